/**
 * The `color` and `mie` commands under generated input, run in-process through main(argv): exit 0 or 2 (never
 * 1); on 2 one line "outcouple <command>: …"; on 0 a JSON object whose numbers are all finite (nulls only in
 * the fields documented as nullable: cctK, duv, ra, r).
 */
import fc from 'fast-check';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { main } from '../../src/cli/main';
import { checkAsync } from './support';

const dir = mkdtempSync(join(tmpdir(), 'outcouple-fuzz-color-'));
const NULLABLE = new Set(['cctK', 'duv', 'ra', 'r']);

async function runMain(argv: string[]): Promise<{ code: number; stdout: string; stderr: string }> {
  let stdout = '';
  let stderr = '';
  const out = process.stdout.write;
  const err = process.stderr.write;
  process.stdout.write = ((chunk: string | Uint8Array) => ((stdout += String(chunk)), true)) as typeof process.stdout.write;
  process.stderr.write = ((chunk: string | Uint8Array) => ((stderr += String(chunk)), true)) as typeof process.stderr.write;
  try {
    return { code: await main(argv), stdout, stderr };
  } finally {
    process.stdout.write = out;
    process.stderr.write = err;
  }
}

function expectContract(command: string, r: { code: number; stdout: string; stderr: string }, where: string): void {
  expect([0, 2], `${where}: ${r.stderr}`).toContain(r.code);
  if (r.code === 2) {
    expect(r.stderr.startsWith(`outcouple ${command}: `) && r.stderr.indexOf('\n') === r.stderr.length - 1, `${where}: ${r.stderr}`).toBe(true);
    return;
  }
  expect(r.stderr).toBe('');
  const walk = (value: unknown, key: string): void => {
    if (value === null) expect(NULLABLE.has(key), `${where}: null ${key}`).toBe(true);
    else if (typeof value === 'number') expect(Number.isFinite(value), `${where}: ${key}`).toBe(true);
    else if (Array.isArray(value)) value.forEach((v) => walk(v, key));
    else if (value && typeof value === 'object') for (const [k, v] of Object.entries(value)) walk(v, k);
  };
  walk(JSON.parse(r.stdout), '');
}

const hostile = fc.constantFrom('NaN', 'Infinity', '-1', '', '1e400', 'abc', '__proto__', '0', '1e-320');

describe('color and mie commands under generated input', () => {
  it('color: random spectrum files give a colour or one line naming the line and field', async () => {
    const cell = fc.oneof(fc.double({ min: -10, max: 2000, noNaN: true }).map(String), hostile);
    const file = fc.array(fc.tuple(cell, cell), { minLength: 0, maxLength: 30 });
    let n = 0;
    await checkAsync('cli color file', fc.asyncProperty(file, fc.boolean(), async (rows, sorted) => {
      const lines = rows.map(([a, b]) => `${a},${b}`);
      if (sorted) lines.sort((p, q) => Number(p.split(',')[0]) - Number(q.split(',')[0]));
      const path = join(dir, `f${n++}.csv`);
      writeFileSync(path, ['wavelength_nm,value', ...lines].join('\n'));
      expectContract('color', await runMain(['color', path, '--json']), lines.join('|').slice(0, 200));
    }), 200);
  });

  it('color: smooth random spectra always give a colour with finite figures', async () => {
    let n = 0;
    await checkAsync('cli color smooth', fc.asyncProperty(fc.double({ min: 400, max: 700, noNaN: true }), fc.double({ min: 1, max: 200, noNaN: true }), async (peak, fwhm) => {
      const path = join(dir, `s${n++}.csv`);
      const lines = [];
      for (let nm = 380; nm <= 780; nm += 2) lines.push(`${nm},${Math.exp(-0.5 * ((nm - peak) / (fwhm / 2.3548)) ** 2) + 1e-3}`);
      writeFileSync(path, lines.join('\n'));
      const r = await runMain(['color', path, '--json']);
      expect(r.code).toBe(0);
      expectContract('color', r, `${peak} ${fwhm}`);
    }), 60);
  });

  it('mie: random and hostile option values run or are refused in one line', async () => {
    const value = (min: number, max: number) => fc.oneof(fc.double({ min, max, noNaN: true }).map(String), hostile);
    await checkAsync('cli mie', fc.asyncProperty(
      value(0.01, 60), value(0.9, 4.5), value(-0.1, 1.2), value(0.9, 2.6), value(150, 2600), fc.option(fc.tuple(value(-5, 100), value(0.3, 30), value(0.3, 30)), { nil: undefined }),
      async (d, n, k, host, wl, load) => {
        const argv = ['mie', `--diameter=${d}`, `--n-particle=${n}`, `--k-particle=${k}`, `--n-host=${host}`, `--wavelength=${wl}`, '--json'];
        if (load) argv.push(`--wt=${load[0]}`, `--density-particle=${load[1]}`, `--density-host=${load[2]}`);
        expectContract('mie', await runMain(argv), argv.join(' '));
      }), 300);
  });
});
