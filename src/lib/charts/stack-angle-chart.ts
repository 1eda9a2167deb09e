/**
 * Chart of a layer stack's transmittance against the angle of incidence inside the chip: s, p and
 * unpolarised, the bare interface for comparison, and a vertical marker at the escape-cone angle.
 * Pure: takes sampled numbers, returns a ChartSpec.
 */
import type { ChartPoint, ChartSpec, SeriesSpec } from './spec';

export interface StackAngleInput {
  /** Angles of incidence in the chip, degrees, ascending, within [0, 90]. */
  thetaDeg: ArrayLike<number>;
  /** Stack transmittances (fractions 0–1) at each angle: s, p and unpolarised (s + p)/2. */
  Ts: ArrayLike<number>;
  Tp: ArrayLike<number>;
  T: ArrayLike<number>;
  /** Unpolarised transmittance of the bare chip → exit interface at the same angles (optional). */
  bareT?: ArrayLike<number>;
  /** Escape-cone (critical) angle into the exit medium, degrees; null when there is none (exit index ≥ chip index). */
  criticalDeg: number | null;
  /** Name of the exit medium, for the title and legend: "air", "methyl silicone". */
  exitName: string;
}

const AXIS_X = 'Angle of incidence in the chip θ (°)';
const AXIS_Y = 'Transmittance T (%)';

function curve(thetaDeg: ArrayLike<number>, values: ArrayLike<number>): ChartPoint[] {
  const pts: ChartPoint[] = [];
  const n = Math.min(thetaDeg.length, values.length);
  for (let i = 0; i < n; i++) {
    const x = thetaDeg[i];
    const y = values[i] * 100;
    if (Number.isFinite(x) && Number.isFinite(y)) pts.push({ x, y });
  }
  return pts;
}

/**
 * T(θ) chart of a stack, in percent against degrees (x axis fixed to 0–90°, y to 0–100 %).
 * Non-finite samples are left out. The escape-cone marker is a vertical line from 0 to 100 %;
 * it is in the legend but not in the CSV.
 */
export function stackAngleChart(input: StackAngleInput): ChartSpec {
  const series: SeriesSpec[] = [
    { label: 'Unpolarised', points: curve(input.thetaDeg, input.T), color: 0 },
    { label: 's-polarised', points: curve(input.thetaDeg, input.Ts), color: 1, dashed: true },
    { label: 'p-polarised', points: curve(input.thetaDeg, input.Tp), color: 2, dashed: true }
  ];
  if (input.bareT) {
    series.push({ label: `Bare interface (no stack), unpolarised`, points: curve(input.thetaDeg, input.bareT), color: 5 });
  }
  const c = input.criticalDeg;
  const hasCone = c !== null && Number.isFinite(c);
  if (hasCone) {
    series.push({
      label: `Escape cone into ${input.exitName}: ${c.toFixed(1)}°`,
      points: [
        { x: c, y: 0 },
        { x: c, y: 100 }
      ],
      color: 3,
      role: 'marker',
      dashed: true
    });
  }
  const tNormal = input.T.length > 0 && Number.isFinite(input.T[0]) ? `${(input.T[0] * 100).toFixed(1)} %` : 'not available';
  const cone = hasCone
    ? `the escape cone into ${input.exitName} ends at ${c.toFixed(1)}°, beyond which T is 0`
    : `the exit medium's index is not below the chip's, so there is no escape cone limit`;
  return {
    kind: 'line',
    title: `Stack transmittance against angle, into ${input.exitName}`,
    ariaLabel: `Line chart of stack transmittance in percent against the angle of incidence in the chip, 0 to 90 degrees, for s, p and unpolarised light; unpolarised T at normal incidence is ${tNormal}; ${cone}.`,
    x: { title: AXIS_X, min: 0, max: 90 },
    y: { title: AXIS_Y, min: 0, max: 100 },
    series
  };
}
