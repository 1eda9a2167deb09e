/**
 * Parses a number typed by a user. Accepts an optional sign, digits with one decimal point (a decimal
 * comma is read as a point), and an exponent: "2.5", "-0,3", ".5", "1e-3". Rejects everything else —
 * including "", "abc", "0x10", "1..2", "Infinity" — with null, so no text ever turns into NaN or a
 * surprising number.
 */
export function parseNumber(text: string): number | null {
  const t = text.trim().replace(',', '.');
  if (!/^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i.test(t)) return null;
  const x = Number(t);
  return Number.isFinite(x) ? x : null;
}
