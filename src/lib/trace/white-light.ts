/**
 * A package made white: a phosphor setting (library phosphor by particles, or a coefficient table)
 * put into a traced package, traced, and summarised; and the phosphor load for a target CCT.
 *
 * Load for a target CCT: CCT falls as the load rises (more blue converted). The search traces each
 * trial load with the same seed (common random numbers: the noise of two nearby loads is strongly
 * correlated, so their CCT difference is smooth in the load), brackets the target by doubling the load,
 * then narrows the bracket by a secant step kept inside it, falling back to bisection (regula falsi with
 * a bisection guard; W. H. Press et al., Numerical Recipes, 3rd ed., §9.2–9.3).
 */
import { emissionRows, findPhosphor, type Phosphor } from '../phosphors/index';
import { coefficientsFromParticles, SILICONE_DENSITY_G_PER_CM3, type PhosphorRegion, type TracePhosphor } from './package-phosphor';
import type { TracePackage } from './package-spec';
import { phosphorSummary, type PhosphorSummary } from './phosphor-summary';
import { traceSync } from './trace';
import type { Tally } from './tally';

/** Rows of a Gaussian line of peak and full width at half maximum (nm), ±3 FWHM, at least 61 rows. */
export function gaussianRows(peakNm: number, fwhmNm: number): [number, number][] {
  const sigma = fwhmNm / (2 * Math.sqrt(2 * Math.LN2));
  const rows: [number, number][] = [];
  const n = 60;
  for (let i = 0; i <= n; i++) {
    const nm = peakNm - 3 * fwhmNm + (6 * fwhmNm * i) / n;
    rows.push([nm, Math.exp(-0.5 * ((nm - peakNm) / sigma) ** 2)]);
  }
  return rows;
}

/** The chip's spectrum rows from a scenario emission (one line, a Gaussian or a table). */
export function chipSpectrumRows(
  emission: { kind: 'single'; wavelengthNm: number } | { kind: 'gaussian'; peakNm: number; fwhmNm: number } | { kind: 'table'; rows: [number, number][] }
): [number, number][] {
  if (emission.kind === 'single') return [[emission.wavelengthNm, 1]];
  if (emission.kind === 'gaussian') return gaussianRows(emission.peakNm, emission.fwhmNm);
  return emission.rows.map(([a, b]) => [a, b]);
}

/** Where the phosphor sits: the whole encapsulant (default), or a layer of thickness T mm (body-phosphor.ts). */
export interface PhosphorPlacement {
  region?: PhosphorRegion;
  thicknessMm?: number;
}

/** A phosphor setting: particles of a library (or user) phosphor by load, or a measured coefficient table. */
export type PhosphorSetting = PhosphorPlacement &
  (
  | {
      kind: 'particles';
      phosphor: Phosphor;
      /** Weight percent of phosphor in the mixture, [0, 95]. */
      weightPercent: number;
      /** Particle diameter (single size), µm. */
      diameterUm: number;
      /** Quantum yield; default the phosphor's typical one. */
      quantumYield?: number;
      /** Emission rows; default the phosphor's band model. */
      emission?: [number, number][];
    }
  | { kind: 'table'; coefficients: [number, number, number, number][]; emission: [number, number][]; quantumYield: number }
  );

/** The library phosphor by id, or a RangeError naming the field. */
export function libraryPhosphor(id: string, field = 'phosphor'): Phosphor {
  const p = findPhosphor(id);
  if (!p) throw new RangeError(`${field}: unknown phosphor '${id}'`);
  return p;
}

/** Emission rows of a library phosphor (380–830 nm, 2 nm). */
function emissionOf(p: Phosphor): [number, number][] {
  return emissionRows(p, 380, 830, 2);
}

/** The package with the phosphor in its region (the whole encapsulant, or a layer of it). */
export function withPhosphor(pkg: TracePackage, setting: PhosphorSetting, chipSpectrum: [number, number][]): TracePackage {
  let phosphor: TracePhosphor;
  const placement = {
    region: setting.region ?? 'encapsulant',
    ...(setting.region && setting.region !== 'encapsulant' && setting.thicknessMm !== undefined ? { thicknessMm: setting.thicknessMm } : {})
  };
  if (setting.kind === 'table') {
    phosphor = { ...placement, coefficients: setting.coefficients, emission: setting.emission, quantumYield: setting.quantumYield, chipSpectrum };
  } else {
    const coefficients = coefficientsFromParticles({
      phosphor: setting.phosphor,
      weightFraction: setting.weightPercent / 100,
      size: { kind: 'single', diameterUm: setting.diameterUm },
      hostN: pkg.encapsulant.n,
      hostDensityGPerCm3: SILICONE_DENSITY_G_PER_CM3
    });
    phosphor = {
      ...placement,
      coefficients,
      emission: setting.emission ?? emissionOf(setting.phosphor),
      quantumYield: setting.quantumYield ?? setting.phosphor.quantumYield,
      chipSpectrum
    };
  }
  return { ...pkg, phosphor };
}

export interface WhiteTrace {
  tally: Tally;
  summary: PhosphorSummary;
}

/** Traces a white package (single thread) and summarises it. */
export function traceWhite(pkg: TracePackage, rays: number, seed: number, maxEvents = 10000): WhiteTrace {
  const tally = traceSync(pkg, { rays, seed, maxEvents });
  const summary = phosphorSummary(tally);
  if (!summary) throw new Error('traceWhite: the package holds no phosphor');
  return { tally, summary };
}

export interface LoadSearch {
  /** The load found (weight percent) and the summary of its trace. */
  weightPercent: number;
  summary: PhosphorSummary;
  /** Every trial: load and CCT (null beyond the locus' range). */
  trials: { weightPercent: number; cctK: number | null }[];
  converged: boolean;
}

/** Limits of the load search, weight percent. */
export const LOAD_SEARCH = { minPercent: 0.05, maxPercent: 60, toleranceK: 15, maxTrials: 14 } as const;

/**
 * The weight percent of a particle phosphor that gives `targetK`.
 * @param evaluate traces the package at a load (always with the same rays and seed: common random numbers)
 * @throws RangeError when the target is not reached inside LOAD_SEARCH's load range
 */
export async function loadForCct(evaluate: (weightPercent: number) => Promise<PhosphorSummary>, targetK: number): Promise<LoadSearch> {
  const trials: LoadSearch['trials'] = [];
  const results = new Map<number, PhosphorSummary>();
  // f(load) = CCT − target; a load whose light has no CCT counts as far above (too blue) or below (too yellow)
  const f = async (w: number): Promise<number> => {
    const r = await evaluate(w);
    results.set(w, r);
    const cct = r.color?.cctK ?? null;
    trials.push({ weightPercent: w, cctK: cct });
    if (cct !== null) return cct - targetK;
    return r.color && r.color.x < 0.3 ? 1e5 : -1e5;
  };
  const L = LOAD_SEARCH;
  let lo = 0.5;
  let flo = await f(lo);
  while (flo < 0 && lo > L.minPercent) {
    lo = Math.max(L.minPercent, lo / 3);
    flo = await f(lo);
  }
  if (flo < 0) throw new RangeError(`target CCT ${targetK} K: even ${L.minPercent} wt% gives a lower CCT`);
  let hi = lo * 3;
  let fhi = await f(hi);
  while (fhi > 0 && hi < L.maxPercent) {
    lo = hi;
    flo = fhi;
    hi = Math.min(L.maxPercent, hi * 2);
    fhi = await f(hi);
  }
  if (fhi > 0) throw new RangeError(`target CCT ${targetK} K: not reached by ${L.maxPercent} wt% (the CCT stays above it)`);
  let best = Math.abs(flo) < Math.abs(fhi) ? lo : hi;
  let fbest = Math.min(Math.abs(flo), Math.abs(fhi));
  let converged = fbest <= L.toleranceK;
  for (let i = 0; !converged && trials.length < L.maxTrials; i++) {
    // Secant inside the bracket when both ends have a CCT; bisection otherwise and every third step
    const secant = Math.abs(flo) < 1e4 && Math.abs(fhi) < 1e4 && i % 3 !== 2;
    let w = secant ? lo + ((hi - lo) * flo) / (flo - fhi) : 0.5 * (lo + hi);
    if (!(w > lo && w < hi)) w = 0.5 * (lo + hi);
    const fw = await f(w);
    if (Math.abs(fw) < fbest) {
      best = w;
      fbest = Math.abs(fw);
    }
    if (fw > 0) {
      lo = w;
      flo = fw;
    } else {
      hi = w;
      fhi = fw;
    }
    converged = fbest <= L.toleranceK || hi - lo < 1e-3;
  }
  return { weightPercent: best, summary: results.get(best)!, trials, converged };
}
