/**
 * What the Monte Carlo tracer traces: one LED package (chip, base, encapsulant, outside medium) and
 * the run options, with the checks made once at the public edge.
 *
 * Units: lengths in mm, absorption coefficients in 1/mm (Beer–Lambert, I = I0·exp(−α·d)), indices
 * dimensionless. Frame: z up, base plane z = 0, chip centred on the z axis, width along x, length along y.
 */
import { LIMITS } from '../scenario/limits';
import { packageFitProblems, phosphorFitProblems } from '../scenario/package-fit';
import { validateTracePhosphor, type TracePhosphor } from './package-phosphor';

/** Where rays start inside the chip. */
export type EmissionMode = 'plane' | 'volume';

export interface TraceChip {
  /** Size along x, mm. */
  widthMm: number;
  /** Size along y, mm. */
  lengthMm: number;
  /** Size along z, mm; the chip stands on the base plane. */
  heightMm: number;
  /** Real refractive index. */
  n: number;
  /** Bulk absorption coefficient, 1/mm. */
  absorptionPerMm: number;
  /** Height of the emitting plane above the base, mm, [0, heightMm]; default heightMm / 2. */
  emitterZMm?: number;
  /** 'plane': uniform over the footprint at emitterZMm; 'volume': uniform in the chip (in the emitting layer when layered). */
  emission: EmissionMode;
  /**
   * Layers bottom to top (absent: one layer of heightMm, n, absorptionPerMm). When present, heightMm
   * must equal their total thickness and n, absorptionPerMm are not used.
   */
  layers?: TraceChipLayer[];
  /** Index into `layers` of the emitting layer (default 0); emitterZMm must lie inside it. */
  emitLayer?: number;
  /** The chip's own bottom mirror (absent: the chip stands on the base / cup floor and that reflects). */
  mirror?: TraceBase;
  /** Textured top face: scattered fraction s, [0, 1] (absent or 0: flat). */
  topScatter?: number;
}

export interface TraceChipLayer {
  /** Unique name (the ledger's bin for what it absorbs), e.g. 'GaN'. */
  name: string;
  thicknessMm: number;
  n: number;
  absorptionPerMm: number;
}

/** How the base (or the cup floor) reflects: like a mirror, or diffusely (Lambertian; needs a plain reflectance). */
export type SurfaceFinish = 'specular' | 'diffuse';

/**
 * A reflector cup: floor disc of radius floorRadiusMm at z = 0 (the base, with the package's base
 * reflectance and finish), a cone-frustum wall up to topRadiusMm at z = depthMm.
 * fill: 'flat' fills the cup with the encapsulant to its rim; 'dome' also puts a half spheroid of the
 * encapsulant (encapsulant.radiusMm ≤ topRadiusMm, encapsulant.heightMm) on the rim plane; 'none'
 * leaves it empty (the outside medium). With a cup, encapsulant.shape is not used.
 */
export interface TraceCup {
  kind: 'cup';
  floorRadiusMm: number;
  topRadiusMm: number;
  depthMm: number;
  wallFinish: SurfaceFinish;
  wallReflectance: number;
  fill: 'flat' | 'dome' | 'none';
}

/** The body the chip stands in: today's endless base plane ('flat'), or a reflector cup. */
export type TraceBody = { kind: 'flat' } | TraceCup;

/** The specular base under chip and encapsulant: a fixed reflectance, or a metal by its n + ik. */
export type TraceBase =
  | { kind: 'reflectance'; reflectance: number }
  | { kind: 'metal'; n: number; k: number };

export type EncapsulantShape = 'none' | 'dome' | 'cylinder' | 'box';

export interface TraceEncapsulant {
  /**
   * 'dome': upper half of the spheroid x²/R² + y²/R² + z²/h² = 1; 'cylinder': radius R, height h, flat top;
   * 'box': a square block |x|, |y| ≤ R (R the half side), height h, flat top (a chip-scale package).
   */
  shape: EncapsulantShape;
  /** R, mm: the radius, or a box's half side (ignored for 'none'). */
  radiusMm: number;
  /** h, mm (ignored for 'none'); h = R makes a hemisphere. */
  heightMm: number;
  /** Real refractive index (ignored for 'none'). */
  n: number;
  /** Bulk absorption coefficient, 1/mm (ignored for 'none'). */
  absorptionPerMm: number;
}

/** How polarisation enters the Fresnel choice at each interface. */
export type PolarizationMode = 'average' | 'track';

export interface TracePackage {
  chip: TraceChip;
  base: TraceBase;
  encapsulant: TraceEncapsulant;
  /** Index of the outside medium (1 for air). */
  outsideN: number;
  /** 'average': reflect with probability (Rs + Rp)/2; 'track': carry each ray's field and use its own R. */
  polarization: PolarizationMode;
  /** Finish of the base (or cup floor); default 'specular'. 'diffuse' needs base.kind 'reflectance'. */
  baseFinish?: SurfaceFinish;
  /** Default { kind: 'flat' }. */
  body?: TraceBody;
  /** A phosphor (package-phosphor.ts): rays then carry their wavelength. Needs an encapsulant. */
  phosphor?: TracePhosphor;
  /**
   * Indices over wavelength, for a package whose rays carry their wavelength (with a phosphor): each
   * ray then sees every index at its own wavelength. Absent (or null for a part): the part's `n` at
   * every wavelength. Without a phosphor it is not used.
   */
  dispersion?: TraceDispersion;
}

/** Rows [wavelength nm, real index n], sorted by wavelength; linear between rows, the ends held. */
export type IndexRows = [number, number][];

export interface TraceDispersion {
  /** One entry per chip layer, bottom to top (the single-box chip: one). */
  chipLayers?: (IndexRows | null)[];
  /** The encapsulant (and a phosphor layer of its material). */
  encapsulant?: IndexRows | null;
  outside?: IndexRows | null;
}

export interface TraceOptions {
  /** Rays to launch, integer [1, 2e7]. */
  rays: number;
  /** Seed, unsigned 32-bit integer. */
  seed: number;
  /** Surface events after which a ray is counted lost, integer [1, 1e6]; default 1000. */
  maxEvents?: number;
}

/** Default event cap per ray. */
export const DEFAULT_MAX_EVENTS = 1000;

/**
 * The tracer's names for its allowed ranges; the numbers live in the one limits table, so the tracer takes
 * every package the scenario schema accepts. Rays go down to 1 here (tests and single chunks); the
 * table's minimum is what a user may ask for.
 */
export const TRACE_LIMITS = {
  sizeMm: LIMITS.sizeMm,
  index: LIMITS.indexN,
  absorptionPerMm: LIMITS.absorptionPerMm,
  reflectance: LIMITS.reflectance,
  metalN: LIMITS.materialN,
  metalK: LIMITS.materialK,
  rays: { min: 1, max: LIMITS.rays.max },
  seed: LIMITS.seed,
  maxEvents: LIMITS.maxEvents,
  scatteredFraction: LIMITS.scatteredFraction,
  layers: LIMITS.chipLayers
} as const;

function show(value: unknown): string {
  return typeof value === 'number' || typeof value === 'string' ? JSON.stringify(value) : typeof value;
}

function requireRange(field: string, value: unknown, min: number, max: number): number {
  if (typeof value !== 'number' || !(value >= min && value <= max)) {
    throw new RangeError(`${field} must be a number in [${min}, ${max}] (got ${show(value)})`);
  }
  return value;
}

function requireInteger(field: string, value: unknown, min: number, max: number): number {
  if (typeof value !== 'number' || !Number.isInteger(value) || value < min || value > max) {
    throw new RangeError(`${field} must be an integer in [${min}, ${max}] (got ${show(value)})`);
  }
  return value;
}

function requireChoice(field: string, value: unknown, choices: readonly string[]): void {
  if (typeof value !== 'string' || !choices.includes(value)) {
    throw new RangeError(`${field} must be one of ${choices.map((c) => `'${c}'`).join(', ')} (got ${show(value)})`);
  }
}

/** A limit for a message, to six significant digits. */
function limitText(value: number): string {
  return String(Number(value.toPrecision(6)));
}

function requireObject(field: string, value: unknown): void {
  if (typeof value !== 'object' || value === null) throw new RangeError(`${field} must be an object (got ${show(value)})`);
}

/** The chip's layers bottom to top: chip.layers, or the one layer the single-box chip is. */
export function chipLayers(chip: TraceChip): TraceChipLayer[] {
  return chip.layers ?? [{ name: 'chip', thicknessMm: chip.heightMm, n: chip.n, absorptionPerMm: chip.absorptionPerMm }];
}

/** Bottom and top height (mm) of layer i of a chip. */
export function layerSpanMm(chip: TraceChip, i: number): [number, number] {
  const layers = chipLayers(chip);
  let z0 = 0;
  for (let k = 0; k < i; k++) z0 += layers[k].thicknessMm;
  return [z0, z0 + layers[i].thicknessMm];
}

/** The emitter height actually used: chip.emitterZMm, or the middle of the emitting layer when absent. */
export function emitterHeightMm(chip: TraceChip): number {
  if (chip.emitterZMm !== undefined) return chip.emitterZMm;
  if (chip.layers === undefined) return chip.heightMm / 2;
  const [z0, z1] = layerSpanMm(chip, chip.emitLayer ?? 0);
  return (z0 + z1) / 2;
}

/**
 * Checks a package; throws a RangeError naming the field and its allowed range. Also rejects a chip
 * that does not fit in the encapsulant: all four top corners (±w/2, ±l/2, H) must lie strictly inside
 * the dome (x²/R² + y²/R² + z²/h² < 1) or the cylinder (x² + y² < R², H < h).
 */
export function validateTracePackage(p: TracePackage): void {
  requireObject('package', p);
  const L = TRACE_LIMITS;
  requireObject('chip', p.chip);
  const chip = p.chip;
  requireRange('chip.widthMm', chip.widthMm, L.sizeMm.min, L.sizeMm.max);
  requireRange('chip.lengthMm', chip.lengthMm, L.sizeMm.min, L.sizeMm.max);
  requireRange('chip.heightMm', chip.heightMm, L.sizeMm.min, L.sizeMm.max);
  requireRange('chip.n', chip.n, L.index.min, L.index.max);
  requireRange('chip.absorptionPerMm', chip.absorptionPerMm, L.absorptionPerMm.min, L.absorptionPerMm.max);
  requireChoice('chip.emission', chip.emission, ['plane', 'volume']);
  if (chip.layers === undefined) {
    if (chip.emitterZMm !== undefined) requireRange('chip.emitterZMm', chip.emitterZMm, 0, chip.heightMm);
  } else {
    validateLayers(chip);
  }
  if (chip.mirror !== undefined) validateMirror('chip.mirror', chip.mirror);
  if (chip.topScatter !== undefined) requireRange('chip.topScatter', chip.topScatter, L.scatteredFraction.min, L.scatteredFraction.max);

  validateMirror('base', p.base);
  if (p.baseFinish !== undefined) {
    requireChoice('baseFinish', p.baseFinish, ['specular', 'diffuse']);
    if (p.baseFinish === 'diffuse' && p.base.kind !== 'reflectance') {
      throw new RangeError(`baseFinish 'diffuse' needs base.kind 'reflectance' (got base.kind '${p.base.kind}')`);
    }
  }

  requireRange('outsideN', p.outsideN, L.index.min, L.index.max);
  requireChoice('polarization', p.polarization, ['average', 'track']);

  requireObject('encapsulant', p.encapsulant);
  const enc = p.encapsulant;
  if (p.phosphor !== undefined) validateTracePhosphor(p.phosphor);
  if (p.dispersion !== undefined) validateDispersion(p.dispersion, chipLayers(chip).length);
  if (p.body !== undefined) {
    requireObject('body', p.body);
    requireChoice('body.kind', p.body.kind, ['flat', 'cup']);
    if (p.body.kind === 'cup') {
      validateCup(p, p.body);
      return validatePhosphorFit(p);
    }
  }
  requireChoice('encapsulant.shape', enc.shape, ['none', 'dome', 'cylinder', 'box']);
  if (enc.shape === 'none') return validatePhosphorFit(p);
  requireRange('encapsulant.radiusMm', enc.radiusMm, L.sizeMm.min, L.sizeMm.max);
  requireRange('encapsulant.heightMm', enc.heightMm, L.sizeMm.min, L.sizeMm.max);
  requireRange('encapsulant.n', enc.n, L.index.min, L.index.max);
  requireRange('encapsulant.absorptionPerMm', enc.absorptionPerMm, L.absorptionPerMm.min, L.absorptionPerMm.max);

  // Chip fit: the same rules as the scenario schema
  const problem = packageFitProblems(chip, enc)[0];
  if (problem) throw new RangeError(`${problem.path}: ${problem.message}`);
  validatePhosphorFit(p);
}

function validateIndexRows(field: string, rows: unknown): void {
  if (rows === null || rows === undefined) return;
  const L = TRACE_LIMITS;
  if (!Array.isArray(rows) || rows.length < 1 || rows.length > LIMITS.spectrumRows.max) {
    throw new RangeError(`${field} must hold 1 to ${LIMITS.spectrumRows.max} rows [wavelength nm, n] (got ${show(rows)})`);
  }
  rows.forEach((row: unknown, i) => {
    const f = `${field}[${i}]`;
    if (!Array.isArray(row) || row.length !== 2) throw new RangeError(`${f} must be [wavelength nm, n]`);
    requireRange(`${f} wavelength`, row[0], LIMITS.wavelengthNm.min, LIMITS.wavelengthNm.max);
    requireRange(`${f} n`, row[1], L.index.min, L.index.max);
    if (i > 0 && !(row[0] > (rows[i - 1] as number[])[0])) throw new RangeError(`${f} wavelength must be above the previous row's (rows sorted, no repeats)`);
  });
}

function validateDispersion(d: TraceDispersion, layerCount: number): void {
  requireObject('dispersion', d);
  if (d.chipLayers !== undefined) {
    if (!Array.isArray(d.chipLayers) || d.chipLayers.length !== layerCount) {
      throw new RangeError(`dispersion.chipLayers must hold one entry per chip layer (${layerCount})`);
    }
    d.chipLayers.forEach((rows, i) => validateIndexRows(`dispersion.chipLayers[${i}]`, rows));
  }
  validateIndexRows('dispersion.encapsulant', d.encapsulant);
  validateIndexRows('dispersion.outside', d.outside);
}

/** The phosphor's region fits the package (the scenario schema's rules); a cup's fill stands for the shape. */
function validatePhosphorFit(p: TracePackage): void {
  if (p.phosphor === undefined) return;
  const body = p.body ?? { kind: 'flat' as const };
  const enc = body.kind === 'cup' ? { ...p.encapsulant, shape: body.fill } : p.encapsulant;
  const problem = phosphorFitProblems(p.chip, enc, body, p.phosphor)[0];
  if (problem) throw new RangeError(`${problem.path}: ${problem.message}`);
}

function validateMirror(field: string, m: TraceBase): void {
  requireObject(field, m);
  const L = TRACE_LIMITS;
  requireChoice(`${field}.kind`, m.kind, ['reflectance', 'metal']);
  if (m.kind === 'reflectance') {
    requireRange(`${field}.reflectance`, m.reflectance, L.reflectance.min, L.reflectance.max);
  } else {
    if (!(typeof m.n === 'number' && m.n > L.metalN.min && m.n <= L.metalN.max)) {
      throw new RangeError(`${field}.n must be a number in (${L.metalN.min}, ${L.metalN.max}] (got ${show(m.n)})`);
    }
    requireRange(`${field}.k`, m.k, L.metalK.min, L.metalK.max);
  }
}

function validateLayers(chip: TraceChip): void {
  const L = TRACE_LIMITS;
  const layers = chip.layers as unknown;
  if (!Array.isArray(layers) || layers.length < L.layers.min || layers.length > L.layers.max) {
    throw new RangeError(`chip.layers must be a list of ${L.layers.min} to ${L.layers.max} layers (got ${show(layers)})`);
  }
  const names = new Set<string>();
  let total = 0;
  chip.layers!.forEach((layer, i) => {
    const f = `chip.layers[${i}]`;
    requireObject(f, layer);
    if (typeof layer.name !== 'string' || layer.name.length === 0 || names.has(layer.name) || ['outside', 'encapsulant'].includes(layer.name)) {
      throw new RangeError(`${f}.name must be a unique non-empty name other than 'outside' and 'encapsulant' (got ${show(layer.name)})`);
    }
    names.add(layer.name);
    requireRange(`${f}.thicknessMm`, layer.thicknessMm, L.sizeMm.min, L.sizeMm.max);
    requireRange(`${f}.n`, layer.n, L.index.min, L.index.max);
    requireRange(`${f}.absorptionPerMm`, layer.absorptionPerMm, L.absorptionPerMm.min, L.absorptionPerMm.max);
    total += layer.thicknessMm;
  });
  if (!(Math.abs(total - chip.heightMm) <= 1e-9 * total)) {
    throw new RangeError(`chip.heightMm must equal the layers' total thickness ${limitText(total)} mm (got ${show(chip.heightMm)})`);
  }
  const emit = chip.emitLayer ?? 0;
  requireInteger('chip.emitLayer', emit, 0, chip.layers!.length - 1);
  if (chip.emitterZMm !== undefined) {
    const [z0, z1] = layerSpanMm(chip, emit);
    requireRange('chip.emitterZMm (inside the emitting layer)', chip.emitterZMm, z0, z1);
  }
}

/** Checks a cup body and that the chip (and a dome) fit it. */
function validateCup(p: TracePackage, cup: TraceCup): void {
  const L = TRACE_LIMITS;
  requireRange('body.floorRadiusMm', cup.floorRadiusMm, L.sizeMm.min, L.sizeMm.max);
  requireRange('body.topRadiusMm', cup.topRadiusMm, cup.floorRadiusMm, L.sizeMm.max);
  requireRange('body.depthMm', cup.depthMm, L.sizeMm.min, L.sizeMm.max);
  requireChoice('body.wallFinish', cup.wallFinish, ['specular', 'diffuse']);
  requireRange('body.wallReflectance', cup.wallReflectance, L.reflectance.min, L.reflectance.max);
  requireChoice('body.fill', cup.fill, ['flat', 'dome', 'none']);
  const chip = p.chip;
  const rho = Math.hypot(chip.widthMm / 2, chip.lengthMm / 2);
  if (!(rho < cup.floorRadiusMm)) {
    throw new RangeError(
      `body.floorRadiusMm must be greater than the chip's half-diagonal ${limitText(rho)} mm so the chip stands on the floor (got ${show(cup.floorRadiusMm)})`
    );
  }
  if (!(chip.heightMm < cup.depthMm)) {
    throw new RangeError(`body.depthMm must be greater than chip.heightMm = ${limitText(chip.heightMm)} mm so the chip fits in the cup (got ${show(cup.depthMm)})`);
  }
  if (cup.fill === 'none') return;
  const enc = p.encapsulant;
  requireRange('encapsulant.n', enc.n, L.index.min, L.index.max);
  requireRange('encapsulant.absorptionPerMm', enc.absorptionPerMm, L.absorptionPerMm.min, L.absorptionPerMm.max);
  if (cup.fill === 'dome') {
    requireRange('encapsulant.radiusMm (dome on the cup rim, at most body.topRadiusMm)', enc.radiusMm, L.sizeMm.min, cup.topRadiusMm);
    requireRange('encapsulant.heightMm', enc.heightMm, L.sizeMm.min, L.sizeMm.max);
  }
}

/** Checks run options; throws a RangeError naming the field and its allowed range. */
export function validateTraceOptions(o: TraceOptions): void {
  requireObject('options', o);
  const L = TRACE_LIMITS;
  requireInteger('rays', o.rays, L.rays.min, L.rays.max);
  requireInteger('seed', o.seed, L.seed.min, L.seed.max);
  if (o.maxEvents !== undefined) requireInteger('maxEvents', o.maxEvents, L.maxEvents.min, L.maxEvents.max);
}
