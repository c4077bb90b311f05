/**
 * Redox couples written `Ox/Red`: `Cu2+/Cu`, `Fe3+/Fe2+`, `AgCl/Ag`,
 * `MnO4-/Mn2+`. Several species on one side are separated by "," or "+".
 */
import { type Species, scanSpecies, formatSpecies, speciesKey } from './species';
import { SourceText } from './source';

/** A couple: the oxidised and reduced species as named. */
export interface Couple {
  readonly oxidized: readonly Species[];
  readonly reduced: readonly Species[];
  /** inline activities written in the couple, by species key ("Cu2+(aq, 5 mM)/Cu") */
  readonly activities?: ReadonlyMap<string, number>;
}

/** Index of the couple's slash in normalised text (outside brackets, not a fraction), or −1. */
export function coupleSlashAt(t: string): number {
  let depth = 0;
  let found = -1;
  for (let i = 0; i < t.length; i++) {
    const ch = t[i];
    if (ch === '(' || ch === '[') depth++;
    else if (ch === ')' || ch === ']') depth--;
    else if (ch === '/' && depth === 0) {
      const before = t[i - 1] ?? '';
      const after = t[i + 1] ?? '';
      if (/\d/.test(before) && /\d/.test(after) && !/[A-Za-z)\]+-]/.test(t[i - 2] ?? ' ')) continue; // a fraction
      if (found >= 0) return -2;
      found = i;
    }
  }
  return found;
}

function parseList(
  src: SourceText,
  from: number,
  to: number,
  argument: string,
  activities: Map<string, number>,
): Species[] {
  const out: Species[] = [];
  let i = from;
  const t = src.text;
  for (;;) {
    while (i < to && t[i] === ' ') i++;
    if (i >= to) src.fail(i, 'expected a species', argument);
    const s = scanSpecies(src, i, argument);
    out.push(s.species);
    if (s.activity) activities.set(speciesKey(s.species), s.activity.value);
    i = s.end;
    while (i < to && t[i] === ' ') i++;
    if (i >= to) break;
    if (t[i] === ',' || t[i] === '+') {
      i++;
      continue;
    }
    src.fail(i, `unexpected "${t[i] as string}" in a couple; write it as Ox/Red, e.g. "Fe3+/Fe2+"`, argument);
  }
  return out;
}

/**
 * Parse a couple.
 *
 * @throws EngineError (`parse`) with the position of the problem
 * @example
 * parseCouple('Fe3+/Fe2+').oxidized[0].charge // 3
 */
export function parseCouple(text: string, argument = 'reaction'): Couple {
  return parseCoupleSource(new SourceText(text), argument);
}

export function parseCoupleSource(src: SourceText, argument = 'reaction'): Couple {
  const at = coupleSlashAt(src.text);
  if (at === -2)
    src.fail(
      src.text.lastIndexOf('/'),
      'a couple has one "/" between the oxidised and reduced forms',
      argument,
    );
  if (at < 0) src.fail(0, 'expected a couple written Ox/Red, e.g. "Cu2+/Cu"', argument);
  const activities = new Map<string, number>();
  const oxidized = parseList(src, 0, at, argument, activities);
  const reduced = parseList(src, at + 1, src.text.length, argument, activities);
  return { oxidized, reduced, activities };
}

/**
 * Canonical text of a couple.
 *
 * @example
 * formatCouple(parseCouple('Cu²⁺/Cu')) // 'Cu2+/Cu'
 */
export function formatCouple(c: Couple): string {
  return `${c.oxidized.map((s) => formatSpecies(s)).join(', ')}/${c.reduced.map((s) => formatSpecies(s)).join(', ')}`;
}
