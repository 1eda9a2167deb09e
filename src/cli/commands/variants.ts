import { readFileSync, statSync } from 'node:fs';
import { tallyTracer, type Tracer } from '../../lib/runs/tracer';
import { traceSync } from '../../lib/trace/trace';
import { createNodeTracePool, defaultThreads, MAX_THREADS } from '../../lib/trace/node/node-pool';
import { cellText } from '../../lib/variants/cell-text';
import { comparisonRows } from '../../lib/variants/comparison-rows';
import { readComparison } from '../../lib/variants/read-comparison';
import { variantFigures } from '../../lib/variants/variant-figures';
import { traceVariant } from '../../lib/variants/trace-variant';
import type { VariantResult } from '../../lib/variants/variant-result';
import { CliError } from '../cli-error';
import { integerOption, parseOptions, truncate, type OptionSpec } from '../options';

export const summary = "Side-by-side of the variants in a comparison file saved by the app's Variants page";
export const help = `outcouple variants FILE.json — the variants of a comparison side by side

FILE.json is the page's "Save comparison (JSON)" file, or a plain variants document
({ "version": 1, "variants": [{ "name": "A", "scenario": {…} }, …] }).

A variant whose results the file carries is printed from them, as saved. A variant without results
is traced here like the page traces it: its package and its bare chip on the same base, with the
rays and seed of the variant's scenario (the same numbers as the page for the same seed and ray count).

Options
  --trace           trace every variant anew, ignoring the results in the file
  --rays N          rays per trace when tracing, 1000 to 100000000 (default: each scenario's own)
  --threads T       1 to ${MAX_THREADS} (default: all cores)
  --json            print one JSON object (variants, where their results came from, and the rows)

Traced figures carry ± one binomial standard error; the ratio to the first variant carries the
propagated error of both traces. Percent columns are percent of launched rays.`;

const options: OptionSpec = {
  json: { type: 'boolean' },
  trace: { type: 'boolean' },
  rays: { type: 'string' },
  threads: { type: 'string' }
};

const MAX_FILE_BYTES = 20 * 1024 * 1024;

function readJsonFile(path: string): unknown {
  let text: string;
  try {
    if (statSync(path).size > MAX_FILE_BYTES) throw new CliError(`the file is larger than 20 MB (${truncate(path, 80)})`);
    text = readFileSync(path, 'utf8');
  } catch (error) {
    if (error instanceof CliError) throw error;
    throw new CliError(`cannot read '${truncate(path, 80)}'`);
  }
  try {
    return JSON.parse(text);
  } catch {
    throw new CliError(`'${truncate(path, 80)}' is not valid JSON`);
  }
}

/** Columns padded to their widest cell; the first column left-aligned, the others right-aligned. */
function table(header: string[], body: string[][]): string {
  const widths = header.map((h, j) => Math.max(h.length, ...body.map((r) => r[j].length)));
  const line = (cells: string[]) => cells.map((c, j) => (j === 0 ? c.padEnd(widths[j]) : c.padStart(widths[j]))).join('  ');
  return [line(header), widths.map((w) => '-'.repeat(w)).join('  '), ...body.map(line)].join('\n');
}

export async function run(argv: string[]): Promise<void> {
  const { values, positionals } = parseOptions(argv, options, 'variants');
  if (positionals.length !== 1) throw new CliError("variants needs one comparison file: outcouple variants FILE.json (see 'outcouple variants --help')");
  const rays = values.rays === undefined ? undefined : integerOption(values, 'rays', 1000, 1e8);
  const threads = integerOption(values, 'threads', 1, MAX_THREADS, defaultThreads());
  const read = readComparison(readJsonFile(positionals[0]));
  if (!read.ok) throw new CliError(read.message);
  if (read.variants.length === 0) throw new CliError('the file holds no variants');

  const retrace = values.trace === true;
  const results: VariantResult[] = [];
  const origin: ('file' | 'traced')[] = [];
  // The pool starts only when a variant has to be traced
  const needsTrace = retrace || read.results.some((r) => !r);
  const pool = threads > 1 && needsTrace ? createNodeTracePool(threads) : null;
  const tracer: Tracer = pool
    ? tallyTracer((pkg, o, onProgress) => pool.run(pkg, o, onProgress), threads)
    : tallyTracer(async (pkg, o) => traceSync(pkg, o), 1);
  try {
    for (let i = 0; i < read.variants.length; i++) {
      const given = read.results[i];
      if (given && !retrace) {
        results.push(given);
        origin.push('file');
        continue;
      }
      results.push(await traceVariant(tracer, read.variants[i].scenario, { rays }));
      origin.push('traced');
    }
  } finally {
    await pool?.close();
  }

  const figures = read.variants.map((v, i) => variantFigures(v.name, v.scenario, results[i]));
  const rows = comparisonRows(figures);
  const names = read.variants.map((v) => v.name);
  if (values.json === true) {
    const doc = {
      variants: read.variants.map((v, i) => ({ name: v.name, scenarioName: v.scenario.name, results: origin[i], rays: results[i].package.rays, seed: results[i].seed })),
      rows: rows.map((r) => ({ key: r.key, label: r.label, unit: r.unit, cells: r.cells, why: r.why }))
    };
    process.stdout.write(JSON.stringify(doc, null, 2) + '\n');
    return;
  }
  const lines = ['Variants side by side', '---------------------'];
  read.variants.forEach((v, i) => {
    const from = origin[i] === 'file' ? 'results from the file' : `traced now, ${results[i].package.rays.toLocaleString('en-US')} rays, seed ${results[i].seed}`;
    lines.push(`${v.name}: ${v.scenario.name} (${from})`);
  });
  lines.push('');
  lines.push(table(['Figure', ...names], rows.map((r) => [r.label, ...names.map((_, i) => cellText(r, i))])));
  lines.push('', 'note: ± is one standard error; the ratio σ treats both traces as independent (same-seed traces are correlated, so it errs on the large side).');
  process.stdout.write(lines.join('\n') + '\n');
}
