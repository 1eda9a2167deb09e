/**
 * One sweep as work for the run model: traces the plan's points one after another on the page's queue
 * (no cache: sweep points would crowd the package results out of it), publishing the points so far.
 */
import type { RunContext } from '$lib/runs';
import { queuedTracer } from '$lib/runs/browser-tracer';
import { runSweep, type SweepPointResult } from '$lib/sweeps/run-sweep';
import type { SweepPlan } from '$lib/sweeps/sweep-plan';

export interface SweepProgress {
  results: SweepPointResult[];
  raysPerPoint: number;
}

/** Traces every point of `plan` with `rays` rays from `seed`; resolves with every point traced. */
export async function sweepWork(plan: SweepPlan, rays: number, seed: number, ctx: RunContext<SweepProgress>): Promise<SweepProgress> {
  ctx.publish({ results: [], raysPerPoint: rays });
  const run = await runSweep(
    plan,
    (pkg, o, onProgress) =>
      queuedTracer(pkg, { ...o, signal: ctx.signal, onProgress }).then((r) => ({ extraction: r.summary.extraction, stderr: r.summary.stderr })),
    {
      rays,
      seed,
      signal: ctx.signal,
      onProgress: ctx.progress,
      onPoint: (results) => ctx.publish({ results, raysPerPoint: rays })
    }
  );
  return { results: run.results, raysPerPoint: rays };
}
