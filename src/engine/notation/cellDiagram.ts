/**
 * IUPAC cell diagrams: `Zn(s) | Zn2+(aq, 0.1 M) || Cu2+(aq) | Cu(s)`.
 * `|` is a phase boundary, `||` a salt bridge, `,` separates species in one phase.
 * Activities may be written inline. Without a salt bridge (`Pt | H2 | HCl | AgCl | Ag`)
 * the electrolyte is shared by both electrodes.
 */
import { type InlineActivity, type Species, scanSpecies, formatSpecies } from './species';
import { withActivity } from './reaction';
import { SourceText } from './source';

/** One species of a cell diagram with its inline activity, if written. */
export interface CellSpecies {
  readonly species: Species;
  readonly activity: InlineActivity | null;
}

/** One phase: the species separated by commas between two bars. */
export type CellPhase = readonly CellSpecies[];

/** A parsed cell diagram. */
export interface CellDiagram {
  /** Phases left of the salt bridge (or all phases where there is none). */
  readonly left: readonly CellPhase[];
  /** Phases right of the salt bridge (empty where there is none). */
  readonly right: readonly CellPhase[];
  /** True where a salt bridge `||` separates the two half-cells. */
  readonly bridge: boolean;
}

/** True where text looks like a cell diagram (has a bar). */
export function looksLikeCellDiagram(text: string): boolean {
  return /[|‖│∣]/.test(text);
}

/** Split [from, to) of the text at a separator outside parentheses. */
function splitTop(t: string, from: number, to: number, sep: string): { from: number; to: number }[] {
  const parts: { from: number; to: number }[] = [];
  let depth = 0;
  let start = from;
  for (let i = from; i < to; i++) {
    const ch = t[i];
    if (ch === '(' || ch === '[') depth++;
    else if (ch === ')' || ch === ']') depth--;
    else if (depth === 0 && t.startsWith(sep, i)) {
      if (sep === '|' && (t[i + 1] === '|' || t[i - 1] === '|')) continue;
      parts.push({ from: start, to: i });
      start = i + sep.length;
      i += sep.length - 1;
    }
  }
  parts.push({ from: start, to });
  return parts;
}

function parsePhase(src: SourceText, from: number, to: number, argument: string): CellSpecies[] {
  const out: CellSpecies[] = [];
  for (const part of splitTop(src.text, from, to, ',')) {
    let i = part.from;
    while (i < part.to && src.text[i] === ' ') i++;
    if (i >= part.to) src.fail(i, 'expected a species between the separators', argument);
    const s = scanSpecies(src, i, argument);
    let k = s.end;
    while (k < part.to && src.text[k] === ' ') k++;
    if (k < part.to)
      src.fail(k, `unexpected "${src.text[k] as string}"; separate species in one phase with ","`, argument);
    out.push({ species: s.species, activity: s.activity });
  }
  return out;
}

/**
 * Parse a cell diagram.
 *
 * @throws EngineError (`parse`) with the position of the problem
 * @example
 * parseCellDiagram('Zn | Zn2+ || Cu2+ | Cu').bridge // true
 */
export function parseCellDiagram(text: string, argument = 'reaction'): CellDiagram {
  return parseCellDiagramSource(new SourceText(text), argument);
}

export function parseCellDiagramSource(src: SourceText, argument = 'reaction'): CellDiagram {
  const t = src.text;
  const halves = splitTop(t, 0, t.length, '||');
  if (halves.length > 2) src.fail(halves[2]!.from - 2, 'a cell has at most one salt bridge "||"', argument);
  const phasesOf = (h: { from: number; to: number }) =>
    splitTop(t, h.from, h.to, '|').map((p) => parsePhase(src, p.from, p.to, argument));
  if (halves.length === 2) {
    const left = phasesOf(halves[0]!);
    const right = phasesOf(halves[1]!);
    return { left, right, bridge: true };
  }
  const all = phasesOf(halves[0]!);
  if (all.length < 2)
    src.fail(t.length, 'a cell diagram needs at least two phases separated by "|"', argument);
  return { left: all, right: [], bridge: false };
}

function formatPhase(p: CellPhase): string {
  return p
    .map((c) => (c.activity ? withActivity(c.species, c.activity) : formatSpecies(c.species)))
    .join(', ');
}

/**
 * Canonical text of a cell diagram.
 *
 * @example
 * formatCellDiagram(parseCellDiagram('Zn|Zn2+(0.1 M)||Cu2+|Cu')) // 'Zn | Zn2+(aq, 0.1 M) || Cu2+ | Cu'
 */
export function formatCellDiagram(d: CellDiagram): string {
  const side = (ps: readonly CellPhase[]) => ps.map(formatPhase).join(' | ');
  return d.bridge ? `${side(d.left)} || ${side(d.right)}` : side(d.left);
}
