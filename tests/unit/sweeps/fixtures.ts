/** Packages shared by the sweep tests. */
import type { TracePackage } from '../../../src/lib/trace/package-spec';

/** A GaN-like 1 × 1 × 0.15 mm chip (n 2.5) under a hemispherical dome R = 2.5 mm (n 1.5), air outside. */
export function domePackage(): TracePackage {
  return {
    chip: { widthMm: 1, lengthMm: 1, heightMm: 0.15, n: 2.5, absorptionPerMm: 0.5, emitterZMm: 0.14, emission: 'plane' },
    base: { kind: 'reflectance', reflectance: 0.92 },
    encapsulant: { shape: 'dome', radiusMm: 2.5, heightMm: 2.5, n: 1.5, absorptionPerMm: 0.001 },
    outsideN: 1,
    polarization: 'average'
  };
}

/**
 * A point-like emitter: a 1 µm chip, 0.2 µm tall, index-matched to the dome (n 1.5 both), emitting
 * 0.1 µm above a base of the given reflectance. Its only interface is the dome surface.
 */
export function pointSourcePackage(reflectance: number): TracePackage {
  return {
    chip: { widthMm: 0.001, lengthMm: 0.001, heightMm: 0.0002, n: 1.5, absorptionPerMm: 0, emitterZMm: 0.0001, emission: 'plane' },
    base: { kind: 'reflectance', reflectance },
    encapsulant: { shape: 'dome', radiusMm: 1, heightMm: 1, n: 1.5, absorptionPerMm: 0 },
    outsideN: 1,
    polarization: 'average'
  };
}
