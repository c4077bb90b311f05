/**
 * A1 column letters (bijective base 26). Checks from the spreadsheet convention (common
 * practice): A…Z, then AA; ZZ is column 702, AAA column 703; Excel's last column, 16384,
 * is XFD (Excel specifications and limits, from memory).
 */
import { columnLetters } from '../../src/engine';

describe('columnLetters', () => {
  test.each([
    [1, 'A'],
    [26, 'Z'],
    [27, 'AA'],
    [52, 'AZ'],
    [53, 'BA'],
    [702, 'ZZ'],
    [703, 'AAA'],
    [16384, 'XFD'],
  ])('column %p is %s', (column, letters) => {
    expect(columnLetters(column)).toBe(letters);
  });

  test.each([0, -1, 1.5, Number.NaN])('column %p is a programming error', (column) => {
    expect(() => columnLetters(column)).toThrow(RangeError);
  });
});
