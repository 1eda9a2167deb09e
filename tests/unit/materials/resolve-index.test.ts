import { describe, expect, it } from 'vitest';
import { findMaterial, indexAt, resolveIndex, validateUserMaterial } from '../../../src/lib/materials';

describe('resolveIndex(spec, wavelengthNm)', () => {
  it('reads a plain number as n with k = 0', () => {
    expect(resolveIndex('1.41', 450)).toEqual({ n: 1.41, k: 0 });
    expect(resolveIndex(' 2.5 ', 450)).toEqual({ n: 2.5, k: 0 });
    expect(resolveIndex('.5', 450)).toEqual({ n: 0.5, k: 0 });
    expect(resolveIndex('1.5e0', 450)).toEqual({ n: 1.5, k: 0 });
  });

  it('reads n+ki complex indices, with or without spaces, i or j, k before or after the unit', () => {
    expect(resolveIndex('2.4+0.01i', 450)).toEqual({ n: 2.4, k: 0.01 });
    expect(resolveIndex('0.05+3.6i', 550)).toEqual({ n: 0.05, k: 3.6 });
    expect(resolveIndex('2.4 + 0.01 i', 450)).toEqual({ n: 2.4, k: 0.01 });
    expect(resolveIndex('2.4+0.01j', 450)).toEqual({ n: 2.4, k: 0.01 });
    expect(resolveIndex('2.4+i0.01', 450)).toEqual({ n: 2.4, k: 0.01 });
    expect(resolveIndex('1.5+0i', 450)).toEqual({ n: 1.5, k: 0 });
  });

  it('reads a material id, name or alias and returns its indexAt value with materialId', () => {
    const r = resolveIndex('GaN', 450);
    expect(r.materialId).toBe('gan');
    expect(r).toEqual({ ...indexAt(findMaterial('gan')!, 450), materialId: 'gan', inRange: undefined });
    expect(resolveIndex('sapphire-o', 632.8).materialId).toBe('sapphire-o');
  });

  it('passes the out-of-range warning through', () => {
    const r = resolveIndex('pmma', 400);
    expect(r.warning).toMatch(/437–1052 nm/);
  });

  it('passes pole errors through (GaAs at 870 nm)', () => {
    expect(() => resolveIndex('GaAs', 870)).toThrow(/pole at 874\.6 nm/);
  });

  it('finds user materials after the library', () => {
    const user = validateUserMaterial({
      id: 'my-glue', name: 'My glue', category: 'encapsulant',
      dispersion: { model: 'cauchy', A: 1.47, B: 0, C: 0 }, validRangeNm: { min: 400, max: 800 }
    });
    if (!user.ok) throw new Error('fixture should be valid');
    expect(resolveIndex('my glue', 500, [user.material])).toEqual({ n: 1.47, k: 0, materialId: 'my-glue' });
  });

  it('rejects k < 0 with a message saying absorption is n + ki, k ≥ 0', () => {
    expect(() => resolveIndex('2.4-0.01i', 450)).toThrow(/k must be ≥ 0/);
  });

  it('rejects n ≤ 0 or beyond 10, and k beyond 50, naming the range', () => {
    expect(() => resolveIndex('0', 450)).toThrow(/n must be > 0 and ≤ 10/);
    expect(() => resolveIndex('12', 450)).toThrow(/n must be > 0 and ≤ 10/);
    expect(() => resolveIndex('1e400', 450)).toThrow(/n must be > 0 and ≤ 10/);
    expect(() => resolveIndex('1+60i', 450)).toThrow(/k must be in \[0, 50\]/);
  });

  it('rejects negative numbers, empty text and unknown names with the accepted forms', () => {
    expect(() => resolveIndex('-1.5', 450)).toThrow(/not a number > 0 or a complex index/);
    expect(() => resolveIndex('', 450)).toThrow(/index is empty/);
    expect(() => resolveIndex('   ', 450)).toThrow(/index is empty/);
    expect(() => resolveIndex('NaN', 450)).toThrow(/not a number, a complex index n\+ki or a known material/);
    expect(() => resolveIndex('unobtainium', 450)).toThrow(/known material/);
    expect(() => resolveIndex('1.5.2', 450)).toThrow(RangeError);
  });

  it('checks the wavelength for every kind of spec', () => {
    expect(() => resolveIndex('1.5', Number.NaN)).toThrow(/wavelengthNm must be a number between 100 and 20000 nm/);
    expect(() => resolveIndex('1.5', 50)).toThrow(RangeError);
  });
});
