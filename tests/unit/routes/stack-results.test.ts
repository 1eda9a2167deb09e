// Tests of the /stack page's computation (src/routes/stack/stack-results.ts, stack-layers.ts),
// against values computed from the escape-cone integral (Schubert, Light-Emitting Diodes, 2nd ed., ch. 5) and
// the stack formulas (Macleod, Thin-Film Optical Filters, 4th ed., ch. 2).
import { describe, expect, it } from 'vitest';
import { findMaterial } from '../../../src/lib/materials';
import { defaultStack, type StackDoc, type StackItem } from '../../../src/routes/stack/stack-doc';
import { expandStack } from '../../../src/routes/stack/stack-layers';
import { computeStack, reflectanceSpectrum } from '../../../src/routes/stack/stack-results';
import { assertInDelta } from '../../support/assert';

const find = (id: string) => findMaterial(id);
const typed = (n: number, thicknessNm: number, k = 0): StackItem => ({ kind: 'layer', medium: { kind: 'index', n, k }, thicknessNm });
const doc = (mode: 'thin' | 'thick', items: StackItem[]): StackDoc => ({ version: 2, mode, exit: 'outside', items, userMaterials: [] });
const medium = (n: number, label = 'typed') => ({ label, n, k: 0 });

function results(d: StackDoc, nChip: number, nExit: number, wavelengthNm = 450) {
  const r = computeStack(d, medium(nChip), medium(nExit), wavelengthNm, find);
  if (!r.ok) throw new Error(r.problems[0].message);
  return r.results;
}

describe('computeStack(doc, chip, exit, wavelengthNm, find)', () => {
  // Tolerance 5e-5: the notes give four decimals, so half a unit in the last place.
  it('incoherent 2.5 → 1.5 → 1.0 at normal incidence: T = 0.9023, bare 0.8163 (computed; incoherent and thin-film stacks: Macleod, Thin-Film Optical Filters, 4th ed., ch. 2)', () => {
    const r = results(doc('thick', [typed(1.5, 1e6)]), 2.5, 1);
    assertInDelta(r.normal.T, 0.9023, 5e-5);
    assertInDelta(1 - r.bareNormalR, 0.8163, 5e-5);
  });

  it('incoherent geometric ladder 2.5 → 1 in N equal-ratio steps: N = 2: 0.9035, 5: 0.9596 (computed; incoherent and thin-film stacks: Macleod, Thin-Film Optical Filters, 4th ed., ch. 2)', () => {
    for (const [N, T] of [
      [2, 0.9035],
      [5, 0.9596]
    ]) {
      const items: StackItem[] = [];
      for (let j = 1; j < N; j++) items.push(typed(2.5 * Math.pow(1 / 2.5, j / N), 1e6));
      assertInDelta(results(doc('thick', items), 2.5, 1).normal.T, T, 5e-5, `N = ${N}`);
    }
  });

  it('quarter-wave MgF2 (1.38) on glass (1.52) at the design wavelength: R = 0.01260, bare 0.04258 (incoherent and thin-film stacks: Macleod, Thin-Film Optical Filters, 4th ed., ch. 2; ±5e-6)', () => {
    const r = results(doc('thin', [typed(1.38, 550 / (4 * 1.38))]), 1.52, 1, 550);
    assertInDelta(r.normal.R, 0.0126, 5e-6);
    assertInDelta(r.bareNormalR, 0.04258, 5e-6);
  });

  it('a half-wave layer at its design wavelength reflects like the bare interface (common practice; 1e-12 for roundoff)', () => {
    const r = results(doc('thin', [typed(1.8, 450 / (2 * 1.8))]), 2.45, 1);
    assertInDelta(r.normal.R, r.bareNormalR, 1e-12);
  });

  it('no layers gives the bare escape cone: 2.45 → 1, θc 24.09°, η_F 0.03408 (computed; escape cone ½∫T sin θ dθ: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5; ±5e-6)', () => {
    const r = results(doc('thin', []), 2.45, 1);
    assertInDelta(r.escapeConeDeg!, 24.09, 5e-3);
    assertInDelta(r.extraction.fresnel, 0.03408, 5e-6);
    assertInDelta(r.extraction.gainOverBare, 1, 1e-9);
  });

  it('keeps the escape cone whatever the stack (n·sin θ invariance; exact: both are asin(n_exit/n_chip))', () => {
    const bare = results(doc('thin', []), 2.45, 1).escapeConeDeg;
    const stacked = results(doc('thick', [typed(1.8, 5e4), typed(1.2, 5e4)]), 2.45, 1);
    expect(stacked.escapeConeDeg).toBe(bare);
    expect(stacked.fate.join(' ')).toContain('cannot widen the 24.1° escape cone into typed');
  });

  it('samples T(θ) every 0.5° from 0° to 90°, zero beyond the escape cone', () => {
    const r = results(defaultStack(), 2.45, 1);
    expect(r.angle.x).toHaveLength(181);
    expect(r.angle.x[180]).toBe(90);
    const beyond = r.angle.x.findIndex((x) => x > 24.1);
    for (let i = beyond; i < 181; i++) expect(r.angle.T[i]).toBe(0);
  });

  it('reports a missing material as a problem of its item, not a NaN', () => {
    const r = computeStack(doc('thin', [typed(1.5, 10), { kind: 'layer', medium: { kind: 'material', id: 'user-gone' }, thicknessNm: 10 }]), medium(2.45), medium(1), 450, find);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems).toEqual([{ item: 1, message: "Layer 2: material 'user-gone' is neither in the library nor among your materials. Pick another." }]);
  });

  it('notes a chip or exit extinction that the outer media leave out', () => {
    const r = computeStack(doc('thin', []), { label: 'lossy', n: 2.45, k: 0.01 }, medium(1), 450, find);
    expect(r.ok && r.results.notes[0]).toMatch(/chip's extinction k = 0.01 is left out/);
  });
});

describe('expandStack(items, wavelengthNm, find)', () => {
  it('expands a graded section into its sublayers, in order, with their item', () => {
    const ex = expandStack([typed(2, 10), { kind: 'graded', fromN: 2.5, toN: 1, thicknessNm: 500, profile: 'linear', sublayers: 5 }], 450, find);
    expect(ex.ok).toBe(true);
    if (!ex.ok) return;
    expect(ex.layers).toHaveLength(6);
    // Midpoint rule: first sublayer at t = 0.1 of a linear 2.5 → 1 profile is 2.35 (optics core example)
    assertInDelta(ex.layers[1].n, 2.35, 1e-12);
    expect(ex.layers.slice(1).every((l) => l.item === 1 && l.subCount === 5 && l.thicknessNm === 100)).toBe(true);
  });

  it('takes library materials at the wavelength and passes on range warnings', () => {
    const ex = expandStack([{ kind: 'layer', medium: { kind: 'material', id: 'silicone-methyl' }, thicknessNm: 10 }], 1000, find);
    expect(ex.ok).toBe(true);
    if (ex.ok) expect(ex.warnings[0]).toMatch(/^Layer 1: .*above its valid range/);
  });
});

describe('reflectanceSpectrum(items, chipAt, exitAt, find, from, to, points)', () => {
  it('re-evaluates every medium at each wavelength and leaves NaN where one has no index', () => {
    const items: StackItem[] = [typed(1.38, 550 / (4 * 1.38))];
    const s = reflectanceSpectrum(items, () => 1.52, (w) => {
      if (w > 700) throw new RangeError('no index');
      return 1;
    }, find, 500, 800, 7);
    expect(s.wavelengthNm).toEqual([500, 550, 600, 650, 700, 750, 800]);
    assertInDelta(s.R[1], 0.0126, 5e-6); // the quarter-wave design point (incoherent and thin-film stacks: Macleod, Thin-Film Optical Filters, 4th ed., ch. 2)
    expect(s.R[1]).toBeLessThan(s.R[0]);
    expect(Number.isNaN(s.R[5]) && Number.isNaN(s.bareR[6])).toBe(true);
  });
});

describe('computeStack notes', () => {
  it('warns that thick-layer mode is the wrong model for a metal film, and not in thin-film mode', () => {
    // Silver at 550 nm, n = 0.04382, k = 3.6101 (K. M. McPeak et al., ACS Photonics 2, 326 (2015))
    const silver = typed(0.04382, 20, 3.6101);
    const thick = computeStack(doc('thick', [silver]), medium(2.45), medium(1), 550, find);
    expect(thick.ok && thick.results.notes.join(' ')).toMatch(/Use thin-film mode for metal/);
    const thin = computeStack(doc('thin', [silver]), medium(2.45), medium(1), 550, find);
    expect(thin.ok && thin.results.notes).toEqual([]);
  });
});
