/**
 * Correlated colour temperature and Duv by Ohno's combined method.
 * The Planckian table is refined by cascade (Ohno's "cascade expansion"): 16 temperatures spaced
 * evenly in log T over [1000, 100000] K, then over the two intervals around the nearest one, until the
 * two intervals span less than 1e-4 relative; then the triangular solution (|Duv| < 0.002) or the parabolic
 * one (otherwise), as Ohno prescribes. With so fine a final table, Ohno's 1 % table correction
 * factors are not needed.
 * @see Y. Ohno, "Practical use and calculation of CCT and Duv", LEUKOS 10, 47–55 (2014)
 */
import type { Uv } from './chromaticity';
import { CCT_RANGE_K, planckianUv } from './planck';

export interface CctDuv {
  /** Correlated colour temperature, K. */
  cctK: number;
  /** Signed distance from the Planckian locus in CIE 1960 u, v; positive above (greener), negative below (pinker). */
  duv: number;
}

const POINTS = 16;

/**
 * CCT and Duv of a CIE 1960 chromaticity by Ohno (2014).
 * @param uv chromaticity in CIE 1960 UCS
 * @returns null when the nearest Planckian point lies at or beyond the ends of 1000–100000 K
 */
export function cctOhno(uv: Uv): CctDuv | null {
  let lo = Math.log(CCT_RANGE_K.min);
  let hi = Math.log(CCT_RANGE_K.max);
  const T = new Float64Array(POINTS);
  const d = new Float64Array(POINTS);
  const vAt = new Float64Array(POINTS);
  const uAt = new Float64Array(POINTS);
  let m = 0;
  for (let pass = 0; pass < 40; pass++) {
    for (let i = 0; i < POINTS; i++) {
      T[i] = Math.exp(lo + ((hi - lo) * i) / (POINTS - 1));
      const p = planckianUv(T[i]);
      uAt[i] = p.u;
      vAt[i] = p.v;
      d[i] = Math.hypot(uv.u - p.u, uv.v - p.v);
    }
    m = 0;
    for (let i = 1; i < POINTS; i++) if (d[i] < d[m]) m = i;
    // Nearest at an end of the full range: the chromaticity is beyond 1000 K or 100000 K
    if ((m === 0 && pass === 0) || (m === POINTS - 1 && pass === 0)) return null;
    if (m === 0) m = 1;
    if (m === POINTS - 1) m = POINTS - 2;
    if (T[m + 1] / T[m - 1] - 1 < 1e-4) break;
    lo = Math.log(T[m - 1]);
    hi = Math.log(T[m + 1]);
  }
  const [T0, T1, T2] = [T[m - 1], T[m], T[m + 1]];
  const [d0, d1, d2] = [d[m - 1], d[m], d[m + 1]];

  // Triangular solution (Ohno 2014, eqs. 4–8)
  const l = Math.hypot(uAt[m + 1] - uAt[m - 1], vAt[m + 1] - vAt[m - 1]);
  const x = (d0 * d0 - d2 * d2 + l * l) / (2 * l);
  const cctTri = T0 + ((T2 - T0) * x) / l;
  const vTx = vAt[m - 1] + ((vAt[m + 1] - vAt[m - 1]) * x) / l;
  const duvTri = Math.sqrt(Math.max(0, d0 * d0 - x * x)) * Math.sign(uv.v - vTx);
  if (Math.abs(duvTri) < 0.002) return { cctK: cctTri, duv: duvTri };

  // Parabolic solution (Ohno 2014, eqs. 9–14): d(T) = aT² + bT + c through the three points
  const X = (T2 - T1) * (T0 - T2) * (T1 - T0);
  const a = (T0 * (d2 - d1) + T1 * (d0 - d2) + T2 * (d1 - d0)) / X;
  const b = -(T0 * T0 * (d2 - d1) + T1 * T1 * (d0 - d2) + T2 * T2 * (d1 - d0)) / X;
  const c = -(d0 * (T2 - T1) * T1 * T2 + d1 * (T0 - T2) * T0 * T2 + d2 * (T1 - T0) * T0 * T1) / X;
  const cctPar = -b / (2 * a);
  const duvPar = (a * cctPar * cctPar + b * cctPar + c) * Math.sign(uv.v - planckianUv(cctPar).v);
  return { cctK: cctPar, duv: duvPar };
}
