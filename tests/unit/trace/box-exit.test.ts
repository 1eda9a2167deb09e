import { describe, expect, it } from 'vitest';
import { boxExit } from '../../../src/lib/trace/box-exit';
import * as S from '../../../src/lib/trace/surfaces';
import { EPS, assertInDelta } from '../../support/assert';

// Box [−0.5, 0.5] × [−0.25, 0.25] × [0, 0.1] mm
const box = Float64Array.of(0.5, 0.25, 0.1);
const hit = new Float64Array(1);
const ray = (x: number, y: number, z: number, dx: number, dy: number, dz: number) => {
  const n = Math.hypot(dx, dy, dz);
  return Float64Array.of(x, y, z, dx / n, dy / n, dz / n);
};

describe('boxExit(ray, box, hit)', () => {
  it.each([
    [ray(0, 0, 0.05, 1, 0, 0), S.CHIP_X_POS, 0.5],
    [ray(0, 0, 0.05, -1, 0, 0), S.CHIP_X_NEG, 0.5],
    [ray(0, 0, 0.05, 0, 1, 0), S.CHIP_Y_POS, 0.25],
    [ray(0, 0, 0.05, 0, -1, 0), S.CHIP_Y_NEG, 0.25],
    [ray(0, 0, 0.05, 0, 0, 1), S.CHIP_TOP, 0.05],
    [ray(0, 0, 0.05, 0, 0, -1), S.CHIP_BOTTOM, 0.05]
  ])('leaves an axis ray through the face ahead (%#) at the wall distance (exact)', (r, face, t) => {
    expect(boxExit(r, box, hit)).toBe(face);
    expect(hit[0]).toBe(t);
  });

  it('picks the nearest wall for an oblique ray: t = min over axes of (wall − p)/d (2 ε)', () => {
    // from the centre of the floor toward (1, 1, 1): x wall at 0.5√3, y at 0.25√3, top at 0.1√3
    const r = ray(0, 0, 0, 1, 1, 1);
    expect(boxExit(r, box, hit)).toBe(S.CHIP_TOP);
    assertInDelta(hit[0], 0.1 * Math.sqrt(3), 2 * EPS);
    const flat = ray(0.4, 0, 0.05, 1, 1, 0.01);
    expect(boxExit(flat, box, hit)).toBe(S.CHIP_X_POS);
    assertInDelta(hit[0], 0.1 / flat[3], 2 * EPS);
  });

  it('returns t = 0 (not negative) for a point a hair outside after roundoff, and NONE for a zero direction', () => {
    expect(boxExit(Float64Array.of(0.5 + 1e-16, 0, 0.05, 1, 0, 0), box, hit)).toBe(S.CHIP_X_POS);
    expect(hit[0]).toBe(0);
    expect(boxExit(Float64Array.of(0, 0, 0.05, 0, 0, 0), box, hit)).toBe(S.SURFACE_NONE);
  });
});
