/** A length or angle for a one-line error message: 3 significant digits, no trailing zeros (`fmt(66.5596)` → "66.6"). */
export function fmt(x: number): string {
  return String(Number(x.toPrecision(3)));
}
