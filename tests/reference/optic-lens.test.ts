/**
 * Collimating lenses traced through their sampled profiles with vector Snell's law.
 * Sources: a hyperbolic interface of eccentricity e = n collimates a point source at its outer focus (E. Hecht,
 * Optics, 4th ed., §5.2.1, Cartesian surfaces); the plano-convex lens focuses at f = R/(n − 1) (lensmaker's
 * equation, Hecht §5.2.3) with spherical aberration growing with the ray height (Hecht §6.3.1).
 */
import { describe, expect, it } from 'vitest';
import { designOptic } from '../../src/lib/optic-design';
import { walkRay } from '../support/profile-ray';

function exitAngles(design: ReturnType<typeof designOptic>, rays: number, fraction = 1): number[] {
  const out: number[] = [];
  for (let i = 0; i < rays; i++) {
    const theta = (fraction * design.collectionHalfAngleRad * (i + 0.5)) / rays;
    const { d, events } = walkRay(design, [0, 0, 0], [Math.sin(theta), 0, Math.cos(theta)]);
    expect(events.map((e) => e.surface)).toEqual(['entry', 'exit']);
    out.push(Math.atan2(d[0], d[2]));
  }
  return out;
}

describe('aspheric (plano-hyperbolic) collimating lens', () => {
  for (const n of [1.41, 1.49, 1.585]) {
    it(`sends every ray from its focus parallel to the axis, n = ${n}`, () => {
      const lens = designOptic({ type: 'lens', exitDiameterMm: 20, heightMm: 20, n, toleranceMm: 1e-5 });
      const angles = exitAngles(lens, 500);
      // Chord sampling at 10 nm: the normal tilts by < 1e-3 rad over these segments; Snell scales it by < n − 1
      for (const a of angles) expect(Math.abs(a)).toBeLessThan(1e-3);
    });
  }

  it('its rim angle stays inside the hyperbola’s asymptotic cone acos(1/n)', () => {
    const lens = designOptic({ type: 'lens', exitDiameterMm: 20, heightMm: 20, n: 1.5 });
    expect(lens.collectionHalfAngleRad).toBeLessThan(Math.acos(1 / 1.5));
  });
});

describe('plano-convex lens focused on the source', () => {
  it('collimates paraxial rays and bends the marginal ones past the axis (spherical aberration)', () => {
    const lens = designOptic({ type: 'lens', shape: 'plano-convex', exitDiameterMm: 20, heightMm: 40, n: 1.49, toleranceMm: 1e-5 });
    // rays near the rim leave through the edge (the plane face bends them too little): stop at 0.9 of the rim
    const angles = exitAngles(lens, 400, 0.9);
    expect(Math.abs(angles[0])).toBeLessThan(1e-4); // paraxial: at the focus by design
    // Marginal rays are over-bent by a spherical surface (positive spherical aberration): they cross the axis
    expect(angles[angles.length - 1]).toBeLessThan(-0.01);
    // … and more so the higher they meet the lens
    for (let i = 40; i < angles.length; i += 40) expect(angles[i]).toBeLessThan(angles[i - 40]);
  });
});
