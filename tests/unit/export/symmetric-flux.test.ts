import { describe, it, expect } from 'vitest';
import { symmetricFlux } from '../../../src/lib/export/symmetric-flux';
import { assertInDelta, EPS } from '../../support/assert';

describe('symmetricFlux(thetaDeg, intensity)', () => {
  it('gives 4π·I for a uniform (isotropic) source over 0–180° (exact for a linear piece, 16 ε)', () => {
    // Φ = 2π ∫0^π I sin θ dθ = 4π I — solid angle of the sphere (common practice)
    assertInDelta(symmetricFlux([0, 180], [1, 1]), 4 * Math.PI, 16 * EPS);
    assertInDelta(symmetricFlux([0, 30, 90, 180], [2.5, 2.5, 2.5, 2.5]), 10 * Math.PI, 64 * EPS);
  });

  it('gives 2π·I for a uniform hemisphere that stops at 90° (nothing beyond the last angle)', () => {
    assertInDelta(symmetricFlux([0, 45, 90], [1, 1, 1]), 2 * Math.PI, 16 * EPS);
  });

  it('integrates a linear ramp exactly: 2π ∫0^{π/2} (1 − 2θ/π) sin θ dθ = 2π(1 − 2/π)', () => {
    assertInDelta(symmetricFlux([0, 90], [1, 0]), 2 * Math.PI * (1 - 2 / Math.PI), 16 * EPS);
    // The same ramp split into 7 pieces gives the same integral (exactness per piece, 64 ε)
    const t = [0, 10, 20, 35, 50, 70, 85, 90];
    assertInDelta(symmetricFlux(t, t.map((x) => 1 - x / 90)), 2 * Math.PI * (1 - 2 / Math.PI), 64 * EPS);
  });

  it('approaches π·I0 for a Lambertian I0·cos θ as the grid is refined (error ∝ h², Lambert)', () => {
    // Lambert's cosine law: Φ = π I0 (common practice). Piecewise-linear error ≤ h²/8·max|I''| ≈ 3.8e-5 at 1°.
    const grid = (step: number) => Array.from({ length: 90 / step + 1 }, (_, i) => i * step);
    const err = (step: number) => {
      const t = grid(step);
      return Math.abs(symmetricFlux(t, t.map((x) => Math.cos((x * Math.PI) / 180))) - Math.PI) / Math.PI;
    };
    expect(err(1)).toBeLessThan(4e-5);
    expect(err(5)).toBeGreaterThan(err(1));
    // halving the step quarters the error (second order), within 10 %
    assertInDelta(err(2) / err(1), 4, 0.4);
  });

  it('rejects fewer than 2 angles, unsorted or out-of-range angles and negative intensity, naming the field', () => {
    expect(() => symmetricFlux([0], [1])).toThrow(/thetaDeg must list at least 2 angles/);
    expect(() => symmetricFlux([0, 90], [1])).toThrow(/intensity must have one value per angle/);
    expect(() => symmetricFlux([0, 90, 45], [1, 1, 1])).toThrow(/increase strictly/);
    expect(() => symmetricFlux([0, 181], [1, 1])).toThrow(/thetaDeg\[1\] must be a number in \[0, 180\]/);
    expect(() => symmetricFlux([0, 90], [1, -1])).toThrow(/intensity\[1\] must be a finite number ≥ 0/);
    expect(() => symmetricFlux([0, 90], [1, NaN])).toThrow(RangeError);
  });
});
