/**
 * Polarisation tracking for the 'track' mode: each ray carries its electric field as a complex
 * 3-vector E ⊥ d of unit intensity (|E|² = 1), held in the module-scope buffer `field`
 * (Re Ex, Im Ex, Re Ey, Im Ey, Re Ez, Im Ez).
 *
 * At an interface with unit normal n facing the incident side (cos θi = −d·n > 0):
 *   s = (d × n)/|d × n|, the same for incident, reflected and transmitted waves;
 *   p_w = d_w × s for each wave w, so (s, p, d) has the same handedness for all three — the basis
 *   in which the core's Fresnel coefficients hold (rp = −rs at normal incidence);
 *   Es = E·s, Ep = E·p_i (complex);
 *   reflection probability R = |rs|²|Es|² + |rp|²|Ep|² (s and p reflected fields are orthogonal);
 *   after the choice, E' = (r or t)s·Es·s + (r or t)p·Ep·p_w, renormalised to |E'|² = 1, so the ray
 *   carries the state conditional on the branch taken (no weights; the ledger stays integer).
 * Total internal reflection keeps |rs| = |rp| = 1 but shifts their phases, turning linear light
 * elliptical; the complex coefficients carry that.
 * Unpolarised emission: each ray starts linearly polarised at a uniform random azimuth about d; the
 * average over that azimuth is the unpolarised state (density matrix I/2), so every probability
 * averages to the unpolarised one.
 * Directions are updated with the core's vector Snell's law and law of reflection.
 * Sources: M. Born, E. Wolf, Principles of Optics, §1.5.2–1.5.4 (coefficients, TIR phase);
 * E. Hecht, Optics, §8.1 (natural light as an incoherent mixture).
 */
import { fresnelComplex } from '../optics/fresnel';
import { reflectDirection, refractDirection } from '../optics/snell';

/** The current ray's field: Re Ex, Im Ex, Re Ey, Im Ey, Re Ez, Im Ez. */
export const field = new Float64Array(6);

/** Outcome codes of {@link trackedInterface}. */
export const TRACK_REFLECTED = 0;
export const TRACK_TIR = 1;
export const TRACK_TRANSMITTED = 2;

// s basis vector of the current event
let sx = 0;
let sy = 0;
let sz = 0;
// Projections of the current field on s and p_i, set by project()
let esRe = 0;
let esIm = 0;
let epRe = 0;
let epIm = 0;

/** Any unit vector ⊥ d into (sx, sy, sz): d × x̂, or d × ŷ when d is near x̂. */
function perpendicular(dx: number, dy: number, dz: number): void {
  // d × x̂ = (0, dz, −dy); d × ŷ = (−dz, 0, dx)
  let ax = 0;
  let ay = dz;
  let az = -dy;
  if (Math.abs(dx) > 0.9) {
    ax = -dz;
    ay = 0;
    az = dx;
  }
  const inv = 1 / Math.sqrt(ax * ax + ay * ay + az * az);
  sx = ax * inv;
  sy = ay * inv;
  sz = az * inv;
}

/**
 * Starts a ray's field: linear polarisation at azimuth ψ = 2π·u about the unit direction d.
 * @param d unit direction [dx, dy, dz]; @param u uniform random number in [0, 1)
 */
export function launchPolarization(d: Float64Array, u: number): void {
  const dx = d[0];
  const dy = d[1];
  const dz = d[2];
  perpendicular(dx, dy, dz);
  // second basis vector w = d × s
  const wx = dy * sz - dz * sy;
  const wy = dz * sx - dx * sz;
  const wz = dx * sy - dy * sx;
  const psi = 2 * Math.PI * u;
  const c = Math.cos(psi);
  const s = Math.sin(psi);
  field[0] = c * sx + s * wx;
  field[1] = 0;
  field[2] = c * sy + s * wy;
  field[3] = 0;
  field[4] = c * sz + s * wz;
  field[5] = 0;
}

/**
 * s = (d × n)/|d × n| into (sx, sy, sz), then Es = E·s and Ep = E·p_i with p_i = d × s.
 * At normal incidence d × n vanishes and any unit vector ⊥ d serves (all are equivalent there).
 */
function project(d: Float64Array, n: Float64Array): void {
  const dx = d[0];
  const dy = d[1];
  const dz = d[2];
  const ax = dy * n[2] - dz * n[1];
  const ay = dz * n[0] - dx * n[2];
  const az = dx * n[1] - dy * n[0];
  const len2 = ax * ax + ay * ay + az * az;
  if (len2 < 1e-24) {
    perpendicular(dx, dy, dz);
  } else {
    const inv = 1 / Math.sqrt(len2);
    sx = ax * inv;
    sy = ay * inv;
    sz = az * inv;
  }
  const px = dy * sz - dz * sy;
  const py = dz * sx - dx * sz;
  const pz = dx * sy - dy * sx;
  esRe = field[0] * sx + field[2] * sy + field[4] * sz;
  esIm = field[1] * sx + field[3] * sy + field[5] * sz;
  epRe = field[0] * px + field[2] * py + field[4] * pz;
  epIm = field[1] * px + field[3] * py + field[5] * pz;
}

/**
 * Writes E' = (aRe + i aIm)·s + (bRe + i bIm)·p into `field`, with p = d' × s for the new direction
 * d', renormalised to unit intensity.
 */
function setField(d: Float64Array, aRe: number, aIm: number, bRe: number, bIm: number): void {
  const dx = d[0];
  const dy = d[1];
  const dz = d[2];
  // p' = d' × s
  const px = dy * sz - dz * sy;
  const py = dz * sx - dx * sz;
  const pz = dx * sy - dy * sx;
  const i2 = aRe * aRe + aIm * aIm + bRe * bRe + bIm * bIm;
  const inv = i2 > 0 ? 1 / Math.sqrt(i2) : 0;
  field[0] = (aRe * sx + bRe * px) * inv;
  field[1] = (aIm * sx + bIm * px) * inv;
  field[2] = (aRe * sy + bRe * py) * inv;
  field[3] = (aIm * sy + bIm * py) * inv;
  field[4] = (aRe * sz + bRe * pz) * inv;
  field[5] = (aIm * sz + bIm * pz) * inv;
}

/**
 * One dielectric interface for a tracked ray: chooses reflection with the ray's own probability
 * R = |rs Es|² + |rp Ep|² (|Es|² + |Ep|² = 1), replaces the direction d in place and updates `field`.
 * Coefficients from the core's fresnelComplex (lossless media).
 * @param d unit direction, replaced by the new one
 * @param n unit normal facing the incident side, −d·n = cosThetaI ∈ [0, 1]
 * @param etaI index on the incident side, @param etaT on the far side (> 0)
 * @param u uniform random number in [0, 1)
 * @returns TRACK_REFLECTED, TRACK_TIR or TRACK_TRANSMITTED
 */
export function trackedInterface(
  d: Float64Array,
  n: Float64Array,
  cosThetaI: number,
  etaI: number,
  etaT: number,
  u: number
): number {
  const cosI = cosThetaI < 1 ? cosThetaI : 1;
  const sin2I = 1 - cosI * cosI;
  const f = fresnelComplex(Math.sqrt(sin2I), etaI, 0, etaT, 0);
  project(d, n);
  const ps = esRe * esRe + esIm * esIm;
  const pp = epRe * epRe + epIm * epIm;
  // R = (Rs |Es|² + Rp |Ep|²) / (|Es|² + |Ep|²)
  const R = (f.Rs * ps + f.Rp * pp) / (ps + pp);
  const eta = etaI / etaT;
  const tir = eta * eta * sin2I >= 1;
  if (tir || u < R) {
    // Reflect; E' = rs Es s + rp Ep p_r
    reflectDirection(d, d, n);
    const rs = f.rs;
    const rp = f.rp;
    setField(
      d,
      rs.re * esRe - rs.im * esIm,
      rs.re * esIm + rs.im * esRe,
      rp.re * epRe - rp.im * epIm,
      rp.re * epIm + rp.im * epRe
    );
    return tir ? TRACK_TIR : TRACK_REFLECTED;
  }
  // Refract; E' = ts Es s + tp Ep p_t
  refractDirection(d, d, n, etaI, etaT);
  const ts = f.ts;
  const tp = f.tp;
  setField(
    d,
    ts.re * esRe - ts.im * esIm,
    ts.re * esIm + ts.im * esRe,
    tp.re * epRe - tp.im * epIm,
    tp.re * epIm + tp.im * epRe
  );
  return TRACK_TRANSMITTED;
}

/**
 * A mirror (the base) for a tracked ray, with given complex amplitude reflection coefficients:
 * reflects with probability |rs Es|² + |rp Ep|², replacing d and updating `field`; otherwise the ray
 * is absorbed and nothing changes.
 * For a metal pass the core's coefficients; for a plain reflectance R use rs = −√R, rp = +√R (the
 * phases of a perfect conductor, which at normal incidence reflects s and p alike).
 * @param n unit normal facing the incident side
 * @returns true when the ray is reflected
 */
export function trackedMirror(
  d: Float64Array,
  n: Float64Array,
  rsRe: number,
  rsIm: number,
  rpRe: number,
  rpIm: number,
  u: number
): boolean {
  project(d, n);
  const aRe = rsRe * esRe - rsIm * esIm;
  const aIm = rsRe * esIm + rsIm * esRe;
  const bRe = rpRe * epRe - rpIm * epIm;
  const bIm = rpRe * epIm + rpIm * epRe;
  const ps = esRe * esRe + esIm * esIm;
  const pp = epRe * epRe + epIm * epIm;
  // R = |rs Es|² + |rp Ep|², over the incoming intensity
  const R = (aRe * aRe + aIm * aIm + bRe * bRe + bIm * bIm) / (ps + pp);
  if (!(u < R)) return false;
  reflectDirection(d, d, n);
  setField(d, aRe, aIm, bRe, bIm);
  return true;
}
