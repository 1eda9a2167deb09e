/**
 * What the Monte Carlo tracer traces: one LED package (chip, base, encapsulant, outside medium) and
 * the run options, with the checks made once at the public edge.
 *
 * Units: lengths in mm, absorption coefficients in 1/mm (Beer–Lambert, I = I0·exp(−α·d)), indices
 * dimensionless. Frame: z up, base plane z = 0, chip centred on the z axis, width along x, length along y.
 */
import { LIMITS } from '../scenario/limits';
import { packageFitProblems } from '../scenario/package-fit';

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
  /** 'plane': uniform over the footprint at emitterZMm; 'volume': uniform in the chip. */
  emission: EmissionMode;
}

/** The specular base under chip and encapsulant: a fixed reflectance, or a metal by its n + ik. */
export type TraceBase =
  | { kind: 'reflectance'; reflectance: number }
  | { kind: 'metal'; n: number; k: number };

export type EncapsulantShape = 'none' | 'dome' | 'cylinder';

export interface TraceEncapsulant {
  /** 'dome': upper half of the spheroid x²/R² + y²/R² + z²/h² = 1; 'cylinder': radius R, height h, flat top. */
  shape: EncapsulantShape;
  /** R, mm (ignored for 'none'). */
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
  maxEvents: LIMITS.maxEvents
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

function requireObject(field: string, value: unknown): void {
  if (typeof value !== 'object' || value === null) throw new RangeError(`${field} must be an object (got ${show(value)})`);
}

/** The emitter height actually used: chip.emitterZMm, or half the chip height when absent. */
export function emitterHeightMm(chip: TraceChip): number {
  return chip.emitterZMm === undefined ? chip.heightMm / 2 : chip.emitterZMm;
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
  if (chip.emitterZMm !== undefined) requireRange('chip.emitterZMm', chip.emitterZMm, 0, chip.heightMm);
  requireChoice('chip.emission', chip.emission, ['plane', 'volume']);

  requireObject('base', p.base);
  requireChoice('base.kind', p.base.kind, ['reflectance', 'metal']);
  if (p.base.kind === 'reflectance') {
    requireRange('base.reflectance', p.base.reflectance, L.reflectance.min, L.reflectance.max);
  } else {
    if (!(typeof p.base.n === 'number' && p.base.n > L.metalN.min && p.base.n <= L.metalN.max)) {
      throw new RangeError(`base.n must be a number in (${L.metalN.min}, ${L.metalN.max}] (got ${show(p.base.n)})`);
    }
    requireRange('base.k', p.base.k, L.metalK.min, L.metalK.max);
  }

  requireRange('outsideN', p.outsideN, L.index.min, L.index.max);
  requireChoice('polarization', p.polarization, ['average', 'track']);

  requireObject('encapsulant', p.encapsulant);
  const enc = p.encapsulant;
  requireChoice('encapsulant.shape', enc.shape, ['none', 'dome', 'cylinder']);
  if (enc.shape === 'none') return;
  requireRange('encapsulant.radiusMm', enc.radiusMm, L.sizeMm.min, L.sizeMm.max);
  requireRange('encapsulant.heightMm', enc.heightMm, L.sizeMm.min, L.sizeMm.max);
  requireRange('encapsulant.n', enc.n, L.index.min, L.index.max);
  requireRange('encapsulant.absorptionPerMm', enc.absorptionPerMm, L.absorptionPerMm.min, L.absorptionPerMm.max);

  // Chip fit: the same rules as the scenario schema
  const problem = packageFitProblems(chip, enc)[0];
  if (problem) throw new RangeError(`${problem.path}: ${problem.message}`);
}

/** Checks run options; throws a RangeError naming the field and its allowed range. */
export function validateTraceOptions(o: TraceOptions): void {
  requireObject('options', o);
  const L = TRACE_LIMITS;
  requireInteger('rays', o.rays, L.rays.min, L.rays.max);
  requireInteger('seed', o.seed, L.seed.min, L.seed.max);
  if (o.maxEvents !== undefined) requireInteger('maxEvents', o.maxEvents, L.maxEvents.min, L.maxEvents.max);
}
