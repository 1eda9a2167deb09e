import { requireInRange, requirePositive, requireNonNegative } from './guard';

/**
 * One layer of a planar stack: complex index N = n + ik and its thickness.
 * For thin films (coherent) thickness is typically tens to hundreds of nanometres; for thick layers
 * (incoherent) it may be microns to millimetres, still written in nanometres (1 mm = 1e6 nm).
 */
export interface StackLayer {
  /** real part of the refractive index, > 0 */
  n: number;
  /** extinction coefficient, ≥ 0 (α = 4πk/λ) */
  k: number;
  /** geometric thickness in nanometres, ≥ 0 */
  thicknessNm: number;
}

/**
 * Power reflectance, transmittance and absorptance of a stack, per polarisation and unpolarised
 * (mean of s and p). R + T + A = 1 for each polarisation.
 */
export interface StackResult {
  Rs: number;
  Rp: number;
  Ts: number;
  Tp: number;
  As: number;
  Ap: number;
  R: number;
  T: number;
  A: number;
}

/** Largest stack accepted at the public edge. */
export const MAX_LAYERS = 10000;

/**
 * Smallest index n accepted at the public edge. Metals reach n ≈ 0.01; below about 1e-150 the squared
 * indices in the admittances underflow and R, T turn into NaN.
 */
export const MIN_INDEX = 1e-6;

function requireIndex(field: string, n: number): void {
  requirePositive(field, n);
  if (n < MIN_INDEX) throw new RangeError(`${field} must be a finite number ≥ 1e-6 (got ${n})`);
}

/**
 * Checks the arguments shared by the stack functions; throws a RangeError naming the field.
 * Incident and exit media are lossless (real index); layers may absorb.
 */
export function validateStack(
  nIn: number,
  layers: readonly StackLayer[],
  nOut: number,
  wavelengthNm: number,
  thetaInRad?: number
): void {
  requireIndex('nIn', nIn);
  requireIndex('nOut', nOut);
  requirePositive('wavelengthNm', wavelengthNm);
  if (thetaInRad !== undefined) requireInRange('thetaInRad', thetaInRad, 0, Math.PI / 2);
  if (!Array.isArray(layers)) throw new RangeError('layers must be an array of { n, k, thicknessNm }');
  if (layers.length > MAX_LAYERS) {
    throw new RangeError(`layers must have at most ${MAX_LAYERS} entries (got ${layers.length})`);
  }
  for (let i = 0; i < layers.length; i++) {
    const l = layers[i];
    if (l === null || typeof l !== 'object') throw new RangeError(`layers[${i}] must be { n, k, thicknessNm }`);
    requireIndex(`layers[${i}].n`, l.n);
    requireNonNegative(`layers[${i}].k`, l.k);
    requireNonNegative(`layers[${i}].thicknessNm`, l.thicknessNm);
  }
}

/** Builds a StackResult from Rs, Rp, Ts, Tp, As, Ap stored in out[0..5]. */
export function stackResultFrom(out: Float64Array): StackResult {
  const Rs = out[0];
  const Rp = out[1];
  const Ts = out[2];
  const Tp = out[3];
  const As = out[4];
  const Ap = out[5];
  return { Rs, Rp, Ts, Tp, As, Ap, R: 0.5 * (Rs + Rp), T: 0.5 * (Ts + Tp), A: 0.5 * (As + Ap) };
}
