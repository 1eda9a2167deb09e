import { describe, expect, it } from 'vitest';
import { DEFAULT_SHAPE_VALUES, planShapeSweep } from '../../../src/lib/sweeps/plan-shape-sweep';
import { domePackage, ROUND_INDICES } from '../../support/fixtures';

describe('planShapeSweep(pkg, values)', () => {
  it('spans h/R = 0.3 to 2 by default and includes the hemisphere h/R = 1', () => {
    expect(DEFAULT_SHAPE_VALUES[0]).toBe(0.3);
    expect(DEFAULT_SHAPE_VALUES[DEFAULT_SHAPE_VALUES.length - 1]).toBe(2);
    expect(DEFAULT_SHAPE_VALUES).toContain(1);
  });

  it('keeps the radius and sets the height to (h/R)·R', () => {
    const plan = planShapeSweep(domePackage(ROUND_INDICES), [0.5, 1, 2]);
    expect(plan.points.map((p) => p.pkg.encapsulant.radiusMm)).toEqual([2.5, 2.5, 2.5]);
    expect(plan.points.map((p) => p.pkg.encapsulant.heightMm)).toEqual([1.25, 2.5, 5]);
  });

  it('draws the closed form flat, since it assumes a hemisphere whatever the height', () => {
    const plan = planShapeSweep(domePackage(ROUND_INDICES));
    const ys = new Set([...plan.points.map((p) => p.closedForm), ...plan.closedFormLine.map((p) => p.y)]);
    expect(ys.size).toBe(1);
    expect(plan.closedFormLabel).toMatch(/hemisphere/);
  });

  it("skips shapes too flat to hold the chip's top corners, and keeps the rest", () => {
    // R = 0.8 mm, chip 1 × 1 × 0.15 mm: a top corner (0.5, 0.5, 0.15) is inside the spheroid
    // x²/R² + y²/R² + z²/h² < 1 only when h > 0.15/√(1 − 0.5/0.64) = 0.3207 mm, i.e. h/R > 0.4009.
    const pkg = domePackage(ROUND_INDICES);
    pkg.encapsulant.radiusMm = 0.8;
    pkg.encapsulant.heightMm = 0.8;
    const plan = planShapeSweep(pkg, [0.3, 0.4, 0.41, 1]);
    expect(plan.skipped.map((s) => s.x)).toEqual([0.3, 0.4]);
    expect(plan.skipped[0].reason).toMatch(/too flat/);
    expect(plan.points.map((p) => p.x)).toEqual([0.41, 1]);
  });

  it('marks the scenario shape h/R', () => {
    const pkg = domePackage(ROUND_INDICES);
    pkg.encapsulant.heightMm = 3.5;
    expect(planShapeSweep(pkg).currentX).toBeCloseTo(1.4, 12);
  });

  it('rejects values outside [0.05, 10] naming the field', () => {
    expect(() => planShapeSweep(domePackage(ROUND_INDICES), [0.01])).toThrow(/Dome shapes h\/R.*\[0\.05, 10\]/);
  });
});
