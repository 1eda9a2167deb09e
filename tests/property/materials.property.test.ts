/**
 * Every material of the shipped library gives a physical index everywhere in its validity range, and
 * outside it either a finite value with a warning or a RangeError — never NaN.
 *
 * Physical index: finite n > 0 (metals go below 1, never to 0) and k ≥ 0 with N = n + ik (common
 * practice; Born & Wolf, Principles of Optics, §14.1 for the sign of k). No tolerance: these are
 * sign and finiteness checks.
 */
import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { listMaterials, indexAt, MATERIAL_LIMITS } from '../../src/lib/materials';
import { check, real, RUNS } from './support';

const materials = listMaterials();
const W = MATERIAL_LIMITS.wavelengthNm;

describe('indexAt(material, wavelengthNm) over the whole library', () => {
  it(`gives finite n > 0 and k ≥ 0 at random wavelengths inside each range (${RUNS.many} cases)`, () => {
    check(
      'library dispersion inside the range',
      fc.property(
        fc.constantFrom(...materials).chain((m) => real(m.validRangeNm.min, m.validRangeNm.max).map((wl) => [m, wl] as const)),
        ([m, wl]) => {
          const v = indexAt(m, wl);
          expect(v.n > 0 && Number.isFinite(v.n), `${m.id} n(${wl}) = ${v.n}`).toBe(true);
          expect(v.k >= 0 && Number.isFinite(v.k), `${m.id} k(${wl}) = ${v.k}`).toBe(true);
          expect(v.inRange).toBe(true);
          expect(v.warning).toBeUndefined();
        }
      ),
      RUNS.many
    );
  });

  it('checks every material at both ends of its range', () => {
    for (const m of materials) {
      for (const wl of [m.validRangeNm.min, m.validRangeNm.max]) {
        const v = indexAt(m, wl);
        expect(v.n > 0 && Number.isFinite(v.n) && v.k >= 0 && Number.isFinite(v.k), `${m.id} at ${wl} nm`).toBe(true);
      }
    }
  });

  it(`outside the range gives a finite value with a warning or a RangeError naming the range, never NaN (${RUNS.many} cases)`, () => {
    check(
      'library dispersion outside the range',
      fc.property(fc.constantFrom(...materials), real(W.min, W.max), (m, wl) => {
        fc.pre(wl < m.validRangeNm.min || wl > m.validRangeNm.max);
        let v;
        try {
          v = indexAt(m, wl);
        } catch (error) {
          expect(error).toBeInstanceOf(RangeError);
          expect((error as Error).message).toContain(`${m.validRangeNm.min}–${m.validRangeNm.max} nm`);
          return;
        }
        expect(v.n > 0 && Number.isFinite(v.n) && v.k >= 0 && Number.isFinite(v.k), `${m.id} at ${wl}: ${v.n}, ${v.k}`).toBe(true);
        expect(v.inRange).toBe(false);
        expect(v.warning, 'an extrapolated value always says so').toMatch(/valid range/);
      }),
      RUNS.many
    );
  });
});
