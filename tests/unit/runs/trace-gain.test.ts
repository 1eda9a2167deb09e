import { describe, expect, it } from 'vitest';
import { traceGain } from '../../../src/lib/runs/trace-gain';
import { assertInDelta } from '../../support/assert';

describe('traceGain(etaDome, sigmaDome, etaBare, sigmaBare) ', () => {
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
});
