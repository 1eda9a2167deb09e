import { describe, expect, it } from 'vitest';
import { fmtDeg, fmtIndex, fmtNumber, fmtPercent, fmtPercentPlain, fmtPlain, fmtPoints, fmtUnit, missing, plainName } from '../../../src/lib/format/format';

describe('fmtNumber', () => {
  it.each([
    [0.0417424, 4, '0.04174'],
    [23.5782, 4, '23.58'],
    [1234.5, 4, '1235'],
    [12345.6, 4, '12346'],
    [2.5, 4, '2.500'],
    [9.99996, 4, '10.00'],
    [0.999996, 3, '1.00'],
    [-0.04174, 3, '-0.0417'],
    [0.001, 4, '0.001000'],
    [0, 4, '0'],
    [-0, 4, '0'],
    [-0.00001, 2, '-1.0 × 10⁻⁵'],
    [2.5e-7, 4, '2.500 × 10⁻⁷'],
    [6.02e23, 3, '6.02 × 10²³'],
    [1e6, 2, '1.0 × 10⁶']
  ])('fmtNumber(%s, %s) is "%s"', (x, digits, text) => {
    expect(fmtNumber(x, digits)).toBe(text);
  });

  it('never prints NaN or Infinity: a dash with the reason instead', () => {
    expect(fmtNumber(NaN)).toBe('— (not defined)');
    expect(fmtNumber(Infinity, 4, 'no critical angle')).toBe('— (no critical angle)');
    expect(fmtNumber(-Infinity)).not.toMatch(/Infinity|NaN/);
    expect(missing('why')).toBe('— (why)');
  });

  it('clamps the digit count to 1–15', () => {
    expect(fmtNumber(Math.PI, 0)).toBe('3');
    expect(fmtNumber(Math.PI, 40)).toBe('3.14159265358979');
  });
});

describe('fmtPercent, fmtDeg, fmtUnit, fmtIndex, fmtPlain', () => {
  it('fmtPercent(0.04174) is "4.174 %" (space before the sign)', () => {
    expect(fmtPercent(0.0417424)).toBe('4.174 %');
    expect(fmtPercent(0.5, 4)).toBe('50.00 %');
    expect(fmtPercent(NaN, 4, 'no data')).toBe('— (no data)');
  });

  it.each([
    [4.444e-10, '< 0.001 %'],
    [1.6e-9, '< 0.001 %'],
    [-3e-9, '> −0.001 %'],
    [0, '0 %'],
    [1e-5, '0.001000 %'],
    [1.234e-4, '0.01234 %']
  ])('fmtPercent(%s) is "%s": no power of ten for a tiny share', (x, text) => {
    expect(fmtPercent(x)).toBe(text);
    expect(fmtPercent(x)).not.toMatch(/10⁻|e-/);
  });

  it.each([
    [0.85, '85 %'],
    [0.38637, '38.6 %'],
    [-0.05, '-5 %'],
    [1.6e-9, '< 0.001 %'],
    [0, '0 %'],
    [NaN, '— (not defined)']
  ])('fmtPercentPlain(%s) is "%s": no trailing zeros, the same floor as fmtPercent', (x, text) => {
    expect(fmtPercentPlain(x)).toBe(text);
  });

  it('fmtPoints names a difference in percentage points, singular for exactly one', () => {
    expect(fmtPoints(0.311)).toBe('31.1 percentage points');
    expect(fmtPoints(0.01)).toBe('1.00 percentage point');
    expect(fmtPoints(1.6e-9)).toBe('< 0.001 percentage points');
    expect(fmtPoints(NaN)).toBe('— (not defined)');
  });

  it('fmtDeg takes radians: asin(1/2.5) → "23.58°" (computed: 23.578°)', () => {
    expect(fmtDeg(Math.asin(1 / 2.5))).toBe('23.58°');
    expect(fmtDeg(Math.PI / 2, 3)).toBe('90.0°');
    expect(fmtDeg(NaN)).toBe('— (not defined)');
  });

  it('fmtUnit puts a space between number and unit', () => {
    expect(fmtUnit(2.5, 'mm', 3)).toBe('2.50 mm');
    expect(fmtUnit(2.5, '', 2)).toBe('2.5');
    expect(fmtUnit(Infinity, 'mm')).toBe('— (not defined)');
  });

  it('fmtIndex writes n + ik, or n alone when k = 0', () => {
    expect(fmtIndex(2.48692, 0)).toBe('2.487');
    expect(fmtIndex(0.04382, 3.6101)).toBe('0.04382 + 3.610i');
    expect(fmtIndex(NaN, 0)).toBe('— (index not available)');
  });

  it('fmtPlain echoes inputs without trailing zeros', () => {
    expect(fmtPlain(2.5)).toBe('2.5');
    expect(fmtPlain(0.15)).toBe('0.15');
    expect(fmtPlain(450)).toBe('450');
    expect(fmtPlain(1 / 3)).toBe('0.333333');
    expect(fmtPlain(2e7)).toBe('2 × 10⁷');
    expect(fmtPlain(NaN)).toBe('— (not defined)');
  });

  it('plainName drops a trailing nominal index from a material name', () => {
    expect(plainName('Methyl silicone (n ≈ 1.41)')).toBe('Methyl silicone');
    expect(plainName('GaN (ordinary ray)')).toBe('GaN (ordinary ray)');
  });
});
