import { describe, expect, it } from 'vitest';
import { gaussianSpectrum, GAUSSIAN_SAMPLES, monochromatic, tableSpectrum, type Spectrum } from '../../../src/lib/photometry';

function sum(a: Float64Array): number {
  let s = 0;
  for (const x of a) s += x;
  return s;
}
function moment(s: Spectrum, f: (w: number) => number): number {
  let m = 0;
  for (let i = 0; i < s.weight.length; i++) m += s.weight[i] * f(s.wavelengthNm[i]);
  return m;
}

describe('gaussianSpectrum(peakNm, fwhmNm)', () => {
  const s = gaussianSpectrum(450, 20);

  it('samples 241 points over peak ± 3 FWHM with weights summing to 1', () => {
    expect(s.wavelengthNm.length).toBe(GAUSSIAN_SAMPLES);
    expect(s.wavelengthNm[0]).toBeCloseTo(390, 12);
    expect(s.wavelengthNm[GAUSSIAN_SAMPLES - 1]).toBeCloseTo(510, 12);
    // Tolerance: 241 additions of rounding, ~1e-15 each.
    expect(Math.abs(sum(s.weight) - 1)).toBeLessThan(1e-13);
  });

  it('has its mean at the peak and half the peak weight at peak ± FWHM/2 (definition of FWHM)', () => {
    expect(Math.abs(moment(s, (w) => w) - 450)).toBeLessThan(1e-10);
    const mid = (GAUSSIAN_SAMPLES - 1) / 2;
    // The grid step is FWHM/40, so ± 20 samples is ± FWHM/2 exactly.
    expect(s.weight[mid + 20] / s.weight[mid]).toBeCloseTo(0.5, 12);
    expect(s.weight[mid - 20] / s.weight[mid]).toBeCloseTo(0.5, 12);
  });

  it('has variance σ² = (FWHM / 2√(2 ln 2))²', () => {
    const sigma = 20 / (2 * Math.sqrt(2 * Math.LN2));
    const variance = moment(s, (w) => (w - 450) ** 2);
    // Uniform-grid sums of a Gaussian converge spectrally; truncation at ±7σ leaves < 1e-10 relative.
    expect(Math.abs(variance / (sigma * sigma) - 1)).toBeLessThan(1e-9);
  });

  it('cuts the grid at 100 nm when the band would reach below it', () => {
    const low = gaussianSpectrum(150, 100);
    expect(low.wavelengthNm[0]).toBe(100);
    expect(Math.abs(sum(low.weight) - 1)).toBeLessThan(1e-13);
  });

  it('rejects peaks outside 100–20000 nm and widths outside 0.01–1000 nm', () => {
    expect(() => gaussianSpectrum(50, 20)).toThrow(/peakNm must be a number between 100 and 20000 nm/);
    expect(() => gaussianSpectrum(Number.NaN, 20)).toThrow(/peakNm/);
    expect(() => gaussianSpectrum(450, 0)).toThrow(/fwhmNm must be a number between 0.01 and 1000 nm/);
    expect(() => gaussianSpectrum(450, -5)).toThrow(/fwhmNm/);
    expect(() => gaussianSpectrum(450, Infinity)).toThrow(/fwhmNm/);
  });
});

describe('tableSpectrum(rows)', () => {
  it('gives trapezoid weights, half-width at the ends, normalised', () => {
    const s = tableSpectrum([[400, 1], [410, 1], [430, 1]]);
    // Widths: 5, 15, 10 nm of a flat spectrum over 30 nm.
    expect(Array.from(s.weight)).toEqual([5 / 30, 15 / 30, 10 / 30]);
  });

  it('sorts rows by wavelength and keeps power with its wavelength', () => {
    const s = tableSpectrum([[500, 2], [400, 0], [450, 1]]);
    expect(Array.from(s.wavelengthNm)).toEqual([400, 450, 500]);
    expect(s.weight[0]).toBe(0);
  });

  it('one row is a monochromatic spectrum', () => {
    expect(tableSpectrum([[633, 5]])).toEqual(monochromatic(633));
  });

  it('rejects empty, repeated, negative, non-finite and all-zero rows', () => {
    expect(() => tableSpectrum([])).toThrow(/1 to 5000/);
    expect(() => tableSpectrum([[400, 1], [400, 2]])).toThrow(/distinct wavelengths/);
    expect(() => tableSpectrum([[400, 1], [500, -1]])).toThrow(/rows\[1\] power must be a finite number ≥ 0/);
    expect(() => tableSpectrum([[400, 1], [500, Number.NaN]])).toThrow(/rows\[1\] power/);
    expect(() => tableSpectrum([[40, 1], [500, 1]])).toThrow(/rows\[0\] wavelength must be a number between 100 and 20000 nm/);
    expect(() => tableSpectrum([[400, 0], [500, 0]])).toThrow(/carry some power/);
    expect(() => tableSpectrum([[400, 1, 2] as unknown as [number, number]])).toThrow(/\[wavelength_nm, power\]/);
  });
});

describe('monochromatic(wavelengthNm)', () => {
  it('is one sample of weight 1', () => {
    const s = monochromatic(555);
    expect(Array.from(s.wavelengthNm)).toEqual([555]);
    expect(Array.from(s.weight)).toEqual([1]);
  });

  it('rejects wavelengths outside 100–20000 nm', () => {
    expect(() => monochromatic(99)).toThrow(RangeError);
  });
});
