/**
 * Reference checks of the Monte Carlo tracer with a point source at the centre of a hemispherical dome
 * (dome: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5; sine rule, Born & Wolf §4.2.3). Monte Carlo tolerances: k = 4 binomial standard errors, σ = √(p(1 − p)/N) with p the
 * expected value. The "point source" is a 1 µm chip (the smallest size of the limits table)
 * index-matched to the dome (no interface, no absorption) emitting 0.5 µm above the base: its rays meet
 * a 10 mm dome within 5e-5 rad of normal incidence, which changes R by under 1e-8 — far below σ.
 */
import { describe, expect, it } from 'vitest';
import { reflectanceComplex } from '../../src/lib/optics/fresnel';
import type { TraceBase, TracePackage } from '../../src/lib/trace/package-spec';
import { summarize } from '../../src/lib/trace/summary';
import { traceSync } from '../../src/lib/trace/trace';

const K = 4;

function pointInHemisphere(base: TraceBase, polarization: TracePackage['polarization'] = 'average'): TracePackage {
  return {
    chip: { widthMm: 1e-3, lengthMm: 1e-3, heightMm: 1e-3, n: 1.5, absorptionPerMm: 0, emission: 'plane' },
    base,
    encapsulant: { shape: 'dome', radiusMm: 10, heightMm: 10, n: 1.5, absorptionPerMm: 0 },
    outsideN: 1,
    polarization
  };
}

describe('reference: point source at the centre of a hemisphere n = 1.5 (dome: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5; sine rule, Born & Wolf §4.2.3)', () => {
  // dome: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5; sine rule, Born & Wolf §4.2.3: absorbing base → 0.5 · (1 − 0.04) = 0.48 (R = 0.04 for 1.5 / air at normal incidence,
  // common practice); only the upward half reaches the dome, and what it reflects comes back to the base.
  it('on an absorbing base extracts 0.5 · (1 − 0.04) = 0.48 (within 4σ)', () => {
    const N = 400_000;
    const s = summarize(traceSync(pointInHemisphere({ kind: 'reflectance', reflectance: 0 }), { rays: N, seed: 1 }));
    const sigma = Math.sqrt((0.48 * 0.52) / N);
    expect(Math.abs(s.extraction - 0.48)).toBeLessThanOrEqual(K * sigma);
    expect(s.counts.escaped + s.counts.base).toBe(N);
    expect(s.tir.outerSurface).toBe(0);
  });

  // dome: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5; sine rule, Born & Wolf §4.2.3: on a perfect reflector with no absorption every ray escapes (1.0).
  it('on a perfect mirror with no absorption lets every ray out (exactly, none lost)', () => {
    const N = 100_000;
    const s = summarize(traceSync(pointInHemisphere({ kind: 'reflectance', reflectance: 1 }), { rays: N, seed: 2 }));
    expect(s.counts.escaped).toBe(N);
    expect(s.counts.lost).toBe(0);
  });

  // An isotropic source seen through a concentric dome stays isotropic over the upper hemisphere:
  // I = Φ/(2π) = I0/2 with I0 = Φ/π (common practice). Each 30° zone's count is Poisson-like: relative
  // σ = 1/√(expected count), so the tolerance is 4 · 0.5/√(N · 0.48 · (cos a − cos b)).
  it('sends out an isotropic upper-hemisphere far field: relative intensity 1/2 in every zone above the horizon', () => {
    const N = 400_000;
    const tally = traceSync(pointInHemisphere({ kind: 'reflectance', reflectance: 0 }), { rays: N, seed: 3 });
    const s = summarize(tally);
    const i0 = s.counts.escaped / Math.PI;
    for (const [a, b] of [[0, 30], [30, 60], [60, 90]]) {
      let n = 0;
      for (let i = a; i < b; i++) n += tally.polarHistogram[i];
      const band = Math.cos((a * Math.PI) / 180) - Math.cos((b * Math.PI) / 180);
      const tolerance = (K * 0.5) / Math.sqrt(N * 0.48 * band);
      expect(Math.abs(n / (2 * Math.PI * band) / i0 - 0.5), `zone ${a}–${b}°`).toBeLessThanOrEqual(tolerance);
    }
    // below the horizon only rays within 5e-5 rad of horizontal can escape (the source height over R)
    expect(s.escapedBelowHorizon).toBeLessThan(1e-3);
    // the intensity drops from 1/2 to 0 at 90°: half maximum there, full angle 180° (±2° for the 5° smoothing)
    expect(Math.abs((s.farField.beamAngleDeg ?? 0) - 180)).toBeLessThanOrEqual(2);
  });

  // Silver at 550 nm: n = 0.04382, k = 3.6101 (published: K. M. McPeak et al., ACS Photonics 2, 326 (2015)).
  // Closed form for this geometry (every ray stays radial, so it meets the base at its own polar angle,
  // μ = |cos θ| uniform on [0, 1]): η = ∫₀¹ ½ [1 + R(μ)] · T / (1 − (1 − T) R(μ)) dμ with T = 0.96 at the dome
  // and R(μ) the unpolarised metal reflectance into n = 1.5, integrated here with the core's
  // reflectanceComplex (midpoint rule, 20 000 steps: error < 1e-9).
  it.each(['average', 'track'] as const)('on a silver base matches the closed-form multiple-bounce sum (%s polarisation, 4σ)', (mode) => {
    const n = 0.04382;
    const k = 3.6101;
    const fr = new Float64Array(2);
    const M = 20_000;
    let expected = 0;
    for (let i = 0; i < M; i++) {
      const mu = (i + 0.5) / M;
      reflectanceComplex(mu, 1.5, n, k, fr);
      const R = 0.5 * (fr[0] + fr[1]);
      expected += (0.5 * (1 + R) * 0.96) / (1 - 0.04 * R);
    }
    expected /= M;
    // In 'track' mode the second pass meets the base with the polarisation left by the first: the
    // correlation enters only through the 4 % dome reflection times Rs − Rp (< 0.02 for silver), < 1e-4.
    const N = mode === 'average' ? 300_000 : 60_000;
    const s = summarize(traceSync(pointInHemisphere({ kind: 'metal', n, k }, mode), { rays: N, seed: 4 }));
    const sigma = Math.sqrt((expected * (1 - expected)) / N);
    expect(Math.abs(s.extraction - expected)).toBeLessThanOrEqual(K * sigma + (mode === 'track' ? 1e-4 : 0));
  });
});
