/**
 * The fit rules of a package, in one place: the emitter lies inside the chip (inside its emitting
 * layer when the chip is layered), the layers add up to the chip's height, and the chip lies inside its
 * encapsulant or on its cup's floor. The scenario schema and the tracer's edge check both read these,
 * so they accept the same packages and say the same thing.
 *
 * On a flat base both encapsulant shapes keep or lose width going up, so the chip's four top corners
 * (±w/2, ±l/2, H) decide: inside the dome x²/R² + y²/R² + z²/h² < 1, or the cylinder x² + y² < R², H < h.
 * In a cup the chip stands on the floor (half-diagonal < floor radius) below the rim (H < depth); the
 * wall widens upward, so nothing else can touch it; a dome on the rim plane is at most as wide as the rim.
 */
import { LIMITS } from './limits';

export interface FitChip {
  widthMm: number;
  lengthMm: number;
  heightMm: number;
  /** Omitted: the tracer's default, half the chip height (always inside). */
  emitterZMm?: number;
  /** Layers bottom to top (only their thicknesses matter here); absent: one box. */
  layers?: readonly { thicknessMm: number }[];
  /** The emitting layer, from 0 at the bottom (default 0). */
  emitLayer?: number;
}

export interface FitEncapsulant {
  shape: 'none' | 'dome' | 'cylinder' | 'box' | 'flat';
  radiusMm: number;
  heightMm: number;
}

/** The body the chip stands in: a flat base, or a cup (radii and depth in mm). */
export type FitBody = { kind: 'flat' } | { kind: 'cup'; floorRadiusMm: number; topRadiusMm: number; depthMm: number };

/** The base's kind and finish: a diffuse (Lambertian) base needs a plain reflectance. */
export interface FitBase {
  kind: 'reflectance' | 'metal';
  finish: 'specular' | 'diffuse';
}

/** One broken fit rule: the field (as a scenario path) and a sentence naming the allowed range. */
export interface FitProblem {
  path:
    | 'chip.emitterZMm'
    | 'chip.heightMm'
    | 'chip.emitLayer'
    | 'encapsulant.shape'
    | 'encapsulant.heightMm'
    | 'encapsulant.radiusMm'
    | 'body.floorRadiusMm'
    | 'body.topRadiusMm'
    | 'body.depthMm'
    | 'baseFinish';
  message: string;
}

/** Bottom and top (mm) of layer i of a stack of thicknesses. */
export function layerSpan(layers: readonly { thicknessMm: number }[], i: number): [number, number] {
  let z0 = 0;
  for (let k = 0; k < i; k++) z0 += layers[k].thicknessMm;
  return [z0, z0 + layers[i].thicknessMm];
}

/** A lower bound for a message, rounded up to 3 significant digits so a value at the shown bound fits. */
function above(x: number): string {
  const p = Number(x.toPrecision(3));
  const shown = p >= x ? p : Number((p + 10 ** (Math.floor(Math.log10(x)) - 2)).toPrecision(3));
  return `${shown} mm`;
}

function atMost(x: number): string {
  return `${Number(x.toPrecision(3))} mm`;
}

/**
 * The smallest radius (exclusive) of an encapsulant of height h that holds the chip: for a dome
 * R > ρ/√(1 − H²/h²) (corner (ρ, H) inside the spheroid), for a cylinder R > ρ; ρ the half-diagonal;
 * for a box (R its half side) R > max(w, l)/2.
 * Infinity when h ≤ H (nothing holds the chip).
 */
export function minEncapsulantRadiusMm(chip: FitChip, enc: FitEncapsulant): number {
  const rho = Math.hypot(chip.widthMm / 2, chip.lengthMm / 2);
  if (!(enc.heightMm > chip.heightMm)) return Infinity;
  if (enc.shape === 'cylinder') return rho;
  if (enc.shape === 'box') return Math.max(chip.widthMm, chip.lengthMm) / 2;
  return rho / Math.sqrt(1 - (chip.heightMm * chip.heightMm) / (enc.heightMm * enc.heightMm));
}

/** The chip's own rules: layers add up to its height, the emitting layer exists, the emitter lies in it. */
function chipProblems(chip: FitChip): FitProblem[] {
  const H = chip.heightMm;
  const layers = chip.layers;
  if (layers === undefined) {
    if (chip.emitLayer !== undefined && chip.emitLayer !== 0) {
      return [{ path: 'chip.emitLayer', message: 'Emitting layer must be 1: the chip is a single box.' }];
    }
    if (chip.emitterZMm !== undefined && chip.emitterZMm > H) {
      return [{ path: 'chip.emitterZMm', message: `Emitter height must be between 0 and the chip height (${atMost(H)}).` }];
    }
    return [];
  }
  const total = layers.reduce((sum, l) => sum + l.thicknessMm, 0);
  if (!(Math.abs(total - H) <= 1e-9 * total)) {
    return [{ path: 'chip.heightMm', message: `Chip height must equal the layers' total thickness (${atMost(total)}).` }];
  }
  const emit = chip.emitLayer ?? 0;
  if (!(Number.isInteger(emit) && emit >= 0 && emit < layers.length)) {
    return [{ path: 'chip.emitLayer', message: `Emitting layer must be a layer number from 1 to ${layers.length}.` }];
  }
  const [z0, z1] = layerSpan(layers, emit);
  if (chip.emitterZMm !== undefined && !(chip.emitterZMm >= z0 && chip.emitterZMm <= z1)) {
    return [{
      path: 'chip.emitterZMm',
      message: `Emitter height must be inside emitting layer ${emit + 1}: between ${Number(z0.toPrecision(6))} and ${Number(z1.toPrecision(6))} mm.`
    }];
  }
  return [];
}

/** A cup's rules: it widens upward, holds the chip on its floor below its rim, and a dome is no wider than the rim. */
function cupProblems(chip: FitChip, enc: FitEncapsulant, cup: Extract<FitBody, { kind: 'cup' }>): FitProblem[] {
  const max = `${LIMITS.sizeMm.max} mm`;
  const problems: FitProblem[] = [];
  if (enc.shape === 'cylinder' || enc.shape === 'box') {
    problems.push({ path: 'encapsulant.shape', message: "Encapsulant shape in a cup must be 'flat' (filled to the rim), 'dome' (a dome on the rim) or 'none' (empty)." });
  }
  if (!(cup.topRadiusMm >= cup.floorRadiusMm)) {
    problems.push({ path: 'body.topRadiusMm', message: `Cup top radius must be at least the floor radius (${atMost(cup.floorRadiusMm)}) and at most ${max}.` });
  }
  const rho = Math.hypot(chip.widthMm / 2, chip.lengthMm / 2);
  if (!(cup.floorRadiusMm > rho)) {
    problems.push({
      path: 'body.floorRadiusMm',
      message: `Cup floor radius must be more than the chip's half-diagonal (${above(rho)}) so the chip fits on the floor, and at most ${max}.`
    });
  }
  if (!(cup.depthMm > chip.heightMm)) {
    problems.push({ path: 'body.depthMm', message: `Cup depth must be more than the chip height (${atMost(chip.heightMm)}) and at most ${max}.` });
  }
  if (enc.shape === 'dome' && !(enc.radiusMm <= cup.topRadiusMm)) {
    problems.push({ path: 'encapsulant.radiusMm', message: `Encapsulant radius (the dome on the cup) must be between ${LIMITS.sizeMm.min} mm and the cup's top radius (${atMost(cup.topRadiusMm)}).` });
  }
  return problems;
}

/**
 * Every broken fit rule of a package whose single numbers are already in range (empty when it fits).
 * `body` defaults to the flat base; `base`, when given, is checked for a diffuse finish on a metal.
 */
export function packageFitProblems(chip: FitChip, enc: FitEncapsulant, body: FitBody = { kind: 'flat' }, base?: FitBase): FitProblem[] {
  const problems = chipProblems(chip);
  if (base && base.finish === 'diffuse' && base.kind !== 'reflectance') {
    problems.push({ path: 'baseFinish', message: 'Base finish can be diffuse only for a base given by its reflectance (0 to 1), not for a metal.' });
  }
  if (body.kind === 'cup') return [...problems, ...cupProblems(chip, enc, body)];
  if (enc.shape === 'flat') {
    problems.push({ path: 'encapsulant.shape', message: "Encapsulant shape 'flat' fills a cup: choose the cup body, or shape 'none', 'dome', 'cylinder' or 'box'." });
    return problems;
  }
  const H = chip.heightMm;
  if (enc.shape === 'none') return problems;
  const max = `${LIMITS.sizeMm.max} mm`;
  if (!(enc.heightMm > H)) {
    problems.push({ path: 'encapsulant.heightMm', message: `Encapsulant height must be more than the chip height (${atMost(H)}) and at most ${max}.` });
    return problems;
  }
  const minR = minEncapsulantRadiusMm(chip, enc);
  if (!(enc.radiusMm > minR)) {
    const why = enc.shape === 'dome' ? "so the chip's corners are inside the dome" : enc.shape === 'box' ? "half the chip's longer side" : "the chip's half-diagonal";
    problems.push({
      path: 'encapsulant.radiusMm',
      message:
        enc.shape === 'dome'
          ? `Encapsulant radius must be more than ${above(minR)} (${why}) and at most ${max}.`
          : `${enc.shape === 'box' ? 'Box half side' : 'Encapsulant radius'} must be more than ${why} (${above(minR)}) and at most ${max}.`
    });
  }
  return problems;
}

/** Where a phosphor sits (the regions the tracer builds; see trace/body-phosphor.ts). */
export type FitPhosphorRegion = 'encapsulant' | 'conformal' | 'remote' | 'floor';

export interface FitPhosphor {
  region: FitPhosphorRegion;
  /** Layer thickness T, mm (the layer regions; ignored for 'encapsulant'). */
  thicknessMm?: number;
}

/** x rounded down to 3 significant digits, so a value at the shown bound fits. */
function roundedDown(x: number): number {
  const step = 10 ** (Math.floor(Math.log10(x)) - 2);
  return Number((Math.floor(x / step) * step).toPrecision(3));
}

/** A broken phosphor rule: the field and its message. */
export interface PhosphorFitProblem {
  path: 'phosphor.region' | 'phosphor.thicknessMm';
  message: string;
}

/**
 * The largest layer thickness (exclusive) that fits, by bisection of a predicate that only gets
 * harder to meet as the layer thickens; 0 when none does.
 */
function largestFitting(fits: (t: number) => boolean, upTo: number): number {
  if (fits(upTo)) return upTo;
  let lo = 0;
  let hi = upTo;
  for (let i = 0; i < 60; i++) {
    const mid = 0.5 * (lo + hi);
    if (fits(mid)) lo = mid;
    else hi = mid;
  }
  return lo;
}

/**
 * The phosphor's placement rules: a layer region needs its thickness, every region needs an
 * encapsulant (the layer's binder is the encapsulant material), and the layer must fit:
 * conformal — the coated chip (w + 2T) × (l + 2T) × (H + T) inside the dome or cylinder, or on the cup
 * floor below the rim; remote — a plate (the top T of a flat fill or cylinder) above the chip, or on a
 * dome a shell of thickness T under its surface (inner spheroid R − T, h − T) clear of the chip;
 * floor — a settled layer thinner than the chip, in a cup or a cylinder (not under a dome on a flat
 * base, whose curved edge the layer would meet).
 * `enc.shape` is the fill for a cup ('flat', 'dome', 'none').
 */
export function phosphorFitProblems(chip: FitChip, enc: FitEncapsulant, body: FitBody, phosphor: FitPhosphor): PhosphorFitProblem[] {
  const region = phosphor.region;
  if (enc.shape === 'none') {
    return [{ path: 'phosphor.region', message: `Phosphor region '${region}' needs an encapsulant (the phosphor's binder is the encapsulant material): choose a fill, a dome or a cylinder.` }];
  }
  if (region === 'encapsulant') return [];
  if (enc.shape === 'box' && body.kind !== 'cup') {
    return [{ path: 'phosphor.region', message: `Phosphor region '${region}' is not modelled in a box encapsulant: disperse the phosphor in the whole encapsulant ('encapsulant'), or choose a dome or a cylinder.` }];
  }
  const T = phosphor.thicknessMm;
  const tLimit = LIMITS.phosphorThicknessMm;
  if (T === undefined) {
    return [{ path: 'phosphor.thicknessMm', message: `Phosphor layer thickness is needed for a ${region} layer (between ${tLimit.min} and ${tLimit.max} mm).` }];
  }
  const cup = body.kind === 'cup' ? body : null;
  const H = chip.heightMm;
  const a = chip.widthMm / 2;
  const b = chip.lengthMm / 2;
  if (region === 'floor' && !cup && enc.shape === 'dome') {
    return [{
      path: 'phosphor.region',
      message: "Phosphor region 'floor' needs a cup or a cylinder encapsulant: a settled layer on a flat base would meet the dome's curved edge, which is not modelled."
    }];
  }
  let fits: (t: number) => boolean;
  let why: string;
  if (region === 'conformal') {
    why = cup ? 'the coated chip on the cup floor, below the rim' : `the coated chip inside the ${enc.shape}`;
    fits = (t) => {
      const rho2 = (a + t) ** 2 + (b + t) ** 2;
      if (cup) return Math.sqrt(rho2) < cup.floorRadiusMm && H + t < cup.depthMm;
      if (enc.shape === 'cylinder') return rho2 < enc.radiusMm ** 2 && H + t < enc.heightMm;
      return rho2 / enc.radiusMm ** 2 + (H + t) ** 2 / enc.heightMm ** 2 < 1;
    };
  } else if (region === 'remote') {
    if (enc.shape === 'dome') {
      why = "a shell under the dome's surface, thinner than the dome" + (cup ? '' : ', clear of the chip');
      fits = (t) => t < enc.radiusMm && t < enc.heightMm && (cup !== null || packageFitProblems(chip, { shape: 'dome', radiusMm: enc.radiusMm - t, heightMm: enc.heightMm - t }).length === 0);
    } else {
      const top = cup ? cup.depthMm : enc.heightMm;
      why = `a plate at the top of the ${cup ? 'cup fill' : 'cylinder'}, above the chip`;
      fits = (t) => t < top - H;
    }
  } else {
    why = 'a settled layer thinner than the chip';
    fits = (t) => t < H;
  }
  if (fits(T)) return [];
  const max = largestFitting(fits, tLimit.max);
  return [{
    path: 'phosphor.thicknessMm',
    message:
      max > tLimit.min
        ? `Phosphor layer thickness must be from ${tLimit.min} mm to below ${roundedDown(max)} mm for a ${region} layer here (${why}).`
        : `Phosphor region '${region}' does not fit this package at any thickness from ${tLimit.min} mm (${why}).`
  }];
}
