/**
 * The Excel side of the catalogue's values: the one place that turns the catalogue's
 * {@link CellError} cells into `CustomFunctions.Error` values, and Excel's arguments into the
 * catalogue's {@link Arg}s.
 *
 * Error codes: `#VALUE!` → `invalidValue`, `#N/A` → `notAvailable` (both carry the message,
 * which Excel shows on the cell's error indicator), `#NUM!` → `invalidNumber` (Excel shows no
 * message for it, so none is passed).
 *
 * Every wrapper in functions.ts goes through {@link toExcel}, which catches anything thrown
 * on the way (a bug, never a user's mistake) and returns it as `#VALUE!` with a message asking
 * for a report, so that no input makes a function throw into Excel.
 */
import { cellOf, isFiniteColumn } from '../engine';
import { isCellError, type Arg, type CellError, type ErrorCode, type Result, type Scalar } from './cellTypes';

/** A cell as Excel receives it from a custom function. */
export type ExcelCell = number | string | CustomFunctions.Error;
/** What every ECHEM function returns to Excel: rows of cells (a 1×1 grid for one value). */
export type ExcelResult = ExcelCell[][];

/** The `CustomFunctions.ErrorCode` member for a catalogue error code. */
function excelErrorCode(code: ErrorCode): CustomFunctions.ErrorCode {
  switch (code) {
    case '#N/A':
      return CustomFunctions.ErrorCode.notAvailable;
    case '#NUM!':
      return CustomFunctions.ErrorCode.invalidNumber;
    case '#VALUE!':
    default:
      return CustomFunctions.ErrorCode.invalidValue;
  }
}

/** The Excel error for a catalogue error cell; `#NUM!` goes without its message (Excel shows none). */
export function excelError(error: CellError): CustomFunctions.Error {
  const code = excelErrorCode(error.code);
  return code === CustomFunctions.ErrorCode.invalidNumber
    ? new CustomFunctions.Error(code)
    : new CustomFunctions.Error(code, error.message);
}

/** `#VALUE!` for something that went wrong inside Potentia rather than in the user's formula. */
function internalError(detail: string): CustomFunctions.Error {
  return new CustomFunctions.Error(
    CustomFunctions.ErrorCode.invalidValue,
    `Internal error: ${detail}, please report it with the formula that gave it.`,
  );
}

/** One result cell for Excel; a number that is not finite (a bug) never reaches the sheet. */
function excelCell(cell: unknown): ExcelCell {
  if (typeof cell === 'number') {
    if (Number.isFinite(cell)) return cell;
    return Number.isNaN(cell)
      ? internalError('a result was not a number')
      : new CustomFunctions.Error(CustomFunctions.ErrorCode.invalidNumber);
  }
  if (typeof cell === 'string') return cell;
  if (isCellError(cell)) return excelError(cell);
  return internalError(`a result cell had the unexpected type ${cell === null ? 'null' : typeof cell}`);
}

function isPlainCell(cell: unknown): boolean {
  return typeof cell === 'string' || (typeof cell === 'number' && Number.isFinite(cell));
}

/** A catalogue result as Excel wants it: same shape, error cells turned into Excel errors. */
export function resultToExcel(result: Result): ExcelResult {
  // a column the kernel reports all finite numbers goes over without a check of each cell
  if (isFiniteColumn(result)) return result as ExcelResult;
  if (
    !Array.isArray(result) ||
    result.length === 0 ||
    !result.every((row) => Array.isArray(row) && row.length > 0)
  ) {
    return [[internalError('the function returned no grid of values')]];
  }
  // Most spills are all numbers: hand them over as they are, without a copy.
  if (result.every((row) => row.every(isPlainCell))) return result as ExcelResult;
  return result.map((row) => row.map(excelCell));
}

/** What a wrapper of functions.ts calls: a catalogue entry's implementation and, where it has one, its path for Excel's own argument shapes. */
export interface ExcelEntry {
  readonly impl: (...args: Arg[]) => Result;
  /**
   * A path over the arguments exactly as Excel passes them (before {@link argFromExcel}),
   * for the common shapes: a result only where every cell is a finite number, computed as
   * the full path computes it; null otherwise (then the full path runs).
   */
  readonly host?: (args: readonly unknown[]) => Result | null;
}

/** `#VALUE!` "Internal error: …" for anything thrown past a catalogue function. */
function thrownToExcel(e: unknown): ExcelResult {
  const detail = e instanceof Error ? e.message || e.name : String(e);
  return [[internalError(detail)]];
}

/**
 * Calls a catalogue function with Excel's arguments and gives its result to Excel. Nothing
 * thrown inside escapes: it becomes `#VALUE!` "Internal error: …, please report …".
 *
 * @example
 * return toExcel(catalogue.nernstSlope, temp_C, n);
 */
export function toExcel(impl: (...args: Arg[]) => Result, ...args: unknown[]): ExcelResult {
  try {
    return resultToExcel(impl(...args.map(argFromExcel)));
  } catch (e) {
    return thrownToExcel(e);
  }
}

/**
 * What every wrapper of functions.ts calls: the entry's path for Excel's own argument shapes
 * where it gives a result (all finite numbers, handed over as they are), else
 * {@link toExcel}'s path. Nothing thrown inside escapes.
 *
 * @example
 * return callFromExcel(POTENTIAL_ENTRY, reaction, species, values, temp_C, table);
 */
export function callFromExcel(entry: ExcelEntry, ...args: unknown[]): ExcelResult {
  try {
    const fast = entry.host ? entry.host(args) : null;
    if (fast) return fast as ExcelResult;
    return resultToExcel(entry.impl(...args.map(argFromExcel)));
  } catch (e) {
    return thrownToExcel(e);
  }
}

/** An error value Excel passed in a range (shape of `CustomFunctions.Error`). */
function isExcelErrorValue(v: unknown): v is { code: string } {
  return typeof v === 'object' && v !== null && typeof (v as { code?: unknown }).code === 'string';
}

function scalarFromExcel(v: unknown): Scalar {
  if (v === null || v === undefined) return null;
  if (typeof v === 'number' || typeof v === 'string' || typeof v === 'boolean') return v;
  // An error in an input cell reaches the catalogue as its code ("#N/A"), so the message of the
  // argument it lands in names it; anything else Excel might pass is read as its text.
  return isExcelErrorValue(v) ? v.code : String(v);
}

/**
 * True where every element is a row of scalar cells (numbers tested first: most cells are).
 * One pass, no closures; cells read with `cellOf`, which leaves rows of numbers as they are
 * (an indexed read here, where text rows pass too, would box every number of the user's rows).
 */
function allScalarRows(rows: readonly unknown[]): boolean {
  for (let r = 0; r < rows.length; r++) {
    const row = rows[r];
    if (!Array.isArray(row)) return false;
    for (let c = 0; c < row.length; c++) {
      const v = cellOf(row, c);
      if (typeof v === 'number' || v === null || typeof v === 'string' || typeof v === 'boolean') continue;
      return false;
    }
  }
  return true;
}

/**
 * An Excel argument as the catalogue takes it: omitted stays `undefined`, a range stays rows of
 * cells (copied only where a cell needs changing), error values in cells become their code text.
 */
export function argFromExcel(v: unknown): Arg {
  if (v === undefined) return undefined;
  if (!Array.isArray(v)) return scalarFromExcel(v);
  const rows = v as unknown[];
  if (allScalarRows(rows)) return rows as Scalar[][];
  return rows.map((row) => (Array.isArray(row) ? row.map(scalarFromExcel) : [scalarFromExcel(row)]));
}
