/**
 * Reads a comparison back: the page's exported JSON (variants with their results) or a plain variants
 * document (what the browser stores and the link carries; no results). Scenarios go through the
 * variants document's migration and schema; results through their own schema. Never throws. Pure.
 */
import { readVariants, type Variant } from './variants-doc';
import { variantResultSchema, type VariantResult } from './variant-result';

export type ReadComparisonResult =
  | { ok: true; variants: Variant[]; results: (VariantResult | null)[] }
  | { ok: false; message: string };

function isRecord(x: unknown): x is Record<string, unknown> {
  return typeof x === 'object' && x !== null && !Array.isArray(x);
}

export function readComparison(raw: unknown): ReadComparisonResult {
  if (!isRecord(raw)) return { ok: false, message: 'The file must hold one JSON object.' };
  const exported = raw.view === 'variants';
  if (exported && raw.formatVersion !== 1) {
    return { ok: false, message: `Comparison format version ${String(raw.formatVersion).slice(0, 20)} is not one this program reads (1).` };
  }
  const list = Array.isArray(raw.variants) ? raw.variants : null;
  const doc = exported
    ? { version: raw.variantsVersion, variants: list ? list.map((v) => (isRecord(v) ? { name: v.name, scenario: v.scenario } : v)) : raw.variants }
    : raw;
  const read = readVariants(doc);
  if (!read.ok) return read;
  const results: (VariantResult | null)[] = [];
  for (let i = 0; i < read.value.variants.length; i++) {
    const given = exported && list && isRecord(list[i]) ? (list[i] as Record<string, unknown>).results : null;
    if (given === null || given === undefined) {
      results.push(null);
      continue;
    }
    const r = variantResultSchema.safeParse(given);
    if (!r.success) {
      const issue = r.error.issues[0];
      return { ok: false, message: `Variant ${i + 1} (${read.value.variants[i].name}): results.${issue.path.map(String).join('.')}: ${issue.message}` };
    }
    results.push(r.data);
  }
  return { ok: true, variants: read.value.variants, results };
}
