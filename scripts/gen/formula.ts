/**
 * Formula text of an example call, `=ECHEM.ID(arg, …)`, and a result as the docs show it.
 * Shared by the functions.ts generator and the docs generator.
 */
import type { Arg, Result, Scalar } from '../../src/functions/cellTypes';
import { isCellError } from '../../src/functions/cellTypes';

function scalarText(v: Scalar): string {
  if (v === null) return '';
  if (typeof v === 'string') return `"${v.replace(/"/g, '""')}"`;
  if (typeof v === 'boolean') return v ? 'TRUE' : 'FALSE';
  return String(v);
}

/** One argument as formula text: a literal, or an inline array `{a,b;c,d}`. */
export function argText(a: Arg): string {
  if (a === undefined || a === null) return '';
  if (!Array.isArray(a)) return scalarText(a);
  if (a.length === 1 && a[0]!.length === 1) return scalarText(a[0]![0] ?? null);
  return `{${a.map((row) => row.map(scalarText).join(',')).join(';')}}`;
}

/** The formula of a call, trailing omitted arguments dropped. */
export function formulaOf(id: string, args: readonly Arg[]): string {
  const parts = args.map(argText);
  while (parts.length > 0 && parts[parts.length - 1] === '') parts.pop();
  return `=ECHEM.${id}(${parts.join(', ')})`;
}

/** A number as the docs show it: 6 significant digits, exponent form beyond 1e±6. */
export function numberText(x: number): string {
  if (x === 0) return '0';
  const a = Math.abs(x);
  if (a >= 1e6 || a < 1e-4) return x.toExponential(5).replace(/\.?0+e/, 'e').replace('e+', 'E+').replace('e-', 'E-');
  return String(Number(x.toPrecision(6)));
}

/** A result as the docs show it: one value, or `{a; b}` for a spill (first 4 rows). */
export function resultText(r: Result): string {
  const cell = (c: unknown): string =>
    typeof c === 'number' ? numberText(c) : isCellError(c) ? c.code : typeof c === 'string' ? c : String(c);
  if (r.length === 1 && r[0]!.length === 1) return cell(r[0]![0]);
  const rows = r.slice(0, 4).map((row) => row.map(cell).join(', '));
  return `{${rows.join('; ')}${r.length > 4 ? `; … (${r.length} rows)` : ''}}`;
}
