/**
 * The Henyey–Greenstein phase function: density of the scattering-angle cosine μ,
 * p(μ) = ½(1 − g²)/(1 + g² − 2gμ)^(3/2) on [−1, 1], mean cosine g; and its inverse-CDF sampler
 * μ = (1 + g² − ((1 − g²)/(1 − g + 2gu))²)/(2g) (μ = 2u − 1 when g = 0).
 * Pure and allocation-free: the caller passes u from the tracer's seeded generator.
 * @see L. G. Henyey, J. L. Greenstein, "Diffuse radiation in the Galaxy", Astrophys. J. 93, 70–83 (1941);
 *   inversion as in L. Wang, S. L. Jacques, L. Zheng, "MCML", Comput. Methods Programs Biomed. 47, 131 (1995)
 */

/** |g| below this is sampled as isotropic (the closed form divides by g). */
const G_ISOTROPIC = 1e-6;

/**
 * Samples the cosine of the scattering angle.
 * @param g asymmetry, in (−1, 1); @param u uniform number in [0, 1)
 * @returns μ in [−1, 1]
 */
export function sampleHenyeyGreenstein(g: number, u: number): number {
  if (Math.abs(g) < G_ISOTROPIC) return 2 * u - 1;
  const f = (1 - g * g) / (1 - g + 2 * g * u);
  const mu = (1 + g * g - f * f) / (2 * g);
  return mu < -1 ? -1 : mu > 1 ? 1 : mu;
}

/**
 * Density of μ = cos θ under Henyey–Greenstein: ½(1 − g²)/(1 + g² − 2gμ)^(3/2), integrating to 1 over [−1, 1].
 * @param g asymmetry, in (−1, 1); @param mu cosine, in [−1, 1]
 */
export function henyeyGreensteinDensity(g: number, mu: number): number {
  return (0.5 * (1 - g * g)) / (1 + g * g - 2 * g * mu) ** 1.5;
}
