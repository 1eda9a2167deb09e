// Bootstrap for tests that start a TypeScript worker_threads entry (Node 20 cannot load .ts directly).
// The tracer's Node pool ships the same bootstrap for run time; this file reuses it:
//   new Worker(new URL('./ts-worker-boot.mjs', import.meta.url), { workerData: { tsEntry: url.href } })
import '../../src/lib/trace/node/boot.mjs';
