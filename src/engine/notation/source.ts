/**
 * A piece of user text being read, with positions mapped back to what the user
 * typed (after Unicode normalisation), and the one way parse errors are raised.
 */
import { EngineError, quote } from '../errors';
import { normalizeNotation } from './unicode';

export class SourceText {
  /** The normalised text the scanners read. */
  readonly text: string;
  /** The user's text as typed. */
  readonly original: string;
  private readonly origin: number[];

  constructor(original: string) {
    this.original = original;
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
