import { describe, expect, it } from 'vitest';
import { chartTable, toCsv } from '../../../src/lib/charts/csv';
import type { ChartSpec } from '../../../src/lib/charts/spec';

describe('toCsv', () => {
  // Quoting rules and line ends: RFC 4180, "Common Format and MIME Type for CSV Files", §2 rules 1, 6 and 7.
  it('toCsv(headers, rows) ends every record with CRLF', () => {
    expect(toCsv(['a', 'b'], [[1, 2], [3, 4]])).toBe('a,b\r\n1,2\r\n3,4\r\n');
  });

  it('quotes fields containing commas, quotes or line breaks, doubling inner quotes (RFC 4180 §2.6–2.7)', () => {
    expect(toCsv(['name'], [['a,b'], ['say "hi"'], ['two\nlines'], ['plain']])).toBe(
      'name\r\n"a,b"\r\n"say ""hi"""\r\n"two\nlines"\r\nplain\r\n'
    );
  });

  it('writes numbers to six significant digits (no float noise), whole numbers exactly, non-finite numbers as empty cells', () => {
    expect(toCsv(['x'], [[0.1 + 0.2], [NaN], [Infinity], [-0.5], [1e-20], [38.63700000000001], [250000]])).toBe(
      'x\r\n0.3\r\n\r\n\r\n-0.5\r\n1e-20\r\n38.637\r\n250000\r\n'
    );
  });

  it('pads short rows to the header width, keeps longer rows whole, writes null/undefined as empty', () => {
    expect(toCsv(['a', 'b', 'c'], [[1], [1, 2, 3, 4], [null, undefined, 'z']])).toBe('a,b,c\r\n1,,\r\n1,2,3,4\r\n,,z\r\n');
  });

  it('with no rows gives the header line only', () => {
    expect(toCsv(['θ (°)', 'T (%)'], [])).toBe('θ (°),T (%)\r\n');
  });
});

describe('chartTable', () => {
  const base = { kind: 'line' as const, title: 't', ariaLabel: 'a', x: { title: 'θ (°)' }, y: { title: 'T (%)' } };

  it('one wide table when all data series share x; markers and guides are left out', () => {
    const spec: ChartSpec = {
      ...base,
      series: [
        { label: 's', points: [{ x: 0, y: 1 }, { x: 1, y: 2 }], color: 0 },
        { label: 'p', points: [{ x: 0, y: 3 }, { x: 1, y: 4 }], color: 1 },
        { label: 'θc', points: [{ x: 0.5, y: 0 }, { x: 0.5, y: 100 }], color: 5, role: 'marker' },
        { label: 'grid', points: [{ x: 9, y: 9 }], color: 0, role: 'guide' }
      ]
    };
    expect(chartTable(spec)).toEqual({
      headers: ['θ (°)', 's — T (%)', 'p — T (%)'],
      rows: [
        [0, 1, 3],
        [1, 2, 4]
      ]
    });
  });

  it('adds low/high columns for series with error bars', () => {
    const spec: ChartSpec = { ...base, series: [{ label: 'MC', points: [{ x: 1, y: 0.5, yMin: 0.4, yMax: 0.6 }], color: 0 }] };
    expect(chartTable(spec)).toEqual({ headers: ['θ (°)', 'MC — T (%)', 'MC low', 'MC high'], rows: [[1, 0.5, 0.4, 0.6]] });
  });

  it('a long table when the series have different x values', () => {
    const spec: ChartSpec = {
      ...base,
      series: [
        { label: 'a', points: [{ x: 0, y: 1 }], color: 0 },
        { label: 'b', points: [{ x: 2, y: 3 }, { x: 4, y: 5, yMin: 4.5 }], color: 1 }
      ]
    };
    expect(chartTable(spec)).toEqual({
      headers: ['series', 'θ (°)', 'T (%)', 'low', 'high'],
      rows: [
        ['a', 0, 1, '', ''],
        ['b', 2, 3, '', ''],
        ['b', 4, 5, 4.5, '']
      ]
    });
  });

  it('bar charts name the category instead of its index; an explicit csv wins', () => {
    const bar: ChartSpec = {
      ...base,
      kind: 'bar',
      categories: ['methyl', 'phenyl'],
      series: [{ label: 'gain', points: [{ x: 0, y: 2.26 }, { x: 1, y: 2.73 }], color: 0 }]
    };
    expect(chartTable(bar).rows).toEqual([
      ['methyl', 2.26],
      ['phenyl', 2.73]
    ]);
    const own = { headers: ['h'], rows: [[1]] };
    expect(chartTable({ ...bar, csv: own })).toBe(own);
  });
});
