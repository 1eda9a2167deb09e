import { describe, expect, it } from 'vitest';
import { finiteRuns, stackWavelengthChart } from '../../../src/lib/charts/stack-wavelength-chart';
import { chartTable } from '../../../src/lib/charts/csv';

describe('finiteRuns(x, y, scale)', () => {
  it('splits at non-finite values so gaps stay gaps', () => {
    const runs = finiteRuns([1, 2, 3, 4, 5], [0.1, NaN, 0.3, 0.4, Infinity], 10);
    expect(runs).toEqual([[{ x: 1, y: 1 }], [{ x: 3, y: 3 }, { x: 4, y: 4 }]]);
  });

  it('gives no runs for empty input', () => {
    expect(finiteRuns([], [])).toEqual([]);
  });
});

describe('stackWavelengthChart(input)', () => {
  const w = [400, 500, 600, 700];
  // 0.04258 = ((1.52 − 1)/(1.52 + 1))², bare glass (computed; incoherent and thin-film stacks: Macleod, Thin-Film Optical Filters, 4th ed., ch. 2); 0.0126 the quarter-wave MgF2 value
  const R = [0.02, 0.0126, 0.018, 0.03];
  const bareR = [0.04258, 0.04258, 0.04258, 0.04258];

  it('plots R in percent against nm with unit-labelled axes', () => {
    const spec = stackWavelengthChart({ wavelengthNm: w, R, bareR, exitName: 'air' });
    expect(spec.x.title).toBe('Wavelength λ (nm)');
    expect(spec.y.title).toBe('Reflectance R (%)');
    const stack = spec.series.find((s) => s.label === 'Stack')!;
    expect(stack.points[1].y).toBeCloseTo(1.26, 12);
  });

  it('scales the y axis to the next 5 % step above the largest value, at least 5 %', () => {
    expect(stackWavelengthChart({ wavelengthNm: w, R, exitName: 'air' }).y.max).toBe(5);
    expect(stackWavelengthChart({ wavelengthNm: w, R: [0.31, 0.2, 0.1, 0.05], exitName: 'air' }).y.max).toBe(35);
  });

  it('marks the scenario wavelength only when it lies inside the plotted range', () => {
    const inside = stackWavelengthChart({ wavelengthNm: w, R, markNm: 450, exitName: 'air' });
    expect(inside.series.find((s) => s.role === 'marker')?.points[0].x).toBe(450);
    const outside = stackWavelengthChart({ wavelengthNm: w, R, markNm: 900, exitName: 'air' });
    expect(outside.series.some((s) => s.role === 'marker')).toBe(false);
  });

  it('exports one CSV row per wavelength, empty cells where R is undefined', () => {
    const spec = stackWavelengthChart({ wavelengthNm: w, R: [0.02, NaN, 0.018, 0.03], bareR, exitName: 'air' });
    const t = chartTable(spec);
    expect(t.headers).toEqual(['wavelength (nm)', 'stack reflectance R (%)', 'bare interface reflectance R (%)']);
    expect(t.rows).toHaveLength(4);
    expect(t.rows[1][1]).toBe('');
    expect(spec.series.filter((s) => s.label.startsWith('Stack'))).toHaveLength(2);
  });

  it('names the lowest reflectance in the text alternative', () => {
    expect(stackWavelengthChart({ wavelengthNm: w, R, exitName: 'air' }).ariaLabel).toContain('1.26 % at 500 nm');
  });
});
