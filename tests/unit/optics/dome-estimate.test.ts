import { describe, it, expect } from 'vitest';
import { domeEstimate, type DomeInput } from '../../../src/lib/optics/dome-estimate';
import { escapeCone } from '../../../src/lib/optics/escape-cone';
import { assertInDelta, EPS } from '../../support/assert';

const base: DomeInput = { nChip: 2.5, nEnc: 1.5, nOut: 1, chipWidthMm: 1, chipLengthMm: 1, radiusMm: 2 };

describe('domeEstimate(input)', () => {
  it('gains nothing from a dome with the outside index (gain = 1 exactly)', () => {
    expect(domeEstimate({ ...base, nEnc: 1 }).gain).toBe(1);
  });
  it('uses the bare Fresnel escape cone for etaBare', () => {
    expect(domeEstimate(base).etaBare).toBe(escapeCone(2.5, 1).fresnel);
  });
  it('gains more with a denser encapsulant, up to the index of the chip', () => {
    const g = [1.3, 1.41, 1.5, 1.6].map((n) => domeEstimate({ ...base, nEnc: n }).gain);
    for (let i = 1; i < g.length; i++) expect(g[i]).toBeGreaterThan(g[i - 1]);
  });
  it('takes the half-diagonal √(w² + l²)/2 and scales the no-TIR radius as r nEnc / nOut (4 ε)', () => {
    const r = domeEstimate({ ...base, chipWidthMm: 0.6, chipLengthMm: 0.8 });
    assertInDelta(r.halfDiagonalMm, 0.5, EPS);
    assertInDelta(r.minRadiusNoTirMm, 0.75, 4 * EPS);
  });
  it('says noTir only when the radius reaches the limit', () => {
    const limit = domeEstimate(base).minRadiusNoTirMm;
    expect(domeEstimate({ ...base, radiusMm: limit }).noTir).toBe(true);
    expect(domeEstimate({ ...base, radiusMm: limit * (1 - 1e-9) }).noTir).toBe(false);
  });
  it.each(['nChip', 'nEnc', 'nOut', 'chipWidthMm', 'chipLengthMm', 'radiusMm'] as const)(
    'rejects a NaN %s with a RangeError naming it',
    (field) => {
      expect(() => domeEstimate({ ...base, [field]: NaN })).toThrow(new RegExp(field));
    }
  );
});
