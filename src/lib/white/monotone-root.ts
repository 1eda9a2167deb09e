/**
 * The root of a monotone function of one variable on [lo, hi] from a warm start: bracket it by steps
 * that grow away from the start (by `growth`, squared at each step, at most doubling), then narrow the bracket by Illinois regula falsi, falling back to
 * bisection when a trial has no finite value (D. Dowell, P. Jarratt, BIT 11, 168 (1971); W. H. Press
 * et al., Numerical Recipes, 3rd ed., §9.2–9.3). Meant for Monte Carlo functions evaluated with common
 * random numbers: there the noise of nearby trials is correlated, so the function is monotone and
 * nearly smooth at the scale of the tolerance, and the search never needs a derivative.
 */

export interface MonotoneRootOptions {
  lo: number;
  hi: number;
  /** First trial, inside [lo, hi]. */
  start: number;
  /** Smallest step away from the start (also the step off `lo` when the start is lo = 0). */
  minStep: number;
  /** First bracketing factor (> 1; default 2): a warm start close to the root steps by less; it squares at each further step. */
  growth?: number;
  /** Done when |f(x)| ≤ tolerance, or ≤ tolerance(x) (read after f(x): a Monte Carlo trial's own σ). */
  tolerance: number | ((x: number) => number);
  /** Done (not converged) when the bracket is narrower than this. */
  xTolerance: number;
  maxEvaluations: number;
  /** Whether f rises with x (false: it falls, like CCT against phosphor load). */
  increasing: boolean;
}

export type MonotoneRoot =
  | { status: 'converged' | 'not converged'; x: number; fx: number; evaluations: number }
  /** 'below': f is already past zero at lo; 'above': f has not reached zero by hi. x, fx: the end tried. */
  | { status: 'below' | 'above'; x: number; fx: number; evaluations: number };

/**
 * @param f residual (target − value or value − target); ±Infinity allowed for "far on that side"
 */
export async function monotoneRoot(f: (x: number) => Promise<number>, o: MonotoneRootOptions): Promise<MonotoneRoot> {
  let evaluations = 0;
  // g rises with x whatever f does, so "g < 0" always means "x too small"
  const g = async (x: number) => {
    evaluations++;
    const v = await f(x);
    return o.increasing ? v : -v;
  };
  let x = Math.min(o.hi, Math.max(o.lo, o.start));
  let gx = await g(x);
  let best = { x, gx };
  const keep = (xx: number, gg: number) => {
    if (Math.abs(gg) < Math.abs(best.gx)) best = { x: xx, gx: gg };
  };
  const sign = (v: number) => (o.increasing ? v : -v);
  const within = (xx: number, gg: number) => Math.abs(gg) <= (typeof o.tolerance === 'number' ? o.tolerance : o.tolerance(xx));
  if (within(x, gx)) return { status: 'converged', x, fx: sign(gx), evaluations };
  // Bracket: step away from the start, doubling, until g changes sign or the range ends
  let a: number, ga: number, b: number, gb: number;
  let factor = Math.max(1.01, o.growth ?? 2);
  if (gx < 0) {
    a = x; ga = gx;
    for (;;) {
      if (a >= o.hi) return { status: 'above', x: a, fx: sign(ga), evaluations };
      const next = Math.min(o.hi, Math.max(factor * a, a + o.minStep));
      factor = Math.min(2, factor * factor);
      const gn = await g(next);
      keep(next, gn);
      if (within(next, gn)) return { status: 'converged', x: next, fx: sign(gn), evaluations };
      if (gn > 0) { b = next; gb = gn; break; }
      a = next; ga = gn;
      if (evaluations >= o.maxEvaluations) return { status: 'not converged', x: best.x, fx: sign(best.gx), evaluations };
    }
  } else {
    b = x; gb = gx;
    for (;;) {
      if (b <= o.lo) return { status: 'below', x: b, fx: sign(gb), evaluations };
      const next = b / factor < o.lo + o.minStep ? o.lo : b / factor;
      factor = Math.min(2, factor * factor);
      const gn = await g(next);
      keep(next, gn);
      if (within(next, gn)) return { status: 'converged', x: next, fx: sign(gn), evaluations };
      if (gn < 0) { a = next; ga = gn; break; }
      b = next; gb = gn;
      if (evaluations >= o.maxEvaluations) return { status: 'not converged', x: best.x, fx: sign(best.gx), evaluations };
    }
  }
  // Narrow: Illinois regula falsi (halve the weight of an end kept twice), bisection when an end is infinite
  let side = 0;
  while (evaluations < o.maxEvaluations && b - a > o.xTolerance) {
    const finite = Number.isFinite(ga) && Number.isFinite(gb);
    let m = finite ? (a * gb - b * ga) / (gb - ga) : 0.5 * (a + b);
    if (!(m > a && m < b)) m = 0.5 * (a + b);
    const gm = await g(m);
    keep(m, gm);
    if (within(m, gm)) return { status: 'converged', x: m, fx: sign(gm), evaluations };
    if (gm < 0) {
      a = m; ga = gm;
      if (side === -1) gb /= 2;
      side = -1;
    } else {
      b = m; gb = gm;
      if (side === 1) ga /= 2;
      side = 1;
    }
  }
  // Not settled: the best trial, or where the bracket closed when no trial had a finite value
  if (!Number.isFinite(best.gx)) return { status: 'not converged', x: 0.5 * (a + b), fx: sign(best.gx), evaluations };
  return { status: 'not converged', x: best.x, fx: sign(best.gx), evaluations };
}
