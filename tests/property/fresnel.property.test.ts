/**
 * Invariants of a single interface over random indices and angles.
 *
 * Sources: Fresnel equations for real and complex indices (M. Born, E. Wolf, Principles of Optics,
 * §1.5.2 and §14.2); Rp ≤ Rs at every angle for two dielectrics, equal at normal and grazing incidence
 * and Rp = 0 at Brewster's angle (Born & Wolf §1.5.3; common practice); R + T = 1 at a lossless
 * interface (energy conservation, §1.5.3).
 *
 * Tolerances: ORDER_SLACK = 4 ulps for Rp ≤ Rs (at normal incidence the two are equal and are computed
 * by different formulas). fresnelComplex against fresnelReal with k = 0: AGREE = 1e-13 absolute (a
 * complex square root and complex divisions, a few ulps each) plus the conditioning term
 * 16 ε / (cos θi · cos θt): cos θt = √(1 − sin²θt) carries an absolute error ε / cos θt, and R's
 * sensitivity to it grows as 1 / cos θi. Near the critical angle or at grazing incidence between nearly
 * equal indices the two formulas legitimately part (0.0052 against 0.0025 was seen at cos θi = 4e-8
 * with indices 1 + 1e-15 apart); the term lets exactly those cases through and no others.
 */
import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { fresnelComplex, fresnelReal, reflectanceComplex } from '../../src/lib/optics/fresnel';
import { check, real, RUNS } from './support';

const ORDER_SLACK = 4 * Number.EPSILON;
const AGREE = 1e-13;
const fr = new Float64Array(3);

/** AGREE plus the conditioning term of the file comment. */
function agreeTolerance(cosI: number, cosT: number): number {
  return AGREE + (16 * Number.EPSILON) / (cosI * cosT);
}
const rc = new Float64Array(2);

const index = real(1, 6);
const cosTheta = real(0, 1);

describe('fresnelReal(cosThetaI, etaI, etaT, out)', () => {
  it(`gives Rs, Rp in [0, 1] and Rp ≤ Rs, for external and internal reflection (${RUNS.many} cases)`, () => {
    check(
      'fresnelReal bounds and order',
      fc.property(cosTheta, index, index, (c, etaI, etaT) => {
        const transmitted = fresnelReal(c, etaI, etaT, fr);
        const [Rs, Rp, cosT] = fr;
        expect(Rs >= 0 && Rs <= 1, `Rs ${Rs}`).toBe(true);
        expect(Rp >= 0 && Rp <= 1, `Rp ${Rp}`).toBe(true);
        expect(cosT >= 0 && cosT <= 1, `cos θt ${cosT}`).toBe(true);
        expect(Rp, 'Rp ≤ Rs').toBeLessThanOrEqual(Rs + ORDER_SLACK);
        if (!transmitted) expect([Rs, Rp], 'total internal reflection').toEqual([1, 1]);
        // Snell: etaI sin θi = etaT sin θt whenever light is transmitted
        if (transmitted) {
          const sinI = Math.sqrt(1 - c * c);
          const sinT = Math.sqrt(1 - cosT * cosT);
          expect(Math.abs(etaI * sinI - etaT * sinT), 'n sin θ conserved').toBeLessThanOrEqual(1e-7 * etaI);
        }
      }),
      RUNS.many
    );
  });
});

describe('fresnelComplex(sinThetaI, nI, kI, nT, kT)', () => {
  it(`agrees with fresnelReal for k = 0 within ${AGREE} plus the conditioning term (${RUNS.many} cases)`, () => {
    check(
      'fresnelComplex = fresnelReal for k = 0',
      fc.property(real(0, 1), index, index, (s, nI, nT) => {
        const cosI = Math.sqrt(1 - s * s);
        const c = fresnelComplex(s, nI, 0, nT, 0);
        const transmitted = fresnelReal(cosI, nI, nT, fr);
        if (!transmitted) {
          expect(Math.abs(c.Rs - 1) + Math.abs(c.Rp - 1), 'total internal reflection').toBeLessThanOrEqual(1e-12);
          return;
        }
        const tol = agreeTolerance(cosI, fr[2]);
        expect(Math.abs(c.Rs - fr[0]), `Rs ${c.Rs} vs ${fr[0]}`).toBeLessThanOrEqual(tol);
        expect(Math.abs(c.Rp - fr[1]), `Rp ${c.Rp} vs ${fr[1]}`).toBeLessThanOrEqual(tol);
        // lossless interface: R + T = 1 per polarisation (grazing incidence: T = 0, R = 1)
        if (s < 1) {
          expect(Math.abs(c.Rs + c.Ts - 1), 'Rs + Ts').toBeLessThanOrEqual(tol);
          expect(Math.abs(c.Rp + c.Tp - 1), 'Rp + Tp').toBeLessThanOrEqual(tol);
        }
      }),
      RUNS.many
    );
  });

  it('regression: agrees at index-matched grazing incidence, where the plain sums underflow', () => {
    // found by the property below: reflectanceComplex gave Rs = 1 for matched indices at cos θ = 1.6e-162
    reflectanceComplex(1.5717277847026288e-162, 1, 1, 0, rc);
    expect([rc[0], rc[1]]).toEqual([0, 0]);
    expect(fresnelComplex(1, 1.41, 0, 1.41, 0).R).toBe(0);
  });

  it(`keeps Rs, Rp, Ts, Tp in [0, 1] against absorbing media and metals (${RUNS.many} cases)`, () => {
    check(
      'fresnelComplex bounds, absorbing far side',
      fc.property(real(0, 1), index, real(0.01, 6), fc.oneof(fc.constant(0), real(0, 50)), (s, nI, nT, kT) => {
        const c = fresnelComplex(s, nI, 0, nT, kT);
        for (const [name, x] of [['Rs', c.Rs], ['Rp', c.Rp], ['Ts', c.Ts], ['Tp', c.Tp]] as const) {
          expect(x >= -ORDER_SLACK && x <= 1 + 1e-12, `${name} ${x}`).toBe(true);
        }
        // what is not reflected enters the absorbing medium (lossless incident side): R + T = 1
        if (s < 1) {
          expect(Math.abs(c.Rs + c.Ts - 1), 'Rs + Ts').toBeLessThanOrEqual(1e-10);
          expect(Math.abs(c.Rp + c.Tp - 1), 'Rp + Tp').toBeLessThanOrEqual(1e-10);
        }
      }),
      RUNS.many
    );
  });
});

describe('reflectanceComplex(cosThetaI, etaI, nT, kT, out)', () => {
  it(`agrees with fresnelComplex for a lossless incident side within 1e-12 plus the conditioning term (${RUNS.many} cases)`, () => {
    check(
      'reflectanceComplex = fresnelComplex',
      fc.property(cosTheta, index, real(0.01, 6), fc.oneof(fc.constant(0), real(0, 50)), (c, etaI, nT, kT) => {
        reflectanceComplex(c, etaI, nT, kT, rc);
        const s = Math.sqrt(1 - c * c);
        const f = fresnelComplex(s, etaI, 0, nT, kT);
        // |cos θt| = |√(N² − etaI² sin²θi)| / |N|, the conditioning of the file comment
        const wRe = nT * nT - kT * kT - etaI * etaI * s * s;
        const wIm = 2 * nT * kT;
        const cosT = Math.sqrt(Math.hypot(wRe, wIm)) / Math.hypot(nT, kT);
        const tol = 1e-12 + (16 * Number.EPSILON) / (c * cosT);
        expect(Math.abs(rc[0] - f.Rs), 'Rs').toBeLessThanOrEqual(tol);
        expect(Math.abs(rc[1] - f.Rp), 'Rp').toBeLessThanOrEqual(tol);
        expect(rc[0] >= 0 && rc[0] <= 1 + 1e-12 && rc[1] >= 0 && rc[1] <= 1 + 1e-12, `Rs ${rc[0]}, Rp ${rc[1]}`).toBe(true);
      }),
      RUNS.many
    );
  });
});
