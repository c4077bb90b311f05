/**
 * Workbooks between ExcelJS (the .xlsx file) and HyperFormula (the calculation).
 *
 * Reading: every worksheet's values and formulas go into one HyperFormula sheet of the
 * same name. ExcelJS keeps formulas without the leading "=", gives the followers of a
 * shared formula their translated text through `cell.formula`, and keeps an array formula
 * on its top-left cell with the range in `ref` (the other cells of the range hold cached
 * values only, and are left empty here so that the formula can fill them again).
 * Text is loaded as text (never re-read as a number or a formula), dates as spreadsheet
 * serial numbers, rich text as its plain text, error values as errors.
 *
 * Writing: each formula cell keeps its formula and gets its newly computed result as the
 * cached value (what a spreadsheet program shows before it recalculates). A formula whose
 * result spills over several cells is written as an array formula over the spill range,
 * with the spilled values in the cells of that range, and then marked as a dynamic array
 * (dynamicArrays.ts) when the file is saved.
 */
import type ExcelJS from 'exceljs';
import { excelJs } from './excelModel';
import { HyperFormula } from 'hyperformula';
import type { CellValue as HfCellValue, RawCellContent } from 'hyperformula';
import { HF_CONFIG, registerEchemFunctions } from './echemPlugin';
import { explainError, isHfError, spillSize } from './engineValues';
import type { HfErrorValue } from './engineValues';
import { formulaForEngine, slideFormula } from './formulaText';
import { UsageError } from './io';
import { columnLetters as engineColumnLetters } from '../engine';
import { DEFAULT_MAX_CELLS, ENGINE_MAX_COLUMNS, ENGINE_MAX_ROWS } from './limits';

/** How a formula is stored in the file. */
export type FormulaKind = 'single' | 'shared-master' | 'shared' | 'array';

/** A formula cell found in the workbook. */
export interface FormulaCell {
  sheet: string;
  sheetIndex: number;
  /** 0-based row and column. */
  row: number;
  col: number;
  /** The formula as stored (no leading "="; followers of a shared formula translated). */
  formula: string;
  kind: FormulaKind;
  /** The range of an array formula as stored, e.g. "F5:F16". */
  ref?: string;
}

/** Where a formula cell is: its sheet's name and its 0-based row and column. */
export type FormulaAt = Pick<FormulaCell, 'sheet' | 'row' | 'col'>;

/**
 * The record of one formula cell, as both loading paths (the spreadsheet model and the
 * package's XML) make it: `ref` is kept for an array formula only.
 *
 * @example
 * formulaCell('Cells', 0, 4, 2, 'ECHEM.POTENTIAL(A5)', 'single').col // 2
 */
export function formulaCell(
  sheet: string,
  sheetIndex: number,
  row: number,
  col: number,
  formula: string,
  kind: FormulaKind,
  ref?: string,
): FormulaCell {
  return kind === 'array' && ref
    ? { sheet, sheetIndex, row, col, formula, kind, ref }
    : { sheet, sheetIndex, row, col, formula, kind };
}

/** A workbook ready for HyperFormula. */
export interface LoadedWorkbook {
  sheetNames: string[];
  sheets: Record<string, RawCellContent[][]>;
  formulas: FormulaCell[];
  /** Named ranges as "=Sheet!$A$1:$B$2" formulas. */
  names: { name: string; expression: string }[];
}

/** One cell whose computed value is an error. */
export interface CellErrorReport {
  sheet: string;
  /** A1-style address, e.g. "C5". */
  cell: string;
  code: string;
  message: string;
}

/** What a recalculation did. */
export interface RecalcSummary {
  formulas: number;
  /** Cells written: formula cells plus cells filled by spills. */
  cellsComputed: number;
  errors: CellErrorReport[];
  /** The anchor cells ("E7") of formulas written over a range, by sheet: written as dynamic arrays. */
  spillAnchors: Map<string, Set<string>>;
}

interface FormulaModel {
  formula?: string;
  sharedFormula?: string;
  shareType?: string;
  ref?: string;
  result?: unknown;
}

/** A1 column letters for a 0-based column (the engine's rule counts columns from 1). */
export function columnLetters(col: number): string {
  return engineColumnLetters(col + 1);
}

/** "C5" for 0-based row 4, column 2. */
export function a1(row: number, col: number): string {
  return `${columnLetters(col)}${row + 1}`;
}

/** 0-based row and column of an A1 address ("$C$5" too), or undefined. */
export function parseA1(text: string): { row: number; col: number } | undefined {
  const m = /^\$?([A-Za-z]{1,3})\$?(\d+)$/.exec(text.trim());
  if (!m || m[1] === undefined || m[2] === undefined) return undefined;
  let col = 0;
  for (const ch of m[1].toUpperCase()) col = col * 26 + (ch.charCodeAt(0) - 64);
  return { row: Number(m[2]) - 1, col: col - 1 };
}

/** The corners (0-based) of an A1 range ("B2:D9", or one cell), or undefined. */
export function parseRange(
  ref: string,
): { top: number; left: number; bottom: number; right: number } | undefined {
  const [from, to] = ref.split(':');
  const a = from === undefined ? undefined : parseA1(from);
  const b = to === undefined ? a : parseA1(to);
  if (!a || !b) return undefined;
  return {
    top: Math.min(a.row, b.row),
    left: Math.min(a.col, b.col),
    bottom: Math.max(a.row, b.row),
    right: Math.max(a.col, b.col),
  };
}

const EXCEL_EPOCH_MS = Date.UTC(1899, 11, 30);

/** The spreadsheet serial number of a date (1900 date system, as ExcelJS reads it). */
function dateSerial(d: Date): number {
  return (d.getTime() - EXCEL_EPOCH_MS) / 86400000;
}

export { formulaForEngine } from './formulaText';

export const ERROR_LITERALS = new Set(['#N/A', '#REF!', '#NAME?', '#DIV/0!', '#NULL!', '#VALUE!', '#NUM!']);

/** A plain (non-formula) cell value as HyperFormula raw content. */
function valueForEngine(v: ExcelJS.CellValue): RawCellContent {
  if (v === null || v === undefined) return null;
  if (typeof v === 'number') return v;
  if (typeof v === 'boolean') return v;
  // A leading apostrophe makes HyperFormula keep text as text ("1.5", "=x", "TRUE").
  if (typeof v === 'string') return `'${v}`;
  if (v instanceof Date) return dateSerial(v);
  if (typeof v === 'object') {
    if ('richText' in v && Array.isArray(v.richText)) return `'${v.richText.map((r) => r.text).join('')}`;
    if ('error' in v && typeof v.error === 'string') return ERROR_LITERALS.has(v.error) ? v.error : '#VALUE!';
    if ('text' in v && typeof v.text === 'string') return `'${v.text}`;
    if ('result' in v) return valueForEngine(v.result as ExcelJS.CellValue);
  }
  return null;
}

/**
 * The formula of a shared-formula follower (0-based row, column), from its master's text:
 * string literals untouched (ExcelJS's own translation also moves "Cu2" inside text).
 */
function followerFormula(
  ws: ExcelJS.Worksheet,
  master: string,
  row: number,
  col: number,
): string | undefined {
  const at = parseA1(master);
  const text = at === undefined ? undefined : ws.getCell(at.row + 1, at.col + 1).formula;
  return at === undefined || typeof text !== 'string' || text === ''
    ? undefined
    : slideFormula(text, at, { row, col });
}

/**
 * Refuses a sheet larger than the calculation engine holds.
 *
 * @throws UsageError naming the sheet, its last row or column and the limit
 */
export function checkSheetSize(name: string, lastRow: number, lastColumn: number): void {
  if (lastRow > ENGINE_MAX_ROWS) {
    throw new UsageError(
      `sheet "${name}" has data down to row ${lastRow.toLocaleString('en-US')}; the calculation engine holds ` +
        `${ENGINE_MAX_ROWS.toLocaleString('en-US')} rows a sheet: split the sheet, or clear the cells below row ` +
        `${ENGINE_MAX_ROWS.toLocaleString('en-US')} that hold stray content`,
    );
  }
  if (lastColumn > ENGINE_MAX_COLUMNS) {
    throw new UsageError(
      `sheet "${name}" has data in column ${lastColumn.toLocaleString('en-US')}; the calculation engine holds ` +
        `${ENGINE_MAX_COLUMNS.toLocaleString('en-US')} columns a sheet`,
    );
  }
}

/**
 * Reads a workbook's sheets, values and formulas for HyperFormula.
 *
 * @param maxCells the most cells an array formula's range may cover (a range larger than
 *   that, or past the engine's sheet size, is refused as damaged)
 * @throws UsageError for a sheet larger than the calculation engine holds or an array
 *   formula whose range is larger than any data
 */
export function loadWorkbook(wb: ExcelJS.Workbook, maxCells: number = DEFAULT_MAX_CELLS): LoadedWorkbook {
  const { ValueType } = excelJs();
  const sheetNames: string[] = [];
  const sheets: Record<string, RawCellContent[][]> = {};
  const formulas: FormulaCell[] = [];

  wb.worksheets.forEach((ws, sheetIndex) => {
    const name = ws.name;
    sheetNames.push(name);
    checkSheetSize(name, ws.rowCount, ws.columnCount);
    const grid: RawCellContent[][] = [];
    const put = (row: number, col: number, content: RawCellContent): void => {
      while (grid.length <= row) grid.push([]);
      const r = grid[row] as RawCellContent[];
      while (r.length < col) r.push(null);
      r[col] = content;
    };

    // Cells covered by an array formula other than its top-left cell.
    const covered = new Set<string>();
    ws.eachRow({ includeEmpty: false }, (row) => {
      row.eachCell({ includeEmpty: false }, (cell) => {
        const m = cell.value as FormulaModel | null;
        if (cell.type === ValueType.Formula && m && m.shareType === 'array' && m.ref) {
          const rg = parseRange(m.ref);
          if (!rg) return;
          const area = (rg.bottom - rg.top + 1) * (rg.right - rg.left + 1);
          if (area > maxCells || rg.bottom >= ENGINE_MAX_ROWS || rg.right >= ENGINE_MAX_COLUMNS) {
            throw new UsageError(
              `the array formula in ${name}!${a1(Number(cell.row) - 1, Number(cell.col) - 1)} claims the range ${m.ref} ` +
                `(${area.toLocaleString('en-US')} cells), larger than the sheet's data or the engine's sheet; ` +
                'the file is damaged: re-enter the formula in a spreadsheet program and save again',
            );
          }
          for (let r = rg.top; r <= rg.bottom; r++) {
            for (let c = rg.left; c <= rg.right; c++) {
              if (r !== Number(cell.row) - 1 || c !== Number(cell.col) - 1) covered.add(`${r},${c}`);
            }
          }
        }
      });
    });

    ws.eachRow({ includeEmpty: false }, (row) => {
      row.eachCell({ includeEmpty: false }, (cell) => {
        const r = Number(cell.row) - 1;
        const c = Number(cell.col) - 1;
        if (covered.has(`${r},${c}`)) return;
        // The followers of a merged range repeat the first cell's value: they are empty.
        if (cell.type === ValueType.Merge) return;
        if (cell.type === ValueType.Formula) {
          const m = cell.value as FormulaModel;
          const text =
            m.sharedFormula === undefined ? cell.formula : followerFormula(ws, m.sharedFormula, r, c);
          if (typeof text !== 'string' || text === '') {
            // A shared-formula follower whose master is missing: keep the cached value.
            put(r, c, valueForEngine(cell.result as ExcelJS.CellValue));
            return;
          }
          let kind: FormulaKind = 'single';
          if (m.shareType === 'array') kind = 'array';
          else if (m.sharedFormula !== undefined) kind = 'shared';
          else if (m.shareType === 'shared') kind = 'shared-master';
          formulas.push(formulaCell(name, sheetIndex, r, c, text, kind, m.ref));
          put(r, c, formulaForEngine(text));
          return;
        }
        put(r, c, valueForEngine(cell.value));
      });
    });
    sheets[name] = grid;
  });

  const names: { name: string; expression: string }[] = [];
  const model = (wb.definedNames as unknown as { model?: { name: string; ranges: string[] }[] }).model ?? [];
  for (const dn of model) {
    if (dn.ranges.length !== 1 || dn.ranges[0] === undefined) continue;
    names.push({ name: dn.name, expression: `=${dn.ranges[0]}` });
  }
  return { sheetNames, sheets, formulas, names };
}

/** Builds a HyperFormula engine (with the ECHEM functions) and computes the workbook. */
export function buildEngine(loaded: Pick<LoadedWorkbook, 'sheets' | 'names'>): {
  hf: HyperFormula;
  warnings: string[];
} {
  registerEchemFunctions();
  let hf: HyperFormula;
  try {
    hf = HyperFormula.buildFromSheets(loaded.sheets, { ...HF_CONFIG });
  } catch (e) {
    // The engine refuses what it cannot hold (sheet size, names): a limit, not a bug.
    const message = e instanceof Error ? e.message : String(e);
    if (e instanceof Error && /limit|exceed|size|invalid|sheet/i.test(`${e.name} ${message}`)) {
      throw new UsageError(`the calculation engine cannot load this workbook: ${message}`);
    }
    throw e;
  }
  const warnings: string[] = [];
  for (const n of loaded.names) {
    try {
      if (hf.isItPossibleToAddNamedExpression(n.name, n.expression))
        hf.addNamedExpression(n.name, n.expression);
      else warnings.push(`defined name ${n.name} (${n.expression}) was not loaded`);
    } catch (e) {
      warnings.push(`defined name ${n.name} was not loaded: ${e instanceof Error ? e.message : String(e)}`);
    }
  }
  return { hf, warnings };
}

/** Error codes a spreadsheet file may cache; HyperFormula's own ones are stored as #VALUE!. */
const FILE_ERROR_CODES = new Set([...ERROR_LITERALS, '#SPILL!', '#CALC!']);

/** A computed value as a cached result of the file (ExcelJS's shape). */
export function resultForFile(v: HfCellValue): number | string | boolean | { error: string } | undefined {
  if (v === null || v === undefined) return undefined;
  if (isHfError(v)) return { error: FILE_ERROR_CODES.has(v.value) ? v.value : '#VALUE!' };
  if (typeof v === 'number' || typeof v === 'string' || typeof v === 'boolean') return v;
  return undefined;
}

/** The message of an error, naming the cell it comes from when that is another cell. */
function withOrigin(v: HfErrorValue, f: FormulaAt, echemNames: readonly string[]): string {
  const message = explainError(v, echemNames);
  const origin = (v as { address?: unknown }).address;
  if (typeof origin !== 'string' || origin === '') return message;
  const here = `${f.sheet}!${a1(f.row, f.col)}`;
  const same = origin === here || origin.replace(/'/g, '') === here;
  return same ? message : `${message} (from ${origin})`;
}

/** The report of a formula cell that computed to an error. */
export function errorReport(
  value: HfErrorValue,
  f: FormulaAt,
  echemNames: readonly string[],
): CellErrorReport {
  return {
    sheet: f.sheet,
    cell: a1(f.row, f.col),
    code: value.value,
    message: withOrigin(value, f, echemNames),
  };
}

/**
 * Writes the computed values into the ExcelJS workbook: formulas kept, cached results set,
 * spills written as array formulas over their range. Returns the summary.
 */
export function writeResults(
  wb: ExcelJS.Workbook,
  loaded: LoadedWorkbook,
  hf: HyperFormula,
  echemNames: readonly string[],
  onProgress?: (done: number) => void,
): RecalcSummary {
  const errors: CellErrorReport[] = [];
  const spillAnchors = new Map<string, Set<string>>();
  let cellsComputed = 0;
  let done = 0;
  for (const f of loaded.formulas) {
    const ws = wb.worksheets[f.sheetIndex];
    const sheetId = hf.getSheetId(f.sheet);
    if (ws === undefined || sheetId === undefined) continue;
    const address = { sheet: sheetId, row: f.row, col: f.col };
    const value = hf.getCellValue(address);
    const size = spillSize(hf, address);
    const cell = ws.getCell(f.row + 1, f.col + 1);
    const model = cell.value as FormulaModel;
    const result = resultForFile(value);

    if (isHfError(value)) errors.push(errorReport(value, f, echemNames));

    const spills = size.width > 1 || size.height > 1;
    if (spills || f.kind === 'array') {
      let onSheet = spillAnchors.get(f.sheet);
      if (onSheet === undefined) spillAnchors.set(f.sheet, (onSheet = new Set()));
      onSheet.add(a1(f.row, f.col));
      const ref = `${a1(f.row, f.col)}:${a1(f.row + size.height - 1, f.col + size.width - 1)}`;
      cell.value = { formula: f.formula, shareType: 'array', ref, result } as unknown as ExcelJS.CellValue;
      // Cells of the stored array range that the new result no longer covers are emptied.
      const old = f.ref === undefined ? undefined : parseRange(f.ref);
      if (old) {
        for (let r = old.top; r <= old.bottom; r++) {
          for (let c = old.left; c <= old.right; c++) {
            if (r < f.row || c < f.col || r >= f.row + size.height || c >= f.col + size.width) {
              ws.getCell(r + 1, c + 1).value = null;
            }
          }
        }
      }
      for (let r = 0; r < size.height; r++) {
        for (let c = 0; c < size.width; c++) {
          if (r === 0 && c === 0) continue;
          const v = hf.getCellValue({ sheet: sheetId, row: f.row + r, col: f.col + c });
          const other = ws.getCell(f.row + r + 1, f.col + c + 1);
          const cached = resultForFile(v);
          other.value = (cached === undefined ? null : cached) as ExcelJS.CellValue;
          cellsComputed++;
          if (isHfError(v) && !isHfError(value)) {
            errors.push({
              sheet: f.sheet,
              cell: a1(f.row + r, f.col + c),
              code: v.value,
              message: explainError(v, echemNames),
            });
          }
        }
      }
    } else if (f.kind === 'shared' && model.sharedFormula !== undefined) {
      cell.value = { sharedFormula: model.sharedFormula, result } as unknown as ExcelJS.CellValue;
    } else if (f.kind === 'shared-master') {
      cell.value = {
        formula: f.formula,
        shareType: 'shared',
        ref: model.ref,
        result,
      } as unknown as ExcelJS.CellValue;
    } else {
      cell.value = { formula: f.formula, result } as unknown as ExcelJS.CellValue;
    }
    cellsComputed++;
    done++;
    onProgress?.(done);
  }
  return { formulas: loaded.formulas.length, cellsComputed, errors, spillAnchors };
}
