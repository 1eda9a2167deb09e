import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
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
    expect(typeof out.farField.beamAngleDeg).toBe('number');
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
