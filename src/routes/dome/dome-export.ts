/** The dome page's results as a JSON document, with the scenario they were computed in. Pure. */
import { exportJsonReplacer } from '$lib/export/number-text';
import type { DomeClosedForm } from '$lib/sweeps/dome-closed-form';
import type { SweepPointResult } from '$lib/sweeps/run-sweep';
import type { SweepPlan } from '$lib/sweeps/sweep-plan';
import type { Scenario } from '$lib/scenario/schema';
import type { TraceSummary } from '$lib/trace/summary';

export interface DomeExportTrace {
  scenario: Scenario;
  dome: TraceSummary;
  bare: TraceSummary | null;
  gain: { gain: number; stderr: number } | null;
  seconds: number;
  raysPerSecond: number;
  workers: number;
  /** True when the trace was run for an earlier version of the scenario. */
  stale: boolean;
}

export interface DomeExportSweep {
  plan: SweepPlan;
  results: SweepPointResult[];
  raysPerPoint: number;
}

function traceDoc(s: TraceSummary) {
  return {
    rays: s.rays,
    extraction: s.extraction,
    stderr: s.stderr,
    ledger: s.ledger,
    counts: s.counts,
    perSurface: s.perSurface,
    escapedBelowHorizon: s.escapedBelowHorizon,
    eventsPerRay: s.eventsPerRay,
    geometryErrors: s.geometryErrors,
    farField: {
      beamAngleDeg: s.farField.beamAngleDeg,
      onAxisVsLambertian: s.farField.onAxisVsLambertian,
      bins: s.farField.bins
    }
  };
}

/** JSON text of the page: closed form, trace (if any), sweeps traced for the current scenario, and the scenario. */
export function domeExport(
  scenario: Scenario,
  wavelengthNm: number,
  indices: { nChip: number; nEnc: number; nOut: number },
  closed: DomeClosedForm,
  trace: DomeExportTrace | null,
  sweeps: DomeExportSweep[]
): string {
  const doc = {
    app: 'Outcouple',
    view: 'dome',
    formatVersion: 1,
    wavelengthNm,
    indices,
    closedForm: {
      etaBare: closed.etaBare,
      etaDome: closed.etaDome,
      gain: closed.gain,
      minRadiusNoTirMm: closed.minRadiusNoTirMm,
      halfDiagonalMm: closed.halfDiagonalMm,
      noTir: closed.noTir,
      assumptions: 'Point-like chip at the centre of a hemispherical dome; top face only; single pass; no absorption.'
    },
    trace: trace
      ? {
          stale: trace.stale,
          tracedScenario: trace.stale ? trace.scenario : undefined,
          package: traceDoc(trace.dome),
          bareChip: trace.bare ? traceDoc(trace.bare) : null,
          gain: trace.gain,
          seconds: trace.seconds,
          raysPerSecond: trace.raysPerSecond,
          workers: trace.workers,
          notes: 'Fractions of launched rays; stderr is the binomial standard error; far-field intensities over I0 = Φ/π.'
        }
      : null,
    sweeps: sweeps.map((s) => ({
      kind: s.plan.kind,
      title: s.plan.title,
      x: s.plan.xTitle,
      raysPerPoint: s.raysPerPoint,
      marker: s.plan.marker,
      skipped: s.plan.skipped,
      points: s.plan.points.map((p) => {
        const r = s.results.find((q) => q.x === p.x);
        return { x: p.x, closedForm: p.closedForm, extraction: r?.extraction ?? null, stderr: r?.stderr ?? null };
      })
    })),
    scenario
  };
  return JSON.stringify(doc, exportJsonReplacer, 2) + '\n';
}
