/**
 * Reference checks of the Monte Carlo tracer against the Fresnel-weighted escape cone of one planar
 * face (escape cone ½∫T sin θ dθ: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5). Monte Carlo tolerances: k = 4 binomial standard errors, σ = √(p(1 − p)/N).
 *
 * Set-up: a chip n = 2.45 in air on an absorbing base (reflectance 0). A ray leaves through the top only
 * on its first top hit (whatever the top reflects, or totally reflects, goes down and is absorbed), so
 * top escapes are exactly η_F = ½∫₀^θc T(θ) sin θ dθ — for any chip width, since θc = 24.09° < 45°: the
 * side cones do not overlap the top cone, and a total reflection at a side keeps a ray's polar angle.
 * The side faces add their own escapes, (H/W)·ln(W/H)-small: measured 0.0028 of all rays at W/H = 1000,
 * 0.0004 at 1e4 and 0.00005 at 1e5. So the whole extraction equals η_F once W/H = 1e5 (10 mm × 10 mm ×
 * 0.1 µm), where the side share is below σ/3 for N = 500 000 (checked in the test).
 */
import { describe, expect, it } from 'vitest';
import { escapeCone } from '../../src/lib/optics/escape-cone';
import type { TracePackage } from '../../src/lib/trace/package-spec';
import { summarize } from '../../src/lib/trace/summary';
import { traceSync } from '../../src/lib/trace/trace';

const K = 4;
// escape cone ½∫T sin θ dθ: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5: η_F(2.45 → 1) = 0.03408 (computed). The core's integral is the reference; the table
// value checks it to its 4 significant digits.
const etaF = escapeCone(2.45, 1).fresnel;

function chipInAir(widthMm: number, heightMm: number, polarization: TracePackage['polarization'] = 'average'): TracePackage {
  return {
    chip: { widthMm, lengthMm: widthMm, heightMm, n: 2.45, absorptionPerMm: 0, emission: 'plane' },
    base: { kind: 'reflectance', reflectance: 0 },
    encapsulant: { shape: 'none', radiusMm: 1, heightMm: 1, n: 1, absorptionPerMm: 0 },
    outsideN: 1,
    polarization
  };
}

describe('reference: escape through one planar face, chip 2.45 → air (escape cone ½∫T sin θ dθ: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5)', () => {
  it('the core gives η_F(2.45 → 1) = 0.03408 [computed; escape cone ½∫T sin θ dθ: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5; 5e-6 for the 4 printed digits]', () => {
    expect(Math.abs(etaF - 0.03408)).toBeLessThanOrEqual(5e-6);
  });

  it('a 100 mm × 100 mm × 1 µm chip (W/H = 1e5; 1 µm is the smallest size the limits table allows) extracts η_F, its sides negligible (within 4σ)', () => {
    const N = 500_000;
    const s = summarize(traceSync(chipInAir(100, 1e-3), { rays: N, seed: 21 }));
    const sigma = Math.sqrt((etaF * (1 - etaF)) / N);
    expect(s.perSurface.chipSide).toBeLessThan(sigma / 3);
    expect(Math.abs(s.extraction - etaF)).toBeLessThanOrEqual(K * sigma);
    expect(s.counts.escaped + s.counts.base).toBe(N);
  });

  it('a 1 × 1 × 0.15 mm chip still sends exactly η_F through its top face (within 4σ)', () => {
    const N = 400_000;
    const s = summarize(traceSync(chipInAir(1, 0.15), { rays: N, seed: 22 }));
    const sigma = Math.sqrt((etaF * (1 - etaF)) / N);
    expect(Math.abs(s.perSurface.chipTop - etaF)).toBeLessThanOrEqual(K * sigma);
    // and the sides of this thick chip add a share of their own (one test that they are counted at all)
    expect(s.perSurface.chipSide).toBeGreaterThan(10 * sigma);
  });

  it('with tracked polarisation the unpolarised emitter still extracts η_F through the top (within 4σ)', () => {
    const N = 100_000;
    const s = summarize(traceSync(chipInAir(1, 0.15, 'track'), { rays: N, seed: 23 }));
    const sigma = Math.sqrt((etaF * (1 - etaF)) / N);
    expect(Math.abs(s.perSurface.chipTop - etaF)).toBeLessThanOrEqual(K * sigma);
  });
});
