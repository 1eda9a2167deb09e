/**
 * The CIE colour rendering index (CIE 13.3-1995): special indices R1…R14 and the general index Ra
 * (mean of R1…R8). Steps, as the standard gives them:
 * 1. the reference illuminant: Planckian at the test source's CCT below 5000 K, CIE daylight at or above;
 * 2. the 14 test colour samples under each source, normalised so each source has Y = 100;
 * 3. von Kries adaptation of the test-source colours in CIE 1960 u, v (c = (4 − u − 10v)/v,
 *    d = (1.708v + 0.404 − 1.481u)/v; u′ = (10.872 + 0.404·c·cr/ck − 4·d·dr/dk)/(16.518 + 1.481·c·cr/ck − d·dr/dk),
 *    v′ = 5.520/(same denominator));
 * 4. CIE 1964 U*V*W*: W* = 25Y^(1/3) − 17, U* = 13W*(u − u0), V* = 13W*(v − v0);
 * 5. Ri = 100 − 4.6·ΔE*i.
 * The standard asks for a test source within DC = 5.4×10⁻³ of the Planckian locus (in u, v); beyond it the
 * result is still computed but `meaningful` is false.
 * @see CIE 13.3-1995, Method of measuring and specifying colour rendering properties of light sources
 */
import type { Uv } from './chromaticity';
import { uvOf } from './chromaticity';
import { cctOhno } from './cct-ohno';
import { TEST_COLOUR_SAMPLES } from './cie-tables';
import { daylightSpectrum } from './daylight';
import { planckRadiance } from './planck';
import { gridSamples, type SpectralSamples } from './spectral-samples';
import { tristimulus } from './tristimulus';

/** CIE 13.3's limit on the test source's distance from the Planckian locus in CIE 1960 u, v. */
export const CRI_DC_LIMIT = 5.4e-3;
/** CCT range over which a reference illuminant exists here, K (Planckian from 1000 K, daylight to 25 000 K). */
export const CRI_CCT_RANGE_K = { min: 1000, max: 25000 } as const;

export interface ColorRendering {
  /** General colour rendering index, mean of R1…R8. */
  ra: number;
  /** Special indices R1…R14 (index 0 is R1; R9, the saturated red, is r[8]). */
  r: number[];
  /** The test source's CCT, K, and the reference chosen for it. */
  cctK: number;
  reference: 'planckian' | 'daylight';
  /** Distance of the test source from the Planckian locus in CIE 1960 u, v. */
  dc: number;
  /** False when dc exceeds 5.4×10⁻³: CIE 13.3 calls the index not meaningful there. */
  meaningful: boolean;
}

/** c and d of the CIE 13.3 von Kries transform: c = (4 − u − 10v)/v, d = (1.708v + 0.404 − 1.481u)/v. */
function cd(p: Uv): [number, number] {
  return [(4 - p.u - 10 * p.v) / p.v, (1.708 * p.v + 0.404 - 1.481 * p.u) / p.v];
}

/**
 * Colour rendering of a light source.
 * @param samples the test source's quadrature nodes (spectralSamples)
 * @returns null when the source's CCT is outside 1000–25 000 K (no reference illuminant)
 */
export function colorRendering(samples: SpectralSamples): ColorRendering | null {
  const source = tristimulus(samples);
  const uvk = uvOf(source);
  const cct = cctOhno(uvk);
  if (!cct || cct.cctK < CRI_CCT_RANGE_K.min || cct.cctK > CRI_CCT_RANGE_K.max) return null;
  const reference = cct.cctK < 5000 ? 'planckian' : 'daylight';
  const refPower = reference === 'planckian' ? (nm: number) => planckRadiance(nm, cct.cctK) : daylightSpectrum(cct.cctK);
  const refSamples = gridSamples(refPower);
  const ref = tristimulus(refSamples);
  const uvr = uvOf(ref);
  const dc = Math.hypot(uvk.u - uvr.u, uvk.v - uvr.v);

  const [ck, dk] = cd(uvk);
  const [cr, dr] = cd(uvr);
  const r: number[] = [];
  for (const tcs of TEST_COLOUR_SAMPLES) {
    // Sample colours under each source, normalised so the source itself has Y = 100
    const tk = tristimulus(samples, tcs);
    const tr = tristimulus(refSamples, tcs);
    const yk = (100 * tk.Y) / source.Y;
    const yr = (100 * tr.Y) / ref.Y;
    const uvki = uvOf(tk);
    const uvri = uvOf(tr);
    // von Kries adaptation of the sample under the test source to the reference white (CIE 13.3 eqs. 5–6)
    const [cki, dki] = cd(uvki);
    const cc = (cr / ck) * cki;
    const dd = (dr / dk) * dki;
    const den = 16.518 + 1.481 * cc - dd;
    const uAdapted = (10.872 + 0.404 * cc - 4 * dd) / den;
    const vAdapted = 5.52 / den;
    // CIE 1964 U*V*W*; the adapted test white coincides with the reference white (CIE 13.3 eq. 7–8)
    const wr = 25 * Math.cbrt(yr) - 17;
    const wk = 25 * Math.cbrt(yk) - 17;
    const dU = 13 * wr * (uvri.u - uvr.u) - 13 * wk * (uAdapted - uvr.u);
    const dV = 13 * wr * (uvri.v - uvr.v) - 13 * wk * (vAdapted - uvr.v);
    const dE = Math.sqrt(dU * dU + dV * dV + (wr - wk) ** 2);
    r.push(100 - 4.6 * dE); // CIE 13.3 eq. 10
  }
  const ra = r.slice(0, 8).reduce((a, b) => a + b, 0) / 8;
  return { ra, r, cctK: cct.cctK, reference, dc, meaningful: dc <= CRI_DC_LIMIT };
}
