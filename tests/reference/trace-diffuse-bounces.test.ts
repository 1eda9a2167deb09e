/**
 * Reference checks of diffuse surfaces with many bounces, against closed forms.
 *
 * 1. Diffuse floor under a point source at the centre of a hemispherical dome (n = 1.5 in air): every
 *    ray from the centre meets the dome at normal incidence, where it escapes with e = 1 − r0,
 *    r0 = ((1.5 − 1)/(1.5 + 1))² = 0.04, or returns to the centre of the floor; the floor sends it up
 *    again with probability R (Lambertian). From "going up": E_up = e + r0·R·E_up, a geometric series,
 *    E_up = e/(1 − r0·R); half the rays start down and meet the floor first, so
 *      escape = ½ (1 + R) · e / (1 − r0 R).
 *    The escape directions are the directions inside (no bending at normal incidence): the rays that
 *    escape without touching the floor, ½e of all, are isotropic (uniform in cos θ); the others are
 *    Lambertian (uniform in cos²θ). Their polar histogram is checked by χ² in 5° bins.
 *    Sources: Fresnel reflectance at normal incidence, M. Born, E. Wolf, Principles of Optics, §1.5.2;
 *    Lambertian reflector, cosine-weighted directions (Pharr, Jakob, Humphreys, Physically Based
 *    Rendering, 3rd ed., §13.6.3); geometric series of repeated reflections (common practice).
 * 2. Textured top face, s = 1, on a very wide, very thin slab chip (n = 2.45) in air on a specular base of
 *    reflectance Rb: every event at the top sends the ray on in a cosine-weighted direction, so the top
 *    is met first by the isotropic emitter's upward rays (escape share T_iso = ∫₀¹ T(μ) dμ), and after
 *    every reflection by Lambertian rays (the specular base keeps cos θ): T_lam = ∫₀¹ T(μ) 2μ dμ, with
 *    T = 1 − (Rs + Rp)/2 the unpolarised Fresnel transmittance (0 beyond the critical angle). Then
 *      E_lam = T_lam / (1 − Rb (1 − T_lam)),
 *      escape = ½ (1 + Rb) · (T_iso + (1 − T_iso) · Rb · E_lam).
 *    Sources: Fresnel equations, Born & Wolf §1.5.2; incoherent balance of repeated reflections
 *    (common practice). The sides (0.1 µm high on a 10 mm chip) take a negligible share (< 0.001,
 *    added to the tolerance, as in the layered-slab reference).
 * Monte Carlo tolerances: k = 4 binomial standard errors σ = √(p(1 − p)/N), p the expected value.
 */
import { describe, expect, it } from 'vitest';
import type { TracePackage } from '../../src/lib/trace/package-spec';
import { summarize } from '../../src/lib/trace/summary';
import { traceSync } from '../../src/lib/trace/trace';
import { assertInDelta } from '../support/assert';

const K = 4;

/** Unpolarised Fresnel transmittance from index a into b at incidence cos ci; 0 beyond the critical angle (Born & Wolf §1.5.2). */
function transmittance(ci: number, a: number, b: number): number {
  const s2 = (a / b) ** 2 * (1 - ci * ci);
  if (s2 >= 1) return 0;
  const ct = Math.sqrt(1 - s2);
  const rs = (a * ci - b * ct) / (a * ci + b * ct);
  const rp = (b * ci - a * ct) / (b * ci + a * ct);
  return 1 - (rs * rs + rp * rp) / 2;
}

describe('reference: diffuse floor under a point source in a hemisphere, many bounces', () => {
  const R = 0.9;
  const r0 = 0.04;
  const e = 1 - r0;
  const expected = (0.5 * (1 + R) * e) / (1 - r0 * R);
  const pkg: TracePackage = {
    chip: { widthMm: 1e-3, lengthMm: 1e-3, heightMm: 1e-3, n: 1.5, absorptionPerMm: 0, emission: 'plane' },
    base: { kind: 'reflectance', reflectance: R },
    baseFinish: 'diffuse',
    encapsulant: { shape: 'dome', radiusMm: 10, heightMm: 10, n: 1.5, absorptionPerMm: 0 },
    outsideN: 1,
    polarization: 'average'
  };
  const N = 40_000;
  const s = summarize(traceSync(pkg, { rays: N, seed: 31 }));

  it(`escape = ½(1 + R)·e/(1 − r0·R) = ${expected.toFixed(4)} for R = ${R} (within 4σ; one bounce alone would be 30σ off)`, () => {
    assertInDelta(s.extraction, expected, K * Math.sqrt((expected * (1 - expected)) / N));
    expect(s.geometryErrors).toBe(0);
  });

  it('escape directions: isotropic share ½e/escape, the rest Lambertian — χ² over 18 bins of 5° below the 99.9 % point', () => {
    const tally = traceSync(pkg, { rays: N, seed: 31 });
    const escaped = tally.escaped;
    const direct = (0.5 * e) / expected;
    let chi2 = 0;
    for (let b = 0; b < 18; b++) {
      let observed = 0;
      for (let i = 5 * b; i < 5 * b + 5; i++) observed += tally.polarHistogram[i];
      const mu1 = Math.cos(((5 * b) * Math.PI) / 180);
      const mu2 = Math.cos(((5 * b + 5) * Math.PI) / 180);
      const p = direct * (mu1 - mu2) + (1 - direct) * (mu1 * mu1 - mu2 * mu2);
      chi2 += (observed - escaped * p) ** 2 / (escaped * p);
    }
    // nothing escapes downward
    expect(tally.polarHistogram.slice(90).reduce((a, x) => a + x, 0)).toBe(0);
    // χ²(17 degrees of freedom) at 0.999 = 40.79 (M. Abramowitz, I. A. Stegun, Handbook of Mathematical Functions, Table 26.8)
    expect(chi2).toBeLessThan(40.79);
  });
});

describe('reference: textured top face with s = 1 on a very wide slab chip in air', () => {
  it.each([0.9, 0.5])('base reflectance %s: escape against the Lambertian per-angle balance (within 4σ + 0.001; a flat top gives 0.08 at 0.9)', (Rb) => {
    const n = 2.45;
    const h = 1e-3;
    const pkg: TracePackage = {
      chip: { widthMm: 100, lengthMm: 100, heightMm: h, n, absorptionPerMm: 0, emission: 'plane', emitterZMm: h / 2, topScatter: 1 },
      base: { kind: 'reflectance', reflectance: Rb },
      encapsulant: { shape: 'none', radiusMm: 1, heightMm: 1, n: 1, absorptionPerMm: 0 },
      outsideN: 1,
      polarization: 'average'
    };
    // midpoint rule over μ = cos θ
    const steps = 20000;
    let tIso = 0;
    let tLam = 0;
    for (let i = 0; i < steps; i++) {
      const mu = (i + 0.5) / steps;
      const t = transmittance(mu, n, 1);
      tIso += t / steps;
      tLam += (2 * mu * t) / steps;
    }
    const eLam = tLam / (1 - Rb * (1 - tLam));
    const expected = 0.5 * (1 + Rb) * (tIso + (1 - tIso) * Rb * eLam);
    const N = 40_000;
    const s = summarize(traceSync(pkg, { rays: N, seed: 17, maxEvents: 100_000 }));
    assertInDelta(s.extraction, expected, K * Math.sqrt((expected * (1 - expected)) / N) + 0.001);
    expect(s.geometryErrors).toBe(0);
  });
});
