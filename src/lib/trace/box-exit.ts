/** Faces of a box medium, in the order of its M_BOX_FACES slots. */
export const FACE_X_POS = 0;
export const FACE_X_NEG = 1;
export const FACE_Y_POS = 2;
export const FACE_Y_NEG = 3;
export const FACE_Z_POS = 4;
export const FACE_Z_NEG = 5;

/**
 * Where a ray inside the box [−a, a] × [−b, b] × [z0, z1] leaves it: along each axis the wall ahead
 * is at t = D/|d| (D ≥ 0 the distance to that wall, |d| the direction component's size), and the
 * nearest wall is the exit (slab method). The walls are compared without dividing —
 * D1/|d1| < D2/|d2| ⇔ D1·|d2| < D2·|d1| — so only the winner costs a division (this is the tracer's
 * most frequent geometry call).
 * Writes the distance (mm, ≥ 0) to hit[0] and returns the face (FACE_*), or −1 for a zero
 * direction. A point a hair outside (roundoff) gives t = 0, never t < 0.
 * @param ray [x, y, z, dx, dy, dz] in mm, unit direction (read only)
 * @param box the box's [a, b, z0, z1] (mm) from offset o: a medium record's M_BOX_A slots, or the
 *   tracer's own table of box media
 * @see T. L. Kay, J. T. Kajiya, "Ray tracing complex scenes", SIGGRAPH '86 (slabs)
 */
export function boxExit(ray: Float64Array, box: Float64Array, o: number, hit: Float64Array): number {
  const px = ray[0];
  const py = ray[1];
  const pz = ray[2];
  const dx = ray[3];
  const dy = ray[4];
  const dz = ray[5];
  // Nearest wall so far as the fraction D/|d|; 1/0 = "none yet", beaten by any wall ahead
  let D = 1;
  let speed = 0;
  let face = -1;
  if (dx > 0) {
    D = box[o] - px;
    speed = dx;
    face = FACE_X_POS;
  } else if (dx < 0) {
    D = box[o] + px;
    speed = -dx;
    face = FACE_X_NEG;
  }
  if (dy > 0) {
    const Dy = box[o + 1] - py;
    if (Dy * speed < D * dy) {
      D = Dy;
      speed = dy;
      face = FACE_Y_POS;
    }
  } else if (dy < 0) {
    const Dy = box[o + 1] + py;
    if (Dy * speed < -D * dy) {
      D = Dy;
      speed = -dy;
      face = FACE_Y_NEG;
    }
  }
  if (dz > 0) {
    const Dz = box[o + 3] - pz;
    if (Dz * speed < D * dz) {
      D = Dz;
      speed = dz;
      face = FACE_Z_POS;
    }
  } else if (dz < 0) {
    const Dz = pz - box[o + 2];
    if (Dz * speed < -D * dz) {
      D = Dz;
      speed = -dz;
      face = FACE_Z_NEG;
    }
  }
  // t = D/|d| for the winning wall
  const t = D / speed;
  hit[0] = t > 0 ? t : 0;
  return face;
}
