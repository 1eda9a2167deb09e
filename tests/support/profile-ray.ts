/**
 * A deterministic ray walk through the sampled profiles of a designed optic, for tests: no Fresnel branching —
 * at a solid's face a ray refracts when it can and reflects totally when it cannot; at a mirror it reflects.
 * It uses the core's surface-of-revolution intersection and vector Snell's law, so a test checks the designer
 * against geometry it does not share.
 */
import { buildRevolutionProfile, intersectRevolution, type OpticDesign, type RevolutionProfile } from '../../src/lib/optic-design';
import { reflectDirection, refractDirection } from '../../src/lib/optics/snell';

const built = new WeakMap<OpticDesign, RevolutionProfile>();

export interface WalkEvent {
  surface: string;
  kind: 'refract' | 'tir' | 'mirror';
  x: number;
  y: number;
  z: number;
}

export interface WalkResult {
  /** Final direction (unit). */
  d: Float64Array;
  /** Final position. */
  p: Float64Array;
  events: WalkEvent[];
}

/**
 * Walks a ray from `origin` along `dir` (unit) through the design: a lens or TIR solid (index design.n in air),
 * or a reflector's mirror. Stops when the ray meets nothing more, or after `maxEvents`.
 */
export function walkRay(design: OpticDesign, origin: ArrayLike<number>, dir: ArrayLike<number>, maxEvents = 20): WalkResult {
  let profile = built.get(design);
  if (!profile) {
    profile = buildRevolutionProfile(design.surfaces);
    built.set(design, profile);
  }
  const ray = Float64Array.of(origin[0], origin[1], origin[2], dir[0], dir[1], dir[2]);
  const hit = new Float64Array(4);
  const nrm = new Float64Array(3);
  const d = new Float64Array(3);
  const events: WalkEvent[] = [];
  let inside = false;
  for (let k = 0; k < maxEvents; k++) {
    // 1e-7 mm skips the surface the ray just left (its rounding re-hit lies within ~2e-9 mm)
    const t = intersectRevolution(profile, ray, 1e-7, hit);
    if (t === Infinity) break;
    for (let i = 0; i < 3; i++) ray[i] += t * ray[3 + i];
    d[0] = ray[3];
    d[1] = ray[4];
    d[2] = ray[5];
    const surface = profile.names[profile.surfaceOfSegment[hit[3]]];
    const at = { surface, x: ray[0], y: ray[1], z: ray[2] };
    if (design.type === 'reflector') {
      reflectDirection(d, d, hit);
      events.push({ ...at, kind: 'mirror' });
    } else {
      // Normal facing the incident side: the outward normal when outside, flipped inside
      const facing = d[0] * hit[0] + d[1] * hit[1] + d[2] * hit[2] < 0;
      for (let i = 0; i < 3; i++) nrm[i] = facing ? hit[i] : -hit[i];
      inside = !facing; // a ray meeting the outward normal head-on comes from outside
      const etaI = inside ? design.n : 1;
      const etaT = inside ? 1 : design.n;
      if (refractDirection(d, d, nrm, etaI, etaT)) events.push({ ...at, kind: 'refract' });
      else {
        reflectDirection(d, d, nrm);
        events.push({ ...at, kind: 'tir' });
      }
    }
    ray[3] = d[0];
    ray[4] = d[1];
    ray[5] = d[2];
  }
  return { d: ray.slice(3, 6), p: ray.slice(0, 3), events };
}
