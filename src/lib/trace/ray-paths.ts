/**
 * A few traced rays as polylines, for the package drawing: where each ray started on the emitter,
 * every surface it met, and where it ended, with its fate (the ledger bin it went to).
 *
 * The rays are chunk 0 of the given seed, traced by the tracer's own steps (recordSceneRays in
 * trace-chunk.ts), so their fates are exactly the tally of traceSync(pkg, { rays, seed }) for the
 * same numbers (rays ≤ one chunk). A traced run never records: this is a separate, small run.
 */
import { compileScene, type LedgerGroup } from './compile-scene';
import { DEFAULT_MAX_EVENTS, validateTracePackage, type TracePackage } from './package-spec';
import { packageScene } from './package-scene';
import type { SceneDescription, Shape } from './scene';
import { recordSceneRays } from './trace-chunk';

/** One recorded ray. */
export interface RayPath {
  /**
   * Points along the ray, mm (x, y, z): the launch point, each surface event's point, and the end —
   * the absorption point in a medium, or for an escape a point one scene radius beyond the last
   * surface along the escape direction. A ray absorbed at a surface ends at that surface's point.
   */
  points: [number, number, number][];
  /** Name of the surface each point lies on; '' for the launch point, an absorption point in a medium and an escape's end. */
  surfaces: string[];
  /** The ledger bin the ray ended in: 'escaped:<surface>', 'medium:<name>', 'surface:<name>', 'lost:event cap', 'lost:geometry error'. */
  fate: string;
  /** The fate's group in the summary ledger (for a colour per group). */
  group: LedgerGroup;
}

export interface SamplePathOptions {
  /** Rays to record, integer in [1, 1000]; about 50 suit a drawing. */
  rays: number;
  /** Unsigned 32-bit seed. */
  seed: number;
  /** Surface events after which a ray is lost; default as a traced run. */
  maxEvents?: number;
}

/** Radius of a sphere about the origin holding every finite shape of the scene, mm. */
export function sceneRadius(scene: SceneDescription): number {
  let r = 0;
  const grow = (x: number, y: number, z: number) => {
    r = Math.max(r, Math.hypot(x, y, z));
  };
  for (const { shape } of scene.surfaces) grow(...shapeCorner(shape));
  return r;
}

/** The farthest point of a shape's bounding box from the origin, as |x|, |y|, |z| (an endless plane counts at its height only). */
function shapeCorner(sh: Shape): [number, number, number] {
  switch (sh.kind) {
    case 'rect': {
      const c: [number, number, number] = [0, 0, 0];
      const others = [0, 1, 2].filter((k) => k !== sh.axis);
      c[sh.axis] = Math.abs(sh.at);
      c[others[0]] = Math.max(Math.abs(sh.uMin), Math.abs(sh.uMax));
      c[others[1]] = Math.max(Math.abs(sh.vMin), Math.abs(sh.vMax));
      return c;
    }
    case 'disc':
      return [Number.isFinite(sh.rOuter) ? sh.rOuter : 0, 0, Math.abs(sh.at)];
    case 'cylinder':
      return [sh.radius, 0, Math.max(Math.abs(sh.z0), Math.abs(sh.z1))];
    case 'frustum':
      return [Math.max(sh.r0, sh.r1), 0, Math.max(Math.abs(sh.z0), Math.abs(sh.z1))];
    case 'spheroid-cap':
      return [sh.radius, 0, Math.max(Math.abs(sh.zCentre), Math.abs(sh.zCentre + sh.height))];
    case 'revolution': {
      let r = 0;
      let z = 0;
      for (let i = 0; i < sh.r.length; i++) {
        r = Math.max(r, Math.abs(sh.r[i]));
        z = Math.max(z, Math.abs(sh.z[i]));
      }
      return [r, 0, z];
    }
  }
}

/**
 * Traces `rays` rays of `pkg` (chunk 0 of `seed`) and returns their paths and fates.
 * @throws RangeError naming the field and its allowed range on a bad package or options
 * @example samplePaths(pkg, { rays: 50, seed: 1 }).filter((p) => p.group === 'escaped').length
 */
export function samplePaths(pkg: TracePackage, options: SamplePathOptions): RayPath[] {
  validateTracePackage(pkg);
  const { rays, seed } = options;
  if (!Number.isInteger(rays) || rays < 1 || rays > 1000) throw new RangeError(`rays must be an integer in [1, 1000] (got ${rays})`);
  if (!Number.isInteger(seed) || seed < 0 || seed > 0xffffffff) throw new RangeError(`seed must be an integer in [0, 4294967295] (got ${seed})`);
  const maxEvents = options.maxEvents ?? DEFAULT_MAX_EVENTS;
  if (!Number.isInteger(maxEvents) || maxEvents < 1) throw new RangeError(`maxEvents must be an integer ≥ 1 (got ${maxEvents})`);
  const description = packageScene(pkg);
  const scene = compileScene(description);
  const reach = sceneRadius(description);
  const paths: RayPath[] = [];
  let points: [number, number, number][] = [];
  let surfaces: string[] = [];
  recordSceneRays(scene, 0, rays, seed, maxEvents, {
    point(x, y, z, surface) {
      points.push([x, y, z]);
      surfaces.push(surface < 0 ? '' : scene.surfaceNames[surface]);
    },
    absorbed(x, y, z) {
      points.push([x, y, z]);
      surfaces.push('');
    },
    escaped(dx, dy, dz) {
      const [x, y, z] = points[points.length - 1];
      points.push([x + reach * dx, y + reach * dy, z + reach * dz]);
      surfaces.push('');
    },
    end(bin) {
      paths.push({ points, surfaces, fate: scene.binNames[bin], group: scene.binGroups[bin] });
      points = [];
      surfaces = [];
    }
  });
  return paths;
}
