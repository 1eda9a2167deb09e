import { describe, expect, it } from 'vitest';
import { chartConfig, equalUnitsAspectRatio, FALLBACK_PALETTE, labelPlugin, seriesColor } from '../../../src/lib/charts/chart-config';
import { polarChart } from '../../../src/lib/charts/polar-chart';
import type { ChartSpec } from '../../../src/lib/charts/spec';

const line: ChartSpec = {
  kind: 'line',
  title: 'T',
  ariaLabel: 'a',
  x: { title: 'θ (°)', min: 0, max: 90 },
  y: { title: 'T (%)' },
  series: [
    { label: 'data', points: [{ x: 0, y: 1 }], color: 0 },
    { label: 'guide', points: [{ x: 0, y: 0 }], color: 0, role: 'guide' },
    { label: 'scatter', points: [{ x: 1, y: 2 }], color: 7, line: false }
  ]
};

describe('chartConfig', () => {
  it('draws line charts as scatter charts with lines, numeric axes with titles, animation off', () => {
    const c = chartConfig(line, FALLBACK_PALETTE) as any;
    expect(c.type).toBe('scatter');
    expect(c.options.animation).toBe(false);
    expect(c.options.scales.x).toMatchObject({ type: 'linear', min: 0, max: 90, title: { display: true, text: 'θ (°)' } });
    expect(c.options.scales.y.title.text).toBe('T (%)');
    expect(c.data.datasets[0]).toMatchObject({ label: 'data', showLine: true, pointRadius: 0, borderColor: FALLBACK_PALETTE.series[0] });
    expect(c.data.datasets[2]).toMatchObject({ showLine: false, pointRadius: 3.5 });
  });

  it('wraps palette slots and greys out guides; guides are kept out of legend and tooltips', () => {
    expect(seriesColor(FALLBACK_PALETTE, line.series[2])).toBe(FALLBACK_PALETTE.series[1]); // slot 7 of 6 → 1
    expect(seriesColor(FALLBACK_PALETTE, line.series[1])).toBe(FALLBACK_PALETTE.guide);
    const c = chartConfig(line, FALLBACK_PALETTE) as any;
    const filter = c.options.plugins.legend.labels.filter;
    expect([0, 1, 2].map((i) => filter({ datasetIndex: i }))).toEqual([true, false, true]);
    expect(c.options.plugins.tooltip.filter({ datasetIndex: 1 })).toBe(false);
  });

  it('bar charts use the categories and a category x axis', () => {
    const c = chartConfig(
      { ...line, kind: 'bar', categories: ['a', 'b'], series: [{ label: 'v', points: [{ x: 0, y: 1 }, { x: 1, y: 2 }], color: 2 }] },
      FALLBACK_PALETTE
    ) as any;
    expect(c.type).toBe('bar');
    expect(c.data.labels).toEqual(['a', 'b']);
    expect(c.data.datasets[0].data).toEqual([1, 2]);
    expect(c.options.scales.x.type).toBe('category');
  });

  it('a horizontal bar chart puts the categories on the vertical axis and the values on the horizontal one', () => {
    const c = chartConfig(
      { ...line, kind: 'bar', horizontal: true, categories: ['a', 'b'], series: [{ label: 'v', points: [{ x: 0, y: 1 }, { x: 1, y: 2 }], color: 2 }] },
      FALLBACK_PALETTE
    ) as any;
    expect(c.options.indexAxis).toBe('y');
    expect(c.options.scales.y.type).toBe('category');
    expect(c.options.scales.y.title.text).toBe(line.x.title);
    expect(c.options.scales.x.type).toBe('linear');
    expect(c.options.scales.x.title.text).toBe(line.y.title);
  });

  it('polar charts keep their aspect ratio so a circle stays round', () => {
    const c = chartConfig(polarChart([{ label: 'a', thetaRad: [0], intensity: [1] }], { title: 'F', intensityLabel: 'I' }), FALLBACK_PALETTE) as any;
    expect(c.options.maintainAspectRatio).toBe(true);
    expect(c.options.aspectRatio).toBeCloseTo(2 * 0.92, 12);
  });

  it('log axes when asked', () => {
    const c = chartConfig({ ...line, y: { title: 'rays', log: true } }, FALLBACK_PALETTE) as any;
    expect(c.options.scales.y.type).toBe('logarithmic');
  });
});

describe('equalUnitsAspectRatio(canvasW, canvasH, plotW, plotH, xSpan, ySpan)', () => {
  it('gives a plot area whose pixels per unit are the same on both axes', () => {
    // 400 × 300 canvas with a 340 × 200 plot: axes and legend take 60 px across and 100 px down
    const ratio = equalUnitsAspectRatio(400, 300, 340, 200, 2.2, 1.1);
    const plotH = 400 / ratio - 100;
    expect(340 / 2.2).toBeCloseTo(plotH / 1.1, 9);
  });

  it('keeps an already square-unit layout as it is', () => {
    expect(equalUnitsAspectRatio(400, 270, 340, 170, 2, 1)).toBeCloseTo(400 / 270, 12);
  });

  it('stays within [0.5, 3] and is finite for degenerate sizes', () => {
    expect(equalUnitsAspectRatio(400, 300, 340, 200, 0.01, 10)).toBe(0.5);
    expect(equalUnitsAspectRatio(400, 300, 340, 200, 100, 0.01)).toBe(3);
    expect(equalUnitsAspectRatio(0, 0, 0, 0, 1, 1)).toBe(2);
  });
});

describe('labelPlugin(current)', () => {
  it("draws each of the spec's labels at its data coordinates, in the muted ink, after the datasets", () => {
    const drawn: [string, number, number][] = [];
    const ctx = { save() {}, restore() {}, fillText: (t: string, x: number, y: number) => drawn.push([t, x, y]), fillStyle: '', font: '', textAlign: '', textBaseline: '' };
    const scale = (k: number) => ({ getPixelForValue: (v: number) => k * v });
    const spec = { ...line, labels: [{ x: 1, y: 2, text: '30°' }] };
    const plugin = labelPlugin(() => ({ spec, palette: FALLBACK_PALETTE }));
    const chart = { ctx, scales: { x: scale(10), y: scale(-5) } };
    (plugin.afterDatasetsDraw as unknown as (c: unknown) => void)(chart);
    expect(drawn).toEqual([['30°', 10, -10]]);
    expect(ctx.fillStyle).toBe(FALLBACK_PALETTE.muted);
  });
});
