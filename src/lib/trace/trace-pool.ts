/**
 * Browser-side client of the trace workers (uses Worker and navigator: browser only). Splits the run's
 * chunks into one contiguous range per worker (navigator.hardwareConcurrency, at most 8), merges the
 * tallies — identical to traceSync for any worker count — and reports progress about 20 times a second.
 * cancel() terminates the workers at once and rejects with an AbortError; a failing worker rejects
 * with a message naming the failure, and the partial result is discarded. A worker that dies silently
 * (no error event, no message for STALL_MS) is treated as a failure too, so a run never hangs.
 */
import { chunkPlan } from './chunk-plan';
import { DEFAULT_MAX_EVENTS, validateTraceOptions, validateTracePackage, type TraceOptions, type TracePackage } from './package-spec';
import { createTally, mergeTally, type Tally } from './tally';
import type { TraceReply, TraceRequest } from './trace-messages';

export interface TraceJob {
  /** Resolves with the merged tally; rejects on cancel (name 'AbortError') or on a worker failure. */
  result: Promise<Tally>;
  /** Stops every worker now. */
  cancel(): void;
  /** Workers this job runs on (the pool's rule: cores, at most 8, at most one per chunk). */
  workers: number;
}

const MAX_WORKERS = 8;
const PROGRESS_MS = 50;
/** Silence after which a running trace counts as failed; a chunk of 16 384 rays takes well under a second. */
const STALL_MS = 30_000;

/**
 * Starts a trace on worker threads.
 * @param onProgress (rays done, rays total), at most every 50 ms and once at the end
 * @param workers worker count, default navigator.hardwareConcurrency (capped at 8)
 * @throws RangeError naming the field for an invalid package or options (before any worker starts)
 */
export function startTrace(
  pkg: TracePackage,
  options: TraceOptions,
  onProgress?: (raysDone: number, raysTotal: number) => void,
  workers?: number
): TraceJob {
  validateTracePackage(pkg);
  validateTraceOptions(options);
  const plan = chunkPlan(options.rays);
  const cores = typeof navigator !== 'undefined' && navigator.hardwareConcurrency > 0 ? navigator.hardwareConcurrency : 2;
  const count = Math.max(1, Math.min(workers ?? cores, MAX_WORKERS, plan.chunkCount));
  const pool: Worker[] = [];
  const progress = new Float64Array(count);
  const total = createTally();
  let finished = 0;
  let lastReport = 0;
  let settle: { resolve(t: Tally): void; reject(e: Error): void } = { resolve() {}, reject() {} };
  const result = new Promise<Tally>((resolve, reject) => (settle = { resolve, reject }));

  let lastHeard = Date.now();
  const watchdog = setInterval(() => {
    if (Date.now() - lastHeard > STALL_MS) stop(new Error(`trace worker failed: no progress for ${STALL_MS / 1000} s (the worker stopped)`));
  }, 1000);
  const stop = (error: Error | null) => {
    clearInterval(watchdog);
    // 'cancel' first: harmless before terminate, and it stops a worker that outlives terminate()
    pool.forEach((w, id) => (w.postMessage({ type: 'cancel', id } satisfies TraceRequest), w.terminate()));
    pool.length = 0;
    if (error) settle.reject(error);
  };
  for (let w = 0; w < count; w++) {
    const worker = new Worker(new URL('./trace-worker.ts', import.meta.url), { type: 'module' });
    pool.push(worker);
    worker.onmessage = (event: MessageEvent<TraceReply>) => {
      lastHeard = Date.now();
      const reply = event.data;
      if (reply.type === 'error') return stop(new Error(`trace worker failed: ${reply.message}`));
      progress[w] = reply.type === 'done' ? reply.tally.launched : reply.raysDone;
      if (reply.type === 'done') {
        mergeTally(total, reply.tally);
        finished++;
      }
      const now = Date.now();
      if (onProgress && (finished === count || now - lastReport >= PROGRESS_MS)) {
        lastReport = now;
        onProgress(progress.reduce((a, b) => a + b, 0), plan.rays);
      }
      if (finished === count) {
        stop(null);
        settle.resolve(total);
      }
    };
    worker.onmessageerror = () => stop(new Error('trace worker failed: a message could not be read'));
    worker.onerror = (event: ErrorEvent) => {
      event.preventDefault();
      stop(new Error(`trace worker failed: ${event.message || 'the worker script could not run'}`));
    };
    const from = Math.floor((w * plan.chunkCount) / count);
    const to = Math.floor(((w + 1) * plan.chunkCount) / count);
    const request: TraceRequest = {
      type: 'run',
      id: w,
      pkg,
      rays: plan.rays,
      seed: options.seed,
      maxEvents: options.maxEvents ?? DEFAULT_MAX_EVENTS,
      from,
      to
    };
    worker.postMessage(request);
  }
  return {
    result,
    workers: count,
    cancel: () => stop(Object.assign(new Error('trace cancelled'), { name: 'AbortError' }))
  };
}
