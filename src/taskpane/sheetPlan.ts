/**
 * What the task pane writes into a new worksheet, as plain data: blocks of cells
 * (values or formulas, with light formatting) and at most one chart. The plans are
 * built by pure functions (potentialsSheet.ts, sweepPlan.ts, examples in
 * officeActions.ts) and written by one Office writer, so that tests can check
 * every address, value and formula without Excel.
 */
import type { AxisTitles } from './chart';

/** A cell value the pane writes: text, a number, or "" for an empty cell. */
export type CellValue = string | number;

/** A rectangle of cells, written at `address` (A1 notation on the new sheet). */
export interface CellBlock {
  readonly address: string;
  /** Values, one array per row; exclusive with `formulas`. */
  readonly values?: readonly (readonly CellValue[])[];
  /** Formulas (text starting with "="), one array per row. */
  readonly formulas?: readonly (readonly string[])[];
  readonly bold?: boolean;
  readonly italic?: boolean;
  /** One Excel number format for every cell of the block, e.g. "0.0000" or "@". */
  readonly numberFormat?: string;
}

/** An XY scatter chart with lines, one series. */
export interface ChartSpec extends AxisTitles {
  readonly type: 'XYScatterLines';
  /** The range the chart is created from (the series' values with their header). */
  readonly source: string;
  /** The x values of the series (no header). */
  readonly xValues: string;
  /** The y values of the series (no header). */
  readonly yValues: string;
  readonly seriesName: string;
  readonly title: string;
  /** Where the chart sits: top-left and bottom-right cells. */
  readonly topLeft: string;
  readonly bottomRight: string;
}

/** Everything written into one new sheet. */
export interface SheetPlan {
  /** The (already unique) name of the new sheet. */
  readonly sheetName: string;
  readonly blocks: readonly CellBlock[];
  readonly chart?: ChartSpec;
  /** Rows to freeze at the top (0 for none). */
  readonly freezeRows: number;
  /** Columns whose widths are fitted to their contents, e.g. "A:D". */
  readonly autofitColumns?: string;
}
