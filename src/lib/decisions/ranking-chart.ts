/**
 * Chart of the ranked candidates against encapsulant index: the ideal one-face reference curve
 * η_dome(n) with each candidate placed on it, and — once traced — each candidate's traced package
 * extraction with ±2σ bars. Every candidate has its own colour and marker shape (the same on both of
 * its points), and the x axis is zoomed to the candidates' index range. Pure: returns a ChartSpec for
 * the shared chart wrapper.
 */
import { MARKER_SHAPES, type ChartSpec, type SeriesSpec } from '../charts/spec';
import { extractionCurve } from './extraction-curve';
import type { EncapsulantRanking } from './rank-encapsulants';
import type { TracedRow } from './rank-traced';

/** Palette slots for candidates (slot 0 is the reference curve). */
const CANDIDATE_COLORS = 5;
/** Error bars span ±this many standard errors. */
const BAR_K = 2;

function fmt(x: number, digits: number): string {
  return String(Number(x.toPrecision(digits)));
}

/** The x range that shows every candidate and the current index with a margin: [lo, hi], within [1, nChip]. */
export function candidateIndexRange(ranking: EncapsulantRanking): { min: number; max: number } {
  const ns = [...ranking.rows.map((r) => r.nEnc), ranking.current.n];
  const lo = Math.min(...ns);
  const hi = Math.max(...ns);
  const pad = Math.max(0.05, 0.15 * (hi - lo));
  const top = Math.max(ranking.nChip, 1.05);
  const min = Math.max(1, Math.floor((lo - pad) * 100) / 100);
  const max = Math.min(top, Math.ceil((hi + pad) * 100) / 100);
  return max > min ? { min, max } : { min: 1, max: top };
}

/**
 * The reference curve (percent) over the candidates' index range, one series per candidate (own colour
 * and marker; a second, "traced" series when `traced` holds it) and a dashed vertical line at the
 * current index. The CSV holds the curve, the candidates' reference values and their traced values.
 */
export function rankingChart(ranking: EncapsulantRanking, traced: readonly TracedRow[] = [], points = 61): ChartSpec {
  const range = candidateIndexRange(ranking);
  const nChip = Math.max(ranking.nChip, 1.0001);
  // Sample the whole curve finely and keep the part in range, so the zoomed curve stays smooth.
  const full = extractionCurve(nChip, ranking.nOut, Math.min(1000, Math.max(points, Math.ceil((points * (nChip - 1)) / (range.max - range.min)))));
  const line = full.n
    .map((n, i) => ({ x: n, y: full.etaDome[i] * 100 }))
    .filter((p) => p.x >= range.min - 1e-9 && p.x <= range.max + 1e-9);
  const tracedById = new Map(traced.map((t) => [t.row.id, t]));
  const ys = [
    ...line.map((p) => p.y),
    ...ranking.rows.map((r) => r.etaDome * 100),
    ...traced.map((t) => (t.summary.extraction + BAR_K * t.summary.stderr) * 100)
  ];
  const top = Math.ceil((Math.max(...ys) * 1.05) / 5) * 5;
  const series: SeriesSpec[] = [{ label: 'Ideal one-face reference η(n)', points: line, color: 0 }];
  ranking.rows.forEach((r, i) => {
    const color = 1 + (i % CANDIDATE_COLORS);
    const marker = MARKER_SHAPES[i % MARKER_SHAPES.length];
    const name = `${r.name}${r.isCurrent ? ' (current)' : ''}`;
    const t = tracedById.get(r.id);
    // Once traced, the legend names the candidate once (its traced point); its reference point sits on the curve
    series.push({ label: `${name}, ideal reference`, points: [{ x: r.nEnc, y: r.etaDome * 100 }], color, marker, line: false, markers: true, inLegend: !t });
    if (t) {
      const y = t.summary.extraction * 100;
      const e = BAR_K * t.summary.stderr * 100;
      series.push({ label: `${name}, traced (±${BAR_K}σ)`, points: [{ x: r.nEnc, y, yMin: y - e, yMax: y + e }], color, marker, line: false, markers: true });
    }
  });
  series.push({
    label: `Current: ${ranking.current.label}, n = ${fmt(ranking.current.n, 4)}`,
    points: [
      { x: ranking.current.n, y: 0 },
      { x: ranking.current.n, y: top }
    ],
    color: 0,
    role: 'marker',
    dashed: true
  });
  const rows: (string | number)[][] = line.map((p) => ['ideal one-face reference', p.x, p.y, '']);
  for (const r of ranking.rows) {
    rows.push([`${r.name}, ideal reference`, r.nEnc, r.etaDome * 100, '']);
    const t = tracedById.get(r.id);
    if (t) rows.push([`${r.name}, traced package`, r.nEnc, t.summary.extraction * 100, t.summary.stderr * 100]);
  }
  const best = traced[0] ?? null;
  return {
    kind: 'line',
    title: `Extraction against encapsulant index (chip n ${fmt(ranking.nChip, 4)}, ${fmt(ranking.wavelengthNm, 4)} nm)`,
    ariaLabel:
      `Chart of extraction in percent against encapsulant index from ${fmt(range.min, 3)} to ${fmt(range.max, 3)}: ` +
      `the ideal one-face reference curve with ${ranking.rows.length} candidates on it` +
      (traced.length > 0 ? `, and ${traced.length} traced package extractions with ±${BAR_K} standard-error bars` : '') +
      (best ? `; the highest traced is ${best.row.name} at ${fmt(best.summary.extraction * 100, 3)} percent.` : '.'),
    x: { title: 'Encapsulant index n', min: range.min, max: range.max },
    y: { title: 'Extraction (%)', min: 0, max: top },
    series,
    csv: { headers: ['series', 'encapsulant index n', 'extraction (%)', 'standard error (%)'], rows }
  };
}
