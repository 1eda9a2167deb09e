import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { demoScenario } from '../../../src/lib/scenario/defaults';
import { summarize } from '../../../src/lib/trace/summary';
import { traceSync } from '../../../src/lib/trace/trace';
import { variantRequest } from '../../../src/lib/variants/trace-variant';
import { comparisonRows } from '../../../src/lib/variants/comparison-rows';
import { variantFigures } from '../../../src/lib/variants/variant-figures';
import { comparisonJson } from '../../../src/lib/variants/variants-export';
import { fakeResult, phenylScenario, twoVariants } from '../variants/fixtures';
import { runCli, runJson } from './run-cli';

const dir = mkdtempSync(join(tmpdir(), 'outcouple-variants-'));
function file(name: string, content: unknown): string {
  const path = join(dir, name);
  writeFileSync(path, typeof content === 'string' ? content : JSON.stringify(content));
  return path;
}

describe('outcouple variants', () => {
  it('traces a variants document that carries no results, the same rays as the page for the same seed', () => {
    const path = file('doc.json', twoVariants());
    const out = runJson(['variants', path, '--rays', '2000', '--threads', '1']);
    expect(out.variants.map((v: { name: string; results: string }) => [v.name, v.results])).toEqual([['A', 'traced'], ['B', 'traced']]);
    // the page's plan traced in-process: identical tallies for the same seed and rays (chunk seeding)
    const plan = variantRequest(phenylScenario(), 2000);
    const p = summarize(traceSync(plan.pkg, { rays: plan.rays, seed: plan.seed }));
    const extraction = out.rows.find((r: { key: string }) => r.key === 'extraction');
    const sigma = Math.sqrt((p.extraction * (1 - p.extraction)) / 2000) * 100;
    expect(Math.abs(extraction.cells[1].value - p.extraction * 100)).toBeLessThanOrEqual(sigma / 20);
  });

  it('prints the results a saved comparison carries, side by side, without tracing', () => {
    const variants = [{ name: 'Methyl', scenario: demoScenario() }, { name: 'Phenyl', scenario: phenylScenario() }];
    const results = [fakeResult(0.386, 0.186), fakeResult(0.461, 0.186)];
    const rows = comparisonRows(variants.map((v, i) => variantFigures(v.name, v.scenario, results[i])));
    const path = file('saved.json', comparisonJson(variants, results, rows));
    const run = runCli(['variants', path]);
    expect(run.code).toBe(0);
    expect(run.stdout).toMatch(/Methyl: .*\(results from the file\)/);
    expect(run.stdout).toMatch(/Package extraction, traced\s+38\.600 ± 0\.097 %\s+46\.10 ± 0\.10 %/);
    expect(run.stdout).toMatch(/Ratio to Methyl \(traced extraction\)\s+1 ×\s+1\.1943 ± 0\.0040 ×/);
  });

  it.each([
    [[], /needs one comparison file/],
    [['/nonexistent/outcouple.json'], /cannot read/],
    [['BAD_JSON'], /is not valid JSON/],
    [['BAD_SCENARIO'], /Variant 2 \(B\): Chip width must be between 0\.001 and 1000 mm/],
    [['DOC', '--rays', '5'], /--rays must be a number from 1000 to 100000000/]
  ])('bad input %j: one line naming the problem, exit code 2', (args, message) => {
    const bad = twoVariants();
    (bad.variants[1].scenario.chip as { widthMm: number }).widthMm = 0;
    const map: Record<string, string> = { BAD_JSON: file('bad.json', '{'), BAD_SCENARIO: file('bad-scenario.json', bad), DOC: file('doc2.json', twoVariants()) };
    const run = runCli(['variants', ...args.map((a) => map[a] ?? a)]);
    expect(run.code).toBe(2);
    expect(run.stderr).toMatch(message);
    expect(run.stderr.trim().split('\n')).toHaveLength(1);
  });
});
