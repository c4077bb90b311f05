/**
 * Argument adaptation: hosts pass omitted optional arguments as null or
 * undefined, empty cells as null, "" or 0, and ranges as 2-D arrays. These
 * helpers read one cell as the type a parameter needs, with a message that names
 * the argument when it cannot.
 */
import { EngineError } from '../engine';
import type { Arg, Grid, Scalar } from './cellTypes';

/** True for null, undefined and "" (after trimming). */
export function isBlank(v: unknown): boolean {
  return v === null || v === undefined || (typeof v === 'string' && v.trim() === '');
}

function allRows(arg: readonly unknown[]): boolean {
  for (let r = 0; r < arg.length; r++) if (!Array.isArray(arg[r])) return false;
  return true;
}

/** An argument as a grid (a scalar becomes 1×1); null where omitted. */
export function asGrid(arg: Arg): Grid | null {
  if (arg === undefined || arg === null) return null;
  if (Array.isArray(arg)) {
    if (arg.length === 0) return null;
    // keep the host's array where it is already a grid, so identity-based caches downstream hold
    if (allRows(arg)) return arg;
    return arg.map((row) => (Array.isArray(row) ? row : [row as Scalar]));
  }
  return [[arg]];
}

/** True where a grid is absent or holds only blank cells. */
export function isBlankGrid(g: Grid | null): boolean {
  return g === null || g.every((row) => row.every((c) => isBlank(c)));
}

/**
 * True for an optional text argument left empty: null, "", or the 0 some hosts pass for
 * an empty cell (no text argument has 0 as a meaningful value).
 */
export function isEmptyText(v: unknown): boolean {
  return isBlank(v) || v === 0;
}

/** True where a text-holding grid (species names, a table) is absent or all empty. */
export function isEmptyTextGrid(g: Grid | null): boolean {
  return g === null || g.every((row) => row.every((c) => isEmptyText(c)));
}

/** A grid's shape as text, e.g. "3×2". */
export function shapeOf(g: Grid | null): string {
  if (!g) return '0×0';
  return `${g.length}×${g[0]?.length ?? 0}`;
}

/** Flatten a row or a column (or one cell) into a list; error for a 2-D block. */
export function asList(g: Grid | null, name: string): Scalar[] {
  if (!g) return [];
  if (g.length === 1) return g[0]!.slice();
  if (g.every((r) => r.length === 1)) return g.map((r) => r[0] as Scalar);
  throw new EngineError('shape', `${name} must be one row or one column; got a ${shapeOf(g)} range.`, name);
}

function describe(v: unknown): string {
  if (typeof v === 'string') return `"${v.length > 40 ? v.slice(0, 39) + '…' : v}"`;
  return String(v);
}

/**
 * The one rule for reading number text: trimmed, the Unicode minus read as "-", anything
 * `Number` reads as a finite number; null otherwise.
 *
 * @example
 * parseNumberText(' −0.5 ') // -0.5
 */
export function parseNumberText(text: string): number | null {
  const t = text.trim().replace(/\u2212/g, '-');
  if (t === '') return null;
  const x = Number(t);
  return Number.isFinite(x) ? x : null;
}

/**
 * Read a number. Numeric text is accepted ("25", "−0.5"); blank gives the default,
 * or an error where there is none.
 *
 * @example
 * readNumber(null, 'temp_C', 25) // 25
 */
export function readNumber(v: unknown, name: string, dflt?: number, unit = ''): number {
  if (isBlank(v)) {
    if (dflt !== undefined) return dflt;
    throw new EngineError('argument', `${name} is missing: give a number${unit ? ` in ${unit}` : ''}.`, name);
  }
  if (typeof v === 'number') {
    if (!Number.isFinite(v))
      throw new EngineError('argument', `${name} must be a finite number; got ${describe(v)}.`, name);
    return v;
  }
  if (typeof v === 'string') {
    const x = parseNumberText(v);
    if (x !== null) return x;
  }
  throw new EngineError(
    'argument',
    `${name} must be a number${unit ? ` in ${unit}` : ''}; got ${describe(v)}.`,
    name,
  );
}

/** Read an optional number: null where blank. */
export function readOptionalNumber(v: unknown, name: string, unit = ''): number | null {
  return isBlank(v) ? null : readNumber(v, name, undefined, unit);
}

/**
 * Read text (trimmed); blank gives the default, or an error.
 *
 * @example
 * readText('  Cu2+/Cu ', 'reaction') // 'Cu2+/Cu'
 */
export function readText(v: unknown, name: string, dflt?: string, what = 'text'): string {
  if (isBlank(v) || (v === 0 && dflt !== undefined)) {
    if (dflt !== undefined) return dflt;
    throw new EngineError('argument', `${name} is missing: give ${what}.`, name);
  }
  if (typeof v === 'string') return v.trim();
  if (v === 0)
    throw new EngineError('argument', `${name} is empty (an empty cell reads as 0): give ${what}.`, name);
  throw new EngineError('argument', `${name} must be ${what}; got ${describe(v)}.`, name);
}

/** Read optional text: null where blank. */
export function readOptionalText(v: unknown, name: string, what = 'text'): string | null {
  return isEmptyText(v) ? null : readText(v, name, undefined, what);
}

/** Read a positive whole number (electrons). */
export function readElectrons(v: unknown, name = 'n'): number | null {
  if (isBlank(v) || v === 0) return null;
  const n = readNumber(v, name);
  if (!(n > 0) || !Number.isInteger(n)) {
    throw new EngineError(
      'argument',
      `${name} (electrons transferred) must be a positive whole number; got ${describe(v)}.`,
      name,
    );
  }
  return n;
}
