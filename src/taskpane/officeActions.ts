/**
 * The task pane's workbook writes, through Excel.run. Every action creates ONE new
 * worksheet under a name no sheet of the workbook has (sheetNames.ts) and writes only
 * into it: the pane never overwrites a user's sheet, table or cell.
 *
 * Each action reads the existing sheet names, builds its plan from them (pure code),
 * adds the sheet and syncs (so that the sheet is known to be the pane's own), then fills
 * it and syncs again. A rejection anywhere propagates to the caller, which shows it
 * (status.ts); a failure after the sheet was added says which sheet was left half-filled.
 */
import type { SheetPlan } from './sheetPlan';
import { describeOfficeError } from './status';

/** A failure after the pane's new sheet was created: names the sheet, keeps the cause. */
export class PartialWriteError extends Error {
  readonly sheetName: string;
  readonly cause: unknown;
  constructor(sheetName: string, cause: unknown) {
    super(
      `the new sheet "${sheetName}" was created but could not be filled: ${describeOfficeError(cause)} ` +
        'No other sheet was changed; you may delete that sheet.',
    );
    this.name = 'PartialWriteError';
    this.sheetName = sheetName;
    this.cause = cause;
  }
}

function blockSize(rows: readonly (readonly unknown[])[]): { rows: number; columns: number } {
  return { rows: rows.length, columns: rows.reduce((m, r) => Math.max(m, r.length), 0) };
}

/**
 * The names of the workbook's sheets.
 */
export async function existingSheetNames(context: Excel.RequestContext): Promise<string[]> {
  const sheets = context.workbook.worksheets;
  sheets.load('items/name');
  await context.sync();
  return sheets.items.map((s) => s.name);
}

/** Fill a sheet that the pane has just created, following the plan (queued; the caller syncs). */
function fillSheet(sheet: Excel.Worksheet, plan: SheetPlan): void {
  for (const block of plan.blocks) {
    const range = sheet.getRange(block.address);
    const cells = block.values ?? block.formulas ?? [];
    if (block.numberFormat !== undefined) {
      const { rows, columns } = blockSize(cells);
      range.numberFormat = Array.from({ length: rows }, () =>
        Array.from({ length: columns }, () => block.numberFormat),
      );
    }
    if (block.values) range.values = block.values.map((row) => [...row]);
    if (block.formulas) range.formulas = block.formulas.map((row) => [...row]);
    if (block.bold) range.format.font.bold = true;
    if (block.italic) range.format.font.italic = true;
  }
  if (plan.freezeRows > 0) sheet.freezePanes.freezeRows(plan.freezeRows);
  if (plan.autofitColumns) sheet.getRange(plan.autofitColumns).format.autofitColumns();
  const c = plan.chart;
  if (c) {
    const chart = sheet.charts.add(c.type, sheet.getRange(c.source), 'Columns');
    chart.title.text = c.title;
    chart.legend.visible = false;
    chart.axes.categoryAxis.title.text = c.xTitle;
    chart.axes.valueAxis.title.text = c.yTitle;
    const series = chart.series.getItemAt(0);
    series.name = c.seriesName;
    series.setXAxisValues(sheet.getRange(c.xValues));
    series.setValues(sheet.getRange(c.yValues));
    chart.setPosition(c.topLeft, c.bottomRight);
  }
  sheet.activate();
}

/**
 * Create a new sheet and write a plan into it.
 *
 * @param makePlan builds the plan from the names of the sheets that already exist; the
 *   plan's sheet name must be none of them (checked again here, case-insensitively)
 * @returns the plan that was written
 * @throws whatever Excel.run rejects with; {@link PartialWriteError} after the sheet was added
 */
export async function writeNewSheet<P extends SheetPlan>(
  makePlan: (existing: readonly string[]) => P,
): Promise<P> {
  return Excel.run(async (context) => {
    const existing = await existingSheetNames(context);
    const plan = makePlan(existing);
    const lower = plan.sheetName.toLowerCase();
    if (existing.some((n) => n.toLowerCase() === lower)) {
      throw new Error(
        `a sheet named "${plan.sheetName}" already exists; the pane does not overwrite sheets.`,
      );
    }
    const sheet = context.workbook.worksheets.add(plan.sheetName);
    await context.sync();
    try {
      fillSheet(sheet, plan);
      await context.sync();
    } catch (error) {
      throw new PartialWriteError(plan.sheetName, error);
    }
    return plan;
  });
}

/**
 * A range reference as typed in the pane: `Sheet!A2:D115`, `'My sheet'!A2:D115`, a bare
 * address (the active sheet) or a defined name.
 *
 * @example
 * splitRangeRef("'Potentials (2)'!A2:D115") // { sheet: 'Potentials (2)', address: 'A2:D115' }
 */
export function splitRangeRef(ref: string): { sheet: string | null; address: string } | { name: string } {
  const t = ref.trim();
  const quoted = /^'((?:[^']|'')+)'!(.+)$/.exec(t);
  if (quoted) return { sheet: (quoted[1] as string).replace(/''/g, "'"), address: quoted[2] as string };
  const bare = /^([^!']+)!(.+)$/.exec(t);
  if (bare) return { sheet: bare[1] as string, address: bare[2] as string };
  if (/^\$?[A-Za-z]{1,3}\$?\d+(?::\$?[A-Za-z]{1,3}\$?\d+)?$/.test(t)) return { sheet: null, address: t };
  return { name: t };
}

/**
 * Read the values of a range of the workbook (only reads; nothing is written), for the
 * preview to use the user's potentials table as the sheet formula will.
 *
 * @throws Error naming the reference where the workbook has no such sheet, range or name
 */
export async function readRangeValues(ref: string): Promise<(string | number | boolean)[][]> {
  return Excel.run(async (context) => {
    const where = splitRangeRef(ref);
    let range: Excel.Range;
    if ('name' in where) {
      const item = context.workbook.names.getItemOrNullObject(where.name);
      await context.sync();
      if (item.isNullObject) throw new Error(`the workbook has no range or name "${where.name}".`);
      range = item.getRange();
    } else if (where.sheet === null) {
      range = context.workbook.worksheets.getActiveWorksheet().getRange(where.address);
    } else {
      const sheet = context.workbook.worksheets.getItemOrNullObject(where.sheet);
      await context.sync();
      if (sheet.isNullObject) throw new Error(`the workbook has no sheet named "${where.sheet}".`);
      range = sheet.getRange(where.address);
    }
    range.load('values');
    await context.sync();
    return range.values as (string | number | boolean)[][];
  });
}
