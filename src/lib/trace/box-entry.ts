import { SURFACE_NONE, CHIP_TOP, CHIP_X_POS, CHIP_X_NEG, CHIP_Y_POS, CHIP_Y_NEG } from './surfaces';

/**
 * Where a ray outside the chip box [−a, a] × [−b, b] × [0, H] (in the encapsulant, z ≥ 0) enters it,
 * by the slab method: t_near = max of the entry distances, t_far = min of the exit distances; the box
 * is hit when t_near ≤ t_far and t_far > eps. The bottom face lies on the base plane and is never an
 * entry face (the base is met first).
 * Writes the distance (mm, ≥ 0) to hit[0] and returns the entry face, or SURFACE_NONE on a miss.
 * A ray leaving a face it stands on has t_far ≤ eps and so misses, which keeps a ray that just left
 * (or was just reflected off) the chip from hitting it again at t = 0.
 * @param ray [x, y, z, dx, dy, dz] in mm, unit direction (read only)
 * @param box [a, b, H, eps]: half width (x), half length (y), height, and the self-hit distance, mm
 * @see T. L. Kay, J. T. Kajiya, "Ray tracing complex scenes", SIGGRAPH '86 (slabs)
 */
export function boxEntry(ray: Float64Array, box: Float64Array, hit: Float64Array): number {
  const px = ray[0];
  const py = ray[1];
  const pz = ray[2];
  const dx = ray[3];
  const dy = ray[4];
  const dz = ray[5];
  const a = box[0];
  const b = box[1];
  const H = box[2];
  // Quick miss: outside a slab and not moving toward it (a ray that just left the chip, mostly)
  if ((px >= a && dx >= 0) || (px <= -a && dx <= 0)) return SURFACE_NONE;
  if ((py >= b && dy >= 0) || (py <= -b && dy <= 0)) return SURFACE_NONE;
  if (pz >= H && dz >= 0) return SURFACE_NONE;
  let tNear = -Infinity;
  let tFar = Infinity;
  let face = SURFACE_NONE;
  // x slab
  if (dx > 0) {
    tNear = (-a - px) / dx;
    tFar = (a - px) / dx;
    face = CHIP_X_NEG;
  } else if (dx < 0) {
    tNear = (a - px) / dx;
    tFar = (-a - px) / dx;
    face = CHIP_X_POS;
  } else if (!(px > -a && px < a)) {
    return SURFACE_NONE;
  }
  // y slab
  if (dy > 0) {
    const t1 = (-b - py) / dy;
    const t2 = (b - py) / dy;
    if (t1 > tNear) {
      tNear = t1;
      face = CHIP_Y_NEG;
    }
    if (t2 < tFar) tFar = t2;
  } else if (dy < 0) {
    const t1 = (b - py) / dy;
    const t2 = (-b - py) / dy;
    if (t1 > tNear) {
      tNear = t1;
      face = CHIP_Y_POS;
    }
    if (t2 < tFar) tFar = t2;
  } else if (!(py > -b && py < b)) {
    return SURFACE_NONE;
  }
  // z slab [0, H]: going down the ray enters through the top
  if (dz < 0) {
    const t1 = (H - pz) / dz;
    const t2 = -pz / dz;
    if (t1 > tNear) {
      tNear = t1;
      face = CHIP_TOP;
    }
    if (t2 < tFar) tFar = t2;
  } else if (dz > 0) {
    const t2 = (H - pz) / dz;
    if (t2 < tFar) tFar = t2;
  } else if (!(pz < H)) {
    return SURFACE_NONE;
  }
  if (!(tNear <= tFar && tFar > box[3])) return SURFACE_NONE;
  hit[0] = tNear > 0 ? tNear : 0;
  return face;
}
