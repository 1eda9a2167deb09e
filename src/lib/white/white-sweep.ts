/**
 * CCT, efficacy and colour uniformity against phosphor load or particle size: the white trace run at
 * each value of one swept quantity, every point with the same rays and seed (common random numbers, so
 * the curve's point-to-point wiggle is smaller than each point's σ), one point after another.
 */
import { LIMITS } from '../scenario/limits';
import { checkSweepValues } from '../sweeps/sweep-values';
import type { PhosphorSummary } from '../trace/phosphor-summary';
import { exportNumber } from '../export/index';

export type WhiteSweepAxis = 'load' | 'diameter';

export const WHITE_SWEEP_AXES: Record<WhiteSweepAxis, { label: string; unit: string; column: string; limit: { min: number; max: number } }> = {
  load: { label: 'Phosphor load', unit: 'wt%', column: 'load_wt_percent', limit: LIMITS.phosphorWeightPercent },
  diameter: { label: 'Particle diameter', unit: 'µm', column: 'diameter_um', limit: LIMITS.phosphorDiameterUm }
};

/** Most points of one sweep. */
export const MAX_WHITE_SWEEP_POINTS = 24;

export interface WhiteSweepPoint {
  /** The swept value (wt% or µm). */
  value: number;
  cctK: number | null;
  sigmaCctK: number | null;
  duv: number | null;
  ra: number | null;
  /** Luminous efficacy of the escaping radiation, lm/W. */
  lerLmPerW: number | null;
  /** Lumens per watt of chip light: LER × energy efficiency. */
  lumensPerWattOfChip: number | null;
  /** Watts out / watts of chip light. */
  energyEfficiency: number;
  /** Photons out / chip photons. */
  photonEfficiency: number;
  /** Largest u′v′ distance of a 10° band from the whole output; null with fewer than two bands. */
  deltaUvPrime: number | null;
}

/**
 * The swept values from text ("2, 4, 8, 12"): 1 to MAX_WHITE_SWEEP_POINTS numbers, each in the axis'
 * range, increasing.
 * @throws RangeError naming the field, the value and the allowed range
 */
export function parseWhiteSweepValues(axis: WhiteSweepAxis, text: string): number[] {
  const a = WHITE_SWEEP_AXES[axis];
  const field = `${a.label} values`;
  const cells = text.split(/[,;\s]+/).filter((c) => c !== '');
  if (cells.length < 1 || cells.length > MAX_WHITE_SWEEP_POINTS) throw new RangeError(`${field} must be 1 to ${MAX_WHITE_SWEEP_POINTS} numbers, separated by commas`);
  const values = cells.map((c) => {
    const v = Number(c);
    if (!Number.isFinite(v)) throw new RangeError(`${field}: '${c.slice(0, 20)}' is not a number`);
    return v;
  });
  const min = axis === 'load' ? Math.max(a.limit.min, 0.01) : a.limit.min; // a load of 0 has no colour to sweep
  return checkSweepValues(`${field} (${a.unit})`, values, min, a.limit.max);
}

/** One point's figures from its white summary. */
export function sweepPointOf(value: number, s: PhosphorSummary): WhiteSweepPoint {
  const c = s.color;
  return {
    value,
    cctK: c?.cctK ?? null,
    sigmaCctK: c?.sigma.cctK ?? null,
    duv: c?.duv ?? null,
    ra: c?.ra ?? null,
    lerLmPerW: c ? c.lerLmPerW : null,
    lumensPerWattOfChip: c ? c.lerLmPerW * s.energyEfficiency : null,
    energyEfficiency: s.energyEfficiency,
    photonEfficiency: s.photonEfficiency,
    deltaUvPrime: s.deltaUvPrime
  };
}

/**
 * Traces every value in turn.
 * @param evaluate traces the package at one swept value (same rays and seed every time)
 * @param onPoint called after each point with the points so far (to draw the curve as it grows)
 */
export async function runWhiteSweep(
  values: readonly number[],
  evaluate: (value: number) => Promise<PhosphorSummary>,
  onPoint: (points: WhiteSweepPoint[]) => void = () => {}
): Promise<WhiteSweepPoint[]> {
  const points: WhiteSweepPoint[] = [];
  for (const v of values) {
    points.push(sweepPointOf(v, await evaluate(v)));
    onPoint([...points]);
  }
  return points;
}

const CSV_COLUMNS = ['cct_k', 'sigma_cct_k', 'duv', 'ra', 'ler_lm_per_w', 'lm_per_w_of_chip_light', 'energy_efficiency', 'photon_efficiency', 'delta_u_v_prime'] as const;

/** The sweep as CSV: one row per point, units in the column names, empty cells where a value is undefined. */
export function whiteSweepCsv(axis: WhiteSweepAxis, points: readonly WhiteSweepPoint[]): string {
  const cell = (v: number | null) => (v === null ? '' : exportNumber(v));
  const rows = points.map((p) =>
    [p.value, p.cctK, p.sigmaCctK, p.duv, p.ra, p.lerLmPerW, p.lumensPerWattOfChip, p.energyEfficiency, p.photonEfficiency, p.deltaUvPrime].map(cell).join(',')
  );
  return [[WHITE_SWEEP_AXES[axis].column, ...CSV_COLUMNS].join(','), ...rows].join('\n') + '\n';
}
