/**
 * Paraboloid reflector with a point source at its focus, traced through the sampled profile.
 * Sources: the focal property of the parabola (every ray from the focus reflects parallel to the axis —
 * E. Hecht, Optics, 4th ed., §5.4.3 on mirrors / any analytic geometry text); Lambert's cosine law I(θ) = I0 cos θ
 * (common practice), so the flux of a Lambertian point source within θ of the axis is sin² θ of the hemisphere's
 * and a mirror from θ_rim to 90° receives cos² θ_rim — θ_rim being the rim angle, between the axis and the line from
 * the focus to the open front rim (atan(R/H) for a rim of radius R at height H above the focus).
 */
import { describe, expect, it } from 'vitest';
import { designOptic, lambertianFractionOnMirror } from '../../src/lib/optic-design';
import { walkRay } from '../support/profile-ray';
import { expectClose } from '../support/assert';

describe('paraboloid reflector, point source at the focus', () => {
  const tol = 1e-4;
  const design = designOptic({ type: 'reflector', exitDiameterMm: 20, heightMm: 12, toleranceMm: tol });

  /** Largest angle from the axis of the reflected rays over a deterministic fan of 3 × rays directions. */
  function worstDeviation(d: typeof design, rays: number): number {
    let worst = 0;
    for (const phi of [0, 1.1, 2.9]) {
      for (let i = 0; i < rays; i++) {
        const theta = d.rimAngleRad + ((Math.PI / 2 - d.rimAngleRad) * (i + 0.5)) / rays;
        const dir = [Math.sin(theta) * Math.cos(phi), Math.sin(theta) * Math.sin(phi), Math.cos(theta)];
        const { d: out, events } = walkRay(d, [0, 0, 0], dir);
        expect(events.length, `θ = ${theta}`).toBe(1);
        worst = Math.max(worst, Math.acos(Math.min(1, out[2])));
      }
    }
    return worst;
  }

  it('every ray from the focus that meets the mirror leaves parallel to the axis, to the chord sampling', () => {
    // A chord of sagitta s and length L tilts the normal by up to 4s/L, and the reflected ray by twice that:
    // the deviation shrinks like √tolerance (s ∝ L²). 100× finer sampling must give about 10× less deviation.
    const coarse = worstDeviation(design, 2000);
    const fine = worstDeviation(designOptic({ type: 'reflector', exitDiameterMm: 20, heightMm: 12, toleranceMm: tol / 100 }), 2000);
    expect(coarse).toBeLessThan(0.01); // 0.57° at a 0.1 µm chord tolerance
    expect(fine).toBeLessThan(coarse / 5);
    expect(fine).toBeGreaterThan(coarse / 20);
  });

  it('rays inside the rim angle pass the open front untouched', () => {
    for (let i = 0; i < 200; i++) {
      const theta = (design.rimAngleRad * (i + 0.5)) / 200;
      const { events } = walkRay(design, [0, 0, 0], [Math.sin(theta), 0, Math.cos(theta)]);
      expect(events.length).toBe(0);
    }
  });

  it('the Lambertian fraction meeting the mirror equals cos² of the rim angle (numerical integration over θ)', () => {
    // ∫ hit(θ) 2 cos θ sin θ dθ over [0, π/2] by the midpoint rule, hit(θ) from the traced profile
    const N = 20000;
    let sum = 0;
    for (let i = 0; i < N; i++) {
      const theta = ((i + 0.5) * (Math.PI / 2)) / N;
      const { events } = walkRay(design, [0, 0, 0], [Math.sin(theta), 0, Math.cos(theta)], 1);
      if (events.length > 0) sum += 2 * Math.cos(theta) * Math.sin(theta) * (Math.PI / 2 / N);
    }
    const closed = Math.cos(design.rimAngleRad) ** 2;
    // One θ step of the edge (π/2/N) times the largest integrand (1) bounds the quadrature error
    expectClose(sum, closed, { abs: (Math.PI / 2 / N) * 1.01 });
    expectClose(lambertianFractionOnMirror(design), closed, { abs: 1e-12 });
  });

  it('a raised mirror (gap) receives sin² θ_base − sin² θ_rim', () => {
    const raised = designOptic({ type: 'reflector', exitDiameterMm: 20, heightMm: 12, gapMm: 1.5 });
    expect(raised.collectionHalfAngleRad).toBeLessThan(Math.PI / 2);
    const N = 20000;
    let sum = 0;
    for (let i = 0; i < N; i++) {
      const theta = ((i + 0.5) * (Math.PI / 2)) / N;
      const { events } = walkRay(raised, [0, 0, 0], [Math.sin(theta), 0, Math.cos(theta)], 1);
      if (events.length > 0) sum += 2 * Math.cos(theta) * Math.sin(theta) * (Math.PI / 2 / N);
    }
    expectClose(sum, lambertianFractionOnMirror(raised), { abs: (2 * Math.PI) / 2 / N });
  });
});
