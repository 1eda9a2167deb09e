/**
 * The candela charts of the beam optics side by side: intensity (cd per 1000 lm of source flux) against
 * the angle from the optic's axis, linear and polar. Each optic's 1° zones are drawn as they were traced.
 */
import { polarChart } from './polar-chart';
import type { ChartSpec, SeriesSpec } from './spec';

export interface BeamCurve {
  label: string;
  /** Zone centres, degrees from the axis, 0–180. */
  thetaDeg: readonly number[];
  cdPerKlm: readonly number[];
}

/** The widest angle worth drawing: where every curve has fallen below 1 % of its own peak, rounded up to 10°, at least 30°. */
export function beamExtentDeg(curves: readonly BeamCurve[]): number {
  let extent = 30;
  for (const c of curves) {
    const peak = Math.max(0, ...c.cdPerKlm.filter(Number.isFinite));
    for (let i = 0; i < c.cdPerKlm.length; i++) if (c.cdPerKlm[i] >= 0.01 * peak && peak > 0) extent = Math.max(extent, c.thetaDeg[i]);
  }
  return Math.min(180, Math.ceil(extent / 10) * 10);
}

/** Linear chart: cd/klm against the angle from the axis, one line per optic. Never blank: an empty set says so. */
export function beamCandelaChart(curves: readonly BeamCurve[]): ChartSpec {
  const maxDeg = beamExtentDeg(curves);
  const series: SeriesSpec[] = curves.map((c, i) => ({
    label: c.label,
    color: i,
    points: c.thetaDeg.map((t, j) => ({ x: t, y: c.cdPerKlm[j] })).filter((p) => p.x <= maxDeg && Number.isFinite(p.y))
  }));
  const names = curves.map((c) => c.label).join(', ');
  return {
    kind: 'line',
    title: 'Beam: intensity against angle',
    ariaLabel: curves.length
      ? `Line chart of intensity in candela per 1000 lumens against the angle from the optic's axis, 0 to ${maxDeg} degrees, for ${names}.`
      : 'Beam chart: no optic traced yet.',
    x: { title: 'Angle from the axis θ (°)', min: 0, max: maxDeg },
    y: { title: 'Intensity (cd/klm)', min: 0 },
    series,
    csv: {
      headers: ['Angle from the axis θ (°)', ...curves.map((c) => `${c.label} (cd/klm)`)],
      rows: (curves[0]?.thetaDeg ?? []).map((t, j) => [t, ...curves.map((c) => c.cdPerKlm[j])])
    }
  };
}

/** Polar chart of the same curves, mirrored to both sides of the axis (rotational symmetry). */
export function beamCandelaPolar(curves: readonly BeamCurve[]): ChartSpec {
  return polarChart(
    curves.map((c, i) => {
      const theta: number[] = [];
      const intensity: number[] = [];
      for (let j = c.thetaDeg.length - 1; j >= 0; j--) {
        theta.push((-c.thetaDeg[j] * Math.PI) / 180);
        intensity.push(c.cdPerKlm[j]);
      }
      for (let j = 0; j < c.thetaDeg.length; j++) {
        theta.push((c.thetaDeg[j] * Math.PI) / 180);
        intensity.push(c.cdPerKlm[j]);
      }
      return { label: c.label, thetaRad: theta, intensity, color: i };
    }),
    { title: 'Beam: polar candela plot', intensityLabel: 'Intensity (cd/klm)' }
  );
}
