import { describe, it, expect } from 'vitest';
import { traceAgreement } from '../../../src/lib/decisions/trace-agreement';
import { assertInDelta, EPS } from '../../support/assert';

const c = (name: string, extraction: number, stderr: number) => ({ id: name, name, extraction, stderr });

describe('traceAgreement(candidates, k)', () => {
  it('adds the standard errors in quadrature and compares the difference with k σ', () => {
    const { pairs, allAgree } = traceAgreement([c('a', 0.45, 0.003), c('b', 0.44, 0.004)], 3);
    assertInDelta(pairs[0].sigma, 0.005, 4 * EPS);
    assertInDelta(pairs[0].difference, 0.01, 4 * EPS);
    expect(pairs[0].agrees).toBe(true);
    expect(pairs[0].resolved).toBe(false); // 0.01 < 3 × 0.005
    expect(allAgree).toBe(true);
  });

  it('flags a pair the trace puts the other way round by more than k σ', () => {
    const { pairs, allAgree } = traceAgreement([c('a', 0.40, 0.002), c('b', 0.42, 0.002), c('c', 0.30, 0.002)]);
    expect(pairs.map((p) => p.agrees)).toEqual([false, true]);
    expect(pairs[1].resolved).toBe(true);
    expect(allAgree).toBe(false);
  });

  it('has no pairs for fewer than two candidates, and rejects k ≤ 0', () => {
    expect(traceAgreement([c('a', 0.4, 0.01)])).toEqual({ pairs: [], allAgree: true });
    expect(() => traceAgreement([], 0)).toThrow(/k must be a finite number > 0/);
  });
});
