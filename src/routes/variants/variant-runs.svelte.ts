/**
 * Background traces of the kept variants, on the shared run model: each variant is one RunState whose
 * work is traceVariant through browserTracer — the page-wide trace queue, the worker pool and the
 * trace cache. So a variant whose package, rays and seed were traced before (on this page, on /dome,
 * before a reload) is answered from the cache, two variants with the same package share one run, and a
 * renamed variant is not traced again. Browser only.
 */
import { browserTracer } from '$lib/runs/browser-tracer';
import { RunState } from '$lib/runs/run-state.svelte';
import { traceKey } from '$lib/runs/trace-key';
import type { Scenario } from '$lib/scenario/schema';
import type { Variant } from '$lib/variants/variants-doc';
import { traceVariant, variantRequest } from '$lib/variants/trace-variant';
import type { VariantResult } from '$lib/variants/variant-result';

export type VariantRun = RunState<VariantResult>;

/** The key a variant's run is kept under: what it traces (package, rays, seed), not its name. */
export function runKey(scenario: Scenario): string {
  const { pkg, rays, seed } = variantRequest(scenario);
  return traceKey(pkg, rays, seed);
}

export class VariantRuns {
  /** Runs by key (runKey). */
  runs: Record<string, VariantRun> = $state({});

  /** Starts every kept variant without a run (or whose run was cancelled), cancels runs of variants no longer kept. */
  sync(variants: readonly Variant[]): void {
    const wanted = new Map(variants.map((v) => [runKey(v.scenario), v.scenario]));
    for (const [key, run] of Object.entries(this.runs)) {
      if (wanted.has(key)) continue;
      run.cancel();
      delete this.runs[key];
    }
    for (const [key, scenario] of wanted) {
      const run = (this.runs[key] ??= new RunState<VariantResult>());
      if (run.status !== 'idle' && run.status !== 'cancelled') continue;
      void run.start(key, (ctx) => traceVariant(browserTracer, scenario, { signal: ctx.signal, onProgress: ctx.progress }));
    }
  }

  /** The run of a variant's scenario, or null when none was started. */
  get(scenario: Scenario): VariantRun | null {
    return this.runs[runKey(scenario)] ?? null;
  }

  /** Cancels the runs in flight (the page is left); finished results stay, and the cache keeps them across reloads. */
  stop(): void {
    for (const run of Object.values(this.runs)) run.cancel();
  }
}

/** The page's one set of variant runs: finished results outlive a visit to another page. */
export const variantRuns = new VariantRuns();
