/**
 * Chart of n (or k) against wavelength for the materials picked on the materials page: solid inside
 * each material's validity range, dashed where the model is extrapolated beyond it, gaps where the
 * model has no value. Pure.
 */
import type { MaterialCurve } from './materials-curve';
import type { ChartPoint, ChartSpec, SeriesSpec } from './spec';

export interface MaterialsChartOptions {
  /** Which part of the index to plot. */
  quantity: 'n' | 'k';
  /** Draw the extrapolated parts (dashed); when false only the validity range is drawn. */
  extrapolated: boolean;
  /** Wavelength to mark with a vertical line (the scenario's), nm. */
  markNm?: number;
}

/**
 * Runs of consecutive samples with the same in-range flag and a finite value. An extrapolated run is
 * widened by one finite neighbour on each side so its dashes meet the solid line.
 */
function runs(c: MaterialCurve, values: number[], inside: boolean): ChartPoint[][] {
  const out: ChartPoint[][] = [];
  const count = c.wavelengthNm.length;
  const member = (i: number) => Number.isFinite(values[i]) && c.inRange[i] === inside;
  let i = 0;
  while (i < count) {
    if (!member(i)) {
      i++;
      continue;
    }
    let j = i;
    while (j + 1 < count && member(j + 1)) j++;
    let a = i;
    let b = j;
    if (!inside) {
      if (a > 0 && Number.isFinite(values[a - 1])) a--;
      if (b + 1 < count && Number.isFinite(values[b + 1])) b++;
    }
    const points: ChartPoint[] = [];
    for (let t = a; t <= b; t++) points.push({ x: c.wavelengthNm[t], y: values[t] });
    out.push(points);
    i = j + 1;
  }
  return out;
}

/**
 * The n(λ) or k(λ) chart of several materials. Each material keeps one palette slot for its solid and
 * dashed parts; the legend names the extrapolated parts. The CSV has one row per wavelength of the
 * first curve, with each material's value and an in-range flag (all curves share the same wavelengths).
 */
export function materialsIndexChart(curves: readonly MaterialCurve[], opts: MaterialsChartOptions): ChartSpec {
  const q = opts.quantity;
  const series: SeriesSpec[] = [];
  curves.forEach((c, i) => {
    const values = q === 'n' ? c.n : c.k;
    runs(c, values, true).forEach((points, j) =>
      series.push({ label: j === 0 ? c.label : `${c.label} (part ${j + 1})`, points, color: i })
    );
    if (opts.extrapolated) {
      const firstIn = c.inRange.indexOf(true);
      runs(c, values, false).forEach((points) => {
        // A run ending at or before the first in-range sample lies below the range; otherwise above it
        const side = firstIn < 0 ? 'outside' : points[points.length - 1].x <= c.wavelengthNm[firstIn] ? 'below' : 'above';
        series.push({ label: `${c.label}, ${side} its valid range`, points, color: i, dashed: true });
      });
    }
  });

  const w = curves[0]?.wavelengthNm ?? [];
  const lo = w[0] ?? 0;
  const hi = w[w.length - 1] ?? 0;
  let yMin = Infinity;
  let yMax = -Infinity;
  for (const s of series) for (const p of s.points) {
    yMin = Math.min(yMin, p.y);
    yMax = Math.max(yMax, p.y);
  }
  const m = opts.markNm;
  if (m !== undefined && Number.isFinite(m) && m >= lo && m <= hi && Number.isFinite(yMin)) {
    series.push({
      label: `Scenario wavelength ${m} nm`,
      points: [
        { x: m, y: yMin },
        { x: m, y: yMax }
      ],
      color: 5,
      role: 'marker',
      dashed: true
    });
  }

  const headers = ['wavelength (nm)'];
  for (const c of curves) headers.push(`${c.label} ${q}`, `${c.label} in valid range`);
  const rows: (string | number)[][] = w.map((wl, i) => {
    const row: (string | number)[] = [wl];
    for (const c of curves) {
      const v = (q === 'n' ? c.n : c.k)[i];
      row.push(Number.isFinite(v) ? v : '', c.inRange[i] ? 'yes' : 'no');
    }
    return row;
  });

  const name = q === 'n' ? 'Refractive index n' : 'Extinction coefficient k';
  const names = curves.map((c) => c.label).join(', ');
  return {
    kind: 'line',
    title: q === 'n' ? 'Refractive index n against wavelength' : 'Extinction coefficient k against wavelength',
    ariaLabel:
      curves.length === 0
        ? `${name} against wavelength: no materials selected.`
        : `Line chart of ${name.toLowerCase()} against wavelength from ${lo} to ${hi} nm for ${names}; dashed parts lie outside a material's valid range.`,
    x: { title: 'Wavelength λ (nm)', min: lo, max: hi },
    y: { title: q === 'n' ? 'Refractive index n' : 'Extinction coefficient k', min: q === 'k' ? 0 : undefined },
    series,
    csv: { headers, rows }
  };
}
