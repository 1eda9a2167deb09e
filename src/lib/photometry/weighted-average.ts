import { KM_LM_PER_W } from './luminous-efficacy';
import { photopicV } from './photopic';
import type { Spectrum } from './spectrum';

export type WeightingMode = 'radiometric' | 'luminous';

export interface WeightedAverage {
  /** Spectrally weighted average of f. */
  value: number;
  mode: WeightingMode;
  /** Luminous efficacy of radiation of the spectrum, lm/W: Km·Σ wᵢV(λᵢ) / Σ wᵢ. */
  luminousEfficacyLmPerW: number;
}

/**
 * Spectrally weighted average of a per-wavelength quantity f (e.g. an extraction efficiency):
 * - radiometric: ⟨f⟩ = Σ wᵢ f(λᵢ) / Σ wᵢ (weights = radiant power);
 * - luminous:    ⟨f⟩ = Σ wᵢ V(λᵢ) f(λᵢ) / Σ wᵢ V(λᵢ) (weights = luminous flux).
 * Also returns the spectrum's luminous efficacy of radiation K = Km Σ wV / Σ w (lm/W, Km = 683).
 * Weights are normalised before the sum, so a one-sample spectrum returns exactly f(λ).
 * f is called once per sample, in ascending wavelength.
 * @throws RangeError if f returns a non-finite value, or for 'luminous' when V = 0 over the whole spectrum
 * @see CIE 015:2018; ISO 23539:2005 (photometric weighting with V(λ) and Km)
 */
export function weightedAverage(
  spectrum: Spectrum,
  f: (wavelengthNm: number) => number,
  mode: WeightingMode = 'radiometric'
): WeightedAverage {
  if (mode !== 'radiometric' && mode !== 'luminous') {
    throw new RangeError(`mode must be 'radiometric' or 'luminous' (got ${String(mode)})`);
  }
  const { wavelengthNm, weight } = spectrum;
  const n = wavelengthNm.length;
  if (n === 0 || weight.length !== n) {
    throw new RangeError('spectrum must have at least one sample and as many weights as wavelengths');
  }
  // Weight totals: radiant and luminous
  let sumW = 0;
  let sumWV = 0;
  const wv = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    wv[i] = weight[i] * photopicV(wavelengthNm[i]);
    sumW += weight[i];
    sumWV += wv[i];
  }
  if (!(sumW > 0)) throw new RangeError('spectrum weights must sum to a positive number');
  if (mode === 'luminous' && !(sumWV > 0)) {
    throw new RangeError(
      'luminous weighting needs light inside 360–830 nm (V(λ) is 0 over this whole spectrum); use radiometric'
    );
  }
  const total = mode === 'luminous' ? sumWV : sumW;
  let value = 0;
  for (let i = 0; i < n; i++) {
    const fi = f(wavelengthNm[i]);
    if (typeof fi !== 'number' || !Number.isFinite(fi)) {
      throw new RangeError(`the averaged quantity is not a finite number at ${wavelengthNm[i]} nm (got ${String(fi)})`);
    }
    // Normalised share first, so a single sample has share exactly 1 and returns f exactly
    const share = (mode === 'luminous' ? wv[i] : weight[i]) / total;
    value += share * fi;
  }
  return { value, mode, luminousEfficacyLmPerW: (KM_LM_PER_W * sumWV) / sumW };
}
