import { describe, expect, it } from 'vitest';
import { escapeCone, cuboidChipEscape } from '../../../src/lib/optics';
import { DEMO_SCENARIO } from '../../../src/lib/scenario/defaults';
import { resolveScenario } from '../../../src/lib/scenario/resolve';
import { escapeExport } from '../../../src/routes/escape/escape-export';
import { sideFromParam, sideToParam, sideValue, type Side } from '../../../src/routes/escape/sides';

const fallback: Side = { kind: 'scenario', part: 'encapsulant' };

describe('escape-cone page sides', () => {
  it('round-trips every kind of side through its link parameter', () => {
    const sides: Side[] = [
      { kind: 'scenario', part: 'chip' },
      { kind: 'scenario', part: 'outside' },
      { kind: 'material', id: 'sapphire-o' },
      { kind: 'index', n: 1.5 }
    ];
    for (const s of sides) expect(sideFromParam(sideToParam(s), fallback)).toEqual(s);
  });

  it('falls back on unknown, metal or out-of-range values', () => {
    for (const bad of ['mat:unobtainium', 'mat:ag', 'n:0', 'n:abc', 'n:7', 'base', 'mat:GaN']) {
      expect(sideFromParam(bad, fallback)).toBe(fallback);
    }
    expect(sideFromParam(null, fallback)).toBe(fallback);
  });

  it('takes the index from the scenario, the library or as typed', () => {
    const r = resolveScenario(DEMO_SCENARIO);
    expect(sideValue({ kind: 'scenario', part: 'chip' }, r).n).toBe(r.chip.n);
    expect(sideValue({ kind: 'index', n: 1.53 }, r)).toEqual({ n: 1.53, label: 'typed index', warning: null });
    // Sapphire ordinary ray near 450 nm ≈ 1.78 (Malitson & Dodge 1972 formula; loose check, 0.02).
    expect(Math.abs(sideValue({ kind: 'material', id: 'sapphire-o' }, r).n - 1.78)).toBeLessThan(0.02);
  });
});

describe('escapeExport', () => {
  it('writes inputs, fractions, the critical angle in degrees and the scenario as JSON', () => {
    const cone = escapeCone(2.5, 1);
    const doc = JSON.parse(
      escapeExport(DEMO_SCENARIO, 450, { n: 2.5, label: 'typed index', warning: null }, { n: 1, label: 'Air', warning: null }, cone, [
        cuboidChipEscape(2.5, 1, 1),
        cuboidChipEscape(2.5, 1, 6)
      ])
    );
    expect(doc.view).toBe('escape-cone');
    expect(doc.results.criticalAngleDeg).toBeCloseTo(23.578, 3); // asin(1/2.5), computed
    expect(doc.results.onePlanarFace.geometric).toBeCloseTo(0.04174, 5); // computed check value
    expect(doc.results.cuboidChip.map((c: { faces: number }) => c.faces)).toEqual([1, 6]);
    expect(doc.scenario).toEqual(DEMO_SCENARIO);
  });

  it('writes null (not NaN) for the critical angle when there is none', () => {
    const cone = escapeCone(1.4, 1.6);
    const text = escapeExport(DEMO_SCENARIO, 450, { n: 1.4, label: 'a', warning: null }, { n: 1.6, label: 'b', warning: null }, cone, []);
    expect(JSON.parse(text).results.criticalAngleDeg).toBeNull();
    expect(text).not.toMatch(/NaN|Infinity/);
  });
});
