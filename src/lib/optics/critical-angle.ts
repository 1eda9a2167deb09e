import { requirePositive } from './guard';

/**
 * Critical angle for total internal reflection going from index nIn into nOut:
 *   θc = asin(nOut / nIn)   for nOut < nIn
 * @param nIn index on the incident (inner) side, > 0
 * @param nOut index on the far (outer) side, > 0
 * @returns θc in radians, in (0, π/2); null when nOut ≥ nIn (no total internal reflection)
 * @example criticalAngle(1.5, 1) // ≈ 0.7297 (41.81°)
 * @see Born & Wolf, Principles of Optics, §1.5.4
 */
export function criticalAngle(nIn: number, nOut: number): number | null {
  requirePositive('nIn', nIn);
  requirePositive('nOut', nOut);
  if (nOut >= nIn) return null;
  // sin θc = nOut / nIn
  return Math.asin(nOut / nIn);
}
