/**
 * Sweeps: `values` one row (one case) or a matrix whose rows are cases; every
 * other argument one cell or a column with one entry per case. The case count is
 * the largest; each argument must have 1 entry or that many. A mismatch names
 * both shapes.
 */
import { EngineError } from '../engine';
import type { Grid, Scalar } from './cellTypes';
import { shapeOf } from './args';

/** A per-case argument: one value for every case, or one per case. */
export interface CaseColumn {
  readonly name: string;
  readonly cells: readonly Scalar[] | null;
}

/**
 * A per-case argument from a grid: a single cell, or a column (a row is accepted
 * too where it is the only way the user laid out the cases).
 */
export function caseColumn(g: Grid | null, name: string): CaseColumn {
  if (!g) return { name, cells: null };
  if (g.length === 1 && g[0]!.length === 1) return { name, cells: [g[0]![0] as Scalar] };
  if (g.every((r) => r.length === 1)) return { name, cells: g.map((r) => r[0] as Scalar) };
  if (g.length === 1) return { name, cells: g[0]!.slice() };
  throw new EngineError(
    'shape',
    `${name} must be one cell or one column with an entry per case; got a ${shapeOf(g)} range.`,
    name,
  );
}

/** The value of a case column for case i (null where omitted). */
export function at(c: CaseColumn, i: number): Scalar {
  if (!c.cells) return null;
  return (c.cells.length === 1 ? c.cells[0] : c.cells[i]) ?? null;
}

/**
 * The number of cases given the values matrix rows (or null where there is no
 * matrix) and the per-case columns.
 *
 * @throws EngineError (`shape`) naming both shapes where lengths disagree
 */
export function caseCount(
  valueRows: { name: string; rows: number } | null,
  columns: readonly CaseColumn[],
): number {
  let n = 1;
  let by = '';
  const consider = (len: number, label: string) => {
    if (len <= 1) return;
    if (n === 1) {
      n = len;
      by = label;
    } else if (len !== n) {
      throw new EngineError(
        'shape',
        `${label} but ${by}: give one entry per case, or a single value for all cases.`,
        'values',
      );
    }
  };
  if (valueRows) consider(valueRows.rows, `${valueRows.name} has ${valueRows.rows} rows (cases)`);
  for (const c of columns) if (c.cells) consider(c.cells.length, `${c.name} has ${c.cells.length} entries`);
  return n;
}
