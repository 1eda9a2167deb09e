import { describe, expect, it } from 'vitest';
import { niceCeil, polarChart } from '../../../src/lib/charts/polar-chart';
import { assertInDelta } from '../../support/assert';

const N = 37;
const theta = Array.from({ length: N }, (_, i) => -Math.PI / 2 + (Math.PI * i) / (N - 1));

describe('polarChart', () => {
  it('a Lambertian I = cos θ plots as the circle x² + (y − ½)² = ¼ (exact identity; Lambertian: common practice)', () => {
    const spec = polarChart([{ label: 'Lambertian', thetaRad: theta, intensity: theta.map(Math.cos) }], {
      title: 'Far field',
      intensityLabel: 'Relative intensity'
    });
    const data = spec.series.filter((s) => s.role !== 'guide');
    expect(data).toHaveLength(1);
    for (const p of data[0].points) assertInDelta(p.x * p.x + (p.y - 0.5) ** 2, 0.25, 8 * Number.EPSILON);
  });

  it('draws the upper half plane only when all angles are within ±90°, with equal axis ranges', () => {
    const spec = polarChart([{ label: 'a', thetaRad: theta, intensity: theta.map(() => 2) }], { title: 'F', intensityLabel: 'I (W/sr)' });
    expect(spec.kind).toBe('polar');
    // the axis reaches 1.2 × the maximum, rounded up to a round number (2.4 → 2.5)
    expect(spec.x).toMatchObject({ min: -2.5, max: 2.5 });
    expect(spec.y).toMatchObject({ min: 0, max: 2.5 });
    const full = polarChart([{ label: 'b', thetaRad: [0, Math.PI], intensity: [1, 1] }], { title: 'F', intensityLabel: 'I' });
    expect(full.y.min).toBe(-1.2);
  });

  it('adds guide circles at 25–100 % of the maximum and guide rays every 30°, left out of the CSV', () => {
    const spec = polarChart([{ label: 'a', thetaRad: [0], intensity: [4] }], { title: 'F', intensityLabel: 'I' });
    const guides = spec.series.filter((s) => s.role === 'guide');
    expect(guides).toHaveLength(4 + 7);
    const outer = guides[3].points;
    for (const p of outer) assertInDelta(Math.hypot(p.x, p.y), 4, 1e-12);
    expect(spec.csv).toEqual({ headers: ['series', 'angle from normal θ (°)', 'I'], rows: [['a', 0, 4]] });
  });

  it('skips non-finite or negative samples, and an empty input still gives guides and a clear aria label', () => {
    const spec = polarChart([{ label: 'a', thetaRad: [0, 0.1, NaN], intensity: [NaN, -1, 1] }], { title: 'F', intensityLabel: 'I' });
    expect(spec.series.filter((s) => s.role !== 'guide')[0].points).toHaveLength(0);
    expect(spec.ariaLabel).toBe('F: no intensity to draw yet.');
    expect(spec.x.max).toBe(1.2);
  });
});

describe('niceCeil', () => {
  it('rounds up to 1, 1.2, 1.5, 2, 2.5, 3, 4, 5, 6 or 8 × 10^k', () => {
    expect([0.9, 1, 1.2, 2.4, 3.1, 7, 95_281.8 * 1.2].map(niceCeil)).toEqual([1, 1, 1.2, 2.5, 4, 8, 120_000]);
  });
});

describe('polarChart angle labels', () => {
  it('labels every 30° guide ray with its unsigned angle from the normal, beyond the outer circle', () => {
    const spec = polarChart([{ label: 'a', thetaRad: [0], intensity: [2] }], { title: 'F', intensityLabel: 'I' });
    expect(spec.labels?.map((l) => l.text)).toEqual(['90°', '60°', '30°', '0°', '30°', '60°', '90°']);
    const zero = spec.labels![3];
    assertInDelta(zero.x, 0, 1e-12);
    assertInDelta(zero.y, 2.2, 1e-12);
    // every label lies inside the axis ranges, so none is clipped
    for (const l of spec.labels!) {
      expect(Math.abs(l.x)).toBeLessThanOrEqual(spec.x.max!);
      expect(l.y).toBeGreaterThanOrEqual(spec.y.min!);
      expect(l.y).toBeLessThanOrEqual(spec.y.max!);
    }
  });

  it('labels the whole circle 0–180° when light heads below the horizon', () => {
    const spec = polarChart([{ label: 'b', thetaRad: [0, Math.PI], intensity: [1, 1] }], { title: 'F', intensityLabel: 'I' });
    expect(spec.labels?.map((l) => l.text)).toEqual(['180°', '150°', '120°', '90°', '60°', '30°', '0°', '30°', '60°', '90°', '120°', '150°']);
  });
});
