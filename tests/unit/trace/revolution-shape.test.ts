/**
 * The surface-of-revolution shape in the scene: a hemispherical dome given as a sampled profile traces like
 * the analytic spheroid cap (the same package, k = 4 standard errors of the difference), and a Lambertian
 * source's share within θ of the axis is sin² θ (Lambert's cosine law, common practice).
 */
import { describe, expect, it } from 'vitest';
import { compileScene } from '../../../src/lib/trace/compile-scene';
import { packageScene } from '../../../src/lib/trace/package-scene';
import type { SceneDescription } from '../../../src/lib/trace/scene';
import { createTally } from '../../../src/lib/trace/tally';
import { traceSceneChunk } from '../../../src/lib/trace/trace-chunk';
import type { TracePackage } from '../../../src/lib/trace/package-spec';

const pkg: TracePackage = {
  chip: { widthMm: 1, lengthMm: 1, heightMm: 0.15, n: 2.45, absorptionPerMm: 0.5, emission: 'plane' },
  base: { kind: 'reflectance', reflectance: 0.92 },
  encapsulant: { shape: 'dome', radiusMm: 2.5, heightMm: 2.5, n: 1.41, absorptionPerMm: 0 },
  outsideN: 1,
  polarization: 'average'
};

function trace(scene: SceneDescription, rays: number, seed: number) {
  const tally = createTally();
  const compiled = compileScene(scene);
  for (let i = 0; i * 16384 < rays; i++) traceSceneChunk(compiled, i, Math.min(16384, rays - i * 16384), seed, tally);
  return tally;
}

describe('revolution shape', () => {
  it('a dome as a sampled profile (400 segments) extracts like the analytic dome', () => {
    const scene = packageScene(pkg);
    const R = 2.5;
    const n = 401;
    const r = new Float64Array(n);
    const z = new Float64Array(n);
    // from the rim (R, 0) up to the pole (0, R): the outward normal is on the walking direction's right
    for (let i = 0; i < n; i++) {
      const phi = ((Math.PI / 2) * i) / (n - 1);
      r[i] = R * Math.cos(phi);
      z[i] = R * Math.sin(phi);
    }
    const sampled: SceneDescription = {
      ...scene,
      surfaces: scene.surfaces.map((s) => (s.name === 'dome' ? { ...s, shape: { kind: 'revolution' as const, r, z } } : s))
    };
    const rays = 60_000;
    const a = trace(scene, rays, 11);
    const b = trace(sampled, rays, 12);
    const pa = a.escaped / rays;
    const pb = b.escaped / rays;
    const sigma = Math.sqrt((pa * (1 - pa) + pb * (1 - pb)) / rays);
    expect(Math.abs(pa - pb)).toBeLessThan(4 * sigma);
    expect(b.geometryErrors).toBe(0);
    expect(b.parts['escaped:dome']).toBeGreaterThan(0);
  });

  it("a Lambertian source's share within 30° of the axis is sin² 30° = 1/4", () => {
    const scene: SceneDescription = {
      media: [{ name: 'outside', role: 'outside', n: 1, absorptionPerMm: 0 }],
      surfaces: [
        { name: 'board', shape: { kind: 'disc', at: 0, normalSign: 1, rInner: 0, rOuter: Infinity }, front: 'outside', behind: null, behaviour: { kind: 'absorber' } }
      ],
      outside: 'outside',
      emitter: { medium: 'outside', mode: 'lambertian', z: 0, source: { shape: 'disc', widthMm: 1, lengthMm: 1 }, surface: 'board' },
      polarization: 'average'
    };
    const rays = 40_000;
    const t = trace(scene, rays, 3);
    let within = 0;
    for (let i = 0; i < 30; i++) within += t.polarHistogram[i];
    const p = within / rays;
    expect(Math.abs(p - 0.25)).toBeLessThan(4 * Math.sqrt((0.25 * 0.75) / rays));
    expect(t.escaped).toBe(rays);
  });
});
