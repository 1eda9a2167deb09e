/**
 * What a variant traces, on the page and the command line alike: its package and, when it has an
 * encapsulant, the bare chip on the same base (for the gain), VARIANT_RAYS rays each with the
 * scenario's seed — so both give the same numbers (the tracer's chunk seeding makes a run
 * independent of the thread count). Pure.
 */
import { resolveScenario, toTracePackage } from '../scenario/resolve';
import type { Scenario } from '../scenario/schema';
import { bareChip } from '../sweeps/vary-package';
import type { TracePackage } from '../trace/package-spec';
import { VARIANT_RAYS } from './variant-result';

export interface VariantPlan {
  pkg: TracePackage;
  /** null when the package has no encapsulant (it is the bare chip). */
  bare: TracePackage | null;
  rays: number;
  seed: number;
}

export function variantPlan(scenario: Scenario, rays = VARIANT_RAYS): VariantPlan {
  const pkg = toTracePackage(scenario, resolveScenario(scenario));
  return { pkg, bare: pkg.encapsulant.shape === 'none' ? null : bareChip(pkg), rays, seed: scenario.trace.seed };
}
