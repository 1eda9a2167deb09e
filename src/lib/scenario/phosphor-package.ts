/**
 * A scenario's optional phosphor block (version 4) as the tracer's phosphor, and the package with it:
 * the library (or carried user) phosphor by particles (Mie) at the scenario's load, size and quantum
 * yield, with the red phosphor mixed in when the block has one, drawn from the scenario's chip emission.
 */
import { chipSpectrumRows, withPhosphor, type PhosphorPlacement, type PhosphorSetting } from '../trace/white-light';
import type { TracePackage } from '../trace/package-spec';
import { withDispersion } from './package-dispersion';
import { withMixture } from '../white/phosphor-mix';
import { scenarioMixture } from '../white/scenario-mixture';
import { resolveScenario, toTracePackage, type ResolvedScenario } from './resolve';
import type { Scenario } from './schema';

/** The scenario phosphor block's placement: its region and, for a layer, its thickness. */
export function phosphorPlacementOf(phosphor: NonNullable<Scenario['phosphor']>): PhosphorPlacement {
  return { region: phosphor.region, ...(phosphor.thicknessMm !== undefined ? { thicknessMm: phosphor.thicknessMm } : {}) };
}

/**
 * The traced package with the scenario's phosphor block (main phosphor, user phosphor, red mixed in, in
 * its region), or with `setting` instead when one is given (the command line's phosphor options), or the
 * clear package; with a phosphor, its media's dispersion too (each ray sees the indices at its own wavelength).
 */
export function toWhitePackage(scenario: Scenario, resolved: ResolvedScenario = resolveScenario(scenario), setting?: PhosphorSetting | null): TracePackage {
  const pkg = toTracePackage(scenario, resolved);
  const chip = chipSpectrumRows(scenario.emission);
  if (setting) return withPhosphor(withDispersion(pkg, scenario, resolved), setting, chip);
  const mix = setting === null ? null : scenarioMixture(scenario.phosphor);
  return mix && scenario.phosphor ? withMixture(withDispersion(pkg, scenario, resolved), mix, chip, phosphorPlacementOf(scenario.phosphor)) : pkg;
}
