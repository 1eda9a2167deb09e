import { describe, expect, it } from 'vitest';
import { SLIDE_SIZE, slideHeader } from '../../../src/lib/charts/slide';
import type { ChartSpec } from '../../../src/lib/charts/spec';

const line: ChartSpec = {
  kind: 'line',
  title: 'Far field: intensity against angle',
  ariaLabel: '',
  x: { title: 'Polar angle θ (°)' },
  y: { title: 'Intensity / I₀' },
  series: []
};

describe('slideHeader(spec, scenario, variant)', () => {
  it('is at least 1600 px wide, 16:9', () => {
    expect(SLIDE_SIZE.width).toBeGreaterThanOrEqual(1600);
    expect(SLIDE_SIZE.width / SLIDE_SIZE.height).toBeCloseTo(16 / 9, 6);
  });
  it('titles the slide with the chart title and names the scenario, then the units of both axes', () => {
    expect(slideHeader(line, 'Demo')).toEqual({
      title: 'Far field: intensity against angle',
      subtitle: ['Scenario: Demo', 'Horizontal: Polar angle θ (°) · vertical: Intensity / I₀']
    });
  });
  it('names the variant when there is one', () => {
    expect(slideHeader(line, 'Demo', 'B').subtitle[0]).toBe('Scenario: Demo · variant B');
  });
  it('says what the distance from the centre is on a polar chart', () => {
    const polar: ChartSpec = { ...line, kind: 'polar', x: { title: 'Intensity / I₀ · sin θ' }, y: { title: 'Intensity / I₀ · cos θ' } };
    expect(slideHeader(polar, 'Demo').subtitle[1]).toBe('Distance from the centre: Intensity / I₀; angle from the package axis θ (°)');
  });
  it('names an unnamed scenario', () => {
    expect(slideHeader(line, '  ').subtitle[0]).toBe('Scenario: unnamed scenario');
  });
});
