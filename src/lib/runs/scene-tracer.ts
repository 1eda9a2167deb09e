/**
 * The scene tracer on the calling thread: every chunk of every scene in turn, checking the signal
 * between chunks. The same tallies as the worker pool's (chunks seeded by index). Pure; for the
 * command line and tests.
 */
import { chunkPlan, raysInChunk } from '../trace/chunk-plan';
import { createTally } from '../trace/tally';
import { traceSceneChunk } from '../trace/trace-chunk';
import { throwIfAborted } from './abort';
import type { SceneTracer } from './tracer';

export const syncSceneTracer: SceneTracer = async (scenes, { rays, seed, signal, onProgress }) => {
  const t0 = performance.now();
  const plan = chunkPlan(rays);
  const tallies = scenes.map(() => createTally());
  const units = scenes.length * plan.chunkCount;
  for (let k = 0; k < units; k++) {
    throwIfAborted(signal);
    const s = Math.floor(k / plan.chunkCount);
    const c = k % plan.chunkCount;
    traceSceneChunk(scenes[s], c, raysInChunk(plan, c), seed, tallies[s]);
    onProgress?.((k + 1) / units);
  }
  return { tallies, seconds: (performance.now() - t0) / 1000, workers: 1 };
};
