// Tests of the /stack page's stack document (src/routes/stack/stack-doc.ts) and its link encoding
// (stack-url.ts). They live here with the page's other dataset tests.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  checkStack,
  defaultStack,
  expandedCount,
  nmToUm,
  umToNm,
  type StackDoc
} from '../../../src/routes/stack/stack-doc';
import { decodeStackParam, encodeStackParam } from '../../../src/routes/stack/stack-url';

const graded = (sublayers: number) =>
  ({ kind: 'graded', fromN: 2.4, toN: 1.4, thicknessNm: 500, profile: 'linear', sublayers }) as const;

describe('checkStack(input)', () => {
  it('accepts the starting stack', () => {
    expect(checkStack(defaultStack()).ok).toBe(true);
  });

  it('names the field and its range for a bad typed index', () => {
    const doc = { ...defaultStack(), items: [{ kind: 'layer', medium: { kind: 'index', n: 0, k: 0 }, thicknessNm: 10 }] };
    expect(checkStack(doc)).toEqual({ ok: false, message: 'Item 1: Layer index n must be between 0.01 and 10.' });
  });

  it('refuses more than 200 layers after graded sections are expanded, and says how many it would be', () => {
    const doc: StackDoc = { ...defaultStack(), items: [graded(150), graded(60)] };
    expect(expandedCount(doc.items)).toBe(210);
    const r = checkStack(doc);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toBe('The stack would have 210 layers (graded sections count each sublayer); at most 200 are allowed.');
    expect(checkStack({ ...doc, items: [graded(150), graded(50)] }).ok).toBe(true);
  });

  it('refuses a layer over 100 µm in thin-film mode but takes it in thick-layer mode', () => {
    const items = [{ kind: 'layer' as const, medium: { kind: 'material' as const, id: 'sio2' }, thicknessNm: 500_000 }];
    const thin = checkStack({ ...defaultStack(), mode: 'thin', items });
    expect(thin.ok).toBe(false);
    if (!thin.ok) expect(thin.message).toContain('thin-film mode takes layers between 0 and 100000 nm');
    expect(checkStack({ ...defaultStack(), mode: 'thick', items }).ok).toBe(true);
  });

  it('rejects NaN, Infinity and unknown fields instead of passing them on', () => {
    for (const thicknessNm of [NaN, Infinity, -1]) {
      const r = checkStack({ ...defaultStack(), items: [{ kind: 'layer', medium: { kind: 'material', id: 'sio2' }, thicknessNm }] });
      expect(r.ok).toBe(false);
    }
    expect(checkStack({ ...defaultStack(), extra: 1 }).ok).toBe(false);
    expect(checkStack({ ...defaultStack(), items: [{ ...graded(10), profile: 'cubic' }] }).ok).toBe(false);
  });
});

describe('nmToUm / umToNm', () => {
  it('reads back every typed thickness of up to 9 significant digits unchanged (exact round trip)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 999_999_999 }), fc.integer({ min: -6, max: 4 }), (mantissa, exp) => {
        const typed = Number(`${mantissa}e${exp}`);
        if (typed > 10_000) return; // thick-mode limit, µm
        expect(nmToUm(umToNm(typed))).toBe(typed);
      })
    );
  });

  it('converts exactly for round values (1 µm = 1000 nm)', () => {
    expect(umToNm(2.5)).toBe(2500);
    expect(nmToUm(100)).toBe(0.1);
  });
});

describe('encodeStackParam / decodeStackParam', () => {
  const doc: StackDoc = {
    version: 1,
    mode: 'thick',
    exit: 'outside',
    items: [
      { kind: 'layer', medium: { kind: 'index', n: 1.8, k: 0.01 }, thicknessNm: 1234.5 },
      { kind: 'graded', fromN: 2.4, toN: 1.41, thicknessNm: 50_000, profile: 'quintic', sublayers: 20 }
    ]
  };

  it('round-trips a stack exactly', () => {
    const d = decodeStackParam(encodeStackParam(doc));
    expect(d).toEqual({ doc, message: null, fromLink: true });
  });

  it('gives the fallback and no message when there is no parameter', () => {
    const fallback = defaultStack();
    expect(decodeStackParam(null, fallback)).toEqual({ doc: fallback, message: null, fromLink: false });
  });

  it('gives the fallback and says why for a damaged, newer or invalid link', () => {
    const fallback = defaultStack();
    expect(decodeStackParam('1.@@@', fallback).message).toMatch(/could not be read/);
    expect(decodeStackParam('nonsense', fallback).message).toMatch(/could not be read/);
    expect(decodeStackParam('9.e30', fallback).message).toMatch(/newer version of Outcouple \(stack version 9\)/);
    const bad = encodeStackParam({ ...doc, items: [graded(500)] });
    const d = decodeStackParam(bad, fallback);
    expect(d.doc).toBe(fallback);
    expect(d.message).toMatch(/not valid: Item 1: Number of sublayers must be a whole number between 1 and 200 sublayers\./);
  });
});
