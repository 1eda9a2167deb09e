import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

const entry = fileURLToPath(new URL('../../../bin/outcouple.mjs', import.meta.url));

/** Runs the real command line in a child process, as a user would. */
export function runCli(args: string[]): { code: number; stdout: string; stderr: string } {
  const run = spawnSync(process.execPath, [entry, ...args], { encoding: 'utf8', timeout: 60_000 });
  return { code: run.status ?? -1, stdout: run.stdout, stderr: run.stderr };
}

/** Runs the command line and parses its JSON output. */
export function runJson(args: string[]): Record<string, any> {
  const run = runCli([...args, '--json']);
  if (run.code !== 0) throw new Error(`exit ${run.code}: ${run.stderr}`);
  return JSON.parse(run.stdout);
}
