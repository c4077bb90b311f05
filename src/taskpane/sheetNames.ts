/**
 * Worksheet names and A1 addresses, without Office: the task pane never overwrites a
 * sheet, so every sheet it creates gets a name that no sheet of the workbook has yet.
 *
 * Excel's rules for a sheet name: 1 to 31 characters, none of `\ / ? * [ ] :`, not
 * starting or ending with an apostrophe, not the reserved name "History"; names are
 * compared without regard to case ("potentials" and "Potentials" clash).
 */
import { columnLetters } from '../engine/index';

/** The column letters rule is the engine's, shared with the runner. */
export { columnLetters };

/** The longest sheet name Excel accepts. */
export const MAX_SHEET_NAME_LENGTH = 31;

const FORBIDDEN = /[\\/?*[\]:]/g;
const RESERVED = new Set(['history']);

/**
 * A legal sheet name made from any text: forbidden characters become spaces, runs of
 * spaces collapse, leading and trailing apostrophes and spaces go, and the result is cut
 * to {@link MAX_SHEET_NAME_LENGTH}. Empty text gives "Sheet".
 *
 * @example
 * legalSheetName('E vs log a[Cu2+]') // 'E vs log a Cu2+'
 */
export function legalSheetName(text: string): string {
  let name = text.replace(FORBIDDEN, ' ').replace(/\s+/g, ' ').trim();
  name = name.replace(/^'+|'+$/g, '').trim();
  name = Array.from(name).slice(0, MAX_SHEET_NAME_LENGTH).join('').trim();
  name = name.replace(/'+$/g, '').trim();
  if (name === '' || RESERVED.has(name.toLowerCase())) return name === '' ? 'Sheet' : `${name} 1`;
  return name;
}

/**
 * The first of `base`, `base (2)`, `base (3)`, … that is not among `existing` (compared
 * without case), shortening `base` where the suffix would pass 31 characters.
 *
 * @example
 * uniqueSheetName('Potentials', ['Sheet1', 'Potentials']) // 'Potentials (2)'
 * uniqueSheetName('Potentials', ['potentials', 'Potentials (2)']) // 'Potentials (3)'
 */
export function uniqueSheetName(base: string, existing: readonly string[]): string {
  const taken = new Set(existing.map((n) => n.toLowerCase()));
  const legal = legalSheetName(base);
  if (!taken.has(legal.toLowerCase())) return legal;
  for (let i = 2; ; i++) {
    const suffix = ` (${i})`;
    const room = MAX_SHEET_NAME_LENGTH - suffix.length;
    const stem = Array.from(legal).slice(0, room).join('').trimEnd().replace(/'+$/g, '');
    const candidate = `${stem}${suffix}`;
    if (!taken.has(candidate.toLowerCase())) return candidate;
  }
}

/**
 * The sheet name as it must be written before `!` in a formula: bare where Excel accepts
 * it bare (letters, digits, underscores and dots, not looking like a cell address),
 * otherwise in apostrophes with inner apostrophes doubled.
 *
 * @example
 * sheetRef('Potentials') // 'Potentials'
 * sheetRef('Potentials (2)') // "'Potentials (2)'"
 */
export function sheetRef(name: string): string {
  const bare =
    /^[A-Za-z_][A-Za-z0-9_.]*$/.test(name) &&
    !/^[A-Za-z]{1,3}[0-9]+$/.test(name) &&
    !/^[RrCc]$/.test(name) &&
    !/^[Rr][0-9]*[Cc][0-9]*$/.test(name);
  return bare ? name : `'${name.replace(/'/g, "''")}'`;
}

/**
 * A1 address of a cell (1-based column and row).
 *
 * @example
 * cellAddress(2, 5) // 'B5'
 */
export function cellAddress(column: number, row: number): string {
  if (!Number.isInteger(row) || row < 1) throw new RangeError(`row must be a positive integer; got ${row}`);
  return `${columnLetters(column)}${row}`;
}

/**
 * A1 address of a rectangle; a single cell where both corners coincide.
 *
 * @example
 * rangeAddress(1, 2, 4, 65) // 'A2:D65'
 */
export function rangeAddress(col1: number, row1: number, col2: number, row2: number): string {
  const a = cellAddress(col1, row1);
  const b = cellAddress(col2, row2);
  return a === b ? a : `${a}:${b}`;
}

/**
 * Text that Excel stores as text when written to a cell's value: a leading `=`, `+`, `-`
 * or `@` would otherwise make Excel read it as a formula, so such text gets the
 * apostrophe prefix (not shown in the cell).
 *
 * @example
 * asCellText('-> x') // "'-> x"
 * asCellText('Cu2+') // 'Cu2+'
 */
export function asCellText(text: string): string {
  return /^[=+\-@]/.test(text) ? `'${text}` : text;
}
