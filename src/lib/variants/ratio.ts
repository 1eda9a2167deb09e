/** A ratio of two Monte Carlo estimates with its standard error. Pure. */

export interface Estimate {
  value: number;
  /** Standard error (≥ 0). */
  sigma: number;
}

/**
 * q = a / b with σ_q = |q| · √((σ_a/a)² + (σ_b/b)²) — first-order propagation of independent errors
 * (J. R. Taylor, An Introduction to Error Analysis, 2nd ed., 1997, §3.8). Two traces run with the
 * same seed are positively correlated, so for them this σ errs on the large side.
 * Returns null when b is not > 0 or a is not finite (no ratio can be formed).
 */
export function ratioWithSigma(a: Estimate, b: Estimate): Estimate | null {
  if (!(b.value > 0) || !Number.isFinite(a.value) || !Number.isFinite(a.sigma) || !Number.isFinite(b.sigma)) return null;
  const q = a.value / b.value;
  const relA = a.value !== 0 ? a.sigma / Math.abs(a.value) : 0;
  const relB = b.sigma / b.value;
  return { value: q, sigma: Math.abs(q) * Math.hypot(relA, relB) };
}
