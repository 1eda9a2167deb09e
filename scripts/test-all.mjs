// Runs every test tier in order: pure-core rule, type check, unit + reference + property tests, browser tests.
// Stops at the first failing tier and exits with its code.
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

const chromium = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

const tiers = [
  ['pure-core rule', 'node', ['scripts/check-pure-core.mjs']],
  ['type check', 'npm', ['run', '--silent', 'check']],
  ['unit, reference and property tests', 'npx', ['vitest', 'run']],
  ['browser tests', 'npx', ['playwright', 'test']]
];

for (const [name, cmd, args] of tiers) {
  if (name === 'browser tests' && !existsSync(chromium)) {
    console.error(
      `No Chromium at ${chromium}: install Debian's package (apt-get install chromium) or set CHROMIUM_PATH to a Chromium binary (e.g. one from 'npx playwright install chromium' where downloads are allowed).`
    );
    process.exit(1);
  }
  console.log(`\n=== ${name} ===`);
  const run = spawnSync(cmd, args, { stdio: 'inherit', env: { ...process.env, CI: process.env.CI ?? 'true' } });
  if (run.status !== 0) {
    console.error(`\n${name} failed (exit ${run.status ?? run.signal}).`);
    process.exit(run.status ?? 1);
  }
}
console.log('\nAll test tiers passed.');
