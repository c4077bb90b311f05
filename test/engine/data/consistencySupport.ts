/** Re-exports for the consistency test, and the cell reaction of two table rows as text. */
export * from '../../../src/engine';
import { type ResolvedHalf, formatReaction } from '../../../src/engine';
import { combineMaps, mapToReaction, electronsOf, MEDIUM_KEYS } from '../../../src/engine/table/halfReaction';
import { div, neg, rat, lcm } from '../../../src/engine/rational';

/**
 * The cell reaction "right reduced, left oxidised" of two half-reactions as text (whole
 * coefficients), or null where nothing but water, H+ and OH- would react.
 */
export function mapToReactionForTest(right: ResolvedHalf, left: ResolvedHalf): string | null {
  const nr = electronsOf(right.map);
  const nl = electronsOf(left.map);
  const l = rat(lcm(nr.num * nl.den, nl.num * nr.den), nr.den * nl.den);
  const m = combineMaps(right.map, div(l, nr), left.map, neg(div(l, nl)));
  m.delete('e');
  if ([...m.keys()].every((k) => MEDIUM_KEYS.has(k))) return null;
  return formatReaction(mapToReaction(m));
}
