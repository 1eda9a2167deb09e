import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseIes } from '../../../src/lib/export/ies';
import { runCli, runJson } from './run-cli';

describe('outcouple optic', () => {
  it('prints the documented JSON keys; the ledger fractions sum to 1; writes IES, profile and a ray file that reads back', () => {
    const dir = mkdtempSync(join(tmpdir(), 'optic-'));
    const ies = join(dir, 'beam.ies');
    const profile = join(dir, 'tir.csv');
    const out = runJson(['optic', '--type', 'tir', '--exit-diameter', '20', '--height', '12', '--material', 'pmma', '--source', 'lambertian:1x1',
      '--rays', '20000', '--ies', ies, '--profile', profile]);
    for (const key of ['efficiency', 'efficiencyInBeam', 'beamAngleDeg', 'fieldAngleDeg', 'peakCdPerKlm', 'etendueLimitDeg', 'ledger', 'farField']) {
      expect(out).toHaveProperty(key);
    }
    for (const key of ['out', 'fresnel', 'metal', 'tirLeak', 'missed', 'absorbed', 'lost']) expect(out.ledger).toHaveProperty(key);
    const sum = Object.values(out.ledger as Record<string, number>).reduce((a, b) => a + b, 0);
    expect(sum).toBeCloseTo(1, 9);
    // étendue limit of 1 mm² through a 20 mm exit: 2 asin(√(1/(π·100))) = 6.47° (Welford & Winston 1989, ch. 2; computed)
    expect(out.etendueLimitDeg).toBeCloseTo(6.469, 2);
    expect(parseIes(readFileSync(ies, 'utf8')).candela.length).toBeGreaterThan(0);
    expect(readFileSync(profile, 'utf8')).toContain('tir-wall');

    const rays = join(dir, 'package.csv');
    runJson(['optic', '--type', 'lens', '--source', 'package', '--rays', '2000', '--write-rays', rays, '--ray-count', '5000']);
    const fromFile = runJson(['optic', '--type', 'lens', '--source', `rays:${rays}`, '--rays', '5000']);
    expect(fromFile.source).toContain('ray file');
    expect(Number.isFinite(fromFile.efficiency)).toBe(true);
  });

  it('refuses bad input in one line naming the option and range, exit 2', () => {
    const cases: [string[], RegExp][] = [
      [['--type', 'lens', '--reflectance', '1.5'], /--reflectance must be a number from 0 to 1/],
      [['--type', 'tir', '--exit-diameter', '2', '--source', 'lambertian:3x3'], /--exit-diameter must exceed the source's diameter/],
      [['--type', 'reflector', '--target-beam', '3', '--source', 'lambertian:1x1'], /no optic of this size can make a 3° beam from this source; the limit is 6.47°/],
      [['--type', 'tir', '--height', '2', '--source', 'lambertian:1x1'], /^outcouple optic: --height: a TIR collimator 20 mm wide at n = 1.49\d* .*fits heights in \(/],
      [['--type', 'lens', '--height', '0.8', '--source', 'lambertian:1x1'], /--height: a collimating lens 20 mm wide .* needs a top above/],
      // the package's étendue area (not its outline) bounds the target beam, as on the page
      [['--type', 'reflector', '--target-beam', '3'], /no optic of this size can make a 3° beam from this source; the limit is 11.6° \(exit 20 mm, source 3.22 mm²/],
      [['--type', 'prism'], /--type must be one of reflector, lens, tir/],
      [['--exit-diameter', '20'], /--type is required/],
      [['--type', 'lens', '--source', 'rays:/nonexistent/file.csv'], /--source rays: cannot read/],
      [['--type', 'lens', '--source', 'lambertian:0x1'], /--source: the Lambertian source's size must be from 0\.01 to 100 mm/],
      // the package source takes the scenario's options and messages; the encapsulant's --height is --enc-height here
      [['--type', 'lens', '--source', 'package', '--enc-height', '-1'], /outcouple optic: --enc-height: Encapsulant height must be between/],
      [['--type', 'lens', '--source', 'package', '--n-chip', 'abc'], /outcouple optic: --n-chip: Chip index n must be between/]
    ];
    for (const [args, message] of cases) {
      const r = runCli(['optic', ...args, '--rays', '1000']);
      expect(r.code, args.join(' ')).toBe(2);
      expect(r.stderr).toMatch(message);
      expect(r.stderr.trim().split('\n')).toHaveLength(1);
    }
  });
});
