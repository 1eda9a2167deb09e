import { validateTracePackage, type TracePackage } from '../trace/package-spec';
import { domeClosedForm } from './dome-closed-form';
import type { SkippedPoint, SweepPlan, SweepPoint } from './sweep-plan';
import { checkSweepValues } from './sweep-values';
import { packageFits } from './package-fits';
import { withEncapsulant } from './vary-package';

/** Dome shapes h/R traced by default, from a flat lens (0.3) through the hemisphere (1) to a tall bullet (2). */
export const DEFAULT_SHAPE_VALUES: readonly number[] = [0.3, 0.4, 0.5, 0.6, 0.8, 1, 1.2, 1.4, 1.6, 1.8, 2];

/** Allowed dome shapes h/R for the sweep. */
export const SHAPE_SWEEP_RANGE = { min: 0.05, max: 10 } as const;

/**
 * Extraction against the dome's shape h/R (h the dome height, R its base radius): the scenario's
 * package with R kept and h = (h/R)·R. A shape whose dome would not hold the chip's top corners is
 * skipped with the reason. The closed form assumes a hemisphere, so its line is flat: the trace shows
 * what the shape does.
 * @param pkg the scenario's package; its encapsulant must be a dome
 * @param values h/R values to trace, increasing, each in [0.05, 10]
 */
export function planShapeSweep(pkg: TracePackage, values: readonly number[] = DEFAULT_SHAPE_VALUES): SweepPlan {
  validateTracePackage(pkg);
  if (pkg.encapsulant.shape !== 'dome') throw new RangeError("encapsulant.shape must be 'dome' for a dome sweep");
  const xs = checkSweepValues('Dome shapes h/R', values, SHAPE_SWEEP_RANGE.min, SHAPE_SWEEP_RANGE.max);
  const R = pkg.encapsulant.radiusMm;
  // The closed form does not depend on the dome height.
  const eta = domeClosedForm(pkg).etaDome;

  const points: SweepPoint[] = [];
  const skipped: SkippedPoint[] = [];
  for (const x of xs) {
    const p = withEncapsulant(pkg, { heightMm: x * R });
    if (packageFits(p)) points.push({ x, pkg: p, closedForm: eta });
    else skipped.push({ x, reason: `at h/R = ${x} the dome is too flat to hold the chip's top corners` });
  }
  const ratio = pkg.encapsulant.heightMm / R;
  return {
    kind: 'shape',
    title: 'Extraction against dome shape h/R',
    xTitle: 'Dome height over radius h/R',
    points,
    closedFormLine: [
      { x: xs[0], y: eta },
      { x: xs[xs.length - 1], y: eta }
    ],
    closedFormLabel: 'Closed form (hemisphere, point source)',
    skipped,
    marker: null,
    currentX: ratio >= xs[0] && ratio <= xs[xs.length - 1] ? ratio : null
  };
}

