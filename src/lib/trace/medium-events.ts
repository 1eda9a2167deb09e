/**
 * Spectral rays and the events inside a phosphor medium, for the ray loop (trace-chunk.ts).
 *
 * - Each ray carries its wavelength (`photon[0]`), drawn at launch from the chip's quantile table
 *   (no number drawn for a single line).
 * - In a phosphor medium the flight to the next boundary samples a free path from the total
 *   coefficient μt = μs(λ) + μa(λ) of the phosphor (a fresh exponential per segment: memoryless),
 *   while the host's own absorption keeps spending the ray's optical depth τ as in any medium.
 *   Ending before the boundary, the ray meets a particle: with probability μs/μt it scatters
 *   (Henyey–Greenstein, g(λ)); otherwise the phosphor absorbs it, and with probability QY it is
 *   re-emitted isotropically at a wavelength drawn from the phosphor's emission (it goes on from
 *   there, and may be re-absorbed by the same rule), else it is heat (ledger bin 'phosphor:<medium>').
 * - Dispersion: every medium that gives its index over wavelength has it set at the ray's wavelength
 *   whenever that changes (launch, re-emission), written into the compiled medium records the interface
 *   events read, so Fresnel and refraction are per ray at no cost per event. Media without a table
 *   (a typed index) keep their one index; so do metal mirrors and the Mie host index of the coefficients.
 * - A medium may mix particle kinds (a yellow and a red phosphor): μs and μa are the kinds' sums, and
 *   the uniform number that chose scatter or absorb also picks the kind by its share of μs or μa at
 *   the ray's wavelength (independent scatterers; no extra number is drawn), so a red phosphor absorbs
 *   the yellow light it sees by its own table, and each kind re-emits by its own QY and emission.
 * Allocation-free: module-scope typed arrays, small-integer returns.
 * Sources: free-path sampling and the scatter/absorb choice, L. Wang, S. L. Jacques, L. Zheng, "MCML",
 * Comput. Methods Programs Biomed. 47, 131 (1995), §3; direction update after a scattering angle,
 * ibid. eq. 3.24 (common practice); isotropic directions, G. Marsaglia, Ann. Math. Stat. 43, 645 (1972).
 */
import { sampleHenyeyGreenstein } from '../scatter/henyey-greenstein';
import type { CompiledScene } from './compile-scene';
import { GRID_FROM_NM, GRID_POINTS, GRID_STEP_NM, MAX_MIXED_KINDS, PHOSPHOR_TABLE_STRIDE } from './phosphor-tables';
import { uniformsInto } from './rng';
import { QUANTILES, sampleQuantile } from './spectral-sampler';
import { ANGLE_BANDS, ANGLE_BAND_DEG, BATCHES, SPECTRUM_BINS, SPECTRUM_FROM_NM, SPECTRUM_STEP_NM, createSpectralTally, type SpectralTally } from './spectral-tally';
import * as layout from './scene-layout';

// Module constants, not imported bindings (see trace-chunk.ts: getters under tsx are not always inlined)
const { M_ABSORPTION, M_BIN, M_INDEX, M_PHOSPHOR, MEDIUM_STRIDE } = layout;

/** The current ray's [wavelength nm, converted (0/1), batch]. */
export const photon = new Float64Array(3);

// Outcomes of a flight through a phosphor medium
/** Reached the boundary: go on with the surface event. */
export const AT_BOUNDARY = 0;
/** Scattered or re-emitted inside: find the next boundary from the new direction. */
export const REDIRECTED = 1;
/** Absorbed (phosphor heat or host): the ray ends, counted. */
export const ENDED = 2;

const u = new Float64Array(2);
const c = new Float64Array(3);
/** μs, μa, g of each kind of a mixture at the ray's wavelength. */
const kinds = new Float64Array(3 * MAX_MIXED_KINDS);
// `var`, not `let`, for the mutable state read per event (no initialisation check per read: see trace-chunk.ts)
var partStart: Int32Array = new Int32Array(0);
var partCount: Int32Array = new Int32Array(0);
var coefficients: Float64Array = new Float64Array(0);
var emission: Float64Array = new Float64Array(0);
var quantumYield: Float64Array = new Float64Array(0);
var chip: Float64Array = new Float64Array(0);
var chipLine = true;
var heatBins: number[] = [];
// Dispersive media (compiled medium indices), their index tables on the grid, and the records they are written to
var dispersive: Int32Array = new Int32Array(0);
var indices: Float64Array = new Float64Array(0);
var sceneMedia: Float64Array = new Float64Array(0);
var tally: SpectralTally = createSpectralTally();
const RAD_TO_DEG = 180 / Math.PI;

/**
 * Sets the tables of a spectral scene and the tally the escapes go to; false (nothing set) when the
 * scene has no phosphor.
 */
export function configureSpectral(scene: CompiledScene, into: SpectralTally): boolean {
  const t = scene.spectral;
  if (!t) return false;
  coefficients = t.coefficients;
  partStart = t.partStart;
  partCount = t.partCount;
  emission = t.emission;
  quantumYield = t.quantumYield;
  chip = t.chip;
  chipLine = t.chipLine;
  heatBins = scene.phosphorBins;
  dispersive = t.dispersive;
  indices = t.indices;
  sceneMedia = scene.media;
  tally = into;
  return true;
}

/** Writes each dispersive medium's index at the ray's wavelength into the medium records (grid interpolation, ends held). */
function indicesAtWavelength(): void {
  const count = dispersive.length;
  if (count === 0) return;
  let f = (photon[0] - GRID_FROM_NM) / GRID_STEP_NM;
  if (f < 0) f = 0;
  else if (f > GRID_POINTS - 1) f = GRID_POINTS - 1;
  const i = f | 0;
  const j = i < GRID_POINTS - 1 ? i + 1 : i;
  const w = f - i;
  for (let k = 0; k < count; k++) {
    const o = k * GRID_POINTS;
    const a = indices[o + i];
    sceneMedia[dispersive[k] * MEDIUM_STRIDE + M_INDEX] = w === 0 ? a : a + w * (indices[o + j] - a);
  }
}

/** A new ray's wavelength from the chip spectrum; `rayIndex` picks its batch. */
export function launchWavelength(rayIndex: number): void {
  if (chipLine) photon[0] = chip[0];
  else {
    uniformsInto(u, 1);
    photon[0] = sampleQuantile(chip, 0, u[0]);
  }
  photon[1] = 0;
  photon[2] = rayIndex % BATCHES;
  tally.launchedInverseNm += 1 / photon[0];
  indicesAtWavelength();
}

/** μs, μa, g of phosphor p at the ray's wavelength into c[0..2] (grid interpolation, ends held). */
function coefficientsAt(p: number): void {
  let f = (photon[0] - GRID_FROM_NM) / GRID_STEP_NM;
  if (f < 0) f = 0;
  else if (f > GRID_POINTS - 1) f = GRID_POINTS - 1;
  const i = f | 0;
  const j = i < GRID_POINTS - 1 ? i + 1 : i;
  const w = f - i;
  const o = p * PHOSPHOR_TABLE_STRIDE;
  for (let k = 0; k < 3; k++) {
    const a = coefficients[o + k * GRID_POINTS + i];
    c[k] = a + w * (coefficients[o + k * GRID_POINTS + j] - a);
  }
}

/** A new direction at angle acos(μ) from the old one, azimuth uniform (MCML eq. 3.24). */
function turn(ray: Float64Array, mu: number, phi: number): void {
  const st = Math.sqrt(Math.max(0, 1 - mu * mu));
  const cp = Math.cos(phi);
  const sp = Math.sin(phi);
  const ux = ray[3];
  const uy = ray[4];
  const uz = ray[5];
  if (Math.abs(uz) > 0.99999) {
    ray[3] = st * cp;
    ray[4] = st * sp;
    ray[5] = mu * (uz > 0 ? 1 : -1);
    return;
  }
  const den = Math.sqrt(1 - uz * uz);
  ray[3] = (st * (ux * uz * cp - uy * sp)) / den + ux * mu;
  ray[4] = (st * (uy * uz * cp + ux * sp)) / den + uy * mu;
  ray[5] = -st * cp * den + uz * mu;
}

/** An isotropic direction (Marsaglia 1972). */
function isotropic(ray: Float64Array): void {
  let a = 0;
  let b = 0;
  let s = 1;
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
}

/**
 * Flight of the ray (ray = [x, y, z, dx, dy, dz, τ]) through the phosphor medium at media offset `o`
 * towards a boundary at distance hit[0]. Moves the ray and returns AT_BOUNDARY, REDIRECTED or ENDED.
 */
export function phosphorFlight(ray: Float64Array, hit: Float64Array, media: Float64Array, o: number, bins: Float64Array): number {
  const m = media[o + M_PHOSPHOR] | 0;
  const first = partStart[m];
  const count = partCount[m];
  coefficientsAt(first);
  if (count > 1) {
    // A mixture: keep each kind's coefficients, sum μs and μa (g is picked per kind below)
    kinds[0] = c[0];
    kinds[1] = c[1];
    kinds[2] = c[2];
    let mus = c[0];
    let mua = c[1];
    for (let k = 1; k < count; k++) {
      coefficientsAt(first + k);
      kinds[3 * k] = c[0];
      kinds[3 * k + 1] = c[1];
      kinds[3 * k + 2] = c[2];
      mus += c[0];
      mua += c[1];
    }
    c[0] = mus;
    c[1] = mua;
  }
  const mut = c[0] + c[1];
  let t = hit[0];
  let inside = false;
  if (mut > 0) {
    uniformsInto(u, 1);
    const d = -Math.log(1 - u[0]) / mut;
    if (d < t) {
      t = d;
      inside = true;
    }
  }
  const alpha = media[o + M_ABSORPTION];
  if (alpha > 0) {
    const depth = alpha * t;
    if (depth >= ray[6]) {
      bins[media[o + M_BIN] | 0]++;
      return ENDED;
    }
    ray[6] -= depth;
  }
  ray[0] += t * ray[3];
  ray[1] += t * ray[4];
  ray[2] += t * ray[5];
  if (!inside) return AT_BOUNDARY;
  uniformsInto(u, 1);
  let pick = u[0] * mut;
  let p = first;
  if (pick < c[0]) {
    // Scattering by the kind whose share of μs the number falls in: Henyey–Greenstein polar angle, uniform azimuth
    let g = c[2];
    if (count > 1) {
      let k = 0;
      while (k < count - 1 && pick >= kinds[3 * k]) pick -= kinds[3 * k++];
      g = kinds[3 * k + 2];
    }
    uniformsInto(u, 2);
    turn(ray, sampleHenyeyGreenstein(g, u[0]), 2 * Math.PI * u[1]);
    tally.scatterEvents++;
    return REDIRECTED;
  }
  if (count > 1) {
    // Absorbed by the kind whose share of μa the number falls in
    pick -= c[0];
    let k = 0;
    while (k < count - 1 && pick >= kinds[3 * k + 1]) pick -= kinds[3 * k++ + 1];
    p = first + k;
  }
  // Absorbed by the phosphor: re-emitted with probability QY, else heat
  uniformsInto(u, 1);
  if (!(u[0] < quantumYield[p])) {
    bins[heatBins[m]]++;
    return ENDED;
  }
  uniformsInto(u, 1);
  photon[0] = sampleQuantile(emission, p * QUANTILES, u[0]);
  photon[1] = 1;
  tally.conversions++;
  indicesAtWavelength();
  isotropic(ray);
  return REDIRECTED;
}

/** Records an escape: its wavelength bin in the ray's batch and its polar band (θ from the direction dz). */
export function spectralEscape(dz: number): void {
  const cz = dz > 1 ? 1 : dz < -1 ? -1 : dz;
  let band = Math.floor((Math.acos(cz) * RAD_TO_DEG) / ANGLE_BAND_DEG);
  if (band >= ANGLE_BANDS) band = ANGLE_BANDS - 1;
  let bin = Math.floor((photon[0] - SPECTRUM_FROM_NM) / SPECTRUM_STEP_NM);
  if (bin < 0) bin = 0;
  else if (bin >= SPECTRUM_BINS) bin = SPECTRUM_BINS - 1;
  tally.escaped[((photon[2] | 0) * ANGLE_BANDS + band) * SPECTRUM_BINS + bin]++;
  if (photon[1] === 1) tally.escapedConverted++;
  else tally.escapedBlue++;
  tally.escapedInverseNm += 1 / photon[0];
}

/** Whether the medium at offset `o` holds a phosphor. */
export function isPhosphorMedium(media: Float64Array, o: number): boolean {
  return media[o + M_PHOSPHOR] >= 0;
}
