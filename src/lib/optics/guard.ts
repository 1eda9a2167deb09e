/**
 * Checks at the public edge of the optics core. Each throws a RangeError naming the field and the
 * allowed range, so bad input never turns into NaN further in. Inner functions trust their inputs.
 */

function show(value: unknown): string {
  return typeof value === 'number' ? String(value) : typeof value;
}

/** Throws unless `value` is a finite number in [min, max]. Returns the value. */
export function requireInRange(field: string, value: number, min: number, max: number): number {
  if (typeof value !== 'number' || !(value >= min && value <= max)) {
    throw new RangeError(`${field} must be a number in [${min}, ${max}] (got ${show(value)})`);
  }
  return value;
}

/** Throws unless `value` is a finite number > 0 (a refractive index, a wavelength, a size). */
export function requirePositive(field: string, value: number): number {
  if (typeof value !== 'number' || !(value > 0 && value < Infinity)) {
    throw new RangeError(`${field} must be a finite number > 0 (got ${show(value)})`);
  }
  return value;
}

/** Throws unless `value` is a finite number ≥ 0 (an extinction coefficient, a thickness). */
export function requireNonNegative(field: string, value: number): number {
  if (typeof value !== 'number' || !(value >= 0 && value < Infinity)) {
    throw new RangeError(`${field} must be a finite number ≥ 0 (got ${show(value)})`);
  }
  return value;
}

/** Throws unless `value` is an integer in [min, max]. */
export function requireInteger(field: string, value: number, min: number, max: number): number {
  if (typeof value !== 'number' || !Number.isInteger(value) || value < min || value > max) {
    throw new RangeError(`${field} must be an integer in [${min}, ${max}] (got ${show(value)})`);
  }
  return value;
}
