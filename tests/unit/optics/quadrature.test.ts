import { describe, it, expect } from 'vitest';
import { integrate, integrateSmoothEnds } from '../../../src/lib/optics/quadrature';
import { assertInDelta, EPS } from '../../support/assert';

describe('integrate(f, a, b)', () => {
  it('is exact for polynomials up to degree 13 in one 7-point Gauss step (8 ε)', () => {
    let calls = 0;
    const v = integrate((x) => {
      calls++;
      return 14 * x ** 13 + 3 * x * x;
    }, 0, 1);
    assertInDelta(v, 2, 8 * EPS);
    expect(calls).toBe(15); // no refinement was needed: the K15 − G7 estimate was already ~0
  });
  it('integrates sin over [0, π] to 2 (1e-14)', () => {
    assertInDelta(integrate(Math.sin, 0, Math.PI), 2, 1e-14);
  });
  it('handles a sharp peak: ∫ 1/(1 + 1e4 x²) over [−1, 1] = 2 atan(100)/100 (1e-13)', () => {
    assertInDelta(integrate((x) => 1 / (1 + 1e4 * x * x), -1, 1), (2 * Math.atan(100)) / 100, 1e-13);
  });
  it('returns 0 for an empty interval and changes sign when the limits swap', () => {
    expect(integrate(Math.exp, 1, 1)).toBe(0);
    assertInDelta(integrate(Math.exp, 1, 0), -(Math.E - 1), 1e-14);
  });
});

describe('integrateSmoothEnds(f, a, b)', () => {
  it('integrates a √ endpoint singularity ∫₀¹ √(1 − x) dx = 2/3 to 1e-14', () => {
    assertInDelta(integrateSmoothEnds((x) => Math.sqrt(1 - x), 0, 1), 2 / 3, 1e-14);
  });
  it('integrates √ behaviour at both ends: ∫₀¹ √(x(1 − x)) dx = π/8 (1e-14)', () => {
    assertInDelta(integrateSmoothEnds((x) => Math.sqrt(x * (1 - x)), 0, 1), Math.PI / 8, 1e-14);
  });
  it('agrees with integrate on smooth integrands (1e-14)', () => {
    assertInDelta(integrateSmoothEnds(Math.cos, 0.2, 1.3), Math.sin(1.3) - Math.sin(0.2), 1e-14);
  });
});
