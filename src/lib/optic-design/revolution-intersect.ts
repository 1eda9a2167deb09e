/**
 * Ray intersection with a surface of revolution given as a sampled meridian polyline (see profile.ts):
 * each segment, rotated about the z axis, is a cone frustum (a flat annulus when Δz = 0, a cylinder when
 * Δr = 0). Built once per surface; the intersection itself allocates nothing (hot path of a tracer).
 *
 * Cone of segment i: x² + y² = ρ(z)², ρ(z) = r0 + k (z − z0), k = Δr/Δz, ρ ≥ 0, z in the segment's band.
 * With the ray p = o + t d this is a quadratic in t — the ray–cone intersection as in M. Pharr, W. Jakob,
 * G. Humphreys, Physically Based Rendering, 3rd ed., §3.8 (cones), solved in the cancellation-free form
 * q = −½(b + sign(b)√disc), t = q/a, c/q (W. H. Press et al., Numerical Recipes, 3rd ed., §5.6).
 *
 * Fast rejections, without a division per box: the ray's closest approach to the axis beyond the whole profile;
 * then, for a box over 8 segments and then for each of its segments, the t-interval in which the ray is inside
 * the box's z band, and whether the ray's distance from the axis over that interval reaches the box's radii.
 * Measured (2-core machine under a load average of ~17): a 52-segment TIR profile 1.65 M intersections/s
 * (0.72 with per-segment boxes only), 644 segments 0.36 M/s (0.06).
 */
import type { ProfileSurface } from './profile';

/** Segments per bounding group: a ray tests a group's box before its segments' (a two-level hierarchy). */
const GROUP = 8;

/** A profile prepared for intersection: points plus bounding boxes. */
export interface RevolutionProfile {
  /** Number of points (segments = count − 1). */
  count: number;
  r: Float64Array;
  z: Float64Array;
  /**
   * Bounding boxes in visiting order, stride 4 (lowest z, highest z, smallest r, largest r; largest r = −1 for
   * a gap, never hit): a group box over GROUP segments, then those segments' boxes, then the next group…
   */
  boxes: Float64Array;
  /** Largest r of the whole profile, mm. */
  rMax: number;
  zMin: number;
  zMax: number;
  /** Slack of the band tests, mm: 1e-12 of the profile's size, so a ray through a shared end point is not lost to rounding. */
  eps: number;
  /** Index of the named surface each segment belongs to (into `names`). */
  surfaceOfSegment: Int32Array;
  names: string[];
}

/**
 * Joins named surfaces, in order, into one intersectable profile. Consecutive surfaces are expected to share
 * their end points (a closed solid's boundary); a gap between them becomes no segment.
 * @throws RangeError when a surface has fewer than 2 points, a negative r, or a non-finite coordinate
 */
export function buildRevolutionProfile(surfaces: readonly ProfileSurface[]): RevolutionProfile {
  const rs: number[] = [];
  const zs: number[] = [];
  const owner: number[] = [];
  const names: string[] = [];
  for (let s = 0; s < surfaces.length; s++) {
    const { name, r, z } = surfaces[s];
    if (r.length < 2 || r.length !== z.length) throw new RangeError(`surface ${name}: needs ≥ 2 points with r and z of equal length`);
    for (let i = 0; i < r.length; i++) {
      if (!Number.isFinite(r[i]) || !Number.isFinite(z[i]) || r[i] < 0) {
        throw new RangeError(`surface ${name}: point ${i} must have finite r ≥ 0 and z (got ${r[i]}, ${z[i]})`);
      }
    }
    names.push(name);
    for (let i = 0; i < r.length; i++) {
      const last = rs.length - 1;
      if (i === 0 && last >= 0 && rs[last] === r[0] && zs[last] === z[0]) continue; // shared end point
      if (last >= 0) owner.push(i === 0 ? -1 : s); // −1: the jump between two surfaces that do not meet
      rs.push(r[i]);
      zs.push(z[i]);
    }
  }
  const count = rs.length;
  const segments = Math.max(0, count - 1);
  const groups = Math.ceil(segments / GROUP);
  const boxes = new Float64Array(4 * (GROUP + 1) * groups);
  let rMax = 0;
  let zMin = Infinity;
  let zMax = -Infinity;
  for (let i = 0; i < count; i++) {
    rMax = Math.max(rMax, rs[i]);
    zMin = Math.min(zMin, zs[i]);
    zMax = Math.max(zMax, zs[i]);
  }
  for (let g = 0; g < groups; g++) {
    const gb = 4 * (GROUP + 1) * g;
    let gzLo = Infinity;
    let gzHi = -Infinity;
    let grLo = Infinity;
    let grHi = -1;
    for (let j = 0; j < GROUP; j++) {
      const i = g * GROUP + j;
      const b = gb + 4 * (j + 1);
      if (i >= segments || owner[i] < 0) {
        boxes[b + 3] = -1; // padding, or the jump between two surfaces: never hit
        continue;
      }
      boxes[b] = Math.min(zs[i], zs[i + 1]);
      boxes[b + 1] = Math.max(zs[i], zs[i + 1]);
      boxes[b + 2] = Math.min(rs[i], rs[i + 1]);
      boxes[b + 3] = Math.max(rs[i], rs[i + 1]);
      gzLo = Math.min(gzLo, boxes[b]);
      gzHi = Math.max(gzHi, boxes[b + 1]);
      grLo = Math.min(grLo, boxes[b + 2]);
      grHi = Math.max(grHi, boxes[b + 3]);
    }
    boxes[gb] = gzLo;
    boxes[gb + 1] = gzHi;
    boxes[gb + 2] = grLo;
    boxes[gb + 3] = grHi;
  }
  return {
    count,
    r: Float64Array.from(rs),
    z: Float64Array.from(zs),
    boxes,
    rMax,
    zMin,
    zMax,
    eps: 1e-12 * (rMax + Math.abs(zMin) + Math.abs(zMax)),
    surfaceOfSegment: Int32Array.from(owner),
    names
  };
}

/**
 * Nearest intersection t > tMin of the ray o + t d with the profile's surface of revolution.
 * @param ray Float64Array [ox, oy, oz, dx, dy, dz] (mm; d need not be unit, t is in units of |d|)
 * @param tMin smallest accepted t (≥ 0). A ray leaving a face may re-hit it by rounding within ~1e-9 of the
 *   profile's size (measured: < 2e-9 mm on a 20 mm lens), so after a hit pass about 1e-7 mm
 * @param out receives the unit outward normal at the hit in out[0..2] (see profile.ts for "outward") and the
 *   segment index in out[3]; untouched on a miss
 * @returns t of the nearest hit, or Infinity when the ray misses. Never NaN for finite input with |d| > 0.
 */
export function intersectRevolution(profile: RevolutionProfile, ray: Float64Array, tMin: number, out: Float64Array): number {
  const ox = ray[0];
  const oy = ray[1];
  const oz = ray[2];
  const dx = ray[3];
  const dy = ray[4];
  const dz = ray[5];
  const a2 = dx * dx + dy * dy;
  const od = ox * dx + oy * dy;
  const o2 = ox * ox + oy * oy;
  // Closest approach of the ray's line to the axis: nothing beyond the profile's widest point can be hit
  const rho2Min = a2 > 0 ? Math.max(0, o2 - (od * od) / a2) : o2;
  const rReach = profile.rMax + profile.eps;
  if (rho2Min > rReach * rReach) return Infinity;
  if (dz === 0 && (oz < profile.zMin - profile.eps || oz > profile.zMax + profile.eps)) return Infinity;

  const r = profile.r;
  const z = profile.z;
  const boxes = profile.boxes;
  const nBoxes = boxes.length >> 2;
  const eps = profile.eps;
  let best = Infinity;
  let hit = -1;
  const invDz = dz !== 0 ? 1 / dz : 0;
  let k = 0;
  while (k < nBoxes) {
    // Box k: a group's (k a multiple of GROUP + 1; failing it skips its segments) or one segment's
    const isGroup = k % (GROUP + 1) === 0;
    const step = isGroup ? GROUP + 1 : 1;
    const rHi = boxes[4 * k + 3];
    if (rHi < 0) {
      k += step;
      continue;
    }
    const zLo = boxes[4 * k] - eps;
    const zHi = boxes[4 * k + 1] + eps;
    // The t-interval [ta, tb] in which the ray is inside the box's z band (and between tMin and the best hit)
    let ta = tMin;
    let tb = best;
    if (dz === 0) {
      if (oz < zLo || oz > zHi) ta = Infinity;
    } else {
      const t0 = (zLo - oz) * invDz;
      const t1z = (zHi - oz) * invDz;
      if (t0 < t1z) {
        if (t0 > ta) ta = t0;
        if (t1z < tb) tb = t1z;
      } else {
        if (t1z > ta) ta = t1z;
        if (t0 < tb) tb = t0;
      }
    }
    if (ta > tb) {
      k += step;
      continue;
    }
    // The ray's distance from the axis over [ta, tb] must reach the box's [rLo, rHi]: ρ²(t) is a convex
    // quadratic, so its largest value is at an end and its smallest at an end or at the closest approach.
    // (A filter only, with a relative slack for rounding; the exact test follows.)
    const hi2 = (rHi + eps) * (rHi + eps) * (1 + 1e-9);
    let reaches = rho2Min <= hi2;
    if (reaches && tb < Infinity) {
      const pa = o2 + ta * (2 * od + ta * a2);
      const pb = o2 + tb * (2 * od + tb * a2);
      let lo2 = pa < pb ? pa : pb;
      const top2 = pa < pb ? pb : pa;
      if (a2 > 0) {
        const ts = -od / a2;
        if (ts > ta && ts < tb) lo2 = rho2Min;
      }
      const rLo = boxes[4 * k + 2] - eps;
      reaches = lo2 <= hi2 && !(rLo > 0 && top2 < rLo * rLo * (1 - 1e-9));
    }
    if (!reaches || isGroup) {
      k += reaches ? 1 : step; // into the group's segments, or past the box
      continue;
    }
    const i = k - Math.floor(k / (GROUP + 1)) - 1; // the segment of box k
    k++;
    const r0 = r[i];
    const z0 = z[i];
    const r1 = r[i + 1];
    const z1 = z[i + 1];
    if (z1 === z0) {
      // Flat annulus in the plane z = z0
      if (dz === 0) continue;
      const t = (z0 - oz) / dz;
      if (t <= tMin || t >= best) continue;
      const px = ox + t * dx;
      const py = oy + t * dy;
      const p2 = px * px + py * py;
      const lo = (r0 < r1 ? r0 : r1) - eps;
      const hi = rHi + eps;
      if (p2 >= (lo > 0 ? lo * lo : 0) && p2 <= hi * hi) {
        best = t;
        hit = i;
      }
      continue;
    }
    // Cone, written so the division is by the segment's longer side (a nearly flat cone near the axis would
    // otherwise amplify rounding by Δr/Δz): steep, ρ = A + B t with ρ(z) = r0 + k (z − z0), k = Δr/Δz:
    //   (ox + t dx)² + (oy + t dy)² = (A + B t)²;
    // flat, m ρ = C + D t with z − z0 = m (ρ − r0), m = Δz/Δr: m²[(ox + t dx)² + (oy + t dy)²] = (C + D t)²
    const steep = Math.abs(z1 - z0) >= Math.abs(r1 - r0);
    let A: number;
    let B: number;
    let qa: number;
    let qb: number;
    let qc: number;
    let qScale: number; // size of qa's terms, for the degenerate (linear) test
    if (steep) {
      const k = (r1 - r0) / (z1 - z0);
      A = r0 + k * (oz - z0);
      B = k * dz;
      qa = a2 - B * B;
      qb = 2 * (od - A * B);
      qc = o2 - A * A;
      qScale = a2 + B * B;
    } else {
      const m = (z1 - z0) / (r1 - r0);
      const m2 = m * m;
      // ρ ≥ 0 ⇔ (C + D t)/m ≥ 0: keep the sign of m in A and B so the test below reads A + B t ≥ 0
      A = (oz - z0 + m * r0) / m;
      B = dz / m;
      qa = m2 * a2 - dz * dz;
      qb = 2 * (m2 * od - (oz - z0 + m * r0) * dz);
      qc = m2 * o2 - (oz - z0 + m * r0) * (oz - z0 + m * r0);
      qScale = m2 * a2 + dz * dz;
    }
    let t1 = Infinity;
    let t2 = Infinity;
    if (Math.abs(qa) <= 1e-14 * qScale) {
      // The ray runs parallel to a generatrix of the cone: one root of the linear equation
      if (qb !== 0) t1 = -qc / qb;
    } else {
      let disc = qb * qb - 4 * qa * qc;
      if (disc < 0) {
        // A ray along the axis through a cone's tip is a double root; rounding may push disc just below 0
        if (disc < -1e-12 * qb * qb) continue;
        disc = 0;
      }
      const q = -0.5 * (qb + (qb >= 0 ? Math.sqrt(disc) : -Math.sqrt(disc)));
      t1 = q / qa;
      t2 = q !== 0 ? qc / q : t1;
    }
    for (let root = 0; root < 2; root++) {
      const t = root === 0 ? t1 : t2;
      if (!(t > tMin && t < best)) continue;
      const pz = oz + t * dz;
      if (pz < zLo || pz > zHi || A + B * t < -eps) continue;
      best = t;
      hit = i;
    }
  }
  if (hit < 0) return Infinity;

  // Outward normal: (Δz, −Δr) in the meridian plane, turned to the hit's azimuth
  const sr = r[hit + 1] - r[hit];
  const sz = z[hit + 1] - z[hit];
  const len = Math.sqrt(sr * sr + sz * sz);
  const nr = sz / len;
  const nz = -sr / len;
  const px = ox + best * dx;
  const py = oy + best * dy;
  const rho = Math.sqrt(px * px + py * py);
  if (rho > 1e-100) {
    out[0] = (nr * px) / rho;
    out[1] = (nr * py) / rho;
    out[2] = nz;
  } else {
    // On the axis (a cone's tip; below 1e-100 mm the squares underflow): only the axial part is defined
    out[0] = 0;
    out[1] = 0;
    out[2] = nz >= 0 ? 1 : -1;
  }
  out[3] = hit;
  return best;
}
