/**
 * Correlated colour temperature and Duv by Robertson's method: isotemperature lines (normals to the
 * Planckian locus in CIE 1960 u, v) at Robertson's reciprocal temperatures; the chromaticity's signed
 * distances to the two lines that bracket it are interpolated linearly in reciprocal temperature.
 * The lines' points and directions are computed here from the CIE 1931 observer and Planck's law
 * (c2 = 1.4388×10⁻² m·K) as Robertson computed his, rather than copied from his 1968 table. A second,
 * independent route to CCT that the tests hold against Ohno's.
 * @see A. R. Robertson, "Computation of correlated color temperature and distribution temperature",
 *   J. Opt. Soc. Am. 58, 1528–1535 (1968)
 */
import type { Uv } from './chromaticity';
import type { CctDuv } from './cct-ohno';
import { planckianUv } from './planck';

/** Robertson's reciprocal temperatures, MK⁻¹ (mired), from 10 (100 000 K) to 600 (1667 K). */
export const ROBERTSON_MIRED: readonly number[] = [
  10, 20, 30, 40, 50, 60, 70, 80, 90, 100, 125, 150, 175, 200, 225, 250, 275, 300, 325, 350, 375, 400, 425, 450, 475,
  500, 525, 550, 575, 600
];

interface Isotherm {
  mired: number;
  u: number;
  v: number;
  /** Unit tangent of the locus along increasing mired; the isotherm is normal to it. */
  tu: number;
  tv: number;
}

let lines: Isotherm[] | undefined;

function isotherms(): Isotherm[] {
  lines ??= ROBERTSON_MIRED.map((mired) => {
    const p = planckianUv(1e6 / mired);
    // d/dmired = −T²/10⁶ · d/dT; only the direction matters
    const len = Math.hypot(p.duDT, p.dvDT);
    return { mired, u: p.u, v: p.v, tu: -p.duDT / len, tv: -p.dvDT / len };
  });
  return lines;
}

/**
 * CCT and Duv of a CIE 1960 chromaticity by Robertson (1968).
 * @returns null outside the span of the isotherms (100 000 K to 1667 K)
 */
export function cctRobertson(uv: Uv): CctDuv | null {
  const iso = isotherms();
  // Signed distance along the locus tangent: zero on the isotherm through each node
  let prev = (uv.u - iso[0].u) * iso[0].tu + (uv.v - iso[0].v) * iso[0].tv;
  for (let i = 1; i < iso.length; i++) {
    const di = (uv.u - iso[i].u) * iso[i].tu + (uv.v - iso[i].v) * iso[i].tv;
    if (prev >= 0 && di <= 0) {
      const f = prev === di ? 0 : prev / (prev - di);
      const mired = iso[i - 1].mired + f * (iso[i].mired - iso[i - 1].mired);
      const cctK = 1e6 / mired;
      // Duv: distance to the Planckian point at that CCT, signed by side (above the locus positive)
      const p = planckianUv(cctK);
      const duv = Math.hypot(uv.u - p.u, uv.v - p.v) * Math.sign(uv.v - p.v);
      return { cctK, duv };
    }
    prev = di;
  }
  return null;
}
