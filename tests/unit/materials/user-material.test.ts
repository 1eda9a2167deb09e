import { describe, expect, it } from 'vitest';
import { indexAt, validateUserMaterial } from '../../../src/lib/materials';

const base = {
  id: 'my-film',
  name: 'My film',
  category: 'layer',
  dispersion: { model: 'cauchy', A: 1.8, B: 0.01, C: 0 },
  validRangeNm: { min: 400, max: 800 }
};

function errorsOf(input: unknown) {
  const r = validateUserMaterial(input);
  if (r.ok) throw new Error('expected errors');
  return r.errors;
}

describe('validateUserMaterial(json)', () => {
  it('accepts a minimal material and fills aliases, source and provenance', () => {
    const r = validateUserMaterial(base);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.material.aliases).toEqual([]);
    expect(r.material.provenance).toBe('user supplied');
    expect(indexAt(r.material, 500).n).toBeCloseTo(1.8 + 0.01 / 0.25, 14);
  });

  it('takes the validity range of a table from its rows when none is given', () => {
    const r = validateUserMaterial({ id: 'thin-metal', name: 'Thin metal', category: 'metal', dispersion: { model: 'table', rows: [[400, 0.1, 2], [700, 0.2, 4]] } });
    expect(r.ok && r.material.validRangeNm).toEqual({ min: 400, max: 700 });
  });

  it('rejects non-objects with one whole-input error', () => {
    for (const bad of [null, 3, 'x', [base]]) {
      expect(errorsOf(bad)).toEqual([{ path: '', message: expect.stringContaining('JSON object') }]);
    }
  });

  it('names each bad field by path with the allowed range', () => {
    const errors = errorsOf({ ...base, id: 'Bad Id', category: 'thing', validRangeNm: { min: 50, max: 800 } });
    const byPath = Object.fromEntries(errors.map((e) => [e.path, e.message]));
    expect(byPath.id).toMatch(/lower-case letters, digits or dashes/);
    expect(byPath.category).toMatch(/one of: semiconductor, substrate/);
    expect(byPath['validRangeNm.min']).toMatch(/\[100, 20000\] nm/);
  });

  it('names an unknown dispersion model and lists the known ones', () => {
    const errors = errorsOf({ ...base, dispersion: { model: 'lorentz' } });
    expect(errors[0].path).toBe('dispersion.model');
    expect(errors[0].message).toMatch(/sellmeier, sellmeier-glass, cauchy, formula or table/);
  });

  it('reports unknown fields (typos) by name', () => {
    const errors = errorsOf({ ...base, validRange: { min: 1, max: 2 } });
    expect(errors.some((e) => e.message.includes('"validRange"'))).toBe(true);
  });

  it('rejects a table row with k < 0 at the row and column', () => {
    const errors = errorsOf({ ...base, dispersion: { model: 'table', rows: [[400, 1.5, 0], [800, 1.4, -0.1]] } });
    expect(errors).toContainEqual({ path: 'dispersion.rows.1.2', message: 'dispersion.rows.1.2 k must be in [0, 50]' });
  });

  it('rejects table rows out of order and a range wider than the table', () => {
    expect(errorsOf({ ...base, dispersion: { model: 'table', rows: [[800, 1.5, 0], [400, 1.4, 0]] } })[0].message).toMatch(/ascend/);
    expect(errorsOf({ ...base, validRangeNm: { min: 300, max: 800 }, dispersion: { model: 'table', rows: [[400, 1.5, 0], [800, 1.4, 0]] } })[0].message).toMatch(
      /within the table's wavelengths, 400–800 nm/
    );
  });

  it('rejects an inverted validity range', () => {
    expect(errorsOf({ ...base, validRangeNm: { min: 800, max: 400 } })).toContainEqual({
      path: 'validRangeNm.max',
      message: 'validRangeNm.max must be greater than validRangeNm.min (800 nm)'
    });
  });

  it('rejects a formula with a pole inside its range', () => {
    const errors = errorsOf({ ...base, dispersion: { model: 'sellmeier', terms: [{ B: 1, C: 0.5 }] } });
    expect(errors[0].message).toMatch(/pole at 500 nm inside validRangeNm 400–800 nm/);
  });

  it('rejects a formula that gives n² ≤ 0 somewhere in its range', () => {
    const errors = errorsOf({ ...base, dispersion: { model: 'sellmeier', a0: -5, terms: [{ B: 1, C: 0.1 }] } });
    expect(errors[0]).toEqual({ path: 'dispersion', message: expect.stringMatching(/no physical index at 400 nm/) });
  });

  it('rejects the id of a library material', () => {
    expect(errorsOf({ ...base, id: 'gan' })[0]).toEqual({ path: 'id', message: expect.stringMatching(/belongs to a library material/) });
  });

  it('rejects non-finite numbers', () => {
    const errors = errorsOf({ ...base, dispersion: { model: 'cauchy', A: Number.NaN, B: Infinity, C: 0 } });
    expect(errors.map((e) => e.path).sort()).toEqual(['dispersion.A', 'dispersion.B']);
  });
});
