// Tests of the "add a material" form reader (src/lib/materials-user/user-material-form.ts).
import { describe, expect, it } from 'vitest';
import { indexAt } from '../../../src/lib/materials';
import { emptyForm, readUserMaterialForm, userMaterialId, type UserMaterialForm } from '../../../src/lib/materials-user/user-material-form';
import { assertInDelta } from '../../support/assert';

const none = new Set<string>();

function form(patch: Partial<UserMaterialForm>): UserMaterialForm {
  return { ...emptyForm(), ...patch };
}

// Fused silica, I. H. Malitson, JOSA 55, 1205 (1965): resonance form, C in µm.
const malitson = [
  { B: '0.6961663', C: '0.0684043' },
  { B: '0.4079426', C: '0.1162414' },
  { B: '0.8974794', C: '9.896161' }
];
// N-BK7, SCHOTT data sheet: glass-catalogue form, C in µm².
const schott = [
  { B: '1.03961212', C: '0.00600069867' },
  { B: '0.231792344', C: '0.0200179144' },
  { B: '1.01046945', C: '103.560653' }
];

describe('readUserMaterialForm(form, takenIds)', () => {
  it('reads the resonance form (C in µm): fused silica n(587.6 nm) = 1.45846 (Malitson 1965; ±5e-6)', () => {
    const r = readUserMaterialForm(form({ name: 'My silica', terms: malitson, rangeMinNm: '210', rangeMaxNm: '3710' }), none);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.material.id).toBe('user-my-silica');
    expect(r.material.provenance).toBe('user supplied');
    expect(r.material.source).toBe('entered by the user');
    assertInDelta(indexAt(r.material, 587.6).n, 1.45846, 5e-6);
  });

  it('reads the glass form (C in µm²): N-BK7 nd(587.56 nm) = 1.5168 (SCHOTT data sheet; ±5e-5)', () => {
    const r = readUserMaterialForm(form({ name: 'Crown', model: 'sellmeier-glass', terms: schott, rangeMinNm: '300', rangeMaxNm: '2500' }), none);
    expect(r.ok).toBe(true);
    if (r.ok) assertInDelta(indexAt(r.material, 587.56).n, 1.5168, 5e-5);
  });

  it('keeps the two forms apart: glass-form numbers read as µm give a different index (the commonest bug, common practice)', () => {
    const asResonance = readUserMaterialForm(form({ name: 'Mixed', model: 'sellmeier', terms: schott.slice(0, 2), rangeMinNm: '300', rangeMaxNm: '2500' }), none);
    const asGlass = readUserMaterialForm(form({ name: 'Mixed', model: 'sellmeier-glass', terms: schott.slice(0, 2), rangeMinNm: '300', rangeMaxNm: '2500' }), none);
    expect(asResonance.ok && asGlass.ok).toBe(true);
    if (asResonance.ok && asGlass.ok) {
      expect(Math.abs(indexAt(asResonance.material, 587.56).n - indexAt(asGlass.material, 587.56).n)).toBeGreaterThan(1e-3);
    }
  });

  it('reads Cauchy coefficients with B and C defaulting to 0, and a constant k', () => {
    const r = readUserMaterialForm(form({ name: 'Resin', model: 'cauchy', cauchyA: '1.5', cauchyB: '0.004', k: '0.001', rangeMinNm: '400', rangeMaxNm: '800' }), none);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    // n = A + B/λ² at λ = 0.5 µm: 1.5 + 0.004/0.25 = 1.516 (exact arithmetic, 1e-12 for roundoff)
    const v = indexAt(r.material, 500);
    assertInDelta(v.n, 1.516, 1e-12);
    expect(v.k).toBe(0.001);
  });

  it('reads a pasted n,k table, its span as the default valid range', () => {
    const r = readUserMaterialForm(form({ name: 'Film', model: 'table', table: 'λ n k\n400 1.52 0.001\n800 1.49 0' }), none);
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.material.validRangeNm).toEqual({ min: 400, max: 800 });
  });

  it('names each bad field with its allowed range', () => {
    const r = readUserMaterialForm(
      form({ name: ' ', terms: [{ B: 'x', C: '-1' }], k: '60', rangeMinNm: '50', rangeMaxNm: '' }),
      none
    );
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(Object.fromEntries(r.errors)).toEqual({
      name: 'Name must be 1 to 120 characters.',
      'terms.0.B': 'B1 must be a number.',
      'terms.0.C': 'C1 (µm) must be a number ≥ 0.',
      k: 'Extinction k must be a number between 0 and 50.',
      rangeMinNm: 'Valid from must be a wavelength between 100 and 20000 nm.',
      rangeMaxNm: 'Valid to must be a wavelength between 100 and 20000 nm.'
    });
  });

  it('refuses a formula with a pole inside its valid range, saying where', () => {
    // Resonance at C = 0.5 µm → pole at 500 nm, inside 400–900 nm.
    const r = readUserMaterialForm(form({ name: 'Pole', terms: [{ B: '1', C: '0.5' }], rangeMinNm: '400', rangeMaxNm: '900' }), none);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors.get('model')).toMatch(/^The formula has a pole at 500 nm inside validRangeNm 400–900 nm/);
  });

  it('reports a table error with its line number', () => {
    const r = readUserMaterialForm(form({ name: 'T', model: 'table', table: '400 1.5\n500 abc' }), none);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors.get('table')).toMatch(/^Table, line 2: /);
  });

  it('needs at least one Sellmeier term', () => {
    const r = readUserMaterialForm(form({ name: 'Empty', rangeMinNm: '400', rangeMaxNm: '800' }), none);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors.get('terms.0.B')).toMatch(/at least one Sellmeier term/);
  });
});

describe('userMaterialId(name, takenIds)', () => {
  it('makes a lower-case id that the library and the user do not use yet', () => {
    expect(userMaterialId('My SiO₂ film!', none)).toBe('user-my-sio2-film');
    expect(userMaterialId('Oxide', new Set(['user-oxide', 'user-oxide-2']))).toBe('user-oxide-3');
    expect(userMaterialId('∞', none)).toBe('user-material');
    expect(userMaterialId('x'.repeat(100), none).length).toBeLessThanOrEqual(40);
  });
});
