import { describe, expect, it } from 'vitest';
import { POLAR_BINS, createTally, mergeTally } from '../../../src/lib/trace/tally';

describe('tally', () => {
  it('createTally() starts every count and histogram bin at zero', () => {
    const t = createTally();
    for (const [key, value] of Object.entries(t)) {
      if (key === 'polarHistogram' || key === 'parts') continue;
      expect(value, key).toBe(0);
    }
    expect(t.parts).toEqual({});
    expect(t.polarHistogram.length).toBe(POLAR_BINS);
    expect(t.polarHistogram.every((v) => v === 0)).toBe(true);
  });

  it('mergeTally(into, from) adds every count and bin, and returns into', () => {
    const a = createTally();
    const b = createTally();
    let k = 1;
    for (const key of Object.keys(a) as (keyof typeof a)[]) {
      if (key === 'polarHistogram' || key === 'parts') continue;
      (a[key] as number) = k;
      (b[key] as number) = 10 * k;
      k++;
    }
    a.parts = { 'escaped:dome': 4, 'medium:chip': 1 };
    b.parts = { 'escaped:dome': 6, 'surface:base': 2 };
    a.polarHistogram[0] = 2;
    b.polarHistogram[0] = 3;
    b.polarHistogram[179] = 5;
    expect(mergeTally(a, b)).toBe(a);
    k = 1;
    for (const key of Object.keys(a) as (keyof typeof a)[]) {
      if (key === 'polarHistogram' || key === 'parts') continue;
      expect(a[key], key).toBe(11 * k);
      k++;
    }
    expect(a.parts).toEqual({ 'escaped:dome': 10, 'medium:chip': 1, 'surface:base': 2 });
    expect(a.polarHistogram[0]).toBe(5);
    expect(a.polarHistogram[179]).toBe(5);
  });

  it('survives structured cloning unchanged (what a worker posts)', () => {
    const t = createTally();
    t.escaped = 7;
    t.polarHistogram[42] = 3;
    t.parts['escaped:dome'] = 7;
    const copy = structuredClone(t);
    expect(copy).toEqual(t);
    expect(copy.polarHistogram).toBeInstanceOf(Float64Array);
  });
});
