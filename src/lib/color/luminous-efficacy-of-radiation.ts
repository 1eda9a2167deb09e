/**
 * Luminous efficacy of radiation: K = Km·∫S(λ)V(λ)dλ / ∫S(λ)dλ, Km = 683 lm/W, V = ȳ of the CIE 1931
 * observer (identical to the CIE 1924 photopic V(λ)). The denominator takes the whole spectrum, inside
 * and outside 360–830 nm: radiant power the eye does not see still counts as watts.
 * @see CIE 015:2018 §7.1 and CIE S 010/ISO 23539 (V(λ)); BIPM SI brochure, 9th ed. (Km = Kcd = 683 lm/W)
 */
import { KM_LM_PER_W } from '../photometry/luminous-efficacy';
import type { ColorSpectrum } from './color-spectrum';
import type { Tristimulus } from './tristimulus';

/** Radiant power of a spectrum by the trapezoid rule over all its samples, power·nm. */
export function radiantPower(spectrum: ColorSpectrum): number {
  const w = spectrum.wavelengthNm;
  const p = spectrum.power;
  let sum = 0;
  for (let i = 1; i < w.length; i++) sum += 0.5 * (p[i] + p[i - 1]) * (w[i] - w[i - 1]);
  return sum;
}

/**
 * Luminous efficacy of radiation, lm/W.
 * @param tristimulus the spectrum's tristimulus values on the same scale (Y = ∫Sȳ dλ)
 * @param spectrum the spectrum (for its radiant power)
 * @returns 0 when the spectrum carries no power
 */
export function luminousEfficacyOfRadiation(tristimulus: Tristimulus, spectrum: ColorSpectrum): number {
  const watts = radiantPower(spectrum);
  return watts > 0 ? (KM_LM_PER_W * tristimulus.Y) / watts : 0;
}
