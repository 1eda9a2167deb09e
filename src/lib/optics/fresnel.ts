/**
 * Fresnel reflection and transmission at a single planar interface.
 *
 * Sign convention (N = n + i·k, fields ∝ e^{i(k·r − ωt)}, so k ≥ 0 means absorption):
 *   rs = (N1 cosθ1 − N2 cosθ2) / (N1 cosθ1 + N2 cosθ2)
 *   rp = (N2 cosθ1 − N1 cosθ2) / (N2 cosθ1 + N1 cosθ2)
 *   ts = 2 N1 cosθ1 / (N1 cosθ1 + N2 cosθ2),   tp = 2 N1 cosθ1 / (N2 cosθ1 + N1 cosθ2)
 * At normal incidence this gives rp = −rs; only |r|² matters for power.
 * Source: M. Born, E. Wolf, Principles of Optics, 7th ed., §1.5.2 (dielectrics) and §14.2 (absorbing media).
 */
import { cDivInto, type Complex } from './complex';
import { propagationFactorInto } from './propagation-factor';
import { requireInRange, requirePositive, requireNonNegative } from './guard';

// Roundoff allowance on a cosine passed in by a ray tracer (a normalised dot product can reach 1 + 2ε).
const COS_SLACK = 1e-9;

// The hot functions test their inputs inline and call these only to throw: a call the engine does not
// inline boxes every floating-point argument and result, and the ray tracer calls them per event.
function throwCos(cosThetaI: number): never {
  throw new RangeError(`cosThetaI must be a number in [0, 1] (got ${cosThetaI})`);
}

function throwEta(field: string, eta: number): never {
  throw new RangeError(`${field} must be a finite number > 0 (got ${eta})`);
}

/** fresnelReal's inputs, for its array form. */
const realIn = new Float64Array(3);

/**
 * Power reflectances of a lossless dielectric interface, s and p, plus the cosine of the refraction angle.
 * Hot path: allocates nothing; the checks are plain comparisons.
 *
 *   sin²θt = (etaI/etaT)² (1 − cos²θi);  TIR when sin²θt ≥ 1
 *   Rs = ((etaI cosθi − etaT cosθt)/(etaI cosθi + etaT cosθt))²
 *   Rp = ((etaT cosθi − etaI cosθt)/(etaT cosθi + etaI cosθt))²
 *
 * @param cosThetaI cosine of the angle of incidence, [0, 1] (roundoff up to 1e-9 outside is clamped)
 * @param etaI refractive index on the incident side (> 0)
 * @param etaT refractive index on the far side (> 0)
 * @param out receives out[0] = Rs, out[1] = Rp, out[2] = cosθt (≥ 0); length ≥ 3
 * @returns true if light is transmitted; false on total internal reflection (then Rs = Rp = 1,
 *   cosθt = 0). Exactly at the critical angle (sin θt = 1) counts as total reflection. Equal indices
 *   give Rs = Rp = 0 and cosθt = cosθi at every angle, grazing included.
 * @example fresnelReal(1, 1.5, 1, out) // out[0] = out[1] = 0.04
 * @see M. Born, E. Wolf, Principles of Optics, §1.5.2
 */
export function fresnelReal(cosThetaI: number, etaI: number, etaT: number, out: Float64Array): boolean {
  realIn[0] = cosThetaI;
  realIn[1] = etaI;
  realIn[2] = etaT;
  return fresnelRealAt(realIn, out);
}

/**
 * {@link fresnelReal} with its numbers in an array, inp = [cos θi, etaI, etaT], so that a call the
 * engine does not inline boxes nothing (the tracer's bounce loop). Same outputs and result: it checks
 * its arguments and hands the array to {@link fresnelRealTrusted}, where the formulas live.
 */
export function fresnelRealAt(inp: Float64Array, out: Float64Array): boolean {
  const cosI = inp[0];
  const etaI = inp[1];
  const etaT = inp[2];
  if (!(cosI >= -COS_SLACK && cosI <= 1 + COS_SLACK)) throwCos(cosI);
  if (!(etaI > 0 && etaI < Infinity)) throwEta('etaI', etaI);
  if (!(etaT > 0 && etaT < Infinity)) throwEta('etaT', etaT);
  return fresnelRealTrusted(inp, out);
}

/**
 * {@link fresnelRealAt} without its checks, for a caller that has checked the indices once (the ray
 * tracer's scene compile) and passes a cosine of a unit vector (clamped here to [0, 1]). Small, so the
 * tracer's bounce loop inlines it together with its random-number step.
 */
export function fresnelRealTrusted(inp: Float64Array, out: Float64Array): boolean {
  let cosI = inp[0];
  const etaI = inp[1];
  const etaT = inp[2];
  cosI = cosI > 1 ? 1 : cosI < 0 ? 0 : cosI;

  // Index matched: no interface
  if (etaI === etaT) {
    out[0] = 0;
    out[1] = 0;
    out[2] = cosI;
    return true;
  }

  // Snell: sin θt = (etaI/etaT) sin θi
  const eta = etaI / etaT;
  const sin2T = eta * eta * (1 - cosI * cosI);

  // Handle total internal reflection
  if (sin2T >= 1) {
    out[0] = 1;
    out[1] = 1;
    out[2] = 0;
    return false;
  }
  const cosT = Math.sqrt(1 - sin2T);

  // Fresnel amplitude coefficients, Born & Wolf §1.5.2
  const rs = (etaI * cosI - etaT * cosT) / (etaI * cosI + etaT * cosT);
  const rp = (etaT * cosI - etaI * cosT) / (etaT * cosI + etaI * cosT);
  out[0] = rs * rs;
  out[1] = rp * rp;
  out[2] = cosT;
  return true;
}

/** Length of the buffer {@link fresnelAmplitudesAt} fills. */
export const FRESNEL_AMPLITUDES_LENGTH = 8;

/**
 * Complex amplitude coefficients of a lossless dielectric interface, including the phase shifts of
 * total internal reflection. Hot path: allocates nothing, and takes its numbers in an array so that a
 * call the engine does not inline boxes nothing (the polarisation-tracking tracer); agrees with
 * {@link fresnelComplex} for k = 0.
 *
 *   below the critical angle (all real): rs, rp as in fresnelReal,
 *     ts = 2 etaI cosθi/(etaI cosθi + etaT cosθt),  tp = 2 etaI cosθi/(etaT cosθi + etaI cosθt)
 *   beyond it, with a = etaI cosθi, q = √(etaI² sin²θi − etaT²), c = etaT² cosθi, e = etaI q:
 *     rs = (a − iq)/(a + iq),  rp = (c − ie)/(c + ie)  (|rs| = |rp| = 1),  ts = tp = 0 (no travelling wave)
 *
 * @param inp [cos θi in [0, 1], index on the incident side (> 0), index on the far side (> 0)]; may be out
 * @param out receives Re rs, Im rs, Re rp, Im rp, Re ts, Im ts, Re tp, Im tp; length ≥ 8
 * @returns true if light is transmitted; false on total internal reflection (exactly critical included)
 * @example fresnelAmplitudesAt(Float64Array.of(1, 1, 1.5), out) // out[0] = −0.2, out[2] = +0.2 (rp = −rs at normal incidence)
 * @see M. Born, E. Wolf, Principles of Optics, §1.5.2 (coefficients) and §1.5.4 (total reflection)
 */
export function fresnelAmplitudesAt(inp: Float64Array, out: Float64Array): boolean {
  const cos0 = inp[0];
  const etaI = inp[1];
  const etaT = inp[2];
  if (!(cos0 >= -COS_SLACK && cos0 <= 1 + COS_SLACK)) throwCos(cos0);
  const cosI = cos0 > 1 ? 1 : cos0 < 0 ? 0 : cos0;
  if (!(etaI > 0 && etaI < Infinity)) throwEta('etaI', etaI);
  if (!(etaT > 0 && etaT < Infinity)) throwEta('etaT', etaT);
  out[1] = out[3] = out[5] = out[7] = 0;
  // Index matched: no interface (also the 0/0 limit at grazing incidence)
  if (etaI === etaT) {
    out[0] = out[2] = 0;
    out[4] = out[6] = 1;
    return true;
  }
  const sin2I = 1 - cosI * cosI;
  const eta = etaI / etaT;
  const sin2T = eta * eta * sin2I;
  if (sin2T >= 1) {
    const a = etaI * cosI;
    const q = Math.sqrt(etaI * etaI * sin2I - etaT * etaT);
    const c = etaT * etaT * cosI;
    const e = etaI * q;
    // (x − iy)/(x + iy) = (x² − y² − 2ixy)/(x² + y²)
    out[0] = (a * a - q * q) / (a * a + q * q);
    out[1] = (-2 * a * q) / (a * a + q * q);
    out[2] = (c * c - e * e) / (c * c + e * e);
    out[3] = (-2 * c * e) / (c * c + e * e);
    out[4] = out[6] = 0;
    return false;
  }
  const cosT = Math.sqrt(1 - sin2T);
  const ds = etaI * cosI + etaT * cosT;
  const dp = etaT * cosI + etaI * cosT;
  out[0] = (etaI * cosI - etaT * cosT) / ds;
  out[2] = (etaT * cosI - etaI * cosT) / dp;
  out[4] = (2 * etaI * cosI) / ds;
  out[6] = (2 * etaI * cosI) / dp;
  return true;
}

const unpolScratch = new Float64Array(3);

/**
 * Unpolarised power reflectance at a dielectric interface: R = (Rs + Rp) / 2.
 * Returns 1 at and beyond the critical angle (total internal reflection).
 * @param cosThetaI cosine of the angle of incidence, [0, 1]
 * @param etaI index on the incident side (> 0); @param etaT index on the far side (> 0)
 * @example reflectanceUnpolarised(Math.cos(Math.PI / 4), 1, 1.5) // ≈ 0.05024
 * @see M. Born, E. Wolf, Principles of Optics, §1.5.2
 */
export function reflectanceUnpolarised(cosThetaI: number, etaI: number, etaT: number): number {
  fresnelReal(cosThetaI, etaI, etaT, unpolScratch);
  return 0.5 * (unpolScratch[0] + unpolScratch[1]);
}

/** Result of {@link fresnelComplex}. */
export interface FresnelComplexResult {
  rs: Complex;
  rp: Complex;
  ts: Complex;
  tp: Complex;
  Rs: number;
  Rp: number;
  Ts: number;
  Tp: number;
  /** unpolarised reflectance (Rs + Rp)/2 */
  R: number;
  /** unpolarised transmittance (Ts + Tp)/2 */
  T: number;
}

// Scratch for the complex helpers (re at even index, im at odd).
const z = new Float64Array(16);

/**
 * Fresnel coefficients for complex indices N = n + ik on either side (absorbing chips, metals with
 * n < 1), valid beyond the critical angle (then |rs| = |rp| = 1 and T = 0, evanescent field in medium 2).
 *
 *   β = N1 sin θ1 (conserved),  N2 cos θ2 = √(N2² − β²) with Im ≥ 0 (transmitted wave decays)
 *   rs, rp, ts, tp as in the file header
 *   Ts = Re(N2 cosθ2) / Re(N1 cosθ1) · |ts|²
 *   Tp = Re(N2* cosθ2) / Re(N1* cosθ1) · |tp|²   (* = complex conjugate)
 *
 * For a lossless incident medium (kI = 0) R + T = 1 when medium 2 is lossless, and T is the power
 * entering medium 2 when it absorbs. With kI > 0 the angle θ1 is taken as real (the usual convention for
 * an absorbing chip) and incident and reflected waves interfere in the flux, so R + T need not be 1:
 * use kI = 0 where energy bookkeeping matters. At grazing incidence (sinThetaI = 1) Ts = Tp = 0.
 *
 * @param sinThetaI sine of the angle of incidence, [0, 1]
 * @param nI real part of the incident index (> 0); @param kI its extinction coefficient (≥ 0)
 * @param nT real part of the far-side index (> 0, may be < 1 for metals); @param kT (≥ 0)
 * @example fresnelComplex(0, 1, 0, 0.04382, 3.6101).R // ≈ 0.9876 (silver, 550 nm)
 * @see M. Born, E. Wolf, Principles of Optics, §1.5.2 and §14.2
 */
export function fresnelComplex(
  sinThetaI: number,
  nI: number,
  kI: number,
  nT: number,
  kT: number
): FresnelComplexResult {
  requireInRange('sinThetaI', sinThetaI, 0, 1);
  requirePositive('nI', nI);
  requireNonNegative('kI', kI);
  requirePositive('nT', nT);
  requireNonNegative('kT', kT);

  const cos1 = Math.sqrt(1 - sinThetaI * sinThetaI);
  // β = N1 sin θ1
  const betaRe = nI * sinThetaI;
  const betaIm = kI * sinThetaI;
  // a = N1 cos θ1 (z[0..1]), b = N2 cos θ2 (z[2..3])
  const aRe = nI * cos1;
  const aIm = kI * cos1;
  propagationFactorInto(z, 2, nT, kT, betaRe, betaIm);
  const bRe = z[2];
  const bIm = z[3];

  // s: rs = (a − b)/(a + b), ts = 2a/(a + b)
  const dsRe = aRe + bRe;
  const dsIm = aIm + bIm;
  cDivInto(z, 4, aRe - bRe, aIm - bIm, dsRe, dsIm);
  cDivInto(z, 6, 2 * aRe, 2 * aIm, dsRe, dsIm);
  const rs = { re: z[4], im: z[5] };
  const ts = { re: z[6], im: z[7] };

  // p, multiplied through by N2: rp = (N2² cosθ1 − N1·b)/(N2² cosθ1 + N1·b), tp = 2 N1 N2 cosθ1 / (same)
  const n2Re = nT * nT - kT * kT;
  const n2Im = 2 * nT * kT;
  const pRe = n2Re * cos1;
  const pIm = n2Im * cos1;
  const eRe = nI * bRe - kI * bIm;
  const eIm = nI * bIm + kI * bRe;
  const dpRe = pRe + eRe;
  const dpIm = pIm + eIm;
  // N1 N2
  const mRe = nI * nT - kI * kT;
  const mIm = nI * kT + kI * nT;
  cDivInto(z, 8, pRe - eRe, pIm - eIm, dpRe, dpIm);
  cDivInto(z, 10, 2 * mRe * cos1, 2 * mIm * cos1, dpRe, dpIm);
  const rp = { re: z[8], im: z[9] };
  const tp = { re: z[10], im: z[11] };

  // Index matched at grazing incidence: 0/0 above; the limit is no reflection, full transmission.
  const matched = nI === nT && kI === kT;
  const Rs = matched ? 0 : rs.re * rs.re + rs.im * rs.im;
  const Rp = matched ? 0 : rp.re * rp.re + rp.im * rp.im;

  // Power transmittances (normal component of the Poynting vector): Born & Wolf §1.5.3
  let Ts = 0;
  let Tp = 0;
  if (aRe > 0) {
    Ts = matched ? 1 : (bRe / aRe) * (ts.re * ts.re + ts.im * ts.im);
    // cos θ2 = b / N2, cos θ1 real; Re(N2* cosθ2) / Re(N1* cosθ1)
    cDivInto(z, 12, bRe, bIm, nT, kT);
    const c2Re = z[12];
    const c2Im = z[13];
    const numP = nT * c2Re + kT * c2Im; // Re(conj(N2)·cosθ2)
    const denP = nI * cos1; // Re(conj(N1)·cosθ1), cosθ1 real
    Tp = matched ? 1 : (numP / denP) * (tp.re * tp.re + tp.im * tp.im);
  }
  if (matched) {
    rs.re = rs.im = rp.re = rp.im = 0;
    ts.re = tp.re = 1;
    ts.im = tp.im = 0;
  }

  return { rs, rp, ts, tp, Rs, Rp, Ts, Tp, R: 0.5 * (Rs + Rp), T: 0.5 * (Ts + Tp) };
}

/**
 * Power reflectances Rs, Rp of a lossless medium (index etaI) against an absorbing one
 * N = nT + i·kT (a metal reflector, an absorbing chip). Allocates nothing.
 *
 *   q = N cosθt = √(N² − etaI² sin²θi)  (Im q ≥ 0)
 *   Rs = |(etaI cosθi − q)/(etaI cosθi + q)|²
 *   Rp = |(N² cosθi − etaI q)/(N² cosθi + etaI q)|²
 *
 * @param cosThetaI cosine of the angle of incidence, [0, 1]
 * @param etaI real index on the incident side (> 0)
 * @param nT real part of the far-side index (> 0; metals have nT < 1); @param kT extinction (≥ 0)
 * @param out receives out[0] = Rs, out[1] = Rp; length ≥ 2
 * @returns out
 * @example reflectanceComplex(1, 1, 0.4892, 4.7783, out) // out[0] ≈ 0.9219 (aluminium, 450 nm)
 * @see M. Born, E. Wolf, Principles of Optics, §14.2
 */
export function reflectanceComplex(
  cosThetaI: number,
  etaI: number,
  nT: number,
  kT: number,
  out: Float64Array
): Float64Array {
  mirrorIn[0] = cosThetaI;
  mirrorIn[1] = etaI;
  mirrorIn[2] = nT;
  mirrorIn[3] = kT;
  mirrorAmplitudesAt(mirrorIn, mirrorOut);
  out[0] = mirrorOut[4];
  out[1] = mirrorOut[5];
  return out;
}

const mirrorIn = new Float64Array(4);
const mirrorOut = new Float64Array(6);

/** Length of the buffer {@link mirrorAmplitudesAt} fills. */
export const MIRROR_AMPLITUDES_LENGTH = 6;

/**
 * Amplitude and power reflection coefficients of a lossless medium (index etaI) against an absorbing
 * one N = nT + i·kT, with every number in an array — inp = [cos θi, etaI, nT, kT] — so that a call the
 * engine does not inline boxes nothing (the tracer's metal base). Writes
 * out = [Re rs, Im rs, Re rp, Im rp, Rs, Rp]. Same convention as {@link fresnelComplex}:
 *
 *   q = N cosθt = √(N² − etaI² sin²θi), the root with Im q ≥ 0 (the principal root, as Im N² ≥ 0)
 *   rs = (etaI cosθi − q)/(etaI cosθi + q),  rp = (N² cosθi − etaI q)/(N² cosθi + etaI q)
 *
 * @returns out
 * @see M. Born, E. Wolf, Principles of Optics, §1.5.2 and §14.2
 */
export function mirrorAmplitudesAt(inp: Float64Array, out: Float64Array): Float64Array {
  const cos0 = inp[0];
  const etaI = inp[1];
  const nT = inp[2];
  const kT = inp[3];
  if (!(cos0 >= -COS_SLACK && cos0 <= 1 + COS_SLACK)) throwCos(cos0);
  const cosI = cos0 > 1 ? 1 : cos0 < 0 ? 0 : cos0;
  if (!(etaI > 0 && etaI < Infinity)) throwEta('etaI', etaI);
  if (!(nT > 0 && nT < Infinity)) throwEta('nT', nT);
  if (!(kT >= 0 && kT < Infinity)) {
    throw new RangeError(`kT must be a finite number ≥ 0 (got ${kT})`);
  }
  // Index matched: no interface at any angle (near grazing the quotients below underflow to 0/0).
  if (etaI === nT && kT === 0) {
    out.fill(0);
    return out;
  }
  // w = N² − etaI² sin²θi, Im w = 2 nT kT ≥ 0; principal square root, stable form (as in cSqrtInto)
  const wRe = nT * nT - kT * kT - etaI * etaI * (1 - cosI * cosI);
  const wIm = 2 * nT * kT;
  const t = Math.sqrt((Math.sqrt(wRe * wRe + wIm * wIm) + Math.abs(wRe)) / 2);
  let qRe = 0;
  let qIm = 0;
  if (t > 0) {
    qRe = wRe >= 0 ? t : wIm / (2 * t);
    qIm = wRe >= 0 ? wIm / (2 * t) : t;
  }
  // rs = (a − q)/(a + q) = (a − q)·conj(a + q)/|a + q|²
  const a = etaI * cosI;
  const dS = (a + qRe) * (a + qRe) + qIm * qIm;
  const rsRe = dS > 0 ? (a * a - qRe * qRe - qIm * qIm) / dS : 0;
  const rsIm = dS > 0 ? (-2 * a * qIm) / dS : 0;
  // rp = (P − E)/(P + E) with P = N² cosθi, E = etaI q
  const pRe = (nT * nT - kT * kT) * cosI;
  const pIm = 2 * nT * kT * cosI;
  const eRe = etaI * qRe;
  const eIm = etaI * qIm;
  const dP = (pRe + eRe) * (pRe + eRe) + (pIm + eIm) * (pIm + eIm);
  const rpRe = dP > 0 ? (pRe * pRe - eRe * eRe + pIm * pIm - eIm * eIm) / dP : 0;
  const rpIm = dP > 0 ? (2 * (pIm * eRe - pRe * eIm)) / dP : 0;
  out[0] = rsRe;
  out[1] = rsIm;
  out[2] = rpRe;
  out[3] = rpIm;
  out[4] = rsRe * rsRe + rsIm * rsIm;
  out[5] = rpRe * rpRe + rpIm * rpIm;
  return out;
}

/**
 * Power reflectance at normal incidence between two media with complex indices:
 *   R = |N1 − N2|² / |N1 + N2|² = ((n1 − n2)² + (k1 − k2)²) / ((n1 + n2)² + (k1 + k2)²)
 * Lossless: ((n1 − n2)/(n1 + n2))². The result is symmetric in the two media.
 * @param n1 real index of medium 1 (> 0); @param k1 its extinction coefficient (≥ 0)
 * @param n2 real index of medium 2 (> 0); @param k2 its extinction coefficient (≥ 0)
 * @example normalReflectance(1.5, 0, 1, 0) // 0.04
 * @see M. Born, E. Wolf, Principles of Optics, §1.5.2 and §14.2
 */
export function normalReflectance(n1: number, k1: number, n2: number, k2: number): number {
  requirePositive('n1', n1);
  requireNonNegative('k1', k1);
  requirePositive('n2', n2);
  requireNonNegative('k2', k2);
  const dn = n1 - n2;
  const dk = k1 - k2;
  const sn = n1 + n2;
  const sk = k1 + k2;
  return (dn * dn + dk * dk) / (sn * sn + sk * sk);
}
