/**
 * Multi-threaded trace in Node (command line, benchmark, tests) with worker_threads. Node only: not
 * for the browser (the page uses trace-pool.ts).
 *
 * Chunks are handed out one at a time to whichever thread is free (two in flight per thread, so a
 * thread never waits for its next chunk); each answer is the tally of one chunk, merged on arrival.
 * Chunk i always traces the same rays with the same random numbers (chunk-plan.ts), and merging adds
 * integers, so the result is identical to traceSync for any thread count.
 *
 * Starting a thread costs a few hundred milliseconds (it loads the TypeScript sources through tsx), so
 * a pool can be kept for several runs: createNodeTracePool(threads) … pool.run(…) … pool.close().
 * traceParallel is the one-shot form.
 */
import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';
import { chunkPlan } from '../chunk-plan';
import {
  DEFAULT_MAX_EVENTS,
  validateTraceOptions,
  validateTracePackage,
  type TraceOptions,
  type TracePackage
} from '../package-spec';
import { createTally, mergeTally, type Tally } from '../tally';
import type { TraceReply, TraceRequest } from '../trace-messages';

/** Most threads a pool accepts. */
export const MAX_THREADS = 64;

/** Threads worth using on this machine: os.availableParallelism(), capped at MAX_THREADS. */
export function defaultThreads(): number {
  return Math.max(1, Math.min(MAX_THREADS, availableParallelism()));
}

const IN_FLIGHT_PER_THREAD = 2;

export interface NodeTracePool {
  readonly threads: number;
  /**
   * Traces `options.rays` rays through `pkg` and resolves with the merged tally — identical to
   * traceSync(pkg, options). One run at a time.
   * @param onProgress called after each chunk with (rays done, rays total)
   * @throws RangeError (as a rejected promise) for invalid input; rejects with an Error naming the
   *   thread's message if a thread fails, after which the pool is closed
   */
  run(pkg: TracePackage, options: TraceOptions, onProgress?: (raysDone: number, raysTotal: number) => void): Promise<Tally>;
  /** Stops every thread. */
  close(): Promise<void>;
}

/** Per-run state the thread listeners report to. */
interface Run {
  onReply(worker: Worker, reply: TraceReply): void;
  fail(message: string): void;
}

/**
 * Starts `threads` worker threads for tracing.
 * @param threads integer [1, 64]
 * @throws RangeError for a bad thread count
 */
export function createNodeTracePool(threads: number): NodeTracePool {
  if (!Number.isInteger(threads) || threads < 1 || threads > MAX_THREADS) {
    throw new RangeError(`threads must be an integer in [1, ${MAX_THREADS}] (got ${String(threads)})`);
  }
  const boot = new URL('./boot.mjs', import.meta.url);
  const entry = new URL('./trace-thread.ts', import.meta.url);
  const workers: Worker[] = [];
  let current: Run | null = null;
  let closed = false;
  let broken: string | null = null;

  const close = async () => {
    closed = true;
    await Promise.all(workers.map((w) => w.terminate()));
  };
  const breakPool = (message: string) => {
    if (broken === null) broken = message;
    current?.fail(message);
    void close();
  };
  for (let w = 0; w < threads; w++) {
    const worker = new Worker(boot, { workerData: { tsEntry: entry.href } });
    worker.unref(); // an idle pool does not keep the process alive
    worker.on('message', (reply: TraceReply) => current?.onReply(worker, reply));
    worker.on('error', (error) => breakPool(error.message));
    worker.on('exit', (code) => {
      if (!closed) breakPool(`a thread exited early with code ${code}`);
    });
    workers.push(worker);
  }

  const run: NodeTracePool['run'] = async (pkg, options, onProgress) => {
    validateTracePackage(pkg);
    validateTraceOptions(options);
    if (broken !== null) throw new Error(`trace thread failed: ${broken}`);
    if (closed) throw new Error('the trace pool is closed');
    if (current !== null) throw new Error('the trace pool is busy with another run');
    const plan = chunkPlan(options.rays);
    const maxEvents = options.maxEvents ?? DEFAULT_MAX_EVENTS;
    const total = createTally();
    for (const worker of workers) worker.ref(); // keep the process alive while the run is under way
    try {
      await new Promise<void>((resolve, reject) => {
        let nextChunk = 0;
        let chunksDone = 0;
        let raysDone = 0;
        let failed = false;
        const send = (worker: Worker) => {
          if (nextChunk >= plan.chunkCount) return;
          const request: TraceRequest = {
            type: 'run',
            id: nextChunk,
            pkg,
            rays: plan.rays,
            seed: options.seed,
            maxEvents,
            from: nextChunk,
            to: nextChunk + 1
          };
          nextChunk++;
          worker.postMessage(request);
        };
        current = {
          fail(message) {
            if (failed) return;
            failed = true;
            reject(new Error(`trace thread failed: ${message}`));
          },
          onReply(worker, reply) {
            if (failed) return;
            if (reply.type === 'error') return this.fail(reply.message);
            if (reply.type !== 'done') return;
            mergeTally(total, reply.tally);
            chunksDone++;
            raysDone += reply.tally.launched;
            onProgress?.(raysDone, plan.rays);
            if (chunksDone === plan.chunkCount) resolve();
            else send(worker);
          }
        };
        for (const worker of workers) for (let k = 0; k < IN_FLIGHT_PER_THREAD; k++) send(worker);
      });
    } finally {
      current = null;
      for (const worker of workers) worker.unref();
    }
    return total;
  };

  return { threads, run, close };
}

/**
 * Traces `options.rays` rays through `pkg` on `threads` worker threads (started for this run and
 * stopped after it) and resolves with the merged tally — identical to traceSync(pkg, options) for any
 * thread count.
 * @param threads integer [1, 64]; no more threads are started than the run has chunks
 * @param onProgress called after each chunk with (rays done, rays total)
 * @throws RangeError (as a rejected promise) for invalid input; rejects with an Error naming the
 *   thread's message if a thread fails
 */
export async function traceParallel(
  pkg: TracePackage,
  options: TraceOptions,
  threads: number,
  onProgress?: (raysDone: number, raysTotal: number) => void
): Promise<Tally> {
  validateTracePackage(pkg);
  validateTraceOptions(options);
  if (!Number.isInteger(threads) || threads < 1 || threads > MAX_THREADS) {
    throw new RangeError(`threads must be an integer in [1, ${MAX_THREADS}] (got ${String(threads)})`);
  }
  const pool = createNodeTracePool(Math.min(threads, chunkPlan(options.rays).chunkCount));
  try {
    return await pool.run(pkg, options, onProgress);
  } finally {
    await pool.close();
  }
}
