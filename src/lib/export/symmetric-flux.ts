/**
 * Luminous flux of a rotationally symmetric intensity distribution I(θ), given at polar angles θ
 * (degrees from the axis, type C vertical angles: 0° straight along the axis).
 *
 *   Φ = 2π ∫ I(θ) sin θ dθ   (flux through the sphere for I independent of azimuth)
 *
 * I is taken as linear in θ between the given angles, and each piece is integrated exactly:
 *   ∫_{θa}^{θb} (Ia + m(θ − θa)) sin θ dθ = Ia (cos θa − cos θb) + m (sin θb − sin θa − h cos θb),
 *   m = (Ib − Ia)/h, h = θb − θa.
 * Outside the given angles the intensity is zero (as an LM-63 file that stops at 90° means).
 * Source: the definition of luminous intensity, I = dΦ/dΩ (CIE S 017, International Lighting
 * Vocabulary), with dΩ = 2π sin θ dθ for a symmetric distribution — the zonal-lumen sum of common
 * practice; the piecewise-linear closed form is elementary calculus.
 */

/**
 * Φ = 2π ∫ I(θ) sin θ dθ for piecewise-linear I(θ).
 * @param thetaDeg polar angles, degrees, strictly increasing, each in [0, 180]; at least 2
 * @param intensity I at those angles (cd, or any unit: Φ is then in that unit × sr), finite, ≥ 0
 * @returns the flux (lm when I is in cd); 0 for an all-zero distribution
 * @example symmetricFlux([0, 90], [1, 0]) // = 2π(1 − 2/π) ≈ 2.283 (linear ramp, not cos θ)
 */
export function symmetricFlux(thetaDeg: ArrayLike<number>, intensity: ArrayLike<number>): number {
  checkDistribution(thetaDeg, intensity);
  const toRad = Math.PI / 180;
  let sum = 0;
  let thetaA = thetaDeg[0] * toRad;
  let cosA = Math.cos(thetaA);
  let sinA = Math.sin(thetaA);
  for (let i = 1; i < thetaDeg.length; i++) {
    const thetaB = thetaDeg[i] * toRad;
    const cosB = Math.cos(thetaB);
    const sinB = Math.sin(thetaB);
    const h = thetaB - thetaA;
    const iA = intensity[i - 1];
    const m = (intensity[i] - iA) / h;
    // Exact integral of the linear piece times sin θ
    sum += iA * (cosA - cosB) + m * (sinB - sinA - h * cosB);
    thetaA = thetaB;
    cosA = cosB;
    sinA = sinB;
  }
  // Φ = 2π ∫ I sin θ dθ; a tiny negative from roundoff on a near-zero tail is clamped
  return Math.max(0, 2 * Math.PI * sum);
}

/** Throws a RangeError naming the field unless the angles and intensities make a distribution. */
export function checkDistribution(thetaDeg: ArrayLike<number>, intensity: ArrayLike<number>): void {
  if (!thetaDeg || typeof thetaDeg.length !== 'number' || thetaDeg.length < 2) {
    throw new RangeError('thetaDeg must list at least 2 angles in [0, 180] degrees');
  }
  if (!intensity || intensity.length !== thetaDeg.length) {
    throw new RangeError(`intensity must have one value per angle (${thetaDeg.length})`);
  }
  for (let i = 0; i < thetaDeg.length; i++) {
    const t = thetaDeg[i];
    if (typeof t !== 'number' || !(t >= 0 && t <= 180)) {
      throw new RangeError(`thetaDeg[${i}] must be a number in [0, 180] degrees (got ${String(t)})`);
    }
    if (i > 0 && !(t > thetaDeg[i - 1])) {
      throw new RangeError(`thetaDeg must increase strictly (thetaDeg[${i}] = ${t} does not)`);
    }
    const v = intensity[i];
    if (typeof v !== 'number' || !(v >= 0 && v < Infinity)) {
      throw new RangeError(`intensity[${i}] must be a finite number ≥ 0 (got ${String(v)})`);
    }
  }
}
