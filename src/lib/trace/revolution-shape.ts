/**
 * The scene's surface-of-revolution shape (scene.ts `RevolutionShape`): a sampled meridian profile,
 * intersected by the optic designers' one implementation (optic-design/revolution-intersect.ts), with
 * the tracer's side rule on top: from the front the ray must move against the outward normal, from
 * behind along it. A hit on the wrong side (the face the ray stands on, met again by rounding, or
 * the far side of the same profile) is stepped past and the next one taken.
 *
 * The compiled scene carries the prepared profiles (`CompiledScene.profiles`); the ray loop hands
 * them over once per chunk (useRevolutionProfiles). The normal found by the intersection is kept per
 * surface, so the surface event reads it without intersecting again. Nothing is allocated per ray.
 */
import { intersectRevolution, type RevolutionProfile } from '../optic-design/revolution-intersect';
import { SIDE_FRONT } from './scene-layout';

/** Wrong-side hits stepped past before giving up (a profile crossed more often than this is not an optic). */
const MAX_STEPS = 8;

// `var`, not `let`, for the mutable state read per event (no initialisation check per read: see trace-chunk.ts)
var profiles: RevolutionProfile[] = [];
// The last outward normal found on each revolution surface, 3 doubles per surface index
var normals = new Float64Array(0);
// Intersection output [nx, ny, nz, segment]
const out = new Float64Array(4);

/** Hands the compiled scene's profiles to the intersection (once per chunk). */
export function useRevolutionProfiles(list: RevolutionProfile[], surfaceCount: number): void {
  profiles = list;
  if (normals.length < 3 * surfaceCount) normals = new Float64Array(3 * surfaceCount);
}

/**
 * Revolution shape from offset p (profile index, surface index): the nearest crossing from `side`,
 * distance to hit[0]; true on a hit.
 */
export function intersectRevolutionShape(s: Float64Array, p: number, side: number, ray: Float64Array, hit: Float64Array): boolean {
  const profile = profiles[s[p] | 0];
  let tMin = 0;
  for (let step = 0; step < MAX_STEPS; step++) {
    const t = intersectRevolution(profile, ray, tMin, out);
    if (t === Infinity) return false;
    const dn = ray[3] * out[0] + ray[4] * out[1] + ray[5] * out[2];
    if (side === SIDE_FRONT ? dn < 0 : dn > 0) {
      const k = 3 * (s[p + 1] | 0);
      normals[k] = out[0];
      normals[k + 1] = out[1];
      normals[k + 2] = out[2];
      hit[0] = t;
      return true;
    }
    tMin = t;
  }
  return false;
}

/** Unit normal facing the incident side at the last hit on the revolution surface at offset p. */
export function revolutionNormal(s: Float64Array, p: number, side: number, normal: Float64Array): void {
  const k = 3 * (s[p + 1] | 0);
  const toward = side === SIDE_FRONT ? 1 : -1;
  normal[0] = toward * normals[k];
  normal[1] = toward * normals[k + 1];
  normal[2] = toward * normals[k + 2];
}
