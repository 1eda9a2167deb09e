import { describe, it, expect } from 'vitest';
import { propagationFactorInto } from '../../../src/lib/optics/propagation-factor';
import { assertInDelta, EPS } from '../../support/assert';

const out = new Float64Array(2);

describe('propagationFactorInto(out, i, n, k, betaRe, betaIm)', () => {
  it('is n cos θ, real and positive, for a propagating wave in a lossless medium (4 ε)', () => {
    const theta = 0.4;
    propagationFactorInto(out, 0, 1.5, 0, 1.5 * Math.sin(theta), 0);
    assertInDelta(out[0], 1.5 * Math.cos(theta), 4 * EPS);
    expect(out[1]).toBe(0);
  });
  it('is purely imaginary with Im > 0 beyond the critical angle (evanescent, decaying)', () => {
    propagationFactorInto(out, 0, 1, 0, 1.2, 0);
    expect(out[0]).toBe(0);
    assertInDelta(out[1], Math.sqrt(1.44 - 1), 4 * EPS);
  });
  it('has Im > 0 in an absorbing medium, metals included, and squares back to N² − β² (1e-14)', () => {
    for (const [n, k, b] of [[0.05, 3.6, 0.9], [2.5, 0.1, 2.4], [0.5, 4.8, 0], [3.5, 0.01, 3.49]]) {
      propagationFactorInto(out, 0, n, k, b, 0);
      expect(out[1]).toBeGreaterThan(0);
      const re = out[0] * out[0] - out[1] * out[1];
      const im = 2 * out[0] * out[1];
      assertInDelta(re, n * n - k * k - b * b, 1e-14 * (n * n + k * k));
      assertInDelta(im, 2 * n * k, 1e-14 * (n * n + k * k));
    }
  });
  it('writes at offset i and leaves other slots alone', () => {
    const buf = new Float64Array([9, 9, 9, 9]);
    propagationFactorInto(buf, 2, 2, 0, 0, 0);
    expect([...buf]).toEqual([9, 9, 2, 0]);
  });
});
