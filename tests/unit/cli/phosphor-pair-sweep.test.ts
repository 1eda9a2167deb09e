import { describe, expect, it } from 'vitest';
import { runCli, runJson } from './run-cli';

describe('outcouple phosphor-load with a red phosphor, and phosphor-sweep', () => {
  it('finds a yellow + red pair for 3000 K on the Planckian locus: both loads above 0, CCT and Duv within the search tolerances or ±σ', () => {
    const out = runJson(['phosphor-load', '--target-cct', '3000', '--phosphor', 'garnet-yellow', '--red-phosphor', 'nitride-red', '--rays', '6000']);
    expect(out.loads).toHaveLength(2);
    expect(out.weightPercent).toBeGreaterThan(0);
    expect(out.redWeightPercent).toBeGreaterThan(0);
    expect(Math.abs(out.color.cctK - 3000)).toBeLessThanOrEqual(Math.max(15, out.color.sigma.cctK));
    expect(Math.abs(out.color.duv)).toBeLessThanOrEqual(Math.max(0.001, out.color.sigma.duv));
    expect(out.energyCost).toBeGreaterThan(out.photonCost); // Stokes loss on top of the photons lost (common practice)
  });

  it.each([
    [['phosphor-load', '--target-cct', '4000', '--target-duv', '0.01'], /--target-duv needs --red-phosphor ID/],
    [['phosphor-load', '--target-cct', '4000', '--red-phosphor', 'nope'], /--red-phosphor: unknown phosphor 'nope'/],
    [['phosphor-load', '--target-cct', '4000', '--red-phosphor', 'nitride-red', '--target-duv', '0.3'], /--target-duv must be a number from -0.02 to 0.02/],
    [['phosphor-load', '--target-cct', '4000', '--phosphor', 'garnet-green', '--rays', '1500'], /out of reach for garnet-green alone/],
    [['phosphor-sweep', '--loads', '4,x'], /--loads: Phosphor load values: 'x' is not a number/],
    [['phosphor-sweep', '--loads', '8,4'], /must increase/],
    [['phosphor-sweep', '--loads', '4,90'], /must each be a number in \[0.01, 60\]/],
    [['phosphor-sweep', '--loads', '4', '--diameters', '5'], /exactly one of --loads and --diameters/],
    [['phosphor-sweep', '--diameters', '0.01,5'], /--diameters: .*\[0.05, 50\]/]
  ])('bad input %j: one line naming the option and its range, exit 2', (args, message) => {
    const r = runCli(args);
    expect(r.code).toBe(2);
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
    expect(r.stderr).toMatch(message);
  });

  it('phosphor-sweep: CCT falls as the yellow load rises (common practice); CSV has one row per point with units in the header', () => {
    const out = runJson(['phosphor-sweep', '--phosphor', 'garnet-yellow', '--loads', '10,14,20', '--rays', '4000']);
    const ccts = out.points.map((p: { cctK: number }) => p.cctK);
    expect(ccts[1]).toBeLessThan(ccts[0]);
    expect(ccts[2]).toBeLessThan(ccts[1]);
    for (const p of out.points) expect(p.lumensPerWattOfChip).toBeCloseTo(p.lerLmPerW * p.energyEfficiency, 9);
    const csv = runCli(['phosphor-sweep', '--phosphor', 'garnet-yellow', '--diameters', '5,15', '--rays', '2000', '--csv']);
    expect(csv.code).toBe(0);
    const lines = csv.stdout.trim().split('\n');
    expect(lines[0]).toMatch(/^diameter_um,cct_k,sigma_cct_k,duv,ra,ler_lm_per_w,/);
    expect(lines).toHaveLength(3);
  });
});
