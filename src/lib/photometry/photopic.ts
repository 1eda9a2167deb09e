/**
 * The CIE 1924 photopic luminous efficiency function V(λ), from the table in
 * data/cie-photopic-1924.json (CIE 015:2018; ISO 23539:2005 / CIE S 010), 360–830 nm in 5 nm steps.
 */
import table from '../../../data/cie-photopic-1924.json';

const START_NM = table.rows[0][0];
const STEP_NM = table.rows[1][0] - table.rows[0][0];
const END_NM = table.rows[table.rows.length - 1][0];
const V = Float64Array.from(table.rows, (row) => row[1]);

/** Source of the V(λ) table, for display beside luminous results. */
export const PHOTOPIC_SOURCE: string = table.source;

/**
 * Photopic luminous efficiency V(λ), dimensionless, peak 1 at 555 nm.
 * Linear interpolation in λ between the 5 nm CIE rows; exact table values at the rows;
 * 0 outside 360–830 nm (the CIE table ends there; V < 4×10⁻⁶ at both ends).
 * @param wavelengthNm vacuum wavelength, nm (any finite number)
 * @throws RangeError when wavelengthNm is not a finite number
 * @see CIE 015:2018 Colorimetry; ISO 23539:2005 / CIE S 010/E:2004 (CIE 1924 photopic V(λ))
 * @example photopicV(555) // 1
 */
export function photopicV(wavelengthNm: number): number {
  if (typeof wavelengthNm !== 'number' || !Number.isFinite(wavelengthNm)) {
    throw new RangeError(`wavelengthNm must be a finite number (got ${String(wavelengthNm)})`);
  }
  if (wavelengthNm < START_NM || wavelengthNm > END_NM) return 0;
  // Linear interpolation between tabulated rows
  const x = (wavelengthNm - START_NM) / STEP_NM;
  const i = Math.min(Math.floor(x), V.length - 2);
  const t = x - i;
  return t === 0 ? V[i] : V[i] + t * (V[i + 1] - V[i]);
}
