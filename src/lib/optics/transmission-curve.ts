import { fresnelReal } from './fresnel';
import { requirePositive, requireInteger } from './guard';

/** Sampled transmittance and reflectance of one interface versus the angle of incidence. */
export interface TransmissionCurve {
  /** angles of incidence in degrees, 0..90 inclusive, evenly spaced */
  angleDeg: number[];
  Ts: number[];
  Tp: number[];
  /** unpolarised (Ts + Tp)/2 */
  T: number[];
  Rs: number[];
  Rp: number[];
  /** unpolarised (Rs + Rp)/2 */
  R: number[];
}

const fr = new Float64Array(3);

/**
 * T(θ) = 1 − R(θ) for s, p and unpolarised light at a lossless interface nIn → nOut, sampled at
 * `points` evenly spaced angles of incidence from 0° to 90° (degrees at this edge, for charts).
 * T = 0 at and beyond the critical angle. Every value is finite.
 * @param nIn incident index (> 0); @param nOut far-side index (> 0)
 * @param points number of samples, integer in [2, 10001] (default 181: every 0.5°)
 * @see Born & Wolf, Principles of Optics, §1.5.2
 */
export function transmissionCurve(nIn: number, nOut: number, points = 181): TransmissionCurve {
  requirePositive('nIn', nIn);
  requirePositive('nOut', nOut);
  requireInteger('points', points, 2, 10001);
  const curve: TransmissionCurve = { angleDeg: [], Ts: [], Tp: [], T: [], Rs: [], Rp: [], R: [] };
  for (let i = 0; i < points; i++) {
    const deg = (90 * i) / (points - 1);
    // cos 90° in doubles is 6e-17; use 0 exactly at the end point
    const cosI = i === points - 1 ? 0 : Math.cos((deg * Math.PI) / 180);
    fresnelReal(cosI, nIn, nOut, fr);
    curve.angleDeg.push(deg);
    curve.Rs.push(fr[0]);
    curve.Rp.push(fr[1]);
    curve.R.push(0.5 * (fr[0] + fr[1]));
    curve.Ts.push(1 - fr[0]);
    curve.Tp.push(1 - fr[1]);
    curve.T.push(1 - 0.5 * (fr[0] + fr[1]));
  }
  return curve;
}
