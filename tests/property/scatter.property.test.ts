/** Property tests of Mie scattering and the particle cloud over random inputs (seeded). */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { mieEfficiencies, particleCloud, PARTICLE_CLOUD_LIMITS } from '../../src/lib/scatter';

const seed = 12012;

describe('Mie efficiencies over random spheres', () => {
  it('are finite, Qsca ≤ Qext, Qabs ≥ 0 and −1 ≤ g ≤ 1 for x up to 2000', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-3, max: 2000, noNaN: true }),
        fc.double({ min: 0.5, max: 3, noNaN: true }),
        fc.double({ min: 0, max: 2, noNaN: true }),
        (x, mRe, mIm) => {
          const q = mieEfficiencies(mRe, mIm, x);
          for (const v of [q.qExt, q.qSca, q.qAbs, q.qBack, q.g]) expect(Number.isFinite(v)).toBe(true);
          expect(q.qSca).toBeLessThanOrEqual(q.qExt * (1 + 1e-9) + 1e-15);
          expect(q.qAbs).toBeGreaterThanOrEqual(0);
          expect(Math.abs(q.g)).toBeLessThanOrEqual(1);
        }
      ),
      { seed, numRuns: 150 }
    );
  });
});

describe('particleCloud over random powders', () => {
  const powder = fc.record({
    wavelengthNm: fc.double({ min: 380, max: 780, noNaN: true }),
    particleN: fc.double({ min: 1.6, max: 2.3, noNaN: true }),
    particleK: fc.double({ min: 0, max: 0.01, noNaN: true }),
    hostN: fc.double({ min: 1.38, max: 1.6, noNaN: true }),
    diameterUm: fc.double({ min: 1, max: 25, noNaN: true }),
    spread: fc.double({ min: 1, max: 1.8, noNaN: true }),
    particleDensity: fc.double({ min: 3, max: 7, noNaN: true }),
    hostDensity: fc.double({ min: 0.9, max: 1.3, noNaN: true })
  });

  it('μs and μa scale linearly with weight fraction at low load (Beer–Lambert in number density)', () => {
    fc.assert(
      fc.property(powder, (p) => {
        const at = (w: number) =>
          particleCloud({
            wavelengthNm: p.wavelengthNm, particleN: p.particleN, particleK: p.particleK, hostN: p.hostN,
            size: p.spread > 1.05 ? { kind: 'lognormal', d50Um: p.diameterUm, spread: p.spread } : { kind: 'single', diameterUm: p.diameterUm },
            weightFraction: w, particleDensityGPerCm3: p.particleDensity, hostDensityGPerCm3: p.hostDensity
          });
        const a = at(0.001);
        const b = at(0.002);
        // φ = (w/ρp)/(w/ρp + (1 − w)/ρh) is linear in w to O(w): at w ≤ 0.002 the departure is below 0.5 %
        expect(b.musPerMm / a.musPerMm).toBeGreaterThan(2 * 0.995);
        expect(b.musPerMm / a.musPerMm).toBeLessThan(2 * 1.005);
        if (a.muaPerMm > 1e-300) expect(Math.abs(b.muaPerMm / a.muaPerMm - 2)).toBeLessThan(0.01);
        expect(b.g).toBeCloseTo(a.g, 12);
        for (const v of [a.musPerMm, a.muaPerMm, a.g, a.numberPerMm3]) expect(Number.isFinite(v)).toBe(true);
      }),
      { seed, numRuns: 40 }
    );
  });

  it('gives zero coefficients at zero load and refuses loads beyond its range', () => {
    const base = { wavelengthNm: 450, particleN: 1.83, particleK: 5e-4, hostN: 1.41, size: { kind: 'single', diameterUm: 10 } as const,
      particleDensityGPerCm3: 4.55, hostDensityGPerCm3: 1.1 };
    expect(particleCloud({ ...base, weightFraction: 0 }).musPerMm).toBe(0);
    expect(() => particleCloud({ ...base, weightFraction: -0.1 })).toThrow(/weightFraction must be a number from 0 to 0.95/);
    expect(() => particleCloud({ ...base, weightFraction: PARTICLE_CLOUD_LIMITS.weightFraction.max + 0.01 })).toThrow(/weightFraction/);
    expect(() => particleCloud({ ...base, weightFraction: 0.1, size: { kind: 'single', diameterUm: 500 } })).toThrow(/diameterUm must be a number from 0.05 to 50/);
  });
});
