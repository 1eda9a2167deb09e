/**
 * Adaptive Gauss–Kronrod quadrature (7-point Gauss, 15-point Kronrod), for the angle integrals of the
 * escape cone and of stacks. Edge use only: it calls a closure per node.
 *
 * Nodes and weights: R. Piessens, E. de Doncker-Kapenga, C. W. Überhuber, D. K. Kahaner,
 * QUADPACK (Springer, 1983), routine QK15.
 */

// Kronrod abscissae on [−1, 1], non-negative half; odd entries (1, 3, 5, 7) are the Gauss nodes.
const XGK = [
  0.991455371120812639206854697526329, 0.949107912342758524526189684047851,
  0.864864423359769072789712788640926, 0.741531185599394439863864773280788,
  0.586087235467691130294144845693013, 0.405845151377397166906606412076961,
  0.207784955007898467600689403773245, 0
];
const WGK = [
  0.02293532201052922496373200805897, 0.063092092629978553290700663189204,
  0.104790010322250183839876322541518, 0.140653259715525918745189590510238,
  0.16900472663926790282658342659855, 0.190350578064785409913256402421014,
  0.204432940075298892414161999234649, 0.209482141084727828012999174891714
];
// Gauss weights for XGK[1], XGK[3], XGK[5], XGK[7]
const WG = [
  0.129484966168869693270611432679082, 0.27970539148927666790146777142378,
  0.381830050505118944950369775488975, 0.417959183673469387755102040816327
];

/** Tolerances of {@link integrate}. */
export interface QuadratureOptions {
  /** absolute error goal (default 1e-14) */
  absTol?: number;
  /** relative error goal (default 1e-13) */
  relTol?: number;
  /** most sub-intervals before giving up refining (default 4000) */
  maxIntervals?: number;
}

/** One 15-point Kronrod rule on [a, b]; writes [K15, |K15 − G7|] into res. */
function kronrod15(f: (x: number) => number, a: number, b: number, res: Float64Array): void {
  const c = 0.5 * (a + b);
  const h = 0.5 * (b - a);
  const fc = f(c);
  let k = WGK[7] * fc;
  let g = WG[3] * fc;
  for (let j = 0; j < 7; j++) {
    const dx = h * XGK[j];
    const s = f(c - dx) + f(c + dx);
    k += WGK[j] * s;
    if (j % 2 === 1) g += WG[(j - 1) / 2] * s;
  }
  res[0] = k * h;
  res[1] = Math.abs((k - g) * h);
}

/**
 * ∫_a^b f(x) dx by globally adaptive Gauss–Kronrod (G7/K15): the interval with the largest error
 * estimate is bisected until the summed estimate ≤ max(absTol, relTol·|I|) or maxIntervals is reached.
 * The K15 rule is exact for polynomials of degree ≤ 22. f must be finite on [a, b] (endpoints are never
 * evaluated, so an integrable endpoint singularity is tolerated, but converges slowly: see
 * {@link integrateSmoothEnds}).
 * @see Piessens et al., QUADPACK (1983), routines QAG/QK15
 */
export function integrate(
  f: (x: number) => number,
  a: number,
  b: number,
  options: QuadratureOptions = {}
): number {
  if (a === b) return 0;
  const absTol = options.absTol ?? 1e-14;
  const relTol = options.relTol ?? 1e-13;
  const maxIntervals = options.maxIntervals ?? 4000;
  const res = new Float64Array(2);
  const lo: number[] = [a];
  const hi: number[] = [b];
  kronrod15(f, a, b, res);
  const val: number[] = [res[0]];
  const err: number[] = [res[1]];
  let total = res[0];
  let totalErr = res[1];
  while (totalErr > Math.max(absTol, relTol * Math.abs(total)) && lo.length < maxIntervals) {
    // Bisect the interval with the largest error estimate
    let worst = 0;
    for (let i = 1; i < err.length; i++) if (err[i] > err[worst]) worst = i;
    const l = lo[worst];
    const r = hi[worst];
    const m = 0.5 * (l + r);
    if (m <= Math.min(l, r) || m >= Math.max(l, r)) break; // interval exhausted at machine precision
    kronrod15(f, l, m, res);
    const v1 = res[0];
    const e1 = res[1];
    kronrod15(f, m, r, res);
    total += v1 + res[0] - val[worst];
    totalErr += e1 + res[1] - err[worst];
    hi[worst] = m;
    val[worst] = v1;
    err[worst] = e1;
    lo.push(m);
    hi.push(r);
    val.push(res[0]);
    err.push(res[1]);
  }
  // Re-sum to shed the drift of the running total
  let sum = 0;
  for (let i = 0; i < val.length; i++) sum += val[i];
  return sum;
}

/**
 * ∫_a^b f(x) dx after the change of variable x = a + (b − a)(3t² − 2t³), dx = 6(b − a) t(1 − t) dt,
 * which turns square-root endpoint behaviour f ~ √(b − x) (the Fresnel transmittance at a critical
 * angle) into a smooth integrand, so the Gauss–Kronrod rule converges fast again.
 * Since b − x = (b − a)(1 − t)²(1 + 2t), √(b − x) becomes (1 − t)·√((b − a)(1 + 2t)).
 * @see P. J. Davis, P. Rabinowitz, Methods of Numerical Integration, 2nd ed., §2.9 (change of variable)
 */
export function integrateSmoothEnds(
  f: (x: number) => number,
  a: number,
  b: number,
  options: QuadratureOptions = {}
): number {
  const w = b - a;
  return integrate((t) => f(a + w * t * t * (3 - 2 * t)) * 6 * w * t * (1 - t), 0, 1, options);
}
