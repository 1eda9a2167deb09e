import { validateTracePackage, type TracePackage } from '../trace/package-spec';
import { domeClosedForm } from './dome-closed-form';
import type { SweepPlan, SweepPoint } from './sweep-plan';
import { checkSweepValues, evenGrid } from './sweep-values';
import { withEncapsulant } from './vary-package';

/** Encapsulant indices traced by default: 1.0 (an air-filled dome) to 2.0 in steps of 0.1. */
export const DEFAULT_INDEX_VALUES: readonly number[] = evenGrid(1, 2, 10).map((v) => Math.round(v * 10) / 10);

/** Allowed encapsulant indices for the sweep (the tracer's index range, capped at the scenario limit). */
export const INDEX_SWEEP_RANGE = { min: 1, max: 6 } as const;

/**
 * Extraction against the encapsulant index: the scenario's package with only the encapsulant's index
 * changed (geometry, absorption, chip and base as they are). The closed form is drawn on a grid four
 * times finer than the traced values.
 * @param pkg the scenario's package; its encapsulant must be a dome
 * @param values encapsulant indices to trace, increasing, each in [1, 6]
 */
export function planIndexSweep(pkg: TracePackage, values: readonly number[] = DEFAULT_INDEX_VALUES): SweepPlan {
  validateTracePackage(pkg);
  if (pkg.encapsulant.shape !== 'dome') throw new RangeError("encapsulant.shape must be 'dome' for a dome sweep");
  const xs = checkSweepValues('Encapsulant indices', values, INDEX_SWEEP_RANGE.min, INDEX_SWEEP_RANGE.max);

  const points: SweepPoint[] = xs.map((x) => {
    const p = withEncapsulant(pkg, { n: x });
    return { x, pkg: p, closedForm: domeClosedForm(p).etaDome };
  });
  const line =
    xs.length > 1
      ? evenGrid(xs[0], xs[xs.length - 1], 4 * (xs.length - 1)).map((x) => ({
          x,
          y: domeClosedForm(withEncapsulant(pkg, { n: x })).etaDome
        }))
      : points.map((p) => ({ x: p.x, y: p.closedForm }));
  const n = pkg.encapsulant.n;
  return {
    kind: 'index',
    title: 'Extraction against encapsulant index',
    xTitle: 'Encapsulant index n',
    points,
    closedFormLine: line,
    closedFormLabel: 'Closed form (point source, one face)',
    skipped: [],
    marker: null,
    currentX: n >= xs[0] && n <= xs[xs.length - 1] ? n : null
  };
}
