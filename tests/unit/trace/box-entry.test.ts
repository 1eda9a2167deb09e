import { describe, expect, it } from 'vitest';
import { boxEntry } from '../../../src/lib/trace/box-entry';
import * as S from '../../../src/lib/trace/surfaces';
import { EPS, assertInDelta } from '../../support/assert';

// Box [−0.5, 0.5] × [−0.5, 0.5] × [0, 0.2] mm, self-hit distance 1e-12 mm
const box = Float64Array.of(0.5, 0.5, 0.2, 1e-12);
const hit = new Float64Array(1);
const ray = (x: number, y: number, z: number, dx: number, dy: number, dz: number) => {
  const n = Math.hypot(dx, dy, dz);
  return Float64Array.of(x, y, z, dx / n, dy / n, dz / n);
};

describe('boxEntry(ray, box, hit)', () => {
  it('enters through the side facing the ray (exact axis distances)', () => {
    expect(boxEntry(ray(2, 0, 0.1, -1, 0, 0), box, hit)).toBe(S.CHIP_X_POS);
    expect(hit[0]).toBe(1.5);
    expect(boxEntry(ray(-2, 0, 0.1, 1, 0, 0), box, hit)).toBe(S.CHIP_X_NEG);
    expect(boxEntry(ray(0, 3, 0.1, 0, -1, 0), box, hit)).toBe(S.CHIP_Y_POS);
    expect(hit[0]).toBe(2.5);
    expect(boxEntry(ray(0, -3, 0.1, 0, 1, 0), box, hit)).toBe(S.CHIP_Y_NEG);
    expect(boxEntry(ray(0.1, 0.1, 1, 0, 0, -1), box, hit)).toBe(S.CHIP_TOP);
    assertInDelta(hit[0], 0.8, EPS);
  });

  it('enters through the top for a ray coming down at a slant (slab method, 2 ε)', () => {
    // from (−0.9, 0, 0.7) toward (1, 0, −1): drops 0.5 to the top z = 0.2 at x = −0.4, inside; t = 0.5√2
    const r = ray(-0.9, 0, 0.7, 1, 0, -1);
    expect(boxEntry(r, box, hit)).toBe(S.CHIP_TOP);
    assertInDelta(hit[0], 0.5 * Math.SQRT2, 2 * EPS);
  });

  it('misses a ray passing beside or above the box, and a ray parallel to a slab outside it', () => {
    expect(boxEntry(ray(2, 0.6, 0.1, -1, 0, 0), box, hit)).toBe(S.SURFACE_NONE);
    expect(boxEntry(ray(2, 0, 0.3, -1, 0, 0), box, hit)).toBe(S.SURFACE_NONE);
    expect(boxEntry(ray(2, 0, 0.1, 1, 0, 0), box, hit)).toBe(S.SURFACE_NONE);
    expect(boxEntry(ray(0, 0, 0.5, 0, 0, 1), box, hit)).toBe(S.SURFACE_NONE);
  });

  it('does not hit the face a ray stands on when it leaves or was reflected off it', () => {
    expect(boxEntry(ray(0.5, 0, 0.1, 1, 0, 0.3), box, hit)).toBe(S.SURFACE_NONE);
    expect(boxEntry(ray(0.1, 0.2, 0.2, 0.3, 0, 1), box, hit)).toBe(S.SURFACE_NONE);
  });
});
