import { describe, expect, it } from 'vitest';
import { runCli, runJson } from './run-cli';

describe('outcouple escape', () => {
  it('escape --n-in 2.45 --n-out 1 gives θc 24.09°, geometric 0.04355, Fresnel-weighted 0.03408 (computed; escape cone ½∫T sin θ dθ: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5)', () => {
    const out = runJson(['escape', '--n-in', '2.45', '--n-out', '1']);
    expect(out.criticalAngleDeg).toBeCloseTo(24.09, 2);
    expect(Math.abs(out.escapeFractionGeometric - 0.04355)).toBeLessThan(1e-4);
    expect(Math.abs(out.escapeFractionFresnel - 0.03408)).toBeLessThan(1e-4);
    expect(out.escapeFractionFresnelS).toBeLessThan(out.escapeFractionFresnelP);
    expect(out.normalReflectance).toBeCloseTo(((2.45 - 1) / 3.45) ** 2, 12);
    expect(out.chipEscapeFraction).toBe(out.escapeFractionFresnel);
  });

  it('escape --in GaN --out air reads both media from the library at the wavelength', () => {
    const out = runJson(['escape', '--in', 'GaN', '--out', 'air', '--wavelength', '450']);
    expect(out.nIn).toBeCloseTo(2.4869, 3); // Barker & Ilegems, Phys. Rev. B 7, 743 (1973), formula at 450 nm
    expect(out.nOut).toBeCloseTo(1, 3);
  });

  it('escape --faces 6 sums six cones and flags overlap once θc > 45°', () => {
    expect(runJson(['escape', '--n-in', '2.5', '--faces', '6']).chipEscapeFraction).toBeCloseTo(6 * 0.03243, 4);
    expect(runJson(['escape', '--n-in', '1.5', '--n-out', '1.2', '--faces', '6']).conesOverlap).toBe(true);
  });

  it('prints a readable table with units without --json', () => {
    const run = runCli(['escape', '--n-in', '2.45']);
    expect(run.code).toBe(0);
    expect(run.stdout).toMatch(/critical angle\s+24\.09 °/);
    expect(run.stdout).toMatch(/Fresnel-weighted\s+3\.408 %/);
  });

  it.each([
    [['escape', '--n-in', 'abc'], /--n-in/],
    [['escape', '--n-in', '2.45', '--faces', '9'], /--faces must be .*1 to 6/],
    [['escape', '--n-in', '2.45', '--faces', '3'], /--faces must be 1 \(top only\), 5 .* or 6/],
    [['escape', '--n-in', '2.45', '--wavelength', 'NaN'], /--wavelength must be a number from 200 to 2500/],
    [['escape'], /--n-in is required/],
    [['escape', '--n-in', '2.45', '--bogus', '1'], /Unknown option '--bogus'/]
  ])('bad input %j: one line naming the option, exit code 2, no stack trace', (args, message) => {
    const run = runCli(args);
    expect(run.code).toBe(2);
    expect(run.stderr).toMatch(message);
    expect(run.stderr.trim().split('\n')).toHaveLength(1);
    expect(run.stderr).not.toMatch(/\bat .*\.ts:\d+/);
  });
});
