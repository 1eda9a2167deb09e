import { describe, it, expect } from 'vitest';
import { iesOpeningMetres, packageOpening } from '../../../src/lib/export/ies-opening';

describe('iesOpeningMetres(opening)', () => {
  it('writes sizes in metres with the shape signs of LM-63-2019 (from memory, see file header)', () => {
    expect(iesOpeningMetres({ shape: 'point', widthMm: 1, lengthMm: 1, heightMm: 1 })).toEqual([0, 0, 0]);
    expect(iesOpeningMetres({ shape: 'rectangle', widthMm: 2, lengthMm: 3, heightMm: 9 })).toEqual([0.002, 0.003, 0]);
    expect(iesOpeningMetres({ shape: 'box', widthMm: 1, lengthMm: 1, heightMm: 0.15 })).toEqual([0.001, 0.001, 0.00015]);
    expect(iesOpeningMetres({ shape: 'disc', widthMm: 5, lengthMm: 5, heightMm: 0 })).toEqual([-0.005, -0.005, 0]);
    expect(iesOpeningMetres({ shape: 'cylinder', widthMm: 5, lengthMm: 5, heightMm: 2.5 })).toEqual([-0.005, -0.005, 0.0025]);
    expect(iesOpeningMetres({ shape: 'sphere', widthMm: 4, lengthMm: 4, heightMm: 4 })).toEqual([-0.004, -0.004, -0.004]);
  });

  it('rejects unknown shapes and sizes outside (0, 10000] mm, naming the field', () => {
    // @ts-expect-error — a shape the standard does not list
    expect(() => iesOpeningMetres({ shape: 'cone', widthMm: 1, lengthMm: 1, heightMm: 1 })).toThrow(/opening.shape must be one of/);
    expect(() => iesOpeningMetres({ shape: 'box', widthMm: 1, lengthMm: 0, heightMm: 1 })).toThrow(/opening.lengthMm must be a number in \(0, 10000\] mm/);
    expect(() => iesOpeningMetres({ shape: 'cylinder', widthMm: 1, lengthMm: 1, heightMm: NaN })).toThrow(/opening.heightMm/);
  });
});

describe('packageOpening(encapsulant, chip)', () => {
  it('gives the dome or cylinder as a vertical cylinder of its base diameter and height', () => {
    expect(packageOpening({ shape: 'dome', radiusMm: 2.5, heightMm: 2.5 }, { widthMm: 1, lengthMm: 1, heightMm: 0.15 }))
      .toEqual({ shape: 'cylinder', widthMm: 5, lengthMm: 5, heightMm: 2.5 });
    expect(packageOpening({ shape: 'cylinder', radiusMm: 2, heightMm: 1 }, { widthMm: 1, lengthMm: 1, heightMm: 0.15 }))
      .toEqual({ shape: 'cylinder', widthMm: 4, lengthMm: 4, heightMm: 1 });
  });

  it('gives a bare chip as a box with luminous sides', () => {
    expect(packageOpening({ shape: 'none', radiusMm: 2.5, heightMm: 2.5 }, { widthMm: 1, lengthMm: 0.5, heightMm: 0.15 }))
      .toEqual({ shape: 'box', widthMm: 1, lengthMm: 0.5, heightMm: 0.15 });
  });
});

describe('packageOpening(encapsulant, chip, body) with a reflector cup', () => {
  const chip = { widthMm: 1, lengthMm: 1, heightMm: 0.15 };
  const cup = { kind: 'cup' as const, topRadiusMm: 1.5 };
  it("a cup filled flat or empty is a luminous disc of the rim's diameter (LM-63-2019 disc: −d −d 0, from memory)", () => {
    expect(packageOpening({ shape: 'flat', radiusMm: 9, heightMm: 9 }, chip, { ...cup, fill: 'flat' })).toEqual({ shape: 'disc', widthMm: 3, lengthMm: 3, heightMm: 0 });
    expect(packageOpening({ shape: 'none', radiusMm: 9, heightMm: 9 }, chip, { ...cup, fill: 'none' }).shape).toBe('disc');
  });
  it("a dome on the rim is the vertical cylinder of the rim's diameter and the dome's height", () => {
    expect(packageOpening({ shape: 'dome', radiusMm: 1.5, heightMm: 1 }, chip, { ...cup, fill: 'dome' })).toEqual({ shape: 'cylinder', widthMm: 3, lengthMm: 3, heightMm: 1 });
  });
});
