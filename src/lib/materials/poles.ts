import type { Dispersion } from './types';

/**
 * Wavelengths (nm) where a dispersion formula has a pole, in ascending order.
 * Resonance Sellmeier: λ = C·1000 (C in µm); glass form and pole sum: λ = √C·1000 (C in µm², C > 0).
 * Cauchy and tables have none (λ > 0). A term with B = 0 has no pole.
 * @see W. Sellmeier, Ann. Phys. 219, 272 (1871) — each term diverges at its resonance
 */
export function polesNm(d: Dispersion): number[] {
  const poles: number[] = [];
  if (d.model === 'sellmeier') {
    for (const t of d.terms) if (t.B !== 0 && t.C > 0) poles.push(t.C * 1000);
  } else if (d.model === 'sellmeier-glass' || d.model === 'formula') {
    for (const t of d.terms) if (t.B !== 0 && t.C > 0) poles.push(Math.sqrt(t.C) * 1000);
  }
  return poles.sort((a, b) => a - b);
}
