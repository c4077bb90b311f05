/**
 * The potentials table: built-in rows and a user's rows (a spreadsheet range),
 * validated row by row. User rows take precedence over built-in rows for the
 * same half-reaction; a broken user row is reported with its row number and does
 * not break lookups that do not touch it.
 */
import { EngineError, isEngineError, quote } from '../errors';
import { sign, type Rational, div, neg, ONE } from '../rational';
import { parseNotation } from '../notation/notation';
import { formatReaction, type Reaction } from '../notation/reaction';
import { speciesKey } from '../notation/species';
import { checkBalance } from '../balance/balance';
import { BUILTIN_POTENTIALS } from '../data/potentials';
import {
  storedHalfReactionRows,
  storedReactionReader,
} from '../data/storedParseReader';
import { type StoichMap, reactionMap, electronsOf, proportionality, scaleMap } from './halfReaction';
import { toNumber } from '../rational';
import {
  reactionThermo,
  isComplete,
  potentialModel,
  checkSpeciesTemperature,
  cpFactorK,
  T0_K,
  type MissingSpeciesData,
} from '../thermo/reactionThermo';

/** Where a row came from. `row` is 1-based within the user's range (header included). */
export type RowOrigin =
  { readonly kind: 'builtin'; readonly index: number } | { readonly kind: 'user'; readonly row: number };

/** A validated table row. */
export interface TableRow {
  readonly text: string;
  readonly reaction: Reaction;
  /** stoichiometry per the row as written */
  readonly map: StoichMap;
  /** the same per electron (for matching) */
  readonly perElectron: StoichMap;
  /** electrons consumed as written */
  readonly n: number;
  readonly e0V: number;
  readonly dE0dTmVperK: number | null;
  readonly source: string;
  readonly origin: RowOrigin;
  /** how E° moves with temperature */
  readonly temperature: RowTemperature;
  /** E° at 25 °C from the species data (V), or null where a species has no data */
  readonly speciesE0V: number | null;
}

/**
 * A row's E°(T) = e0V + slopeVPerK·(T − 298.15 K) + cpVPerK·cpFactorK(T).
 * `basis`: `species` where the slope and ΔCp° come from the species data (valid
 * 0–100 °C), `row` where the row's own dE°/dT is used (linear), `none` where E° is taken
 * as its 25 °C value at every temperature. `cpMissing`: species whose heat capacity is left
 * out of ΔrCp°; `entropyMissing`: species without S° (then the basis is not `species`).
 */
export interface RowTemperature extends MissingSpeciesData {
  readonly slopeVPerK: number;
  readonly cpVPerK: number;
  readonly basis: 'species' | 'row' | 'none';
}

/**
 * E° of a table row at a temperature (V).
 *
 * @throws EngineError (`argument`) outside 0–100 °C for a row whose temperature dependence comes from the species data
 * @example
 * rowE0V(builtinTable()[0], 25)
 */
export function rowE0V(r: TableRow, tempC: number): number {
  const t = r.temperature;
  if (tempC === 25 || t.basis === 'none') return r.e0V;
  if (t.basis === 'row') return r.e0V + t.slopeVPerK * (tempC - 25);
  const tK = checkSpeciesTemperature(tempC);
  return r.e0V + t.slopeVPerK * (tK - T0_K) + t.cpVPerK * cpFactorK(tK);
}

function speciesModel(map: StoichMap, n: number) {
  const entries = Array.from(map.values()).map((v) => ({ species: v.species, nu: toNumber(v.nu) }));
  const th = reactionThermo(entries);
  if (!isComplete(th)) return null;
  return { th, model: potentialModel(th, n) };
}

/** A problem found in a user's table. */
export interface TableProblem {
  /** 1-based row within the range */
  readonly row: number;
  readonly message: string;
}

/** A merged table: user rows first, then built-in rows not shadowed by a user row. */
export interface PotentialTable {
  readonly rows: readonly TableRow[];
  readonly userRows: readonly TableRow[];
  readonly problems: readonly TableProblem[];
  /** user rows that could not be used but whose half-reaction could be read: a lookup that needs one is an error */
  readonly brokenRows: readonly BrokenRow[];
}

/** A user row that names a readable half-reaction but cannot be used (bad E°, unbalanced …). */
export interface BrokenRow {
  readonly row: number;
  readonly perElectron: StoichMap;
  readonly message: string;
}

function readablePerElectron(text: string): StoichMap | null {
  try {
    const n = parseNotation(text, 'half-reaction');
    if (n.kind !== 'half') return null;
    const map = reactionMap(n.reaction);
    const e = electronsOf(map);
    return sign(e) > 0 ? scaleMap(map, div(ONE, e)) : null;
  } catch {
    return null;
  }
}

/** Describe a row's origin for provenance and messages. */
export function describeOrigin(o: RowOrigin): string {
  return o.kind === 'builtin' ? `built-in row ${o.index + 1}` : `your table, row ${o.row}`;
}

/** A row's half-reaction read: the reaction as written, its map and its electrons. */
interface ReadHalfReaction {
  readonly reaction: Reaction;
  readonly map: StoichMap;
  readonly e: Rational;
}

/** Parse and check a row's half-reaction (balanced, written as a reduction). */
function readHalfReaction(text: string): ReadHalfReaction {
  const n = parseNotation(text, 'half-reaction');
  if (n.kind !== 'half') {
    throw new EngineError(
      'parse',
      `${quote(text)} is not a half-reaction: write a reduction with electrons on the left, e.g. "Fe3+ + e- -> Fe2+".`,
    );
  }
  const bal = checkBalance(n.reaction);
  if (!bal.balanced)
    throw new EngineError('unbalanced', `${quote(text)} does not balance (${bal.problems.join('; ')}).`);
  const map = reactionMap(n.reaction);
  const e: Rational = electronsOf(map);
  if (sign(e) < 0) {
    throw new EngineError(
      'parse',
      `${quote(text)} is written as an oxidation; write it as a reduction (electrons on the left).`,
    );
  }
  return { reaction: n.reaction, map, e };
}

/** The temperature-dependent part of a row: E°, dE°/dT and how E° moves with temperature. */
export interface RowThermo {
  readonly e0V: number;
  readonly dE0dTmVperK: number | null;
  readonly temperature: RowTemperature;
  readonly speciesE0V: number | null;
}

/** The temperature model of a row's own dE°/dT (mV/K): linear, or none where it gives none. */
function rowOwnTemperature(
  mv: number | null,
  cpMissing: readonly string[],
  entropyMissing: readonly string[],
): RowTemperature {
  return mv === null
    ? { slopeVPerK: 0, cpVPerK: 0, basis: 'none', cpMissing, entropyMissing }
    : { slopeVPerK: mv * 1e-3, cpVPerK: 0, basis: 'row', cpMissing, entropyMissing };
}

function rowThermo(
  map: StoichMap,
  electrons: number,
  e0V: number,
  dE0dTmVperK: number | null,
  builtin: boolean,
): RowThermo {
  const sp = speciesModel(map, electrons);
  let temperature: RowTemperature;
  let value = e0V;
  let slopeMv = dE0dTmVperK;
  const cpMissing = sp ? sp.th.cpMissing : [];
  const entropyMissing = sp ? sp.th.entropyMissing : [];
  const fromSpecies = (): RowTemperature => ({
    slopeVPerK: sp!.model.slopeVPerK!,
    cpVPerK: sp!.model.cpVPerK,
    basis: 'species',
    cpMissing,
    entropyMissing,
  });
  const fromRow = (mv: number | null): RowTemperature => rowOwnTemperature(mv, cpMissing, entropyMissing);
  if (builtin && sp) {
    // built-in rows: E° and its temperature dependence from the species data
    value = sp.model.e0V;
    if (sp.model.slopeVPerK !== null) {
      temperature = fromSpecies();
      slopeMv = sp.model.slopeVPerK * 1e3;
    } else temperature = fromRow(dE0dTmVperK);
  } else if (dE0dTmVperK !== null) temperature = fromRow(dE0dTmVperK);
  else if (sp && sp.model.slopeVPerK !== null) temperature = fromSpecies();
  else temperature = fromRow(null);
  return { e0V: value, dE0dTmVperK: slopeMv, temperature, speciesE0V: sp ? sp.model.e0V : null };
}

function electronCount(e: Rational): number {
  return Number(e.num) / Number(e.den);
}

function makeRow(
  text: string,
  e0V: number,
  dE0dTmVperK: number | null,
  source: string,
  origin: RowOrigin,
): TableRow {
  const { reaction, map, e } = readHalfReaction(text);
  const electrons = electronCount(e);
  return {
    text,
    reaction,
    map,
    perElectron: scaleMap(map, div(ONE, e)),
    n: electrons,
    ...rowThermo(map, electrons, e0V, dE0dTmVperK, origin.kind === 'builtin'),
    source,
    origin,
  };
}

/** A built-in row's half-reaction read: {@link ReadHalfReaction} and its electron count. */
interface ReadBuiltin extends ReadHalfReaction {
  readonly n: number;
}

/**
 * A built-in row: its half-reaction as stored in storedParse.json (read by the notation
 * parser when that file was generated; checked there to balance and to be a reduction) and
 * read from there when first asked for (a lookup reads only the rows that hold its species,
 * see {@link builtinRowsHolding}), its E° at 25 °C from the species data as storedParse.json
 * holds it (computed there by `npm run gen:terms`), its temperature dependence (and E° where
 * the stored list is stale) from the species data on first use.
 */
class BuiltinRow implements TableRow {
  readonly origin: RowOrigin;
  private read: ReadBuiltin | null = null;
  private thermo: RowThermo | null = null;
  private perElectronMap: StoichMap | null = null;

  /**
   * `stored` and `readStored`: the row's stored text and its reader; else `given`, the text as
   * parsed. `storedE0V`: the row's E° at 25 °C from the species data as stored (null where the
   * species data gives none: the row's own E° is used), undefined where not stored.
   */
  constructor(
    readonly text: string,
    private readonly stored: string | null,
    private readonly readStored: ((row: string) => Reaction) | null,
    given: ReadHalfReaction | null,
    private readonly givenE0V: number,
    private readonly givenSlopeMvPerK: number | null,
    readonly source: string,
    index: number,
    private readonly storedE0V: number | null | undefined,
  ) {
    if (given) this.read = { ...given, n: electronCount(given.e) };
    this.origin = { kind: 'builtin', index };
  }

  /** E° and its temperature model from the species data, whatever is stored. */
  thermoFromSpecies(): RowThermo {
    return rowThermo(this.map, this.n, this.givenE0V, this.givenSlopeMvPerK, true);
  }

  private halfReaction(): ReadBuiltin {
    if (!this.read) {
      const reaction = this.readStored!(this.stored!);
      const map = storedMap(reaction);
      const e = electronsOf(map);
      this.read = { reaction, map, e, n: electronCount(e) };
    }
    return this.read;
  }
  get reaction(): Reaction {
    return this.halfReaction().reaction;
  }
  get map(): StoichMap {
    return this.halfReaction().map;
  }
  get n(): number {
    return this.halfReaction().n;
  }

  get perElectron(): StoichMap {
    if (!this.perElectronMap) {
      const { map, e } = this.halfReaction();
      this.perElectronMap = scaleMap(map, div(ONE, e));
    }
    return this.perElectronMap;
  }

  private computed(): RowThermo {
    if (!this.thermo) this.thermo = this.thermoFromSpecies();
    return this.thermo;
  }
  /** E° at 25 °C: as stored where it is, so that a call at 25 °C builds no species data. */
  get e0V(): number {
    if (this.thermo === null && this.storedE0V !== undefined) return this.storedE0V ?? this.givenE0V;
    return this.computed().e0V;
  }
  get dE0dTmVperK(): number | null {
    return this.computed().dE0dTmVperK;
  }
  get temperature(): RowTemperature {
    return this.computed().temperature;
  }
  get speciesE0V(): number | null {
    if (this.thermo === null && this.storedE0V !== undefined) return this.storedE0V;
    return this.computed().speciesE0V;
  }
}

/**
 * Each built-in row's E° and temperature model worked out from the species data now, in the
 * table's order, whatever storedParse.json holds: what `npm run gen:terms` stores E° from and
 * the tests compare the stored list with.
 *
 * @example
 * builtinThermoFromSpecies()[0]?.e0V === builtinTable()[0]?.e0V // true while the stored list is fresh
 */
export function builtinThermoFromSpecies(): RowThermo[] {
  return builtinTable().map((r) => (r as BuiltinRow).thermoFromSpecies());
}

/** The built-in rows holding each species key, from the stored parse (null where it is stale). */
let builtinRowsByKey: Readonly<Record<string, readonly number[]>> | null = null;

/**
 * The indexes (`origin.index`) of the built-in rows whose half-reaction holds one of the
 * species `keys` (`speciesKey`) other than the medium's (MEDIUM_KEYS: the electron, H+, OH-,
 * H2O, which are left out of the index; every built-in row holds another species), from the
 * stored parse, so that a lookup reads only those rows; null where not known (a stale stored
 * parse): then any row may hold them.
 *
 * @example
 * builtinRowsHolding(['Zn|2']) // Set { the index of Zn2+ + 2 e- -> Zn, … }
 */
export function builtinRowsHolding(keys: Iterable<string>): ReadonlySet<number> | null {
  builtinTable();
  const index = builtinRowsByKey;
  if (!index) return null;
  const out = new Set<number>();
  for (const k of keys) if (Object.prototype.hasOwnProperty.call(index, k)) for (const i of index[k]!) out.add(i);
  return out;
}

/**
 * The map of a stored built-in reaction: where no species occurs twice (by formula and charge)
 * nothing merges or cancels, so the map is the terms in order, reactants negative; otherwise
 * {@link reactionMap}. Saves inferring every species' phase on the first call.
 */
function storedMap(reaction: Reaction): StoichMap {
  const map: StoichMap = new Map();
  for (const t of reaction.reactants) map.set(speciesKey(t.species), { species: t.species, nu: neg(t.coefficient) });
  for (const t of reaction.products) map.set(speciesKey(t.species), { species: t.species, nu: t.coefficient });
  return map.size === reaction.reactants.length + reaction.products.length ? map : reactionMap(reaction);
}

let builtinRows: TableRow[] | null = null;

/**
 * The built-in rows, made once (their half-reactions read from the stored parse and their E°
 * from the species data when first asked for).
 *
 * @example
 * builtinTable().length >= 60 // true
 */
export function builtinTable(): readonly TableRow[] {
  if (!builtinRows) {
    const stored = storedHalfReactionRows(BUILTIN_POTENTIALS);
    const read = stored ? storedReactionReader() : null;
    const e0 = stored ? stored.e0V : null;
    builtinRowsByKey = stored ? stored.rowsByKey : null;
    builtinRows = BUILTIN_POTENTIALS.map((r, index) => {
      const row = stored?.rows[index];
      const t = e0?.[index];
      return row !== undefined
        ? new BuiltinRow(r.halfReaction, row, read, null, r.e0V, r.dE0dTmVperK, r.source, index, t)
        : new BuiltinRow(r.halfReaction, null, null, readHalfReaction(r.halfReaction), r.e0V, r.dE0dTmVperK, r.source, index, t);
    });
  }
  return builtinRows;
}

const BUILTIN_TABLE: { value: PotentialTable | null } = { value: null };

/** The table with only built-in rows. */
export function defaultTable(): PotentialTable {
  if (!BUILTIN_TABLE.value)
    BUILTIN_TABLE.value = { rows: builtinTable(), userRows: [], problems: [], brokenRows: [] };
  return BUILTIN_TABLE.value;
}

type Cell = unknown;

function isBlankCell(v: Cell): boolean {
  return v === null || v === undefined || (typeof v === 'string' && v.trim() === '');
}

function cellNumber(v: Cell): number | null {
  if (typeof v === 'number') return Number.isFinite(v) ? v : NaN;
  if (typeof v === 'string') {
    const t = v.trim().replace(/\u2212/g, '-');
    if (t === '') return null;
    const x = Number(t);
    return Number.isFinite(x) ? x : NaN;
  }
  if (isBlankCell(v)) return null;
  return NaN;
}

function looksLikeHeader(row: readonly Cell[]): boolean {
  const first = row[0];
  if (typeof first !== 'string') return false;
  if (/->|→|=|⇌/.test(first)) return false;
  const second = row[1];
  return typeof second === 'string' && Number.isNaN(Number(second.trim()))
    ? true
    : /half|reaction|couple/i.test(first);
}

/**
 * Read a user's table from a range: columns half-reaction | E° (V) | dE°/dT (mV/K, optional) | source (optional).
 * A header row is recognised and skipped; blank rows (all cells empty, "" or 0) are skipped.
 * dE°/dT: a number (0 included) is used as given, so 0 forces a constant E°; an empty cell
 * (empty or "") means none given: the temperature dependence then comes from the species
 * entropies where all the row's species are known (SOURCE says so), else the 25 °C value is
 * used at every temperature.
 *
 * @example
 * readUserTable([['Half-reaction', 'E0'], ['Fe3+ + e- -> Fe2+', 0.68]]).rows[0].e0V // 0.68
 */
export function readUserTable(cells: readonly (readonly Cell[])[] | null | undefined): PotentialTable {
  if (!cells || cells.length === 0) return defaultTable();
  const userRows: TableRow[] = [];
  const problems: TableProblem[] = [];
  const brokenRows: BrokenRow[] = [];
  cells.forEach((raw, idx) => {
    const before = problems.length;
    readRow(raw, idx);
    const p = problems[before];
    if (p && problems.length > before) {
      const t = raw?.[0];
      const per = typeof t === 'string' ? readablePerElectron(t.trim()) : null;
      if (per) brokenRows.push({ row: idx + 1, perElectron: per, message: p.message });
    }
  });
  function readRow(raw: readonly Cell[] | undefined, idx: number): void {
    const rowNo = idx + 1;
    const row = raw ?? [];
    const blank = row.every((c) => isBlankCell(c) || c === 0 || c === false);
    if (blank) return;
    if (idx === 0 && looksLikeHeader(row)) return;
    const textCell = row[0];
    if (typeof textCell !== 'string' || textCell.trim() === '') {
      problems.push({
        row: rowNo,
        message: `row ${rowNo}: the first column must hold a half-reaction such as "Fe3+ + e- -> Fe2+".`,
      });
      return;
    }
    const text = textCell.trim();
    const e0 = cellNumber(row[1]);
    if (e0 === null || Number.isNaN(e0)) {
      problems.push({
        row: rowNo,
        message: `row ${rowNo} (${quote(text)}): E° must be a number in volts; got ${quote(String(row[1] ?? ''))}.`,
      });
      return;
    }
    if (Math.abs(e0) > 10) {
      problems.push({
        row: rowNo,
        message: `row ${rowNo} (${quote(text)}): E° of ${e0} V is outside ±10 V; give it in volts, not millivolts.`,
      });
      return;
    }
    const slope = cellNumber(row[2]);
    if (slope !== null && Number.isNaN(slope)) {
      problems.push({
        row: rowNo,
        message: `row ${rowNo} (${quote(text)}): dE°/dT must be a number in mV/K or empty; got ${quote(String(row[2]))}.`,
      });
      return;
    }
    const srcCell = row[3];
    const source = typeof srcCell === 'string' && srcCell.trim() !== '' ? srcCell.trim() : 'user table';
    try {
      userRows.push(makeRow(text, e0, slope, source, { kind: 'user', row: rowNo }));
    } catch (e) {
      if (!isEngineError(e)) throw e;
      problems.push({ row: rowNo, message: `row ${rowNo}: ${e.message}` });
    }
  }
  // duplicates within the user's rows; a later duplicate with the same E° is dropped from lookups
  const dropped = new Set<TableRow>();
  for (let i = 0; i < userRows.length; i++) {
    for (let j = i + 1; j < userRows.length; j++) {
      const a = userRows[i]!;
      const b = userRows[j]!;
      if (proportionality(a.perElectron, b.perElectron)) {
        const ra = (a.origin as { row: number }).row;
        const rb = (b.origin as { row: number }).row;
        problems.push({
          row: rb,
          message: `rows ${ra} and ${rb} give the same half-reaction (${formatReaction(a.reaction)})${a.e0V === b.e0V ? '' : ` with different E° (${a.e0V} V and ${b.e0V} V)`}; keep one.`,
        });
        if (a.e0V === b.e0V && a.dE0dTmVperK === b.dE0dTmVperK) dropped.add(b);
      }
    }
  }
  const shadowed = (r: TableRow) =>
    userRows.some((u) => proportionality(u.perElectron, r.perElectron) !== null);
  const usable = userRows.filter((r) => !dropped.has(r));
  const rows = [...usable, ...builtinTable().filter((r) => !shadowed(r))];
  return { rows, userRows, problems, brokenRows };
}

/** Problems that make a user row unusable for a lookup that needs it: duplicate rows with different E°. */
export function conflictingDuplicates(table: PotentialTable, row: TableRow): TableRow[] {
  if (row.origin.kind !== 'user') return [];
  return table.userRows.filter(
    (u) => u !== row && proportionality(u.perElectron, row.perElectron) && u.e0V !== row.e0V,
  );
}

/** The table's key for caching (content-based). */
export function tableKey(cells: readonly (readonly Cell[])[] | null | undefined): string {
  if (!cells || cells.length === 0) return '';
  return JSON.stringify(cells);
}
