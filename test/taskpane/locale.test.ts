/**
 * Reading numbers in the user's locale: a comma is the decimal separator where the locale
 * writes decimals with one (common practice: de-DE and fr-FR write 0,01; en-US and en-GB
 * write 0.01), and only there.
 */
import { decimalSeparatorOf, localNumber } from '../../src/taskpane/locale';
import { numberHint, readNumber } from '../../src/taskpane/sweepPlan';

describe('decimalSeparatorOf', () => {
  test.each([
    ['de-DE', ','],
    ['fr-FR', ','],
    ['pt-BR', ','],
    ['en-US', '.'],
    ['en-GB', '.'],
    ['ja-JP', '.'],
    ['not a locale!', '.'],
  ])('%s → %s', (locale, sep) => {
    expect(decimalSeparatorOf(locale)).toBe(sep);
  });
});

describe('readNumber with and without a decimal comma', () => {
  test.each([
    ['0,01', true, 0.01],
    ['1,5e-3', true, 0.0015],
    [' −0,5 ', true, -0.5],
    ['0.01', true, 0.01], // a point is still read
    ['10^-6', true, 1e-6],
    ['0,01', false, null], // refused where the locale writes a point
    ['1,000.5', true, null], // no thousands separators
    ['1,2,3', true, null],
    ['', true, null],
  ])('"%s" (comma locale %s) → %s', (text, comma, value) => {
    expect(readNumber(text, comma)).toBe(value);
  });

  test("the hint shows the locale's own way of writing 0.01", () => {
    expect(numberHint(true)).toContain('0,01');
    expect(numberHint(false)).toContain('0.01');
    expect(numberHint(false)).toContain('decimal point');
  });

  test("localNumber shows defaults in the locale's separator, leaving exponents and integers alone", () => {
    expect(localNumber('0.001', ',')).toBe('0,001');
    expect(localNumber('1e-6', ',')).toBe('1e-6');
    expect(localNumber('14', ',')).toBe('14');
    expect(localNumber('0.001', '.')).toBe('0.001');
  });
});
