/**
 * Resolution: from any `reaction` argument (half-reaction, couple, cell diagram,
 * full reaction) to half-reactions with their standard potentials and the table
 * rows they came from. Untabulated couples are derived from two tabulated ones
 * by Gibbs-energy additivity (n·E° adds, E° does not), and the derivation is
 * recorded for SOURCE.
 */
import { EngineError, quote } from '../errors';
import { type Rational, div, neg, sign, toNumber, ONE, lcm, rat } from '../rational';
import {
  type Species,
  speciesKey,
  sameSpecies,
  formatSpecies,
  elementsOf,
  phaseOf,
} from '../notation/species';
import { splitElectrolyte } from '../notation/electrolytes';
import { type Reaction, formatReaction } from '../notation/reaction';
import { type Notation, parseNotation } from '../notation/notation';
import { type CellDiagram, type CellPhase, type CellSpecies } from '../notation/cellDiagram';
import { type Couple } from '../notation/couple';
import { INERT_ELECTRODES } from '../notation/elements';
import { assertBalanced } from '../balance/balance';
import {
  type PotentialTable,
  type TableRow,
  describeOrigin,
  conflictingDuplicates,
  rowE0V,
  builtinRowsHolding,
} from './potentialTable';
import {
  type StoichMap,
  MEDIUM_KEYS,
  reactionMap,
  electronsOf,
  proportionality,
  combineMaps,
  scaleMap,
  mapToReaction,
  fillPhases,
  sideKeys,
  smallestWholeMap,
} from './halfReaction';

/** A table row's share in a resolved standard potential: E° = Σ weight·E°(row). */
export interface RowShare {
  readonly row: TableRow;
  /** cᵢ·nᵢ/n: the row's weight in E° */
  readonly weight: number;
}

/** A half-reaction with its standard potential, resolved against a table. */
export interface ResolvedHalf {
  /** the reduction as resolved (the user's form, phases completed from the table) */
  readonly map: StoichMap;
  readonly reaction: Reaction;
  /** electrons consumed as written */
  readonly n: number;
  readonly shares: readonly RowShare[];
  /** how it was derived, or null for a single row */
  readonly derivation: string | null;
  /** inline activities written in a cell diagram for this half-cell, by species key */
  readonly inline: ReadonlyMap<string, number>;
}

/** The result of resolving a reaction argument. */
export type Resolved =
  | { readonly kind: 'half'; readonly text: string; readonly half: ResolvedHalf }
  | {
      readonly kind: 'cell';
      readonly text: string;
      /** the electrode where oxidation runs for the cell as written (left of the diagram) */
      readonly left: ResolvedHalf;
      /** the electrode where reduction runs (right of the diagram) */
      readonly right: ResolvedHalf;
      /** the cell reaction, reduction on the right */
      readonly reaction: Reaction;
      readonly map: StoichMap;
      /** electrons transferred in the cell reaction as written */
      readonly n: number;
      /** true where given as a cell diagram (species may then be side-qualified) */
      readonly diagram: boolean;
    };

/** E° at 25 °C of a resolved half (V). */
export function halfE0V25(h: ResolvedHalf): number {
  let e = 0;
  for (const s of h.shares) e += s.weight * s.row.e0V;
  return e;
}

/**
 * E° at a temperature (V): Σ weight·E°(row, T), each row's E°(T) from the species data
 * (built-in rows, and user rows without dE°/dT whose species are all known), from the
 * row's own dE°/dT, or its 25 °C value (see `RowTemperature`).
 *
 * @throws EngineError (`argument`) outside 0–100 °C where a row's E°(T) rests on the species data
 */
export function halfE0V(h: ResolvedHalf, tempC: number): number {
  if (tempC === 25) return halfE0V25(h);
  let e = 0;
  for (const s of h.shares) e += s.weight * rowE0V(s.row, tempC);
  return e;
}

/** dE°/dT in mV/K at 25 °C of a resolved half, and whether every row had a temperature model. */
export function halfSlopeMvPerK(h: ResolvedHalf): { slope: number; complete: boolean } {
  let slope = 0;
  let complete = true;
  for (const s of h.shares) {
    if (s.row.temperature.basis === 'none') complete = false;
    else slope += s.weight * s.row.temperature.slopeVPerK * 1e3;
  }
  return { slope, complete };
}

/** The heat-capacity term of a resolved half: E° gains cpVPerK·cpFactorK(T); and whether any row rests on the species data. */
export function halfCpModel(h: ResolvedHalf): { cpVPerK: number; species: boolean } {
  let cp = 0;
  let species = false;
  for (const s of h.shares) {
    cp += s.weight * s.row.temperature.cpVPerK;
    if (s.row.temperature.basis === 'species') species = true;
  }
  return { cpVPerK: cp, species };
}

// ---------------------------------------------------------------------------

function nonHOElements(m: StoichMap): Set<string> {
  const out = new Set<string>();
  for (const v of m.values())
    for (const el of elementsOf(v.species).keys()) if (el !== 'H' && el !== 'O') out.add(el);
  return out;
}

/** Rows whose elements other than H and O all occur in `elements` (only H/O rows where `elements` is empty). */
function relevantRows(table: PotentialTable, elements: ReadonlySet<string>): TableRow[] {
  return table.rows.filter((r) => {
    const els = nonHOElements(r.map);
    for (const el of els) if (!elements.has(el)) return false;
    return elements.size > 0 || els.size === 0;
  });
}

function phasesCompatible(a: StoichMap, b: StoichMap): boolean {
  for (const [k, v] of a) {
    const w = b.get(k);
    if (w && !sameSpecies(v.species, w.species)) return false;
  }
  return true;
}

interface Candidate {
  map: StoichMap;
  n: number;
  shares: RowShare[];
  derivation: string | null;
  perElectron: StoichMap;
}

function fromRow(r: TableRow): Candidate {
  return {
    map: r.map,
    n: r.n,
    shares: [{ row: r, weight: 1 }],
    derivation: null,
    perElectron: r.perElectron,
  };
}

function candidateE0(c: Candidate): number {
  let e = 0;
  for (const s of c.shares) e += s.weight * s.row.e0V;
  return e;
}

/**
 * Derive half-reactions from pairs of rows: r1 + b·r2 with b chosen to cancel a
 * species they share (Gibbs additivity). Only results that consume electrons are kept.
 */
function derivedCandidates(rows: readonly TableRow[], accept: (m: StoichMap) => boolean): Candidate[] {
  const out: Candidate[] = [];
  for (let i = 0; i < rows.length; i++) {
    for (let j = 0; j < rows.length; j++) {
      if (i === j) continue;
      const r1 = rows[i]!;
      const r2 = rows[j]!;
      for (const [k, v1] of r1.map) {
        if (MEDIUM_KEYS.has(k)) continue;
        const v2 = r2.map.get(k);
        if (!v2) continue;
        const b = neg(div(v1.nu, v2.nu));
        if (sign(b) === 0) continue;
        const m = combineMaps(r1.map, ONE, r2.map, b);
        if (!phasesCompatible(r1.map, r2.map)) continue;
        const e = electronsOf(m);
        if (sign(e) <= 0) continue;
        if (m.size < 2) continue;
        if (!accept(m)) continue;
        const n = toNumber(e);
        const shares: RowShare[] = [
          { row: r1, weight: r1.n / n },
          { row: r2, weight: (toNumber(b) * r2.n) / n },
        ];
        const verb = sign(b) > 0 ? 'plus' : 'minus';
        const factor = toNumber(b) < 0 ? -toNumber(b) : toNumber(b);
        const derivation =
          `derived by Gibbs-energy additivity: (${r1.text}) ${verb} ${factor === 1 ? '' : `${fmtFactor(b)} × `}(${r2.text}); ` +
          `n·E° adds: E° = (${r1.n}·${fmtE0(r1.e0V)} ${sign(b) > 0 ? '+' : '−'} ${fmtNum(factor * r2.n)}·${fmtE0(r2.e0V)}) / ${fmtNum(n)}`;
        out.push({ map: m, n, shares, derivation, perElectron: scaleMap(m, div(ONE, e)) });
      }
    }
  }
  // keep one of each proportional result, and none that only re-derives a tabulated row
  const unique: Candidate[] = [];
  for (const c of out) {
    if (rows.some((r) => proportionality(r.perElectron, c.perElectron))) continue;
    if (!unique.some((u) => proportionality(u.perElectron, c.perElectron))) unique.push(c);
  }
  return unique;
}

function fmtFactor(b: Rational): string {
  const a = sign(b) < 0 ? neg(b) : b;
  return a.den === 1n ? a.num.toString() : `${a.num.toString()}/${a.den.toString()}`;
}
function fmtE0(x: number): string {
  return String(Number(x.toFixed(5)));
}
function fmtNum(x: number): string {
  return Number.isInteger(x) ? String(x) : String(Number(x.toPrecision(12)));
}

function describeCandidates(cs: readonly Candidate[]): string {
  return cs
    .map((c) =>
      c.derivation
        ? `${formatReaction(mapToReaction(c.map))} (derived)`
        : `${c.shares[0]!.row.text} (${describeOrigin(c.shares[0]!.row.origin)})`,
    )
    .join('; ');
}

function checkConflicts(table: PotentialTable, c: Candidate): void {
  for (const s of c.shares) {
    const dup = conflictingDuplicates(table, s.row);
    if (dup.length > 0) {
      const rows = [s.row, ...dup].map((r) => describeOrigin(r.origin)).join(' and ');
      throw new EngineError(
        'ambiguous',
        `${rows} give the same half-reaction (${s.row.text}) with different E°; keep one.`,
        'table',
      );
    }
  }
}

function toHalf(
  c: Candidate,
  userMap: StoichMap | null,
  inline: ReadonlyMap<string, number>,
  table: PotentialTable,
): ResolvedHalf {
  checkConflicts(table, c);
  if (userMap) {
    // the user's written form, scaled as written; shares scale with n
    const f = proportionality(userMap, c.map);
    const filled = fillPhases(userMap, c.map);
    const n = f ? toNumber(f) * c.n : c.n;
    return {
      map: filled,
      reaction: mapToReaction(filled),
      n,
      shares: c.shares,
      derivation: c.derivation,
      inline,
    };
  }
  const m = smallestWholeMap(c.map);
  const e = electronsOf(m);
  return {
    map: m,
    reaction: mapToReaction(m),
    n: Number(e.num) / Number(e.den),
    shares: c.shares,
    derivation: c.derivation,
    inline,
  };
}

/** Find the half-reaction matching a written half-reaction. */
function resolveHalfMap(
  target: StoichMap,
  text: string,
  table: PotentialTable,
  inline: ReadonlyMap<string, number>,
): ResolvedHalf {
  const e = electronsOf(target);
  if (sign(e) < 0) {
    throw new EngineError(
      'parse',
      `${quote(text)} is written as an oxidation. Electrode potentials are reduction potentials: write the half-reaction with the electrons on the left.`,
      'reaction',
    );
  }
  const perE = scaleMap(target, div(ONE, e));
  refuseBroken(table, (m) => proportionality(perE, m) !== null, text);
  const direct = table.rows.filter((r) => proportionality(perE, r.perElectron) !== null).map(fromRow);
  const accept = (m: StoichMap) => proportionality(perE, scaleMap(m, div(ONE, electronsOf(m)))) !== null;
  const fromUser = derivedFromUserRows(table, direct, nonHOElements(target), accept, text);
  if (fromUser) return toHalf(fromUser, target, inline, table);
  const chosen = pickOne(direct, text);
  if (chosen) return toHalf(chosen, target, inline, table);
  const rows = relevantRows(table, nonHOElements(target));
  const derived = derivedCandidates(
    rows,
    (m) => proportionality(perE, scaleMap(m, div(ONE, electronsOf(m)))) !== null,
  );
  const d = pickOne(derived, text);
  if (d) return toHalf(d, target, inline, table);
  throw notFound(text);
}

/**
 * Where the user passed a table and no user row gives the half-reaction directly, a
 * half-reaction derived from the user's own rows beats a built-in row of the same couple
 * (a user's data set is not mixed silently with the built-in one).
 */
function derivedFromUserRows(
  table: PotentialTable,
  direct: readonly Candidate[],
  elements: ReadonlySet<string>,
  accept: (m: StoichMap) => boolean,
  text: string,
): Candidate | null {
  if (table.userRows.length < 2) return null;
  if (direct.some((c) => c.shares.every((s) => s.row.origin.kind === 'user'))) return null;
  const userRows = table.rows.filter((r) => r.origin.kind === 'user');
  const rows = relevantRows({ ...table, rows: userRows }, elements);
  if (rows.length < 2) return null;
  return pickOne(derivedCandidates(rows, accept), text);
}

/**
 * A lookup that a broken row of the user's table would answer is an error: the
 * user meant that row, and a silent fall-back to the built-in value would hide it.
 */
function refuseBroken(
  table: PotentialTable,
  matches: (perElectron: StoichMap) => boolean,
  text: string,
): void {
  const broken = table.brokenRows.find((b) => matches(b.perElectron));
  if (broken && !table.userRows.some((u) => matches(u.perElectron))) {
    throw new EngineError(
      'argument',
      `${quote(text)} needs row ${broken.row} of your table, which cannot be used: ${broken.message.replace(/^row \d+:?\s*/, '')} Fix the row.`,
      'table',
      undefined,
      'checkTable',
    );
  }
}

function notFound(text: string): EngineError {
  return new EngineError(
    'notFound',
    `${quote(text)} is not in the potentials table and cannot be derived from two of its rows. Add the half-reaction and its E° to your table and pass the range as the table argument.`,
    'reaction',
  );
}

/**
 * Two built-in candidates that differ only by water ionisation (H2O -> H+ + OH-) are the
 * acid and base forms of one couple: one species data layer makes them agree at every pH
 * (a pH value sets a(OH-) through Kw), so the acid form is taken.
 */
function acidOfPair(pool: readonly Candidate[]): Candidate | null {
  if (pool.length !== 2) return null;
  if (!pool.every((c) => c.shares.every((s) => s.row.origin.kind === 'builtin'))) return null;
  const [a, b] = pool as [Candidate, Candidate];
  const d = combineMaps(a.perElectron, ONE, b.perElectron, neg(ONE));
  for (const k of d.keys()) if (k !== 'H|1' && k !== 'OH|-1' && k !== 'H2O|0') return null;
  const h = d.get('H|1');
  const oh = d.get('OH|-1');
  if (!h || !oh || toNumber(h.nu) !== toNumber(oh.nu)) return null;
  // a consumes H+ where b produces OH-: a is the acid form when its H+ coefficient is lower
  return toNumber(h.nu) < 0 ? a : b;
}

/** The one candidate to use; `text` names the lookup in the message (a function: written only for it). */
function pickOne(cs: Candidate[], text: string | (() => string)): Candidate | null {
  if (cs.length === 0) return null;
  // user rows take precedence
  const user = cs.filter((c) => c.shares.every((s) => s.row.origin.kind === 'user'));
  const pool = user.length > 0 ? user : cs;
  if (pool.length === 1) return pool[0]!;
  const acid = acidOfPair(pool);
  if (acid) return acid;
  throw new EngineError(
    'ambiguous',
    `${quote(typeof text === 'string' ? text : text())} matches ${pool.length} half-reactions: ${describeCandidates(pool)}. Write the half-reaction in full (with phases, and H+ or OH- as it applies) to choose one.`,
    'reaction',
  );
}

// ---------------------------------------------------------------------------
// couples

function keysOf(species: readonly Species[]): string[] {
  return species.map(speciesKey);
}

/**
 * How well a half-reaction fits a couple: null where a named species is missing
 * or on the wrong side; else the number of further species it needs besides
 * H+, OH-, H2O and electrons (counter-ions such as Cl- in AgCl/Ag). Fewest wins.
 */
function coupleFit(c: Couple, m: StoichMap): number | null {
  const ox = keysOf(c.oxidized);
  const red = keysOf(c.reduced);
  for (const [i, k] of ox.entries()) {
    const v = m.get(k);
    if (!v || sign(v.nu) >= 0 || !sameSpecies(v.species, c.oxidized[i]!)) return null;
  }
  for (const [i, k] of red.entries()) {
    const v = m.get(k);
    if (!v || sign(v.nu) <= 0 || !sameSpecies(v.species, c.reduced[i]!)) return null;
  }
  let extra = 0;
  for (const k of sideKeys(m, -1)) if (!ox.includes(k)) extra++;
  for (const k of sideKeys(m, 1)) if (!red.includes(k)) extra++;
  return extra;
}

function bestFit(cs: Candidate[], fit: (m: StoichMap) => number | null): Candidate[] {
  const scored = cs
    .map((c) => ({ c, f: fit(c.map) }))
    .filter((x): x is { c: Candidate; f: number } => x.f !== null);
  if (scored.length === 0) return [];
  const min = Math.min(...scored.map((x) => x.f));
  return scored.filter((x) => x.f === min).map((x) => x.c);
}

function resolveCouple(c: Couple, text: string, table: PotentialTable): ResolvedHalf {
  const fit = (m: StoichMap) => coupleFit(c, m);
  refuseBroken(table, (m) => fit(m) !== null, text);
  const user = bestFit(table.userRows.filter((r) => table.rows.includes(r)).map(fromRow), fit);
  const els = new Set<string>();
  for (const s of [...c.oxidized, ...c.reduced])
    for (const el of elementsOf(s).keys()) if (el !== 'H' && el !== 'O') els.add(el);
  if (user.length === 0 && table.userRows.length >= 2) {
    const userRows = table.rows.filter((r) => r.origin.kind === 'user');
    const fromUser = bestFit(
      derivedCandidates(relevantRows({ ...table, rows: userRows }, els), (m) => fit(m) !== null),
      fit,
    );
    const u = pickOne(fromUser, text);
    if (u) return toHalf(u, null, c.activities ?? new Map(), table);
  }
  const direct = user.length > 0 ? user : bestFit(table.rows.map(fromRow), fit);
  const chosen = pickOne(direct, text);
  if (chosen) return toHalf(chosen, null, c.activities ?? new Map(), table);
  const derived = bestFit(
    derivedCandidates(relevantRows(table, els), (m) => fit(m) !== null),
    fit,
  );
  const d = pickOne(derived, text);
  if (d) return toHalf(d, null, c.activities ?? new Map(), table);
  throw notFound(text);
}

// ---------------------------------------------------------------------------
// cells

function combineCell(right: ResolvedHalf, left: ResolvedHalf): { map: StoichMap; n: number } {
  const nr = electronsOf(right.map);
  const nl = electronsOf(left.map);
  const l = rat(lcm(nr.num * nl.den, nl.num * nr.den), nr.den * nl.den);
  const m = combineMaps(right.map, div(l, nr), left.map, neg(div(l, nl)));
  m.delete('e');
  return { map: m, n: toNumber(l) };
}

const SOLUTE_UNITS = new Set(['M', 'mol/L', 'mol/l', 'mol/dm3', 'mM', 'uM', 'µM', 'μM', 'm', 'mol/kg']);

/** A species in solution: aqueous (written or inferred), or given with a concentration unit and no phase. */
function isSolutionSpecies(c: CellSpecies): boolean {
  if (phaseOf(c.species) === 'aq') return true;
  return c.species.phase === null && c.activity !== null && SOLUTE_UNITS.has(c.activity.unit);
}

interface SideSet {
  keys: Map<string, Species>;
  inline: Map<string, number>;
}

function sideSet(phases: readonly CellPhase[]): SideSet {
  const keys = new Map<string, Species>();
  const inline = new Map<string, number>();
  for (const p of phases)
    for (const cs of p) {
      const ions =
        cs.species.charge === 0 && isSolutionSpecies(cs) ? splitElectrolyte(cs.species.formula) : null;
      if (ions) {
        for (const { ion, count } of ions) {
          const k = speciesKey(ion);
          keys.set(k, ion);
          if (cs.activity) inline.set(k, cs.activity.value * count);
        }
        continue;
      }
      const k = speciesKey(cs.species);
      keys.set(k, cs.species);
      if (cs.activity) inline.set(k, cs.activity.value);
    }
  return { keys, inline };
}

function resolveElectrode(side: SideSet, text: string, which: string, table: PotentialTable): ResolvedHalf {
  const score = (m: StoichMap): number | null => {
    for (const [k, v] of m) {
      if (MEDIUM_KEYS.has(k)) continue;
      const s = side.keys.get(k);
      if (!s || !sameSpecies(s, v.species)) return null;
    }
    let covered = 0;
    for (const k of m.keys()) if (side.keys.has(k)) covered++;
    return covered > 0 ? covered : null;
  };
  const best = (cs: Candidate[]): Candidate[] => {
    let top = 0;
    const scored = cs.map((c) => ({ c, s: score(c.map) ?? 0 }));
    for (const x of scored) top = Math.max(top, x.s);
    return top === 0 ? [] : scored.filter((x) => x.s === top).map((x) => x.c);
  };
  // for messages only: written where a message needs it
  const label = () =>
    `the ${which} electrode of ${quote(text)} (${Array.from(side.keys.values())
      .map((s) => formatSpecies(s))
      .join(', ')})`;
  // a row scores null unless every species of its map other than the medium's is the
  // electrode's (and it holds one such species): the built-in rows that hold none of the
  // electrode's species other than the medium's are not read
  const holding = builtinRowsHolding(side.keys.keys());
  const mayFit = (r: TableRow) => holding === null || r.origin.kind !== 'builtin' || holding.has(r.origin.index);
  let cands = best(table.rows.filter((r) => mayFit(r) && score(r.map) !== null).map(fromRow));
  if (cands.length === 0) {
    const els = new Set<string>();
    for (const [k, s] of side.keys) {
      if (INERT_ELECTRODES.has(s.formula) && s.charge === 0 && k) continue;
      for (const el of elementsOf(s).keys()) if (el !== 'H' && el !== 'O') els.add(el);
    }
    cands = best(derivedCandidates(relevantRows(table, els), (m) => score(m) !== null));
  }
  if (cands.length === 0) {
    throw new EngineError(
      'notFound',
      `No half-reaction in the potentials table fits ${label()}. Check the species, or add the couple to your table.`,
      'reaction',
    );
  }
  const chosen = pickOne(cands, label)!;
  const inline = new Map<string, number>();
  for (const k of chosen.map.keys()) {
    const v = side.inline.get(k);
    if (v !== undefined) inline.set(k, v);
  }
  return toHalf(chosen, null, inline, table);
}

function splitNoBridge(phases: readonly CellPhase[]): { left: CellPhase[]; right: CellPhase[] } {
  const isSolution = (p: CellPhase) => p.some(isSolutionSpecies);
  const first = phases.findIndex(isSolution);
  let last = -1;
  phases.forEach((p, i) => {
    if (isSolution(p)) last = i;
  });
  if (first < 0) return { left: phases.slice(0, 1), right: phases.slice(1) };
  return { left: phases.slice(0, first + 1), right: phases.slice(last) };
}

function resolveDiagram(d: CellDiagram, text: string, table: PotentialTable): Resolved {
  const parts = d.bridge ? { left: d.left.slice(), right: d.right.slice() } : splitNoBridge(d.left);
  const left = resolveElectrode(sideSet(parts.left), text, 'left', table);
  const right = resolveElectrode(sideSet(parts.right), text, 'right', table);
  const cell = combineCell(right, left);
  return {
    kind: 'cell',
    text,
    left,
    right,
    reaction: mapToReaction(cell.map),
    map: cell.map,
    n: cell.n,
    diagram: true,
  };
}

// ---------------------------------------------------------------------------
// full reactions

/** Splittings of a full reaction whose E° agree within this are taken as one (V). */
const AGREEMENT_V = 1e-3;

function resolveFull(r: Reaction, text: string, table: PotentialTable): Resolved {
  assertBalanced(r, text);
  const x = reactionMap(r);
  if (x.size === 0)
    throw new EngineError(
      'parse',
      `${quote(text)} has the same species on both sides; nothing reacts.`,
      'reaction',
    );
  const rows = relevantRows(table, nonHOElements(x));
  const inReaction = (m: StoichMap) => {
    for (const [k, v] of m) {
      if (k === 'e' || MEDIUM_KEYS.has(k)) continue;
      const w = x.get(k);
      if (!w || !sameSpecies(v.species, w.species)) return false;
    }
    return true;
  };
  const direct = rows.filter((row) => inReaction(row.map)).map(fromRow);
  const tryPairs = (cands: Candidate[], needDerived: boolean) => {
    const found: { red: Candidate; ox: Candidate; k: Rational }[] = [];
    for (const red of cands)
      for (const ox of cands) {
        if (red === ox) continue;
        if (needDerived && !red.derivation && !ox.derivation) continue;
        const v = combineMaps(red.perElectron, ONE, ox.perElectron, neg(ONE));
        const k = proportionality(x, v);
        if (k && sign(k) > 0) found.push({ red, ox, k });
      }
    return found;
  };
  // tier 1: rows whose species all occur in the reaction; tier 2: rows with a species that
  // cancels between the two halves (Ag in AgCl -> Ag+ + Cl-); tier 3: a derived half-reaction
  let found = tryPairs(direct, false);
  if (found.length === 0) found = tryPairs(rows.map(fromRow), false);
  if (found.length === 0) {
    const derived = derivedCandidates(rows, inReaction);
    found = tryPairs([...direct, ...derived], true);
  }
  if (found.length === 0) {
    throw new EngineError(
      'notFound',
      `${quote(text)} cannot be split into two half-reactions of the potentials table (directly or derived). Write it as a cell diagram, or add the missing half-reaction to your table.`,
      'reaction',
    );
  }
  // prefer decompositions using user rows; n is the smallest electron count that reproduces
  // the reaction; splittings with that n must agree on E°
  const userFound = found.filter((f) =>
    [...f.red.shares, ...f.ox.shares].some((s) => s.row.origin.kind === 'user'),
  );
  const pool0 = userFound.length > 0 ? userFound : found;
  const minK = Math.min(...pool0.map((f) => toNumber(f.k)));
  const pool = pool0.filter((f) => toNumber(f.k) === minK);
  const e0s = pool.map((f) => candidateE0(f.red) - candidateE0(f.ox));
  // splittings that agree within 1 mV (the rounding of published values) are one answer
  const distinct = pool.filter((_, i) => Math.abs(e0s[i]! - e0s[0]!) > AGREEMENT_V);
  if (distinct.length > 0) {
    const list = pool
      .slice(0, 4)
      .map((f) => `${describeCandidates([f.red])} with ${describeCandidates([f.ox])} reversed`)
      .join('; ');
    throw new EngineError(
      'ambiguous',
      `${quote(text)} splits into half-reactions in more than one way with different E°: ${list}. Write it as a cell diagram to choose.`,
      'reaction',
    );
  }
  const f = pool
    .slice()
    .sort(
      (a, b) =>
        Number(!!a.red.derivation || !!a.ox.derivation) - Number(!!b.red.derivation || !!b.ox.derivation),
    )[0]!;
  const k = toNumber(f.k);
  const right = toHalf(f.red, null, new Map(), table);
  const left = toHalf(f.ox, null, new Map(), table);
  return { kind: 'cell', text, left, right, reaction: r, map: x, n: k, diagram: false };
}

// ---------------------------------------------------------------------------

/**
 * Resolve any `reaction` argument against a table.
 *
 * @param input the user's text, or an already parsed notation
 * @throws EngineError `parse`, `unbalanced`, `notFound` (not in the table), `ambiguous` (candidates listed)
 * @example
 * const r = resolveReaction('Zn | Zn2+ || Cu2+ | Cu', defaultTable());
 * r.kind // 'cell'; E° = E°(Cu2+/Cu) − E°(Zn2+/Zn) = 1.0988 V
 */
export function resolveReaction(text: string, table: PotentialTable, parsed?: Notation): Resolved {
  const n = parsed ?? parseNotation(text);
  switch (n.kind) {
    case 'half': {
      assertBalanced(n.reaction, text);
      const inline = new Map<string, number>();
      for (const t of [...n.reaction.reactants, ...n.reaction.products])
        if (t.activity) inline.set(speciesKey(t.species), t.activity.value);
      return { kind: 'half', text, half: resolveHalfMap(reactionMap(n.reaction), text, table, inline) };
    }
    case 'couple':
      return { kind: 'half', text, half: resolveCouple(n.couple, text, table) };
    case 'cell':
      return resolveDiagram(n.diagram, text, table);
    case 'reaction': {
      const res = resolveFull(n.reaction, text, table);
      if (res.kind === 'cell') {
        const inline = new Map<string, number>();
        for (const t of [...n.reaction.reactants, ...n.reaction.products])
          if (t.activity) inline.set(speciesKey(t.species), t.activity.value);
        if (inline.size > 0)
          return { ...res, left: { ...res.left, inline }, right: { ...res.right, inline } };
      }
      return res;
    }
  }
}

/** E° (V) of a resolution at a temperature: a half's E°, or E°(right) − E°(left) for a cell. */
export function standardPotentialV(r: Resolved, tempC: number): number {
  return r.kind === 'half' ? halfE0V(r.half, tempC) : halfE0V(r.right, tempC) - halfE0V(r.left, tempC);
}

/** Electron count of a resolution: of the half-reaction as written, or of the cell reaction. */
export function electronCount(r: Resolved): number {
  return r.kind === 'half' ? r.half.n : r.n;
}
