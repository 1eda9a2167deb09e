/**
 * Chart.js, wrapped once. Registers only the pieces our charts use, draws a ChartSpec on a canvas,
 * follows the light/dark theme, fills an opaque background (so a saved PNG reads on any viewer) and
 * draws error bars from each point's yMin/yMax.
 */
import {
  BarController,
  BarElement,
  CategoryScale,
  Chart,
  Legend,
  LinearScale,
  LineElement,
  LogarithmicScale,
  PointElement,
  ScatterController,
  SubTitle,
  Title,
  Tooltip,
  type ChartConfiguration,
  type Plugin
} from 'chart.js';
import { chartConfig, equalUnitsAspectRatio, FALLBACK_PALETTE, labelPlugin, seriesColor, type ChartPalette } from './chart-config';
import { SLIDE_SIZE, type SlideHeader } from './slide';
import type { ChartSpec } from './spec';

Chart.register(
  ScatterController,
  BarController,
  PointElement,
  LineElement,
  BarElement,
  LinearScale,
  LogarithmicScale,
  CategoryScale,
  Legend,
  Title,
  SubTitle,
  Tooltip
);

/** Reads the theme's chart colours from CSS custom properties on (or above) the element. */
export function readPalette(el: Element): ChartPalette {
  const cs = getComputedStyle(el);
  const v = (name: string, fallback: string) => cs.getPropertyValue(name).trim() || fallback;
  const f = FALLBACK_PALETTE;
  return {
    series: f.series.map((c, i) => v(`--chart-${i + 1}`, c)),
    ink: v('--chart-ink', f.ink),
    muted: v('--chart-muted', f.muted),
    grid: v('--chart-grid', f.grid),
    guide: v('--chart-guide', f.guide),
    background: v('--chart-bg', f.background),
    fontFamily: cs.fontFamily || f.fontFamily
  };
}

interface Live {
  spec: ChartSpec;
  palette: ChartPalette;
}

function backgroundPlugin(live: Live): Plugin {
  return {
    id: 'outcoupleBackground',
    beforeDraw(chart) {
      const { ctx, width, height } = chart;
      ctx.save();
      ctx.fillStyle = live.palette.background;
      ctx.fillRect(0, 0, width, height);
      ctx.restore();
    }
  };
}

/** Vertical error bars with short caps, from each point's yMin / yMax. */
function errorBarPlugin(live: Live): Plugin {
  return {
    id: 'outcoupleErrorBars',
    afterDatasetsDraw(chart) {
      const { ctx } = chart;
      const yScale = chart.scales.y;
      live.spec.series.forEach((s, i) => {
        if (!chart.isDatasetVisible(i)) return;
        const meta = chart.getDatasetMeta(i);
        ctx.save();
        ctx.strokeStyle = seriesColor(live.palette, s);
        ctx.lineWidth = 1.5;
        s.points.forEach((p, j) => {
          if (p.yMin === undefined && p.yMax === undefined) return;
          const el = meta.data[j];
          if (!el) return;
          const x = el.x;
          const y0 = yScale.getPixelForValue(p.yMin ?? p.y);
          const y1 = yScale.getPixelForValue(p.yMax ?? p.y);
          ctx.beginPath();
          ctx.moveTo(x, y0);
          ctx.lineTo(x, y1);
          ctx.moveTo(x - 4, y0);
          ctx.lineTo(x + 4, y0);
          ctx.moveTo(x - 4, y1);
          ctx.lineTo(x + 4, y1);
          ctx.stroke();
        });
        ctx.restore();
      });
    }
  };
}

/**
 * Equal units on both axes of a polar chart, so a circle stays a circle: after each layout the plot
 * area's height is compared with width × (y range / x range), and the canvas aspect ratio corrected
 * (the axes, ticks and legend take a share of the canvas that the first estimate can only guess).
 */
function equalUnitsPlugin(live: Live): Plugin {
  return {
    id: 'outcoupleEqualUnits',
    afterLayout(chart) {
      const { kind, x, y } = live.spec;
      if (kind !== 'polar' || x.min === undefined || x.max === undefined || y.min === undefined || y.max === undefined) return;
      const area = chart.chartArea;
      const plotW = area.right - area.left;
      const plotH = area.bottom - area.top;
      if (!(plotW > 0 && plotH > 0)) return;
      const wanted = equalUnitsAspectRatio(chart.width, chart.height, plotW, plotH, x.max - x.min, y.max - y.min);
      const current = chart.options.aspectRatio ?? 2;
      if (Math.abs(wanted - current) / current < 0.005) return;
      chart.options.aspectRatio = wanted;
      // Not inside the layout pass: resize runs a layout of its own
      setTimeout(() => {
        if (chart.canvas) chart.resize();
      }, 0);
    }
  };
}

export interface ChartHandle {
  /** Redraws with a new spec (same chart kind keeps the canvas; a different kind rebuilds it). */
  update(spec: ChartSpec): void;
  destroy(): void;
}

/** Draws `spec` on `canvas` and keeps it in step with the colour scheme until destroyed. */
export function mountChart(canvas: HTMLCanvasElement, spec: ChartSpec): ChartHandle {
  const live: Live = { spec, palette: readPalette(canvas) };
  const make = () => {
    const config = chartConfig(live.spec, live.palette);
    config.plugins = [backgroundPlugin(live), errorBarPlugin(live), equalUnitsPlugin(live), labelPlugin(() => live)];
    return new Chart(canvas, config);
  };
  let chart = make();

  const redraw = () => {
    live.palette = readPalette(canvas);
    const config = chartConfig(live.spec, live.palette);
    if ((config as { type: string }).type !== (chart.config as { type: string }).type) {
      chart.destroy();
      chart = make();
      return;
    }
    chart.data = config.data;
    chart.options = config.options ?? {};
    chart.update('none');
  };

  const scheme = window.matchMedia?.('(prefers-color-scheme: dark)');
  scheme?.addEventListener('change', redraw);

  return {
    update(next) {
      live.spec = next;
      redraw();
    },
    destroy() {
      scheme?.removeEventListener('change', redraw);
      chart.destroy();
    }
  };
}

/** Font sizes of a saved slide, px: readable when a 1600 px picture is shown on a projector. */
const SLIDE_FONT = { title: 34, subtitle: 20, axisTitle: 22, ticks: 18, legend: 19 } as const;

type FontedScale = { title?: { font?: object }; ticks?: { font?: object; color?: string }; min?: number; max?: number };

/** The on-screen configuration enlarged for a slide: fixed size, title and subtitle, larger fonts. */
function slideConfig(spec: ChartSpec, palette: ChartPalette, header: SlideHeader): ChartConfiguration {
  const config = chartConfig(spec, palette);
  const options = (config.options ?? {}) as Record<string, unknown> & {
    scales?: Record<string, FontedScale>;
    plugins?: Record<string, unknown>;
  };
  const family = palette.fontFamily;
  options.responsive = false;
  options.maintainAspectRatio = false;
  options.devicePixelRatio = 1;
  options.layout = { padding: { left: 24, right: 40, top: 12, bottom: 12 } };
  for (const scale of Object.values(options.scales ?? {})) {
    if (scale.title) scale.title.font = { size: SLIDE_FONT.axisTitle, family };
    if (scale.ticks) scale.ticks.font = { size: SLIDE_FONT.ticks, family };
  }
  const plugins = (options.plugins ?? {}) as Record<string, { labels?: { font?: object; boxWidth?: number; boxHeight?: number } }>;
  if (plugins.legend?.labels) {
    plugins.legend.labels.font = { size: SLIDE_FONT.legend, family };
    plugins.legend.labels.boxWidth = 40;
    plugins.legend.labels.boxHeight = 3;
  }
  options.plugins = {
    ...plugins,
    tooltip: { enabled: false },
    title: {
      display: true,
      text: header.title,
      color: palette.ink,
      align: 'start',
      font: { size: SLIDE_FONT.title, weight: 'bold', family },
      padding: { top: 8, bottom: 6 }
    },
    subtitle: {
      display: true,
      text: header.subtitle,
      color: palette.muted,
      align: 'start',
      font: { size: SLIDE_FONT.subtitle, family },
      padding: { bottom: 18 }
    }
  };
  config.options = options as ChartConfiguration['options'];
  return config;
}

/**
 * Equal units on both axes of a polar chart drawn at a fixed size: widens the x or y range (never
 * narrows it) until the plot area's pixels per unit match, so a circle stays a circle.
 */
function equalUnitsAtFixedSize(chart: Chart, spec: ChartSpec): void {
  const { x, y } = spec;
  if (spec.kind !== 'polar' || x.min === undefined || x.max === undefined || y.min === undefined || y.max === undefined) return;
  const scales = chart.options.scales as Record<string, FontedScale & { ticks?: { callback?: (v: number | string) => string } }>;
  // Ticks only over the data's own range: the widened margin carries no labels
  const yMax = y.max;
  const xMax = Math.max(Math.abs(x.min), Math.abs(x.max));
  if (scales.y.ticks) scales.y.ticks.callback = (v) => (Number(v) <= yMax + 1e-9 ? String(Number(Number(v).toFixed(6))) : '');
  if (scales.x.ticks) scales.x.ticks.callback = (v) => (Math.abs(Number(v)) <= xMax + 1e-9 ? String(Number(Number(v).toFixed(6))) : '');
  for (let pass = 0; pass < 3; pass++) {
    const area = chart.chartArea;
    const plotW = area.right - area.left;
    const plotH = area.bottom - area.top;
    if (!(plotW > 0 && plotH > 0)) return;
    const xSpan = x.max - x.min;
    const ySpan = y.max - y.min;
    if (plotW / plotH > xSpan / ySpan) {
      const wide = (ySpan * plotW) / plotH;
      const mid = (x.max + x.min) / 2;
      scales.x.min = mid - wide / 2;
      scales.x.max = mid + wide / 2;
    } else {
      scales.y.max = y.min + (xSpan * plotH) / plotW;
    }
    chart.update('none');
  }
}

/**
 * PNG (data URL) of `spec` drawn off screen at slide size with its title, scenario and units, on a white
 * background whatever the page's colour scheme.
 * @param header what to write above the plot (see slideHeader)
 */
export function renderSlidePng(spec: ChartSpec, header: SlideHeader, size: { width: number; height: number } = SLIDE_SIZE): string {
  const canvas = document.createElement('canvas');
  canvas.width = size.width;
  canvas.height = size.height;
  const live: Live = { spec, palette: { ...FALLBACK_PALETTE, fontFamily: readPalette(document.body).fontFamily } };
  const config = slideConfig(spec, live.palette, header);
  config.plugins = [backgroundPlugin(live), errorBarPlugin(live)];
  const chart = new Chart(canvas, config);
  try {
    equalUnitsAtFixedSize(chart, spec);
    return chart.toBase64Image('image/png', 1);
  } finally {
    chart.destroy();
  }
}
