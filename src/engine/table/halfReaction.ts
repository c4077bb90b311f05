/**
 * Half-reactions as vectors per electron, for exact matching and Gibbs-additive
 * combination of table rows.
 */
import { type Rational, div, isZero, eq, mul, add, neg, ZERO, ONE, sign, lcm, gcd, rat } from '../rational';
import { type Species, speciesKey, sameSpecies, formatSpecies } from '../notation/species';
import {
  type StoichEntry,
  type Reaction,
  stoichiometry,
  electronsConsumed,
  reactionFromStoichiometry,
} from '../notation/reaction';

/** Species that any aqueous half-reaction may take from the solvent. */
export const MEDIUM_KEYS: ReadonlySet<string> = new Set(['H|1', 'OH|-1', 'H2O|0', 'e']);

/** A stoichiometry keyed by species identity (formula and charge). */
export type StoichMap = Map<string, { species: Species; nu: Rational }>;

/** Stoichiometry as a map keyed by {@link speciesKey}. */
export function toMap(entries: readonly StoichEntry[]): StoichMap {
  const m: StoichMap = new Map();
  for (const e of entries) {
    const k = speciesKey(e.species);
    const prev = m.get(k);
    if (prev) prev.nu = add(prev.nu, e.nu);
    else m.set(k, { species: e.species, nu: e.nu });
  }
  for (const [k, v] of m) if (isZero(v.nu)) m.delete(k);
  return m;
}

/** Electrons consumed by a stoichiometry map (positive for a reduction). */
export function electronsOf(m: StoichMap): Rational {
  const e = m.get('e');
  return e ? neg(e.nu) : ZERO;
}

/** a·x + b·y */
export function combineMaps(x: StoichMap, a: Rational, y: StoichMap, b: Rational): StoichMap {
  const out: StoichMap = new Map();
  for (const [k, v] of x) out.set(k, { species: v.species, nu: mul(v.nu, a) });
  for (const [k, v] of y) {
    const prev = out.get(k);
    const nu = mul(v.nu, b);
    if (prev) {
      prev.nu = add(prev.nu, nu);
      if (!prev.species.phase && v.species.phase) prev.species = v.species;
    } else out.set(k, { species: v.species, nu });
  }
  for (const [k, v] of out) if (isZero(v.nu)) out.delete(k);
  return out;
}

/** Multiply a map by a rational. */
export function scaleMap(x: StoichMap, f: Rational): StoichMap {
  const out: StoichMap = new Map();
  for (const [k, v] of x) out.set(k, { species: v.species, nu: mul(v.nu, f) });
  return out;
}

/**
 * The factor f with x = f·y exactly (species compared by formula and charge,
 * explicit phases must agree), or null where they are not proportional.
 */
export function proportionality(x: StoichMap, y: StoichMap): Rational | null {
  if (x.size !== y.size || x.size === 0) return null;
  let f: Rational | null = null;
  for (const [k, v] of x) {
    const w = y.get(k);
    if (!w || !sameSpecies(v.species, w.species)) return null;
    const r = div(v.nu, w.nu);
    if (f === null) f = r;
    else if (!eq(f, r)) return null;
  }
  return f;
}

/** Phases completed: explicit phases from `from` fill species that have none in `into`. */
export function fillPhases(into: StoichMap, from: StoichMap): StoichMap {
  const out: StoichMap = new Map();
  for (const [k, v] of into) {
    const w = from.get(k);
    out.set(k, { species: !v.species.phase && w?.species.phase ? w.species : v.species, nu: v.nu });
  }
  return out;
}

/** A reaction from a map, reactants first (in map order). */
export function mapToReaction(m: StoichMap): Reaction {
  const entries: StoichEntry[] = [];
  for (const v of m.values()) if (sign(v.nu) < 0 && !v.species.isElectron) entries.push(v);
  for (const v of m.values()) if (sign(v.nu) < 0 && v.species.isElectron) entries.push(v);
  for (const v of m.values()) if (sign(v.nu) > 0) entries.push(v);
  return reactionFromStoichiometry(entries);
}

/**
 * The map scaled to its smallest whole coefficients (`2 Fe3+ + 2 e- -> 2 Fe2+` →
 * `Fe3+ + e- -> Fe2+`), so an electrode's electron count does not depend on how a
 * table row happens to be scaled.
 */
export function smallestWholeMap(m: StoichMap): StoichMap {
  let l = 1n;
  for (const v of m.values()) l = lcm(l, v.nu.den);
  let g = 0n;
  for (const v of m.values()) g = gcd(g, (v.nu.num * l) / v.nu.den);
  if (g === 0n) return m;
  const f = rat(l, g);
  return eq(f, ONE) ? m : scaleMap(m, f);
}

/** Map of a parsed reaction. */
export function reactionMap(r: Reaction): StoichMap {
  return toMap(stoichiometry(r));
}

/** Electrons of a reaction as a number. */
export function electronNumber(r: Reaction): number {
  const e = electronsConsumed(r);
  return Number(e.num) / Number(e.den);
}

/** Non-medium species keys on one side of a map (−1 reactants, +1 products). */
export function sideKeys(m: StoichMap, side: -1 | 1): string[] {
  const out: string[] = [];
  for (const [k, v] of m) if (!MEDIUM_KEYS.has(k) && sign(v.nu) === side) out.push(k);
  return out;
}

/** Text of a species list, for messages. */
export function listSpecies(species: readonly Species[]): string {
  return species.map((s) => formatSpecies(s)).join(', ');
}
