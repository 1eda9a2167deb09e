/**
 * The collimation condition as an ODE: the surface that turns a one-parameter family of meridional rays into
 * rays parallel to the axis (+z), by reflection or by refraction.
 *
 * Ray θ starts at P(θ) with unit direction d(θ) (both in the (r, z) plane); the surface point on it is
 * W(θ) = P + s(θ) d. The surface normal must be parallel to m = nIn·d − nOut·ẑ (vector Snell's law; a mirror is
 * nIn = nOut: the normal bisects −d and ẑ). The surface's tangent dW/dθ is then perpendicular to m:
 *   (P′ + s′ d + s d′)·m = 0, and with d·d′ = 0 (|d| = 1):
 *   s′ = (nOut · s · d′_z − P′·m) / (nIn − nOut · d_z)
 * — the differential form of the Cartesian-oval construction (R. K. Luneburg, Mathematical Theory of Optics,
 * 1964, §II; the same edge-ray tangent condition as in R. Winston, J. C. Miñano, P. Benítez, Nonimaging
 * Optics, 2005, ch. 4, from memory). Closed-form cases: P = 0, d = (sin θ, cos θ), a mirror gives the
 * parabola s = 2f/(1 − cos θ); refraction into index n gives the hyperbola s = (n − 1)v/(n cos θ − 1).
 *
 * Integrated with the classical fourth-order Runge–Kutta method (Press et al., Numerical Recipes, 3rd ed.,
 * §17.1) on a uniform θ grid; the step is halved until the step-doubling error estimate |s_h − s_{h/2}|/15
 * (Richardson, same §17.2) and the chord error of the sampled surface are both below the tolerance.
 */

/**
 * The ray family: writes, for parameter θ, [Pr, Pz, P′r, P′z, dr, dz, d′r, d′z] into out (mm, mm/rad, unit, 1/rad).
 */
export type RayFamily = (theta: number, out: Float64Array) => void;

/** How the surface turns the rays to +z. */
export interface CollimationLaw {
  /** 'mirror' (reflection; the indices are ignored) or 'refract'. */
  kind: 'mirror' | 'refract';
  /** Index on the rays' side (refraction only). */
  nIn?: number;
  /** Index beyond the surface, where the rays go parallel to the axis (refraction only). */
  nOut?: number;
}

/** A surface found by integrating the collimation condition. */
export interface CollimatingSurface {
  /** θ of each sample, rad. */
  theta: Float64Array;
  /** s of each sample: distance from P(θ) along d(θ), mm. */
  s: Float64Array;
  /** Surface points, mm. */
  r: Float64Array;
  z: Float64Array;
  /** Number of RK4 steps used. */
  steps: number;
  /** Step-doubling estimate of the largest error in s, mm. */
  odeErrorMm: number;
  /** Largest distance of the half-step points from the chords of the returned polyline, mm. */
  chordErrorMm: number;
}

/** Right-hand side s′(θ, s) of the collimation ODE. `buf` is the family's scratch. */
function slope(family: RayFamily, nIn: number, nOut: number, theta: number, s: number, buf: Float64Array): number {
  family(theta, buf);
  const mr = nIn * buf[4];
  const mz = nIn * buf[5] - nOut;
  return (nOut * s * buf[7] - (buf[2] * mr + buf[3] * mz)) / (nIn - nOut * buf[5]);
}

function integrate(
  family: RayFamily,
  nIn: number,
  nOut: number,
  theta0: number,
  theta1: number,
  s0: number,
  steps: number,
  buf: Float64Array
): Float64Array {
  const s = new Float64Array(steps + 1);
  const h = (theta1 - theta0) / steps;
  s[0] = s0;
  for (let i = 0; i < steps; i++) {
    const t = theta0 + i * h;
    const y = s[i];
    // Classical RK4 step (Numerical Recipes §17.1, eq. 17.1.3)
    const k1 = slope(family, nIn, nOut, t, y, buf);
    const k2 = slope(family, nIn, nOut, t + h / 2, y + (h / 2) * k1, buf);
    const k3 = slope(family, nIn, nOut, t + h / 2, y + (h / 2) * k2, buf);
    const k4 = slope(family, nIn, nOut, t + h, y + h * k3, buf);
    s[i + 1] = y + (h / 6) * (k1 + 2 * k2 + 2 * k3 + k4);
  }
  return s;
}

/**
 * Integrates the collimating surface from θ0 (where s = s0) to θ1 (either direction).
 * @param toleranceMm bound for both the ODE error in s and the chord error, mm (> 0)
 * @param minSteps first step count (doubled until the tolerance holds, at most 2^16 steps)
 * @throws RangeError when s turns non-finite or ≤ 0 (the family cannot be collimated from this start) or the
 *   tolerance is not reached within 2^16 steps
 */
export function integrateCollimatingSurface(
  family: RayFamily,
  law: CollimationLaw,
  theta0: number,
  theta1: number,
  s0: number,
  toleranceMm: number,
  minSteps = 16
): CollimatingSurface {
  const nIn = law.kind === 'mirror' ? 1 : (law.nIn ?? 1);
  const nOut = law.kind === 'mirror' ? 1 : (law.nOut ?? 1);
  const buf = new Float64Array(8);
  let steps = minSteps;
  let coarse = integrate(family, nIn, nOut, theta0, theta1, s0, steps, buf);
  for (;;) {
    const fine = integrate(family, nIn, nOut, theta0, theta1, s0, 2 * steps, buf);
    let odeError = 0;
    for (let i = 0; i <= steps; i++) odeError = Math.max(odeError, Math.abs(fine[2 * i] - coarse[i]) / 15);
    for (let i = 0; i <= 2 * steps; i++) {
      if (!Number.isFinite(fine[i]) || fine[i] <= 0) {
        throw new RangeError('the collimating surface runs through its own rays: no surface for this design');
      }
    }
    // Chord error: the fine run's odd points are the midpoints of the coarse run's intervals
    const h = (theta1 - theta0) / (2 * steps);
    let chordErrorMm = 0;
    const pts = new Float64Array(2 * (2 * steps + 1));
    for (let i = 0; i <= 2 * steps; i++) {
      family(theta0 + i * h, buf);
      pts[2 * i] = buf[0] + fine[i] * buf[4];
      pts[2 * i + 1] = buf[1] + fine[i] * buf[5];
    }
    for (let i = 0; i < steps; i++) {
      const ra = pts[4 * i];
      const za = pts[4 * i + 1];
      const dr = pts[4 * i + 4] - ra;
      const dz = pts[4 * i + 5] - za;
      const len = Math.hypot(dr, dz);
      const dev = Math.abs((pts[4 * i + 2] - ra) * dz - (pts[4 * i + 3] - za) * dr) / len;
      chordErrorMm = Math.max(chordErrorMm, dev);
    }
    if (odeError <= toleranceMm && chordErrorMm <= toleranceMm) {
      const theta = new Float64Array(steps + 1);
      const r = new Float64Array(steps + 1);
      const z = new Float64Array(steps + 1);
      for (let i = 0; i <= steps; i++) {
        theta[i] = theta0 + 2 * i * h;
        r[i] = pts[4 * i];
        z[i] = pts[4 * i + 1];
      }
      return { theta, s: coarse, r, z, steps, odeErrorMm: odeError, chordErrorMm };
    }
    if (steps >= 1 << 16) throw new RangeError(`the collimating surface did not reach the ${toleranceMm} mm tolerance`);
    steps *= 2;
    coarse = fine;
  }
}
