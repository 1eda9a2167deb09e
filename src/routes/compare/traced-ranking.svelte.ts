/**
 * The compare page's traced ranking as a run of the run model: every candidate traced in the
 * background (cached, on the page-wide queue), restarted when the package, the candidates, the rays or
 * the seed change. Browser only.
 */
import { traceRanking, type EncapsulantRow, type TracedRow } from '$lib/decisions';
import { packageKey } from '$lib/runs';
import { browserTracer } from '$lib/runs/browser-tracer';
import { RunState } from '$lib/runs/run-state.svelte';
import type { TracePackage } from '$lib/trace/package-spec';

/** Names one traced ranking: the package, the candidates' indices, rays and seed. */
export function rankingKey(base: TracePackage, rows: readonly EncapsulantRow[], rays: number, seed: number): string {
  const who = rows.map((r) => `${r.id}:${r.nEnc}:${r.isCurrent ? 1 : 0}`).sort().join(',');
  return `${packageKey(base)}|${who}|${rays}|${seed}`;
}

/** Names the package and candidates only: a result with another rankingKey but this one is not stale. */
export function candidatesKey(base: TracePackage, rows: readonly EncapsulantRow[]): string {
  return rankingKey(base, rows, 0, 0).split('|').slice(0, 2).join('|');
}

export class TracedRankingRun extends RunState<TracedRow[]> {
  /** (Re)starts the traced ranking of `rows` in `base` with `rays` rays per candidate. */
  trace(base: TracePackage, rows: readonly EncapsulantRow[], rays: number, seed: number): Promise<void> {
    return this.start(rankingKey(base, rows, rays, seed), (ctx) =>
      traceRanking(browserTracer, base, rows, { rays, seed, signal: ctx.signal, onProgress: ctx.progress, onTraced: ctx.publish })
    );
  }
}
