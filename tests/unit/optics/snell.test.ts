import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { refractAngle, refractDirection, reflectDirection } from '../../../src/lib/optics/snell';
import { assertInDelta, EPS } from '../../support/assert';

const dot = (a: ArrayLike<number>, b: ArrayLike<number>) => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];

/** Unit incident direction at angle θ to the normal (0, 0, 1), travelling toward −z, in the x–z plane. */
function incident(theta: number): number[] {
  return [Math.sin(theta), 0, -Math.cos(theta)];
}
const up = [0, 0, 1];

describe('refractAngle(thetaI, etaI, etaT)', () => {
  it('leaves normal incidence undeviated', () => {
    expect(refractAngle(0, 1, 1.5)).toBe(0);
  });
  it('obeys etaI sin θi = etaT sin θt (2 ε)', () => {
    const t = refractAngle(0.5, 1, 1.5) as number;
    assertInDelta(1.5 * Math.sin(t), Math.sin(0.5), 2 * EPS);
  });
  it('keeps the sign of the angle', () => {
    expect(refractAngle(-0.5, 1, 1.5)).toBe(-(refractAngle(0.5, 1, 1.5) as number));
  });
  it('returns null beyond the critical angle and about π/2 exactly at it', () => {
    expect(refractAngle(Math.PI / 4, 1.5, 1)).toBeNull();
    // sin 30° · 2 = 1 up to one ulp: the result is grazing, within √(2ε) of π/2 (asin near 1)
    const t = refractAngle(Math.PI / 6, 2, 1) as number;
    expect(t).not.toBeNull();
    assertInDelta(t, Math.PI / 2, 2 * Math.sqrt(2 * EPS));
  });
  it.each([
    ['thetaI NaN', NaN, 1, 1.5, /thetaI/],
    ['thetaI 2 rad', 2, 1, 1.5, /thetaI.*\[/],
    ['etaI −1', 0.1, -1, 1.5, /etaI/],
    ['etaT 0', 0.1, 1, 0, /etaT/]
  ])('rejects %s with a RangeError', (_l, t, a, b, msg) => {
    expect(() => refractAngle(t, a, b)).toThrow(RangeError);
    expect(() => refractAngle(t, a, b)).toThrow(msg);
  });
});

describe('refractDirection(out, d, n, etaI, etaT)', () => {
  it('agrees with refractAngle in the plane of incidence (4 ε)', () => {
    const out = [0, 0, 0];
    expect(refractDirection(out, incident(0.6), up, 1, 1.5)).toBe(true);
    const t = refractAngle(0.6, 1, 1.5) as number;
    assertInDelta(out[0], Math.sin(t), 4 * EPS);
    assertInDelta(out[1], 0, 0);
    assertInDelta(out[2], -Math.cos(t), 4 * EPS);
  });

  it('gives a unit vector, in the plane of d and n, obeying tangential Snell invariance (1e-14)', () => {
    const unit = fc
      .tuple(fc.double({ min: -1, max: 1, noNaN: true }), fc.double({ min: -1, max: 1, noNaN: true }), fc.double({ min: -1, max: -0.05, noNaN: true }))
      .map(([x, y, z]) => {
        const l = Math.hypot(x, y, z);
        return [x / l, y / l, z / l];
      });
    fc.assert(
      fc.property(unit, fc.double({ min: 1, max: 4, noNaN: true }), fc.double({ min: 1, max: 4, noNaN: true }), (d, a, b) => {
        const out = [0, 0, 0];
        if (!refractDirection(out, d, up, a, b)) return;
        assertInDelta(Math.hypot(out[0], out[1], out[2]), 1, 1e-14);
        // tangential components scale as etaI/etaT; same azimuth (coplanar)
        assertInDelta(b * out[0], a * d[0], 1e-14 * b);
        assertInDelta(b * out[1], a * d[1], 1e-14 * b);
        expect(out[2]).toBeLessThanOrEqual(0); // keeps going through the surface
      })
    );
  });

  it('returns false on total internal reflection and leaves out untouched', () => {
    const out = [7, 8, 9];
    expect(refractDirection(out, incident(Math.PI / 4), up, 1.5, 1)).toBe(false);
    expect(out).toEqual([7, 8, 9]);
  });

  it('refracts just inside the critical angle to a near-grazing unit direction, and not just beyond', () => {
    // Exactly critical is not representable reliably (sin² + cos² = 1 only to an ulp), so step 1e-9 either side.
    const out = [0, 0, 0];
    const inside = Math.asin(0.5 * (1 - 1e-9));
    const beyond = Math.asin(0.5 * (1 + 1e-9));
    expect(refractDirection(out, incident(inside), up, 2, 1)).toBe(true);
    assertInDelta(Math.hypot(out[0], out[1], out[2]), 1, 1e-12);
    expect(Math.abs(out[2])).toBeLessThan(1e-4); // cos θt = √(2e-9) ≈ 4.5e-5
    expect(refractDirection(out, incident(beyond), up, 2, 1)).toBe(false);
  });

  it('is safe when out is the same array as d', () => {
    const d = incident(0.7);
    const expected = [0, 0, 0];
    refractDirection(expected, d, up, 1.2, 1.7);
    refractDirection(d, d, up, 1.2, 1.7);
    expect(d).toEqual(expected);
  });

  it('is safe when out is the same array as n', () => {
    const n = [0, 0, 1];
    const expected = [0, 0, 0];
    refractDirection(expected, incident(0.7), [0, 0, 1], 1.2, 1.7);
    refractDirection(n, incident(0.7), n, 1.2, 1.7);
    expect(n).toEqual(expected);
  });

  it('works on Float64Array vectors', () => {
    const out = new Float64Array(3);
    expect(refractDirection(out, new Float64Array([0, 0, -1]), new Float64Array([0, 0, 1]), 1, 2)).toBe(true);
    expect([...out]).toEqual([0, 0, -1]);
  });
});

describe('reflectDirection(out, d, n)', () => {
  it('mirrors the normal component and keeps the tangential one', () => {
    const out = [0, 0, 0];
    reflectDirection(out, [0.6, 0, -0.8], up);
    assertInDelta(out[0], 0.6, EPS);
    assertInDelta(out[2], 0.8, EPS);
    expect(dot(out, up)).toBeCloseTo(-dot([0.6, 0, -0.8], up), 15);
  });
  it('gives the same result for either orientation of the normal', () => {
    const a = reflectDirection([0, 0, 0], [0.3, 0.4, -Math.sqrt(0.75)], [0, 0, 1]);
    const b = reflectDirection([0, 0, 0], [0.3, 0.4, -Math.sqrt(0.75)], [0, 0, -1]);
    expect(a).toEqual(b);
  });
  it('is its own inverse (2 ε)', () => {
    const d = [0.3, -0.4, -Math.sqrt(0.75)];
    const n = [Math.SQRT1_2, 0, Math.SQRT1_2];
    const r = reflectDirection([0, 0, 0], reflectDirection([0, 0, 0], d, n), n);
    for (let i = 0; i < 3; i++) assertInDelta(r[i], d[i], 2 * EPS);
  });
  it('is safe when out is d or n', () => {
    const d = [0.3, -0.4, -Math.sqrt(0.75)];
    const n = [Math.SQRT1_2, 0, Math.SQRT1_2];
    const expected = reflectDirection([0, 0, 0], d, n);
    const d2 = [...d];
    expect(reflectDirection(d2, d2, n)).toEqual(expected);
    const n2 = [...n];
    expect(reflectDirection(n2, d, n2)).toEqual(expected);
  });
});
