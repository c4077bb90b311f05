/**
 * Benchmarks of the Excel custom functions, called the way Excel calls them: through the
 * wrappers of src/functions/functions.ts (found by id, as Excel finds them, from the
 * `CustomFunctions.associate` calls recorded by the test stub), every argument a matrix
 * (`[[text]]`, `[[a1, a2]]`, …), a fresh array for every argument of every call, and distinct
 * values in every call. Every output is checked against the hand-written Nernst equation of
 * bench/reference.ts.
 */
import { installCustomFunctionsStub, type CustomFunctionsStub } from '../test/functions/customFunctionsStub';
import {
  CHECK_TOLERANCE_V,
  COPPER,
  DANIELL_DIAGRAM,
  DANIELL_N,
  FARADAY,
  GAS_CONSTANT,
  ZINC,
  caseInputs,
  daniellEmfV,
  daniellNernstTermV,
  daniellTableRange,
  molar,
} from './reference';
import {
  CheckFailure,
  expectClose,
  scale,
  timePair,
  timeRuns,
  type Contender,
  type PairStat,
  type Stat,
} from './stats';

/** An Excel custom function as Excel sees it: matrices in, a matrix out. */
export type ExcelFunction = (...args: unknown[]) => unknown[][];

let stub: CustomFunctionsStub | null = null;
/** The module whose `CustomFunctions.associate` calls give the wrappers (see {@link useFunctionsModule}). */
let functionsModule = '../src/functions/functions';

/**
 * Loads the wrappers from `modulePath` instead of src/functions/functions.ts: the built bundle
 * dist/functions.js, as bench/excelChild.ts does. Call it before the first {@link excelFunction}.
 */
export function useFunctionsModule(modulePath: string): void {
  if (stub) throw new Error('useFunctionsModule: the wrappers are already loaded');
  functionsModule = modulePath;
}

/**
 * The wrapper Excel would call for `id`, from the associations functions.ts (or the bundle
 * made from it) records when it loads, under a stub `CustomFunctions` global installed first.
 */
export function excelFunction(id: string): ExcelFunction {
  if (!stub) {
    stub = installCustomFunctionsStub();
    // eslint-disable-next-line @typescript-eslint/no-require-imports
    require(functionsModule);
  }
  const fn = stub.associations.get(id);
  if (!fn) throw new Error(`functions.ts associates no custom function with id ${id}`);
  return fn as ExcelFunction;
}

/** How far the built-in Daniell E° may lie from the published value typed in reference.ts, V. */
const BUILTIN_E0_SPREAD_V = 0.01;
const PUBLISHED_DANIELL_E0_V = COPPER.e0V - ZINC.e0V;

/**
 * Checks outputs computed with the built-in table at 25 °C: the Nernst term must match the
 * hand-written one exactly, so out + (RT/2F)·ln(aZn/aCu) is the same E° for every case, and
 * that E° must lie within 10 mV of the published one (the built-in table may cite another
 * source; its Nernst part is what is checked to the last digits).
 */
export class BuiltinE0Check {
  private e0: number | null = null;
  constructor(private readonly bench: string) {}
  check(index: number, got: unknown, aZn: number, aCu: number): void {
    if (typeof got !== 'number' || !Number.isFinite(got))
      throw new CheckFailure(this.bench, `output ${index} is ${JSON.stringify(got)}, expected a number`);
    const e0 = got + daniellNernstTermV(aZn, aCu, 25);
    if (this.e0 === null) {
      if (!(Math.abs(e0 - PUBLISHED_DANIELL_E0_V) <= BUILTIN_E0_SPREAD_V))
        throw new CheckFailure(
          this.bench,
          `built-in E° ${e0} V is not within 10 mV of ${PUBLISHED_DANIELL_E0_V} V`,
        );
      this.e0 = e0;
    }
    expectClose(this.bench, index, e0, this.e0, CHECK_TOLERANCE_V);
  }
}

type CallArgs = unknown[];
interface Calls {
  args: CallArgs[];
  cases: { aZn: number; aCu: number; tempC: number }[];
}

/** `count` calls' arguments, fresh arrays each, case numbers from `offset` (so runs differ too). */
function daniellCalls(count: number, offset: number, withTable: boolean): Calls {
  const args: CallArgs[] = new Array<CallArgs>(count);
  const cases: Calls['cases'] = new Array<Calls['cases'][number]>(count);
  for (let i = 0; i < count; i++) {
    const c = caseInputs(offset + i);
    if (!withTable) c.tempC = 25;
    cases[i] = c;
    args[i] = withTable
      ? [[[DANIELL_DIAGRAM]], [['Zn2+', 'Cu2+']], [[c.aZn, c.aCu]], [[c.tempC]], daniellTableRange()]
      : [[[DANIELL_DIAGRAM]], [['Zn2+', 'Cu2+']], [[c.aZn, c.aCu]], null, null];
  }
  return { args, cases };
}

/**
 * The baseline: a custom function written by hand for the Daniell cell, of the same shape as
 * POTENTIAL (the same five matrix arguments read, a fresh 1×1 matrix returned), E° typed in.
 */
export function handPotential(
  _reaction: unknown[][],
  _species: unknown[][],
  values: unknown[][],
  temp: unknown[][] | null,
  _table: unknown[][] | null,
): number[][] {
  const row = values[0] as number[];
  const t = temp === null ? 25 : ((temp[0] as number[])[0] as number);
  const e0 = COPPER.e0V - ZINC.e0V + ((COPPER.dE0dTmVperK - ZINC.dE0dTmVperK) / 1000) * (t - 25);
  const s = (GAS_CONSTANT * (t + 273.15) * Math.LN10) / (DANIELL_N * FARADAY);
  return [[e0 - s * Math.log10((row[0] as number) / (row[1] as number))]];
}

function callContender(
  name: string,
  fn: (...a: never[]) => unknown[][],
  count: number,
  withTable: boolean,
  checkAgainstTable: boolean,
): Contender<Calls, unknown[][][]> {
  let run = 0;
  return {
    prepare: () => daniellCalls(count, 1_000_003 * ++run, withTable),
    run: ({ args }) => {
      const out = new Array<unknown[][]>(args.length);
      const f = fn as (...a: unknown[]) => unknown[][];
      for (let i = 0; i < args.length; i++) {
        const a = args[i] as unknown[];
        out[i] = f(a[0], a[1], a[2], a[3], a[4]);
      }
      return out;
    },
    check: ({ cases }, out) => {
      const builtin = new BuiltinE0Check(name);
      for (let i = 0; i < cases.length; i++) {
        const r = out[i];
        const c = cases[i]!;
        if (!Array.isArray(r) || r.length !== 1 || !Array.isArray(r[0]) || r[0].length !== 1)
          throw new CheckFailure(name, `output ${i} is not a 1×1 matrix: ${JSON.stringify(r)}`);
        const v = r[0][0];
        if (checkAgainstTable) expectClose(name, i, v, daniellEmfV(c.aZn, c.aCu, c.tempC), CHECK_TOLERANCE_V);
        else builtin.check(i, v, c.aZn, c.aCu);
      }
    },
  };
}

/** Per-call figures of a pair: µs per call on each side and the ratio. */
export interface CallFigures {
  calls: number;
  potentiaUs: Stat;
  handUs: Stat;
  ratio: Stat;
}

function perCall(p: PairStat, calls: number): CallFigures {
  return {
    calls,
    potentiaUs: scale(p.fMs, 1000 / calls),
    handUs: scale(p.gMs, 1000 / calls),
    ratio: p.ratio,
  };
}

/**
 * Single-case POTENTIAL calls of the Daniell cell, Excel-shaped, distinct activities each call.
 * `withTable`: the user passes the potentials range (published E° and dE°/dT) and a distinct
 * temperature; otherwise table and temperature are omitted (null, as Excel passes them) and
 * the built-in table is used at 25 °C.
 */
export function benchExcelCalls(calls: number, runs: number, withTable: boolean): CallFigures {
  const potential = excelFunction('POTENTIAL');
  const name = withTable ? 'call_excel_table' : 'call_excel';
  const p = timePair(
    callContender(name, potential, calls, withTable, withTable),
    callContender(`${name} (hand-written)`, handPotential, calls, withTable, true),
    runs,
  );
  return perCall(p, calls);
}

/** Rows of a spill: [aZn, aCu] per case, a fresh matrix per run. */
function sweepRows(count: number, offset: number): number[][] {
  const rows = new Array<number[]>(count);
  for (let i = 0; i < count; i++) {
    const c = caseInputs(offset + i);
    rows[i] = [c.aZn, c.aCu];
  }
  return rows;
}

function checkColumn(name: string, rows: number[][], get: (i: number) => unknown): void {
  for (let i = 0; i < rows.length; i++) {
    const r = rows[i]!;
    expectClose(name, i, get(i), daniellEmfV(r[0]!, r[1]!, 25), CHECK_TOLERANCE_V);
  }
}

/** The floors of the sweep: the Nernst equation by hand over the same rows. */
function daniellSlope25(): { e0: number; s: number } {
  return {
    e0: COPPER.e0V - ZINC.e0V,
    s: (GAS_CONSTANT * 298.15 * Math.LN10) / (DANIELL_N * FARADAY),
  };
}

export function handSweepRows(rows: number[][]): number[][] {
  const { e0, s } = daniellSlope25();
  const out = new Array<number[]>(rows.length);
  for (let i = 0; i < rows.length; i++) {
    const r = rows[i]!;
    out[i] = [e0 - s * Math.log10(r[0]! / r[1]!)];
  }
  return out;
}

export function handSweepTyped(rows: number[][]): Float64Array {
  const { e0, s } = daniellSlope25();
  const out = new Float64Array(rows.length);
  for (let i = 0; i < rows.length; i++) {
    const r = rows[i]!;
    out[i] = e0 - s * Math.log10(r[0]! / r[1]!);
  }
  return out;
}

/**
 * The engine's sweep kernel alone, called through the engine index as the function layer
 * calls it (reaction compiled and bound once, rows in, a column of one-cell rows out): the
 * spill's cost without the function layer's argument and result passes. Null where the
 * engine no longer exports these.
 */
function kernelSweep(): ((rows: number[][]) => unknown[][]) | null {
  // eslint-disable-next-line @typescript-eslint/no-require-imports
  const e = require('../src/engine') as Record<string, unknown>;
  const compile = e.compiledReaction as ((t: string, c: unknown) => unknown) | undefined;
  const bind = e.bindSpecies as ((f: unknown, h: string[]) => unknown) | undefined;
  const sweep = e.sweepToColumn as
    | ((b: unknown, rows: number[][], t: number, q: string, onError: (x: unknown) => unknown) => unknown[][])
    | undefined;
  if (typeof compile !== 'function' || typeof bind !== 'function' || typeof sweep !== 'function') return null;
  return (rows) => {
    const b = bind(compile(DANIELL_DIAGRAM, daniellTableRange()), ['Zn2+', 'Cu2+']);
    return sweep(b, rows, 25, 'potential', (x) => x);
  };
}

export interface SweepFigures {
  cases: number;
  spillMs: Stat;
  /** Against the hand loop writing the same column of one-cell rows (the contract's figure). */
  ratioRows: Stat;
  rowsLoopMs: Stat;
  /** Against the Float64Array loop (the floor). */
  ratioFloor: Stat;
  floorMs: Stat;
  /** The spill's own runs in that pair (the numerator of `ratioFloor`). */
  spillFloorPairMs: Stat;
  /** Minor page faults per run: the spill in each pair, the hand loop and the floor. */
  pageFaults: { spillRowsPair: Stat; rowsLoop: Stat; spillFloorPair: Stat; floor: Stat };
  /** The engine kernel alone against the same floor (null where it cannot be reached). */
  kernelRatioFloor: Stat | null;
  kernelMs: Stat | null;
}

/** One spilled POTENTIAL over `cases` rows × 2 species (user table, 25 °C) against the hand loops. */
export function benchSweep(cases: number, runs: number): SweepFigures {
  const potential = excelFunction('POTENTIAL');
  let k = 0;
  const spill: Contender<number[][], unknown[][]> = {
    prepare: () => sweepRows(cases, 7_000_001 * ++k),
    run: (rows) => potential([[DANIELL_DIAGRAM]], [['Zn2+', 'Cu2+']], rows, [[25]], daniellTableRange()),
    check: (rows, out) => {
      if (!Array.isArray(out) || out.length !== rows.length)
        throw new CheckFailure(
          'sweep',
          `the spill has ${Array.isArray(out) ? out.length : 'no'} rows, expected ${rows.length}`,
        );
      checkColumn('sweep', rows, (i) => (out[i] as unknown[])[0]);
    },
  };
  const rowsLoop: Contender<number[][], number[][]> = {
    prepare: () => sweepRows(cases, 7_000_001 * ++k),
    run: handSweepRows,
    check: (rows, out) => checkColumn('sweep (hand loop)', rows, (i) => out[i]![0]),
  };
  const floor: Contender<number[][], Float64Array> = {
    prepare: () => sweepRows(cases, 7_000_001 * ++k),
    run: handSweepTyped,
    check: (rows, out) => checkColumn('sweep (Float64Array loop)', rows, (i) => out[i]),
  };
  const a = timePair(spill, rowsLoop, runs);
  const b = timePair(spill, floor, runs);
  const kern = kernelSweep();
  const c = kern
    ? timePair<number[][], unknown[][], number[][], Float64Array>(
        {
          prepare: () => sweepRows(cases, 7_000_001 * ++k),
          run: kern,
          check: (rows, out) => checkColumn('sweep_kernel', rows, (i) => (out[i] as unknown[])[0]),
        },
        floor,
        runs,
      )
    : null;
  return {
    kernelRatioFloor: c ? c.ratio : null,
    kernelMs: c ? c.fMs : null,
    cases,
    spillMs: a.fMs,
    ratioRows: a.ratio,
    rowsLoopMs: a.gMs,
    ratioFloor: b.ratio,
    floorMs: b.gMs,
    spillFloorPairMs: b.fMs,
    pageFaults: {
      spillRowsPair: a.fPageFaults,
      rowsLoop: a.gPageFaults,
      spillFloorPair: b.fPageFaults,
      floor: b.gPageFaults,
    },
  };
}

/** The cell diagram with its activities written in, e.g. "Zn | Zn2+(aq, 0.0123 M) || Cu2+(aq, 0.1 M) | Cu". */
export function inlineDiagram(aZn: number, aCu: number): string {
  return `Zn | Zn2+(aq, ${molar(aZn)}) || Cu2+(aq, ${molar(aCu)}) | Cu`;
}

export interface DiagramFigures {
  calls: number;
  us: Stat;
  tableUs: Stat;
}

/**
 * POTENTIAL of a diagram whose inline activities change every call (so its text changes
 * every call): once with the built-in table (table and temperature omitted), once with the
 * user's table and a distinct temperature (checked against the published E° exactly).
 */
export function benchInlineDiagram(calls: number, runs: number): DiagramFigures {
  const potential = excelFunction('POTENTIAL');
  let k = 0;
  const contender = (withTable: boolean): Contender<Calls, unknown[][][]> => ({
    prepare: () => {
      const base = 3_000_017 * ++k;
      const c = daniellCalls(calls, base, withTable);
      c.args = c.cases.map((x) =>
        withTable
          ? [[[inlineDiagram(x.aZn, x.aCu)]], null, null, [[x.tempC]], daniellTableRange()]
          : [[[inlineDiagram(x.aZn, x.aCu)]], null, null, null, null],
      );
      return c;
    },
    run: ({ args }) => args.map((a) => potential(a[0], a[1], a[2], a[3], a[4])),
    check: ({ cases }, out) => {
      const name = withTable ? 'diagram_inline_table' : 'diagram_inline';
      const builtin = new BuiltinE0Check(name);
      cases.forEach((c, i) => {
        const v = (out[i]?.[0] as unknown[] | undefined)?.[0];
        if (withTable) expectClose(name, i, v, daniellEmfV(c.aZn, c.aCu, c.tempC), CHECK_TOLERANCE_V);
        else builtin.check(i, v, c.aZn, c.aCu);
      });
    },
  });
  const plain = timeRuns(contender(false), runs);
  const table = timeRuns(contender(true), runs);
  return { calls, us: scale(plain, 1000 / calls), tableUs: scale(table, 1000 / calls) };
}
