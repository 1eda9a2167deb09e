import { describe, expect, it } from 'vitest';
import {
  emitterHeightMm,
  validateTraceOptions,
  validateTracePackage,
  type TracePackage
} from '../../../src/lib/trace/package-spec';
import { NO_ENCAPSULANT, domePackage, withEncapsulant } from '../../support/fixtures';

/** A copy of the dome package with one field replaced by a path like 'chip.n'. */
function withField(path: string, value: unknown): TracePackage {
  const pkg = structuredClone(domePackage()) as unknown as Record<string, Record<string, unknown>>;
  const [a, b] = path.split('.');
  if (b === undefined) (pkg as Record<string, unknown>)[a] = value;
  else pkg[a][b] = value;
  return pkg as unknown as TracePackage;
}

describe('validateTracePackage(pkg)', () => {
  it('accepts the dome, cylinder and bare packages', () => {
    expect(() => validateTracePackage(domePackage())).not.toThrow();
    expect(() =>
      validateTracePackage(withEncapsulant(domePackage(), { shape: 'cylinder', radiusMm: 2.5, heightMm: 1, n: 1.41, absorptionPerMm: 0 }))
    ).not.toThrow();
    expect(() => validateTracePackage(withEncapsulant(domePackage(), NO_ENCAPSULANT))).not.toThrow();
  });

  it.each([
    ['chip.widthMm', 0, /chip\.widthMm must be a number in \[0\.001, 1000\]/],
    ['chip.heightMm', Number.NaN, /chip\.heightMm must be a number in/],
    ['chip.n', 0.5, /chip\.n must be a number in \[1, 6\]/],
    ['chip.absorptionPerMm', -1, /chip\.absorptionPerMm must be a number in \[0, 1000\]/],
    ['chip.emitterZMm', 0.2, /chip\.emitterZMm must be a number in \[0, 0\.15\]/],
    ['chip.emission', 'point', /chip\.emission must be one of 'plane', 'volume'/],
    ['base.reflectance', 1.1, /base\.reflectance must be a number in \[0, 1\]/],
    ['outsideN', Infinity, /outsideN must be a number in \[1, 6\]/],
    ['polarization', 'none', /polarization must be one of 'average', 'track'/],
    ['encapsulant.shape', 'cube', /encapsulant\.shape must be one of 'none', 'dome', 'cylinder'/],
    ['encapsulant.n', '1.5', /encapsulant\.n must be a number in \[1, 6\] \(got "1\.5"\)/]
  ])('rejects %s = %s with a RangeError naming the field and range', (path, value, message) => {
    expect(() => validateTracePackage(withField(path, value))).toThrow(RangeError);
    expect(() => validateTracePackage(withField(path, value))).toThrow(message);
  });

  it('accepts a metal base with n < 1 (metals), and rejects a negative k', () => {
    const metal = { ...domePackage(), base: { kind: 'metal' as const, n: 0.04382, k: 3.6101 } };
    expect(() => validateTracePackage(metal)).not.toThrow();
    expect(() => validateTracePackage({ ...metal, base: { kind: 'metal', n: 0.5, k: -1 } })).toThrow(/base\.k must be/);
  });

  it('rejects a chip whose top corners poke out of the dome, naming the smallest radius', () => {
    // corners at (±0.5, ±0.5, 0.15): need R > ρ/√(1 − H²/h²), ρ = √0.5; h = 1 → R > 0.715199
    const dome = (radiusMm: number) =>
      withEncapsulant(domePackage(), { shape: 'dome', radiusMm, heightMm: 1, n: 1.41, absorptionPerMm: 0 });
    expect(() => validateTracePackage(dome(0.7))).toThrow(/encapsulant\.radiusMm: Encapsulant radius must be more than 0\.716 mm/);
    expect(() => validateTracePackage(dome(0.716))).not.toThrow();
  });

  it('rejects a cylinder lower than the chip or narrower than its half-diagonal', () => {
    const cyl = (radiusMm: number, heightMm: number) =>
      withEncapsulant(domePackage(), { shape: 'cylinder', radiusMm, heightMm, n: 1.41, absorptionPerMm: 0 });
    expect(() => validateTracePackage(cyl(2, 0.15))).toThrow(/encapsulant\.heightMm: Encapsulant height must be more than the chip height \(0\.15 mm\)/);
    expect(() => validateTracePackage(cyl(0.7, 1))).toThrow(/encapsulant\.radiusMm: Encapsulant radius must be more than the chip's half-diagonal \(0\.708 mm\)/);
    expect(() => validateTracePackage(cyl(0.71, 1))).not.toThrow();
  });

  it('ignores the encapsulant numbers when there is none', () => {
    expect(() =>
      validateTracePackage(withEncapsulant(domePackage(), { shape: 'none', radiusMm: -1, heightMm: 0, n: 0, absorptionPerMm: -1 }))
    ).not.toThrow();
  });

  it('rejects a missing part with a message naming it', () => {
    expect(() => validateTracePackage(withField('chip', null))).toThrow(/chip must be an object/);
  });
});

describe('validateTraceOptions(options)', () => {
  it.each([
    [{ rays: 0, seed: 1 }, /rays must be an integer in \[1, 20000000\]/],
    [{ rays: 1.5, seed: 1 }, /rays must be an integer/],
    [{ rays: 1e9, seed: 1 }, /rays must be an integer/],
    [{ rays: 10, seed: -1 }, /seed must be an integer in \[0, 4294967295\]/],
    [{ rays: 10, seed: 1, maxEvents: 0 }, /maxEvents must be an integer in \[1, 1000000\]/]
  ])('rejects %o', (options, message) => {
    expect(() => validateTraceOptions(options)).toThrow(message);
  });

  it('accepts the bounds', () => {
    expect(() => validateTraceOptions({ rays: 1, seed: 0 })).not.toThrow();
    expect(() => validateTraceOptions({ rays: 2e7, seed: 4294967295, maxEvents: 1e6 })).not.toThrow();
  });
});

describe('emitterHeightMm(chip)', () => {
  it('defaults to half the chip height and otherwise returns emitterZMm', () => {
    const chip = domePackage().chip;
    expect(emitterHeightMm(chip)).toBe(0.1);
    expect(emitterHeightMm({ ...chip, emitterZMm: undefined })).toBe(0.075);
  });
});

describe('validateTracePackage(pkg): bodies, layers, mirror, texture', () => {
  const cupBody = { kind: 'cup', floorRadiusMm: 1.3, topRadiusMm: 1.5, depthMm: 0.8, wallFinish: 'diffuse', wallReflectance: 0.93, fill: 'flat' } as const;
  const layered = {
    ...domePackage().chip,
    heightMm: 0.155,
    layers: [
      { name: 'GaN', thicknessMm: 0.005, n: 2.45, absorptionPerMm: 0.5 },
      { name: 'sapphire', thicknessMm: 0.15, n: 1.78, absorptionPerMm: 0 }
    ],
    emitterZMm: 0.002
  };
  it.each([
    ['a chip wider than the cup floor', { body: { ...cupBody, floorRadiusMm: 0.6 } }, /body\.floorRadiusMm must be greater than the chip's half-diagonal 0\.707107 mm/],
    ['a chip taller than the cup', { body: { ...cupBody, depthMm: 0.1 } }, /body\.depthMm must be greater than chip\.heightMm = 0\.15 mm/],
    ['a top narrower than the floor', { body: { ...cupBody, topRadiusMm: 1 } }, /body\.topRadiusMm must be a number in \[1\.3, 1000\]/],
    ['a dome wider than the rim', { body: { ...cupBody, fill: 'dome' }, encapsulant: { ...domePackage().encapsulant, radiusMm: 2 } }, /encapsulant\.radiusMm \(dome on the cup rim, at most body\.topRadiusMm\) must be a number in \[0\.001, 1\.5\]/],
    ['a wall reflectance above 1', { body: { ...cupBody, wallReflectance: 1.2 } }, /body\.wallReflectance must be a number in \[0, 1\]/],
    ['a texture fraction above 1', { chip: { ...domePackage().chip, topScatter: 1.5 } }, /chip\.topScatter must be a number in \[0, 1\]/],
    ['a layer of zero thickness', { chip: { ...layered, layers: [{ ...layered.layers[0], thicknessMm: 0 }, layered.layers[1]] } }, /chip\.layers\[0\]\.thicknessMm must be a number in/],
    ['an emitter outside its layer', { chip: { ...layered, emitterZMm: 0.1 } }, /chip\.emitterZMm \(inside the emitting layer\) must be a number in \[0, 0\.005\]/],
    ['layers not adding up to the chip height', { chip: { ...layered, heightMm: 0.2 } }, /chip\.heightMm must equal the layers' total thickness 0\.155 mm/],
    ['a diffuse metal base', { base: { kind: 'metal', n: 0.5, k: 4 }, baseFinish: 'diffuse' }, /baseFinish 'diffuse' needs base\.kind 'reflectance'/],
    ['a chip mirror reflectance below 0', { chip: { ...domePackage().chip, mirror: { kind: 'reflectance', reflectance: -0.1 } } }, /chip\.mirror\.reflectance must be a number in \[0, 1\]/]
  ])('rejects %s with a message naming the field and range', (_, change, message) => {
    expect(() => validateTracePackage({ ...domePackage(), ...change } as TracePackage)).toThrow(message);
  });

  it('accepts a layered chip in a flat-filled cup', () => {
    expect(() => validateTracePackage({ ...domePackage(), chip: layered, body: cupBody })).not.toThrow();
  });
});
