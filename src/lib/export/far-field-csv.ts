/**
 * The far field as CSV: polar angle, relative intensity and candela at a stated flux, at the traced
 * angles themselves (no resampling), with the same scale as the IES file written for that flux.
 */
import { toCsv } from '../charts/csv';
import { candelaDistribution, type FarFieldSamples } from './candela-distribution';

export const FAR_FIELD_CSV_HEADERS: readonly string[] = ['theta (deg)', 'relative intensity', 'intensity (cd)'];

/**
 * CSV text (RFC 4180, CR LF; numbers to six significant digits by toCsv) with one row per traced angle: θ in degrees from the package axis, the
 * relative intensity as traced, and candela = relative · k, where k scales the distribution (resampled
 * on a 1° grid, as in the IES file) to `lumens`.
 * @param farField relative intensity against polar angle
 * @param lumens total flux, lm, in [1e-6, 1e7]
 */
export function farFieldCsv(farField: FarFieldSamples, lumens: number): string {
  const { candelaPerUnit } = candelaDistribution(farField, lumens, 1);
  const rows = farField.thetaDeg.map((theta, i) => [
    theta,
    farField.relativeIntensity[i],
    farField.relativeIntensity[i] * candelaPerUnit
  ]);
  return toCsv(FAR_FIELD_CSV_HEADERS, rows);
}
