import { describe, expect, it } from 'vitest';
import {
  domeFarFieldChart,
  farFieldExtentDeg,
  lambertianCurve,
  regroupFarField,
  type FarFieldSample
} from '../../../src/lib/charts/dome-far-field-chart';
import { assertInDelta } from '../../support/assert';

const RAD = Math.PI / 180;

/** Exact zone means of a Lambertian (I/I0 = cos θ) over 1° bins: ∫cos θ dΩ / ∫dΩ = (sin²θ2 − sin²θ1) / (2 (cos θ1 − cos θ2)). */
function lambertBins(): FarFieldSample[] {
  const bins: FarFieldSample[] = [];
  for (let i = 0; i < 180; i++) {
    const a = i * RAD;
    const b = (i + 1) * RAD;
    const mean = i < 90 ? (Math.sin(b) ** 2 - Math.sin(a) ** 2) / (2 * (Math.cos(a) - Math.cos(b))) : 0;
    bins.push({ thetaDeg: i + 0.5, relativeIntensity: mean });
  }
  return bins;
}

describe('regroupFarField(bins, group)', () => {
  it('gives the exact zone mean of a Lambertian over the wider zone (computed, 1e-12)', () => {
    const zones = regroupFarField(lambertBins(), 3, 90);
    expect(zones).toHaveLength(30);
    for (let k = 0; k < zones.length; k++) {
      const a = 3 * k * RAD;
      const b = 3 * (k + 1) * RAD;
      const mean = (Math.sin(b) ** 2 - Math.sin(a) ** 2) / (2 * (Math.cos(a) - Math.cos(b)));
      assertInDelta(zones[k].thetaDeg, 3 * k + 1.5, 1e-12);
      assertInDelta(zones[k].intensity, mean, 1e-12);
    }
  });

  it('keeps a uniform intensity uniform and skips non-finite bins', () => {
    const flat = lambertBins().map((b) => ({ thetaDeg: b.thetaDeg, relativeIntensity: 2 }));
    flat[4].relativeIntensity = Number.NaN;
    for (const z of regroupFarField(flat, 5)) assertInDelta(z.intensity, 2, 1e-13);
    expect(regroupFarField([], 3)).toEqual([]);
  });
});

describe('lambertianCurve(step)', () => {
  it('falls to half at 60°: the Lambertian full width at half maximum is 120° (common practice)', () => {
    const c = lambertianCurve(2);
    assertInDelta(c.find((p) => p.x === 60)!.y, 0.5, 1e-15);
    expect(c[0]).toEqual({ x: 0, y: 1 });
    expect(c[c.length - 1].x).toBe(90);
  });
});

describe('domeFarFieldChart(input)', () => {
  it('draws the trace, the Lambertian reference and a marker at half the beam angle', () => {
    const spec = domeFarFieldChart({ bins: lambertBins(), beamAngleDeg: 120, onAxisVsLambertian: 0.998 });
    expect(spec.series.map((s) => s.role ?? 'data')).toEqual(['data', 'data', 'marker']);
    expect(spec.series[2].points[0].x).toBe(60);
    expect(spec.x).toMatchObject({ min: 0, max: 90 });
    expect(spec.ariaLabel).toMatch(/beam angle \(full width at half maximum\) 120\.0°/);
    expect(spec.ariaLabel).toMatch(/1\.00 times/);
  });

  it('keeps the Lambertian reference when nothing escaped, so the chart is never blank', () => {
    const none = lambertBins().map((b) => ({ thetaDeg: b.thetaDeg, relativeIntensity: 0 }));
    const spec = domeFarFieldChart({ bins: none, beamAngleDeg: null, onAxisVsLambertian: null });
    expect(spec.series[0].points).toEqual([]);
    expect(spec.series[1].points.length).toBeGreaterThan(10);
    expect(spec.series).toHaveLength(2);
    expect(spec.ariaLabel).toMatch(/no light escaped/);
  });

  it('widens the axis past 90° (to 120° or 180°) when light leaves below the horizon', () => {
    const bins = lambertBins().map((b) => (b.thetaDeg > 90 && b.thetaDeg < 97 ? { ...b, relativeIntensity: 0.1 } : b));
    expect(farFieldExtentDeg({ bins, beamAngleDeg: 120, onAxisVsLambertian: 1, fullSphere: true })).toBe(120);
    expect(farFieldExtentDeg({ bins, beamAngleDeg: 120, onAxisVsLambertian: 1 })).toBe(90);
    const everywhere = bins.map((b) => ({ ...b, relativeIntensity: 1 }));
    const spec = domeFarFieldChart({ bins: everywhere, beamAngleDeg: 120, onAxisVsLambertian: 1, fullSphere: true });
    expect(spec.x.max).toBe(180);
    expect(spec.csv!.rows).toHaveLength(60);
  });

  it('tops the y axis at the next 0.2 above 1.1 × the peak (1.2 for a Lambertian)', () => {
    expect(domeFarFieldChart({ bins: lambertBins(), beamAngleDeg: 120, onAxisVsLambertian: 1 }).y.max).toBe(1.2);
    const tall = lambertBins().map((b) => ({ ...b, relativeIntensity: b.thetaDeg < 10 ? 3 : 0 }));
    expect(domeFarFieldChart({ bins: tall, beamAngleDeg: 20, onAxisVsLambertian: 3 }).y.max).toBe(3.4);
  });
});
