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
import { FRESNEL_AMPLITUDES_LENGTH, fresnelAmplitudesAt } from '../optics/fresnel';
import { reflectDirection, refractDirection } from '../optics/snell';

/** The current ray's field: Re Ex, Im Ex, Re Ey, Im Ey, Re Ez, Im Ez. */
export const field = new Float64Array(6);

// Amplitude coefficients of the current event (layout of fresnelAmplitudesAt)
const f = new Float64Array(FRESNEL_AMPLITUDES_LENGTH);

/** Outcome codes of {@link trackedInterface}. */
export const TRACK_REFLECTED = 0;
export const TRACK_TIR = 1;
export const TRACK_TRANSMITTED = 2;

// The current event's numbers live in one typed array, not in module-scope `let`s: the engine keeps a
// module variable holding a non-integer as a heap object, so every write to one would allocate.
const st = new Float64Array(11);
// s basis vector of the current event
const SX = 0;
const SY = 1;
const SZ = 2;
// Projections of the current field on s and p_i, set by project()
const ES_RE = 3;
const ES_IM = 4;
const EP_RE = 5;
const EP_IM = 6;
// The new field's components on s and p, read by setField()
const A_RE = 7;
const A_IM = 8;
const B_RE = 9;
const B_IM = 10;

/** Any unit vector ⊥ d into s: d × x̂, or d × ŷ when d is near x̂. */
function perpendicular(d: Float64Array): void {
  const dx = d[0];
  const dy = d[1];
  const dz = d[2];
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
  st[SX] = ax * inv;
  st[SY] = ay * inv;
  st[SZ] = az * inv;
}

/**
 * Starts a ray's field: linear polarisation at azimuth ψ = 2π·u about the unit direction d.
 * @param d unit direction [dx, dy, dz]; @param random [u], u uniform in [0, 1) (an array, so no number is boxed)
 */
export function launchPolarization(d: Float64Array, random: Float64Array): void {
  const u = random[0];
  const dx = d[0];
  const dy = d[1];
  const dz = d[2];
  perpendicular(d);
  // second basis vector w = d × s
  const wx = dy * st[SZ] - dz * st[SY];
  const wy = dz * st[SX] - dx * st[SZ];
  const wz = dx * st[SY] - dy * st[SX];
  const psi = 2 * Math.PI * u;
  const c = Math.cos(psi);
  const s = Math.sin(psi);
  field[0] = c * st[SX] + s * wx;
  field[1] = 0;
  field[2] = c * st[SY] + s * wy;
  field[3] = 0;
  field[4] = c * st[SZ] + s * wz;
  field[5] = 0;
}

/**
 * s = (d × n)/|d × n|, then Es = E·s and Ep = E·p_i with p_i = d × s.
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
    perpendicular(d);
  } else {
    const inv = 1 / Math.sqrt(len2);
    st[SX] = ax * inv;
    st[SY] = ay * inv;
    st[SZ] = az * inv;
  }
  const px = dy * st[SZ] - dz * st[SY];
  const py = dz * st[SX] - dx * st[SZ];
  const pz = dx * st[SY] - dy * st[SX];
  st[ES_RE] = field[0] * st[SX] + field[2] * st[SY] + field[4] * st[SZ];
  st[ES_IM] = field[1] * st[SX] + field[3] * st[SY] + field[5] * st[SZ];
  st[EP_RE] = field[0] * px + field[2] * py + field[4] * pz;
  st[EP_IM] = field[1] * px + field[3] * py + field[5] * pz;
}

/**
 * Writes E' = a·s + b·p (a, b complex, from st) into `field`, with p = d' × s for the new direction
 * d', renormalised to unit intensity.
 */
function setField(d: Float64Array): void {
  const dx = d[0];
  const dy = d[1];
  const dz = d[2];
  // p' = d' × s
  const px = dy * st[SZ] - dz * st[SY];
  const py = dz * st[SX] - dx * st[SZ];
  const pz = dx * st[SY] - dy * st[SX];
  const aRe = st[A_RE];
  const aIm = st[A_IM];
  const bRe = st[B_RE];
  const bIm = st[B_IM];
  const i2 = aRe * aRe + aIm * aIm + bRe * bRe + bIm * bIm;
  const inv = i2 > 0 ? 1 / Math.sqrt(i2) : 0;
  field[0] = (aRe * st[SX] + bRe * px) * inv;
  field[1] = (aIm * st[SX] + bIm * px) * inv;
  field[2] = (aRe * st[SY] + bRe * py) * inv;
  field[3] = (aIm * st[SY] + bIm * py) * inv;
  field[4] = (aRe * st[SZ] + bRe * pz) * inv;
  field[5] = (aIm * st[SZ] + bIm * pz) * inv;
}

/**
 * One dielectric interface for a tracked ray: chooses reflection with the ray's own probability
 * R = |rs Es|² + |rp Ep|² (|Es|² + |Ep|² = 1), replaces the direction d in place and updates `field`.
 * Coefficients from the core's fresnelAmplitudesAt (lossless media). The numbers come in an array,
 * not as arguments, so that a call the engine does not inline boxes nothing: no allocation per event.
 * @param d unit direction, replaced by the new one
 * @param n unit normal facing the incident side
 * @param args [cos θi ∈ [0, 1] (= −d·n), index on the incident side, index on the far side, uniform
 *   random number in [0, 1)]
 * @returns TRACK_REFLECTED, TRACK_TIR or TRACK_TRANSMITTED
 */
export function trackedInterface(d: Float64Array, n: Float64Array, args: Float64Array): number {
  const etaI = args[1];
  const etaT = args[2];
  const transmitted = fresnelAmplitudesAt(args, f);
  project(d, n);
  const ps = st[ES_RE] * st[ES_RE] + st[ES_IM] * st[ES_IM];
  const pp = st[EP_RE] * st[EP_RE] + st[EP_IM] * st[EP_IM];
  // R = (|rs|² |Es|² + |rp|² |Ep|²) / (|Es|² + |Ep|²)
  const R = ((f[0] * f[0] + f[1] * f[1]) * ps + (f[2] * f[2] + f[3] * f[3]) * pp) / (ps + pp);
  const tir = !transmitted;
  if (tir || args[3] < R) {
    // Reflect; E' = rs Es s + rp Ep p_r
    reflectDirection(d, d, n);
    // rs = f[0] + i f[1], rp = f[2] + i f[3]
    st[A_RE] = f[0] * st[ES_RE] - f[1] * st[ES_IM];
    st[A_IM] = f[0] * st[ES_IM] + f[1] * st[ES_RE];
    st[B_RE] = f[2] * st[EP_RE] - f[3] * st[EP_IM];
    st[B_IM] = f[2] * st[EP_IM] + f[3] * st[EP_RE];
    setField(d);
    return tir ? TRACK_TIR : TRACK_REFLECTED;
  }
  // Refract; E' = ts Es s + tp Ep p_t
  refractDirection(d, d, n, etaI, etaT);
  // ts = f[4] + i f[5], tp = f[6] + i f[7]
  st[A_RE] = f[4] * st[ES_RE] - f[5] * st[ES_IM];
  st[A_IM] = f[4] * st[ES_IM] + f[5] * st[ES_RE];
  st[B_RE] = f[6] * st[EP_RE] - f[7] * st[EP_IM];
  st[B_IM] = f[6] * st[EP_IM] + f[7] * st[EP_RE];
  setField(d);
  return TRACK_TRANSMITTED;
}

/**
 * A mirror (the base) for a tracked ray, with given complex amplitude reflection coefficients:
 * reflects with probability |rs Es|² + |rp Ep|², replacing d and updating `field`; otherwise the ray
 * is absorbed and nothing changes.
 * For a metal pass the core's coefficients; for a plain reflectance R use rs = −√R, rp = +√R (the
 * phases of a perfect conductor, which at normal incidence reflects s and p alike).
 * @param n unit normal facing the incident side
 * @param args [Re rs, Im rs, Re rp, Im rp, uniform random number in [0, 1)]
 * @returns true when the ray is reflected
 */
export function trackedMirror(d: Float64Array, n: Float64Array, args: Float64Array): boolean {
  const rsRe = args[0];
  const rsIm = args[1];
  const rpRe = args[2];
  const rpIm = args[3];
  project(d, n);
  st[A_RE] = rsRe * st[ES_RE] - rsIm * st[ES_IM];
  st[A_IM] = rsRe * st[ES_IM] + rsIm * st[ES_RE];
  st[B_RE] = rpRe * st[EP_RE] - rpIm * st[EP_IM];
  st[B_IM] = rpRe * st[EP_IM] + rpIm * st[EP_RE];
  const ps = st[ES_RE] * st[ES_RE] + st[ES_IM] * st[ES_IM];
  const pp = st[EP_RE] * st[EP_RE] + st[EP_IM] * st[EP_IM];
  // R = |rs Es|² + |rp Ep|², over the incoming intensity
  const R = (st[A_RE] * st[A_RE] + st[A_IM] * st[A_IM] + st[B_RE] * st[B_RE] + st[B_IM] * st[B_IM]) / (ps + pp);
  if (!(args[4] < R)) return false;
  reflectDirection(d, d, n);
  setField(d);
  return true;
}
