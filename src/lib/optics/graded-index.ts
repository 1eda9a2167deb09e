import type { StackLayer } from './layer';
import { requirePositive, requireNonNegative, requireInteger } from './guard';

/** Shape of an index profile from nA (t = 0) to nB (t = 1). */
export type IndexProfile = 'linear' | 'quintic' | 'exponential';

/** Input of {@link gradedIndexLayers}. */
export interface GradedIndexSpec {
  /** index at the start (chip side), > 0 */
  nA: number;
  /** index at the end (outside side), > 0 */
  nB: number;
  /** total thickness in nm, ≥ 0 */
  thicknessNm: number;
  /** number of equal-thickness sublayers, integer in [1, 10000] */
  steps: number;
  profile: IndexProfile;
  /** extinction coefficient of every sublayer (default 0) */
  k?: number;
}

/**
 * Normalised profile value at depth t ∈ [0, 1]:
 *   linear       t
 *   quintic      10t³ − 15t⁴ + 6t⁵  (zero slope and curvature at both ends)
 *   exponential  handled in {@link profileIndex} as a geometric mean n = nA (nB/nA)^t
 * Source (quintic): W. H. Southwell, "Gradient-index antireflection coatings", Opt. Lett. 8, 584 (1983).
 */
function shape(profile: IndexProfile, t: number): number {
  if (profile === 'quintic') return t * t * t * (10 - 15 * t + 6 * t * t);
  return t;
}

/**
 * Index of a graded profile at fractional depth t ∈ [0, 1] from nA to nB.
 *   linear, quintic: n = nA + (nB − nA)·shape(t);  exponential: n = nA·(nB/nA)^t
 * @see W. H. Southwell, Opt. Lett. 8, 584 (1983) for the quintic profile
 */
export function profileIndex(nA: number, nB: number, profile: IndexProfile, t: number): number {
  // Exponential (geometric) profile: equal index ratio per unit depth
  if (profile === 'exponential') return nA * Math.pow(nB / nA, t);
  return nA + (nB - nA) * shape(profile, t);
}

/**
 * A graded-index region between nA and nB as `steps` homogeneous sublayers of equal thickness, each
 * with the profile's index at its mid-depth (midpoint rule). Ordered from the nA side.
 * @returns StackLayer[] of length steps; thicknessNm / steps each
 * @example gradedIndexLayers({ nA: 2.5, nB: 1, thicknessNm: 500, steps: 5, profile: 'linear' })[0].n // 2.35
 * @see W. H. Southwell, Opt. Lett. 8, 584 (1983)
 */
export function gradedIndexLayers(spec: GradedIndexSpec): StackLayer[] {
  requirePositive('nA', spec.nA);
  requirePositive('nB', spec.nB);
  requireNonNegative('thicknessNm', spec.thicknessNm);
  requireInteger('steps', spec.steps, 1, 10000);
  if (spec.profile !== 'linear' && spec.profile !== 'quintic' && spec.profile !== 'exponential') {
    throw new RangeError(`profile must be 'linear', 'quintic' or 'exponential' (got ${String(spec.profile)})`);
  }
  const k = spec.k === undefined ? 0 : requireNonNegative('k', spec.k);
  const d = spec.thicknessNm / spec.steps;
  const layers: StackLayer[] = [];
  for (let i = 0; i < spec.steps; i++) {
    const t = (i + 0.5) / spec.steps;
    layers.push({ n: profileIndex(spec.nA, spec.nB, spec.profile, t), k, thicknessNm: d });
  }
  return layers;
}

/**
 * Index of a single antireflection layer that cancels reflection at normal incidence (at a quarter
 * wave): n = √(nIn · nOut).
 * @param nIn, nOut indices of the two media (> 0)
 * @example singleLayerOptimumIndex(1, 1.52) // ≈ 1.2329
 * @see E. Hecht, Optics, thin-film section (quarter-wave antireflection coating)
 */
export function singleLayerOptimumIndex(nIn: number, nOut: number): number {
  requirePositive('nIn', nIn);
  requirePositive('nOut', nOut);
  // n1² = n0 · ns
  return Math.sqrt(nIn * nOut);
}

/**
 * Physical thickness of a quarter-wave layer: d = λ / (4 n cos θ), θ the ray angle inside the layer
 * (default 0, normal incidence).
 * @param n layer index (> 0); @param wavelengthNm vacuum design wavelength, nm (> 0)
 * @param thetaLayerRad angle inside the layer, radians, [0, π/2)
 * @returns thickness in nm
 * @example quarterWaveThicknessNm(1.38, 550) // ≈ 99.64
 * @see Macleod, Thin-Film Optical Filters, ch. 3
 */
export function quarterWaveThicknessNm(n: number, wavelengthNm: number, thetaLayerRad = 0): number {
  requirePositive('n', n);
  requirePositive('wavelengthNm', wavelengthNm);
  if (!(thetaLayerRad >= 0 && thetaLayerRad < Math.PI / 2)) {
    throw new RangeError(`thetaLayerRad must be a number in [0, π/2) (got ${thetaLayerRad})`);
  }
  // optical thickness n d cos θ = λ/4
  return wavelengthNm / (4 * n * Math.cos(thetaLayerRad));
}
