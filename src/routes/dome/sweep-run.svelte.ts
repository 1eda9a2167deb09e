/**
 * One sweep's run on the page: traces the plan's points one after another through the page's job
 * queue, with progress, cancel, and the results so far (kept with the scenario they belong to).
 */
import { runSweep, type SweepPointResult } from '$lib/sweeps/run-sweep';
import type { SweepPlan } from '$lib/sweeps/sweep-plan';
import type { RunStatus } from './dome-trace.svelte';
import { isAbort, queuedTrace } from './trace-queue';

export class SweepRunState {
  status: RunStatus = $state('idle');
  progress = $state(0);
  error: string | null = $state(null);
  /** Results so far, and the scenario link parameter and rays per point they were traced with. */
  results: SweepPointResult[] = $state.raw([]);
  forParam: string | null = $state(null);
  raysPerPoint = $state(0);

  #ctl: AbortController | null = null;

  /** Traces every point of `plan` (cancelling a sweep of this kind in flight). */
  async start(plan: SweepPlan, scenarioParam: string, rays: number, seed: number): Promise<void> {
    this.#ctl?.abort();
    const ctl = new AbortController();
    this.#ctl = ctl;
    this.status = 'running';
    this.error = null;
    this.progress = 0;
    this.results = [];
    this.forParam = scenarioParam;
    this.raysPerPoint = rays;
    const tracer = (pkg: SweepPlan['points'][number]['pkg'], o: { rays: number; seed: number }, onProgress: (f: number) => void) =>
      queuedTrace(pkg, o, onProgress, ctl.signal).then((r) => ({ extraction: r.summary.extraction, stderr: r.summary.stderr }));
    try {
      const run = await runSweep(plan, tracer, {
        rays,
        seed,
        signal: ctl.signal,
        onProgress: (f) => {
          if (this.#ctl === ctl) this.progress = f;
        },
        onPoint: (results) => {
          if (this.#ctl === ctl) this.results = results;
        }
      });
      if (this.#ctl !== ctl) return;
      this.status = run.cancelled ? 'cancelled' : 'done';
    } catch (error) {
      if (this.#ctl !== ctl) return;
      if (isAbort(error)) this.status = 'cancelled';
      else {
        this.status = 'error';
        this.error = error instanceof Error ? error.message : String(error);
      }
    } finally {
      if (this.#ctl === ctl) this.#ctl = null;
    }
  }

  cancel(): void {
    this.#ctl?.abort();
  }
}
