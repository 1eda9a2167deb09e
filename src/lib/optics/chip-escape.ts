import { escapeCone } from './escape-cone';
import { requirePositive } from './guard';

/** Which faces of a cuboid chip emit: the top only, top and four sides, or all six. */
export type ChipFaces = 1 | 5 | 6;

/** Result of {@link cuboidChipEscape}. */
export interface ChipEscape {
  faces: ChipFaces;
  /** escape-cone half-angle inside the chip (π/2 when nOut ≥ nIn) */
  criticalAngleRad: number;
  /** Fresnel-weighted fraction through one face (unpolarised) */
  perFace: number;
  /** geometric fraction through one face, (1 − cos θc)/2 */
  perFaceGeometric: number;
  /** escape fraction of the chip, faces × perFace, clamped to ≤ 1 */
  fraction: number;
  /** faces × perFaceGeometric, clamped to ≤ 1 */
  fractionGeometric: number;
  /** true when more than one face counts and θc > 45°: neighbouring cones overlap */
  conesOverlap: boolean;
  /** true when a sum exceeded 1 and was clamped */
  clamped: boolean;
  /** plain-language caveat for the UI; empty when the sum is a sound single-pass estimate */
  note: string;
}

/**
 * Single-pass escape from a cuboid chip through 1, 5 or 6 faces: the sum of per-face Fresnel-weighted
 * escape cones, η = faces · η_F(nIn → nOut), each ray leaving through at most one face and no recycling
 * of reflected light.
 *
 * The cones about perpendicular face normals are disjoint only while θc ≤ 45° (opposite faces never
 * share a direction), so for θc > 45° the sum counts some directions twice: `conesOverlap` is set and the
 * sum is an overestimate. Sums above 1 are clamped to 1 and `clamped` is set.
 * @param nIn chip index (> 0); @param nOut outside index (> 0); @param faces 1, 5 or 6
 * @example cuboidChipEscape(2.5, 1, 6).fraction // ≈ 0.1946
 * @see E. F. Schubert, Light-Emitting Diodes, 2nd ed. (2006), ch. 5 (escape cones of a cuboid chip)
 */
export function cuboidChipEscape(nIn: number, nOut: number, faces: ChipFaces): ChipEscape {
  requirePositive('nIn', nIn);
  requirePositive('nOut', nOut);
  if (faces !== 1 && faces !== 5 && faces !== 6) {
    throw new RangeError(`faces must be 1, 5 or 6 (got ${String(faces)})`);
  }
  const cone = escapeCone(nIn, nOut);
  const rawTotal = faces * cone.fresnel;
  const rawGeometric = faces * cone.geometric;
  const clamped = rawTotal > 1 || rawGeometric > 1;
  const conesOverlap = faces > 1 && cone.criticalAngleRad > Math.PI / 4;

  const notes: string[] = [];
  if (conesOverlap) {
    const deg = ((cone.criticalAngleRad * 180) / Math.PI).toFixed(1);
    notes.push(
      `The escape cones of neighbouring faces overlap (critical angle ${deg}° > 45°), so the no-overlap sum counts some directions twice and is an overestimate.`
    );
  }
  if (clamped) notes.push('The sum exceeded 1 and is clamped to 1.');

  return {
    faces,
    criticalAngleRad: cone.criticalAngleRad,
    perFace: cone.fresnel,
    perFaceGeometric: cone.geometric,
    fraction: Math.min(1, rawTotal),
    fractionGeometric: Math.min(1, rawGeometric),
    conesOverlap,
    clamped,
    note: notes.join(' ')
  };
}
