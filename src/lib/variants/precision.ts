/**
 * Numbers at the precision they carry, for tables and CSV: a value with a standard error is given to
 * the decimal of the error's second significant digit, the error to two significant digits (JCGM
 * 100:2008, Guide to the Expression of Uncertainty in Measurement, §7.2.6: "at most two significant
 * digits"); a value without one to a stated number of significant digits. Pure; returns plain numbers
 * whose shortest decimal text is the rounded value (no 38.63700000000001). Significant-digit rounding
 * is the exports' own (export/number-text.ts), so a table cell and a file cell round alike.
 */
import { roundSignificant } from '../export/number-text';

/** `x` rounded to `decimals` places (may be negative: −1 rounds to tens). */
export function roundDecimals(x: number, decimals: number): number {
  if (!Number.isFinite(x)) return x;
  if (decimals >= 0) return Number(x.toFixed(Math.min(decimals, 20)));
  const f = 10 ** -decimals;
  return Math.round(x / f) * f;
}

/**
 * A value and its standard error at the error's precision: σ to two significant digits, the value to
 * the same decimal, and that decimal (for text that keeps trailing zeros: 0.10 not 0.1).
 * 38.6374 ± 0.0973 → 38.637 ± 0.097 (3 decimals); 46.1243 ± 0.0997 → 46.12 ± 0.10 (2 decimals).
 * A σ of 0 or non-finite leaves the value at `digits` significant digits and `decimals` null.
 */
export function roundWithSigma(value: number, sigma: number, digits = 4): { value: number; sigma: number; decimals: number | null } {
  if (!(sigma > 0) || !Number.isFinite(sigma) || !Number.isFinite(value)) return { value: roundSignificant(value, digits), sigma, decimals: null };
  const s = roundSignificant(sigma, 2);
  // decimal of the rounded σ's second significant digit (σ = 0.0997 rounds to 0.10: two decimals)
  const decimals = 1 - Math.floor(Math.log10(s));
  return { value: roundDecimals(value, decimals), sigma: roundDecimals(s, decimals), decimals };
}

/**
 * Decimal text of a rounded number: with `decimals` (≥ 0) that many places, trailing zeros kept;
 * otherwise the shortest form. Non-finite values give ''.
 */
export function decimalText(x: number, decimals: number | null = null): string {
  if (!Number.isFinite(x)) return '';
  return decimals !== null && decimals >= 0 ? x.toFixed(Math.min(decimals, 20)) : String(x);
}
