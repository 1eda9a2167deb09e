import { describe, expect, it } from 'vitest';
import { demoScenario } from '../../../src/lib/scenario/defaults';
import { chartTable } from '../../../src/lib/charts/csv';
import { cellText } from '../../../src/lib/variants/cell-text';
import { comparisonRows } from '../../../src/lib/variants/comparison-rows';
import { readComparison } from '../../../src/lib/variants/read-comparison';
import { variantFigures } from '../../../src/lib/variants/variant-figures';
import { variantsFarFieldChart, variantsLedgerChart } from '../../../src/lib/variants/variant-charts';
import { comparisonCsv, comparisonJson } from '../../../src/lib/variants/variants-export';
import { fakeResult, phenylScenario } from './fixtures';

const figuresAB = () => [
  variantFigures('A', demoScenario(), fakeResult(0.386, 0.186)),
  variantFigures('B', phenylScenario(), fakeResult(0.461, 0.186))
];
const row = (rows: ReturnType<typeof comparisonRows>, key: string) => rows.find((r) => r.key === key)!;

describe('comparisonRows', () => {
  it('puts the traced extraction ± binomial σ √(p(1 − p)/N) in percent, rounded at σ (common practice)', () => {
    const rows = comparisonRows(figuresAB());
    const ext = row(rows, 'extraction');
    // √(0.386 · 0.614 / 250 000) = 0.000973… → 0.097 %
    expect(ext.cells[0]).toEqual({ value: 38.6, sigma: 0.097, decimals: 3 });
    expect(cellText(ext, 0)).toBe('38.600 ± 0.097 %');
  });

  it('gives the ratio to the first variant with both errors propagated (Taylor eq. 3.18); the first reads 1', () => {
    const rows = comparisonRows(figuresAB());
    const ratio = row(rows, 'ratio');
    expect(ratio.label).toBe('Ratio to A (traced extraction)');
    expect(ratio.cells[0]).toEqual({ value: 1, sigma: null, decimals: null });
    const q = 0.461 / 0.386;
    const sq = q * Math.hypot(Math.sqrt((0.461 * 0.539) / 250_000) / 0.461, Math.sqrt((0.386 * 0.614) / 250_000) / 0.386);
    expect(Math.abs(ratio.cells[1]!.value - q)).toBeLessThan(0.0001);
    expect(ratio.cells[1]!.sigma).toBe(Number(sq.toPrecision(2)));
  });

  it('takes the closed-form reference from the scenario: the phenyl dome is higher than the methyl one (η_F grows with n_enc)', () => {
    const rows = comparisonRows(figuresAB());
    const ideal = row(rows, 'ideal');
    expect(ideal.cells[1]!.value).toBeGreaterThan(ideal.cells[0]!.value);
    // GaN (n ≈ 2.49) into air: one flat face lets out ≈ 3.3 % (escape cone ½∫T sinθ dθ; E. F. Schubert, Light-Emitting Diodes, 2nd ed., §5.1 — from memory)
    expect(row(rows, 'escape').cells[0]!.value).toBeGreaterThan(3.1);
    expect(row(rows, 'escape').cells[0]!.value).toBeLessThan(3.5);
  });

  it('an untraced variant shows closed-form figures, and its traced cells say the trace is not finished', () => {
    const rows = comparisonRows([variantFigures('A', demoScenario(), fakeResult(0.386, 0.186)), variantFigures('B', phenylScenario(), null)]);
    expect(row(rows, 'extraction').cells[1]).toBeNull();
    expect(row(rows, 'extraction').why[1]).toBe('trace not finished');
    expect(cellText(row(rows, 'ratio'), 1)).toBe('— (trace not finished)');
    expect(row(rows, 'ideal').cells[1]).not.toBeNull();
  });

  it('a variant without encapsulant has gain 1 and no encapsulant index', () => {
    const bare = demoScenario();
    bare.encapsulant.shape = 'none';
    const rows = comparisonRows([variantFigures('Bare', bare, fakeResult(0.186, null))]);
    expect(row(rows, 'gain').cells[0]).toEqual({ value: 1, sigma: 0, decimals: null });
    expect(row(rows, 'n-enc').why[0]).toBe('no encapsulant');
  });
});

describe('comparison exports', () => {
  it('the CSV holds every variant with numbers at their precision, no float noise', () => {
    const rows = comparisonRows(figuresAB());
    const csv = comparisonCsv(['A', 'B'], rows);
    const lines = csv.trim().split('\r\n');
    expect(lines[0]).toBe('Figure,Unit,A,A ±1σ,B,B ±1σ,Notes');
    expect(lines).toContain('"Package extraction, traced",%,38.6,0.097,46.1,0.1,');
    expect(csv).not.toMatch(/\d\.\d*0000000\d|\d\.\d*9999999\d/);
  });

  it('the JSON holds every scenario and result and reads back unchanged', () => {
    const figs = figuresAB();
    const results = [fakeResult(0.386, 0.186), fakeResult(0.461, 0.186)];
    const variants = [{ name: 'A', scenario: demoScenario() }, { name: 'B', scenario: phenylScenario() }];
    const text = comparisonJson(variants, results, comparisonRows(figs));
    const back = readComparison(JSON.parse(text));
    expect(back).toEqual({ ok: true, variants, results });
  });

  it('readComparison names the variant of a broken result', () => {
    const text = comparisonJson([{ name: 'A', scenario: demoScenario() }], [fakeResult(0.386, 0.186)], []);
    const doc = JSON.parse(text);
    doc.variants[0].results.package.extraction = 2;
    const r = readComparison(doc);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(/^Variant 1 \(A\): results\.package\.extraction: /);
  });
});

describe('comparison charts', () => {
  it('the ledger is one bar chart: one series per traced variant over the five ledger bins', () => {
    const spec = variantsLedgerChart(figuresAB());
    expect(spec.kind).toBe('bar');
    expect(spec.categories).toHaveLength(5);
    expect(spec.series.map((s) => s.label)).toEqual(['A', 'B']);
    expect(spec.series[1].points[0].y).toBeCloseTo(46.1, 10);
  });

  it("the far fields overlay on the first variant's Lambertian: B's curve is scaled by η_B/η_A", () => {
    const spec = variantsFarFieldChart(figuresAB());
    const [a, b] = spec.series;
    expect(a.label).toBe('A');
    for (let i = 0; i < a.points.length; i++) expect(b.points[i].y).toBeCloseTo((a.points[i].y * 0.461) / 0.386, 12);
    // a Lambertian trace of A's flux reads cos θ against A's I0 (zone means over 3°, so within 0.1 %)
    expect(a.points[0].y).toBeCloseTo(Math.cos((1.5 * Math.PI) / 180), 2);
    const table = chartTable(spec);
    expect(table.headers).toEqual(['Angle from normal θ (°)', 'A intensity / I0 of A', 'B intensity / I0 of A']);
  });

  it('with nothing traced the far-field chart still draws the Lambertian reference', () => {
    const spec = variantsFarFieldChart([variantFigures('A', demoScenario(), null)]);
    expect(spec.series).toHaveLength(1);
    expect(spec.ariaLabel).toMatch(/no variant has finished tracing/);
  });
});
