import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { demoScenario as cliDemoScenario } from '../../../src/lib/scenario/defaults';
import { runCli, runJson } from './run-cli';
import { toTracePackage } from '../../../src/lib/scenario/resolve';
import { traceSync } from '../../../src/lib/trace/trace';
import { summarize } from '../../../src/lib/trace/summary';

const demo = ['trace', '--n-chip', '2.45', '--chip', '1x1x0.15', '--emitter-z', '0.1', '--chip-absorption', '0.5', '--n-enc', '1.41',
  '--enc-absorption', '0.001', '--shape', 'dome', '--radius', '2.5', '--height', '2.5', '--base-reflectance', '0.92', '--seed', '1'];

describe('outcouple trace', () => {
  it('prints the documented JSON keys; the ledger counts sum to the launched rays exactly', () => {
    const out = runJson([...demo, '--rays', '20000', '--threads', '1']);
    for (const key of ['extraction', 'stderr', 'ledger', 'counts', 'escapedBelowHorizon', 'eventsPerRay', 'raysPerSecond', 'farField']) {
      expect(out).toHaveProperty(key);
    }
    const c = out.counts;
    expect(c.escaped + c.chip + c.encapsulant + c.base + c.lost).toBe(c.rays);
    expect(c.rays).toBe(20000);
    expect(out.stderr).toBeCloseTo(Math.sqrt((out.extraction * (1 - out.extraction)) / 20000), 12); // binomial standard error
    expect(out.farField.bins.length).toBeGreaterThan(0);
    // The beam angle is a full width at half maximum, never above 180°; without one a sentence says why.
    if (out.farField.beamAngleDeg === null) expect(out.farField.beamAngleNote).toMatch(/\w/);
    else expect(out.farField.beamAngleDeg).toBeLessThanOrEqual(180);
  });

  it('gives the same ledger on one thread and on two (chunks are seeded by index, not by thread)', () => {
    const one = runJson([...demo, '--rays', '40000', '--threads', '1']);
    const two = runJson([...demo, '--rays', '40000', '--threads', '2']);
    expect(two.counts).toEqual(one.counts);
  });

  it('--scenario reads the JSON the page exports (the scenario itself, or an export holding it), and options on the line win', () => {
    const dir = mkdtempSync(join(tmpdir(), 'outcouple-'));
    const file = join(dir, 'scenario.json');
    const scenario = { ...cliDemoScenario(), encapsulant: { ...cliDemoScenario().encapsulant, shape: 'cylinder', heightMm: 1 }, trace: { rays: 5000, seed: 1, polarization: 'average' } };
    writeFileSync(file, JSON.stringify(scenario));
    const out = runJson(['trace', '--scenario', file, '--threads', '1', '--seed', '3']);
    expect(out.package.encapsulant.shape).toBe('cylinder');
    expect(out.rays).toBe(5000);
    expect(out.seed).toBe(3);
    const wrapped = join(dir, 'export.json');
    writeFileSync(wrapped, JSON.stringify({ page: 'dome', scenario }));
    expect(runJson(['trace', '--scenario', wrapped, '--threads', '1']).package.encapsulant.shape).toBe('cylinder');
  });

  it('with no options traces the demo scenario: the same ledger as the page gets from the same scenario, seed and rays', () => {
    // The page traces toTracePackage(DEMO_SCENARIO) with the scenario's rays and seed (src/routes/dome).
    const rays = 20_000;
    const cli = runJson(['trace', '--rays', String(rays), '--threads', '1']);
    const demoPkg = toTracePackage(cliDemoScenario());
    const page = traceSync(demoPkg, { rays, seed: cliDemoScenario().trace.seed, maxEvents: 1000 });
    expect(cli.package).toEqual(demoPkg);
    expect(cli.counts).toEqual({ ...summarize(page).counts });
  });

  it('--chip WxL keeps the height; WxLxH sets it and moves the emitter with it; a negative number is read as a number', () => {
    const d = cliDemoScenario().chip;
    const wl = runJson(['trace', '--chip', '0.5x0.8', '--rays', '1000', '--threads', '1']).package.chip;
    expect([wl.widthMm, wl.lengthMm, wl.heightMm, wl.emitterZMm]).toEqual([0.5, 0.8, d.heightMm, d.emitterZMm]);
    const wlh = runJson(['trace', '--chip', '1x1x0.3', '--rays', '1000', '--threads', '1']).package.chip;
    expect(wlh.heightMm).toBe(0.3);
    expect(wlh.emitterZMm).toBeCloseTo((d.emitterZMm / d.heightMm) * 0.3, 12);
    const negative = runCli(['trace', '--radius', '-3']);
    expect(negative.code).toBe(2);
    expect(negative.stderr).toBe('outcouple trace: --radius: Encapsulant radius must be between 0.001 and 1000 mm.\n');
  });

  it('--scenario reads an app scenario whose encapsulant is a user material carried in the file', () => {
    const dir = mkdtempSync(join(tmpdir(), 'outcouple-'));
    const file = join(dir, 'scenario.json');
    // Cauchy n = 1.5 + 0.004/λ² (λ in µm): 1.516 at 500 nm (exact arithmetic)
    const material = { id: 'my-silicone', name: 'My silicone', category: 'encapsulant', dispersion: { model: 'cauchy', A: 1.5, B: 0.004, C: 0 }, validRangeNm: { min: 400, max: 800 } };
    writeFileSync(file, JSON.stringify({ ...cliDemoScenario(), emission: { kind: 'single', wavelengthNm: 500 }, encapsulant: { medium: { kind: 'user', material }, shape: 'dome', radiusMm: 2.5, heightMm: 2.5, absorptionPerMm: 0.001 } }));
    const out = runJson(['trace', '--scenario', file, '--threads', '1', '--rays', '5000']);
    expect(out.package.encapsulant.n).toBeCloseTo(1.516, 12);
    const bad = runCli(['trace', '--scenario', file.replace('scenario.json', 'bad.json')]);
    expect(bad.code).toBe(2);
    writeFileSync(join(dir, 'bad.json'), JSON.stringify({ ...cliDemoScenario(), encapsulant: { medium: { kind: 'user', material: { ...material, id: 'air' } }, shape: 'none', radiusMm: 1, heightMm: 1, absorptionPerMm: 0 } }));
    const clash = runCli(['trace', '--scenario', join(dir, 'bad.json')]);
    expect(clash.code).toBe(2);
    expect(clash.stderr).toMatch(/--scenario: Encapsulant user material: id "air" belongs to a library material/);
  });

  it('--ies writes an IES LM-63 file scaled to --lumens', () => {
    const dir = mkdtempSync(join(tmpdir(), 'outcouple-'));
    const file = join(dir, 'beam.ies');
    runJson([...demo, '--rays', '20000', '--threads', '1', '--ies', file, '--lumens', '100']);
    const text = readFileSync(file, 'utf8');
    expect(text.startsWith('IES:LM-63-2019')).toBe(true); // ANSI/IES LM-63-2019 first line
    expect(text).toMatch(/^TILT=NONE\r?$/m);
  });

  it.each([
    [['trace', '--rays', '10'], /^outcouple trace: --rays: Rays must be a whole number between 1000 and 20000000 rays\.$/m],
    [['trace', '--shape', 'cone'], /^outcouple trace: --shape: Encapsulant shape must be 'none', 'dome', 'cylinder', 'box' or 'flat'\.$/m],
    [['trace', '--n-out', '7'], /^outcouple trace: --n-out: Outside medium index n must be between 1 and 6\.$/m],
    [['trace', '--chip', '5x1'], /^outcouple trace: --chip: Encapsulant radius must be more than 2\.56 mm/m],
    [['trace', '--radius', '0.4', '--height', '0.4', '--rays', '1000'], /fit|radius/i],
    [['trace', '--ies', 'x.ies'], /--ies needs --lumens/],
    [['trace', '--scenario', 'does-not-exist.json'], /--scenario: cannot read/]
  ])('bad input %j: one line naming the option, exit code 2', (args, message) => {
    const run = runCli(args);
    expect(run.code).toBe(2);
    expect(run.stderr).toMatch(message);
    expect(run.stderr.trim().split('\n')).toHaveLength(1);
  });
});
