/**
 * A spectral power distribution for colorimetry: wavelengths (nm, strictly ascending) and spectral
 * power per nm (≥ 0, any scale), linear between samples and 0 outside the first and last sample.
 * `colorSpectrum` is the one validation path: the CLI's file reader and the pages call it.
 */
import { CMF_END_NM, CMF_START_NM } from './cie-tables';

export interface ColorSpectrum {
  readonly wavelengthNm: Float64Array;
  readonly power: Float64Array;
}

/** Allowed ranges for a colour spectrum at the public edge. */
export const COLOR_SPECTRUM_LIMITS = {
  rows: { min: 2, max: 100000 },
  wavelengthNm: { min: 100, max: 20000 }
} as const;

/**
 * Checks rows [wavelength nm, spectral power] and builds a ColorSpectrum.
 * @param rows 2–100 000 rows; wavelengths in [100, 20000] nm, strictly ascending; power finite ≥ 0,
 *   with some power between 360 and 830 nm (where the CIE 1931 observer sees)
 * @param rowName how errors name row i (0-based): "spectrum row i+1" by default; a file reader passes its line numbers
 * @throws RangeError naming the row (1-based) and the field
 */
export function colorSpectrum(
  rows: ReadonlyArray<readonly [number, number]>,
  rowName: (i: number) => string = (i) => `spectrum row ${i + 1}`
): ColorSpectrum {
  const { min: rMin, max: rMax } = COLOR_SPECTRUM_LIMITS.rows;
  if (!Array.isArray(rows) || rows.length < rMin || rows.length > rMax) {
    throw new RangeError(`spectrum must have ${rMin} to ${rMax} rows of wavelength_nm, value (got ${Array.isArray(rows) ? rows.length : 'none'})`);
  }
  const { min: wMin, max: wMax } = COLOR_SPECTRUM_LIMITS.wavelengthNm;
  const wavelengthNm = new Float64Array(rows.length);
  const power = new Float64Array(rows.length);
  let visible = 0;
  for (let i = 0; i < rows.length; i++) {
    const [w, p] = rows[i];
    if (typeof w !== 'number' || !(w >= wMin && w <= wMax)) {
      throw new RangeError(`${rowName(i)}: wavelength_nm must be a number from ${wMin} to ${wMax} nm (got ${String(w)})`);
    }
    if (i > 0 && !(w > wavelengthNm[i - 1])) {
      throw new RangeError(`${rowName(i)}: wavelength_nm must be above the previous row's ${wavelengthNm[i - 1]} nm (rows sorted, no repeats)`);
    }
    if (typeof p !== 'number' || !(p >= 0 && p < Infinity)) {
      throw new RangeError(`${rowName(i)}: value must be a finite number ≥ 0 (got ${String(p)})`);
    }
    wavelengthNm[i] = w;
    power[i] = p;
    // power on a stretch of positive length inside (360, 830) nm, where the observer sees
    if (i > 0 && Math.min(w, CMF_END_NM) > Math.max(wavelengthNm[i - 1], CMF_START_NM)) visible += power[i - 1] + p;
  }
  if (!(visible > 0)) throw new RangeError(`spectrum has no power between ${CMF_START_NM} and ${CMF_END_NM} nm, so it has no colour`);
  return { wavelengthNm, power };
}

/**
 * Spectral power at a wavelength: linear between samples, 0 outside the sampled range.
 * @param spectrum a checked spectrum; @param wavelengthNm nm
 */
export function powerAt(spectrum: ColorSpectrum, wavelengthNm: number): number {
  const w = spectrum.wavelengthNm;
  const n = w.length;
  if (!(wavelengthNm >= w[0] && wavelengthNm <= w[n - 1])) return 0;
  // Binary search for the segment w[lo] ≤ λ ≤ w[lo + 1]
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (w[mid] <= wavelengthNm) lo = mid;
    else hi = mid;
  }
  const p = spectrum.power;
  const f = (wavelengthNm - w[lo]) / (w[hi] - w[lo]);
  return p[lo] + f * (p[hi] - p[lo]);
}
