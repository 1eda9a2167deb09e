import { describe, expect, it } from 'vitest';
import { domeSweepChart, paddedRange } from '../../../src/lib/charts/dome-sweep-chart';
import { chartTable } from '../../../src/lib/charts/csv';
import type { SweepPlan } from '../../../src/lib/sweeps/sweep-plan';
import type { SweepPointResult } from '../../../src/lib/sweeps/run-sweep';
import type { TracePackage } from '../../../src/lib/trace/package-spec';

const pkg = {} as TracePackage; // the chart never reads the packages

function plan(): SweepPlan {
  return {
    kind: 'radius',
    title: 'Extraction against dome radius',
    xTitle: 'Dome radius over half-diagonal R/r',
    points: [
      { x: 1.2, pkg, closedForm: 0.08 },
      { x: 2, pkg, closedForm: 0.08 },
      { x: 4, pkg, closedForm: 0.08 }
    ],
    closedFormLine: [
      { x: 1.2, y: 0.08 },
      { x: 4, y: 0.08 }
    ],
    closedFormLabel: 'Closed form',
    skipped: [{ x: 1.01, reason: 'too small' }],
    marker: { x: 1.41, label: 'No-TIR radius' },
    currentX: 3.5
  };
}

const results: SweepPointResult[] = [
  { x: 2, closedForm: 0.08, extraction: 0.385, stderr: 0.002 },
  { x: 1.2, closedForm: 0.08, extraction: 0.37, stderr: 0.002 }
];

describe('domeSweepChart(plan, results, raysPerPoint)', () => {
  it('draws the closed form as a line and the trace as points in percent, sorted by x, with ±1 s.e. bars', () => {
    const spec = domeSweepChart(plan(), results, 50_000);
    const [line, trace] = spec.series;
    expect(line.points.map((p) => p.y)).toEqual([8, 8]);
    expect(trace.line).toBe(false);
    expect(trace.points.map((p) => p.x)).toEqual([1.2, 2]);
    expect(trace.points[0].y).toBeCloseTo(37, 12);
    expect(trace.points[0].yMin).toBeCloseTo(36.8, 12);
    expect(trace.points[0].yMax).toBeCloseTo(37.2, 12);
  });

  it('puts the no-TIR marker and the scenario line from 0 to the top of the y axis', () => {
    const spec = domeSweepChart(plan(), results, 50_000);
    const marker = spec.series.find((s) => s.label === 'No-TIR radius')!;
    expect(marker.role).toBe('marker');
    expect(marker.points).toEqual([
      { x: 1.41, y: 0 },
      { x: 1.41, y: spec.y.max }
    ]);
    expect(spec.series.some((s) => s.role === 'marker' && s.points[0].x === 3.5)).toBe(true);
    // highest value 38.7 % (+5 % margin, rounded up to 10 %) → 50 %
    expect(spec.y).toMatchObject({ min: 0, max: 50 });
  });

  it('leaves out non-finite results instead of drawing NaN', () => {
    const spec = domeSweepChart(plan(), [...results, { x: 4, closedForm: 0.08, extraction: Number.NaN, stderr: 0 }], 10);
    expect(spec.series[1].points).toHaveLength(2);
    for (const s of spec.series) for (const p of s.points) expect(Number.isFinite(p.y)).toBe(true);
  });

  it('says in its text alternative when the trace has not run yet', () => {
    const spec = domeSweepChart(plan(), [], 10);
    expect(spec.series[1].points).toEqual([]);
    expect(spec.ariaLabel).toMatch(/not been run yet/);
    expect(domeSweepChart(plan(), results, 10).ariaLabel).toMatch(/2 of 3 trace points done/);
  });

  it('exports one CSV row per planned point (trace blank until done) and one per skipped value', () => {
    const t = chartTable(domeSweepChart(plan(), results, 50_000));
    expect(t.headers[0]).toBe('Dome radius over half-diagonal R/r');
    expect(t.rows).toHaveLength(4);
    expect(t.rows[0]).toEqual([1.2, 8, 37, 0.2, 50_000]);
    expect(t.rows[2]).toEqual([4, 8, '', '', '']);
    expect(t.rows[3][4]).toMatch(/skipped: too small/);
  });
});

describe('paddedRange(xMin, xMax)', () => {
  it('widens the range by at least 2 % each side onto a round grid of about a tenth of the range', () => {
    expect(paddedRange(1, 2)).toEqual({ min: 0.9, max: 2.1 });
    expect(paddedRange(0.3, 2)).toEqual({ min: 0.2, max: 2.2 });
    expect(paddedRange(1.05, 4)).toEqual({ min: 0.8, max: 4.2 });
    expect(paddedRange(1000, 5000)).toEqual({ min: 500, max: 5500 });
  });

  it('gives a small range around a single value, and null without a finite range', () => {
    expect(paddedRange(1.5, 1.5)).toEqual({ min: 1.4, max: 1.6 });
    expect(paddedRange(Infinity, -Infinity)).toBeNull();
  });
});
