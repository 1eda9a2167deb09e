/**
 * Samples a material's dispersion over a wavelength range for plotting: n and k at evenly spaced
 * wavelengths, whether each lies inside the material's validity range, and NaN where the model
 * gives no index (a pole of the formula, or n² ≤ 0). Pure.
 */
import { indexAt } from '../materials/dispersion';
import type { Material } from '../materials/types';

export interface MaterialCurve {
  id: string;
  label: string;
  wavelengthNm: number[];
  n: number[];
  k: number[];
  inRange: boolean[];
}

/** Range accepted for plotting, nm (the library's own wavelength limits are wider). */
export const CURVE_LIMITS = { minNm: 100, maxNm: 20000, minSteps: 2, maxSteps: 2000 } as const;

/**
 * n(λ), k(λ) of `material` at `steps` wavelengths evenly spaced from `fromNm` to `toNm` inclusive.
 * A wavelength where the library refuses a value (RangeError: pole or unphysical) gives NaN for n and k.
 * @param fromNm start, nm, in [100, 20000]; @param toNm end, nm, > fromNm and ≤ 20000
 * @param steps number of samples, whole number in [2, 2000]
 * @throws RangeError naming the field and its range when the range or step count is not allowed
 */
export function sampleMaterial(material: Material, fromNm: number, toNm: number, steps = 200, label = material.name): MaterialCurve {
  const L = CURVE_LIMITS;
  if (!(fromNm >= L.minNm && fromNm <= L.maxNm)) throw new RangeError(`From wavelength must be between ${L.minNm} and ${L.maxNm} nm.`);
  if (!(toNm > fromNm && toNm <= L.maxNm)) throw new RangeError(`To wavelength must be more than the from wavelength (${fromNm} nm) and at most ${L.maxNm} nm.`);
  if (!(Number.isInteger(steps) && steps >= L.minSteps && steps <= L.maxSteps)) {
    throw new RangeError(`Number of samples must be a whole number between ${L.minSteps} and ${L.maxSteps}.`);
  }
  const curve: MaterialCurve = { id: material.id, label, wavelengthNm: [], n: [], k: [], inRange: [] };
  for (let i = 0; i < steps; i++) {
    // Even spacing; the last sample is exactly toNm.
    const w = i === steps - 1 ? toNm : fromNm + ((toNm - fromNm) * i) / (steps - 1);
    curve.wavelengthNm.push(w);
    curve.inRange.push(w >= material.validRangeNm.min && w <= material.validRangeNm.max);
    try {
      const v = indexAt(material, w);
      curve.n.push(v.n);
      curve.k.push(v.k);
    } catch (e) {
      if (!(e instanceof RangeError)) throw e;
      curve.n.push(NaN);
      curve.k.push(NaN);
    }
  }
  return curve;
}
