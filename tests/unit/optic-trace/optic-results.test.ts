import { describe, expect, it } from 'vitest';
import { widthAtLevelDeg, zoneSolidAngleSr } from '../../../src/lib/optic-trace';

describe('optic results', () => {
  it('zone solid angles sum to the full sphere, 4π sr', () => {
    let sum = 0;
    for (let i = 0; i < 180; i++) sum += zoneSolidAngleSr(i);
    expect(sum).toBeCloseTo(4 * Math.PI, 12);
  });

  it('full width at half maximum of a Gaussian beam I = exp(−θ²/2s²) is 2·s·√(2 ln 2) (common practice)', () => {
    const s = 6;
    const I = Array.from({ length: 180 }, (_, i) => Math.exp(-((i + 0.5) ** 2) / (2 * s * s)));
    expect(widthAtLevelDeg(I, 0.5)).toBeCloseTo(2 * s * Math.sqrt(2 * Math.log(2)), 0);
    expect(widthAtLevelDeg(I, 0.1)).toBeCloseTo(2 * s * Math.sqrt(2 * Math.log(10)), 0);
  });

  it('a far field that never falls below the level is 360° wide; an empty one 0°', () => {
    expect(widthAtLevelDeg(new Array(180).fill(1), 0.5)).toBe(360);
    expect(widthAtLevelDeg(new Array(180).fill(0), 0.5)).toBe(0);
  });
});
