import { describe, expect, it } from 'vitest';
import { minEncapsulantRadiusMm, packageFitProblems, phosphorFitProblems } from '../../../src/lib/scenario/package-fit';

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

  it("a square box (R its half side) must reach past half the chip's longer side and rise above the chip", () => {
    const long = { ...chip, lengthMm: 1.4 };
    expect(minEncapsulantRadiusMm(long, { shape: 'box', radiusMm: 1, heightMm: 1 })).toBe(0.7);
    expect(packageFitProblems(long, { shape: 'box', radiusMm: 0.7, heightMm: 1 })[0].message).toMatch(/^Box half side must be more than half the chip's longer side \(0\.7\d* mm\)/);
    expect(packageFitProblems(long, { shape: 'box', radiusMm: 0.71, heightMm: 1 })).toEqual([]);
    expect(packageFitProblems(long, { shape: 'box', radiusMm: 1, heightMm: 0.1 })[0].path).toBe('encapsulant.heightMm');
  });
});

describe('packageFitProblems with a cup, layers and a base finish', () => {
  const cup = { kind: 'cup' as const, floorRadiusMm: 1.3, topRadiusMm: 1.5, depthMm: 0.8 };
  const flatFill = { shape: 'flat' as const, radiusMm: 1.5, heightMm: 1 };

  it('accepts the mid-power cup: a 1 × 1 mm chip on a 1.3 mm floor, 0.8 mm deep, filled flat or with a dome as wide as the rim', () => {
    expect(packageFitProblems(chip, flatFill, cup)).toEqual([]);
    expect(packageFitProblems(chip, { shape: 'dome', radiusMm: 1.5, heightMm: 1.5 }, cup)).toEqual([]);
    expect(packageFitProblems(chip, { shape: 'none', radiusMm: 9, heightMm: 9 }, cup)).toEqual([]);
  });

  it('a chip wider than the floor or taller than the cup is refused, naming the field and the bound', () => {
    // half-diagonal of 2 × 2 mm: √2 = 1.41421 mm > 1.3 mm
    const wide = packageFitProblems({ ...chip, widthMm: 2, lengthMm: 2 }, flatFill, cup);
    expect(wide).toEqual([
      { path: 'body.floorRadiusMm', message: "Cup floor radius must be more than the chip's half-diagonal (1.42 mm) so the chip fits on the floor, and at most 1000 mm." }
    ]);
    expect(packageFitProblems(chip, flatFill, { ...cup, depthMm: 0.15 })[0]).toEqual({
      path: 'body.depthMm',
      message: 'Cup depth must be more than the chip height (0.15 mm) and at most 1000 mm.'
    });
  });

  it('a dome wider than the rim, a rim narrower than the floor and a cylinder in a cup are refused', () => {
    expect(packageFitProblems(chip, { shape: 'dome', radiusMm: 1.6, heightMm: 1 }, cup)[0].path).toBe('encapsulant.radiusMm');
    expect(packageFitProblems(chip, { shape: 'dome', radiusMm: 1.6, heightMm: 1 }, cup)[0].message).toMatch(/top radius \(1\.5 mm\)/);
    expect(packageFitProblems(chip, flatFill, { ...cup, topRadiusMm: 1.2 })[0].path).toBe('body.topRadiusMm');
    expect(packageFitProblems(chip, { ...flatFill, shape: 'cylinder' }, cup)[0].path).toBe('encapsulant.shape');
    expect(packageFitProblems(chip, { ...flatFill, shape: 'box' }, cup)[0].path).toBe('encapsulant.shape');
    expect(packageFitProblems(chip, flatFill)[0].path).toBe('encapsulant.shape');
  });

  it('layers must add up to the chip height and the emitter must lie in the emitting layer', () => {
    const layers = [{ thicknessMm: 0.005 }, { thicknessMm: 0.15 }];
    const layered = { widthMm: 1, lengthMm: 1, heightMm: 0.155, emitterZMm: 0.0025, layers, emitLayer: 0 };
    expect(packageFitProblems(layered, flatFill, cup)).toEqual([]);
    expect(packageFitProblems({ ...layered, heightMm: 0.2 }, flatFill, cup)[0].path).toBe('chip.heightMm');
    expect(packageFitProblems({ ...layered, emitLayer: 2 }, flatFill, cup)[0]).toEqual({
      path: 'chip.emitLayer',
      message: 'Emitting layer must be a layer number from 1 to 2.'
    });
    expect(packageFitProblems({ ...layered, emitterZMm: 0.1 }, flatFill, cup)[0]).toEqual({
      path: 'chip.emitterZMm',
      message: 'Emitter height must be inside emitting layer 1: between 0 and 0.005 mm.'
    });
  });

  it('a diffuse base needs a plain reflectance', () => {
    expect(packageFitProblems(chip, flatFill, cup, { kind: 'metal', finish: 'diffuse' })[0].path).toBe('baseFinish');
    expect(packageFitProblems(chip, flatFill, cup, { kind: 'reflectance', finish: 'diffuse' })).toEqual([]);
  });
});

describe('phosphorFitProblems(chip, encapsulant, body, phosphor)', () => {
  const cup = { kind: 'cup' as const, floorRadiusMm: 1.3, topRadiusMm: 1.5, depthMm: 0.8 };
  const flat = { kind: 'flat' as const };
  const fill = { shape: 'flat' as const, radiusMm: 1, heightMm: 1 };
  const dome = { shape: 'dome' as const, radiusMm: 2.5, heightMm: 2.5 };

  it('the dispersed region fits any package with an encapsulant; none fits without one', () => {
    expect(phosphorFitProblems(chip, dome, flat, { region: 'encapsulant' })).toEqual([]);
    expect(phosphorFitProblems(chip, { ...dome, shape: 'none' }, flat, { region: 'encapsulant' })[0].path).toBe('phosphor.region');
  });

  it('a remote plate in a flat-filled cup must leave the chip below it: T < depth − H = 0.65 mm', () => {
    expect(phosphorFitProblems(chip, fill, cup, { region: 'remote', thicknessMm: 0.6 })).toEqual([]);
    const [p] = phosphorFitProblems(chip, fill, cup, { region: 'remote', thicknessMm: 0.7 });
    expect(p.path).toBe('phosphor.thicknessMm');
    expect(p.message).toMatch(/below 0\.649 mm for a remote layer here \(a plate at the top of the cup fill, above the chip\)/);
  });

  it('a floor layer must be thinner than the chip (H = 0.15 mm), and needs a cup or a cylinder', () => {
    expect(phosphorFitProblems(chip, fill, cup, { region: 'floor', thicknessMm: 0.1 })).toEqual([]);
    expect(phosphorFitProblems(chip, fill, cup, { region: 'floor', thicknessMm: 0.15 })[0].message).toMatch(/below 0\.149 mm for a floor layer/);
    expect(phosphorFitProblems(chip, dome, flat, { region: 'floor', thicknessMm: 0.1 })[0].path).toBe('phosphor.region');
  });

  it('a conformal layer keeps the coated chip on the cup floor: half-diagonal (0.5 + T)·√2 < 1.3 mm gives T < 0.419 mm', () => {
    expect(phosphorFitProblems(chip, fill, cup, { region: 'conformal', thicknessMm: 0.4 })).toEqual([]);
    expect(phosphorFitProblems(chip, fill, cup, { region: 'conformal', thicknessMm: 0.45 })[0].message).toMatch(/below 0\.419 mm/);
  });

  it('a remote shell under the dome must be thinner than the dome and clear of the chip', () => {
    expect(phosphorFitProblems(chip, dome, flat, { region: 'remote', thicknessMm: 1 })).toEqual([]);
    expect(phosphorFitProblems(chip, dome, flat, { region: 'remote', thicknessMm: 2.4 })[0].path).toBe('phosphor.thicknessMm');
  });

  it('a layer region needs its thickness', () => {
    expect(phosphorFitProblems(chip, dome, flat, { region: 'conformal' })[0].message).toMatch(/thickness is needed/);
  });
});
