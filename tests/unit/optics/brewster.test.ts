import { describe, it, expect } from 'vitest';
import { brewsterAngle } from '../../../src/lib/optics/brewster';
import { criticalAngle } from '../../../src/lib/optics/critical-angle';
import { refractAngle } from '../../../src/lib/optics/snell';
import { fresnelReal } from '../../../src/lib/optics/fresnel';
import { assertInDelta, EPS } from '../../support/assert';

describe('brewsterAngle(etaI, etaT)', () => {
  it('makes Rp vanish (20 ε)', () => {
    const out = new Float64Array(3);
    for (const [a, b] of [[1, 1.5], [2.5, 1], [1.41, 2.45]]) {
      fresnelReal(Math.cos(brewsterAngle(a, b)), a, b, out);
      assertInDelta(out[1], 0, 20 * EPS);
    }
  });
  it('makes the reflected and refracted rays perpendicular: θB + θt = 90° (4 ε)', () => {
    const tB = brewsterAngle(1, 1.5);
    assertInDelta(tB + (refractAngle(tB, 1, 1.5) as number), Math.PI / 2, 4 * EPS);
  });
  it('from the denser side lies below the critical angle', () => {
    expect(brewsterAngle(2.5, 1)).toBeLessThan(criticalAngle(2.5, 1) as number);
  });
  it('is 45° for equal indices', () => {
    expect(brewsterAngle(1.7, 1.7)).toBe(Math.PI / 4);
  });
  it('rejects NaN with a RangeError', () => {
    expect(() => brewsterAngle(NaN, 1)).toThrow(/etaI/);
  });
});
