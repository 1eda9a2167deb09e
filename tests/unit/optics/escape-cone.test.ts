import { describe, it, expect } from 'vitest';
import { escapeCone } from '../../../src/lib/optics/escape-cone';
import { normalReflectance } from '../../../src/lib/optics/fresnel';
import { assertInDelta, EPS } from '../../support/assert';

describe('escapeCone(nIn, nOut)', () => {
  it('lets half of all light through one face when the indices match (no interface; 1e-14)', () => {
    const e = escapeCone(1.7, 1.7);
    expect(e.criticalAngleRad).toBe(Math.PI / 2);
    assertInDelta(e.geometric, 0.5, EPS);
    assertInDelta(e.fresnel, 0.5, 1e-14);
    assertInDelta(e.fresnelS, 0.5, 1e-14);
    assertInDelta(e.fresnelP, 0.5, 1e-14);
    expect(e.normalReflectance).toBe(0);
  });

  it('has criticalAngleRad = asin(nOut/nIn) and geometric = (1 − cos θc)/2 (4 ε)', () => {
    const e = escapeCone(2.5, 1);
    assertInDelta(e.criticalAngleRad, Math.asin(0.4), EPS);
    assertInDelta(e.geometric, (1 - Math.cos(Math.asin(0.4))) / 2, 4 * EPS);
    expect(e.smallAngle).toBe(1 / (4 * 6.25));
  });

  it('orders the fractions: s < unpolarised < p < geometric, since Rs ≥ Rp > 0 inside the cone', () => {
    for (const [a, b] of [[3.5, 1], [2.5, 1.5], [1.5, 1], [1, 1.5]]) {
      const e = escapeCone(a, b);
      expect(e.fresnelS).toBeLessThan(e.fresnel);
      expect(e.fresnel).toBeLessThan(e.fresnelP);
      expect(e.fresnelP).toBeLessThan(e.geometric);
      assertInDelta(e.fresnel, 0.5 * (e.fresnelS + e.fresnelP), EPS);
    }
  });

  // Unpolarised R of a dielectric interface grows with angle (common practice), so T(θ) ≤ T(0) in the cone.
  it('is bounded by the normal-incidence loss: η_F ≤ (1 − R_normal) · geometric', () => {
    for (const [a, b] of [[3.5, 1], [2.5, 1], [1.5, 1]]) {
      const e = escapeCone(a, b);
      expect(e.fresnel).toBeLessThan((1 - normalReflectance(a, 0, b, 0)) * e.geometric);
    }
  });

  it('approaches the small-angle form for a high index contrast (ratio within 1e-4 at nIn/nOut = 100)', () => {
    const e = escapeCone(100, 1);
    // (1 − cos θc)/2 = s²/4 · (1 + s²/4 + …) with s = 0.01
    assertInDelta(e.geometric / e.smallAngle, 1, 1e-4);
  });

  it('grows with the outside index', () => {
    expect(escapeCone(2.5, 1.5).fresnel).toBeGreaterThan(escapeCone(2.5, 1.41).fresnel);
  });

  it('integrates the whole hemisphere into a denser medium: θc = π/2, geometric = 1/2, losses only from Fresnel', () => {
    const e = escapeCone(1, 1.5);
    expect(e.criticalAngleRad).toBe(Math.PI / 2);
    assertInDelta(e.geometric, 0.5, EPS);
    expect(e.fresnel).toBeLessThan(0.5 * (1 - 0.04));
    expect(e.fresnel).toBeGreaterThan(0.3);
  });

  it('rejects NaN and non-positive indices with a RangeError naming the field', () => {
    expect(() => escapeCone(NaN, 1)).toThrow(/nIn/);
    expect(() => escapeCone(2.5, 0)).toThrow(/nOut.*> 0/);
    expect(() => escapeCone(2.5, Infinity)).toThrow(RangeError);
  });
});
