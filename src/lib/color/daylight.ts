/**
 * CIE daylight of a given correlated colour temperature, from the components S0, S1, S2.
 * Chromaticity: xD = −4.6070e9/T³ + 2.9678e6/T² + 0.09911e3/T + 0.244063 (4000–7000 K),
 * xD = −2.0064e9/T³ + 1.9018e6/T² + 0.24748e3/T + 0.237040 (7000–25000 K); yD = −3.000xD² + 2.870xD − 0.275.
 * S(λ) = S0 + M1·S1 + M2·S2, M = 0.0241 + 0.2562xD − 0.7341yD, M1 = (−1.3515 − 1.7703xD + 5.9114yD)/M,
 * M2 = (0.0300 − 31.4424xD + 30.0717yD)/M; components interpolated linearly from 5 nm.
 * @see CIE 015:2018 Colorimetry, 4th ed., §4.1 (eqs. 4.7–4.11)
 */
import { DAYLIGHT_S0, DAYLIGHT_S1, DAYLIGHT_S2, tableAt } from './cie-tables';
import type { Xy } from './chromaticity';

/** Range of CCT for which the CIE defines daylight, K. */
export const DAYLIGHT_RANGE_K = { min: 4000, max: 25000 } as const;

/**
 * Chromaticity of CIE daylight at a CCT (CIE 015:2018 eqs. 4.7–4.9).
 * @param cctK correlated colour temperature, K, in [4000, 25000]
 */
export function daylightXy(cctK: number): Xy {
  const t = cctK;
  const x =
    t <= 7000
      ? -4.607e9 / t ** 3 + 2.9678e6 / t ** 2 + 0.09911e3 / t + 0.244063
      : -2.0064e9 / t ** 3 + 1.9018e6 / t ** 2 + 0.24748e3 / t + 0.23704;
  return { x, y: -3 * x * x + 2.87 * x - 0.275 };
}

/**
 * Relative spectral power of CIE daylight at a CCT, as a function of wavelength (nm).
 * @param cctK correlated colour temperature, K, in [4000, 25000]
 * @throws RangeError outside that range
 */
export function daylightSpectrum(cctK: number): (wavelengthNm: number) => number {
  const { min, max } = DAYLIGHT_RANGE_K;
  if (!(cctK >= min && cctK <= max)) throw new RangeError(`daylight CCT must be from ${min} to ${max} K (got ${cctK})`);
  const { x, y } = daylightXy(cctK);
  const m = 0.0241 + 0.2562 * x - 0.7341 * y;
  const m1 = (-1.3515 - 1.7703 * x + 5.9114 * y) / m;
  const m2 = (0.03 - 31.4424 * x + 30.0717 * y) / m;
  return (nm) => tableAt(DAYLIGHT_S0, nm) + m1 * tableAt(DAYLIGHT_S1, nm) + m2 * tableAt(DAYLIGHT_S2, nm);
}
