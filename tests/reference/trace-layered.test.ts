/**
 * Reference check of a layered chip against the per-angle incoherent balance through both layers.
 *
 * A very wide, very thin two-layer slab (200 mm × 200 mm, 2 µm in all — the smallest layer the limits
 * table allows, 1 µm, at the same width-to-thickness ratio as 10 mm over 0.1 µm: its sides take a negligible
 * share) in air, lossless layers n1 (emitting, bottom) and n2 (top), on an absorbing chip mirror (R = 0).
 * A ray leaving the emitter upward at θ1 meets the n1 → n2 interface: reflected, it goes down to the
 * absorber; transmitted at θ2 (n1 sin θ1 = n2 sin θ2) it meets the top: transmitted, it escapes;
 * reflected, it returns to the interface, where it is reflected up again with R21(θ2) = R12(θ1)
 * (reciprocity) or passes into layer 1 and down to the absorber. So
 *   escape(θ1) = T12 · T2a / (1 − R2a · R12),
 * with unpolarised Fresnel reflectances R = (Rs + Rp)/2 at each interface (the tracer's 'average'
 * mode draws each event with that R), R = 1 beyond a critical angle; downward rays are absorbed.
 * Extraction = ½ ∫₀^{π/2} escape(θ1) sin θ1 dθ1 (isotropic emitter). Sources: Fresnel equations and
 * Snell's law, M. Born, E. Wolf, Principles of Optics, §1.5.2; incoherent multiple reflections between
 * two interfaces, T = T1·T2/(1 − R1·R2) (common practice). Tolerance 4σ (binomial) plus 0.001 for the
 * sides and the midpoint rule.
 */
import { describe, it } from 'vitest';
import type { TracePackage } from '../../src/lib/trace/package-spec';
import { summarize } from '../../src/lib/trace/summary';
import { traceSync } from '../../src/lib/trace/trace';
import { assertInDelta } from '../support/assert';

const K = 4;

/** Unpolarised Fresnel reflectance from index a to b at incidence cos ci; 1 beyond the critical angle. */
function reflectance(ci: number, a: number, b: number): number {
  const s2 = ((a / b) ** 2) * (1 - ci * ci);
  if (s2 >= 1) return 1;
  const ct = Math.sqrt(1 - s2);
  const rs = (a * ci - b * ct) / (a * ci + b * ct);
  const rp = (b * ci - a * ct) / (b * ci + a * ct);
  return (rs * rs + rp * rp) / 2;
}

function balance(n1: number, n2: number): number {
  const steps = 20000;
  let sum = 0;
  for (let i = 0; i < steps; i++) {
    const t1 = ((i + 0.5) / steps) * (Math.PI / 2);
    const c1 = Math.cos(t1);
    const r12 = reflectance(c1, n1, n2);
    if (r12 >= 1) continue;
    const s2 = (n1 / n2) * Math.sin(t1);
    const c2 = Math.sqrt(1 - s2 * s2);
    const r2a = reflectance(c2, n2, 1);
    const escape = ((1 - r12) * (1 - r2a)) / (1 - r2a * r12);
    sum += escape * Math.sin(t1) * (Math.PI / 2 / steps);
  }
  return sum / 2;
}

describe('reference: two-layer slab on an absorber, against the per-angle incoherent balance', () => {
  it.each([
    [2.45, 1.78],
    [1.78, 2.45]
  ])('n1 %s (emitting) under n2 %s: extraction within 4σ + 0.001', (n1, n2) => {
    const h = 0.001;
    const pkg: TracePackage = {
      chip: {
        widthMm: 200,
        lengthMm: 200,
        heightMm: 2 * h,
        n: n1,
        absorptionPerMm: 0,
        emission: 'plane',
        layers: [
          { name: 'bottom layer', thicknessMm: h, n: n1, absorptionPerMm: 0 },
          { name: 'top layer', thicknessMm: h, n: n2, absorptionPerMm: 0 }
        ],
        emitLayer: 0,
        mirror: { kind: 'reflectance', reflectance: 0 }
      },
      base: { kind: 'reflectance', reflectance: 0 },
      encapsulant: { shape: 'none', radiusMm: 1, heightMm: 1, n: 1, absorptionPerMm: 0 },
      outsideN: 1,
      polarization: 'average'
    };
    const N = 40_000;
    const s = summarize(traceSync(pkg, { rays: N, seed: 23, maxEvents: 100_000 }));
    const expected = balance(n1, n2);
    assertInDelta(s.extraction, expected, K * Math.sqrt((expected * (1 - expected)) / N) + 0.001);
  });
});
