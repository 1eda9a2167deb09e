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
 * whole's, V(λ)/λ per photon (trace/luminous-bands.ts): the weights keep the flux, so the bins stay
 * relative to a Lambertian of the same (luminous) flux.
 * Sources: CIE 015:2018 §7.1 and ISO 23539 (V(λ), Km); BIPM SI brochure, 9th ed. (Km = 683 lm/W).
 */
import type { PhosphorSummary } from '../trace/phosphor-summary';
import { ANGLE_BAND_DEG } from '../trace/spectral-tally';

/** Lumens per watt of chip light: LER × energy efficiency; null when nothing escaped. */
export function lumensPerChipWatt(summary: PhosphorSummary): number | null {
  const c = summary.color;
  return c && c.lerLmPerW > 0 && summary.energyEfficiency > 0 ? c.lerLmPerW * summary.energyEfficiency : null;
}

/**
 * The 1° bins' relative intensities weighted by their 10° band's lumens per photon over the whole's
 * (PhosphorSummary.luminousBandWeights; see trace/luminous-bands.ts): the luminous far field, flux kept.
 */
export function luminousBinIntensities(binIntensities: ArrayLike<number>, bandWeights: ArrayLike<number>): number[] {
  const out: number[] = [];
  for (let j = 0; j < binIntensities.length; j++) {
    const a = Math.min(bandWeights.length - 1, Math.floor(j / ANGLE_BAND_DEG));
    out.push(binIntensities[j] * bandWeights[a]);
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
