import { describe, expect, it } from 'vitest';
import { spheroidExit } from '../../../src/lib/trace/spheroid-exit';
import { EPS, assertInDelta } from '../../support/assert';

const hit = new Float64Array(1);
const ray = (x: number, y: number, z: number, dx: number, dy: number, dz: number) => {
  const n = Math.hypot(dx, dy, dz);
  return Float64Array.of(x, y, z, dx / n, dy / n, dz / n);
};

describe('spheroidExit(ray, shell, hit)', () => {
  it('from the centre of a sphere reaches the surface at t = R in every direction (4 ε)', () => {
    const shell = Float64Array.of(2.5, 2.5);
    for (const d of [[1, 0, 0], [0, 0, 1], [1, 2, 3], [-1, 0.5, 0.2]]) {
      spheroidExit(ray(0, 0, 0, d[0], d[1], d[2]), shell, hit);
      assertInDelta(hit[0], 2.5, 4 * 2.5 * EPS);
    }
  });

  it('reaches the pole of a tall spheroid at t = h − z and the equator at t = R − x (4 ε)', () => {
    const shell = Float64Array.of(1, 3);
    spheroidExit(ray(0, 0, 0.5, 0, 0, 1), shell, hit);
    assertInDelta(hit[0], 2.5, 4 * 3 * EPS);
    spheroidExit(ray(0.25, 0, 0, 1, 0, 0), shell, hit);
    assertInDelta(hit[0], 0.75, 4 * EPS);
  });

  it('lands on the surface x²/R² + y²/R² + z²/h² = 1 for oblique rays from off-centre points (1e-14)', () => {
    const shell = Float64Array.of(2, 1.2);
    const r = ray(0.3, -0.2, 0.1, 0.4, 0.7, 0.6);
    spheroidExit(r, shell, hit);
    const t = hit[0];
    const x = r[0] + t * r[3];
    const y = r[1] + t * r[4];
    const z = r[2] + t * r[5];
    assertInDelta(x * x / 4 + y * y / 4 + z * z / 1.44, 1, 1e-14);
    expect(t).toBeGreaterThan(0);
  });

  it('from a point on the surface heading inward returns the chord length 2|B|/A, and never NaN outside', () => {
    const shell = Float64Array.of(1, 1);
    spheroidExit(ray(1, 0, 0, -1, 0, 0), shell, hit);
    assertInDelta(hit[0], 2, 4 * EPS);
    spheroidExit(ray(1.5, 0, 0, 0, 1, 0), shell, hit);
    expect(hit[0]).toBe(0);
  });
});
