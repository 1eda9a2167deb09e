/**
 * Closed-form dome extraction against encapsulant index, from 1.0 (no encapsulant) up to the chip
 * index, for a chart: η_dome(n) = η_F(nChip → n) · (1 − R_normal(n → nOut)) (see optics/dome-estimate.ts;
 * Schubert, Light-Emitting Diodes, 2nd ed., ch. 5).
 */
import { escapeCone, normalReflectance } from '../optics/index';
import { LIMITS } from '../scenario/limits';

export interface ExtractionCurve {
  /** Encapsulant indices, ascending from 1 to nChip. */
  n: number[];
  /** η_dome at each index. */
  etaDome: number[];
}

/**
 * η_dome on `points` evenly spaced indices in [1, nChip].
 * @param nChip chip index, (1, 6] (LIMITS.indexN, above 1 so the range is not empty)
 * @param nOut outside index, LIMITS.indexN
 * @param points samples, integer in [2, 1000] (default 61)
 * @example extractionCurve(2.45, 1, 2).etaDome[0] // η_F(2.45 → 1) ≈ 0.03408 (at n = 1 there is no dome surface)
 */
export function extractionCurve(nChip: number, nOut: number, points = 61): ExtractionCurve {
  const N = LIMITS.indexN;
  if (typeof nChip !== 'number' || !(nChip > N.min && nChip <= N.max)) throw new RangeError(`nChip must be a number in (${N.min}, ${N.max}] (got ${String(nChip)})`);
  if (typeof nOut !== 'number' || !(nOut >= N.min && nOut <= N.max)) throw new RangeError(`nOut must be a number in [${N.min}, ${N.max}] (got ${String(nOut)})`);
  if (!Number.isInteger(points) || points < 2 || points > 1000) throw new RangeError(`points must be an integer in [2, 1000] (got ${String(points)})`);
  const n: number[] = [];
  const etaDome: number[] = [];
  for (let i = 0; i < points; i++) {
    const ni = i === points - 1 ? nChip : 1 + ((nChip - 1) * i) / (points - 1);
    n.push(ni);
    // η_dome = η_F(nChip → n) · (1 − R_normal(n → nOut))
    etaDome.push(escapeCone(nChip, ni).fresnel * (1 - normalReflectance(ni, 0, nOut, 0)));
  }
  return { n, etaDome };
}
