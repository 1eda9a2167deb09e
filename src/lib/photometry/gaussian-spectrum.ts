import { checkSpectrumWavelength, SPECTRUM_LIMITS, type Spectrum } from './spectrum';

/** Samples across a Gaussian band (odd, so the peak is a sample). */
export const GAUSSIAN_SAMPLES = 241;
/** Half-span of the sampled band in units of the FWHM (±3 FWHM = ±7.06 σ). */
export const GAUSSIAN_HALF_SPAN_FWHM = 3;

/**
 * A Gaussian emission band sampled on a uniform grid: S(λ) ∝ exp(−(λ − λp)²/(2σ²)),
 * σ = FWHM/(2√(2 ln 2)). 241 samples over λp ± 3·FWHM (step FWHM/40); the grid is cut at 100 nm
 * if the band would reach below it. Weights are S(λᵢ) normalised to sum 1 (uniform-grid quadrature;
 * the power beyond ±3 FWHM, about 3×10⁻¹², is dropped).
 * @param peakNm peak wavelength, nm, in [100, 20000]
 * @param fwhmNm full width at half maximum, nm, in [0.01, 1000]
 * @see common practice: LED bands are commonly modelled as Gaussian in wavelength
 */
export function gaussianSpectrum(peakNm: number, fwhmNm: number): Spectrum {
  checkSpectrumWavelength('peakNm', peakNm);
  const { min: fMin, max: fMax } = SPECTRUM_LIMITS.fwhmNm;
  if (typeof fwhmNm !== 'number' || !(fwhmNm >= fMin && fwhmNm <= fMax)) {
    throw new RangeError(`fwhmNm must be a number between ${fMin} and ${fMax} nm (got ${String(fwhmNm)})`);
  }
  const { min: wMin, max: wMax } = SPECTRUM_LIMITS.wavelengthNm;
  // σ from the full width at half maximum: FWHM = 2√(2 ln 2)·σ (property of the normal distribution)
  const sigma = fwhmNm / (2 * Math.sqrt(2 * Math.LN2));
  const lo = Math.max(wMin, peakNm - GAUSSIAN_HALF_SPAN_FWHM * fwhmNm);
  const hi = Math.min(wMax, peakNm + GAUSSIAN_HALF_SPAN_FWHM * fwhmNm);
  const n = GAUSSIAN_SAMPLES;
  const wavelengthNm = new Float64Array(n);
  const weight = new Float64Array(n);
  let sum = 0;
  for (let i = 0; i < n; i++) {
    const lambda = lo + ((hi - lo) * i) / (n - 1);
    const u = (lambda - peakNm) / sigma;
    wavelengthNm[i] = lambda;
    weight[i] = Math.exp(-0.5 * u * u);
    sum += weight[i];
  }
  for (let i = 0; i < n; i++) weight[i] /= sum;
  return { wavelengthNm, weight };
}
