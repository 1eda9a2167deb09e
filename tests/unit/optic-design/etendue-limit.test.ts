import { describe, expect, it } from 'vitest';
import { etendueLimitHalfAngleRad, etendueMm2Sr, minExitDiameterMm } from '../../../src/lib/optic-design';

describe('etendueMm2Sr(area, n, halfAngle)', () => {
  it('is π n² A sin² θ: a 1 mm² Lambertian source into a hemisphere of index 1.5 holds 2.25π mm²·sr', () => {
    expect(etendueMm2Sr(1, 1.5, Math.PI / 2)).toBeCloseTo(2.25 * Math.PI, 14);
    expect(etendueMm2Sr(1, 1, 0)).toBe(0);
  });
});

describe('etendueLimitHalfAngleRad(input)', () => {
  it('is π/2 (no narrowing possible) when the exit is smaller than the source', () => {
    expect(etendueLimitHalfAngleRad({ sourceAreaMm2: 100, exitDiameterMm: 5 })).toBe(Math.PI / 2);
  });
  it('falls as 1/D: doubling the exit halves sin θ', () => {
    const a = Math.sin(etendueLimitHalfAngleRad({ sourceAreaMm2: 4, exitDiameterMm: 10 }));
    const b = Math.sin(etendueLimitHalfAngleRad({ sourceAreaMm2: 4, exitDiameterMm: 20 }));
    expect(a / b).toBeCloseTo(2, 14);
  });
  it('refuses sizes ≤ 0 and a collection angle outside (0, π/2]', () => {
    expect(() => etendueLimitHalfAngleRad({ sourceAreaMm2: 0, exitDiameterMm: 10 })).toThrowError(/^sourceAreaMm2 must be a finite number > 0/);
    expect(() => etendueLimitHalfAngleRad({ sourceAreaMm2: 1, exitDiameterMm: -1 })).toThrowError(/^exitDiameterMm must be a finite number > 0/);
    expect(() => etendueLimitHalfAngleRad({ sourceAreaMm2: 1, exitDiameterMm: 10, collectionHalfAngleRad: 2 })).toThrowError(/^collectionHalfAngleRad must be a number in \(0, π\/2\]/);
  });
});

describe('minExitDiameterMm(area, beamDeg)', () => {
  it('inverts the limit and refuses a beam outside (0, 180]', () => {
    const D = minExitDiameterMm(2, 12);
    expect((2 * etendueLimitHalfAngleRad({ sourceAreaMm2: 2, exitDiameterMm: D }) * 180) / Math.PI).toBeCloseTo(12, 12);
    expect(() => minExitDiameterMm(2, 0)).toThrowError(/^targetBeamDeg must be a number in \(0, 180\]/);
  });
});
