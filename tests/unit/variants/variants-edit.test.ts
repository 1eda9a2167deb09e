import { describe, expect, it } from 'vitest';
import { demoScenario } from '../../../src/lib/scenario/defaults';
import { emptyVariants, MAX_VARIANTS, readVariants } from '../../../src/lib/variants/variants-doc';
import { keepVariant, nextVariantName, removeVariant, renameVariant } from '../../../src/lib/variants/variants-edit';
import { phenylScenario, twoVariants } from './fixtures';

describe('variant edits', () => {
  it('keepVariant names variants A, B, … and stores a copy of the scenario', () => {
    const s = demoScenario();
    const a = keepVariant(emptyVariants(), s);
    expect(a.ok && a.doc.variants.map((v) => v.name)).toEqual(['A']);
    s.chip.widthMm = 2; // later edits of the panel's scenario do not reach the kept copy
    const b = a.ok ? keepVariant(a.doc, phenylScenario()) : a;
    expect(b.ok && b.doc.variants.map((v) => v.name)).toEqual(['A', 'B']);
    expect(b.ok && b.doc.variants[0].scenario.chip.widthMm).toBe(1);
    expect(b.ok && readVariants(b.doc).ok).toBe(true);
  });

  it('nextVariantName skips letters already used, whatever their case', () => {
    const doc = twoVariants();
    doc.variants[0].name = 'c';
    expect(nextVariantName(doc)).toBe('A');
    doc.variants[0].name = 'A';
    expect(nextVariantName(doc)).toBe('C');
  });

  it(`keeps at most ${MAX_VARIANTS} variants, then says to remove one`, () => {
    let doc = emptyVariants();
    for (let i = 0; i < MAX_VARIANTS; i++) {
      const r = keepVariant(doc, demoScenario());
      if (!r.ok) throw new Error(r.message);
      doc = r.doc;
    }
    expect(doc.variants.map((v) => v.name).join('')).toBe('ABCDEF');
    const r = keepVariant(doc, demoScenario());
    expect(r).toEqual({ ok: false, message: `At most ${MAX_VARIANTS} variants can be kept; remove one first.` });
  });

  it('renameVariant trims, refuses a clash or an empty name, and leaves the input unchanged', () => {
    const doc = twoVariants();
    const r = renameVariant(doc, 1, '  Phenyl  ');
    expect(r.ok && r.doc.variants[1].name).toBe('Phenyl');
    expect(doc.variants[1].name).toBe('B');
    expect(renameVariant(doc, 1, 'a')).toEqual({ ok: false, message: 'Variant name "a" is already used; names must differ.' });
    expect(renameVariant(doc, 0, '   ').ok).toBe(false);
    expect(renameVariant(doc, 0, 'A').ok).toBe(true);
    expect(renameVariant(doc, 5, 'Z')).toEqual({ ok: false, message: 'There is no variant 6.' });
  });

  it('removeVariant keeps the others and their names', () => {
    const r = removeVariant(twoVariants(), 0);
    expect(r.ok && r.doc.variants.map((v) => v.name)).toEqual(['B']);
  });
});
