import { describe, expect, it } from 'vitest';
import { sourceAreaMm2, sourceRadiusMm } from '../../../src/lib/optic-design';

describe('sourceAreaMm2(source) and sourceRadiusMm(source)', () => {
  it('a disc: π w²/4 and w/2', () => {
    expect(sourceAreaMm2({ shape: 'disc', widthMm: 2 })).toBeCloseTo(Math.PI, 15);
    expect(sourceRadiusMm({ shape: 'disc', widthMm: 2 })).toBe(1);
  });
  it('a rectangle: w·l and half the diagonal; a square when the length is left out', () => {
    expect(sourceAreaMm2({ shape: 'rect', widthMm: 1, lengthMm: 2 })).toBe(2);
    expect(sourceRadiusMm({ shape: 'rect', widthMm: 3, lengthMm: 4 })).toBe(2.5);
    expect(sourceAreaMm2({ shape: 'rect', widthMm: 1.5 })).toBe(2.25);
  });
  it('refuses a bad shape or size in one line naming the field', () => {
    expect(() => sourceAreaMm2({ shape: 'hex' as 'disc', widthMm: 1 })).toThrowError(/^source\.shape must be disc or rect$/);
    expect(() => sourceRadiusMm({ shape: 'rect', widthMm: 1, lengthMm: 0 })).toThrowError(/^source\.lengthMm must be a number in \(0, 1000\] \(got 0\)$/);
    expect(() => sourceAreaMm2({ shape: 'disc', widthMm: NaN })).toThrowError(/^source\.widthMm must be a number in \(0, 1000\]/);
  });
});
