import { describe, it, expect } from 'vitest';
import { transmissionCurve } from '../../../src/lib/optics/transmission-curve';
import { normalReflectance } from '../../../src/lib/optics/fresnel';
import { assertInDelta, EPS } from '../../support/assert';

describe('transmissionCurve(nIn, nOut, points)', () => {
  it('samples 0° to 90° inclusive in equal steps, degrees at the edge', () => {
    const c = transmissionCurve(1.5, 1, 91);
    expect(c.angleDeg.length).toBe(91);
    expect(c.angleDeg[0]).toBe(0);
    expect(c.angleDeg[90]).toBe(90);
    expect(c.angleDeg[45]).toBe(45);
  });
  it('starts at T = 1 − R_normal (4 ε) and is 0 beyond the critical angle', () => {
    const c = transmissionCurve(2.5, 1, 181);
    assertInDelta(c.T[0], 1 - normalReflectance(2.5, 0, 1, 0), 4 * EPS);
    for (let i = 0; i < c.angleDeg.length; i++) {
      if (c.angleDeg[i] > 23.6) {
        expect(c.T[i]).toBe(0);
        expect(c.R[i]).toBe(1);
      }
    }
  });
  it('keeps R + T = 1 per polarisation and every value finite in [0, 1]', () => {
    const c = transmissionCurve(1, 2.45, 37);
    for (let i = 0; i < 37; i++) {
      for (const v of [c.Ts[i], c.Tp[i], c.T[i], c.Rs[i], c.Rp[i], c.R[i]]) {
        expect(Number.isFinite(v)).toBe(true);
        expect(v).toBeGreaterThanOrEqual(0);
        expect(v).toBeLessThanOrEqual(1);
      }
      assertInDelta(c.Rs[i] + c.Ts[i], 1, EPS);
      assertInDelta(c.Rp[i] + c.Tp[i], 1, EPS);
    }
    expect(c.T[36]).toBe(0); // grazing from the rare side
  });
  it('rejects fewer than two points and NaN indices', () => {
    expect(() => transmissionCurve(1.5, 1, 1)).toThrow(/points/);
    expect(() => transmissionCurve(1.5, NaN)).toThrow(/nOut/);
  });
});
