/**
 * TIR collimator: the collimation ODE against closed forms, and the designed optic traced with Snell's law.
 * Sources: the parabola's focal property (every ray from the focus reflects parallel to the axis; analytic
 * geometry) — the ODE's mirror case with all rays from one point; the hyperbola of eccentricity n as the
 * collimating refracting surface (E. Hecht, Optics, 4th ed., §5.2.1) — its refraction case; total internal
 * reflection above θc = asin(n2/n1) (M. Born, E. Wolf, Principles of Optics, §1.5.4); RK4 global error O(h⁴)
 * (W. H. Press et al., Numerical Recipes, 3rd ed., §17.1).
 */
import { describe, expect, it } from 'vitest';
import { designOptic, integrateCollimatingSurface, type RayFamily } from '../../src/lib/optic-design';
import { walkRay } from '../support/profile-ray';
import { expectClose } from '../support/assert';

const pointFamily: RayFamily = (t, o) => {
  o[0] = 0;
  o[1] = 0;
  o[2] = 0;
  o[3] = 0;
  o[4] = Math.sin(t);
  o[5] = Math.cos(t);
  o[6] = Math.cos(t);
  o[7] = -Math.sin(t);
};

describe('collimation ODE against closed forms', () => {
  it('mirror, rays from one point: the parabola ρ = 2f/(1 − cos θ)', () => {
    const f = 1.7;
    const w = integrateCollimatingSurface(pointFamily, { kind: 'mirror' }, Math.PI / 2, 0.4, 2 * f, 1e-7);
    for (let i = 0; i < w.theta.length; i++) expectClose(w.s[i], (2 * f) / (1 - Math.cos(w.theta[i])), { abs: 1e-6 });
    // On the parabola z = r²/(4f) − f
    for (let i = 0; i < w.r.length; i++) expectClose(w.z[i], (w.r[i] * w.r[i]) / (4 * f) - f, { abs: 1e-6 });
  });

  it('refraction into n, rays from one point: the hyperbola ρ = (n − 1)v/(n cos θ − 1)', () => {
    const n = 1.49;
    const v = 2.5;
    const w = integrateCollimatingSurface(pointFamily, { kind: 'refract', nIn: 1, nOut: n }, 0, 0.75, v, 1e-8);
    for (let i = 0; i < w.theta.length; i++) {
      expectClose(w.s[i], ((n - 1) * v) / (n * Math.cos(w.theta[i]) - 1), { abs: 1e-7 });
    }
  });

  it('RK4: the error falls about 16× when the step is halved (fourth order)', () => {
    const f = 1;
    const exact = (2 * f) / (1 - Math.cos(0.5));
    // A loose tolerance returns the first step count tried, so minSteps sets the step
    const err = (steps: number) => {
      const w = integrateCollimatingSurface(pointFamily, { kind: 'mirror' }, Math.PI / 2, 0.5, 2 * f, 1, steps);
      expect(w.steps).toBe(steps);
      return Math.abs(w.s[w.s.length - 1] - exact);
    };
    const order = Math.log2(err(32) / err(64));
    expect(order).toBeGreaterThan(3.7);
    expect(order).toBeLessThan(4.3);
  });
});

describe('designed TIR collimator, point source', () => {
  const design = designOptic({ type: 'tir', exitDiameterMm: 20, heightMm: 12, n: 1.49, toleranceMm: 1e-5 });

  it('its wall reflects every design ray by TIR (incidence above the critical angle)', () => {
    expect(design.tirFailures).toEqual([]);
    expect(design.tirMarginRad).toBeGreaterThan(0);
  });

  it('rays through the lens part leave parallel; rays by the wall are totally reflected and leave parallel', () => {
    let lensRays = 0;
    let wallRays = 0;
    for (let i = 0; i < 900; i++) {
      const theta = ((Math.PI / 2) * (i + 0.5)) / 900;
      const { d, events } = walkRay(design, [0, 0, 0], [Math.sin(theta), 0, Math.cos(theta)]);
      const path = events.map((e) => `${e.kind}:${e.surface}`).join(' ');
      if (theta < (design.splitAngleRad as number)) {
        expect(path).toBe('refract:cavity-floor refract:exit');
        lensRays++;
      } else {
        expect(path).toBe('refract:cavity-wall tir:tir-wall refract:exit');
        wallRays++;
      }
      // within a small fraction of a degree (chord sampling at 10 nm)
      expect(Math.abs(Math.atan2(d[0], d[2])), path).toBeLessThan(2e-3);
    }
    expect(lensRays).toBeGreaterThan(50);
    expect(wallRays).toBeGreaterThan(50);
  });

  it('a low-index material leaks at the wall, and the design says where', () => {
    const low = designOptic({ type: 'tir', exitDiameterMm: 20, heightMm: 12, n: 1.3 });
    expect(low.tirFailures!.length).toBeGreaterThan(0);
    // Incidence i = 90° − α/2 falls as the refracted ray turns horizontal: the widest source rays fail first
    const thetaC = Math.asin(1 / 1.3);
    for (const f of low.tirFailures!) expect(f.incidenceRad).toBeLessThanOrEqual(thetaC);
    const firstFail = Math.min(...low.tirFailures!.map((f) => f.thetaRad));
    // closed form: i(θ) = acos √((1 − cos θ / n)/2) = θc  ⇔  cos θ = n (1 − 2 cos² θc)
    const thetaEdge = Math.acos(1.3 * (1 - 2 * Math.cos(thetaC) ** 2));
    expect(firstFail).toBeGreaterThanOrEqual(thetaEdge - 1e-9);
    // and a traced ray beyond that angle does refract out through the wall
    const th = (thetaEdge + Math.PI / 2) / 2;
    const { events } = walkRay(low, [0, 0, 0], [Math.sin(th), 0, Math.cos(th)]);
    expect(events[1]).toMatchObject({ kind: 'refract', surface: 'tir-wall' });
  });
});

describe('TIR collimator with a collimating exit lens over a flat cavity floor', () => {
  for (const [D, H, n] of [[20, 12, 1.49], [30, 14, 1.585]]) {
    it(`sends every ray through the lens part or by the wall out parallel, ${D} mm × ${H} mm, n = ${n}`, () => {
      const design = designOptic({ type: 'tir', exitDiameterMm: D, heightMm: H, n, exitFace: 'lens', toleranceMm: 1e-5 });
      expect(design.tirFailures).toEqual([]);
      const seen = new Set<string>();
      for (let i = 0; i < 600; i++) {
        const theta = ((Math.PI / 2) * (i + 0.5)) / 600;
        const { d, events } = walkRay(design, [0, 0, 0], [Math.sin(theta), 0, Math.cos(theta)]);
        const path = events.map((e) => `${e.kind}:${e.surface}`).join(' ');
        seen.add(path);
        // the lens rim meets the flat ring only to the design's bisection: allow a few mrad
        expect(Math.abs(Math.atan2(d[0], d[2])), path).toBeLessThan(3e-3);
      }
      expect([...seen].sort()).toEqual(['refract:cavity-floor refract:exit', 'refract:cavity-wall tir:tir-wall refract:exit']);
    });
  }
});

