// The physics core stays pure: no Svelte, SvelteKit, Chart.js or DOM globals in these folders.
// Node-only helpers live in a `node/` subfolder and are exempt from the DOM rule but not from the UI rule.
// State modules (`*.svelte.ts`) are the browser's side and skip the purity rules, but no file of a core
// folder, state modules included, may lean on the UI's own folder (src/lib/components).
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';

const coreRoots = ['src/lib/optics', 'src/lib/trace', 'src/lib/materials', 'src/lib/scenario', 'src/lib/photometry',
  'src/lib/decisions', 'src/lib/export', 'src/lib/sweeps', 'src/lib/materials-user', 'src/lib/variants', 'src/lib/color',
  'src/lib/scatter', 'src/lib/phosphors', 'src/lib/optic-design', 'src/lib/optic-trace', 'src/lib/runs', 'src/lib/format', 'src/lib/white'];
// Chart dataset builders are pure too; chart.ts is the one file that draws (Chart.js and the DOM).
const pureRoots = [...coreRoots, 'src/lib/charts'];
const drawingGlue = new Set(['src/lib/charts/chart.ts']);
const browserShims = new Set(['trace-worker.ts', 'trace-pool.ts', 'browser-tracer.ts']); // worker glue may use Worker/self/navigator
const banned = [
  [/from\s+['"]svelte(\/[^'"]*)?['"]/, 'imports svelte'],
  [/from\s+['"]\$app\//, 'imports $app'],
  [/^(?!import\s+type\b).*from\s+['"]chart\.js/m, 'imports chart.js (type-only imports are fine)'],
  [/\b(document|window|localStorage|sessionStorage)\./, 'touches a DOM global'],
  [/Math\.random\s*\(/, 'uses Math.random (use the seeded generator)']
];
const uiImport = /from\s+['"](\$lib\/components|(\.\.\/)+components)\//;

function* walk(dir, withState) {
  let entries = [];
  try { entries = readdirSync(dir); } catch { return; }
  for (const name of entries) {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) yield* walk(path, withState);
    else if (/\.(ts|js|mjs)$/.test(name) && (withState || !name.endsWith('.svelte.ts'))) yield path;
  }
}

const problems = [];
for (const root of pureRoots) {
  for (const file of walk(root, false)) {
    if (drawingGlue.has(file)) continue;
    const text = readFileSync(file, 'utf8');
    for (const [pattern, what] of banned) {
      if (what === 'touches a DOM global' && browserShims.has(file.split('/').pop())) continue;
      if (pattern.test(text)) problems.push(`${file}: ${what}`);
    }
  }
}
for (const root of coreRoots) {
  for (const file of walk(root, true)) {
    if (uiImport.test(readFileSync(file, 'utf8'))) problems.push(`${file}: imports from src/lib/components (move what it needs into a core folder)`);
  }
}
if (problems.length) {
  console.error('Pure-core rule broken:\n' + problems.join('\n'));
  process.exit(1);
}
console.log(`pure-core rule holds for ${pureRoots.join(', ')} (chart.ts excepted as the drawing glue)`);
