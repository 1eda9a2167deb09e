import { describe, expect, it } from 'vitest';
import { checkDesignOptions, designOptic, type OpticDesignOptions } from '../../../src/lib/optic-design';

const base: OpticDesignOptions = { type: 'tir', exitDiameterMm: 20, heightMm: 12, n: 1.49 };
const oneLine = /^[^\n]+$/;

describe('checkDesignOptions(options)', () => {
  it('fills the defaults: gap 0, reflectance 0.92, tolerance 1 µm, the first shape of the type', () => {
    const o = checkDesignOptions({ type: 'reflector', exitDiameterMm: 20, heightMm: 12 });
    expect(o).toMatchObject({ shape: 'paraboloid', gapMm: 0, reflectance: 0.92, toleranceMm: 0.001, n: 1, sourceRadiusMm: 0 });
    expect(checkDesignOptions({ type: 'lens', exitDiameterMm: 20, heightMm: 12, n: 1.5 }).shape).toBe('aspheric');
  });

  it('reads a library material at the wavelength (PMMA ≈ 1.49 at 587.6 nm, Sultanova et al. 2009)', () => {
    const o = checkDesignOptions({ type: 'lens', exitDiameterMm: 20, heightMm: 12, material: 'pmma', wavelengthNm: 587.6 });
    expect(o.n).toBeCloseTo(1.491, 2);
  });

  const bad: [string, Partial<OpticDesignOptions>, RegExp][] = [
    ['an unknown type', { type: 'prism' as 'tir' }, /^type must be reflector, lens or tir/],
    ['a shape of another type', { shape: 'cpc' }, /^shape must be tir for a tir/],
    ['a zero exit', { exitDiameterMm: 0 }, /^exitDiameterMm must be a number in \(0, 1000\]/],
    ['a NaN height', { heightMm: NaN }, /^heightMm must be a number in \(0, 1000\]/],
    ['a missing height', { heightMm: undefined }, /^heightMm must be a number/],
    ['reflectance above 1', { type: 'reflector', reflectance: 1.2 }, /^reflectance must be a number in \[0, 1\] \(got 1\.2\)/],
    ['reflectance below 0', { type: 'reflector', reflectance: -0.1 }, /^reflectance must be a number in \[0, 1\]/],
    ['an index of 1', { n: 1 }, /^n must be a number in \(1, 4\]/],
    ['no index at all', { n: undefined }, /^n must be a number in \(1, 4\] \(or give material\)/],
    ['a gap above the top', { gapMm: 13 }, /^gapMm must be below heightMm 12/],
    ['an optic smaller than the source', { source: { shape: 'rect', widthMm: 15 } }, /^exitDiameterMm must exceed the source's diameter 21\.2 mm: the optic is smaller than the source/],
    ['a negative source', { source: { shape: 'disc', widthMm: -1 } }, /^source\.widthMm must be a number in \(0, 1000\]/]
  ];
  for (const [what, change, message] of bad) {
    it(`refuses ${what} in one line naming the field`, () => {
      const run = () => checkDesignOptions({ ...base, ...change } as OpticDesignOptions);
      expect(run).toThrowError(RangeError);
      expect(run).toThrowError(message);
      expect(run).toThrowError(oneLine);
    });
  }
});

describe('designOptic(options): heights that cannot hold the design', () => {
  it('a lens too flat for its width', () => {
    expect(() => designOptic({ type: 'lens', exitDiameterMm: 20, heightMm: 5, n: 1.5 })).toThrowError(
      /^heightMm: a collimating lens 20 mm wide at n = 1\.5 needs a top above 9\.94 mm; allowed > 9\.94 \(got 5\)$/
    );
    expect(() => designOptic({ type: 'lens', shape: 'plano-convex', exitDiameterMm: 20, heightMm: 5, n: 1.5 })).toThrowError(/^heightMm: a plano-convex lens/);
  });
  it('a TIR collimator outside its height range', () => {
    expect(() => designOptic({ type: 'tir', exitDiameterMm: 20, heightMm: 3, n: 1.49 })).toThrowError(/^heightMm: a TIR collimator 20 mm wide at n = 1\.49 with a [\d.]+° split fits heights in \(/);
  });
  it('a CPC shorter than its target needs (L = a(1 + sin θa)/tan θa = 66.6 mm at a = 10, θa = 10°)', () => {
    expect(() => designOptic({ type: 'reflector', shape: 'cpc', exitDiameterMm: 20, heightMm: 10, targetBeamDeg: 20 })).toThrowError(
      /^heightMm: a CPC for a 20° beam with a 20 mm exit reaches 66\.6 mm; allowed ≥ 66\.6 \(got 10\)$/
    );
  });
  it('a paraboloid whose base opening is narrower than the source', () => {
    expect(() => designOptic({ type: 'reflector', exitDiameterMm: 10, heightMm: 30, source: { shape: 'rect', widthMm: 2 } })).toThrowError(
      /^heightMm: the mirror's base opening \([\d.]+ mm\) is narrower than the source \(2\.83 mm\)/
    );
  });
});
