import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseCieCsv } from '../../../src/lib/color';
import { runCli, runJson } from './run-cli';

const dir = mkdtempSync(join(tmpdir(), 'outcouple-color-'));
function file(name: string, text: string): string {
  const path = join(dir, name);
  writeFileSync(path, text);
  return path;
}
const leds = parseCieCsv(readFileSync(new URL('../../../data/cie/CIE_illum_LEDs_1nm.csv', import.meta.url), 'utf8'), 10, 'leds');

describe('outcouple color', () => {
  it('color LED-B3.csv --json gives the CIE 015:2018 chromaticity 0.3756, 0.3723 and CCT 4103 K', () => {
    const path = file('b3.csv', ['wavelength_nm,value', ...leds.map((r) => `${r[0]},${r[3]}`)].join('\n'));
    const out = runJson(['color', path]);
    // published: CIE 015:2018 Table 12.2 (LED-B3), x, y to 4 decimals, CCT to 1 K
    expect(Math.abs(out.x - 0.3756)).toBeLessThan(2e-4);
    expect(Math.abs(out.y - 0.3723)).toBeLessThan(2e-4);
    expect(Math.abs(out.cctK - 4103)).toBeLessThan(5);
    expect(out.r).toHaveLength(14);
    expect(out.ra).toBeCloseTo(out.r.slice(0, 8).reduce((a: number, b: number) => a + b, 0) / 8, 10);
    expect(out.uPrime).toBeCloseTo((4 * out.x) / (-2 * out.x + 12 * out.y + 3), 10); // CIE 015:2018 u′ from x, y
    expect(out.lerLmPerW).toBeGreaterThan(250);
    for (const key of ['x', 'y', 'uPrime', 'vPrime', 'cctK', 'duv', 'ra', 'r', 'lerLmPerW']) expect(out).toHaveProperty(key);
  });

  it('a file without header and with comment lines reads the same; a green line has no CRI and says why', () => {
    const path = file('plain.csv', ['# LED-B3, no header', ...leds.map((r) => `${r[0]},${r[3]}`)].join('\r\n'));
    expect(runJson(['color', path]).cctK).toBeGreaterThan(4098);
    const green = runJson(['color', file('green.csv', '530,0\n532,1\n534,0\n')]);
    expect(green.ra).toBeNull();
    expect(green.r).toBeNull();
    expect(green.cctK).toBeNull();
    expect(Math.abs(green.duv)).toBeGreaterThan(0.05);
    expect(green.warnings.join(' ')).toMatch(/no CCT: \|Duv\| = .* exceeds 0.05/);
    expect(Number.isFinite(green.lerLmPerW)).toBe(true);
  });

  it('prints a readable table with units', () => {
    const run = runCli(['color', file('b1.csv', leds.map((r) => `${r[0]},${r[1]}`).join('\n'))]);
    expect(run.code).toBe(0);
    expect(run.stdout).toMatch(/CCT\s+2733 K/);
    expect(run.stdout).toMatch(/luminous efficacy of radiation\s+\d+\.\d lm\/W/);
  });

  it.each([
    ['nonnumber.csv', 'wavelength_nm,value\n400,1\n500,abc\n', /line 3: value must be a finite number/],
    ['unsorted.csv', '400,1\n500,2\n450,1\n', /line 3: wavelength_nm must be above the previous row's 500 nm/],
    ['negative.csv', '400,1\n500,-2\n', /line 2: value must be a finite number ≥ 0/],
    ['header.csv', 'lambda,power\n400,1\n', /line 1: expected the header 'wavelength_nm,value'/],
    ['dark.csv', '900,1\n950,1\n', /no power between 360 and 830 nm/],
    ['one.csv', '500,1\n', /2 to 100000 rows/]
  ])('bad file %s: one line naming the line and field, exit 2', (name, text, message) => {
    const run = runCli(['color', file(name, text)]);
    expect(run.code).toBe(2);
    expect(run.stderr).toMatch(message);
    expect(run.stderr.trim().split('\n')).toHaveLength(1);
  });

  it('a missing file or no file is a one-line error, exit 2', () => {
    expect(runCli(['color', join(dir, 'nope.csv')]).stderr).toMatch(/cannot read/);
    const run = runCli(['color']);
    expect(run.code).toBe(2);
    expect(run.stderr).toMatch(/name one spectrum file/);
  });
});

describe('outcouple mie', () => {
  it('reproduces Wiscombe\'s test case m = 1.5 + 1i, x = 1 (Qext 2.336321, Qsca 0.6634538)', () => {
    // published: W. J. Wiscombe, NCAR/TN-140+STR (1979), MIEV0 test case 14; x = πd/λ with d = λ/π
    const out = runJson(['mie', '--diameter', String(0.5 / Math.PI), '--n-particle', '1.5', '--k-particle', '1', '--wavelength', '500']);
    expect(out.sizeParameter).toBeCloseTo(1, 12);
    expect(Math.abs(out.qExt - 2.336321)).toBeLessThan(2e-6);
    expect(Math.abs(out.qSca - 0.6634538)).toBeLessThan(2e-6);
    expect(out).not.toHaveProperty('musPerMm');
  });

  it('with a load gives μs = φ·(3/2d)·Qsca and μa = φ·(3/2d)·Qabs', () => {
    const args = ['mie', '--diameter', '10', '--n-particle', '1.83', '--k-particle', '0.0005', '--n-host', '1.41', '--wavelength', '450'];
    const out = runJson([...args, '--wt', '8', '--density-particle', '4.55', '--density-host', '1.1']);
    // volume fraction from the weight fraction: φ = (w/ρp)/(w/ρp + (1 − w)/ρh) (mixture rule, common practice)
    const phi = 0.08 / 4.55 / (0.08 / 4.55 + 0.92 / 1.1);
    expect(out.volumeFraction).toBeCloseTo(phi, 12);
    // number density × cross section: N·πd²/4·Q with N = φ/(πd³/6), d = 0.01 mm
    expect(out.musPerMm).toBeCloseTo((phi * 1.5 * out.qSca) / 0.01, 10);
    expect(out.muaPerMm).toBeCloseTo((phi * 1.5 * out.qAbs) / 0.01, 10);
    expect(out.g).toBeGreaterThan(0.8);
  });

  it.each([
    [['mie', '--diameter', '500', '--n-particle', '1.8', '--wavelength', '450'], /--diameter must be a number from 0.05 to 50/],
    [['mie', '--diameter', '10', '--n-particle', '1.8'], /--wavelength is required/],
    [['mie', '--diameter', '10', '--n-particle', '1.8', '--wavelength', '450', '--wt', '8'], /--density-particle is required/],
    [['mie', '--diameter', '10', '--n-particle', '1.8', '--wavelength', '450', '--density-host', '1.1'], /need --wt/],
    [['mie', '--diameter', '10', '--n-particle', '1.8', '--wavelength', '450', '--wt', '120', '--density-particle', '4', '--density-host', '1'], /--wt must be a number from 0 to 95/],
    [['mie', '--diameter', '10', '--n-particle', '1.8', '--wavelength', '450', '--k-particle', '2'], /--k-particle must be a number from 0 to 1/]
  ])('bad input %j: one line naming the option, exit 2', (args, message) => {
    const run = runCli(args);
    expect(run.code).toBe(2);
    expect(run.stderr).toMatch(message);
    expect(run.stderr.trim().split('\n')).toHaveLength(1);
  });
});
