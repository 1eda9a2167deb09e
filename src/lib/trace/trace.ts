/**
 * Single-thread trace: validates the package and options, cuts the run into the fixed chunk plan and
 * traces the chunks in order. The worker pools run the same chunks, so they give the same tally.
 */
import { chunkPlan, raysInChunk } from './chunk-plan';
import { DEFAULT_MAX_EVENTS, validateTraceOptions, validateTracePackage, type TraceOptions, type TracePackage } from './package-spec';
import { compileScene } from './compile-scene';
import { packageScene } from './package-scene';
import { createTally, type Tally } from './tally';
import { traceSceneChunk } from './trace-chunk';

export { chunkPlan } from './chunk-plan';

/**
 * Traces `options.rays` rays through `pkg` on the calling thread and returns the tally.
 * @param onProgress called after each chunk with (rays done, rays total)
 * @throws RangeError naming the field and its allowed range when pkg or options are invalid
 */
export function traceSync(
  pkg: TracePackage,
  options: TraceOptions,
  onProgress?: (raysDone: number, raysTotal: number) => void
): Tally {
  validateTracePackage(pkg);
  validateTraceOptions(options);
  const maxEvents = options.maxEvents ?? DEFAULT_MAX_EVENTS;
  const plan = chunkPlan(options.rays);
  const tally = createTally();
  // compiled once for the run: its chunks trace as on fresh compiles (tests/unit/trace/trace.test.ts)
  const scene = compileScene(packageScene(pkg));
  let done = 0;
  for (let i = 0; i < plan.chunkCount; i++) {
    const n = raysInChunk(plan, i);
    traceSceneChunk(scene, i, n, options.seed, tally, maxEvents);
    done += n;
    onProgress?.(done, plan.rays);
  }
  return tally;
}
