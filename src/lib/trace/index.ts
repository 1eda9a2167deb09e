/**
 * Public API of the Monte Carlo package tracer (pure; runs anywhere). The browser pool lives in
 * trace-pool.ts and the Node pool in node/node-pool.ts; import those directly where they apply.
 */
export * from './package-spec';
export * from './tally';
export * from './chunk-plan';
export { traceChunk } from './trace-chunk';
export { traceSync } from './trace';
export * from './summary';
export type { TraceReply, TraceRequest } from './trace-messages';
export * from './chip-presets';
export type * from './scene';
export { packageScene } from './package-scene';
export { compileScene, type CompiledScene, type LedgerGroup } from './compile-scene';
export { traceSceneChunk } from './trace-chunk';
export { samplePaths, sceneRadius, type RayPath, type SamplePathOptions } from './ray-paths';
