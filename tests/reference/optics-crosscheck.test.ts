/**
 * Independent cross-checks of the optics core against implementations written here from the textbook
 * formulas, sharing no code with src/lib/optics (own complex arithmetic, own quadrature):
 *  1. escape-cone integral: Gauss–Legendre in the transmitted-angle variable, and composite Simpson in θ;
 *  2. one thin film: the Airy summation formula against the characteristic-matrix sweep;
 *  3. one thick film: the coherent result averaged over one period of thickness against the incoherent
 *     formula T1T2/(1 − R1R2) (exact for the average of the Airy function over a full phase period).
 */
import { describe, it } from 'vitest';
import fc from 'fast-check';
import { escapeCone } from '../../src/lib/optics/escape-cone';
import { thinFilm } from '../../src/lib/optics/thin-film';
import { incoherentStack } from '../../src/lib/optics/incoherent-stack';
import { assertInDelta } from '../support/assert';

// ---- small independent complex type (test-only) ----
class C {
  constructor(readonly re: number, readonly im = 0) {}
  add(b: C) { return new C(this.re + b.re, this.im + b.im); }
  sub(b: C) { return new C(this.re - b.re, this.im - b.im); }
  mul(b: C) { return new C(this.re * b.re - this.im * b.im, this.re * b.im + this.im * b.re); }
  div(b: C) {
    const d = b.re * b.re + b.im * b.im;
    return new C((this.re * b.re + this.im * b.im) / d, (this.im * b.re - this.re * b.im) / d);
  }
  abs2() { return this.re * this.re + this.im * this.im; }
  conj() { return new C(this.re, -this.im); }
  exp() { const m = Math.exp(this.re); return new C(m * Math.cos(this.im), m * Math.sin(this.im)); }
  /** principal root, in the cancellation-free form (W. H. Press et al., Numerical Recipes, §5.5) */
  sqrt() {
    if (this.re === 0 && this.im === 0) return new C(0);
    const r = Math.hypot(this.re, this.im);
    if (this.re >= 0) {
      const t = Math.sqrt((r + this.re) / 2);
      return new C(t, this.im / (2 * t));
    }
    const t = Math.sqrt((r - this.re) / 2);
    return new C(Math.abs(this.im) / (2 * t), this.im < 0 ? -t : t);
  }
}

/** Gauss–Legendre nodes and weights on [−1, 1] by Newton's method on P_n (Numerical Recipes §4.6, gauleg). */
function gaussLegendre(n: number): { x: number[]; w: number[] } {
  const x: number[] = new Array(n);
  const w: number[] = new Array(n);
  for (let i = 0; i < Math.ceil(n / 2); i++) {
    let z = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let pp = 0;
    for (let it = 0; it < 100; it++) {
      let p1 = 1;
      let p2 = 0;
      for (let j = 1; j <= n; j++) {
        const p3 = p2;
        p2 = p1;
        p1 = ((2 * j - 1) * z * p2 - (j - 1) * p3) / j;
      }
      pp = (n * (z * p1 - p2)) / (z * z - 1);
      const dz = p1 / pp;
      z -= dz;
      if (Math.abs(dz) < 1e-16) break;
    }
    x[i] = -z;
    x[n - 1 - i] = z;
    w[i] = w[n - 1 - i] = 2 / ((1 - z * z) * pp * pp);
  }
  return { x, w };
}

/** Lossless Fresnel T for s and p from textbook formulas (Born & Wolf §1.5.2). */
function tSP(cosI: number, n1: number, n2: number, cosT: number): [number, number] {
  const rs = (n1 * cosI - n2 * cosT) / (n1 * cosI + n2 * cosT);
  const rp = (n2 * cosI - n1 * cosT) / (n2 * cosI + n1 * cosT);
  return [1 - rs * rs, 1 - rp * rp];
}

/**
 * η_F by substituting s = cos θt (angle in the outside medium): with u = cos θ inside,
 * u² = 1 − (n2/n1)²(1 − s²), du = (n2/n1)² s/u ds, so ½∫₀^θc T sin θ dθ = ½∫₀¹ T(u(s), s) (n2/n1)² s/u ds,
 * a smooth integrand (no square-root end point), for n2 < n1.
 */
function escapeBySubstitution(n1: number, n2: number, nodes: number): [number, number] {
  const { x, w } = gaussLegendre(nodes);
  const q = (n2 / n1) ** 2;
  let s1 = 0;
  let p1 = 0;
  for (let i = 0; i < nodes; i++) {
    const s = 0.5 * (x[i] + 1);
    const u = Math.sqrt(1 - q * (1 - s * s));
    const [ts, tp] = tSP(u, n1, n2, s);
    const jac = (q * s) / u;
    s1 += 0.5 * w[i] * ts * jac;
    p1 += 0.5 * w[i] * tp * jac;
  }
  return [0.5 * s1, 0.5 * p1];
}

/** Composite Simpson in θ over [0, θc] (or [0, π/2]) with m (even) intervals. */
function escapeBySimpson(n1: number, n2: number, m: number): number {
  const thetaC = n2 < n1 ? Math.asin(n2 / n1) : Math.PI / 2;
  const h = thetaC / m;
  const f = (t: number) => {
    const sinT2 = (n1 / n2) ** 2 * Math.sin(t) ** 2;
    if (sinT2 >= 1) return 0;
    const [ts, tp] = tSP(Math.cos(t), n1, n2, Math.sqrt(1 - sinT2));
    return 0.5 * (ts + tp) * Math.sin(t);
  };
  let sum = f(0) + f(thetaC);
  for (let i = 1; i < m; i++) sum += (i % 2 ? 4 : 2) * f(i * h);
  return (0.5 * sum * h) / 3;
}

describe('cross-check: escape-cone integral', () => {
  // Both smooth rules converge exponentially; 96 nodes settle to roundoff (64 and 96 nodes agree to ~1e-16,
  // and so does the adaptive rule when this was written). Tolerance 1e-13 leaves room for libm differences.
  it.each([[3.5, 1], [2.5, 1], [2.45, 1], [2.5, 1.5], [1.5, 1], [1.2, 1.19]])(
    '%s → %s: adaptive Gauss–Kronrod agrees with 96-node Gauss–Legendre in cos θt, per polarisation (1e-13)',
    (n1, n2) => {
      const e = escapeCone(n1, n2);
      const [s, p] = escapeBySubstitution(n1, n2, 96);
      assertInDelta(e.fresnelS, s, 1e-13);
      assertInDelta(e.fresnelP, p, 1e-13);
    }
  );

  // Simpson with a √(θc − θ) end point converges only as h^1.5: with 2·10⁵ intervals over ≤ 0.73 rad,
  // h^1.5 ≈ 3e-9. Tolerance 2e-8.
  it.each([[3.5, 1], [1.5, 1], [1, 1.5]])('%s → %s: agrees with composite Simpson in θ, 2e5 intervals (2e-8)', (n1, n2) => {
    assertInDelta(escapeCone(n1, n2).fresnel, escapeBySimpson(n1, n2, 200000), 2e-8);
  });
});

/**
 * Airy summation for one film N1 between lossless n0 and n2 (Born & Wolf §1.6.4, §13.4):
 *   r = (r01 + r12 e^{2iβ}) / (1 + r01 r12 e^{2iβ}),  t = t01 t12 e^{iβ} / (1 + r01 r12 e^{2iβ}),
 *   β = 2π N1 cos θ1 d / λ,  T = Re(N2 cos θ2)/(n0 cos θ0) |t|² (s), with N2* for p.
 */
function airy(n0: number, film: { n: number; k: number; d: number }, n2: number, lambda: number, theta: number) {
  const N0 = new C(n0);
  const N1 = new C(film.n, film.k);
  const N2 = new C(n2);
  const b = new C(n0 * Math.sin(theta));
  const ncos = (N: C) => {
    let q = N.mul(N).sub(b.mul(b)).sqrt();
    if (q.im < -1e-15 || (Math.abs(q.im) <= 1e-15 && q.re < 0)) q = new C(-q.re, -q.im);
    return q; // N cos θ, decaying branch
  };
  const q0 = new C(n0 * Math.cos(theta));
  const q1 = ncos(N1);
  const q2 = ncos(N2);
  const two = new C(2);
  // s: r_ij = (qi − qj)/(qi + qj), t_ij = 2qi/(qi + qj)
  const rS = (qi: C, qj: C) => qi.sub(qj).div(qi.add(qj));
  const tS = (qi: C, qj: C) => two.mul(qi).div(qi.add(qj));
  // p: r_ij = (Nj² qi − Ni² qj)/(Nj² qi + Ni² qj), t_ij = 2 Ni Nj qi/(Nj² qi + Ni² qj)
  const rP = (Ni: C, qi: C, Nj: C, qj: C) => {
    const a = Nj.mul(Nj).mul(qi);
    const c = Ni.mul(Ni).mul(qj);
    return a.sub(c).div(a.add(c));
  };
  const tP = (Ni: C, qi: C, Nj: C, qj: C) => two.mul(Ni).mul(Nj).mul(qi).div(Nj.mul(Nj).mul(qi).add(Ni.mul(Ni).mul(qj)));
  const beta = new C((2 * Math.PI * film.d) / lambda).mul(q1);
  const e1 = new C(-beta.im, beta.re).exp(); // e^{iβ}
  const e2 = e1.mul(e1);
  const one = new C(1);
  const rsum = (r01: C, r12: C) => r01.add(r12.mul(e2)).div(one.add(r01.mul(r12).mul(e2)));
  const tsum = (r01: C, r12: C, t01: C, t12: C) => t01.mul(t12).mul(e1).div(one.add(r01.mul(r12).mul(e2)));
  const rs = rsum(rS(q0, q1), rS(q1, q2));
  const ts = tsum(rS(q0, q1), rS(q1, q2), tS(q0, q1), tS(q1, q2));
  const rp = rsum(rP(N0, q0, N1, q1), rP(N1, q1, N2, q2));
  const tp = tsum(rP(N0, q0, N1, q1), rP(N1, q1, N2, q2), tP(N0, q0, N1, q1), tP(N1, q1, N2, q2));
  const cos2 = q2.div(N2);
  const Ts = (q2.re / q0.re) * ts.abs2();
  const Tp = (N2.conj().mul(cos2).re / (n0 * Math.cos(theta))) * tp.abs2();
  return { Rs: rs.abs2(), Rp: rp.abs2(), Ts, Tp };
}

describe('cross-check: one thin film, characteristic matrix vs Airy summation', () => {
  // Both are exact for one film; they differ only by roundoff. Angles kept below 85° (near grazing both
  // lose digits in n0 cos θ0). Thickness ≤ 600 nm and k ≤ 2 keep e^{2iβ} well scaled. Tolerance 1e-11.
  it('agrees for random films, absorbing and evanescent (frustrated TIR) cases included (1e-11)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 3, noNaN: true }),
        fc.double({ min: 0.1, max: 3.5, noNaN: true }),
        fc.double({ min: 0, max: 2, noNaN: true }),
        fc.double({ min: 0, max: 600, noNaN: true }),
        fc.double({ min: 1, max: 3, noNaN: true }),
        fc.double({ min: 350, max: 900, noNaN: true }),
        fc.double({ min: 0, max: (85 * Math.PI) / 180, noNaN: true }),
        (n0, n, k, d, n2, lambda, theta) => {
          const a = airy(n0, { n, k, d }, n2, lambda, theta);
          const m = thinFilm(n0, [{ n, k, thicknessNm: d }], n2, lambda, theta);
          assertInDelta(m.Rs, a.Rs, 1e-11);
          assertInDelta(m.Rp, a.Rp, 1e-11);
          assertInDelta(m.Ts, a.Ts, 1e-11);
          assertInDelta(m.Tp, a.Tp, 1e-11);
        }
      ),
      { numRuns: 300 }
    );
  });

  it('agrees in the frustrated-TIR case 1.5 | 100 nm air gap | 1.5 at 60° (1e-12)', () => {
    const a = airy(1.5, { n: 1, k: 0, d: 100 }, 1.5, 500, Math.PI / 3);
    const m = thinFilm(1.5, [{ n: 1, k: 0, thicknessNm: 100 }], 1.5, 500, Math.PI / 3);
    assertInDelta(m.Ts, a.Ts, 1e-12);
    assertInDelta(m.Tp, a.Tp, 1e-12);
  });
});

describe('cross-check: thick film, coherent averaged over thickness vs incoherent', () => {
  // The coherent T is periodic in d with period λ / (2 n1 cos θ1); the trapezoid rule over one full period
  // converges exponentially for this analytic periodic function, and the exact average is T1T2/(1 − R1R2).
  // 400 samples: the Airy denominator 1 + R1R2 − 2√(R1R2) cos φ is far from 0 here (R ≤ 0.2). Tolerance 1e-12.
  it.each([[2.5, 1.5, 1, 0], [2.5, 1.5, 1, 0.3], [1, 2.1, 1.5, 0.9]])(
    '%s | %s | %s at %s rad: mean over one period of d equals the incoherent T (1e-12)',
    (n0, n1, n2, theta) => {
      const lambda = 500;
      const cos1 = Math.sqrt(1 - ((n0 * Math.sin(theta)) / n1) ** 2);
      const period = lambda / (2 * n1 * cos1);
      const samples = 400;
      let sumS = 0;
      let sumP = 0;
      for (let i = 0; i < samples; i++) {
        const r = thinFilm(n0, [{ n: n1, k: 0, thicknessNm: 10000 + (period * i) / samples }], n2, lambda, theta);
        sumS += r.Ts;
        sumP += r.Tp;
      }
      const inc = incoherentStack(n0, [{ n: n1, k: 0, thicknessNm: 1e6 }], n2, lambda, theta);
      assertInDelta(sumS / samples, inc.Ts, 1e-12);
      assertInDelta(sumP / samples, inc.Tp, 1e-12);
    }
  );
});
