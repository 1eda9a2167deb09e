import { CYLINDER_SIDE, CYLINDER_TOP, SURFACE_NONE } from './surfaces';

/**
 * Where a ray inside the cylinder x² + y² ≤ R², 0 ≤ z ≤ h leaves it through the wall or the flat top
 * (the base plane z = 0 is handled by the caller). Wall: far root of A t² + 2B t + C = 0 with
 * A = dx² + dy², B = x dx + y dy, C = x² + y² − R²; top: t = (h − z)/dz for dz > 0.
 * Writes the distance (mm, ≥ 0) to hit[0] and returns CYLINDER_SIDE or CYLINDER_TOP, or SURFACE_NONE
 * (hit[0] = ∞) when the ray moves straight down or not at all.
 * @param ray [x, y, z, dx, dy, dz] in mm, unit direction (read only)
 * @param shell [R, h]: radius and height, mm
 * @see W. H. Press et al., Numerical Recipes, 3rd ed., §5.6 (stable quadratic roots)
 */
export function cylinderExit(ray: Float64Array, shell: Float64Array, hit: Float64Array): number {
  const px = ray[0];
  const py = ray[1];
  const dx = ray[3];
  const dy = ray[4];
  const dz = ray[5];
  let t = Infinity;
  let face = SURFACE_NONE;
  // Wall: far root, cancellation-free form
  const A = dx * dx + dy * dy;
  if (A > 0) {
    const R = shell[0];
    const B = px * dx + py * dy;
    const C = px * px + py * py - R * R;
    let D = B * B - A * C;
    if (D < 0) D = 0;
    const sq = Math.sqrt(D);
    t = B > 0 ? -C / (B + sq) : (sq - B) / A;
    face = CYLINDER_SIDE;
  }
  // Flat top
  if (dz > 0) {
    const tTop = (shell[1] - ray[2]) / dz;
    if (tTop < t) {
      t = tTop;
      face = CYLINDER_TOP;
    }
  }
  hit[0] = t > 0 ? t : 0;
  return face;
}
