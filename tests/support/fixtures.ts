/**
 * Invented packages and ranking inputs shared by the tests (round numbers, no real product). Each
 * builder returns a fresh object, so a test may change its copy.
 */
import { encapsulantCandidates, type RankInput } from '../../src/lib/decisions/rank-encapsulants';
import { findMaterial, indexAt, listMaterials } from '../../src/lib/materials/index';
import type { TracePackage } from '../../src/lib/trace/package-spec';

/**
 * A 1 × 1 × 0.15 mm chip under a hemispherical dome R = 2.5 mm on a 92 % base, air outside. By default
 * the demo's indices (chip 2.45, methyl silicone 1.41) and an emitter 0.1 mm above the chip's bottom;
 * `change` sets other indices or emitter height.
 */
export function domePackage(change: { nChip?: number; nEnc?: number; emitterZMm?: number } = {}): TracePackage {
  return {
    chip: {
      widthMm: 1,
      lengthMm: 1,
      heightMm: 0.15,
      n: change.nChip ?? 2.45,
      absorptionPerMm: 0.5,
      emitterZMm: change.emitterZMm ?? 0.1,
      emission: 'plane'
    },
    base: { kind: 'reflectance', reflectance: 0.92 },
    encapsulant: { shape: 'dome', radiusMm: 2.5, heightMm: 2.5, n: change.nEnc ?? 1.41, absorptionPerMm: 0.001 },
    outsideN: 1,
    polarization: 'average'
  };
}

/** The same package with another encapsulant. */
export function withEncapsulant(pkg: TracePackage, encapsulant: TracePackage['encapsulant']): TracePackage {
  return { ...pkg, encapsulant };
}

/** The bare chip: no encapsulant. */
export const NO_ENCAPSULANT: TracePackage['encapsulant'] = { shape: 'none', radiusMm: 1, heightMm: 1, n: 1, absorptionPerMm: 0 };

/** The mid-power cup of the bench: 2.6 mm floor, 3.0 mm top, 0.8 mm deep, white diffuse wall 0.93, silvered floor 0.95, flat fill. */
export function cupPackage(chip: TracePackage['chip']): TracePackage {
  return {
    chip,
    base: { kind: 'reflectance', reflectance: 0.95 },
    encapsulant: { shape: 'dome', radiusMm: 1.4, heightMm: 1, n: 1.41, absorptionPerMm: 0.001 },
    outsideN: 1,
    polarization: 'average',
    body: { kind: 'cup', floorRadiusMm: 1.3, topRadiusMm: 1.5, depthMm: 0.8, wallFinish: 'diffuse', wallReflectance: 0.93, fill: 'flat' }
  };
}

/**
 * A point-like emitter: a 1 µm cube (the smallest size of the limits table), index-matched to the dome
 * (n 1.5 both), emitting 0.5 µm above a base of the given reflectance. Its only interface is the dome surface.
 */
export function pointSourcePackage(reflectance: number): TracePackage {
  return {
    chip: { widthMm: 0.001, lengthMm: 0.001, heightMm: 0.001, n: 1.5, absorptionPerMm: 0, emitterZMm: 0.0005, emission: 'plane' },
    base: { kind: 'reflectance', reflectance },
    encapsulant: { shape: 'dome', radiusMm: 1, heightMm: 1, n: 1.5, absorptionPerMm: 0 },
    outsideN: 1,
    polarization: 'average'
  };
}

/**
 * The encapsulant ranking of the demo: the library's GaN chip at 450 nm, 1 × 1 mm, under a 2.5 mm
 * dome in air, every library encapsulant a candidate, methyl silicone the current choice. `change`
 * overrides any field.
 */
export function rankInput(change: Partial<RankInput> = {}): RankInput {
  return {
    chip: { material: findMaterial('gan')! },
    outside: { n: 1 },
    chipWidthMm: 1,
    chipLengthMm: 1,
    radiusMm: 2.5,
    wavelengthNm: 450,
    candidates: encapsulantCandidates(listMaterials(), [], { optics: true }),
    current: { label: 'Methyl silicone', n: indexAt(findMaterial('silicone-methyl')!, 450).n, materialId: 'silicone-methyl' },
    ...change
  };
}

/** Round indices the sweep tests check closed forms with: chip 2.5 under a 1.5 dome. */
export const ROUND_INDICES = { nChip: 2.5, nEnc: 1.5 } as const;
