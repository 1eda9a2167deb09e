import { describe, expect, it } from 'vitest';
import { sampleMaterial } from '../../../src/lib/charts/materials-curve';
import { materialsIndexChart } from '../../../src/lib/charts/materials-index-chart';
import { chartTable } from '../../../src/lib/charts/csv';
import type { Material } from '../../../src/lib/materials/types';
import { assertInDelta } from '../../support/assert';

// Fused silica, I. H. Malitson, JOSA 55, 1205 (1965): resonance form, C in µm, valid 210–3710 nm.
const silica: Material = {
  id: 'silica-test',
  name: 'Fused silica',
  aliases: [],
  category: 'optic',
  dispersion: {
    model: 'sellmeier',
    terms: [
      { B: 0.6961663, C: 0.0684043 },
      { B: 0.4079426, C: 0.1162414 },
      { B: 0.8974794, C: 9.896161 }
    ]
  },
  validRangeNm: { min: 210, max: 3710 },
  source: 'I. H. Malitson, JOSA 55, 1205 (1965)',
  provenance: 'published'
};

// N-BK7, SCHOTT data sheet: glass-catalogue form, C in µm², valid 300–2500 nm.
const bk7: Material = {
  id: 'bk7-test',
  name: 'Crown glass',
  aliases: [],
  category: 'optic',
  dispersion: {
    model: 'sellmeier-glass',
    terms: [
      { B: 1.03961212, C: 0.00600069867 },
      { B: 0.231792344, C: 0.0200179144 },
      { B: 1.01046945, C: 103.560653 }
    ]
  },
  validRangeNm: { min: 300, max: 2500 },
  source: 'SCHOTT optical glass data sheet',
  provenance: 'published'
};

describe('sampleMaterial(material, fromNm, toNm, steps)', () => {
  it('passes through the published index of fused silica, n(587.6 nm) = 1.45846 (Malitson 1965; ±5e-6 = half a unit of the last published digit)', () => {
    const c = sampleMaterial(silica, 587.6, 600, 2);
    expect(c.wavelengthNm).toEqual([587.6, 600]);
    assertInDelta(c.n[0], 1.45846, 5e-6);
    expect(c.k[0]).toBe(0);
  });

  it('uses the glass form for N-BK7: nd(587.56 nm) = 1.5168 (SCHOTT data sheet; ±5e-5, half the last digit)', () => {
    const c = sampleMaterial(bk7, 587.56, 632.8, 2);
    assertInDelta(c.n[0], 1.5168, 5e-5);
    // n(632.8 nm) = 1.51509, same data sheet
    assertInDelta(c.n[1], 1.51509, 5e-6);
  });

  it('spaces samples evenly and ends exactly at toNm', () => {
    const c = sampleMaterial(silica, 350, 1000, 14);
    expect(c.wavelengthNm[0]).toBe(350);
    expect(c.wavelengthNm[13]).toBe(1000);
    assertInDelta(c.wavelengthNm[1] - c.wavelengthNm[0], 50, 1e-12);
  });

  it('flags samples outside the validity range', () => {
    const c = sampleMaterial(bk7, 250, 350, 3);
    expect(c.inRange).toEqual([false, true, true]);
    expect(Number.isFinite(c.n[0])).toBe(true);
  });

  it('gives NaN, not a wild number, across a pole of the formula', () => {
    // Resonance term at C = 0.5 µm: a pole at 500 nm, below the valid range 600–900 nm
    const pole: Material = { ...silica, id: 'pole-test', dispersion: { model: 'sellmeier', terms: [{ B: 1, C: 0.5 }] }, validRangeNm: { min: 600, max: 900 } };
    const c = sampleMaterial(pole, 400, 700, 4);
    expect(Number.isNaN(c.n[0])).toBe(true); // 400 nm: the pole lies between it and the range
    expect(Number.isNaN(c.n[1])).toBe(true); // 500 nm: on the pole
    expect(Number.isFinite(c.n[2])).toBe(true); // 600 nm
  });

  it('rejects a bad range with a RangeError naming the field and range', () => {
    expect(() => sampleMaterial(silica, 50, 500)).toThrow(/From wavelength must be between 100 and 20000 nm/);
    expect(() => sampleMaterial(silica, 500, 400)).toThrow(/To wavelength must be more than/);
    expect(() => sampleMaterial(silica, 400, 500, 1)).toThrow(/Number of samples must be a whole number between 2 and 2000/);
  });
});

describe('materialsIndexChart(curves, options)', () => {
  const curves = [sampleMaterial(bk7, 250, 400, 4), sampleMaterial(silica, 250, 400, 4)];

  it('draws the valid range solid and the extrapolated part dashed, touching at the edge', () => {
    const spec = materialsIndexChart(curves, { quantity: 'n', extrapolated: true });
    const solid = spec.series.find((s) => s.label === 'Crown glass')!;
    const dashed = spec.series.find((s) => s.label === 'Crown glass, below its valid range')!;
    expect(solid.points.map((p) => p.x)).toEqual([300, 350, 400]);
    expect(dashed.dashed).toBe(true);
    expect(dashed.points.map((p) => p.x)).toEqual([250, 300]);
    expect(dashed.color).toBe(solid.color);
  });

  it('names which side of the valid range an extrapolated part lies on', () => {
    const wide = sampleMaterial(bk7, 200, 3000, 29);
    const labels = materialsIndexChart([wide], { quantity: 'n', extrapolated: true }).series.map((s) => s.label);
    expect(labels).toEqual(['Crown glass', 'Crown glass, below its valid range', 'Crown glass, above its valid range']);
  });

  it('leaves the extrapolated parts out when asked', () => {
    const spec = materialsIndexChart(curves, { quantity: 'n', extrapolated: false });
    expect(spec.series.some((s) => s.dashed)).toBe(false);
  });

  it('plots k on its own chart with the axis starting at 0', () => {
    const spec = materialsIndexChart(curves, { quantity: 'k', extrapolated: true });
    expect(spec.y.title).toBe('Extinction coefficient k');
    expect(spec.y.min).toBe(0);
  });

  it('exports every material with a valid-range flag per wavelength', () => {
    const t = chartTable(materialsIndexChart(curves, { quantity: 'n', extrapolated: false }));
    expect(t.headers).toEqual(['wavelength (nm)', 'Crown glass n', 'Crown glass in valid range', 'Fused silica n', 'Fused silica in valid range']);
    expect(t.rows).toHaveLength(4);
    expect(t.rows[0][2]).toBe('no');
    expect(t.rows[0][4]).toBe('yes');
  });

  it('says when nothing is selected', () => {
    expect(materialsIndexChart([], { quantity: 'n', extrapolated: true }).ariaLabel).toMatch(/no materials selected/);
  });
});
