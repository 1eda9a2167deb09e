/**
 * Browser worker shim around the chunk tracers: a 'run' job traces chunks [from, to) of a package, a
 * 'run-scenes' job its listed (scene, chunk) units of compiled scenes; both post progress (after every
 * chunk, and every ≥ 50 ms inside a long chunk) and then their tallies. Between chunks it yields to the
 * event loop (through a MessageChannel, which has no timer clamp) so a 'cancel' can stop the job.
 */
import { chunkPlan, raysInChunk } from './chunk-plan';
import { compileScene } from './compile-scene';
import { packageScene } from './package-scene';
import { validateTracePackage } from './package-spec';
import { createTally } from './tally';
import { traceSceneChunk } from './trace-chunk';
import type { TraceReply, TraceRequest } from './trace-messages';

const scope = self as unknown as {
  postMessage(reply: TraceReply): void;
  onmessage: ((event: MessageEvent<TraceRequest>) => void) | null;
};
const cancelled = new Set<number>();
const tick = new MessageChannel();
const waiting: (() => void)[] = [];
tick.port1.onmessage = () => waiting.shift()?.();
const yieldToEvents = () => new Promise<void>((r) => (waiting.push(r), tick.port2.postMessage(0)));

/** A progress reporter for one job: the rays of finished chunks plus the running chunk's. */
function reporter(id: number) {
  let done = 0;
  let last = Date.now();
  return {
    inChunk: (n: number) => {
      if (Date.now() - last < 50) return;
      last = Date.now();
      scope.postMessage({ type: 'progress', id, raysDone: done + n });
    },
    chunkDone: (n: number) => {
      done += n;
      scope.postMessage({ type: 'progress', id, raysDone: done });
    }
  };
}

async function run(msg: Extract<TraceRequest, { type: 'run' }>): Promise<void> {
  validateTracePackage(msg.pkg);
  const plan = chunkPlan(msg.rays);
  const tally = createTally();
  const report = reporter(msg.id);
  const scene = compileScene(packageScene(msg.pkg));
  for (let c = msg.from; c < msg.to; c++) {
    traceSceneChunk(scene, c, raysInChunk(plan, c), msg.seed, tally, msg.maxEvents, report.inChunk);
    report.chunkDone(raysInChunk(plan, c));
    await yieldToEvents();
    if (cancelled.delete(msg.id)) return;
  }
  scope.postMessage({ type: 'done', id: msg.id, tally });
}

async function runScenes(msg: Extract<TraceRequest, { type: 'run-scenes' }>): Promise<void> {
  const plan = chunkPlan(msg.rays);
  const tallies = msg.scenes.map(() => createTally());
  const report = reporter(msg.id);
  for (let u = 0; u < msg.units.length; u += 2) {
    const s = msg.units[u];
    const c = msg.units[u + 1];
    traceSceneChunk(msg.scenes[s], c, raysInChunk(plan, c), msg.seed, tallies[s], msg.maxEvents, report.inChunk);
    report.chunkDone(raysInChunk(plan, c));
    await yieldToEvents();
    if (cancelled.delete(msg.id)) return;
  }
  scope.postMessage({ type: 'scenes-done', id: msg.id, tallies });
}

scope.onmessage = (event) => {
  const msg = event.data;
  if (msg.type === 'cancel') cancelled.add(msg.id);
  else
    (msg.type === 'run' ? run(msg) : runScenes(msg)).catch((error) =>
      scope.postMessage({ type: 'error', id: msg.id, message: error instanceof Error ? error.message : String(error) })
    );
};
