import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { thinFilm, thinFilmInto } from '../../../src/lib/optics/thin-film';
import { fresnelReal, normalReflectance } from '../../../src/lib/optics/fresnel';
import type { StackLayer } from '../../../src/lib/optics/layer';
import { assertInDelta, expectClose, EPS } from '../../support/assert';

const fr = new Float64Array(3);
const losslessLayer = fc.record({
  n: fc.double({ min: 1, max: 3.5, noNaN: true }),
  k: fc.constant(0),
  thicknessNm: fc.double({ min: 0, max: 2000, noNaN: true })
});
const lossyLayer = fc.record({
  n: fc.double({ min: 0.05, max: 3.5, noNaN: true }),
  k: fc.double({ min: 0, max: 5, noNaN: true }),
  thicknessNm: fc.double({ min: 0, max: 500, noNaN: true })
});
const medium = fc.double({ min: 1, max: 3, noNaN: true });
const wavelength = fc.double({ min: 300, max: 1000, noNaN: true });
const angle = fc.double({ min: 0, max: 1.55, noNaN: true });

describe('thinFilm(nIn, layers, nOut, wavelengthNm, thetaInRad)', () => {
  it('with no layers is the bare Fresnel interface (1e-14)', () => {
    for (const theta of [0, 0.3, 0.7, 1.2]) {
      const r = thinFilm(1, [], 1.5, 550, theta);
      fresnelReal(Math.cos(theta), 1, 1.5, fr);
      assertInDelta(r.Rs, fr[0], 1e-14);
      assertInDelta(r.Rp, fr[1], 1e-14);
      assertInDelta(r.Ts, 1 - fr[0], 1e-14);
      assertInDelta(r.Tp, 1 - fr[1], 1e-14);
    }
  });

  it('gives T = 0 beyond the exit critical angle and R = 1 for a lossless stack (1e-12)', () => {
    const layers = [{ n: 1.8, k: 0, thicknessNm: 120 }, { n: 1.3, k: 0, thicknessNm: 90 }];
    const r = thinFilm(2.5, layers, 1, 450, Math.asin(1 / 2.5) + 1e-3);
    expect(r.T).toBe(0);
    assertInDelta(r.R, 1, 1e-12);
  });

  it('ignores a zero-thickness layer, and a 1e-6 nm layer changes R by less than 1e-8', () => {
    const bare = thinFilm(2.45, [], 1, 450, 0.3);
    const zero = thinFilm(2.45, [{ n: 1.2, k: 0.3, thicknessNm: 0 }], 1, 450, 0.3);
    const tiny = thinFilm(2.45, [{ n: 1.2, k: 0.3, thicknessNm: 1e-6 }], 1, 450, 0.3);
    expect(zero).toEqual(bare);
    assertInDelta(tiny.R, bare.R, 1e-8);
    assertInDelta(tiny.T, bare.T, 1e-8);
  });

  it('makes a half-wave layer absent at its design wavelength, normal incidence (1e-14)', () => {
    const r = thinFilm(1, [{ n: 2.1, k: 0, thicknessNm: 500 / (2 * 2.1) }], 1.52, 500, 0);
    assertInDelta(r.R, normalReflectance(1, 0, 1.52, 0), 1e-14);
  });

  it('cancels reflection with a quarter-wave layer of index √(n0 ns) at normal incidence (1e-15)', () => {
    const n1 = Math.sqrt(1.52);
    const r = thinFilm(1, [{ n: n1, k: 0, thicknessNm: 550 / (4 * n1) }], 1.52, 550, 0);
    assertInDelta(r.R, 0, 1e-15);
  });

  it('treats a layer with the incident index as part of the incident medium (lossless; 1e-13)', () => {
    const bare = thinFilm(1.5, [], 1, 633, 0.5);
    const thick = thinFilm(1.5, [{ n: 1.5, k: 0, thicknessNm: 12345 }], 1, 633, 0.5);
    assertInDelta(thick.Rs, bare.Rs, 1e-13);
    assertInDelta(thick.Rp, bare.Rp, 1e-13);
  });

  it('conserves energy: A = 0 within 1e-12 for lossless stacks; 0 ≤ R, T, A and R + T + A = 1 for lossy ones', () => {
    fc.assert(
      fc.property(medium, fc.array(losslessLayer, { maxLength: 6 }), medium, wavelength, angle, (a, ls, b, w, t) => {
        const r = thinFilm(a, ls, b, w, t);
        assertInDelta(r.As, 0, 1e-12);
        assertInDelta(r.Ap, 0, 1e-12);
        assertInDelta(r.Rs + r.Ts, 1, 1e-12);
        assertInDelta(r.Rp + r.Tp, 1, 1e-12);
      })
    );
    fc.assert(
      fc.property(medium, fc.array(lossyLayer, { maxLength: 6 }), medium, wavelength, angle, (a, ls, b, w, t) => {
        const r = thinFilm(a, ls, b, w, t);
        for (const v of [r.Rs, r.Rp, r.Ts, r.Tp]) {
          expect(v).toBeGreaterThanOrEqual(0);
          expect(v).toBeLessThanOrEqual(1 + 1e-12);
        }
        expect(r.As).toBeGreaterThanOrEqual(-1e-12);
        expect(r.Ap).toBeGreaterThanOrEqual(-1e-12);
        assertInDelta(r.Rs + r.Ts + r.As, 1, 1e-12);
        assertInDelta(r.R + r.T + r.A, 1, 1e-12);
      })
    );
  });

  // Lorentz reciprocity: transmittance is the same both ways through any linear stack (lossy included),
  // at Snell-matched angles; reflectance need not be when layers absorb. Tolerance 1e-10 covers the
  // conditioning near grazing angles in the exit medium.
  it('is reciprocal in transmission: T(a → b at θ) = T(b → a at θ′), layers reversed (1e-10)', () => {
    fc.assert(
      fc.property(medium, fc.array(lossyLayer, { maxLength: 5 }), medium, wavelength, fc.double({ min: 0, max: 1.3, noNaN: true }), (a, ls, b, w, t) => {
        const sinB = (a * Math.sin(t)) / b;
        fc.pre(sinB < 0.99);
        const fwd = thinFilm(a, ls, b, w, t);
        const back = thinFilm(b, [...ls].reverse(), a, w, Math.asin(sinB));
        assertInDelta(back.Ts, fwd.Ts, 1e-10);
        assertInDelta(back.Tp, fwd.Tp, 1e-10);
      })
    );
  });

  it('never widens the escape cone: T = 0 for every angle beyond asin(nOut/nIn), any stack', () => {
    fc.assert(
      fc.property(fc.array(lossyLayer, { maxLength: 5 }), wavelength, fc.double({ min: 0, max: 1, noNaN: true }), (ls, w, u) => {
        const thetaC = Math.asin(1 / 2.5);
        const theta = thetaC + 1e-9 + u * (Math.PI / 2 - thetaC - 1e-9);
        expect(thinFilm(2.5, ls, 1, w, theta).T).toBe(0);
      })
    );
  });

  it('passes some light by tunnelling through a thin low-index gap beyond its critical angle (frustrated TIR), less for a wider gap', () => {
    const theta = (60 * Math.PI) / 180; // θc(1.5 → 1) = 41.8°
    const narrow = thinFilm(1.5, [{ n: 1, k: 0, thicknessNm: 50 }], 1.5, 500, theta);
    const wide = thinFilm(1.5, [{ n: 1, k: 0, thicknessNm: 300 }], 1.5, 500, theta);
    expect(narrow.T).toBeGreaterThan(0.5);
    expect(wide.T).toBeLessThan(narrow.T);
    expect(wide.T).toBeGreaterThan(0);
    assertInDelta(narrow.R + narrow.T, 1, 1e-12);
  });

  it('turns an opaque absorbing layer into a finite T = 0 with R of the semi-infinite absorber (1e-12)', () => {
    const r = thinFilm(1.5, [{ n: 2, k: 0.5, thicknessNm: 1e7 }], 1, 550, 0);
    expect(r.T).toBe(0);
    assertInDelta(r.R, normalReflectance(1.5, 0, 2, 0.5), 1e-12);
    expect(Number.isFinite(r.A)).toBe(true);
  });

  // Index-matched weak absorber: only bulk attenuation remains; the interface reflectance (k/2n)² ≈ 1e-9
  // and its interference bound the difference: tolerance 1e-8 relative.
  it('reduces to Beer–Lambert, T = exp(−4πkd/λ), for an index-matched weak absorber at normal incidence', () => {
    const k = 1e-4;
    const d = 2e5;
    const r = thinFilm(1.5, [{ n: 1.5, k, thicknessNm: d }], 1.5, 500, 0);
    expectClose(r.T, Math.exp((-4 * Math.PI * k * d) / 500), { rel: 1e-8 });
  });

  it('reflects everything at grazing incidence onto a different index (R = 1, T = 0)', () => {
    const r = thinFilm(1, [{ n: 1.4, k: 0, thicknessNm: 100 }], 1.5, 550, Math.PI / 2);
    assertInDelta(r.R, 1, 4 * EPS);
    expect(r.T).toBe(0);
  });

  it('stays finite for 2000 quarter-wave layers (no overflow in the matrix product)', () => {
    const layers: StackLayer[] = [];
    for (let i = 0; i < 1000; i++) {
      layers.push({ n: 2.5, k: 0, thicknessNm: 55 }, { n: 1.5, k: 0, thicknessNm: 550 / 6 });
    }
    const r = thinFilm(1, layers, 1.5, 550, 0.2);
    assertInDelta(r.R, 1, 1e-12);
    expect(Number.isFinite(r.T)).toBe(true);
  });

  it('thinFilmInto writes Rs, Rp, Ts, Tp, As, Ap and returns its out argument', () => {
    const out = new Float64Array(6);
    expect(thinFilmInto(out, 1, [], 1.5, 550, 0)).toBe(out);
    assertInDelta(out[0], 0.04, 4 * EPS);
    assertInDelta(out[3], 0.96, 4 * EPS);
  });

  it.each([
    ['nIn NaN', () => thinFilm(NaN, [], 1, 550, 0), /nIn/],
    ['a layer with n NaN', () => thinFilm(1, [{ n: 1.5, k: 0, thicknessNm: 1 }, { n: NaN, k: 0, thicknessNm: 1 }], 1, 550, 0), /layers\[1\]\.n/],
    ['a negative k', () => thinFilm(1, [{ n: 1.5, k: -0.1, thicknessNm: 1 }], 1, 550, 0), /layers\[0\]\.k.*≥ 0/],
    ['a negative thickness', () => thinFilm(1, [{ n: 1.5, k: 0, thicknessNm: -1 }], 1, 550, 0), /thicknessNm/],
    ['wavelength 0', () => thinFilm(1, [], 1, 0, 0), /wavelengthNm/],
    ['an angle above π/2', () => thinFilm(1, [], 1, 550, 2), /thetaInRad/]
  ])('rejects %s with a RangeError naming the field', (_l, call, msg) => {
    expect(call).toThrow(RangeError);
    expect(call).toThrow(msg);
  });
});
