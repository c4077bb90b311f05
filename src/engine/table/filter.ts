/**
 * Picking rows of the built-in potentials table by what a user types, shared by
 * LISTTABLE([filter]) and the task pane's potentials sheet:
 * - an element symbol alone ("Fe", "Cu", "O") picks every row with a species containing
 *   that element;
 * - a species ("Cu2+", "Fe3+", "MnO4-", "Cu²⁺") picks the rows where that species (same
 *   formula and charge, any phase) takes part;
 * - anything else, or a species that no row has, picks the rows whose text contains it
 *   (ignoring case), e.g. "(OH)" or "CN".
 */
import { type BuiltinPotentialRow } from '../data/potentials';
import { type Species, parseSpecies, elementsOf, speciesKey, formatSpecies } from '../notation/species';
import { parseReaction } from '../notation/reaction';

/** How a filter was applied. */
export type FilterRule = 'all' | 'element' | 'species' | 'text';

/** The rows a filter picks, and how it read the filter. */
export interface FilterResult {
  readonly rows: readonly BuiltinPotentialRow[];
  readonly rule: FilterRule;
  /** e.g. "the element Fe", "the species Cu2+", 'text containing "CN"', "all rows" */
  readonly described: string;
}

const speciesCache = new Map<string, Species[]>();

function speciesOfRow(row: BuiltinPotentialRow): Species[] {
  let list = speciesCache.get(row.halfReaction);
  if (!list) {
    const r = parseReaction(row.halfReaction, 'half-reaction');
    list = [...r.reactants, ...r.products].map((t) => t.species).filter((s) => !s.isElectron);
    speciesCache.set(row.halfReaction, list);
  }
  return list;
}

function asElementSymbol(text: string): string | null {
  if (!/^[A-Z][a-z]?$/.test(text)) return null;
  try {
    const s = parseSpecies(text, 'filter');
    if (s.charge !== 0 || s.formula !== text) return null;
    const els = elementsOf(s);
    return els.size === 1 && els.get(text) === 1 ? text : null;
  } catch {
    return null;
  }
}

/**
 * The built-in rows a filter picks (see the module comment for the rules).
 *
 * @example
 * filterPotentials(BUILTIN_POTENTIALS, 'Cu2+').rule // 'species'
 */
export function filterPotentials(rows: readonly BuiltinPotentialRow[], filter: string): FilterResult {
  const f = filter.trim();
  if (f === '') return { rows, rule: 'all', described: 'all rows' };
  const element = asElementSymbol(f);
  if (element) {
    return {
      rows: rows.filter((r) => speciesOfRow(r).some((s) => elementsOf(s).has(element))),
      rule: 'element',
      described: `the element ${element}`,
    };
  }
  let species: Species | null = null;
  try {
    species = parseSpecies(f, 'filter');
  } catch {
    species = null;
  }
  if (species && !species.isElectron) {
    const key = speciesKey(species);
    const picked = rows.filter((r) => speciesOfRow(r).some((s) => speciesKey(s) === key));
    if (picked.length > 0) {
      return { rows: picked, rule: 'species', described: `the species ${formatSpecies(species, false)}` };
    }
  }
  const lower = f.toLowerCase();
  return {
    rows: rows.filter((r) => r.halfReaction.toLowerCase().includes(lower)),
    rule: 'text',
    described: `text containing "${f}"`,
  };
}
