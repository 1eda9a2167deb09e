import { describe, expect, it } from 'vitest';
import { checkSweepValues, evenGrid } from '../../../src/lib/sweeps/sweep-values';

describe('evenGrid(from, to, n)', () => {
  it('gives n + 1 values whose last one is exactly `to`', () => {
    const g = evenGrid(0.3, 2, 7);
    expect(g).toHaveLength(8);
    expect(g[0]).toBe(0.3);
    expect(g[7]).toBe(2);
  });
});

describe('checkSweepValues(field, values, min, max)', () => {
  it('returns a copy of a valid list', () => {
    const v = [1, 2, 3];
    const out = checkSweepValues('x', v, 0, 5);
    expect(out).toEqual(v);
    expect(out).not.toBe(v);
  });

  it('rejects empty or over-long lists, values out of range, NaN, ±Infinity and repeats', () => {
    expect(() => checkSweepValues('Values', [], 0, 1)).toThrow(/Values must be a list of 1 to 64/);
    expect(() => checkSweepValues('Values', new Array(65).fill(0).map((_, i) => i / 100), 0, 1)).toThrow(RangeError);
    expect(() => checkSweepValues('Values', [2], 0, 1)).toThrow(/\[0, 1\]/);
    expect(() => checkSweepValues('Values', [Number.NaN], 0, 1)).toThrow(RangeError);
    expect(() => checkSweepValues('Values', [Infinity], 0, Infinity)).toThrow(RangeError);
    expect(() => checkSweepValues('Values', [-Infinity], 0, 1)).toThrow(RangeError);
    expect(() => checkSweepValues('Values', [0.5, 0.5], 0, 1)).toThrow(/increase/);
  });
});
