/**
 * What a metal base reflects, from its n + ik at the design wavelength: the reflectance at normal
 * incidence for light reaching it from the encapsulant (or the outside medium when there is none) and
 * from the chip, which sits on it. A fixed-reflectance base reflects what it says. Pure.
 *
 *   R = ((n − n₀)² + k²) / ((n + n₀)² + k²)   lossless medium n₀ against the metal N = n + ik
 *   (M. Born, E. Wolf, Principles of Optics, §14.2)
 */
import { normalReflectance } from '../optics/fresnel';
import type { ResolvedScenario } from './resolve';
import type { Scenario } from './schema';

export interface BaseReflectance {
  /** At normal incidence from the medium around the chip (encapsulant, or outside when bare). */
  fromSurround: number;
  /** Its name: "encapsulant" or "outside medium". */
  surround: string;
  /** At normal incidence from the chip. */
  fromChip: number;
}

/** Null for a fixed-reflectance base (its number is the input itself). */
export function baseReflectance(scenario: Scenario, resolved: ResolvedScenario): BaseReflectance | null {
  const b = resolved.base;
  if (b.kind !== 'metal') return null;
  const bare = scenario.encapsulant.shape === 'none';
  const n0 = bare ? resolved.outside.n : resolved.encapsulant.n;
  return {
    fromSurround: normalReflectance(n0, 0, b.n, b.k),
    surround: bare ? 'outside medium' : 'encapsulant',
    fromChip: normalReflectance(resolved.chip.n, 0, b.n, b.k)
  };
}
