/**
 * Messages between a trace client (the page's pool or the Node pool) and a trace worker. Every
 * message carries the `id` of the job it belongs to.
 *
 * A job traces chunks [from, to) of the run's chunk plan (see chunk-plan.ts) and answers with one
 * 'done' holding the tally of those chunks only; the client merges the tallies.
 */
import type { TracePackage } from './package-spec';
import type { Tally } from './tally';

export type TraceRequest =
  | {
      type: 'run';
      id: number;
      pkg: TracePackage;
      /** Rays of the whole run (fixes the chunk plan). */
      rays: number;
      seed: number;
      maxEvents: number;
      /** First chunk, inclusive. */
      from: number;
      /** Last chunk, exclusive. */
      to: number;
    }
  | { type: 'cancel'; id: number };

export type TraceReply =
  /** Rays of this job traced so far. */
  | { type: 'progress'; id: number; raysDone: number }
  | { type: 'done'; id: number; tally: Tally }
  | { type: 'error'; id: number; message: string };
