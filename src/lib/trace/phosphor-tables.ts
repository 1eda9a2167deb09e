/**
 * The spectral part of a compiled scene, built once per run from the scene's chip spectrum and its
 * phosphor media: each phosphor's (each particle kind's, for a mixture) μs, μa, g tabulated on one wavelength grid (GRID_FROM_NM..GRID_TO_NM
 * in GRID_STEP_NM steps, linear between the given rows, the first and last rows held beyond the ends),
 * its emission as a quantile table, its quantum yield; the chip's quantile table; and the real index of
 * each medium that gives one over wavelength (SceneMedium.indexRows) on the same grid, so each ray sees
 * the indices at its own wavelength (dispersion).
 * The ray loop (medium-events.ts) reads these flat arrays only.
 */
import { quantileTable, QUANTILES } from './spectral-sampler';
import type { ScenePhosphor, ScenePhosphorPart } from './scene';

export const GRID_FROM_NM = 300;
export const GRID_TO_NM = 900;
export const GRID_STEP_NM = 1;
export const GRID_POINTS = (GRID_TO_NM - GRID_FROM_NM) / GRID_STEP_NM + 1;
/** Per phosphor: μs, μa, g over the grid (three runs of GRID_POINTS). */
export const PHOSPHOR_TABLE_STRIDE = 3 * GRID_POINTS;
/** Most particle kinds mixed in one medium (the ray loop's scratch holds this many). */
export const MAX_MIXED_KINDS = 4;

export interface SpectralTables {
  /** Quantile table of the chip's emission (QUANTILES entries). */
  chip: Float64Array;
  /** True when the chip emits one line (no number is drawn for its wavelength). */
  chipLine: boolean;
  /**
   * Per phosphor medium (index the medium record holds): its first particle kind and how many kinds it
   * mixes. The tables below are per particle kind.
   */
  partStart: Int32Array;
  partCount: Int32Array;
  /** PHOSPHOR_TABLE_STRIDE doubles per particle kind. */
  coefficients: Float64Array;
  /** QUANTILES doubles per phosphor: its emission's quantile table. */
  emission: Float64Array;
  quantumYield: Float64Array;
  /** Media whose index depends on wavelength (indices into the compiled scene's media). */
  dispersive: Int32Array;
  /** GRID_POINTS doubles per dispersive medium: its real index on the grid. */
  indices: Float64Array;
}

/** A medium's index over wavelength, for the tables: its index in the scene and its rows [nm, n]. */
export interface IndexTableInput {
  medium: number;
  rows: readonly (readonly [number, number])[];
}

/**
 * Linear interpolation of rows [x, y] sorted by x, ends held, returning a row's own y exactly where x
 * falls on it (so a grid point at a row's wavelength carries the library's value bit for bit).
 */
function rowValueAt(rows: readonly (readonly [number, number])[], x: number): number {
  if (x <= rows[0][0]) return rows[0][1];
  const last = rows.length - 1;
  if (x >= rows[last][0]) return rows[last][1];
  let i = 1;
  while (rows[i][0] < x) i++;
  if (rows[i][0] === x) return rows[i][1];
  const f = (x - rows[i - 1][0]) / (rows[i][0] - rows[i - 1][0]);
  return rows[i - 1][1] + f * (rows[i][1] - rows[i - 1][1]);
}

/** Linear interpolation in rows sorted by x (column `col`), ends held. */
export function interpolateHeld(rows: readonly (readonly number[])[], x: number, col: number): number {
  if (x <= rows[0][0]) return rows[0][col];
  const last = rows.length - 1;
  if (x >= rows[last][0]) return rows[last][col];
  let i = 1;
  while (rows[i][0] < x) i++;
  const [x0, x1] = [rows[i - 1][0], rows[i][0]];
  const f = (x - x0) / (x1 - x0);
  return rows[i - 1][col] + f * (rows[i][col] - rows[i - 1][col]);
}

export function buildSpectralTables(
  chipSpectrum: readonly (readonly [number, number])[],
  mediumPhosphors: readonly ScenePhosphor[],
  indexTables: readonly IndexTableInput[] = []
): SpectralTables {
  const partStart = new Int32Array(mediumPhosphors.length);
  const partCount = new Int32Array(mediumPhosphors.length);
  const phosphors: ScenePhosphorPart[] = [];
  mediumPhosphors.forEach((m, i) => {
    partStart[i] = phosphors.length;
    const kinds = [m, ...(m.mixedWith ?? [])];
    if (kinds.length > MAX_MIXED_KINDS) throw new RangeError(`a phosphor medium mixes at most ${MAX_MIXED_KINDS} particle kinds (got ${kinds.length})`);
    partCount[i] = kinds.length;
    phosphors.push(...kinds);
  });
  const coefficients = new Float64Array(phosphors.length * PHOSPHOR_TABLE_STRIDE);
  const emission = new Float64Array(phosphors.length * QUANTILES);
  const quantumYield = new Float64Array(phosphors.length);
  phosphors.forEach((p, i) => {
    const o = i * PHOSPHOR_TABLE_STRIDE;
    for (let k = 0; k < GRID_POINTS; k++) {
      const nm = GRID_FROM_NM + k * GRID_STEP_NM;
      coefficients[o + k] = interpolateHeld(p.coefficients, nm, 1);
      coefficients[o + GRID_POINTS + k] = interpolateHeld(p.coefficients, nm, 2);
      coefficients[o + 2 * GRID_POINTS + k] = interpolateHeld(p.coefficients, nm, 3);
    }
    emission.set(quantileTable(p.emission), i * QUANTILES);
    quantumYield[i] = p.quantumYield;
  });
  const indices = new Float64Array(indexTables.length * GRID_POINTS);
  indexTables.forEach((t, i) => {
    for (let k = 0; k < GRID_POINTS; k++) indices[i * GRID_POINTS + k] = rowValueAt(t.rows, GRID_FROM_NM + k * GRID_STEP_NM);
  });
  return {
    chip: quantileTable(chipSpectrum),
    chipLine: chipSpectrum.length === 1,
    partStart,
    partCount,
    coefficients,
    emission,
    quantumYield,
    dispersive: Int32Array.from(indexTables.map((t) => t.medium)),
    indices
  };
}
