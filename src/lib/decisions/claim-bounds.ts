/**
 * The physical bounds a stated extraction, gain or coating claim is checked against, for one package:
 * a cuboid chip of index nChip emitting through `faces` faces, optionally under a large ideal dome of
 * index nEnc, in an outside medium nOut. All fractions are of the light generated in the chip by an
 * isotropic source.
 *
 *   escape cone, one face        η_F = ½∫₀^θc T sin θ dθ, η_geo = (1 − cos θc)/2       (escapeCone)
 *   bare cuboid, single pass     Σ over faces of η_F(nChip → nOut)                     (cuboidChipEscape)
 *   ideal dome, single pass      Σ over faces of η_F(nChip → nEnc) · (1 − R_normal(nEnc → nOut))
 *   recycling limit              share of directions inside any cone of an emitting axis (coneUnionFraction):
 *                                what a planar cuboid can never exceed, however little it absorbs
 *   closed-form dome gain        η_F(nChip → nEnc)·(1 − R_normal) / η_F(nChip → nOut)    (domeEstimate)
 *   gain limit, planar chip      U_geo(nChip → nEnc) / (2·axes · η_F(nChip → nOut)): every ray inside the
 *                                encapsulated cones leaves (lossless recycling, perfect dome surface) while
 *                                the bare chip keeps none of its Fresnel reflections
 *   flat-coating limit           η_geo / η_F − 1 into the medium the coating faces: n·sin θ is conserved
 *                                through parallel layers, so a coating only removes Fresnel losses inside the
 *                                same cone (ratio ≥ any recycling state, since recycling raises η_F only)
 *   single quarter-wave layer    gain of one layer n = √(nChip·nExit), λ/4 thick, over the whole cone − 1
 * Sources: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5 (escape cones, encapsulants); Born & Wolf §1.5
 * (Fresnel, Snell invariance n sin θ); Hecht, Optics (quarter-wave antireflection layer).
 */
import { cuboidChipEscape, escapeCone, normalReflectance, stackExtraction, type ChipFaces } from '../optics/index';
import { coneUnionFraction } from './cone-union';

export interface PackageForClaim {
  /** Chip index, [1, 6]. */
  nChip: number;
  /** Encapsulant index, [1, 6]; null for a bare chip. */
  nEnc: number | null;
  /** Outside index, LIMITS.indexN. */
  nOut: number;
  /** Emitting faces of the cuboid chip. */
  faces: ChipFaces;
}

export interface ClaimBoundSet {
  encapsulated: boolean;
  /** Index of the medium the chip's faces touch: nEnc, or nOut for a bare chip. */
  nExit: number;
  /** Escape-cone half-angle into the exit medium, radians. */
  criticalAngleRad: number;
  /** Escape-cone half-angle straight into the outside medium, radians. */
  criticalAngleBareRad: number;
  /** One face, bare chip → outside: Fresnel-weighted and geometric fractions. */
  bareFace: { fresnel: number; geometric: number };
  /** Bare cuboid, single pass, sum over the emitting faces (≤ 1). */
  bareCuboid: number;
  /** One face, chip → exit medium. */
  exitFace: { fresnel: number; geometric: number };
  /** 1 − R_normal at the dome surface (1 for a bare chip). */
  domeSurfaceTransmission: number;
  /** Ideal dome (or bare chip), single pass, sum over the emitting faces, ≤ 1. */
  idealDome: number;
  /** Share of directions inside any escape cone of an emitting axis, ≤ 1. */
  recyclingLimit: number;
  /** Closed-form dome gain over the bare chip (1 for a bare chip). */
  closedFormGain: number;
  /** Largest gain a planar chip can show (see the file header). */
  gainLimit: number;
  /** Largest relative increase a flat coating can give (0.278 = +27.8 %). */
  coatingLimit: number;
  /** Relative increase of one ideal quarter-wave layer over the cone. */
  quarterWaveCoating: number;
  /** Index of that layer, √(nChip · nExit). */
  quarterWaveIndex: number;
  /** True when cones of neighbouring faces overlap (θc > 45°, more than one face): the sums overestimate. */
  conesOverlap: boolean;
  /** The same for the bare chip's cones into the outside medium (then the gain limit is not a bound). */
  bareConesOverlap: boolean;
}

/** The bounds for one package; inputs are trusted (checked by {@link checkClaim}). */
export function claimBounds(p: PackageForClaim): ClaimBoundSet {
  const encapsulated = p.nEnc !== null && p.nEnc !== p.nOut;
  const nExit = p.nEnc ?? p.nOut;
  const bare = escapeCone(p.nChip, p.nOut);
  const exit = encapsulated ? escapeCone(p.nChip, nExit) : bare;
  const bareCuboid = cuboidChipEscape(p.nChip, p.nOut, p.faces);
  const exitCuboid = encapsulated ? cuboidChipEscape(p.nChip, nExit, p.faces) : bareCuboid;
  // Dome surface at normal incidence: 1 − ((nEnc − nOut)/(nEnc + nOut))²
  const domeSurfaceTransmission = encapsulated ? 1 - normalReflectance(nExit, 0, p.nOut, 0) : 1;
  const axes = p.faces === 1 ? 1 : 3;

  // Gain limit: U_geo(exit) over the Fresnel-weighted bare sum over the same 2·axes cones
  const recyclingLimit = coneUnionFraction(exit.criticalAngleRad, axes);
  const gainLimit = encapsulated ? recyclingLimit / Math.min(1, 2 * axes * bare.fresnel) : 1;

  // One quarter-wave layer of the ideal index at its design wavelength (any λ: only d/λ matters)
  const lambda = 550;
  const nLayer = Math.sqrt(p.nChip * nExit);
  const layer = { n: nLayer, k: 0, thicknessNm: lambda / (4 * nLayer) };
  const quarterWaveCoating = nExit < p.nChip ? stackExtraction(p.nChip, [layer], nExit, lambda).gainOverBare - 1 : 0;

  return {
    encapsulated,
    nExit,
    criticalAngleRad: exit.criticalAngleRad,
    criticalAngleBareRad: bare.criticalAngleRad,
    bareFace: { fresnel: bare.fresnel, geometric: bare.geometric },
    bareCuboid: bareCuboid.fraction,
    exitFace: { fresnel: exit.fresnel, geometric: exit.geometric },
    domeSurfaceTransmission,
    idealDome: Math.min(1, exitCuboid.fraction * domeSurfaceTransmission),
    recyclingLimit,
    closedFormGain: encapsulated ? (exit.fresnel * domeSurfaceTransmission) / bare.fresnel : 1,
    gainLimit,
    // best case: every ray inside the cone transmitted; η_geo / η_F − 1
    coatingLimit: exit.geometric / exit.fresnel - 1,
    quarterWaveCoating,
    quarterWaveIndex: nLayer,
    conesOverlap: exitCuboid.conesOverlap,
    bareConesOverlap: bareCuboid.conesOverlap
  };
}
