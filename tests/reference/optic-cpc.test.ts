/**
 * Compound parabolic concentrator of revolution, traced in a meridian plane through its sampled profile.
 * Source: W. T. Welford, R. Winston, High Collection Nonimaging Optics, Academic Press 1989, §4.3: a′ = a sin θa,
 * L = (a + a′)/tan θa, and the 2-D CPC accepts every ray within θa and rejects every ray beyond it. The 3-D cases
 * checked here: meridional rays of the CPC of revolution obey the 2-D relation exactly (a meridian section is the
 * 2-D CPC); over all rays (skew ones included) the CPC of revolution is nearly ideal — its transmission–angle curve
 * T(θ) is 1 up to near θa and falls to 0 within a few degrees beyond it (Welford & Winston §5.3, the transmission–
 * angle curves of 3-D CPCs; the width from memory, asserted loosely) — and, étendue being conserved, a field of
 * uniform radiance over the entry passes exactly what the small aperture can hold: ∫ T(θ) sin 2θ dθ over
 * [0, π/2] = sin² θa (Welford & Winston ch. 2; the integral is computed here by a stratified quadrature).
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

  /** Fraction of a parallel beam at θ from the axis, over the whole entry disc, that reaches the small aperture. */
  function transmission(theta: number, n: number): number {
    let through = 0;
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        // stratified over the entry disc (equal areas): every azimuth, so most rays are skew
        const r = a * Math.sqrt((i + 0.5) / n);
        const phi = (2 * Math.PI * (j + 0.5)) / n;
        const { d, p } = walkRay(cpc, [r * Math.cos(phi), r * Math.sin(phi), cpc.heightMm - 1e-6], [Math.sin(theta), 0, -Math.cos(theta)], 100);
        if (d[2] >= 0) continue;
        const t = (cpc.gapMm - p[2]) / d[2];
        if (Math.hypot(p[0] + t * d[0], p[1] + t * d[1]) <= aPrime + 1e-6) through++;
      }
    }
    return through / (n * n);
  }

  it('3-D, skew rays included: T(θ) = 1 up to 0.8 θa and 0 from 1.2 θa (the transmission–angle curve)', () => {
    for (const f of [0, 0.4, 0.8]) expect(transmission(f * thetaA, 24), `θ = ${f}·θa`).toBe(1);
    expect(transmission(thetaA, 24)).toBeGreaterThan(0.2);
    expect(transmission(thetaA, 24)).toBeLessThan(0.8);
    for (const f of [1.2, 2, 4]) expect(transmission(f * thetaA, 24), `θ = ${f}·θa`).toBe(0);
  });

  it('3-D: a uniform-radiance field passes ∫ T(θ) sin 2θ dθ = sin² θa, the small aperture’s étendue (within 1 %)', () => {
    // T = 0 beyond 1.2 θa (above); the midpoint rule over [0, 1.5 θa] in 48 steps
    const top = 1.5 * thetaA;
    const steps = 48;
    let integral = 0;
    for (let k = 0; k < steps; k++) {
      const th = ((k + 0.5) / steps) * top;
      integral += transmission(th, 24) * Math.sin(2 * th) * (top / steps);
    }
    expectClose(integral, Math.sin(thetaA) ** 2, { rel: 0.01 });
  });
});
