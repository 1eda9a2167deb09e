/**
 * Exports of the comparison: a CSV of the side-by-side rows (every variant, each number at the
 * precision it carries) and a JSON document holding every variant's scenario and trace results, which
 * the command line reads back (`outcouple variants FILE.json`). Pure.
 */
import { toCsv, type CsvCell } from '../charts/csv';
import type { ComparisonRow } from './comparison-rows';
import { VARIANTS_VERSION, type Variant } from './variants-doc';
import type { VariantResult } from './variant-result';

/** Format version of the exported comparison file. */
export const COMPARISON_FORMAT_VERSION = 1;

/** CSV: figure, unit, then a value and a ± column per variant. An empty cell says why in the last column. */
export function comparisonCsv(names: readonly string[], rows: readonly ComparisonRow[]): string {
  const headers = ['Figure', 'Unit', ...names.flatMap((n) => [n, `${n} ±1σ`]), 'Notes'];
  const body: CsvCell[][] = rows.map((r) => {
    const notes = r.why.map((w, i) => (w ? `${names[i]}: ${w}` : null)).filter((w): w is string => w !== null);
    return [r.label, r.unit, ...r.cells.flatMap((c) => [c?.value ?? null, c?.sigma ?? null]), notes.join('; ')];
  });
  return toCsv(headers, body);
}

/** Numbers that JSON cannot hold (NaN, ±Infinity) become null. */
function clean(_key: string, value: unknown): unknown {
  return typeof value === 'number' && !Number.isFinite(value) ? null : value;
}

/**
 * JSON text of the comparison: the variants (name, scenario, results or null while tracing) and the
 * side-by-side rows as shown. `variantsVersion` and each scenario's `version` say how to read it.
 */
export function comparisonJson(variants: readonly Variant[], results: readonly (VariantResult | null)[], rows: readonly ComparisonRow[]): string {
  const doc = {
    app: 'Outcouple',
    view: 'variants',
    formatVersion: COMPARISON_FORMAT_VERSION,
    variantsVersion: VARIANTS_VERSION,
    notes:
      'Traced figures are fractions of launched rays; stderr is the binomial standard error √(p(1 − p)/N). ' +
      'The ratio σ propagates both traces as independent errors. Far-field intensities are over I0 = Φ/π of the same trace.',
    variants: variants.map((v, i) => ({ name: v.name, scenario: v.scenario, results: results[i] ?? null })),
    comparison: rows.map((r) => ({ key: r.key, label: r.label, unit: r.unit, cells: r.cells, why: r.why }))
  };
  return JSON.stringify(doc, clean, 2) + '\n';
}
