import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli, runJson } from './run-cli';
import { packagePresets } from '../../../src/lib/scenario/presets';
import { toTracePackage } from '../../../src/lib/scenario/resolve';
import { packageScene } from '../../../src/lib/trace/package-scene';

const cupLine = ['trace', '--body', 'cup', '--cup-floor-radius', '1.3', '--cup-top-radius', '1.5', '--cup-depth', '0.8', '--wall-reflectance', '0.93',
  '--wall', 'diffuse', '--base', 'specular', '--base-reflectance', '0.95', '--chip-layers', '0.005:gan:0.5,0.15:sapphire-o:0', '--emit-layer', '1',
  '--chip-mirror', '0.95', '--shape', 'flat', '--rays', '4000', '--threads', '1'];

describe('outcouple trace with package bodies', () => {
  it('builds the mid-power cup from options: the package echoed is the preset\'s, and the JSON has the per-part ledger', () => {
    const out = runJson(cupLine);
    const preset = toTracePackage(packagePresets()[1].scenario);
    expect(out.package.body).toEqual(preset.body);
    expect(out.package.base).toEqual(preset.base);
    expect(out.package.chip.mirror).toEqual(preset.chip.mirror);
    expect(out.package.chip.layers.map((l: { thicknessMm: number; n: number }) => [l.thicknessMm, l.n])).toEqual(
      preset.chip.layers!.map((l) => [l.thicknessMm, l.n])
    );
    expect(out.package.chip.emitterZMm).toBeCloseTo(0.0025, 12); // the middle of the 5 µm emitting film
    expect(out.scene).toEqual(JSON.parse(JSON.stringify(packageScene(out.package))));
    expect(out.ledger.chipLayers.map((l: { name: string }) => l.name)).toEqual(['gan', 'sapphire-o']);
    expect(out.ledger.wall).toBeGreaterThan(0);
    expect(out.ledger.mirror).toBeGreaterThan(0);
    expect(Object.keys(out.escapedBySurface)).toEqual(['cup top']);
    // the ledger closes: every part's count sums to the launched rays
    expect(out.parts.reduce((sum: number, p: { count: number }) => sum + p.count, 0)).toBe(4000);
    const layerSum = out.ledger.chipLayers.reduce((sum: number, l: { fraction: number }) => sum + l.fraction, 0);
    expect(layerSum).toBeCloseTo(out.ledger.chip, 12);
  });

  it('--scenario takes the same fields: the preset file traces the same ledger as the options', () => {
    const dir = mkdtempSync(join(tmpdir(), 'outcouple-'));
    const file = join(dir, 'cup.json');
    writeFileSync(file, JSON.stringify(packagePresets()[1].scenario));
    const fromFile = runJson(['trace', '--scenario', file, '--rays', '4000', '--threads', '1']);
    const fromOptions = runJson([...cupLine, '--chip-layers', '0.005:gan:0.5,0.15:sapphire-o:0']);
    expect(fromFile.counts).toEqual(fromOptions.counts);
  });

  it('--body cup alone fills the cup flat; --shape dome puts a dome on the rim; --shape none leaves it empty', () => {
    expect(runJson(['trace', '--body', 'cup', '--rays', '1000', '--threads', '1']).package.body.fill).toBe('flat');
    const dome = runJson(['trace', '--body', 'cup', '--shape', 'dome', '--radius', '1.5', '--height', '1', '--rays', '1000', '--threads', '1']);
    expect(dome.package.body.fill).toBe('dome');
    expect(Object.keys(dome.escapedBySurface).sort()).toEqual(['dome']);
    expect(runJson(['trace', '--body', 'cup', '--shape', 'none', '--rays', '1000', '--threads', '1']).package.body.fill).toBe('none');
  });

  it('a flat body keeps the old JSON ledger fields and adds zero wall and mirror shares', () => {
    const out = runJson(['trace', '--rays', '1000', '--threads', '1', '--top-texture', '0.5', '--base', 'diffuse']);
    expect(out.ledger.wall).toBe(0);
    expect(out.ledger.mirror).toBe(0);
    expect(out.ledger.chipLayers).toEqual([{ name: 'chip', fraction: out.ledger.chip }]);
    expect(out.package.chip.topScatter).toBe(0.5);
    expect(out.package.baseFinish).toBe('diffuse');
  });

  it.each([
    [['--body', 'cup', '--cup-depth', '0.1'], '--cup-depth: Cup depth must be more than the chip height (0.15 mm) and at most 1000 mm.'],
    [['--body', 'cup', '--cup-floor-radius', '0.5'], "--cup-floor-radius: Cup floor radius must be more than the chip's half-diagonal (0.708 mm) so the chip fits on the floor, and at most 1000 mm."],
    [['--body', 'cup', '--shape', 'dome', '--radius', '2'], "--radius: Encapsulant radius (the dome on the cup) must be between 0.001 mm and the cup's top radius (1.5 mm)."],
    [['--chip-layers', '0.005:2.45:0.5,0:1.77:0'], '--chip-layers: Chip layer 2 thickness must be between 0.001 and 1000 mm.'],
    [['--chip-layers', '0.005:2.45:0.5,0.15:1.77:0', '--emitter-z', '0.1'], '--emitter-z: Emitter height must be inside emitting layer 1: between 0 and 0.005 mm.'],
    [['--chip-layers', '0.005:2.45:0.5', '--emit-layer', '2'], "--emit-layer must be a whole layer number from 1 to 1 (got '2')"],
    [['--wall-reflectance', '1.2', '--body', 'cup'], '--wall-reflectance: Cup wall reflectance must be between 0 and 1.'],
    [['--top-texture', '-0.1'], '--top-texture: Textured top fraction must be between 0 and 1.'],
    [['--chip-mirror', '1.2'], '--chip-mirror: Chip mirror reflectance must be between 0 and 1.'],
    [['--wall', 'diffuse'], '--wall needs --body cup (a reflector cup)'],
    [['--shape', 'flat'], "--shape: Encapsulant shape 'flat' fills a cup: choose the cup body, or shape 'none', 'dome', 'cylinder' or 'box'."],
    [['--base', 'diffuse', '--base-material', 'ag'], '--base: Base finish can be diffuse only for a base given by its reflectance (0 to 1), not for a metal.']
  ])('refuses %j in one line naming the option and range, exit 2', (args, message) => {
    const run = runCli(['trace', ...args, '--rays', '1000']);
    expect(run.code).toBe(2);
    expect(run.stderr.trim()).toBe(`outcouple trace: ${message}`);
  });
});
