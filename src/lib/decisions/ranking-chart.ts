/**
 * Chart of closed-form dome extraction against encapsulant index, with each ranked candidate placed
 * on the curve at its index (and the scenario's current encapsulant marked). Pure: returns a ChartSpec
 * for the shared chart wrapper.
 */
import type { ChartSpec, SeriesSpec } from '../charts/spec';
import { extractionCurve } from './extraction-curve';
import type { EncapsulantRanking } from './rank-encapsulants';

function fmt(x: number, digits: number): string {
  return String(Number(x.toPrecision(digits)));
}

/**
 * The curve η_dome(n) for n from 1 to the chip index (percent), one marker series per candidate, and a
 * dashed vertical marker at the current encapsulant's index. The CSV holds the curve and the markers in
 * one long table.
 */
export function rankingChart(ranking: EncapsulantRanking, points = 61): ChartSpec {
  const curve = extractionCurve(Math.max(ranking.nChip, 1.0001), ranking.nOut, points);
  const line = curve.n.map((n, i) => ({ x: n, y: curve.etaDome[i] * 100 }));
  // y range up to the next multiple of 5 % above the highest point
  const top = Math.ceil((Math.max(...line.map((p) => p.y), ...ranking.rows.map((r) => r.etaDome * 100)) * 1.02) / 5) * 5;
  const series: SeriesSpec[] = [{ label: 'Closed form: extraction under a dome η(n), one face', points: line, color: 0 }];
  ranking.rows.forEach((r, i) => {
    series.push({
      label: `${r.name}${r.isCurrent ? ' (current)' : ''}`,
      points: [{ x: r.nEnc, y: r.etaDome * 100 }],
      color: 1 + (i % 5),
      line: false,
      markers: true
    });
  });
  series.push({
    label: `Current: ${ranking.current.label}, n = ${fmt(ranking.current.n, 4)}`,
    points: [
      { x: ranking.current.n, y: 0 },
      { x: ranking.current.n, y: top }
    ],
    color: 5,
    role: 'marker',
    dashed: true
  });
  const best = ranking.rows[0];
  const rows: (string | number)[][] = line.map((p) => ['closed form', p.x, p.y]);
  for (const r of ranking.rows) rows.push([r.name, r.nEnc, r.etaDome * 100]);
  return {
    kind: 'line',
    title: `Dome extraction against encapsulant index (chip n ${fmt(ranking.nChip, 4)}, ${fmt(ranking.wavelengthNm, 4)} nm)`,
    ariaLabel:
      `Line chart of closed-form dome extraction in percent against encapsulant index from 1 to ${fmt(ranking.nChip, 4)}, ` +
      `with ${ranking.rows.length} candidate encapsulants placed on it` +
      (best ? `; the highest is ${best.name} at n ${fmt(best.nEnc, 4)} with ${fmt(best.etaDome * 100, 3)} percent.` : '.'),
    x: { title: 'Encapsulant index n', min: 1, max: Math.max(ranking.nChip, 1.05) },
    y: { title: 'Extraction into air, one face (%)', min: 0, max: top },
    series,
    csv: { headers: ['series', 'encapsulant index n', 'extraction, one face (%)'], rows }
  };
}
