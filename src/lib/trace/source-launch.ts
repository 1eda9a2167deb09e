/**
 * Starting rays from a source that is not a package's chip: an idealised flat Lambertian source
 * (a disc or a rectangle at height z, cosine-weighted directions about +z), or a table of rays
 * (a ray file), each drawn with probability proportional to its weight. The ray starts in the
 * scene's outside medium. Numbers come and go in arrays so nothing is boxed in the ray loop.
 * Sources: M. Pharr, W. Jakob, G. Humphreys, Physically Based Rendering, 3rd ed., §13.6.2 (uniform
 * point on a disc, r = R√u, φ = 2πu′), §13.3 (sampling a discrete distribution by its cumulative sum).
 */
import { lambertianDirection } from './lambertian';
import { uniformsInto } from './rng';
import * as layout from './scene-layout';

const { EMIT_LAMBERTIAN_DISC, EMIT_LAMBERTIAN_RECT, EMIT_RAY_STRIDE } = layout;

const UP = Float64Array.of(0, 0, 1);
const u = new Float64Array(2);
const dir = new Float64Array(3);

/**
 * Writes a new ray's position and unit direction into ray[0..5].
 * @param kind EMIT_LAMBERTIAN_RECT, EMIT_LAMBERTIAN_DISC or EMIT_RAYS
 * @param params [z, half width (disc radius), half length], mm
 * @param table ray table, EMIT_RAY_STRIDE doubles per ray, the last its cumulative weight (ending at 1)
 */
export function launchSourceRay(ray: Float64Array, kind: number, params: Float64Array, table: Float64Array): void {
  if (kind === EMIT_LAMBERTIAN_RECT || kind === EMIT_LAMBERTIAN_DISC) {
    uniformsInto(u, 2);
    if (kind === EMIT_LAMBERTIAN_RECT) {
      ray[0] = (2 * u[0] - 1) * params[1];
      ray[1] = (2 * u[1] - 1) * params[2];
    } else {
      const r = params[1] * Math.sqrt(u[0]);
      const phi = 2 * Math.PI * u[1];
      ray[0] = r * Math.cos(phi);
      ray[1] = r * Math.sin(phi);
    }
    ray[2] = params[0];
    uniformsInto(u, 2);
    lambertianDirection(dir, UP, u);
    ray[3] = dir[0];
    ray[4] = dir[1];
    ray[5] = dir[2];
    return;
  }
  // Ray table: the first ray whose cumulative weight exceeds a uniform number, by bisection
  uniformsInto(u, 1);
  let lo = 0;
  let hi = table.length / EMIT_RAY_STRIDE - 1;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (table[mid * EMIT_RAY_STRIDE + EMIT_RAY_STRIDE - 1] > u[0]) hi = mid;
    else lo = mid + 1;
  }
  const o = lo * EMIT_RAY_STRIDE;
  for (let k = 0; k < 6; k++) ray[k] = table[o + k];
}
