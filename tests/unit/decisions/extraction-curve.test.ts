import { describe, it, expect } from 'vitest';
import { extractionCurve } from '../../../src/lib/decisions/extraction-curve';
import { rankingChart } from '../../../src/lib/decisions/ranking-chart';
import { rankEncapsulants, encapsulantCandidates } from '../../../src/lib/decisions/rank-encapsulants';
import { escapeCone } from '../../../src/lib/optics/index';
import { findMaterial, listMaterials } from '../../../src/lib/materials/index';
import { chartTable } from '../../../src/lib/charts/csv';
import { assertInDelta, EPS } from '../../support/assert';

describe('extractionCurve(nChip, nOut, points)', () => {
  it('runs from n = 1 to the chip index; at n = 1 in air it is the bare escape cone (4 ε)', () => {
    const c = extractionCurve(2.45, 1, 11);
    expect(c.n[0]).toBe(1);
    expect(c.n[10]).toBe(2.45);
    assertInDelta(c.etaDome[0], escapeCone(2.45, 1).fresnel, 4 * EPS);
  });

  it('rises with index over the encapsulant range 1–1.8', () => {
    const c = extractionCurve(2.45, 1, 81);
    for (let i = 1; i < c.n.length && c.n[i] <= 1.8; i++) expect(c.etaDome[i]).toBeGreaterThan(c.etaDome[i - 1]);
  });

  it('rejects bad indices and point counts', () => {
    expect(() => extractionCurve(1, 1)).toThrow(/nChip must be a number in \(1, 6\]/);
    expect(() => extractionCurve(2.45, 0.5)).toThrow(/nOut must be a number in \[1, 6\]/);
    expect(() => extractionCurve(2.45, 1, 1)).toThrow(/points must be an integer in \[2, 1000\]/);
  });
});

describe('rankingChart(ranking)', () => {
  const ranking = rankEncapsulants({
    chip: { material: findMaterial('gan')! },
    outside: { n: 1 },
    chipWidthMm: 1,
    chipLengthMm: 1,
    radiusMm: 2.5,
    wavelengthNm: 450,
    candidates: encapsulantCandidates(listMaterials()),
    current: { label: 'Methyl silicone', n: 1.41, materialId: 'silicone-methyl' }
  });
  const spec = rankingChart(ranking);

  it('has the curve, one marker series per candidate placed on the curve, and the current index marked', () => {
    expect(spec.series[0].points.length).toBe(61);
    const markers = spec.series.filter((s) => s.line === false);
    expect(markers.length).toBe(ranking.rows.length);
    for (const m of markers) {
      const row = ranking.rows.find((r) => m.label.startsWith(r.name))!;
      expect(m.points[0]).toEqual({ x: row.nEnc, y: row.etaDome * 100 });
    }
    expect(spec.series.at(-1)!.role).toBe('marker');
    expect(spec.series.some((s) => s.label.includes('(current)'))).toBe(true);
  });

  it('names the best candidate in its text alternative and exports curve and markers as CSV', () => {
    expect(spec.ariaLabel).toContain(ranking.rows[0].name);
    const t = chartTable(spec);
    expect(t.headers).toEqual(['series', 'encapsulant index n', 'extraction, one face (%)']);
    expect(t.rows.length).toBe(61 + ranking.rows.length);
  });
});
