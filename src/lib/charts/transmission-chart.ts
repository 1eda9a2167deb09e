/**
 * Chart of the transmittance of one interface against the angle of incidence, T(θ) for s, p and
 * unpolarised light, with the critical angle marked by a vertical line.
 */
import type { ChartSpec, SeriesSpec } from './spec';

/** Samples of T(θ); the shape `transmissionCurve` in the optics core returns. */
export interface TransmissionSamples {
  /** Angles of incidence, degrees, ascending in [0, 90]. */
  angleDeg: readonly number[];
  /** s, p and unpolarised transmittance, fractions [0, 1]. */
  Ts: readonly number[];
  Tp: readonly number[];
  T: readonly number[];
}

function fmt(x: number, digits: number): string {
  return String(Number(x.toPrecision(digits)));
}

/**
 * Builds the T(θ) chart in percent. `criticalAngleRad` ≥ π/2 (or not finite) means there is no critical
 * angle (surrounding index ≥ inside index): no marker is drawn and the text says so. Non-finite samples
 * are dropped, so the chart never receives NaN.
 * @param nIn index the light starts in; @param nOut index it escapes into (for the labels only)
 */
export function transmissionChart(samples: TransmissionSamples, criticalAngleRad: number, nIn: number, nOut: number): ChartSpec {
  const series = (label: string, ys: readonly number[], color: number, dashed = false): SeriesSpec => {
    const points = [];
    for (let i = 0; i < samples.angleDeg.length && i < ys.length; i++) {
      const x = samples.angleDeg[i];
      const y = ys[i] * 100;
      if (Number.isFinite(x) && Number.isFinite(y)) points.push({ x, y });
    }
    return { label, points, color, dashed };
  };
  const out: SeriesSpec[] = [
    series('Unpolarised', samples.T, 0),
    series('s-polarised', samples.Ts, 1, true),
    series('p-polarised', samples.Tp, 2, true)
  ];
  const hasCritical = Number.isFinite(criticalAngleRad) && criticalAngleRad < Math.PI / 2;
  const thetaCDeg = (criticalAngleRad * 180) / Math.PI;
  if (hasCritical) {
    out.push({
      label: `Critical angle ${fmt(thetaCDeg, 4)}°`,
      points: [
        { x: thetaCDeg, y: 0 },
        { x: thetaCDeg, y: 100 }
      ],
      color: 5,
      role: 'marker',
      dashed: true
    });
  }
  const pair = `n ${fmt(nIn, 4)} → ${fmt(nOut, 4)}`;
  return {
    kind: 'line',
    title: `Transmittance against angle of incidence (${pair})`,
    ariaLabel: hasCritical
      ? `Line chart of transmittance in percent against angle of incidence from 0 to 90 degrees for unpolarised, s and p light, ${pair}. Transmittance falls to zero at the critical angle, ${fmt(thetaCDeg, 4)} degrees, marked by a vertical line.`
      : `Line chart of transmittance in percent against angle of incidence from 0 to 90 degrees for unpolarised, s and p light, ${pair}. There is no critical angle: the surrounding index is not lower than the inside index.`,
    x: { title: 'Angle of incidence inside, θ (°)', min: 0, max: 90 },
    y: { title: 'Transmittance T (%)', min: 0, max: 100 },
    series: out
  };
}
