import { describe, expect, it } from 'vitest';
import { exportJsonReplacer, exportNumber, roundSignificant } from '../../../src/lib/export/number-text';

describe('exportNumber(x) writes the significant digits of a quantity, not float noise', () => {
  it('exportNumber(38.63700000000001) is "38.637" and 0.1 + 0.2 is "0.3"', () => {
    expect(exportNumber(38.63700000000001)).toBe('38.637');
    expect(exportNumber(0.1 + 0.2)).toBe('0.3');
  });
  it('keeps six significant digits by default: an index to 1e-5, a fraction to 1e-6', () => {
    expect(exportNumber(1.4584636)).toBe('1.45846');
    expect(exportNumber(0.386370123)).toBe('0.38637');
    expect(exportNumber(-2.718281828)).toBe('-2.71828');
  });
  it('writes whole numbers (ray counts) exactly', () => {
    expect(exportNumber(250000)).toBe('250000');
    expect(exportNumber(123456789)).toBe('123456789');
  });
  it('uses plain decimals from 1e-4 and exponent form below: 1.6e-7, not 0.00000016', () => {
    expect(exportNumber(0.00012345678)).toBe('0.000123457');
    expect(exportNumber(1.6e-7)).toBe('1.6e-7');
    expect(exportNumber(2.1e-225)).toBe('2.1e-225');
    expect(exportNumber(1e-5)).toBe('1e-5');
  });
  it('writes 0 and −0 as "0", NaN and ±Infinity as an empty cell', () => {
    expect(exportNumber(0)).toBe('0');
    expect(exportNumber(-0)).toBe('0');
    expect(exportNumber(Number.NaN)).toBe('');
    expect(exportNumber(Infinity)).toBe('');
    expect(exportNumber(-Infinity)).toBe('');
  });
  it('takes a digit count in [1, 17] and refuses others naming the field', () => {
    expect(exportNumber(3.14159, 3)).toBe('3.14');
    expect(() => exportNumber(1, 0)).toThrow(/significantDigits/);
    expect(() => exportNumber(1, 2.5)).toThrow(/significantDigits/);
  });
  it('round-trips: the text parses back within half a unit of the last kept digit', () => {
    for (const x of [Math.PI, 1 / 3, 123.456789, 9.999999e-3]) {
      expect(Math.abs(Number(exportNumber(x)) - x) / x).toBeLessThanOrEqual(5e-6);
    }
  });
});

describe('JSON exports: roundSignificant and exportJsonReplacer', () => {
  it('roundSignificant(38.63700000000001) is 38.637 (12 digits by default)', () => {
    expect(roundSignificant(38.63700000000001)).toBe(38.637);
    expect(roundSignificant(Math.PI)).toBe(3.14159265359);
  });
  it('the replacer rounds fractions, keeps integers, and turns NaN and ±Infinity into null', () => {
    const text = JSON.stringify({ a: 0.1 + 0.2, n: 250000, bad: NaN, inf: -Infinity, list: [1.0000000000000002] }, exportJsonReplacer);
    expect(JSON.parse(text)).toEqual({ a: 0.3, n: 250000, bad: null, inf: null, list: [1] });
  });
});
