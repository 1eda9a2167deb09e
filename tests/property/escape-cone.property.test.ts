/**
 * Invariants of escape fractions over random chip and outside indices.
 *
 * Sources: geometric fraction (1 − cos θc)/2 and the Fresnel-weighted ½∫T sin θ dθ (E. F. Schubert,
 * Light-Emitting Diodes, 2nd ed., ch. 5, from memory); T ≤ 1 makes the Fresnel fraction at most the
 * geometric one; a planar stack never widens the escape cone because n·sin θ is conserved through
 * parallel layers (Born & Wolf, Principles of Optics, §1.5.4) — so its extraction is at most the
 * geometric fraction of the bare cone.
 *
 * Monotonicity holds while nOut ≤ nIn: a larger outside index widens the cone and lowers the Fresnel
 * loss inside it. Beyond nOut = nIn the whole hemisphere already escapes geometrically and the Fresnel
 * fraction falls again (external reflection grows), so the property is stated only up to nIn.
 *
 * Tolerances: QUAD = 1e-10, the accuracy the integrals are documented to (1e-12 for one cone, ~1e-10
 * for a stack), used as slack on every comparison of two integrals.
 */
import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { escapeCone } from '../../src/lib/optics/escape-cone';
import { cuboidChipEscape } from '../../src/lib/optics/chip-escape';
import { stackExtraction } from '../../src/lib/optics/stack-extraction';
import { check, real, RUNS } from './support';

const QUAD = 1e-10;

function inUnit(x: number): boolean {
  return x >= 0 && x <= 1;
}

describe('escapeCone(nIn, nOut)', () => {
  it(`gives every fraction in [0, 1] and fresnel ≤ geometric (${RUNS.many} cases)`, () => {
    check(
      'escape fractions bounded',
      fc.property(real(1, 6), real(1, 6), (nIn, nOut) => {
        const c = escapeCone(nIn, nOut);
        // smallAngle nOut²/(4 nIn²) is an approximation for nOut ≪ nIn, documented as such: not a fraction
        for (const [name, x] of Object.entries(c)) {
          if (name !== 'criticalAngleRad' && name !== 'smallAngle') expect(inUnit(x), `${name} ${x}`).toBe(true);
        }
        expect(c.criticalAngleRad > 0 && c.criticalAngleRad <= Math.PI / 2).toBe(true);
        expect(c.fresnel, 'fresnel ≤ geometric').toBeLessThanOrEqual(c.geometric + QUAD);
        expect(c.fresnelS, 'fresnelS ≤ geometric').toBeLessThanOrEqual(c.geometric + QUAD);
        expect(c.fresnelP, 'fresnelP ≤ geometric').toBeLessThanOrEqual(c.geometric + QUAD);
        expect(c.fresnelS, 'fresnelS ≤ fresnelP (Rp ≤ Rs)').toBeLessThanOrEqual(c.fresnelP + QUAD);
      }),
      RUNS.many
    );
  });

  it(`is monotone non-decreasing in the outside index up to the chip index (${RUNS.some} cases)`, () => {
    check(
      'escape monotone in nOut',
      fc.property(real(1, 6), real(0, 1), real(0, 1), (nIn, a, b) => {
        const lo = 1 + Math.min(a, b) * (nIn - 1);
        const hi = 1 + Math.max(a, b) * (nIn - 1);
        const cLo = escapeCone(nIn, lo);
        const cHi = escapeCone(nIn, hi);
        expect(cHi.geometric, `geometric at ${hi} vs ${lo}`).toBeGreaterThanOrEqual(cLo.geometric);
        expect(cHi.fresnel, `fresnel at ${hi} vs ${lo}`).toBeGreaterThanOrEqual(cLo.fresnel - QUAD);
        expect(cHi.fresnelS, 'fresnelS').toBeGreaterThanOrEqual(cLo.fresnelS - QUAD);
        expect(cHi.fresnelP, 'fresnelP').toBeGreaterThanOrEqual(cLo.fresnelP - QUAD);
      }),
      RUNS.some
    );
  });

  it(`keeps the geometric fraction non-decreasing beyond the chip index too (${RUNS.many} cases)`, () => {
    check(
      'geometric monotone in nOut, all indices',
      fc.property(real(1, 6), real(1, 6), real(1, 6), (nIn, a, b) => {
        const [lo, hi] = a <= b ? [a, b] : [b, a];
        expect(escapeCone(nIn, hi).geometric).toBeGreaterThanOrEqual(escapeCone(nIn, lo).geometric);
      }),
      RUNS.many
    );
  });
});

describe('cuboidChipEscape(nIn, nOut, faces)', () => {
  it(`gives fractions in [0, 1] and no more than the faces' sum (${RUNS.many} cases)`, () => {
    check(
      'chip escape bounded',
      fc.property(real(1, 6), real(1, 6), fc.constantFrom(1, 5, 6) as fc.Arbitrary<1 | 5 | 6>, (nIn, nOut, faces) => {
        const e = cuboidChipEscape(nIn, nOut, faces);
        expect(inUnit(e.fraction) && inUnit(e.fractionGeometric), `${e.fraction}, ${e.fractionGeometric}`).toBe(true);
        expect(e.fraction).toBeLessThanOrEqual(faces * e.perFace + QUAD);
        expect(e.fraction).toBeLessThanOrEqual(e.fractionGeometric + faces * QUAD);
        expect(e.conesOverlap).toBe(faces > 1 && e.criticalAngleRad > Math.PI / 4);
      }),
      RUNS.many
    );
  });
});

describe('stackExtraction(nIn, layers, nOut, wavelengthNm, mode)', () => {
  const layer = fc.record({ n: real(1, 4), k: fc.oneof(fc.constant(0), real(0, 0.05)), thicknessNm: real(0, 400) });
  it(`never beats the geometric escape cone of the bare interface (${RUNS.some} cases)`, () => {
    check(
      'stack extraction within the bare cone',
      fc.property(real(1.2, 4), fc.array(layer, { maxLength: 4 }), real(1, 2), real(300, 1000), fc.constantFrom('coherent', 'incoherent') as fc.Arbitrary<'coherent' | 'incoherent'>, (nIn, layers, nOut, wl, mode) => {
        const ex = stackExtraction(nIn, layers, nOut, wl, mode);
        const bare = escapeCone(nIn, nOut);
        expect(ex.escapeConeRad).toBe(bare.criticalAngleRad);
        for (const x of [ex.fresnel, ex.fresnelS, ex.fresnelP]) {
          expect(x >= -QUAD && x <= bare.geometric + QUAD, `extraction ${x} vs cone ${bare.geometric}`).toBe(true);
        }
      }),
      RUNS.some
    );
  });
});
