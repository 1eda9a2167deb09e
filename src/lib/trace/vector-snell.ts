/**
 * New ray directions at an interface, in vector form. `m` is the unit surface normal on the far side
 * of the incident ray (d·m = cos θi > 0); `d` is the unit incident direction. Results go into out[0..2].
 * Both functions read all inputs as numbers first, so `out` may be the caller's direction buffer.
 */

/**
 * Specular reflection: d_r = d − 2 (d·m) m.
 * @param cosThetaI d·m, [0, 1]
 * @see M. Pharr, W. Jakob, G. Humphreys, Physically Based Rendering, 3rd ed., §8.2 (Reflect)
 */
export function reflectDirection(
  out: Float64Array,
  dx: number,
  dy: number,
  dz: number,
  mx: number,
  my: number,
  mz: number,
  cosThetaI: number
): Float64Array {
  // d_r = d − 2 cosθi m
  const c2 = 2 * cosThetaI;
  out[0] = dx - c2 * mx;
  out[1] = dy - c2 * my;
  out[2] = dz - c2 * mz;
  return out;
}

/**
 * Refraction by vector Snell's law: d_t = η d + (cos θt − η cos θi) m, η = etaI/etaT, renormalised
 * to unit length against roundoff drift over many events.
 * @param eta etaI / etaT (> 0)
 * @param cosThetaI d·m, [0, 1]; @param cosThetaT cosine of the refraction angle, [0, 1] (no TIR)
 * @see M. Pharr, W. Jakob, G. Humphreys, Physically Based Rendering, 3rd ed., §8.2 (Refract)
 */
export function refractDirection(
  out: Float64Array,
  dx: number,
  dy: number,
  dz: number,
  mx: number,
  my: number,
  mz: number,
  eta: number,
  cosThetaI: number,
  cosThetaT: number
): Float64Array {
  // d_t = η d + (cosθt − η cosθi) m
  const a = cosThetaT - eta * cosThetaI;
  const tx = eta * dx + a * mx;
  const ty = eta * dy + a * my;
  const tz = eta * dz + a * mz;
  const inv = 1 / Math.sqrt(tx * tx + ty * ty + tz * tz);
  out[0] = tx * inv;
  out[1] = ty * inv;
  out[2] = tz * inv;
  return out;
}
