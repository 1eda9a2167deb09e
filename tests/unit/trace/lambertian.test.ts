import { describe, expect, it } from 'vitest';
import { lambertianDensity, lambertianDirection } from '../../../src/lib/trace/lambertian';
import { nextFloat, seedChunk } from '../../../src/lib/trace/rng';
import { assertInDelta } from '../../support/assert';

const K = 4;

function draw(n: Float64Array, count: number, each: (d: Float64Array) => void): void {
  const d = new Float64Array(3);
  const u = new Float64Array(2);
  for (let i = 0; i < count; i++) {
    u[0] = nextFloat();
    u[1] = nextFloat();
    lambertianDirection(d, n, u);
    each(d);
  }
}

describe('lambertianDirection(out, n, u)', () => {
  it('gives unit directions on the side of n, for normals along every axis and oblique', () => {
    seedChunk(1, 0);
    for (const n of [[0, 0, 1], [0, 0, -1], [1, 0, 0], [0, -1, 0], [0.6, 0, -0.8], [1 / Math.sqrt(3), 1 / Math.sqrt(3), 1 / Math.sqrt(3)]]) {
      const nn = Float64Array.from(n);
      draw(nn, 2000, (d) => {
        assertInDelta(Math.hypot(d[0], d[1], d[2]), 1, 1e-14);
        expect(d[0] * nn[0] + d[1] * nn[1] + d[2] * nn[2]).toBeGreaterThanOrEqual(0);
      });
    }
  });

  // For p(ω) = cos θ/π: E[cos θ] = 2/3, Var = 1/2 − 4/9 = 1/18 (Pharr, Jakob, Humphreys, PBR 3rd ed., §13.6.3).
  it('has mean cos θ = 2/3 (within 4σ, σ = √(1/18/N))', () => {
    seedChunk(2, 0);
    const N = 200_000;
    const n = Float64Array.of(0.36, -0.48, 0.8);
    let sum = 0;
    draw(n, N, (d) => (sum += d[0] * n[0] + d[1] * n[1] + d[2] * n[2]));
    assertInDelta(sum / N, 2 / 3, K * Math.sqrt(1 / 18 / N));
  });

  // Under p = cos θ/π, cos²θ is uniform on [0, 1] and the azimuth uniform on [0, 2π): a χ² test of
  // 10 × 8 equal-probability cells (79 degrees of freedom; the 99.9 % point is 124.8, NIST/SEMATECH
  // e-Handbook of Statistical Methods, §1.3.6.7.4).
  it('matches its density cos θ/π: χ² over cells of cos²θ and azimuth below the 99.9 % point', () => {
    seedChunk(3, 0);
    const N = 80_000;
    const cells = new Float64Array(80);
    draw(Float64Array.of(0, 0, 1), N, (d) => {
      const c2 = d[2] * d[2];
      const phi = Math.atan2(d[1], d[0]) + Math.PI;
      cells[Math.min(9, Math.floor(c2 * 10)) * 8 + Math.min(7, Math.floor((phi / (2 * Math.PI)) * 8))]++;
    });
    const expected = N / 80;
    const chi2 = cells.reduce((s, o) => s + (o - expected) ** 2 / expected, 0);
    expect(chi2).toBeLessThan(124.8);
  });
});

describe('lambertianDensity(cosTheta)', () => {
  it('is cos θ/π, 0 below the surface, and integrates to 1 over the hemisphere (midpoint rule, 1e-6)', () => {
    expect(lambertianDensity(1)).toBe(1 / Math.PI);
    expect(lambertianDensity(-0.5)).toBe(0);
    let integral = 0;
    const steps = 2000;
    for (let i = 0; i < steps; i++) {
      const theta = ((i + 0.5) / steps) * (Math.PI / 2);
      integral += lambertianDensity(Math.cos(theta)) * 2 * Math.PI * Math.sin(theta) * (Math.PI / 2 / steps);
    }
    assertInDelta(integral, 1, 1e-6);
  });
});
