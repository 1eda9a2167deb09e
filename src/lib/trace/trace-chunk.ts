/**
 * The Monte Carlo ray loop: traces one chunk of rays through a package and adds their fates to a tally.
 *
 * Model (units mm, z up, base plane z = 0; see package-spec.ts):
 * - A ray knows its medium (chip or encapsulant) and meets only the surfaces bounding it: chip faces
 *   and the base from inside the chip; chip faces, base plane and the outer surface from the encapsulant.
 * - At each dielectric interface the core Fresnel functions decide: total internal reflection, else
 *   reflection with probability R = (Rs + Rp)/2 ('average') or the ray's own polarised R ('track',
 *   see polarization.ts), else refraction by the core's vector Snell's law.
 * - The base is a specular mirror: reflect with probability R (a fixed number, or a metal's R at the
 *   angle of incidence from the adjacent medium), else the ray is absorbed at the base.
 * - Bulk absorption by Beer–Lambert: each ray draws one optical depth τ ~ Exp(1) at launch and spends
 *   α·t of it on every segment of length t; it is absorbed where the total reaches τ. This is the same
 *   as drawing a fresh exponential free path per segment (the exponential is memoryless) and needs one
 *   logarithm per ray.
 * - Escape is final: a ray refracted into the outside medium is counted escaped at that moment, with
 *   its polar angle, and never returns (even if, heading down, it would meet the base plane again);
 *   escapes heading below the horizon are also counted in escapedBelowHorizon.
 * - Every ray ends in exactly one ledger bin: escaped, absorbed in chip / encapsulant / at base, or lost
 *   (event cap reached, or a geometry error — no surface found where one must exist — also counted in
 *   geometryErrors). One event = one segment ending on a surface (or in absorption).
 *
 * Speed: the loop allocates nothing per ray or event, in both polarisation modes. The ray lives in the module-scope Float64Array
 * `ray`; the loop's functions pass only small integers (media, faces, outcomes), never floating-point
 * numbers, which the engine would box into heap objects whenever it declines to inline a call. Each
 * step is split in two — the segment (stepInChip / stepInEncapsulant) and the surface event
 * (chipWallEvent / encapsulantSurfaceEvent) — so that each is optimised with its own inlining budget
 * and the core Fresnel function is inlined whole rather than half (measured: 43 bytes of garbage per
 * ray before the split, none after).
 * Sources: M. Pharr, W. Jakob, G. Humphreys, Physically Based Rendering, 3rd ed. (choosing
 * reflection with probability R, §14.1; exponential free paths, §15.2); G. Marsaglia, "Choosing a
 * point from the surface of a sphere", Ann. Math. Stat. 43, 645 (1972) (isotropic directions).
 */
import { fresnelReal, MIRROR_AMPLITUDES_LENGTH, mirrorAmplitudesAt } from '../optics/fresnel';
import { reflectDirection, refractDirection } from '../optics/snell';
import { boxEntry } from './box-entry';
import { boxExit } from './box-exit';
import { cylinderExit } from './cylinder-exit';
import { DEFAULT_MAX_EVENTS, emitterHeightMm, type TracePackage } from './package-spec';
import { TRACK_TIR, TRACK_TRANSMITTED, launchPolarization, trackedInterface, trackedMirror } from './polarization';
import { nextFloat, seedChunk } from './rng';
import { spheroidExit } from './spheroid-exit';
import {
  BASE,
  CHIP_BOTTOM,
  CHIP_TOP,
  CHIP_X_NEG,
  CHIP_X_POS,
  CHIP_Y_NEG,
  CHIP_Y_POS,
  CYLINDER_SIDE,
  CYLINDER_TOP,
  DOME,
  SURFACE_NONE
} from './surfaces';
import { POLAR_BINS, type Tally } from './tally';

const SHAPE_NONE = 0;
const SHAPE_DOME = 1;
const SHAPE_CYLINDER = 2;

// Outcomes of one dielectric interface event
const REFLECTED = 0;
const TIR = 1;
const TRANSMITTED = 2;

// Outcomes of a step; 3..11 end the ray and index `fates`. A step moves the ray along one segment;
// when it ends on an interface it returns AT_SURFACE and the surface's own event function follows.
const GO_ON = 0;
const ENTER_ENCAPSULANT = 1;
const ENTER_CHIP = 2;
const ESCAPED_CHIP_TOP = 3;
const ESCAPED_CHIP_SIDE = 4;
const ESCAPED_DOME = 5;
const ESCAPED_CYLINDER_TOP = 6;
const ESCAPED_CYLINDER_SIDE = 7;
const ABSORBED_CHIP = 8;
const ABSORBED_ENCAPSULANT = 9;
const ABSORBED_BASE = 10;
const GEOMETRY_ERROR = 11;
const AT_SURFACE = 15;

const DEG_PER_RAD = 180 / Math.PI;
/** Rays between progress callbacks inside a chunk. */
const PROGRESS_EVERY = 2048;

// The current ray: [x, y, z, dx, dy, dz, τ left], mm and unit direction; `direction` views ray[3..5]
const ray = new Float64Array(7);
const direction = ray.subarray(3, 6);
// Unit normal of the current surface, facing the incident side (cos θi = −d·n)
const normal = new Float64Array(3);
const hit = new Float64Array(1);
const fr = new Float64Array(3);
// A metal base's inputs [cos θi, index above, n, k] and coefficients (layout of mirrorAmplitudesAt)
const mirrorIn = new Float64Array(4);
const mirror = new Float64Array(MIRROR_AMPLITUDES_LENGTH);
// numbers handed to the polarisation functions (see polarization.ts: arrays, so nothing is boxed)
const trackArgs = new Float64Array(5);
// Chip box [a, b, H, self-hit eps, emitter height] and encapsulant shell [R, h], mm
const box = new Float64Array(5);
const shell = new Float64Array(2);
// Ray fates of the current chunk, indexed by step outcome; slots 12–14: lost, escaped below, events
const fates = new Float64Array(15);

// Media by number — chip, encapsulant, outside — so calls pass small integers, never boxed doubles
const CHIP = 0;
const ENCAPSULANT = 1;
const OUTSIDE = 2;
// Refractive index and absorption coefficient (1/mm) of each medium
const indexOf = new Float64Array(3);
const alphaOf = new Float64Array(3);

// Package constants, set once per chunk by configure()
let shape = SHAPE_NONE;
let aroundChip = OUTSIDE;
let volumeEmission = false;
let absorbing = false;
let track = false;
let metalBase = false;
let baseReflectance = 0;
let baseN = 1;
let baseK = 0;
// √R of a plain reflector, for the tracked mirror (rs = −√R, rp = +√R)
let baseAmplitude = 0;
let invR2 = 0;
let invH2 = 0;
// The surface the last step ended on (a constant from surfaces.ts)
let surface = SURFACE_NONE;
// Debug counters of total internal reflections
let outerTir = 0;
let chipTir = 0;

function configure(pkg: TracePackage): void {
  const chip = pkg.chip;
  const enc = pkg.encapsulant;
  shape = enc.shape === 'dome' ? SHAPE_DOME : enc.shape === 'cylinder' ? SHAPE_CYLINDER : SHAPE_NONE;
  box[0] = chip.widthMm / 2;
  box[1] = chip.lengthMm / 2;
  box[2] = chip.heightMm;
  shell[0] = enc.radiusMm;
  shell[1] = enc.heightMm;
  // Self-hit guard for the chip seen from the encapsulant, relative to the package size
  box[3] = 1e-12 * (box[0] + box[1] + box[2] + (shape === SHAPE_NONE ? 0 : shell[0] + shell[1]));
  invR2 = 1 / (shell[0] * shell[0]);
  invH2 = 1 / (shell[1] * shell[1]);
  indexOf[CHIP] = chip.n;
  indexOf[ENCAPSULANT] = enc.n;
  indexOf[OUTSIDE] = pkg.outsideN;
  alphaOf[CHIP] = chip.absorptionPerMm;
  alphaOf[ENCAPSULANT] = shape === SHAPE_NONE ? 0 : enc.absorptionPerMm;
  aroundChip = shape === SHAPE_NONE ? OUTSIDE : ENCAPSULANT;
  box[4] = emitterHeightMm(chip);
  volumeEmission = chip.emission === 'volume';
  absorbing = alphaOf[CHIP] > 0 || alphaOf[ENCAPSULANT] > 0;
  track = pkg.polarization === 'track';
  metalBase = pkg.base.kind === 'metal';
  if (pkg.base.kind === 'metal') {
    baseN = pkg.base.n;
    baseK = pkg.base.k;
  } else {
    baseReflectance = pkg.base.reflectance;
    baseAmplitude = Math.sqrt(baseReflectance);
  }
}

/** Starts a ray in the chip: position, isotropic direction, polarisation, optical depth. */
function launch(): void {
  // Position on the emitting plane or in the volume
  ray[0] = (nextFloat() - 0.5) * 2 * box[0];
  ray[1] = (nextFloat() - 0.5) * 2 * box[1];
  ray[2] = volumeEmission ? nextFloat() * box[2] : box[4];
  // Isotropic direction without trigonometry (Marsaglia 1972): (u, v) uniform in the unit disc,
  // s = u² + v²; then (2u√(1 − s), 2v√(1 − s), 1 − 2s) is uniform on the sphere
  let u = 0;
  let v = 0;
  let s = 1;
  while (s >= 1) {
    u = 2 * nextFloat() - 1;
    v = 2 * nextFloat() - 1;
    s = u * u + v * v;
  }
  const k = 2 * Math.sqrt(1 - s);
  ray[3] = k * u;
  ray[4] = k * v;
  ray[5] = 1 - 2 * s;
  if (track) {
    trackArgs[0] = nextFloat();
    launchPolarization(direction, trackArgs);
  }
  // Optical depth to absorption, τ ~ Exp(1) by inverse transform (1 − u ∈ (0, 1]); none if nothing absorbs
  if (absorbing) ray[6] = -Math.log(1 - nextFloat());
  else ray[6] = Infinity;
}

/**
 * One dielectric interface at the current point, with `normal` facing the incident side, from medium
 * `from` into medium `to`: decides reflection, total internal reflection or refraction, and replaces
 * the ray's direction.
 */
function interfaceEvent(from: number, to: number): number {
  const etaI = indexOf[from];
  const etaT = indexOf[to];
  let cosI = -(ray[3] * normal[0] + ray[4] * normal[1] + ray[5] * normal[2]);
  // A roundoff hit at t ≈ 0 can graze from the wrong side: treat as grazing incidence
  if (cosI < 0) cosI = 0;
  else if (cosI > 1) cosI = 1;
  if (track) {
    trackArgs[0] = cosI;
    trackArgs[1] = etaI;
    trackArgs[2] = etaT;
    trackArgs[3] = nextFloat();
    const code = trackedInterface(direction, normal, trackArgs);
    return code === TRACK_TRANSMITTED ? TRANSMITTED : code === TRACK_TIR ? TIR : REFLECTED;
  }
  // Handle total internal reflection
  if (!fresnelReal(cosI, etaI, etaT, fr)) {
    reflectDirection(direction, direction, normal);
    return TIR;
  }
  // Reflect with probability R = (Rs + Rp)/2, else refract
  if (nextFloat() < 0.5 * (fr[0] + fr[1])) {
    reflectDirection(direction, direction, normal);
    return REFLECTED;
  }
  refractDirection(direction, direction, normal, etaI, etaT);
  return TRANSMITTED;
}

/**
 * A dielectric interface on an axis-aligned face (the chip's faces), 'average' mode: the outward normal
 * is sign·ê_k, so cos θi = sign·d_k, reflection flips d_k, and refraction scales the two tangential
 * components by η = etaI/etaT and sets the normal one to sign·cos θt (vector Snell's law on an axis;
 * the result is unit length by construction: η² sin²θi + cos²θt = 1).
 */
function axisFaceEvent(k: number, sign: number, from: number, to: number): number {
  const etaI = indexOf[from];
  const etaT = indexOf[to];
  const j = 3 + k;
  const cosI = sign * ray[j];
  // Handle total internal reflection
  if (!fresnelReal(cosI, etaI, etaT, fr)) {
    ray[j] = -ray[j];
    return TIR;
  }
  // Reflect with probability R = (Rs + Rp)/2, else refract
  if (nextFloat() < 0.5 * (fr[0] + fr[1])) {
    ray[j] = -ray[j];
    return REFLECTED;
  }
  const eta = etaI / etaT;
  ray[3] *= eta;
  ray[4] *= eta;
  ray[5] *= eta;
  ray[j] = sign * fr[2];
  return TRANSMITTED;
}

/** The same face event for a polarisation-tracked ray: a general interface with normal −sign·ê_k. */
function trackedAxisFace(k: number, sign: number, from: number, to: number): number {
  normal[0] = 0;
  normal[1] = 0;
  normal[2] = 0;
  normal[k] = -sign;
  return interfaceEvent(from, to);
}

/** The base mirror met going down from medium `from`: true if reflected (direction replaced). */
function baseEvent(from: number): boolean {
  if (metalBase) {
    mirrorIn[0] = -ray[5];
    mirrorIn[1] = indexOf[from];
    mirrorIn[2] = baseN;
    mirrorIn[3] = baseK;
    mirrorAmplitudesAt(mirrorIn, mirror);
  }
  if (track) {
    normal[0] = 0;
    normal[1] = 0;
    normal[2] = 1;
    trackArgs[0] = metalBase ? mirror[0] : -baseAmplitude;
    trackArgs[1] = metalBase ? mirror[1] : 0;
    trackArgs[2] = metalBase ? mirror[2] : baseAmplitude;
    trackArgs[3] = metalBase ? mirror[3] : 0;
    trackArgs[4] = nextFloat();
    return trackedMirror(direction, normal, trackArgs);
  }
  const R = metalBase ? 0.5 * (mirror[4] + mirror[5]) : baseReflectance;
  if (!(nextFloat() < R)) return false;
  ray[5] = -ray[5];
  return true;
}

/** One step inside the chip: to the next wall, with absorption on the way; the base reflects here. */
function stepInChip(): number {
  const face = boxExit(ray, box, hit);
  if (face === SURFACE_NONE) return GEOMETRY_ERROR;
  const t = hit[0];
  // Beer–Lambert: absorbed on this segment if the optical depth runs out
  const alpha = alphaOf[CHIP];
  if (alpha > 0) {
    const depth = alpha * t;
    if (depth >= ray[6]) return ABSORBED_CHIP;
    ray[6] -= depth;
  }
  ray[0] += t * ray[3];
  ray[1] += t * ray[4];
  ray[2] += t * ray[5];

  // Base under the chip
  if (face === CHIP_BOTTOM) {
    ray[2] = 0;
    return baseEvent(CHIP) ? GO_ON : ABSORBED_BASE;
  }

  surface = face;
  return AT_SURFACE;
}

/** The event at the chip wall the last chip step reached (from inside the chip). */
function chipWallEvent(): number {
  const face = surface;
  // Snap onto the face; its outward normal is sign·ê_k
  let k = 2;
  let sign = 1;
  if (face === CHIP_TOP) {
    ray[2] = box[2];
  } else if (face === CHIP_X_POS) {
    ray[0] = box[0];
    k = 0;
  } else if (face === CHIP_X_NEG) {
    ray[0] = -box[0];
    k = 0;
    sign = -1;
  } else if (face === CHIP_Y_POS) {
    ray[1] = box[1];
    k = 1;
  } else {
    ray[1] = -box[1];
    k = 1;
    sign = -1;
  }
  const outcome = track ? trackedAxisFace(k, sign, CHIP, aroundChip) : axisFaceEvent(k, sign, CHIP, aroundChip);
  if (outcome === TIR) chipTir++;
  if (outcome !== TRANSMITTED) return GO_ON;
  if (shape !== SHAPE_NONE) return ENTER_ENCAPSULANT;
  return face === CHIP_TOP ? ESCAPED_CHIP_TOP : ESCAPED_CHIP_SIDE;
}

/** One step in the encapsulant: to the nearest of chip, base plane and outer surface; the base reflects here. */
function stepInEncapsulant(): number {
  let t = Infinity;
  let hitSurface = boxEntry(ray, box, hit);
  if (hitSurface !== SURFACE_NONE) t = hit[0];
  const dz = ray[5];
  if (dz < 0) {
    const tBase = -ray[2] / dz;
    if (tBase < t) {
      t = tBase;
      hitSurface = BASE;
    }
  }
  if (shape === SHAPE_DOME) {
    spheroidExit(ray, shell, hit);
    if (hit[0] < t) {
      t = hit[0];
      hitSurface = DOME;
    }
  } else {
    const wall = cylinderExit(ray, shell, hit);
    if (wall !== SURFACE_NONE && hit[0] < t) {
      t = hit[0];
      hitSurface = wall;
    }
  }
  if (hitSurface === SURFACE_NONE || !(t < Infinity)) return GEOMETRY_ERROR;
  // Beer–Lambert in the encapsulant
  const alpha = alphaOf[ENCAPSULANT];
  if (alpha > 0) {
    const depth = alpha * t;
    if (depth >= ray[6]) return ABSORBED_ENCAPSULANT;
    ray[6] -= depth;
  }
  ray[0] += t * ray[3];
  ray[1] += t * ray[4];
  ray[2] += t * dz;

  // Base plane beside the chip
  if (hitSurface === BASE) {
    ray[2] = 0;
    return baseEvent(ENCAPSULANT) ? GO_ON : ABSORBED_BASE;
  }
  surface = hitSurface;
  return AT_SURFACE;
}

/** The event at the surface the last encapsulant step reached: a chip face or the outer surface. */
function encapsulantSurfaceEvent(): number {
  const hitSurface = surface;
  normal[0] = 0;
  normal[1] = 0;
  normal[2] = 0;
  // Chip face seen from outside: snap onto it; the face's outward normal faces the ray
  if (hitSurface <= CHIP_Y_NEG) {
    if (hitSurface === CHIP_TOP) {
      ray[2] = box[2];
      normal[2] = 1;
    } else if (hitSurface === CHIP_X_POS) {
      ray[0] = box[0];
      normal[0] = 1;
    } else if (hitSurface === CHIP_X_NEG) {
      ray[0] = -box[0];
      normal[0] = -1;
    } else if (hitSurface === CHIP_Y_POS) {
      ray[1] = box[1];
      normal[1] = 1;
    } else {
      ray[1] = -box[1];
      normal[1] = -1;
    }
    return interfaceEvent(ENCAPSULANT, CHIP) === TRANSMITTED ? ENTER_CHIP : GO_ON;
  }

  // Outer surface, met from inside: the inward unit normal faces the ray
  if (hitSurface === DOME) {
    // outward ∇(x²/R² + y²/R² + z²/h²) ∝ (x/R², y/R², z/h²)
    const gx = ray[0] * invR2;
    const gy = ray[1] * invR2;
    const gz = ray[2] * invH2;
    const inv = -1 / Math.sqrt(gx * gx + gy * gy + gz * gz);
    normal[0] = gx * inv;
    normal[1] = gy * inv;
    normal[2] = gz * inv;
  } else if (hitSurface === CYLINDER_SIDE) {
    const inv = -1 / Math.sqrt(ray[0] * ray[0] + ray[1] * ray[1]);
    normal[0] = ray[0] * inv;
    normal[1] = ray[1] * inv;
  } else {
    ray[2] = shell[1];
    normal[2] = -1;
  }
  const outcome = interfaceEvent(ENCAPSULANT, OUTSIDE);
  if (outcome === TIR) outerTir++;
  if (outcome !== TRANSMITTED) return GO_ON;
  return hitSurface === DOME ? ESCAPED_DOME : hitSurface === CYLINDER_TOP ? ESCAPED_CYLINDER_TOP : ESCAPED_CYLINDER_SIDE;
}

/** Histogram bin of an escape direction: ⌊θ in degrees⌋, θ = acos(dz), clamped to 0..179. */
function polarBin(): number {
  const dz = ray[5];
  const c = dz > 1 ? 1 : dz < -1 ? -1 : dz;
  const bin = Math.floor(Math.acos(c) * DEG_PER_RAD);
  return bin < POLAR_BINS ? bin : POLAR_BINS - 1;
}

// Extra slots of `fates` filled by the ray loop
const LOST = 12;
const ESCAPED_BELOW = 13;
const EVENTS = 14;

/**
 * The ray loop proper: launches `rays` rays and follows each to its end, counting fates in `fates`.
 * Kept apart from the tally bookkeeping so the optimised loop never meets code it has not yet run
 * (which would throw it back to the interpreter at the end of every chunk).
 */
function runRays(rays: number, maxEvents: number, histogram: Float64Array, onProgress?: (raysDone: number) => void): void {
  for (let i = 0; i < rays; i++) {
    if (onProgress !== undefined && i > 0 && i % PROGRESS_EVERY === 0) onProgress(i);
    launch();
    let inChip = true;
    let rayEvents = 0;
    for (;;) {
      // Event cap: the ray is lost
      if (rayEvents === maxEvents) {
        fates[LOST]++;
        break;
      }
      rayEvents++;
      let step = inChip ? stepInChip() : stepInEncapsulant();
      if (step === AT_SURFACE) step = inChip ? chipWallEvent() : encapsulantSurfaceEvent();
      if (step === GO_ON) continue;
      if (step === ENTER_ENCAPSULANT) {
        inChip = false;
        continue;
      }
      if (step === ENTER_CHIP) {
        inChip = true;
        continue;
      }
      // The ray ends here: one ledger bin
      fates[step]++;
      if (step <= ESCAPED_CYLINDER_SIDE) {
        histogram[polarBin()]++;
        if (ray[5] < 0) fates[ESCAPED_BELOW]++;
      }
      break;
    }
    fates[EVENTS] += rayEvents;
  }
}

/**
 * Traces `rays` rays of chunk `chunkIndex` and adds their fates to `tally`. The generator is seeded
 * from (seed, chunkIndex), so a chunk gives the same counts on any thread. Inputs are trusted: check
 * them first with validateTracePackage / validateTraceOptions.
 * @param rays rays in this chunk, integer ≥ 0
 * @param seed unsigned 32-bit seed of the whole run
 * @param maxEvents surface events after which a ray is counted lost (default 1000)
 * @param onProgress called with the rays done so far in this chunk, every 2048 rays
 * @returns tally
 */
export function traceChunk(
  pkg: TracePackage,
  chunkIndex: number,
  rays: number,
  seed: number,
  tally: Tally,
  maxEvents: number = DEFAULT_MAX_EVENTS,
  onProgress?: (raysDone: number) => void
): Tally {
  configure(pkg);
  fates.fill(0);
  outerTir = 0;
  chipTir = 0;
  seedChunk(seed, chunkIndex);
  runRays(rays, maxEvents, tally.polarHistogram, onProgress);

  const escChipTop = fates[ESCAPED_CHIP_TOP];
  const escChipSide = fates[ESCAPED_CHIP_SIDE];
  const escDome = fates[ESCAPED_DOME];
  const escCylTop = fates[ESCAPED_CYLINDER_TOP];
  const escCylSide = fates[ESCAPED_CYLINDER_SIDE];
  const geometryErrors = fates[GEOMETRY_ERROR];
  tally.launched += rays;
  tally.escaped += escChipTop + escChipSide + escDome + escCylTop + escCylSide;
  tally.escapedBelowHorizon += fates[ESCAPED_BELOW];
  tally.absorbedChip += fates[ABSORBED_CHIP];
  tally.absorbedEncapsulant += fates[ABSORBED_ENCAPSULANT];
  tally.absorbedBase += fates[ABSORBED_BASE];
  tally.lost += fates[LOST] + geometryErrors;
  tally.geometryErrors += geometryErrors;
  tally.events += fates[EVENTS];
  tally.escapedChipTop += escChipTop;
  tally.escapedChipSide += escChipSide;
  tally.escapedDome += escDome;
  tally.escapedCylinderTop += escCylTop;
  tally.escapedCylinderSide += escCylSide;
  tally.outerSurfaceTir += outerTir;
  tally.chipFaceTir += chipTir;
  return tally;
}
