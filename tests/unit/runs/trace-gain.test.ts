import { describe, expect, it } from 'vitest';
import { traceGain } from '../../../src/lib/runs/trace-gain';
import { assertInDelta } from '../../support/assert';

describe("traceGain(etaDome, sigmaDome, etaBare, sigmaBare): a ratio of two traced estimates with its standard error", () => {
  it('adds relative errors in quadrature: 1 % and 1 % give √2 % on the ratio (Taylor §3.8)', () => {
    const g = traceGain(0.4, 0.004, 0.2, 0.002)!;
    assertInDelta(g.gain, 2, 4 * Number.EPSILON);
    assertInDelta(g.stderr, 2 * Math.SQRT2 * 0.01, 1e-15);
  });

  it('has no gain without bare-chip light, and none from a non-finite extraction', () => {
    expect(traceGain(0.4, 0.004, 0, 0)).toBeNull();
    expect(traceGain(Number.NaN, 0, 0.2, 0.002)).toBeNull();
  });

  it('keeps the bare error alone when nothing escapes the dome package', () => {
    expect(traceGain(0, 0, 0.2, 0.002)).toEqual({ gain: 0, stderr: 0 });
  });

  it('agrees with the spread of simulated ratios of two independent normal estimates (k = 3 on the spread)', () => {
    // Independent check by simulation: 20 000 draws, deterministic generator (LCG, Numerical Recipes constants).
    let state = 12345;
    const uniform = () => ((state = (Math.imul(state, 1664525) + 1013904223) >>> 0) + 0.5) / 4294967296;
    const normal = () => Math.sqrt(-2 * Math.log(uniform())) * Math.cos(2 * Math.PI * uniform());
    const [a, sa, b, sb] = [0.46, 0.001, 0.386, 0.00097];
    const n = 20_000;
    let s = 0;
    let s2 = 0;
    for (let i = 0; i < n; i++) {
      const q = (a + sa * normal()) / (b + sb * normal());
      s += q;
      s2 += q * q;
    }
    const sd = Math.sqrt(s2 / n - (s / n) ** 2);
    const predicted = traceGain(a, sa, b, sb)!.stderr;
    // the sample SD of n normal draws has a relative standard error ≈ 1/√(2n) = 0.5 %; allow 3 of them
    expect(Math.abs(sd / predicted - 1)).toBeLessThan(3 / Math.sqrt(2 * n));
  });
});
