/**
 * CIE 1931 tristimulus values of sampled spectral power, optionally seen through a reflectance.
 * X = Σ S(λ)·ρ(λ)·x̄(λ)·Δλ, and so on for Y, Z (CIE 015:2018 §7.1), x̄ ȳ z̄ interpolated linearly
 * between the 1 nm rows. Absolute scale: as the spectrum's (no factor k); normalise where needed.
 */
import { CMF_X, CMF_Y, CMF_Z, tableAt, type EvenTable } from './cie-tables';
import type { SpectralSamples } from './spectral-samples';

export interface Tristimulus {
  X: number;
  Y: number;
  Z: number;
}

/**
 * Tristimulus values of `samples`, through `reflectance` (a CIE table, e.g. a test colour sample) when given.
 * @param samples quadrature nodes from spectralSamples / gridSamples
 * @param reflectance spectral radiance factor, interpolated linearly (CIE 13.3 5 nm table)
 */
export function tristimulus(samples: SpectralSamples, reflectance?: EvenTable): Tristimulus {
  let X = 0;
  let Y = 0;
  let Z = 0;
  const w = samples.wavelengthNm;
  for (let i = 0; i < w.length; i++) {
    const sw = samples.weightedPower[i] * (reflectance ? tableAt(reflectance, w[i]) : 1);
    X += sw * tableAt(CMF_X, w[i]);
    Y += sw * tableAt(CMF_Y, w[i]);
    Z += sw * tableAt(CMF_Z, w[i]);
  }
  return { X, Y, Z };
}
