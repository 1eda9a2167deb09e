/**
 * Checks the list of swept values at the public edge of a planner: 1 to 64 finite numbers, each in
 * [min, max], strictly increasing. Throws a RangeError naming the field and the allowed range.
 */
export function checkSweepValues(field: string, values: readonly number[], min: number, max: number): number[] {
  if (!Array.isArray(values) || values.length < 1 || values.length > 64) {
    throw new RangeError(`${field} must be a list of 1 to 64 values`);
  }
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (typeof v !== 'number' || !Number.isFinite(v) || !(v >= min && v <= max)) {
      throw new RangeError(`${field} must each be a number in [${min}, ${max}] (got ${String(v)})`);
    }
    if (i > 0 && !(v > values[i - 1])) {
      throw new RangeError(`${field} must increase from one value to the next`);
    }
  }
  return [...values];
}

/**
 * n + 1 evenly spaced values from `from` to `to` inclusive (the last one is exactly `to`).
 * @param n number of intervals, integer ≥ 1
 */
export function evenGrid(from: number, to: number, n: number): number[] {
  const out: number[] = [];
  for (let i = 0; i < n; i++) out.push(from + ((to - from) * i) / n);
  out.push(to);
  return out;
}
