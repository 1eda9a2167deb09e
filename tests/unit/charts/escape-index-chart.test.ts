import { describe, expect, it } from 'vitest';
import { escapeIndexChart } from '../../../src/lib/charts/escape-index-chart';
import { escapeCone } from '../../../src/lib/optics';
import { assertInDelta } from '../../support/assert';

describe('escapeIndexChart', () => {
  const spec = escapeIndexChart(2.5, 1.5, escapeCone, 60);
  const [geo, fres, marker] = spec.series;
  const at = (pts: { x: number; y: number }[], x: number) => pts.find((p) => Math.abs(p.x - x) < 1e-12)!;

  it('samples the surrounding index from 1.0 up to the inside index, 61 points', () => {
    expect(geo.points).toHaveLength(61);
    expect(geo.points[0].x).toBe(1);
    expect(geo.points[60].x).toBe(2.5);
    expect(spec.x).toMatchObject({ title: 'Surrounding index nₒᵤₜ', min: 1, max: 2.5 });
    expect(spec.y.title).toBe('Escape, one face (%)');
  });

  // Check values computed from the escape-cone integral (Schubert, Light-Emitting Diodes, 2nd ed., ch. 5) (given to 4 digits: tolerance half a unit).
  it('2.5 → 1: geometric 4.174 %, Fresnel-weighted 3.243 %', () => {
    assertInDelta(at(geo.points, 1).y, 4.174, 0.0005);
    assertInDelta(at(fres.points, 1).y, 3.243, 0.0005);
  });

  it('2.5 → 1.5: geometric 10.00 %, Fresnel-weighted 8.796 %', () => {
    assertInDelta(at(geo.points, 1.5).y, 10.0, 0.005);
    assertInDelta(at(fres.points, 1.5).y, 8.796, 0.0005);
  });

  it('at n_out = n_in the whole facing hemisphere escapes: geometric 50 % and no Fresnel loss (exact)', () => {
    assertInDelta(at(geo.points, 2.5).y, 50, 1e-12);
    assertInDelta(at(fres.points, 2.5).y, 50, 1e-9);
  });

  it('both curves rise with the surrounding index, Fresnel never above geometric', () => {
    for (let i = 1; i < geo.points.length; i++) {
      expect(geo.points[i].y).toBeGreaterThan(geo.points[i - 1].y);
      expect(fres.points[i].y).toBeGreaterThan(fres.points[i - 1].y);
      expect(fres.points[i].y).toBeLessThanOrEqual(geo.points[i].y + 1e-12);
    }
  });

  it('marks the chosen surrounding index with a vertical line and states its value in the aria label', () => {
    expect(marker.role).toBe('marker');
    expect(marker.points.map((p) => p.x)).toEqual([1.5, 1.5]);
    expect(spec.ariaLabel).toMatch(/chosen surrounding index 1\.5 the Fresnel-weighted fraction is 8\.8 percent/);
  });

  it('widens a degenerate range (inside index 1) so there is still a curve', () => {
    const s = escapeIndexChart(1, 1, escapeCone, 10);
    expect(s.x.max).toBeCloseTo(1.05, 12);
    expect(s.series[0].points).toHaveLength(11);
  });

  it('extends the range when the chosen surrounding index is above the inside index', () => {
    expect(escapeIndexChart(1.5, 1.8, escapeCone).x.max).toBe(1.8);
  });

  it('drops samples that come back non-finite', () => {
    const s = escapeIndexChart(2, 1, (_a, b) => ({ geometric: b > 1.5 ? NaN : 0.1, fresnel: 0.05 }), 10);
    expect(s.series[0].points.length).toBe(6);
    expect(s.series[1].points.length).toBe(11);
  });
});
