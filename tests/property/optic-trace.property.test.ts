/**
 * Random optics over random Lambertian sources: every result is a finite number, the ledger closes, and the
 * traced beam never holds more of the flux in a cone than the étendue allows (W. T. Welford, R. Winston, High
 * Collection Nonimaging Optics, 1989, ch. 2: flux f of a uniform Lambertian source needs sin θ_f ≥ √f sin θ_limit;
 * 3 % slack for the 1° zones and the counting noise of 4000 rays).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { coneHoldingDeg, runOptic } from '../../src/lib/optic-trace';
import { check } from './support';

describe('optic trace, random designs', () => {
  it('no NaN, the ledger closes, the étendue holds', () => {
    check(
      'optic trace over random sizes and materials',
      fc.property(
        fc.constantFrom('reflector', 'lens', 'tir') as fc.Arbitrary<'reflector' | 'lens' | 'tir'>,
        fc.double({ min: 10, max: 40, noNaN: true }),
        fc.double({ min: 0.6, max: 1.2, noNaN: true }),
        fc.double({ min: 0.2, max: 2, noNaN: true }),
        fc.constantFrom('pmma', 'polycarbonate', 'soda-lime-glass', '1.6'),
        (type, exit, heightRatio, source, material) => {
          let run;
          try {
            run = runOptic({
              design: { type, exitDiameterMm: exit, heightMm: exit * heightRatio, gapMm: 0.2, material },
              source: { kind: 'lambertian', shape: 'rect', widthMm: source },
              rays: 4000,
              seed: 1
            });
          } catch (e) {
            // a design the designer refuses says so in one line naming the field
            expect(e).toBeInstanceOf(RangeError);
            expect((e as Error).message).not.toContain('\n');
            return;
          }
          const r = run.results;
          for (const v of [r.efficiency, r.efficiencyInBeam, r.beamAngleDeg, r.fieldAngleDeg, r.peakCdPerKlm, r.etendueLimitDeg, ...Object.values(r.ledger)]) {
            expect(Number.isFinite(v)).toBe(true);
          }
          expect(Object.values(r.ledger).reduce((a, b) => a + b, 0)).toBeCloseTo(1, 12);
          const f = 0.5;
          const cone = coneHoldingDeg(run.tally, run.tally.launched * r.sourceFraction, f);
          const bound = (2 * Math.asin(Math.sqrt(f) * Math.sin((r.etendueLimitDeg * Math.PI) / 360)) * 180) / Math.PI;
          expect(cone).toBeGreaterThanOrEqual(bound * 0.97);
          // the beam's own étendue use stays at or below 1 (5 % slack for the 1° zones and 4000 rays)
          expect(r.etendueRatio).toBeLessThanOrEqual(1.05);
        }
      ),
      30
    );
  });
});
