import { describe, expect, it } from 'vitest';
import { findMaterial, indexAt, polesNm, type Material } from '../../../src/lib/materials';

const EPS = Number.EPSILON;

function material(partial: Partial<Material> & Pick<Material, 'dispersion' | 'validRangeNm'>): Material {
  return { id: 'test', name: 'Test medium', aliases: [], category: 'layer', source: 'test', provenance: 'user supplied', ...partial };
}

const silica = findMaterial('fused-silica')!;
const pmma = findMaterial('pmma')!;

describe('indexAt(material, wavelengthNm): the two Sellmeier forms', () => {
  it('resonance form with C in µm equals the glass form with C² in µm² to a few ulps', () => {
    if (silica.dispersion.model !== 'sellmeier') throw new Error('fused silica is stored in resonance form');
    const asGlass = material({
      dispersion: { model: 'sellmeier-glass', terms: silica.dispersion.terms.map((t) => ({ B: t.B, C: t.C * t.C })) },
      validRangeNm: silica.validRangeNm
    });
    for (const wavelengthNm of [250, 450, 587.6, 1000, 3000]) {
      const a = indexAt(silica, wavelengthNm).n;
      const b = indexAt(asGlass, wavelengthNm).n;
      // Tolerance: 8 ulps — the two forms differ only by the rounding of C·C.
      expect(Math.abs(a - b)).toBeLessThanOrEqual(8 * EPS * a);
    }
  });

  it('PMMA (glass form) read in the wrong (resonance) form gives a clearly wrong index', () => {
    if (pmma.dispersion.model !== 'sellmeier-glass') throw new Error('PMMA is stored in glass form');
    const wrong = material({ dispersion: { ...pmma.dispersion, model: 'sellmeier' }, validRangeNm: pmma.validRangeNm });
    const right = indexAt(pmma, 587.6).n;
    // The measured nD = 1.491 (N. Sultanova et al., Acta Phys. Pol. A 116, 585 (2009)) is met by the right
    // form only; mixing the forms moves n by more than 0.01, far beyond the 1e-3 of the measurement.
    expect(Math.abs(right - 1.491)).toBeLessThan(1e-3);
    expect(Math.abs(indexAt(wrong, 587.6).n - 1.491)).toBeGreaterThan(0.01);
  });

  it('fused silica read in the wrong (glass) form gives a clearly wrong index', () => {
    if (silica.dispersion.model !== 'sellmeier') throw new Error('fused silica is stored in resonance form');
    const wrong = material({ dispersion: { ...silica.dispersion, model: 'sellmeier-glass' }, validRangeNm: { min: 400, max: 700 } });
    // Malitson 1965: n(587.6 nm) = 1.45846; the mixed-up form is off by more than 0.005.
    expect(Math.abs(indexAt(wrong, 587.6).n - 1.45846)).toBeGreaterThan(0.005);
  });

  it('a0 defaults to 1 (n² − 1 = Σ …) and an explicit a0 adds to n²', () => {
    const terms = [{ B: 1, C: 0.1 }];
    const one = indexAt(material({ dispersion: { model: 'sellmeier', terms }, validRangeNm: { min: 400, max: 800 } }), 500).n;
    const two = indexAt(material({ dispersion: { model: 'sellmeier', a0: 2, terms }, validRangeNm: { min: 400, max: 800 } }), 500).n;
    // Closed form at λ = 0.5 µm: B λ²/(λ² − C²) = 0.25/0.24
    expect(one).toBeCloseTo(Math.sqrt(1 + 0.25 / 0.24), 14);
    expect(two).toBeCloseTo(Math.sqrt(2 + 0.25 / 0.24), 14);
  });

  it('the d·λ² term of the Sellmeier form is applied with λ in µm', () => {
    const m = material({ dispersion: { model: 'sellmeier', a0: 3, terms: [{ B: 0, C: 0 }], d: -0.01 }, validRangeNm: { min: 400, max: 2000 } });
    expect(indexAt(m, 2000).n).toBeCloseTo(Math.sqrt(3 - 0.04), 14);
  });

  it('Cauchy n = A + B/λ² + C/λ⁴ with λ in µm, and a constant k is returned', () => {
    const m = material({ dispersion: { model: 'cauchy', A: 1.5, B: 0.01, C: 0.001, k: 0.002 }, validRangeNm: { min: 400, max: 800 } });
    const r = indexAt(m, 500);
    expect(r.n).toBeCloseTo(1.5 + 0.01 / 0.25 + 0.001 / 0.0625, 14);
    expect(r.k).toBe(0.002);
  });

  it('the pole-sum form n² = a0 + B/(λ² − C) matches its closed form', () => {
    const m = material({ dispersion: { model: 'formula', form: 'pole-sum', a0: 5.913, terms: [{ B: 0.2441, C: 0.0803 }] }, validRangeNm: { min: 430, max: 1530 } });
    expect(indexAt(m, 700).n).toBeCloseTo(Math.sqrt(5.913 + 0.2441 / (0.49 - 0.0803)), 14);
  });
});

describe('indexAt(material, wavelengthNm): tables', () => {
  const table = material({ dispersion: { model: 'table', rows: [[400, 1, 0], [1600, 2, 1]] }, validRangeNm: { min: 400, max: 1600 } });

  it('interpolates linearly in ln λ: the geometric-mean wavelength gets the mean values', () => {
    // ln 800 is halfway between ln 400 and ln 1600; linear-in-λ would give n = 4/3 instead.
    const r = indexAt(table, 800);
    expect(r.n).toBeCloseTo(1.5, 14);
    expect(r.k).toBeCloseTo(0.5, 14);
  });

  it('returns tabulated rows exactly', () => {
    const ag = findMaterial('ag')!;
    // The 550 nm row of McPeak et al. 2015 as the data file writes it
    expect(indexAt(ag, 550)).toEqual({ n: 0.043817181, k: 3.610113564, inRange: true });
  });

  it('extrapolates the end segment outside the range, with a warning', () => {
    const r = indexAt(table, 3200);
    expect(r.n).toBeCloseTo(2.5, 12);
    expect(r.inRange).toBe(false);
    expect(r.warning).toMatch(/above its valid range 400–1600 nm/);
  });

  it('throws when extrapolation would give n ≤ 0', () => {
    expect(() => indexAt(table, 100)).toThrow(RangeError);
    expect(() => indexAt(table, 100)).toThrow(/Test medium.*400–1600 nm/);
  });
});

describe('indexAt(material, wavelengthNm): validity range, poles and bad input', () => {
  it('is in range at both closed ends', () => {
    expect(indexAt(silica, 210).inRange).toBe(true);
    expect(indexAt(silica, 3710).inRange).toBe(true);
  });

  it('outside the range computes the value and warns, naming material and range', () => {
    const r = indexAt(silica, 200);
    expect(r.inRange).toBe(false);
    expect(Number.isFinite(r.n)).toBe(true);
    expect(r.warning).toContain('Fused silica');
    expect(r.warning).toContain('210–3710 nm');
    expect(r.warning).toContain('extrapolated');
  });

  it('GaAs (Skauli 2003) has a pole at 874.6 nm: at or beyond it indexAt throws, between it and 970 nm it warns', () => {
    const gaas = findMaterial('gaas')!;
    expect(polesNm(gaas.dispersion).some((p) => Math.abs(p - 874.6453) < 1e-9)).toBe(true);
    expect(() => indexAt(gaas, 874.6453)).toThrow(RangeError);
    expect(() => indexAt(gaas, 870)).toThrow(/pole at 874\.6 nm.*970–17000 nm/);
    expect(() => indexAt(gaas, 500)).toThrow(RangeError);
    const near = indexAt(gaas, 940);
    expect(near.inRange).toBe(false);
    expect(near.warning).toMatch(/below its valid range 970–17000 nm/);
  });

  it('fused silica below its 116 nm pole throws instead of extrapolating across it', () => {
    expect(() => indexAt(silica, 110)).toThrow(/pole at 116\.2 nm/);
  });

  it('a formula that gives n² ≤ 0 outside its range throws, naming the range', () => {
    // n² = 1 − 0.1/λ²: no pole in λ > 0, and n² < 0 below λ = 316 nm
    const m = material({ dispersion: { model: 'formula', form: 'pole-sum', a0: 1, terms: [{ B: -0.1, C: 0 }] }, validRangeNm: { min: 500, max: 1000 } });
    expect(indexAt(m, 400).warning).toBeDefined();
    expect(() => indexAt(m, 300)).toThrow(/Test medium.*n² ≤ 0.*500–1000 nm/);
  });

  it('rejects wavelengths that are not numbers in [100, 20000] nm', () => {
    for (const bad of [Number.NaN, Infinity, -500, 0, 50, 30000, '500' as unknown as number]) {
      expect(() => indexAt(silica, bad)).toThrow(/wavelengthNm must be a number between 100 and 20000 nm/);
    }
  });
});
