import { describe, expect, it } from 'vitest';
import { domeLedgerChart, LEDGER_CATEGORIES } from '../../../src/lib/charts/dome-ledger-chart';
import { assertInDelta } from '../../support/assert';

const ledger = { escaped: 0.38, chip: 0.48, encapsulant: 0.001, base: 0.139, lost: 0 };

describe('domeLedgerChart(series)', () => {
  it('draws one bar per ledger bin in percent, and the bars of a series add up to 100 % (the ledger closes)', () => {
    const spec = domeLedgerChart([{ label: 'Dome package', rays: 200_000, ledger }]);
    expect(spec.kind).toBe('bar');
    expect(spec.categories).toEqual(LEDGER_CATEGORIES.map((c) => c.label));
    const ys = spec.series[0].points.map((p) => p.y);
    // shares are fractions of one count, so they sum to 100 % up to rounding of five terms (a few ε·100)
    assertInDelta(ys.reduce((a, b) => a + b, 0), 100, 1e-12);
    expect(ys[0]).toBeCloseTo(38, 12);
  });

  it('gives ±√(p(1 − p)/N) error bars: p = 0.5 of N = 10 000 → ±0.5 % (binomial, computed)', () => {
    const spec = domeLedgerChart([
      { label: 'A', rays: 10_000, ledger: { escaped: 0.5, chip: 0.5, encapsulant: 0, base: 0, lost: 0 } }
    ]);
    const p = spec.series[0].points[0];
    assertInDelta(p.yMax! - p.y, 0.5, 1e-12);
    assertInDelta(p.y - p.yMin!, 0.5, 1e-12);
    // an empty bin has no spread and its bar never dips below 0
    expect(spec.series[0].points[2]).toMatchObject({ y: 0, yMin: 0, yMax: 0 });
  });

  it('draws a dome and a bare-chip series side by side in their own colours', () => {
    const spec = domeLedgerChart([
      { label: 'Dome package', rays: 1000, ledger, color: 0 },
      { label: 'Bare chip', rays: 1000, ledger, color: 5 }
    ]);
    expect(spec.series.map((s) => [s.label, s.color])).toEqual([
      ['Dome package', 0],
      ['Bare chip', 5]
    ]);
  });

  it('draws a non-finite share as 0 and names it in the text, never NaN', () => {
    const spec = domeLedgerChart([{ label: 'Odd', rays: 100, ledger: { ...ledger, base: Number.NaN } }]);
    for (const p of spec.series[0].points) expect(Number.isFinite(p.y)).toBe(true);
    expect(spec.ariaLabel).toMatch(/Not available: Odd: absorbed at base/);
  });
});
