/**
 * Shared pieces of the property and fuzz tier: one fixed seed, the case counts, and a helper that runs
 * a fast-check property with both and prints one summary line per property, so a run shows how many
 * generated cases each check tried.
 *
 * A failure prints fast-check's counterexample and its seed and path; paste the counterexample into a
 * plain `it(...)` next to the property as a regression test once it is fixed.
 */
import fc from 'fast-check';

/** The seed of every property in this tier (any change gives other, equally valid, cases). */
export const SEED = 20_261_201;

/** Run counts. Sized so the whole tier stays well under a minute on a 2-core machine. */
export const RUNS = {
  /** Cheap closed-form checks (one Fresnel call, one stack). */
  many: 3000,
  /** Checks that integrate over angle or trace a few thousand rays. */
  some: 1000,
  /** Fuzzing an entry point with generated hostile input (several properties per entry point). */
  fuzz: 2000
} as const;

/** fast-check never stops on a fractional run count (it counts up to exactly numRuns): refuse one. */
function requireRuns(numRuns: number): void {
  if (!Number.isInteger(numRuns) || numRuns < 1) throw new RangeError(`numRuns must be a whole number ≥ 1 (got ${numRuns})`);
}

/** Runs `property` with the tier's seed and `numRuns` cases and prints "property <name>: N cases". */
export function check<Ts>(name: string, property: fc.IProperty<Ts>, numRuns: number): void {
  requireRuns(numRuns);
  fc.assert(property, { seed: SEED, numRuns });
  console.log(`property ${name}: ${numRuns} cases, seed ${SEED}`);
}

/** Async version of {@link check}. */
export async function checkAsync<Ts>(name: string, property: fc.IAsyncProperty<Ts>, numRuns: number): Promise<void> {
  requireRuns(numRuns);
  await fc.assert(property, { seed: SEED, numRuns });
  console.log(`property ${name}: ${numRuns} cases, seed ${SEED}`);
}

/** A double in [min, max], never NaN or infinite. */
export function real(min: number, max: number): fc.Arbitrary<number> {
  return fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
}

/** Numbers no number field should accept: NaN, ±Infinity, negative, zero, huge, tiny, -0. */
export const hostileNumber: fc.Arbitrary<number> = fc.oneof(
  fc.constantFrom(NaN, Infinity, -Infinity, -0, 0, -1, 1e308, -1e308, 5e-324, Number.MAX_SAFE_INTEGER + 2, 2 ** 53),
  fc.double()
);

/** Any JSON-like value, including deep nesting, odd keys and prototype-pollution keys. */
export const hostileValue: fc.Arbitrary<unknown> = fc.letrec((tie) => ({
  value: fc.oneof(
    { depthSize: 'small', withCrossShrink: true },
    hostileNumber,
    fc.string({ maxLength: 30 }),
    fc.constantFrom(null, undefined, true, false, '', ' ', 'NaN', 'Infinity', '__proto__', 'constructor', '1e999', '-0'),
    fc.array(tie('value'), { maxLength: 4 }),
    fc.dictionary(fc.oneof(fc.string({ maxLength: 8 }), fc.constantFrom('__proto__', 'constructor', 'prototype', 'toString')), tie('value'), {
      maxKeys: 4
    })
  )
})).value;

/** A value nested `depth` levels deep: [[[…[0]…]]] or {"a":{"a":…}}. */
export function deeplyNested(depth: number, kind: 'array' | 'object'): string {
  return kind === 'array' ? '['.repeat(depth) + '0' + ']'.repeat(depth) : '{"a":'.repeat(depth) + '0' + '}'.repeat(depth);
}

/** True when Object.prototype has gained a property (prototype pollution). */
export function prototypePolluted(): boolean {
  const probe: Record<string, unknown> = {};
  return 'polluted' in probe || 'isAdmin' in probe || Object.keys(Object.prototype).length > 0;
}
