/**
 * Browser-side client of the trace workers (uses Worker and navigator: browser only). Splits a run's
 * chunks over the workers (navigator.hardwareConcurrency, at most 8), merges the tallies — identical
 * to a one-thread trace for any worker count — and reports progress about 20 times a second.
 * cancel() terminates the workers at once and rejects with an AbortError; a failing worker rejects
 * with a message naming the failure, and the partial result is discarded. A worker that dies silently
 * (no error event, no message for STALL_MS) is treated as a failure too, so a run never hangs.
 *
 * Two kinds of run: startTrace traces one package (one contiguous chunk range per worker);
 * startSceneTrace traces several compiled scenes on one chunk plan (the beam page's optics), the
 * (scene, chunk) units dealt out in turn so every worker gets a share of each scene's cost.
 */
import { chunkPlan, dealSceneUnits } from './chunk-plan';
import type { CompiledScene } from './compile-scene';
import { DEFAULT_MAX_EVENTS, validateTraceOptions, validateTracePackage, type TraceOptions, type TracePackage } from './package-spec';
import { createTally, mergeTally, type Tally } from './tally';
import type { TraceReply, TraceRequest } from './trace-messages';

export interface TraceJob<T = Tally> {
  /** Resolves with the merged tally (tallies); rejects on cancel (name 'AbortError') or on a worker failure. */
  result: Promise<T>;
  /** Stops every worker now. */
  cancel(): void;
  /** Workers this job runs on (the pool's rule: cores, at most 8, at most one per chunk). */
  workers: number;
}

const MAX_WORKERS = 8;
const PROGRESS_MS = 50;
/** Silence after which a running trace counts as failed; a chunk of 16 384 rays takes well under a second. */
const STALL_MS = 30_000;

/** Workers for `units` work units: the cores (or `asked`), at most 8, at most one per unit. */
function workerCount(units: number, asked?: number): number {
  const cores = typeof navigator !== 'undefined' && navigator.hardwareConcurrency > 0 ? navigator.hardwareConcurrency : 2;
  return Math.max(1, Math.min(asked ?? cores, MAX_WORKERS, units));
}

/**
 * Runs one request per worker and settles when every worker has answered 'done' or 'scenes-done'.
 * @param request the request of worker w
 * @param take adds one worker's final reply into the result
 */
function runOnWorkers<T>(
  count: number,
  raysTotal: number,
  request: (w: number) => TraceRequest,
  take: (reply: Extract<TraceReply, { type: 'done' | 'scenes-done' }>) => number,
  result: T,
  onProgress?: (raysDone: number, raysTotal: number) => void
): TraceJob<T> {
  const pool: Worker[] = [];
  const progress = new Float64Array(count);
  let finished = 0;
  let lastReport = 0;
  let settle: { resolve(t: T): void; reject(e: Error): void } = { resolve() {}, reject() {} };
  const promise = new Promise<T>((resolve, reject) => (settle = { resolve, reject }));

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
      if (reply.type === 'progress') progress[w] = reply.raysDone;
      else {
        try {
          progress[w] = take(reply);
        } catch (error) {
          return stop(error instanceof Error ? error : new Error(String(error)));
        }
        finished++;
      }
      const now = Date.now();
      if (onProgress && (finished === count || now - lastReport >= PROGRESS_MS)) {
        lastReport = now;
        onProgress(progress.reduce((a, b) => a + b, 0), raysTotal);
      }
      if (finished === count) {
        stop(null);
        settle.resolve(result);
      }
    };
    worker.onmessageerror = () => stop(new Error('trace worker failed: a message could not be read'));
    worker.onerror = (event: ErrorEvent) => {
      event.preventDefault();
      stop(new Error(`trace worker failed: ${event.message || 'the worker script could not run'}`));
    };
    worker.postMessage(request(w));
  }
  return {
    result: promise,
    workers: count,
    cancel: () => stop(Object.assign(new Error('trace cancelled'), { name: 'AbortError' }))
  };
}

/**
 * Starts a trace of one package on worker threads.
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
  const count = workerCount(plan.chunkCount, workers);
  const total = createTally();
  return runOnWorkers(
    count,
    plan.rays,
    (w) => ({
      type: 'run',
      id: w,
      pkg,
      rays: plan.rays,
      seed: options.seed,
      maxEvents: options.maxEvents ?? DEFAULT_MAX_EVENTS,
      from: Math.floor((w * plan.chunkCount) / count),
      to: Math.floor(((w + 1) * plan.chunkCount) / count)
    }),
    (reply) => {
      if (reply.type !== 'done') throw new Error('trace worker answered a package run with scene tallies');
      mergeTally(total, reply.tally);
      return reply.tally.launched;
    },
    total,
    onProgress
  );
}

/**
 * Starts a trace of several compiled scenes, `options.rays` rays each on the same chunk plan and seed,
 * on worker threads. Unit k of the scene-major list (scene, chunk) goes to worker k mod count; each
 * chunk is seeded by its index, so the tallies equal traceSceneChunk over every chunk on one thread.
 * Inputs are trusted (scenes compiled from checked designs; rays and seed checked by the caller).
 * @param onProgress (rays done, rays total over all scenes), at most every 50 ms and once at the end
 * @param workers worker count, default navigator.hardwareConcurrency (capped at 8)
 */
export function startSceneTrace(
  scenes: CompiledScene[],
  options: TraceOptions,
  onProgress?: (raysDone: number, raysTotal: number) => void,
  workers?: number
): TraceJob<Tally[]> {
  const plan = chunkPlan(options.rays);
  const units = scenes.length * plan.chunkCount;
  const count = workerCount(units, workers);
  const tallies = scenes.map(() => createTally());
  return runOnWorkers(
    count,
    plan.rays * scenes.length,
    (w) => ({
      type: 'run-scenes',
      id: w,
      scenes,
      rays: plan.rays,
      seed: options.seed,
      maxEvents: options.maxEvents ?? DEFAULT_MAX_EVENTS,
      units: dealSceneUnits(plan, scenes.length, w, count)
    }),
    (reply) => {
      if (reply.type !== 'scenes-done') throw new Error('trace worker answered a scene run with one tally');
      let launched = 0;
      reply.tallies.forEach((t, s) => (mergeTally(tallies[s], t), (launched += t.launched)));
      return launched;
    },
    tallies,
    onProgress
  );
}
