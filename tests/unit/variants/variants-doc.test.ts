import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { loadSaved } from '../../../src/lib/scenario/saved-item';
import { demoScenario } from '../../../src/lib/scenario/defaults';
import { SCENARIO_VERSION } from '../../../src/lib/scenario/schema';
import { MAX_VARIANTS, readVariants, VARIANTS_STORAGE_KEY } from '../../../src/lib/variants/variants-doc';
import { twoVariants } from './fixtures';

function memoryStorage(items: Record<string, string>): Storage & { items: Map<string, string> } {
  const m = new Map(Object.entries(items));
  return {
    items: m,
    get length() {
      return m.size;
    },
    clear: () => m.clear(),
    getItem: (k: string) => m.get(k) ?? null,
    key: (i: number) => [...m.keys()][i] ?? null,
    removeItem: (k: string) => void m.delete(k),
    setItem: (k: string, v: string) => void m.set(k, v)
  };
}

describe('readVariants', () => {
  it('reads a version-1 document of two variants unchanged', () => {
    const doc = twoVariants();
    const r = readVariants(JSON.parse(JSON.stringify(doc)));
    expect(r).toEqual({ ok: true, value: doc });
  });

  it('lifts each variant scenario through the scenario migration (a version-0 draft scenario inside reads)', () => {
    const v0 = {
      name: 'Draft',
      wavelengthNm: 450,
      chip: { material: 'gan', widthMm: 1, lengthMm: 1, heightMm: 0.15 },
      encapsulant: { material: 'silicone-phenyl', shape: 'dome', radiusMm: 2.5 },
      base: 0.92
    };
    const r = readVariants({ version: 1, variants: [{ name: 'A', scenario: v0 }] });
    expect(r.ok).toBe(true);
    if (r.ok) {
      expect(r.value.variants[0].scenario.version).toBe(SCENARIO_VERSION);
      expect(r.value.variants[0].scenario.encapsulant.medium).toEqual({ kind: 'material', id: 'silicone-phenyl' });
    }
  });

  it('refuses a newer version, naming both versions', () => {
    const r = readVariants({ version: 9, variants: [] });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(/newer version .*variants version 9.*up to 1/);
  });

  it('names the variant and the field of an invalid scenario', () => {
    const doc = twoVariants();
    (doc.variants[1].scenario.chip as { widthMm: number }).widthMm = -1;
    const r = readVariants(doc);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(/^Variant 2 \(B\): Chip width must be between 0\.001 and 1000 mm\./);
  });

  it('refuses two variants of the same name (case-insensitive) and more than the most kept', () => {
    const doc = twoVariants();
    doc.variants[1].name = 'a';
    const same = readVariants(doc);
    expect(same.ok).toBe(false);
    if (!same.ok) expect(same.message).toMatch(/used twice/);
    const many = { version: 1, variants: Array.from({ length: MAX_VARIANTS + 1 }, (_, i) => ({ name: `V${i}`, scenario: demoScenario() })) };
    const r = readVariants(many);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(`At most ${MAX_VARIANTS} variants`);
  });

  it('never throws on arbitrary JSON values (fast-check, seeded)', () => {
    fc.assert(
      fc.property(fc.jsonValue(), (raw) => {
        const r = readVariants(raw);
        expect(typeof r.ok).toBe('boolean');
      }),
      { seed: 7, numRuns: 300 }
    );
  });
});

describe('saved variants in browser storage', () => {
  it('an unreadable saved set is set aside under "<key>.unreadable" with a message, never lost', () => {
    const text = '{"version":1,"variants":[{"name":"A","scenario":{"version":2}}]}';
    const storage = memoryStorage({ [VARIANTS_STORAGE_KEY]: text });
    const loaded = loadSaved(storage, [VARIANTS_STORAGE_KEY], readVariants, 'variants', 'no variants');
    expect(loaded.value).toBeNull();
    expect(loaded.message).toMatch(/Your saved variants could not be read \(Variant 1 \(A\): .*\); it is kept untouched .*outcouple\.variants\.v1\.unreadable/);
    expect(storage.items.get(`${VARIANTS_STORAGE_KEY}.unreadable`)).toBe(text);
  });

  it('a readable saved set loads', () => {
    const storage = memoryStorage({ [VARIANTS_STORAGE_KEY]: JSON.stringify(twoVariants()) });
    const loaded = loadSaved(storage, [VARIANTS_STORAGE_KEY], readVariants, 'variants', 'no variants');
    expect(loaded.message).toBeNull();
    expect(loaded.value?.variants.map((v) => v.name)).toEqual(['A', 'B']);
  });
});
