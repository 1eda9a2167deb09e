import { describe, it, expect } from 'vitest';
import { validateStack, stackResultFrom, MAX_LAYERS } from '../../../src/lib/optics/layer';
import { requireInRange, requireInteger } from '../../../src/lib/optics/guard';

describe('validateStack(nIn, layers, nOut, wavelengthNm, thetaInRad?)', () => {
  it('accepts metals (n < 1) and zero-thickness layers', () => {
    expect(() => validateStack(1.5, [{ n: 0.05, k: 3.6, thicknessNm: 0 }], 1, 550, 0)).not.toThrow();
  });
  it('names the offending layer and field', () => {
    expect(() => validateStack(1.5, [{ n: 1.5, k: 0, thicknessNm: 1 }, { n: 1.5, k: 0, thicknessNm: NaN }], 1, 550)).toThrow(
      'layers[1].thicknessNm must be a finite number ≥ 0 (got NaN)'
    );
  });
  it('rejects a non-array, a missing layer object and an over-long stack', () => {
    expect(() => validateStack(1.5, null as never, 1, 550)).toThrow(/layers must be an array/);
    expect(() => validateStack(1.5, [null as never], 1, 550)).toThrow(/layers\[0\]/);
    const many = Array.from({ length: MAX_LAYERS + 1 }, () => ({ n: 1.5, k: 0, thicknessNm: 1 }));
    expect(() => validateStack(1.5, many, 1, 550)).toThrow(/at most/);
  });
});

describe('stackResultFrom(out)', () => {
  it('averages s and p for R, T, A', () => {
    const r = stackResultFrom(new Float64Array([0.1, 0.3, 0.8, 0.6, 0.1, 0.1]));
    expect(r.R).toBeCloseTo(0.2, 15);
    expect(r.T).toBeCloseTo(0.7, 15);
    expect(r.A).toBeCloseTo(0.1, 15);
  });
});

describe('guard', () => {
  it('requireInRange names the field and the range', () => {
    expect(() => requireInRange('angleDeg', 91, 0, 90)).toThrow('angleDeg must be a number in [0, 90] (got 91)');
  });
  it('requireInteger rejects fractions', () => {
    expect(() => requireInteger('steps', 2.5, 1, 10)).toThrow(/integer/);
  });
});
