/**
 * The generic argument reader and runner: from a {@link FunctionSpec} and the arguments a host
 * gives, read every argument by its kind, count the cases (docs/design.md, "Sweeps"), run the
 * computation per case or over all cases, and return a grid. Nothing throws past here: a bad
 * case gives an error in its own cell, a bad call one error cell.
 */
import { EngineError, cellOf, isFiniteColumn } from '../../engine';
import type { Arg, Result, ResultCell, Scalar } from '../cellTypes';
import { asGrid } from '../args';
import { at, caseColumn, caseCount, type CaseColumn } from '../broadcast';
import { cellError, toCellError } from '../errorCodes';
import { isPerCase, kindOf, nounOf, readFlag, readNumberOf, readTextOf, unitOf } from './kinds';
import type { CallArgs, CaseArgs, FunctionSpec, ParamSpec, PotentialV, TempC } from './types';
import { inputErrorInRow, numberRow, readHeaders, readNumberList, readValueRows, tableCells, type TableCells } from './values';

/** A number that is not finite never reaches a sheet: it becomes #NUM! with a message. */
export function finiteCell(x: ResultCell, what: string): ResultCell {
  return typeof x !== 'number' || Number.isFinite(x)
    ? x
    : cellError('#NUM!', `${what} is not a finite number (overflow); check the inputs.`);
}

type Memo = { readonly ok: true; readonly v: unknown } | { readonly ok: false; readonly e: unknown };

class Prepared implements CallArgs {
  cases = 1;
  private readonly columns = new Map<string, CaseColumn>();
  private readonly headerLists = new Map<string, string[]>();
  private readonly valueRows = new Map<string, Scalar[][] | null>();
  /** Per parameter: the read value of a one-cell column, read once for every case. */
  private readonly memo = new Map<string, Memo>();
  /** The values parameter whose error cells propagate (docs/design.md, "Errors"). */
  valuesParam: { name: string; headerParam: string } | null = null;

  constructor(
    readonly spec: FunctionSpec,
    private readonly byName: ReadonlyMap<string, { p: ParamSpec; i: number }>,
    private readonly args: readonly Arg[],
  ) {
    const perCase: CaseColumn[] = [];
    let valueCases: { name: string; rows: number } | null = null;
    for (const p of spec.params) {
      const arg = args[this.byName.get(p.name)!.i];
      const shape = kindOf(p).shape;
      if (shape === 'header') this.headerLists.set(p.name, readHeaders(arg, p.name));
      else if (shape === 'values') {
        const hp = p.headerParam ?? 'species';
        const headers = this.headerLists.get(hp) ?? [];
        const rows = readValueRows(headers, arg, p.name, hp);
        this.valueRows.set(p.name, rows);
        if (rows) {
          valueCases = { name: p.name, rows: rows.length };
          this.valuesParam ??= { name: p.name, headerParam: hp };
        }
      } else if (shape === 'cell') {
        const c = caseColumn(asGrid(arg), p.name);
        const col = isPerCase(p) || !c.cells ? c : { name: p.name, cells: [c.cells[0] ?? null] };
        if (!p.optional && !col.cells)
          throw new EngineError('argument', `${p.name} is missing: give ${nounOf(p)}.`, p.name);
        this.columns.set(p.name, col);
        if (isPerCase(p)) perCase.push(col);
      }
    }
    this.cases = caseCount(valueCases, perCase);
  }

  param(name: string): ParamSpec {
    const hit = this.byName.get(name);
    if (!hit) throw new Error(`${this.spec.id} has no parameter ${name}`);
    return hit.p;
  }

  table(name = 'table'): TableCells {
    return tableCells(this.raw(name));
  }

  headers(name = 'species'): string[] {
    return this.headerLists.get(name) ?? [];
  }

  rows(name = 'values'): Scalar[][] | null {
    return this.valueRows.get(name) ?? null;
  }

  numberList(name: string): number[] {
    return readNumberList(this.raw(name), name, unitOf(this.param(name)));
  }

  raw(name: string): Arg {
    return this.args[this.byName.get(name)?.i ?? -1];
  }

  column(name: string): readonly Scalar[] | null {
    return this.columns.get(name)?.cells ?? null;
  }

  /** The typed value of a cell parameter for case i (one read for a one-cell column). */
  read(name: string, i: number, how: (v: Scalar, p: ParamSpec) => unknown): unknown {
    const p = this.param(name);
    const col = this.columns.get(name);
    const one = !col?.cells || col.cells.length === 1;
    if (one) {
      const hit = this.memo.get(name);
      if (hit) {
        if (hit.ok) return hit.v;
        throw hit.e;
      }
    }
    const v = col ? at(col, i) : null;
    if (!one) return how(v, p);
    try {
      const value = how(v, p);
      this.memo.set(name, { ok: true, v: value });
      return value;
    } catch (e) {
      this.memo.set(name, { ok: false, e });
      throw e;
    }
  }

  at(i: number): CaseArgs {
    return new Case(this, i);
  }
}

class Case implements CaseArgs {
  constructor(
    private readonly call: Prepared,
    readonly i: number,
  ) {}

  cell(name: string): Scalar {
    const cells = this.call.column(name);
    if (!cells) return null;
    return (cells.length === 1 ? cells[0] : cells[this.i]) ?? null;
  }

  optNum(name: string): number | null {
    const p = this.call.param(name);
    const extrapolate = p.extrapolateParam !== undefined && this.flag(p.extrapolateParam);
    return this.call.read(name, this.i, (v, q) => readNumberOf(v, q, extrapolate)) as number | null;
  }

  num(name: string): number {
    return this.given(name, this.optNum(name));
  }

  tempC(name = 'temp_C'): TempC {
    if (this.call.param(name).kind !== 'temperature') throw new Error(`${name} is not a temperature parameter`);
    return this.num(name) as TempC;
  }

  potentialV(name: string): PotentialV {
    if (this.call.param(name).kind !== 'potential') throw new Error(`${name} is not a potential parameter`);
    return this.num(name) as PotentialV;
  }

  /** A value that must be there: "X is missing: give …" where it is not. */
  private given<T>(name: string, v: T | null): T {
    if (v !== null) return v;
    throw new EngineError('argument', `${name} is missing: give ${nounOf(this.call.param(name))}.`, name);
  }

  optText(name: string): string | null {
    return this.call.read(name, this.i, readTextOf) as string | null;
  }

  text(name: string): string {
    return this.given(name, this.optText(name));
  }

  choice<T>(name: string): T {
    return this.call.read(name, this.i, (v, p) => {
      const t = readTextOf(v, p);
      if (!p.parseChoice) throw new Error(`${name} has no parseChoice`);
      return p.parseChoice(t);
    }) as T;
  }

  flag(name: string): boolean {
    return this.call.read(name, this.i, readFlag) as boolean;
  }

  row(name = 'values'): readonly Scalar[] | null {
    const rows = this.call.rows(name);
    if (!rows) return null;
    return rows.length === 1 ? rows[0]! : (rows[this.i] ?? null);
  }

  numbers(name = 'values'): number[] {
    const p = this.call.param(name);
    const row = this.row(name);
    if (!row) return [];
    return numberRow(row, this.call.headers(p.headerParam ?? 'species'), name, unitOf(p));
  }
}

function widthOf(spec: FunctionSpec, call: Prepared): number {
  const r = spec.result;
  if (r.kind === 'perCase') return r.widthFrom ? Math.max(1, call.headers(r.widthFrom).length) : (r.width ?? 1);
  if (r.kind === 'list') return r.width ?? 1;
  return 1;
}

function runPerCase(spec: FunctionSpec, call: Prepared): Result {
  const f = spec.perCase!;
  const n = call.cases;
  const width = widthOf(spec, call);
  const out: Result = new Array<ResultCell[]>(n);
  for (let i = 0; i < n; i++) {
    try {
      const r = f(call.at(i), call);
      out[i] = Array.isArray(r) ? r.map((x) => finiteCell(x, spec.id)) : [finiteCell(r, spec.id)];
    } catch (e) {
      const err = toCellError(e);
      out[i] = width === 1 ? [err] : new Array<ResultCell>(width).fill(err);
    }
  }
  return out;
}

/**
 * Error cells in a values range propagate to the cases that read them (docs/design.md,
 * "Errors"): a case whose result holds an error and whose values row holds an error cell gives
 * that cell's error instead, across its width. A row whose error cell the case does not read (a
 * species the reaction ignores) computes as usual. Only erring cases are looked at, so a clean
 * sweep costs one pass over its result.
 *
 * @example
 * propagateInputErrors([[cellErr]], [['#N/A']], ['Cu2+'], 'values') // [[#N/A "values (Cu2+) holds …"]]
 */
export function propagateInputErrors(
  result: Result,
  rows: readonly (readonly Scalar[])[] | null,
  headers: readonly string[],
  valuesName: string,
): Result {
  if (!rows || rows.length === 0 || isFiniteColumn(result)) return result;
  for (let r = 0; r < result.length; r++) {
    const row = result[r]!;
    let erring = false;
    // cellOf: a result row of numbers is read as it is, never converted to boxed numbers
    for (let c = 0; c < row.length; c++) if (typeof cellOf(row, c) === 'object') erring = true;
    if (!erring) continue;
    const src = rows.length === 1 ? rows[0] : rows[r];
    const e = src ? inputErrorInRow(src, headers, valuesName) : null;
    if (e) {
      const cell = toCellError(e);
      result[r] = row.map(() => cell);
    }
  }
  return result;
}

function applyErrorRows(result: Result, call: Prepared): Result {
  const v = call.valuesParam;
  if (!v || call.spec.result.kind !== 'perCase') return result;
  return propagateInputErrors(result, call.rows(v.name), call.headers(v.headerParam), v.name);
}

/**
 * The host-independent implementation of a spec: reads, broadcasts, computes, never throws.
 *
 * @example
 * implementationOf(spec)(25, 1) // [[0.0591…]] for NERNSTSLOPE
 */
export function implementationOf(spec: FunctionSpec): (...args: Arg[]) => Result {
  if (!spec.perCase === !spec.run) throw new Error(`${spec.id}: give exactly one of perCase and run`);
  // the parameters by name, made on the first call (not for every function at load)
  let byName: ReadonlyMap<string, { p: ParamSpec; i: number }> | null = null;
  return (...args: Arg[]): Result => {
    try {
      const fast = spec.fast?.(args);
      if (fast) return fast;
      byName ??= new Map(spec.params.map((p, i) => [p.name, { p, i }]));
      const call = new Prepared(spec, byName, args);
      const result = spec.run ? spec.run(call) : runPerCase(spec, call);
      return applyErrorRows(result, call);
    } catch (e) {
      return [[toCellError(e)]];
    }
  };
}
