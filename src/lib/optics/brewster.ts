import { requirePositive } from './guard';

/**
 * Brewster angle, where the p-polarised reflectance of a lossless interface vanishes:
 *   θB = atan(etaT / etaI)
 * Exists on both sides of an interface; from the denser side it lies below the critical angle.
 * @param etaI index on the incident side (> 0); @param etaT index on the far side (> 0)
 * @returns θB in radians, in (0, π/2)
 * @example brewsterAngle(1, 1.5) // ≈ 0.9828 (56.31°)
 * @see Born & Wolf, Principles of Optics, §1.5.3
 */
export function brewsterAngle(etaI: number, etaT: number): number {
  requirePositive('etaI', etaI);
  requirePositive('etaT', etaT);
  // tan θB = etaT / etaI
  return Math.atan2(etaT, etaI);
}
