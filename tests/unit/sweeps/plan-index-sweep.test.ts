import { describe, expect, it } from 'vitest';
import { DEFAULT_INDEX_VALUES, planIndexSweep } from '../../../src/lib/sweeps/plan-index-sweep';
import { assertInDelta } from '../../support/assert';
import { domePackage, ROUND_INDICES } from '../../support/fixtures';

describe('planIndexSweep(pkg, values)', () => {
  it('traces 1.0 to 2.0 in steps of 0.1 by default, exactly', () => {
    expect(DEFAULT_INDEX_VALUES).toEqual([1, 1.1, 1.2, 1.3, 1.4, 1.5, 1.6, 1.7, 1.8, 1.9, 2]);
    expect(planIndexSweep(domePackage(ROUND_INDICES)).points.map((p) => p.x)).toEqual(DEFAULT_INDEX_VALUES);
  });

  it('changes only the encapsulant index of each point and leaves the input package as it was', () => {
    const pkg = domePackage(ROUND_INDICES);
    const before = JSON.stringify(pkg);
    const plan = planIndexSweep(pkg, [1.2, 1.7]);
    expect(JSON.stringify(pkg)).toBe(before);
    for (const p of plan.points) {
      expect(p.pkg.encapsulant.n).toBe(p.x);
      expect({ ...p.pkg, encapsulant: { ...p.pkg.encapsulant, n: 1.5 } }).toEqual(pkg);
      expect(p.pkg.chip).not.toBe(pkg.chip);
    }
  });

  it('gives the closed form η_F(2.5 → 1.5)·(1 − 0.04) = 0.08444 at n = 1.5 (computed, 4 digits)', () => {
    // computed: η_F(2.5 → 1.5) = 0.08796 (escape cone ½∫T sin θ dθ: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5) and R_normal(1.5 → air) = 0.04 (common practice);
    // the table is rounded to 4 significant digits, so ±1e-5 on the product.
    const plan = planIndexSweep(domePackage(ROUND_INDICES), [1.5]);
    assertInDelta(plan.points[0].closedForm, 0.08796 * 0.96, 1e-5);
  });

  it('gives the bare-chip escape η_F(2.5 → 1) = 0.03243 at n = 1 (an air dome has no Fresnel loss)', () => {
    // computed; escape cone ½∫T sin θ dθ: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5, 4 significant digits → ±1e-5
    assertInDelta(planIndexSweep(domePackage(ROUND_INDICES), [1]).points[0].closedForm, 0.03243, 1e-5);
  });

  it('draws the closed form on a grid 4× finer, rising with the index from 1 to 2', () => {
    const plan = planIndexSweep(domePackage(ROUND_INDICES));
    expect(plan.closedFormLine).toHaveLength(41);
    expect(plan.closedFormLine[0].x).toBe(1);
    expect(plan.closedFormLine[40].x).toBe(2);
    for (let i = 1; i < plan.closedFormLine.length; i++) {
      expect(plan.closedFormLine[i].y).toBeGreaterThan(plan.closedFormLine[i - 1].y);
    }
  });

  it("marks the scenario's own index, or nothing when it lies outside the sweep", () => {
    expect(planIndexSweep(domePackage(ROUND_INDICES)).currentX).toBe(1.5);
    expect(planIndexSweep(domePackage(ROUND_INDICES), [1.6, 1.8]).currentX).toBeNull();
  });

  it('rejects a package without a dome and bad value lists with a RangeError naming the field', () => {
    const flat = domePackage(ROUND_INDICES);
    flat.encapsulant.shape = 'cylinder';
    expect(() => planIndexSweep(flat)).toThrow(/encapsulant\.shape/);
    expect(() => planIndexSweep(domePackage(ROUND_INDICES), [])).toThrow(/Encapsulant indices/);
    expect(() => planIndexSweep(domePackage(ROUND_INDICES), [1.5, 1.4])).toThrow(/increase/);
    expect(() => planIndexSweep(domePackage(ROUND_INDICES), [0.9])).toThrow(/\[1, 6\]/);
    expect(() => planIndexSweep(domePackage(ROUND_INDICES), [Number.NaN])).toThrow(RangeError);
  });

  it('rejects an invalid package through the tracer check (field named)', () => {
    const bad = domePackage(ROUND_INDICES);
    bad.chip.n = Number.NaN;
    expect(() => planIndexSweep(bad)).toThrow(/chip\.n/);
  });
});
