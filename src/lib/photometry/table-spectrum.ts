import { monochromatic } from './monochromatic';
import { checkSpectrumWavelength, SPECTRUM_LIMITS, type Spectrum } from './spectrum';

/**
 * A spectrum from tabulated rows [wavelength nm, relative spectral power]. Rows are sorted by
 * wavelength; each sample's weight is its power times the trapezoid-rule width
 * (λᵢ₊₁ − λᵢ₋₁)/2 (half-widths at the ends), normalised to sum 1, so uneven spacing is handled.
 * One row gives a monochromatic spectrum.
 * @param rows 1–5000 rows; wavelength in [100, 20000] nm, distinct; power finite ≥ 0, not all 0
 * @see trapezoid rule, e.g. W. H. Press et al., Numerical Recipes, 3rd ed., §4.1
 */
export function tableSpectrum(rows: ReadonlyArray<readonly [number, number]>): Spectrum {
  const { min: rMin, max: rMax } = SPECTRUM_LIMITS.rows;
  if (!Array.isArray(rows) || rows.length < rMin || rows.length > rMax) {
    throw new RangeError(`spectrum rows must be a list of ${rMin} to ${rMax} [wavelength_nm, power] rows`);
  }
  const sorted = rows.map((row, i) => {
    if (!Array.isArray(row) || row.length !== 2) {
      throw new RangeError(`spectrum rows[${i}] must be [wavelength_nm, power]`);
    }
    checkSpectrumWavelength(`spectrum rows[${i}] wavelength`, row[0]);
    if (typeof row[1] !== 'number' || !(row[1] >= 0 && row[1] < Infinity)) {
      throw new RangeError(`spectrum rows[${i}] power must be a finite number ≥ 0 (got ${String(row[1])})`);
    }
    return [row[0], row[1]] as const;
  });
  sorted.sort((a, b) => a[0] - b[0]);
  for (let i = 1; i < sorted.length; i++) {
    if (sorted[i][0] === sorted[i - 1][0]) {
      throw new RangeError(`spectrum rows must have distinct wavelengths (${sorted[i][0]} nm appears twice)`);
    }
  }
  if (sorted.length === 1) {
    if (!(sorted[0][1] > 0)) throw new RangeError('spectrum rows must carry some power (all powers are 0)');
    return monochromatic(sorted[0][0]);
  }

  // Trapezoid weights: half the distance to each neighbour
  const n = sorted.length;
  const wavelengthNm = new Float64Array(n);
  const weight = new Float64Array(n);
  let sum = 0;
  for (let i = 0; i < n; i++) {
    const left = i > 0 ? sorted[i][0] - sorted[i - 1][0] : 0;
    const right = i < n - 1 ? sorted[i + 1][0] - sorted[i][0] : 0;
    wavelengthNm[i] = sorted[i][0];
    weight[i] = (sorted[i][1] * (left + right)) / 2;
    sum += weight[i];
  }
  if (!(sum > 0)) throw new RangeError('spectrum rows must carry some power (all powers are 0)');
  for (let i = 0; i < n; i++) weight[i] /= sum;
  return { wavelengthNm, weight };
}
