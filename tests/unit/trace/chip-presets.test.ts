import { describe, expect, it } from 'vitest';
import { flipChipOnSapphire, singleBoxChip, thinFilmChip } from '../../../src/lib/trace/chip-presets';
import { validateTracePackage } from '../../../src/lib/trace/package-spec';
import { domePackage } from '../../support/fixtures';

describe('chip presets', () => {
  it('flipChipOnSapphire(): GaN emitting below the sapphire, on its own mirror, valid in a package', () => {
    const chip = flipChipOnSapphire();
    expect(chip.layers?.map((l) => l.name)).toEqual(['GaN', 'sapphire']);
    expect(chip.emitLayer).toBe(0);
    expect(chip.mirror).toEqual({ kind: 'reflectance', reflectance: 0.95 });
    expect(() => validateTracePackage({ ...domePackage(), chip })).not.toThrow();
  });

  it('flipChipOnSapphire({ sapphireMm }) accepts 0.1–0.2 mm and refuses other thicknesses with the range', () => {
    expect(flipChipOnSapphire({ sapphireMm: 0.1 }).heightMm).toBeCloseTo(0.105, 12);
    expect(() => flipChipOnSapphire({ sapphireMm: 0.3 })).toThrow(/sapphireMm must be a number in \[0\.1, 0\.2\]/);
  });

  it('thinFilmChip() and singleBoxChip() are valid in a package', () => {
    expect(() => validateTracePackage({ ...domePackage(), chip: thinFilmChip() })).not.toThrow();
    expect(() => validateTracePackage({ ...domePackage(), chip: singleBoxChip() })).not.toThrow();
    expect(singleBoxChip().layers).toBeUndefined();
  });
});
