import { describe, expect, it } from 'vitest';
import { gaussianSpectrum, KM_LM_PER_W, monochromatic, photopicV, tableSpectrum, weightedAverage } from '../../../src/lib/photometry';

// An arbitrary smooth per-wavelength quantity standing in for an extraction efficiency.
const extraction = (w: number) => 0.3 + 0.1 * Math.sin(w / 37) + 1e-4 * w;

describe('weightedAverage(spectrum, f, mode)', () => {
  it('a monochromatic spectrum gives exactly f(λ) in both modes', () => {
    for (const w of [365, 450.5, 555, 633, 940]) {
      for (const mode of ['radiometric', 'luminous'] as const) {
        if (mode === 'luminous' && photopicV(w) === 0) continue;
        expect(weightedAverage(monochromatic(w), extraction, mode).value).toBe(extraction(w));
      }
    }
  });

  it('a monochromatic 555 nm spectrum has luminous efficacy Km = 683 lm/W', () => {
    expect(weightedAverage(monochromatic(555), extraction).luminousEfficacyLmPerW).toBe(KM_LM_PER_W);
  });

  it('a flat spectrum gives the plain average: f(λ) = λ over 400–700 nm averages to 550', () => {
    const rows = Array.from({ length: 301 }, (_, i) => [400 + i, 1] as [number, number]);
    // The trapezoid rule is exact for a linear f; tolerance: rounding of 301 terms.
    expect(Math.abs(weightedAverage(tableSpectrum(rows), (w) => w).value - 550)).toBeLessThan(1e-10);
  });

  it('a constant quantity averages to itself under luminous weighting', () => {
    const s = gaussianSpectrum(530, 30);
    expect(weightedAverage(s, () => 0.42, 'luminous').value).toBeCloseTo(0.42, 14);
  });

  it('luminous weighting pulls a red band average toward 555 nm', () => {
    // V(λ) falls through the red, so shorter wavelengths weigh more: ⟨λ⟩ luminous < ⟨λ⟩ radiometric.
    const s = gaussianSpectrum(630, 40);
    const radiometric = weightedAverage(s, (w) => w, 'radiometric').value;
    const luminous = weightedAverage(s, (w) => w, 'luminous').value;
    expect(Math.abs(radiometric - 630)).toBeLessThan(1e-9);
    expect(luminous).toBeLessThan(radiometric - 5);
  });

  it('luminous efficacy of radiation is Km·Σ wV / Σ w for any spectrum', () => {
    const s = tableSpectrum([[450, 1], [550, 2], [650, 1]]);
    // Trapezoid weights: power × width = 1×50, 2×100, 1×50 → 1/6, 4/6, 1/6.
    const expected = KM_LM_PER_W * ((photopicV(450) + 4 * photopicV(550) + photopicV(650)) / 6);
    expect(weightedAverage(s, extraction).luminousEfficacyLmPerW).toBeCloseTo(expected, 10);
  });

  it('luminous mode refuses a spectrum with no visible light', () => {
    expect(() => weightedAverage(monochromatic(940), extraction, 'luminous')).toThrow(/V\(λ\) is 0 over this whole spectrum/);
    expect(weightedAverage(monochromatic(940), extraction).luminousEfficacyLmPerW).toBe(0);
  });

  it('names the wavelength where f is not finite, and rejects unknown modes', () => {
    expect(() => weightedAverage(monochromatic(500), () => Number.NaN)).toThrow(/not a finite number at 500 nm/);
    expect(() => weightedAverage(monochromatic(500), extraction, 'photonic' as 'luminous')).toThrow(/mode must be/);
  });
});
