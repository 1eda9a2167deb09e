import { cSqrtInto } from './complex';

/**
 * Normal component of the propagation factor in a medium of complex index N = n + ik:
 *   N cos θ = √(N² − β²),   β = N0 sin θ0 = (betaRe + i·betaIm), conserved across planar interfaces.
 * Branch: the wave must decay away from the interface, Im(N cos θ) > 0; when Im is zero within roundoff
 * (lossless medium, propagating wave) the forward-going root Re(N cos θ) ≥ 0 is taken. Beyond the critical
 * angle of a lossless medium the result is purely imaginary (evanescent wave).
 * Writes out[i] = Re, out[i + 1] = Im. Allocates nothing; trusts its inputs (inner function).
 * @see Born & Wolf, Principles of Optics, §1.5.4 (evanescent wave) and §14.2 (absorbing media)
 */
export function propagationFactorInto(
  out: Float64Array,
  i: number,
  n: number,
  k: number,
  betaRe: number,
  betaIm: number
): Float64Array {
  // N² − β²
  const wRe = n * n - k * k - (betaRe * betaRe - betaIm * betaIm);
  const wIm = 2 * n * k - 2 * betaRe * betaIm;
  cSqrtInto(out, i, wRe, wIm);
  const re = out[i];
  const im = out[i + 1];
  const tiny = 1e-14 * (Math.abs(re) + Math.abs(im));
  const flip = Math.abs(im) > tiny ? im < 0 : re < 0;
  if (flip) {
    out[i] = -re;
    out[i + 1] = -im;
  }
  return out;
}
