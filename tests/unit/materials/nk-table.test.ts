import { describe, expect, it } from 'vitest';
import { parseNkTable } from '../../../src/lib/materials';

function rowsOf(text: string) {
  const r = parseNkTable(text);
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return r;
}
function errorsOf(text: string) {
  const r = parseNkTable(text);
  if (r.ok) throw new Error('expected errors');
  return r.errors;
}

describe('parseNkTable(text)', () => {
  it('reads CSV with a header', () => {
    const r = rowsOf('wavelength_nm,n,k\n400,1.5,0.01\n500,1.45,0\n');
    expect(r.rows).toEqual([[400, 1.5, 0.01], [500, 1.45, 0]]);
    expect(r.unit).toBe('nm');
    expect(r.notes).toEqual([]);
  });

  it('reads tabs, semicolons, runs of spaces and CRLF line ends', () => {
    expect(rowsOf('400\t1.5\t0\r\n500\t1.4\t0').rows).toEqual([[400, 1.5, 0], [500, 1.4, 0]]);
    expect(rowsOf('400;1.5;0\n500;1.4;0').rows).toEqual([[400, 1.5, 0], [500, 1.4, 0]]);
    expect(rowsOf('  400    1.5   0\n 500 1.4 0 ').rows).toEqual([[400, 1.5, 0], [500, 1.4, 0]]);
  });

  it('takes k = 0 when only two columns are given, and skips blank and comment lines', () => {
    expect(rowsOf('# measured\n\n400 1.5\n// note\n500 1.4\n').rows).toEqual([[400, 1.5, 0], [500, 1.4, 0]]);
  });

  it('reads wavelengths all below 20 as micrometres and says so', () => {
    const r = rowsOf('lambda_um n k\n0.4 1.5 0\n0.55 1.45 0.001\n');
    expect(r.unit).toBe('um');
    expect(r.rows).toEqual([[400, 1.5, 0], [550, 1.45, 0.001]]);
    expect(r.notes[0]).toMatch(/micrometres/);
  });

  it('sorts rows by wavelength', () => {
    expect(rowsOf('600 1.4 0\n400 1.5 0\n500 1.45 0').rows.map((r) => r[0])).toEqual([400, 500, 600]);
  });

  it('reports a bad cell with its 1-based line number', () => {
    expect(errorsOf('wavelength n k\n400 1.5 0\n500 abc 0\n600 1.4 0')).toEqual([
      { line: 3, message: expect.stringMatching(/not a row of numbers/) }
    ]);
  });

  it('rejects NaN and Infinity cells, wrong column counts, n ≤ 0 and negative k', () => {
    expect(errorsOf('400 NaN 0\n500 1.4 0')[0].line).toBe(1);
    expect(errorsOf('400 1.5 0\n500 Infinity 0')[0].line).toBe(2);
    expect(errorsOf('400 1.5 0 7\n500 1.4 0')[0].message).toMatch(/expected 2 or 3 numbers.*found 4/);
    expect(errorsOf('400 0 0\n500 1.4 0')[0].message).toMatch(/n must be > 0/);
    expect(errorsOf('400 1.5 -0.1\n500 1.4 0')[0].message).toMatch(/k must be in \[0, 50\]/);
  });

  it('rejects a repeated wavelength, naming both lines', () => {
    expect(errorsOf('400 1.5 0\n500 1.4 0\n400 1.6 0')).toEqual([{ line: 3, message: 'wavelength 400 nm appears on lines 1 and 3' }]);
  });

  it('needs at least 2 rows and allows at most 5000', () => {
    expect(errorsOf('400 1.5 0')[0].message).toMatch(/at least 2 rows/);
    const ok = Array.from({ length: 5000 }, (_, i) => `${400 + i * 0.1} 1.5 0`).join('\n');
    expect(rowsOf(ok).rows.length).toBe(5000);
    expect(errorsOf(ok + '\n900 1.5 0')).toEqual([{ line: 5001, message: 'too many rows: at most 5000 are allowed' }]);
  });

  it('rejects wavelengths outside 100–20000 nm after the unit is settled', () => {
    expect(errorsOf('50 1.5 0\n500 1.4 0')[0]).toEqual({ line: 1, message: 'wavelength 50 nm is outside 100–20000 nm' });
  });

  it('stops after 20 errors', () => {
    const text = Array.from({ length: 40 }, () => 'x y z').join('\n');
    expect(errorsOf('400 1.5 0\n' + text).length).toBe(20);
  });
});
