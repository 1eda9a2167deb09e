/**
 * A scenario's phosphor block as the mixture the tracer is given: the main phosphor (library, or the
 * user phosphor carried in the block) and, when set, the red phosphor mixed with it.
 */
import { findPhosphor } from '../phosphors/index';
import type { UserPhosphor } from '../phosphors/user-phosphor';
import type { Scenario } from '../scenario/schema';
import { libraryOptics, userOptics, type ParticleOptics } from './particle-optics';
import type { MixComponent } from './phosphor-mix';

/**
 * The optics of a phosphor by id: the user phosphor when given (its id must match), else the library's.
 * @throws RangeError naming the field for an id in neither
 */
export function phosphorOptics(id: string, user?: UserPhosphor, field = 'Phosphor'): ParticleOptics {
  if (user && user.id === id) return userOptics(user);
  const p = findPhosphor(id);
  if (!p) throw new RangeError(`${field}: unknown phosphor '${id.slice(0, 40)}'`);
  return libraryOptics(p);
}

/** The mixture of a scenario's phosphor block, or null for a clear encapsulant. @throws RangeError for an unknown id */
export function scenarioMixture(phosphor: Scenario['phosphor']): MixComponent[] | null {
  if (!phosphor) return null;
  const main: MixComponent = {
    optics: phosphorOptics(phosphor.id, phosphor.user),
    weightPercent: phosphor.weightPercent,
    diameterUm: phosphor.diameterUm,
    quantumYield: phosphor.quantumYield
  };
  const red = phosphor.red;
  if (!red) return [main];
  return [main, { optics: phosphorOptics(red.id, red.user, 'Red phosphor'), weightPercent: red.weightPercent, diameterUm: red.diameterUm, quantumYield: red.quantumYield }];
}
