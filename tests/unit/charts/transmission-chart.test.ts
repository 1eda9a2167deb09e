import { describe, expect, it } from 'vitest';
import { transmissionChart } from '../../../src/lib/charts/transmission-chart';
import { escapeCone, transmissionCurve } from '../../../src/lib/optics';
import { assertInDelta } from '../../support/assert';

describe('transmissionChart', () => {
  const curve = transmissionCurve(2.5, 1, 181);
  const cone = escapeCone(2.5, 1);
  const spec = transmissionChart(curve, cone.criticalAngleRad, 2.5, 1);
  const byLabel = (label: string) => spec.series.find((s) => s.label === label)!;

  it('has unpolarised, s and p series in percent over 0–90°, with axis titles that carry units', () => {
    expect(spec.series.map((s) => s.label)).toEqual(['Unpolarised', 's-polarised', 'p-polarised', 'Critical angle 23.58°']);
    expect(spec.x).toMatchObject({ title: 'Angle of incidence inside, θ (°)', min: 0, max: 90 });
    expect(spec.y).toMatchObject({ title: 'Transmittance T (%)', min: 0, max: 100 });
    for (const s of spec.series.slice(0, 3)) expect(s.points).toHaveLength(181);
  });

  it('at normal incidence T = 1 − ((2.5 − 1)/(2.5 + 1))² = 81.63 % (computed check value), for s, p and unpolarised', () => {
    for (const label of ['Unpolarised', 's-polarised', 'p-polarised']) {
      expect(byLabel(label).points[0].x).toBe(0);
      assertInDelta(byLabel(label).points[0].y, 100 * (1 - 0.1837), 0.01, label); // 4-digit check value: ±0.005 %
    }
  });

  it('2.5 → air at 20°: Ts = 1 − 0.4075, Tp = 1 − 0.02544 (computed check values, 4 digits)', () => {
    const i = 40; // 20° at 0.5° spacing
    expect(byLabel('s-polarised').points[i].x).toBe(20);
    assertInDelta(byLabel('s-polarised').points[i].y, 100 * (1 - 0.4075), 0.01);
    assertInDelta(byLabel('p-polarised').points[i].y, 100 * (1 - 0.02544), 0.001);
  });

  it('marks the critical angle asin(1/2.5) = 23.578° with a vertical line from 0 to 100 %', () => {
    const m = spec.series[3];
    expect(m.role).toBe('marker');
    assertInDelta(m.points[0].x, 23.578, 5e-4); // computed check value 23.58° (computed: θc = asin(n₂/n₁), Snell's law)
    expect(m.points.map((p) => p.y)).toEqual([0, 100]);
    expect(m.points[0].x).toBe(m.points[1].x);
    expect(spec.ariaLabel).toMatch(/critical angle, 23\.58 degrees/);
  });

  it('every sample beyond the critical angle is 0 % (total internal reflection)', () => {
    for (const p of byLabel('Unpolarised').points) if (p.x > 23.6) expect(p.y).toBe(0);
  });

  it('no marker and a plain statement when the surrounding index is not lower', () => {
    const none = transmissionChart(transmissionCurve(1.4, 1.6, 91), escapeCone(1.4, 1.6).criticalAngleRad, 1.4, 1.6);
    expect(none.series.some((s) => s.role === 'marker')).toBe(false);
    expect(none.ariaLabel).toMatch(/no critical angle/);
  });

  it('drops non-finite samples instead of passing NaN to the chart', () => {
    const s = transmissionChart({ angleDeg: [0, 45, 90], Ts: [1, NaN, 0], Tp: [1, 0.5, Infinity], T: [1, 0.5, 0] }, NaN, 2, 1);
    expect(s.series.map((x) => x.points.length)).toEqual([3, 2, 2]);
    expect(s.series.some((x) => x.role === 'marker')).toBe(false);
  });
});
