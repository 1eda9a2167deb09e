/**
 * Compound parabolic concentrator of revolution, traced in a meridian plane through its sampled profile.
 * Source: W. T. Welford, R. Winston, High Collection Nonimaging Optics, Academic Press 1989, §4.3: a′ = a sin θa,
 * L = (a + a′)/tan θa, and the 2-D CPC accepts every ray within θa and rejects every ray beyond it. The 3-D case
 * checked here: meridional rays of the CPC of revolution obey the 2-D relation exactly (a meridian section is the
 * 2-D CPC); skew rays are not ideal (Welford & Winston §5.3) and are not asserted.
 */
import { describe, expect, it } from 'vitest';
import { designOptic, etendueMm2Sr } from '../../src/lib/optic-design';
import { walkRay } from '../support/profile-ray';
import { expectClose } from '../support/assert';

describe('CPC of revolution', () => {
  const beamDeg = 30;
  const thetaA = ((beamDeg / 2) * Math.PI) / 180;
  const cpc = designOptic({ type: 'reflector', shape: 'cpc', exitDiameterMm: 20, targetBeamDeg: beamDeg, toleranceMm: 1e-5 });
  const a = 10;
  const aPrime = a * Math.sin(thetaA);
  const wall = cpc.surfaces[0];

  it('has the published apertures and length: a′ = a sin θa, L = (a + a′)/tan θa', () => {
    expectClose(wall.r[0], aPrime, { abs: 1e-12 });
    expectClose(wall.r[wall.r.length - 1], a, { abs: 1e-9 });
    expectClose(cpc.heightMm, (a + aPrime) / Math.tan(thetaA), { abs: 1e-9 });
    // 3-D: the small aperture's étendue over the hemisphere equals the exit's within θa (the étendue limit)
    expectClose(etendueMm2Sr(Math.PI * aPrime * aPrime, 1, Math.PI / 2), etendueMm2Sr(Math.PI * a * a, 1, thetaA), { rel: 1e-12 });
  });

  /** Does a meridional ray entering the exit at height x with angle θ (toward −z) reach the small aperture? */
  function accepted(x: number, theta: number): boolean {
    const { d, p } = walkRay(cpc, [x, 0, cpc.heightMm - 1e-6], [Math.sin(theta), 0, -Math.cos(theta)], 50);
    if (d[2] >= 0) return false; // turned back out of the exit
    // leaving downward: it crosses the small aperture's plane inside it
    const t = (cpc.gapMm - p[2]) / d[2];
    return Math.abs(p[0] + t * d[0]) <= aPrime + 1e-6;
  }

  it('meridional rays within θa all reach the small aperture (2-D acceptance, sin θa = a′/a)', () => {
    for (const f of [0, 0.3, 0.6, 0.9, 0.97]) {
      for (let i = 0; i < 101; i++) {
        const x = -a + (2 * a * (i + 0.5)) / 101;
        expect(accepted(x, f * thetaA), `θ = ${f}·θa, x = ${x}`).toBe(true);
        expect(accepted(x, -f * thetaA), `θ = −${f}·θa, x = ${x}`).toBe(true);
      }
    }
  });

  it('meridional rays beyond θa are all turned back', () => {
    for (const f of [1.03, 1.1, 1.5, 2.5]) {
      for (let i = 0; i < 101; i++) {
        const x = -a + (2 * a * (i + 0.5)) / 101;
        expect(accepted(x, f * thetaA), `θ = ${f}·θa, x = ${x}`).toBe(false);
      }
    }
  });
});
