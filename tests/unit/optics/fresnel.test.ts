import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import {
  fresnelReal,
  reflectanceUnpolarised,
  fresnelComplex,
  fresnelAmplitudesAt,
  FRESNEL_AMPLITUDES_LENGTH,
  mirrorAmplitudesAt,
  MIRROR_AMPLITUDES_LENGTH,
  reflectanceComplex,
  normalReflectance
} from '../../../src/lib/optics/fresnel';
import { assertInDelta, EPS } from '../../support/assert';

const out = new Float64Array(3);
const index = fc.double({ min: 1, max: 4, noNaN: true });
const cosine = fc.double({ min: 0, max: 1, noNaN: true });
const angle = fc.double({ min: 0, max: Math.PI / 2, noNaN: true });

describe('fresnelReal(cosThetaI, etaI, etaT, out)', () => {
  it('gives Rs = Rp = ((etaI − etaT)/(etaI + etaT))² at normal incidence (exact identity, 4 ε)', () => {
    for (const [a, b] of [[1, 1.5], [2.5, 1], [3.5, 1.41], [1.2, 1.21]]) {
      expect(fresnelReal(1, a, b, out)).toBe(true);
      const r = ((a - b) / (a + b)) ** 2;
      assertInDelta(out[0], r, 4 * EPS);
      assertInDelta(out[1], r, 4 * EPS);
      expect(out[2]).toBe(1);
    }
  });

  it('returns false and writes Rs = Rp = 1, cosThetaT = 0 beyond the critical angle', () => {
    out.fill(-1);
    const cosI = Math.cos((45 * Math.PI) / 180); // θc(1.5 → 1) = 41.8°
    expect(fresnelReal(cosI, 1.5, 1, out)).toBe(false);
    expect([...out]).toEqual([1, 1, 0]);
  });

  it('treats exactly the critical angle as total internal reflection', () => {
    // sin θc = 1/2 → cos θc = √3/2; sin²θt = 4 (1 − 3/4) = 1 exactly in doubles
    expect(fresnelReal(Math.sqrt(3) / 2, 2, 1, out)).toBe(false);
    expect(out[0]).toBe(1);
    expect(out[1]).toBe(1);
  });

  it('gives Rs = Rp = 1 at grazing incidence from the less dense side', () => {
    expect(fresnelReal(0, 1, 1.5, out)).toBe(true);
    assertInDelta(out[0], 1, 4 * EPS);
    assertInDelta(out[1], 1, 4 * EPS);
  });

  it('gives no reflection at all for equal indices, grazing included', () => {
    for (const c of [1, 0.5, 0]) {
      expect(fresnelReal(c, 1.7, 1.7, out)).toBe(true);
      expect(out[0]).toBe(0);
      expect(out[1]).toBe(0);
      expect(out[2]).toBe(c);
    }
  });

  it('has Rp = 0 at the Brewster angle tan θB = etaT/etaI (10 ε)', () => {
    const thetaB = Math.atan(1.5);
    fresnelReal(Math.cos(thetaB), 1, 1.5, out);
    assertInDelta(out[1], 0, 10 * EPS);
  });

  // Compared as squares: √(1 − cos²) loses digits near normal incidence, the squares do not.
  // Tolerance 16 ε · etaT²: a few roundings in each of cos², 1 − cos² and the products.
  it('writes a cosThetaT that obeys Snell: etaI² sin²θi = etaT² sin²θt (16 ε · etaT²)', () => {
    fc.assert(
      fc.property(cosine, index, index, (c, a, b) => {
        if (!fresnelReal(c, a, b, out)) return;
        const lhs = a * a * (1 - c * c);
        const rhs = b * b * (1 - out[2] * out[2]);
        assertInDelta(lhs, rhs, 16 * EPS * b * b);
      })
    );
  });

  it('keeps 0 ≤ Rs, Rp ≤ 1 and Rs ≥ Rp for every input (Rs ≥ Rp is a property of dielectrics)', () => {
    fc.assert(
      fc.property(cosine, index, index, (c, a, b) => {
        fresnelReal(c, a, b, out);
        expect(out[0]).toBeGreaterThanOrEqual(0);
        expect(out[0]).toBeLessThanOrEqual(1);
        expect(out[1]).toBeGreaterThanOrEqual(0);
        expect(out[1] - out[0]).toBeLessThanOrEqual(1e-15);
      })
    );
  });

  // Kept 0.01 away from grazing: there the far side sits at its critical angle, where R has a square-root
  // kink. The back-side cosine carries an error ≈ n²ε/cosθi ≤ 16 · 2.2e-16 / 0.01 ≈ 4e-13, and
  // |dR/dcos| ≤ ~8 here, so R agrees to ~3e-12: tolerance 1e-11.
  it('is reciprocal: the same Rs, Rp from either side at Snell-matched angles (1e-11)', () => {
    const back = new Float64Array(3);
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 1, noNaN: true }), index, index, (c, a, b) => {
        if (!fresnelReal(c, a, b, out)) return;
        fresnelReal(out[2], b, a, back);
        assertInDelta(back[0], out[0], 1e-11);
        assertInDelta(back[1], out[1], 1e-11);
      })
    );
  });

  it('clamps a cosine of 1 + 2ε from roundoff to 1', () => {
    expect(fresnelReal(1 + 2 * EPS, 1.5, 1, out)).toBe(true);
    expect(out[2]).toBe(1);
  });

  it.each([
    ['cosThetaI NaN', NaN, 1.5, 1, /cosThetaI/],
    ['cosThetaI 1.1', 1.1, 1.5, 1, /cosThetaI.*\[0, 1\]/],
    ['cosThetaI −0.5', -0.5, 1.5, 1, /cosThetaI/],
    ['etaI 0', 0.5, 0, 1, /etaI.*> 0/],
    ['etaT NaN', 0.5, 1.5, NaN, /etaT/],
    ['etaT Infinity', 0.5, 1.5, Infinity, /etaT/]
  ])('rejects %s with a RangeError naming the field', (_label, c, a, b, msg) => {
    expect(() => fresnelReal(c, a, b, out)).toThrow(RangeError);
    expect(() => fresnelReal(c, a, b, out)).toThrow(msg);
  });
});

describe('reflectanceUnpolarised(cosThetaI, etaI, etaT)', () => {
  it('is the mean of Rs and Rp', () => {
    fresnelReal(0.6, 1, 2, out);
    expect(reflectanceUnpolarised(0.6, 1, 2)).toBe(0.5 * (out[0] + out[1]));
  });
  it('is 1 beyond the critical angle', () => {
    expect(reflectanceUnpolarised(0.1, 2.5, 1)).toBe(1);
  });
  it('rejects NaN', () => {
    expect(() => reflectanceUnpolarised(NaN, 1, 1.5)).toThrow(RangeError);
  });
});

describe('fresnelComplex(sinThetaI, nI, kI, nT, kT)', () => {
  // Angles drawn directly so that sin θ and cos θ are both accurate (deriving one from the other loses
  // digits near 0° or 90°). Indices closer than 1e-6 are skipped: near grazing, cos θt is then a difference
  // of nearly equal numbers and the two formulations lose different digits.
  it('agrees with fresnelReal for lossless media (1e-12)', () => {
    fc.assert(
      fc.property(angle, index, index, (t, a, b) => {
        fc.pre(Math.abs(a - b) > 1e-6);
        const s = Math.sin(t);
        const c = Math.cos(t);
        const r = fresnelComplex(s, a, 0, b, 0);
        fresnelReal(c, a, b, out);
        assertInDelta(r.Rs, out[0], 1e-12);
        assertInDelta(r.Rp, out[1], 1e-12);
      })
    );
  });

  it('conserves energy at the interface, R + T = 1, also when the far side absorbs or is a metal (1e-12)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 1, noNaN: true }),
        index,
        fc.double({ min: 0.03, max: 4, noNaN: true }),
        fc.double({ min: 0, max: 8, noNaN: true }),
        (s, a, n, k) => {
          const r = fresnelComplex(s, a, 0, n, k);
          if (s === 1) return; // grazing: no flux through the plane
          assertInDelta(r.Rs + r.Ts, 1, 1e-12);
          assertInDelta(r.Rp + r.Tp, 1, 1e-12);
        }
      )
    );
  });

  it('gives |rs| = |rp| = 1 and T = 0 beyond the critical angle', () => {
    const r = fresnelComplex(Math.sin((30 * Math.PI) / 180), 2.5, 0, 1, 0);
    assertInDelta(Math.hypot(r.rs.re, r.rs.im), 1, 4 * EPS);
    assertInDelta(Math.hypot(r.rp.re, r.rp.im), 1, 4 * EPS);
    expect(r.Ts).toBe(0);
    expect(r.Tp).toBe(0);
    expect(r.T).toBe(0);
  });

  it('gives the TIR phase shift |δs| = 2 atan(√(sin²θ − n²)/cos θ), n = n2/n1 (Born & Wolf §1.5.4; 1e-12)', () => {
    const theta = (50 * Math.PI) / 180;
    const n = 1 / 1.5;
    const r = fresnelComplex(Math.sin(theta), 1.5, 0, 1, 0);
    const expected = 2 * Math.atan(Math.sqrt(Math.sin(theta) ** 2 - n * n) / Math.cos(theta));
    assertInDelta(Math.abs(Math.atan2(r.rs.im, r.rs.re)), expected, 1e-12);
  });

  it('makes the transmitted wave decay: Im(N2 cos θ2) ≥ 0 shows as Ts = 0 under TIR, not a gain', () => {
    const r = fresnelComplex(0.9, 3.5, 0, 1, 0);
    expect(r.Rs).toBeLessThanOrEqual(1 + 1e-15);
    expect(r.Rp).toBeLessThanOrEqual(1 + 1e-15);
  });

  it('matches the normal-incidence formula ((n−n0)² + k²)/((n+n0)² + k²) for a metal (4 ε)', () => {
    const r = fresnelComplex(0, 1, 0, 0.4892, 4.7783);
    const expected = ((0.4892 - 1) ** 2 + 4.7783 ** 2) / ((0.4892 + 1) ** 2 + 4.7783 ** 2);
    assertInDelta(r.Rs, expected, 4 * EPS);
    assertInDelta(r.Rp, expected, 4 * EPS);
  });

  it('has ts − rs = 1 for s polarisation (field continuity, 1e-14)', () => {
    const r = fresnelComplex(0.4, 1.5, 0.01, 2.4, 0.2);
    assertInDelta(r.ts.re - r.rs.re, 1, 1e-14);
    assertInDelta(r.ts.im - r.rs.im, 0, 1e-14);
  });

  it('returns R = 0, T = 1 for identical media at any angle', () => {
    for (const s of [0, 0.5, 1]) {
      const r = fresnelComplex(s, 2, 0.1, 2, 0.1);
      expect(r.R).toBe(0);
      if (s < 1) expect(r.T).toBe(1);
    }
  });

  it('accepts metals with n < 1 and rejects NaN or negative k with a RangeError', () => {
    expect(fresnelComplex(0.5, 1, 0, 0.05, 3.6).R).toBeGreaterThan(0.9);
    expect(() => fresnelComplex(NaN, 1, 0, 1.5, 0)).toThrow(/sinThetaI/);
    expect(() => fresnelComplex(0.5, 1, 0, 1.5, -0.1)).toThrow(/kT.*≥ 0/);
    expect(() => fresnelComplex(1.2, 1, 0, 1.5, 0)).toThrow(/sinThetaI.*\[0, 1\]/);
  });
});

describe('reflectanceComplex(cosThetaI, etaI, nT, kT, out)', () => {
  it('agrees with fresnelComplex for a lossless incident side (1e-12)', () => {
    const o = new Float64Array(2);
    fc.assert(
      fc.property(
        angle,
        index,
        fc.double({ min: 0.03, max: 4, noNaN: true }),
        fc.double({ min: 0, max: 8, noNaN: true }),
        (t, a, n, k) => {
          fc.pre(Math.abs(a - n) > 1e-6 || k > 1e-6); // see the note on near-equal indices above
          reflectanceComplex(Math.cos(t), a, n, k, o);
          const r = fresnelComplex(Math.sin(t), a, 0, n, k);
          assertInDelta(o[0], r.Rs, 1e-12);
          assertInDelta(o[1], r.Rp, 1e-12);
        }
      )
    );
  });

  it('returns its out argument and rejects negative kT', () => {
    const o = new Float64Array(2);
    expect(reflectanceComplex(1, 1, 0.5, 4, o)).toBe(o);
    expect(() => reflectanceComplex(1, 1, 0.5, -1, o)).toThrow(/kT/);
  });
});

describe('normalReflectance(n1, k1, n2, k2)', () => {
  it('is symmetric in the two media', () => {
    expect(normalReflectance(1.5, 0, 0.3, 3)).toBe(normalReflectance(0.3, 3, 1.5, 0));
  });
  it('is 0 for identical media and agrees with fresnelReal at normal incidence', () => {
    expect(normalReflectance(2, 0.1, 2, 0.1)).toBe(0);
    fresnelReal(1, 2.5, 1, out);
    assertInDelta(normalReflectance(2.5, 0, 1, 0), out[0], 2 * EPS);
  });
  it('rejects a zero index with a RangeError naming it', () => {
    expect(() => normalReflectance(0, 0, 1, 0)).toThrow(/n1.*> 0/);
  });
});

describe('mirrorAmplitudesAt([cosThetaI, etaI, nT, kT], out)', () => {
  const buf = new Float64Array(MIRROR_AMPLITUDES_LENGTH);

  // fresnelComplex is the reference (checked against Born & Wolf above); lossless incident side, any far side.
  it('agrees with fresnelComplex for dielectrics, absorbers and metals at any angle (1e-12)', () => {
    fc.assert(
      fc.property(angle, index, fc.double({ min: 0.03, max: 4, noNaN: true }), fc.double({ min: 0, max: 8, noNaN: true }), (t, a, n, k) => {
        fc.pre(Math.abs(a - n) > 1e-6 || k > 1e-6);
        const s = Math.sin(t); // both get the same cos θ, as fresnelComplex derives it from sin θ
        const r = fresnelComplex(s, a, 0, n, k);
        mirrorAmplitudesAt(Float64Array.of(Math.sqrt(1 - s * s), a, n, k), buf);
        const want = [r.rs.re, r.rs.im, r.rp.re, r.rp.im, r.Rs, r.Rp];
        for (let i = 0; i < want.length; i++) assertInDelta(buf[i], want[i], 1e-12);
      })
    );
  });

  it('names the field and range of a bad input', () => {
    expect(() => mirrorAmplitudesAt(Float64Array.of(0.5, 1, 0.5, -1), buf)).toThrow(/kT must be a finite number ≥ 0/);
    expect(() => mirrorAmplitudesAt(Float64Array.of(1.5, 1, 0.5, 1), buf)).toThrow(/cosThetaI must be a number in \[0, 1\]/);
  });
});

describe('fresnelAmplitudesAt([cosThetaI, etaI, etaT], out)', () => {
  const amp = new Float64Array(FRESNEL_AMPLITUDES_LENGTH);
  // Spelled out for readability: cos θi, incident and far-side index
  const amplitudes = (c: number, a: number, b: number, out: Float64Array) => fresnelAmplitudesAt(Float64Array.of(c, a, b), out);

  // The general complex-index function is the reference (itself checked against Born & Wolf above);
  // indices closer than 1e-6 are skipped for the reason given there.
  it('agrees with fresnelComplex for lossless media, below and beyond the critical angle (1e-12)', () => {
    fc.assert(
      fc.property(angle, index, index, (t, a, b) => {
        fc.pre(Math.abs(a - b) > 1e-6);
        // Both get the same cos θ (fresnelComplex derives it from sin θ; near grazing that costs digits)
        const s = Math.sin(t);
        const r = fresnelComplex(s, a, 0, b, 0);
        const c = Math.sqrt(1 - s * s);
        const transmitted = amplitudes(c, a, b, amp);
        const eta = a / b;
        expect(transmitted).toBe(eta * eta * (1 - c * c) < 1); // Snell: a transmitted wave exists
        const want = [r.rs.re, r.rs.im, r.rp.re, r.rp.im];
        if (transmitted) want.push(r.ts.re, r.ts.im, r.tp.re, r.tp.im);
        for (let i = 0; i < want.length; i++) assertInDelta(amp[i], want[i], 1e-12);
      })
    );
  });

  it('gives rs = −0.2 and rp = +0.2 at normal incidence air → 1.5 (Hecht, Optics, §4.6.2: rp = −rs at normal incidence in this sign convention)', () => {
    expect(amplitudes(1, 1, 1.5, amp)).toBe(true);
    assertInDelta(amp[0], -0.2, 4 * EPS);
    assertInDelta(amp[2], 0.2, 4 * EPS);
    assertInDelta(amp[4], 0.8, 4 * EPS); // ts = 1 + rs
  });

  it('gives |rs| = |rp| = 1 and no transmitted amplitude beyond the critical angle', () => {
    expect(amplitudes(Math.cos(1), 2.45, 1.41, amp)).toBe(false);
    assertInDelta(Math.hypot(amp[0], amp[1]), 1, 4 * EPS);
    assertInDelta(Math.hypot(amp[2], amp[3]), 1, 4 * EPS);
    expect(Array.from(amp.subarray(4))).toEqual([0, 0, 0, 0]);
  });

  it('transmits everything when the indices match, grazing incidence included', () => {
    expect(amplitudes(0, 1.5, 1.5, amp)).toBe(true);
    expect(Array.from(amp)).toEqual([0, 0, 0, 0, 1, 0, 1, 0]);
  });
});
