import { describe, expect, it } from 'vitest';
import { bareChip, withEncapsulant } from '../../../src/lib/sweeps/vary-package';
import { domePackage, ROUND_INDICES } from '../../support/fixtures';

describe('withEncapsulant(pkg, patch)', () => {
  it('returns a deep enough copy: editing the result never touches the input', () => {
    const pkg = domePackage(ROUND_INDICES);
    const out = withEncapsulant(pkg, { n: 1.7 });
    out.chip.n = 3;
    out.base = { kind: 'reflectance', reflectance: 0 };
    expect(pkg.chip.n).toBe(2.5);
    expect(pkg.encapsulant.n).toBe(1.5);
    expect(out.encapsulant.n).toBe(1.7);
  });
});

describe('bareChip(pkg)', () => {
  it('removes the encapsulant and keeps chip, base, outside index and polarisation mode', () => {
    const pkg = domePackage(ROUND_INDICES);
    const bare = bareChip(pkg);
    expect(bare.encapsulant.shape).toBe('none');
    expect(bare.chip).toEqual(pkg.chip);
    expect(bare.base).toEqual(pkg.base);
    expect(bare.outsideN).toBe(pkg.outsideN);
    expect(pkg.encapsulant.shape).toBe('dome');
  });
});
