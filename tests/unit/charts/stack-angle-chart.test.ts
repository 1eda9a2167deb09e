import { describe, expect, it } from 'vitest';
import { stackAngleChart } from '../../../src/lib/charts/stack-angle-chart';
import { chartTable } from '../../../src/lib/charts/csv';
import { assertInDelta } from '../../support/assert';

const theta = [0, 30, 60, 90];
const base = { thetaDeg: theta, Ts: [0.8, 0.5, 0, 0], Tp: [0.8, 0.7, 0, 0], T: [0.8, 0.6, 0, 0], exitName: 'air' };

describe('stackAngleChart(input)', () => {
  it('plots s, p and unpolarised T in percent (fraction × 100, exact to 1 ulp of 100)', () => {
    const spec = stackAngleChart({ ...base, criticalDeg: 24.09 });
    const unpol = spec.series.find((s) => s.label === 'Unpolarised')!;
    expect(unpol.points.map((p) => p.x)).toEqual(theta);
    unpol.points.forEach((p, i) => assertInDelta(p.y, base.T[i] * 100, 1e-13));
    expect(spec.series.map((s) => s.label)).toContain('s-polarised');
    expect(spec.series.map((s) => s.label)).toContain('p-polarised');
  });

  it('labels both axes with their units and fixes them to 0–90° and 0–100 %', () => {
    const spec = stackAngleChart({ ...base, criticalDeg: 24.09 });
    expect(spec.x.title).toMatch(/\(°\)/);
    expect(spec.y.title).toMatch(/\(%\)/);
    expect([spec.x.min, spec.x.max, spec.y.min, spec.y.max]).toEqual([0, 90, 0, 100]);
  });

  it('marks the escape cone with a vertical marker line at the given angle, left out of the CSV', () => {
    // 24.09° = arcsin(1/2.45), the critical angle 2.45 → air (computed, Snell's law)
    const spec = stackAngleChart({ ...base, criticalDeg: 24.09 });
    const marker = spec.series.find((s) => s.role === 'marker')!;
    expect(marker.points).toEqual([
      { x: 24.09, y: 0 },
      { x: 24.09, y: 100 }
    ]);
    expect(marker.label).toContain('24.1°');
    const table = chartTable(spec);
    expect(table.headers.some((h) => h.includes('Escape cone'))).toBe(false);
    expect(table.rows).toHaveLength(theta.length);
  });

  it('draws no marker when there is no escape cone (exit index not below the chip)', () => {
    const spec = stackAngleChart({ ...base, criticalDeg: null });
    expect(spec.series.some((s) => s.role === 'marker')).toBe(false);
    expect(spec.ariaLabel).toMatch(/no escape cone/);
  });

  it('adds the bare interface for comparison when given', () => {
    const spec = stackAngleChart({ ...base, bareT: [0.7, 0.5, 0, 0], criticalDeg: 24.09 });
    const bare = spec.series.find((s) => s.label.startsWith('Bare'))!;
    expect(bare.points.map((p) => p.y)).toEqual([70, 50, 0, 0]);
  });

  it('leaves out non-finite samples instead of plotting NaN', () => {
    const spec = stackAngleChart({ ...base, T: [0.8, NaN, Infinity, 0], criticalDeg: 24.09 });
    const unpol = spec.series.find((s) => s.label === 'Unpolarised')!;
    expect(unpol.points.map((p) => p.x)).toEqual([0, 90]);
  });

  it('states T at normal incidence in the text alternative', () => {
    expect(stackAngleChart({ ...base, criticalDeg: 24.09 }).ariaLabel).toContain('80.0 %');
  });
});
