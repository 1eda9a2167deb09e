/**
 * Closed-form dome extraction against encapsulant index, from 1.0 (no encapsulant) up to the chip
 * index, for a chart: η_dome(n) = η_F(nChip → n) · (1 − R_normal(n → nOut)) (see optics/dome-estimate.ts;
 * Schubert, Light-Emitting Diodes, 2nd ed., ch. 5).
 */
import { escapeCone, normalReflectance } from '../optics/index';

export interface ExtractionCurve {
  /** Encapsulant indices, ascending from 1 to nChip. */
  n: number[];
  /** η_dome at each index. */
  etaDome: number[];
}

/**
 * η_dome on `points` evenly spaced indices in [1, nChip].
 * @param nChip chip index, (1, 6]
 * @param nOut outside index, [1, 3]
 * @param points samples, integer in [2, 1000] (default 61)
 * @example extractionCurve(2.45, 1, 2).etaDome[0] // η_F(2.45 → 1) ≈ 0.03408 (at n = 1 there is no dome surface)
 */
export function extractionCurve(nChip: number, nOut: number, points = 61): ExtractionCurve {
  if (typeof nChip !== 'number' || !(nChip > 1 && nChip <= 6)) throw new RangeError(`nChip must be a number in (1, 6] (got ${String(nChip)})`);
  if (typeof nOut !== 'number' || !(nOut >= 1 && nOut <= 3)) throw new RangeError(`nOut must be a number in [1, 3] (got ${String(nOut)})`);
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
