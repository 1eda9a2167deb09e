/**
 * Where each library chip material emits, so the scenario's wavelength can follow a chip that is
 * changed: a red chip left at a blue 450 nm is evaluated where it never emits (and outside
 * its index data). Pure.
 *
 * Ranges are those of LED material systems as a textbook surveys them (E. F. Schubert, Light-Emitting
 * Diodes, 2nd ed., Cambridge 2006, chs. 12–13: AlGaInP red to yellow-green, InGaN/GaN near-UV to green,
 * GaAs infrared, GaP green to red with dopants) — from memory, rounded to the nearest 5 nm.
 */
import { findMaterial } from '../materials/index';
import { designWavelengthNm } from './resolve';
import type { EmissionSpec, Scenario } from './schema';

export interface EmissionRange {
  minNm: number;
  maxNm: number;
  /** The wavelength to offer: a common emitter of the material. */
  typicalNm: number;
}

/** By library material id. Substrates, encapsulants and user materials have none. */
export const CHIP_EMISSION: Readonly<Record<string, EmissionRange>> = {
  gan: { minNm: 365, maxNm: 530, typicalNm: 450 },
  ingan: { minNm: 400, maxNm: 530, typicalNm: 450 },
  // GaP also stands for red–yellow AlGaInP chips on their GaP window (no open AlGaInP data; retired-ids.ts):
  // their range 560–650 nm lies inside GaP's own, and red 620 nm is the common emitter of the two
  gap: { minNm: 555, maxNm: 700, typicalNm: 620 },
  gaas: { minNm: 850, maxNm: 980, typicalNm: 940 }
};

export interface EmissionAdvice {
  /** The chip material's display name. */
  chip: string;
  range: EmissionRange;
  /** The scenario's design wavelength now, nm. */
  currentNm: number;
  /** False for a tabulated spectrum, which cannot be moved by one number. */
  movable: boolean;
}

/**
 * Advice when the scenario's chip is a library material whose emission range does not hold the
 * design wavelength; null otherwise (typed index, user material, a wavelength in range). Needs no
 * index, so it also answers for a chip whose formula cannot be evaluated at the present wavelength.
 */
export function emissionAdvice(scenario: Scenario): EmissionAdvice | null {
  // By the library entry the id finds (an alias or a retired id names its replacement)
  const material = scenario.chip.medium.kind === 'material' ? findMaterial(scenario.chip.medium.id) : undefined;
  const range = material ? CHIP_EMISSION[material.id] : undefined;
  if (!material || !range) return null;
  const nm = designWavelengthNm(scenario.emission);
  if (nm >= range.minNm && nm <= range.maxNm) return null;
  return { chip: material.name, range, currentNm: nm, movable: scenario.emission.kind !== 'table' };
}

/** The emission moved to `wavelengthNm`: the single wavelength, or the Gaussian's peak (its width kept). */
export function emissionAt(emission: EmissionSpec, wavelengthNm: number): EmissionSpec {
  if (emission.kind === 'gaussian') return { ...emission, peakNm: wavelengthNm };
  if (emission.kind === 'single') return { kind: 'single', wavelengthNm };
  return emission;
}
