/**
 * A1 column letters: the one rule that the task pane (which writes sheets through Office)
 * and the runner (which reads and writes workbooks itself) both need.
 */

/**
 * Column letters of a 1-based column number: 1 → A, 26 → Z, 27 → AA (bijective base 26).
 *
 * Domain: a whole number ≥ 1 (Excel's last column, 16384, is "XFD"). A column is made by
 * the program, never typed by a user, so anything else is a programming error and throws
 * a RangeError.
 *
 * @example
 * columnLetters(1) // 'A'
 * columnLetters(28) // 'AB'
 */
export function columnLetters(column: number): string {
  if (!Number.isInteger(column) || column < 1)
    throw new RangeError(`column must be a positive integer; got ${column}`);
  let n = column;
  let out = '';
  while (n > 0) {
    const r = (n - 1) % 26;
    out = String.fromCharCode(65 + r) + out;
    n = Math.floor((n - 1) / 26);
  }
  return out;
}
