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
    [['--phosphor', 'garnet-yellow', '--phosphor-wt', '-1'], /--phosphor-wt must be a number from 0 to 60/],
    [['--phosphor', 'garnet-yellow', '--phosphor-diameter', '0.01'], /--phosphor-diameter must be a number from 0.05 to 50 .*the range the Mie evaluation supports/],
    [['--phosphor', 'garnet-yellow', '--quantum-yield', '1.2'], /--quantum-yield must be a number from 0 to 1/],
    [['--phosphor', 'garnet-yellow', '--phosphor-region', 'sprayed'], /--phosphor-region/],
    [['--phosphor', 'garnet-yellow', '--phosphor-region', 'remote'], /--phosphor-region remote needs --phosphor-thickness T \(0.005 to 10 mm\)/],
    [['--phosphor', 'garnet-yellow', '--phosphor-thickness', '0.1'], /--phosphor-thickness applies to a layer region/],
    [['--phosphor', 'garnet-yellow', '--phosphor-region', 'conformal', '--phosphor-thickness', '11'], /--phosphor-thickness must be a number from 0.005 to 10/],
    [['--phosphor', 'garnet-yellow', '--phosphor-region', 'conformal', '--phosphor-thickness', '3'], /--phosphor-thickness: Phosphor layer thickness must be from 0.005 mm to below 1.05 mm for a conformal layer/],
    [['--phosphor', 'garnet-yellow', '--phosphor-region', 'floor', '--phosphor-thickness', '0.1'], /--phosphor-region: Phosphor region 'floor' needs a cup or a cylinder/],
    [['--phosphor', 'garnet-yellow', '--phosphor-emission', 'gaussian:560:0.01'], /FWHM must be from 0.1 to 500 nm/]
  ])('bad input %j: one line naming the option and range, exit 2', (args, message) => {
    const r = runCli(['trace', '--rays', '1000', ...args]);
    expect(r.code).toBe(2);
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
    expect(r.stderr).toMatch(message);
  });

  it.each([
    ['a non-numeric row', 'wavelength_nm,mus_per_mm,mua_per_mm,g\n450,1,1,0\n460,x,1,0\n', /--phosphor-coefficients: line 3 must hold 4 numbers \(wavelength_nm, mus_per_mm, mua_per_mm, g\)/],
    ['unsorted rows', 'wavelength_nm,mus_per_mm,mua_per_mm,g\n460,1,1,0\n450,1,1,0\n', /line 3: wavelength_nm must be above the previous row's/],
    ['a negative row', 'wavelength_nm,mus_per_mm,mua_per_mm,g\n450,1,-1,0\n', /line 2: mua_per_mm must be ≥ 0 \(got -1\)/],
    ['a non-numeric first data row after the header', 'wavelength_nm,mus_per_mm,mua_per_mm,g\nabc,1,1,0\n', /line 2 must hold 4 numbers/]
  ])('a coefficient file with %s: one line naming the option and the rule, exit 2', (_, text, message) => {
    const r = runCli(['trace', '--rays', '1000', '--phosphor-coefficients', file('rows.csv', text), '--phosphor-emission', 'gaussian:560:100']);
    expect(r.code).toBe(2);
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
    expect(r.stderr).toMatch(message);
  });

  it.each([
    ['a non-numeric row', 'wavelength_nm,value\n500,1\n510,?\n', /--phosphor-emission: line 3 must hold 2 numbers/],
    ['unsorted rows', 'wavelength_nm,value\n520,1\n510,1\n', /--phosphor-emission: line 3: wavelength_nm must be above/],
    ['a negative row', 'wavelength_nm,value\n500,1\n510,-2\n', /--phosphor-emission: line 3: value must be ≥ 0 \(got -2\)/]
  ])('an emission spectrum file with %s: one line, exit 2', (_, text, message) => {
    const r = runCli(['trace', '--rays', '1000', '--phosphor', 'garnet-yellow', '--phosphor-emission', file('e.csv', text)]);
    expect(r.code).toBe(2);
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
    expect(r.stderr).toMatch(message);
  });

  it('a conformal layer: the JSON carries every white-light key by its name, the heat booked to the layer', () => {
    const out = runJson(['trace', '--rays', '10000', '--threads', '1', '--phosphor', 'garnet-yellow', '--phosphor-wt', '60', '--phosphor-diameter', '12',
      '--quantum-yield', '0.95', '--phosphor-region', 'conformal', '--phosphor-thickness', '0.3']);
    expect(out.package.phosphor).toMatchObject({ region: 'conformal', thicknessMm: 0.3 });
    const heat = out.parts.find((p: { bin: string }) => p.bin === 'phosphor:conformal phosphor');
    expect(heat.count).toBeGreaterThan(0);
    expect(out.ledger.phosphor).toBeCloseTo(heat.fraction, 12);
    for (const key of ['escapedBlue', 'escapedConverted', 'energyEfficiency', 'scatterEventsPerRay']) expect(Number.isFinite(out[key])).toBe(true);
    for (const key of ['x', 'y', 'cctK', 'duv', 'ra', 'r9', 'lerLmPerW']) expect(out.color).toHaveProperty(key);
    for (const key of ['x', 'y', 'cctK']) expect(out.color.sigma).toHaveProperty(key);
    expect(out.spectrum.length).toBeGreaterThan(100);
    expect(out.colorOverAngle.bins[0]).toHaveProperty('cctK');
    expect(out.scene.media.map((m: { name: string }) => m.name)).toContain('conformal phosphor');
  });

  it('a coefficient table with g outside (−1, 1) is refused naming the row', () => {
    const bad = file('bad.csv', 'wavelength_nm,mus_per_mm,mua_per_mm,g\n450,1,1,1.5\n');
    const r = runCli(['trace', '--rays', '1000', '--phosphor-coefficients', bad, '--phosphor-emission', 'gaussian:560:100']);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/row 1: g must lie in \(−1, 1\)/);
  });
});
