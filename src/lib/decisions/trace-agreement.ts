/**
 * Does a Monte Carlo trace of the ranked candidates keep the closed-form order? For each neighbouring
 * pair (closed form says a ≥ b) the traced difference d = η_a − η_b is compared with its standard error
 * σ_d = √(σ_a² + σ_b²) (independent runs: different seeds):
 *   d > −kσ_d   the trace agrees with the order (within noise);
 *   d >  kσ_d   the trace also resolves the pair (the difference is real at k σ).
 * Source: the standard error of a difference of independent binomial estimates (common practice).
 */

export interface TracedCandidate {
  id: string;
  name: string;
  /** Traced extraction and its standard error, both fractions. */
  extraction: number;
  stderr: number;
}

export interface PairAgreement {
  higher: string;
  lower: string;
  /** η_higher − η_lower from the trace. */
  difference: number;
  /** √(σ_higher² + σ_lower²). */
  sigma: number;
  agrees: boolean;
  resolved: boolean;
}

/**
 * Pairwise check of traced candidates given in closed-form order (best first).
 * @param k standard errors allowed, > 0 (default 3)
 */
export function traceAgreement(candidates: readonly TracedCandidate[], k = 3): { pairs: PairAgreement[]; allAgree: boolean } {
  if (!(typeof k === 'number' && k > 0 && k < Infinity)) throw new RangeError(`k must be a finite number > 0 (got ${String(k)})`);
  const pairs: PairAgreement[] = [];
  for (let i = 1; i < candidates.length; i++) {
    const a = candidates[i - 1];
    const b = candidates[i];
    const difference = a.extraction - b.extraction;
    // σ of a difference of independent estimates
    const sigma = Math.hypot(a.stderr, b.stderr);
    pairs.push({ higher: a.name, lower: b.name, difference, sigma, agrees: difference > -k * sigma, resolved: difference > k * sigma });
  }
  return { pairs, allAgree: pairs.every((p) => p.agrees) };
}
