/**
 * A sampled emission spectrum: wavelengths (nm, ascending) and the fraction of radiant power each
 * sample stands for (weights ≥ 0 summing to 1). Built by `gaussianSpectrum`, `tableSpectrum` or
 * `monochromatic`; consumed by `weightedAverage`.
 */
export interface Spectrum {
  readonly wavelengthNm: Float64Array;
  readonly weight: Float64Array;
}

/** Allowed ranges for spectra at the public edge. */
export const SPECTRUM_LIMITS = {
  /** Any spectral sample, nm. */
  wavelengthNm: { min: 100, max: 20000 },
  /** Full width at half maximum of a Gaussian band, nm. */
  fwhmNm: { min: 0.01, max: 1000 },
  /** Rows of a tabulated spectrum. */
  rows: { min: 1, max: 5000 }
} as const;

/** Throws a RangeError naming `field` unless `value` is a wavelength in the spectrum range. */
export function checkSpectrumWavelength(field: string, value: unknown): number {
  const { min, max } = SPECTRUM_LIMITS.wavelengthNm;
  if (typeof value !== 'number' || !(value >= min && value <= max)) {
    throw new RangeError(`${field} must be a number between ${min} and ${max} nm (got ${String(value)})`);
  }
  return value;
}
