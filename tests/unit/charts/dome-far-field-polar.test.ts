import { describe, expect, it } from 'vitest';
import { domeFarFieldPolar } from '../../../src/lib/charts/dome-far-field-polar';
import { assertInDelta } from '../../support/assert';

const bins = Array.from({ length: 180 }, (_, i) => ({ thetaDeg: i + 0.5, relativeIntensity: i < 90 ? 1 : 0 }));

describe('domeFarFieldPolar(input)', () => {
  it('mirrors the traced profile about the normal: x(−θ) = −x(θ), same y', () => {
    const spec = domeFarFieldPolar({ bins, beamAngleDeg: 150, onAxisVsLambertian: 1 });
    const trace = spec.series.find((s) => s.label === 'Monte Carlo trace')!;
    const n = trace.points.length;
    expect(n).toBe(60);
    for (let i = 0; i < n / 2; i++) {
      assertInDelta(trace.points[i].x, -trace.points[n - 1 - i].x, 1e-15);
      assertInDelta(trace.points[i].y, trace.points[n - 1 - i].y, 1e-15);
    }
  });

  it('puts the Lambertian reference at distance cos θ from the centre (1 on axis, 0.5 at 60°)', () => {
    const spec = domeFarFieldPolar({ bins, beamAngleDeg: 150, onAxisVsLambertian: 1 });
    const lambert = spec.series.find((s) => s.label === 'Lambertian of the same flux')!;
    const at60 = lambert.points.find((p) => Math.abs(Math.atan2(p.x, p.y) - Math.PI / 3) < 1e-9)!;
    assertInDelta(Math.hypot(at60.x, at60.y), 0.5, 1e-12);
  });

  it('draws only the reference when nothing escaped, and says so', () => {
    const none = bins.map((b) => ({ ...b, relativeIntensity: 0 }));
    const spec = domeFarFieldPolar({ bins: none, beamAngleDeg: null, onAxisVsLambertian: null });
    expect(spec.series.some((s) => s.label === 'Monte Carlo trace')).toBe(false);
    expect(spec.ariaLabel).toMatch(/no light escaped/);
  });
});

describe('domeFarFieldPolar(input) with light below the horizon', () => {
  it('draws the upper half space only', () => {
    const below = bins.map((b) => ({ ...b, relativeIntensity: 1 }));
    const spec = domeFarFieldPolar({ bins: below, beamAngleDeg: 150, onAxisVsLambertian: 1, fullSphere: true });
    expect(spec.y.min).toBe(0);
    const trace = spec.series.find((s) => s.label === 'Monte Carlo trace')!;
    for (const p of trace.points) expect(p.y).toBeGreaterThanOrEqual(0);
  });
});
