/** Pure chart pieces (no Chart.js, no DOM): specs, dataset builders, CSV. Draw with Chart.svelte. */
export type { ChartKind, ChartPoint, SeriesSpec, AxisSpec, ChartSpec } from './spec';
export { toCsv, chartTable, type CsvCell } from './csv';
export { chartConfig, FALLBACK_PALETTE, seriesColor, type ChartPalette } from './chart-config';
export { transmissionChart, type TransmissionSamples } from './transmission-chart';
export { escapeIndexChart, type EscapeFn } from './escape-index-chart';
export { polarChart, type PolarSeriesInput, type PolarChartOptions } from './polar-chart';
