/**
 * Numbers at the precision they carry, for tables and CSV: a value with a standard error is given to
 * the decimal of the error's second significant digit, the error to two significant digits (JCGM
 * 100:2008, Guide to the Expression of Uncertainty in Measurement, §7.2.6: "at most two significant
 * digits"); a value without one to a stated number of significant digits. Pure; returns plain numbers
 * whose shortest decimal text is the rounded value (no 38.63700000000001).
 */

/** `x` rounded to `digits` significant digits (1–15); non-finite values pass through. */
export function roundSignificant(x: number, digits: number): number {
  if (!Number.isFinite(x) || x === 0) return x;
  return Number(x.toPrecision(Math.min(15, Math.max(1, Math.round(digits)))));
}

/** `x` rounded to `decimals` places (may be negative: −1 rounds to tens). */
export function roundDecimals(x: number, decimals: number): number {
  if (!Number.isFinite(x)) return x;
  if (decimals >= 0) return Number(x.toFixed(Math.min(decimals, 20)));
  const f = 10 ** -decimals;
  return Math.round(x / f) * f;
}

/**
 * A value and its standard error at the error's precision: σ to two significant digits, the value to
 * the same decimal. 0.386374 ± 0.000973 → 0.38637 ± 0.00097. A σ of 0 or non-finite leaves the value
 * at `digits` significant digits.
 */
export function roundWithSigma(value: number, sigma: number, digits = 4): { value: number; sigma: number } {
  if (!(sigma > 0) || !Number.isFinite(sigma) || !Number.isFinite(value)) return { value: roundSignificant(value, digits), sigma };
  // decimal of σ's second significant digit
  const decimals = 1 - Math.floor(Math.log10(sigma));
  const s = roundSignificant(sigma, 2);
  return { value: roundDecimals(value, decimals), sigma: roundDecimals(s, decimals) };
}

/** Decimal text of a rounded number (shortest form; powers of ten only beyond ±1e21 or below 1e-6). */
export function decimalText(x: number): string {
  return Number.isFinite(x) ? String(x) : '';
}
