/**
 * Browser-side client of the trace workers (uses Worker and navigator: browser only). Splits a run's
 * chunks over the workers (navigator.hardwareConcurrency, at most 8), merges the tallies — identical
 * to a one-thread trace for any worker count — and reports progress about 20 times a second.
 * cancel() terminates the workers at once and rejects with an AbortError; a failing worker rejects
 * with a message naming the failure, and the partial result is discarded. A worker that dies silently
 * (no error event, no message for STALL_MS) is treated as a failure too, so a run never hangs.
 *
 * Two kinds of run: startTrace traces one package (one contiguous chunk range per worker, fresh
 * workers ended after the run); startSceneTrace traces several compiled scenes on one chunk plan (the
 * beam page's optics), the (scene, chunk) units dealt out in turn so every worker gets a share of each
 * scene's cost, on workers kept warm between runs (see `warm` below).
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
 * Workers kept between scene runs (startSceneTrace): a fresh worker loads and compiles the tracer
 * again, a few hundred milliseconds of a one-second run, so scene runs hand their workers back here
 * when they finish or are cancelled (a cancelled worker stops after its current chunk; replies of an
 * old job carry its id and are ignored). They end after WARM_IDLE_MS without a run, or on a failure.
 */
const warm: Worker[] = [];
const WARM_IDLE_MS = 60_000;
let idleTimer: ReturnType<typeof setTimeout> | null = null;
/** Job ids are unique in the tab, so a kept worker's late reply to an old job is never taken for a new one's. */
let nextJobId = 0;

function newWorker(): Worker {
  return new Worker(new URL('./trace-worker.ts', import.meta.url), { type: 'module' });
}

function releaseWarm(workers: Worker[]): void {
  for (const w of workers) {
    w.onmessage = null;
    w.onerror = null;
    w.onmessageerror = null;
    warm.push(w);
  }
  if (idleTimer !== null) clearTimeout(idleTimer);
  idleTimer = setTimeout(() => warm.splice(0).forEach((w) => w.terminate()), WARM_IDLE_MS);
}

/**
 * Runs one request per worker and settles when every worker has answered 'done' or 'scenes-done'.
 * @param request the request of worker w, under job id `id`
 * @param take adds one worker's final reply into the result
 * @param keep hand the workers back to the warm set when done or cancelled (scene runs), else terminate them
 */
function runOnWorkers<T>(
  count: number,
  raysTotal: number,
  request: (w: number, id: number) => TraceRequest,
  take: (reply: Extract<TraceReply, { type: 'done' | 'scenes-done' }>) => number,
  result: T,
  onProgress: ((raysDone: number, raysTotal: number) => void) | undefined,
  keep: boolean
): TraceJob<T> {
  const pool: Worker[] = keep ? warm.splice(0, count) : [];
  while (pool.length < count) pool.push(newWorker());
  const base = nextJobId;
  nextJobId += count;
  const progress = new Float64Array(count);
  let finished = 0;
  let lastReport = 0;
  let settle: { resolve(t: T): void; reject(e: Error): void } = { resolve() {}, reject() {} };
  const promise = new Promise<T>((resolve, reject) => (settle = { resolve, reject }));

  let lastHeard = Date.now();
  const watchdog = setInterval(() => {
    if (Date.now() - lastHeard > STALL_MS) stop(new Error(`trace worker failed: no progress for ${STALL_MS / 1000} s (the worker stopped)`), false);
  }, 1000);
  let stopped = false;
  /** Ends the job: reject with `error` (null: resolved already); `reuse` keeps sound workers warm. */
  const stop = (error: Error | null, reuse: boolean) => {
    if (stopped) return;
    stopped = true;
    clearInterval(watchdog);
    // 'cancel' first: harmless before terminate, and it stops a worker that outlives terminate() or is kept
    if (finished < count) pool.forEach((w, i) => w.postMessage({ type: 'cancel', id: base + i } satisfies TraceRequest));
    if (keep && reuse) releaseWarm(pool);
    else pool.forEach((w) => w.terminate());
    if (error) settle.reject(error);
  };
  pool.forEach((worker, w) => {
    const id = base + w;
    worker.onmessage = (event: MessageEvent<TraceReply>) => {
      const reply = event.data;
      if (reply.id !== id || stopped) return; // a kept worker's late reply to an earlier job
      lastHeard = Date.now();
      if (reply.type === 'error') return stop(new Error(`trace worker failed: ${reply.message}`), false);
      if (reply.type === 'progress') progress[w] = reply.raysDone;
      else {
        try {
          progress[w] = take(reply);
        } catch (error) {
          return stop(error instanceof Error ? error : new Error(String(error)), false);
        }
        finished++;
      }
      const now = Date.now();
      if (onProgress && (finished === count || now - lastReport >= PROGRESS_MS)) {
        lastReport = now;
        onProgress(progress.reduce((a, b) => a + b, 0), raysTotal);
      }
      if (finished === count) {
        stop(null, true);
        settle.resolve(result);
      }
    };
    worker.onmessageerror = () => stop(new Error('trace worker failed: a message could not be read'), false);
    worker.onerror = (event: ErrorEvent) => {
      event.preventDefault();
      stop(new Error(`trace worker failed: ${event.message || 'the worker script could not run'}`), false);
    };
    worker.postMessage(request(w, id));
  });
  return {
    result: promise,
    workers: count,
    cancel: () => stop(Object.assign(new Error('trace cancelled'), { name: 'AbortError' }), true)
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
    (w, id) => ({
      type: 'run',
      id,
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
    onProgress,
    false
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
    (w, id) => ({
      type: 'run-scenes',
      id,
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
    onProgress,
    true
  );
}
