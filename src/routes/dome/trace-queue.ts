/**
 * The page's one line of trace jobs: each job waits for the one before it, then runs on the worker
 * pool, so the main trace and the sweeps never fight over the cores and each job's speed is its own.
 * Browser only (the pool starts Web Workers).
 */
import { startTrace } from '$lib/trace/trace-pool';
import type { TracePackage } from '$lib/trace/package-spec';
import { summarize, type TraceSummary } from '$lib/trace/summary';

export interface QueuedTraceResult {
  summary: TraceSummary;
  /** Wall time of the trace itself (not the wait in the queue), seconds. */
  seconds: number;
}

/** Settles when the last queued job has finished (it never rejects). */
let tail: Promise<void> = Promise.resolve();

/** The error a cancelled job rejects with (name 'AbortError', like the pool's). */
export function abortError(): Error {
  return Object.assign(new Error('trace cancelled'), { name: 'AbortError' });
}

/** True for the rejection of a cancelled job. */
export function isAbort(error: unknown): boolean {
  return error instanceof Error && error.name === 'AbortError';
}

/**
 * Traces `pkg` when the jobs queued before it are done. The signal cancels it while waiting (it then
 * never starts) or while running (the pool stops its workers). Rejects with an AbortError on cancel,
 * with the pool's error on a worker failure, or with the RangeError of an invalid package.
 * @param onProgress fraction of this job's rays done, [0, 1]
 */
export function queuedTrace(
  pkg: TracePackage,
  options: { rays: number; seed: number },
  onProgress: (fraction: number) => void,
  signal: AbortSignal
): Promise<QueuedTraceResult> {
  return new Promise<QueuedTraceResult>((resolve, reject) => {
    let started = false;
    // Cancelled while waiting in line: give up at once (the job will not start when its turn comes).
    const onAbortWaiting = () => {
      if (!started) reject(abortError());
    };
    signal.addEventListener('abort', onAbortWaiting, { once: true });
    tail = tail.then(
      () =>
        new Promise<void>((next) => {
          started = true;
          signal.removeEventListener('abort', onAbortWaiting);
          if (signal.aborted) {
            reject(abortError());
            return next();
          }
          const t0 = performance.now();
          let handle: ReturnType<typeof startTrace>;
          try {
            handle = startTrace(pkg, options, (done, total) => onProgress(total > 0 ? done / total : 1));
          } catch (error) {
            reject(error);
            return next();
          }
          const onAbort = () => handle.cancel();
          signal.addEventListener('abort', onAbort, { once: true });
          handle.result.then(
            (tally) => {
              signal.removeEventListener('abort', onAbort);
              resolve({ summary: summarize(tally), seconds: (performance.now() - t0) / 1000 });
              next();
            },
            (error: unknown) => {
              signal.removeEventListener('abort', onAbort);
              reject(error);
              next();
            }
          );
        })
    );
  });
}

/** Worker threads a trace uses in this browser (the pool's rule: cores, at most 8). */
export function workerCount(): number {
  const cores = typeof navigator !== 'undefined' && navigator.hardwareConcurrency > 0 ? navigator.hardwareConcurrency : 2;
  return Math.min(cores, 8);
}
