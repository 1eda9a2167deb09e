import { describe, it, expect } from 'vitest';
import {
  gradedIndexLayers, profileIndex, singleLayerOptimumIndex, quarterWaveThicknessNm
} from '../../../src/lib/optics/graded-index';
import { assertInDelta, EPS } from '../../support/assert';

describe('profileIndex(nA, nB, profile, t)', () => {
  it('runs from nA at t = 0 to nB at t = 1 for every profile (4 ε)', () => {
    for (const p of ['linear', 'quintic', 'exponential'] as const) {
      assertInDelta(profileIndex(2.5, 1, p, 0), 2.5, 4 * EPS);
      assertInDelta(profileIndex(2.5, 1, p, 1), 1, 4 * EPS);
    }
  });
  it('gives the quintic profile zero slope at both ends and the midpoint value at t = 1/2', () => {
    const h = 1e-6;
    expect(Math.abs(profileIndex(2.5, 1, 'quintic', h) - 2.5)).toBeLessThan(1e-16 + 20 * h ** 3);
    assertInDelta(profileIndex(2.5, 1, 'quintic', 0.5), 1.75, 4 * EPS);
  });
  it('gives the exponential profile equal index ratios per step', () => {
    assertInDelta(profileIndex(2.5, 1, 'exponential', 0.5) ** 2, 2.5, 8 * EPS);
  });
});

describe('gradedIndexLayers(spec)', () => {
  it('splits the thickness equally and samples the profile at mid-depth', () => {
    const ls = gradedIndexLayers({ nA: 2.5, nB: 1, thicknessNm: 500, steps: 5, profile: 'linear' });
    expect(ls).toHaveLength(5);
    ls.forEach((l) => expect(l.thicknessNm).toBe(100));
    assertInDelta(ls[0].n, 2.35, 4 * EPS);
    assertInDelta(ls[4].n, 1.15, 4 * EPS);
    expect(ls.every((l) => l.k === 0)).toBe(true);
  });
  it('passes k through and accepts a single step', () => {
    const ls = gradedIndexLayers({ nA: 2, nB: 1, thicknessNm: 80, steps: 1, profile: 'exponential', k: 0.01 });
    assertInDelta(ls[0].n, Math.SQRT2, 4 * EPS);
    expect(ls[0].k).toBe(0.01);
  });
  it('rejects zero steps, an unknown profile and a negative thickness', () => {
    expect(() => gradedIndexLayers({ nA: 2, nB: 1, thicknessNm: 80, steps: 0, profile: 'linear' })).toThrow(/steps/);
    expect(() => gradedIndexLayers({ nA: 2, nB: 1, thicknessNm: 80, steps: 2, profile: 'cubic' as 'linear' })).toThrow(/profile/);
    expect(() => gradedIndexLayers({ nA: 2, nB: 1, thicknessNm: -1, steps: 2, profile: 'linear' })).toThrow(/thicknessNm/);
  });
});

describe('singleLayerOptimumIndex(nIn, nOut) and quarterWaveThicknessNm(n, λ, θ)', () => {
  it('is the geometric mean √(nIn nOut)', () => {
    assertInDelta(singleLayerOptimumIndex(2.5, 1), Math.sqrt(2.5), EPS);
  });
  it('gives λ / (4 n cos θ)', () => {
    assertInDelta(quarterWaveThicknessNm(1.38, 550), 550 / 5.52, 4 * EPS * 100);
    assertInDelta(quarterWaveThicknessNm(2, 600, Math.PI / 3), 150, 1e-12);
  });
  it('rejects a grazing layer angle and a zero index', () => {
    expect(() => quarterWaveThicknessNm(1.5, 550, Math.PI / 2)).toThrow(/thetaLayerRad/);
    expect(() => singleLayerOptimumIndex(0, 1)).toThrow(/nIn/);
  });
});
