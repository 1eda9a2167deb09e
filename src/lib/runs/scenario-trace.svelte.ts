/**
 * The scenario's own trace — package, bare-chip companion and gain — as the pages lead with it (/dome
 * and /report share it through the cache: the second page to open finds the first one's result).
 * Browser only (worker pool, localStorage).
 */
import type { Scenario } from '../scenario/schema';
import type { TracePackage } from '../trace/package-spec';
import { browserTracer } from './browser-tracer';
import { tracePackage, type PackageTrace } from './package-trace';
import { RunState } from './run-state.svelte';
import { traceKey } from './trace-key';

/** A package trace with the scenario it was started for (its name and settings, for exports). */
export interface ScenarioTrace extends PackageTrace {
  scenario: Scenario;
}

/** Default pause after a change before the trace restarts, so typing a number does not start a run per key. */
export const RESTART_DELAY_MS = 250;

export class ScenarioTraceRun extends RunState<ScenarioTrace> {
  /** (Re)starts the trace of `pkg` (built from `scenario`) with the scenario's rays and seed. */
  trace(scenario: Scenario, pkg: TracePackage): Promise<void> {
    const { rays, seed } = scenario.trace;
    return this.start(traceKey(pkg, rays, seed), async (ctx) => ({
      ...(await tracePackage(browserTracer, pkg, { rays, seed, signal: ctx.signal, onProgress: ctx.progress })),
      scenario
    }));
  }

  /** True when the latest run started (finished, running or cancelled) is for exactly this package, rays and seed. */
  startedFor(scenario: Scenario, pkg: TracePackage): boolean {
    return this.startedKey === traceKey(pkg, scenario.trace.rays, scenario.trace.seed);
  }
}
