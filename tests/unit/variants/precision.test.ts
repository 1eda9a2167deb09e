import { describe, expect, it } from 'vitest';
import { roundSignificant } from '../../../src/lib/export/number-text';
import { decimalText, roundDecimals, roundWithSigma } from '../../../src/lib/variants/precision';

describe('numbers at the precision they carry', () => {
  it('roundWithSigma: σ to two significant digits, the value to the same decimal (JCGM 100:2008 §7.2.6)', () => {
    // GUM §7.2.2 example: m_S = 100.021 47 g, u_c = 0.35 mg → 100.021 47(35) g: value to σ's second digit
    expect(roundWithSigma(100.0214712, 0.000353)).toEqual({ value: 100.02147, sigma: 0.00035, decimals: 5 });
    expect(roundWithSigma(38.63700000000001, 0.0973)).toEqual({ value: 38.637, sigma: 0.097, decimals: 3 });
    // σ rounding up to a new digit moves the decimal: 0.0997 → 0.10
    expect(roundWithSigma(46.1243, 0.0997)).toEqual({ value: 46.12, sigma: 0.1, decimals: 2 });
    expect(roundWithSigma(1234.5, 23)).toEqual({ value: 1235, sigma: 23, decimals: 0 });
    expect(roundWithSigma(12345, 230)).toEqual({ value: 12350, sigma: 230, decimals: -1 });
  });

  it('without a σ the value keeps its significant digits; non-finite passes through', () => {
    expect(roundWithSigma(7.52512345, 0)).toEqual({ value: 7.525, sigma: 0, decimals: null });
    expect(roundSignificant(0.1 + 0.2, 4)).toBe(0.3);
    expect(roundSignificant(Number.NaN, 4)).toBeNaN();
    expect(roundDecimals(0.1 + 0.2, 2)).toBe(0.3);
  });

  it('decimalText keeps trailing zeros at the stated decimal and never prints float noise', () => {
    expect(decimalText(0.1, 2)).toBe('0.10');
    expect(decimalText(38.637, 3)).toBe('38.637');
    expect(decimalText(roundSignificant(38.63700000000001, 5))).toBe('38.637');
    expect(decimalText(12300, -1)).toBe('12300');
    expect(decimalText(Number.POSITIVE_INFINITY)).toBe('');
  });
});
