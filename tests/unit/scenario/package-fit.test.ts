import { describe, expect, it } from 'vitest';
import { minEncapsulantRadiusMm, packageFitProblems } from '../../../src/lib/scenario/package-fit';

const chip = { widthMm: 1, lengthMm: 1, heightMm: 0.15, emitterZMm: 0.14 };

describe('packageFitProblems(chip, encapsulant)', () => {
  it('accepts the demo package: a 1 × 1 × 0.15 mm chip under a 2.5 mm hemisphere', () => {
    expect(packageFitProblems(chip, { shape: 'dome', radiusMm: 2.5, heightMm: 2.5 })).toEqual([]);
  });

  it('the emitter must lie in the chip', () => {
    expect(packageFitProblems({ ...chip, emitterZMm: 0.2 }, { shape: 'none', radiusMm: 1, heightMm: 1 })).toEqual([
      { path: 'chip.emitterZMm', message: 'Emitter height must be between 0 and the chip height (0.15 mm).' }
    ]);
  });

  it("a dome holds the chip's top corners when R > ρ/√(1 − H²/h²) (corner (ρ, H) inside the spheroid; exact identity)", () => {
    // ρ = √0.5 = 0.70711, H = 0.15, h = 1: R > 0.70711/√(1 − 0.0225) = 0.71520 mm (computed)
    const minR = minEncapsulantRadiusMm(chip, { shape: 'dome', radiusMm: 1, heightMm: 1 });
    expect(minR).toBeCloseTo(0.7152, 4);
    expect(packageFitProblems(chip, { shape: 'dome', radiusMm: minR, heightMm: 1 })[0].path).toBe('encapsulant.radiusMm');
    expect(packageFitProblems(chip, { shape: 'dome', radiusMm: minR * (1 + 1e-12), heightMm: 1 })).toEqual([]);
  });

  it('shows a lower bound rounded up, so a radius typed at the shown bound fits', () => {
    const [problem] = packageFitProblems(chip, { shape: 'dome', radiusMm: 0.7, heightMm: 1 });
    expect(problem.message).toMatch(/^Encapsulant radius must be more than 0\.716 mm/);
    expect(packageFitProblems(chip, { shape: 'dome', radiusMm: 0.716, heightMm: 1 })).toEqual([]);
  });

  it('a cylinder must be wider than the half-diagonal and taller than the chip; none checks nothing of the encapsulant', () => {
    expect(packageFitProblems(chip, { shape: 'cylinder', radiusMm: 0.7, heightMm: 1 })[0].message).toMatch(/half-diagonal \(0\.708 mm\)/);
    expect(packageFitProblems(chip, { shape: 'cylinder', radiusMm: 2, heightMm: 0.15 })[0].path).toBe('encapsulant.heightMm');
    expect(packageFitProblems(chip, { shape: 'none', radiusMm: 0.001, heightMm: 0.001 })).toEqual([]);
  });
});
