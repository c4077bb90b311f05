/**
 * A piece of user text being read, with positions mapped back to what the user
 * typed (after Unicode normalisation), and the one way parse errors are raised.
 */
import { EngineError, quote } from '../errors';
import { normalizeNotation } from './unicode';

/**
 * The longest text, in characters (UTF-16 code units), that the notation parser reads.
 * Longer texts are refused with a parse error before any scanning, so no cell can hold the
 * parser (or the task pane sharing its runtime) for long. A half-reaction of the built-in
 * table is under 80 characters; 4,096 leaves room for any reaction a person writes.
 */
export const MAX_NOTATION_CHARS = 4096;

let lengthLimit = MAX_NOTATION_CHARS;

/**
 * Runs `fn` with another length limit (benchmarks measure the scanners on longer texts).
 * The limit is restored afterwards, also when `fn` throws.
 *
 * @example
 * withNotationLengthLimit(20000, () => parseNotation(longText))
 */
export function withNotationLengthLimit<T>(limit: number, fn: () => T): T {
  const before = lengthLimit;
  lengthLimit = limit;
  try {
    return fn();
  } finally {
    lengthLimit = before;
  }
}

export class SourceText {
  /** The normalised text the scanners read. */
  readonly text: string;
  /** The user's text as typed. */
  readonly original: string;
  private readonly origin: number[];

  constructor(original: string) {
    this.original = original;
    if (original.length > lengthLimit) {
      throw new EngineError(
        'parse',
        `Cannot read a text of ${original.length.toLocaleString('en-US')} characters: ` +
          `the longest reaction, species or cell text read is ${lengthLimit.toLocaleString('en-US')} characters; ` +
          'check that the cell holds one reaction and not a whole column of text',
        undefined,
        lengthLimit + 1,
      );
    }
    const n = normalizeNotation(original);
    this.text = n.text;
    this.origin = n.origin;
  }

  /** 1-based character position in the user's text of normalised index `i`. */
  positionOf(i: number): number {
    if (i >= this.origin.length) return Array.from(this.original).length + 1;
    const at = this.origin[i] ?? 0;
    // count code points before `at` so that a superscript counts as one character
    return Array.from(this.original.slice(0, at)).length + 1;
  }

  /** Raise a parse error pointing at normalised index `i`. */
  fail(i: number, what: string, argument = 'reaction'): never {
    const pos = this.positionOf(i);
    throw new EngineError(
      'parse',
      `Cannot read ${quote(this.original)} at character ${pos}: ${what}`,
      argument,
      pos,
    );
  }
}
