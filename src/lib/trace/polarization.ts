/**
 * Polarisation tracking for the 'track' mode: each ray carries its electric field as a complex
 * 3-vector E ⊥ d of unit intensity (|E|² = 1), held in the module-scope buffer `field`
 * (Re Ex, Im Ex, Re Ey, Im Ey, Re Ez, Im Ez).
 *
 * At an interface with unit normal m (d·m = cos θi > 0):
 *   s = (d × m)/|d × m|, the same for incident, reflected and transmitted waves;
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
 * Sources: M. Born, E. Wolf, Principles of Optics, §1.5.2–1.5.4 (coefficients, TIR phase);
 * E. Hecht, Optics, §8.1 (natural light as an incoherent mixture).
 */
import { fresnelComplex } from '../optics/fresnel';

/** The current ray's field: Re Ex, Im Ex, Re Ey, Im Ey, Re Ez, Im Ez. */
export const field = new Float64Array(6);

/** New direction after the last tracked event (read by the ray loop). */
export const trackedDirection = new Float64Array(3);

/** Outcome codes of {@link trackedInterface}. */
export const TRACK_REFLECTED = 0;
export const TRACK_TIR = 1;
export const TRACK_TRANSMITTED = 2;

// s basis vector of the current event
let sx = 0;
let sy = 0;
let sz = 0;

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
 * @param u uniform random number in [0, 1)
 */
export function launchPolarization(dx: number, dy: number, dz: number, u: number): void {
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

/** s = (d × m)/|d × m| into (sx, sy, sz); at normal incidence any unit vector ⊥ d (all are equivalent). */
function sBasis(dx: number, dy: number, dz: number, mx: number, my: number, mz: number): void {
  const ax = dy * mz - dz * my;
  const ay = dz * mx - dx * mz;
  const az = dx * my - dy * mx;
  const len2 = ax * ax + ay * ay + az * az;
  if (len2 < 1e-24) {
    perpendicular(dx, dy, dz);
    return;
  }
  const inv = 1 / Math.sqrt(len2);
  sx = ax * inv;
  sy = ay * inv;
  sz = az * inv;
}

/**
 * Writes E' = (aRe + i aIm)·s + (bRe + i bIm)·p into `field`, p = d' × s with d' the new direction
 * in trackedDirection, and renormalises to unit intensity. Returns |E'|² before renormalising.
 */
function setField(aRe: number, aIm: number, bRe: number, bIm: number): number {
  const nx = trackedDirection[0];
  const ny = trackedDirection[1];
  const nz = trackedDirection[2];
  // p' = d' × s
  const px = ny * sz - nz * sy;
  const py = nz * sx - nx * sz;
  const pz = nx * sy - ny * sx;
  const i2 = aRe * aRe + aIm * aIm + bRe * bRe + bIm * bIm;
  const inv = i2 > 0 ? 1 / Math.sqrt(i2) : 0;
  field[0] = (aRe * sx + bRe * px) * inv;
  field[1] = (aIm * sx + bIm * px) * inv;
  field[2] = (aRe * sy + bRe * py) * inv;
  field[3] = (aIm * sy + bIm * py) * inv;
  field[4] = (aRe * sz + bRe * pz) * inv;
  field[5] = (aIm * sz + bIm * pz) * inv;
  return i2;
}

// Projections of the current field on s and p_i, set by project()
let esRe = 0;
let esIm = 0;
let epRe = 0;
let epIm = 0;

/** Es = E·s, Ep = E·p_i with p_i = d × s (complex dot products with real basis vectors). */
function project(dx: number, dy: number, dz: number): void {
  const px = dy * sz - dz * sy;
  const py = dz * sx - dx * sz;
  const pz = dx * sy - dy * sx;
  esRe = field[0] * sx + field[2] * sy + field[4] * sz;
  esIm = field[1] * sx + field[3] * sy + field[5] * sz;
  epRe = field[0] * px + field[2] * py + field[4] * pz;
  epIm = field[1] * px + field[3] * py + field[5] * pz;
}

/**
 * One dielectric interface for a tracked ray: chooses reflection with the ray's own probability
 * R = |rs Es|² + |rp Ep|² (|Es|² + |Ep|² = 1), updates `field`, and writes the new direction to
 * trackedDirection. Coefficients from the core's fresnelComplex (lossless media).
 * @param d unit direction; @param m unit normal with d·m = cosThetaI > 0
 * @param etaI, etaT real indices on the incident and far side (> 0)
 * @param u uniform random number in [0, 1)
 * @returns TRACK_REFLECTED, TRACK_TIR or TRACK_TRANSMITTED
 */
export function trackedInterface(
  dx: number,
  dy: number,
  dz: number,
  mx: number,
  my: number,
  mz: number,
  cosThetaI: number,
  etaI: number,
  etaT: number,
  u: number
): number {
  const cosI = cosThetaI < 1 ? cosThetaI : 1;
  const sin2I = 1 - cosI * cosI;
  const f = fresnelComplex(Math.sqrt(sin2I), etaI, 0, etaT, 0);
  sBasis(dx, dy, dz, mx, my, mz);
  project(dx, dy, dz);
  const ps = esRe * esRe + esIm * esIm;
  const pp = epRe * epRe + epIm * epIm;
  // R = (Rs |Es|² + Rp |Ep|²) / (|Es|² + |Ep|²)
  const R = (f.Rs * ps + f.Rp * pp) / (ps + pp);
  const eta = etaI / etaT;
  const sin2T = eta * eta * sin2I;
  const tir = sin2T >= 1;
  if (tir || u < R) {
    // Reflect: d_r = d − 2 cosθi m; E' = rs Es s + rp Ep p_r
    const c2 = 2 * cosI;
    trackedDirection[0] = dx - c2 * mx;
    trackedDirection[1] = dy - c2 * my;
    trackedDirection[2] = dz - c2 * mz;
    const rs = f.rs;
    const rp = f.rp;
    setField(
      rs.re * esRe - rs.im * esIm,
      rs.re * esIm + rs.im * esRe,
      rp.re * epRe - rp.im * epIm,
      rp.re * epIm + rp.im * epRe
    );
    return tir ? TRACK_TIR : TRACK_REFLECTED;
  }
  // Refract: d_t = η d + (cosθt − η cosθi) m; E' = ts Es s + tp Ep p_t
  const cosT = Math.sqrt(1 - sin2T);
  const a = cosT - eta * cosI;
  const tx = eta * dx + a * mx;
  const ty = eta * dy + a * my;
  const tz = eta * dz + a * mz;
  const inv = 1 / Math.sqrt(tx * tx + ty * ty + tz * tz);
  trackedDirection[0] = tx * inv;
  trackedDirection[1] = ty * inv;
  trackedDirection[2] = tz * inv;
  const ts = f.ts;
  const tp = f.tp;
  setField(
    ts.re * esRe - ts.im * esIm,
    ts.re * esIm + ts.im * esRe,
    tp.re * epRe - tp.im * epIm,
    tp.re * epIm + tp.im * epRe
  );
  return TRACK_TRANSMITTED;
}

/**
 * A mirror (the base) for a tracked ray, with given complex amplitude reflection coefficients:
 * reflects with probability |rs Es|² + |rp Ep|², updating `field` and trackedDirection; otherwise
 * the ray is absorbed and nothing changes.
 * For a metal pass the core's coefficients; for a plain reflectance R use rs = −√R, rp = +√R (the
 * phases of a perfect conductor, which at normal incidence reflects s and p alike).
 * @returns true when the ray is reflected
 */
export function trackedMirror(
  dx: number,
  dy: number,
  dz: number,
  mx: number,
  my: number,
  mz: number,
  cosThetaI: number,
  rsRe: number,
  rsIm: number,
  rpRe: number,
  rpIm: number,
  u: number
): boolean {
  sBasis(dx, dy, dz, mx, my, mz);
  project(dx, dy, dz);
  const aRe = rsRe * esRe - rsIm * esIm;
  const aIm = rsRe * esIm + rsIm * esRe;
  const bRe = rpRe * epRe - rpIm * epIm;
  const bIm = rpRe * epIm + rpIm * epRe;
  const ps = esRe * esRe + esIm * esIm;
  const pp = epRe * epRe + epIm * epIm;
  // R = |rs Es|² + |rp Ep|², over the incoming intensity
  const R = (aRe * aRe + aIm * aIm + bRe * bRe + bIm * bIm) / (ps + pp);
  if (!(u < R)) return false;
  const c2 = 2 * cosThetaI;
  trackedDirection[0] = dx - c2 * mx;
  trackedDirection[1] = dy - c2 * my;
  trackedDirection[2] = dz - c2 * mz;
  setField(aRe, aIm, bRe, bIm);
  return true;
}
