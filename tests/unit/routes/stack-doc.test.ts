// Tests of the /stack page's stack document (src/routes/stack/stack-doc.ts) and its link encoding
// (stack-url.ts). They live here with the page's other dataset tests.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  carryUserMaterials,
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
    version: 2,
    mode: 'thick',
    exit: 'outside',
    items: [
      { kind: 'layer', medium: { kind: 'index', n: 1.8, k: 0.01 }, thicknessNm: 1234.5 },
      { kind: 'graded', fromN: 2.4, toN: 1.41, thicknessNm: 50_000, profile: 'quintic', sublayers: 20 }
    ],
    userMaterials: []
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

describe('user materials carried by a stack (version 2)', () => {
  // A user's film as a Cauchy formula: n = 1.9 + 0.01/λ² (λ in µm).
  const film = { id: 'my-film', name: 'My film', aliases: [], category: 'layer' as const, dispersion: { model: 'cauchy' as const, A: 1.9, B: 0.01, C: 0 }, validRangeNm: { min: 400, max: 800 }, source: 'user supplied', provenance: 'user supplied' as const };
  const withFilm: StackDoc = {
    ...defaultStack(),
    items: [
      { kind: 'layer', medium: { kind: 'material', id: 'sio2' }, thicknessNm: 100 },
      { kind: 'layer', medium: { kind: 'material', id: 'my-film' }, thicknessNm: 80 },
      { kind: 'layer', medium: { kind: 'material', id: 'my-film' }, thicknessNm: 40 }
    ]
  };

  it('carries exactly the non-library materials the layers use, once each', () => {
    const carried = carryUserMaterials(withFilm, (id) => (id === 'my-film' ? film : undefined));
    expect(carried.userMaterials).toEqual([film]);
    const none = carryUserMaterials({ ...withFilm, items: withFilm.items.slice(0, 1) }, () => film);
    expect(none.userMaterials).toEqual([]);
  });

  it('keeps a carried definition when this browser does not have the material', () => {
    const fromLink = { ...withFilm, userMaterials: [film] };
    expect(carryUserMaterials(fromLink, () => undefined).userMaterials).toEqual([film]);
  });

  it('round-trips through a link with the definition, so the receiver can compute the layer', () => {
    const carried = carryUserMaterials(withFilm, () => film);
    const d = decodeStackParam(encodeStackParam(carried));
    expect(d.message).toBeNull();
    expect(d.doc.userMaterials).toEqual([film]);
  });

  it('reads a version-1 stack as version 2 carrying nothing', () => {
    const { userMaterials: _none, ...v1 } = { ...defaultStack(), version: 1 };
    const r = checkStack(v1);
    expect(r.ok && r.doc).toEqual(defaultStack());
  });

  it('refuses a carried material that breaks the user-material rules, naming it', () => {
    const r = checkStack({ ...withFilm, userMaterials: [{ ...film, id: 'sio2' }] });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(/^User material in the stack: id "sio2" belongs to a library material/);
  });
});
