import { describe, expect, it } from 'vitest';
import { cylinderExit } from '../../../src/lib/trace/cylinder-exit';
import * as S from '../../../src/lib/trace/surfaces';
import { EPS, assertInDelta } from '../../support/assert';

const hit = new Float64Array(1);
const shell = Float64Array.of(2, 1); // R = 2 mm, h = 1 mm
const ray = (x: number, y: number, z: number, dx: number, dy: number, dz: number) => {
  const n = Math.hypot(dx, dy, dz);
  return Float64Array.of(x, y, z, dx / n, dy / n, dz / n);
};

describe('cylinderExit(ray, shell, hit)', () => {
  it('leaves a horizontal ray from the axis through the wall at t = R (2 ε)', () => {
    expect(cylinderExit(ray(0, 0, 0.5, 0.6, 0.8, 0), shell, hit)).toBe(S.CYLINDER_SIDE);
    assertInDelta(hit[0], 2, 2 * 2 * EPS);
  });

  it('leaves a steep ray through the flat top at t = (h − z)/dz (2 ε)', () => {
    const r = ray(0, 0, 0.2, 0.1, 0, 1);
    expect(cylinderExit(r, shell, hit)).toBe(S.CYLINDER_TOP);
    assertInDelta(hit[0], 0.8 / r[5], 2 * EPS);
  });

  it('meets the wall at x² + y² = R² from an off-axis point (1e-14)', () => {
    const r = ray(1, 0.5, 0.1, -0.3, 0.9, 0.05);
    expect(cylinderExit(r, shell, hit)).toBe(S.CYLINDER_SIDE);
    const x = r[0] + hit[0] * r[3];
    const y = r[1] + hit[0] * r[4];
    assertInDelta(x * x + y * y, 4, 1e-14);
  });

  it('finds no wall or top for a ray going straight down (the base is the caller’s)', () => {
    expect(cylinderExit(ray(0.5, 0, 0.5, 0, 0, -1), shell, hit)).toBe(S.SURFACE_NONE);
    expect(hit[0]).toBe(Infinity);
  });
});
