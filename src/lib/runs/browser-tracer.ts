/**
 * Browser glue of the run model (uses the worker pool and localStorage: browser only). Every trace a
 * page starts goes through one page-wide RunQueue onto the worker pool, so runs never share the cores;
 * `browserTracer` also answers from, and fills, the trace cache kept across reloads.
 */
import { startSceneTrace, startTrace } from '../trace/trace-pool';
import { summarize } from '../trace/summary';
import { RunQueue } from './run-queue';
import { cachedTracer, TraceCache, type TextStore } from './trace-cache';
import type { SceneTracer, Tracer } from './tracer';

/** The one line of background traces in this tab. */
export const traceQueue = new RunQueue();

/** Traces on the worker pool when the jobs queued before are done; no cache (sweeps, one-off runs). */
export const queuedTracer: Tracer = (pkg, { rays, seed, signal, onProgress }) =>
  traceQueue.run(
    (signal) =>
      new Promise((resolve, reject) => {
        const t0 = performance.now();
        const job = startTrace(pkg, { rays, seed }, (done, total) => onProgress?.(total > 0 ? done / total : 1));
        const onAbort = () => job.cancel();
        signal.addEventListener('abort', onAbort, { once: true });
        job.result.then(
          (tally) => {
            signal.removeEventListener('abort', onAbort);
            resolve({ summary: summarize(tally), seconds: (performance.now() - t0) / 1000, workers: job.workers, cached: false });
          },
          (error: unknown) => {
            signal.removeEventListener('abort', onAbort);
            reject(error);
          }
        );
      }),
    signal ?? new AbortController().signal
  );

/** Traces compiled scenes on the worker pool when the jobs queued before are done (the beam page's optics). */
export const queuedSceneTracer: SceneTracer = (scenes, { rays, seed, signal, onProgress }) =>
  traceQueue.run(
    (signal) =>
      new Promise((resolve, reject) => {
        const t0 = performance.now();
        const job = startSceneTrace(scenes, { rays, seed }, (done, total) => onProgress?.(total > 0 ? done / total : 1));
        const onAbort = () => job.cancel();
        signal.addEventListener('abort', onAbort, { once: true });
        job.result.then(
          (tallies) => {
            signal.removeEventListener('abort', onAbort);
            resolve({ tallies, seconds: (performance.now() - t0) / 1000, workers: job.workers });
          },
          (error: unknown) => {
            signal.removeEventListener('abort', onAbort);
            reject(error);
          }
        );
      }),
    signal ?? new AbortController().signal
  );

function localStore(): TextStore | null {
  try {
    return typeof localStorage === 'undefined' ? null : localStorage;
  } catch {
    return null; // storage refused (privacy settings): memory only
  }
}

let cache: TraceCache | null = null;

/** The tab's trace cache (created on first use, over localStorage when the browser allows it). */
export function traceCache(): TraceCache {
  cache ??= new TraceCache(localStore());
  return cache;
}

/** The tracer pages lead with: cached results first, else a queued run on the worker pool. */
export const browserTracer: Tracer = (pkg, options) => cachedTracer(queuedTracer, traceCache())(pkg, options);
