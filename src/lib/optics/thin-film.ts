/**
 * Coherent planar stack by the characteristic-matrix (transfer-matrix) method, s and p.
 *
 * Convention N = n + ik (k ≥ 0 absorbs). Conserved tangential index β = nIn sin θ0. In layer j:
 *   q_j = N_j cos θ_j = √(N_j² − β²), Im q_j ≥ 0;   phase δ_j = 2π q_j d_j / λ
 *   admittance  s: η_j = q_j      p: η_j = q_j / N_j² (= cos θ_j / N_j, the dual form, finite at grazing)
 *   M_j = [[cos δ_j, −i sin δ_j / η_j], [−i η_j sin δ_j, cos δ_j]]
 *   [B, C]ᵀ = M_1 ⋯ M_L [1, η_out]ᵀ
 *   r = (η0 B − C)/(η0 B + C),  R = |r|²
 *   T = 4 η0 Re(η_out) / |η0 B + C|²,   1 − R = 4 η0 Re(B C*) / |η0 B + C|²,   A = 1 − R − T
 * This is the textbook matrix (written for N = n − ik) complex-conjugated; R, T, A are unchanged.
 * Source: H. A. Macleod, Thin-Film Optical Filters, 4th ed., ch. 2; Born & Wolf §1.6.2.
 *
 * Overflow: each layer matrix is multiplied by e^{−Im δ} (and the running product renormalised), the
 * scale kept as a logarithm, so opaque layers give T → 0 instead of Infinity/NaN.
 */
import { propagationFactorInto } from './propagation-factor';
import { validateStack, stackResultFrom, type StackLayer, type StackResult } from './layer';

// Scratch: [0..1] q, [2..3] η; running product m11, m12, m21, m22 at [4..11]; exit factor [12..13]
const z = new Float64Array(16);
const res = new Float64Array(6);

/**
 * One polarisation through the stack. Writes R into out[oR], T into out[oT], A into out[oA].
 * pol 0 = s, 1 = p. Trusts its inputs.
 */
function sweep(
  pol: 0 | 1,
  nIn: number,
  layers: readonly StackLayer[],
  nOut: number,
  wavelengthNm: number,
  cos0: number,
  beta: number,
  out: Float64Array,
  oR: number,
  oT: number,
  oA: number
): void {
  // Running product starts as the identity; logScale holds log of the factor taken out
  let m11r = 1, m11i = 0, m12r = 0, m12i = 0, m21r = 0, m21i = 0, m22r = 1, m22i = 0;
  let logScale = 0;
  const k0 = (2 * Math.PI) / wavelengthNm;

  for (let j = 0; j < layers.length; j++) {
    const n = layers[j].n;
    const k = layers[j].k;
    const d = layers[j].thicknessNm;
    if (d === 0) continue; // identity matrix

    // q = N cos θ, with the decaying branch
    propagationFactorInto(z, 0, n, k, beta, 0);
    const qr = z[0];
    const qi = z[1];

    // Admittance: s η = q; p η = q / N²
    let er = qr;
    let ei = qi;
    if (pol === 1) {
      const n2r = n * n - k * k;
      const n2i = 2 * n * k;
      const den = n2r * n2r + n2i * n2i;
      er = (qr * n2r + qi * n2i) / den;
      ei = (qi * n2r - qr * n2i) / den;
    }

    // δ = k0 q d = a + ib (b ≥ 0); scaled by e^{−b}:
    // P = e^{ia} e^{−2b}, Q = e^{−ia}; cos δ·e^{−b} = (P + Q)/2; −i sin δ·e^{−b} = (Q − P)/2
    const a = k0 * qr * d;
    const b = k0 * qi * d;
    const E = Math.exp(-2 * b);
    const ca = Math.cos(a);
    const sa = Math.sin(a);
    const Pr = E * ca;
    const Pi = E * sa;
    const Qr = ca;
    const Qi = -sa;
    const cr = 0.5 * (Pr + Qr);
    const ci = 0.5 * (Pi + Qi);
    const hr = 0.5 * (Qr - Pr); // −i sin δ · e^{−b}
    const hi = 0.5 * (Qi - Pi);
    // l12 = h / η
    const eden = er * er + ei * ei;
    const l12r = (hr * er + hi * ei) / eden;
    const l12i = (hi * er - hr * ei) / eden;
    // l21 = h η
    const l21r = hr * er - hi * ei;
    const l21i = hr * ei + hi * er;
    logScale += b;

    // M ← M · L, L = [[c, l12], [l21, c]]
    const n11r = m11r * cr - m11i * ci + (m12r * l21r - m12i * l21i);
    const n11i = m11r * ci + m11i * cr + (m12r * l21i + m12i * l21r);
    const n12r = m11r * l12r - m11i * l12i + (m12r * cr - m12i * ci);
    const n12i = m11r * l12i + m11i * l12r + (m12r * ci + m12i * cr);
    const n21r = m21r * cr - m21i * ci + (m22r * l21r - m22i * l21i);
    const n21i = m21r * ci + m21i * cr + (m22r * l21i + m22i * l21r);
    const n22r = m21r * l12r - m21i * l12i + (m22r * cr - m22i * ci);
    const n22i = m21r * l12i + m21i * l12r + (m22r * ci + m22i * cr);

    // Renormalise so long or opaque stacks never overflow
    const big = Math.max(
      Math.abs(n11r), Math.abs(n11i), Math.abs(n12r), Math.abs(n12i),
      Math.abs(n21r), Math.abs(n21i), Math.abs(n22r), Math.abs(n22i)
    );
    const s = big > 0 ? 1 / big : 1;
    if (big > 0) logScale += Math.log(big);
    m11r = n11r * s; m11i = n11i * s; m12r = n12r * s; m12i = n12i * s;
    m21r = n21r * s; m21i = n21i * s; m22r = n22r * s; m22i = n22i * s;
  }

  // Incident admittance (real): s η0 = nIn cos θ0; p η0 = cos θ0 / nIn
  const eta0 = pol === 0 ? nIn * cos0 : cos0 / nIn;
  // Exit admittance: q_out = √(nOut² − β²), imaginary beyond the exit critical angle
  propagationFactorInto(z, 12, nOut, 0, beta, 0);
  let esr = z[12];
  let esi = z[13];
  if (pol === 1) {
    esr /= nOut * nOut;
    esi /= nOut * nOut;
  }

  // [B, C] = M [1, η_out]
  const Br = m11r + (m12r * esr - m12i * esi);
  const Bi = m11i + (m12r * esi + m12i * esr);
  const Cr = m21r + (m22r * esr - m22i * esi);
  const Ci = m21i + (m22r * esi + m22i * esr);

  const dr = eta0 * Br + Cr;
  const di = eta0 * Bi + Ci;
  const den = dr * dr + di * di;
  if (!(den > 0)) {
    // Only when everything is index matched at exactly grazing incidence: the limit is no interface
    out[oR] = 0;
    out[oT] = 1;
    out[oA] = 0;
    return;
  }
  const nr = eta0 * Br - Cr;
  const ni = eta0 * Bi - Ci;
  const R = (nr * nr + ni * ni) / den;
  // Power entering the stack, 4 η0 Re(B C*) / |η0 B + C|² (scale-free ratio)
  const entering = (4 * eta0 * (Br * Cr + Bi * Ci)) / den;
  // T carries the product scale twice: actual [B, C] = e^{logScale} · stored
  let T = 0;
  if (esr > 0 && eta0 > 0) {
    T = Math.exp(Math.log((4 * eta0 * esr) / den) - 2 * logScale);
  }
  let A = entering - T;
  // Roundoff guard: A is a difference of nearly equal numbers for lossless stacks
  if (A < 0 && A > -1e-12) A = 0;
  out[oR] = R;
  out[oT] = T;
  out[oA] = A;
}

/**
 * Coherent stack, no validation and no allocation: writes out[0..5] = Rs, Rp, Ts, Tp, As, Ap.
 * For sweeps after {@link validateStack} has checked the arguments once.
 */
export function thinFilmInto(
  out: Float64Array,
  nIn: number,
  layers: readonly StackLayer[],
  nOut: number,
  wavelengthNm: number,
  thetaInRad: number
): Float64Array {
  const cos0 = thetaInRad >= Math.PI / 2 ? 0 : Math.cos(thetaInRad);
  const beta = nIn * Math.sin(thetaInRad);
  sweep(0, nIn, layers, nOut, wavelengthNm, cos0, beta, out, 0, 2, 4);
  sweep(1, nIn, layers, nOut, wavelengthNm, cos0, beta, out, 1, 3, 5);
  return out;
}

/**
 * Reflectance, transmittance and absorptance of a coherent planar stack (thin films: interference
 * kept), for s, p and unpolarised light, by the characteristic-matrix method (see the file header).
 *
 * Incident medium nIn and exit medium nOut are lossless (real); layers may absorb (N = n + ik).
 * Beyond the exit critical angle T = 0; thin low-index layers can still pass light below it by
 * tunnelling (frustrated total internal reflection), which this method includes.
 * @param nIn incident index (> 0), e.g. the chip
 * @param layers from the incident side outward; thicknessNm ≥ 0 (0 = absent)
 * @param nOut exit index (> 0)
 * @param wavelengthNm vacuum wavelength in nm (> 0)
 * @param thetaInRad angle of incidence in the incident medium, radians, [0, π/2]
 * @returns { Rs, Rp, Ts, Tp, R, T, A, As, Ap }, each in [0, 1], R + T + A = 1
 * @example thinFilm(1, [{ n: 1.38, k: 0, thicknessNm: 550 / 4 / 1.38 }], 1.52, 550, 0).R // ≈ 0.01260
 * @see H. A. Macleod, Thin-Film Optical Filters, 4th ed., ch. 2
 */
export function thinFilm(
  nIn: number,
  layers: readonly StackLayer[],
  nOut: number,
  wavelengthNm: number,
  thetaInRad: number
): StackResult {
  validateStack(nIn, layers, nOut, wavelengthNm, thetaInRad);
  return stackResultFrom(thinFilmInto(res, nIn, layers, nOut, wavelengthNm, thetaInRad));
}
