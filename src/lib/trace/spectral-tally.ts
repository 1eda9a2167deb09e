/**
 * What spectral rays add to a tally: the escaped photons binned by wavelength and polar angle, in
 * BATCHES interleaved batches of rays (ray i of a chunk in batch i mod BATCHES) so the summary can
 * give a colour's Monte Carlo σ by batch means; and the counts and sums for photon and energy
 * bookkeeping. Plain numbers and Float64Arrays: survives structured cloning, merges by addition.
 * Photon energy is hc/λ, so energies are kept as Σ 1/λ (1/nm) and compared as ratios.
 */

export const SPECTRUM_FROM_NM = 360;
export const SPECTRUM_STEP_NM = 2;
/** 360–830 nm in 2 nm bins. */
export const SPECTRUM_BINS = 235;
/** Polar-angle bands of the colour over angle, 10° each over 0–180°. */
export const ANGLE_BANDS = 18;
export const ANGLE_BAND_DEG = 10;
export const BATCHES = 8;

export interface SpectralTally {
  /** Escaped photons, index (batch·ANGLE_BANDS + band)·SPECTRUM_BINS + bin; wavelengths outside the range go to the end bins. */
  escaped: Float64Array;
  /** Escaped photons never converted (the chip's own light, "blue"), and converted ones. */
  escapedBlue: number;
  escapedConverted: number;
  /** Σ 1/λ (1/nm) over launched photons (the chip's light made) and over escaped photons. */
  launchedInverseNm: number;
  escapedInverseNm: number;
  /** Phosphor scattering events, and conversions (absorbed and re-emitted), summed over all rays. */
  scatterEvents: number;
  conversions: number;
}

export function createSpectralTally(): SpectralTally {
  return {
    escaped: new Float64Array(BATCHES * ANGLE_BANDS * SPECTRUM_BINS),
    escapedBlue: 0,
    escapedConverted: 0,
    launchedInverseNm: 0,
    escapedInverseNm: 0,
    scatterEvents: 0,
    conversions: 0
  };
}

/** Adds `from` into `into`; returns `into`. */
export function mergeSpectralTally(into: SpectralTally, from: SpectralTally): SpectralTally {
  for (let i = 0; i < into.escaped.length; i++) into.escaped[i] += from.escaped[i];
  into.escapedBlue += from.escapedBlue;
  into.escapedConverted += from.escapedConverted;
  into.launchedInverseNm += from.launchedInverseNm;
  into.escapedInverseNm += from.escapedInverseNm;
  into.scatterEvents += from.scatterEvents;
  into.conversions += from.conversions;
  return into;
}
