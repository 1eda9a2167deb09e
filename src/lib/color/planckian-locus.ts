/**
 * Dataset builder for a CIE 1931 chromaticity diagram: the Planckian locus as x, y points and, at
 * chosen temperatures, isotherm ticks — short segments normal to the locus in CIE 1960 u, v (where
 * isotherms are defined), running from Duv = −δ to +δ and mapped back to x, y.
 * @see CIE 015:2018 §9.5 (CCT and isotemperature lines in the CIE 1960 UCS diagram)
 */
import { xyFromUv, type Xy } from './chromaticity';
import { planckianUv } from './planck';

export interface Isotherm {
  cctK: number;
  /** Locus point and the tick's two ends (Duv −δ, +δ), CIE 1931 x, y. */
  center: Xy;
  below: Xy;
  above: Xy;
}

export interface PlanckianLocus {
  points: (Xy & { cctK: number })[];
  isotherms: Isotherm[];
}

/**
 * Planckian locus and isotherm ticks.
 * @param options.fromK, toK locus span, K (default 1000–25000, within 1000–100000)
 * @param options.points locus points, spaced evenly in reciprocal temperature (default 120, 2–2000)
 * @param options.isothermsK temperatures of the ticks (default 2000, 2500, 3000, 3500, 4000, 5000, 6500, 10000 K)
 * @param options.isothermDuv half-length δ of each tick in Duv (default 0.02)
 */
export function planckianLocus(options: { fromK?: number; toK?: number; points?: number; isothermsK?: number[]; isothermDuv?: number } = {}): PlanckianLocus {
  const fromK = options.fromK ?? 1000;
  const toK = options.toK ?? 25000;
  const count = options.points ?? 120;
  const duv = options.isothermDuv ?? 0.02;
  if (!(fromK >= 1000 && toK <= 100000 && toK > fromK)) throw new RangeError(`locus span must lie within 1000–100000 K, fromK < toK (got ${fromK}–${toK})`);
  if (!(Number.isInteger(count) && count >= 2 && count <= 2000)) throw new RangeError(`points must be a whole number from 2 to 2000 (got ${count})`);
  if (!(duv > 0 && duv <= 0.05)) throw new RangeError(`isothermDuv must be above 0 and at most 0.05 (got ${duv})`);
  const points = [];
  for (let i = 0; i < count; i++) {
    // even in mired: the locus bends most at low temperature
    const cctK = 1 / (1 / fromK + ((1 / toK - 1 / fromK) * i) / (count - 1));
    const p = planckianUv(cctK);
    points.push({ ...xyFromUv(p), cctK });
  }
  const isotherms = (options.isothermsK ?? [2000, 2500, 3000, 3500, 4000, 5000, 6500, 10000]).map((cctK) => {
    if (!(cctK >= 1000 && cctK <= 100000)) throw new RangeError(`isotherm temperatures must be from 1000 to 100000 K (got ${cctK})`);
    const p = planckianUv(cctK);
    // Unit normal to the locus, pointing to +Duv (above the locus: larger v)
    const len = Math.hypot(p.duDT, p.dvDT);
    let nu = -p.dvDT / len;
    let nv = p.duDT / len;
    if (nv < 0) { nu = -nu; nv = -nv; }
    return {
      cctK,
      center: xyFromUv(p),
      below: xyFromUv({ u: p.u - duv * nu, v: p.v - duv * nv }),
      above: xyFromUv({ u: p.u + duv * nu, v: p.v + duv * nv })
    };
  });
  return { points, isotherms };
}
