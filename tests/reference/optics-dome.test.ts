/**
 * Reference checks for the closed-form dome estimate (dome: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5; sine rule, Born & Wolf §4.2.3).
 * Gains are tagged "computed" there and given to 3 significant figures: tolerance 0.005.
 */
import { describe, it, expect } from 'vitest';
import { domeEstimate } from '../../src/lib/optics/dome-estimate';
import { assertInDelta } from '../support/assert';

const dome = (nChip: number, nEnc: number) =>
  domeEstimate({ nChip, nEnc, nOut: 1, chipWidthMm: 1, chipLengthMm: 1, radiusMm: 5 });

describe('reference: dome encapsulant (dome: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5; sine rule, Born & Wolf §4.2.3)', () => {
  it.each([
    [3.5, 1.5, 2.62],
    [2.5, 1.41, 2.26],
    [2.5, 1.5, 2.6],
    [2.5, 1.53, 2.73]
  ])('chip %s under a %s dome: gain ≈ %s [computed]', (nChip, nEnc, gain) => {
    assertInDelta(dome(nChip, nEnc).gain, gain, 0.005);
  });

  // Schubert, Light-Emitting Diodes, 2nd ed.: encapsulation raises extraction "by a factor of about 2–3"
  // (from memory, loose: the whole 2–3 band is the tolerance).
  it.each([[3.5, 1.5], [2.5, 1.41], [2.5, 1.5], [2.5, 1.53]])(
    'chip %s under %s: gain within "about 2–3" [from memory: Schubert]',
    (nChip, nEnc) => {
      const g = dome(nChip, nEnc).gain;
      expect(g).toBeGreaterThanOrEqual(2);
      expect(g).toBeLessThanOrEqual(3);
    }
  );

  it('no-TIR dome radius for a 1 × 1 mm chip in 1.41 is 0.997 mm [computed; sine rule, aplanatic point (Born & Wolf, from memory)]', () => {
    const r = domeEstimate({ nChip: 2.5, nEnc: 1.41, nOut: 1, chipWidthMm: 1, chipLengthMm: 1, radiusMm: 1 });
    assertInDelta(r.minRadiusNoTirMm, 0.997, 5e-4);
    expect(r.noTir).toBe(true);
    expect(domeEstimate({ nChip: 2.5, nEnc: 1.41, nOut: 1, chipWidthMm: 1, chipLengthMm: 1, radiusMm: 0.99 }).noTir).toBe(false);
  });
});
