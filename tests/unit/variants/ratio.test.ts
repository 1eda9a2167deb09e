import { describe, expect, it } from 'vitest';
import { ratioWithSigma } from '../../../src/lib/variants/ratio';

describe('ratioWithSigma', () => {
  it('q = a/b with σ_q = q·√((σa/a)² + (σb/b)²) (J. R. Taylor, An Introduction to Error Analysis, 2nd ed., eq. 3.18)', () => {
    // 0.4 ± 0.001 over 0.2 ± 0.001: relative errors 0.25 % and 0.5 % → 2 · 0.559 % = 0.01118
    const r = ratioWithSigma({ value: 0.4, sigma: 0.001 }, { value: 0.2, sigma: 0.001 });
    expect(r?.value).toBe(2);
    expect(r?.sigma).toBeCloseTo(2 * Math.hypot(0.0025, 0.005), 15);
  });

  it('agrees with the spread of simulated ratios of two independent normal estimates (k = 3 on the spread)', () => {
    // Independent check by simulation: 20 000 draws, deterministic generator (LCG, Numerical Recipes constants).
    let state = 12345;
    const uniform = () => ((state = (Math.imul(state, 1664525) + 1013904223) >>> 0) + 0.5) / 4294967296;
    const normal = () => Math.sqrt(-2 * Math.log(uniform())) * Math.cos(2 * Math.PI * uniform());
    const a = { value: 0.46, sigma: 0.001 };
    const b = { value: 0.386, sigma: 0.00097 };
    const n = 20_000;
    let s = 0;
    let s2 = 0;
    for (let i = 0; i < n; i++) {
      const q = (a.value + a.sigma * normal()) / (b.value + b.sigma * normal());
      s += q;
      s2 += q * q;
    }
    const sd = Math.sqrt(s2 / n - (s / n) ** 2);
    const predicted = ratioWithSigma(a, b)!.sigma;
    // the sample SD of n normal draws has a relative standard error ≈ 1/√(2n) = 0.5 %; allow 3 of them
    expect(Math.abs(sd / predicted - 1)).toBeLessThan(3 / Math.sqrt(2 * n));
  });

  it('gives null when the reference is not > 0', () => {
    expect(ratioWithSigma({ value: 0.4, sigma: 0.001 }, { value: 0, sigma: 0 })).toBeNull();
    expect(ratioWithSigma({ value: Number.NaN, sigma: 0 }, { value: 0.4, sigma: 0.001 })).toBeNull();
  });
});
