import { readFileSync, statSync } from 'node:fs';
import { scenarioRanking, traceRanking, TRACE_SEPARATION_K, type TracedRow } from '../../lib/decisions';
import { tallyTracer, type Tracer } from '../../lib/runs';
import { DEMO_SCENARIO, demoScenario, readScenario, resolveScenario, toTracePackage, type Scenario } from '../../lib/scenario';
import { traceSync } from '../../lib/trace/trace';
import { createNodeTracePool, defaultThreads, MAX_THREADS } from '../../lib/trace/node/node-pool';
import { CliError } from '../cli-error';
import { integerOption, parseOptions, stringOption, truncate, type OptionSpec } from '../options';
import { emit, percent, type Row } from '../output';

export const summary = 'encapsulants ranked by the Monte Carlo trace of the whole package (the app\'s /compare)';
export const help = `outcouple compare — every encapsulant put into the package in turn, ranked by the traced extraction

  --scenario FILE.json     a scenario saved by the app (default: the app's demo scenario)
  --rays N                 rays per candidate, 1000 to 100000000 (default: the scenario's, ${DEMO_SCENARIO.trace.rays} for the demo)
  --seed S                 0 to 4294967295 (default: the scenario's); the current encapsulant uses it, the others
                           their own seed derived from it, so the runs are independent
  --optics                 also rank optic materials (lens plastics and glasses), which are not potting materials
  --threads T              1 to ${MAX_THREADS} (default: all cores)
  --json                   print one JSON object

Each row: traced package extraction ± 1 standard error, the ratio to the current encapsulant ± σ, and the ideal
one-face reference (closed form). Neighbours within ${TRACE_SEPARATION_K} standard errors of their difference are marked ≈.

Example: outcouple compare --rays 100000`;

const options: OptionSpec = {
  scenario: { type: 'string' }, rays: { type: 'string' }, seed: { type: 'string' }, threads: { type: 'string' },
  optics: { type: 'boolean' }, json: { type: 'boolean' }
};

const MAX_SCENARIO_BYTES = 2 * 1024 * 1024;

/** An app scenario from a file (the page's JSON export or a saved scenario). */
function scenarioFile(path: string): Scenario {
  let raw: unknown;
  try {
    if (statSync(path).size > MAX_SCENARIO_BYTES) throw new CliError(`--scenario: file is larger than 2 MB (${truncate(path, 80)})`);
    raw = JSON.parse(readFileSync(path, 'utf8'));
  } catch (error) {
    if (error instanceof CliError) throw error;
    throw new CliError(`--scenario: cannot read '${truncate(path, 80)}' as JSON`);
  }
  const object = raw as Record<string, unknown> | null;
  const candidate = object && typeof object === 'object' && !('version' in object) && 'scenario' in object ? object.scenario : raw;
  const read = readScenario(candidate);
  if (!read.ok) throw new CliError(`--scenario: ${read.message}`);
  return read.scenario;
}

function rowJson(t: TracedRow) {
  return {
    rank: t.rank, id: t.row.id, name: t.row.name, category: t.row.category, nEnc: t.row.nEnc, isCurrent: t.row.isCurrent,
    seed: t.seed, rays: t.summary.rays, extraction: t.summary.extraction, stderr: t.summary.stderr,
    overCurrent: t.overCurrent, separableFromNext: t.separableFromNext,
    idealOneFace: t.row.etaDome, maxServiceTempC: t.row.maxServiceTempC
  };
}

export async function run(argv: string[]): Promise<void> {
  const { values, positionals } = parseOptions(argv, options, 'compare');
  if (positionals.length) throw new CliError(`compare: unexpected argument '${truncate(positionals[0])}'`);
  const path = stringOption(values, 'scenario');
  const scenario = path ? scenarioFile(path) : demoScenario();
  const rays = integerOption(values, 'rays', 1000, 1e8, scenario.trace.rays);
  const seed = integerOption(values, 'seed', 0, 4294967295, scenario.trace.seed);
  const threads = integerOption(values, 'threads', 1, MAX_THREADS, defaultThreads());
  const resolved = resolveScenario(scenario);
  const ranking = scenarioRanking(scenario, resolved, [], 'design', values.optics === true);
  if (ranking.rows.length === 0) throw new CliError('no candidate could be ranked for this scenario');
  const base = toTracePackage(scenario, resolved);

  const started = performance.now();
  const pool = threads > 1 ? createNodeTracePool(threads) : null;
  const tracer: Tracer = pool
    ? tallyTracer((pkg, o, onProgress) => pool.run(pkg, o, onProgress), threads)
    : tallyTracer(async (pkg, o) => traceSync(pkg, o), 1);
  let traced: TracedRow[];
  try {
    traced = await traceRanking(tracer, base, ranking.rows, { rays, seed });
  } finally {
    await pool?.close();
  }
  const seconds = (performance.now() - started) / 1000;

  const notes: string[] = [...ranking.warnings];
  for (let i = 0; i < traced.length - 1; i++) {
    if (traced[i].separableFromNext === false) {
      notes.push(`${traced[i].row.name} and ${traced[i + 1].row.name} are not separable within ${TRACE_SEPARATION_K} standard errors at ${rays} rays`);
    }
  }
  if (scenario.encapsulant.shape === 'none') notes.push("the scenario has no encapsulant: each candidate was traced as a hemispherical dome of the scenario's radius");
  for (const s of ranking.skipped) notes.push(`not ranked: ${s.name} — ${s.reason}`);
  const rows: Row[] = traced.map((t) => [
    `${t.rank}. ${t.row.name}${t.row.isCurrent ? ' (current)' : ''}${t.separableFromNext === false ? ' ≈' : ''}`,
    `${percent(t.summary.extraction, 2)} ± ${percent(t.summary.stderr, 2)}` +
      (t.overCurrent ? `   ${t.overCurrent.gain.toFixed(4)} ± ${t.overCurrent.stderr.toFixed(4)} × current` : '') +
      `   ideal one-face ${percent(t.row.etaDome, 2)}`
  ]);
  rows.push(['rays per candidate', rays], ['seed', seed], ['threads', threads], ['time', seconds.toFixed(1), 's']);
  emit(
    values.json === true,
    { scenario: scenario.name, wavelengthNm: ranking.wavelengthNm, rays, seed, threads, separationK: TRACE_SEPARATION_K, ranking: traced.map(rowJson), notes },
    `Encapsulants ranked by the traced package extraction: ${scenario.name}`,
    rows,
    notes
  );
}
