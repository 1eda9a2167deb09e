/**
 * Correlated colour temperature and Duv by Ohno's combined method.
 * The Planckian table is refined by cascade (Ohno's "cascade expansion"): a table 2 % apart over
 * 1000–100000 K (built once), then 8 temperatures over the two intervals around the nearest entry, again
 * and again, until those two intervals span less than 0.1 %; then the triangular solution (|Duv| < 0.002) or the
 * parabolic one (otherwise), as Ohno prescribes. With so fine a final table, Ohno's correction factors
 * for a 1 % table are not needed (against a direct minimisation of the distance: within 0.11 K over
 * 1200–80 000 K and |Duv| ≤ 0.04, measured).
 * @see Y. Ohno, "Practical use and calculation of CCT and Duv", LEUKOS 10, 47–55 (2014)
 */
import type { Uv } from './chromaticity';
import { CCT_RANGE_K, planckianUvOnly } from './planck';

export interface CctDuv {
  /** Correlated colour temperature, K. */
  cctK: number;
  /** Signed distance from the Planckian locus in CIE 1960 u, v; positive above (greener), negative below (pinker). */
  duv: number;
}

/** Coarse table: temperatures 2 % apart over 1000–100000 K, built once on first use. */
const COARSE_RATIO = 1.02;
let coarse: { T: Float64Array; u: Float64Array; v: Float64Array } | undefined;
function coarseTable() {
  if (!coarse) {
    const n = Math.ceil(Math.log(CCT_RANGE_K.max / CCT_RANGE_K.min) / Math.log(COARSE_RATIO)) + 1;
    const T = new Float64Array(n), u = new Float64Array(n), v = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      T[i] = Math.min(CCT_RANGE_K.max, CCT_RANGE_K.min * COARSE_RATIO ** i);
      const p = planckianUvOnly(T[i]);
      u[i] = p.u;
      v[i] = p.v;
    }
    coarse = { T, u, v };
  }
  return coarse;
}

/** Points per cascade pass, and the span (T[m+1]/T[m−1] − 1) at which the cascade stops. */
const POINTS = 8;
const FINAL_SPAN = 1e-3;

/**
 * CCT and Duv of a CIE 1960 chromaticity by Ohno (2014).
 * @param uv chromaticity in CIE 1960 UCS
 * @returns null when the nearest Planckian point lies at or beyond the ends of 1000–100000 K
 */
export function cctOhno(uv: Uv): CctDuv | null {
  // Nearest entry of the coarse table
  const table = coarseTable();
  let m = 0;
  let best = Infinity;
  for (let i = 0; i < table.T.length; i++) {
    const dist2 = (uv.u - table.u[i]) ** 2 + (uv.v - table.v[i]) ** 2;
    if (dist2 < best) {
      best = dist2;
      m = i;
    }
  }
  if (m === 0 || m === table.T.length - 1) return null;
  // Cascade: re-tabulate the two intervals around the nearest point until they are fine enough
  let lo = Math.log(table.T[m - 1]);
  let hi = Math.log(table.T[m + 1]);
  const T = new Float64Array(POINTS);
  const d = new Float64Array(POINTS);
  const uAt = new Float64Array(POINTS);
  const vAt = new Float64Array(POINTS);
  for (;;) {
    for (let i = 0; i < POINTS; i++) {
      T[i] = Math.exp(lo + ((hi - lo) * i) / (POINTS - 1));
      const p = planckianUvOnly(T[i]);
      uAt[i] = p.u;
      vAt[i] = p.v;
      d[i] = Math.hypot(uv.u - p.u, uv.v - p.v);
    }
    m = 1;
    for (let i = 2; i < POINTS - 1; i++) if (d[i] < d[m]) m = i;
    if (T[m + 1] / T[m - 1] - 1 < FINAL_SPAN) break;
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
  const duvPar = (a * cctPar * cctPar + b * cctPar + c) * Math.sign(uv.v - planckianUvOnly(cctPar).v);
  return { cctK: cctPar, duv: duvPar };
}
