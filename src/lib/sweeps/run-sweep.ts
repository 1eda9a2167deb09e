import type { TracePackage } from '../trace/package-spec';
import type { SweepPlan } from './sweep-plan';

/** What a sweep needs from one trace: the extraction and its standard error. */
export interface SweepTraceResult {
  extraction: number;
  stderr: number;
}

/**
 * Traces one package. In the browser this is the worker pool; in Node, the synchronous tracer.
 * `onProgress` receives the fraction of this trace's rays done, [0, 1].
 */
export type SweepTracer = (
  pkg: TracePackage,
  options: { rays: number; seed: number },
  onProgress: (fraction: number) => void
) => Promise<SweepTraceResult>;

/** One traced point of a sweep. */
export interface SweepPointResult {
  x: number;
  closedForm: number;
  extraction: number;
  stderr: number;
}

export interface SweepRunOptions {
  /** Rays per point, integer ≥ 1. */
  rays: number;
  /** Seed used at every point (common random numbers: neighbouring points share their noise). */
  seed: number;
  /** Stops the sweep before the next point; the trace in flight is the tracer's to cancel. */
  signal?: AbortSignal;
  /** Whole-sweep progress, [0, 1]: (points done + fraction of the current one) / points. */
  onProgress?: (fraction: number) => void;
  /** Called after each point with every result so far (for drawing the curve as it grows). */
  onPoint?: (results: SweepPointResult[]) => void;
}

export interface SweepRun {
  plan: SweepPlan;
  results: SweepPointResult[];
  /** True when the signal stopped the sweep; `results` then holds the points finished before. */
  cancelled: boolean;
}

/**
 * Traces the plan's points one after another (each trace may itself use every worker). A rejected
 * trace after the signal has fired counts as a cancel; any other rejection is passed on.
 */
export async function runSweep(plan: SweepPlan, trace: SweepTracer, options: SweepRunOptions): Promise<SweepRun> {
  const { rays, seed, signal, onProgress, onPoint } = options;
  if (!Number.isInteger(rays) || rays < 1) throw new RangeError(`rays must be an integer ≥ 1 (got ${String(rays)})`);
  const n = plan.points.length;
  const results: SweepPointResult[] = [];
  for (let i = 0; i < n; i++) {
    if (signal?.aborted) return { plan, results, cancelled: true };
    const point = plan.points[i];
    let r: SweepTraceResult;
    try {
      r = await trace(point.pkg, { rays, seed }, (f) => onProgress?.((i + Math.min(1, Math.max(0, f))) / n));
    } catch (error) {
      if (signal?.aborted) return { plan, results, cancelled: true };
      throw error;
    }
    if (signal?.aborted) return { plan, results, cancelled: true };
    results.push({ x: point.x, closedForm: point.closedForm, extraction: r.extraction, stderr: r.stderr });
    onProgress?.((i + 1) / n);
    onPoint?.(results.slice());
  }
  return { plan, results, cancelled: false };
}
