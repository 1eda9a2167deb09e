import '@vitest/web-worker';
import { describe, expect, it } from 'vitest';
import { createTally, mergeTally } from '../../../src/lib/trace/tally';
import { traceChunk } from '../../../src/lib/trace/trace-chunk';
import type { TraceReply, TraceRequest } from '../../../src/lib/trace/trace-messages';
import { startTrace } from '../../../src/lib/trace/trace-pool';
import { traceSync } from '../../../src/lib/trace/trace';
import { domePackage } from '../../support/fixtures';

function replies(worker: Worker, request: TraceRequest): Promise<TraceReply[]> {
  return new Promise((resolve) => {
    const seen: TraceReply[] = [];
    worker.onmessage = (event: MessageEvent<TraceReply>) => {
      seen.push(event.data);
      if (event.data.type !== 'progress') resolve(seen);
    };
    worker.postMessage(request);
  });
}

describe('trace-worker.ts (browser worker shim)', () => {
  it('answers a run with progress per chunk and the tally of its chunks', async () => {
    const worker = new Worker(new URL('../../../src/lib/trace/trace-worker.ts', import.meta.url), { type: 'module' });
    const request: TraceRequest = { type: 'run', id: 7, pkg: domePackage(), rays: 40_000, seed: 3, maxEvents: 1000, from: 1, to: 3 };
    const seen = await replies(worker, request);
    worker.terminate();
    const done = seen.at(-1);
    expect(done?.type).toBe('done');
    expect(seen.every((r) => r.id === 7)).toBe(true);
    expect(seen.filter((r) => r.type === 'progress').map((r) => (r.type === 'progress' ? r.raysDone : 0))).toEqual(
      expect.arrayContaining([16384, 16384 + 7232])
    );
    // chunks 1 and 2 of a 40 000-ray plan hold 16 384 and 7 232 rays
    const expected = traceChunk(domePackage(), 2, 7232, 3, traceChunk(domePackage(), 1, 16384, 3, createTally()));
    if (done?.type === 'done') expect(done.tally).toEqual(expected);
  });

  it('answers an invalid package with an error reply naming the field', async () => {
    const worker = new Worker(new URL('../../../src/lib/trace/trace-worker.ts', import.meta.url), { type: 'module' });
    const bad = { ...domePackage(), outsideN: 0 };
    const seen = await replies(worker, { type: 'run', id: 1, pkg: bad, rays: 10, seed: 1, maxEvents: 10, from: 0, to: 1 });
    worker.terminate();
    expect(seen.at(-1)).toMatchObject({ type: 'error', id: 1, message: expect.stringMatching(/outsideN must be/) });
  });
});

// @vitest/web-worker runs workers in the test's own thread and shares the worker module between workers
// created back to back, so only one worker can run here; the chunk plan makes the result independent of
// the worker count (checked with real threads in node-pool.test.ts).
describe('startTrace(pkg, options) — browser pool, one emulated worker', () => {
  it('merges the workers’ tallies into exactly the traceSync result', async () => {
    const options = { rays: 40_000, seed: 77 };
    const progress: number[] = [];
    const job = startTrace(domePackage(), options, (done) => progress.push(done), 1);
    expect(await job.result).toEqual(traceSync(domePackage(), options));
    expect(progress.at(-1)).toBe(40_000);
    expect(mergeTally(createTally(), await job.result).launched).toBe(40_000);
  });

  it('rejects with an AbortError when cancelled', async () => {
    const job = startTrace(domePackage(), { rays: 200_000, seed: 1 }, undefined, 1);
    job.cancel();
    await expect(job.result).rejects.toMatchObject({ name: 'AbortError', message: 'trace cancelled' });
  });

  it('throws a RangeError naming the field before starting any worker', () => {
    expect(() => startTrace(domePackage(), { rays: -5, seed: 1 })).toThrow(/rays must be an integer/);
  });
});
