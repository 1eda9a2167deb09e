/**
 * A scenario's optional phosphor block (version 4) as the tracer's phosphor setting, and the package
 * with it: the library phosphor by particles (Mie) at the scenario's load, size and quantum yield,
 * drawn from the scenario's chip emission.
 */
import { chipSpectrumRows, libraryPhosphor, withPhosphor, type PhosphorSetting } from '../trace/white-light';
import type { TracePackage } from '../trace/package-spec';
import { withDispersion } from './package-dispersion';
import { resolveScenario, toTracePackage, type ResolvedScenario } from './resolve';
import type { Scenario } from './schema';

/** The scenario's phosphor setting, or null for a clear encapsulant. @throws RangeError for an unknown phosphor id */
export function phosphorSettingOf(scenario: Scenario): Extract<PhosphorSetting, { kind: 'particles' }> | null {
  const p = scenario.phosphor;
  if (!p) return null;
  return {
    kind: 'particles', phosphor: libraryPhosphor(p.id, 'Phosphor'), weightPercent: p.weightPercent, diameterUm: p.diameterUm, quantumYield: p.quantumYield,
    region: p.region, ...(p.thicknessMm !== undefined ? { thicknessMm: p.thicknessMm } : {})
  };
}

/**
 * The traced package with the scenario's phosphor (or `setting` instead) and its media's dispersion
 * (each ray sees the indices at its own wavelength), or the clear package when there is none.
 */
export function toWhitePackage(scenario: Scenario, resolved: ResolvedScenario = resolveScenario(scenario), setting: PhosphorSetting | null = phosphorSettingOf(scenario)): TracePackage {
  const pkg = toTracePackage(scenario, resolved);
  return setting ? withPhosphor(withDispersion(pkg, scenario, resolved), setting, chipSpectrumRows(scenario.emission)) : pkg;
}
