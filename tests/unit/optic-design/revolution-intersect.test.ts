import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { buildRevolutionProfile, intersectRevolution, sampleCurve, straightFace } from '../../../src/lib/optic-design';
import { SEED } from '../../property/support';

const R = 3;
const tol = 1e-4;
// Sphere of radius R centred at (0, 0, 5), sampled from the bottom pole up (outward normal away from the centre)
const sphere = buildRevolutionProfile([
  sampleCurve('sphere', (u, o) => { o[0] = R * Math.sin(u); o[1] = 5 - R * Math.cos(u); }, 0, Math.PI, tol)
]);

/** Nearest t > 0 of the ray with the exact sphere, or Infinity. */
function sphereT(o: number[], d: number[]): number {
  const ox = o[0], oy = o[1], oz = o[2] - 5;
  const b = ox * d[0] + oy * d[1] + oz * d[2];
  const c = ox * ox + oy * oy + oz * oz - R * R;
  const disc = b * b - c;
  if (disc < 0) return Infinity;
  const t1 = -b - Math.sqrt(disc);
  const t2 = -b + Math.sqrt(disc);
  return t1 > 0 ? t1 : t2 > 0 ? t2 : Infinity;
}

describe('intersectRevolution(profile, ray, tMin, out)', () => {
  const out = new Float64Array(4);

  it('agrees with the exact sphere to the chord tolerance over the incidence (rays from outside and inside)', () => {
    let checked = 0;
    for (let i = 0; i < 400; i++) {
      // deterministic origins on a shell of radius 8 around the centre, aimed at points inside the sphere
      const a = i * 2.399963;
      const zc = 1 - (2 * (i + 0.5)) / 400;
      const o = [8 * Math.sqrt(1 - zc * zc) * Math.cos(a), 8 * Math.sqrt(1 - zc * zc) * Math.sin(a), 5 + 8 * zc];
      const target = [0.9 * Math.cos(3 * a), 0.9 * Math.sin(5 * a), 5 + 0.9 * Math.cos(7 * a)];
      const d = [target[0] - o[0], target[1] - o[1], target[2] - o[2]];
      const len = Math.hypot(d[0], d[1], d[2]);
      for (let k = 0; k < 3; k++) d[k] /= len;
      const exact = sphereT(o, d);
      const t = intersectRevolution(sphere, Float64Array.of(...o, ...d), 0, out);
      // the chords lie inside the sphere by ≤ tol: along the ray that is ≤ tol / cos(incidence)
      const px = o[0] + exact * d[0], py = o[1] + exact * d[1], pz = o[2] + exact * d[2] - 5;
      const cosI = Math.abs(px * d[0] + py * d[1] + pz * d[2]) / R;
      expect(t).toBeGreaterThanOrEqual(exact - 1e-12);
      expect(t - exact).toBeLessThanOrEqual(tol / cosI + 1e-12);
      // outward normal within the chord's tilt of the sphere's
      const nDot = (out[0] * px + out[1] * py + out[2] * pz) / R;
      expect(nDot).toBeGreaterThan(Math.cos(0.02));
      // from inside (just past the entry) the far side is found
      const inside = [o[0] + (t + 1e-6) * d[0], o[1] + (t + 1e-6) * d[1], o[2] + (t + 1e-6) * d[2]];
      const t2 = intersectRevolution(sphere, Float64Array.of(...inside, ...d), 0, out);
      expect(Math.abs(t2 - sphereT(inside, d))).toBeLessThanOrEqual(tol / 0.05 + 1e-9);
      checked++;
    }
    expect(checked).toBe(400);
  });

  it('agrees with the exact paraboloid z = r²/(4f) − f for rays from its focus (to the chord tolerance)', () => {
    const f = 2;
    const para = buildRevolutionProfile([
      sampleCurve('p', (u, o) => { o[0] = u; o[1] = (u * u) / (4 * f) - f; }, 0, 10, tol)
    ]);
    for (let i = 0; i < 300; i++) {
      const th = 0.3 + (2.6 * (i + 0.5)) / 300; // from the focus, angle from +z
      const d = [Math.sin(th), 0, Math.cos(th)];
      const exact = (2 * f) / (1 - Math.cos(th));
      if (exact * Math.sin(th) > 10) continue;
      const t = intersectRevolution(para, Float64Array.of(0, 0, 0, ...d), 0, out);
      // a ray from the focus meets the mirror at incidence (π − θ)/2: cos i = sin(θ/2)
      expect(Math.abs(t - exact), `θ = ${th}`).toBeLessThanOrEqual(tol / Math.sin(th / 2) + 1e-9);
    }
  });

  it('a ray along the axis meets the pole with the axial normal', () => {
    const t = intersectRevolution(sphere, Float64Array.of(0, 0, -1, 0, 0, 1), 0, out);
    expect(t).toBeCloseTo(3, 12);
    expect([out[0], out[1], out[2]]).toEqual([0, 0, -1]);
    const up = intersectRevolution(sphere, Float64Array.of(0, 0, 5, 0, 0, 1), 0, out);
    expect(up).toBeCloseTo(3, 12);
    expect(out[2]).toBe(1);
  });

  it('flat annulus, cylinder and misses', () => {
    const cup = buildRevolutionProfile([straightFace('floor', 0, 0, 2, 0), straightFace('wall', 2, 0, 2, 4)]);
    expect(intersectRevolution(cup, Float64Array.of(1, 1, 3, 0, 0, -1), 0, out)).toBeCloseTo(3, 14);
    expect(out[2]).toBe(-1);
    expect(intersectRevolution(cup, Float64Array.of(0, 0, 2, 1, 0, 0), 0, out)).toBeCloseTo(2, 14);
    expect(out[0]).toBeCloseTo(1, 14);
    expect(intersectRevolution(cup, Float64Array.of(0, 0, 5, 1, 0, 0), 0, out)).toBe(Infinity); // above the band
    expect(intersectRevolution(cup, Float64Array.of(3, 0, 2, 0, 1, 0), 0, out)).toBe(Infinity); // passes outside
    expect(intersectRevolution(cup, Float64Array.of(0, 0, 2, 1, 0, 0), 2.5, out)).toBe(Infinity); // tMin beyond the wall
  });

  it('grazing rays: tangent to the cylinder counts once, parallel to a cone generatrix is found', () => {
    const cyl = buildRevolutionProfile([straightFace('wall', 2, 0, 2, 4)]);
    const t = intersectRevolution(cyl, Float64Array.of(2, -5, 1, 0, 1, 0), 0, out);
    expect(t).toBeCloseTo(5, 6);
    const cone = buildRevolutionProfile([straightFace('cone', 0, 0, 2, 2)]); // 45° cone, apex at the origin
    // a ray parallel to the generatrix on the far side, starting on the axis above the apex
    const tc = intersectRevolution(cone, Float64Array.of(0, 0, 1, Math.SQRT1_2, 0, Math.SQRT1_2), 0, out);
    expect(tc).toBe(Infinity); // parallel to the generatrix through (0,0,1): never meets the cone
    const tp = intersectRevolution(cone, Float64Array.of(-1, 0, 0.5, Math.SQRT1_2, 0, Math.SQRT1_2), 0, out);
    expect(tp).toBeCloseTo(Math.SQRT1_2 / 2, 12); // the single root of the linear case: hits at (−0.75, 0, 0.75)
  });

  it('a gap between two surfaces is not a face', () => {
    const p = buildRevolutionProfile([straightFace('a', 1, 0, 1, 1), straightFace('b', 3, 2, 3, 3)]);
    expect(p.surfaceOfSegment[1]).toBe(-1);
    expect(intersectRevolution(p, Float64Array.of(0, 0, 1.5, 1, 0, 0), 0, out)).toBe(Infinity);
  });

  it('never returns NaN, and a hit lies on the surface with a unit normal (property)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -20, max: 20, noNaN: true }), { minLength: 6, maxLength: 6 }),
        ([ox, oy, oz, dx, dy, dz]) => {
          const len = Math.hypot(dx, dy, dz);
          fc.pre(len > 1e-6);
          const t = intersectRevolution(sphere, Float64Array.of(ox, oy, oz, dx / len, dy / len, dz / len), 0, out);
          if (Number.isNaN(t)) return false;
          if (t === Infinity) return true;
          const n = Math.hypot(out[0], out[1], out[2]);
          const px = ox + (t * dx) / len, py = oy + (t * dy) / len, pz = oz + (t * dz) / len - 5;
          return t > 0 && Math.abs(n - 1) < 1e-12 && Math.abs(Math.hypot(px, py, pz) - R) <= tol + 1e-9;
        }
      ),
      { seed: SEED, numRuns: 3000 }
    );
  });
});
