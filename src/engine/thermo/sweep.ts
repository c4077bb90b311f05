/**
 * Many cases of one reaction at once: the Nernst equation evaluated over rows of
 * activities (and a temperature per case), with an error kept per case so one
 * bad row does not stop the others. The hot loop allocates nothing per case.
 */
import { EngineError } from '../errors';
import { ZERO_CELSIUS_K, MAX_TEMP_C, slopePerElectronAtKelvin, kelvinFromCelsius } from '../constants';
import { type Resolved, halfE0V25, halfSlopeMvPerK, halfCpModel } from '../table/resolve';
import { checkSpeciesTemperature, cpFactorK, SPECIES_DATA_RANGE_C } from './reactionThermo';
import { pKw } from './water';
import { type Binding, weightedLogActivity } from './nernstForm';

/**
 * E°(T) = e0V25 + slopeVPerK·(T − 25 °C) + cpVPerK·cpFactorK(T): the rows' dE°/dT and,
 * for rows from the species data, the constant-ΔCp° term (then `speciesRange`: valid
 * 0–100 °C).
 */
export interface LinearStandardPotential {
  readonly e0V25: number;
  readonly slopeVPerK: number;
  readonly cpVPerK: number;
  readonly speciesRange: boolean;
}

/**
 * E°(T) of a temperature model (V).
 *
 * @throws EngineError (`argument`) outside 0–100 °C where the model rests on the species data
 * @example
 * standardPotentialAt(linearStandardPotential(r), 60)
 */
export function standardPotentialAt(lin: LinearStandardPotential, tempC: number): number {
  if (tempC === 25) return lin.e0V25;
  if (lin.speciesRange) {
    const tK = checkSpeciesTemperature(tempC);
    return lin.e0V25 + lin.slopeVPerK * (tempC - 25) + lin.cpVPerK * cpFactorK(tK);
  }
  return lin.e0V25 + lin.slopeVPerK * (tempC - 25);
}

/** The pH-set OH- term: −Σw(OH- from pH)·pKw(T), zero where no OH- activity comes from a pH. */
function ohOffset(b: Binding, tempC: number): number {
  return b.ohFromPH === 0 ? 0 : -b.ohFromPH * pKw(tempC);
}

/**
 * The linear temperature model of a resolution's E°.
 *
 * @example
 * linearStandardPotential(resolveReaction('Ag+/Ag', defaultTable())) // { e0V25: 0.7996, slopeVPerK: -0.000989 }
 */
export function linearStandardPotential(r: Resolved): LinearStandardPotential {
  let lin = linearCache.get(r);
  if (!lin) {
    lin = computeLinear(r);
    linearCache.set(r, lin);
  }
  return lin;
}

const linearCache = new WeakMap<Resolved, LinearStandardPotential>();

/**
 * E° at 25 °C at once; the temperature terms on first use, since they may need the species
 * data, which a sheet at 25 °C need not build (built-in rows store their E° at 25 °C).
 */
class LazyLinear implements LinearStandardPotential {
  readonly e0V25: number;
  private model: TemperatureTerms | null = null;

  constructor(private readonly r: Resolved) {
    this.e0V25 = r.kind === 'half' ? halfE0V25(r.half) : halfE0V25(r.right) - halfE0V25(r.left);
  }

  private terms(): TemperatureTerms {
    return (this.model ??= temperatureTerms(this.r));
  }

  get slopeVPerK(): number {
    return this.terms().slopeVPerK;
  }

  get cpVPerK(): number {
    return this.terms().cpVPerK;
  }

  get speciesRange(): boolean {
    return this.terms().speciesRange;
  }
}

type TemperatureTerms = Omit<LinearStandardPotential, 'e0V25'>;

function computeLinear(r: Resolved): LinearStandardPotential {
  return new LazyLinear(r);
}

function temperatureTerms(r: Resolved): TemperatureTerms {
  if (r.kind === 'half') {
    const cp = halfCpModel(r.half);
    return {
      slopeVPerK: halfSlopeMvPerK(r.half).slope * 1e-3,
      cpVPerK: cp.cpVPerK,
      speciesRange: cp.species,
    };
  }
  const cr = halfCpModel(r.right);
  const cl = halfCpModel(r.left);
  return {
    slopeVPerK: (halfSlopeMvPerK(r.right).slope - halfSlopeMvPerK(r.left).slope) * 1e-3,
    cpVPerK: cr.cpVPerK - cl.cpVPerK,
    speciesRange: cr.species || cl.species,
  };
}

const NO_ERRORS: Map<number, EngineError> = new Map();

/** What to compute per case. */
export type CaseQuantity = 'potential' | 'log10Q';

/** Results of a sweep: a value per case, or the error of that case. */
export interface SweepResult {
  readonly values: Float64Array;
  /** errors by case index (sparse; shared and empty where there are none — do not mutate) */
  readonly errors: ReadonlyMap<number, EngineError>;
}

/**
 * Evaluate a bound reaction over rows of values.
 *
 * @param rows one row of values per case (cells in the order of the species headers)
 * @param tempC one temperature for all cases, or a function giving case i's temperature (may throw)
 * @example
 * sweepCases(binding, [[0.01], [0.1]], 25, 'potential').values // Float64Array [0.2778, 0.3074]
 */
export function sweepCases(
  b: Binding,
  rows: readonly ArrayLike<unknown>[],
  tempC: number | ((i: number) => number),
  quantity: CaseQuantity,
  caseCount = rows.length,
): SweepResult {
  const values = new Float64Array(caseCount);
  let errors: Map<number, EngineError> | null = null;
  const lin = linearStandardPotential(b.form.resolved);
  const n = b.form.n;
  const fixedT = typeof tempC === 'number';
  let fixedE0 = 0;
  let fixedS = 0;
  let fixedOH = 0;
  if (fixedT) {
    const tK = kelvinFromCelsius(tempC);
    fixedE0 = standardPotentialAt(lin, tempC);
    fixedS = slopePerElectronAtKelvin(tK);
    fixedOH = ohOffset(b, tempC);
  }
  const logOH = b.ohFromPH === 0 ? 0 : ohOffset(b, 25);
  // a temperature per case: the temperature terms read once, not per case
  const slopeVPerK = fixedT ? 0 : lin.slopeVPerK;
  const cpVPerK = fixedT ? 0 : lin.cpVPerK;
  const speciesRange = fixedT ? false : lin.speciesRange;
  const empty: unknown[] = [];
  for (let i = 0; i < caseCount; i++) {
    try {
      const row = rows.length === 1 ? rows[0]! : (rows[i] ?? empty);
      const sum = weightedLogActivity(b, row, fixedT ? tempC : (tempC as (i: number) => number)(i));
      let x: number;
      if (quantity === 'log10Q') x = n * (sum + logOH);
      else if (fixedT) x = fixedE0 - fixedS * (sum + fixedOH);
      else {
        const t = (tempC as (i: number) => number)(i);
        const tK = t + ZERO_CELSIUS_K;
        if (!(tK > 0) || !(t <= MAX_TEMP_C)) kelvinFromCelsius(t);
        let e0 = lin.e0V25 + slopeVPerK * (t - 25);
        if (speciesRange) {
          if (!(t >= SPECIES_DATA_RANGE_C.min && t <= SPECIES_DATA_RANGE_C.max)) checkSpeciesTemperature(t);
          if (cpVPerK !== 0) e0 += cpVPerK * cpFactorK(tK);
        }
        x = e0 - slopePerElectronAtKelvin(tK) * (b.ohFromPH === 0 ? sum : sum + ohOffset(b, t));
      }
      if (!Number.isFinite(x))
        throw new EngineError('range', 'The result is beyond the number range; check the values.', 'values');
      values[i] = x;
    } catch (e) {
      if (!(e instanceof EngineError)) throw e;
      (errors ??= new Map()).set(i, e);
    }
  }
  return { values, errors: errors ?? NO_ERRORS };
}

/** Columns from {@link sweepToColumn} in which every cell is a finite number. */
const FINITE_COLUMNS = new WeakSet<object>();
/** Below this many cases a column is not marked: checking it again costs less than marking it. */
const MARK_FROM_CASES = 32;

/**
 * True where `column` came from {@link sweepToColumn} with every cell a finite number (no
 * error cell), so that a caller can hand it over without checking each cell again. False only
 * means "not known": small columns are not marked.
 *
 * @example
 * isFiniteColumn(sweepToColumn(binding, rows, 25, 'potential', (e) => e)) // true where no case failed
 */
export function isFiniteColumn(column: unknown): boolean {
  return typeof column === 'object' && column !== null && FINITE_COLUMNS.has(column);
}

/** One case by the general path (any binding, any cell): the value, or the error as a cell. */
function generalCase<E>(
  b: Binding,
  row: ArrayLike<unknown>,
  oh: number,
  potential: boolean,
  e0: number,
  s: number,
  onError: (e: EngineError) => E,
  tempC: number,
): number | E {
  try {
    const sum = weightedLogActivity(b, row, tempC) + oh;
    const x = potential ? e0 - s * sum : b.form.n * sum;
    return Number.isFinite(x)
      ? x
      : onError(new EngineError('range', 'The result is not a finite number; check the inputs.', 'values'));
  } catch (e) {
    if (!(e instanceof EngineError)) throw e;
    return onError(e);
  }
}

/**
 * A cell of a values row read without changing the row. An indexed read (`row[c]`) at a site
 * that has met rows of numbers and rows of text makes V8's optimised code convert every
 * number row it reads into a row of boxed numbers (an elements-kind transition), which then
 * costs an allocation per cell and the garbage after it, in this pass and in every later one;
 * `Array.prototype.at` reads any row as it is. Null where the row is no array.
 */
type CellReader = (row: unknown, c: number) => unknown;
const HAS_AT = typeof (Array.prototype as { at?: unknown }).at === 'function';

/** The cell `c` of a host row (see {@link CellReader}); undefined outside the row or where it is no array. */
export const cellOf: CellReader = HAS_AT
  ? (row, c) => (Array.isArray(row) ? (row as unknown as { at(i: number): unknown }).at(c) : undefined)
  : (row, c) => (Array.isArray(row) ? (row as unknown[])[c] : undefined);

/**
 * The two-species kernel at one temperature: where the binding reads two value columns of
 * opposite, equal weights (a cell or a redox couple, the common case),
 * Σ w·log10 a = w·log10(a[c1]/a[c2]), so each case is `k0 + k·log10(a[c1]/a[c2])`: one
 * logarithm, E° and RT ln10/nF worked out once for the temperature (a temperature-independent
 * call pays no temperature term per case).
 */
export interface PairKernel {
  readonly c1: number;
  readonly c2: number;
  readonly k0: number;
  readonly k: number;
}

/**
 * The {@link PairKernel} of a binding at `tempC`, or null where the binding is not a ratio pair.
 *
 * @throws EngineError (`argument`) for a temperature the reaction's data refuse (as {@link sweepToColumn})
 * @example
 * pairKernel(bindSpecies(compiledReaction('Zn | Zn2+ || Cu2+ | Cu', null), ['Zn2+', 'Cu2+']), 25, 'potential') // { c1: 0, c2: 1, k0: 1.1018, k: 0.02958 }
 */
export function pairKernel(b: Binding, tempC: number, quantity: CaseQuantity): PairKernel | null {
  const pair = ratioPair(b);
  if (!pair) return null;
  const { c1, c2, w } = pair;
  if (quantity === 'log10Q') return { c1, c2, k0: b.form.n * b.fixedLog, k: b.form.n * w };
  const s = slopePerElectronAtKelvin(kelvinFromCelsius(tempC));
  const e0 = standardPotentialAt(linearStandardPotential(b.form.resolved), tempC);
  return { c1, c2, k0: e0 - s * b.fixedLog, k: -s * w };
}

/**
 * Writes `out[i] = [k0 + k·log10(a[c1]/a[c2])]` from case `from` on, while the two cells are
 * positive numbers and the result is finite; returns the first case it could not write (the
 * caller's general path takes that one).
 */
function pairCells(kern: PairKernel, rows: readonly unknown[], out: unknown[][], from: number): number {
  const { c1, c2, k0, k } = kern;
  const n = rows.length;
  // a spill's rows are made by oneCellRow, a few cells' by the literal (see oneCellRow)
  const spill = n >= MARK_FROM_CASES;
  let i = from;
  for (; i < n; i++) {
    const row = rows[i];
    const a1 = cellOf(row, c1);
    const a2 = cellOf(row, c2);
    if (typeof a1 !== 'number' || typeof a2 !== 'number' || !(a1 > 0) || !(a2 > 0)) break;
    const x = k0 + k * Math.log10(a1 / a2);
    if (x - x !== 0) break;
    out[i] = spill ? oneCellRow(x) : [x];
  }
  return i;
}

/**
 * `[x]` for a spill's row, made as `new Array(1)` and one store instead of by an array
 * literal. A literal here gets pretenured by V8 once a large spill's rows survive a
 * young-generation collection: from then on every row is allocated in the old generation,
 * whose pages the next full collection can hand back to the system and the next spill must
 * fault in again (measured: about 1,000 more page faults per 100,000-case spill, and twice
 * the time; bench/README.md). Rows made this way stayed in the young generation in every run
 * measured. Below 32 cases the literal is kept: there it is the faster of the two (measured,
 * about 0.14 µs less per one-cell call).
 */
function oneCellRow<T>(x: T): T[] {
  const row = new Array<T>(1);
  row[0] = x;
  return row;
}

/**
 * The kernel over all rows where every case is a plain number: the column of one-cell rows
 * (marked by {@link isFiniteColumn} from 32 cases), or null at the first case that is not (a
 * cell that is no positive number, a result beyond the number range) so that the caller takes
 * its general path with its messages.
 *
 * @example
 * pairColumn(kernel, [[0.1, 0.01]]) // [[1.0718]]
 */
export function pairColumn(kern: PairKernel, rows: readonly unknown[]): number[][] | null {
  const n = rows.length;
  const out = new Array<number[]>(n);
  if (pairCells(kern, rows, out, 0) !== n) return null;
  if (n >= MARK_FROM_CASES) FINITE_COLUMNS.add(out);
  return out;
}

/**
 * The same computation as {@link sweepCases}, written straight into a column of
 * one-cell rows (the shape a spreadsheet spill takes), with each case's error
 * turned into a cell by `onError`. One pass, no intermediate array; where every cell is a
 * finite number the column is marked so ({@link isFiniteColumn}).
 *
 * @example
 * sweepToColumn(binding, [[0.01], [0.1]], 25, 'potential', (e) => e.message) // [[0.2778], [0.3074]]
 */
export function sweepToColumn<E>(
  b: Binding,
  rows: readonly ArrayLike<unknown>[],
  tempC: number,
  quantity: CaseQuantity,
  onError: (e: EngineError) => E,
): (number | E)[][] {
  const caseCount = rows.length;
  const out: (number | E)[][] = new Array<(number | E)[]>(caseCount);
  const lin = linearStandardPotential(b.form.resolved);
  const tK = kelvinFromCelsius(tempC);
  const e0 = standardPotentialAt(lin, tempC);
  const s = slopePerElectronAtKelvin(tK);
  const potential = quantity === 'potential';
  // an OH- activity set by a pH column: log10 a(OH-) = pH − pKw(T) (log Q at 25 °C)
  const oh = ohOffset(b, potential ? tempC : 25);
  const kern = pairKernel(b, tempC, quantity);
  const spill = caseCount >= MARK_FROM_CASES;
  let allFinite = true;
  let i = kern ? pairCells(kern, rows, out, 0) : 0;
  while (i < caseCount) {
    const cell = generalCase(b, rows[i]!, oh, potential, e0, s, onError, tempC);
    if (typeof cell !== 'number') allFinite = false;
    out[i] = spill ? oneCellRow(cell) : [cell];
    i = kern ? pairCells(kern, rows, out, i + 1) : i + 1;
  }
  if (allFinite && spill) FINITE_COLUMNS.add(out);
  return out;
}

/** A binding's ratio pair, worked out once per binding. */
const pairCache = new WeakMap<Binding, RatioPair | null>();

interface RatioPair {
  readonly c1: number;
  readonly c2: number;
  readonly w: number;
}

/** Two bound activity columns with weights w and −w (no pH column), or null. */
function ratioPair(b: Binding): RatioPair | null {
  let p = pairCache.get(b);
  if (p === undefined) {
    p = computeRatioPair(b);
    pairCache.set(b, p);
  }
  return p;
}

function computeRatioPair(b: Binding): RatioPair | null {
  const found: { c: number; w: number }[] = [];
  for (let i = 0; i < b.column.length; i++) {
    const c = b.column[i]!;
    if (c < 0) continue;
    if (b.isPH[i] !== 0) return null;
    found.push({ c, w: b.weight[i]! });
    if (found.length > 2) return null;
  }
  if (found.length !== 2) return null;
  const [x, y] = found as [{ c: number; w: number }, { c: number; w: number }];
  if (x.w !== -y.w || x.c === y.c) return null;
  return { c1: x.c, c2: y.c, w: x.w };
}
