import { describe, it, expect } from 'vitest';
import { cuboidChipEscape, type ChipFaces } from '../../../src/lib/optics/chip-escape';
import { escapeCone } from '../../../src/lib/optics/escape-cone';
import { assertInDelta, EPS } from '../../support/assert';

describe('cuboidChipEscape(nIn, nOut, faces)', () => {
  it('sums one Fresnel-weighted cone per face (4 ε)', () => {
    const one = escapeCone(2.5, 1).fresnel;
    for (const f of [1, 5, 6] as const) {
      const r = cuboidChipEscape(2.5, 1, f);
      assertInDelta(r.fraction, f * one, 4 * EPS);
      expect(r.perFace).toBe(one);
      expect(r.faces).toBe(f);
    }
  });

  it('reports no overlap while θc ≤ 45° (2.5 → 1: 23.6°) and leaves the note empty', () => {
    const r = cuboidChipEscape(2.5, 1, 6);
    expect(r.conesOverlap).toBe(false);
    expect(r.clamped).toBe(false);
    expect(r.note).toBe('');
  });

  it('flags overlapping cones when θc > 45° (1.3 → 1: 50.3°) and says the sum overestimates', () => {
    const r = cuboidChipEscape(1.3, 1, 5);
    expect(r.conesOverlap).toBe(true);
    expect(r.note).toMatch(/overlap/);
    expect(r.note).toMatch(/overestimate/);
    expect(r.note).toMatch(/50\.3°/);
  });

  it('never flags overlap for a single face', () => {
    expect(cuboidChipEscape(1.3, 1, 1).conesOverlap).toBe(false);
  });

  it('clamps a sum above 1 to 1 and says so (index-matched chip, six faces)', () => {
    const r = cuboidChipEscape(1.5, 1.5, 6);
    expect(r.fraction).toBe(1);
    expect(r.fractionGeometric).toBe(1);
    expect(r.clamped).toBe(true);
    expect(r.note).toMatch(/clamped/);
  });

  it('rejects a face count other than 1, 5 or 6, and NaN indices', () => {
    expect(() => cuboidChipEscape(2.5, 1, 2 as ChipFaces)).toThrow(/faces must be 1, 5 or 6/);
    expect(() => cuboidChipEscape(NaN, 1, 1)).toThrow(/nIn/);
  });
});
