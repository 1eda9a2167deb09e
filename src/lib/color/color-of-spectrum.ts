/**
 * Every colour figure of one spectrum, the summary the CLI's `color` command and the pages show:
 * CIE 1931 x, y; CIE 1976 u′, v′; CCT and Duv (Ohno 2014); CIE 13.3 Ra and R1…R14; luminous efficacy
 * of radiation. Figures that do not exist for the spectrum are null, with the reason in `warnings`,
 * never NaN.
 */
import { cctOhno } from './cct-ohno';
import { uvOf, xyOf } from './chromaticity';
import { colorRendering, CRI_CCT_RANGE_K, CRI_DC_LIMIT } from './color-rendering';
import type { ColorSpectrum } from './color-spectrum';
import { luminousEfficacyOfRadiation } from './luminous-efficacy-of-radiation';
import { CCT_RANGE_K } from './planck';
import { spectralSamples } from './spectral-samples';
import { tristimulus } from './tristimulus';

/** |Duv| beyond which a CCT is not a meaningful description (CIE 015:2018 §9.5 recommends 0.05). */
export const CCT_DUV_LIMIT = 0.05;

export interface ColorSummary {
  /** Tristimulus values on the spectrum's own scale (power·nm). */
  X: number;
  Y: number;
  Z: number;
  x: number;
  y: number;
  uPrime: number;
  vPrime: number;
  /** Correlated colour temperature, K; null beyond 1000–100000 K or |Duv| > 0.05. */
  cctK: number | null;
  /** Signed distance from the Planckian locus (CIE 1960 u, v); null only beyond 1000–100000 K. */
  duv: number | null;
  ra: number | null;
  /** R1…R14 (index 0 is R1; R9 is r[8]), or null. */
  r: number[] | null;
  lerLmPerW: number;
  warnings: string[];
}

/**
 * Colour of a spectrum.
 * @param spectrum a checked spectrum (colorSpectrum)
 */
export function colorOfSpectrum(spectrum: ColorSpectrum): ColorSummary {
  const samples = spectralSamples(spectrum);
  const t = tristimulus(samples);
  const xy = xyOf(t);
  const uv = uvOf(t);
  const warnings: string[] = [];
  const nearest = cctOhno(uv);
  // CCT is defined only near the locus (|Duv| ≤ 0.05); beyond it neither CCT nor a colour rendering index exists
  const cct = nearest && Math.abs(nearest.duv) <= CCT_DUV_LIMIT ? nearest : null;
  if (!nearest) warnings.push(`no CCT: the chromaticity is beyond the Planckian locus's ${CCT_RANGE_K.min}–${CCT_RANGE_K.max} K`);
  else if (!cct) {
    warnings.push(`no CCT: |Duv| = ${Math.abs(nearest.duv).toFixed(4)} exceeds ${CCT_DUV_LIMIT}, the light is not white (CIE 015:2018)`);
  }
  const cr = cct ? colorRendering(samples) : null;
  if (cct && !cr) warnings.push(`no colour rendering index: CCT outside ${CRI_CCT_RANGE_K.min}–${CRI_CCT_RANGE_K.max} K, where CIE 13.3 gives no reference illuminant`);
  if (cr && !cr.meaningful) {
    warnings.push(`colour rendering index not meaningful: distance from the Planckian locus ${cr.dc.toFixed(4)} exceeds ${CRI_DC_LIMIT} (CIE 13.3-1995)`);
  }
  return {
    X: t.X, Y: t.Y, Z: t.Z,
    x: xy.x, y: xy.y, uPrime: uv.u, vPrime: 1.5 * uv.v,
    cctK: cct ? cct.cctK : null,
    duv: nearest ? nearest.duv : null,
    ra: cr ? cr.ra : null,
    r: cr ? cr.r : null,
    lerLmPerW: luminousEfficacyOfRadiation(t, spectrum),
    warnings
  };
}
