import { CYLINDER_SIDE, CYLINDER_TOP, SURFACE_NONE } from './surfaces';

/**
 * Where a ray inside the cylinder x² + y² ≤ R², 0 ≤ z ≤ h leaves it through the wall or the flat top
 * (the base plane z = 0 is handled by the caller). Wall: far root of A t² + 2B t + C = 0 with
 * A = dx² + dy², B = x dx + y dy, C = x² + y² − R²; top: t = (h − z)/dz for dz > 0.
 * Writes the distance (mm, ≥ 0) to hit[0] and returns CYLINDER_SIDE or CYLINDER_TOP, or SURFACE_NONE
 * when the ray heads straight down the axis direction (dz ≤ 0 and no horizontal motion).
 * @param R radius, mm (> 0); @param h height, mm (> 0)
 * @see W. H. Press et al., Numerical Recipes, 3rd ed., §5.6 (stable quadratic roots)
 */
export function cylinderExit(
  px: number,
  py: number,
  pz: number,
  dx: number,
  dy: number,
  dz: number,
  R: number,
  h: number,
  hit: Float64Array
): number {
  let t = Infinity;
  let face = SURFACE_NONE;
  // Wall: far root, cancellation-free form
  const A = dx * dx + dy * dy;
  if (A > 0) {
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
    const tTop = (h - pz) / dz;
    if (tTop < t) {
      t = tTop;
      face = CYLINDER_TOP;
    }
  }
  hit[0] = t > 0 ? t : 0;
  return face;
}
