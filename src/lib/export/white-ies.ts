/**
 * What the IES file of a white package carries: luminous flux and a luminous far field, from the traced
 * spectrum.
 *
 * Flux rule: the trace knows the package's output per watt of chip light (the optical watts the chip
 * emits, mostly blue), so the file carries, unless a flux is asked for, the luminous flux per 1 W of
 * chip light: Φv = Km·∫V(λ)Φe(λ)dλ = LER × (W out per W of chip light), Km = 683 lm/W. Asked for L lm,
 * the same distribution is scaled to L. Either way the [_LUMINOUS_FLUX] keyword states the lumens per
 * watt of chip light and what the file is scaled to.
 * Far field: the trace's 1° bins count photons; a band of the colour over angle whose light is yellower
 * carries more lumens per photon. Each bin is weighted by its 10° band's lumens per photon over the
 * whole's, Σ V(λ)/λ per photon (a photon's energy ∝ 1/λ): the weights keep the flux, so the bins stay
 * relative to a Lambertian of the same (luminous) flux.
 * Sources: CIE 015:2018 §7.1 and ISO 23539 (V(λ), Km); BIPM SI brochure, 9th ed. (Km = 683 lm/W).
 */
import { photopicV } from '../photometry/photopic';
import type { PhosphorSummary } from '../trace/phosphor-summary';
import { ANGLE_BANDS, ANGLE_BAND_DEG, SPECTRUM_BINS, SPECTRUM_FROM_NM, SPECTRUM_STEP_NM, type SpectralTally } from '../trace/spectral-tally';

/** Lumens per watt of chip light: LER × energy efficiency; null when nothing escaped. */
export function lumensPerChipWatt(summary: PhosphorSummary): number | null {
  const c = summary.color;
  return c && c.lerLmPerW > 0 && summary.energyEfficiency > 0 ? c.lerLmPerW * summary.energyEfficiency : null;
}

/** The 1° bins' relative intensities weighted by their band's lumens per photon (see the file comment). */
export function luminousBinIntensities(binIntensities: ArrayLike<number>, spectral: SpectralTally): number[] {
  const batches = spectral.escaped.length / (ANGLE_BANDS * SPECTRUM_BINS);
  const photons = new Float64Array(ANGLE_BANDS);
  const lumens = new Float64Array(ANGLE_BANDS);
  for (let i = 0; i < SPECTRUM_BINS; i++) {
    const nm = SPECTRUM_FROM_NM + (i + 0.5) * SPECTRUM_STEP_NM;
    const perPhoton = photopicV(nm) / nm;
    for (let b = 0; b < batches; b++) {
      for (let a = 0; a < ANGLE_BANDS; a++) {
        const n = spectral.escaped[(b * ANGLE_BANDS + a) * SPECTRUM_BINS + i];
        photons[a] += n;
        lumens[a] += n * perPhoton;
      }
    }
  }
  const totalPhotons = photons.reduce((x, y) => x + y, 0);
  const totalLumens = lumens.reduce((x, y) => x + y, 0);
  const out: number[] = [];
  for (let j = 0; j < binIntensities.length; j++) {
    const a = Math.min(ANGLE_BANDS - 1, Math.floor(j / ANGLE_BAND_DEG));
    const weight = photons[a] > 0 && totalLumens > 0 ? lumens[a] / photons[a] / (totalLumens / totalPhotons) : 1;
    out.push(binIntensities[j] * weight);
  }
  return out;
}

/** The [_LUMINOUS_FLUX] text: lumens per watt of chip light, and the flux the file is scaled to. */
export function whiteFluxNote(lmPerChipWatt: number, fileLumens: number, asked: boolean): string {
  const per = Number(lmPerChipWatt.toPrecision(4));
  return asked
    ? `${per} lm per 1 W of chip light (683 lm/W x integral of V(lambda) times the traced output spectrum); the file is scaled to the ${Number(fileLumens.toPrecision(6))} lm asked for`
    : `${per} lm per 1 W of chip light (683 lm/W x integral of V(lambda) times the traced output spectrum); the file carries that flux, for 1 W of chip light`;
}
