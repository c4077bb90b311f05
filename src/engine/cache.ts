/**
 * The engine's caches: parsed user tables and resolved reactions, cached by content, so a
 * sweep of 100,000 cases (or 100,000 single-case calls) parses and resolves once; and the
 * one registry of all the engine's caches (src/engine/cacheRegistry.ts, re-exported here),
 * with one clear ({@link clearCaches}) and one report ({@link cacheStats}).
 *
 * Other modules make their caches with `ByteBoundedCache` (which registers itself) or
 * register their own with `registerCache`, importing them from './cacheRegistry'.
 */
import { type PotentialTable, readUserTable, defaultTable, tableKey } from './table/potentialTable';
import { type Resolved, resolveReaction } from './table/resolve';
import { type NernstForm, nernstForm } from './thermo/nernstForm';
import { EngineError } from './errors';
import { ByteBoundedCache, clearRegisteredCaches, registerCache } from './cacheRegistry';

export {
  ByteBoundedCache,
  approximateBytes,
  cacheStats,
  registerCache,
  type CacheLimits,
  type CacheStats,
  type RegisteredCache,
} from './cacheRegistry';

/** The byte budget of the resolved-reaction cache (all tables together). */
export const RESOLUTION_CACHE_BYTES = 64 * 1024 * 1024;
/** The byte budget of the parsed-table cache. */
export const TABLE_CACHE_BYTES = 32 * 1024 * 1024;

// Table keys are the table's content as JSON: the size is the key's, which dominates.
const tables = new ByteBoundedCache<PotentialTable>('userTables', {
  maxEntries: 64,
  maxBytes: TABLE_CACHE_BYTES,
  sizeOf: (k) => 64 + 8 * k.length,
});
type Outcome = { ok: true; form: NernstForm } | { ok: false; error: EngineError };
/** Resolutions by table key, then by reaction text: one budget for all of them. */
const resolutions = new ByteBoundedCache<Outcome>('resolvedReactions', {
  maxEntries: 4096,
  maxBytes: RESOLUTION_CACHE_BYTES,
});
let last: { key: string; text: string; outcome: Outcome } | null = null;
let lastTableCells: unknown = undefined;
let lastTable: { key: string; table: PotentialTable } | null = null;
/** Short numbers stand for table keys inside the resolution cache (a key may be long JSON). */
const tableIds = new Map<string, number>();

registerCache({
  name: 'lastUsed',
  clear: () => {
    last = null;
    lastTableCells = undefined;
    lastTable = null;
    tableIds.clear();
  },
  stats: () => ({ name: 'lastUsed', entries: tableIds.size, bytes: 0 }),
});

function resolutionKey(tableKeyText: string, text: string): string {
  let id = tableIds.get(tableKeyText);
  if (id === undefined) {
    if (tableIds.size >= 64) {
      // Ids are reused only after both maps are emptied, so no key can mean two tables.
      tableIds.clear();
      resolutions.clear();
    }
    id = tableIds.size;
    tableIds.set(tableKeyText, id);
  }
  return `${id}\u0000${text}`;
}

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
  const cacheKey = resolutionKey(key, text);
  let o = resolutions.get(cacheKey);
  if (!o) {
    try {
      o = { ok: true, form: nernstForm(resolveReaction(text, table)) };
    } catch (e) {
      if (!(e instanceof EngineError)) throw e;
      o = { ok: false, error: e };
    }
    resolutions.set(cacheKey, o);
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

/**
 * Drops everything every registered cache holds (tests, benchmarks, a host freeing memory).
 *
 * @example
 * clearCaches(); cacheStats().every((c) => c.entries === 0) // true
 */
export function clearCaches(): void {
  clearRegisteredCaches();
}
