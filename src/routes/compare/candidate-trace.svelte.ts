/**
 * Traces the top candidates of the ranking one after another on the worker pool, each with its own
 * seed (seed + i) so the runs are independent and their differences have σ² = σa² + σb². Keeps the last
 * finished set until a new one is complete, so a cancel never blanks the page. Browser only.
 */
import { withEncapsulant } from '$lib/sweeps/vary-package';
import type { TracePackage } from '$lib/trace/package-spec';
import { startTrace, type TraceJob } from '$lib/trace/trace-pool';
import { summarize, type TraceSummary } from '$lib/trace/summary';

export interface CandidateToTrace {
  id: string;
  name: string;
  nEnc: number;
  /** Closed-form η_dome of the ranking (one face). */
  closedEta: number;
}

export interface CandidateTraceResult extends CandidateToTrace {
  summary: TraceSummary;
  seed: number;
}

export type RunStatus = 'idle' | 'running' | 'done' | 'cancelled' | 'error';

export class CandidateTraceRun {
  status: RunStatus = $state('idle');
  /** Fraction of all rays done, [0, 1]. */
  progress = $state(0);
  /** Name of the candidate being traced. */
  tracing: string | null = $state(null);
  error: string | null = $state(null);
  results: CandidateTraceResult[] = $state.raw([]);
  /** Scenario link parameter the results were traced for. */
  forParam: string | null = $state(null);
  rays = $state(0);

  #job: TraceJob | null = null;
  #token = 0;

  async start(items: readonly CandidateToTrace[], base: TracePackage, rays: number, seed: number, param: string): Promise<void> {
    this.cancel();
    const token = ++this.#token;
    this.status = 'running';
    this.error = null;
    this.progress = 0;
    const done: CandidateTraceResult[] = [];
    try {
      for (let i = 0; i < items.length; i++) {
        const item = items[i];
        this.tracing = item.name;
        const pkg = withEncapsulant(base, { n: item.nEnc });
        const runSeed = (seed + i) % 4294967296;
        const job = startTrace(pkg, { rays, seed: runSeed }, (d, total) => {
          if (token === this.#token) this.progress = (i + (total > 0 ? d / total : 1)) / items.length;
        });
        this.#job = job;
        const tally = await job.result;
        if (token !== this.#token) return;
        done.push({ ...item, summary: summarize(tally), seed: runSeed });
      }
      this.results = done;
      this.forParam = param;
      this.rays = rays;
      this.progress = 1;
      this.status = 'done';
    } catch (error) {
      if (token !== this.#token) return;
      if (error instanceof Error && error.name === 'AbortError') this.status = 'cancelled';
      else {
        this.status = 'error';
        this.error = error instanceof Error ? error.message : String(error);
      }
    } finally {
      if (token === this.#token) {
        this.#job = null;
        this.tracing = null;
      }
    }
  }

  cancel(): void {
    if (this.#job) {
      this.#job.cancel();
      this.#job = null;
    }
  }
}
