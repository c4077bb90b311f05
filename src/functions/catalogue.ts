/**
 * The ECHEM function catalogue, independent of any spreadsheet host: each entry
 * adapts raw cell arguments, broadcasts over cases and calls the engine through
 * its index. Both the Excel custom functions (functions.ts) and the headless
 * runner (src/cli) call these, so results agree to the last digit.
 *
 * Argument values arrive as a host gives them: numbers, strings, booleans, null
 * for omitted optional arguments or empty cells (some hosts give 0 or ""), and
 * 2-D arrays (rows of cells) for ranges.
 */

import {
  EngineError,
  compiledReaction,
  bindSpecies,
  sweepCases,
  sweepToColumn,
  standardPotentialV,
  electronCount,
  log10EquilibriumConstant,
  equilibriumConstantFromLog10,
  gibbsEnergyKJ,
  parseNotation,
  parseMedium,
  balanceSkeleton,
  formatReaction,
  checkBalance,
  nernstSlopeV,
  planConcentrationCell,
  concentrationCellEmfV,
  convertPotentialV,
  parseActivityModel,
  ionActivityCoefficient,
  activities as engineActivities,
  ionicStrength as engineIonicStrength,
  combineStepPotentialsV,
  describeSource,
  describeDiagram,
  BUILTIN_POTENTIALS,
  filterPotentials,
  tableFor,
  electronsConsumed,
  type NernstForm,
  type Binding,
} from '../engine';
import {
  asGrid,
  asList,
  isBlank,
  isBlankGrid,
  isEmptyTextGrid,
  readNumber,
  readOptionalNumber,
  readText,
  readOptionalText,
  readElectrons,
  shapeOf,
} from './args';
import { caseColumn, caseCount, at, type CaseColumn } from './broadcast';
import { cellError, toCellError } from './errorCodes';

/** A single cell value as a host passes it. */
export type Scalar = number | string | boolean | null;
/** A range: rows of cells. */
export type Grid = Scalar[][];
/** An argument: a scalar or a range (or undefined where omitted). */
export type Arg = Scalar | Grid | undefined;

/** Spreadsheet error codes the catalogue produces. */
export type ErrorCode = '#VALUE!' | '#N/A' | '#NUM!';

/** An error value with a message (shown by the host where it can). */
export interface CellError {
  readonly kind: 'cell-error';
  readonly code: ErrorCode;
  readonly message: string;
}

/** A cell of a result. */
export type ResultCell = number | string | CellError;
/** What a catalogue function returns: always rows of cells (a 1×1 grid for one value). */
export type Result = ResultCell[][];

/** A parameter of a catalogue function. */
export interface ParamSpec {
  /** Name as shown to users (PRODUCT.md), e.g. "temp_C". */
  readonly name: string;
  readonly optional: boolean;
}

/** One function of the catalogue. */
export interface FunctionSpec {
  /** Id in the ECHEM namespace, fixed once released, e.g. "POTENTIAL". */
  readonly id: string;
  readonly params: readonly ParamSpec[];
  readonly impl: (...args: Arg[]) => Result;
}

/** True where `v` is a {@link CellError}. */
export function isCellError(v: unknown): v is CellError {
  return typeof v === 'object' && v !== null && (v as { kind?: unknown }).kind === 'cell-error';
}

// ---------------------------------------------------------------------------
// Implementations. Each adapts its arguments, broadcasts over cases, calls the
// engine through its index, and returns a grid; nothing throws past here.

type TableCells = readonly (readonly unknown[])[] | null;

function guard(f: () => Result): Result {
  try {
    return f();
  } catch (e) {
    return [[toCellError(e)]];
  }
}

function finite(x: number, what: string): ResultCell {
  return Number.isFinite(x)
    ? x
    : cellError('#NUM!', `${what} is not a finite number (overflow); check the inputs.`);
}

function one(x: ResultCell): Result {
  return [[x]];
}

function tableCells(arg: Arg): TableCells {
  const g = asGrid(arg);
  return isEmptyTextGrid(g) ? null : (g as TableCells);
}

/** Species names and a values matrix → headers, one row per case. */
function speciesAndValues(speciesArg: Arg, valuesArg: Arg): { headers: string[]; rows: Scalar[][] | null } {
  const sg = asGrid(speciesArg);
  const names = isEmptyTextGrid(sg) ? [] : asList(sg, 'species');
  const vg = asGrid(valuesArg);
  const headers = names.map((s, i) => {
    if (typeof s !== 'string' || s.trim() === '') {
      throw new EngineError(
        'argument',
        `species entry ${i + 1} must be a species name such as "Cu2+" or "pH"; got ${isBlank(s) ? 'an empty cell' : String(s)}.`,
        'species',
      );
    }
    return s.trim();
  });
  if (headers.length === 0) {
    if (!isBlankGrid(vg))
      throw new EngineError(
        'argument',
        'values are given but species is empty: name the species of each values column.',
        'species',
      );
    return { headers, rows: null };
  }
  if (!vg)
    throw new EngineError(
      'argument',
      `values is missing: give one value per species (${headers.join(', ')}).`,
      'values',
    );
  const k = headers.length;
  const width = vg[0]?.length ?? 0;
  if (width === k) return { headers, rows: vg };
  if (k > 1 && vg.length === k && vg.every((r) => r.length === 1))
    return { headers, rows: [vg.map((r) => r[0] as Scalar)] };
  throw new EngineError(
    'shape',
    `values is a ${shapeOf(vg)} range but species lists ${k} name${k === 1 ? '' : 's'}: give one column per species and one row per case.`,
    'values',
  );
}

/** A per-case argument (one cell or a column); null cells where omitted. */
function column(arg: Arg, name: string): CaseColumn {
  return caseColumn(asGrid(arg), name);
}

/** A per-case argument that must be given. */
function requiredColumn(arg: Arg, name: string, what: string): CaseColumn {
  const c = column(arg, name);
  if (!c.cells) throw new EngineError('argument', `${name} is missing: give ${what}.`, name);
  return c;
}

function reactionColumn(
  arg: Arg,
  name = 'reaction',
  what = 'a half-reaction, couple, cell diagram or reaction',
): CaseColumn {
  return requiredColumn(arg, name, what);
}

function tempColumn(arg: Arg): CaseColumn {
  return column(arg, 'temp_C');
}

function readTemp(c: CaseColumn, i: number): number {
  return readNumber(at(c, i), 'temp_C', 25, '°C');
}

/** The last prepared POTENTIAL/LOGQ call: repeated single-case calls skip argument adaptation. */
let lastPrepared: { reaction: string; species: Scalar[]; table: Arg; binding: Binding } | null = null;

function scalarOf(a: Arg): Scalar | undefined {
  if (!Array.isArray(a)) return a;
  return a.length === 1 && Array.isArray(a[0]) && a[0].length === 1 ? (a[0][0] as Scalar) : undefined;
}

function sameSpeciesRow(a: Scalar[], species: Arg): boolean {
  if (!Array.isArray(species) || species.length !== 1) return false;
  const row = species[0];
  if (!Array.isArray(row) || row.length !== a.length) return false;
  for (let i = 0; i < a.length; i++) if (row[i] !== a[i]) return false;
  return true;
}

/**
 * Fast path for the common single-formula shape (one reaction text, the same
 * species row and table as the previous call, a values matrix of that width, one
 * temperature): the same computation as the general path without re-adapting
 * arguments. Returns null where the call does not have that shape.
 */
function fastNernst(
  reaction: Arg,
  species: Arg,
  values: Arg,
  temp: Arg,
  table: Arg,
  quantity: 'potential' | 'log10Q',
): Result | null {
  const p = lastPrepared;
  if (!p || !Array.isArray(values) || values.length === 0) return null;
  const r = scalarOf(reaction);
  if (r !== p.reaction || table !== p.table || !sameSpeciesRow(p.species, species)) return null;
  const t = quantity === 'potential' ? scalarOf(temp) : null;
  if (t === undefined ? Array.isArray(temp) : t !== null && !(typeof t === 'number' && Number.isFinite(t)))
    return null;
  const k = p.species.length;
  // ranges from a host are rectangular: the first row's width is every row's
  const first = values[0];
  if (!Array.isArray(first) || first.length !== k || !Array.isArray(values[values.length - 1])) return null;
  return sweepToColumn<ResultCell>(
    p.binding,
    values as Scalar[][],
    typeof t === 'number' ? t : 25,
    quantity,
    toCellError,
  );
}

function toColumn(
  res: { values: Float64Array; errors: ReadonlyMap<number, EngineError> },
  n: number,
): Result {
  const out: Result = new Array<ResultCell[]>(n);
  const vals = res.values;
  const anyErrors = res.errors.size > 0;
  for (let i = 0; i < n; i++) {
    const x = vals[i]!;
    out[i] = [
      anyErrors && res.errors.has(i)
        ? toCellError(res.errors.get(i))
        : Number.isFinite(x)
          ? x
          : finite(x, 'E'),
    ];
  }
  return out;
}

/** Evaluate the Nernst equation (or log Q) over cases. */
function nernstCases(
  reaction: Arg,
  species: Arg,
  values: Arg,
  temp: Arg,
  table: Arg,
  quantity: 'potential' | 'log10Q',
): Result {
  const cells = tableCells(table);
  const rc = reactionColumn(reaction);
  const { headers, rows } = speciesAndValues(species, values);
  const tc = quantity === 'potential' ? tempColumn(temp) : caseColumn(null, 'temp_C');
  const n = caseCount(rows ? { name: 'values', rows: rows.length } : null, [rc, tc]);
  const valueRows: readonly Scalar[][] = rows ?? [[]];
  if (rc.cells!.length === 1) {
    const text = readText(rc.cells![0], 'reaction', undefined, 'a reaction');
    const form = compiledReaction(text, cells);
    const b = bindSpecies(form, headers);
    const sg = asGrid(species);
    lastPrepared =
      sg && sg.length === 1 && typeof reaction === 'string' && text === reaction
        ? { reaction, species: sg[0]!.slice(), table, binding: b }
        : null;
    // one temperature: n equals the number of value rows
    if (!tc.cells || tc.cells.length === 1) {
      return sweepToColumn<ResultCell>(b, valueRows, readTemp(tc, 0), quantity, toCellError);
    }
    return toColumn(
      sweepCases(b, valueRows, (i: number) => readTemp(tc, i), quantity, n),
      n,
    );
  }
  // one reaction per case
  const out: Result = new Array<ResultCell[]>(n);
  let lastText: string | null = null;
  let lastBinding: Binding | null = null;
  for (let i = 0; i < n; i++) {
    try {
      const text = readText(at(rc, i), 'reaction', undefined, 'a reaction');
      if (text !== lastText) {
        lastBinding = bindSpecies(compiledReaction(text, cells), headers);
        lastText = text;
      }
      const row = valueRows.length === 1 ? valueRows[0]! : valueRows[i]!;
      const res = sweepCases(
        lastBinding!,
        [row],
        quantity === 'potential' ? readTemp(tc, i) : 25,
        quantity,
        1,
      );
      out[i] = [res.errors.has(0) ? toCellError(res.errors.get(0)) : finite(res.values[0]!, 'E')];
    } catch (e) {
      out[i] = [toCellError(e)];
    }
  }
  return out;
}

/** Run a per-case function over broadcast columns. */
function perCase(columns: CaseColumn[], f: (i: number) => ResultCell, rows: number | null = null): Result {
  const n = caseCount(rows === null ? null : { name: 'values', rows }, columns);
  const out: Result = new Array<ResultCell[]>(n);
  for (let i = 0; i < n; i++) {
    try {
      out[i] = [f(i)];
    } catch (e) {
      out[i] = [toCellError(e)];
    }
  }
  return out;
}

/** E in V: a half-reaction's electrode potential, or a cell's or reaction's EMF. */
export function potential(reaction: Arg, species: Arg, values: Arg, temp_C: Arg, table: Arg): Result {
  return guard(
    () =>
      fastNernst(reaction, species, values, temp_C, table, 'potential') ??
      nernstCases(reaction, species, values, temp_C, table, 'potential'),
  );
}

/** E° in V at temp_C. */
export function stdPotential(reaction: Arg, temp_C: Arg, table: Arg): Result {
  return guard(() => {
    const cells = tableCells(table);
    const rc = reactionColumn(reaction);
    const tc = tempColumn(temp_C);
    return perCase([rc, tc], (i) => {
      const form = compiledReaction(readText(at(rc, i), 'reaction', undefined, 'a reaction'), cells);
      const t = readTemp(tc, i);
      readNumber(t, 'temp_C');
      return finite(standardPotentialV(form.resolved, checkTemp(t)), 'E°');
    });
  });
}

function checkTemp(t: number): number {
  nernstSlopeV(t, 1);
  return t;
}

/** Q (where representable). */
export function quotient(reaction: Arg, species: Arg, values: Arg, table: Arg): Result {
  return guard(() => {
    const logs = nernstCases(reaction, species, values, null, table, 'log10Q');
    return logs.map((row) =>
      row.map((c) => {
        if (typeof c !== 'number') return c;
        if (c > 308.25 || c < -307.65) {
          return cellError(
            '#NUM!',
            `Q = 10^${c.toFixed(4)} is outside the spreadsheet's number range; use LOGQ, which gives log10 Q = ${c.toFixed(6)}.`,
          );
        }
        return Math.pow(10, c);
      }),
    );
  });
}

/** log10 Q. */
export function logQ(reaction: Arg, species: Arg, values: Arg, table: Arg): Result {
  return guard(
    () =>
      fastNernst(reaction, species, values, null, table, 'log10Q') ??
      nernstCases(reaction, species, values, null, table, 'log10Q'),
  );
}

/** (E°, n) from either a reaction text or a number with n. */
function standardAndN(
  v: Scalar,
  nCell: Scalar,
  t: number,
  cells: TableCells,
  argName: string,
): { e0: number; n: number } {
  const given = readElectrons(nCell, 'n');
  if (
    typeof v === 'number' ||
    (typeof v === 'string' && v.trim() !== '' && Number.isFinite(Number(v.trim().replace(/\u2212/g, '-'))))
  ) {
    const e0 = readNumber(v, argName, undefined, 'V');
    if (given === null) {
      throw new EngineError(
        'argument',
        `n is missing: when ${argName} is a potential (${e0} V), give the electrons transferred, n.`,
        'n',
      );
    }
    return { e0, n: given };
  }
  const text = readText(v, argName, undefined, 'a reaction or a potential in volts');
  const form: NernstForm = compiledReaction(text, cells);
  const n = electronCount(form.resolved);
  if (given !== null && Math.abs(given - n) > 1e-9) {
    throw new EngineError(
      'argument',
      `n = ${given} does not match the ${n} electron${n === 1 ? '' : 's'} of ${text} as written; leave n empty, or scale the reaction's coefficients.`,
      'n',
    );
  }
  return { e0: standardPotentialV(form.resolved, t), n };
}

function logKCases(
  reactionOrE0: Arg,
  nArg: Arg,
  temp_C: Arg,
  table: Arg,
  name: string,
): { cols: CaseColumn[]; value: (i: number) => number } {
  const cells = tableCells(table);
  const rc = requiredColumn(reactionOrE0, name, 'a reaction or a standard potential in volts');
  const nc = column(nArg, 'n');
  const tc = tempColumn(temp_C);
  return {
    cols: [rc, nc, tc],
    value: (i) => {
      const t = readTemp(tc, i);
      const { e0, n } = standardAndN(at(rc, i), at(nc, i), t, cells, name);
      return log10EquilibriumConstant(e0, n, t);
    },
  };
}

/** log10 K = nFE°/(RT ln10). */
export function logK(reaction_or_E0: Arg, n: Arg, temp_C: Arg, table: Arg): Result {
  return guard(() => {
    const c = logKCases(reaction_or_E0, n, temp_C, table, 'reaction_or_E0');
    return perCase(c.cols, (i) => finite(c.value(i), 'log10 K'));
  });
}

/** K; #NUM! beyond the number range. */
export function eqConst(reaction_or_E0: Arg, n: Arg, temp_C: Arg, table: Arg): Result {
  return guard(() => {
    const c = logKCases(reaction_or_E0, n, temp_C, table, 'reaction_or_E0');
    return perCase(c.cols, (i) => equilibriumConstantFromLog10(c.value(i)));
  });
}

/** ΔG = −nFE in kJ/mol (ΔG° for reaction text). */
export function gibbs(reaction_or_E: Arg, n: Arg, temp_C: Arg, table: Arg): Result {
  return guard(() => {
    const cells = tableCells(table);
    const rc = requiredColumn(reaction_or_E, 'reaction_or_E', 'a reaction or a potential in volts');
    const nc = column(n, 'n');
    const tc = tempColumn(temp_C);
    return perCase([rc, nc, tc], (i) => {
      const t = checkTemp(readTemp(tc, i));
      const { e0, n: ne } = standardAndN(at(rc, i), at(nc, i), t, cells, 'reaction_or_E');
      return finite(gibbsEnergyKJ(e0, ne), 'ΔG');
    });
  });
}

/** n of the balanced reaction. */
export function electrons(reaction: Arg, table: Arg): Result {
  return guard(() => {
    const cells = tableCells(table);
    const rc = reactionColumn(reaction);
    return perCase([rc], (i) => {
      const text = readText(at(rc, i), 'reaction', undefined, 'a reaction');
      const parsed = parseNotation(text);
      if (parsed.kind === 'half') {
        const bal = checkBalance(parsed.reaction);
        if (!bal.balanced) {
          throw new EngineError(
            'unbalanced',
            `"${text}" does not balance (${bal.problems.join('; ')}). Use BALANCE to balance it.`,
            'reaction',
          );
        }
        const e = electronsConsumed(parsed.reaction);
        return Math.abs(Number(e.num) / Number(e.den));
      }
      return electronCount(compiledReaction(text, cells).resolved);
    });
  });
}

/** Balanced reaction text. */
export function balance(reaction: Arg, medium: Arg, table: Arg): Result {
  return guard(() => {
    const cells = tableCells(table);
    const rc = reactionColumn(reaction);
    const mc = column(medium, 'medium');
    return perCase([rc, mc], (i) => {
      const text = readText(at(rc, i), 'reaction', undefined, 'a reaction');
      const m = parseMedium(readOptionalText(at(mc, i), 'medium', '"acid", "base" or empty'));
      const parsed = parseNotation(text);
      if (parsed.kind === 'half' || parsed.kind === 'reaction')
        return formatReaction(balanceSkeleton(parsed.reaction, m, text).reaction);
      const r = compiledReaction(text, cells).resolved;
      return formatReaction(r.kind === 'half' ? r.half.reaction : r.reaction);
    });
  });
}

/** RT ln10 / (nF) in V per decade. */
export function nernstSlope(temp_C: Arg, n: Arg): Result {
  return guard(() => {
    const tc = tempColumn(temp_C);
    const nc = column(n, 'n');
    return perCase([tc, nc], (i) => {
      const t = readTemp(tc, i);
      const ne = readNumber(at(nc, i), 'n', 1);
      if (!(ne > 0))
        throw new EngineError('argument', `n (electrons) must be a positive number; got ${ne}.`, 'n');
      return nernstSlopeV(t, ne);
    });
  });
}

/** EMF in V of a concentration cell. */
export function concCell(
  couple: Arg,
  value_left: Arg,
  value_right: Arg,
  species: Arg,
  temp_C: Arg,
  table: Arg,
): Result {
  return guard(() => {
    const cells = tableCells(table);
    const cc = reactionColumn(couple, 'couple');
    const lc = column(value_left, 'value_left');
    const rcol = column(value_right, 'value_right');
    const sc = column(species, 'species');
    const tc = tempColumn(temp_C);
    return perCase([cc, lc, rcol, sc, tc], (i) => {
      const form = compiledReaction(
        readText(at(cc, i), 'couple', undefined, 'a couple such as "Ag+/Ag"'),
        cells,
      );
      const plan = planConcentrationCell(form, readOptionalText(at(sc, i), 'species', 'a species name'));
      const left = readNumber(at(lc, i), 'value_left');
      const right = readNumber(at(rcol, i), 'value_right');
      return concentrationCellEmfV(plan, left, right, readTemp(tc, i));
    });
  });
}

/** A potential on another reference scale. */
export function vsRef(potentialArg: Arg, from_ref: Arg, to_ref: Arg, temp_C: Arg, pH: Arg): Result {
  return guard(() => {
    const pc = requiredColumn(potentialArg, 'potential', 'a potential in volts');
    const fc = column(from_ref, 'from_ref');
    const toc = column(to_ref, 'to_ref');
    const tc = tempColumn(temp_C);
    const phc = column(pH, 'pH');
    return perCase([pc, fc, toc, tc, phc], (i) => {
      const e = readNumber(at(pc, i), 'potential', undefined, 'V');
      const from = readText(at(fc, i), 'from_ref', undefined, 'a reference electrode name such as "SCE"');
      const to = readText(at(toc, i), 'to_ref', undefined, 'a reference electrode name such as "SHE"');
      return convertPotentialV(e, from, to, readTemp(tc, i), readOptionalNumber(at(phc, i), 'pH'));
    });
  });
}

/** Activity coefficient of one ion. */
export function actCoef(ion: Arg, ionic_strength: Arg, model: Arg, temp_C: Arg, ion_size: Arg): Result {
  return guard(() => {
    const ic = reactionColumn(ion, 'ion', 'an ion such as "Cu2+"');
    const isc = column(ionic_strength, 'ionic_strength');
    const mc = column(model, 'model');
    const tc = tempColumn(temp_C);
    const sc = column(ion_size, 'ion_size');
    return perCase([ic, isc, mc, tc, sc], (i) => {
      const text = readText(at(ic, i), 'ion', undefined, 'an ion such as "Cu2+"');
      const I = readNumber(at(isc, i), 'ionic_strength', undefined, 'mol/kg');
      const m = parseActivityModel(readOptionalText(at(mc, i), 'model'));
      const size = at(sc, i) === 0 ? null : readOptionalNumber(at(sc, i), 'ion_size', 'Å');
      return ionActivityCoefficient(text, I, m, readTemp(tc, i), size);
    });
  });
}

function numberRow(row: readonly Scalar[], headers: readonly string[]): number[] {
  return row.map((v, j) => readNumber(v, `values (${headers[j]})`, undefined, 'mol/kg'));
}

/** Activities, same shape as values. */
export function activity(species: Arg, values: Arg, model: Arg, ionic_strength: Arg, temp_C: Arg): Result {
  return guard(() => {
    const { headers, rows } = speciesAndValues(species, values);
    if (!rows)
      throw new EngineError(
        'argument',
        'species and values are needed: name each species and give its concentration.',
        'species',
      );
    const m = parseActivityModel(readOptionalText(asGrid(model)?.[0]?.[0], 'model'));
    const isc = column(ionic_strength, 'ionic_strength');
    const tc = tempColumn(temp_C);
    const n = caseCount({ name: 'values', rows: rows.length }, [isc, tc]);
    const out: Result = [];
    for (let i = 0; i < n; i++) {
      try {
        const row = numberRow(rows.length === 1 ? rows[0]! : rows[i]!, headers);
        const I = readOptionalNumber(at(isc, i), 'ionic_strength', 'mol/kg');
        out.push(engineActivities(headers, row, m, I, readTemp(tc, i)));
      } catch (e) {
        const err = toCellError(e);
        out.push(headers.map(() => err));
      }
    }
    return out;
  });
}

/** Ionic strength per row. */
export function ionicStr(species: Arg, values: Arg): Result {
  return guard(() => {
    const { headers, rows } = speciesAndValues(species, values);
    if (!rows)
      throw new EngineError(
        'argument',
        'species and values are needed: name each species and give its concentration in mol/kg.',
        'species',
      );
    return perCase([], (i) => engineIonicStrength(headers, numberRow(rows[i]!, headers)), rows.length);
  });
}

/** E° of a chained couple: Σ nᵢEᵢ / Σ nᵢ. */
export function combine(potentials: Arg, electronsArg: Arg): Result {
  return guard(() => {
    const es = asList(asGrid(potentials), 'potentials').map((v, i) =>
      readNumber(v, `potentials (entry ${i + 1})`, undefined, 'V'),
    );
    const ns = asList(asGrid(electronsArg), 'electrons').map((v, i) =>
      readNumber(v, `electrons (entry ${i + 1})`),
    );
    return one(combineStepPotentialsV(es, ns));
  });
}

/** Provenance text. */
export function source(reaction: Arg, table: Arg): Result {
  return guard(() => {
    const cells = tableCells(table);
    const rc = reactionColumn(reaction);
    return perCase([rc], (i) =>
      describeSource(
        compiledReaction(readText(at(rc, i), 'reaction', undefined, 'a reaction'), cells).resolved,
      ),
    );
  });
}

/** IUPAC cell diagram with activities. */
export function diagram(reaction: Arg, species: Arg, values: Arg, table: Arg): Result {
  return guard(() => {
    const cells = tableCells(table);
    const rc = reactionColumn(reaction);
    const { headers, rows } = speciesAndValues(species, values);
    return perCase(
      [rc],
      (i) => {
        const form = compiledReaction(readText(at(rc, i), 'reaction', undefined, 'a reaction'), cells);
        const b = bindSpecies(form, headers);
        const row = rows ? (rows.length === 1 ? rows[0]! : rows[i]!) : null;
        if (row)
          sweepCases(b, [row], 25, 'log10Q', 1).errors.forEach((e) => {
            throw e;
          });
        return describeDiagram(form.resolved, b, row);
      },
      rows ? rows.length : null,
    );
  });
}

/** The built-in table with a header row, optionally filtered. */
export function potentials(filter: Arg): Result {
  return guard(() => {
    const f = readOptionalText(asGrid(filter)?.[0]?.[0], 'filter', 'text such as "Fe" or "Cu2+"') ?? '';
    const picked = filterPotentials(BUILTIN_POTENTIALS, f);
    if (picked.rows.length === 0) {
      return one(
        cellError(
          '#N/A',
          `No built-in half-reaction matches ${picked.described}. Type an element symbol (Fe), a species (Cu2+), or leave the filter empty for the whole table.`,
        ),
      );
    }
    const out: Result = [['Half-reaction', 'E° (V vs SHE, 25 °C)', 'dE°/dT (mV/K)', 'Source']];
    for (const r of picked.rows) out.push([r.halfReaction, r.e0V, r.dE0dTmVperK ?? '', r.source]);
    return out;
  });
}

/** Problems in a user table, or OK. */
export function checkTable(table: Arg): Result {
  return guard(() => {
    const cells = tableCells(table);
    if (!cells)
      return one(
        cellError(
          '#VALUE!',
          'table is empty: pass the range of your potentials table (half-reaction | E° | dE°/dT | source).',
        ),
      );
    const t = tableFor(cells).table;
    if (t.problems.length === 0) return one('OK');
    return t.problems.map((p) => [p.message]);
  });
}

const P = (name: string, optional = false): ParamSpec => ({ name, optional });

/** Every function of the catalogue, with its id and parameters as PRODUCT.md gives them. */
export const CATALOGUE: readonly FunctionSpec[] = [
  {
    id: 'POTENTIAL',
    params: [P('reaction'), P('species', true), P('values', true), P('temp_C', true), P('table', true)],
    impl: potential,
  },
  { id: 'STDPOTENTIAL', params: [P('reaction'), P('temp_C', true), P('table', true)], impl: stdPotential },
  { id: 'QUOTIENT', params: [P('reaction'), P('species'), P('values'), P('table', true)], impl: quotient },
  { id: 'LOGQ', params: [P('reaction'), P('species'), P('values'), P('table', true)], impl: logQ },
  {
    id: 'LOGK',
    params: [P('reaction_or_E0'), P('n', true), P('temp_C', true), P('table', true)],
    impl: logK,
  },
  {
    id: 'EQCONST',
    params: [P('reaction_or_E0'), P('n', true), P('temp_C', true), P('table', true)],
    impl: eqConst,
  },
  {
    id: 'GIBBS',
    params: [P('reaction_or_E'), P('n', true), P('temp_C', true), P('table', true)],
    impl: gibbs,
  },
  { id: 'ELECTRONS', params: [P('reaction'), P('table', true)], impl: electrons },
  { id: 'BALANCE', params: [P('reaction'), P('medium', true), P('table', true)], impl: balance },
  { id: 'NERNSTSLOPE', params: [P('temp_C', true), P('n', true)], impl: nernstSlope },
  {
    id: 'CONCCELL',
    params: [
      P('couple'),
      P('value_left'),
      P('value_right'),
      P('species', true),
      P('temp_C', true),
      P('table', true),
    ],
    impl: concCell,
  },
  {
    id: 'VSREF',
    params: [P('potential'), P('from_ref'), P('to_ref'), P('temp_C', true), P('pH', true)],
    impl: vsRef,
  },
  {
    id: 'ACTCOEF',
    params: [P('ion'), P('ionic_strength'), P('model', true), P('temp_C', true), P('ion_size', true)],
    impl: actCoef,
  },
  {
    id: 'ACTIVITY',
    params: [P('species'), P('values'), P('model', true), P('ionic_strength', true), P('temp_C', true)],
    impl: activity,
  },
  { id: 'IONICSTR', params: [P('species'), P('values')], impl: ionicStr },
  { id: 'COMBINE', params: [P('potentials'), P('electrons')], impl: combine },
  { id: 'SOURCE', params: [P('reaction'), P('table', true)], impl: source },
  {
    id: 'DIAGRAM',
    params: [P('reaction'), P('species', true), P('values', true), P('table', true)],
    impl: diagram,
  },
  { id: 'POTENTIALS', params: [P('filter', true)], impl: potentials },
  { id: 'CHECKTABLE', params: [P('table')], impl: checkTable },
];

/**
 * Calls a catalogue function by id with host-shaped arguments: the one entry point
 * that the task pane and other in-process clients use, so they compute exactly what
 * the sheet formula computes.
 *
 * @example
 * callFunction('NERNSTSLOPE', [25]); // [[0.05916…]]
 */
export function callFunction(id: string, args: readonly Arg[]): Result {
  const spec = CATALOGUE.find((s) => s.id === id.toUpperCase());
  if (!spec) return [[cellError('#N/A', `There is no function ECHEM.${id}; check the name in the function reference.`)]];
  return spec.impl(...args);
}
