/**
 * Candidates ranked by the Monte Carlo trace of the whole package: each candidate's index put into the
 * scenario's encapsulant, traced with the scenario's rays, ordered by traced extraction. Neighbours
 * whose difference is within TRACE_SEPARATION_K standard errors of the difference are flagged as not
 * separable. Each candidate has its own seed (the current one the scenario's, so its trace is the one
 * the dome page shows), so runs are independent and σ_d = √(σ_a² + σ_b²) (common practice).
 * The closed-form figures stay on each row as a reference. Pure: the tracer is handed in.
 */
import type { TracePackage } from '../trace/package-spec';
import type { TraceSummary } from '../trace/summary';
import { throwIfAborted } from '../runs/abort';
import { fnv1a64 } from '../runs/trace-key';
import { traceGain } from '../runs/trace-gain';
import type { Tracer } from '../runs/tracer';
import type { EncapsulantRow } from './rank-encapsulants';
import { traceAgreement } from './trace-agreement';

/** Neighbours closer than this many standard errors of their difference are not separable. */
export const TRACE_SEPARATION_K = 2;

export interface TracedRow {
  /** Rank by the trace, 1 = highest traced extraction. */
  rank: number;
  /** The candidate's closed-form row (its `rank` is the closed-form rank). */
  row: EncapsulantRow;
  seed: number;
  summary: TraceSummary;
  /** Traced extraction over the current encapsulant's traced extraction, ± σ (null when the current one is not traced or gave no light). */
  overCurrent: { gain: number; stderr: number } | null;
  /** False when this row and the next are within TRACE_SEPARATION_K σ of each other; null for the last row. */
  separableFromNext: boolean | null;
}

/**
 * The seed of a candidate's trace: the scenario's for the current encapsulant, else the scenario's
 * offset by a hash of the candidate's id (so it does not depend on the order of the list).
 */
export function candidateSeed(seed: number, id: string, isCurrent: boolean): number {
  if (isCurrent) return seed;
  return (seed + Number.parseInt(fnv1a64(id).slice(0, 8), 16)) % 4294967296;
}

/**
 * The package a candidate is traced in: the scenario's, with the candidate's index. A scenario without
 * encapsulant gets a hemispherical dome of its radius (the shape the closed form assumes).
 */
export function candidatePackage(base: TracePackage, nEnc: number): TracePackage {
  const enc = base.encapsulant;
  const filled = enc.shape === 'none' ? { ...enc, shape: 'dome' as const, heightMm: enc.radiusMm } : enc;
  return { ...base, chip: { ...base.chip }, base: { ...base.base }, encapsulant: { ...filled, n: nEnc } };
}

/** Orders traced candidates by extraction (highest first), with the ratio to the current one and separability. */
export function rankByTrace(traced: readonly { row: EncapsulantRow; seed: number; summary: TraceSummary }[]): TracedRow[] {
  const sorted = [...traced].sort((a, b) => b.summary.extraction - a.summary.extraction);
  const current = traced.find((t) => t.row.isCurrent) ?? null;
  const pairs = traceAgreement(
    sorted.map((t) => ({ id: t.row.id, name: t.row.name, extraction: t.summary.extraction, stderr: t.summary.stderr })),
    TRACE_SEPARATION_K
  ).pairs;
  return sorted.map((t, i) => ({
    rank: i + 1,
    row: t.row,
    seed: t.seed,
    summary: t.summary,
    overCurrent: !current
      ? null
      : t === current
        ? { gain: 1, stderr: 0 }
        : traceGain(t.summary.extraction, t.summary.stderr, current.summary.extraction, current.summary.stderr),
    separableFromNext: i < pairs.length ? pairs[i].resolved : null
  }));
}

/**
 * Traces every candidate one after another with `tracer` and ranks them by the trace.
 * @param onTraced called after each candidate with the ranking of those traced so far
 * @param onProgress fraction of all candidates' rays done, [0, 1]
 */
export async function traceRanking(
  tracer: Tracer,
  base: TracePackage,
  rows: readonly EncapsulantRow[],
  options: {
    rays: number;
    seed: number;
    signal?: AbortSignal;
    onProgress?: (fraction: number) => void;
    onTraced?: (ranking: TracedRow[]) => void;
  }
): Promise<TracedRow[]> {
  const { rays, seed, signal, onProgress, onTraced } = options;
  const traced: { row: EncapsulantRow; seed: number; summary: TraceSummary }[] = [];
  // The current candidate first: its trace is usually cached from the dome page, and every ratio needs it.
  const order = [...rows].sort((a, b) => Number(b.isCurrent) - Number(a.isCurrent));
  for (let i = 0; i < order.length; i++) {
    throwIfAborted(signal);
    const row = order[i];
    const s = candidateSeed(seed, row.id, row.isCurrent);
    const out = await tracer(candidatePackage(base, row.nEnc), {
      rays,
      seed: s,
      signal,
      onProgress: (f) => onProgress?.((i + f) / order.length)
    });
    traced.push({ row, seed: s, summary: out.summary });
    onTraced?.(rankByTrace(traced));
  }
  onProgress?.(1);
  return rankByTrace(traced);
}
