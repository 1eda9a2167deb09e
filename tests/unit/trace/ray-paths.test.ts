import { describe, expect, it } from 'vitest';
import { flipChipOnSapphire } from '../../../src/lib/trace/chip-presets';
import { packageScene } from '../../../src/lib/trace/package-scene';
import type { TracePackage } from '../../../src/lib/trace/package-spec';
import { samplePaths, sceneRadius } from '../../../src/lib/trace/ray-paths';
import type { Shape } from '../../../src/lib/trace/scene';
import { createTally } from '../../../src/lib/trace/tally';
import { traceChunk } from '../../../src/lib/trace/trace-chunk';
import { cupPackage, domePackage } from '../../support/fixtures';

const cup = cupPackage(flipChipOnSapphire());
const packages: [string, TracePackage][] = [
  ['dome', domePackage()],
  ['flip chip under the dome', { ...domePackage(), chip: flipChipOnSapphire() }],
  ['flat cup, diffuse wall', cup],
  ['empty cup, tracked polarisation', { ...cup, polarization: 'track', body: { ...(cup.body as object), fill: 'none' } as TracePackage['body'] }]
];

/** How far p is off the shape, mm (0 on it, within its bounds; Infinity outside its bounds). Geometry of scene.ts. */
function offSurface(sh: Shape, [x, y, z]: [number, number, number]): number {
  const slack = 1e-9;
  switch (sh.kind) {
    case 'rect': {
      const p = [x, y, z];
      const [iu, iv] = [0, 1, 2].filter((k) => k !== sh.axis);
      const inside = p[iu] >= sh.uMin - slack && p[iu] <= sh.uMax + slack && p[iv] >= sh.vMin - slack && p[iv] <= sh.vMax + slack;
      return inside ? Math.abs(p[sh.axis] - sh.at) : Infinity;
    }
    case 'disc': {
      const r = Math.hypot(x, y);
      return r >= sh.rInner - slack && r <= sh.rOuter + slack ? Math.abs(z - sh.at) : Infinity;
    }
    case 'cylinder':
      return z >= sh.z0 - slack && z <= sh.z1 + slack ? Math.abs(Math.hypot(x, y) - sh.radius) : Infinity;
    case 'frustum': {
      const rho = sh.r0 + ((sh.r1 - sh.r0) * (z - sh.z0)) / (sh.z1 - sh.z0);
      return z >= sh.z0 - slack && z <= sh.z1 + slack ? Math.abs(Math.hypot(x, y) - rho) : Infinity;
    }
    case 'spheroid-cap': {
      // x²/R² + y²/R² + (z − zc)²/h² = 1, as a distance scale: R·|√(…) − 1|
      const q = Math.sqrt((x * x + y * y) / sh.radius ** 2 + ((z - sh.zCentre) / sh.height) ** 2);
      return z >= sh.zCentre - slack ? sh.radius * Math.abs(q - 1) : Infinity;
    }
    case 'revolution':
      throw new Error('no package in this test holds a profile of revolution');
  }
}

describe('samplePaths', () => {
  it.each(packages)('%s: starts on the emitter, every event point on its surface, fates = the tally of the same seeded rays', (_, pkg) => {
    const rays = 60;
    const paths = samplePaths(pkg, { rays, seed: 5 });
    expect(paths).toHaveLength(rays);
    const scene = packageScene(pkg);
    const emitterBox = scene.media.find((m) => m.name === scene.emitter.medium)!.box!;
    const shapes = new Map(scene.surfaces.map((s) => [s.name, s.shape]));
    const reach = sceneRadius(scene);
    const fates: Record<string, number> = {};
    for (const path of paths) {
      fates[path.fate] = (fates[path.fate] ?? 0) + 1;
      expect(path.points.length).toBe(path.surfaces.length);
      const [x0, y0, z0] = path.points[0];
      expect(path.surfaces[0]).toBe('');
      expect(Math.abs(x0)).toBeLessThanOrEqual(emitterBox.a);
      expect(Math.abs(y0)).toBeLessThanOrEqual(emitterBox.b);
      expect(z0).toBe(scene.emitter.z);
      path.points.forEach((p, i) => {
        const name = path.surfaces[i];
        if (name !== '') expect(offSurface(shapes.get(name)!, p), `${path.fate}, point ${i} on ${name}`).toBeLessThan(1e-9);
      });
      if (path.group === 'escaped') {
        // the last surface met is the one the escape is credited to; the end is one scene radius beyond it
        const n = path.points.length;
        const last = scene.surfaces.find((s) => s.name === path.surfaces[n - 2])!;
        expect(path.fate).toBe(`escaped:${last.escapedBin ?? last.name}`);
        const [a, b] = [path.points[n - 2], path.points[n - 1]];
        expect(Math.hypot(b[0] - a[0], b[1] - a[1], b[2] - a[2])).toBeCloseTo(reach, 9);
      }
    }
    const tally = traceChunk(pkg, 0, rays, 5, createTally());
    const expected = Object.fromEntries(Object.entries(tally.parts).filter(([, n]) => n > 0));
    expect(fates).toEqual(expected);
  });

  it('leaves a traced run unchanged (the recorder keeps no state the loop reads)', () => {
    const pkg = domePackage();
    const before = traceChunk(pkg, 3, 3000, 9, createTally());
    samplePaths(cup, { rays: 50, seed: 2 });
    expect(traceChunk(pkg, 3, 3000, 9, createTally())).toEqual(before);
  });

  it('refuses bad options with one line naming the field and its range', () => {
    expect(() => samplePaths(domePackage(), { rays: 0, seed: 1 })).toThrow('rays must be an integer in [1, 1000]');
    expect(() => samplePaths(domePackage(), { rays: 10, seed: -1 })).toThrow('seed must be an integer in [0, 4294967295]');
  });
});
