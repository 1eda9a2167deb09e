/**
 * ChartSpec → Chart.js configuration, given the colours of the current theme. Pure (types only from
 * Chart.js), so it is tested in Node; `chart.ts` does the drawing.
 */
import type { ChartConfiguration, ChartDataset, Plugin, ScaleOptionsByType } from 'chart.js';
import type { AxisSpec, ChartSpec, SeriesSpec } from './spec';

/** Theme colours read from CSS custom properties (see app.css, --chart-*). */
export interface ChartPalette {
  series: string[];
  ink: string;
  muted: string;
  grid: string;
  guide: string;
  background: string;
  fontFamily: string;
}

/** Used when CSS gives nothing (e.g. in Node); the same hues as the light theme. */
export const FALLBACK_PALETTE: ChartPalette = {
  series: ['#2b6cb0', '#c05621', '#2f855a', '#805ad5', '#b83280', '#4a5568'],
  ink: '#1f2933',
  muted: '#52606d',
  grid: 'rgba(82, 96, 109, 0.18)',
  guide: 'rgba(82, 96, 109, 0.35)',
  background: '#ffffff',
  fontFamily: 'system-ui, sans-serif'
};

export function seriesColor(palette: ChartPalette, s: SeriesSpec): string {
  if (s.role === 'guide') return palette.guide;
  const n = palette.series.length;
  return palette.series[((s.color % n) + n) % n];
}

type XY = 'linear' | 'logarithmic' | 'category';

function axis(a: AxisSpec, type: XY, palette: ChartPalette) {
  return {
    type,
    min: a.min,
    max: a.max,
    title: { display: true, text: a.title, color: palette.ink, font: { size: 13, family: palette.fontFamily } },
    grid: { color: palette.grid },
    border: { color: palette.muted },
    ticks: { color: palette.muted, font: { size: 12, family: palette.fontFamily } }
  } as unknown as ScaleOptionsByType<'linear'>;
}

function xyDataset(spec: ChartSpec, s: SeriesSpec, palette: ChartPalette): ChartDataset<'scatter'> {
  const color = seriesColor(palette, s);
  const guide = s.role === 'guide';
  const line = s.line ?? spec.kind !== 'scatter';
  const markers = s.markers ?? !line;
  return {
    label: s.label,
    data: s.points.map((p) => ({ x: p.x, y: p.y })),
    borderColor: color,
    backgroundColor: color,
    showLine: line,
    borderWidth: guide ? 1 : 2,
    borderDash: s.dashed ? [6, 4] : [],
    pointRadius: markers ? (s.marker && s.marker !== 'circle' ? 5 : 3.5) : 0,
    // With marker shapes in the legend, a plain line is drawn there as a line
    pointStyle: s.marker ?? (!markers && spec.series.some((x) => x.marker) ? 'line' : 'circle'),
    pointHoverRadius: markers ? 5 : guide ? 0 : 3,
    pointHitRadius: guide ? 0 : 6,
    tension: 0,
    order: guide ? 10 : s.role === 'marker' ? 5 : 0
  };
}

/**
 * The canvas aspect ratio (width/height) that gives a plot area with equal units on both axes,
 * keeping the canvas width and the space the axes and legend take (canvas minus plot area).
 * @param canvasW canvas width, px; @param canvasH its height, px
 * @param plotW plot area width, px; @param plotH its height, px
 * @param xSpan x axis range, data units (> 0); @param ySpan y axis range (> 0)
 * @returns the ratio, clamped to [0.5, 3] (a narrow canvas with a tall legend still gets a usable plot)
 */
export function equalUnitsAspectRatio(canvasW: number, canvasH: number, plotW: number, plotH: number, xSpan: number, ySpan: number): number {
  const wantedH = canvasH - plotH + (plotW * ySpan) / xSpan;
  const ratio = canvasW / wantedH;
  return Number.isFinite(ratio) && ratio > 0 ? Math.max(0.5, Math.min(3, ratio)) : 2;
}

/**
 * The Chart.js configuration of a spec: 'line', 'scatter' and 'polar' become scatter charts with
 * per-series lines (numeric x axes); 'bar' a bar chart over `categories` (sideways with `horizontal`). Animations are off so updates
 * while typing are immediate. Polar charts keep equal scales on both axes through their aspect ratio (estimated here, corrected
 * after layout with equalUnitsAspectRatio).
 */
export function chartConfig(spec: ChartSpec, palette: ChartPalette): ChartConfiguration {
  // Marker shapes tell series apart: show them in the legend, at a readable size
  const pointLegend = spec.series.some((s) => s.marker !== undefined);
  const legend = {
    display: true,
    position: 'bottom' as const,
    labels: {
      color: palette.ink,
      boxWidth: pointLegend ? 10 : 24,
      boxHeight: pointLegend ? 10 : 2,
      usePointStyle: pointLegend,
      font: { size: 12, family: palette.fontFamily },
      filter: (item: { datasetIndex?: number }) => {
        const s = spec.series[item.datasetIndex ?? -1];
        return s?.role !== 'guide' && s?.inLegend !== false;
      }
    }
  };
  const tooltip = { enabled: true, filter: (item: { datasetIndex: number }) => spec.series[item.datasetIndex]?.role !== 'guide' };

  if (spec.kind === 'bar') {
    return {
      type: 'bar',
      data: {
        labels: spec.categories ?? [],
        datasets: spec.series.map((s) => ({
          label: s.label,
          data: s.points.map((p) => p.y),
          backgroundColor: s.pointColors ? s.pointColors.map((c) => seriesColor(palette, { ...s, color: c })) : seriesColor(palette, s),
          borderColor: s.pointColors ? s.pointColors.map((c) => seriesColor(palette, { ...s, color: c })) : seriesColor(palette, s),
          borderWidth: 1
        }))
      },
      options: {
        animation: false,
        responsive: true,
        maintainAspectRatio: false,
        // A sideways bar chart: Chart.js puts the categories on its y scale and the values on x
        ...(spec.horizontal
          ? { indexAxis: 'y', scales: { x: axis(spec.y, spec.y.log ? 'logarithmic' : 'linear', palette), y: axis(spec.x, 'category', palette) } }
          : { scales: { x: axis(spec.x, 'category', palette), y: axis(spec.y, spec.y.log ? 'logarithmic' : 'linear', palette) } }),
        plugins: { legend, tooltip }
      }
    } as ChartConfiguration;
  }

  const polar = spec.kind === 'polar';
  let aspectRatio = 2;
  if (polar && spec.x.min !== undefined && spec.x.max !== undefined && spec.y.min !== undefined && spec.y.max !== undefined) {
    // Equal units on both axes: plot area ratio = data range ratio (the legend below takes a little height).
    aspectRatio = Math.max(0.5, Math.min(3, ((spec.x.max - spec.x.min) / (spec.y.max - spec.y.min)) * 0.92));
  }
  return {
    type: 'scatter',
    data: { datasets: spec.series.map((s) => xyDataset(spec, s, palette)) },
    options: {
      animation: false,
      responsive: true,
      maintainAspectRatio: polar,
      aspectRatio,
      interaction: { mode: 'nearest', intersect: false },
      scales: {
        x: axis(spec.x, spec.x.log ? 'logarithmic' : 'linear', palette),
        y: axis(spec.y, spec.y.log ? 'logarithmic' : 'linear', palette)
      },
      plugins: { legend, tooltip }
    }
  } as ChartConfiguration;
}

/**
 * Draws a spec's `labels` (e.g. a polar plot's angle marks) in the theme's muted ink, centred on their
 * data coordinates, after the datasets. `current` returns the spec and palette being drawn.
 */
export function labelPlugin(current: () => { spec: ChartSpec; palette: ChartPalette }): Plugin {
  return {
    id: 'outcoupleLabels',
    afterDatasetsDraw(chart) {
      const { spec, palette } = current();
      if (!spec.labels || spec.labels.length === 0) return;
      const { ctx } = chart;
      const xScale = chart.scales.x;
      const yScale = chart.scales.y;
      ctx.save();
      ctx.fillStyle = palette.muted;
      ctx.font = `12px ${palette.fontFamily}`;
      ctx.textAlign = 'center';
      ctx.textBaseline = 'middle';
      for (const l of spec.labels) ctx.fillText(l.text, xScale.getPixelForValue(l.x), yScale.getPixelForValue(l.y));
      ctx.restore();
    }
  };
}
