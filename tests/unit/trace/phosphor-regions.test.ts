import { describe, expect, it } from 'vitest';
import { packageSection } from '../../../src/lib/components/package-section';
import { packagePresets } from '../../../src/lib/scenario/presets';
import { toTracePackage } from '../../../src/lib/scenario/resolve';
import { packageScene } from '../../../src/lib/trace/package-scene';
import type { PhosphorRegion } from '../../../src/lib/trace/package-phosphor';
import type { TracePackage } from '../../../src/lib/trace/package-spec';
import { phosphorSummary } from '../../../src/lib/trace/phosphor-summary';
import { traceSync } from '../../../src/lib/trace/trace';
import { libraryPhosphor, withPhosphor } from '../../../src/lib/trace/white-light';

const [demoScenario, cupScenario] = packagePresets().map((p) => p.scenario);
const dome = toTracePackage(demoScenario);
const cup = toTracePackage(cupScenario);
const cupDome: TracePackage = { ...cup, body: { ...(cup.body as Extract<TracePackage['body'], { kind: 'cup' }>), fill: 'dome' }, encapsulant: { ...cup.encapsulant, radiusMm: 1.4, heightMm: 1.0 } };
const cylinder: TracePackage = { ...dome, encapsulant: { ...dome.encapsulant, shape: 'cylinder', radiusMm: 1.5, heightMm: 1.0 } };
const yellow = libraryPhosphor('garnet-yellow');

/** Every region in each body it fits, with a thickness that fits. */
const CASES: [string, TracePackage, PhosphorRegion, number][] = [
  ['conformal on the flat base under a dome', dome, 'conformal', 0.08],
  ['conformal in a flat-filled cup', cup, 'conformal', 0.08],
  ['remote shell under a dome', dome, 'remote', 0.2],
  ['remote shell under a dome on a cup', cupDome, 'remote', 0.15],
  ['remote plate at the top of a flat-filled cup', cup, 'remote', 0.2],
  ['remote plate at the top of a cylinder', cylinder, 'remote', 0.2],
  ['floor layer in a flat-filled cup', cup, 'floor', 0.08],
  ['floor layer under a cylinder', cylinder, 'floor', 0.08]
];

const particles = (pkg: TracePackage, region: PhosphorRegion, thicknessMm: number, weightPercent = 40) =>
  withPhosphor(pkg, { kind: 'particles', phosphor: yellow, weightPercent, diameterUm: 12, region, thicknessMm }, [[450, 1]]);
/** An index-matched layer of nothing (μs = μa = 0): only the region's surfaces, no particles. */
const clearLayer = (pkg: TracePackage, region: PhosphorRegion, thicknessMm: number) =>
  withPhosphor(pkg, { kind: 'table', coefficients: [[300, 0, 0, 0]], emission: [[550, 1]], quantumYield: 1, region, thicknessMm }, [[450, 1]]);

describe('phosphor regions: layers of the encapsulant material as scene media', () => {
  it.each(CASES)('%s: every ray ends in one named bin, no geometry error, the phosphor heat is booked to the layer', (_, pkg, region, T) => {
    const rays = 4000;
    const tally = traceSync(particles(pkg, region, T), { rays, seed: 7, maxEvents: 10000 });
    expect(Object.values(tally.parts).reduce((a, b) => a + b, 0)).toBe(rays);
    expect(tally.geometryErrors).toBe(0);
    expect(tally.parts[`phosphor:${region} phosphor`]).toBeGreaterThan(0);
    expect(tally.parts['phosphor:encapsulant']).toBeUndefined();
    const w = phosphorSummary(tally)!;
    expect(w.escapedConverted).toBeGreaterThan(0);
    expect(w.escapedBlue + w.escapedConverted).toBeCloseTo(tally.escaped / rays, 12);
  });

  it.each(CASES)('%s: an index-matched layer without particles changes nothing — the extraction equals the clear package within 4 σ of the difference', (_, pkg, region, T) => {
    const rays = 20000;
    const clear = traceSync(pkg, { rays, seed: 3 });
    const layered = traceSync(clearLayer(pkg, region, T), { rays, seed: 5 });
    expect(layered.geometryErrors).toBe(0);
    const p1 = clear.escaped / rays;
    const p2 = layered.escaped / rays;
    const sigma = Math.sqrt((p1 * (1 - p1) + p2 * (1 - p2)) / rays);
    expect(Math.abs(p1 - p2)).toBeLessThan(4 * sigma);
  });

  it('remote shell, pure absorber: a point source at the centre of a hemisphere on a black base escapes ½·exp(−μa·T)·(1 − R0), R0 = ((1.5 − 1)/(1.5 + 1))² (Beer–Lambert along the radius, Fresnel at normal incidence; Born & Wolf, Principles of Optics, §1.5 and §14.1) within 4 σ', () => {
    const muA = 2;
    const T = 0.2;
    const pkg: TracePackage = {
      chip: { widthMm: 0.02, lengthMm: 0.02, heightMm: 0.02, n: 1.5, absorptionPerMm: 0, emission: 'plane' },
      base: { kind: 'reflectance', reflectance: 0 },
      encapsulant: { shape: 'dome', radiusMm: 2, heightMm: 2, n: 1.5, absorptionPerMm: 0 },
      outsideN: 1,
      polarization: 'average',
      phosphor: { region: 'remote', thicknessMm: T, coefficients: [[300, 0, muA, 0]], emission: [[550, 1]], quantumYield: 0, chipSpectrum: [[450, 1]] }
    };
    const rays = 40000;
    const tally = traceSync(pkg, { rays, seed: 9 });
    const expected = 0.5 * Math.exp(-muA * T) * (1 - 0.04);
    const p = tally.escaped / rays;
    expect(Math.abs(p - expected)).toBeLessThan(4 * Math.sqrt((expected * (1 - expected)) / rays));
    expect(tally.parts['phosphor:remote phosphor']).toBeGreaterThan(0);
  });

  it('the conformal layer shares the chip faces: the chip top and sides are one surface each, with the chip behind and the layer in front', () => {
    const scene = packageScene(particles(dome, 'conformal', 0.08));
    for (const name of ['chip top', 'chip +x', 'chip −x', 'chip +y', 'chip −y']) {
      const faces = scene.surfaces.filter((s) => s.name === name);
      expect(faces).toHaveLength(1);
      expect(faces[0]).toMatchObject({ front: 'conformal phosphor', behind: 'chip' });
    }
    const top = scene.surfaces.find((s) => s.name === 'conformal phosphor top')!;
    expect(top.shape).toMatchObject({ kind: 'rect', at: 0.15 + 0.08, uMax: 0.5 + 0.08 });
  });

  it('the section drawing shows each layer as a region of its own with the phosphor fill, and says so in the legend', () => {
    for (const [, pkg, region, T] of CASES) {
      const s = packageSection(packageScene(particles(pkg, region, T)));
      const layer = s.regions.filter((r) => r.medium === `${region} phosphor`);
      expect(layer.length).toBeGreaterThan(0);
      expect(layer.every((r) => r.role === 'phosphor')).toBe(true);
      expect(s.media.find((m) => m.name === `${region} phosphor`)!.text).toMatch(/holds the phosphor/);
      expect(s.regions.some((r) => r.medium === 'encapsulant' && r.role === 'encapsulant')).toBe(true);
    }
    // the conformal shell: the box (w + 2T) × (H + T), drawn before the chip so the chip shows over it
    const s = packageSection(packageScene(particles(dome, 'conformal', 0.08)));
    const i = s.regions.findIndex((r) => r.medium === 'conformal phosphor');
    expect(s.regions[i].d).toMatch(/-0\.58/);
    expect(i).toBeLessThan(s.regions.findIndex((r) => r.medium === 'chip'));
  });
});
