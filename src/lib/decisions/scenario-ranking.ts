/**
 * The scenario turned into a ranking input: chip and outside media (library or user material, or typed index),
 * the current encapsulant, the emission spectrum for weighted figures, and the candidates (library plus
 * the user's own materials). The one RankInput builder of the pages and the command line. Pure.
 */
import { listMaterials } from '../materials/library';
import type { Material } from '../materials/types';
import type { Spectrum } from '../photometry/index';
import { scenarioSpectrum } from '../photometry/scenario-spectrum';
import { mediumMaterial, type ResolvedScenario } from '../scenario/resolve';
import type { EmissionSpec, MediumSpec, Scenario } from '../scenario/schema';
import { encapsulantCandidates, rankEncapsulants, type EncapsulantRanking, type IndexSource, type RankOrder } from './rank-encapsulants';

/** The emission as a sampled spectrum, or null for a single wavelength (nothing to weight). */
export function emissionSpectrum(emission: EmissionSpec): Spectrum | null {
  return emission.kind === 'single' ? null : scenarioSpectrum(emission);
}

function source(spec: MediumSpec, n: number): IndexSource {
  const m = mediumMaterial(spec);
  return m ? { material: m } : { n };
}

/**
 * Ranks the candidate encapsulants for the scenario's chip, dome radius and outside medium by the ideal
 * one-face reference (the traced ranking starts from these rows). Optic materials (lens plastics,
 * glasses) are candidates only when `optics` is set.
 */
export function scenarioRanking(
  scenario: Scenario,
  resolved: ResolvedScenario,
  userMaterials: readonly Material[],
  order: RankOrder,
  optics = false
): EncapsulantRanking {
  const spectrum = emissionSpectrum(scenario.emission);
  const hasEncapsulant = scenario.encapsulant.shape !== 'none';
  return rankEncapsulants({
    chip: source(scenario.chip.medium, resolved.chip.n),
    outside: source(scenario.outside, resolved.outside.n),
    chipWidthMm: scenario.chip.widthMm,
    chipLengthMm: scenario.chip.lengthMm,
    radiusMm: scenario.encapsulant.radiusMm,
    wavelengthNm: resolved.wavelengthNm,
    candidates: encapsulantCandidates(listMaterials(), userMaterials, { optics }),
    current: hasEncapsulant
      ? { label: resolved.encapsulant.label, n: resolved.encapsulant.n, materialId: resolved.encapsulant.materialId }
      : { label: 'no encapsulant', n: resolved.outside.n, materialId: null },
    spectrum,
    order: spectrum ? order : 'design'
  });
}
