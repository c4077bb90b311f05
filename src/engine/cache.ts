/**
 * Caches of parsed user tables and resolved reactions, keyed by content, so a
 * sweep of 100,000 cases (or 100,000 single-case calls) parses and resolves once.
 * Bounded: the oldest entries are dropped past a limit.
 */
import { type PotentialTable, readUserTable, defaultTable, tableKey } from './table/potentialTable';
import { type Resolved, resolveReaction } from './table/resolve';
import { type NernstForm, nernstForm } from './thermo/nernstForm';
import { EngineError } from './errors';

class BoundedCache<V> {
  private readonly map = new Map<string, V>();
  constructor(private readonly limit: number) {}
  get(k: string): V | undefined {
    return this.map.get(k);
  }
  set(k: string, v: V): void {
    if (this.map.size >= this.limit) {
      const first = this.map.keys().next();
      if (!first.done) this.map.delete(first.value);
    }
    this.map.set(k, v);
  }
  clear(): void {
    this.map.clear();
  }
}

const tables = new BoundedCache<PotentialTable>(64);
type Outcome = { ok: true; form: NernstForm } | { ok: false; error: EngineError };
const resolutions = new Map<string, BoundedCache<Outcome>>();
let last: { key: string; text: string; outcome: Outcome } | null = null;
let lastTableCells: unknown = undefined;
let lastTable: { key: string; table: PotentialTable } | null = null;

/**
 * The potentials table for a user range (cached by content); the built-in table where none is given.
 *
 * @example
 * tableFor(null).rows.length // the built-in rows
 */
export function tableFor(cells: readonly (readonly unknown[])[] | null | undefined): {
  key: string;
  table: PotentialTable;
} {
  if (!cells || cells.length === 0) return { key: '', table: defaultTable() };
  if (cells === lastTableCells && lastTable) return lastTable;
  const key = tableKey(cells);
  let t = tables.get(key);
  if (!t) {
    t = readUserTable(cells);
    tables.set(key, t);
  }
  lastTableCells = cells;
  lastTable = { key, table: t };
  return lastTable;
}

/**
 * Resolve and compile a reaction text against a table, cached by (text, table content).
 * Errors are cached too (the same bad text fails fast every time).
 *
 * @example
 * compiledReaction('Cu2+/Cu', null).n // 2
 */
export function compiledReaction(
  text: string,
  cells: readonly (readonly unknown[])[] | null | undefined,
): NernstForm {
  const { key, table } = tableFor(cells);
  if (last && last.text === text && last.key === key) {
    if (!last.outcome.ok) throw last.outcome.error;
    return last.outcome.form;
  }
  let byText = resolutions.get(key);
  if (!byText) {
    if (resolutions.size >= 64) resolutions.clear();
    byText = new BoundedCache<Outcome>(4096);
    resolutions.set(key, byText);
  }
  let o = byText.get(text);
  if (!o) {
    try {
      o = { ok: true, form: nernstForm(resolveReaction(text, table)) };
    } catch (e) {
      if (!(e instanceof EngineError)) throw e;
      o = { ok: false, error: e };
    }
    byText.set(text, o);
  }
  last = { key, text, outcome: o };
  if (!o.ok) throw o.error;
  return o.form;
}

/** Resolution only (no compilation), through the same cache. */
export function resolvedReaction(
  text: string,
  cells: readonly (readonly unknown[])[] | null | undefined,
): Resolved {
  return compiledReaction(text, cells).resolved;
}

/** Drop all cached tables and resolutions (tests, benchmarks). */
export function clearCaches(): void {
  tables.clear();
  resolutions.clear();
  last = null;
  lastTableCells = undefined;
  lastTable = null;
}
