/**
 * The worker_threads side of the Node pool: answers each 'run' job with the tally of its chunks.
 * Loaded through boot.mjs (Node 20 cannot start a .ts worker directly).
 */
import { parentPort } from 'node:worker_threads';
import { chunkPlan, raysInChunk } from '../chunk-plan';
import { validateTracePackage } from '../package-spec';
import { createTally } from '../tally';
import { compileScene } from '../compile-scene';
import { packageScene } from '../package-scene';
import { traceSceneChunk } from '../trace-chunk';
import type { TraceReply, TraceRequest } from '../trace-messages';

const port = parentPort;
if (port === null) throw new Error('trace-thread.ts must run in a worker thread');

port.on('message', (msg: TraceRequest) => {
  if (msg.type !== 'run') return;
  let reply: TraceReply;
  try {
    validateTracePackage(msg.pkg);
    const plan = chunkPlan(msg.rays);
    const tally = createTally();
    const scene = compileScene(packageScene(msg.pkg));
    for (let c = msg.from; c < msg.to; c++) traceSceneChunk(scene, c, raysInChunk(plan, c), msg.seed, tally, msg.maxEvents);
    reply = { type: 'done', id: msg.id, tally };
  } catch (error) {
    reply = { type: 'error', id: msg.id, message: error instanceof Error ? error.message : String(error) };
  }
  port.postMessage(reply);
});
