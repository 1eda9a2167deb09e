/**
 * Optic designers over random sizes, indices and shapes: each either returns a profile of finite points within
 * its box, or refuses with a one-line RangeError naming a field — never NaN, never another kind of error.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { designOptic, profileCsv, type OpticDesignOptions } from '../../src/lib/optic-design';
import { check, real } from './support';

const options: fc.Arbitrary<OpticDesignOptions> = fc.record({
  type: fc.constantFrom('reflector', 'lens', 'tir'),
  shapeIndex: fc.integer({ min: 0, max: 1 }),
  exitDiameterMm: real(0.5, 200),
  heightMm: real(0.2, 200),
  n: real(1.05, 2.6),
  gapMm: fc.oneof(fc.constant(0), real(0, 5)),
  targetBeamDeg: fc.oneof(fc.constant(undefined), real(1, 120)),
  sourceWidthMm: fc.oneof(fc.constant(undefined), real(0.1, 10)),
  exitFace: fc.constantFrom('flat', 'lens')
}).map((o) => ({
  type: o.type as OpticDesignOptions['type'],
  shape: o.type === 'reflector' ? (['paraboloid', 'cpc'] as const)[o.shapeIndex] : o.type === 'lens' ? (['aspheric', 'plano-convex'] as const)[o.shapeIndex] : 'tir',
  exitDiameterMm: o.exitDiameterMm,
  heightMm: o.heightMm,
  n: o.n,
  gapMm: o.gapMm,
  targetBeamDeg: o.targetBeamDeg,
  source: o.sourceWidthMm === undefined ? undefined : { shape: 'rect' as const, widthMm: o.sourceWidthMm },
  exitFace: o.exitFace as 'flat' | 'lens',
  toleranceMm: 0.01
}));

describe('optic designers (property)', () => {
  it('design or refuse in one line; a design has finite points inside its box and a CSV without NaN', () => {
    let designed = 0;
    check(
      'optic design: finite profile or one-line RangeError',
      fc.property(options, (o) => {
        let d;
        try {
          d = designOptic(o);
        } catch (e) {
          expect(e).toBeInstanceOf(RangeError);
          expect((e as Error).message).toMatch(/^[a-zA-Z.]+[ :][^\n]*$/);
          expect((e as Error).message).not.toMatch(/NaN/);
          return;
        }
        designed++;
        for (const s of d.surfaces) {
          for (let i = 0; i < s.r.length; i++) {
            expect(Number.isFinite(s.r[i]) && Number.isFinite(s.z[i])).toBe(true);
            expect(s.r[i]).toBeGreaterThanOrEqual(0);
            expect(s.r[i]).toBeLessThanOrEqual(o.exitDiameterMm / 2 + 1e-9);
          }
        }
        for (const v of [d.rimAngleRad, d.collectionHalfAngleRad, d.heightMm, d.gapMm]) expect(Number.isFinite(v)).toBe(true);
        expect(profileCsv(d)).not.toMatch(/NaN|Infinity/);
      }),
      300
    );
    expect(designed).toBeGreaterThan(30); // the generator reaches designs, not only refusals
  });
});
