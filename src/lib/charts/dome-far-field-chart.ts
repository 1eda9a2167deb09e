/**
 * Far field of a trace against polar angle, in Cartesian axes: the traced intensity (regrouped into
 * wider zones, so the small cones near the axis are not all noise), a Lambertian emitter of the same
 * flux, and a vertical line at half the beam angle. Pure: takes far-field bins, returns a ChartSpec.
 *
 * Intensities are relative to the Lambertian on-axis intensity I0 = Φ/π of the same escaped flux Φ,
 * so the Lambertian reads cos θ (common practice).
 */
import type { ChartPoint, ChartSpec, SeriesSpec } from './spec';

/** One far-field sample: bin centre (°) and intensity over the Lambertian I0 of the same flux. */
export interface FarFieldSample {
  thetaDeg: number;
  relativeIntensity: number;
}

export interface FarFieldInput {
  /** Bins of equal width in θ, from 0° up, in order. */
  bins: readonly FarFieldSample[];
  /** Full width at half maximum (°, at most 180), or null when it does not exist. */
  beamAngleDeg: number | null;
  /** Why there is no beam angle (e.g. wider than 180°), for the text alternative. */
  beamAngleNote?: string | null;
  /** Mean intensity over the 0–5° cap over I0, or null. */
  onAxisVsLambertian: number | null;
  /** Draw up to 180° (light escapes below the horizon) instead of 0–90°. */
  fullSphere?: boolean;
}

const RAD = Math.PI / 180;

/**
 * Regroups equal-width bins into zones of `group` bins: the zone's intensity is the solid-angle
 * weighted mean I = Σ I_i ΔΩ_i / Σ ΔΩ_i, ΔΩ_i = 2π (cos θ_lo − cos θ_hi) (exact for counts over
 * solid angle). Non-finite bins are skipped. Returns zone centres (°) and intensities.
 * @param group bins per zone, integer ≥ 1
 */
export function regroupFarField(bins: readonly FarFieldSample[], group: number, maxDeg = 180): { thetaDeg: number; intensity: number }[] {
  const out: { thetaDeg: number; intensity: number }[] = [];
  if (bins.length === 0) return out;
  const width = bins.length > 1 ? bins[1].thetaDeg - bins[0].thetaDeg : 2 * bins[0].thetaDeg;
  for (let i = 0; i < bins.length; i += group) {
    let weighted = 0;
    let omega = 0;
    let lo = Infinity;
    let hi = -Infinity;
    for (let j = i; j < Math.min(bins.length, i + group); j++) {
      const b = bins[j];
      const a0 = b.thetaDeg - width / 2;
      const a1 = b.thetaDeg + width / 2;
      if (a1 > maxDeg + 1e-9) continue;
      // ΔΩ = 2π (cos θ_lo − cos θ_hi)
      const dOmega = 2 * Math.PI * (Math.cos(a0 * RAD) - Math.cos(a1 * RAD));
      if (!Number.isFinite(b.relativeIntensity) || !(dOmega > 0)) continue;
      weighted += b.relativeIntensity * dOmega;
      omega += dOmega;
      lo = Math.min(lo, a0);
      hi = Math.max(hi, a1);
    }
    if (omega > 0) out.push({ thetaDeg: (lo + hi) / 2, intensity: weighted / omega });
  }
  return out;
}

/**
 * How far in θ the chart reaches (°): 90; with `fullSphere`, 120 when the last bin holding light ends
 * by 120°, else 180 (round numbers on a 20° or 30° grid).
 */
export function farFieldExtentDeg(input: FarFieldInput): number {
  if (!input.fullSphere) return 90;
  const bins = input.bins;
  const width = bins.length > 1 ? bins[1].thetaDeg - bins[0].thetaDeg : 1;
  let last = 0;
  for (const b of bins) if (b.relativeIntensity > 0 && Number.isFinite(b.relativeIntensity)) last = b.thetaDeg + width / 2;
  return last <= 90 + 1e-9 ? 90 : last <= 120 + 1e-9 ? 120 : 180;
}

/** Lambertian reference cos θ (relative to I0), sampled every `step` degrees from 0 to 90. */
export function lambertianCurve(step = 2): ChartPoint[] {
  const pts: ChartPoint[] = [];
  for (let t = 0; t <= 90 + 1e-9; t += step) pts.push({ x: t, y: Math.max(0, Math.cos(t * RAD)) });
  return pts;
}

/**
 * The far-field chart (relative intensity against θ from the package normal). The traced curve uses
 * zones of `group` bins (3° for 1° bins). With no escaped light the trace series is empty and the text
 * says so; the Lambertian reference is always drawn, so the chart is never blank.
 */
export function domeFarFieldChart(input: FarFieldInput, group = 3): ChartSpec {
  const maxDeg = farFieldExtentDeg(input);
  const zones = regroupFarField(input.bins, group, maxDeg);
  const traced: ChartPoint[] = zones.map((z) => ({ x: z.thetaDeg, y: z.intensity }));
  const empty = !traced.some((p) => p.y > 0);
  let peak = 1;
  for (const p of traced) if (p.y > peak) peak = p.y;
  // y axis top: 10 % above the larger of the peak and the Lambertian's 1, up to the next 0.2
  const top = Math.round(Math.ceil((peak * 1.1) / 0.2 - 1e-9) * 2) / 10;

  const series: SeriesSpec[] = [
    { label: 'Monte Carlo trace', points: empty ? [] : traced, color: 0 },
    { label: 'Lambertian of the same flux (cos θ)', points: lambertianCurve(), color: 5, dashed: true }
  ];
  const beam = input.beamAngleDeg;
  if (beam !== null && Number.isFinite(beam) && beam / 2 <= maxDeg) {
    series.push({
      label: `Half the beam angle: ${(beam / 2).toFixed(1)}° (FWHM ${beam.toFixed(1)}°)`,
      points: [
        { x: beam / 2, y: 0 },
        { x: beam / 2, y: top }
      ],
      color: 3,
      role: 'marker',
      dashed: true
    });
  }
  const ratio = input.onAxisVsLambertian;
  const facts = empty
    ? 'no light escaped in this trace, so only the Lambertian reference is drawn'
    : `beam angle (full width at half maximum) ${beam !== null && Number.isFinite(beam) ? `${beam.toFixed(1)}°` : `not defined${input.beamAngleNote ? ` (${input.beamAngleNote.replace(/\.$/, '')})` : ''}`}; on-axis intensity ${ratio !== null && Number.isFinite(ratio) ? `${ratio.toFixed(2)} times` : 'not available against'} a Lambertian of the same flux`;
  return {
    kind: 'line',
    title: 'Far field: intensity against polar angle',
    ariaLabel: `Line chart of relative intensity against the polar angle from the package normal, 0 to ${maxDeg} degrees, for the trace and a Lambertian emitter of the same flux; ${facts}.`,
    x: { title: 'Angle from the package normal θ (°)', min: 0, max: maxDeg },
    y: { title: 'Relative intensity I/I₀', min: 0, max: top },
    series,
    csv: {
      headers: ['Angle from normal θ (°)', 'Trace intensity / I0', 'Lambertian intensity / I0'],
      rows: zones.map((z) => [z.thetaDeg, z.intensity, z.thetaDeg <= 90 ? Math.cos(z.thetaDeg * RAD) : 0])
    }
  };
}
