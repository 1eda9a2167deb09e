import type { TracePackage } from '../trace/package-spec';
import { validateTracePackage } from '../trace/package-spec';
import { domeClosedForm } from './dome-closed-form';
import { packageFits } from './package-fits';
import type { SkippedPoint, SweepPlan, SweepPoint } from './sweep-plan';
import { checkSweepValues, evenGrid } from './sweep-values';
import { withEncapsulant } from './vary-package';

/**
 * Dome radii traced by default, as R over the chip's half-diagonal r: dense from 1.05 to 1.6, where
 * the no-TIR size r·n_enc/n_out of common silicones and epoxies lies (1.41–1.57 in air), then out to 4.
 */
export const DEFAULT_RADIUS_VALUES: readonly number[] = [1.05, 1.1, 1.2, 1.3, 1.4, 1.5, 1.6, 1.8, 2, 2.5, 3, 4];

/** Allowed R / r for the sweep. */
export const RADIUS_SWEEP_RANGE = { min: 1, max: 10_000 } as const;

/**
 * Extraction against the dome radius R relative to the chip's half-diagonal r = ½√(w² + l²): the
 * scenario's package with R = x·r and the dome's shape h/R kept. Radii too small to hold the chip's
 * top corners are skipped with the reason. The marker is the no-TIR radius r·n_enc/n_out (sine rule:
 * a ray from distance r off the centre meets the sphere at sin θ ≤ r/R), below which rays from the
 * chip's corners can be totally reflected at the dome.
 * @param pkg the scenario's package; its encapsulant must be a dome
 * @param values R/r values to trace, increasing, each in [1, 10000]
 * @see M. Born, E. Wolf, Principles of Optics, §4.2.3 (aplanatic points of a sphere) — the r = R/n boundary
 */
export function planRadiusSweep(pkg: TracePackage, values: readonly number[] = DEFAULT_RADIUS_VALUES): SweepPlan {
  validateTracePackage(pkg);
  if (pkg.encapsulant.shape !== 'dome') throw new RangeError("encapsulant.shape must be 'dome' for a dome sweep");
  const xs = checkSweepValues('Dome radii R/r', values, RADIUS_SWEEP_RANGE.min, RADIUS_SWEEP_RANGE.max);
  const r = 0.5 * Math.hypot(pkg.chip.widthMm, pkg.chip.lengthMm);
  const shape = pkg.encapsulant.heightMm / pkg.encapsulant.radiusMm;
  const at = (x: number) => withEncapsulant(pkg, { radiusMm: x * r, heightMm: shape * x * r });

  const points: SweepPoint[] = [];
  const skipped: SkippedPoint[] = [];
  for (const x of xs) {
    const p = at(x);
    if (packageFits(p)) points.push({ x, pkg: p, closedForm: domeClosedForm(p).etaDome });
    else skipped.push({ x, reason: `at R/r = ${x} the dome is too small to hold the chip's top corners` });
  }
  const first = xs[0];
  const last = xs[xs.length - 1];
  const line = (xs.length > 1 ? evenGrid(first, last, 4 * (xs.length - 1)) : xs).map((x) => ({
    x,
    y: domeClosedForm(withEncapsulant(pkg, { radiusMm: x * r })).etaDome
  }));
  const noTir = domeClosedForm(pkg).minRadiusNoTirMm / r;
  const current = pkg.encapsulant.radiusMm / r;
  return {
    kind: 'radius',
    title: 'Extraction against dome radius',
    xTitle: "Dome radius over the chip's half-diagonal R/r",
    points,
    closedFormLine: line,
    closedFormLabel: 'Closed form (point source, one face)',
    skipped,
    marker: { x: noTir, label: `No total internal reflection from here (no-TIR radius): R/r = ${Number(noTir.toPrecision(3))}` },
    currentX: current >= first && current <= last ? current : null
  };
}
