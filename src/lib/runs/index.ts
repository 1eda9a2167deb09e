/**
 * The run model: every background computation of the app (a page's trace, its sweeps, the traced
 * ranking of candidates) follows the same rules, defined here once.
 *
 * - LatestRun (latest-run.ts): start(key, work) cancels the run in flight and starts `work`; only the
 *   latest run changes the state (status 'idle' | 'running' | 'done' | 'cancelled' | 'error',
 *   progress, error, result); a cancel or a failure keeps the last result. `work` gets a context with
 *   the AbortSignal, progress(f) and publish(partial). In a component use RunState
 *   (run-state.svelte.ts), the same thing as reactive state:
 *
 *       const run = new RunState<PackageTrace>();
 *       $effect(() => { const key = traceKey(pkg, rays, seed);
 *         untrack(() => run.start(key, (ctx) => tracePackage(browserTracer, pkg, { rays, seed, ...ctx, onProgress: ctx.progress }))); });
 *
 * - RunQueue (run-queue.ts): one line of jobs, so runs never fight over the cores. The browser has one
 *   (browser-tracer.ts: traceQueue).
 * - Tracer (tracer.ts): (package, {rays, seed, signal, onProgress}) → TraceOutcome. browserTracer
 *   (cached, queued, worker pool) and queuedTracer (no cache) in the browser; tallyTracer(pool.run)
 *   over the Node pool; any engine in tests.
 * - SceneTracer (tracer.ts): compiled scenes (an optic over its source) → one tally per scene, same
 *   chunk plan and seed: queuedSceneTracer (browser-tracer.ts, worker pool, queued) in the browser,
 *   syncSceneTracer (scene-tracer.ts, calling thread) for the command line and tests.
 * - tracePackage (package-trace.ts): the package and its bare-chip companion and the gain — the
 *   headline figures of every page. traceKey/packageKey (trace-key.ts) name what was traced: a new
 *   ray count is a new trace of the same package, not a new package.
 * - TraceCache (trace-cache.ts): finished traces kept across reloads, keyed by traceKey.
 * - abortError / isAbort / throwIfAborted (abort.ts): the one cancel error.
 *
 * Everything exported here is pure (no DOM); browser-tracer.ts and run-state.svelte.ts are imported
 * directly where they apply.
 */
export { abortError, isAbort, throwIfAborted } from './abort';
export { RunQueue, type Job } from './run-queue';
export { LatestRun, type RunStatus, type RunContext, type RunWork, type RunView } from './latest-run';
export { tallyTracer, type Tracer, type TraceOutcome, type TraceRequestOptions, type SceneTracer, type SceneTraceOutcome } from './tracer';
export { syncSceneTracer } from './scene-tracer';
export { tracePackage, bareRays, BARE_MAX_RAYS, type PackageTrace } from './package-trace';
export { traceGain } from './trace-gain';
export { packageKey, traceKey, canonicalJson, fnv1a64, TRACE_RESULTS_VERSION } from './trace-key';
export { TraceCache, cachedTracer, TRACE_CACHE_KEY, type TextStore } from './trace-cache';
