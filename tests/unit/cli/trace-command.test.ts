import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { demoScenario as cliDemoScenario } from '../../../src/lib/scenario/defaults';
import { runCli, runJson } from './run-cli';

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

  it('--scenario reads a flat object of option names, and options on the line win', () => {
    const dir = mkdtempSync(join(tmpdir(), 'outcouple-'));
    const file = join(dir, 'package.json');
    writeFileSync(file, JSON.stringify({ 'n-chip': 2.45, chip: '1x1x0.15', shape: 'cylinder', radius: 2.5, height: 1, rays: 5000 }));
    const out = runJson(['trace', '--scenario', file, '--threads', '1', '--seed', '3']);
    expect(out.package.encapsulant.shape).toBe('cylinder');
    expect(out.rays).toBe(5000);
    expect(out.seed).toBe(3);
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
    [['trace', '--rays', '10'], /--rays must be a number from 1000 to 100000000/],
    [['trace', '--shape', 'cone'], /--shape must be one of none, dome, cylinder/],
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
