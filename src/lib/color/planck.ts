/**
 * The Planckian radiator in the colour core: relative spectral radiance and its chromaticity.
 * M(λ, T) ∝ λ⁻⁵ / (exp(c2/(λT)) − 1), c2 = 1.4388×10⁻² m·K (CIE 015:2018 §9.5; ITS-90 value).
 */
import { CMF_END_NM, CMF_START_NM, CMF_X, CMF_Y, CMF_Z } from './cie-tables';
import type { Uv } from './chromaticity';

/** Second radiation constant as the CIE uses it for colour temperature, nm·K. */
export const C2_NM_K = 1.4388e7;

/** Range of correlated colour temperatures the colour core resolves, K. */
export const CCT_RANGE_K = { min: 1000, max: 100000 } as const;

/**
 * Relative spectral radiance of a blackbody, λ⁻⁵/(exp(c2/(λT)) − 1) with λ in µm (so values near 1).
 * @param wavelengthNm wavelength, nm (> 0); @param temperatureK temperature, K (> 0)
 * @see M. Planck (1901); CIE 015:2018 §9.5 (c2 = 1.4388×10⁻² m·K)
 */
export function planckRadiance(wavelengthNm: number, temperatureK: number): number {
  const um = wavelengthNm * 1e-3;
  return 1 / (um ** 5 * Math.expm1(C2_NM_K / (wavelengthNm * temperatureK)));
}

/** (λ/µm)⁵ on the observer's 1 nm grid, precomputed: the power is the costly part of a Planck sum. */
const UM5 = Float64Array.from({ length: CMF_END_NM - CMF_START_NM + 1 }, (_, i) => ((CMF_START_NM + i) * 1e-3) ** 5);

/**
 * CIE 1960 u, v of the Planckian radiator at T (no derivatives; the CCT searches call this often).
 * @param temperatureK temperature, K, in (0, ∞)
 */
export function planckianUvOnly(temperatureK: number): Uv {
  let X = 0, Y = 0, Z = 0;
  const n = UM5.length;
  for (let i = 0; i < n; i++) {
    const m = 1 / (UM5[i] * Math.expm1(C2_NM_K / ((CMF_START_NM + i) * temperatureK)));
    X += m * CMF_X.values[i]; Y += m * CMF_Y.values[i]; Z += m * CMF_Z.values[i];
  }
  const D = X + 15 * Y + 3 * Z;
  return { u: (4 * X) / D, v: (6 * Y) / D };
}

/** Planckian chromaticity with the derivative along temperature. */
export interface PlanckianPoint extends Uv {
  /** du/dT and dv/dT, 1/K. */
  duDT: number;
  dvDT: number;
}

/**
 * CIE 1960 u, v of the Planckian radiator at T, from the CIE 1931 observer summed at 1 nm over
 * 360–830 nm, with du/dT, dv/dT from ∂M/∂T = M·(x/T)·eˣ/(eˣ − 1), x = c2/(λT) (differentiated Planck law).
 * @param temperatureK temperature, K, in (0, ∞)
 */
export function planckianUv(temperatureK: number): PlanckianPoint {
  let X = 0, Y = 0, Z = 0, dX = 0, dY = 0, dZ = 0;
  const n = CMF_END_NM - CMF_START_NM + 1;
  for (let i = 0; i < n; i++) {
    const nm = CMF_START_NM + i;
    const x = C2_NM_K / (nm * temperatureK);
    const em1 = Math.expm1(x);
    const m = 1 / (UM5[i] * em1);
    const dm = x > 700 ? 0 : (m * (x / temperatureK) * (em1 + 1)) / em1;
    const xb = CMF_X.values[i], yb = CMF_Y.values[i], zb = CMF_Z.values[i];
    X += m * xb; Y += m * yb; Z += m * zb;
    dX += dm * xb; dY += dm * yb; dZ += dm * zb;
  }
  // u = 4X/D, v = 6Y/D with D = X + 15Y + 3Z; quotient rule for the derivatives
  const D = X + 15 * Y + 3 * Z;
  const dD = dX + 15 * dY + 3 * dZ;
  return {
    u: (4 * X) / D,
    v: (6 * Y) / D,
    duDT: (4 * (dX * D - X * dD)) / (D * D),
    dvDT: (6 * (dY * D - Y * dD)) / (D * D)
  };
}
