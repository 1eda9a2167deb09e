import { describe, it, expect } from 'vitest';
import { extractionCurve } from '../../../src/lib/decisions/extraction-curve';
import type { TraceSummary } from '../../../src/lib/trace/summary';
import { rankingChart } from '../../../src/lib/decisions/ranking-chart';
import { rankEncapsulants } from '../../../src/lib/decisions/rank-encapsulants';
import { escapeCone } from '../../../src/lib/optics/index';
import { chartTable } from '../../../src/lib/charts/csv';
import { assertInDelta, EPS } from '../../support/assert';
import { rankInput } from '../../support/fixtures';

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

describe('rankingChart(ranking, traced)', () => {
  const ranking = rankEncapsulants(rankInput({ current: { label: 'Methyl silicone', n: 1.41, materialId: 'silicone-methyl' } }));
  const spec = rankingChart(ranking);

  it('places each candidate on the reference curve with its own colour-and-marker pair, and marks the current index', () => {
    const markers = spec.series.filter((s) => s.line === false);
    expect(markers.length).toBe(ranking.rows.length);
    for (const m of markers) {
      const row = ranking.rows.find((r) => m.label.startsWith(r.name))!;
      expect(m.points[0]).toEqual({ x: row.nEnc, y: row.etaDome * 100 });
    }
    const pairs = new Set(markers.map((m) => `${m.color}/${m.marker}`));
    expect(pairs.size).toBe(markers.length);
    expect(new Set(markers.map((m) => m.marker)).size).toBe(Math.min(markers.length, 7));
    expect(spec.series.at(-1)!.role).toBe('marker');
    expect(spec.series.some((s) => s.label.includes('(current)'))).toBe(true);
  });

  it("zooms the index axis to the candidates' range (with a margin), not 1 to the chip index", () => {
    const ns = ranking.rows.map((r) => r.nEnc);
    expect(spec.x.min!).toBeLessThanOrEqual(Math.min(...ns));
    expect(spec.x.max!).toBeGreaterThanOrEqual(Math.max(...ns));
    expect(spec.x.min!).toBeGreaterThan(1.2);
    expect(spec.x.max!).toBeLessThan(1.8);
    for (const p of spec.series[0].points) {
      expect(p.x).toBeGreaterThanOrEqual(spec.x.min! - 1e-9);
      expect(p.x).toBeLessThanOrEqual(spec.x.max! + 1e-9);
    }
    expect(spec.series[0].points.length).toBeGreaterThan(30);
  });

  it('adds a traced point with ±2σ bars in the candidate\'s colour and marker, and names the best traced', () => {
    const row = ranking.rows[1];
    const summary = { extraction: 0.4, stderr: 0.001 } as TraceSummary;
    const traced = rankingChart(ranking, [{ rank: 1, row, seed: 1, summary, overCurrent: null, separableFromNext: null }]);
    const pair = traced.series.filter((s) => s.label.startsWith(row.name));
    expect(pair.length).toBe(2);
    expect(pair[1].color).toBe(pair[0].color);
    expect(pair[1].marker).toBe(pair[0].marker);
    expect(pair[1].points[0]).toEqual({ x: row.nEnc, y: 40, yMin: 40 - 0.2, yMax: 40 + 0.2 });
    expect(traced.ariaLabel).toContain(`the highest traced is ${row.name}`);
    expect(traced.y.max!).toBeGreaterThanOrEqual(40.2);
  });

  it('exports curve, reference values and traced values as CSV', () => {
    const t = chartTable(spec);
    expect(t.headers).toEqual(['series', 'encapsulant index n', 'extraction (%)', 'standard error (%)']);
    expect(t.rows.length).toBe(spec.series[0].points.length + ranking.rows.length);
  });
});
