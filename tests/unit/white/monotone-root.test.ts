import { describe, expect, it } from 'vitest';
import { monotoneRoot, type MonotoneRootOptions } from '../../../src/lib/white/monotone-root';

const base: MonotoneRootOptions = { lo: 0, hi: 60, start: 8, minStep: 0.05, tolerance: 1e-6, xTolerance: 1e-9, maxEvaluations: 60, increasing: false };
const decreasing = (root: number) => async (x: number) => 5000 * Math.exp(-x / 10) - 5000 * Math.exp(-root / 10);

describe('monotoneRoot', () => {
  it('finds the root of a falling exponential (CCT-like) from a start below and from a start above it', async () => {
    for (const start of [2, 40]) {
      const r = await monotoneRoot(decreasing(17.3), { ...base, start });
      expect(r.status).toBe('converged');
      expect(r.x).toBeCloseTo(17.3, 5);
    }
  });

  it('steps off lo = 0 by minStep and finds a root near zero', async () => {
    const r = await monotoneRoot(async (x) => x - 0.03, { ...base, start: 0, increasing: true });
    expect(r.status).toBe('converged');
    expect(r.x).toBeCloseTo(0.03, 6);
  });

  it("says 'above' when the function has not reached zero by hi, and 'below' when it is already past zero at lo", async () => {
    expect((await monotoneRoot(decreasing(80), base)).status).toBe('above');
    const below = await monotoneRoot(async (x) => -1 - x, { ...base, lo: 0.5 });
    expect(below.status).toBe('below');
    expect(below.x).toBe(0.5);
  });

  it('bisects across infinite values (a trial with no CCT) and still converges', async () => {
    const f = async (x: number) => (x < 5 ? Infinity : x > 30 ? -Infinity : 20 - x);
    const r = await monotoneRoot(f, { ...base, start: 1 });
    expect(r.status).toBe('converged');
    expect(r.x).toBeCloseTo(20, 5);
  });

  it('stops at maxEvaluations and returns the best trial, not converged', async () => {
    let n = 0;
    const r = await monotoneRoot(async (x) => (n++, Math.atan(x - 9.123)), { ...base, tolerance: 1e-15, maxEvaluations: 6, increasing: true, start: 1 });
    expect(r.status).toBe('not converged');
    expect(n).toBe(6);
    expect(r.evaluations).toBe(6);
  });
});
