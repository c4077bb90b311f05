/**
 * The ECHEM function catalogue, independent of any spreadsheet host: each entry
 * adapts raw cell arguments, broadcasts over cases and calls the engine through
 * its index. Both the Excel custom functions (functions.ts) and the headless
 * runner (src/cli) call these, so results agree to the last digit.
 *
 * Argument values arrive as a host gives them: numbers, strings, booleans, null
 * for omitted optional arguments or empty cells (some hosts give 0 or ""), and
 * 2-D arrays (rows of cells) for ranges.
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

/** A parameter of a catalogue function. */
export interface ParamSpec {
  /** Name as shown to users (PRODUCT.md), e.g. "temp_C". */
  readonly name: string;
  readonly optional: boolean;
}

/** One function of the catalogue. */
export interface FunctionSpec {
  /** Id in the ECHEM namespace, fixed once released, e.g. "POTENTIAL". */
  readonly id: string;
  readonly params: readonly ParamSpec[];
  readonly impl: (...args: Arg[]) => Result;
}

/** True where `v` is a {@link CellError}. */
export function isCellError(v: unknown): v is CellError {
  return typeof v === 'object' && v !== null && (v as { kind?: unknown }).kind === 'cell-error';
}
