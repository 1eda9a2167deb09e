/**
 * What every designer returns: the optic's named meridian surfaces (outward-normal order, see profile.ts) and the
 * numbers that describe the design. Angles in radians, lengths in mm.
 */
import type { OpticShape, OpticType } from './design-options';
import type { ProfileSurface } from './profile';

/** A design ray whose incidence on the TIR wall is not above the critical angle. */
export interface TirFailure {
  /** Angle of the source ray from the axis, rad. */
  thetaRad: number;
  /** Where it meets the wall, mm. */
  rMm: number;
  zMm: number;
  /** Its angle of incidence on the wall, rad (≤ the critical angle). */
  incidenceRad: number;
}

export interface OpticDesign {
  type: OpticType;
  shape: OpticShape;
  /** Faces in order along the boundary; for a solid the polyline closes on the axis. */
  surfaces: ProfileSurface[];
  /** Index of the optic's material (1 for a reflector in air). */
  n: number;
  /** Specular reflectance of a reflector's mirror, [0, 1]. */
  reflectance?: number;
  exitDiameterMm: number;
  /** Height of the optic's top above the source plane. */
  heightMm: number;
  /** Height of its lowest point above the source plane. */
  gapMm: number;
  /** Chord tolerance the profiles are sampled to. */
  toleranceMm: number;
  /** Focal length: paraboloid f (focus to vertex), lens f (paraxial), hyperbolic surface vertex distance. */
  focalLengthMm?: number;
  /** Angle from the axis, seen from the source, of the exit rim. */
  rimAngleRad: number;
  /** Widest angle from the axis of a source ray the optic's working faces take. */
  collectionHalfAngleRad: number;
  /** CPC: acceptance half-angle θa (the beam's design half-angle). */
  acceptanceHalfAngleRad?: number;
  /** TIR: the angle dividing the cavity floor's rays from the cavity wall's rays. */
  splitAngleRad?: number;
  /** TIR: cavity radius. */
  cavityRadiusMm?: number;
  /** TIR: design rays that would leak through the wall (empty when the wall reflects all by TIR). */
  tirFailures?: TirFailure[];
  /** TIR: smallest (incidence − critical angle) over the design rays, rad. */
  tirMarginRad?: number;
}
