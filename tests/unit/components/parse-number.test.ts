import { describe, expect, it } from 'vitest';
import { parseNumber } from '../../../src/lib/components/parse-number';

describe('parseNumber', () => {
  it.each([
    ['2.5', 2.5],
    [' 450 ', 450],
    ['-0.3', -0.3],
    ['+1', 1],
    ['.5', 0.5],
    ['5.', 5],
    ['1e-3', 0.001],
    ['2E7', 2e7],
    ['1,5', 1.5],
    ['0', 0]
  ])('parseNumber("%s") is %s', (text, value) => {
    expect(parseNumber(text)).toBe(value);
  });

  it.each(['', ' ', 'abc', '0x10', '1..2', '1.2.3', 'Infinity', 'NaN', '1e', '--1', '1 000', '2,5,0', '1e999'])(
    'parseNumber("%s") is null',
    (text) => {
      expect(parseNumber(text)).toBeNull();
    }
  );
});
