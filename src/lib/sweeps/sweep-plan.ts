/**
 * The shape of a sweep: which packages to trace, one after another, and the closed-form curve to draw
 * beside them. Planners (plan-*-sweep.ts) build a plan from the scenario's package; `runSweep` traces it.
 * Pure data: no Svelte, no DOM, no workers.
 */
import type { TracePackage } from '../trace/package-spec';

/** What a sweep varies. */
export type SweepKind = 'index' | 'shape' | 'radius';

/** One package to trace, at one value of the swept quantity. */
export interface SweepPoint {
  /** The swept value (encapsulant index, h/R, or R over the chip's half-diagonal). */
  x: number;
  /** The scenario's package with the swept quantity changed. */
  pkg: TracePackage;
  /** Closed-form dome extraction at this point (fraction, [0, 1]). */
  closedForm: number;
}

/** A value of the sweep that could not be traced, and why (e.g. the chip would not fit in the dome). */
export interface SkippedPoint {
  x: number;
  reason: string;
}

/** A vertical line on the sweep's chart, e.g. the no-TIR dome radius. */
export interface SweepMarker {
  x: number;
  label: string;
}

export interface SweepPlan {
  kind: SweepKind;
  /** Chart title. */
  title: string;
  /** x-axis title with its unit. */
  xTitle: string;
  /** The packages to trace, in increasing x. */
  points: SweepPoint[];
  /** The closed form on a finer grid than the traced points, for a smooth line. */
  closedFormLine: { x: number; y: number }[];
  /** Legend text of the closed-form line (says what it assumes). */
  closedFormLabel: string;
  /** Values left out of the trace, with the reason. */
  skipped: SkippedPoint[];
  /** Vertical marker line, or null. */
  marker: SweepMarker | null;
  /** The x of the scenario's own package, or null when the scenario is outside the swept range. */
  currentX: number | null;
}
