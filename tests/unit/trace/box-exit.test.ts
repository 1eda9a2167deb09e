import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import * as S from '../../../src/lib/trace/box-exit';

const boxExit = (r: Float64Array, b: Float64Array, h: Float64Array) => S.boxExit(r, b, MEDIUM_STRIDE + M_BOX_A, h);
import { MEDIUM_STRIDE, M_BOX_A } from '../../../src/lib/trace/scene-layout';
import { EPS, assertInDelta } from '../../support/assert';

// Box [−0.5, 0.5] × [−0.25, 0.25] × [0, 0.1] mm, as the second record of a medium table
const box = new Float64Array(2 * MEDIUM_STRIDE);
box.set([0.5, 0.25, 0, 0.1], MEDIUM_STRIDE + M_BOX_A);
const hit = new Float64Array(1);
const ray = (x: number, y: number, z: number, dx: number, dy: number, dz: number) => {
  const n = Math.hypot(dx, dy, dz);
  return Float64Array.of(x, y, z, dx / n, dy / n, dz / n);
};

describe('boxExit(ray, box, offset, hit)', () => {
  it.each([
    [ray(0, 0, 0.05, 1, 0, 0), S.FACE_X_POS, 0.5],
    [ray(0, 0, 0.05, -1, 0, 0), S.FACE_X_NEG, 0.5],
    [ray(0, 0, 0.05, 0, 1, 0), S.FACE_Y_POS, 0.25],
    [ray(0, 0, 0.05, 0, -1, 0), S.FACE_Y_NEG, 0.25],
    [ray(0, 0, 0.05, 0, 0, 1), S.FACE_Z_POS, 0.05],
    [ray(0, 0, 0.05, 0, 0, -1), S.FACE_Z_NEG, 0.05]
  ])('leaves an axis ray through the face ahead (%#) at the wall distance (exact)', (r, face, t) => {
    expect(boxExit(r, box, hit)).toBe(face);
    expect(hit[0]).toBe(t);
  });

  it('picks the nearest wall for an oblique ray: t = min over axes of (wall − p)/d (2 ε)', () => {
    // from the centre of the floor toward (1, 1, 1): x wall at 0.5√3, y at 0.25√3, top at 0.1√3
    const r = ray(0, 0, 0, 1, 1, 1);
    expect(boxExit(r, box, hit)).toBe(S.FACE_Z_POS);
    assertInDelta(hit[0], 0.1 * Math.sqrt(3), 2 * EPS);
    const flat = ray(0.4, 0, 0.05, 1, 1, 0.01);
    expect(boxExit(flat, box, hit)).toBe(S.FACE_X_POS);
    assertInDelta(hit[0], 0.1 / flat[3], 2 * EPS);
  });

  it('returns t = 0 (not negative) for a point a hair outside after roundoff, and −1 for a zero direction', () => {
    expect(boxExit(Float64Array.of(0.5 + 1e-16, 0, 0.05, 1, 0, 0), box, hit)).toBe(S.FACE_X_POS);
    expect(hit[0]).toBe(0);
    expect(boxExit(Float64Array.of(0, 0, 0.05, 0, 0, 0), box, hit)).toBe(-1);
  });

  it('agrees with t = min over axes of (wall − p)/d for random inside points and directions (1e-12 relative)', () => {
    const coord = (h: number) => fc.double({ min: -h, max: h, noNaN: true });
    const comp = fc.double({ min: -1, max: 1, noNaN: true });
    fc.assert(
      fc.property(coord(0.5), coord(0.25), fc.double({ min: 0, max: 0.1, noNaN: true }), comp, comp, comp, (x, y, z, a, b, c) => {
        const n = Math.hypot(a, b, c);
        fc.pre(n > 1e-3);
        const r = Float64Array.of(x, y, z, a / n, b / n, c / n);
        const walls = [
          r[3] > 0 ? (0.5 - x) / r[3] : r[3] < 0 ? (-0.5 - x) / r[3] : Infinity,
          r[4] > 0 ? (0.25 - y) / r[4] : r[4] < 0 ? (-0.25 - y) / r[4] : Infinity,
          r[5] > 0 ? (0.1 - z) / r[5] : r[5] < 0 ? -z / r[5] : Infinity
        ];
        const tMin = Math.min(...walls);
        boxExit(r, box, hit);
        expect(Math.abs(hit[0] - tMin)).toBeLessThanOrEqual(1e-12 * Math.max(1, tMin));
      }),
      { seed: 7, numRuns: 2000 }
    );
  });
});

describe('boxExit on a raised box (a chip layer above another)', () => {
  it('measures the bottom wall from z0 (exact)', () => {
    const layer = new Float64Array(MEDIUM_STRIDE);
    layer.set([0.5, 0.25, 0.125, 0.25], M_BOX_A);
    const r = Float64Array.of(0, 0, 0.2, 0, 0, -1);
    expect(S.boxExit(r, layer, M_BOX_A, hit)).toBe(S.FACE_Z_NEG);
    expect(hit[0]).toBe(0.2 - 0.125);
  });
});
