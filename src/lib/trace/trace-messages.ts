/**
 * Messages between a trace client (the page's pool or the Node pool) and a trace worker. Every
 * message carries the `id` of the job it belongs to.
 *
 * A 'run' job traces chunks [from, to) of a package's chunk plan (see chunk-plan.ts) and answers with
 * one 'done' holding the tally of those chunks only; the client merges the tallies. A 'run-scenes' job
 * traces listed (scene, chunk) units of several compiled scenes that share one chunk plan (the beam
 * page's three optics) and answers with one 'scenes-done' holding a tally per scene.
 */
import type { CompiledScene } from './compile-scene';
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
  | {
      type: 'run-scenes';
      id: number;
      /** Compiled scenes (plain data: typed arrays and numbers, cloned as they are). */
      scenes: CompiledScene[];
      /** Rays per scene (fixes the chunk plan each scene shares). */
      rays: number;
      seed: number;
      maxEvents: number;
      /** The units this worker traces: pairs (scene index, chunk index), flattened. */
      units: Int32Array;
    }
  | { type: 'cancel'; id: number };

export type TraceReply =
  /** Rays of this job traced so far. */
  | { type: 'progress'; id: number; raysDone: number }
  | { type: 'done'; id: number; tally: Tally }
  /** The tallies of a 'run-scenes' job's units, one per scene (empty tallies for scenes it had no unit of). */
  | { type: 'scenes-done'; id: number; tallies: Tally[] }
  | { type: 'error'; id: number; message: string };
