// Bootstrap for a worker_threads worker written in TypeScript: Node 20 cannot start a .ts entry
// directly, so this plain module registers tsx's loader, then imports the entry named in workerData.
// Start with: new Worker(new URL('./boot.mjs', import.meta.url), { workerData: { tsEntry: url.href } })
import { workerData } from 'node:worker_threads';
import { register } from 'tsx/esm/api';

register();
await import(workerData.tsEntry);
