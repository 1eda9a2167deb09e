/**
 * Distance from a point inside the spheroid x²/R² + y²/R² + z²/h² = 1 to its surface along a unit
 * direction. Scaling z by R/h maps the spheroid to a sphere of radius R: with q = (x, y, zR/h) and
 * v = (dx, dy, dz·R/h), solve |q + t v|² = R², i.e. A t² + 2B t + C = 0 with A = v·v, B = q·v,
 * C = q·q − R², and take the far root t = (−B + √(B² − AC))/A, written as −C/(B + √(B² − AC)) when
 * B > 0 to avoid cancellation.
 * Writes t (mm, ≥ 0) to hit[0]. A point a hair outside (roundoff, B² < AC) gives the tangent distance
 * clamped at 0, never NaN.
 * @param ray [x, y, z, dx, dy, dz] in mm, unit direction (read only)
 * @param shell [R, h]: equatorial radius and polar semi-axis (the dome's height), mm
 * @see W. H. Press et al., Numerical Recipes, 3rd ed., §5.6 (stable quadratic roots)
 */
export function spheroidExit(ray: Float64Array, shell: Float64Array, hit: Float64Array): void {
  const px = ray[0];
  const py = ray[1];
  const dx = ray[3];
  const dy = ray[4];
  const R = shell[0];
  const s = R / shell[1];
  const qz = ray[2] * s;
  const vz = ray[5] * s;
  const A = dx * dx + dy * dy + vz * vz;
  const B = px * dx + py * dy + qz * vz;
  const C = px * px + py * py + qz * qz - R * R;
  let D = B * B - A * C;
  if (D < 0) D = 0;
  const sq = Math.sqrt(D);
  // Far root of A t² + 2B t + C = 0, cancellation-free form
  const t = B > 0 ? -C / (B + sq) : (sq - B) / A;
  hit[0] = t > 0 ? t : 0;
}
