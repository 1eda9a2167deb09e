/**
 * CSV text (RFC 4180: comma separated, CRLF line ends, fields with comma, quote or line break quoted,
 * quotes doubled). Numbers are written with the significant digits of the quantity (see exportNumber),
 * never float noise; NaN and ±Infinity are written as empty cells.
 */
import { exportNumber } from '../export/number-text';
import type { ChartSpec } from './spec';

export type CsvCell = string | number | null | undefined;

function cell(v: CsvCell): string {
  if (v === null || v === undefined) return '';
  if (typeof v === 'number') return exportNumber(v);
  return /[",\r\n]/.test(v) ? `"${v.replace(/"/g, '""')}"` : v;
}

/** The CSV text of a header row and data rows. Rows shorter than the header are padded with empty cells. */
export function toCsv(headers: readonly string[], rows: readonly (readonly CsvCell[])[]): string {
  const lines = [headers.map(cell).join(',')];
  for (const row of rows) {
    const cells: string[] = [];
    const width = Math.max(headers.length, row.length);
    for (let i = 0; i < width; i++) cells.push(cell(row[i]));
    lines.push(cells.join(','));
  }
  return lines.join('\r\n') + '\r\n';
}

function sameX(a: { x: number }[], b: { x: number }[]): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i].x !== b[i].x) return false;
  return true;
}

/**
 * The table a chart exports: its own `csv` if given; otherwise, when every data series has the same
 * x values, one wide table (x, then one column per series, plus low/high columns for error bars);
 * otherwise a long table (series, x, y, y low, y high). Guide and marker series are left out.
 */
export function chartTable(spec: ChartSpec): { headers: string[]; rows: (string | number)[][] } {
  if (spec.csv) return spec.csv;
  const data = spec.series.filter((s) => (s.role ?? 'data') === 'data');
  const xName = spec.kind === 'bar' ? 'category' : spec.x.title;
  const xValue = (x: number): string | number => (spec.kind === 'bar' ? (spec.categories?.[x] ?? x) : x);
  if (data.length > 0 && data.every((s) => sameX(s.points, data[0].points))) {
    const headers = [xName];
    const bars = data.map((s) => s.points.some((p) => p.yMin !== undefined || p.yMax !== undefined));
    data.forEach((s, j) => {
      headers.push(`${s.label} — ${spec.y.title}`);
      if (bars[j]) headers.push(`${s.label} low`, `${s.label} high`);
    });
    const rows = data[0].points.map((p0, i) => {
      const row: (string | number)[] = [xValue(p0.x)];
      data.forEach((s, j) => {
        row.push(s.points[i].y);
        if (bars[j]) row.push(s.points[i].yMin ?? '', s.points[i].yMax ?? '');
      });
      return row;
    });
    return { headers, rows };
  }
  const headers = ['series', xName, spec.y.title, 'low', 'high'];
  const rows: (string | number)[][] = [];
  for (const s of data) for (const p of s.points) rows.push([s.label, xValue(p.x), p.y, p.yMin ?? '', p.yMax ?? '']);
  return { headers, rows };
}
