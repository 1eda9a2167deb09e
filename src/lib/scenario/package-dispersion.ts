/**
 * The indices of a scenario's media over wavelength, for spectral rays (a white package): each library
 * or user material's real index every 5 nm over 360–830 nm inside its validity range (the design
 * wavelength added as a row of its own, so a line at it sees exactly the index the monochromatic trace
 * uses), the ends held beyond. A typed index has none (constant). Used by the tracer only when the rays
 * carry their wavelength.
 */
import { indexAt } from '../materials/index';
import type { IndexRows, TraceDispersion, TracePackage } from '../trace/package-spec';
import { LIMITS } from './limits';
import { resolveScenario, type ResolvedMedium, type ResolvedScenario } from './resolve';
import type { Scenario } from './schema';

const FROM_NM = 360;
const TO_NM = 830;
const STEP_NM = 5;

/** A medium's rows [nm, n], or null for a typed index (or a material whose range misses the visible). */
export function indexRowsOf(m: ResolvedMedium, designNm: number): IndexRows | null {
  if (!m.material) return null;
  const { min, max } = m.material.validRangeNm;
  const lo = Math.max(FROM_NM, min);
  const hi = Math.min(TO_NM, max);
  const wavelengths: number[] = [];
  for (let nm = Math.ceil(lo / STEP_NM) * STEP_NM; nm <= hi; nm += STEP_NM) wavelengths.push(nm);
  if (!wavelengths.includes(designNm)) wavelengths.push(designNm);
  wavelengths.sort((a, b) => a - b);
  const rows: IndexRows = [];
  for (const nm of wavelengths) {
    const n = nm === designNm ? m.n : indexAt(m.material, nm).n;
    if (n >= LIMITS.indexN.min && n <= LIMITS.indexN.max) rows.push([nm, n]);
  }
  return rows.length > 1 ? rows : null;
}

/** The scenario's dispersion: each chip layer (or the single chip), the encapsulant, the outside. */
export function scenarioDispersion(scenario: Scenario, resolved: ResolvedScenario = resolveScenario(scenario)): TraceDispersion {
  const nm = resolved.wavelengthNm;
  const layers = resolved.chipLayers.length ? resolved.chipLayers : [resolved.chip];
  return {
    chipLayers: layers.map((m) => indexRowsOf(m, nm)),
    encapsulant: indexRowsOf(resolved.encapsulant, nm),
    outside: indexRowsOf(resolved.outside, nm)
  };
}

/** The package with the scenario's dispersion (used once it holds a phosphor: spectral rays). */
export function withDispersion(pkg: TracePackage, scenario: Scenario, resolved: ResolvedScenario = resolveScenario(scenario)): TracePackage {
  return { ...pkg, dispersion: scenarioDispersion(scenario, resolved) };
}
