/**
 * Colorimetry of spectra (pure, synchronous). The API:
 * - `colorSpectrum(rows)` checks [wavelength nm, power] rows (RangeError naming the row) → ColorSpectrum;
 * - `parseSpectrumCsv(text)` reads a wavelength_nm,value file the same way (errors name the line);
 * - `colorOfSpectrum(spectrum)` → { X, Y, Z, x, y, uPrime, vPrime, cctK, duv, ra, r, lerLmPerW, warnings };
 * - parts: `spectralSamples`, `tristimulus`, `xyOf`, `uvOf`, `cctOhno`, `cctRobertson`, `colorRendering`,
 *   `daylightSpectrum`, `planckRadiance`, `planckianUv`, `luminousEfficacyOfRadiation`;
 * - chart datasets: `planckianLocus(options)` (locus + isotherm ticks), `spectralLocus(step)`.
 * Data: the CIE tables in data/cie (© CIE, CC BY-SA 4.0), read only by cie-tables.ts.
 */
export { colorSpectrum, powerAt, COLOR_SPECTRUM_LIMITS, type ColorSpectrum } from './color-spectrum';
export { parseSpectrumCsv } from './spectrum-csv';
export { colorOfSpectrum, CCT_DUV_LIMIT, type ColorSummary } from './color-of-spectrum';
export { spectralSamples, gridSamples, type SpectralSamples } from './spectral-samples';
export { tristimulus, type Tristimulus } from './tristimulus';
export { xyOf, uvOf, uvFromXy, xyFromUv, type Xy, type Uv } from './chromaticity';
export { cctOhno, type CctDuv } from './cct-ohno';
export { cctRobertson, ROBERTSON_MIRED } from './cct-robertson';
export { colorRendering, CRI_DC_LIMIT, CRI_CCT_RANGE_K, type ColorRendering } from './color-rendering';
export { daylightSpectrum, daylightXy, DAYLIGHT_RANGE_K } from './daylight';
export { planckRadiance, planckianUv, planckianUvOnly, C2_NM_K, CCT_RANGE_K, type PlanckianPoint } from './planck';
export { luminousEfficacyOfRadiation, radiantPower } from './luminous-efficacy-of-radiation';
export { planckianLocus, type PlanckianLocus, type Isotherm } from './planckian-locus';
export { spectralLocus } from './spectral-locus';
export { CIE_TABLES_SOURCE, TEST_COLOUR_SAMPLES } from './cie-tables';
export { parseCieCsv } from './cie-csv';
