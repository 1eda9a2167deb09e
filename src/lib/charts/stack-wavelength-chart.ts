/**
 * Chart of a thin-film stack's normal-incidence reflectance against wavelength, with the bare
 * interface for comparison and a marker at the scenario's wavelength. Pure.
 */
import type { ChartPoint, ChartSpec, SeriesSpec } from './spec';

export interface StackWavelengthInput {
  /** Vacuum wavelengths, nm, ascending. */
  wavelengthNm: ArrayLike<number>;
  /** Stack reflectance (fraction 0–1) at each wavelength; NaN where it cannot be computed (e.g. a material's formula has no value there). */
  R: ArrayLike<number>;
  /** Bare chip → exit reflectance at each wavelength (optional). */
  bareR?: ArrayLike<number>;
  /** The scenario's wavelength, nm, marked with a vertical line when inside the plotted range. */
  markNm?: number;
  exitName: string;
}

/**
 * Splits samples into runs of finite values, so a gap in the data shows as a gap in the line
 * rather than a straight segment drawn across it.
 */
export function finiteRuns(x: ArrayLike<number>, y: ArrayLike<number>, scale = 1): ChartPoint[][] {
  const runs: ChartPoint[][] = [];
  let run: ChartPoint[] = [];
  const n = Math.min(x.length, y.length);
  for (let i = 0; i < n; i++) {
    const yi = y[i] * scale;
    if (Number.isFinite(x[i]) && Number.isFinite(yi)) {
      run.push({ x: x[i], y: yi });
    } else if (run.length > 0) {
      runs.push(run);
      run = [];
    }
  }
  if (run.length > 0) runs.push(run);
  return runs;
}

/**
 * R(λ) chart in percent against nm. The y axis starts at 0 and ends at the next 5 % above the largest
 * value (at least 5 %). The CSV holds one row per wavelength (empty cells where R is not defined).
 */
export function stackWavelengthChart(input: StackWavelengthInput): ChartSpec {
  const w = input.wavelengthNm;
  const series: SeriesSpec[] = [];
  const stackRuns = finiteRuns(w, input.R, 100);
  stackRuns.forEach((points, i) => series.push({ label: i === 0 ? 'Stack' : `Stack (part ${i + 1})`, points, color: 0 }));
  if (input.bareR) {
    finiteRuns(w, input.bareR, 100).forEach((points, i) =>
      series.push({ label: i === 0 ? 'Bare interface (no stack)' : `Bare interface (part ${i + 1})`, points, color: 5 })
    );
  }
  let yMax = 0;
  for (const s of series) for (const p of s.points) if (p.y > yMax) yMax = p.y;
  const top = Math.max(5, Math.ceil((yMax + 1e-9) / 5) * 5);

  const lo = w.length > 0 ? w[0] : 0;
  const hi = w.length > 0 ? w[w.length - 1] : 0;
  const m = input.markNm;
  if (m !== undefined && Number.isFinite(m) && m >= lo && m <= hi) {
    series.push({
      label: `Scenario wavelength ${m} nm`,
      points: [
        { x: m, y: 0 },
        { x: m, y: top }
      ],
      color: 3,
      role: 'marker',
      dashed: true
    });
  }

  let minR = Infinity;
  let minAt = NaN;
  for (let i = 0; i < Math.min(w.length, input.R.length); i++) {
    if (Number.isFinite(input.R[i]) && input.R[i] < minR) {
      minR = input.R[i];
      minAt = w[i];
    }
  }
  const summary = Number.isFinite(minR)
    ? `lowest stack reflectance ${(minR * 100).toFixed(2)} % at ${minAt} nm`
    : 'no reflectance could be computed in this range';

  const rows: (string | number)[][] = [];
  for (let i = 0; i < w.length; i++) {
    const r = input.R[i];
    const b = input.bareR?.[i];
    const row: (string | number)[] = [w[i], Number.isFinite(r) ? r * 100 : ''];
    if (input.bareR) row.push(b !== undefined && Number.isFinite(b) ? b * 100 : '');
    rows.push(row);
  }
  const headers = ['wavelength (nm)', 'stack reflectance R (%)'];
  if (input.bareR) headers.push('bare interface reflectance R (%)');

  return {
    kind: 'line',
    title: `Stack reflectance against wavelength, normal incidence, into ${input.exitName}`,
    ariaLabel: `Line chart of the stack's reflectance at normal incidence in percent against wavelength from ${lo} to ${hi} nm; ${summary}.`,
    x: { title: 'Wavelength λ (nm)', min: lo, max: hi },
    y: { title: 'Reflectance R (%)', min: 0, max: top },
    series,
    csv: { headers, rows }
  };
}
