/**
 * Numbers as exported files write them: the significant digits the quantity carries, never the float
 * noise of the last binary digit (0.1 + 0.2 is written 0.3, 38.63700000000001 is written 38.637).
 */

/** Significant digits of a CSV cell: enough for an index to 1e-5 and a traced fraction to its σ. */
export const CSV_SIGNIFICANT_DIGITS = 6;
/** Significant digits kept in JSON exports: well below double precision, well above any result's accuracy. */
export const JSON_SIGNIFICANT_DIGITS = 12;

/**
 * A finite number as CSV text with `significantDigits` significant digits, trailing zeros dropped:
 * plain decimals for 1e-4 ≤ |x| < 1e15 (and 0), otherwise exponent form (2.1e-7). Whole numbers
 * below 1e15 (ray counts) are written exactly. NaN and ±Infinity give '' (an empty cell); −0 gives '0'.
 * @param significantDigits whole number in [1, 17] (default 6)
 * @example exportNumber(38.63700000000001) // '38.637'
 */
export function exportNumber(x: number, significantDigits = CSV_SIGNIFICANT_DIGITS): string {
  if (!Number.isInteger(significantDigits) || significantDigits < 1 || significantDigits > 17) {
    throw new RangeError(`significantDigits must be a whole number in [1, 17] (got ${String(significantDigits)})`);
  }
  if (typeof x !== 'number' || !Number.isFinite(x)) return '';
  if (x === 0) return '0';
  // Counts stay exact: a ray count is not rounded to six digits
  if (Number.isInteger(x) && Math.abs(x) < 1e15) return String(x);
  const rounded = Number(x.toPrecision(significantDigits));
  const magnitude = Math.abs(rounded);
  if (magnitude >= 1e-4 && magnitude < 1e15) {
    // Number → string gives the shortest round-trip text, without an exponent at these magnitudes
    return String(rounded);
  }
  return rounded.toExponential(significantDigits - 1).replace(/\.?0+e/, 'e').replace('e+', 'e');
}

/**
 * The number rounded to `significantDigits` (as a number, for JSON): removes the float noise of
 * arithmetic (38.63700000000001 → 38.637) without losing any digit a result can claim. Non-finite
 * values pass through unchanged (the caller decides how JSON holds them).
 */
export function roundSignificant(x: number, significantDigits = JSON_SIGNIFICANT_DIGITS): number {
  if (!Number.isFinite(x) || x === 0) return x;
  return Number(x.toPrecision(significantDigits));
}

/**
 * A JSON.stringify replacer for exports: numbers to {@link JSON_SIGNIFICANT_DIGITS} significant digits,
 * NaN and ±Infinity (which JSON cannot hold) as null, integers unchanged.
 */
export function exportJsonReplacer(_key: string, value: unknown): unknown {
  if (typeof value !== 'number') return value;
  if (!Number.isFinite(value)) return null;
  return Number.isInteger(value) ? value : roundSignificant(value);
}
