// Tests of the materials table rows (src/routes/materials/material-row.ts) on the shipped library.
import { describe, expect, it } from 'vitest';
import { findMaterial } from '../../../src/lib/materials';
import { matchesFilter, materialRow, modelLabel } from '../../../src/routes/materials/material-row';
import { assertInDelta } from '../../support/assert';

describe('materialRow(material, wavelengthNm)', () => {
  it('gives GaN n(450 nm) = 2.4869 (Barker & Ilegems, Phys. Rev. B 7, 743 (1973), formula computed; ±5e-5)', () => {
    const r = materialRow(findMaterial('gan')!, 450);
    assertInDelta(r.n!, 2.4869, 5e-5);
    expect(r.inRange).toBe(true);
    expect(r.model).toBe('Sellmeier (C in µm)');
  });

  it('gives a reason instead of a number across a pole (GaAs formula pole at 874.6 nm: Skauli et al., J. Appl. Phys. 94, 6447 (2003))', () => {
    const r = materialRow(findMaterial('gaas')!, 450);
    expect(r.n).toBeNull();
    expect(r.inRange).toBe(false);
    expect(r.reason).toMatch(/pole at 874\.6 nm/);
  });

  it('names the two Sellmeier forms by the unit of C', () => {
    expect(modelLabel(findMaterial('pmma')!)).toBe('Sellmeier, glass form (C in µm²)');
    expect(modelLabel(findMaterial('fused-silica')!)).toBe('Sellmeier (C in µm)');
  });
});

describe('matchesFilter(material, text, category)', () => {
  it('matches name, alias and source case-insensitively, within a category', () => {
    const m = findMaterial('fused-silica')!;
    expect(matchesFilter(m, 'MALITSON', 'all')).toBe(true);
    expect(matchesFilter(m, 'silica', 'optic')).toBe(true);
    expect(matchesFilter(m, 'silica', 'metal')).toBe(false);
    expect(matchesFilter(m, 'zzz', 'all')).toBe(false);
  });
});
