/**
 * The Nernst family: electrode potentials and cell EMFs, standard potentials, the reaction
 * quotient, and the cell notation of a reaction at given activities (docs/functions/).
 */
import {
  STANDARD_TEMP_C,
  registerCache,
  bindSpecies,
  compiledReaction,
  describeDiagram,
  standardPotentialV,
  sweepCases,
  sweepToColumn,
  cellOf,
  pairColumn,
  pairKernel,
  inlineDiagramKernel,
  inlineDiagramValue,
  readInlineAmounts,
  type Binding,
  type InlineDiagramKernel,
  type PairKernel,
} from '../../engine';
import type { Arg, Result, ResultCell, Scalar } from '../cellTypes';
import { asGrid } from '../args';
import { cellError, toCellError } from '../errorCodes';
import { finiteCell, propagateInputErrors } from '../spec/reader';
import { readTempC } from '../spec/kinds';
import { ACTIVITIES, OPTIONAL_SPECIES_HEADER, REACTION, SPECIES_HEADER, TABLE, TEMP_C } from '../spec/params';
import type { CallArgs, FunctionSpec } from '../spec/types';

/** What every Nernst function shares: its family, and one result row per case (unless it says otherwise). */
const NERNST = { family: 'Nernst', result: { kind: 'perCase' } } as const;

const DERIVED = 'derived by hand: E = E° − (RT ln10/nF)·log10 Q with the SI 2019 exact R and F';
const CU_E0 =
  'E°(Cu2+/Cu) = ΔfG°(Cu2+)/(2F) = 65.49 kJ/mol / 2F = 0.339378 V (NBS 1982, from memory; OpenStax Chemistry 2e, Appendix G prints 65.49, Appendix L +0.34)';
const ZN_E0 = 'E°(Zn2+/Zn) = −0.7618 V, OpenStax Chemistry 2e, Appendix L';

type Quantity = 'potential' | 'log10Q';

/**
 * The last prepared single-reaction call: repeated calls skip compiling and binding. `table`
 * is a copy of the table argument's cells (hosts such as Excel pass a fresh array every call,
 * so it is compared by content, never by identity).
 */
let lastPrepared: {
  reaction: string;
  species: Scalar[];
  headers: string[];
  table: Arg;
  binding: Binding;
  /** the two-species kernel at `kernelTempC` for `kernelQuantity` (null where the binding has none) */
  kernel: PairKernel | null;
  kernelTempC: number;
  kernelQuantity: Quantity | null;
} | null = null;

/**
 * The last cell diagram with inline amounts computed without species or values: its kernel
 * (the diagram's text pieces around its amounts, the resolution without them) and a copy of
 * the table argument's cells.
 */
let lastDiagram: { kernel: InlineDiagramKernel; table: Arg } | null = null;
/** The amounts of one call's diagram, read in place (a diagram holds at most 64). */
const diagramAmounts = new Float64Array(64);

/**
 * The one-entry caches above, in the engine's cache registry (name, clear, stats), so that the
 * registry's one clear empties it too.
 */
export const LAST_NERNST_CALL_CACHE = {
  name: 'functions.lastNernstCall',
  clear(): void {
    lastPrepared = null;
    lastDiagram = null;
  },
  stats(): { name: string; entries: number; bytes: number } {
    return { name: 'functions.lastNernstCall', entries: (lastPrepared ? 1 : 0) + (lastDiagram ? 1 : 0), bytes: 0 };
  },
};
registerCache(LAST_NERNST_CALL_CACHE);

function scalarOf(a: Arg): Scalar | undefined {
  if (!Array.isArray(a)) return a;
  return a.length === 1 && Array.isArray(a[0]) && a[0].length === 1 ? (a[0][0] as Scalar) : undefined;
}

/** A table argument's cells, copied row by row (a scalar or an omitted table as it is). */
function snapshotTable(t: Arg): Arg {
  if (!Array.isArray(t)) return t;
  return t.map((row) => (Array.isArray(row) ? row.slice() : row)) as Arg;
}

/** True where a table argument holds the same cells as a snapshot: same rows, same cell values. */
function sameTable(snapshot: Arg, t: Arg): boolean {
  if (snapshot === t) return true;
  if (!Array.isArray(snapshot) || !Array.isArray(t) || snapshot.length !== t.length) return false;
  for (let r = 0; r < t.length; r++) {
    const a: unknown = snapshot[r];
    const b: unknown = t[r];
    if (a === b) continue;
    if (!Array.isArray(a) || !Array.isArray(b) || a.length !== b.length) return false;
    for (let c = 0; c < b.length; c++) if (a[c] !== b[c]) return false;
  }
  return true;
}

function sameSpeciesRow(a: Scalar[], species: Arg): boolean {
  if (!Array.isArray(species) || species.length !== 1) return false;
  const row = species[0];
  if (!Array.isArray(row) || row.length !== a.length) return false;
  for (let i = 0; i < a.length; i++) if (row[i] !== a[i]) return false;
  return true;
}

/**
 * The fast path for the common sweep (one reaction text, the same species row and table as
 * the previous call, one temperature): the same computation without re-reading arguments.
 * Returns null where the call does not have that shape.
 */
function fastNernst(args: readonly Arg[], quantity: Quantity): Result | null {
  const [reaction, species, values] = args;
  const temp = quantity === 'potential' ? args[3] : null;
  const table = quantity === 'potential' ? args[4] : args[3];
  const p = lastPrepared;
  if (!p || !Array.isArray(values) || values.length === 0) return null;
  if (scalarOf(reaction) !== p.reaction || !sameSpeciesRow(p.species, species) || !sameTable(p.table, table)) return null;
  const t = scalarOf(temp);
  if (t === undefined || (t !== null && typeof t !== 'number')) return null;
  const first = values[0];
  if (!Array.isArray(first) || first.length !== p.species.length || !Array.isArray(values[values.length - 1]))
    return null;
  // the one temperature check, also on the fast path
  const tempC = readTempC(t, TEMP_C);
  const result = sweepToColumn<ResultCell>(p.binding, values as Scalar[][], tempC, quantity, toCellError);
  return propagateInputErrors(result, values as Scalar[][], p.headers, 'values');
}

/**
 * The temperature of a call as Excel passes it (omitted, a 1×1 matrix or a number), read by the
 * one temperature check; null for any other shape or a value the check refuses (then the full
 * path gives its message).
 */
function hostTempC(v: unknown): number | null {
  let t: unknown = v;
  if (Array.isArray(v)) {
    if (v.length !== 1) return null;
    const row: unknown = v[0];
    if (!Array.isArray(row) || row.length !== 1) return null;
    t = cellOf(row, 0);
  }
  if (t === null || t === undefined) return STANDARD_TEMP_C;
  if (typeof t !== 'number') return null;
  try {
    return readTempC(t, TEMP_C);
  } catch {
    return null;
  }
}

/**
 * The Excel path of POTENTIAL and LOGQ (spec `host`): the same reaction text, species row and
 * table (by content) as the previous call, one temperature, and a values matrix of as many
 * columns as species; every case worked out by the two-species kernel, E° and RT ln10/nF
 * computed once per temperature. The rows are read as Excel passes them (no conversion pass):
 * where any case is not a plain finite number (an error value, text, a blank, a non-positive
 * activity) the result is null and the full path runs with its checks and messages.
 */
function hostNernst(args: readonly unknown[], quantity: Quantity): Result | null {
  const p = lastPrepared;
  if (p === null) return null;
  const values = args[2];
  if (!Array.isArray(values) || values.length === 0) return null;
  const first: unknown = values[0];
  if (!Array.isArray(first) || first.length !== p.species.length) return null;
  const table = (quantity === 'potential' ? args[4] : args[3]) as Arg;
  if (scalarOf(args[0] as Arg) !== p.reaction || !sameSpeciesRow(p.species, args[1] as Arg) || !sameTable(p.table, table))
    return null;
  const tempC = quantity === 'potential' ? hostTempC(args[3]) : STANDARD_TEMP_C;
  if (tempC === null) return null;
  if (p.kernelQuantity !== quantity || p.kernelTempC !== tempC) {
    let k: PairKernel | null = null;
    try {
      k = pairKernel(p.binding, tempC, quantity);
    } catch {
      k = null;
    }
    p.kernel = k;
    p.kernelTempC = tempC;
    p.kernelQuantity = quantity;
  }
  return p.kernel ? pairColumn(p.kernel, values) : null;
}

/**
 * The Excel path of POTENTIAL and LOGQ for a cell diagram whose activities are written in its
 * text (`"Zn | Zn2+(aq, 0.1 M) || Cu2+(aq, 0.01 M) | Cu"`), species and values omitted: where
 * the text is the last such diagram's text pieces with other amounts and the table the same
 * (by content), the amounts are read in one scan and bound into the cached resolution. Null for
 * anything else, or a result that is not a finite number (then the full path runs).
 */
function hostDiagram(args: readonly unknown[], quantity: Quantity): Result | null {
  const d = lastDiagram;
  if (d === null || !isOmitted(args[1]) || !isOmitted(args[2])) return null;
  const text = scalarOf(args[0] as Arg);
  if (typeof text !== 'string' || !sameTable(d.table, (quantity === 'potential' ? args[4] : args[3]) as Arg)) return null;
  const tempC = quantity === 'potential' ? hostTempC(args[3]) : STANDARD_TEMP_C;
  if (tempC === null || !readInlineAmounts(d.kernel, text, diagramAmounts)) return null;
  let x: number;
  try {
    x = inlineDiagramValue(d.kernel, diagramAmounts, tempC, quantity);
  } catch {
    return null;
  }
  return Number.isFinite(x) ? [[x]] : null;
}

function isOmitted(v: unknown): boolean {
  return v === null || v === undefined;
}

function toColumn(res: { values: Float64Array; errors: ReadonlyMap<number, unknown> }, n: number): Result {
  const out: Result = new Array<ResultCell[]>(n);
  for (let i = 0; i < n; i++) {
    out[i] = [res.errors.has(i) ? toCellError(res.errors.get(i)) : finiteCell(res.values[i]!, 'E')];
  }
  return out;
}

/** The Nernst equation (or log10 Q) over the cases of a call. */
function nernstCases(call: CallArgs, quantity: Quantity): Result {
  const cells = call.table();
  const headers = call.headers();
  const rows = call.rows();
  const n = call.cases;
  const valueRows: readonly Scalar[][] = rows ?? [[]];
  const reactions = call.column('reaction')!;
  const tempOf = (i: number) => (quantity === 'potential' ? call.at(i).num('temp_C') : STANDARD_TEMP_C);
  if (reactions.length === 1) {
    const text = call.at(0).text('reaction');
    const b = bindSpecies(compiledReaction(text, cells), headers);
    const sg = asGrid(call.raw('species'));
    // the reaction as a string or as a 1×1 grid (Excel passes [[text]] for every argument)
    const reaction = scalarOf(call.raw('reaction'));
    lastPrepared =
      sg && sg.length === 1 && typeof reaction === 'string' && text === reaction
        ? {
            reaction,
            species: sg[0]!.slice(),
            headers,
            table: snapshotTable(call.raw('table')),
            binding: b,
            kernel: null,
            kernelTempC: NaN,
            kernelQuantity: null,
          }
        : null;
    if (headers.length === 0 && rows === null && typeof reaction === 'string' && text === reaction) {
      const kernel = inlineDiagramKernel(text, cells);
      if (kernel) lastDiagram = { kernel, table: snapshotTable(call.raw('table')) };
    }
    const temps = quantity === 'potential' ? call.column('temp_C') : null;
    if (!temps || temps.length === 1) return sweepToColumn<ResultCell>(b, valueRows, tempOf(0), quantity, toCellError);
    return toColumn(sweepCases(b, valueRows, tempOf, quantity, n), n);
  }
  const out: Result = new Array<ResultCell[]>(n);
  let lastText: string | null = null;
  let lastBinding: Binding | null = null;
  for (let i = 0; i < n; i++) {
    try {
      const text = call.at(i).text('reaction');
      if (text !== lastText) {
        lastBinding = bindSpecies(compiledReaction(text, cells), headers);
        lastText = text;
      }
      const row = valueRows.length === 1 ? valueRows[0]! : valueRows[i]!;
      const res = sweepCases(lastBinding!, [row], tempOf(i), quantity, 1);
      out[i] = [res.errors.has(0) ? toCellError(res.errors.get(0)) : finiteCell(res.values[0]!, 'E')];
    } catch (e) {
      out[i] = [toCellError(e)];
    }
  }
  return out;
}

/**
 * The three paths of a Nernst-family function computing `quantity`: the catalogue's fast path
 * for repeated calls, the host path on Excel's raw arguments (a species and values row, then a
 * cell diagram with inline activities), and the general path with every check and message.
 */
function nernstPaths(quantity: Quantity): Pick<FunctionSpec, 'fast' | 'host' | 'run'> {
  return {
    fast: (args) => fastNernst(args, quantity),
    host: (args) => hostNernst(args, quantity) ?? hostDiagram(args, quantity),
    run: (call) => nernstCases(call, quantity),
  };
}

const POTENTIAL: FunctionSpec = {
  id: 'POTENTIAL',
  ...NERNST,
  summary:
    'Electrode potential of a half-reaction, or EMF of a cell or reaction, in V vs SHE, by the Nernst equation at the activities and temperature given.',
  returns: 'E in V vs SHE, one row per case',
  params: [REACTION, OPTIONAL_SPECIES_HEADER, { ...ACTIVITIES, optional: true }, TEMP_C, TABLE],
  notes: [
    'E = E° − (RT ln10 / nF)·log10 Q. Pure solids and liquids and water are left out of Q; activities written inline in a cell diagram are used.',
    'A cell EMF is E(right) − E(left) for the cell as written; a negative value means the written reaction is not spontaneous.',
  ],
  examples: [
    { args: ['Cu2+/Cu', 'Cu2+', 0.01], expected: 0.2802187, tolerance: 1e-6, source: `${CU_E0}; ${DERIVED}` },
    {
      args: ['Zn + Cu2+ -> Zn2+ + Cu', [['Zn2+', 'Cu2+']], [[0.1, 0.01]]],
      expected: 1.0715983,
      tolerance: 1e-6,
      source: `${CU_E0}; ${ZN_E0}; ${DERIVED}`,
    },
    {
      args: ['O2(g) + 4 H+ + 4 e- -> 2 H2O', [['O2', 'pH']], [[0.21, 7]]],
      expected: 0.8046947,
      tolerance: 1e-6,
      source: `E°(O2/H2O) = −ΔfG°(H2O, l)/(2F) = 237.129 kJ/mol / 2F = 1.228834 V (NBS 1982, from memory; OpenStax Appendix L prints 1.229); ${DERIVED}`,
    },
  ],
  ...nernstPaths('potential'),
};

const STDPOTENTIAL: FunctionSpec = {
  id: 'STDPOTENTIAL',
  ...NERNST,
  summary:
    "Standard potential E° in V vs SHE of a half-reaction, couple or cell at temp_C (with the table's dE°/dT; where it has none, E° at 25 °C).",
  returns: 'E° in V vs SHE, one row per case',
  params: [REACTION, TEMP_C, TABLE],
  examples: [
    { args: ['Cu2+/Cu'], expected: 0.339378, tolerance: 1e-6, source: CU_E0 },
    { args: ['Zn(s) | Zn2+(aq) || Cu2+(aq) | Cu(s)'], expected: 1.101178, tolerance: 1e-6, source: `${CU_E0}; ${ZN_E0}` },
  ],
  perCase: (a, call) => standardPotentialV(compiledReaction(a.text('reaction'), call.table()).resolved, a.tempC()),
};

/** The parameters of QUOTIENT and LOGQ, and the zinc–copper case their examples share. */
const QUOTIENT_PARAMS = [REACTION, SPECIES_HEADER, ACTIVITIES, TABLE];
const ZN_CU_CASE: Arg[] = ['Zn + Cu2+ -> Zn2+ + Cu', [['Zn2+', 'Cu2+']], [[0.1, 0.01]]];

const QUOTIENT: FunctionSpec = {
  id: 'QUOTIENT',
  ...NERNST,
  summary:
    "Reaction quotient Q from the activities given (pure solids, liquids and water left out); #NUM! where Q leaves the number range (use LOGQ).",
  returns: 'Q (dimensionless), one row per case',
  params: QUOTIENT_PARAMS,
  examples: [
    {
      args: ZN_CU_CASE,
      expected: 10,
      tolerance: 1e-12,
      source: 'derived by hand: Q = a(Zn2+)/a(Cu2+) = 0.1/0.01',
    },
  ],
  run: (call) =>
    nernstCases(call, 'log10Q').map((row) =>
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
    ),
};

const LOGQ: FunctionSpec = {
  id: 'LOGQ',
  ...NERNST,
  summary: 'log10 of the reaction quotient Q, computed in log space so that it never overflows.',
  returns: 'log10 Q, one row per case',
  params: QUOTIENT_PARAMS,
  examples: [
    {
      args: ZN_CU_CASE,
      expected: 1,
      tolerance: 1e-12,
      source: 'derived by hand: log10(0.1/0.01)',
    },
  ],
  ...nernstPaths('log10Q'),
};

const CELLNOTATION: FunctionSpec = {
  id: 'CELLNOTATION',
  ...NERNST,
  summary: 'The IUPAC cell notation of a reaction or cell, with the activities given written inline.',
  returns: 'Cell notation text, one row per case',
  params: [REACTION, OPTIONAL_SPECIES_HEADER, { ...ACTIVITIES, optional: true }, TABLE],
  examples: [
    {
      args: ['Zn + Cu2+ -> Zn2+ + Cu', [['Zn2+', 'Cu2+']], [[0.1, 0.01]]],
      expected: 'Zn(s) | Zn2+(aq, 0.1 M) || Cu2+(aq, 0.01 M) | Cu(s)',
      source: 'IUPAC cell notation (common practice): anode left, single bar a phase boundary, double bar the salt bridge',
    },
  ],
  perCase: (a, call) => {
    const form = compiledReaction(a.text('reaction'), call.table());
    const b = bindSpecies(form, call.headers());
    const row = a.row();
    if (row)
      sweepCases(b, [row], STANDARD_TEMP_C, 'log10Q', 1).errors.forEach((e) => {
        throw e;
      });
    return describeDiagram(form.resolved, b, row);
  },
};

/** The Nernst family, in docs order. */
export const NERNST_SPECS: readonly FunctionSpec[] = [POTENTIAL, STDPOTENTIAL, QUOTIENT, LOGQ, CELLNOTATION];
