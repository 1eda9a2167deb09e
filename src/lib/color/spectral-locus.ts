/**
 * The spectral locus of the CIE 1931 2° observer: chromaticity x, y of each monochromatic stimulus,
 * x = x̄/(x̄ + ȳ + z̄), y = ȳ/(x̄ + ȳ + z̄), for a chromaticity diagram's horseshoe (close it with the purple line).
 * @see CIE 015:2018 §7.3
 */
import { CMF_END_NM, CMF_START_NM, CMF_X, CMF_Y, CMF_Z, tableAt } from './cie-tables';
import type { Xy } from './chromaticity';

/**
 * Spectral locus points.
 * @param stepNm wavelength step, nm (default 5, from 1 to 50); the range is 380–700 nm by default, where
 *   the locus is well defined (beyond 700 nm it stays at one point within 1e-4)
 */
export function spectralLocus(stepNm = 5, fromNm = 380, toNm = 700): (Xy & { wavelengthNm: number })[] {
  if (!(stepNm >= 1 && stepNm <= 50)) throw new RangeError(`stepNm must be from 1 to 50 nm (got ${stepNm})`);
  if (!(fromNm >= CMF_START_NM && toNm <= CMF_END_NM && fromNm < toNm)) throw new RangeError(`locus range must lie within ${CMF_START_NM}–${CMF_END_NM} nm (got ${fromNm}–${toNm})`);
  const out = [];
  for (let nm = fromNm; nm <= toNm + 1e-9; nm += stepNm) {
    const X = tableAt(CMF_X, nm), Y = tableAt(CMF_Y, nm), Z = tableAt(CMF_Z, nm);
    const s = X + Y + Z;
    out.push({ wavelengthNm: nm, x: X / s, y: Y / s });
  }
  return out;
}
