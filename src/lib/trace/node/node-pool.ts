/**
 * Multi-threaded trace in Node (command line, benchmark, tests) with worker_threads. Node only: not
 * for the browser (the page uses trace-pool.ts).
 *
 * Chunks are handed out one at a time to whichever thread is free (two in flight per thread, so a
 * thread never waits for its next chunk); each answer is the tally of one chunk, merged on arrival.
 * Chunk i always traces the same rays with the same random numbers (chunk-plan.ts), and merging adds
 * integers, so the result is identical to traceSync for any thread count.
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

/** Most threads traceParallel accepts. */
export const MAX_THREADS = 64;

/** Threads worth using on this machine: os.availableParallelism(), capped at MAX_THREADS. */
export function defaultThreads(): number {
  return Math.max(1, Math.min(MAX_THREADS, availableParallelism()));
}

const IN_FLIGHT_PER_THREAD = 2;

/**
 * Traces `options.rays` rays through `pkg` on `threads` worker threads and resolves with the merged
 * tally — identical to traceSync(pkg, options) for any thread count.
 * @param threads integer [1, 64]
 * @param onProgress called after each chunk with (rays done, rays total)
 * @throws RangeError (synchronously, as a rejected promise) for invalid input; rejects with an Error
 *   naming the thread's message if a worker fails, after stopping all workers
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
  const plan = chunkPlan(options.rays);
  const maxEvents = options.maxEvents ?? DEFAULT_MAX_EVENTS;
  const workerCount = Math.min(threads, plan.chunkCount);
  const boot = new URL('./boot.mjs', import.meta.url);
  const entry = new URL('./trace-thread.ts', import.meta.url);
  const workers: Worker[] = [];
  const total = createTally();

  try {
    await new Promise<void>((resolve, reject) => {
      let nextChunk = 0;
      let chunksDone = 0;
      let raysDone = 0;
      let failed = false;
      const fail = (message: string) => {
        if (failed) return;
        failed = true;
        reject(new Error(`trace thread failed: ${message}`));
      };
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
      for (let w = 0; w < workerCount; w++) {
        const worker = new Worker(boot, { workerData: { tsEntry: entry.href } });
        workers.push(worker);
        worker.on('message', (reply: TraceReply) => {
          if (failed) return;
          if (reply.type === 'error') return fail(reply.message);
          if (reply.type !== 'done') return;
          mergeTally(total, reply.tally);
          chunksDone++;
          raysDone += reply.tally.launched;
          onProgress?.(raysDone, plan.rays);
          if (chunksDone === plan.chunkCount) resolve();
          else send(worker);
        });
        worker.on('error', (error) => fail(error.message));
        worker.on('exit', (code) => {
          if (chunksDone < plan.chunkCount) fail(`a thread exited early with code ${code}`);
        });
        for (let k = 0; k < IN_FLIGHT_PER_THREAD; k++) send(worker);
      }
      if (plan.chunkCount === 0) resolve();
    });
  } finally {
    await Promise.all(workers.map((w) => w.terminate()));
  }
  return total;
}
