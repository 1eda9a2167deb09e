/**
 * Browser worker shim around traceChunk: runs chunks [from, to) of a job, posts progress (after every
 * chunk, and every ≥ 50 ms inside a long chunk) and then the job's tally. Between chunks it yields to
 * the event loop (through a MessageChannel, which has no timer clamp) so a 'cancel' can stop the job.
 */
import { chunkPlan, raysInChunk } from './chunk-plan';
import { validateTracePackage } from './package-spec';
import { createTally } from './tally';
import { traceChunk } from './trace-chunk';
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

async function run(msg: Extract<TraceRequest, { type: 'run' }>): Promise<void> {
  validateTracePackage(msg.pkg);
  const plan = chunkPlan(msg.rays);
  const tally = createTally();
  let done = 0;
  let last = Date.now();
  const inChunk = (n: number) => {
    if (Date.now() - last < 50) return;
    last = Date.now();
    scope.postMessage({ type: 'progress', id: msg.id, raysDone: done + n });
  };
  for (let c = msg.from; c < msg.to; c++) {
    traceChunk(msg.pkg, c, raysInChunk(plan, c), msg.seed, tally, msg.maxEvents, inChunk);
    done += raysInChunk(plan, c);
    scope.postMessage({ type: 'progress', id: msg.id, raysDone: done });
    await yieldToEvents();
    if (cancelled.delete(msg.id)) return;
  }
  scope.postMessage({ type: 'done', id: msg.id, tally });
}

scope.onmessage = (event) => {
  const msg = event.data;
  if (msg.type === 'cancel') cancelled.add(msg.id);
  else
    run(msg).catch((error) =>
      scope.postMessage({ type: 'error', id: msg.id, message: error instanceof Error ? error.message : String(error) })
    );
};
