/**
 * The fit rules of a package, in one place: the emitter lies inside the chip, and the chip inside its
 * encapsulant. The scenario schema and the tracer's edge check both read these, so they accept the
 * same packages and say the same thing.
 *
 * Both encapsulant shapes keep or lose width going up, so the chip's four top corners (±w/2, ±l/2, H)
 * decide: inside the dome x²/R² + y²/R² + z²/h² < 1, or the cylinder x² + y² < R², H < h.
 */
import { LIMITS } from './limits';

export interface FitChip {
  widthMm: number;
  lengthMm: number;
  heightMm: number;
  /** Omitted: the tracer's default, half the chip height (always inside). */
  emitterZMm?: number;
}

export interface FitEncapsulant {
  shape: 'none' | 'dome' | 'cylinder';
  radiusMm: number;
  heightMm: number;
}

/** One broken fit rule: the field (as a scenario path) and a sentence naming the allowed range. */
export interface FitProblem {
  path: 'chip.emitterZMm' | 'encapsulant.heightMm' | 'encapsulant.radiusMm';
  message: string;
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
 * R > ρ/√(1 − H²/h²) (corner (ρ, H) inside the spheroid), for a cylinder R > ρ; ρ the half-diagonal.
 * Infinity when h ≤ H (nothing holds the chip).
 */
export function minEncapsulantRadiusMm(chip: FitChip, enc: FitEncapsulant): number {
  const rho = Math.hypot(chip.widthMm / 2, chip.lengthMm / 2);
  if (!(enc.heightMm > chip.heightMm)) return Infinity;
  if (enc.shape === 'cylinder') return rho;
  return rho / Math.sqrt(1 - (chip.heightMm * chip.heightMm) / (enc.heightMm * enc.heightMm));
}

/** Every broken fit rule of a package whose single numbers are already in range (empty when it fits). */
export function packageFitProblems(chip: FitChip, enc: FitEncapsulant): FitProblem[] {
  const problems: FitProblem[] = [];
  const H = chip.heightMm;
  if (chip.emitterZMm !== undefined && chip.emitterZMm > H) {
    problems.push({ path: 'chip.emitterZMm', message: `Emitter height must be between 0 and the chip height (${atMost(H)}).` });
  }
  if (enc.shape === 'none') return problems;
  const max = `${LIMITS.sizeMm.max} mm`;
  if (!(enc.heightMm > H)) {
    problems.push({ path: 'encapsulant.heightMm', message: `Encapsulant height must be more than the chip height (${atMost(H)}) and at most ${max}.` });
    return problems;
  }
  const minR = minEncapsulantRadiusMm(chip, enc);
  if (!(enc.radiusMm > minR)) {
    const why = enc.shape === 'dome' ? "so the chip's corners are inside the dome" : "the chip's half-diagonal";
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
