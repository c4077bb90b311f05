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
import { kelvinFromCelsius, slopePerElectronAtKelvin } from './constants';
import { type CaseQuantity, type LinearStandardPotential, linearStandardPotential, standardPotentialAt } from './thermo/sweep';

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

/** A diagram's text split around its inline amounts: the probe text (the template's key), the amounts, their unit factors and the literal pieces between them. */
interface InlineSplit {
  readonly probeText: string;
  readonly amounts: readonly number[];
  readonly factors: readonly number[];
  /** the text before the first amount, between each two, and after the last (amounts + 1 pieces) */
  readonly pieces: readonly string[];
}

function splitInlineAmounts(text: string): InlineSplit | null {
  if (text.indexOf('|') < 0 || text.indexOf(',') < 0) return null;
  const amounts: number[] = [];
  const factors: number[] = [];
  const pieces: string[] = [];
  let pieceStart = 0;
  let bad = false;
  const probeText = text.replace(INLINE_AMOUNT, (m: string, head: string, num: string, rest: string, offset: number) => {
    const factor = inlineUnitFactor(rest.trim());
    const amount = parseFloat(num);
    if (factor === undefined || !AMOUNT_TEXT.test(num) || !(amount > 0) || !Number.isFinite(amount)) bad = true;
    amounts.push(amount);
    factors.push(factor ?? 1);
    const numStart = offset + head.length;
    pieces.push(text.slice(pieceStart, numStart));
    pieceStart = numStart + num.length;
    return `${head}${String(probe(amounts.length - 1))}${rest})`;
  });
  pieces.push(text.slice(pieceStart));
  if (bad || amounts.length === 0 || amounts.length > MAX_INLINE_AMOUNTS) return null;
  return { probeText, amounts, factors, pieces };
}

/** The template of a split diagram against a table (built on first use), or null where none can serve. */
function templateOf(split: InlineSplit, key: string, table: PotentialTable): InlineTemplate | null {
  const tkey = resolutionKey(key, split.probeText);
  let t = inlineTemplates.get(tkey);
  if (t === undefined) {
    if (inlineTemplates.size >= MAX_INLINE_TEMPLATES) inlineTemplates.clear();
    t = buildTemplate(split.probeText, split.factors, table);
    inlineTemplates.set(tkey, t);
  }
  return t;
}

/** Per species key, the slot whose amount it takes (the last where two give the same species, as the parser keeps the last). */
function slotsBySide(t: InlineTemplate): { left: Map<string, InlineSlot>; right: Map<string, InlineSlot> } {
  const left = new Map<string, InlineSlot>();
  const right = new Map<string, InlineSlot>();
  for (const s of t.slots) (s.side === 'left' ? left : right).set(s.key, s);
  return { left, right };
}

/** The slot a compiled term takes its inline activity from, or undefined (unit activity). */
function slotOfTerm(
  t: InlineTemplate,
  by: { left: Map<string, InlineSlot>; right: Map<string, InlineSlot> },
  term: { side: 'left' | 'right' | null; key: string },
): InlineSlot | undefined {
  return t.resolved.diagram
    ? (term.side === 'right' ? by.right : by.left).get(term.key)
    : (by.left.get(term.key) ?? by.right.get(term.key));
}

/** A slot's inline activity for the call's amounts: amount × unit factor × ion count. */
function slotValue(s: InlineSlot, amounts: ArrayLike<number>, factors: ArrayLike<number>): number {
  const value = amounts[s.slot]! * factors[s.slot]!;
  return s.count === 1 ? value : value * s.count;
}

/**
 * The compiled form of a cell diagram with inline amounts, from the cached resolution of the same
 * diagram with other amounts; null where the text is not such a diagram or the template cannot
 * serve it (then the caller resolves the text itself).
 */
function inlineDiagramForm(text: string, key: string, table: PotentialTable): NernstForm | null {
  const split = splitInlineAmounts(text);
  if (!split) return null;
  const t = templateOf(split, key, table);
  if (!t) return null;
  const left = new Map<string, number>();
  const right = new Map<string, number>();
  for (const s of t.slots) (s.side === 'left' ? left : right).set(s.key, slotValue(s, split.amounts, t.factors));
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

// ---------------------------------------------------------------------------
// The same diagrams evaluated without compiling a form per call: a kernel holds the diagram's
// literal pieces (so a call's text is split by one scan, no pattern) and, per Nernst term, the
// slot of its amount and its weight.

/**
 * A cell diagram with inline amounts, ready to evaluate at other amounts of the same text
 * pieces: E = E°(T) − (RT ln10/nF)·Σ w·log10(amount × unit factor × ion count) over the terms
 * whose activity is written inline (the others at unit activity), summed in the order the
 * compiled form sums them.
 */
export interface InlineDiagramKernel {
  /** the text before the first amount, between each two, and after the last */
  readonly pieces: readonly string[];
  readonly factors: Float64Array;
  /** per inline term, in the compiled form's order: its weight, the slot of its amount, the ion count */
  readonly weight: Float64Array;
  readonly slot: Int32Array;
  readonly count: Float64Array;
  readonly n: number;
  readonly lin: LinearStandardPotential;
}

const kernels = new WeakMap<InlineTemplate, InlineDiagramKernel | null>();
/** Characters that may continue a number: a piece after an amount must not start with one (the one scan could not tell where the amount ends). */
const NUMBER_CHARS = '0123456789.eE';

function buildKernel(t: InlineTemplate, pieces: readonly string[]): InlineDiagramKernel | null {
  for (let i = 1; i < pieces.length; i++) if (NUMBER_CHARS.includes(pieces[i]!.charAt(0))) return null;
  const by = slotsBySide(t);
  const weight: number[] = [];
  const slot: number[] = [];
  const count: number[] = [];
  for (const term of t.form.terms) {
    const s = slotOfTerm(t, by, term);
    if (!s) continue;
    weight.push(term.weight);
    slot.push(s.slot);
    count.push(s.count);
  }
  return {
    pieces,
    factors: Float64Array.from(t.factors),
    weight: Float64Array.from(weight),
    slot: Int32Array.from(slot),
    count: Float64Array.from(count),
    n: t.form.n,
    lin: linearStandardPotential(t.resolved),
  };
}

/**
 * The kernel of a cell diagram with inline amounts against a table (the built-in table where
 * none is given), from the same cached resolution {@link compiledReaction} uses; null where the
 * text is no such diagram or the kernel cannot serve it (then compile the text).
 *
 * @example
 * inlineDiagramKernel('Zn | Zn2+(aq, 0.1 M) || Cu2+(aq, 0.01 M) | Cu', null)?.pieces // ['Zn | Zn2+(aq, ', ' M) || Cu2+(aq, ', ' M) | Cu']
 */
export function inlineDiagramKernel(
  text: string,
  cells: readonly (readonly unknown[])[] | null | undefined,
): InlineDiagramKernel | null {
  const split = splitInlineAmounts(text);
  if (!split) return null;
  const { key, table } = tableFor(cells);
  const t = templateOf(split, key, table);
  if (!t) return null;
  let k = kernels.get(t);
  if (k === undefined) {
    k = buildKernel(t, split.pieces);
    kernels.set(t, k);
  }
  // a template serves every text of its probe text; the pieces must be this text's
  if (k && !samePieces(k.pieces, split.pieces)) return buildKernel(t, split.pieces);
  return k;
}

function samePieces(a: readonly string[], b: readonly string[]): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

function isDigit(code: number): boolean {
  return code >= 48 && code <= 57;
}

/** The end of the amount that starts at `pos` (digits, a point and digits, an exponent), or −1 where none starts there. */
function amountEnd(text: string, pos: number): number {
  let i = pos;
  const n = text.length;
  while (i < n && isDigit(text.charCodeAt(i))) i++;
  let digits = i > pos;
  if (i < n && text.charCodeAt(i) === 46 /* . */) {
    const f = i + 1;
    let j = f;
    while (j < n && isDigit(text.charCodeAt(j))) j++;
    if (j > f) {
      i = j;
      digits = true;
    }
  }
  if (!digits) return -1;
  const e = text.charCodeAt(i);
  if (e === 101 || e === 69 /* e E */) {
    let j = i + 1;
    const sign = text.charCodeAt(j);
    if (sign === 43 || sign === 45 /* + - */) j++;
    const d = j;
    while (j < n && isDigit(text.charCodeAt(j))) j++;
    if (j > d) i = j;
  }
  return i;
}

/**
 * Reads the amounts of `text` into `into` where the text is the kernel's pieces with an amount
 * between each two (one scan, no pattern, nothing allocated but the amounts' number text);
 * false where it is not, or an amount is not a positive finite number (then compile the text).
 *
 * @example
 * readInlineAmounts(kernel, 'Zn | Zn2+(aq, 0.2 M) || Cu2+(aq, 0.03 M) | Cu', amounts) // true, amounts [0.2, 0.03]
 */
export function readInlineAmounts(k: InlineDiagramKernel, text: string, into: Float64Array): boolean {
  const pieces = k.pieces;
  const first = pieces[0]!;
  if (!text.startsWith(first)) return false;
  let pos = first.length;
  for (let i = 1; i < pieces.length; i++) {
    const end = amountEnd(text, pos);
    if (end < 0) return false;
    const amount = parseFloat(text.slice(pos, end));
    if (!(amount > 0) || amount === Infinity) return false;
    into[i - 1] = amount;
    const piece = pieces[i]!;
    if (!text.startsWith(piece, end)) return false;
    pos = end + piece.length;
  }
  return pos === text.length;
}

/**
 * E (V) or log10 Q of a kernel's diagram at `amounts` and `tempC`: bit for bit what compiling
 * the text and evaluating its form gives.
 *
 * @throws EngineError (`argument`) for a temperature the reaction's data refuse
 * @example
 * inlineDiagramValue(kernel, Float64Array.of(0.1, 0.01), 25, 'potential') // 1.0718
 */
export function inlineDiagramValue(
  k: InlineDiagramKernel,
  amounts: ArrayLike<number>,
  tempC: number,
  quantity: CaseQuantity,
): number {
  let sum = 0;
  for (let j = 0; j < k.slot.length; j++) {
    const s = k.slot[j]!;
    const value = amounts[s]! * k.factors[s]!;
    const c = k.count[j]!;
    sum += k.weight[j]! * Math.log10(c === 1 ? value : value * c);
  }
  // no pH column: the OH- term of the sweep is 0
  if (quantity === 'log10Q') return k.n * (sum + 0);
  const s = slopePerElectronAtKelvin(kelvinFromCelsius(tempC));
  return standardPotentialAt(k.lin, tempC) - s * (sum + 0);
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
