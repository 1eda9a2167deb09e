/**
 * A traced far field made fit for a photometric file: the 1° histogram bins next to the axis (and
 * opposite it) cover a tiny solid angle — the 0–1° cap is 0.00096 sr against 0.11 sr for the 89–90°
 * zone — so their intensities carry a large counting noise (a lone low bin reads as a dip in the
 * candela curve). Each whole-degree angle θ is given the intensity of a zone of at least a fixed solid
 * angle centred on it:
 *   I(θ) = Σ N_i / Σ ΔΩ_i over the bins of the zone [θ − h, θ + h] (clipped at 0° and 180°),
 * h the smallest whole number of degrees (≥ 1) for which the zone spans at least Ω_min. With
 * Ω_min = 0.05 sr that is ±1° from 14° to 166° and widens toward the poles, ending in a 0–8° cap at 0°.
 * The relative counting noise of each value is then at most 1/√(rays in Ω_min), the same everywhere.
 * Sources: intensity = flux per solid angle, I = dΦ/dΩ (CIE S 017); zone solid angle
 * 2π (cos θ1 − cos θ2) (common practice); binomial counting error √(N p (1 − p)) (common practice).
 */
import type { FarFieldSamples } from './candela-distribution';

/** Smallest solid angle a smoothed value averages over, sr. */
export const FAR_FIELD_MIN_ZONE_SR = 0.05;

/** Number of 1° polar bins a trace's far field has (0–180°). */
const BINS = 180;
const RAD = Math.PI / 180;

export interface SmoothedFarField extends FarFieldSamples {
  /** 0, 1, …, 180 degrees. */
  thetaDeg: number[];
  /** Zone-averaged relative intensity at each angle (same scale as the input bins). */
  relativeIntensity: number[];
  /** Half-width h of the zone averaged at each angle, degrees. */
  halfWidthDeg: number[];
  /** Solid angle of that zone, sr. */
  zoneSolidAngleSr: number[];
  /** How the values were obtained, in plain ASCII (for a file's keywords). */
  note: string;
}

/** Solid angle of the polar zone [θ1, θ2], degrees: 2π (cos θ1 − cos θ2), sr. */
function zoneSr(theta1Deg: number, theta2Deg: number): number {
  return 2 * Math.PI * (Math.cos(theta1Deg * RAD) - Math.cos(theta2Deg * RAD));
}

/**
 * The zone-averaged far field at 0°, 1°, …, 180° (see the file comment).
 * @param relativeIntensity 180 values: intensity per solid angle of the bins [i, i + 1]°, finite, ≥ 0
 * @param minZoneSr smallest zone solid angle averaged over, sr, in (0, 4π] (default 0.05)
 * @throws RangeError naming the field when there are not 180 finite values ≥ 0 or minZoneSr is out of range
 */
export function smoothFarField(relativeIntensity: ArrayLike<number>, minZoneSr = FAR_FIELD_MIN_ZONE_SR): SmoothedFarField {
  if (!relativeIntensity || relativeIntensity.length !== BINS) {
    throw new RangeError(`relativeIntensity must hold ${BINS} values, one per 1° bin (got ${relativeIntensity?.length ?? 'none'})`);
  }
  for (let i = 0; i < BINS; i++) {
    const v = relativeIntensity[i];
    if (typeof v !== 'number' || !(v >= 0 && v < Infinity)) {
      throw new RangeError(`relativeIntensity[${i}] must be a finite number ≥ 0 (got ${String(v)})`);
    }
  }
  if (typeof minZoneSr !== 'number' || !(minZoneSr > 0 && minZoneSr <= 4 * Math.PI)) {
    throw new RangeError(`minZoneSr must be a number in (0, 4π] sr (got ${String(minZoneSr)})`);
  }

  const thetaDeg: number[] = [];
  const smoothed: number[] = [];
  const halfWidthDeg: number[] = [];
  const zoneSolidAngleSr: number[] = [];
  for (let theta = 0; theta <= BINS; theta++) {
    // Widen the zone a degree at a time until it spans Ω_min
    let h = 1;
    let lo = Math.max(0, theta - h);
    let hi = Math.min(BINS, theta + h);
    while (zoneSr(lo, hi) < minZoneSr && !(lo === 0 && hi === BINS)) {
      h++;
      lo = Math.max(0, theta - h);
      hi = Math.min(BINS, theta + h);
    }
    // I = Σ I_i ΔΩ_i / Σ ΔΩ_i  (= rays in the zone over its solid angle)
    let flux = 0;
    for (let i = lo; i < hi; i++) flux += relativeIntensity[i] * zoneSr(i, i + 1);
    const omega = zoneSr(lo, hi);
    thetaDeg.push(theta);
    smoothed.push(flux / omega);
    halfWidthDeg.push(h);
    zoneSolidAngleSr.push(omega);
  }
  const capDeg = halfWidthDeg[0];
  const note =
    `Each angle's intensity is the rays in a zone of at least ${minZoneSr} sr centred on it over the zone's solid angle ` +
    `(+/-1 deg bins away from the poles, widening toward them: a 0-${capDeg} deg cap at 0 deg), ` +
    'so the small polar bins carry no extra counting noise.';
  return { thetaDeg, relativeIntensity: smoothed, halfWidthDeg, zoneSolidAngleSr, note };
}
