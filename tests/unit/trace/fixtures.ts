/** Packages shared by the tracer tests (invented, round numbers). */
import type { TracePackage } from '../../../src/lib/trace/package-spec';

/** A 1 × 1 × 0.15 mm chip (n 2.45) under a hemispherical dome R = 2.5 mm (n 1.41) on a 92 % base. */
export function domePackage(): TracePackage {
  return {
    chip: { widthMm: 1, lengthMm: 1, heightMm: 0.15, n: 2.45, absorptionPerMm: 0.5, emitterZMm: 0.1, emission: 'plane' },
    base: { kind: 'reflectance', reflectance: 0.92 },
    encapsulant: { shape: 'dome', radiusMm: 2.5, heightMm: 2.5, n: 1.41, absorptionPerMm: 0.001 },
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
