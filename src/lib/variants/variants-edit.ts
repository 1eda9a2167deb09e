/**
 * Edits of the kept variants, each returning a new document (the input is never changed) or a
 * message naming what is wrong. Pure.
 */
import type { Scenario } from '../scenario/schema';
import { MAX_VARIANTS, VARIANT_NAME_LENGTH, VARIANTS_VERSION, type VariantsDoc } from './variants-doc';

export type EditResult = { ok: true; doc: VariantsDoc } | { ok: false; message: string };

const LETTERS = 'ABCDEFGHIJKLMNOPQRSTUVWXYZ';

/** The first letter A, B, C, … not yet used as a name (case-insensitive). */
export function nextVariantName(doc: VariantsDoc): string {
  const used = new Set(doc.variants.map((v) => v.name.toLowerCase()));
  for (const letter of LETTERS) if (!used.has(letter.toLowerCase())) return letter;
  return `Variant ${doc.variants.length + 1}`;
}

/** Adds a copy of `scenario` as the next variant (named A, B, … unless `name` is given). */
export function keepVariant(doc: VariantsDoc, scenario: Scenario, name?: string): EditResult {
  if (doc.variants.length >= MAX_VARIANTS) {
    return { ok: false, message: `At most ${MAX_VARIANTS} variants can be kept; remove one first.` };
  }
  const chosen = name ?? nextVariantName(doc);
  const check = nameProblem(doc, chosen, -1);
  if (check) return { ok: false, message: check };
  return {
    ok: true,
    doc: { version: VARIANTS_VERSION, variants: [...doc.variants, { name: chosen.trim(), scenario: structuredClone(scenario) }] }
  };
}

/** Renames variant `index`. */
export function renameVariant(doc: VariantsDoc, index: number, name: string): EditResult {
  if (!doc.variants[index]) return { ok: false, message: `There is no variant ${index + 1}.` };
  const check = nameProblem(doc, name, index);
  if (check) return { ok: false, message: check };
  const variants = doc.variants.map((v, i) => (i === index ? { ...v, name: name.trim() } : v));
  return { ok: true, doc: { version: VARIANTS_VERSION, variants } };
}

/** Removes variant `index` (the others keep their names). */
export function removeVariant(doc: VariantsDoc, index: number): EditResult {
  if (!doc.variants[index]) return { ok: false, message: `There is no variant ${index + 1}.` };
  return { ok: true, doc: { version: VARIANTS_VERSION, variants: doc.variants.filter((_, i) => i !== index) } };
}

/** Why `name` cannot name variant `index` (−1: a new one), or null. */
export function nameProblem(doc: VariantsDoc, name: string, index: number): string | null {
  const trimmed = name.trim();
  if (trimmed.length < VARIANT_NAME_LENGTH.min || trimmed.length > VARIANT_NAME_LENGTH.max) {
    return `Variant name must be between ${VARIANT_NAME_LENGTH.min} and ${VARIANT_NAME_LENGTH.max} characters.`;
  }
  const clash = doc.variants.findIndex((v, i) => i !== index && v.name.toLowerCase() === trimmed.toLowerCase());
  return clash >= 0 ? `Variant name "${trimmed}" is already used; names must differ.` : null;
}
