import { describe, expect, it } from 'vitest';
import { designOptic, paraboloidFocalLengthMm, type OpticDesign, type OpticDesignOptions } from '../../../src/lib/optic-design';
import { expectClose } from '../../support/assert';

const solids: [string, OpticDesignOptions][] = [
  ['aspheric lens', { type: 'lens', exitDiameterMm: 20, heightMm: 20, n: 1.49 }],
  ['plano-convex lens', { type: 'lens', shape: 'plano-convex', exitDiameterMm: 20, heightMm: 30, n: 1.49 }],
  ['TIR, flat exit', { type: 'tir', exitDiameterMm: 20, heightMm: 12, n: 1.49, gapMm: 0.2 }],
  ['TIR, exit lens', { type: 'tir', exitDiameterMm: 20, heightMm: 12, n: 1.49, exitFace: 'lens' }]
];

/** Shoelace area of the closed meridian polygon (surfaces in order, closed along the axis), (r right, z up). */
function signedArea(d: OpticDesign): number {
  const r: number[] = [];
  const z: number[] = [];
  for (const s of d.surfaces) for (let i = 0; i < s.r.length; i++) { r.push(s.r[i]); z.push(s.z[i]); }
  let a = 0;
  for (let i = 0; i < r.length; i++) {
    const j = (i + 1) % r.length;
    a += r[i] * z[j] - r[j] * z[i];
  }
  return a / 2;
}

describe('designed solids', () => {
  for (const [what, options] of solids) {
    it(`${what}: faces meet end to end, start and end on the axis, and run counter-clockwise (the solid on the left, the outward normal on the right)`, () => {
      const d = designOptic(options);
      const s = d.surfaces;
      expect(s[0].r[0]).toBe(0);
      expect(s[s.length - 1].r.at(-1)).toBe(0);
      for (let k = 0; k + 1 < s.length; k++) {
        expect(s[k + 1].r[0], `${s[k].name} → ${s[k + 1].name}`).toBe(s[k].r.at(-1));
        expect(s[k + 1].z[0], `${s[k].name} → ${s[k + 1].name}`).toBe(s[k].z.at(-1));
      }
      expect(signedArea(d)).toBeGreaterThan(0);
      for (const f of s) for (let i = 0; i < f.r.length; i++) expect(Number.isFinite(f.r[i]) && Number.isFinite(f.z[i]) && f.r[i] >= 0).toBe(true);
      // the optic keeps to its box: exit radius, gap … top
      for (const f of s) for (let i = 0; i < f.r.length; i++) {
        expect(f.r[i]).toBeLessThanOrEqual(options.exitDiameterMm / 2 + 1e-12);
        expect(f.z[i]).toBeGreaterThanOrEqual((options.gapMm ?? 0) - 1e-12);
        expect(f.z[i]).toBeLessThanOrEqual(d.heightMm + 1e-12);
      }
    });
  }
});

describe('paraboloid', () => {
  it('f = (√(H² + R²) − H)/2 puts the rim (R, H) on z = r²/(4f) − f', () => {
    for (const [R, H] of [[10, 12], [5, 1], [30, 80]]) {
      const f = paraboloidFocalLengthMm(R, H);
      expectClose(f, (Math.hypot(H, R) - H) / 2, { rel: 1e-14 });
      expectClose((R * R) / (4 * f) - f, H, { rel: 1e-13 });
    }
  });

  it('every profile point lies on the paraboloid and the rim angle is atan(R/H)', () => {
    const d = designOptic({ type: 'reflector', exitDiameterMm: 20, heightMm: 12 });
    const f = d.focalLengthMm as number;
    const m = d.surfaces[0];
    for (let i = 0; i < m.r.length; i++) expectClose(m.z[i], (m.r[i] * m.r[i]) / (4 * f) - f, { abs: 1e-12 });
    expectClose(m.r[0], 2 * f, { abs: 1e-12 }); // the base at the focal plane: the latus rectum's end
    expectClose(d.rimAngleRad, Math.atan2(10, 12), { abs: 1e-15 });
  });
});

describe('TIR collimator', () => {
  it('its outer wall stays outside the cavity and rises monotonically to the exit rim', () => {
    const d = designOptic({ type: 'tir', exitDiameterMm: 20, heightMm: 12, n: 1.49 });
    const wall = d.surfaces.find((s) => s.name === 'tir-wall')!;
    for (let i = 0; i < wall.r.length; i++) expect(wall.r[i]).toBeGreaterThan(d.cavityRadiusMm as number);
    for (let i = 1; i < wall.r.length; i++) {
      expect(wall.z[i]).toBeGreaterThan(wall.z[i - 1]);
      expect(wall.r[i]).toBeGreaterThan(wall.r[i - 1]);
    }
    expect(wall.r.at(-1)).toBe(10);
    expect(wall.z.at(-1)).toBe(12);
  });

  it('a given split angle is kept; one beyond the floor hyperbola’s asymptote is refused', () => {
    const d = designOptic({ type: 'tir', exitDiameterMm: 20, heightMm: 12, n: 1.49, splitAngleDeg: 15 });
    expectClose(d.splitAngleRad as number, (15 * Math.PI) / 180, { abs: 1e-15 });
    expect(() => designOptic({ type: 'tir', exitDiameterMm: 20, heightMm: 12, n: 1.2, splitAngleDeg: 40 })).toThrowError(
      /^splitAngleDeg must be below acos\(1\/n\) = 33\.6° at n = 1\.2 \(got 40\)$/
    );
  });
});
