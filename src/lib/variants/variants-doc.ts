/**
 * The kept variants as one versioned document: { version, variants: [{ name, scenario }] }. Each
 * variant's scenario is checked by the scenario schema itself, after the scenario's own migration, so
 * a variant saved by an older version of the app reads like a saved scenario would. Pure.
 *
 * Version 1 is the first layout. A newer document than this program reads gives a message, never a
 * guess.
 */
import { z } from 'zod';
import { migrateScenario } from '../scenario/migrate';
import { scenarioSchema, type Scenario } from '../scenario/schema';

export const VARIANTS_VERSION = 1;
/** Browser storage key; the number is the variants version written under it. */
export const VARIANTS_STORAGE_KEY = 'outcouple.variants.v1';
/** Most variants kept at once: one chart colour each (the palette has six). */
export const MAX_VARIANTS = 6;
/** Characters in a variant's name. */
export const VARIANT_NAME_LENGTH = { min: 1, max: 40 } as const;

const nameSchema = z
  .string({ error: 'Variant name must be text.' })
  .trim()
  .min(VARIANT_NAME_LENGTH.min, { error: `Variant name must be between ${VARIANT_NAME_LENGTH.min} and ${VARIANT_NAME_LENGTH.max} characters.` })
  .max(VARIANT_NAME_LENGTH.max, { error: `Variant name must be between ${VARIANT_NAME_LENGTH.min} and ${VARIANT_NAME_LENGTH.max} characters.` });

const variantSchema = z.object({ name: nameSchema, scenario: scenarioSchema }, { error: 'A variant must be an object with a name and a scenario.' }).strict();

export const variantsDocSchema = z
  .object(
    {
      version: z.literal(VARIANTS_VERSION, { error: `Variants version must be ${VARIANTS_VERSION}.` }),
      variants: z
        .array(variantSchema, { error: 'Variants must be a list.' })
        .max(MAX_VARIANTS, { error: `At most ${MAX_VARIANTS} variants can be kept.` })
    },
    { error: 'A variants document must be an object with named fields.' }
  )
  .strict()
  .superRefine((doc, ctx) => {
    // Names label the columns of the table and of the CSV: they must tell the variants apart.
    const seen = new Set<string>();
    doc.variants.forEach((v, i) => {
      const key = v.name.toLowerCase();
      if (seen.has(key)) ctx.addIssue({ code: 'custom', path: ['variants', i, 'name'], message: `Variant name "${v.name}" is used twice; names must differ.` });
      seen.add(key);
    });
  });

export type Variant = { name: string; scenario: Scenario };
export type VariantsDoc = { version: typeof VARIANTS_VERSION; variants: Variant[] };

export type ReadVariantsResult = { ok: true; value: VariantsDoc } | { ok: false; message: string };

function isRecord(x: unknown): x is Record<string, unknown> {
  return typeof x === 'object' && x !== null && !Array.isArray(x);
}

/** Where an issue sits, in words: "variant 2 (B), scenario: " — so a message points at the variant. */
function where(raw: unknown, path: readonly PropertyKey[]): string {
  if (path[0] !== 'variants' || typeof path[1] !== 'number') return '';
  const i = path[1];
  const list = isRecord(raw) && Array.isArray(raw.variants) ? raw.variants : [];
  const name = isRecord(list[i]) && typeof list[i].name === 'string' ? ` (${String(list[i].name).slice(0, 40)})` : '';
  return `Variant ${i + 1}${name}: `;
}

/**
 * Brings a parsed variants document of any known version to the current one (not yet validated):
 * each variant's scenario goes through the scenario migration.
 */
export function migrateVariants(raw: unknown): { ok: true; value: unknown } | { ok: false; message: string } {
  if (!isRecord(raw)) return { ok: false, message: 'A variants document must be an object with named fields.' };
  const version = raw.version;
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 1) {
    return { ok: false, message: `Variants version must be a whole number from 1 to ${VARIANTS_VERSION}.` };
  }
  if (version > VARIANTS_VERSION) {
    return {
      ok: false,
      message: `These variants were made by a newer version of Outcouple (variants version ${version}); this one reads versions up to ${VARIANTS_VERSION}.`
    };
  }
  if (!Array.isArray(raw.variants)) return { ok: true, value: raw };
  const variants: unknown[] = [];
  for (let i = 0; i < raw.variants.length; i++) {
    const v = raw.variants[i];
    if (!isRecord(v)) {
      variants.push(v);
      continue;
    }
    const m = migrateScenario(v.scenario);
    if (!m.ok) return { ok: false, message: `${where(raw, ['variants', i])}${m.message}` };
    variants.push({ ...v, scenario: m.value });
  }
  return { ok: true, value: { ...raw, variants } };
}

/** Reads a variants document of any known version: migrates, then validates. Never throws. */
export function readVariants(raw: unknown): ReadVariantsResult {
  const m = migrateVariants(raw);
  if (!m.ok) return m;
  const p = variantsDocSchema.safeParse(m.value);
  if (!p.success) {
    const issue = p.error.issues[0];
    return { ok: false, message: `${where(m.value, issue.path)}${issue.message}` };
  }
  return { ok: true, value: p.data as VariantsDoc };
}

/** No variants kept. */
export function emptyVariants(): VariantsDoc {
  return { version: VARIANTS_VERSION, variants: [] };
}
