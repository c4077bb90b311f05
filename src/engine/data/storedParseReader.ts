/**
 * Readers of src/engine/data/storedParse.json: the built-in half-reactions and the
 * species-data species as the notation parser read them when `npm run gen:terms` wrote the
 * file, so that the engine builds its built-in table and species registry without parsing
 * some 330 texts on its first call. Each list carries a hash of the texts it was made from;
 * where the texts have changed since (the file is stale), a reader returns null and the
 * caller parses the texts itself, so a stale file costs time, never a wrong row. The
 * tests (test/engine/tableStoredTerms.test.ts) fail while the file is stale.
 *
 * Pure data handling: no parsing of chemistry, only splitting the stored fields.
 */
import { type Rational, rat, ONE } from '../rational';
import { ELECTRON, type Phase, type Species } from '../notation/species';
import type { Reaction, Term } from '../notation/reaction';
import STORED from './storedParse.json';

/**
 * FNV-1a (32-bit) hash of texts joined by line feeds: the fingerprint of the texts a stored
 * list was made from.
 *
 * Domain: any strings (UTF-16 code units hashed). Precision: a 32-bit hash; used to detect
 * an edit, not as a security check.
 *
 * @example
 * textsHash(['Zn2+ + 2 e- -> Zn']) === textsHash(['Zn2+ + 2 e- -> Zn']) // true
 */
export function textsHash(texts: readonly string[]): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < texts.length; i++) {
    const t = texts[i]!;
    if (i > 0) h = Math.imul(h ^ 10, 0x01000193);
    for (let j = 0; j < t.length; j++) h = Math.imul(h ^ t.charCodeAt(j), 0x01000193);
  }
  return h >>> 0;
}

/** Coefficients and species read so far (the same few recur in every row), by their stored text. */
interface Interned {
  readonly coefficients: Map<string, Rational>;
  readonly species: Map<string, Species>;
}

/**
 * One term as stored: `[coefficient ]formula[ charge[ phase]]`. The coefficient (an integer or
 * `num/den`, first since no formula starts with a digit) is left out where it is 1, the charge
 * where it is 0 and no phase follows; the electron is `e`.
 */
function storedTerm(text: string, seen: Interned): Term {
  const digit = text.charCodeAt(0) >= 48 && text.charCodeAt(0) <= 57;
  const space = digit ? text.indexOf(' ') : -1;
  const c = digit ? text.slice(0, space) : '1';
  const speciesText = digit ? text.slice(space + 1) : text;
  let coefficient = seen.coefficients.get(c);
  if (!coefficient) {
    const slash = c.indexOf('/');
    coefficient =
      slash < 0 ? (c === '1' ? ONE : rat(BigInt(c))) : rat(BigInt(c.slice(0, slash)), BigInt(c.slice(slash + 1)));
    seen.coefficients.set(c, coefficient);
  }
  let species = seen.species.get(speciesText);
  if (!species) {
    const [formula, charge, phase] = speciesText.split(' ') as [string, string | undefined, Phase | undefined];
    species =
      speciesText === 'e'
        ? ELECTRON
        : Object.freeze({ formula, charge: charge === undefined ? 0 : Number(charge), phase: phase ?? null, isElectron: false });
    seen.species.set(speciesText, species);
  }
  return { coefficient, species, activity: null };
}

/** A stored reaction: terms joined by `,`, reactants and products separated by `>`. */
function storedReaction(text: string, seen: Interned): Reaction {
  const arrow = text.indexOf('>');
  return {
    reactants: text
      .slice(0, arrow)
      .split(',')
      .map((t) => storedTerm(t, seen)),
    products: text
      .slice(arrow + 1)
      .split(',')
      .map((t) => storedTerm(t, seen)),
  };
}

/**
 * The built-in half-reactions as the parser reads `texts` (the rows of
 * src/engine/data/potentials.ts, in order), or null where the stored list was made from
 * other texts.
 *
 * @example
 * storedHalfReactions(BUILTIN_POTENTIALS.map((r) => r.halfReaction))?.[0]?.reactants.length // 2
 */
export function storedHalfReactions(texts: readonly string[]): Reaction[] | null {
  const stored = storedHalfReactionRows(texts);
  if (!stored) return null;
  const read = storedReactionReader();
  return stored.rows.map((r) => read(r));
}

/**
 * The stored rows of the built-in half-reactions (one text per row of `texts`, to be read by
 * {@link storedReactionReader}) and their index by species, or null where the stored list was
 * made from other texts.
 *
 * @example
 * storedHalfReactionRows(BUILTIN_POTENTIALS.map((r) => r.halfReaction))?.rowsByKey['Zn|2'] // the rows holding Zn2+
 */
export function storedHalfReactionRows(texts: readonly string[]): StoredHalfReactions | null {
  const p = STORED.potentials;
  if (p.rows.length !== texts.length || p.textsHash !== textsHash(texts)) return null;
  return p;
}

/** The stored built-in half-reactions: one row per text, and the rows that hold each species. */
export interface StoredHalfReactions {
  readonly rows: readonly string[];
  /**
   * For each species key (`speciesKey`: `formula|charge`) other than the medium's (the electron,
   * H+, OH-, H2O), the rows (0-based, increasing) whose terms hold it; every row holds one.
   */
  readonly rowsByKey: Readonly<Record<string, readonly number[]>>;
}

/**
 * A reader of stored rows (from {@link storedHalfReactionRows}) into reactions, one row at a
 * time; the rows it reads share their coefficients and species.
 *
 * @example
 * storedReactionReader()('Zn 2,2 e>Zn').products[0]?.species.formula // 'Zn'
 */
export function storedReactionReader(): (row: string) => Reaction {
  const seen: Interned = { coefficients: new Map(), species: new Map() };
  return (row) => storedReaction(row, seen);
}


/** A stored species key `formula|charge|phase` as the species it names (phase as inferred). */
function speciesOfKey(key: string): Species {
  const [formula, charge, phase] = key.split('|') as [string, string, string];
  return { formula, charge: Number(charge), phase: phase === '' ? null : (phase as Phase), isElectron: false };
}

/**
 * The species of the species-data records, phases completed as the parser infers them
 * (`{ ...parseSpecies(text), phase: phaseOf(…) }`), for the record texts `texts` of one
 * list (`standard` or `eph`), or null where the stored list was made from other texts.
 *
 * @example
 * storedSpecies('standard', STANDARD_SPECIES.map((r) => r.species))?.[0]?.formula // 'H2'
 */
export function storedSpecies(list: 'standard' | 'eph', texts: readonly string[]): Species[] | null {
  return storedSpeciesKeys(list, texts)?.map(speciesOfKey) ?? null;
}

/**
 * The keys `formula|charge|phase` (`speciesPhaseKey`, phase as inferred) of the species-data
 * records of one list, as stored, for the record texts `texts`, or null where the stored list
 * was made from other texts.
 *
 * @example
 * storedSpeciesKeys('standard', STANDARD_SPECIES.map((r) => r.species))?.[0] // 'H2|0|g'
 */
export function storedSpeciesKeys(list: 'standard' | 'eph', texts: readonly string[]): readonly string[] | null {
  const s = STORED.species[list];
  if (s.keys.length !== texts.length || s.textsHash !== textsHash(texts)) return null;
  return s.keys;
}
