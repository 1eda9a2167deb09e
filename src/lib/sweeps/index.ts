/** Sweeps of the dome page: planners (which packages to trace) and the sequential runner. Pure. */
export type { SweepKind, SweepPoint, SkippedPoint, SweepMarker, SweepPlan } from './sweep-plan';
export { planIndexSweep, DEFAULT_INDEX_VALUES, INDEX_SWEEP_RANGE } from './plan-index-sweep';
export { planShapeSweep, DEFAULT_SHAPE_VALUES, SHAPE_SWEEP_RANGE } from './plan-shape-sweep';
export { planRadiusSweep, DEFAULT_RADIUS_VALUES, RADIUS_SWEEP_RANGE } from './plan-radius-sweep';
export {
  runSweep,
  type SweepTracer,
  type SweepTraceResult,
  type SweepPointResult,
  type SweepRunOptions,
  type SweepRun
} from './run-sweep';
export { domeClosedForm, type DomeClosedForm } from './dome-closed-form';
export { withEncapsulant, bareChip } from './vary-package';
export { packageFits } from './package-fits';
export { checkSweepValues, evenGrid } from './sweep-values';
