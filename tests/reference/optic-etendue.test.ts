/**
 * The étendue limit. Source: G = π n² A sin² θ for a Lambertian bundle and its conservation through any passive
 * optic (R. Winston, J. C. Miñano, P. Benítez, Nonimaging Optics, Elsevier 2005, ch. 3; W. T. Welford, R. Winston,
 * High Collection Nonimaging Optics, 1989, app. A). Values below are computed from that formula.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  checkTargetBeam,
  designOptic,
  etendueLimitHalfAngleRad,
  minExitDiameterMm,
  type OpticDesign
} from '../../src/lib/optic-design';
import { walkRay } from '../support/profile-ray';
import { expectClose } from '../support/assert';
import { SEED } from '../property/support';

const DEG = Math.PI / 180;

describe('étendue limit', () => {
  it('a 1 mm² source through a 20 mm exit: sin θ = √(1/(π·10²)), θ = 3.234°', () => {
    expectClose(etendueLimitHalfAngleRad({ sourceAreaMm2: 1, exitDiameterMm: 20 }) / DEG, 3.2343, { abs: 1e-4 });
  });

  it('"a 20° beam from a 60 mm² source" needs an exit of 2√(60/π)/sin 10° = 50.33 mm', () => {
    expectClose(minExitDiameterMm(60, 20), 50.334, { abs: 1e-3 });
    // and that exit gives exactly the 20° beam back
    expectClose((2 * etendueLimitHalfAngleRad({ sourceAreaMm2: 60, exitDiameterMm: minExitDiameterMm(60, 20) })) / DEG, 20, { abs: 1e-9 });
  });

  it('scales with the source index and the collected cone: sin θ ∝ n_s sin θ_c', () => {
    const base = Math.sin(etendueLimitHalfAngleRad({ sourceAreaMm2: 1, exitDiameterMm: 20 }));
    expectClose(Math.sin(etendueLimitHalfAngleRad({ sourceAreaMm2: 1, exitDiameterMm: 20, nSource: 1.5 })), 1.5 * base, { rel: 1e-12 });
    expectClose(Math.sin(etendueLimitHalfAngleRad({ sourceAreaMm2: 1, exitDiameterMm: 20, collectionHalfAngleRad: Math.PI / 6 })), 0.5 * base, { rel: 1e-12 });
  });

  it('a target below the limit is refused in one line naming the field and the limit', () => {
    // 1.31 mm² through 20 mm: 2·asin √(1.31/(100π)) = 7.40°
    expect(() => checkTargetBeam(3, { sourceAreaMm2: 1.31, exitDiameterMm: 20 })).toThrowError(
      /^targetBeamDeg: no optic of this size can make a 3° beam from this source; the limit is 7\.4° [^\n]*$/
    );
    expect(() => checkTargetBeam(7.5, { sourceAreaMm2: 1.31, exitDiameterMm: 20 })).not.toThrow();
    expect(() =>
      designOptic({ type: 'tir', exitDiameterMm: 20, heightMm: 12, n: 1.49, targetBeamDeg: 3, source: { shape: 'rect', widthMm: 1.1446 } })
    ).toThrowError(/targetBeamDeg: no optic of this size can make a 3° beam/);
  });
});

/**
 * Widest exit angle of meridional rays from a disc source of radius s (points across [−s, s] in the plane y = 0,
 * directions over the design's collection cone) that leave the optic upward (the light going up, the beam). Rays in a meridian
 * plane stay in it, so the 2-D étendue bound sin θ ≥ (s/R) sin θc applies to them — the same number as the 3-D
 * disc formula √(πs²/(πR²)).
 */
function widestExitAngle(design: OpticDesign, s: number, points: number, dirs: number): number {
  let widest = 0;
  const c = design.collectionHalfAngleRad;
  for (let i = 0; i < points; i++) {
    const x = -s + (2 * s * (i + 0.5)) / points;
    for (let j = 0; j < dirs; j++) {
      const th = -c + (2 * c * (j + 0.5)) / dirs;
      const { d } = walkRay(design, [x, 0, 0], [Math.sin(th), 0, Math.cos(th)], 12);
      if (d[2] > 0) widest = Math.max(widest, Math.abs(Math.atan2(d[0], d[2])));
    }
  }
  return widest;
}

describe('no design beats the étendue limit (property, meridional rays from an extended source)', () => {
  it('paraboloid, aspheric lens, TIR collimator: widest beam ≥ the limit for what they collect', () => {
    fc.assert(
      fc.property(
        fc.constantFrom('reflector', 'lens', 'tir'),
        fc.double({ min: 8, max: 25, noNaN: true }),
        fc.double({ min: 0.02, max: 0.1, noNaN: true }),
        (type, R, sFrac) => {
          const s = sFrac * R;
          const H = type === 'lens' ? 1.6 * R : type === 'tir' ? 1.1 * R : 1.2 * R;
          const design = designOptic({ type: type as 'reflector', exitDiameterMm: 2 * R, heightMm: H, n: 1.49, toleranceMm: 1e-4 });
          const limit = etendueLimitHalfAngleRad({ sourceAreaMm2: Math.PI * s * s, exitDiameterMm: 2 * R, collectionHalfAngleRad: design.collectionHalfAngleRad });
          const widest = widestExitAngle(design, s, 9, 61);
          return widest >= limit;
        }
      ),
      { seed: SEED, numRuns: 30 }
    );
  });

  it('the CPC meets the limit: a source filling its small aperture gives a beam of exactly ±θa (meridional)', () => {
    fc.assert(
      fc.property(fc.double({ min: 5, max: 30, noNaN: true }), fc.double({ min: 8, max: 40, noNaN: true }), (R, beamDeg) => {
        const design = designOptic({ type: 'reflector', shape: 'cpc', exitDiameterMm: 2 * R, targetBeamDeg: beamDeg, toleranceMm: 1e-5 });
        const aPrime = design.surfaces[0].r[0];
        const limit = etendueLimitHalfAngleRad({ sourceAreaMm2: Math.PI * aPrime * aPrime, exitDiameterMm: 2 * R });
        expectClose(limit, design.acceptanceHalfAngleRad as number, { abs: 1e-12 });
        const widest = widestExitAngle(design, aPrime * (1 - 1e-9), 15, 181);
        // ≥ the limit less the sampling's reach (rays from the aperture's edge toward the far wall's rim), ≤ it
        // plus the chord sampling's tilt
        return widest <= limit + 2e-3 && widest >= 0.97 * limit;
      }),
      { seed: SEED, numRuns: 20 }
    );
  });
});
