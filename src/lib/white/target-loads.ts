/**
 * The phosphor load(s) that reach a target colour.
 * - One phosphor: the weight percent whose light has the target CCT (CCT falls as the load rises).
 * - Two phosphors (a yellow or green one and a red one): the pair of weight percents whose light has the
 *   target CCT and the target Duv (0: on the Planckian locus). Nested one-dimensional searches: for a
 *   red load r, the main load y*(r) that meets the CCT (its isotherm); then r such that Duv(y*(r), r)
 *   meets the target. Along the isotherm, red light pulls the chromaticity below the locus, so Duv
 *   falls as r rises; each inner search starts from the last one's answer.
 * Every evaluation traces with the same rays and seed (common random numbers), so two trials differ
 * by the loads, not by fresh noise, and the monotone searches (monotone-root.ts) see a nearly smooth
 * function. A target out of reach is a RangeError saying which limit stops it and where.
 */
import { planckianUv, type PlanckianPoint } from '../color/index';
import type { PhosphorSummary } from '../trace/phosphor-summary';
import { MAX_TOTAL_WEIGHT_PERCENT } from './phosphor-mix';
import { monotoneRoot, type MonotoneRoot } from './monotone-root';

/** Traces the package with these loads (wt%, one per phosphor) — always the same rays and seed. */
export type EvaluateLoads = (loads: readonly number[]) => Promise<PhosphorSummary>;

export interface ColourTarget {
  cctK: number;
  /** Target Duv for a pair (default 0, the Planckian locus); ignored for one phosphor. */
  duv?: number;
}

export interface LoadTrial {
  loads: number[];
  cctK: number | null;
  duv: number | null;
}

export interface LoadsFound {
  /** Weight percent of each phosphor, in the order given. */
  loads: number[];
  summary: PhosphorSummary;
  trials: LoadTrial[];
  /** Within the tolerances (CCT, and Duv for a pair). */
  converged: boolean;
}

/** Tolerances and limits of the searches. */
export const TARGET_SEARCH = {
  /** CCT tolerance, K (or the trace's σ(CCT) when larger). */
  toleranceK: 15,
  /** Duv tolerance (or σ(Duv) when larger): about a quarter of a 4-step ellipse's size (common practice). */
  toleranceDuv: 0.001,
  minLoadPercent: 0.02,
  firstLoadPercent: 8,
  firstRedPercent: 0.5,
  maxEvaluations: 64,
  innerEvaluations: 12
} as const;

/**
 * Residual "CCT − target" of a trace. Where the light has no CCT (more than 0.05 from the locus), the
 * side of the target's isotherm it lies on: the isotherm is the line through the Planckian point at the
 * target, normal to the locus in CIE 1960 u, v (CIE 015:2018 §9.5); a point ahead of it along the
 * locus' tangent dP/dT lies on the hotter side (+Infinity), a point behind on the cooler (−Infinity).
 */
function cctResidual(s: PhosphorSummary, targetK: number, isotherm: PlanckianPoint): number {
  const c = s.color;
  if (c?.cctK != null) return c.cctK - targetK;
  if (!c) return Infinity;
  const along = (c.uPrime - isotherm.u) * isotherm.duDT + ((2 * c.vPrime) / 3 - isotherm.v) * isotherm.dvDT;
  return along > 0 ? Infinity : -Infinity;
}

const fmtLoad = (w: number) => `${w.toFixed(2)} wt%`;

/**
 * @param evaluate traces at the given loads (one entry per phosphor: [main] or [main, red])
 * @param names the phosphors' names, for messages
 * @param onTrial called after each trace with the number of trials so far
 * @throws RangeError when the target is out of reach, naming why
 */
export async function loadsForTarget(
  evaluate: EvaluateLoads,
  target: ColourTarget,
  names: readonly string[],
  onTrial: (trials: number) => void = () => {}
): Promise<LoadsFound> {
  const pair = names.length === 2;
  const T = TARGET_SEARCH;
  const trials: LoadTrial[] = [];
  const cache = new Map<string, PhosphorSummary>();
  const keyOf = (loads: readonly number[]) => loads.map((w) => w.toPrecision(12)).join(',');
  const trace = async (loads: number[]): Promise<PhosphorSummary> => {
    const key = keyOf(loads);
    const hit = cache.get(key);
    if (hit) return hit;
    if (trials.length >= T.maxEvaluations) throw new SearchBudget();
    const s = await evaluate(loads);
    cache.set(key, s);
    trials.push({ loads: [...loads], cctK: s.color?.cctK ?? null, duv: s.color?.duv ?? null });
    onTrial(trials.length);
    return s;
  };
  const tolK = (s: PhosphorSummary | undefined) => Math.max(T.toleranceK, s?.color?.sigma.cctK ?? 0);
  const tolDuv = (s: PhosphorSummary | undefined) => Math.max(T.toleranceDuv, s?.color?.sigma.duv ?? 0);
  const targetDuv = target.duv ?? 0;
  const isotherm = planckianUv(target.cctK);

  // The main load for the CCT at a fixed red load (the isotherm), warm-started: from the line through
  // the last two solutions (y against r along the isotherm), or the last one, and then in small steps
  const solved: { red: number; main: number }[] = [];
  const mainStartFor = (red: number): number => {
    if (!solved.length) return T.firstLoadPercent;
    const [p, q] = solved.slice(-2);
    if (!q || q.red === p.red) return solved[solved.length - 1].main;
    const y = q.main + ((red - q.red) * (q.main - p.main)) / (q.red - p.red);
    // Kept within a factor of two of the last solution: the isotherm is curved, the trials noisy
    return Number.isFinite(y) ? Math.min(2 * q.main, Math.max(0.5 * q.main, y)) : q.main;
  };
  const mainFor = async (red: number): Promise<{ root: MonotoneRoot; summary: PhosphorSummary }> => {
    const hi = MAX_TOTAL_WEIGHT_PERCENT - red;
    const mainStart = mainStartFor(red);
    const warm = solved.length > 0;
    const at = (y: number) => (pair ? [y, red] : [y]);
    const root = await monotoneRoot(
      async (y) => cctResidual(await trace(at(y)), target.cctK, isotherm),
      // Each trial is judged against its own σ(CCT): no finer than its noise (the trace is cached)
      { lo: T.minLoadPercent, hi, start: Math.min(mainStart, hi), minStep: 0.05, growth: warm ? 1.15 : 2, tolerance: (y) => tolK(cache.get(keyOf(at(y)))), xTolerance: 1e-3, maxEvaluations: T.innerEvaluations, increasing: false }
    );
    const summary = await trace(pair ? [root.x, red] : [root.x]);
    if (root.status === 'converged') solved.push({ red, main: root.x });
    return { root, summary };
  };

  const cctOf = (s: PhosphorSummary) => (s.color?.cctK != null ? `${s.color.cctK.toFixed(0)} K` : 'no CCT (too far from the locus)');
  const offLocus = (s: PhosphorSummary, name: string): RangeError =>
    new RangeError(
      `target CCT ${target.cctK} K is out of reach for ${name} alone: its light does not come within 0.05 of the Planckian locus near that isotherm, and no CCT is defined beyond that (nearest trial ${s.color?.cctK != null ? `${s.color.cctK.toFixed(0)} K` : 'no CCT'}, Duv ${s.color?.duv?.toFixed(3) ?? '—'}) — mix in a red phosphor`
    );
  const unreachableMain = (root: MonotoneRoot, s: PhosphorSummary, red: number): RangeError => {
    const withRed = red > 0 ? ` with ${fmtLoad(red)} of ${names[1]}` : '';
    return root.status === 'below'
      ? new RangeError(`target CCT ${target.cctK} K is out of reach: even ${fmtLoad(root.x)} of ${names[0]}${withRed} gives ${cctOf(s)}, below the target`)
      : new RangeError(`target CCT ${target.cctK} K is out of reach: ${fmtLoad(root.x)} of ${names[0]}${withRed} (the most allowed) still gives ${cctOf(s)}`);
  };

  /** Duv − target of an inner result, ±Infinity when it did not reach the isotherm near the locus. */
  const duvResidual = (m: { root: MonotoneRoot; summary: PhosphorSummary }): number => {
    if (m.root.status === 'below') return -Infinity; // so much red that no main load is cool enough
    if (m.root.status === 'above') return Infinity; // the CCT stays above the target: more red needed
    const c = m.summary.color;
    // Off the isotherm (the inner search did not settle) or off the locus: only the Duv's side counts
    const onIsotherm = c?.cctK != null && Math.abs(c.cctK - target.cctK) <= 3 * tolK(m.summary);
    if (!onIsotherm || c?.duv == null) return (c?.duv ?? 1) > targetDuv ? Infinity : -Infinity;
    return c.duv - targetDuv;
  };

  try {
    const first = await mainFor(0);
    if (!pair && first.root.status === 'above' && first.summary.color?.cctK == null) throw offLocus(first.summary, names[0]);
    if (first.root.status === 'below' || (!pair && first.root.status === 'above')) throw unreachableMain(first.root, first.summary, 0);
    if (!pair) {
      const c = first.summary.color;
      // Not converged and far off: the trials straddle the isotherm where the light has no CCT (|Duv| > 0.05)
      if (c?.cctK == null || (first.root.status !== 'converged' && Math.abs(c.cctK - target.cctK) > 3 * tolK(first.summary))) throw offLocus(first.summary, names[0]);
      return { loads: [first.root.x], summary: first.summary, trials, converged: first.root.status === 'converged' };
    }
    // Duv along the isotherm against the red load; the main phosphor alone may not reach the isotherm at all
    const at0 = duvResidual(first);
    if (at0 < -tolDuv(first.summary)) {
      throw new RangeError(
        `target Duv ${targetDuv} is out of reach: ${names[0]} alone gives Duv ${first.summary.color!.duv!.toFixed(4)} at ${target.cctK} K, already below it, and ${names[1]} only lowers Duv — choose a greener main phosphor or a lower target Duv`
      );
    }
    let found = first;
    let foundRed = 0;
    let foundGap = Math.abs(at0);
    const duvTol = Number.isFinite(at0) ? tolDuv(first.summary) : TARGET_SEARCH.toleranceDuv;
    const outer = await monotoneRoot(
      async (red) => {
        if (red === 0) return at0;
        const m = await mainFor(red);
        const r = duvResidual(m);
        if (Math.abs(r) < foundGap) {
          found = m;
          foundRed = red;
          foundGap = Math.abs(r);
        }
        return r;
      },
      { lo: 0, hi: MAX_TOTAL_WEIGHT_PERCENT / 2, start: T.firstRedPercent, minStep: 0.05, tolerance: duvTol, xTolerance: 1e-3, maxEvaluations: 10, increasing: false }
    );
    if (outer.status === 'above') {
      throw new RangeError(`target Duv ${targetDuv} is out of reach: up to ${fmtLoad(outer.x)} of ${names[1]} the light at ${target.cctK} K stays above it`);
    }
    if (!Number.isFinite(foundGap)) {
      throw new RangeError(`target ${target.cctK} K at Duv ${targetDuv} is out of reach: no pair of loads of ${names[0]} and ${names[1]} tried meets the isotherm near the locus`);
    }
    const ok = outer.status === 'converged' && found.root.status === 'converged';
    return { loads: [found.root.x, foundRed], summary: found.summary, trials, converged: ok };
  } catch (error) {
    if (!(error instanceof SearchBudget)) throw error;
    throw new RangeError(`the search did not settle within ${T.maxEvaluations} traces; try more rays (less noise) or a target nearer the phosphors' reach`);
  }
}

/** Thrown inside the search when its trace budget is spent. */
class SearchBudget extends Error {}

/** What a phosphor load costs against the same package without phosphor. */
export interface LoadCost {
  /** 1 − photons out with phosphor / photons out without. */
  photonCost: number;
  /** 1 − watts out with phosphor / watts out without. */
  energyCost: number;
  /** Lumens per watt of chip light: LER × watts out / watts of chip light. */
  lumensPerWattOfChip: number | null;
}

/**
 * @param clearEfficiency escaped / launched of the package without phosphor (photons = watts there: no conversion)
 */
export function loadCost(s: PhosphorSummary, clearEfficiency: number): LoadCost {
  return {
    photonCost: clearEfficiency > 0 ? 1 - s.photonEfficiency / clearEfficiency : 0,
    energyCost: clearEfficiency > 0 ? 1 - s.energyEfficiency / clearEfficiency : 0,
    lumensPerWattOfChip: s.color ? s.color.lerLmPerW * s.energyEfficiency : null
  };
}
