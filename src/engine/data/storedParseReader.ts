/**
 * Readers of src/engine/data/storedParse.json: the built-in half-reactions and the
 * species-data species as the notation parser read them when `npm run gen:terms` wrote the
 * file, so that the engine builds its built-in table and species registry without parsing
 * some 330 texts on its first call, and the built-in rows' E° at 25 °C as the species data
 * gave them, so that a first call at 25 °C need not build the species data. Each list
 * carries a hash of what it was made from (the built-in rows' texts, E° and dE°/dT; the
 * species texts); where those have changed since (the file is stale), a reader returns null
 * and the caller works them out itself, so a stale file costs time, never a wrong row, with one
 * exception: the species values behind the stored E° are not fingerprinted at run time (that
 * would mean building the species data). The tests (test/engine/tableStoredTerms.test.ts)
 * recompute every stored entry, E° included, and fail while any part of the file is stale, so
 * such a file cannot pass CI.
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

/** A built-in row as src/engine/data/potentials.ts writes it: what the stored lists are made from. */
export interface BuiltinRowInput {
  readonly halfReaction: string;
  readonly e0V: number;
  readonly dE0dTmVperK: number | null;
}

/**
 * The built-in half-reactions as the parser reads the rows `rows` (those of
 * src/engine/data/potentials.ts, in order), or null where the stored list was made from other
 * rows.
 *
 * @example
 * storedHalfReactions(BUILTIN_POTENTIALS)?.[0]?.reactants.length // 2
 */
export function storedHalfReactions(rows: readonly BuiltinRowInput[]): Reaction[] | null {
  const stored = storedHalfReactionRows(rows);
  if (!stored) return null;
  const read = storedReactionReader();
  return stored.rows.map((r) => read(r));
}

/**
 * The stored rows of the built-in half-reactions (one text per row of `rows`, to be read by
 * {@link storedReactionReader}), their index by species and their E° at 25 °C, or
 * null where the stored lists were made from other rows (another text, E° or dE°/dT).
 *
 * @example
 * storedHalfReactionRows(BUILTIN_POTENTIALS)?.rowsByKey['Zn|2'] // the rows holding Zn2+
 */
export function storedHalfReactionRows(rows: readonly BuiltinRowInput[]): StoredHalfReactions | null {
  const p = STORED.potentials;
  if (p.rows.length !== rows.length || p.e0V.length !== rows.length || p.inputsHash !== rowInputsHash(rows))
    return null;
  return p;
}

/** The stored built-in half-reactions: one row per text, the rows that hold each species, each row's E°. */
export interface StoredHalfReactions {
  readonly rows: readonly string[];
  /**
   * For each species key (`speciesKey`: `formula|charge`) other than the medium's (the electron,
   * H+, OH-, H2O), the rows (0-based, increasing) whose terms hold it; every row holds one.
   */
  readonly rowsByKey: Readonly<Record<string, readonly number[]>>;
  /**
   * Each row's E° at 25 °C (V) as the species data gave it when the file was written, null
   * where the species data gives none (the row's own E° is then used).
   */
  readonly e0V: readonly (number | null)[];
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
 * storedSpecies('standard', standardSpecies().map((r) => r.species))?.[0]?.formula // 'H2'
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
 * storedSpeciesKeys('standard', standardSpecies().map((r) => r.species))?.[0] // 'H2|0|g'
 */
export function storedSpeciesKeys(list: 'standard' | 'eph', texts: readonly string[]): readonly string[] | null {
  const s = STORED.species[list];
  if (s.keys.length !== texts.length || s.textsHash !== textsHash(texts)) return null;
  return s.keys;
}

/**
 * FNV-1a (32-bit) fingerprint of the built-in rows the stored lists were made from: each row's
 * text (its UTF-16 code units), then the eight bytes (little-endian IEEE 754) of its E° and of
 * its dE°/dT (0xff 0xff where it has none), rows separated by a line feed. Hashing the numbers'
 * bytes instead of their decimal texts keeps it one pass, with no string built.
 *
 * Domain: any rows. Precision: a 32-bit hash, to detect an edit, not as a security check.
 *
 * @example
 * rowInputsHash([{ halfReaction: 'Zn2+ + 2 e- -> Zn', e0V: -0.7618, dE0dTmVperK: 0.119 }]) !==
 *   rowInputsHash([{ halfReaction: 'Zn2+ + 2 e- -> Zn', e0V: -0.762, dE0dTmVperK: 0.119 }]) // true
 */
export function rowInputsHash(rows: readonly BuiltinRowInput[]): number {
  const bytes = new DataView(new ArrayBuffer(8));
  let h = 0x811c9dc5;
  const mixNumber = (x: number | null): void => {
    if (x === null) {
      h = Math.imul(h ^ 0xff, 0x01000193);
      h = Math.imul(h ^ 0xff, 0x01000193);
      return;
    }
    bytes.setFloat64(0, x, true);
    for (let k = 0; k < 8; k++) h = Math.imul(h ^ bytes.getUint8(k), 0x01000193);
  };
  for (let i = 0; i < rows.length; i++) {
    const r = rows[i]!;
    if (i > 0) h = Math.imul(h ^ 10, 0x01000193);
    const t = r.halfReaction;
    for (let j = 0; j < t.length; j++) h = Math.imul(h ^ t.charCodeAt(j), 0x01000193);
    mixNumber(r.e0V);
    mixNumber(r.dE0dTmVperK);
  }
  return h >>> 0;
}
