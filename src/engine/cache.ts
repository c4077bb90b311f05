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
import { type Resolved, type ResolvedHalf, resolveReaction } from './table/resolve';
import { inlineUnitFactor } from './notation/species';
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
  const viaTemplate = inlineDiagramForm(text, key, table);
  if (viaTemplate) {
    last = { key, text, outcome: { ok: true, form: viaTemplate } };
    return viaTemplate;
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

// ---------------------------------------------------------------------------
// Cell diagrams with inline activities: the resolution does not depend on the numbers (only on
// the species, phases and units), so it is cached on the diagram with its numbers replaced by
// probes, and each call's numbers are bound into the inline activities of that resolution.

/** An inline amount in a phase group, "(aq, 0.0123 M)": the number and the unit as the parser reads them. */
const INLINE_AMOUNT = /(\(\s*[a-z]+\s*,\s*)([0-9]*\.?[0-9]+(?:[eE][+-]?\d+)?)([^()]*)\)/g;
/** The parser's own amount pattern (notation/species.ts readAmount), anchored. */
const AMOUNT_TEXT = /^[0-9]*\.?[0-9]+(?:[eE][+-]?\d+)?$/;
/** Stoichiometric counts an electrolyte's ion may carry (CaCl2 → 2 Cl-): searched when mapping probes. */
const MAX_ION_COUNT = 8;

/** Where each inline activity of a resolution comes from: slot i's activity × count. */
interface InlineSlot {
  readonly side: 'left' | 'right';
  readonly key: string;
  readonly slot: number;
  readonly count: number;
}
interface InlineTemplate {
  readonly resolved: Resolved & { kind: 'cell' };
  /** the compiled form of `resolved`: each call's form differs only in its terms' inline activities */
  readonly form: NernstForm;
  readonly slots: readonly InlineSlot[];
  readonly factors: readonly number[];
}

/** Templates by table id and probe text; null where a template cannot serve (then the full path runs). */
const inlineTemplates = new Map<string, InlineTemplate | null>();
const MAX_INLINE_TEMPLATES = 1024;
registerCache({
  name: 'inlineDiagramTemplates',
  clear: () => inlineTemplates.clear(),
  stats: () => ({ name: 'inlineDiagramTemplates', entries: inlineTemplates.size, bytes: 0 }),
});

/**
 * Probe i: a power of two, 2^-(4i+20), written so that the parser reads it back exactly; four
 * binary orders apart, so that probe × count (count ≤ 8) never meets another probe.
 */
function probe(i: number): number {
  return Math.pow(2, -(4 * i + 20));
}
/** More amounts than this in one diagram: no template (the probes would leave the number range). */
const MAX_INLINE_AMOUNTS = 64;

function buildTemplate(probeText: string, factors: readonly number[], table: PotentialTable): InlineTemplate | null {
  let r: Resolved;
  try {
    r = resolveReaction(probeText, table);
  } catch (e) {
    if (!(e instanceof EngineError)) throw e;
    return null;
  }
  if (r.kind !== 'cell') return null;
  const slots: InlineSlot[] = [];
  for (const side of ['left', 'right'] as const) {
    for (const [k, x] of r[side].inline) {
      let found: { slot: number; count: number } | null = null;
      let matches = 0;
      for (let i = 0; i < factors.length; i++) {
        const base = probe(i) * factors[i]!;
        for (let c = 1; c <= MAX_ION_COUNT; c++) {
          if ((c === 1 ? base : base * c) === x) {
            found = { slot: i, count: c };
            matches++;
          }
        }
      }
      if (matches !== 1 || !found) return null;
      slots.push({ side, key: k, slot: found.slot, count: found.count });
    }
  }
  return { resolved: r, form: nernstForm(r), slots, factors };
}

/**
 * The compiled form of a cell diagram with inline amounts, from the cached resolution of the same
 * diagram with other amounts; null where the text is not such a diagram or the template cannot
 * serve it (then the caller resolves the text itself).
 */
function inlineDiagramForm(text: string, key: string, table: PotentialTable): NernstForm | null {
  if (text.indexOf('|') < 0 || text.indexOf(',') < 0) return null;
  const amounts: number[] = [];
  const factors: number[] = [];
  let bad = false;
  const probeText = text.replace(INLINE_AMOUNT, (_m, head: string, num: string, rest: string) => {
    const factor = inlineUnitFactor(rest.trim());
    const amount = parseFloat(num);
    if (factor === undefined || !AMOUNT_TEXT.test(num) || !(amount > 0) || !Number.isFinite(amount)) bad = true;
    amounts.push(amount);
    factors.push(factor ?? 1);
    return `${head}${String(probe(amounts.length - 1))}${rest})`;
  });
  if (bad || amounts.length === 0 || amounts.length > MAX_INLINE_AMOUNTS) return null;
  const tkey = resolutionKey(key, probeText);
  let t = inlineTemplates.get(tkey);
  if (t === undefined) {
    if (inlineTemplates.size >= MAX_INLINE_TEMPLATES) inlineTemplates.clear();
    t = buildTemplate(probeText, factors, table);
    inlineTemplates.set(tkey, t);
  }
  if (!t) return null;
  const left = new Map<string, number>();
  const right = new Map<string, number>();
  for (const s of t.slots) {
    const value = amounts[s.slot]! * t.factors[s.slot]!;
    (s.side === 'left' ? left : right).set(s.key, s.count === 1 ? value : value * s.count);
  }
  const base = t.resolved;
  const withHalf = (h: ResolvedHalf, inline: Map<string, number>): ResolvedHalf => ({ ...h, inline });
  const resolved: Resolved = { ...base, text, left: withHalf(base.left, left), right: withHalf(base.right, right) };
  // the terms of nernstForm(resolved), from the template's: only their inline activities change
  const terms = t.form.terms.map((term) => {
    const inline = base.diagram
      ? (term.side === 'right' ? right : left).get(term.key)
      : (left.get(term.key) ?? right.get(term.key));
    return inline === term.inline ? term : { ...term, inline };
  });
  return { resolved, terms, n: t.form.n };
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
