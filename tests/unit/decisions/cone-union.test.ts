import { describe, it, expect } from 'vitest';
import { coneUnionFraction } from '../../../src/lib/decisions/cone-union';
import { assertInDelta, EPS } from '../../support/assert';

const DEG = Math.PI / 180;

/** Independent check: share of N near-uniform Fibonacci-lattice directions with max |d_i| > cos θc. */
function latticeShare(thetaC: number, n = 200_000): number {
  const c = Math.cos(thetaC);
  const golden = Math.PI * (3 - Math.sqrt(5));
  let inside = 0;
  for (let i = 0; i < n; i++) {
    const z = 1 - (2 * (i + 0.5)) / n;
    const r = Math.sqrt(1 - z * z);
    const x = r * Math.cos(golden * i);
    const y = r * Math.sin(golden * i);
    if (Math.abs(x) > c || Math.abs(y) > c || Math.abs(z) > c) inside++;
  }
  return inside / n;
}

describe('coneUnionFraction(criticalAngleRad, axes)', () => {
  it('is 1 − cos θc for one axis (two opposite cones never overlap; 4 ε)', () => {
    for (const t of [5, 24.09, 41.81, 60, 89]) assertInDelta(coneUnionFraction(t * DEG, 1), 1 - Math.cos(t * DEG), 4 * EPS);
  });

  it('is 3 (1 − cos θc) for three axes while θc ≤ 45° (six disjoint cones; 8 ε)', () => {
    for (const t of [16.6, 24.09, 35.1, 45]) assertInDelta(coneUnionFraction(t * DEG, 3), 3 * (1 - Math.cos(t * DEG)), 8 * EPS);
  });

  it('is 1 once θc reaches acos(1/√3) = 54.74°: every direction has a cosine ≥ 1/√3 on some axis (1e-6)', () => {
    assertInDelta(coneUnionFraction(Math.acos(1 / Math.sqrt(3)), 3), 1, 1e-6);
    expect(coneUnionFraction(60 * DEG, 3)).toBe(1);
    expect(coneUnionFraction(Math.PI / 2, 3)).toBe(1);
  });

  it('agrees with a 200 000-point Fibonacci lattice over the sphere where cones overlap (lattice error ~1e-4; allow 5e-4)', () => {
    for (const t of [46, 48, 50, 53]) assertInDelta(coneUnionFraction(t * DEG, 3), latticeShare(t * DEG), 5e-4, `θc = ${t}°`);
  });

  it('is continuous at 45°, where the cones start to overlap (1e-6)', () => {
    const below = coneUnionFraction(45 * DEG, 3);
    const above = coneUnionFraction(45 * DEG + 1e-7, 3);
    assertInDelta(above, below, 1e-6);
  });

  it('rejects angles outside [0, π/2] and axes other than 1 or 3', () => {
    expect(() => coneUnionFraction(-0.1, 3)).toThrow(/criticalAngleRad must be a number in \[0, π\/2\]/);
    expect(() => coneUnionFraction(NaN, 1)).toThrow(RangeError);
    // @ts-expect-error — two axes is not a chip
    expect(() => coneUnionFraction(0.5, 2)).toThrow(/axes must be 1 or 3/);
  });
});
