import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli, runJson } from './run-cli';

const dir = mkdtempSync(join(tmpdir(), 'outcouple-phosphor-'));
function file(name: string, text: string): string {
  const path = join(dir, name);
  writeFileSync(path, text);
  return path;
}

describe('outcouple trace with a phosphor', () => {
  it('a coefficient table with a pure absorber (QY 1, line emission at 560 nm) converts light; photon fractions add to the extraction (common practice)', () => {
    const coefficients = file('c.csv', 'wavelength_nm,mus_per_mm,mua_per_mm,g\n400,0,2,0\n500,0,2,0\n520,0,0,0\n800,0,0,0\n');
    const out = runJson(['trace', '--rays', '4000', '--threads', '1', '--phosphor-coefficients', coefficients, '--phosphor-emission', 'gaussian:560:0.1', '--quantum-yield', '1']);
    expect(out.escapedBlue + out.escapedConverted).toBeCloseTo(out.extraction, 12);
    expect(out.escapedConverted).toBeGreaterThan(out.escapedBlue);
    expect(out.ledger.phosphor).toBe(0);
    expect(out.scatterEventsPerRay).toBe(0);
    // Energy: converted photons carry 450/560 of a chip photon's energy (Stokes)
    expect(out.energyEfficiency).toBeCloseTo(out.escapedBlue + (out.escapedConverted * 450) / 560, 3);
    expect(out.spectrum.length).toBeGreaterThan(100);
    expect(out.color.x).toBeGreaterThan(0);
  });

  it.each([
    [['--phosphor', 'garnet-yellow', '--phosphor-wt', '120'], /--phosphor-wt must be a number from 0 to 60/],
    [['--phosphor', 'garnet-yellow', '--phosphor-diameter', '80'], /--phosphor-diameter must be a number from 0.05 to 50/],
    [['--phosphor', 'no-such'], /--phosphor: unknown phosphor/],
    [['--phosphor', 'garnet-yellow', '--phosphor-region', 'remote'], /--phosphor-region: 'remote' is not traced yet/],
    [['--phosphor', 'garnet-yellow', '--phosphor-emission', 'gaussian:560:0.01'], /FWHM must be from 0.1 to 500 nm/]
  ])('bad input %j: one line naming the option and range, exit 2', (args, message) => {
    const r = runCli(['trace', '--rays', '1000', ...args]);
    expect(r.code).toBe(2);
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
    expect(r.stderr).toMatch(message);
  });

  it('a coefficient table with g outside (−1, 1) is refused naming the row', () => {
    const bad = file('bad.csv', 'wavelength_nm,mus_per_mm,mua_per_mm,g\n450,1,1,1.5\n');
    const r = runCli(['trace', '--rays', '1000', '--phosphor-coefficients', bad, '--phosphor-emission', 'gaussian:560:100']);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/row 1: g must lie in \(−1, 1\)/);
  });
});
