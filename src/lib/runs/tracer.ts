/**
 * What every background trace goes through: a Tracer traces one package and reports progress. The
 * browser's is the worker pool behind the page-wide queue (browser-tracer.ts), the command line's the
 * Node thread pool (nodeTracer below takes one), tests use the synchronous tracer. Pure.
 */
import type { CompiledScene } from '../trace/compile-scene';
import type { TraceOptions, TracePackage } from '../trace/package-spec';
import type { Tally } from '../trace/tally';
import { summarize, type TraceSummary } from '../trace/summary';
import { throwIfAborted } from './abort';

export interface TraceOutcome {
  summary: TraceSummary;
  /** Wall time of the trace itself (not the wait in a queue), seconds; 0 for a cached result. */
  seconds: number;
  /** Worker threads it used (0 for a cached result). */
  workers: number;
  /** True when the result came from the cache instead of a run. */
  cached: boolean;
}

/** How a trace is asked for: rays and seed; signal and progress (fraction of this trace, [0, 1]). */
export interface TraceRequestOptions {
  rays: number;
  seed: number;
  signal?: AbortSignal;
  onProgress?: (fraction: number) => void;
}

/** Traces one package; rejects with an AbortError on cancel, a RangeError for an invalid package. */
export type Tracer = (pkg: TracePackage, options: TraceRequestOptions) => Promise<TraceOutcome>;

/** A tracer over any engine that turns (package, options, progress) into a tally, e.g. the Node pool's run. */
export function tallyTracer(
  engine: (pkg: TracePackage, options: TraceOptions, onProgress: (done: number, total: number) => void) => Promise<Tally>,
  workers: number
): Tracer {
  return async (pkg, { rays, seed, signal, onProgress }) => {
    throwIfAborted(signal);
    const t0 = performance.now();
    const tally = await engine(pkg, { rays, seed }, (done, total) => onProgress?.(total > 0 ? done / total : 1));
    throwIfAborted(signal);
    return { summary: summarize(tally), seconds: (performance.now() - t0) / 1000, workers, cached: false };
  };
}

/** Tallies of several compiled scenes traced on one chunk plan and seed (the beam page's optics). */
export interface SceneTraceOutcome {
  /** One tally per scene, in the order asked. */
  tallies: Tally[];
  /** Wall time of the trace itself (not the wait in a queue), seconds. */
  seconds: number;
  /** Worker threads it used (1 for a trace on the calling thread). */
  workers: number;
}

/**
 * Traces compiled scenes, `rays` each, seeded per chunk so any engine and worker count gives the same
 * tallies; progress over all scenes; rejects with an AbortError on cancel. The browser's runs on the
 * worker pool through the page-wide queue (browser-tracer.ts: queuedSceneTracer); tests and the
 * command line use syncSceneTracer (scene-tracer.ts).
 */
export type SceneTracer = (scenes: CompiledScene[], options: TraceRequestOptions) => Promise<SceneTraceOutcome>;
