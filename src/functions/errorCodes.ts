/**
 * The one place that maps engine error kinds to spreadsheet error codes.
 * Messages travel on #VALUE! and #N/A (the codes whose messages a spreadsheet
 * shows); #NUM! is for numeric range; #N/A for "not in the table".
 */
import { isEngineError, type EngineErrorKind, type EngineHint } from '../engine';
import type { CellError, ErrorCode } from './cellTypes';

const CODE_BY_KIND: Record<EngineErrorKind, ErrorCode> = {
  parse: '#VALUE!',
  argument: '#VALUE!',
  unbalanced: '#VALUE!',
  ambiguous: '#VALUE!',
  shape: '#VALUE!',
  notFound: '#N/A',
  range: '#NUM!',
};

/** The engine's hints, worded with the worksheet functions that take the next step. */
const HINT_TEXT: Record<EngineHint, string> = {
  balance: 'Or let BALANCE balance it.',
  logForm: 'Use LOGK, whose log form never overflows.',
  checkTable: 'CHECKTABLE lists every problem of the table.',
};

/** A cell error value. */
export function cellError(code: ErrorCode, message: string): CellError {
  return { kind: 'cell-error', code, message };
}

/**
 * Turn anything thrown into a cell error: engine errors by their kind, anything
 * else as an internal error (never a bare exception past the catalogue).
 *
 * @example
 * toCellError(new EngineError('notFound', 'not in the table')).code // '#N/A'
 */
export function toCellError(e: unknown): CellError {
  if (isEngineError(e))
    return cellError(CODE_BY_KIND[e.kind], e.hint ? `${e.message} ${HINT_TEXT[e.hint]}` : e.message);
  const msg = e instanceof Error ? e.message : String(e);
  return cellError('#VALUE!', `Internal error: ${msg}. Please report this with the formula that caused it.`);
}

/** The code for an engine error kind (used by the error catalogue and docs/errors.md). */
export function codeForKind(kind: EngineErrorKind): ErrorCode {
  return CODE_BY_KIND[kind];
}
