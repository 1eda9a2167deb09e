/**
 * The Monte Carlo integrator: traces one chunk of rays through a compiled scene (compile-scene.ts)
 * and adds their fates to a tally.
 *
 * The scene (units mm, z up) is media, each a solid region of one material, and surfaces, each a
 * shape with a medium in front and one behind and an optical behaviour (scene.ts). One loop serves
 * every package:
 *   nearest boundary of the current medium → free flight (absorption) → surface event → ledger.
 * - Geometry by medium: a ray knows its medium and meets only the surfaces bounding it (a box
 *   medium — a chip layer — by the slab method, any other by the nearest of its surface list). No
 *   surface ahead is a geometry error, counted, never hidden; in the outside medium it is an escape
 *   (see below). The list search takes two exact shortcuts its builders vouch for: a ray that has just
 *   met a face of the convex solid the list starts with (the chip) skips that solid's faces, and where
 *   the rest of the list bounds one convex region around the ray (a dome on the base, a flat-filled
 *   cup) the first of the rest it meets is the region's one exit (scene.ts: convexSolid,
 *   convexAroundSolid).
 * - Inside the chip: most events happen there (about 2 total internal reflections per ray of about 5
 *   events), so while a ray is in a box medium whose faces are plain Fresnel interfaces or a mirror
 *   of fixed reflectance (no phosphor) boxSteps runs the same steps in a loop of its own — box exit,
 *   flight, face event (inline in 'average' mode, the general event functions in 'track' mode) —
 *   from a table of those boxes it keeps itself (with each face's η when the run's indices are
 *   fixed, so total internal reflection is decided without a division), drawing the same numbers in
 *   the same order and counting the same events; it hands the ray back to the general loop when it
 *   leaves the boxes or meets any other face.
 * - Bulk absorption by Beer–Lambert: each ray draws one optical depth τ ~ Exp(1) at launch and spends
 *   α·t of it on every segment of length t; it is absorbed where the total reaches τ. The same as a
 *   fresh exponential free path per segment (the exponential is memoryless), at one logarithm per ray.
 * - Surface events by behaviour: Fresnel interface (total internal reflection, else reflect with
 *   probability R = (Rs + Rp)/2, or the ray's own R in 'track' mode, see polarization.ts, else
 *   refract by vector Snell's law); textured interface (the same, then with probability s a
 *   cosine-weighted direction in the half-space the ray goes into; s = 0 draws no number); specular
 *   mirror (reflect with probability R, a number or a metal's R at the angle, else absorbed there);
 *   Lambertian reflector (reflect with probability R into a cosine-weighted direction); absorber.
 * - Escape: a ray in the outside medium is followed to the next surface bounding the outside; when
 *   there is none it reaches the scene's bounding sphere and has escaped, credited to the last
 *   surface it met, with its polar angle (escapes heading below the horizon also counted apart).
 *   A surface its builder marks finalExit (all the outside meets is one convex solid: a dome, a
 *   closed cylinder, a bare chip, a cup's flat top) ends the ray at once, without the search.
 * - Every ray ends in exactly one ledger bin (named by the scene): escaped by surface, absorbed in a
 *   medium or at a surface, lost at the event cap, or lost on a geometry error. One event = one
 *   segment ending on a surface (or in absorption); the flight to the bounding sphere is not one.
 * - Dispatch is by `switch` on small integer kinds read from the packed records; no closures.
 *
 * Speed: nothing is allocated per ray or event, in both polarisation modes, under tsx and in the
 * bundle the page runs (node scripts/bench-bundled.mjs counts scavenges). The ray lives in the
 * module-scope Float64Array `ray`; the loop's functions pass only small integers (media, surfaces,
 * outcomes), never floating-point numbers, which the engine would box into heap objects whenever it
 * declines to inline a call — and the bundle's loop runs out of inlining budget, so the core helpers
 * it calls with arrays (fresnelRealAt, refractDirectionAt) hold their formulas themselves rather than
 * forward numbers. The flight and the surface event are separate functions so each is optimised with
 * its own inlining budget, and so is boxSteps (the chip's loop: box exit, the unchecked Fresnel step
 * and one draw site inlined, which is what its budget holds). The list search dispatches on the shape
 * kind itself, so its budget goes to the shape tests; launch is one function too large to inline, so
 * the ray loop's budget goes to the per-event functions.
 * Drawing: recordSceneRays runs the same steps in a loop of its own and reports each ray's path, so
 * the traced run pays nothing for it (ray-paths.ts). It takes the general steps only (no boxSteps, no
 * finalExit shortcut), which give the same fates by construction.
 * Sources: M. Pharr, W. Jakob, G. Humphreys, Physically Based Rendering, 3rd ed. (choosing
 * reflection with probability R, §14.1; exponential free paths, §15.2; media on both sides of a
 * surface, §11.3); G. Marsaglia, "Choosing a point from the surface of a sphere", Ann. Math. Stat. 43,
 * 645 (1972) (isotropic directions).
 */
import { fresnelRealTrusted, MIRROR_AMPLITUDES_LENGTH, mirrorAmplitudesAt } from '../optics/fresnel';
import { reflectDirection, refractDirectionAt } from '../optics/snell';
import { boxExit } from './box-exit';
import { compileScene, type CompiledScene } from './compile-scene';
import { configureSpectral, ENDED, isPhosphorMedium, launchWavelength, photon, phosphorFlight, REDIRECTED, spectralEscape } from './medium-events';
import { createSpectralTally } from './spectral-tally';
import { lambertianDirection } from './lambertian';
import { DEFAULT_MAX_EVENTS, type TracePackage } from './package-spec';
import { packageScene } from './package-scene';
import { TRACK_TIR, TRACK_TRANSMITTED, launchPolarization, trackedInterface, trackedMirror } from './polarization';
import { seedChunk, uniformAt, uniformsInto } from './rng';
import { launchSourceRay } from './source-launch';
import * as layout from './scene-layout';
import { intersectCylinder, intersectDisc, intersectFrustum, intersectRect, intersectSpheroidCap, surfaceNormal } from './shape-intersect';
import { intersectRevolutionShape, useRevolutionProfiles } from './revolution-shape';
import { POLAR_BINS, type Tally } from './tally';

// The layout's constants as module constants: under tsx (command line, bench) an imported binding is a
// getter, which the optimiser does not always inline in a large function (measured: 3× slower loop)
const {
  BEHAVIOUR_DIFFUSE,
  BEHAVIOUR_FRESNEL,
  BEHAVIOUR_MIRROR,
  BEHAVIOUR_TEXTURED,
  BIN_EVENT_CAP,
  BIN_GEOMETRY_ERROR,
  BOUNDARY_BOX,
  COUNTERS,
  COUNTER_ESCAPED_BELOW,
  COUNTER_EVENTS,
  COUNTER_TIR_CHIP,
  COUNTER_TIR_OUTER,
  DIRECTION_DOWN,
  DIRECTION_ISOTROPIC,
  EMIT_LAMBERTIAN_RECT,
  ESCAPE_RECORD,
  MEDIUM_STRIDE,
  M_ABSORPTION,
  M_BIN,
  M_BOUNDARY,
  M_BOX_A,
  M_BOX_B,
  M_BOX_FACES,
  M_BOX_Z0,
  M_BOX_Z1,
  M_CONVEX_COUNT,
  M_CONVEX_REST,
  M_CONVEX_SPHERE,
  M_INDEX,
  M_LIST_COUNT,
  M_LIST_START,
  M_PHOSPHOR,
  NONE,
  SHAPE_CYLINDER,
  SHAPE_DISC,
  SHAPE_FRUSTUM,
  SHAPE_RECT,
  SHAPE_REVOLUTION,
  SHAPE_SPHEROID_CAP,
  SIDE_FRONT,
  SURFACE_STRIDE,
  S_B,
  S_BEHAVIOUR,
  S_BEHIND,
  S_BIN_ABSORBED,
  S_BIN_ESCAPED,
  S_FRONT,
  S_P,
  S_SHAPE,
  S_TIR_BEHIND,
  S_TIR_FRONT
} = layout;

// Outcomes of one dielectric interface event
const REFLECTED = 0;
const TIR = 1;
const TRANSMITTED = 2;

const DEG_PER_RAD = 180 / Math.PI;
/** Rays between progress callbacks inside a chunk. */
const PROGRESS_EVERY = 2048;

// The current ray: [x, y, z, dx, dy, dz, τ left], mm and unit direction; `direction` views ray[3..5]
const ray = new Float64Array(7);
const direction = ray.subarray(3, 6);
// Unit normal of the current surface, facing the incident side (cos θi = −d·n)
const normal = new Float64Array(3);
// The normal of the half-space a scattered ray goes into
const scatterAxis = new Float64Array(3);
const hit = new Float64Array(1);
const fr = new Float64Array(3);
// A metal mirror's inputs [cos θi, index in front, n, k] and coefficients (layout of mirrorAmplitudesAt)
const mirrorIn = new Float64Array(4);
const mirror = new Float64Array(MIRROR_AMPLITUDES_LENGTH);
// numbers handed to the polarisation functions (see polarization.ts: arrays, so nothing is boxed)
const trackArgs = new Float64Array(5);
// Uniform random numbers just drawn (uniformsInto), and the Fresnel inputs [cos θi, etaI, etaT]
const u = new Float64Array(5);
const fin = new Float64Array(3);
// Debug counters of the current chunk (COUNTER_*)
const counters = new Float64Array(COUNTERS);

// The loop's mutable state is declared with `var`, not `let`: a module-scope `let` read in a function costs a
// check that it has been initialised (temporal dead zone) at every read, under tsx and in the page's build alike
// (an esbuild bundle turns them into `var` itself); measured +2–4 % on every benchmark scene. The constant
// arrays stay `const`: the engine folds those in, and as `var` the loop runs 20 % slower.
// The compiled scene of the current chunk, set by configure()
var media: Float64Array = new Float64Array(0);
var surfaces: Float64Array = new Float64Array(0);
var bounds: Int32Array = new Int32Array(0);
var finalExit: Uint8Array = new Uint8Array(0);
var convexOf: Int32Array = new Int32Array(0);
var bins = new Float64Array(2);
var outside = 0;
var emitterOffset = 0;
var emitterMedium = 0;
var volumeEmission = false;
var absorbing = false;
var track = false;
// Spectral rays (a phosphor in the scene: medium-events.ts) and the emitter's direction kind
var spectral = false;
var emitterDirection = DIRECTION_ISOTROPIC;
const downAxis = new Float64Array([0, 0, -1]);
// The emitting plane's height, mm (an array, so the double is not boxed)
const emitterZ = new Float64Array(1);
// A source that is not a chip (source-launch.ts): kind, [z, half width, half length], ray table
var sourceKind = 0;
const sourceParams = new Float64Array(3);
var sourceRays: Float64Array = new Float64Array(0);
var sourceSurface = NONE;

// Escaping rays recorded for a ray file (recordEscapes): ESCAPE_RECORD doubles each, up to the buffer's length
var escapeLog: Float64Array = new Float64Array(0);
var escapesLogged = 0;

// The current ray's medium and the last surface it met
var medium = 0;
var lastSurface = NONE;

// The box media the tight box loop (boxSteps) walks, in a table of its own: module constants (not
// the scene's arrays, which configure() replaces), so the optimised loop reads them without checks.
// A box record: [a, b, z0, z1] (boxExit's layout), α, its absorption bin, then its six faces in
// M_BOX_FACES order, FACE_STRIDE doubles each.
const MAX_FAST_BOXES = 8;
const MAX_FAST_MEDIA = 64;
const B_ABSORPTION = 4;
const B_BIN = 5;
const B_FACES = 6;
const FAST_NONE = 0;
/** A plain Fresnel interface on an axis (or a textured one with s = 0, which draws nothing more). */
const FAST_FRESNEL = 1;
/** A specular mirror of a fixed reflectance. */
const FAST_MIRROR = 2;
const F_KIND = 0;
const F_SURFACE = 1;
const F_TO = 2;
/** Outward normal sign·ê_k: cos θi = sign·d_k. */
const F_SIGN = 3;
const F_AXIS = 4;
/** The face's plane coordinate, where the ray is put on reaching it (as surfaceNormal does). */
const F_AT = 5;
const F_TIR_COUNTER = 6;
/** Mirror: reflectance, and the bin of what it absorbs. */
const F_R = 7;
const F_BIN = 8;
/**
 * Fresnel face: η = n(from)/n(to), as the Fresnel step computes it, when the indices stay fixed for the
 * run; NaN when a spectral scene rewrites them per ray, or when they match (no interface).
 */
const F_ETA = 9;
const FACE_STRIDE = 10;
const BOX_STRIDE = B_FACES + 6 * FACE_STRIDE;
const boxTable = new Float64Array(MAX_FAST_BOXES * BOX_STRIDE);
/** Per medium: offset of its record in boxTable + 1 when boxSteps walks it, else 0. */
const boxOf = new Int32Array(MAX_FAST_MEDIA);
/** False when the scene has more media than boxOf holds (then no box is walked fast). */
var fastBoxes = false;
/** Set by boxSteps when the ray ended inside (absorbed in the box or at its mirror: counted). */
var boxEnded = false;

function configure(scene: CompiledScene, tally?: Tally): void {
  media = scene.media;
  surfaces = scene.surfaces;
  bounds = scene.bounds;
  finalExit = scene.finalExit;
  convexOf = scene.convexOf;
  if (bins.length !== scene.binNames.length) bins = new Float64Array(scene.binNames.length);
  bins.fill(0);
  counters.fill(0);
  outside = scene.outside;
  emitterMedium = scene.emitterMedium;
  emitterOffset = emitterMedium * MEDIUM_STRIDE;
  emitterZ[0] = scene.emitterZ;
  volumeEmission = scene.emitterVolume;
  absorbing = scene.absorbing;
  track = scene.track;
  emitterDirection = scene.emitterDirection;
  spectral = scene.spectral !== null && configureSpectral(scene, tally ? (tally.spectral ??= createSpectralTally()) : createSpectralTally());
  sourceKind = scene.emitterKind;
  sourceParams[0] = scene.emitterZ;
  sourceParams[1] = scene.emitterHalfWidth;
  sourceParams[2] = scene.emitterHalfLength;
  sourceRays = scene.emitterRays;
  sourceSurface = scene.emitterSurface;
  useRevolutionProfiles(scene.profiles, scene.surfaceNames.length);
  configureBoxFaces();
}

/**
 * Fills boxTable / boxOf from the compiled scene: each box medium (no phosphor, not the outside; the
 * first MAX_FAST_BOXES), and of its faces each that is a plain Fresnel interface on
 * its axis or a mirror of fixed reflectance, with what boxSteps needs of it; any other face (diffuse,
 * metal, textured with s > 0, absorber) is FAST_NONE and left to the general event.
 */
function configureBoxFaces(): void {
  const nm = media.length / MEDIUM_STRIDE;
  boxOf.fill(0);
  fastBoxes = nm <= MAX_FAST_MEDIA;
  if (!fastBoxes) return;
  let slots = 0;
  for (let m = 0; m < nm && slots < MAX_FAST_BOXES; m++) {
    const mo = m * MEDIUM_STRIDE;
    if (m === outside || (media[mo + M_BOUNDARY] | 0) !== BOUNDARY_BOX || media[mo + M_PHOSPHOR] >= 0) continue;
    const bo = slots++ * BOX_STRIDE;
    boxOf[m] = bo + 1;
    boxTable.set(media.subarray(mo + M_BOX_A, mo + M_BOX_A + 4), bo);
    boxTable[bo + B_ABSORPTION] = media[mo + M_ABSORPTION];
    boxTable[bo + B_BIN] = media[mo + M_BIN];
    for (let f = 0; f < 6; f++) {
      const q = bo + B_FACES + f * FACE_STRIDE;
      const entry = media[mo + M_BOX_FACES + f] | 0;
      const side = entry & 1;
      const o = (entry >> 1) * SURFACE_STRIDE;
      const behaviour = surfaces[o + S_BEHAVIOUR] | 0;
      const to = (side === SIDE_FRONT ? surfaces[o + S_BEHIND] : surfaces[o + S_FRONT]) | 0;
      const p = o + S_P;
      boxTable[q + F_KIND] = FAST_NONE;
      if ((surfaces[o + S_SHAPE] | 0) !== SHAPE_RECT) continue;
      const fresnel = behaviour === BEHAVIOUR_FRESNEL || (behaviour === BEHAVIOUR_TEXTURED && !(surfaces[o + S_B] > 0));
      const plainMirror = behaviour === BEHAVIOUR_MIRROR && surfaces[o + S_B] >= 0;
      if (!fresnel && !plainMirror) continue;
      boxTable[q + F_KIND] = fresnel ? FAST_FRESNEL : FAST_MIRROR;
      boxTable[q + F_SURFACE] = entry >> 1;
      boxTable[q + F_TO] = to;
      // surfaceNormal's normal facing the incident side is (front ? σ : −σ)·ê_k; the outward one its negative
      boxTable[q + F_SIGN] = side === SIDE_FRONT ? -surfaces[p + 2] : surfaces[p + 2];
      boxTable[q + F_AXIS] = surfaces[p];
      boxTable[q + F_AT] = surfaces[p + 1];
      boxTable[q + F_TIR_COUNTER] = surfaces[o + (side === SIDE_FRONT ? S_TIR_FRONT : S_TIR_BEHIND)];
      boxTable[q + F_R] = plainMirror ? surfaces[o + S_B] : 0;
      boxTable[q + F_BIN] = surfaces[o + S_BIN_ABSORBED];
      const etaI = media[mo + M_INDEX];
      const etaT = fresnel ? media[to * MEDIUM_STRIDE + M_INDEX] : etaI;
      boxTable[q + F_ETA] = !spectral && etaI !== etaT ? etaI / etaT : NaN;
    }
  }
}

/**
 * Starts a ray in the emitting medium (or from a source, see source-launch.ts): position, direction
 * (isotropic, or a beam down for slab references), polarisation, optical depth. One function, once per
 * ray: too large for the engine to inline into the ray loop, whose inlining budget then goes to the
 * per-event functions.
 */
function launch(): void {
  if (sourceKind >= EMIT_LAMBERTIAN_RECT) launchSourceRay(ray, sourceKind, sourceParams, sourceRays);
  else {
    const o = emitterOffset;
    // Position on the emitting plane or in the volume of the emitting box, then (isotropic) a first pair
    const isotropic = emitterDirection === DIRECTION_ISOTROPIC;
    const n = volumeEmission ? 3 : 2;
    uniformsInto(u, isotropic ? n + 2 : n);
    ray[0] = (u[0] - 0.5) * 2 * media[o + M_BOX_A];
    ray[1] = (u[1] - 0.5) * 2 * media[o + M_BOX_B];
    if (volumeEmission) {
      const z0 = media[o + M_BOX_Z0];
      ray[2] = z0 + u[2] * (media[o + M_BOX_Z1] - z0);
    } else {
      ray[2] = emitterZ[0];
    }
    // Isotropic direction without trigonometry (Marsaglia 1972): (a, b) uniform in the unit disc,
    // s = a² + b²; then (2a√(1 − s), 2b√(1 − s), 1 − 2s) is uniform on the sphere
    if (isotropic) {
      let a = 2 * u[n] - 1;
      let b = 2 * u[n + 1] - 1;
      let s = a * a + b * b;
      while (s >= 1) {
        uniformsInto(u, 2);
        a = 2 * u[0] - 1;
        b = 2 * u[1] - 1;
        s = a * a + b * b;
      }
      const k = 2 * Math.sqrt(1 - s);
      ray[3] = k * a;
      ray[4] = k * b;
      ray[5] = 1 - 2 * s;
    } else launchDirection();
  }
  if (track) redrawPolarization();
  // Optical depth to absorption, τ ~ Exp(1) by inverse transform (1 − u ∈ (0, 1]); none if nothing absorbs
  if (absorbing) {
    uniformAt(u, 0);
    ray[6] = -Math.log(1 - u[0]);
  } else ray[6] = Infinity;
  medium = emitterMedium;
  lastSurface = sourceSurface;
}

/** A launch direction other than isotropic: straight down, or cosine-weighted about −z. */
function launchDirection(): void {
  if (emitterDirection === DIRECTION_DOWN) {
    ray[3] = 0;
    ray[4] = 0;
    ray[5] = -1;
  } else {
    uniformsInto(u, 2);
    lambertianDirection(direction, downAxis, u);
  }
}

/**
 * The nearest boundary of the current medium ahead of the ray: returns its bounds entry
 * (surface·2 + side) and writes the distance to hit[0], or returns NONE.
 */
function nearestBoundary(): number {
  const o = medium * MEDIUM_STRIDE;
  if ((media[o + M_BOUNDARY] | 0) === BOUNDARY_BOX) {
    const face = boxExit(ray, media, o + M_BOX_A, hit);
    return face < 0 ? NONE : media[o + M_BOX_FACES + face] | 0;
  }
  let best = NONE;
  let tBest = Infinity;
  let start = media[o + M_LIST_START] | 0;
  const end = start + (media[o + M_LIST_COUNT] | 0);
  // The list starts with the faces of a convex solid seen from without: standing on one of them, heading
  // away, none of them is ahead. Where the rest bounds a convex region around the ray, the first of the
  // rest it meets is the region's one exit: the search ends there (the solid's faces are searched before).
  const rest = start + (media[o + M_CONVEX_COUNT] | 0);
  const exitFirst = media[o + M_CONVEX_REST] === 1;
  if (lastSurface >= 0 && convexOf[lastSurface] === medium) start = rest;
  else if (rest > start) {
    // Nor when its line misses a sphere around the solid: outside it and heading away, or passing wide
    const c = o + M_CONVEX_SPHERE;
    const ox = media[c] - ray[0];
    const oy = media[c + 1] - ray[1];
    const oz = media[c + 2] - ray[2];
    const along = ox * ray[3] + oy * ray[4] + oz * ray[5];
    const d2 = ox * ox + oy * oy + oz * oz;
    const r2 = media[c + 3];
    if (d2 > r2 && (along < 0 || d2 - along * along > r2)) start = rest;
  }
  for (let i = start; i < end; i++) {
    const entry = bounds[i];
    const o = (entry >> 1) * SURFACE_STRIDE;
    const side = entry & 1;
    const p = o + S_P;
    // The dispatch by shape kind, here rather than in a function of its own: the inlining budget then goes to the shape tests
    let met = false;
    switch (surfaces[o + S_SHAPE] | 0) {
      case SHAPE_RECT:
        met = intersectRect(surfaces, p, side, ray, hit);
        break;
      case SHAPE_DISC:
        met = intersectDisc(surfaces, p, side, ray, hit);
        break;
      case SHAPE_CYLINDER:
        met = intersectCylinder(surfaces, p, side, ray, hit);
        break;
      case SHAPE_FRUSTUM:
        met = intersectFrustum(surfaces, p, side, ray, hit);
        break;
      case SHAPE_SPHEROID_CAP:
        met = intersectSpheroidCap(surfaces, p, side, ray, hit);
        break;
      case SHAPE_REVOLUTION:
        met = intersectRevolutionShape(surfaces, p, side, ray, hit);
        break;
    }
    if (met) {
      if (hit[0] < tBest) {
        tBest = hit[0];
        best = entry;
      }
      if (exitFirst && i >= rest) break;
    }
  }
  hit[0] = tBest;
  return best;
}

/** Free flight to hit[0] with Beer–Lambert absorption: false when the ray is absorbed on the way (counted). */
function flight(): boolean {
  const t = hit[0];
  const o = medium * MEDIUM_STRIDE;
  const alpha = media[o + M_ABSORPTION];
  if (alpha > 0) {
    const depth = alpha * t;
    if (depth >= ray[6]) {
      bins[media[o + M_BIN] | 0]++;
      return false;
    }
    ray[6] -= depth;
  }
  ray[0] += t * ray[3];
  ray[1] += t * ray[4];
  ray[2] += t * ray[5];
  return true;
}

/**
 * A dielectric interface from medium `from` into `to`, with `normal` facing the incident side:
 * decides reflection, total internal reflection or refraction, and replaces the ray's direction.
 */
function interfaceEvent(from: number, to: number): number {
  const etaI = media[from * MEDIUM_STRIDE + M_INDEX];
  const etaT = media[to * MEDIUM_STRIDE + M_INDEX];
  let cosI = -(ray[3] * normal[0] + ray[4] * normal[1] + ray[5] * normal[2]);
  // A roundoff hit at t ≈ 0 can graze from the wrong side: treat as grazing incidence
  if (cosI < 0) cosI = 0;
  else if (cosI > 1) cosI = 1;
  fin[0] = cosI;
  if (track) return trackedInterfaceEvent(from, to);
  fin[1] = etaI;
  fin[2] = etaT;
  // Handle total internal reflection
  if (!fresnelRealTrusted(fin, fr)) {
    reflectDirection(direction, direction, normal);
    return TIR;
  }
  // Reflect with probability R = (Rs + Rp)/2, else refract
  uniformAt(u, 0);
  if (u[0] < 0.5 * (fr[0] + fr[1])) {
    reflectDirection(direction, direction, normal);
    return REFLECTED;
  }
  refractDirectionAt(direction, direction, normal, fin);
  return TRANSMITTED;
}

/** interfaceEvent in 'track' mode, with cos θi in fin[0]: the ray's field decides (polarization.ts). */
function trackedInterfaceEvent(from: number, to: number): number {
  trackArgs[0] = fin[0];
  trackArgs[1] = media[from * MEDIUM_STRIDE + M_INDEX];
  trackArgs[2] = media[to * MEDIUM_STRIDE + M_INDEX];
  uniformAt(u, 0);
  trackArgs[3] = u[0];
  const code = trackedInterface(direction, normal, trackArgs);
  return code === TRACK_TRANSMITTED ? TRANSMITTED : code === TRACK_TIR ? TIR : REFLECTED;
}

/**
 * The same interface on a box medium's face met from inside, 'average' mode: the outward normal is
 * sign·ê_k, so cos θi = sign·d_k, reflection flips d_k, and refraction scales the two tangential
 * components by η = etaI/etaT and sets the normal one to sign·cos θt (vector Snell's law on an axis;
 * unit length by construction: η² sin²θi + cos²θt = 1).
 */
function axisFaceEvent(k: number, from: number, to: number): number {
  const etaI = media[from * MEDIUM_STRIDE + M_INDEX];
  const etaT = media[to * MEDIUM_STRIDE + M_INDEX];
  const sign = -normal[k];
  const j = 3 + k;
  fin[0] = sign * ray[j];
  fin[1] = etaI;
  fin[2] = etaT;
  // Handle total internal reflection
  if (!fresnelRealTrusted(fin, fr)) {
    ray[j] = -ray[j];
    return TIR;
  }
  // Reflect with probability R = (Rs + Rp)/2, else refract
  uniformAt(u, 0);
  if (u[0] < 0.5 * (fr[0] + fr[1])) {
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

/** A new random linear polarisation for a ray whose direction was redrawn (a diffuse event depolarises). */
function redrawPolarization(): void {
  uniformAt(trackArgs, 0);
  launchPolarization(direction, trackArgs);
}

/** Dielectric (Fresnel or textured) surface of bounds entry `entry`; `axis` ≥ 0 for a plane on an axis. */
function dielectricEvent(entry: number, axis: number): void {
  const side = entry & 1;
  const o = (entry >> 1) * SURFACE_STRIDE;
  const from = medium;
  const to = (side === SIDE_FRONT ? surfaces[o + S_BEHIND] : surfaces[o + S_FRONT]) | 0;
  const outcome =
    !track && axis >= 0 && (media[from * MEDIUM_STRIDE + M_BOUNDARY] | 0) === BOUNDARY_BOX
      ? axisFaceEvent(axis, from, to)
      : interfaceEvent(from, to);
  if (outcome === TIR) {
    const c = surfaces[o + (side === SIDE_FRONT ? S_TIR_FRONT : S_TIR_BEHIND)] | 0;
    if (c !== NONE) counters[c]++;
  }
  if (outcome === TRANSMITTED) medium = to;
  if ((surfaces[o + S_BEHAVIOUR] | 0) === BEHAVIOUR_TEXTURED) textureEvent(o, outcome === TRANSMITTED ? -1 : 1);
}

/**
 * Textured face at offset o after the Fresnel decision: with probability s a cosine-weighted
 * direction into the half-space the ray goes into (`into` = +1 back to the incident side, −1 across).
 * Draws no random number when s = 0.
 */
function textureEvent(o: number, into: number): void {
  const s = surfaces[o + S_B];
  if (!(s > 0)) return;
  uniformAt(u, 0);
  if (!(u[0] < s)) return;
  scatterAxis[0] = into * normal[0];
  scatterAxis[1] = into * normal[1];
  scatterAxis[2] = into * normal[2];
  uniformsInto(u, 2);
  lambertianDirection(direction, scatterAxis, u);
  if (track) redrawPolarization();
}

/** Specular mirror at offset o: true if reflected (direction replaced), false if absorbed there. */
function mirrorEvent(o: number, axis: number): boolean {
  const reflectance = surfaces[o + S_B];
  const metal = reflectance < 0;
  if (metal) {
    const cosI = -(ray[3] * normal[0] + ray[4] * normal[1] + ray[5] * normal[2]);
    mirrorIn[0] = cosI < 0 ? 0 : cosI > 1 ? 1 : cosI;
    mirrorIn[1] = media[medium * MEDIUM_STRIDE + M_INDEX];
    mirrorIn[2] = surfaces[o + S_B + 1];
    mirrorIn[3] = surfaces[o + S_B + 2];
    mirrorAmplitudesAt(mirrorIn, mirror);
  }
  if (track) {
    const amplitude = surfaces[o + S_B + 3];
    trackArgs[0] = metal ? mirror[0] : -amplitude;
    trackArgs[1] = metal ? mirror[1] : 0;
    trackArgs[2] = metal ? mirror[2] : amplitude;
    trackArgs[3] = metal ? mirror[3] : 0;
    uniformAt(u, 0);
    trackArgs[4] = u[0];
    return trackedMirror(direction, normal, trackArgs);
  }
  const R = metal ? 0.5 * (mirror[4] + mirror[5]) : reflectance;
  uniformAt(u, 0);
  if (!(u[0] < R)) return false;
  if (axis >= 0) ray[3 + axis] = -ray[3 + axis];
  else reflectDirection(direction, direction, normal);
  return true;
}

/** Lambertian reflector at offset o: true if reflected into a cosine-weighted direction. */
function diffuseEvent(o: number): boolean {
  uniformAt(u, 0);
  if (!(u[0] < surfaces[o + S_B])) return false;
  uniformsInto(u, 2);
  lambertianDirection(direction, normal, u);
  if (track) redrawPolarization();
  return true;
}

/** Absorbed at the surface of bounds entry `entry` (mirror, diffuse reflector, absorber): counted. */
function absorbedAt(entry: number): void {
  bins[surfaces[(entry >> 1) * SURFACE_STRIDE + S_BIN_ABSORBED] | 0]++;
}

/**
 * The event at the surface of bounds entry `entry` the flight reached: false when the ray ends there
 * (counted). Each behaviour is its own function taking only small integers, so that each is
 * optimised on its own and keeps the Fresnel and random-number functions inlined whole (a call the
 * engine does not inline boxes every floating-point argument and result).
 */
function surfaceEvent(entry: number): boolean {
  const s = entry >> 1;
  const o = s * SURFACE_STRIDE;
  lastSurface = s;
  const axis = surfaceNormal(surfaces, o, entry & 1, ray, normal);
  const behaviour = surfaces[o + S_BEHAVIOUR] | 0;
  if (behaviour === BEHAVIOUR_FRESNEL || behaviour === BEHAVIOUR_TEXTURED) {
    dielectricEvent(entry, axis);
    return true;
  }
  if (behaviour === BEHAVIOUR_MIRROR ? mirrorEvent(o, axis) : behaviour === BEHAVIOUR_DIFFUSE ? diffuseEvent(o) : false) return true;
  absorbedAt(entry);
  return false;
}

/** Histogram bin of an escape direction: ⌊θ in degrees⌋, θ = acos(dz), clamped to 0..179. */
function polarBin(): number {
  const dz = ray[5];
  const c = dz > 1 ? 1 : dz < -1 ? -1 : dz;
  const bin = Math.floor(Math.acos(c) * DEG_PER_RAD);
  return bin < POLAR_BINS ? bin : POLAR_BINS - 1;
}

/** The ray reached the bounding sphere: escaped, credited to the last surface it met. */
function escape(histogram: Float64Array): void {
  const bin = lastSurface === NONE ? NONE : surfaces[lastSurface * SURFACE_STRIDE + S_BIN_ESCAPED] | 0;
  if (bin === NONE) {
    bins[BIN_GEOMETRY_ERROR]++;
    return;
  }
  bins[bin]++;
  histogram[polarBin()]++;
  if (spectral) spectralEscape(ray[5]);
  if ((escapesLogged + 1) * ESCAPE_RECORD <= escapeLog.length) logEscape();
  if (ray[5] < 0) counters[COUNTER_ESCAPED_BELOW]++;
}

/** Copies the escaping ray's position, direction and wavelength into the recording buffer. */
function logEscape(): void {
  const o = escapesLogged * ESCAPE_RECORD;
  for (let k = 0; k < 6; k++) escapeLog[o + k] = ray[k];
  escapeLog[o + 6] = spectral ? photon[0] : NaN;
  escapesLogged++;
}

/**
 * Records the position, direction and wavelength of the next escaping rays (ESCAPE_RECORD doubles each)
 * into `buffer` until it is full, across the chunks traced after this call; an empty buffer stops recording.
 * @returns a function giving the number of rays recorded so far
 */
export function recordEscapes(buffer: Float64Array): () => number {
  escapeLog = buffer;
  escapesLogged = 0;
  return () => escapesLogged;
}

/**
 * The ray's steps inside box media (chip layers) in one tight loop: box exit → Beer–Lambert flight →
 * the face's Fresnel decision (axisFaceEvent's arithmetic; interfaceEvent in 'track' mode) or its
 * mirror, the same numbers drawn in the same order and the same events counted as runRays's general
 * steps would. Returns the ray's
 * event count; hands the ray back to the general loop, without having started the step, when it
 * leaves the fast boxes, reaches a face of another behaviour, finds no face ahead or reaches the event
 * cap; boxEnded is set when it ended in the box (absorbed in it or at its mirror, counted).
 * Its own function, taking and returning only integers (see the file comment).
 */
function boxSteps(rayEvents: number, maxEvents: number): number {
  boxEnded = false;
  let bo = boxOf[medium] - 1;
  for (;;) {
    const face = boxExit(ray, boxTable, bo, hit);
    if (face < 0 || rayEvents === maxEvents) return rayEvents;
    const q = bo + B_FACES + face * FACE_STRIDE;
    const kind = boxTable[q + F_KIND];
    if (kind === FAST_NONE) return rayEvents;
    rayEvents++;
    // Free flight with Beer–Lambert absorption (flight())
    const t = hit[0];
    const alpha = boxTable[bo + B_ABSORPTION];
    if (alpha > 0) {
      const depth = alpha * t;
      if (depth >= ray[6]) {
        bins[boxTable[bo + B_BIN] | 0]++;
        boxEnded = true;
        return rayEvents;
      }
      ray[6] -= depth;
    }
    ray[0] += t * ray[3];
    ray[1] += t * ray[4];
    ray[2] += t * ray[5];
    // On the face (surfaceNormal's snap)
    const k = boxTable[q + F_AXIS] | 0;
    ray[k] = boxTable[q + F_AT];
    lastSurface = boxTable[q + F_SURFACE] | 0;
    const j = 3 + k;
    const sign = boxTable[q + F_SIGN];
    if (track) {
      // The general events (their polarisation arithmetic) with surfaceNormal's normal, −sign·ê_k
      normal[0] = 0;
      normal[1] = 0;
      normal[2] = 0;
      normal[k] = -sign;
      if (kind === FAST_MIRROR) {
        if (mirrorEvent(lastSurface * SURFACE_STRIDE, k)) continue;
        bins[boxTable[q + F_BIN] | 0]++;
        boxEnded = true;
        return rayEvents;
      }
      const to = boxTable[q + F_TO] | 0;
      const outcome = interfaceEvent(medium, to);
      if (outcome === TIR) {
        const c = boxTable[q + F_TIR_COUNTER] | 0;
        if (c !== NONE) counters[c]++;
      }
      if (outcome !== TRANSMITTED) continue;
      medium = to;
      bo = boxOf[medium] - 1;
      if (bo < 0) return rayEvents;
      continue;
    }
    // The probability of reflection: a mirror's R, or the Fresnel R = (Rs + Rp)/2 (axisFaceEvent's
    // arithmetic) after total internal reflection is ruled out; one draw site for both, which keeps the
    // generator inlined here
    let R = boxTable[q + F_R];
    if (kind === FAST_FRESNEL) {
      const cosI = sign * ray[j];
      // Total internal reflection decided by fresnelRealTrusted's test, sin²θt = η²(1 − cos²θi) ≥ 1, with
      // η known beforehand (NaN: not known, the comparison fails and the Fresnel step decides)
      const eta = boxTable[q + F_ETA];
      let tir = eta * eta * (1 - cosI * cosI) >= 1;
      if (!tir) {
        fin[0] = cosI;
        // the indices from the media records, which a spectral scene rewrites at each ray's wavelength
        fin[1] = media[medium * MEDIUM_STRIDE + M_INDEX];
        fin[2] = media[(boxTable[q + F_TO] | 0) * MEDIUM_STRIDE + M_INDEX];
        tir = !fresnelRealTrusted(fin, fr);
      }
      if (tir) {
        ray[j] = -ray[j];
        const c = boxTable[q + F_TIR_COUNTER] | 0;
        if (c !== NONE) counters[c]++;
        continue;
      }
      R = 0.5 * (fr[0] + fr[1]);
    }
    uniformAt(u, 0);
    if (u[0] < R) {
      ray[j] = -ray[j];
      continue;
    }
    // Not reflected: absorbed at a mirror (mirrorEvent), refracted through an interface
    if (kind === FAST_MIRROR) {
      bins[boxTable[q + F_BIN] | 0]++;
      boxEnded = true;
      return rayEvents;
    }
    const eta = fin[1] / fin[2];
    ray[3] *= eta;
    ray[4] *= eta;
    ray[5] *= eta;
    ray[j] = sign * fr[2];
    medium = boxTable[q + F_TO] | 0;
    bo = boxOf[medium] - 1;
    if (bo < 0) return rayEvents;
  }
}

/**
 * The ray loop proper: launches `rays` rays and follows each to its end, counting fates in `bins`.
 * Kept apart from the tally bookkeeping so the optimised loop never meets code it has not yet run.
 */
function runRays(rays: number, maxEvents: number, histogram: Float64Array, onProgress?: (raysDone: number) => void): void {
  for (let i = 0; i < rays; i++) {
    if (onProgress !== undefined && i > 0 && i % PROGRESS_EVERY === 0) onProgress(i);
    launch();
    if (spectral) launchWavelength(i);
    let rayEvents = 0;
    for (;;) {
      // Inside the chip's layers: the tight loop, until the ray leaves them or needs the general step
      if (fastBoxes && boxOf[medium] !== 0) {
        rayEvents = boxSteps(rayEvents, maxEvents);
        if (boxEnded) break;
      }
      // Left a convex package for good (SceneSurface.finalExit): nothing to search
      if (medium === outside && lastSurface >= 0 && finalExit[lastSurface] === 1) {
        escape(histogram);
        break;
      }
      const entry = nearestBoundary();
      // Nothing ahead in the outside medium: the bounding sphere
      if (entry === NONE && medium === outside) {
        escape(histogram);
        break;
      }
      // Event cap: the ray is lost
      if (rayEvents === maxEvents) {
        bins[BIN_EVENT_CAP]++;
        break;
      }
      rayEvents++;
      if (entry === NONE) {
        bins[BIN_GEOMETRY_ERROR]++;
        break;
      }
      // A phosphor medium: particles met on the way (medium-events.ts)
      if (spectral && isPhosphorMedium(media, medium * MEDIUM_STRIDE)) {
        const outcome = phosphorFlight(ray, hit, media, medium * MEDIUM_STRIDE, bins);
        if (outcome === ENDED) break;
        if (outcome === REDIRECTED) {
          // scattered off the surface it last met (it meets another before any escape)
          lastSurface = NONE;
          if (track) redrawPolarization();
          continue;
        }
      } else if (!flight()) break;
      if (!surfaceEvent(entry)) break;
    }
    counters[COUNTER_EVENTS] += rayEvents;
  }
}

/** Receives a recorded ray's path (recordSceneRays); numbers in mm, a unit direction for escapes. */
export interface PathSink {
  /** A point of the path: the launch point (surface NONE) or a surface event's point on surface `surface`. */
  point(x: number, y: number, z: number, surface: number): void;
  /** The ray was absorbed in the current medium, at (x, y, z). */
  absorbed(x: number, y: number, z: number): void;
  /** The ray reached the bounding sphere going along (dx, dy, dz). */
  escaped(dx: number, dy: number, dz: number): void;
  /** The ray ended in ledger bin `bin` (an index into the scene's binNames). */
  end(bin: number): void;
}

/**
 * The ray loop of runRays with every step reported to `sink`, for drawing a few rays: the same steps
 * in the same order, so chunk `chunkIndex` of (scene, seed) gives the same rays and fates as the
 * tally of that chunk. A separate loop, so the traced run pays nothing for it: keep it in step with
 * runRays.
 */
export function recordSceneRays(scene: CompiledScene, chunkIndex: number, rays: number, seed: number, maxEvents: number, sink: PathSink): void {
  configure(scene);
  seedChunk(seed, chunkIndex);
  const histogram = new Float64Array(POLAR_BINS);
  const before = new Float64Array(bins.length);
  for (let i = 0; i < rays; i++) {
    before.set(bins);
    launch();
    if (spectral) launchWavelength(i);
    sink.point(ray[0], ray[1], ray[2], NONE);
    let rayEvents = 0;
    for (;;) {
      const entry = nearestBoundary();
      if (entry === NONE && medium === outside) {
        escape(histogram);
        sink.escaped(ray[3], ray[4], ray[5]);
        break;
      }
      if (rayEvents === maxEvents) {
        bins[BIN_EVENT_CAP]++;
        break;
      }
      rayEvents++;
      if (entry === NONE) {
        bins[BIN_GEOMETRY_ERROR]++;
        break;
      }
      // A phosphor medium: a particle event is a point on no surface; an absorption ends the path there
      if (spectral && isPhosphorMedium(media, medium * MEDIUM_STRIDE)) {
        const outcome = phosphorFlight(ray, hit, media, medium * MEDIUM_STRIDE, bins);
        if (outcome === ENDED) {
          sink.absorbed(ray[0], ray[1], ray[2]);
          break;
        }
        if (outcome === REDIRECTED) {
          lastSurface = NONE;
          if (track) redrawPolarization();
          sink.point(ray[0], ray[1], ray[2], NONE);
          continue;
        }
        const endedHere = !surfaceEvent(entry);
        sink.point(ray[0], ray[1], ray[2], entry >> 1);
        if (endedHere) break;
        continue;
      }
      // Where the optical depth left would run out, should this flight absorb the ray
      const alpha = media[medium * MEDIUM_STRIDE + M_ABSORPTION];
      const tAbsorbed = alpha > 0 ? ray[6] / alpha : Infinity;
      if (!flight()) {
        sink.absorbed(ray[0] + tAbsorbed * ray[3], ray[1] + tAbsorbed * ray[4], ray[2] + tAbsorbed * ray[5]);
        break;
      }
      const ended = !surfaceEvent(entry);
      // after the event: the position is snapped onto the surface
      sink.point(ray[0], ray[1], ray[2], entry >> 1);
      if (ended) break;
    }
    let bin = 0;
    while (bin < bins.length && bins[bin] === before[bin]) bin++;
    sink.end(bin);
  }
}

/**
 * Traces `rays` rays of chunk `chunkIndex` through a compiled scene and adds their fates to `tally`
 * (the named bins to tally.parts, and each to its older fixed count). The generator is seeded from
 * (seed, chunkIndex), so a chunk gives the same counts on any thread.
 * @param rays rays in this chunk, integer ≥ 0
 * @param seed unsigned 32-bit seed of the whole run
 * @param maxEvents surface events after which a ray is counted lost
 * @param onProgress called with the rays done so far in this chunk, every 2048 rays
 * @returns tally
 */
export function traceSceneChunk(
  scene: CompiledScene,
  chunkIndex: number,
  rays: number,
  seed: number,
  tally: Tally,
  maxEvents: number = DEFAULT_MAX_EVENTS,
  onProgress?: (raysDone: number) => void
): Tally {
  configure(scene, tally);
  seedChunk(seed, chunkIndex);
  runRays(rays, maxEvents, tally.polarHistogram, onProgress);

  tally.launched += rays;
  for (let i = 0; i < bins.length; i++) {
    const n = bins[i];
    const name = scene.binNames[i];
    tally.parts[name] = (tally.parts[name] ?? 0) + n;
    tally[scene.binGroups[i]] += n;
    const legacy = scene.binLegacyEscape[i];
    if (legacy !== null) tally[legacy] += n;
  }
  tally.geometryErrors += bins[BIN_GEOMETRY_ERROR];
  tally.events += counters[COUNTER_EVENTS];
  tally.escapedBelowHorizon += counters[COUNTER_ESCAPED_BELOW];
  tally.outerSurfaceTir += counters[COUNTER_TIR_OUTER];
  tally.chipFaceTir += counters[COUNTER_TIR_CHIP];
  return tally;
}

/**
 * Traces `rays` rays of chunk `chunkIndex` through package `pkg` (compiled to its scene) and adds
 * their fates to `tally`. Inputs are trusted: check them first with validateTracePackage /
 * validateTraceOptions.
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
  return traceSceneChunk(compileScene(packageScene(pkg)), chunkIndex, rays, seed, tally, maxEvents, onProgress);
}
