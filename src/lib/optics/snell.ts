/**
 * Snell's law, as an angle and as a direction vector, and mirror reflection of a direction.
 * Vector functions follow the out-parameter style: inputs are copied to locals first, so `out` may be
 * the same array as `d` or `n`.
 * Source: M. Born, E. Wolf, Principles of Optics, §1.5.1; vector form as in M. Pharr, W. Jakob,
 * G. Humphreys, Physically Based Rendering, 3rd ed., §8.2.3.
 */
import { requireInRange, requirePositive } from './guard';

/** A 3-vector written to in place. */
export type Vec3 = Float64Array | number[];
/** A 3-vector that is only read. */
export type ReadonlyVec3 = ArrayLike<number>;

/**
 * Angle of refraction from Snell's law: etaI sin θi = etaT sin θt.
 * @param thetaI angle of incidence in radians, [−π/2, π/2] (sign is kept)
 * @param etaI index on the incident side (> 0); @param etaT index on the far side (> 0)
 * @returns θt in radians with the sign of θi, or null on total internal reflection
 *   (|etaI sin θi / etaT| > 1). Exactly at the critical angle it returns ±π/2 (grazing).
 * @example refractAngle(Math.PI / 6, 1, 1.5) // ≈ 0.3398 (19.47°)
 * @see Born & Wolf, Principles of Optics, §1.5.1
 */
export function refractAngle(thetaI: number, etaI: number, etaT: number): number | null {
  requireInRange('thetaI', thetaI, -Math.PI / 2, Math.PI / 2);
  requirePositive('etaI', etaI);
  requirePositive('etaT', etaT);
  // sin θt = (etaI / etaT) sin θi
  const sinT = (etaI / etaT) * Math.sin(thetaI);
  if (Math.abs(sinT) > 1) return null;
  return Math.asin(sinT);
}

/**
 * Refracted direction, vector form of Snell's law.
 *
 *   cosθi = −d·n,  η = etaI/etaT,  k = 1 − η²(1 − cos²θi)
 *   TIR when k < 0; otherwise t = η d + (η cosθi − √k) n
 *
 * Trusts its inputs (hot path): d and n unit length, n the surface normal on the incident side
 * (d·n ≤ 0). The result is a unit vector when the inputs are.
 * @param out receives the refracted direction (untouched on total internal reflection)
 * @param d incident direction (unit, pointing toward the surface)
 * @param n unit normal facing the incident side
 * @param etaI index on the incident side; @param etaT index on the far side
 * @returns false on total internal reflection (k < 0), true otherwise. Exactly critical (k = 0) refracts
 *   to the grazing direction and returns true.
 * @see Pharr, Jakob, Humphreys, Physically Based Rendering, 3rd ed., §8.2.3
 */
export function refractDirection(
  out: Vec3,
  d: ReadonlyVec3,
  n: ReadonlyVec3,
  etaI: number,
  etaT: number
): boolean {
  etasIn[1] = etaI;
  etasIn[2] = etaT;
  return refractDirectionAt(out, d, n, etasIn);
}

/** refractDirection's indices, for its array form. */
const etasIn = new Float64Array(3);

/**
 * {@link refractDirection} with the two indices in an array, etas = [·, etaI, etaT] (the layout of
 * fresnelRealAt's input), so that a call the engine does not inline boxes nothing (a call that is not
 * inlined boxes every floating-point argument). Same result; the formula lives here.
 */
export function refractDirectionAt(out: Vec3, d: ReadonlyVec3, n: ReadonlyVec3, etas: Float64Array): boolean {
  const dx = d[0];
  const dy = d[1];
  const dz = d[2];
  const nx = n[0];
  const ny = n[1];
  const nz = n[2];
  const cosI = -(dx * nx + dy * ny + dz * nz);
  const eta = etas[1] / etas[2];
  const k = 1 - eta * eta * (1 - cosI * cosI);

  // Handle total internal reflection
  if (k < 0) return false;

  const c = eta * cosI - Math.sqrt(k);
  out[0] = eta * dx + c * nx;
  out[1] = eta * dy + c * ny;
  out[2] = eta * dz + c * nz;
  return true;
}

/**
 * Mirror reflection of a direction: r = d − 2 (d·n) n. Either orientation of the unit normal n gives
 * the same result. Trusts its inputs (hot path).
 * @param out receives the reflected direction; may alias d or n
 * @param d incident direction; @param n unit surface normal
 * @returns out
 * @see Born & Wolf, Principles of Optics, §1.5.1 (law of reflection)
 */
export function reflectDirection(out: Vec3, d: ReadonlyVec3, n: ReadonlyVec3): Vec3 {
  const dx = d[0];
  const dy = d[1];
  const dz = d[2];
  const nx = n[0];
  const ny = n[1];
  const nz = n[2];
  const s = 2 * (dx * nx + dy * ny + dz * nz);
  out[0] = dx - s * nx;
  out[1] = dy - s * ny;
  out[2] = dz - s * nz;
  return out;
}
