/**
 * Ray–surface intersection for each shape kind of the compiled scene (layouts in scene-layout.ts),
 * and the unit normal facing the incident side at a hit.
 *
 * A ray in a medium meets a surface only when it crosses it from that medium's side: from the front
 * (the normal's side) it must move against the normal, from behind along it. That one rule keeps a
 * ray from re-hitting the surface it stands on, so no distance guard and no nudge is needed:
 * - planes (rect, disc): the sign of d·n decides, t = (at − p_k)/d_k ≥ 0, then the bounds;
 * - quadrics f(p + t d) = A t² + 2B t + C with f < 0 behind (cylinder, frustum, spheroid): the
 *   crossing from behind is the root where f rises, t = (−B + √(B² − AC))/A, the crossing from the
 *   front the other one, t = (−B − √(B² − AC))/A (whatever the sign of A), each in its
 *   cancellation-free form; then the z range of the shape. A ray standing on the surface has that
 *   root at 0 only if it is crossing, never when it has just crossed.
 * Each function writes the distance (mm) to hit[0] and returns true on a hit; the tracer's list search
 * dispatches on the shape kind itself (trace-chunk.ts).
 * Sources: T. L. Kay, J. T. Kajiya, SIGGRAPH '86 (planes, slabs); W. H. Press et al., Numerical
 * Recipes, 3rd ed., §5.6 (stable quadratic roots).
 */
import { revolutionNormal } from './revolution-shape';
import * as layout from './scene-layout';

// The layout's constants as module constants: under tsx (command line, bench) an imported binding is a
// getter, which the optimiser does not always inline in a large function (measured: 3× slower loop)
const { SHAPE_CYLINDER, SHAPE_DISC, SHAPE_FRUSTUM, SHAPE_RECT, SHAPE_REVOLUTION, SIDE_FRONT, S_P, S_SHAPE } = layout;

/** Rect: axis, at, normalSign, uMin, uMax, vMin, vMax from offset p. */
export function intersectRect(s: Float64Array, p: number, side: number, ray: Float64Array, hit: Float64Array): boolean {
  const k = s[p] | 0;
  const sigma = s[p + 2];
  const dk = ray[3 + k];
  // From the front the ray moves against the normal σ·ê_k
  if (side === SIDE_FRONT ? sigma * dk >= 0 : sigma * dk <= 0) return false;
  // t = D/d_k ≥ 0 exactly when D is 0 or has d_k's sign (|d_k| ≤ 1: the quotient never rounds to 0),
  // so a plane behind the ray costs no division
  const D = s[p + 1] - ray[k];
  if (dk < 0 ? D > 0 : D < 0) return false;
  const t = D / dk;
  if (!(t >= 0)) return false;
  // The two other axes in order
  const iu = k === 0 ? 1 : 0;
  const iv = k === 2 ? 1 : 2;
  const u = ray[iu] + t * ray[3 + iu];
  if (!(u >= s[p + 3] && u <= s[p + 4])) return false;
  const v = ray[iv] + t * ray[3 + iv];
  if (!(v >= s[p + 5] && v <= s[p + 6])) return false;
  hit[0] = t;
  return true;
}

/** Disc / annulus / plane z = at: at, normalSign, rInner², rOuter² from offset p. */
export function intersectDisc(s: Float64Array, p: number, side: number, ray: Float64Array, hit: Float64Array): boolean {
  const sigma = s[p + 1];
  const dz = ray[5];
  if (side === SIDE_FRONT ? sigma * dz >= 0 : sigma * dz <= 0) return false;
  const t = (s[p] - ray[2]) / dz;
  if (!(t >= 0)) return false;
  const x = ray[0] + t * ray[3];
  const y = ray[1] + t * ray[4];
  const r2 = x * x + y * y;
  if (!(r2 >= s[p + 2] && r2 <= s[p + 3])) return false;
  hit[0] = t;
  return true;
}

// A quadric's coefficients [A, B, C] and its root, in arrays: a call the engine declines to inline
// boxes every floating-point argument and result, and the tracer's list search is out of budget often
const quadric = new Float64Array(4);

/**
 * The root of A t² + 2B t + C = 0 where the ray crosses from `side`, or −1 when there is none, with
 * q = [A, B, C]; written to q[3]. From behind with A > 0 (a closed quadric seen from inside) a negative
 * discriminant is roundoff of a point a hair outside: it is read as 0 (the tangent point), never NaN.
 */
function quadricRoot(q: Float64Array, side: number): void {
  const A = q[0];
  const B = q[1];
  const C = q[2];
  let D = B * B - A * C;
  if (side === SIDE_FRONT) {
    if (D < 0 || A === 0) {
      q[3] = -1;
      return;
    }
    const sq = Math.sqrt(D);
    // t = (−B − √D)/A
    q[3] = B < 0 ? C / (sq - B) : -(B + sq) / A;
    return;
  }
  if (A === 0 || (D < 0 && A < 0)) {
    q[3] = -1;
    return;
  }
  if (D < 0) D = 0;
  const sq = Math.sqrt(D);
  // t = (−B + √D)/A; from inside a closed quadric (A > 0) a point a hair outside gives 0, not t < 0
  const t = B > 0 ? -C / (B + sq) : (sq - B) / A;
  q[3] = A > 0 && t < 0 ? 0 : t;
}

/** Cylinder wall about z: radius, z0, z1 from offset p. */
export function intersectCylinder(s: Float64Array, p: number, side: number, ray: Float64Array, hit: Float64Array): boolean {
  const px = ray[0];
  const py = ray[1];
  const dx = ray[3];
  const dy = ray[4];
  const R = s[p];
  // f = x² + y² − R²
  const A = dx * dx + dy * dy;
  if (!(A > 0)) return false;
  quadric[0] = A;
  quadric[1] = px * dx + py * dy;
  quadric[2] = px * px + py * py - R * R;
  quadricRoot(quadric, side);
  const t = quadric[3];
  if (!(t >= 0)) return false;
  const z = ray[2] + t * ray[5];
  if (!(z >= s[p + 1] && z <= s[p + 2])) return false;
  hit[0] = t;
  return true;
}

/** Cone frustum wall about z: r0, z0, r1, z1, slope from offset p. */
export function intersectFrustum(s: Float64Array, p: number, side: number, ray: Float64Array, hit: Float64Array): boolean {
  const px = ray[0];
  const py = ray[1];
  const dx = ray[3];
  const dy = ray[4];
  const dz = ray[5];
  const k = s[p + 4];
  // f = x² + y² − ρ(z)², ρ(z) = r0 + k (z − z0)
  const rho = s[p] + k * (ray[2] - s[p + 1]);
  const kdz = k * dz;
  quadric[0] = dx * dx + dy * dy - kdz * kdz;
  quadric[1] = px * dx + py * dy - rho * kdz;
  quadric[2] = px * px + py * py - rho * rho;
  quadricRoot(quadric, side);
  const t = quadric[3];
  if (!(t >= 0)) return false;
  const z = ray[2] + t * dz;
  if (!(z >= s[p + 1] && z <= s[p + 3])) return false;
  hit[0] = t;
  return true;
}

/**
 * Spheroid cap z ≥ zCentre: R, h, zCentre from offset p. Scaling z by R/h maps the spheroid to a
 * sphere of radius R: with q = (x, y, (z − zc)R/h) and v = (dx, dy, dz·R/h), A = v·v, B = q·v,
 * C = q·q − R².
 */
export function intersectSpheroidCap(s: Float64Array, p: number, side: number, ray: Float64Array, hit: Float64Array): boolean {
  const px = ray[0];
  const py = ray[1];
  const dx = ray[3];
  const dy = ray[4];
  const R = s[p];
  const scale = R / s[p + 1];
  const zc = s[p + 2];
  const qz = (ray[2] - zc) * scale;
  const vz = ray[5] * scale;
  const A = dx * dx + dy * dy + vz * vz;
  const B = px * dx + py * dy + qz * vz;
  const C = px * px + py * py + qz * qz - R * R;
  // From behind, a point clearly outside the spheroid (the medium behind a cap can reach below its base
  // plane, as a cup's fill under a remote phosphor shell does) crosses the cap only after entering the
  // spheroid: not when its line misses it or it moves away (quadricRoot would read that as roundoff)
  if (side !== SIDE_FRONT && C > 1e-9 * R * R && (B >= 0 || B * B < A * C)) return false;
  quadric[0] = A;
  quadric[1] = B;
  quadric[2] = C;
  quadricRoot(quadric, side);
  const t = quadric[3];
  if (!(t >= 0)) return false;
  if (!(ray[2] + t * ray[5] >= zc)) return false;
  hit[0] = t;
  return true;
}

/**
 * Puts the ray exactly on a planar surface it has reached (roundoff of the step), and writes the unit
 * normal facing the incident side (the side the ray comes from: cos θi = −d·n ≥ 0) into `normal`.
 * Returns the axis (0, 1, 2) of an axis-aligned plane, −1 for a curved surface. Kept small (the
 * curved shapes apart) so the engine inlines it into the tracer's surface event.
 */
export function surfaceNormal(s: Float64Array, o: number, side: number, ray: Float64Array, normal: Float64Array): number {
  const p = o + S_P;
  const shape = s[o + S_SHAPE] | 0;
  if (shape === SHAPE_RECT || shape === SHAPE_DISC) {
    const k = shape === SHAPE_RECT ? s[p] | 0 : 2;
    const at = shape === SHAPE_RECT ? p + 1 : p;
    ray[k] = s[at];
    normal[0] = 0;
    normal[1] = 0;
    normal[2] = 0;
    // the shape's own normal σ·ê_k, turned to the incident side
    normal[k] = side === SIDE_FRONT ? s[at + 1] : -s[at + 1];
    return k;
  }
  curvedNormal(s, o, side, ray, normal);
  return -1;
}

/** surfaceNormal of a curved shape (cylinder, frustum, spheroid cap). */
function curvedNormal(s: Float64Array, o: number, side: number, ray: Float64Array, normal: Float64Array): void {
  const p = o + S_P;
  // +1 when the normal on the incident side is the shape's own normal
  const toward = side === SIDE_FRONT ? 1 : -1;
  switch (s[o + S_SHAPE] | 0) {
    case SHAPE_CYLINDER: {
      // outward (x, y, 0)/r
      const inv = toward / Math.sqrt(ray[0] * ray[0] + ray[1] * ray[1]);
      normal[0] = ray[0] * inv;
      normal[1] = ray[1] * inv;
      normal[2] = 0;
      return;
    }
    case SHAPE_FRUSTUM: {
      // outward ∇f ∝ (x, y, −k ρ(z))
      const k = s[p + 4];
      const gz = -k * (s[p] + k * (ray[2] - s[p + 1]));
      const inv = toward / Math.sqrt(ray[0] * ray[0] + ray[1] * ray[1] + gz * gz);
      normal[0] = ray[0] * inv;
      normal[1] = ray[1] * inv;
      normal[2] = gz * inv;
      return;
    }
    case SHAPE_REVOLUTION:
      revolutionNormal(s, p, side, normal);
      return;
    default: {
      // Spheroid: outward ∇(x²/R² + y²/R² + (z − zc)²/h²) ∝ (x/R², y/R², (z − zc)/h²)
      const gx = ray[0] * s[p + 3];
      const gy = ray[1] * s[p + 3];
      const gz = (ray[2] - s[p + 2]) * s[p + 4];
      const inv = toward / Math.sqrt(gx * gx + gy * gy + gz * gz);
      normal[0] = gx * inv;
      normal[1] = gy * inv;
      normal[2] = gz * inv;
    }
  }
}
