/**
 * The headline figures of one variant: the traced package extraction ± σ, the bare chip on the same
 * base and the gain, the closed-form ideal one-face reference and the one-face escape into the
 * outside medium, the indices, the far-field shape and the loss ledger. Pure: the closed-form numbers
 * come from the scenario, the traced ones from the variant's result (null while it is being traced).
 */
import { domeClosedForm } from '../sweeps/dome-closed-form';
import { resolveScenario, toTracePackage } from '../scenario/resolve';
import type { Scenario } from '../scenario/schema';
import { traceGain } from '../runs/trace-gain';
import type { VariantResult, VariantTrace } from './variant-result';

/** A traced figure and its standard error. */
export interface Estimate {
  value: number;
  /** Standard error (≥ 0). */
  sigma: number;
}

export interface VariantFigures {
  name: string;
  wavelengthNm: number;
  nChip: number;
  nEnc: number;
  nOut: number;
  encapsulantLabel: string;
  shape: Scenario['encapsulant']['shape'];
  radiusMm: number;
  /** Closed form, or null with `closedFormError` when the optics core refuses the indices or sizes. */
  closedForm: { idealOneFace: number; escapeOneFaceOutside: number; gain: number; minRadiusNoTirMm: number } | null;
  closedFormError: string | null;
  /** Traced figures (null until the trace has finished). */
  traced: {
    rays: number;
    extraction: Estimate;
    bare: Estimate | null;
    gain: Estimate | null;
    trace: VariantTrace;
  } | null;
}

function estimate(t: VariantTrace): Estimate {
  return { value: t.extraction, sigma: t.stderr };
}

/** a / b ± σ of two traced estimates by the one rule every page uses (traceGain); null when b is not > 0. */
export function ratioOf(a: Estimate, b: Estimate): Estimate | null {
  const r = traceGain(a.value, a.sigma, b.value, b.sigma);
  return r && { value: r.gain, sigma: r.stderr };
}

/** Figures of a variant (`result` null: closed form only). Never throws. */
export function variantFigures(name: string, scenario: Scenario, result: VariantResult | null): VariantFigures {
  const resolved = resolveScenario(scenario);
  const pkg = toTracePackage(scenario, resolved);
  let closedForm: VariantFigures['closedForm'] = null;
  let closedFormError: string | null = null;
  try {
    const c = domeClosedForm(pkg);
    closedForm = { idealOneFace: c.etaDome, escapeOneFaceOutside: c.etaBare, gain: c.gain, minRadiusNoTirMm: c.minRadiusNoTirMm };
  } catch (e) {
    closedFormError = e instanceof Error ? e.message : String(e);
  }
  let traced: VariantFigures['traced'] = null;
  if (result) {
    const pack = estimate(result.package);
    // With no encapsulant the package is the bare chip: gain 1 by definition, no second trace.
    const bare = result.bareChip ? estimate(result.bareChip) : scenario.encapsulant.shape === 'none' ? pack : null;
    traced = {
      rays: result.package.rays,
      extraction: pack,
      bare,
      gain: result.bareChip && bare ? ratioOf(pack, bare) : bare ? { value: 1, sigma: 0 } : null,
      trace: result.package
    };
  }
  return {
    name,
    wavelengthNm: resolved.wavelengthNm,
    nChip: resolved.chip.n,
    nEnc: resolved.encapsulant.n,
    nOut: resolved.outside.n,
    encapsulantLabel: scenario.encapsulant.shape === 'none' ? 'none' : resolved.encapsulant.label,
    shape: scenario.encapsulant.shape,
    radiusMm: scenario.encapsulant.radiusMm,
    closedForm,
    closedFormError,
    traced
  };
}
