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
          : `Encapsulant radius must be more than ${why} (${above(minR)}) and at most ${max}.`
    });
  }
  return problems;
}
