/**
 * A sampled meridian profile of a rotationally symmetric optic, and its sampler.
 *
 * Frame: z is the symmetry axis, up from the source plane (z = 0, the package's emitting top); r ≥ 0 is the
 * distance from the axis; lengths in mm. A surface is a polyline (r_i, z_i); rotated about the axis, each
 * segment is a cone frustum (or a flat annulus, or a cylinder). Orientation carries the outward side: the
 * outward normal of segment i is (Δz, −Δr)/|Δ| in the (r, z) plane — walking along the polyline with r to
 * the right and z up, the outside is on the right. Reverse a polyline to flip it.
 */

/** One named surface of an optic: a meridian polyline. */
export interface ProfileSurface {
  /** Our own name for the face ('reflector', 'entry', 'tir-wall', …), written into the CSV export. */
  name: string;
  /** Distance from the axis of each point, mm (≥ 0). */
  r: Float64Array;
  /** Height above the source plane of each point, mm. */
  z: Float64Array;
}

/** A point of a parametric meridian curve, written into out[0] = r, out[1] = z (mm). */
export type CurvePoint = (u: number, out: Float64Array) => void;

const MAX_DEPTH = 24;

/**
 * Samples a parametric curve u ↦ (r, z) on [u0, u1] so that every chord stays within `toleranceMm` of the
 * curve: an interval is halved while the curve point at its parameter midpoint lies farther than the
 * tolerance from the chord (the sagitta test; for a curve smooth on the interval the midpoint deviation is the
 * chord error to leading order — do Carmo, Differential Geometry of Curves and Surfaces, §1-5, from memory).
 * At least `minSegments` uniform intervals are taken first, so a curve symmetric about a midpoint is not
 * mistaken for its chord.
 * @param toleranceMm chord tolerance, mm, > 0
 * @returns the surface's points in parameter order
 */
export function sampleCurve(
  name: string,
  point: CurvePoint,
  u0: number,
  u1: number,
  toleranceMm: number,
  minSegments = 8
): ProfileSurface {
  const rs: number[] = [];
  const zs: number[] = [];
  const a = new Float64Array(2);
  const b = new Float64Array(2);
  const m = new Float64Array(2);
  const refine = (ua: number, ra: number, za: number, ub: number, rb: number, zb: number, depth: number): void => {
    const um = 0.5 * (ua + ub);
    point(um, m);
    const rm = m[0];
    const zm = m[1];
    const dr = rb - ra;
    const dz = zb - za;
    const len = Math.hypot(dr, dz);
    // distance of the midpoint from the chord line
    const dev = len > 0 ? Math.abs((rm - ra) * dz - (zm - za) * dr) / len : Math.hypot(rm - ra, zm - za);
    if (dev > toleranceMm && depth < MAX_DEPTH) {
      refine(ua, ra, za, um, rm, zm, depth + 1);
      refine(um, rm, zm, ub, rb, zb, depth + 1);
    } else {
      rs.push(rb);
      zs.push(zb);
    }
  };
  point(u0, a);
  rs.push(a[0]);
  zs.push(a[1]);
  for (let i = 0; i < minSegments; i++) {
    const ua = u0 + ((u1 - u0) * i) / minSegments;
    const ub = u0 + ((u1 - u0) * (i + 1)) / minSegments;
    point(ua, a);
    point(ub, b);
    refine(ua, a[0], a[1], ub, b[0], b[1], 0);
  }
  return { name, r: Float64Array.from(rs), z: Float64Array.from(zs) };
}

/** A straight face from (r0, z0) to (r1, z1) (one segment: a flat annulus, a cylinder or a cone). */
export function straightFace(name: string, r0: number, z0: number, r1: number, z1: number): ProfileSurface {
  return { name, r: Float64Array.of(r0, r1), z: Float64Array.of(z0, z1) };
}
