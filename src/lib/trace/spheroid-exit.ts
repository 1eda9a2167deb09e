/**
 * Distance from a point inside the spheroid x²/R² + y²/R² + z²/h² = 1 to its surface along a unit
 * direction. Scaling z by R/h maps the spheroid to a sphere of radius R: with q = (x, y, zR/h) and
 * v = (dx, dy, dz·R/h), solve |q + t v|² = R², i.e. A t² + 2B t + C = 0 with A = v·v, B = q·v,
 * C = q·q − R², and take the far root t = (−B + √(B² − AC))/A, written as −C/(B + √(B² − AC)) when
 * B > 0 to avoid cancellation.
 * Returns t in mm (≥ 0). A point a hair outside (roundoff, B² < AC) gives the tangent distance
 * clamped at 0, never NaN.
 * @param R equatorial radius, mm (> 0); @param h polar semi-axis (height of the dome), mm (> 0)
 * @see W. H. Press et al., Numerical Recipes, 3rd ed., §5.6 (stable quadratic roots)
 */
export function spheroidExit(
  px: number,
  py: number,
  pz: number,
  dx: number,
  dy: number,
  dz: number,
  R: number,
  h: number
): number {
  const s = R / h;
  const qz = pz * s;
  const vz = dz * s;
  const A = dx * dx + dy * dy + vz * vz;
  const B = px * dx + py * dy + qz * vz;
  const C = px * px + py * py + qz * qz - R * R;
  let D = B * B - A * C;
  if (D < 0) D = 0;
  const sq = Math.sqrt(D);
  // Far root of A t² + 2B t + C = 0, cancellation-free form
  const t = B > 0 ? -C / (B + sq) : (sq - B) / A;
  return t > 0 ? t : 0;
}
