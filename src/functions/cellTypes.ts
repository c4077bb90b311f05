/**
 * The values that cross the boundary between a spreadsheet host and the catalogue: what a
 * host passes in (scalars, ranges as rows of cells) and what a function gives back (rows of
 * numbers, text or error cells). Every module of src/functions imports these from here, so
 * nothing imports back from catalogue.ts (which re-exports them for its clients).
 *
 * See docs/design.md, "Errors" and "Sweeps".
 */

/** A single cell value as a host passes it. */
export type Scalar = number | string | boolean | null;
/** A range: rows of cells. */
export type Grid = Scalar[][];
/** An argument: a scalar or a range (or undefined where omitted). */
export type Arg = Scalar | Grid | undefined;

/** Spreadsheet error codes the catalogue produces. */
export type ErrorCode = '#VALUE!' | '#N/A' | '#NUM!';

/** An error value with a message (shown by the host where it can). */
export interface CellError {
  readonly kind: 'cell-error';
  readonly code: ErrorCode;
  readonly message: string;
}

/** A cell of a result. */
export type ResultCell = number | string | CellError;
/** What a catalogue function returns: always rows of cells (a 1×1 grid for one value). */
export type Result = ResultCell[][];

/** The cells of a user's potentials table, or null for the built-in table. */
export type TableCells = readonly (readonly unknown[])[] | null;

/** True where `v` is a {@link CellError}. */
export function isCellError(v: unknown): v is CellError {
  return typeof v === 'object' && v !== null && (v as { kind?: unknown }).kind === 'cell-error';
}

/**
 * The spreadsheet error codes a host may put in an input cell, as text. Both hosts hand an
 * error cell to the catalogue as its code text (Excel's `#N/A`, HyperFormula's `#N/A`), so
 * one reader decides what it means (docs/design.md, "Errors": an error in an input cell
 * propagates to the cases that read it).
 */
export const INPUT_ERROR_TEXTS: readonly string[] = [
  '#N/A',
  '#VALUE!',
  '#NUM!',
  '#DIV/0!',
  '#REF!',
  '#NAME?',
  '#NULL!',
  '#SPILL!',
  '#CALC!',
  '#CYCLE!',
  '#ERROR!',
  '#GETTING_DATA',
];

/** True where a cell holds the code text of a spreadsheet error (an error in the input). */
export function isInputErrorText(v: unknown): boolean {
  return typeof v === 'string' && v.length > 1 && v.charCodeAt(0) === 35 && INPUT_ERROR_TEXTS.includes(v);
}
