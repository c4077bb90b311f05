/**
 * The electrode reaction that Faraday's law and the specific capacity read: a half-reaction
 * written out with its electrons, or a couple resolved through the built-in table.
 */
import { EngineError, quote } from '../errors';
import type { Reaction } from '../notation/reaction';
import { parseNotation } from '../notation/notation';
import { assertBalanced } from '../balance/balance';
import { resolvedReaction } from '../cache';

/**
 * The half-reaction `text` writes out (checked for balance) or names as a couple of the
 * built-in table.
 *
 * Domain: a half-reaction with its electrons ("Cu2+ + 2 e- -> Cu") or a couple ("Cu2+/Cu");
 * a cell diagram or a whole reaction is refused.
 *
 * @param argument the argument the text came from, named in parse errors
 * @param notHalf what the refusal says after the quoted text, e.g. "is not a half-reaction: …"
 * @throws EngineError `parse`, `unbalanced`; `argument` where the text is not a half-reaction
 * @example
 * halfReactionOf('Cu2+/Cu', 'reaction', 'is not a half-reaction.') // Cu2+ + 2 e- -> Cu
 */
export function halfReactionOf(text: string, argument: string, notHalf: string): Reaction {
  const n = parseNotation(text, argument);
  if (n.kind === 'half') {
    assertBalanced(n.reaction, text);
    return n.reaction;
  }
  if (n.kind === 'couple') {
    const r = resolvedReaction(text, null);
    if (r.kind === 'half') return r.half.reaction;
  }
  throw new EngineError('argument', `${quote(text)} ${notHalf}`, argument);
}
