/**
 * Reading any `reaction` argument: a half-reaction, a full reaction, a couple
 * (Ox/Red) or an IUPAC cell diagram, told apart by their marks (bars, arrow,
 * slash, electrons).
 */
import { EngineError } from '../errors';
import { SourceText } from './source';
import {
  type CellDiagram,
  parseCellDiagramSource,
  formatCellDiagram,
  looksLikeCellDiagram,
} from './cellDiagram';
import { type Couple, parseCoupleSource, coupleSlashAt, formatCouple } from './couple';
import { type Reaction, parseReactionSource, findArrow, isHalfReaction, formatReaction } from './reaction';

/** What a `reaction` argument holds. */
export type Notation =
  | { readonly kind: 'half'; readonly reaction: Reaction }
  | { readonly kind: 'reaction'; readonly reaction: Reaction }
  | { readonly kind: 'couple'; readonly couple: Couple }
  | { readonly kind: 'cell'; readonly diagram: CellDiagram };

/**
 * Parse a reaction argument in any of the accepted forms.
 *
 * @param text the user's text
 * @param argument the argument name for messages (default "reaction")
 * @throws EngineError (`parse`) with the position of the problem
 * @example
 * parseNotation('Zn | Zn2+ || Cu2+ | Cu').kind // 'cell'
 * parseNotation('Fe3+/Fe2+').kind // 'couple'
 * parseNotation('Cu2+ + 2e- -> Cu').kind // 'half'
 */
export function parseNotation(text: string, argument = 'reaction'): Notation {
  if (typeof text !== 'string' || text.trim() === '') {
    throw new EngineError(
      'parse',
      `${argument} is empty: give a half-reaction ("Cu2+ + 2e- -> Cu"), a couple ("Cu2+/Cu"), a cell diagram ("Zn | Zn2+ || Cu2+ | Cu") or a reaction.`,
      argument,
      1,
    );
  }
  const src = new SourceText(text);
  if (looksLikeCellDiagram(src.text)) return { kind: 'cell', diagram: parseCellDiagramSource(src, argument) };
  const arrow = findArrow(src, argument);
  if (arrow) {
    const reaction = parseReactionSource(src, argument);
    return isHalfReaction(reaction) ? { kind: 'half', reaction } : { kind: 'reaction', reaction };
  }
  if (coupleSlashAt(src.text) !== -1) return { kind: 'couple', couple: parseCoupleSource(src, argument) };
  return src.fail(
    src.text.length,
    'expected a half-reaction or reaction with an arrow (->), a couple such as "Cu2+/Cu", or a cell diagram such as "Zn | Zn2+ || Cu2+ | Cu"',
    argument,
  );
}

/**
 * Canonical text of any notation; parseNotation(formatNotation(x)) equals x.
 *
 * @example
 * formatNotation(parseNotation('Cu²⁺ + 2e⁻ → Cu')) // 'Cu2+ + 2 e- -> Cu'
 */
export function formatNotation(n: Notation): string {
  switch (n.kind) {
    case 'half':
    case 'reaction':
      return formatReaction(n.reaction);
    case 'couple':
      return formatCouple(n.couple);
    case 'cell':
      return formatCellDiagram(n.diagram);
  }
}
