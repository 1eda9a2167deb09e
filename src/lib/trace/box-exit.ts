import { SURFACE_NONE, CHIP_TOP, CHIP_X_POS, CHIP_X_NEG, CHIP_Y_POS, CHIP_Y_NEG, CHIP_BOTTOM } from './surfaces';

/**
 * Where a ray inside the chip box [−a, a] × [−b, b] × [0, H] leaves it: along each axis the wall ahead
 * is at t = D/|d| (D ≥ 0 the distance to that wall, |d| the direction component's size), and the
 * nearest wall is the exit (slab method). The walls are compared without dividing —
 * D1/|d1| < D2/|d2| ⇔ D1·|d2| < D2·|d1| — so only the winner costs a division (this is the tracer's
 * most frequent geometry call).
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
  // Nearest wall so far as the fraction D/|d|; 1/0 = "none yet", beaten by any wall ahead
  let D = 1;
  let speed = 0;
  let face = SURFACE_NONE;
  if (dx > 0) {
    D = box[0] - px;
    speed = dx;
    face = CHIP_X_POS;
  } else if (dx < 0) {
    D = box[0] + px;
    speed = -dx;
    face = CHIP_X_NEG;
  }
  if (dy > 0) {
    const Dy = box[1] - py;
    if (Dy * speed < D * dy) {
      D = Dy;
      speed = dy;
      face = CHIP_Y_POS;
    }
  } else if (dy < 0) {
    const Dy = box[1] + py;
    if (Dy * speed < -D * dy) {
      D = Dy;
      speed = -dy;
      face = CHIP_Y_NEG;
    }
  }
  if (dz > 0) {
    const Dz = box[2] - pz;
    if (Dz * speed < D * dz) {
      D = Dz;
      speed = dz;
      face = CHIP_TOP;
    }
  } else if (dz < 0) {
    if (pz * speed < -D * dz) {
      D = pz;
      speed = -dz;
      face = CHIP_BOTTOM;
    }
  }
  // t = D/|d| for the winning wall
  const t = D / speed;
  hit[0] = t > 0 ? t : 0;
  return face;
}
