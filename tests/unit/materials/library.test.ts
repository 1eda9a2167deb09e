import { describe, expect, it } from 'vitest';
import { findMaterial, indexAt, listMaterials, MATERIAL_CATEGORIES, materialSchema, polesNm } from '../../../src/lib/materials';

// Ids other parts of Outcouple depend on, with the category each must carry.
const REQUIRED: Record<string, string> = {
  gan: 'semiconductor', gaas: 'semiconductor', gap: 'semiconductor', 'sic-4h': 'substrate', 'sapphire-o': 'substrate', 'sapphire-e': 'substrate',
  'silicone-methyl': 'encapsulant', 'silicone-phenyl': 'encapsulant', epoxy: 'encapsulant',
  pmma: 'optic', polycarbonate: 'optic', 'soda-lime-glass': 'optic', 'fused-silica': 'optic',
  sio2: 'layer', si3n4: 'layer', 'tio2-rutile': 'layer', ito: 'layer', zno: 'layer', mgf2: 'layer',
  ag: 'metal', al: 'metal', au: 'metal', air: 'ambient'
};
// No shipped value is recalled: every optical constant comes from a published data set or formula
const SHIPPED_TAGS = ['published', 'computed from published formula', 'common practice'];

describe('listMaterials()', () => {
  const all = listMaterials();

  it('holds at least 23 materials, every required id with its category', () => {
    expect(all.length).toBeGreaterThanOrEqual(23);
    for (const [id, category] of Object.entries(REQUIRED)) {
      expect(all.find((m) => m.id === id)?.category, id).toBe(category);
    }
  });

  it('has unique ids, and no name or alias points at two materials', () => {
    expect(new Set(all.map((m) => m.id)).size).toBe(all.length);
    const owner = new Map<string, string>();
    for (const m of all) {
      for (const name of [m.id, m.name, ...m.aliases]) {
        const key = name.trim().toLowerCase();
        expect(owner.get(key) ?? m.id, `"${name}"`).toBe(m.id);
        owner.set(key, m.id);
      }
    }
  });

  it('every entry passes the schema again, names a source and carries a shipped provenance tag (never `from memory`)', () => {
    for (const m of all) {
      expect(materialSchema.safeParse(m).success, m.id).toBe(true);
      expect(m.source.length, m.id).toBeGreaterThan(20);
      expect(SHIPPED_TAGS, m.id).toContain(m.provenance);
      expect(MATERIAL_CATEGORIES).toContain(m.category);
      for (const note of m.notes ?? []) expect(SHIPPED_TAGS, m.id).toContain(note.tag);
    }
  });

  it('every entry gives finite n > 0 and k ≥ 0 at 50 points across its whole validity range, in range and without warning', () => {
    for (const m of all) {
      const { min, max } = m.validRangeNm;
      for (let i = 0; i < 50; i++) {
        const wavelengthNm = min + ((max - min) * i) / 49;
        const r = indexAt(m, wavelengthNm);
        expect(Number.isFinite(r.n) && r.n > 0, `${m.id} n at ${wavelengthNm}`).toBe(true);
        expect(Number.isFinite(r.k) && r.k >= 0, `${m.id} k at ${wavelengthNm}`).toBe(true);
        expect(r.inRange).toBe(true);
        expect(r.warning).toBeUndefined();
      }
    }
  });

  it('no formula has a pole inside its validity range', () => {
    for (const m of all) {
      for (const pole of polesNm(m.dispersion)) {
        expect(pole < m.validRangeNm.min || pole > m.validRangeNm.max, `${m.id} pole ${pole}`).toBe(true);
      }
    }
  });

  it('metals are accepted with n < 1 (n ≥ 1 is never required)', () => {
    const at: [string, number][] = [['ag', 550], ['al', 450], ['au', 600]];
    for (const [id, wavelengthNm] of at) {
      expect(indexAt(findMaterial(id)!, wavelengthNm).n, id).toBeLessThan(1);
    }
  });

  it('encapsulants carry a service temperature and common-practice notes', () => {
    for (const m of all.filter((x) => x.category === 'encapsulant')) {
      expect(m.maxServiceTempC, m.id).toBeGreaterThan(0);
      expect(m.notes?.some((n) => n.tag === 'common practice'), m.id).toBe(true);
    }
  });

  it('returns frozen entries in a fresh array, so callers cannot change the library', () => {
    const a = listMaterials();
    a.pop();
    expect(listMaterials().length).toBe(all.length);
    expect(Object.isFrozen(all[0])).toBe(true);
    expect(Object.isFrozen(all[0].dispersion)).toBe(true);
  });
});

describe('findMaterial(idOrNameOrAlias)', () => {
  it('finds by id, display name and alias, ignoring case and surrounding spaces', () => {
    expect(findMaterial('gan')?.id).toBe('gan');
    expect(findMaterial('GaN')?.id).toBe('gan');
    expect(findMaterial('  GALLIUM NITRIDE ')?.id).toBe('gan');
    expect(findMaterial('Sapphire (ordinary ray)')?.id).toBe('sapphire-o');
    expect(findMaterial('crown glass')?.id).toBe('soda-lime-glass');
    // Retired ids stay aliases of the entries that replaced them (saved scenarios and typed names)
    expect(findMaterial('borosilicate-crown')?.id).toBe('soda-lime-glass');
    expect(findMaterial('ingan')?.id).toBe('gan');
    expect(findMaterial('AlGaInP')?.id).toBe('gap');
    expect(findMaterial('PC')?.id).toBe('polycarbonate');
  });

  it('reads subscript digits as plain digits (SiO₂ = SiO2)', () => {
    expect(findMaterial('SiO₂')?.id).toBe('sio2');
    expect(findMaterial('Si₃N₄')?.id).toBe('si3n4');
  });

  it('returns undefined for unknown, empty or non-text input', () => {
    expect(findMaterial('unobtainium')).toBeUndefined();
    expect(findMaterial('')).toBeUndefined();
    expect(findMaterial('   ')).toBeUndefined();
    expect(findMaterial(42 as unknown as string)).toBeUndefined();
  });
});
