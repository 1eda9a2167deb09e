import { SURFACE_NONE, CHIP_TOP, CHIP_X_POS, CHIP_X_NEG, CHIP_Y_POS, CHIP_Y_NEG, CHIP_BOTTOM } from './surfaces';

/**
 * Where a ray inside the chip box [−a, a] × [−b, b] × [0, H] leaves it: for each axis the wall ahead
 * of the ray is at t = (wall − p)/d; the nearest of the three is the exit (slab method).
 * Writes the distance (mm, ≥ 0) to hit[0] and returns the face (a constant from surfaces.ts), or
 * SURFACE_NONE for a zero direction. A point a hair outside (roundoff) gives t = 0, never t < 0.
 * @param ray [x, y, z, dx, dy, dz] in mm, unit direction (read only)
 * @param box [a, b, H, …]: half width along x, half length along y, height, mm
 * @see T. L. Kay, J. T. Kajiya, "Ray tracing complex scenes", SIGGRAPH '86 (slabs)
 */
export function boxExit(ray: Float64Array, box: Float64Array, hit: Float64Array): number {
  const px = ray[0];
  const py = ray[1];
  const pz = ray[2];
  const dx = ray[3];
  const dy = ray[4];
  const dz = ray[5];
  const a = box[0];
  const b = box[1];
  let t = Infinity;
  let face = SURFACE_NONE;
  // t = (wall − p)/d along each axis, for the wall ahead
  if (dx > 0) {
    t = (a - px) / dx;
    face = CHIP_X_POS;
  } else if (dx < 0) {
    t = (-a - px) / dx;
    face = CHIP_X_NEG;
  }
  if (dy > 0) {
    const ty = (b - py) / dy;
    if (ty < t) {
      t = ty;
      face = CHIP_Y_POS;
    }
  } else if (dy < 0) {
    const ty = (-b - py) / dy;
    if (ty < t) {
      t = ty;
      face = CHIP_Y_NEG;
    }
  }
  if (dz > 0) {
    const tz = (box[2] - pz) / dz;
    if (tz < t) {
      t = tz;
      face = CHIP_TOP;
    }
  } else if (dz < 0) {
    const tz = -pz / dz;
    if (tz < t) {
      t = tz;
      face = CHIP_BOTTOM;
    }
  }
  hit[0] = t > 0 ? t : 0;
  return face;
}
