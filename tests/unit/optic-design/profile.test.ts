import { describe, expect, it } from 'vitest';
import { sampleCurve } from '../../../src/lib/optic-design';

describe('sampleCurve(name, point, u0, u1, toleranceMm)', () => {
  for (const tol of [1e-2, 1e-4, 1e-6]) {
    it(`keeps every chord of a circle within ${tol} mm (sagitta R − √(R² − (c/2)²))`, () => {
      const R = 5;
      const s = sampleCurve('arc', (u, o) => { o[0] = R * Math.sin(u); o[1] = R * Math.cos(u); }, 0, Math.PI / 2, tol);
      let worst = 0;
      for (let i = 0; i + 1 < s.r.length; i++) {
        const c = Math.hypot(s.r[i + 1] - s.r[i], s.z[i + 1] - s.z[i]);
        worst = Math.max(worst, R - Math.sqrt(R * R - (c / 2) ** 2));
      }
      expect(worst).toBeLessThanOrEqual(tol);
      expect(worst).toBeGreaterThan(tol / 8); // not oversampled: halving stops one step after the tolerance holds
      expect(s.r[0]).toBe(0);
      expect(s.z[s.z.length - 1]).toBeCloseTo(0, 12);
    });
  }

  it('a straight line needs only the minimum segments', () => {
    const s = sampleCurve('line', (u, o) => { o[0] = u; o[1] = 2 * u; }, 0, 1, 1e-9, 4);
    expect(s.r.length).toBe(5);
  });
});
