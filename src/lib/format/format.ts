/**
 * Number formatting for the user's edge. Pure. Never prints "NaN" or "Infinity": a value that cannot
 * be shown prints as "—" followed by the reason in parentheses.
 */

/** Text shown in place of a number that does not exist, with the reason. */
export function missing(reason: string): string {
  return `— (${reason})`;
}

const SUPERSCRIPT: Record<string, string> = {
  '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹'
};

/**
 * A number to `digits` significant digits (1–15), no grouping: 0.041742 → "0.04174", 23.578 → "23.58",
 * 1234.5 → "1235". Magnitudes ≥ 1e6 or < 1e-3 use powers of ten: 2.5e-7 → "2.500 × 10⁻⁷".
 * −0 prints "0". Non-finite values print "—" with `reason`.
 */
export function fmtNumber(x: number, digits = 4, reason = 'not defined'): string {
  if (typeof x !== 'number' || !Number.isFinite(x)) return missing(reason);
  const d = Math.min(15, Math.max(1, Math.round(digits)));
  if (x === 0) return '0';
  const abs = Math.abs(x);
  if (abs >= 1e6 || abs < 1e-3) {
    const [mant, exp] = x.toExponential(d - 1).split('e');
    const e = String(Number(exp)).replace(/./g, (c) => SUPERSCRIPT[c] ?? c);
    return `${mant} × 10${e}`;
  }
  const decimals = Math.max(0, d - 1 - Math.floor(Math.log10(abs)));
  // Rounding can carry into a new digit (9.9996 → "10.000"); re-round from the rounded value.
  const rounded = Number(x.toFixed(Math.min(decimals, 20)));
  const decimals2 = rounded === 0 ? decimals : Math.max(0, d - 1 - Math.floor(Math.log10(Math.abs(rounded))));
  const text = rounded.toFixed(Math.min(decimals2, 20));
  return text === '-0' || /^-0\.0*$/.test(text) ? text.slice(1) : text;
}

/** Percentages below this magnitude print as "< 0.001 %": nothing on a page is known that finely. */
export const SMALLEST_PERCENT = 0.001;

/**
 * A fraction as a percentage with `digits` significant digits: 0.04174 → "4.174 %". A share smaller
 * than 0.001 % in magnitude prints "< 0.001 %" ("> −0.001 %" below zero) rather than a power of ten,
 * and a share of 10⁶ % or more keeps the power of ten of {@link fmtNumber}.
 */
export function fmtPercent(fraction: number, digits = 4, reason = 'not defined'): string {
  if (typeof fraction !== 'number' || !Number.isFinite(fraction)) return missing(reason);
  const pct = fraction * 100;
  if (pct !== 0 && Math.abs(pct) < SMALLEST_PERCENT) return pct > 0 ? `< ${SMALLEST_PERCENT} %` : `> −${SMALLEST_PERCENT} %`;
  // Rounding to `digits` may still land below the floor (0.0010004 → "0.001000"): that is fine, it is ≥ it.
  return `${fmtNumber(pct, digits)} %`;
}

/**
 * A fraction as a percentage without trailing zeros, at most `digits` significant digits, for sentences
 * that echo a stated value beside computed ones: 0.85 → "85 %", 0.3864 → "38.6 %". The same floor as
 * {@link fmtPercent}: 1.6e-9 → "< 0.001 %", never a power of ten below it.
 */
export function fmtPercentPlain(fraction: number, digits = 3, reason = 'not defined'): string {
  if (typeof fraction !== 'number' || !Number.isFinite(fraction)) return missing(reason);
  const pct = fraction * 100;
  if (pct !== 0 && Math.abs(pct) < SMALLEST_PERCENT) return fmtPercent(fraction, digits);
  return `${fmtPlain(pct, digits)} %`;
}

/**
 * A difference of two fractions in percentage points, `digits` significant digits, the same floor as
 * {@link fmtPercent}: 0.311 → "31.1 percentage points", 0.01 → "1.00 percentage point",
 * 1.6e-9 → "< 0.001 percentage points".
 */
export function fmtPoints(difference: number, digits = 3, reason = 'not defined'): string {
  if (typeof difference !== 'number' || !Number.isFinite(difference)) return missing(reason);
  const text = fmtPercent(difference, digits).replace(/ %$/, '');
  return `${text} percentage ${/^1(\.0*)?$/.test(text) ? 'point' : 'points'}`;
}

/** An angle given in radians, printed in degrees: 0.41152 → "23.58°". */
export function fmtDeg(angleRad: number, digits = 4, reason = 'not defined'): string {
  if (typeof angleRad !== 'number' || !Number.isFinite(angleRad)) return missing(reason);
  return `${fmtNumber((angleRad * 180) / Math.PI, digits)}°`;
}

/** A number with its unit after a space: (2.5, 'mm') → "2.5 mm". */
export function fmtUnit(x: number, unit: string, digits = 4, reason = 'not defined'): string {
  if (typeof x !== 'number' || !Number.isFinite(x)) return missing(reason);
  return unit ? `${fmtNumber(x, digits)} ${unit}` : fmtNumber(x, digits);
}

/** A complex index n + ik: (2.4869, 0) → "2.487", (0.0438, 3.61) → "0.0438 + 3.610i". */
export function fmtIndex(n: number, k: number, digits = 4): string {
  if (!Number.isFinite(n) || !Number.isFinite(k)) return missing('index not available');
  return k === 0 ? fmtNumber(n, digits) : `${fmtNumber(n, digits)} + ${fmtNumber(k, digits)}i`;
}

/**
 * A number without trailing zeros, at most `digits` significant digits: 2.5 → "2.5", 0.15 → "0.15",
 * 1/3 → "0.333333". For echoing inputs back (values the user typed), not for computed results.
 */
export function fmtPlain(x: number, digits = 6, reason = 'not defined'): string {
  if (typeof x !== 'number' || !Number.isFinite(x)) return missing(reason);
  if (x === 0) return '0';
  const abs = Math.abs(x);
  if (abs >= 1e6 || abs < 1e-3) return fmtNumber(x, digits).replace(/\.?0+ ×/, ' ×');
  return String(Number(x.toPrecision(Math.min(15, Math.max(1, Math.round(digits))))));
}

/**
 * A material's display name without a trailing nominal index such as "(n ≈ 1.41)", for places that
 * print the actual index at the wavelength beside it: "Methyl silicone (n ≈ 1.41)" → "Methyl silicone".
 */
export function plainName(name: string): string {
  return name.replace(/\s*\(n\s*[≈=~][^)]*\)\s*$/u, '');
}
