import { describe, expect, it } from 'vitest';
import { flipChipOnSapphire, singleBoxChip, thinFilmChip } from '../../../src/lib/trace/chip-presets';
import { compileScene } from '../../../src/lib/trace/compile-scene';
import { packageScene } from '../../../src/lib/trace/package-scene';
import { validateTracePackage, type TracePackage } from '../../../src/lib/trace/package-spec';
import { createTally } from '../../../src/lib/trace/tally';
import { traceChunk } from '../../../src/lib/trace/trace-chunk';
import { NO_ENCAPSULANT, cupPackage, domePackage, withEncapsulant } from '../../support/fixtures';

const cup = cupPackage(flipChipOnSapphire());
const packages: [string, TracePackage][] = [
  ['flat cup, flip chip', cup],
  ['cup with a dome on the rim', { ...cup, body: { ...(cup.body as object), fill: 'dome' } as TracePackage['body'] }],
  ['empty cup, tracked polarisation', { ...cup, polarization: 'track', body: { ...(cup.body as object), fill: 'none' } as TracePackage['body'] }],
  ['thin-film chip, textured top, diffuse base, dome', { ...domePackage(), chip: { ...thinFilmChip(), topScatter: 0.5 }, baseFinish: 'diffuse' }],
  ['chip-scale: flip chip in a square box, diffuse base', {
    ...withEncapsulant(domePackage(), { shape: 'box', radiusMm: 0.6, heightMm: 0.3, n: 1.41, absorptionPerMm: 0.001 }),
    chip: flipChipOnSapphire(),
    baseFinish: 'diffuse'
  }],
  ['flip chip, bare, metal mirror, volume emission', {
    ...withEncapsulant(domePackage(), NO_ENCAPSULANT),
    chip: { ...flipChipOnSapphire({ mirror: { kind: 'metal', n: 0.04382, k: 3.6101 } }), emission: 'volume' }
  }]
];

describe('packageScene(pkg) traced', () => {
  it.each(packages)('%s: valid, every ray in exactly one named bin, no geometry errors', (_, pkg) => {
    validateTracePackage(pkg);
    const t = traceChunk(pkg, 0, 4000, 3, createTally());
    expect(Object.values(t.parts).reduce((a, b) => a + b, 0)).toBe(4000);
    expect(t.escaped + t.absorbedChip + t.absorbedEncapsulant + t.absorbedBase + t.lost).toBe(4000);
    expect(t.geometryErrors).toBe(0);
    expect(t.polarHistogram.reduce((a, b) => a + b, 0)).toBe(t.escaped);
  });

  it('a square box of the outside index is invisible: extraction equals the bare chip within 4σ (Fresnel R = 0 between equal indices; Born & Wolf §1.5.2)', () => {
    const rays = 40_000;
    const bare = traceChunk(withEncapsulant(domePackage(), NO_ENCAPSULANT), 0, rays, 11, createTally());
    const boxed = traceChunk(withEncapsulant(domePackage(), { shape: 'box', radiusMm: 0.8, heightMm: 0.5, n: 1, absorptionPerMm: 0 }), 0, rays, 12, createTally());
    const p = bare.escaped / rays;
    const q = boxed.escaped / rays;
    const sigma = Math.sqrt((p * (1 - p) + q * (1 - q)) / rays);
    expect(Math.abs(p - q)).toBeLessThan(4 * sigma);
    // the box's escapes are credited to its own faces
    expect(Object.keys(boxed.parts).filter((b) => b.startsWith('escaped:')).sort()).toEqual(['escaped:box sides', 'escaped:box top']);
  });

  it('a textured top with s = 0 gives the flat chip bit for bit (no random number drawn)', () => {
    const flat = domePackage();
    const textured = { ...flat, chip: { ...flat.chip, topScatter: 0 } };
    expect(traceChunk(textured, 2, 5000, 8, createTally())).toEqual(traceChunk(flat, 2, 5000, 8, createTally()));
  });

  it('a textured top with s > 0 changes the result', () => {
    const flat = domePackage();
    const textured = { ...flat, chip: { ...flat.chip, topScatter: 1 } };
    expect(traceChunk(textured, 2, 5000, 8, createTally()).escaped).not.toBe(traceChunk(flat, 2, 5000, 8, createTally()).escaped);
  });
});

describe('packageScene(pkg) as a description', () => {
  it('makes the GaN / sapphire face one surface with a layer on each side, and names bins per layer, mirror, wall and floor', () => {
    const scene = packageScene(cup);
    const shared = scene.surfaces.filter((s) => s.name === 'GaN / sapphire');
    expect(shared).toHaveLength(1);
    expect([shared[0].behind, shared[0].front]).toEqual(['GaN', 'sapphire']);
    const bins = compileScene(scene).binNames;
    expect(bins).toEqual(expect.arrayContaining(['medium:GaN', 'medium:encapsulant', 'surface:chip mirror', 'surface:floor', 'surface:wall', 'escaped:cup top']));
    expect(bins).not.toContain('medium:sapphire'); // it does not absorb
  });

  it('emits from the named layer, at its middle by default', () => {
    const scene = packageScene(cup);
    expect(scene.emitter).toEqual({ medium: 'GaN', mode: 'plane', z: 0.0025 });
  });

  it('keeps today\'s single box: one chip medium, its bottom the base', () => {
    const scene = packageScene({ ...domePackage(), chip: singleBoxChip() });
    expect(scene.media.map((m) => m.name)).toEqual(['chip', 'encapsulant', 'outside']);
    expect(scene.surfaces.find((s) => s.name === 'base under the chip')?.absorbedBin).toBe('base');
  });
});
