/**
 * A far-field (angular intensity) plot drawn in x–y: each sample at polar angle θ from the package
 * normal (+z) with intensity I is placed at (I·sin θ, I·cos θ), so the curve's distance from the
 * origin is the intensity in that direction. Thin guide circles mark 25, 50, 75 and 100 % of the
 * largest intensity; guide rays mark every 30°, each labelled with its angle from the normal just
 * beyond the outer circle (unsigned: the far field of a package is symmetric about its normal).
 */
import type { ChartLabel, ChartPoint, ChartSpec, SeriesSpec } from './spec';

export interface PolarSeriesInput {
  label: string;
  /** Polar angles from the normal, radians, signed (left of the normal negative), [−π, π]. */
  thetaRad: ArrayLike<number>;
  /** Intensity at each angle (any consistent unit, ≥ 0). Non-finite samples are skipped. */
  intensity: ArrayLike<number>;
  /** Palette slot; defaults to the series' position. */
  color?: number;
}

export interface PolarChartOptions {
  title: string;
  /** Name and unit of the intensity, for the axes and CSV: "Relative intensity (max = 1)". */
  intensityLabel: string;
  /** Text alternative; a default one lists the series and the angle range. */
  ariaLabel?: string;
}

const GUIDE_FRACTIONS = [0.25, 0.5, 0.75, 1];
const GUIDE_STEPS = 48;
/** Angle labels sit at this multiple of the outer circle's radius; the axes reach a little beyond. */
const LABEL_RADIUS = 1.1;
const AXIS_REACH = 1.2;

function arc(radius: number, lower: boolean): ChartPoint[] {
  const pts: ChartPoint[] = [];
  const from = lower ? -Math.PI : -Math.PI / 2;
  const to = lower ? Math.PI : Math.PI / 2;
  const steps = lower ? GUIDE_STEPS * 2 : GUIDE_STEPS;
  for (let i = 0; i <= steps; i++) {
    const t = from + ((to - from) * i) / steps;
    pts.push({ x: radius * Math.sin(t), y: radius * Math.cos(t) });
  }
  return pts;
}

/** The smallest of 1, 1.2, 1.5, 2, 2.5, 3, 4, 5, 6, 8 × 10^k at or above x (x > 0): axis ends that read as round numbers. */
export function niceCeil(x: number): number {
  const p = 10 ** Math.floor(Math.log10(x));
  for (const f of [1, 1.2, 1.5, 2, 2.5, 3, 4, 5, 6, 8, 10]) if (f * p >= x * (1 - 1e-12)) return Number((f * p).toPrecision(12));
  return 10 * p;
}

/**
 * Builds the polar far-field chart. Only the upper half plane is drawn when every angle lies within
 * ±90° of the normal; otherwise the whole circle. An empty or all-zero input gives the guides only,
 * scaled to 1, and says so in the aria label.
 */
export function polarChart(input: PolarSeriesInput[], opts: PolarChartOptions): ChartSpec {
  let rMax = 0;
  let lower = false;
  const data: SeriesSpec[] = input.map((s, i) => {
    const points: ChartPoint[] = [];
    const n = Math.min(s.thetaRad.length, s.intensity.length);
    for (let j = 0; j < n; j++) {
      const t = s.thetaRad[j];
      const r = s.intensity[j];
      if (!Number.isFinite(t) || !Number.isFinite(r) || r < 0) continue;
      if (Math.abs(t) > Math.PI / 2 + 1e-9) lower = true;
      if (r > rMax) rMax = r;
      points.push({ x: r * Math.sin(t), y: r * Math.cos(t) });
    }
    return { label: s.label, points, color: s.color ?? i };
  });
  const empty = !(rMax > 0);
  const R = empty ? 1 : rMax;

  const guides: SeriesSpec[] = GUIDE_FRACTIONS.map((f) => ({
    label: `${f * 100} % of maximum`,
    points: arc(f * R, lower),
    color: 0,
    role: 'guide' as const
  }));
  const labels: ChartLabel[] = [];
  for (let deg = lower ? -180 : -90; deg <= (lower ? 150 : 90); deg += 30) {
    const t = (deg * Math.PI) / 180;
    // On the horizon of a half-plane plot the label sits just above the axis, inside the plot.
    const lift = !lower && Math.abs(deg) === 90 ? 0.06 * R : 0;
    labels.push({ x: LABEL_RADIUS * R * Math.sin(t), y: LABEL_RADIUS * R * Math.cos(t) + lift, text: `${Math.abs(deg)}°` });
    guides.push({
      label: `${deg}°`,
      points: [
        { x: 0, y: 0 },
        { x: R * Math.sin(t), y: R * Math.cos(t) }
      ],
      color: 0,
      role: 'guide'
    });
  }

  const m = niceCeil(AXIS_REACH * R);
  const rows: (string | number)[][] = [];
  input.forEach((s) => {
    const n = Math.min(s.thetaRad.length, s.intensity.length);
    for (let j = 0; j < n; j++) {
      if (!Number.isFinite(s.thetaRad[j]) || !Number.isFinite(s.intensity[j])) continue;
      rows.push([s.label, (s.thetaRad[j] * 180) / Math.PI, s.intensity[j]]);
    }
  });

  const names = input.map((s) => s.label).join(', ');
  return {
    kind: 'polar',
    title: opts.title,
    ariaLabel:
      opts.ariaLabel ??
      (empty
        ? `${opts.title}: no intensity to draw yet.`
        : `${opts.title}: polar plot of ${opts.intensityLabel.toLowerCase()} against angle from the normal for ${names}; distance from the centre is the intensity.`),
    x: { title: `${opts.intensityLabel} · sin θ`, min: -m, max: m },
    y: { title: `${opts.intensityLabel} · cos θ`, min: lower ? -m : 0, max: m },
    series: [...guides, ...data],
    labels,
    csv: { headers: ['series', 'angle from normal θ (°)', opts.intensityLabel], rows }
  };
}
