/**
 * Minimal complex arithmetic on pairs of doubles.
 *
 * Two forms:
 * - object form (`Complex`, `cAdd`, `cMul`, ...) for code at the public edge, where clarity matters more
 *   than allocation;
 * - buffer form (`cMulInto`, `cDivInto`, `cSqrtInto`, ...) taking real and imaginary parts as plain numbers
 *   and writing the result into `out[i]` (real) and `out[i + 1]` (imaginary) of a caller-owned
 *   `Float64Array`, allocating nothing. Operands are read into locals first, so an operand may live in
 *   the same buffer slot as the result.
 *
 * Convention: z = re + i·im. Principal square root has re ≥ 0 (branch cut on the negative real axis).
 * Source: standard complex arithmetic; the overflow-safe division follows R. L. Smith,
 * "Algorithm 116: Complex division", Commun. ACM 5, 435 (1962).
 */

/** A complex number re + i·im. */
export interface Complex {
  re: number;
  im: number;
}

/** Builds a complex number re + i·im. */
export function complex(re: number, im = 0): Complex {
  return { re, im };
}

/** a + b */
export function cAdd(a: Complex, b: Complex): Complex {
  return { re: a.re + b.re, im: a.im + b.im };
}

/** a − b */
export function cSub(a: Complex, b: Complex): Complex {
  return { re: a.re - b.re, im: a.im - b.im };
}

/** a · b = (ac − bd) + i(ad + bc) */
export function cMul(a: Complex, b: Complex): Complex {
  return { re: a.re * b.re - a.im * b.im, im: a.re * b.im + a.im * b.re };
}

/** s · a for a real scalar s */
export function cScale(a: Complex, s: number): Complex {
  return { re: a.re * s, im: a.im * s };
}

/** Complex conjugate re − i·im */
export function cConj(a: Complex): Complex {
  return { re: a.re, im: -a.im };
}

/** Squared modulus |a|² = re² + im² */
export function cAbs2(a: Complex): number {
  return a.re * a.re + a.im * a.im;
}

/** Modulus |a| (overflow-safe, Math.hypot) */
export function cAbs(a: Complex): number {
  return Math.hypot(a.re, a.im);
}

const scratch = new Float64Array(2);

/** a / b (Smith's algorithm); division by 0 gives non-finite parts, as for real numbers. */
export function cDiv(a: Complex, b: Complex): Complex {
  cDivInto(scratch, 0, a.re, a.im, b.re, b.im);
  return { re: scratch[0], im: scratch[1] };
}

/** Principal square root, re ≥ 0. */
export function cSqrt(a: Complex): Complex {
  cSqrtInto(scratch, 0, a.re, a.im);
  return { re: scratch[0], im: scratch[1] };
}

/** e^a = e^re (cos im + i sin im) */
export function cExp(a: Complex): Complex {
  const m = Math.exp(a.re);
  return { re: m * Math.cos(a.im), im: m * Math.sin(a.im) };
}

/** out[i], out[i+1] ← (aRe + i aIm)(bRe + i bIm). Returns out. */
export function cMulInto(
  out: Float64Array,
  i: number,
  aRe: number,
  aIm: number,
  bRe: number,
  bIm: number
): Float64Array {
  const re = aRe * bRe - aIm * bIm;
  const im = aRe * bIm + aIm * bRe;
  out[i] = re;
  out[i + 1] = im;
  return out;
}

/**
 * out[i], out[i+1] ← (aRe + i aIm)/(bRe + i bIm), Smith's algorithm (avoids overflow of bRe² + bIm²).
 * Returns out.
 */
export function cDivInto(
  out: Float64Array,
  i: number,
  aRe: number,
  aIm: number,
  bRe: number,
  bIm: number
): Float64Array {
  let re: number;
  let im: number;
  if (Math.abs(bRe) >= Math.abs(bIm)) {
    const r = bIm / bRe;
    const d = bRe + bIm * r;
    re = (aRe + aIm * r) / d;
    im = (aIm - aRe * r) / d;
  } else {
    const r = bRe / bIm;
    const d = bRe * r + bIm;
    re = (aRe * r + aIm) / d;
    im = (aIm * r - aRe) / d;
  }
  out[i] = re;
  out[i + 1] = im;
  return out;
}

/**
 * out[i], out[i+1] ← principal √(aRe + i aIm), with re ≥ 0.
 * Formula: t = √((|a| + |aRe|)/2); for aRe ≥ 0 the root is t + i·aIm/(2t), otherwise
 * |aIm|/(2t) + i·sign(aIm)·t (cancellation-free form). Returns out.
 */
export function cSqrtInto(out: Float64Array, i: number, aRe: number, aIm: number): Float64Array {
  if (aRe === 0 && aIm === 0) {
    out[i] = 0;
    out[i + 1] = aIm; // keeps the sign of zero
    return out;
  }
  const ar = Math.abs(aRe);
  const ai = Math.abs(aIm);
  // |a| without Math.hypot (slow in hot loops) while the squares cannot overflow or underflow
  const mod = ar < 1e150 && ai < 1e150 && (ar > 1e-150 || ai > 1e-150) ? Math.sqrt(aRe * aRe + aIm * aIm) : Math.hypot(aRe, aIm);
  const t = Math.sqrt((mod + ar) / 2);
  if (aRe >= 0) {
    out[i] = t;
    out[i + 1] = aIm / (2 * t);
  } else {
    out[i] = ai / (2 * t);
    out[i + 1] = aIm < 0 || (aIm === 0 && 1 / aIm < 0) ? -t : t;
  }
  return out;
}

/** out[i], out[i+1] ← e^(aRe + i aIm). Returns out. */
export function cExpInto(out: Float64Array, i: number, aRe: number, aIm: number): Float64Array {
  const m = Math.exp(aRe);
  out[i] = m * Math.cos(aIm);
  out[i + 1] = m * Math.sin(aIm);
  return out;
}
