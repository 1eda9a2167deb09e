import { describe, it, expect } from 'vitest';
import { candelaDistribution } from '../../../src/lib/export/candela-distribution';
import { symmetricFlux } from '../../../src/lib/export/symmetric-flux';
import { assertInDelta, EPS } from '../../support/assert';

const lambertBins = () => {
  const thetaDeg = Array.from({ length: 180 }, (_, i) => i + 0.5);
  return { thetaDeg, relativeIntensity: thetaDeg.map((t) => Math.max(0, Math.cos((t * Math.PI) / 180))) };
};

describe('candelaDistribution(farField, lumens, stepDeg)', () => {
  it('puts the grid on 0, step, …, 180 degrees', () => {
    const d = candelaDistribution(lambertBins(), 100, 2.5);
    expect(d.thetaDeg.length).toBe(73);
    expect(d.thetaDeg[0]).toBe(0);
    expect(d.thetaDeg[1]).toBe(2.5);
    expect(d.thetaDeg[72]).toBe(180);
  });

  it('scales the candela so the grid flux equals the lumens asked for (64 ε relative)', () => {
    const d = candelaDistribution(lambertBins(), 350, 1);
    assertInDelta(symmetricFlux(d.thetaDeg, d.candela) / 350, 1, 64 * EPS);
    expect(d.lumens).toBe(350);
    d.candela.forEach((c, i) => assertInDelta(c, d.relativeIntensity[i] * d.candelaPerUnit, 4 * EPS * c + 1e-300));
  });

  it('holds the end values beyond the first and last sampled angles, interpolates linearly between', () => {
    const d = candelaDistribution({ thetaDeg: [10, 20], relativeIntensity: [2, 4] }, 1, 5);
    const rel = d.relativeIntensity;
    expect(rel[0]).toBe(2); // 0°: held
    expect(rel[2]).toBe(2); // 10°
    expect(rel[3]).toBe(3); // 15°: midway
    expect(rel[4]).toBe(4); // 20°
    expect(rel[36]).toBe(4); // 180°: held
  });

  it('rejects a far field with no light, bad lumens and a step that does not divide 180°', () => {
    expect(() => candelaDistribution({ thetaDeg: [0, 90], relativeIntensity: [0, 0] }, 10)).toThrow(/carries no light/);
    expect(() => candelaDistribution(lambertBins(), 0)).toThrow(/lumens must be a number in \[1e-6, 1e7\] lm/);
    expect(() => candelaDistribution(lambertBins(), NaN)).toThrow(/lumens/);
    expect(() => candelaDistribution(lambertBins(), 10, 7)).toThrow(/stepDeg must be one of 0.5, 1, 2, 2.5, 5, 10/);
  });
});
