/**
 * Reference checks of the Monte Carlo tracer with a dome encapsulant (dome: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5; sine rule, Born & Wolf §4.2.3). Monte Carlo
 * tolerances: k = 4 binomial standard errors, σ = √(p(1 − p)/N), with p the expected value.
 */
import { describe, expect, it } from 'vitest';
import { domeEstimate } from '../../src/lib/optics/dome-estimate';
import type { TracePackage } from '../../src/lib/trace/package-spec';
import { summarize } from '../../src/lib/trace/summary';
import { traceSync } from '../../src/lib/trace/trace';

const K = 4;

describe('reference: dome encapsulant (dome: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5; sine rule, Born & Wolf §4.2.3)', () => {
  // dome: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5; sine rule, Born & Wolf §4.2.3: η_dome = η_F(chip → encapsulant) · (1 − R_normal(encapsulant → air)) for a chip small
  // against the dome, taken from the core's domeEstimate. Geometry that makes the closed form exact up to
  // small terms: a 100 × 100 mm chip 1 µm thick (W/H = 1e5: side escapes ≈ 5e-5, see
  // trace-escape-cone.test.ts; 1 µm is the smallest size of the limits table) on an absorbing base, under
  // a dome R = 1000 mm, so rays meet the dome within 4.1° of normal incidence, where the unpolarised
  // reflectance 1.41 → 1 differs from its normal value by < 2e-6 (Fresnel equations, Born & Wolf §1.5.2). Second order: light the dome reflects comes back onto the chip and is
  // reflected up again with R ≈ 0.07 (1.41 → 2.45), adding ≈ η·0.03·0.07 ≈ 1.6e-4; with the side term,
  // the closed form may sit up to 2.5e-4 below the trace, added to the 4σ tolerance on that side.
  it('a tiny thin chip under a large dome extracts domeEstimate().etaDome (within 4σ, + 2.5e-4 above)', () => {
    const expected = domeEstimate({ nChip: 2.45, nEnc: 1.41, nOut: 1, chipWidthMm: 100, chipLengthMm: 100, radiusMm: 1000 }).etaDome;
    const pkg: TracePackage = {
      chip: { widthMm: 100, lengthMm: 100, heightMm: 1e-3, n: 2.45, absorptionPerMm: 0, emission: 'plane' },
      base: { kind: 'reflectance', reflectance: 0 },
      encapsulant: { shape: 'dome', radiusMm: 1000, heightMm: 1000, n: 1.41, absorptionPerMm: 0 },
      outsideN: 1,
      polarization: 'average'
    };
    const N = 600_000;
    const s = summarize(traceSync(pkg, { rays: N, seed: 31 }));
    const sigma = Math.sqrt((expected * (1 - expected)) / N);
    expect(s.extraction - expected).toBeLessThanOrEqual(K * sigma + 2.5e-4);
    expect(expected - s.extraction).toBeLessThanOrEqual(K * sigma);
    expect(s.tir.outerSurface).toBe(0);
  });

  // dome: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5; sine rule, Born & Wolf §4.2.3: a source at distance r from the centre of a sphere of radius R meets the surface at
  // sin θ ≤ r/R (sine rule), so no ray is trapped while r ≤ R · nOut/nEnc (the inner aplanatic point,
  // Born & Wolf, from memory). R = 1 mm, nEnc = 1.5: r_max = 0.667 mm. The source is a tall 1 µm wide
  // chip (the limits table's smallest size) index-matched to the dome (invisible), emitting at height r on the axis; base absorbing.
  const displaced = (r: number): TracePackage => ({
    chip: { widthMm: 1e-3, lengthMm: 1e-3, heightMm: 0.95, n: 1.5, absorptionPerMm: 0, emitterZMm: r, emission: 'plane' },
    base: { kind: 'reflectance', reflectance: 0 },
    encapsulant: { shape: 'dome', radiusMm: 1, heightMm: 1, n: 1.5, absorptionPerMm: 0 },
    outsideN: 1,
    polarization: 'average'
  });

  it.each([0.3, 0.6, 0.66])('a source %s mm from the centre (inside R/n = 0.667 mm) meets no total reflection at the dome', (r) => {
    const t = traceSync(displaced(r), { rays: 100_000, seed: 32 });
    expect(t.outerSurfaceTir).toBe(0);
    expect(t.geometryErrors).toBe(0);
  });

  it.each([0.7, 0.9])('a source %s mm from the centre (beyond R/n) is totally reflected at the dome for some rays', (r) => {
    const t = traceSync(displaced(r), { rays: 100_000, seed: 33 });
    expect(t.outerSurfaceTir).toBeGreaterThan(0);
  });

  // An encapsulant index-matched to the outside (n = 1, no absorption) is no interface at all: the
  // ledger must match the bare chip's. On a perfect mirror base (so a ray heading down beside the chip
  // returns up instead of counting as a downward escape) the two runs differ only statistically: each
  // fraction within 4·√(σ1² + σ2²).
  it.each(['dome', 'cylinder'] as const)('an index-matched %s gives the bare chip’s ledger (within 4σ of the difference)', (shape) => {
    const chip = { widthMm: 1, lengthMm: 1, heightMm: 0.15, n: 2.45, absorptionPerMm: 0.5, emission: 'plane' as const };
    const base = { kind: 'reflectance' as const, reflectance: 1 };
    const bare: TracePackage = {
      chip,
      base,
      encapsulant: { shape: 'none', radiusMm: 1, heightMm: 1, n: 1, absorptionPerMm: 0 },
      outsideN: 1,
      polarization: 'average'
    };
    const matched: TracePackage = { ...bare, encapsulant: { shape, radiusMm: 2.5, heightMm: shape === 'dome' ? 2.5 : 1, n: 1, absorptionPerMm: 0 } };
    const N = 200_000;
    const a = summarize(traceSync(bare, { rays: N, seed: 34 }));
    const b = summarize(traceSync(matched, { rays: N, seed: 35 }));
    for (const key of ['escaped', 'chip', 'base', 'lost', 'encapsulant'] as const) {
      const p = (a.ledger[key] + b.ledger[key]) / 2;
      const sigmaDiff = Math.sqrt((2 * p * (1 - p)) / N);
      expect(Math.abs(a.ledger[key] - b.ledger[key]), key).toBeLessThanOrEqual(K * sigmaDiff);
    }
    expect(b.counts.encapsulant).toBe(0);
  });
});
