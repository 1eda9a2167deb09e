/**
 * The page's main trace: the scenario's package and, for the gain, the bare chip on the same base.
 * Holds the last good result until a new run finishes, so a cancel or a failure never blanks the page.
 */
import type { Scenario } from '$lib/scenario/schema';
import { bareChip } from '$lib/sweeps/vary-package';
import type { TracePackage } from '$lib/trace/package-spec';
import type { TraceSummary } from '$lib/trace/summary';
import { bareRays } from './run-estimate';
import { isAbort, queuedTrace, workerCount } from './trace-queue';

export type RunStatus = 'idle' | 'running' | 'done' | 'cancelled' | 'error';

export interface DomeTraceResult {
  /** The scenario's link parameter when the run started: tells whether the result is current. */
  scenarioParam: string;
  scenario: Scenario;
  pkg: TracePackage;
  dome: TraceSummary;
  /** The bare chip on the same base; null when the package has no encapsulant (the trace is the bare chip). */
  bare: TraceSummary | null;
  /** Wall time of the package trace, seconds. */
  seconds: number;
  /** Rays per second of the package trace, over all workers. */
  raysPerSecond: number;
  workers: number;
  finishedAt: Date;
}

export class DomeTraceRun {
  status: RunStatus = $state('idle');
  /** Fraction done over both traces, [0, 1]. */
  progress = $state(0);
  /** What is being traced now. */
  phase: 'package' | 'bare chip' | null = $state(null);
  error: string | null = $state(null);
  /** The last finished result. */
  result: DomeTraceResult | null = $state.raw(null);
  /** Set once the user has started a run: from then on, scenario changes re-run it. */
  started = $state(false);
  /** The scenario link parameter of the latest run started (finished, running or cancelled). */
  startedParam: string | null = $state(null);

  #ctl: AbortController | null = null;

  /** Starts a run (cancelling one in flight). */
  async start(scenario: Scenario, scenarioParam: string, pkg: TracePackage): Promise<void> {
    this.#ctl?.abort();
    const ctl = new AbortController();
    this.#ctl = ctl;
    this.started = true;
    this.startedParam = scenarioParam;
    this.status = 'running';
    this.error = null;
    this.progress = 0;
    const { rays, seed } = scenario.trace;
    const hasEncapsulant = pkg.encapsulant.shape !== 'none';
    const nBare = hasEncapsulant ? bareRays(rays) : 0;
    const total = rays + nBare;
    try {
      this.phase = 'package';
      const dome = await queuedTrace(pkg, { rays, seed }, (f) => this.#report(ctl, (f * rays) / total), ctl.signal);
      let bare: TraceSummary | null = null;
      if (hasEncapsulant) {
        this.phase = 'bare chip';
        const b = await queuedTrace(bareChip(pkg), { rays: nBare, seed }, (f) => this.#report(ctl, (rays + f * nBare) / total), ctl.signal);
        bare = b.summary;
      }
      if (this.#ctl !== ctl) return;
      this.result = {
        scenarioParam,
        scenario,
        pkg,
        dome: dome.summary,
        bare,
        seconds: dome.seconds,
        raysPerSecond: dome.seconds > 0 ? rays / dome.seconds : Number.NaN,
        workers: workerCount(),
        finishedAt: new Date()
      };
      this.progress = 1;
      this.status = 'done';
    } catch (error) {
      if (this.#ctl !== ctl) return;
      if (isAbort(error)) {
        this.status = 'cancelled';
      } else {
        this.status = 'error';
        this.error = error instanceof Error ? error.message : String(error);
      }
    } finally {
      if (this.#ctl === ctl) {
        this.#ctl = null;
        this.phase = null;
      }
    }
  }

  /** Stops the run in flight; the last result stays. */
  cancel(): void {
    if (!this.#ctl) return;
    this.#ctl.abort();
  }

  #report(ctl: AbortController, fraction: number): void {
    if (this.#ctl === ctl) this.progress = Math.min(1, Math.max(0, fraction));
  }
}
