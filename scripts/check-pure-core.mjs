// The physics core stays pure: no Svelte, SvelteKit, Chart.js or DOM globals in these folders.
// Node-only helpers live in a `node/` subfolder and are exempt from the DOM rule but not from the UI rule.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';

const pureRoots = ['src/lib/optics', 'src/lib/trace', 'src/lib/materials', 'src/lib/scenario', 'src/lib/photometry',
  'src/lib/decisions', 'src/lib/export', 'src/lib/variants', 'src/lib/color', 'src/lib/scatter', 'src/lib/phosphors',
  'src/lib/optic-design', 'src/lib/optic-trace', 'src/lib/runs'];
const browserShims = new Set(['trace-worker.ts', 'trace-pool.ts', 'browser-tracer.ts']); // worker glue may use Worker/self/navigator
const banned = [
  [/from\s+['"]svelte(\/[^'"]*)?['"]/, 'imports svelte'],
  [/from\s+['"]\$app\//, 'imports $app'],
  [/from\s+['"]chart\.js/, 'imports chart.js'],
  [/\b(document|window|localStorage|sessionStorage)\./, 'touches a DOM global'],
  [/Math\.random\s*\(/, 'uses Math.random (use the seeded generator)']
];

function* walk(dir) {
  let entries = [];
  try { entries = readdirSync(dir); } catch { return; }
  for (const name of entries) {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) yield* walk(path);
    else if (/\.(ts|js|mjs)$/.test(name) && !name.endsWith('.svelte.ts')) yield path;
  }
}

const problems = [];
for (const root of pureRoots) {
  for (const file of walk(root)) {
    const text = readFileSync(file, 'utf8');
    for (const [pattern, what] of banned) {
      if (what === 'touches a DOM global' && browserShims.has(file.split('/').pop())) continue;
      if (pattern.test(text)) problems.push(`${file}: ${what}`);
    }
  }
}
if (problems.length) {
  console.error('Pure-core rule broken:\n' + problems.join('\n'));
  process.exit(1);
}
console.log(`pure-core rule holds for ${pureRoots.join(', ')}`);
