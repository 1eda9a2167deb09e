import { escapeCone } from './escape-cone';
import { normalReflectance } from './fresnel';
import { requirePositive } from './guard';

/** Input of {@link domeEstimate}. */
export interface DomeInput {
  /** chip index, > 0 */
  nChip: number;
  /** dome (encapsulant) index, > 0 */
  nEnc: number;
  /** outside index (air 1), > 0 */
  nOut: number;
  /** chip footprint, mm, > 0 */
  chipWidthMm: number;
  chipLengthMm: number;
  /** dome radius, mm, > 0 */
  radiusMm: number;
}

/** Result of {@link domeEstimate}. */
export interface DomeEstimate {
  /** Fresnel-weighted escape through the bare top face into nOut */
  etaBare: number;
  /** escape into the dome through the top face, times (1 − R_normal) at the dome surface */
  etaDome: number;
  /** etaDome / etaBare */
  gain: number;
  /** smallest dome radius with no total internal reflection at the dome, r · nEnc / nOut */
  minRadiusNoTirMm: number;
  /** radiusMm ≥ minRadiusNoTirMm */
  noTir: boolean;
  /** chip half-diagonal r = √(w² + l²)/2, mm */
  halfDiagonalMm: number;
}

/**
 * Closed-form estimate of a hemispherical dome over a chip (chip small against the dome, one planar
 * emitting face, single pass):
 *   etaBare = η_F(nChip → nOut)
 *   etaDome = η_F(nChip → nEnc) · (1 − R_normal(nEnc → nOut)),  rays meet the dome near normal incidence
 *   gain = etaDome / etaBare
 * No-TIR size: a point at distance r from the centre of a sphere of radius R meets the surface at
 * sin θ ≤ r/R (sine rule), so nothing is trapped while R ≥ r · nEnc / nOut, evaluated with the chip's
 * half-diagonal r (the boundary is the sphere's inner aplanatic point).
 * @example domeEstimate({ nChip: 2.5, nEnc: 1.5, nOut: 1, chipWidthMm: 1, chipLengthMm: 1, radiusMm: 2 }).gain // ≈ 2.60
 * @see Schubert, Light-Emitting Diodes, 2nd ed., ch. 5 (encapsulant); Born & Wolf §4.2.3 (aplanatic points)
 */
export function domeEstimate(input: DomeInput): DomeEstimate {
  if (input === null || typeof input !== 'object') throw new RangeError('domeEstimate needs an input object');
  const nChip = requirePositive('nChip', input.nChip);
  const nEnc = requirePositive('nEnc', input.nEnc);
  const nOut = requirePositive('nOut', input.nOut);
  const w = requirePositive('chipWidthMm', input.chipWidthMm);
  const l = requirePositive('chipLengthMm', input.chipLengthMm);
  const radiusMm = requirePositive('radiusMm', input.radiusMm);

  const etaBare = escapeCone(nChip, nOut).fresnel;
  const etaDome = escapeCone(nChip, nEnc).fresnel * (1 - normalReflectance(nEnc, 0, nOut, 0));
  const halfDiagonalMm = 0.5 * Math.hypot(w, l);
  // sin θ ≤ r / R at the dome surface; no TIR while (r / R)·nEnc ≤ nOut
  const minRadiusNoTirMm = (halfDiagonalMm * nEnc) / nOut;
  return {
    etaBare,
    etaDome,
    gain: etaDome / etaBare,
    minRadiusNoTirMm,
    noTir: radiusMm >= minRadiusNoTirMm,
    halfDiagonalMm
  };
}
