/**
 * Background traces of the kept variants: each variant's package, then its bare chip on the same
 * base (variant-plan.ts), one job at a time on the browser worker pool.
 * Every call to the pool is in this file. Results are kept per scenario (a renamed variant is not
 * traced again); a removed variant's job is cancelled. Browser only (the pool starts Web Workers).
 */
import type { Scenario } from '$lib/scenario/schema';
import { encodeScenarioParam } from '$lib/scenario/url';
import type { TracePackage } from '$lib/trace/package-spec';
import { startTrace } from '$lib/trace/trace-pool';
import { summarize } from '$lib/trace/summary';
import type { Variant } from '$lib/variants/variants-doc';
import { variantPlan } from '$lib/variants/variant-plan';
import { variantTrace, type VariantResult, type VariantTrace } from '$lib/variants/variant-result';

export type VariantRunStatus = 'queued' | 'running' | 'done' | 'error';

export interface VariantRun {
  status: VariantRunStatus;
  /** Fraction done over both traces, [0, 1]. */
  progress: number;
  result: VariantResult | null;
  error: string | null;
}

/** The key a variant's run is kept under: its whole scenario. */
export function runKey(scenario: Scenario): string {
  return encodeScenarioParam(scenario);
}

interface Job {
  key: string;
  scenario: Scenario;
}

export class VariantRuns {
  /** Runs by scenario key. */
  runs: Record<string, VariantRun> = $state({});

  #queue: Job[] = [];
  #current: { key: string; cancel: () => void } | null = null;

  /** Queues every variant without a run, drops queued or running jobs of variants no longer kept. */
  sync(variants: readonly Variant[]): void {
    const wanted = new Set(variants.map((v) => runKey(v.scenario)));
    this.#queue = this.#queue.filter((j) => {
      if (!wanted.has(j.key)) delete this.runs[j.key];
      return wanted.has(j.key);
    });
    if (this.#current && !wanted.has(this.#current.key)) this.#current.cancel();
    for (const v of variants) {
      const key = runKey(v.scenario);
      if (this.runs[key]) continue;
      this.runs[key] = { status: 'queued', progress: 0, result: null, error: null };
      this.#queue.push({ key, scenario: v.scenario });
    }
    void this.#next();
  }

  /** The run of a variant's scenario, or null when none was started. */
  get(scenario: Scenario): VariantRun | null {
    return this.runs[runKey(scenario)] ?? null;
  }

  /** Stops everything (the page is left). Finished results stay. */
  stop(): void {
    for (const j of this.#queue) delete this.runs[j.key];
    this.#queue = [];
    this.#current?.cancel();
  }

  async #next(): Promise<void> {
    if (this.#current) return;
    const job = this.#queue.shift();
    if (!job) return;
    let cancelled = false;
    let cancelTrace: () => void = () => {};
    this.#current = {
      key: job.key,
      cancel: () => {
        cancelled = true;
        cancelTrace();
      }
    };
    const run = this.runs[job.key];
    run.status = 'running';
    try {
      const plan = variantPlan(job.scenario);
      const parts = plan.bare ? 2 : 1;
      const trace = (p: TracePackage, part: number): Promise<VariantTrace> => {
        const handle = startTrace(p, { rays: plan.rays, seed: plan.seed }, (done, total) => {
          run.progress = (part + (total > 0 ? done / total : 1)) / parts;
        });
        cancelTrace = handle.cancel;
        if (cancelled) handle.cancel();
        return handle.result.then((tally) => variantTrace(summarize(tally)));
      };
      const pack = await trace(plan.pkg, 0);
      const bare = plan.bare ? await trace(plan.bare, 1) : null;
      run.result = { seed: plan.seed, package: pack, bareChip: bare };
      run.progress = 1;
      run.status = 'done';
    } catch (error) {
      if (cancelled) {
        delete this.runs[job.key];
      } else {
        run.status = 'error';
        run.error = error instanceof Error ? error.message : String(error);
      }
    } finally {
      this.#current = null;
      void this.#next();
    }
  }
}

/** The page's one set of variant runs: finished results outlive a visit to another page. */
export const variantRuns = new VariantRuns();
