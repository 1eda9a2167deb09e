import { describe, expect, it } from 'vitest';
import { SIDE_BEHIND, SIDE_FRONT, SURFACE_STRIDE } from '../../../src/lib/trace/scene-layout';
import {
  intersectCylinder,
  intersectDisc,
  intersectFrustum,
  intersectRect,
  intersectSpheroidCap,
  surfaceNormal
} from '../../../src/lib/trace/shape-intersect';
import { packShape } from '../../../src/lib/trace/compile-scene';
import type { Shape } from '../../../src/lib/trace/scene';
import { EPS, assertInDelta } from '../../support/assert';

const hit = new Float64Array(1);
const ray = (x: number, y: number, z: number, dx: number, dy: number, dz: number) => {
  const n = Math.hypot(dx, dy, dz);
  return Float64Array.of(x, y, z, dx / n, dy / n, dz / n);
};

/** One surface record packed by the compiler, as the loop sees it (shape parameters from offset 1). */
function packed(shape: Shape): Float64Array {
  return packShape(shape, new Float64Array(SURFACE_STRIDE), 0);
}

describe('intersectRect', () => {
  const s = Float64Array.of(2, 0.15, 1, -0.5, 0.5, -0.25, 0.25); // z = 0.15, normal +z, |x| ≤ 0.5, |y| ≤ 0.25
  it('is met from the front only moving against the normal, and from behind only along it (distance to 2 ε)', () => {
    expect(intersectRect(s, 0, SIDE_FRONT, ray(0.1, 0, 1.25, 0, 0, -1), hit)).toBe(true);
    assertInDelta(hit[0], 1.1, 2 * EPS);
    expect(intersectRect(s, 0, SIDE_FRONT, ray(0.1, 0, 1.15, 0, 0, 1), hit)).toBe(false);
    expect(intersectRect(s, 0, SIDE_BEHIND, ray(0, 0, 0.05, 0, 0, 1), hit)).toBe(true);
    assertInDelta(hit[0], 0.1, 2 * EPS);
    expect(intersectRect(s, 0, SIDE_BEHIND, ray(0, 0, 0.05, 0, 0, -1), hit)).toBe(false);
  });
  it('misses outside its bounds and behind the ray, and a ray standing on it leaving', () => {
    expect(intersectRect(s, 0, SIDE_FRONT, ray(0.6, 0, 1, 0, 0, -1), hit)).toBe(false);
    expect(intersectRect(s, 0, SIDE_FRONT, ray(0, 0.3, 1, 0, 0, -1), hit)).toBe(false);
    expect(intersectRect(s, 0, SIDE_FRONT, ray(0, 0, 0.1, 0, 0, -1), hit)).toBe(false);
    expect(intersectRect(s, 0, SIDE_FRONT, ray(0, 0, 0.15, 0, 0.2, 1), hit)).toBe(false);
  });
});

describe('intersectDisc', () => {
  const s = Float64Array.of(0.8, 1, 0.25, 2.25); // annulus 0.5 ≤ r ≤ 1.5 at z = 0.8, normal +z
  it('hits inside the annulus from behind, and misses the hole and beyond the rim', () => {
    expect(intersectDisc(s, 0, SIDE_BEHIND, ray(1, 0, 0, 0, 0, 1), hit)).toBe(true);
    expect(hit[0]).toBe(0.8);
    expect(intersectDisc(s, 0, SIDE_BEHIND, ray(0.2, 0, 0, 0, 0, 1), hit)).toBe(false);
    expect(intersectDisc(s, 0, SIDE_BEHIND, ray(1.6, 0, 0, 0, 0, 1), hit)).toBe(false);
    expect(intersectDisc(s, 0, SIDE_FRONT, ray(1, 0, 0, 0, 0, 1), hit)).toBe(false);
  });
});

describe('intersectCylinder', () => {
  const s = Float64Array.of(2, 0, 1); // r = 2, 0 ≤ z ≤ 1
  it('leaves from inside at the far root and enters from outside at the near root (4 ε)', () => {
    expect(intersectCylinder(s, 0, SIDE_BEHIND, ray(0.5, 0, 0.5, 1, 0, 0), hit)).toBe(true);
    assertInDelta(hit[0], 1.5, 4 * EPS);
    expect(intersectCylinder(s, 0, SIDE_FRONT, ray(-3, 0, 0.5, 1, 0, 0), hit)).toBe(true);
    assertInDelta(hit[0], 1, 4 * EPS);
    expect(intersectCylinder(s, 0, SIDE_FRONT, ray(3, 0, 0.5, 1, 0, 0), hit)).toBe(false);
  });
  it('misses above its height and for a vertical ray', () => {
    expect(intersectCylinder(s, 0, SIDE_BEHIND, ray(0, 0, 0.5, 1, 0, 1), hit)).toBe(false);
    expect(intersectCylinder(s, 0, SIDE_BEHIND, ray(0, 0, 0.5, 0, 0, 1), hit)).toBe(false);
  });
});

describe('intersectFrustum', () => {
  const s = packed({ kind: 'frustum', r0: 1, z0: 0, r1: 2, z1: 1 });
  const p = 1; // S_P
  it('leaves a widening cup through its wall at the cone radius: horizontal ray at z = 0.5 meets r = 1.5 (4 ε)', () => {
    expect(intersectFrustum(s, p, SIDE_BEHIND, ray(0, 0, 0.5, 1, 0, 0), hit)).toBe(true);
    assertInDelta(hit[0], 1.5, 4 * EPS);
  });
  it('is not met by a steep ray leaving through the open top, nor below the floor', () => {
    expect(intersectFrustum(s, p, SIDE_BEHIND, ray(0.5, 0, 0.5, 0.2, 0, 1), hit)).toBe(false);
    expect(intersectFrustum(s, p, SIDE_BEHIND, ray(0, 0, 0.5, 1, 0, -1), hit)).toBe(false);
  });
  it('writes the outward normal of the cone, tilted down by its slope (4 ε)', () => {
    const n = new Float64Array(3);
    const at = Float64Array.of(1.5, 0, 0.5, 1, 0, 0);
    surfaceNormal(s, 0, SIDE_FRONT, at, n);
    assertInDelta(n[0], 1 / Math.SQRT2, 4 * EPS);
    assertInDelta(n[2], -1 / Math.SQRT2, 4 * EPS);
  });
});

describe('intersectSpheroidCap', () => {
  const s = packed({ kind: 'spheroid-cap', radius: 2, height: 1, zCentre: 0.8 });
  const p = 1;
  it('leaves a dome on a raised rim plane at the spheroid: straight up from the centre at h (4 ε)', () => {
    expect(intersectSpheroidCap(s, p, SIDE_BEHIND, ray(0, 0, 0.8, 0, 0, 1), hit)).toBe(true);
    assertInDelta(hit[0], 1, 4 * EPS);
  });
  it('is met from below the rim plane only where the crossing lies on the cap (z ≥ zCentre)', () => {
    // inside the cup, outside the spheroid's lower half, heading up and in: crosses the cap
    expect(intersectSpheroidCap(s, p, SIDE_BEHIND, ray(1.9, 0, 0.5, -1, 0, 1), hit)).toBe(true);
    // heading down: the crossing is on the lower half, not the cap
    expect(intersectSpheroidCap(s, p, SIDE_BEHIND, ray(0, 0, 1, 1, 0, -1), hit)).toBe(false);
  });
  it('is entered from outside at the near root, and a ray that just left does not meet it again', () => {
    expect(intersectSpheroidCap(s, p, SIDE_FRONT, ray(0, 0, 3, 0, 0, -1), hit)).toBe(true);
    assertInDelta(hit[0], 1.2, 4 * EPS);
    expect(intersectSpheroidCap(s, p, SIDE_FRONT, ray(0, 0, 1.8, 0.3, 0, 1), hit)).toBe(false);
  });
});
