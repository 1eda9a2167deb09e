/**
 * Raw evaluation of a dispersion model, with no range checks. The public `indexAt` validates the
 * wavelength, looks for poles and decides about warnings; this file only does the arithmetic.
 */
import type { Dispersion, NkRow, SellmeierTerm } from './types';

/** Output slot for `dispersionValue`: n and k at one wavelength. */
export interface NkSlot {
  n: number;
  k: number;
}

/**
 * n and k of a dispersion model at one wavelength, written into `out` (returned).
 * `out.n` is NaN when the formula gives n² ≤ 0 or a non-finite value (at or across a pole).
 *
 * Formulas, λ in µm:
 * - sellmeier:       n² = a0 + Σ Bᵢλ²/(λ² − Cᵢ²) + dλ²   (Cᵢ in µm; a0 defaults to 1)
 * - sellmeier-glass: n² = a0 + Σ Bᵢλ²/(λ² − Cᵢ) + dλ²    (Cᵢ in µm²)
 * - formula/pole-sum: n² = a0 + Σ Bᵢ/(λ² − Cᵢ)          (Cᵢ in µm²)
 * - cauchy:          n = A + B/λ² + C/λ⁴
 * - table:           n, k linear in ln λ between rows; beyond the end rows, the end segment's line.
 * @param wavelengthNm vacuum wavelength, nm (> 0; not checked here)
 * @see W. Sellmeier, Ann. Phys. 219, 272 (1871); A.-L. Cauchy, Mémoire sur la dispersion de la lumière (1836)
 */
export function dispersionValue(d: Dispersion, wavelengthNm: number, out: NkSlot): NkSlot {
  const lambdaUm = wavelengthNm / 1000;
  const lambda2 = lambdaUm * lambdaUm;
  switch (d.model) {
    case 'sellmeier':
      // Resonance form: n² = a0 + Σ Bλ²/(λ² − C²) + dλ² (Sellmeier 1871)
      out.n = fromSquare((d.a0 ?? 1) + sellmeierSum(d.terms, lambda2, true) + (d.d ?? 0) * lambda2);
      out.k = d.k ?? 0;
      return out;
    case 'sellmeier-glass':
      // Glass-catalogue form: n² = a0 + Σ Bλ²/(λ² − C) + dλ², C in µm²
      out.n = fromSquare((d.a0 ?? 1) + sellmeierSum(d.terms, lambda2, false) + (d.d ?? 0) * lambda2);
      out.k = d.k ?? 0;
      return out;
    case 'formula': {
      // Pole sum: n² = a0 + Σ B/(λ² − C) (e.g. J. R. DeVore, JOSA 41, 416 (1951))
      let n2 = d.a0;
      for (let i = 0; i < d.terms.length; i++) n2 += d.terms[i].B / (lambda2 - d.terms[i].C);
      out.n = fromSquare(n2);
      out.k = d.k ?? 0;
      return out;
    }
    case 'cauchy': {
      // Cauchy: n = A + B/λ² + C/λ⁴
      const n = d.A + d.B / lambda2 + d.C / (lambda2 * lambda2);
      out.n = Number.isFinite(n) && n > 0 ? n : NaN;
      out.k = d.k ?? 0;
      return out;
    }
    case 'table':
      return tableValue(d.rows, wavelengthNm, out);
  }
}

function sellmeierSum(terms: SellmeierTerm[], lambda2: number, resonance: boolean): number {
  let sum = 0;
  for (let i = 0; i < terms.length; i++) {
    const c = resonance ? terms[i].C * terms[i].C : terms[i].C;
    sum += (terms[i].B * lambda2) / (lambda2 - c);
  }
  return sum;
}

function fromSquare(n2: number): number {
  return Number.isFinite(n2) && n2 > 0 ? Math.sqrt(n2) : NaN;
}

/** Linear interpolation in ln λ; exact row values at tabulated wavelengths. */
function tableValue(rows: NkRow[], wavelengthNm: number, out: NkSlot): NkSlot {
  const last = rows.length - 1;
  // Find the segment [lo, lo + 1] holding λ (end segments for extrapolation)
  let lo = 0;
  let hi = last;
  if (wavelengthNm <= rows[0][0]) hi = 1;
  else if (wavelengthNm >= rows[last][0]) lo = last - 1;
  else {
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (rows[mid][0] <= wavelengthNm) lo = mid;
      else hi = mid;
    }
  }
  const r0 = rows[lo];
  const r1 = rows[lo + 1];
  if (wavelengthNm === r0[0]) {
    out.n = r0[1];
    out.k = r0[2];
    return out;
  }
  if (wavelengthNm === r1[0]) {
    out.n = r1[1];
    out.k = r1[2];
    return out;
  }
  const t = Math.log(wavelengthNm / r0[0]) / Math.log(r1[0] / r0[0]);
  const n = r0[1] + t * (r1[1] - r0[1]);
  const k = r0[2] + t * (r1[2] - r0[2]);
  out.n = n > 0 ? n : NaN;
  out.k = k >= 0 ? k : NaN;
  return out;
}
