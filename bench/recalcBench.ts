/**
 * Benchmark helper (not a test): headless recalculation of a 10,000-row workbook of
 * ECHEM.POTENTIAL formulas against the same workbook written with plain spreadsheet
 * arithmetic for the Nernst equation, in the same runner (HyperFormula with the ECHEM
 * plugin). PRODUCT.md: the ECHEM workbook may take at most 1.5× the plain one.
 *
 * Run: npx ts-node --transpile-only bench/recalcBench.ts [rows] [runs]
 * or call runRecalcBench() from another benchmark script.
 *
 * Each run builds a fresh engine from the sheets, which parses every formula and computes
 * every cell; the figure is the median of `runs` runs after `warmup` runs. A second pair of
 * figures times the whole `potentia recalc` path in memory (ExcelJS workbook in, cached
 * values written into it), which adds the same file-model work to both workbooks.
 */
import ExcelJS from 'exceljs';
import { HyperFormula } from 'hyperformula';
import type { RawCellContent } from 'hyperformula';
import { HF_CONFIG, registerEchemFunctions } from '../src/cli/echemPlugin';
import { recalcWorkbook } from '../src/cli/recalcCommand';

export interface RecalcBenchOptions {
  rows?: number;
  runs?: number;
  warmup?: number;
  /** Also time the full in-memory recalc path through ExcelJS (slower). */
  withExcelJs?: boolean;
}

export interface RecalcBenchResult {
  rows: number;
  runs: number;
  /** Median milliseconds, engine only (parse + compute). */
  echemMs: number;
  plainMs: number;
  ratio: number;
  /** The same with the formulas reading a 40-row Potentials range as their `table`. */
  echemTableMs: number;
  ratioTable: number;
  /** Median milliseconds of the in-memory recalc path (when asked for). */
  echemWorkbookMs?: number;
  plainWorkbookMs?: number;
  ratioWorkbook?: number;
  /** Largest |E(ECHEM) − E(plain)| over the rows, in V (a sanity check of the two workbooks). */
  maxDifferenceV: number;
}

const HALF = 'Cu2+ + 2 e- -> Cu';
const E0 = 0.337;

/** Invented inputs: a(Cu2+) from 1e-6 to 1, temperatures 5–60 °C. */
function inputs(i: number): [number, number] {
  const a = Math.pow(10, -6 + (6 * (i % 997)) / 996);
  const t = 5 + (i % 56);
  return [a, t];
}

/** Sheets of the ECHEM workbook: species header in A1, a(Cu2+) in A, °C in B, E in C. */
export function echemSheets(rows: number, withTable = false): Record<string, RawCellContent[][]> {
  const cases: RawCellContent[][] = [['Cu2+', 'temp_C', 'E (V)']];
  const table = withTable ? ',Potentials!$A$2:$D$40' : '';
  for (let i = 0; i < rows; i++) {
    const [a, t] = inputs(i);
    const r = i + 2;
    cases.push([a, t, `=ECHEM.POTENTIAL("${HALF}",$A$1,A${r},B${r}${table})`]);
  }
  const sheets: Record<string, RawCellContent[][]> = { Cases: cases };
  if (withTable) {
    // E° without dE°/dT, so that both workbooks compute the same numbers.
    sheets.Potentials = [
      ['half-reaction', 'E° (V)', 'dE°/dT (mV/K)', 'source'],
      [HALF, E0, null, 'OpenStax Chemistry 2e, Appendix L'],
      ['Zn2+ + 2 e- -> Zn', -0.7618, null, 'OpenStax Chemistry 2e, Appendix L'],
      ['Ag+ + e- -> Ag', 0.7996, null, 'OpenStax Chemistry 2e, Appendix L'],
    ];
  }
  return sheets;
}

/** Sheets of the plain workbook: E° in E1, n in F1, and the Nernst equation as users write it. */
export function plainSheets(rows: number): Record<string, RawCellContent[][]> {
  const cases: RawCellContent[][] = [['Cu2+', 'temp_C', 'E (V)', null, E0, 2]];
  for (let i = 0; i < rows; i++) {
    const [a, t] = inputs(i);
    const r = i + 2;
    cases.push([a, t, `=$E$1-(8.314462618*(B${r}+273.15)/($F$1*96485.33212))*LN(1/A${r})`]);
  }
  return { Cases: cases };
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const m = Math.floor(s.length / 2);
  return s.length % 2 === 1 ? (s[m] as number) : ((s[m - 1] as number) + (s[m] as number)) / 2;
}

function timeBuild(sheets: Record<string, RawCellContent[][]>): number {
  const t0 = process.hrtime.bigint();
  const hf = HyperFormula.buildFromSheets(sheets, { ...HF_CONFIG });
  const ms = Number(process.hrtime.bigint() - t0) / 1e6;
  hf.destroy();
  return ms;
}

function toWorkbook(sheets: Record<string, RawCellContent[][]>): ExcelJS.Workbook {
  const wb = new ExcelJS.Workbook();
  for (const [name, rows] of Object.entries(sheets)) {
    const ws = wb.addWorksheet(name);
    rows.forEach((row, r) =>
      row.forEach((v, c) => {
        if (v === null || v === undefined) return;
        const cell = ws.getCell(r + 1, c + 1);
        cell.value =
          typeof v === 'string' && v.startsWith('=')
            ? ({ formula: v.slice(1) } as ExcelJS.CellFormulaValue)
            : (v as ExcelJS.CellValue);
      }),
    );
  }
  return wb;
}

function timeWorkbook(sheets: Record<string, RawCellContent[][]>): number {
  const wb = toWorkbook(sheets);
  const t0 = process.hrtime.bigint();
  recalcWorkbook(wb);
  return Number(process.hrtime.bigint() - t0) / 1e6;
}

/** Interleaves the contenders run by run, so drifts in machine load hit both alike. */
function medians(contenders: (() => number)[], runs: number, warmup: number): number[] {
  for (let w = 0; w < warmup; w++) contenders.forEach((f) => f());
  const times = contenders.map(() => [] as number[]);
  for (let r = 0; r < runs; r++) contenders.forEach((f, i) => (times[i] as number[]).push(f()));
  return times.map(median);
}

function maxDifference(rows: number): number {
  const a = HyperFormula.buildFromSheets(echemSheets(rows, true), { ...HF_CONFIG });
  const b = HyperFormula.buildFromSheets(plainSheets(rows), { ...HF_CONFIG });
  let max = 0;
  for (let r = 1; r <= rows; r++) {
    const x = a.getCellValue({ sheet: 0, row: r, col: 2 });
    const y = b.getCellValue({ sheet: 0, row: r, col: 2 });
    max = typeof x === 'number' && typeof y === 'number' ? Math.max(max, Math.abs(x - y)) : Infinity;
  }
  a.destroy();
  b.destroy();
  return max;
}

export function runRecalcBench(options: RecalcBenchOptions = {}): RecalcBenchResult {
  registerEchemFunctions();
  const rows = options.rows ?? 10000;
  const runs = options.runs ?? 9;
  const warmup = options.warmup ?? 3;
  const echem = echemSheets(rows);
  const echemTable = echemSheets(rows, true);
  const plain = plainSheets(rows);
  const [echemMs, echemTableMs, plainMs] = medians(
    [() => timeBuild(echem), () => timeBuild(echemTable), () => timeBuild(plain)],
    runs,
    warmup,
  ) as [number, number, number];
  const result: RecalcBenchResult = {
    rows,
    runs,
    echemMs,
    plainMs,
    ratio: echemMs / plainMs,
    echemTableMs,
    ratioTable: echemTableMs / plainMs,
    maxDifferenceV: maxDifference(rows),
  };
  if (options.withExcelJs) {
    const [ew, pw] = medians(
      [() => timeWorkbook(echemTable), () => timeWorkbook(plain)],
      Math.max(3, Math.ceil(runs / 3)),
      1,
    ) as [number, number];
    result.echemWorkbookMs = ew;
    result.plainWorkbookMs = pw;
    result.ratioWorkbook = ew / pw;
  }
  return result;
}

/** The figures as printed lines. */
export function formatRecalcBench(r: RecalcBenchResult): string {
  const f = (x: number): string => x.toFixed(1);
  const lines = [
    `headless recalc, ${r.rows.toLocaleString('en-US')} rows, median of ${r.runs} runs (HyperFormula + ECHEM plugin):`,
    `  plain Nernst arithmetic          ${f(r.plainMs)} ms`,
    `  ECHEM.POTENTIAL (built-in table) ${f(r.echemMs)} ms   ratio ${r.ratio.toFixed(2)} (target <= 1.5)`,
    `  ECHEM.POTENTIAL (Potentials!A2:D40 as table) ${f(r.echemTableMs)} ms   ratio ${r.ratioTable.toFixed(2)}`,
  ];
  if (r.echemWorkbookMs !== undefined && r.plainWorkbookMs !== undefined && r.ratioWorkbook !== undefined) {
    lines.push(
      `  whole in-memory recalc via ExcelJS: ECHEM ${f(r.echemWorkbookMs)} ms, plain ${f(r.plainWorkbookMs)} ms, ratio ${r.ratioWorkbook.toFixed(2)}`,
    );
  }
  lines.push(`  largest |E(ECHEM) - E(plain)| ${r.maxDifferenceV.toExponential(2)} V`);
  return lines.join('\n');
}

if (require.main === module) {
  const rows = Number(process.argv[2] ?? 10000);
  const runs = Number(process.argv[3] ?? 9);
  console.log(formatRecalcBench(runRecalcBench({ rows, runs, withExcelJs: true })));
}
