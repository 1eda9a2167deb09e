/**
 * Cosine-weighted (Lambertian) directions about a unit normal, for diffuse reflectors and textured
 * faces. Malley's method: a point uniform on the unit disc, r = √u1, φ = 2π u2, lifted to the
 * hemisphere, z = √(1 − r²), has density p(ω) = cos θ / π over solid angle; the mean of cos θ is 2/3.
 * The frame about n is the branchless orthonormal basis of Duff et al.
 * Sources: M. Pharr, W. Jakob, G. Humphreys, Physically Based Rendering, 3rd ed., §13.6.3 (Malley's
 * method); T. Duff et al., "Building an orthonormal basis, revisited", JCGT 6(1), 2017.
 */

/** Density of a Lambertian direction over solid angle, p = cos θ / π (1/sr), for cos θ ≥ 0. */
export function lambertianDensity(cosTheta: number): number {
  return cosTheta > 0 ? cosTheta / Math.PI : 0;
}

/**
 * Writes into `out` a cosine-weighted unit direction about the unit vector n (on n's side).
 * The numbers come in arrays so that nothing is boxed in the ray loop.
 * @param out receives the direction (may alias n)
 * @param n unit normal of the hemisphere
 * @param u [u1, u2], uniform numbers in [0, 1)
 */
export function lambertianDirection(out: Float64Array, n: Float64Array, u: Float64Array): Float64Array {
  const nx = n[0];
  const ny = n[1];
  const nz = n[2];
  // Point on the unit disc, lifted to the hemisphere
  const r = Math.sqrt(u[0]);
  const phi = 2 * Math.PI * u[1];
  const lx = r * Math.cos(phi);
  const ly = r * Math.sin(phi);
  const lz = Math.sqrt(Math.max(0, 1 - u[0]));
  // Orthonormal basis (t1, t2, n), Duff et al. 2017
  const sign = nz >= 0 ? 1 : -1;
  const a = -1 / (sign + nz);
  const b = nx * ny * a;
  const t1x = 1 + sign * nx * nx * a;
  const t1y = sign * b;
  const t1z = -sign * nx;
  const t2x = b;
  const t2y = sign + ny * ny * a;
  const t2z = -ny;
  out[0] = lx * t1x + ly * t2x + lz * nx;
  out[1] = lx * t1y + ly * t2y + lz * ny;
  out[2] = lx * t1z + ly * t2z + lz * nz;
  return out;
}
