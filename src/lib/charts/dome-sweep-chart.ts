/**
 * Chart of a dome sweep: the closed form as a line, the Monte Carlo trace as points with ±1 standard
 * error bars, a vertical marker (e.g. the no-TIR radius) and a vertical line at the scenario's own
 * value. Pure: takes a sweep plan and the results so far, returns a ChartSpec.
 */
import type { SweepPlan } from '../sweeps/sweep-plan';
import type { SweepPointResult } from '../sweeps/run-sweep';
import type { ChartPoint, ChartSpec, SeriesSpec } from './spec';

const AXIS_Y = 'Extraction η (%)';

/** The y-axis top (%): the largest value plus a margin, rounded up to 10 %, at most 100 %. */
function yTop(values: number[]): number {
  let m = 0;
  for (const v of values) if (Number.isFinite(v) && v > m) m = v;
  return Math.min(100, Math.max(10, Math.ceil((m + 5) / 10) * 10));
}

/** 1, 2 or 5 times a power of ten, nearest above x / 1.5 (a readable grid step for x > 0). */
function niceStep(x: number): number {
  const p = 10 ** Math.floor(Math.log10(x));
  const f = x / p;
  return (f < 1.5 ? 1 : f < 3.5 ? 2 : f < 7.5 ? 5 : 10) * p;
}

/**
 * Axis bounds a little wider than the data (at least 2 % of the range each side, so end points and
 * their error bars are not cut in half), on a grid of about a tenth of the range so the bound
 * labels read as round numbers. Null when there is no finite range.
 */
export function paddedRange(xMin: number, xMax: number): { min: number; max: number } | null {
  if (!Number.isFinite(xMin) || !Number.isFinite(xMax)) return null;
  const range = xMax > xMin ? xMax - xMin : Math.abs(xMin) || 1;
  const g = niceStep(range / 10);
  const round = (v: number) => Number(v.toPrecision(12));
  return {
    min: round(Math.floor((xMin - 0.02 * range) / g) * g),
    max: round(Math.ceil((xMax + 0.02 * range) / g) * g)
  };
}

function vertical(x: number, top: number): ChartPoint[] {
  return [
    { x, y: 0 },
    { x, y: top }
  ];
}

function pct(x: number): string {
  return `${(x * 100).toFixed(1)} %`;
}

/**
 * The sweep chart, y in percent from 0. Trace points that are not finite are left out (never drawn as
 * NaN). Before any trace result, the chart shows the closed form alone and says so in its text.
 * @param plan the sweep plan (closed-form line, marker, x title)
 * @param results traced points so far, any order
 * @param raysPerPoint rays traced at each point, for the CSV and the text
 */
export function domeSweepChart(plan: SweepPlan, results: readonly SweepPointResult[], raysPerPoint: number): ChartSpec {
  const line: ChartPoint[] = plan.closedFormLine
    .filter((p) => Number.isFinite(p.x) && Number.isFinite(p.y))
    .map((p) => ({ x: p.x, y: p.y * 100 }));
  const traced = results
    .filter((r) => Number.isFinite(r.x) && Number.isFinite(r.extraction) && Number.isFinite(r.stderr))
    .slice()
    .sort((a, b) => a.x - b.x);
  const points: ChartPoint[] = traced.map((r) => ({
    x: r.x,
    y: r.extraction * 100,
    yMin: (r.extraction - r.stderr) * 100,
    yMax: (r.extraction + r.stderr) * 100
  }));
  const top = yTop([...line.map((p) => p.y), ...points.map((p) => p.yMax ?? p.y)]);

  const series: SeriesSpec[] = [
    { label: plan.closedFormLabel, points: line, color: 0 },
    { label: 'Monte Carlo trace (± 1 standard error)', points, color: 1, line: false, markers: true }
  ];
  if (plan.marker && Number.isFinite(plan.marker.x)) {
    series.push({ label: plan.marker.label, points: vertical(plan.marker.x, top), color: 3, role: 'marker', dashed: true });
  }
  if (plan.currentX !== null && Number.isFinite(plan.currentX)) {
    series.push({
      label: `This scenario: ${Number(plan.currentX.toPrecision(3))}`,
      points: vertical(plan.currentX, top),
      color: 5,
      role: 'marker'
    });
  }

  const xs = plan.points.map((p) => p.x);
  const xMin = Math.min(...xs, ...plan.closedFormLine.map((p) => p.x));
  const xMax = Math.max(...xs, ...plan.closedFormLine.map((p) => p.x));
  const range = Number.isFinite(xMin) && Number.isFinite(xMax) ? `${xMin} to ${xMax}` : 'no values';
  const bounds = paddedRange(xMin, xMax);
  let traceText: string;
  if (traced.length === 0) {
    traceText = 'the trace has not been run yet';
  } else {
    const best = traced.reduce((a, b) => (b.extraction > a.extraction ? b : a));
    traceText = `${traced.length} of ${plan.points.length} trace points done; the highest traced extraction is ${pct(best.extraction)} at ${best.x}`;
  }

  const byX = new Map(traced.map((r) => [r.x, r]));
  const rows: (string | number)[][] = plan.points.map((p) => {
    const r = byX.get(p.x);
    return r
      ? [p.x, p.closedForm * 100, r.extraction * 100, r.stderr * 100, raysPerPoint]
      : [p.x, p.closedForm * 100, '', '', ''];
  });
  for (const s of plan.skipped) rows.push([s.x, '', '', '', `skipped: ${s.reason}`]);

  return {
    kind: 'line',
    title: plan.title,
    ariaLabel: `Chart of extraction in percent against ${plan.xTitle.toLowerCase()}, ${range}: the closed form as a line and the Monte Carlo trace as points with error bars; ${traceText}.`,
    x: { title: plan.xTitle, min: bounds?.min, max: bounds?.max },
    y: { title: AXIS_Y, min: 0, max: top },
    series,
    csv: {
      headers: [plan.xTitle, 'Closed-form extraction (%)', 'Trace extraction (%)', 'Trace standard error (%)', 'Rays per point'],
      rows
    }
  };
}
