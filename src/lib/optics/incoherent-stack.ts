/**
 * Thick (incoherent) planar stack: intensities add over all multiple reflections, no interference.
 *
 * Per polarisation, interfaces are added one at a time from the incident side. With (R, T) the
 * reflectance and transmittance of what is built so far seen from the incident side, (R', T') seen from
 * inside the current layer looking back, τ = exp(−α d / cos θ) the single-pass transmittance of the
 * layer (Beer–Lambert along the slant path, α = 4πk/λ), and R_I, T_I = 1 − R_I the next interface:
 *   D = 1 − R' R_I τ²
 *   T ← T τ T_I / D                 R ← R + T T' R_I τ² / D
 *   T' ← T_I τ T' / D               R' ← R_I + T_I² R' τ² / D
 * Two interfaces, no absorption: T = T1 T2 / (1 − R1 R2).
 * The ray angle in each layer follows from n sin θ invariance. A layer whose n is below nIn sin θ0 is
 * never entered: total internal reflection at its lower face, T = 0.
 *
 * Interfaces use the real parts n only; k enters only through the bulk attenuation (good for k ≪ n,
 * the thick-layer case).
 * Source: Born & Wolf, Principles of Optics, §1.6 and §14.1 (absorption); the recursion is the
 * standard incoherent summation of multiply reflected beams, e.g. Macleod, Thin-Film Optical Filters, 4th ed., ch. 2
 * (thick substrate).
 */
import { fresnelReal } from './fresnel';
import { validateStack, stackResultFrom, type StackLayer, type StackResult } from './layer';

const fr = new Float64Array(3);
const res = new Float64Array(6);

/** One polarisation (0 = s, 1 = p); writes R, T, A at out[pol], out[2 + pol], out[4 + pol]. */
function sweep(
  pol: 0 | 1,
  nIn: number,
  layers: readonly StackLayer[],
  nOut: number,
  wavelengthNm: number,
  cos0: number,
  out: Float64Array
): void {
  const L = layers.length;

  // First interface: incident medium → layer 0 (or the exit medium)
  const n1 = L > 0 ? layers[0].n : nOut;
  let entered = fresnelReal(cos0, nIn, n1, fr);
  let R = fr[pol];
  let T = entered ? 1 - R : 0;
  let Rb = R; // R' (seen from inside the layer, looking back)
  let Tb = T; // T'
  let cosJ = fr[2];

  if (T === 0) {
    // Nothing enters (total internal reflection or grazing incidence)
    out[pol] = 1;
    out[2 + pol] = 0;
    out[4 + pol] = 0;
    return;
  }

  for (let j = 0; j < L; j++) {
    const nJ = layers[j].n;
    const nNext = j + 1 < L ? layers[j + 1].n : nOut;

    // Beer–Lambert along the slant path: τ = exp(−4πk d / (λ cos θ))
    const kd = layers[j].k * layers[j].thicknessNm;
    const tau = kd === 0 ? 1 : Math.exp((-4 * Math.PI * kd) / (wavelengthNm * cosJ));

    // Next interface, seen from layer j
    entered = fresnelReal(cosJ, nJ, nNext, fr);
    const RI = fr[pol];
    const TI = entered ? 1 - RI : 0;
    cosJ = fr[2];

    const tau2 = tau * tau;
    const D = 1 - Rb * RI * tau2;
    const Rnew = R + (T * Tb * RI * tau2) / D;
    const Tnew = (T * tau * TI) / D;
    const Rbnew = RI + (TI * TI * Rb * tau2) / D;
    const Tbnew = (TI * tau * Tb) / D;
    R = Rnew;
    T = Tnew;
    Rb = Rbnew;
    Tb = Tbnew;

    // Handle total internal reflection inside the stack: nothing reaches further out
    if (!entered || T === 0) {
      T = 0;
      break;
    }
  }

  let A = 1 - R - T;
  if (A < 0 && A > -1e-12) A = 0; // roundoff for lossless stacks
  out[pol] = R;
  out[2 + pol] = T;
  out[4 + pol] = A;
}

/**
 * Thick-layer stack, no validation and no allocation: writes out[0..5] = Rs, Rp, Ts, Tp, As, Ap.
 * For sweeps after {@link validateStack} has checked the arguments once.
 */
export function incoherentStackInto(
  out: Float64Array,
  nIn: number,
  layers: readonly StackLayer[],
  nOut: number,
  wavelengthNm: number,
  thetaInRad: number
): Float64Array {
  const cos0 = thetaInRad >= Math.PI / 2 ? 0 : Math.cos(thetaInRad);
  sweep(0, nIn, layers, nOut, wavelengthNm, cos0, out);
  sweep(1, nIn, layers, nOut, wavelengthNm, cos0, out);
  return out;
}

/**
 * Reflectance, transmittance and absorptance of a stack of thick layers (incoherent: intensities add,
 * multiple reflections summed, Beer–Lambert absorption α = 4πk/λ along the slant path d / cos θ), for
 * s, p and unpolarised light. See the file header for the recursion.
 *
 * Incident and exit media are lossless. Thicknesses are in nanometres but are usually microns to
 * millimetres here (1 µm = 1e3 nm, 1 mm = 1e6 nm); the wavelength matters only through absorption.
 * A layer with n ≤ nIn sin θ0 is not entered (total internal reflection), and then T = 0.
 * @param nIn incident index (> 0); @param layers from the incident side outward
 * @param nOut exit index (> 0); @param wavelengthNm vacuum wavelength in nm (> 0)
 * @param thetaInRad angle of incidence in the incident medium, radians, [0, π/2]
 * @returns { Rs, Rp, Ts, Tp, R, T, A, As, Ap }, R + T + A = 1
 * @example incoherentStack(2.5, [{ n: 1.5, k: 0, thicknessNm: 1e6 }], 1, 450, 0).T // ≈ 0.9023
 * @see Born & Wolf §1.6, §14.1; Macleod, Thin-Film Optical Filters, ch. 2
 */
export function incoherentStack(
  nIn: number,
  layers: readonly StackLayer[],
  nOut: number,
  wavelengthNm: number,
  thetaInRad: number
): StackResult {
  validateStack(nIn, layers, nOut, wavelengthNm, thetaInRad);
  return stackResultFrom(incoherentStackInto(res, nIn, layers, nOut, wavelengthNm, thetaInRad));
}
