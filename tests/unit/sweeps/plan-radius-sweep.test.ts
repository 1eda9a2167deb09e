import { describe, expect, it } from 'vitest';
import { planRadiusSweep } from '../../../src/lib/sweeps/plan-radius-sweep';
import { assertInDelta } from '../../support/assert';
import { domePackage, ROUND_INDICES } from '../../support/fixtures';

const HALF_DIAGONAL = Math.SQRT1_2; // 1 × 1 mm chip: r = √2/2 mm

describe('planRadiusSweep(pkg, values)', () => {
  it('sets R = x·r with r the half-diagonal, keeping the shape h/R', () => {
    const pkg = domePackage(ROUND_INDICES);
    pkg.encapsulant.heightMm = 1.25; // h/R = 0.5
    const plan = planRadiusSweep(pkg, [1.5, 3]);
    for (const p of plan.points) {
      assertInDelta(p.pkg.encapsulant.radiusMm, p.x * HALF_DIAGONAL, 4 * Number.EPSILON * p.x);
      assertInDelta(p.pkg.encapsulant.heightMm / p.pkg.encapsulant.radiusMm, 0.5, 4 * Number.EPSILON);
    }
  });

  it('marks the no-TIR radius at R/r = n_enc/n_out: 1 × 1 mm chip, n 1.41 → R ≥ 0.997 mm (dome: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5; sine rule, Born & Wolf §4.2.3)', () => {
    const pkg = domePackage(ROUND_INDICES);
    pkg.encapsulant.n = 1.41;
    const plan = planRadiusSweep(pkg);
    // computed; dome: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5; sine rule, Born & Wolf §4.2.3: R_min = 0.7071 · 1.41 = 0.997 mm, so R_min / r = 1.41 (rounding of the table ±5e-4 mm)
    assertInDelta(plan.marker!.x * HALF_DIAGONAL, 0.997, 5e-4);
    assertInDelta(plan.marker!.x, 1.41, 1e-12);
    expect(plan.marker!.label).toMatch(/no-TIR radius\): R\/r = 1\.41/);
  });

  it("skips radii too small to hold the chip's top corners", () => {
    // Hemisphere over a 1 × 1 × 0.15 mm chip: corner inside ⇔ R² > r² + H² ⇔ R/r > √(1 + 0.0225/0.5) = 1.02225
    const plan = planRadiusSweep(domePackage(ROUND_INDICES), [1.02, 1.023, 2]);
    expect(plan.skipped.map((s) => s.x)).toEqual([1.02]);
    expect(plan.skipped[0].reason).toMatch(/too small/);
    expect(plan.points.map((p) => p.x)).toEqual([1.023, 2]);
  });

  it('marks the current R/r of the scenario (2.5 mm over 0.7071 mm = 3.536)', () => {
    assertInDelta(planRadiusSweep(domePackage(ROUND_INDICES)).currentX!, 2.5 / HALF_DIAGONAL, 1e-12);
  });

  it('rejects values below R/r = 1 naming the field', () => {
    expect(() => planRadiusSweep(domePackage(ROUND_INDICES), [0.5, 2])).toThrow(/Dome radii R\/r/);
  });
});
