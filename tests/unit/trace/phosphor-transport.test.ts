import { describe, expect, it } from 'vitest';
import { compileScene } from '../../../src/lib/trace/compile-scene';
import { traceSceneChunk } from '../../../src/lib/trace/trace-chunk';
import { createTally, type Tally } from '../../../src/lib/trace/tally';
import type { SceneDescription, ScenePhosphor, SceneSurface } from '../../../src/lib/trace/scene';
import { phosphorSummary } from '../../../src/lib/trace/phosphor-summary';

// Monte Carlo tolerances: k = 4 binomial standard errors, √(p(1 − p)/N).
const K = 4;
const tolerance = (p: number, n: number) => K * Math.sqrt((p * (1 - p)) / n);

const constant = (mus: number, mua: number, g: number, qy = 0): ScenePhosphor => ({
  coefficients: [[300, mus, mua, g], [900, mus, mua, g]],
  emission: [[550, 1]],
  quantumYield: qy
});

const fresnel = { kind: 'fresnel' } as const;

/** Faces of a small source box [−s, s]² × [z0, z1] in `around` (index-matched, so every face transmits). */
function sourceBox(s: number, z0: number, z1: number, around: (face: string) => string, bin: (face: string) => string): SceneSurface[] {
  const faces: [string, SceneSurface['shape']][] = [
    ['+x', { kind: 'rect', axis: 0, at: s, normalSign: 1, uMin: -s, uMax: s, vMin: z0, vMax: z1 }],
    ['-x', { kind: 'rect', axis: 0, at: -s, normalSign: -1, uMin: -s, uMax: s, vMin: z0, vMax: z1 }],
    ['+y', { kind: 'rect', axis: 1, at: s, normalSign: 1, uMin: -s, uMax: s, vMin: z0, vMax: z1 }],
    ['-y', { kind: 'rect', axis: 1, at: -s, normalSign: -1, uMin: -s, uMax: s, vMin: z0, vMax: z1 }],
    ['+z', { kind: 'rect', axis: 2, at: z1, normalSign: 1, uMin: -s, uMax: s, vMin: -s, vMax: s }],
    ['-z', { kind: 'rect', axis: 2, at: z0, normalSign: -1, uMin: -s, uMax: s, vMin: -s, vMax: s }]
  ];
  return faces.map(([f, shape]) => ({ name: `source ${f}`, shape, front: around(f), behind: 'source', behaviour: fresnel, escapedBin: bin(f) }));
}

const SOURCE_FACES: [string, string, string, string, string, string] = ['source +x', 'source -x', 'source +y', 'source -y', 'source +z', 'source -z'];

/**
 * A very wide (±A), very thick (Z) index-matched slab, lit at the middle of its top face from a thin
 * source box sitting on it. Reflection = escapes through the top (source faces and the top around it).
 */
function slabScene(direction: 'down' | 'lambertian-down', phosphor: ScenePhosphor): SceneDescription {
  const A = 60;
  const Z = 60;
  const s = 0.5;
  const top = (uMin: number, uMax: number, vMin: number, vMax: number, name: string): SceneSurface => ({
    name, shape: { kind: 'rect', axis: 2, at: Z, normalSign: 1, uMin, uMax, vMin, vMax }, front: 'outside', behind: 'slab', behaviour: fresnel, escapedBin: 'top'
  });
  const side = (axis: 0 | 1 | 2, at: number, sign: 1 | -1, name: string): SceneSurface => ({
    name,
    shape: axis === 2
      ? { kind: 'rect', axis, at, normalSign: sign, uMin: -A, uMax: A, vMin: -A, vMax: A }
      : { kind: 'rect', axis, at, normalSign: sign, uMin: -A, uMax: A, vMin: 0, vMax: Z },
    front: 'outside', behind: 'slab', behaviour: fresnel, escapedBin: 'through'
  });
  return {
    media: [
      { name: 'source', role: 'chip', n: 1, absorptionPerMm: 0, box: { a: s, b: s, z0: Z, z1: Z + 0.01, faces: SOURCE_FACES } },
      { name: 'slab', role: 'encapsulant', n: 1, absorptionPerMm: 0, phosphor },
      { name: 'outside', role: 'outside', n: 1, absorptionPerMm: 0 }
    ],
    surfaces: [
      ...sourceBox(s, Z, Z + 0.01, (f) => (f === '-z' ? 'slab' : 'outside'), () => 'top'),
      top(-A, -s, -A, A, 'top 1'), top(s, A, -A, A, 'top 2'), top(-s, s, s, A, 'top 3'), top(-s, s, -A, -s, 'top 4'),
      side(0, A, 1, '+x'), side(0, -A, -1, '-x'), side(1, A, 1, '+y'), side(1, -A, -1, '-y'), side(2, 0, -1, 'bottom')
    ],
    outside: 'outside',
    emitter: { medium: 'source', mode: 'plane', z: Z + 0.005, direction },
    polarization: 'average',
    chipSpectrum: [[450, 1]]
  };
}

/** A hemisphere of radius R (index-matched) on a base of the given behaviour, a tiny isotropic source at its centre. */
function domeScene(R: number, base: SceneSurface['behaviour'], phosphor: ScenePhosphor): SceneDescription {
  const s = 0.001;
  return {
    media: [
      { name: 'source', role: 'chip', n: 1, absorptionPerMm: 0, box: { a: s, b: s, z0: s, z1: 3 * s, faces: SOURCE_FACES } },
      { name: 'dome', role: 'encapsulant', n: 1, absorptionPerMm: 0, phosphor },
      { name: 'outside', role: 'outside', n: 1, absorptionPerMm: 0 }
    ],
    surfaces: [
      ...sourceBox(s, s, 3 * s, () => 'dome', () => 'source'),
      { name: 'base', shape: { kind: 'disc', at: 0, normalSign: 1, rInner: 0, rOuter: R }, front: 'dome', behind: null, behaviour: base },
      { name: 'dome', shape: { kind: 'spheroid-cap', radius: R, height: R, zCentre: 0 }, front: 'outside', behind: 'dome', behaviour: fresnel }
    ],
    outside: 'outside',
    emitter: { medium: 'source', mode: 'volume', z: 2 * s },
    polarization: 'average',
    chipSpectrum: [[450, 1]]
  };
}

function trace(scene: SceneDescription, rays: number, seed = 7, maxEvents = 100000): Tally {
  const compiled = compileScene(scene);
  const tally = createTally();
  const chunks = 4;
  for (let c = 0; c < chunks; c++) traceSceneChunk(compiled, c, rays / chunks, seed, tally, maxEvents);
  return tally;
}

const sumParts = (t: Tally) => Object.values(t.parts).reduce((a, b) => a + b, 0);

describe('phosphor transport against radiative-transfer references', () => {
  // Semi-infinite, index-matched, isotropic scattering, single-scattering albedo 0.8: diffuse reflectance
  // 0.28525 for a normally incident collimated beam and 0.34187 for diffuse incidence — adding-doubling
  // reference values (H. C. van de Hulst, Multiple Light Scattering, Academic Press 1980, tables for
  // isotropic scattering; S. A. Prahl, adding-doubling tables). μt = 1/mm; the slab is 60 mean free paths
  // thick and ±60 wide (transmission and side loss below 1e−6 at this albedo).
  const slab = constant(0.8, 0.2, 0);
  it.each([
    ['collimated normal incidence', 'down' as const, 0.28525],
    ['diffuse incidence', 'lambertian-down' as const, 0.34187]
  ])('reflects the reference fraction for %s (k = 4)', (_, direction, expected) => {
    const rays = 20000;
    const t = trace(slabScene(direction, slab), rays);
    expect(sumParts(t)).toBe(rays);
    const reflected = t.parts['escaped:top'] / rays;
    expect(Math.abs(reflected - expected)).toBeLessThan(tolerance(expected, rays));
    expect(t.parts['phosphor:slab']).toBe(rays - t.parts['escaped:top'] - (t.parts['escaped:through'] ?? 0));
  });

  it('a pure absorber around a centred source: the upward half escapes with exp(−μa·R) (Beer–Lambert, closed form; k = 4)', () => {
    const rays = 20000;
    const R = 1;
    const mua = 0.7;
    const t = trace(domeScene(R, { kind: 'absorber' }, constant(0, mua, 0)), rays);
    const expected = 0.5 * Math.exp(-mua * R);
    expect(Math.abs(t.escaped / rays - expected)).toBeLessThan(tolerance(expected, rays));
    expect(t.spectral?.scatterEvents).toBe(0);
  });

  it('a pure scatterer in an index-matched dome on a perfect mirror: everything escapes (energy conservation, common practice)', () => {
    const rays = 4000;
    const t = trace(domeScene(1, { kind: 'mirror', mirror: { kind: 'reflectance', reflectance: 1 } }, constant(5, 0, 0.6)), rays);
    expect(t.escaped).toBe(rays);
    expect(t.lost).toBe(0);
    const s = phosphorSummary(t)!;
    expect(s.scatterEventsPerRay).toBeGreaterThan(3);
    expect(s.escapedBlue).toBe(1);
    expect(s.energyEfficiency).toBeCloseTo(1, 12);
  });

  it('conversion with QY = 1 and no scattering: every absorbed photon comes out converted, energy ≤ photons by the Stokes factor 450/550 (common practice)', () => {
    const rays = 4000;
    const t = trace(domeScene(1, { kind: 'mirror', mirror: { kind: 'reflectance', reflectance: 1 } }, constant(0, 3, 0, 1)), rays);
    const s = phosphorSummary(t)!;
    expect(t.escaped).toBe(rays);
    expect(s.escapedBlue + s.escapedConverted).toBeCloseTo(1, 12);
    // energy efficiency = blue share + converted share × 450/550 exactly (line emissions)
    expect(s.energyEfficiency).toBeCloseTo(s.escapedBlue + (s.escapedConverted * 450) / 550, 10);
    expect(s.energyEfficiency).toBeLessThan(s.photonEfficiency);
  });
});
