// Tests of the user-materials file (src/lib/materials-user/user-materials-file.ts).
import { describe, expect, it } from 'vitest';
import type { Material } from '../../../src/lib/materials/types';
import {
  encodeUserMaterials,
  MAX_USER_MATERIALS,
  mergeUserMaterials,
  readUserMaterialsFile
} from '../../../src/lib/materials-user/user-materials-file';

const resin: Material = {
  id: 'user-resin',
  name: 'Resin',
  aliases: [],
  category: 'encapsulant',
  dispersion: { model: 'cauchy', A: 1.5, B: 0.004, C: 0 },
  validRangeNm: { min: 400, max: 800 },
  source: 'entered by the user',
  provenance: 'user supplied'
};

describe('encodeUserMaterials / readUserMaterialsFile', () => {
  it('round-trips the materials exactly', () => {
    const text = encodeUserMaterials([resin]);
    expect(JSON.parse(text).format).toBe('outcouple-user-materials');
    expect(readUserMaterialsFile(text)).toEqual({ ok: true, materials: [resin] });
  });

  it('also reads a bare array and a single material object', () => {
    expect(readUserMaterialsFile(JSON.stringify([resin]))).toEqual({ ok: true, materials: [resin] });
    expect(readUserMaterialsFile(JSON.stringify(resin))).toEqual({ ok: true, materials: [resin] });
  });

  it('marks imported materials as user supplied, whatever the file says', () => {
    const r = readUserMaterialsFile(JSON.stringify([{ ...resin, provenance: 'published' }]));
    expect(r.ok && r.materials[0].provenance).toBe('user supplied');
  });

  it('explains what is wrong with a bad file, naming the entry', () => {
    expect(readUserMaterialsFile('{ nope')).toEqual({ ok: false, message: 'The file is not valid JSON: expected an Outcouple user-materials file (.json).' });
    expect(readUserMaterialsFile(JSON.stringify({ format: 'other', materials: [] }))).toMatchObject({ message: expect.stringContaining('expected "outcouple-user-materials"') });
    expect(readUserMaterialsFile(JSON.stringify({ format: 'outcouple-user-materials', version: 7, materials: [resin] }))).toMatchObject({
      message: expect.stringContaining('newer version of Outcouple (version 7)')
    });
    expect(readUserMaterialsFile(JSON.stringify({ materials: [] }))).toEqual({ ok: false, message: 'The file holds no materials.' });
    const bad = readUserMaterialsFile(JSON.stringify([resin, { ...resin, id: 'user-b', name: 'Broken', validRangeNm: { min: 900, max: 400 } }]));
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.message).toMatch(/^Material 2 \(Broken\): validRangeNm\.max must be greater than/);
    const library = readUserMaterialsFile(JSON.stringify([{ ...resin, id: 'gan' }]));
    expect(library.ok).toBe(false);
    if (!library.ok) expect(library.message).toMatch(/belongs to a library material/);
  });

  it('refuses files over 2 MB and lists over the count limit', () => {
    expect(readUserMaterialsFile(' '.repeat(2 * 1024 * 1024 + 1))).toMatchObject({ ok: false, message: expect.stringContaining('at most 2 MB') });
    const many = Array.from({ length: MAX_USER_MATERIALS + 1 }, (_, i) => ({ ...resin, id: `user-r${i}` }));
    expect(readUserMaterialsFile(JSON.stringify(many))).toMatchObject({ ok: false, message: expect.stringContaining(`at most ${MAX_USER_MATERIALS}`) });
  });
});

describe('mergeUserMaterials(existing, incoming)', () => {
  it('skips identical entries, renames clashing ones and never changes what exists', () => {
    const other = { ...resin, name: 'Other resin', dispersion: { model: 'cauchy' as const, A: 1.4, B: 0, C: 0 } };
    const existing = [resin];
    const m = mergeUserMaterials(existing, [resin, other, { ...resin, id: 'user-new' }]);
    expect(m).toMatchObject({ added: 2, unchanged: 1, renamed: 1 });
    expect(m.materials.map((x) => x.id)).toEqual(['user-resin', 'user-resin-2', 'user-new']);
    expect(m.materials[0]).toBe(resin);
    expect(existing).toEqual([resin]);
  });
});
