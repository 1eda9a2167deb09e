import { describe, it, expect } from 'vitest';
import { criticalAngle } from '../../../src/lib/optics/critical-angle';
import { assertInDelta, EPS } from '../../support/assert';

describe('criticalAngle(nIn, nOut)', () => {
  it('satisfies sin θc = nOut / nIn (2 ε)', () => {
    assertInDelta(Math.sin(criticalAngle(2.5, 1.4) as number), 1.4 / 2.5, 2 * EPS);
  });
  it('is exactly π/6 for 2 → 1 (asin(1/2))', () => {
    assertInDelta(criticalAngle(2, 1) as number, Math.PI / 6, EPS);
  });
  it('returns null when nOut ≥ nIn (no total internal reflection), equal indices included', () => {
    expect(criticalAngle(1, 1.5)).toBeNull();
    expect(criticalAngle(1.5, 1.5)).toBeNull();
  });
  it('shrinks as the chip index grows', () => {
    expect(criticalAngle(3.5, 1) as number).toBeLessThan(criticalAngle(2.5, 1) as number);
  });
  it('rejects NaN, zero and negative indices with a RangeError naming the field', () => {
    expect(() => criticalAngle(NaN, 1)).toThrow(/nIn/);
    expect(() => criticalAngle(2, 0)).toThrow(/nOut.*> 0/);
    expect(() => criticalAngle(-2, 1)).toThrow(RangeError);
  });
});
