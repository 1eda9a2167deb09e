import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { incoherentStack, incoherentStackInto } from '../../../src/lib/optics/incoherent-stack';
import { fresnelReal } from '../../../src/lib/optics/fresnel';
import { assertInDelta, expectClose, EPS } from '../../support/assert';

const fr = new Float64Array(3);
const layer = (lossy: boolean) =>
  fc.record({
    n: fc.double({ min: 1, max: 3.5, noNaN: true }),
    k: lossy ? fc.double({ min: 0, max: 1e-3, noNaN: true }) : fc.constant(0),
    thicknessNm: fc.double({ min: 0, max: 1e6, noNaN: true })
  });
const medium = fc.double({ min: 1, max: 3, noNaN: true });
const angle = fc.double({ min: 0, max: 1.55, noNaN: true });

describe('incoherentStack(nIn, layers, nOut, wavelengthNm, thetaInRad)', () => {
  it('with no layers is the bare Fresnel interface (exact: same arithmetic path)', () => {
    const r = incoherentStack(2.5, [], 1, 450, 0.2);
    fresnelReal(Math.cos(0.2), 2.5, 1, fr);
    assertInDelta(r.Rs, fr[0], EPS);
    assertInDelta(r.Tp, 1 - fr[1], EPS);
  });

  it('gives T = T1 T2 / (1 − R1 R2) for one lossless layer, per polarisation (4 ε)', () => {
    const theta = 0.3;
    const r = incoherentStack(2.5, [{ n: 1.7, k: 0, thicknessNm: 5e5 }], 1, 450, theta);
    fresnelReal(Math.cos(theta), 2.5, 1.7, fr);
    const [R1s, R1p, cos1] = [fr[0], fr[1], fr[2]];
    fresnelReal(cos1, 1.7, 1, fr);
    const [R2s, R2p] = [fr[0], fr[1]];
    assertInDelta(r.Ts, ((1 - R1s) * (1 - R2s)) / (1 - R1s * R2s), 4 * EPS);
    assertInDelta(r.Tp, ((1 - R1p) * (1 - R2p)) / (1 - R1p * R2p), 4 * EPS);
  });

  it('conserves energy in lossless stacks: R + T = 1 from separate recursions (1e-12)', () => {
    fc.assert(
      fc.property(medium, fc.array(layer(false), { maxLength: 8 }), medium, angle, (a, ls, b, t) => {
        const r = incoherentStack(a, ls, b, 500, t);
        assertInDelta(r.Rs + r.Ts, 1, 1e-12);
        assertInDelta(r.Rp + r.Tp, 1, 1e-12);
        assertInDelta(r.A, 0, 1e-12);
      })
    );
  });

  it('reduces to Beer–Lambert along the slant path for an index-matched absorber: T = exp(−4πkd/(λ cos θ)) (8 ε relative)', () => {
    const theta = 0.6;
    const r = incoherentStack(1.5, [{ n: 1.5, k: 2e-5, thicknessNm: 1e6 }], 1.5, 450, theta);
    expectClose(r.T, Math.exp((-4 * Math.PI * 2e-5 * 1e6) / (450 * Math.cos(theta))), { rel: 8 * EPS });
    assertInDelta(r.R, 0, 0);
  });

  // T is reciprocal for thick layers too: T·τ·T / (1 − R′ R τ²) is symmetric in the two sides.
  it('is reciprocal in transmission, lossy layers included (1e-12)', () => {
    fc.assert(
      fc.property(medium, fc.array(layer(true), { maxLength: 6 }), medium, fc.double({ min: 0, max: 1.3, noNaN: true }), (a, ls, b, t) => {
        const sinB = (a * Math.sin(t)) / b;
        fc.pre(sinB < 0.99);
        const fwd = incoherentStack(a, ls, b, 500, t);
        const back = incoherentStack(b, [...ls].reverse(), a, 500, Math.asin(sinB));
        assertInDelta(back.Ts, fwd.Ts, 1e-12);
        assertInDelta(back.Tp, fwd.Tp, 1e-12);
      })
    );
  });

  it('notes total internal reflection inside the stack: a ray that reaches the 1.8 layer but not the 1.4 layer gives T = 0, R = 1', () => {
    // 2.5 sin 40° = 1.607: enters 1.8, refused by 1.4
    const r = incoherentStack(2.5, [{ n: 1.8, k: 0, thicknessNm: 1e5 }, { n: 1.4, k: 0, thicknessNm: 1e5 }], 1, 450, (40 * Math.PI) / 180);
    expect(r.T).toBe(0);
    assertInDelta(r.R, 1, 1e-14);
  });

  it('loses light to absorption in a layer that traps it: R + A = 1, A > 0', () => {
    const r = incoherentStack(2.5, [{ n: 1.8, k: 1e-4, thicknessNm: 1e5 }], 1, 450, (40 * Math.PI) / 180);
    expect(r.T).toBe(0);
    expect(r.A).toBeGreaterThan(0);
    assertInDelta(r.R + r.A, 1, 1e-14);
  });

  it('never widens the escape cone: T = 0 beyond asin(nOut/nIn) for any stack', () => {
    fc.assert(
      fc.property(fc.array(layer(true), { maxLength: 6 }), fc.double({ min: 0, max: 1, noNaN: true }), (ls, u) => {
        const thetaC = Math.asin(1 / 2.45);
        const theta = thetaC + 1e-9 + u * (Math.PI / 2 - thetaC - 1e-9);
        expect(incoherentStack(2.45, ls, 1, 450, theta).T).toBe(0);
      })
    );
  });

  it('handles an opaque layer (T = 0, all finite) and grazing incidence (R = 1, T = 0)', () => {
    const opaque = incoherentStack(2.5, [{ n: 1.5, k: 0.1, thicknessNm: 1e7 }], 1, 450, 0.1);
    expect(opaque.T).toBe(0);
    expect(Number.isFinite(opaque.R)).toBe(true);
    const grazing = incoherentStack(1, [{ n: 1.5, k: 0, thicknessNm: 1e6 }], 1.5, 450, Math.PI / 2);
    expect(grazing.R).toBe(1);
    expect(grazing.T).toBe(0);
  });

  it('incoherentStackInto returns its out argument', () => {
    const out = new Float64Array(6);
    expect(incoherentStackInto(out, 1.5, [], 1, 450, 0)).toBe(out);
  });

  it('rejects bad layers with a RangeError naming the field', () => {
    expect(() => incoherentStack(2.5, [{ n: 0, k: 0, thicknessNm: 1 }], 1, 450, 0)).toThrow(/layers\[0\]\.n/);
    expect(() => incoherentStack(2.5, [{ n: 1.5, k: 0, thicknessNm: Infinity }], 1, 450, 0)).toThrow(/thicknessNm/);
  });
});
