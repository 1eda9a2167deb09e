import { describe, expect, it } from 'vitest';
import { beamCandelaChart, beamCandelaPolar, beamExtentDeg } from '../../../src/lib/charts/beam-candela-chart';

const theta = Array.from({ length: 180 }, (_, i) => i + 0.5);
const narrow = { label: 'TIR', thetaDeg: theta, cdPerKlm: theta.map((t) => (t < 5 ? 1000 : 0)) };

describe('beam candela charts', () => {
  it('draws every optic, up to where the beams have faded, at least 30°', () => {
    const spec = beamCandelaChart([narrow]);
    expect(spec.series).toHaveLength(1);
    expect(spec.x.max).toBe(30);
    expect(beamExtentDeg([{ ...narrow, cdPerKlm: theta.map((t) => (t < 55 ? 1 : 0)) }])).toBe(60);
    expect(spec.y.title).toContain('cd/klm');
  });

  it('an empty set is not blank: the text says nothing is traced yet', () => {
    expect(beamCandelaChart([]).ariaLabel).toContain('no optic traced yet');
    expect(beamCandelaPolar([]).series.length).toBeGreaterThan(0);
  });

  it('polar chart mirrors each curve to both sides of the axis', () => {
    const spec = beamCandelaPolar([narrow]);
    const data = spec.series.filter((s) => s.role !== 'guide');
    expect(data[0].points.length).toBe(360);
  });
});
