/** Reference checks of photometry against published CIE / BIPM values. */
import { describe, expect, it } from 'vitest';
import { KM_LM_PER_W, photopicV, tableSpectrum, weightedAverage } from '../../src/lib/photometry';

describe('CIE 1924 photopic V(λ)', () => {
  it('matches the published values at 450, 500, 555, 600 and 650 nm', () => {
    // published: CIE 015:2018 / ISO 23539:2005 (CIE S 010), CIE 1924 photopic V(λ).
    // Tolerance 5e-4: half a unit in the third decimal, as the check values are quoted.
    const checks: [number, number][] = [[450, 0.038], [500, 0.323], [555, 1.0], [600, 0.631], [650, 0.107]];
    for (const [w, v] of checks) expect(Math.abs(photopicV(w) - v), `${w} nm`).toBeLessThanOrEqual(5e-4);
  });

  it('peaks at 555 nm with V = 1', () => {
    // published: the CIE normalises V(λ) to 1 at 555 nm.
    expect(photopicV(555)).toBe(1);
    for (let w = 360; w <= 830; w += 1) expect(photopicV(w)).toBeLessThanOrEqual(1);
  });

  it('integrates to about 106.857 nm over 360–830 nm', () => {
    // from memory: ∫V(λ)dλ ≈ 106.857 nm (the CIE 1931 ȳ normalising integral). Trapezoid over the
    // 5 nm table differs from the 1 nm sum by well under 0.01 nm; tolerance 0.01 nm.
    const rows = Array.from({ length: 471 }, (_, i) => [360 + i, 1] as [number, number]);
    const flat = weightedAverage(tableSpectrum(rows), photopicV);
    expect(Math.abs(flat.value * 470 - 106.857)).toBeLessThanOrEqual(0.01);
  });
});

describe('maximum luminous efficacy Km', () => {
  it('is 683 lm/W', () => {
    // published: BIPM SI brochure, 9th ed. (2019), definition of the candela (Kcd = 683 lm/W at 540 THz).
    expect(KM_LM_PER_W).toBe(683);
  });
});
