/** The Henyey–Greenstein sampler against its own density and mean cosine. */
import { describe, expect, it } from 'vitest';
import { henyeyGreensteinDensity, sampleHenyeyGreenstein } from '../../src/lib/scatter';
import { nextFloat, seedChunk } from '../../src/lib/trace/rng';

describe('Henyey–Greenstein phase function', () => {
  it('has a density that integrates to 1 with mean cosine g (Henyey & Greenstein, ApJ 93, 70 (1941))', () => {
    for (const g of [-0.6, 0, 0.3, 0.85]) {
      // midpoint rule with 20 000 cells: error well below 1e-6 for |g| ≤ 0.85
      let total = 0, mean = 0;
      const n = 20000;
      for (let i = 0; i < n; i++) {
        const mu = -1 + (2 * (i + 0.5)) / n;
        const p = henyeyGreensteinDensity(g, mu) * (2 / n);
        total += p;
        mean += p * mu;
      }
      expect(Math.abs(total - 1)).toBeLessThan(1e-5);
      expect(Math.abs(mean - g)).toBeLessThan(1e-5);
    }
  });

  it.each([0, 0.5, 0.9, -0.4])('g = %f: the sample mean cosine equals g within 4σ', (g) => {
    // 40 000 draws; σ of the mean = sqrt(Var μ / N), Var μ = E[μ²] − g² with E[μ²] = (1 + 2g²)/3 for HG; k = 4
    const n = 40000;
    seedChunk(1941, 93);
    let sum = 0;
    for (let i = 0; i < n; i++) sum += sampleHenyeyGreenstein(g, nextFloat());
    const sigma = Math.sqrt(((1 + 2 * g * g) / 3 - g * g) / n);
    expect(Math.abs(sum / n - g)).toBeLessThan(4 * sigma);
  });

  it.each([0.3, 0.85])('g = %f: binned samples pass a χ² test against the density', (g) => {
    // 40 bins in μ, 40 000 draws; expected counts from the integrated density (CDF differences).
    // χ² with 39 degrees of freedom: the 99.9 % point is 72.05 (published: any χ² table, e.g. NIST/SEMATECH e-Handbook 1.3.6.7.4)
    const bins = 40, n = 40000;
    const counts = new Float64Array(bins);
    seedChunk(1941, 70);
    for (let i = 0; i < n; i++) {
      const mu = sampleHenyeyGreenstein(g, nextFloat());
      counts[Math.min(bins - 1, Math.floor(((mu + 1) / 2) * bins))]++;
    }
    // CDF of HG in μ: F(μ) = (1 − g²)/(2g)·[(1 + g² − 2gμ)^(−1/2) − (1 + g)^(−1)]
    const cdf = (mu: number) => ((1 - g * g) / (2 * g)) * ((1 + g * g - 2 * g * mu) ** -0.5 - 1 / (1 + g));
    let chi2 = 0;
    for (let b = 0; b < bins; b++) {
      const expected = n * (cdf(-1 + (2 * (b + 1)) / bins) - cdf(-1 + (2 * b) / bins));
      chi2 += (counts[b] - expected) ** 2 / expected;
    }
    expect(cdf(1)).toBeCloseTo(1, 12);
    expect(chi2).toBeLessThan(72.05);
  });

  it('returns cosines in [−1, 1] at the ends of u and is isotropic for g = 0', () => {
    for (const g of [-0.99, 0, 0.99]) for (const u of [0, 1 - 2 ** -32]) expect(Math.abs(sampleHenyeyGreenstein(g, u))).toBeLessThanOrEqual(1);
    expect(sampleHenyeyGreenstein(0, 0.25)).toBe(-0.5);
  });
});
