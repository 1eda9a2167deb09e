/**
 * A scenario's optional phosphor block (version 4) as the tracer's phosphor, and the package with it:
 * the library (or carried user) phosphor by particles (Mie) at the scenario's load, size and quantum
 * yield, with the red phosphor mixed in when the block has one, drawn from the scenario's chip emission.
 */
import { chipSpectrumRows, withPhosphor, type PhosphorSetting } from '../trace/white-light';
import type { TracePackage } from '../trace/package-spec';
import { withMixture } from '../white/phosphor-mix';
import { scenarioMixture } from '../white/scenario-mixture';
import { resolveScenario, toTracePackage, type ResolvedScenario } from './resolve';
import type { Scenario } from './schema';

/**
 * The traced package with the scenario's phosphor block (main phosphor, user phosphor, red mixed in), or
 * with `setting` instead when one is given (the command line's phosphor options), or the clear package.
 */
export function toWhitePackage(scenario: Scenario, resolved: ResolvedScenario = resolveScenario(scenario), setting?: PhosphorSetting | null): TracePackage {
  const pkg = toTracePackage(scenario, resolved);
  const chip = chipSpectrumRows(scenario.emission);
  if (setting) return withPhosphor(pkg, setting, chip);
  const mix = setting === null ? null : scenarioMixture(scenario.phosphor);
  return mix ? withMixture(pkg, mix, chip) : pkg;
}
