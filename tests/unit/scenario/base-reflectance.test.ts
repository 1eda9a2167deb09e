import { describe, expect, it } from 'vitest';
import { baseReflectance } from '../../../src/lib/scenario/base-reflectance';
import { demoScenario } from '../../../src/lib/scenario/defaults';
import { resolveScenario } from '../../../src/lib/scenario/resolve';
import type { Scenario } from '../../../src/lib/scenario/schema';
import { assertInDelta } from '../../support/assert';

/** A scenario with a typed chip, encapsulant and outside, on a base of the given kind. */
function withBase(base: Scenario['base'], shape: Scenario['encapsulant']['shape'] = 'dome'): Scenario {
  const s = demoScenario();
  s.base = base;
  s.encapsulant.shape = shape;
  return s;
}

describe('baseReflectance(scenario, resolved)', () => {
  it('is null for a fixed-reflectance base', () => {
    const s = withBase({ kind: 'reflectance', reflectance: 0.9 });
    expect(baseReflectance(s, resolveScenario(s))).toBeNull();
  });

  it("gives ((n − n₀)² + k²)/((n + n₀)² + k²) of the base metal from the encapsulant and from the chip", () => {
    const s = withBase({ kind: 'metal', id: 'ag' });
    const r = resolveScenario(s);
    if (r.base.kind !== 'metal') throw new Error('metal base expected');
    const { n, k } = r.base;
    const R = (n0: number) => ((n - n0) ** 2 + k ** 2) / ((n + n0) ** 2 + k ** 2); // Born & Wolf §14.2
    const b = baseReflectance(s, r)!;
    assertInDelta(b.fromSurround, R(r.encapsulant.n), 1e-15);
    assertInDelta(b.fromChip, R(r.chip.n), 1e-15);
    expect(b.surround).toBe('encapsulant');
    // A denser medium in front of a metal reflects less (common practice): chip < encapsulant.
    expect(b.fromChip).toBeLessThan(b.fromSurround);
  });

  it('reproduces R = 0.9219 into air for aluminium n = 0.4892, k = 4.7783 at 450 nm (McPeak et al., ACS Photonics 2, 326 (2015); R computed)', () => {
    const s = withBase({ kind: 'metal', id: 'al' }, 'none');
    const r = resolveScenario(s);
    const forced = { ...r, base: { ...r.base, kind: 'metal' as const, n: 0.4892, k: 4.7783, label: 'Al', materialId: 'al', inRange: true, warning: null }, outside: { ...r.outside, n: 1 } };
    const b = baseReflectance(s, forced)!;
    expect(b.surround).toBe('outside medium');
    assertInDelta(b.fromSurround, 0.9219, 5e-5); // 4 printed digits
  });
});
