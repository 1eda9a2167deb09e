import '@vitest/web-worker';
import { describe, expect, it } from 'vitest';
import { prepareOptic } from '../../../src/lib/optic-trace/optic-run';
import { syncSceneTracer } from '../../../src/lib/runs/scene-tracer';
import { chunkPlan, dealSceneUnits, raysInChunk } from '../../../src/lib/trace/chunk-plan';
import { createTally, mergeTally } from '../../../src/lib/trace/tally';
import { traceSceneChunk } from '../../../src/lib/trace/trace-chunk';
import type { TraceReply, TraceRequest } from '../../../src/lib/trace/trace-messages';
import { startSceneTrace } from '../../../src/lib/trace/trace-pool';

/** The three optics of the beam page's defaults over a 1 × 1 mm Lambertian square, compiled. */
function opticScenes() {
  return (['reflector', 'lens', 'tir'] as const).map(
    (type) =>
      prepareOptic({
        design: { type, exitDiameterMm: 20, heightMm: 12, gapMm: 0.2, material: 'pmma', reflectance: 0.92 },
        source: { kind: 'lambertian', shape: 'rect', widthMm: 1 },
        rays: 40_000,
        seed: 5
      }).compiled
  );
}

describe('scene runs on the browser pool', () => {
  const scenes = opticScenes();
  const options = { rays: 40_000, seed: 5 };

  it('any split of the (scene, chunk) units over workers merges to the one-thread tallies', async () => {
    const { tallies } = await syncSceneTracer(scenes, options);
    const plan = chunkPlan(options.rays);
    for (const count of [2, 3, 5]) {
      const merged = scenes.map(() => createTally());
      for (let w = 0; w < count; w++) {
        const units = dealSceneUnits(plan, scenes.length, w, count);
        const mine = scenes.map(() => createTally());
        for (let j = 0; j < units.length; j += 2) traceSceneChunk(scenes[units[j]], units[j + 1], raysInChunk(plan, units[j + 1]), options.seed, mine[units[j]]);
        mine.forEach((t, s) => mergeTally(merged[s], t));
      }
      expect(merged).toEqual(tallies);
    }
  });

  it("the worker answers a 'run-scenes' job with one tally per scene, progress in rays", async () => {
    const worker = new Worker(new URL('../../../src/lib/trace/trace-worker.ts', import.meta.url), { type: 'module' });
    const units = new Int32Array([2, 1, 0, 0]); // TIR chunk 1, reflector chunk 0
    const seen = await new Promise<TraceReply[]>((resolve) => {
      const all: TraceReply[] = [];
      worker.onmessage = (e: MessageEvent<TraceReply>) => (all.push(e.data), e.data.type !== 'progress' && resolve(all));
      worker.postMessage({ type: 'run-scenes', id: 4, scenes, rays: options.rays, seed: options.seed, maxEvents: 1000, units } satisfies TraceRequest);
    });
    worker.terminate();
    const done = seen.at(-1);
    expect(done?.type).toBe('scenes-done');
    expect(seen.filter((r) => r.type === 'progress').at(-1)).toMatchObject({ raysDone: 2 * 16384 });
    if (done?.type !== 'scenes-done') return;
    expect(done.tallies.map((t) => t.launched)).toEqual([16384, 0, 16384]);
    expect(done.tallies[2]).toEqual(traceSceneChunk(scenes[2], 1, 16384, options.seed, createTally(), 1000));
  });

  // @vitest/web-worker emulates one worker in the test's thread (see trace-worker.test.ts, which also checks cancel)
  it('startSceneTrace with one emulated worker equals the one-thread tracer', async () => {
    const progress: number[] = [];
    const job = startSceneTrace(scenes, options, (done) => progress.push(done), 1);
    expect(await job.result).toEqual((await syncSceneTracer(scenes, options)).tallies);
    expect(progress.at(-1)).toBe(3 * options.rays);
  });

  it('keeps its worker between runs: a run after a finished one and after a cancelled one gives the same tallies', async () => {
    const expected = (await syncSceneTracer(scenes, options)).tallies;
    expect(await startSceneTrace(scenes, options, undefined, 1).result).toEqual(expected);
    // cancelled at once (the emulated worker may report progress before the call returns)
    const stopped = startSceneTrace(scenes, { rays: 200_000, seed: 9 }, undefined, 1);
    stopped.cancel();
    await expect(stopped.result).rejects.toMatchObject({ name: 'AbortError' });
    expect(await startSceneTrace(scenes, options, undefined, 1).result).toEqual(expected);
  });
});
