/**
 * `potentia eval FORMULA...`: evaluates formulas (ECHEM functions and ordinary spreadsheet
 * functions, inline arrays `{...}` allowed) and prints each result.
 *
 * Each formula is placed in cell A1 of a sheet of its own and computed exactly as
 * `potentia recalc` computes a workbook cell, so both commands give the same numbers.
 */
import { FLAG, readCommandLine } from './commandLine';
import { HyperFormula } from 'hyperformula';
import type { CellValue as HfCellValue } from 'hyperformula';
import { echemFunctionNames, HF_CONFIG, registerEchemFunctions } from './echemPlugin';
import { EXIT_CELL_ERRORS, EXIT_OK, UsageError } from './io';
import type { Io } from './io';
import { explainError, isHfError, spillSize } from './engineValues';
import { formulaForEngine } from './formulaText';

/** A computed value as eval reports it. */
export type EvalCell = number | string | boolean | null | { error: string; message: string };
/** One formula's result: one value, or rows of values for a spill. */
export type EvalResult = EvalCell | EvalCell[][];

export const EVAL_USAGE = `Usage: potentia eval [--json] [--full] [--allow-errors] FORMULA...

Evaluates each formula and prints its result; a spill prints as rows (tab-separated).
The leading "=" is optional. Text arguments need double quotes, so quote the whole
formula for the shell, e.g.
  npx potentia eval '=ECHEM.POTENTIAL("Cu2+ + 2e- -> Cu", {"Cu2+"}, {0.01}, 25)'
  npx potentia eval "=ECHEM.NERNSTSLOPE(37)" "=ECHEM.LISTTABLE(\\"Cu\\")"

Options:
  --json          one JSON value per formula per line: a number, a string, an array of
                  rows, or {"error": "#VALUE!", "message": "..."}
  --full          print every digit of a number (default: at most 15 significant
                  digits, as a spreadsheet shows them, so 0.1+0.2 prints 0.3)
  --allow-errors  exit 0 even when a result is an error (otherwise exit code 1)
`;

/** Significant digits printed by default: what a spreadsheet cell shows at most. */
export const DISPLAY_DIGITS = 15;

/** A number as printed: rounded to 15 significant digits unless every digit is asked for. */
export function displayNumber(x: number, full = false): number {
  if (full || !Number.isFinite(x) || x === 0) return x;
  return Number(x.toPrecision(DISPLAY_DIGITS));
}

function displayResult(r: EvalResult, full: boolean): EvalResult {
  const cell = (c: EvalCell): EvalCell => (typeof c === 'number' ? displayNumber(c, full) : c);
  return Array.isArray(r) ? r.map((row) => row.map(cell)) : cell(r);
}

function cellOf(v: HfCellValue, echemNames: readonly string[]): EvalCell {
  if (v === null || v === undefined) return null;
  if (isHfError(v)) return { error: v.value, message: explainError(v, echemNames) };
  if (typeof v === 'number' || typeof v === 'string' || typeof v === 'boolean') return v;
  return null;
}

function isErrorCell(c: EvalCell): c is { error: string; message: string } {
  return typeof c === 'object' && c !== null;
}

/** Removes rows and columns at the end of a spill that hold nothing (unused reserved cells). */
function trimSpill(rows: EvalCell[][]): EvalCell[][] {
  let height = rows.length;
  while (height > 1 && (rows[height - 1] ?? []).every((c) => c === null)) height--;
  let width = 0;
  for (let r = 0; r < height; r++) {
    const row = rows[r] ?? [];
    for (let c = row.length - 1; c >= width; c--) {
      if (row[c] !== null) {
        width = c + 1;
        break;
      }
    }
  }
  width = Math.max(1, width);
  return rows.slice(0, height).map((row) => row.slice(0, width));
}

/**
 * Evaluates formulas with the ECHEM functions; returns one result per formula.
 * A result is a single value, or rows of values when the formula spills.
 */
export function evaluateFormulas(formulas: readonly string[]): EvalResult[] {
  registerEchemFunctions();
  const echemNames = echemFunctionNames();
  const sheets: Record<string, string[][]> = {};
  const names = formulas.map((_, i) => `F${i + 1}`);
  formulas.forEach((f, i) => {
    const text = f.trim();
    sheets[names[i] as string] = [[formulaForEngine(text)]];
  });
  const hf = HyperFormula.buildFromSheets(sheets, { ...HF_CONFIG });
  try {
    return names.map((name) => {
      const sheet = hf.getSheetId(name) as number;
      const anchor = { sheet, row: 0, col: 0 };
      const size = spillSize(hf, anchor);
      if (size.width === 1 && size.height === 1) return cellOf(hf.getCellValue(anchor), echemNames);
      const rows = hf
        .getRangeValues({ start: anchor, end: { sheet, row: size.height - 1, col: size.width - 1 } })
        .map((row) => row.map((v) => cellOf(v, echemNames)));
      const trimmed = trimSpill(rows);
      const first = trimmed[0]?.[0];
      // A whole-formula error fills the reserved area with one error: report it once.
      if (
        first !== undefined &&
        isErrorCell(first) &&
        trimmed.every((row) =>
          row.every((c) => isErrorCell(c) && c.error === first.error && c.message === first.message),
        )
      ) {
        return first;
      }
      if (trimmed.length === 1 && trimmed[0]?.length === 1) return first ?? null;
      return trimmed;
    });
  } finally {
    hf.destroy();
  }
}

function hasError(r: EvalResult): boolean {
  if (Array.isArray(r)) return r.some((row) => row.some((c) => isErrorCell(c)));
  return isErrorCell(r);
}

function formatCell(c: EvalCell): string {
  if (c === null) return '';
  if (isErrorCell(c)) return `${c.error} ${c.message}`;
  if (typeof c === 'boolean') return c ? 'TRUE' : 'FALSE';
  return String(c);
}

/** The text printed for one result: one line, or one line per spilled row. */
export function formatResult(r: EvalResult): string {
  if (Array.isArray(r)) return r.map((row) => row.map(formatCell).join('\t')).join('\n');
  return formatCell(r);
}

export function evalCommand(argv: string[], io: Io): number {
  const line = readCommandLine(
    argv,
    io,
    EVAL_USAGE,
    {
      json: FLAG,
      full: FLAG,
      'allow-errors': FLAG,
    },
    'eval needs at least one formula, e.g. npx potentia eval "=ECHEM.NERNSTSLOPE(25)"',
  );
  if (line === null) return EXIT_OK;
  const { values, positionals } = line;
  const empty = positionals.findIndex((p) => p.trim() === '' || p.trim() === '=');
  if (empty >= 0) throw new UsageError(`formula ${empty + 1} is empty`);

  const results = evaluateFormulas(positionals).map((r) => displayResult(r, values.full));
  const multiLine = results.some((r) => Array.isArray(r) && r.length > 1);
  results.forEach((r, i) => {
    if (values.json) {
      io.out(`${JSON.stringify(r)}\n`);
    } else {
      if (multiLine && i > 0) io.out('\n');
      io.out(`${formatResult(r)}\n`);
    }
  });
  return results.some(hasError) && !values['allow-errors'] ? EXIT_CELL_ERRORS : EXIT_OK;
}
