import { checkSpectrumWavelength, type Spectrum } from './spectrum';

/**
 * A single-wavelength spectrum: one sample of weight 1, so any spectral average of f returns f(λ) exactly.
 * @param wavelengthNm vacuum wavelength, nm, in [100, 20000]
 */
export function monochromatic(wavelengthNm: number): Spectrum {
  checkSpectrumWavelength('wavelengthNm', wavelengthNm);
  return { wavelengthNm: Float64Array.of(wavelengthNm), weight: Float64Array.of(1) };
}
