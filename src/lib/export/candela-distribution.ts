/**
 * A traced far field (relative intensity against polar angle) turned into candela at a stated flux, on
 * an even grid of type C vertical angles 0°, step, …, 180° — what an LM-63 file and the far-field CSV
 * both write.
 */
import { checkDistribution, symmetricFlux } from './symmetric-flux';

/** A rotationally symmetric far field: relative luminous intensity (per steradian) at polar angles. */
export interface FarFieldSamples {
  /** Polar angles from the package axis, degrees, strictly increasing, in [0, 180]. */
  thetaDeg: readonly number[];
  /** Relative intensity (any scale, ∝ cd) at those angles, finite, ≥ 0. */
  relativeIntensity: readonly number[];
}

export interface CandelaDistribution {
  /** Even grid of vertical angles 0 … 180°, degrees. */
  thetaDeg: number[];
  /** Intensity at each grid angle, cd. */
  candela: number[];
  /** Relative intensity at each grid angle (the input, interpolated). */
  relativeIntensity: number[];
  /** cd per unit of the input's relative intensity: candela = candelaPerUnit · relativeIntensity. */
  candelaPerUnit: number;
  /** The flux the candela values carry, lm (equals the lumens asked for). */
  lumens: number;
}

/** Allowed flux at the public edge, lm: from a dim indicator to a large multi-chip array. */
export const LUMENS_LIMIT = { min: 1e-6, max: 1e7 } as const;

/** Vertical angle steps that divide 180° evenly, degrees. */
export const STEP_CHOICES_DEG: readonly number[] = [0.5, 1, 2, 2.5, 5, 10];

/**
 * Linear interpolation of the samples at θ; beyond the first or last sample the end value is held.
 * Inner helper: trusts its inputs (checked, increasing angles).
 */
function interpolate(thetaDeg: readonly number[], values: readonly number[], theta: number, from: number): number {
  const n = thetaDeg.length;
  if (theta <= thetaDeg[0]) return values[0];
  if (theta >= thetaDeg[n - 1]) return values[n - 1];
  let i = from;
  while (thetaDeg[i + 1] < theta) i++;
  const t = (theta - thetaDeg[i]) / (thetaDeg[i + 1] - thetaDeg[i]);
  return values[i] + t * (values[i + 1] - values[i]);
}

/**
 * Resamples a far field onto 0°, step, …, 180° and scales it so its flux is `lumens`:
 *   Φ = 2π ∫ I(θ) sin θ dθ (see {@link symmetricFlux}),  candela = relative · lumens / Φ_relative.
 * Beyond the first or last sampled angle the end value is held (bin centres of a histogram start half a
 * bin from 0° and stop half a bin before 180°).
 * @param farField relative intensity against polar angle (see {@link FarFieldSamples})
 * @param lumens total flux to carry, lm, in [1e-6, 1e7]
 * @param stepDeg grid step, degrees, one of 0.5, 1, 2, 2.5, 5, 10 (default 1)
 * @throws RangeError naming the field for bad input, or when the far field carries no light at all
 */
export function candelaDistribution(farField: FarFieldSamples, lumens: number, stepDeg = 1): CandelaDistribution {
  if (!farField || typeof farField !== 'object') throw new RangeError('farField must be an object with thetaDeg and relativeIntensity');
  checkDistribution(farField.thetaDeg, farField.relativeIntensity);
  if (typeof lumens !== 'number' || !(lumens >= LUMENS_LIMIT.min && lumens <= LUMENS_LIMIT.max)) {
    throw new RangeError(`lumens must be a number in [1e-6, 1e7] lm (got ${String(lumens)})`);
  }
  if (!STEP_CHOICES_DEG.includes(stepDeg)) {
    throw new RangeError(`stepDeg must be one of ${STEP_CHOICES_DEG.join(', ')} degrees (got ${String(stepDeg)})`);
  }

  // Resample onto the even grid
  const count = Math.round(180 / stepDeg) + 1;
  const thetaDeg: number[] = new Array(count);
  const relativeIntensity: number[] = new Array(count);
  let from = 0;
  for (let j = 0; j < count; j++) {
    const theta = j === count - 1 ? 180 : j * stepDeg;
    while (from < farField.thetaDeg.length - 2 && farField.thetaDeg[from + 1] < theta) from++;
    thetaDeg[j] = theta;
    relativeIntensity[j] = interpolate(farField.thetaDeg, farField.relativeIntensity, theta, from);
  }

  // Scale to the asked flux: candela = relative · Φ / Φ_relative
  const relativeFlux = symmetricFlux(thetaDeg, relativeIntensity);
  if (!(relativeFlux > 0)) {
    throw new RangeError('farField carries no light: every relative intensity is 0, so it cannot be scaled to lumens');
  }
  const candelaPerUnit = lumens / relativeFlux;
  const candela = relativeIntensity.map((v) => v * candelaPerUnit);
  return { thetaDeg, candela, relativeIntensity, candelaPerUnit, lumens };
}
