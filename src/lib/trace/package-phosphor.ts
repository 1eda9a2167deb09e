/**
 * A phosphor in a traced package: where it is, its per-wavelength coefficients (given as a table, or
 * computed from particles by Mie theory), its emission and quantum yield, and the chip spectrum the
 * spectral rays are drawn from. Checked once at the edge (validateTracePhosphor).
 * Regions: 'encapsulant' (particles dispersed through the whole encapsulant), or a layer of the
 * encapsulant material holding them, of thickness T: 'conformal' (around the chip's top and sides),
 * 'remote' (a plate at the top of the fill, or a shell under a dome's surface), 'floor' (settled on the
 * floor around the chip). Geometry and fit rules: body-phosphor.ts, scenario/package-fit.ts.
 */
import { particleCloud, type ParticleSize } from '../scatter/index';
import { particleIndexAt, type Phosphor } from '../phosphors/index';
import { LIMITS } from '../scenario/limits';
import { MAX_MIXED_KINDS } from './phosphor-tables';

/** Where a phosphor can sit. */
export const PHOSPHOR_REGIONS = ['encapsulant', 'conformal', 'remote', 'floor'] as const;
export type PhosphorRegion = (typeof PHOSPHOR_REGIONS)[number];

export interface TracePhosphor {
  region: PhosphorRegion;
  /** Layer thickness T, mm: needed for 'conformal', 'remote' and 'floor'; not used for 'encapsulant'. */
  thicknessMm?: number;
  /** [wavelength nm, μs 1/mm, μa 1/mm, g], sorted; linear between rows, ends held. */
  coefficients: [number, number, number, number][];
  /** Emission [wavelength nm, power per nm], sorted. */
  emission: [number, number][];
  quantumYield: number;
  /** Other particle kinds mixed into the same region (a red beside a yellow), each with its own tables. */
  mixedWith?: TracePhosphorPart[];
  /** Chip emission [wavelength nm, power per nm] (one row: a line). */
  chipSpectrum: [number, number][];
}

/** One more particle kind of a mixture: its coefficients, emission and quantum yield. */
export type TracePhosphorPart = Pick<TracePhosphor, 'coefficients' | 'emission' | 'quantumYield'>;

/** Host density of a silicone encapsulant, g/cm³ (common practice: 1.0–1.2). */
export const SILICONE_DENSITY_G_PER_CM3 = 1.1;

export interface ParticleLoad {
  phosphor: Phosphor;
  /** Particle mass / mixture mass, [0, 0.95]. */
  weightFraction: number;
  size: ParticleSize;
  /** Host (encapsulant) index and density. */
  hostN: number;
  hostDensityGPerCm3: number;
}

/**
 * μs, μa, g rows from particles by Mie theory (particleCloud) every `stepNm` over fromNm..toNm.
 * @throws RangeError from particleCloud naming the input out of range
 */
export function coefficientsFromParticles(load: ParticleLoad, fromNm = 360, toNm = 830, stepNm = 5): [number, number, number, number][] {
  const rows: [number, number, number, number][] = [];
  for (let nm = fromNm; nm <= toNm + 1e-9; nm += stepNm) {
    const { n, k } = particleIndexAt(load.phosphor, nm);
    const c = particleCloud({
      wavelengthNm: nm,
      particleN: n,
      particleK: k,
      hostN: load.hostN,
      size: load.size,
      weightFraction: load.weightFraction,
      particleDensityGPerCm3: load.phosphor.densityGPerCm3,
      hostDensityGPerCm3: load.hostDensityGPerCm3
    });
    rows.push([nm, c.musPerMm, c.muaPerMm, c.g]);
  }
  return rows;
}

function sortedRows(field: string, rows: unknown, width: number, check: (row: number[], name: string) => void): void {
  if (!Array.isArray(rows) || rows.length < 1 || rows.length > 100000) throw new RangeError(`${field} must hold 1 to 100000 rows`);
  rows.forEach((row: unknown, i) => {
    const name = `${field} row ${i + 1}`;
    if (!Array.isArray(row) || row.length !== width || !row.every((v) => typeof v === 'number' && Number.isFinite(v))) {
      throw new RangeError(`${name} must be ${width} finite numbers`);
    }
    if (!(row[0] >= 200 && row[0] <= 2500)) throw new RangeError(`${name}: wavelength_nm must be from 200 to 2500 nm (got ${row[0]})`);
    if (i > 0 && !(row[0] > (rows[i - 1] as number[])[0])) throw new RangeError(`${name}: wavelength_nm must be above the previous row's (rows sorted, no repeats)`);
    check(row as number[], name);
  });
}

function coefficientRows(field: string, rows: unknown): void {
  sortedRows(field, rows, 4, (row, name) => {
    if (!(row[1] >= 0 && row[1] <= 1e4)) throw new RangeError(`${name}: mus_per_mm must be from 0 to 10000 1/mm (got ${row[1]})`);
    if (!(row[2] >= 0 && row[2] <= 1e4)) throw new RangeError(`${name}: mua_per_mm must be from 0 to 10000 1/mm (got ${row[2]})`);
    if (!(row[3] > -1 && row[3] < 1)) throw new RangeError(`${name}: g must lie in (−1, 1) (got ${row[3]})`);
  });
}

function spectrumRows(field: string, rows: unknown): void {
  sortedRows(field, rows, 2, (row, name) => {
    if (!(row[1] >= 0)) throw new RangeError(`${name}: value must be ≥ 0 (got ${row[1]})`);
  });
  const r = rows as number[][];
  if (r.length > 1 && !r.some((row) => row[1] > 0)) throw new RangeError(`${field} must have some power above 0`);
}

/** Checks a package's phosphor; throws a RangeError naming the field and its allowed range. */
export function validateTracePhosphor(p: TracePhosphor): void {
  if (typeof p !== 'object' || p === null) throw new RangeError('phosphor must be an object');
  if (!(PHOSPHOR_REGIONS as readonly string[]).includes(p.region)) {
    throw new RangeError(`phosphor.region must be one of: ${PHOSPHOR_REGIONS.join(', ')} (got '${String(p.region)}')`);
  }
  const T = LIMITS.phosphorThicknessMm;
  if (p.thicknessMm !== undefined && !(typeof p.thicknessMm === 'number' && p.thicknessMm >= T.min && p.thicknessMm <= T.max)) {
    throw new RangeError(`phosphor.thicknessMm must be a number from ${T.min} to ${T.max} mm (got ${String(p.thicknessMm)})`);
  }
  coefficientRows('phosphor.coefficients', p.coefficients);
  spectrumRows('phosphor.emission', p.emission);
  spectrumRows('phosphor.chipSpectrum', p.chipSpectrum);
  quantumYieldOf('phosphor.quantumYield', p.quantumYield);
  if (p.mixedWith !== undefined) {
    if (!Array.isArray(p.mixedWith) || p.mixedWith.length > MAX_MIXED_KINDS - 1) {
      throw new RangeError(`phosphor.mixedWith must be a list of at most ${MAX_MIXED_KINDS - 1} particle kinds`);
    }
    p.mixedWith.forEach((k, i) => {
      const f = `phosphor.mixedWith[${i}]`;
      coefficientRows(`${f}.coefficients`, k.coefficients);
      spectrumRows(`${f}.emission`, k.emission);
      quantumYieldOf(`${f}.quantumYield`, k.quantumYield);
    });
  }
}

function quantumYieldOf(field: string, q: unknown): void {
  if (!(typeof q === 'number' && q >= 0 && q <= 1)) throw new RangeError(`${field} must be a number from 0 to 1 (got ${String(q)})`);
}
