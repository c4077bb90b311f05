/**
 * Typed engine errors. Every failure a user can cause is an {@link EngineError}
 * with a kind (which the function layer maps to a spreadsheet error code) and a
 * message that says what is wrong and how to fix it.
 *
 * Kinds:
 * - `parse`      text that cannot be read (reaction, species, number with unit)
 * - `argument`   a value outside the function's domain (negative activity, n ≤ 0 …)
 * - `unbalanced` a reaction that does not conserve atoms or charge, or has no unique balance
 * - `notFound`   nothing in the potentials table (or reference list) matches
 * - `ambiguous`  several table rows match; the message lists them
 * - `shape`      array arguments whose shapes do not fit together
 * - `range`      a result outside the representable number range (e.g. K > 1.8e308)
 *
 * @example
 * throw new EngineError('argument', 'temp_C must be above −273.15 °C; got −300.', 'temp_C');
 */
export type EngineErrorKind =
  'parse' | 'argument' | 'unbalanced' | 'notFound' | 'ambiguous' | 'shape' | 'range';

/**
 * A pointer to a next step that the function layer words for its host (e.g. the name of the
 * worksheet function that does it), so that engine messages name no worksheet function.
 * - `balance`    the reaction can be balanced automatically
 * - `logForm`    the log form of the result never overflows
 * - `checkTable` the user's table can be checked row by row
 */
export type EngineHint = 'balance' | 'logForm' | 'checkTable';

export class EngineError extends Error {
  /** What went wrong, for mapping to a spreadsheet error code. */
  readonly kind: EngineErrorKind;
  /** The argument the error is about, where there is one (e.g. `temp_C`). */
  readonly argument: string | undefined;
  /** 1-based character position in the text, for parse errors. */
  readonly position: number | undefined;
  /** A next step for the host to word (see {@link EngineHint}). */
  readonly hint: EngineHint | undefined;

  constructor(kind: EngineErrorKind, message: string, argument?: string, position?: number, hint?: EngineHint) {
    super(message);
    this.name = 'EngineError';
    this.kind = kind;
    this.argument = argument;
    this.position = position;
    this.hint = hint;
  }
}

/**
 * True where `e` is an {@link EngineError}.
 *
 * @example
 * try { parseReaction('Zn ->') } catch (e) { if (isEngineError(e)) console.log(e.kind) }
 */
export function isEngineError(e: unknown): e is EngineError {
  return e instanceof EngineError;
}

/**
 * Quote a user's text in a message, shortened when very long.
 *
 * @example
 * quote('Zn2+') // '"Zn2+"'
 */
export function quote(text: string, max = 60): string {
  const t = text.length > max ? text.slice(0, max - 1) + '…' : text;
  return `"${t}"`;
}
