import { describe, expect, it } from 'vitest';
import table from '../../../data/cie-photopic-1924.json';
import { photopicV } from '../../../src/lib/photometry';

describe('photopicV(wavelengthNm)', () => {
  it('returns the tabulated value exactly at every 5 nm row', () => {
    for (const [w, v] of table.rows) expect(photopicV(w)).toBe(v);
  });

  it('interpolates linearly between rows (midpoint = mean of neighbours)', () => {
    for (let i = 0; i + 1 < table.rows.length; i++) {
      const [w0, v0] = table.rows[i];
      const [w1, v1] = table.rows[i + 1];
      // Tolerance: 4 ulps of the larger neighbour (one multiply-add of rounding).
      expect(Math.abs(photopicV((w0 + w1) / 2) - (v0 + v1) / 2)).toBeLessThanOrEqual(4 * Number.EPSILON * Math.max(v0, v1));
    }
  });

  it('is 0 outside 360–830 nm and positive inside', () => {
    expect(photopicV(359.999)).toBe(0);
    expect(photopicV(830.001)).toBe(0);
    expect(photopicV(1550)).toBe(0);
    expect(photopicV(-5)).toBe(0);
    expect(photopicV(360)).toBeGreaterThan(0);
    expect(photopicV(830)).toBeGreaterThan(0);
  });

  it('rejects non-finite input', () => {
    for (const bad of [Number.NaN, Infinity, -Infinity, '555' as unknown as number]) {
      expect(() => photopicV(bad)).toThrow(/wavelengthNm must be a finite number/);
    }
  });

  it('table is 95 rows, 360–830 nm in 5 nm steps, never above 1', () => {
    expect(table.rows.length).toBe(95);
    table.rows.forEach(([w, v], i) => {
      expect(w).toBe(360 + 5 * i);
      expect(v).toBeGreaterThan(0);
      expect(v).toBeLessThanOrEqual(1);
    });
  });
});
