/**
 * The complex index of a material at one wavelength, with the validity range enforced out loud:
 * inside the range the value is returned as is; outside it is computed and carries a warning;
 * at or across a pole of the formula, or where the formula gives no real index, it throws.
 */
import { dispersionValue, type NkSlot } from './dispersion-value';
import { MATERIAL_LIMITS } from './limits';
import { polesNm } from './poles';
import type { IndexAt, Material } from './types';

const scratch: NkSlot = { n: 0, k: 0 };
/** Relative distance from a pole treated as on it (1e-6: 0.00087 nm at GaAs's 874.6 nm pole). */
const POLE_BAND = 1e-6;

/**
 * Complex refractive index N = n + ik of `material` at a vacuum wavelength.
 * - Inside `material.validRangeNm` (closed): `inRange: true`, no warning.
 * - Outside it: the model is extrapolated and `warning` says so — never silently.
 * - If a pole of the formula lies between the wavelength and the validity range (or within a relative
 *   1e-6 of the wavelength), or the
 *   formula gives n² ≤ 0, n ≤ 0, k < 0 or a non-finite value: RangeError naming the material and its range.
 * @param wavelengthNm vacuum wavelength, nm, in [100, 20000]
 * @returns n (> 0; metals may be < 1) and k (≥ 0)
 * @example indexAt(findMaterial('fused-silica')!, 587.6) // n ≈ 1.45846 (Malitson 1965)
 */
export function indexAt(material: Material, wavelengthNm: number): IndexAt {
  const { min: wMin, max: wMax } = MATERIAL_LIMITS.wavelengthNm;
  if (typeof wavelengthNm !== 'number' || !(wavelengthNm >= wMin && wavelengthNm <= wMax)) {
    throw new RangeError(`wavelengthNm must be a number between ${wMin} and ${wMax} nm (got ${String(wavelengthNm)})`);
  }
  const { min, max } = material.validRangeNm;
  const inRange = wavelengthNm >= min && wavelengthNm <= max;
  const rangeText = `${min}–${max} nm`;

  // Refuse to extrapolate across (or onto) a pole of the formula; "onto" allows for the rounding
  // of the pole position (relative POLE_BAND) so an exact pole wavelength is never evaluated
  if (!inRange) {
    const edge = wavelengthNm < min ? min : max;
    const lo = Math.min(edge, wavelengthNm);
    const hi = Math.max(edge, wavelengthNm);
    for (const pole of polesNm(material.dispersion)) {
      if (pole >= lo * (1 - POLE_BAND) && pole <= hi * (1 + POLE_BAND)) {
        throw new RangeError(
          `${material.name}: its dispersion formula has a pole at ${round(pole)} nm, between ${wavelengthNm} nm ` +
            `and its valid range ${rangeText}; no index can be given there`
        );
      }
    }
  }

  dispersionValue(material.dispersion, wavelengthNm, scratch);
  const n = scratch.n;
  const k = scratch.k;
  if (!(n > 0 && n < Infinity && k >= 0 && k < Infinity)) {
    throw new RangeError(
      `${material.name}: its ${material.dispersion.model} model gives no physical index at ${wavelengthNm} nm ` +
        `(n² ≤ 0, k < 0 or not finite); its valid range is ${rangeText}`
    );
  }
  if (inRange) return { n, k, inRange };
  const side = wavelengthNm < min ? 'below' : 'above';
  return {
    n,
    k,
    inRange,
    warning:
      `${material.name}: ${wavelengthNm} nm is ${side} its valid range ${rangeText}; ` +
      `the value is extrapolated and may be wrong`
  };
}

function round(x: number): number {
  return Math.round(x * 10) / 10;
}
