/**
 * Recalculation benchmarks: the same workbook of Daniell-cell cases written twice, once
 * with ECHEM.POTENTIAL and once in plain spreadsheet arithmetic, with IDENTICAL chemistry:
 * both read E° and dE°/dT from the same Potentials sheet (published values, see
 * reference.ts) and both use the exact SI R and F. Every computed cell is compared with the
 * hand-written Nernst equation and the two workbooks with each other, cell by cell, within
 * 1e-9 V.
 *
 * Three peers:
 * - in process, through the runner's own functions (read the file, load it into the engine,
 *   evaluate, write values into the workbook, write the file), each phase timed separately;
 *   the engine phase also split into parse/graph and evaluation (evaluation suspended while
 *   loading, then resumed);
 * - end to end, `node bin/potentia.js recalc` as a user runs it (wall time, peak RSS);
 * - LibreOffice headless (where /usr/bin/soffice exists), which recalculates the plain
 *   workbook on load (a private profile sets "always recalculate") and writes it back.
 *
 * Run alone: npx ts-node --transpile-only bench/recalcBench.ts [rows] [runs]
 */
import { spawnSync } from 'child_process';
import * as fs from 'fs';
import * as os from 'os';
import * as path from 'path';
import ExcelJS from 'exceljs';
import { HyperFormula } from 'hyperformula';
import type { RawCellContent } from 'hyperformula';
import {
  COPPER,
  DANIELL_DIAGRAM,
  FARADAY,
  GAS_CONSTANT,
  WORKBOOK_TOLERANCE_V,
  ZINC,
  caseInputs,
  daniellEmfV,
} from './reference';
import { CheckFailure, collectGarbage, recordChecked, stat, type Stat } from './stats';
import { POTENTIA_BIN } from './firstCall';

const ROOT = path.resolve(__dirname, '..');
export const SOFFICE = '/usr/bin/soffice';
const GNU_TIME = '/usr/bin/time';

export type Side = 'echem' | 'plain';

/** A peer that could not run to the end (as opposed to a wrong output, a CheckFailure). */
export class RunFailure extends Error {
  constructor(what: string, detail: string) {
    super(`${what}: ${detail}`);
    this.name = 'RunFailure';
  }
}

/** Column of the result (0-based) on the Cases sheet; row 0 is the header. */
const RESULT_COL = 3;

/** The Potentials sheet both workbooks read: header, Zn2+/Zn (row 2), Cu2+/Cu (row 3). */
function potentialsSheet(): RawCellContent[][] {
  return [
    ['half-reaction', 'E° (V)', 'dE°/dT (mV/K)', 'source'],
    [ZINC.halfReaction, ZINC.e0V, ZINC.dE0dTmVperK, ZINC.source],
    [COPPER.halfReaction, COPPER.e0V, COPPER.dE0dTmVperK, COPPER.source],
  ];
}

/** The formula of case row r (1-based sheet row) on each side. */
export function caseFormula(side: Side, r: number): string {
  if (side === 'echem')
    return `=ECHEM.POTENTIAL("${DANIELL_DIAGRAM}",$A$1:$B$1,A${r}:B${r},C${r},Potentials!$A$2:$D$3)`;
  // E = E°(Cu) − E°(Zn) + (dE°/dT(Cu) − dE°/dT(Zn))/1000·(T − 25) − RT/(2F)·ln(aZn/aCu)
  return (
    `=(Potentials!$B$3-Potentials!$B$2)+(Potentials!$C$3-Potentials!$C$2)/1000*(C${r}-25)` +
    `-${GAS_CONSTANT}*(C${r}+273.15)/(2*${FARADAY})*LN(A${r}/B${r})`
  );
}

/** The case sheets of a layout: "Cases", or "Cases1"…"CasesK" where the cases are split over K sheets. */
export function caseSheetNames(sheets: number): string[] {
  return sheets === 1 ? ['Cases'] : Array.from({ length: sheets }, (_, k) => `Cases${k + 1}`);
}

/** Cases per case sheet (the last may hold fewer). */
function perSheet(rows: number, sheets: number): number {
  return Math.ceil(rows / sheets);
}

/**
 * The sheets of one side: the case sheets (a(Zn2+) | a(Cu2+) | temp_C | E, case i on sheet
 * ⌊i/perSheet⌋) and Potentials.
 */
export function workbookSheets(side: Side, rows: number, sheets = 1): Record<string, RawCellContent[][]> {
  const out: Record<string, RawCellContent[][]> = {};
  const per = perSheet(rows, sheets);
  caseSheetNames(sheets).forEach((name, k) => {
    const cases: RawCellContent[][] = [['Zn2+', 'Cu2+', 'temp_C', 'E (V)']];
    for (let i = k * per; i < Math.min(rows, (k + 1) * per); i++) {
      const c = caseInputs(i);
      cases.push([c.aZn, c.aCu, c.tempC, caseFormula(side, i - k * per + 2)]);
    }
    out[name] = cases;
  });
  out.Potentials = potentialsSheet();
  return out;
}

/** The expected E of every case row, by hand. */
function expectedColumn(rows: number): Float64Array {
  const out = new Float64Array(rows);
  for (let i = 0; i < rows; i++) {
    const c = caseInputs(i);
    out[i] = daniellEmfV(c.aZn, c.aCu, c.tempC);
  }
  return out;
}

/** Writes one side's workbook as .xlsx, formulas without cached values (so every peer must compute). */
export async function writeWorkbookFile(side: Side, rows: number, file: string, sheets = 1): Promise<void> {
  const wb = new ExcelJS.Workbook();
  for (const [name, grid] of Object.entries(workbookSheets(side, rows, sheets))) {
    const ws = wb.addWorksheet(name);
    grid.forEach((row, r) =>
      row.forEach((v, c) => {
        if (v === null || v === undefined) return;
        ws.getCell(r + 1, c + 1).value =
          typeof v === 'string' && v.startsWith('=')
            ? ({ formula: v.slice(1) } as ExcelJS.CellFormulaValue)
            : (v as ExcelJS.CellValue);
      }),
    );
  }
  await wb.xlsx.writeFile(file);
}

/** Checks the computed column of a side: every row against the hand-written Nernst equation. */
function checkValues(what: string, values: readonly unknown[], expected: Float64Array): void {
  if (values.length !== expected.length)
    throw new CheckFailure(what, `${values.length} results, expected ${expected.length}`);
  for (let i = 0; i < expected.length; i++) {
    const v = values[i];
    if (typeof v !== 'number' || !(Math.abs(v - expected[i]!) <= WORKBOOK_TOLERANCE_V))
      throw new CheckFailure(
        what,
        `Cases!D${i + 2} is ${JSON.stringify(v)}, expected ${expected[i]} (±${WORKBOOK_TOLERANCE_V} V)`,
      );
  }
  recordChecked(what, expected.length);
}

/** The two sides cell by cell. */
function compareSides(what: string, a: readonly unknown[], b: readonly unknown[]): number {
  let max = 0;
  for (let i = 0; i < a.length; i++) {
    const x = a[i];
    const y = b[i];
    if (typeof x !== 'number' || typeof y !== 'number' || !(Math.abs(x - y) <= WORKBOOK_TOLERANCE_V))
      throw new CheckFailure(
        what,
        `Cases!D${i + 2}: ECHEM ${JSON.stringify(x)} vs plain ${JSON.stringify(y)}`,
      );
    max = Math.max(max, Math.abs(x - y));
  }
  recordChecked(what, a.length);
  return max;
}

/** The cached results of column D of a written .xlsx (rows 2…). */
async function readResultColumn(file: string, rows: number, sheets = 1): Promise<unknown[]> {
  const wb = new ExcelJS.Workbook();
  await wb.xlsx.readFile(file);
  const out = new Array<unknown>(rows);
  const per = perSheet(rows, sheets);
  caseSheetNames(sheets).forEach((name, k) => {
    const ws = wb.getWorksheet(name);
    if (!ws) throw new CheckFailure('recalc', `${file} has no ${name} sheet`);
    for (let i = k * per; i < Math.min(rows, (k + 1) * per); i++) {
      const v = ws.getCell(i - k * per + 2, RESULT_COL + 1).value as unknown;
      out[i] = typeof v === 'object' && v !== null && 'result' in v ? (v as { result: unknown }).result : v;
    }
  });
  return out;
}

// ---------------------------------------------------------------------------
// In process, through the runner's own functions (looked up at run time, so that the
// benchmark keeps working while the runner's modules are reorganised; what is missing is
// reported, not guessed).

interface RunnerApi {
  readWorkbook: (file: string) => Promise<ExcelJS.Workbook>;
  loadWorkbook?: (wb: ExcelJS.Workbook) => unknown;
  buildEngine?: (loaded: unknown) => { hf: HyperFormula };
  writeResults?: (
    wb: ExcelJS.Workbook,
    loaded: unknown,
    hf: HyperFormula,
    names: readonly string[],
  ) => unknown;
  recalcWorkbook?: (wb: ExcelJS.Workbook) => unknown;
  echemFunctionNames: () => string[];
  hfConfig: Record<string, unknown>;
  register: () => void;
}

function tryRequire(rel: string): Record<string, unknown> {
  try {
    // eslint-disable-next-line @typescript-eslint/no-require-imports
    return require(rel) as Record<string, unknown>;
  } catch {
    return {};
  }
}

function fn<T>(mod: Record<string, unknown>, name: string): T | undefined {
  return typeof mod[name] === 'function' ? (mod[name] as T) : undefined;
}

/** The runner's functions the benchmark times; throws where even the plugin is missing. */
export function runnerApi(): RunnerApi {
  const plugin = tryRequire('../src/cli/echemPlugin');
  const workbook = tryRequire('../src/cli/workbook');
  const command = tryRequire('../src/cli/recalcCommand');
  const register = fn<() => void>(plugin, 'registerEchemFunctions');
  const names = fn<() => string[]>(plugin, 'echemFunctionNames');
  if (!register || !names || typeof plugin.HF_CONFIG !== 'object')
    throw new Error(
      'src/cli/echemPlugin no longer exports registerEchemFunctions, echemFunctionNames and HF_CONFIG',
    );
  const readWb = fn<(file: string) => Promise<ExcelJS.Workbook>>(command, 'readWorkbookFile');
  return {
    readWorkbook:
      readWb ??
      (async (file: string) => {
        const wb = new ExcelJS.Workbook();
        await wb.xlsx.readFile(file);
        return wb;
      }),
    loadWorkbook: fn(workbook, 'loadWorkbook'),
    buildEngine: fn(workbook, 'buildEngine'),
    writeResults: fn(workbook, 'writeResults'),
    recalcWorkbook: fn(command, 'recalcWorkbook'),
    echemFunctionNames: names,
    hfConfig: plugin.HF_CONFIG as Record<string, unknown>,
    register,
  };
}

/** Milliseconds of each phase of one in-process recalculation. */
export interface PhaseMs {
  readFile: number;
  /** ExcelJS model → engine sheets (the runner's loadWorkbook). */
  toEngine: number;
  /** HyperFormula built from the sheets, every formula computed (the runner's buildEngine). */
  engine: number;
  /** Computed values written into the workbook model (the runner's writeResults). */
  writeCells: number;
  writeFile: number;
  total: number;
}

async function timed<T>(f: () => T | Promise<T>): Promise<[T, number]> {
  const t0 = process.hrtime.bigint();
  const v = await f();
  return [v, Number(process.hrtime.bigint() - t0) / 1e6];
}

/** One in-process recalculation of `file`, phases timed; returns the computed column too. */
async function inProcessOnce(
  api: RunnerApi,
  file: string,
  out: string,
  rows: number,
): Promise<{ ms: PhaseMs; values: unknown[] }> {
  collectGarbage();
  const [wb, readFile] = await timed(() => api.readWorkbook(file));
  let toEngine = 0;
  let engine = 0;
  let writeCells = 0;
  let values: unknown[];
  if (api.loadWorkbook && api.buildEngine && api.writeResults) {
    const [loaded, a] = await timed(() => api.loadWorkbook!(wb));
    toEngine = a;
    const [{ hf }, b] = await timed(() => api.buildEngine!(loaded));
    engine = b;
    try {
      const sheet = hf.getSheetId('Cases');
      if (sheet === undefined) throw new CheckFailure('recalc', 'the engine has no Cases sheet');
      values = [];
      for (let i = 0; i < rows; i++) values.push(hf.getCellValue({ sheet, row: i + 1, col: RESULT_COL }));
      const [, c] = await timed(() => api.writeResults!(wb, loaded, hf, api.echemFunctionNames()));
      writeCells = c;
    } finally {
      hf.destroy();
    }
  } else if (api.recalcWorkbook) {
    // The runner no longer exposes its phases: engine and cell writing are timed together.
    const [, b] = await timed(() => api.recalcWorkbook!(wb));
    engine = b;
    const ws = wb.getWorksheet('Cases');
    values = [];
    for (let i = 0; i < rows; i++) {
      const v = ws?.getCell(i + 2, RESULT_COL + 1).value as unknown;
      values.push(
        typeof v === 'object' && v !== null && 'result' in v ? (v as { result: unknown }).result : v,
      );
    }
  } else {
    throw new Error('src/cli exports neither loadWorkbook/buildEngine/writeResults nor recalcWorkbook');
  }
  const [, writeFile] = await timed(() => wb.xlsx.writeFile(out));
  const total = readFile + toEngine + engine + writeCells + writeFile;
  return { ms: { readFile, toEngine, engine, writeCells, writeFile, total }, values };
}

/** The engine alone, split: sheets set with evaluation suspended (parse, graph), then resumed (evaluation). */
function engineSplitOnce(
  api: RunnerApi,
  sheets: Record<string, RawCellContent[][]>,
  rows: number,
): { parseMs: number; evalMs: number; values: unknown[] } {
  collectGarbage();
  const t0 = process.hrtime.bigint();
  const hf = HyperFormula.buildEmpty({ ...api.hfConfig });
  try {
    hf.suspendEvaluation();
    for (const name of Object.keys(sheets)) hf.addSheet(name);
    for (const [name, grid] of Object.entries(sheets)) hf.setSheetContent(hf.getSheetId(name)!, grid);
    const t1 = process.hrtime.bigint();
    hf.resumeEvaluation();
    const t2 = process.hrtime.bigint();
    const sheet = hf.getSheetId('Cases')!;
    const values: unknown[] = [];
    for (let i = 0; i < rows; i++) values.push(hf.getCellValue({ sheet, row: i + 1, col: RESULT_COL }));
    return { parseMs: Number(t1 - t0) / 1e6, evalMs: Number(t2 - t1) / 1e6, values };
  } finally {
    hf.destroy();
  }
}

export interface PhaseStats {
  readFile: Stat;
  toEngine: Stat;
  engine: Stat;
  writeCells: Stat;
  writeFile: Stat;
  total: Stat;
  /** The engine phase split (separate runs): parse + dependency graph, and evaluation. */
  engineParse: Stat;
  engineEval: Stat;
}

export interface InProcessFigures {
  rows: number;
  echem: PhaseStats;
  plain: PhaseStats;
  /** ECHEM ÷ plain, per run: whole path, and evaluation only. */
  ratioTotal: Stat;
  ratioEval: Stat;
  /** Largest |E(ECHEM) − E(plain)| over all cells, V. */
  maxDifferenceV: number;
  /** True where the runner exposed its phases (else engine includes writing the cells). */
  phases: boolean;
}

function phaseStats(ms: PhaseMs[], split: { parseMs: number; evalMs: number }[]): PhaseStats {
  const pick = (k: keyof PhaseMs) => stat(ms.map((m) => m[k]));
  return {
    readFile: pick('readFile'),
    toEngine: pick('toEngine'),
    engine: pick('engine'),
    writeCells: pick('writeCells'),
    writeFile: pick('writeFile'),
    total: pick('total'),
    engineParse: stat(split.map((s) => s.parseMs)),
    engineEval: stat(split.map((s) => s.evalMs)),
  };
}

/** A scratch folder for the benchmark's workbooks (removed by the caller). */
export function scratchDir(): string {
  return fs.mkdtempSync(path.join(os.tmpdir(), 'potentia-bench-'));
}

/** Both workbooks in process, `runs` runs each (interleaved), every run's values checked. */
export async function benchInProcess(rows: number, runs: number, dir: string): Promise<InProcessFigures> {
  const api = runnerApi();
  api.register();
  const expected = expectedColumn(rows);
  const files: Record<Side, string> = {
    echem: path.join(dir, `echem-${rows}.xlsx`),
    plain: path.join(dir, `plain-${rows}.xlsx`),
  };
  for (const side of ['echem', 'plain'] as const)
    if (!fs.existsSync(files[side])) await writeWorkbookFile(side, rows, files[side]);
  const sheets: Record<Side, Record<string, RawCellContent[][]>> = {
    echem: workbookSheets('echem', rows),
    plain: workbookSheets('plain', rows),
  };
  const ms: Record<Side, PhaseMs[]> = { echem: [], plain: [] };
  const split: Record<Side, { parseMs: number; evalMs: number }[]> = { echem: [], plain: [] };
  const last: Record<Side, unknown[]> = { echem: [], plain: [] };
  // one untimed warm-up run of each side
  for (let r = -1; r < runs; r++) {
    for (const side of ['echem', 'plain'] as const) {
      const run = await inProcessOnce(api, files[side], path.join(dir, `${side}-${rows}.out.xlsx`), rows);
      checkValues(`recalc in process (${side})`, run.values, expected);
      const s = engineSplitOnce(api, sheets[side], rows);
      checkValues(`recalc engine split (${side})`, s.values, expected);
      last[side] = run.values;
      if (r >= 0) {
        ms[side].push(run.ms);
        split[side].push(s);
      }
    }
  }
  const maxDifferenceV = compareSides('recalc ECHEM vs plain', last.echem, last.plain);
  const ratio = (k: (m: PhaseMs) => number) => stat(ms.echem.map((m, i) => k(m) / k(ms.plain[i]!)));
  return {
    rows,
    echem: phaseStats(ms.echem, split.echem),
    plain: phaseStats(ms.plain, split.plain),
    ratioTotal: ratio((m) => m.total),
    ratioEval: stat(split.echem.map((s, i) => s.evalMs / split.plain[i]!.evalMs)),
    maxDifferenceV,
    phases: Boolean(api.loadWorkbook && api.buildEngine && api.writeResults),
  };
}

// ---------------------------------------------------------------------------
// End to end: separate processes, wall time and peak resident memory.

export interface ProcessRun {
  wallS: number;
  /** Peak resident set size in MiB (null where it could not be measured). */
  peakRssMiB: number | null;
}

/** Runs a command, timing it; peak RSS from GNU time -v where installed, else by polling /proc. */
function measuredRun(cmd: string, args: string[], what: string, env?: NodeJS.ProcessEnv): ProcessRun {
  const useTime = fs.existsSync(GNU_TIME);
  const t0 = process.hrtime.bigint();
  const res = useTime
    ? spawnSync(GNU_TIME, ['-v', cmd, ...args], {
        cwd: ROOT,
        encoding: 'utf8',
        timeout: 600_000,
        env: env ?? process.env,
      })
    : spawnSync(cmd, args, { cwd: ROOT, encoding: 'utf8', timeout: 600_000, env: env ?? process.env });
  const wallS = Number(process.hrtime.bigint() - t0) / 1e9;
  if (res.status !== 0)
    throw new RunFailure(
      what,
      `${cmd} ${args.join(' ')} exited with ${res.status}: ${(res.stderr ?? '').split(/\n\s*Command (being timed|exited)/)[0]?.slice(-2000)}`,
    );
  let peakRssMiB: number | null = null;
  const m = useTime ? /Maximum resident set size \(kbytes\):\s*(\d+)/.exec(res.stderr ?? '') : null;
  if (m && m[1]) peakRssMiB = Number(m[1]) / 1024;
  return { wallS, peakRssMiB };
}

export interface EndToEndFigures {
  rows: number;
  runs: number;
  wallS: Stat;
  peakRssMiB: Stat | null;
}

function e2eStats(rows: number, runs: ProcessRun[]): EndToEndFigures {
  const rss = runs.map((r) => r.peakRssMiB).filter((x): x is number => x !== null);
  return {
    rows,
    runs: runs.length,
    wallS: stat(runs.map((r) => r.wallS)),
    peakRssMiB: rss.length === runs.length ? stat(rss) : null,
  };
}

/** `node bin/potentia.js recalc` of one side's workbook, `runs` times; the first output checked cell by cell. */
export async function benchEndToEnd(
  side: Side,
  rows: number,
  runs: number,
  dir: string,
  sheets = 1,
): Promise<{ figures: EndToEndFigures; values: unknown[] }> {
  const input = path.join(dir, `${side}-${rows}x${sheets}.xlsx`);
  if (!fs.existsSync(input)) await writeWorkbookFile(side, rows, input, sheets);
  const output = path.join(dir, `${side}-${rows}x${sheets}.potentia.xlsx`);
  const expected = expectedColumn(rows);
  const results: ProcessRun[] = [];
  let values: unknown[] = [];
  // untimed: a launcher that compiles the runner on its first start does it here, not in a timed run
  spawnSync(process.execPath, [POTENTIA_BIN, '--help'], { cwd: ROOT, encoding: 'utf8', timeout: 600_000 });
  for (let r = 0; r < runs; r++) {
    if (fs.existsSync(output)) fs.unlinkSync(output);
    results.push(
      measuredRun(
        process.execPath,
        [POTENTIA_BIN, 'recalc', input, '-o', output, '--force', '--no-progress'],
        `potentia recalc (${side})`,
      ),
    );
    if (r === 0) {
      values = await readResultColumn(output, rows, sheets);
      checkValues(`potentia recalc (${side})`, values, expected);
    }
  }
  return { figures: e2eStats(rows, results), values };
}

/** A private LibreOffice profile that recalculates every formula of .xlsx and .ods files on load. */
function libreOfficeProfile(dir: string): string {
  const profile = path.join(dir, 'lo-profile');
  const user = path.join(profile, 'user');
  fs.mkdirSync(user, { recursive: true });
  // 0 = always recalculate on load (Tools > Options > LibreOffice Calc > Formula)
  fs.writeFileSync(
    path.join(user, 'registrymodifications.xcu'),
    `<?xml version="1.0" encoding="UTF-8"?>
<oor:items xmlns:oor="http://openoffice.org/2001/registry" xmlns:xs="http://www.w3.org/2001/XMLSchema" xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance">
<item oor:path="/org.openoffice.Office.Calc/Formula/Load"><prop oor:name="OOXMLRecalcMode" oor:op="fuse"><value>0</value></prop></item>
<item oor:path="/org.openoffice.Office.Calc/Formula/Load"><prop oor:name="ODFRecalcMode" oor:op="fuse"><value>0</value></prop></item>
</oor:items>
`,
  );
  return `file://${profile}`;
}

/** True where LibreOffice is installed. */
export function hasLibreOffice(): boolean {
  return fs.existsSync(SOFFICE);
}

/**
 * LibreOffice headless: load the plain workbook (recalculating it), write it as .xlsx;
 * `runs` times after one untimed start that creates its profile; the first output checked.
 */
export async function benchLibreOffice(
  rows: number,
  runs: number,
  dir: string,
  sheets = 1,
): Promise<{ figures: EndToEndFigures; values: unknown[] }> {
  const input = path.join(dir, `plain-${rows}x${sheets}.xlsx`);
  if (!fs.existsSync(input)) await writeWorkbookFile('plain', rows, input, sheets);
  const outDir = path.join(dir, 'lo-out');
  fs.mkdirSync(outDir, { recursive: true });
  const profile = libreOfficeProfile(dir);
  const args = [
    `-env:UserInstallation=${profile}`,
    '--headless',
    '--norestore',
    '--convert-to',
    'xlsx',
    '--outdir',
    outDir,
    input,
  ];
  const output = path.join(outDir, path.basename(input));
  const expected = expectedColumn(rows);
  const results: ProcessRun[] = [];
  let values: unknown[] = [];
  for (let r = -1; r < runs; r++) {
    if (fs.existsSync(output)) fs.unlinkSync(output);
    const run = measuredRun(SOFFICE, args, 'LibreOffice');
    if (!fs.existsSync(output)) throw new CheckFailure('LibreOffice', `no output written to ${output}`);
    if (r === 0) {
      values = await readResultColumn(output, rows, sheets);
      checkValues('LibreOffice recalc (plain)', values, expected);
    }
    if (r >= 0) results.push(run);
  }
  return { figures: e2eStats(rows, results), values };
}

/** Checks two end-to-end outputs against each other cell by cell; returns the largest difference. */
export function compareOutputs(what: string, echem: unknown[], plain: unknown[]): number {
  return compareSides(what, echem, plain);
}

if (require.main === module) {
  const rows = Number(process.argv[2] ?? 10000);
  const runs = Number(process.argv[3] ?? 5);
  const dir = scratchDir();
  benchInProcess(rows, runs, dir)
    .then((r) => console.log(JSON.stringify(r, null, 1)))
    .finally(() => fs.rmSync(dir, { recursive: true, force: true }))
    .catch((e) => {
      console.error(e);
      process.exitCode = 1;
    });
}
