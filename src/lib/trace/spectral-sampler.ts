/**
 * Wavelength sampling tables for spectral rays, built once per run: a spectrum given as rows
 * [wavelength nm, power per nm] (linear between rows, zero outside) becomes its quantile table, so a
 * ray draws its wavelength from one uniform number with no search and no allocation.
 * Inverse-transform sampling: λ = F⁻¹(u), F the cumulative power (common practice; M. Pharr, W. Jakob,
 * G. Humphreys, Physically Based Rendering, 3rd ed., §13.3.1). The quantile function is tabulated at
 * QUANTILES equally spaced probabilities and interpolated linearly between them.
 */

/** Probabilities tabulated per spectrum (error of the linear quantile interpolation ≪ a bin of 2 nm). */
export const QUANTILES = 1025;

/**
 * Quantile table of a spectrum: QUANTILES wavelengths, entry k at cumulative probability k/(QUANTILES − 1).
 * A single row is a line: every entry is its wavelength.
 * @param rows [nm, power ≥ 0] sorted by wavelength, total power > 0 (checked by the caller's schema)
 */
export function quantileTable(rows: readonly (readonly [number, number])[]): Float64Array {
  const q = new Float64Array(QUANTILES);
  if (rows.length === 1) return q.fill(rows[0][0]);
  // Cumulative power at each row: trapezoids of the linear segments
  const cum = [0];
  for (let i = 1; i < rows.length; i++) cum.push(cum[i - 1] + 0.5 * (rows[i][1] + rows[i - 1][1]) * (rows[i][0] - rows[i - 1][0]));
  const total = cum[cum.length - 1];
  if (!(total > 0)) throw new RangeError('spectrum: the total power must be above 0');
  let seg = 1;
  for (let k = 0; k < QUANTILES; k++) {
    const target = (k / (QUANTILES - 1)) * total;
    while (seg < rows.length - 1 && cum[seg] < target) seg++;
    const [x0, p0] = rows[seg - 1];
    const [x1, p1] = rows[seg];
    const h = x1 - x0;
    const need = target - cum[seg - 1];
    // Invert the trapezoid area A(s) = p0·s + (p1 − p0)s²/(2h) for s in [0, h]
    const slope = (p1 - p0) / h;
    let s: number;
    if (Math.abs(slope) < 1e-300) s = p0 > 0 ? need / p0 : 0;
    else s = (-p0 + Math.sqrt(Math.max(0, p0 * p0 + 2 * slope * need))) / slope;
    q[k] = x0 + Math.min(h, Math.max(0, s));
  }
  return q;
}

/**
 * The wavelength for uniform number u ∈ [0, 1) from the quantile table starting at `offset` in `table`.
 */
export function sampleQuantile(table: Float64Array, offset: number, u: number): number {
  const f = u * (QUANTILES - 1);
  const i = f | 0;
  const a = table[offset + i];
  return a + (f - i) * (table[offset + (i < QUANTILES - 1 ? i + 1 : i)] - a);
}
