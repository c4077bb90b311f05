/**
 * The ECHEM functions as a HyperFormula function plugin, so that the headless runner
 * evaluates `=ECHEM.POTENTIAL(...)` and friends inside ordinary workbooks.
 *
 * Every entry of the host-independent catalogue (src/functions/catalogue.ts) is registered
 * under `ECHEM.<id>`; the plugin only adapts values between HyperFormula and the catalogue
 * (ranges to rows of cells, empty cells to null, catalogue errors to spreadsheet errors),
 * so results agree with the add-in, which calls the same catalogue, to the last digit.
 *
 * Errors in input cells: an error cell (in a range or as a single argument) reaches the
 * catalogue as its code text ("#N/A"), exactly as the Excel wrapper passes it, so both hosts
 * give the same code and message (docs/design.md, "Errors").
 *
 * Spills: HyperFormula reserves a formula's spill area when it parses the formula, before
 * any value is known. The size is predicted here:
 * - when every argument is a literal (numbers, text, inline arrays), the function is run
 *   once on those literals and its result gives the exact size;
 * - otherwise from the function spec's result shape (src/functions/spec/types.ts): for
 *   `perCase`, one row per case, where the number of cases is the largest height among the
 *   per-case arguments and the rows of `values` (the width from the spec, or the number of
 *   species headers); `single` one cell; `list` as many rows as its source argument; `fixed`
 *   the size of the function called with no arguments (a listing).
 * A result that would not fit the reserved area becomes a #VALUE! error that says so,
 * never a crash; a smaller one leaves the rest of the area empty.
 */
import {
  ArraySize,
  CellError as HfCellError,
  EmptyValue,
  ErrorType,
  FunctionArgumentType,
  FunctionPlugin,
  HyperFormula,
  SimpleRangeValue,
} from 'hyperformula';
import type { FunctionArgument, ImplementedFunctions } from 'hyperformula';
import type { Ast, ProcedureAst } from 'hyperformula/typings/parser';
import type { InterpreterState } from 'hyperformula/typings/interpreter/InterpreterState';
import type {
  InterpreterValue,
  InternalScalarValue,
} from 'hyperformula/typings/interpreter/InterpreterValue';
import { CATALOGUE, isCellError, isPerCase, kindOf } from '../functions/catalogue';
import type { Arg, ErrorCode, FunctionSpec, Grid, Result, ResultCell, Scalar } from '../functions/catalogue';
import { ENGINE_MAX_COLUMNS, ENGINE_MAX_ROWS } from './limits';
import { leanEngineMemory } from './engineMemory';
import { indexGraphEdges } from './graphEdges';
import { isFiniteColumn } from '../engine';

/** The namespace of our functions in formulas. */
export const NAMESPACE = 'ECHEM';

/** The name a catalogue entry has in formulas, e.g. "ECHEM.POTENTIAL". */
export function formulaName(spec: FunctionSpec): string {
  return `${NAMESPACE}.${spec.id}`;
}

const SPECS = new Map<string, FunctionSpec>(CATALOGUE.map((s) => [formulaName(s), s]));

/** The formula names of every catalogue entry, in catalogue order. */
export function echemFunctionNames(): string[] {
  return CATALOGUE.map(formulaName);
}

const HF_ERROR_OF: Record<ErrorCode, ErrorType> = {
  '#VALUE!': ErrorType.VALUE,
  '#N/A': ErrorType.NA,
  '#NUM!': ErrorType.NUM,
};

/** A catalogue call that can never throw past this point. */
function callSafely(spec: FunctionSpec, args: Arg[]): Result {
  try {
    return spec.impl(...args);
  } catch (e) {
    const detail = e instanceof Error ? e.message : String(e);
    return [[{ kind: 'cell-error', code: '#VALUE!', message: `${formulaName(spec)} failed: ${detail}` }]];
  }
}

function resultHeight(r: Result): number {
  return Math.max(1, r.length);
}

function resultWidth(r: Result): number {
  let w = 1;
  for (const row of r) w = Math.max(w, row.length);
  return w;
}

// ---------------------------------------------------------------------------------------
// Literal arguments (known when the formula is parsed)

const NOT_LITERAL = Symbol('not literal');
type Literal = Scalar | Grid | undefined | typeof NOT_LITERAL;

/** The parts of a parsed formula the literal reader looks at (HyperFormula's AST, loosely). */
interface LooseAst {
  type: string;
  value?: unknown;
  expression?: LooseAst;
  args?: unknown[];
  procedureName?: string;
}

function literalScalar(ast: LooseAst): Scalar | typeof NOT_LITERAL {
  switch (ast.type) {
    case 'NUMBER':
      return typeof ast.value === 'number' ? ast.value : NOT_LITERAL;
    case 'STRING':
      return typeof ast.value === 'string' ? ast.value : NOT_LITERAL;
    case 'MINUS_UNARY_OP':
    case 'PLUS_UNARY_OP': {
      const v = ast.value === undefined ? NOT_LITERAL : literalScalar(ast.value as LooseAst);
      if (typeof v !== 'number') return NOT_LITERAL;
      return ast.type === 'MINUS_UNARY_OP' ? -v : v;
    }
    case 'PARENTHESIS':
      return ast.expression === undefined ? NOT_LITERAL : literalScalar(ast.expression);
    case 'FUNCTION_CALL':
      if (ast.args?.length === 0 && ast.procedureName === 'TRUE') return true;
      if (ast.args?.length === 0 && ast.procedureName === 'FALSE') return false;
      return NOT_LITERAL;
    default:
      return NOT_LITERAL;
  }
}

function literalArg(ast: LooseAst): Literal {
  if (ast.type === 'EMPTY') return null;
  if (ast.type === 'ARRAY') {
    const grid: Grid = [];
    for (const row of (ast.args ?? []) as LooseAst[][]) {
      const cells: Scalar[] = [];
      for (const cell of row) {
        const v = literalScalar(cell);
        if (v === NOT_LITERAL) return NOT_LITERAL;
        cells.push(v);
      }
      grid.push(cells);
    }
    return grid;
  }
  return literalScalar(ast);
}

/** The arguments as catalogue values when all of them are literals, else undefined. */
function literalArgs(asts: readonly Ast[]): Arg[] | undefined {
  const out: Arg[] = [];
  for (const ast of asts) {
    const v = literalArg(ast as unknown as LooseAst);
    if (v === NOT_LITERAL) return undefined;
    out.push(v);
  }
  return out;
}

// ---------------------------------------------------------------------------------------
// Values from HyperFormula to the catalogue and back

/** The code text of a HyperFormula error, as a spreadsheet shows it (and Excel passes it). */
const ERROR_TEXT: Partial<Record<ErrorType, string>> = {
  [ErrorType.NA]: '#N/A',
  [ErrorType.VALUE]: '#VALUE!',
  [ErrorType.NUM]: '#NUM!',
  [ErrorType.DIV_BY_ZERO]: '#DIV/0!',
  [ErrorType.REF]: '#REF!',
  [ErrorType.NAME]: '#NAME?',
  [ErrorType.CYCLE]: '#CYCLE!',
  [ErrorType.SPILL]: '#SPILL!',
};

/** A scalar as the catalogue expects it; an error cell becomes its code text. */
function toScalar(v: InternalScalarValue): Scalar {
  if (v === EmptyValue) return null;
  if (v instanceof HfCellError) return ERROR_TEXT[v.type] ?? '#ERROR!';
  if (typeof v === 'number' || typeof v === 'string' || typeof v === 'boolean') return v;
  // Rich numbers (dates, percentages, currency) carry the plain number in `val`.
  const val = (v as { val?: unknown }).val;
  return typeof val === 'number' ? val : null;
}

interface ConvertedArg {
  value: Arg;
}

function convertArg(v: unknown): ConvertedArg {
  if (v === undefined) return { value: undefined };
  if (v instanceof SimpleRangeValue) {
    const data = v.data;
    const grid: Grid = new Array<Scalar[]>(data.length);
    for (let r = 0; r < data.length; r++) {
      const src = data[r] ?? [];
      const row = new Array<Scalar>(src.length);
      for (let c = 0; c < src.length; c++) row[c] = toScalar(src[c] as InternalScalarValue);
      grid[r] = row;
    }
    return { value: grid };
  }
  return { value: toScalar(v as InternalScalarValue) };
}

function toHfCell(cell: ResultCell | undefined): InternalScalarValue {
  if (cell === undefined) return EmptyValue;
  if (typeof cell === 'number') {
    return Number.isFinite(cell)
      ? cell
      : new HfCellError(ErrorType.NUM, 'the result is not a finite number (internal error, please report)');
  }
  if (typeof cell === 'string') return cell;
  if (isCellError(cell)) return new HfCellError(HF_ERROR_OF[cell.code] ?? ErrorType.VALUE, cell.message);
  return EmptyValue;
}

// ---------------------------------------------------------------------------------------
// The plugin

/** Ranges of at least this many cells keep their conversion (tables always do). */
const CACHED_RANGE_CELLS = 64;

type Sized = { width: number; height: number };

/**
 * One plugin class serves every catalogue entry: HyperFormula calls `echemCall` with the
 * parsed call, whose procedure name selects the catalogue entry.
 */
export class EchemPlugin extends FunctionPlugin {
  static override implementedFunctions: ImplementedFunctions = buildImplementedFunctions();

  echemCall(ast: ProcedureAst, state: InterpreterState): InterpreterValue {
    const spec = SPECS.get(ast.procedureName);
    if (spec === undefined) {
      return new HfCellError(ErrorType.NAME, `${ast.procedureName} is not an ECHEM function`);
    }
    // The arguments are evaluated here rather than through runFunction, which would answer
    // for the function when one argument is an error: the catalogue decides what an error in
    // an input means, as it does for the Excel wrapper (docs/design.md, "Errors").
    const metadata = this.metadata(ast.procedureName);
    const raw = this.evaluateArguments(ast.args, state, metadata).map(([value]) => value);
    if (!this.isNumberOfArgumentValuesValid(metadata.parameters ?? [], raw.length)) {
      return new HfCellError(
        ErrorType.NA,
        `${formulaName(spec)} takes ${spec.params.length} arguments (${spec.params.map((p) => p.name).join(', ')})`,
      );
    }
    return this.evaluate(spec, ast, state, raw);
  }

  echemSize(ast: ProcedureAst, state: InterpreterState): ArraySize {
    const spec = SPECS.get(ast.procedureName);
    if (spec === undefined) return ArraySize.scalar();
    const size = this.predictSize(spec, ast, state);
    return size.width === 1 && size.height === 1
      ? ArraySize.scalar()
      : new ArraySize(size.width, size.height);
  }

  private evaluate(
    spec: FunctionSpec,
    ast: ProcedureAst,
    state: InterpreterState,
    raw: unknown[],
  ): InterpreterValue {
    const args: Arg[] = [];
    for (let i = 0; i < raw.length; i++) {
      args.push(this.convertCached(raw[i], spec.params[i]?.kind === 'table').value);
    }
    const result = callSafely(spec, args);
    const height = resultHeight(result);
    const width = resultWidth(result);
    if (height === 1 && width === 1) return toHfCell(result[0]?.[0]);
    const reserved = this.predictSize(spec, ast, state);
    if (spec.result.kind === 'list' && width <= reserved.width && height > reserved.height) {
      // More problems than table rows: list what fits and count the rest.
      const shown = result.slice(0, Math.max(0, reserved.height - 1));
      const rest = height - shown.length;
      const listed: InternalScalarValue[][] = shown.map((row) => [toHfCell(row[0])]);
      listed.push([`... and ${rest} more problems: check a smaller part of the table to see them`]);
      return SimpleRangeValue.onlyValues(listed);
    }
    if (height > reserved.height || width > reserved.width) {
      return new HfCellError(
        ErrorType.VALUE,
        `${formulaName(spec)} returns ${height}×${width} cells but only ${reserved.height}×${reserved.width} ` +
          'were reserved for its spill; give the case arguments as ranges or arrays with one row per case',
      );
    }
    // A column the kernel reports all finite numbers is already HyperFormula's shape: no copy.
    if (width === 1 && isFiniteColumn(result))
      return SimpleRangeValue.onlyValues(result as InternalScalarValue[][]);
    const rows: InternalScalarValue[][] = [];
    for (let r = 0; r < height; r++) {
      const src = result[r] ?? [];
      const row: InternalScalarValue[] = new Array<InternalScalarValue>(width);
      for (let c = 0; c < width; c++) row[c] = toHfCell(src[c]);
      rows.push(row);
    }
    return SimpleRangeValue.onlyValues(rows);
  }

  /**
   * A range argument converted once per content: the conversion is kept on HyperFormula's
   * own range vertex, whose cache HyperFormula clears whenever a cell of the range changes.
   * Every call that reads the same unchanged range (a Potentials table read by thousands of
   * formulas) then gets the same object, which also lets the engine skip re-reading the table.
   * Small ranges that are not tables (a row of one case, `A2:B2`, one per formula) are
   * converted each time instead: kept, they would hold a copy of every case in memory.
   */
  private convertCached(v: unknown, isTable: boolean): ConvertedArg {
    if (
      v instanceof SimpleRangeValue &&
      v.range !== undefined &&
      (isTable || v.range.width() * v.range.height() >= CACHED_RANGE_CELLS)
    ) {
      const vertex = this.dependencyGraph.getRange(v.range.start, v.range.end);
      if (vertex !== undefined) {
        const key = isTable ? 'ECHEM:table' : 'ECHEM:range';
        const hit = vertex.getFunctionValue(key) as ConvertedArg | undefined;
        if (hit !== undefined) return hit;
        const conv = convertArg(v);
        vertex.setFunctionValue(key, conv);
        return conv;
      }
    }
    return convertArg(v);
  }

  private predictSize(spec: FunctionSpec, ast: ProcedureAst, state: InterpreterState): Sized {
    const literal = literalArgs(ast.args);
    if (literal !== undefined) {
      const r = callSafely(spec, literal);
      return { width: resultWidth(r), height: resultHeight(r) };
    }
    const sizes = ast.args.map((a) => this.arraySizeForAst(a, state));
    const sizeOf = (name: string): Sized | undefined => {
      const i = spec.params.findIndex((p) => p.name === name);
      return i >= 0 ? sizes[i] : undefined;
    };
    // Species names are a list (a row or a column); values have one column per species and
    // one row per case, or are a single column holding one case when it matches the list.
    const shape = spec.result;
    switch (shape.kind) {
      case 'fixed': {
        const all = callSafely(spec, []);
        return { width: resultWidth(all), height: resultHeight(all) };
      }
      case 'list':
        return {
          width: shape.width ?? 1,
          height: Math.max(1, shape.rows ?? (shape.heightFrom ? (sizeOf(shape.heightFrom)?.height ?? 1) : 1)),
        };
      case 'single':
        return { width: 1, height: 1 };
      case 'perCase': {
        // Species names are a list (a row or a column); values have one column per species and
        // one row per case, or are a single column holding one case when it matches the list.
        let height = 1;
        const headerCount = (name: string) => {
          const h = sizeOf(name);
          return h === undefined ? 0 : Math.max(h.width, h.height);
        };
        spec.params.forEach((p, i) => {
          const s = sizes[i];
          if (s === undefined) return;
          if (kindOf(p).shape === 'values') {
            const k = headerCount(p.headerParam ?? 'species');
            height = Math.max(height, k > 1 && s.width === 1 && s.height === k ? 1 : s.height);
          } else if (kindOf(p).shape === 'cell' && isPerCase(p)) {
            height = Math.max(height, s.height);
          }
        });
        const width = shape.widthFrom ? Math.max(1, headerCount(shape.widthFrom)) : (shape.width ?? 1);
        return { width, height };
      }
    }
  }
}

function buildImplementedFunctions(): ImplementedFunctions {
  const out: ImplementedFunctions = {};
  for (const spec of CATALOGUE) {
    const parameters: FunctionArgument[] = spec.params.map((p) => ({
      argumentType: FunctionArgumentType.ANY,
      ...(p.optional ? { optionalArg: true } : {}),
    }));
    out[formulaName(spec)] = {
      method: 'echemCall',
      sizeOfResultArrayMethod: 'echemSize',
      parameters,
      vectorizationForbidden: true,
      enableArrayArithmeticForArguments: true,
    };
  }
  return out;
}

let registered = false;

/**
 * Registers the ECHEM functions with HyperFormula (once per process), indexes its
 * dependency graph's edges (graphEdges.ts) so that large workbooks load in linear time, and
 * lets formulas of one shape share their tree and ranges make their caches on first use
 * (engineMemory.ts).
 */
export function registerEchemFunctions(): void {
  if (registered) return;
  indexGraphEdges();
  leanEngineMemory();
  const names: Record<string, string> = {};
  for (const name of echemFunctionNames()) names[name] = name;
  HyperFormula.registerFunctionPlugin(EchemPlugin, { enGB: names, enUS: names });
  registered = true;
}

/** HyperFormula settings shared by every command: GPL-3.0 licence, full precision, spills. */
export const HF_CONFIG = {
  licenseKey: 'gpl-v3',
  // Keep every digit: results must agree with the add-in to the last digit.
  smartRounding: false,
  // Modern spreadsheets: an empty cell reads as 0 in arithmetic, ranges may spill.
  evaluateNullToZero: true,
  useArrayArithmetic: true,
  // The .xlsx sheet size, not HyperFormula's smaller default (40,000 rows): the runner's read
  // limits (limits.ts) refuse anything larger with a clear message first.
  maxRows: ENGINE_MAX_ROWS,
  maxColumns: ENGINE_MAX_COLUMNS,
} as const;
