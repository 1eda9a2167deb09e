/** Photometry: CIE photopic V(λ), Km, sampled emission spectra and spectral weighting. */
export { photopicV, PHOTOPIC_SOURCE } from './photopic';
export { KM_LM_PER_W } from './luminous-efficacy';
export { type Spectrum, SPECTRUM_LIMITS } from './spectrum';
export { gaussianSpectrum, GAUSSIAN_SAMPLES, GAUSSIAN_HALF_SPAN_FWHM } from './gaussian-spectrum';
export { tableSpectrum } from './table-spectrum';
export { monochromatic } from './monochromatic';
export { weightedAverage, type WeightedAverage, type WeightingMode } from './weighted-average';
