/**
 * Lumens per photon of each 10° polar band of a white trace's escapes, over the whole's: a band whose
 * light is yellower carries more lumens per photon. A photon at λ carries energy ∝ 1/λ, so its lumens
 * ∝ V(λ)/λ. Weighting the photon far field by these turns it into the luminous one; the photon-weighted
 * mean of the weights is 1, so the flux is kept. Bands without photons get 1.
 * Source: CIE 015:2018 §7.1 (V(λ) = ȳ of the CIE 1931 observer, the CIE 1924 photopic function).
 */
import { photopicV } from '../photometry/photopic';
import { ANGLE_BANDS, SPECTRUM_BINS, SPECTRUM_FROM_NM, SPECTRUM_STEP_NM, type SpectralTally } from './spectral-tally';

/** ANGLE_BANDS weights, band a covering polar angles [10a, 10a + 10)°. */
export function luminousBandWeights(spectral: SpectralTally): number[] {
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
  return Array.from(photons, (p, a) => (p > 0 && totalLumens > 0 ? lumens[a] / p / (totalLumens / totalPhotons) : 1));
}
