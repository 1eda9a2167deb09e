/**
 * The white-light figures of a spectral trace (a tally with `spectral`, see spectral-tally.ts):
 * - photon fractions per chip photon launched: escapedBlue (never converted) + escapedConverted =
 *   photon efficiency (escaped / launched);
 * - energy efficiency: watts out / watts of chip light made = Σ(1/λ) escaped / Σ(1/λ) launched
 *   (photon energy hc/λ); it is at most the photon efficiency when conversion only lengthens λ
 *   (Stokes loss λin/λout);
 * - the escaped spectrum as power per nm (photon counts × 1/λ, bins of SPECTRUM_STEP_NM) and its colour
 *   (colorOfSpectrum: x, y, CCT, Duv, Ra, R9, LER), with Monte Carlo σ by batch means over BATCHES
 *   interleaved batches of rays: σ = sd(batch values)/√B (common practice, e.g. A. M. Law, Simulation
 *   Modeling and Analysis, 5th ed., §9.5.3);
 * - colour over angle: x, y, CCT per 10° polar band with photons in it, and Δu′v′, the largest
 *   distance of a band's u′v′ from the whole output's (bands with fewer than MIN_BAND_PHOTONS left out).
 * - scatter events and conversions per ray.
 */
import { colorOfSpectrum, colorSpectrum, type ColorSummary } from '../color/index';
import { ANGLE_BANDS, ANGLE_BAND_DEG, BATCHES, SPECTRUM_BINS, SPECTRUM_FROM_NM, SPECTRUM_STEP_NM } from './spectral-tally';
import { luminousBandWeights } from './luminous-bands';
import type { Tally } from './tally';

/** Bands with fewer escaped photons are too noisy for a colour. */
export const MIN_BAND_PHOTONS = 200;

export interface SpectrumBin {
  /** Bin centre, nm. */
  wavelengthNm: number;
  /** Escaped power per nm per launched chip photon, in units of the chip photon energy at 1 nm (hc/1 nm). */
  power: number;
  /** Escaped photons per nm per launched chip photon. */
  photons: number;
}

/** The colour of the escaped light (colorOfSpectrum's figures, R9 alone) with its Monte Carlo σ (batch means). */
export interface ColorWithSigma extends Pick<ColorSummary, 'x' | 'y' | 'uPrime' | 'vPrime' | 'cctK' | 'duv' | 'ra' | 'lerLmPerW' | 'warnings'> {
  r9: number | null;
  sigma: { x: number; y: number; cctK: number | null; duv: number | null; ra: number | null };
}

export interface AngleColor {
  fromDeg: number;
  toDeg: number;
  photons: number;
  x: number;
  y: number;
  uPrime: number;
  vPrime: number;
  cctK: number | null;
}

export interface PhosphorSummary {
  /** Fraction of launched photons absorbed by the phosphor and not re-emitted (the ledger's 'phosphor:' bins). */
  phosphorHeat: number;
  escapedBlue: number;
  escapedConverted: number;
  photonEfficiency: number;
  energyEfficiency: number;
  /** Mean chip wavelength, and mean escaped wavelength by photon energy (nm): their ratio is the Stokes factor. */
  meanChipNm: number;
  meanEscapedNm: number | null;
  spectrum: SpectrumBin[];
  color: ColorWithSigma | null;
  colorOverAngle: AngleColor[];
  /** Largest u′v′ distance of a band from the whole; null with fewer than two bands. */
  deltaUvPrime: number | null;
  /** Lumens per photon of each 10° polar band over the whole's (luminous-bands.ts): photon far field → luminous. */
  luminousBandWeights: number[];
  scatterEventsPerRay: number;
  conversionsPerRay: number;
}

/** Power rows (per nm) of a set of photon bins; photons at λ carry energy ∝ 1/λ. */
function powerRows(photons: Float64Array): [number, number][] {
  const rows: [number, number][] = [];
  for (let i = 0; i < SPECTRUM_BINS; i++) {
    const nm = SPECTRUM_FROM_NM + (i + 0.5) * SPECTRUM_STEP_NM;
    rows.push([nm, photons[i] / nm / SPECTRUM_STEP_NM]);
  }
  return rows;
}

function colorOf(photons: Float64Array): ColorSummary | null {
  if (!photons.some((v) => v > 0)) return null;
  return colorOfSpectrum(colorSpectrum(powerRows(photons)));
}

function sd(values: number[]): number {
  const m = values.reduce((a, b) => a + b, 0) / values.length;
  return Math.sqrt(values.reduce((a, b) => a + (b - m) ** 2, 0) / (values.length - 1));
}

/** σ of the mean from batch values; null when a batch has no value. */
function batchSigma(values: (number | null)[]): number | null {
  if (values.length < 2 || values.some((v) => v === null)) return null;
  return sd(values as number[]) / Math.sqrt(values.length);
}

/** The white-light summary of a tally; null when the trace was not spectral. */
export function phosphorSummary(tally: Tally): PhosphorSummary | null {
  const s = tally.spectral;
  if (!s) return null;
  const n = tally.launched;
  const total = new Float64Array(SPECTRUM_BINS);
  const byBatch: Float64Array[] = [];
  const byBand: Float64Array[] = [];
  for (let b = 0; b < BATCHES; b++) byBatch.push(new Float64Array(SPECTRUM_BINS));
  for (let a = 0; a < ANGLE_BANDS; a++) byBand.push(new Float64Array(SPECTRUM_BINS));
  for (let b = 0; b < BATCHES; b++) {
    for (let a = 0; a < ANGLE_BANDS; a++) {
      const o = (b * ANGLE_BANDS + a) * SPECTRUM_BINS;
      for (let i = 0; i < SPECTRUM_BINS; i++) {
        const v = s.escaped[o + i];
        total[i] += v;
        byBatch[b][i] += v;
        byBand[a][i] += v;
      }
    }
  }
  const whole = colorOf(total);
  let color: ColorWithSigma | null = null;
  if (whole) {
    const batches = byBatch.map(colorOf);
    const pick = (f: (c: ColorSummary) => number | null) => batchSigma(batches.map((c) => (c ? f(c) : null)));
    color = {
      x: whole.x,
      y: whole.y,
      uPrime: whole.uPrime,
      vPrime: whole.vPrime,
      cctK: whole.cctK,
      duv: whole.duv,
      ra: whole.ra,
      r9: whole.r ? whole.r[8] : null,
      lerLmPerW: whole.lerLmPerW,
      sigma: { x: pick((c) => c.x) ?? 0, y: pick((c) => c.y) ?? 0, cctK: pick((c) => c.cctK), duv: pick((c) => c.duv), ra: pick((c) => c.ra) },
      warnings: whole.warnings
    };
  }
  const colorOverAngle: AngleColor[] = [];
  byBand.forEach((photons, a) => {
    const count = photons.reduce((x, y) => x + y, 0);
    if (count < MIN_BAND_PHOTONS) return;
    const c = colorOf(photons);
    if (!c) return;
    colorOverAngle.push({ fromDeg: a * ANGLE_BAND_DEG, toDeg: (a + 1) * ANGLE_BAND_DEG, photons: count, x: c.x, y: c.y, uPrime: c.uPrime, vPrime: c.vPrime, cctK: c.cctK });
  });
  const deltaUvPrime =
    whole && colorOverAngle.length >= 2
      ? Math.max(...colorOverAngle.map((b) => Math.hypot(b.uPrime - whole.uPrime, b.vPrime - whole.vPrime)))
      : null;
  const escaped = s.escapedBlue + s.escapedConverted;
  let heat = 0;
  for (const bin in tally.parts) if (bin.startsWith('phosphor:')) heat += tally.parts[bin];
  return {
    phosphorHeat: n ? heat / n : 0,
    escapedBlue: n ? s.escapedBlue / n : 0,
    escapedConverted: n ? s.escapedConverted / n : 0,
    photonEfficiency: n ? escaped / n : 0,
    energyEfficiency: s.launchedInverseNm > 0 ? s.escapedInverseNm / s.launchedInverseNm : 0,
    meanChipNm: s.launchedInverseNm > 0 ? n / s.launchedInverseNm : 0,
    meanEscapedNm: s.escapedInverseNm > 0 ? escaped / s.escapedInverseNm : null,
    spectrum: powerRows(total).map(([nm, p], i) => ({ wavelengthNm: nm, power: n ? p / n : 0, photons: n ? total[i] / SPECTRUM_STEP_NM / n : 0 })),
    color,
    colorOverAngle,
    deltaUvPrime,
    luminousBandWeights: luminousBandWeights(s),
    scatterEventsPerRay: n ? s.scatterEvents / n : 0,
    conversionsPerRay: n ? s.conversions / n : 0
  };
}
