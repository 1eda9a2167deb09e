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
  /** Shape of the markers (default circle): with the colour, tells candidates apart in print and for colour-blind readers. */
  marker?: MarkerShape;
  /** false keeps a 'data' series out of the legend (it stays in the CSV), e.g. a second point of a candidate already named. */
  inLegend?: boolean;
  /** Bar charts: a palette slot per point (e.g. the claim among its bounds); default `color` for all. */
  pointColors?: number[];
}

export type MarkerShape = 'circle' | 'triangle' | 'rect' | 'rectRot' | 'star' | 'crossRot' | 'rectRounded';

/** Marker shapes in the order charts hand them out. */
export const MARKER_SHAPES: readonly MarkerShape[] = ['circle', 'triangle', 'rect', 'rectRot', 'star', 'crossRot', 'rectRounded'];

export interface AxisSpec {
  /** Axis title with its unit: "Angle of incidence θ (°)". */
  title: string;
  min?: number;
  max?: number;
  log?: boolean;
}

/** A short text drawn in the plot at data coordinates (x, y), centred there: a polar plot's angle marks. */
export interface ChartLabel {
  x: number;
  y: number;
  text: string;
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
  /**
   * Bar charts: bars run sideways, the categories down the left edge (x stays the category axis and y
   * the value axis of the spec). Long category names then stay level and readable on a phone.
   */
  horizontal?: boolean;
  /** Texts drawn inside the plot area (e.g. "30°" at the end of a polar guide ray). */
  labels?: ChartLabel[];
  /** CSV to export instead of the default table built from the series (e.g. polar: angle and intensity). */
  csv?: { headers: string[]; rows: (string | number)[][] };
}
