/**
 * Shared numeric assertions for tests. Each tolerance is passed in by the caller, where it is justified.
 */
import { expect } from 'vitest';

/** Machine epsilon for doubles, 2^-52. Tolerances "in epsilons" multiply this. */
export const EPS = Number.EPSILON;

/**
 * Asserts |actual − expected| ≤ delta (absolute). Fails on NaN or a non-number.
 * @example assertInDelta(Math.PI, 3.14159, 1e-5)
 */
export function assertInDelta(actual: number, expected: number, delta: number, message?: string): void {
  const ok = typeof actual === 'number' && Math.abs(actual - expected) <= delta;
  if (!ok) {
    const where = message ? `${message}: ` : '';
    expect.fail(`${where}expected ${actual} to be within ${delta} of ${expected} (off by ${actual - expected})`);
  }
}

/** Tolerances for {@link expectClose}: passes if within abs OR within rel·|expected|. */
export interface CloseTolerance {
  abs?: number;
  rel?: number;
}

/**
 * Asserts actual is close to expected: |actual − expected| ≤ max(abs, rel·|expected|).
 * Give at least one of abs, rel. Fails on NaN.
 */
export function expectClose(actual: number, expected: number, tol: CloseTolerance, message?: string): void {
  if (tol.abs === undefined && tol.rel === undefined) {
    throw new Error('expectClose needs an abs or a rel tolerance');
  }
  const bound = Math.max(tol.abs ?? 0, (tol.rel ?? 0) * Math.abs(expected));
  assertInDelta(actual, expected, bound, message);
}

/** Asserts every element of two equal-length arrays is within delta. */
export function assertAllInDelta(
  actual: ArrayLike<number>,
  expected: ArrayLike<number>,
  delta: number,
  message?: string
): void {
  expect(actual.length, `${message ?? 'array'} length`).toBe(expected.length);
  for (let i = 0; i < expected.length; i++) {
    assertInDelta(actual[i], expected[i], delta, `${message ?? 'array'}[${i}]`);
  }
}
