/**
 * What a chart shows, independent of the drawing library: pure builders return a ChartSpec, the
 * Chart.js wrapper draws it, the CSV export reads it. Colours are palette slots resolved from CSS
 * custom properties when drawn, so light and dark themes both read well.
 */

export type ChartKind = 'line' | 'scatter' | 'bar' | 'polar';

/** One point. `yMin`/`yMax` draw an error bar (e.g. ±k standard errors of a Monte Carlo estimate). */
export interface ChartPoint {
  x: number;
  y: number;
  yMin?: number;
  yMax?: number;
}

/**
 * One series. `role`: 'data' (default) is in the legend and the CSV; 'marker' (e.g. a vertical line
 * at the critical angle) is in the legend but not the CSV; 'guide' (grid circles of a polar plot) is in
 * neither.
 */
export interface SeriesSpec {
  label: string;
  points: ChartPoint[];
  /** Palette slot 0–5. */
  color: number;
  role?: 'data' | 'marker' | 'guide';
  /** Join the points with a line (default: true except for 'scatter' charts). */
  line?: boolean;
  /** Draw a marker at each point (default: false for lines, true for scatter). */
  markers?: boolean;
  dashed?: boolean;
  /** Bar charts: a palette slot per point (e.g. the claim among its bounds); default `color` for all. */
  pointColors?: number[];
}

export interface AxisSpec {
  /** Axis title with its unit: "Angle of incidence θ (°)". */
  title: string;
  min?: number;
  max?: number;
  log?: boolean;
}

export interface ChartSpec {
  kind: ChartKind;
  /** Shown above the chart and used in file names and button labels. */
  title: string;
  /** Text alternative for the canvas: what is plotted, over which range, and the key value. */
  ariaLabel: string;
  x: AxisSpec;
  y: AxisSpec;
  series: SeriesSpec[];
  /** Bar charts: category names; a bar series' point x is the category's index. */
  categories?: string[];
  /** CSV to export instead of the default table built from the series (e.g. polar: angle and intensity). */
  csv?: { headers: string[]; rows: (string | number)[][] };
}
