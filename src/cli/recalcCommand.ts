/**
 * `potentia recalc IN.xlsx [-o OUT.xlsx]`: recalculates every formula of a workbook (the
 * ECHEM functions and the ordinary spreadsheet ones) and writes a copy with the formulas
 * kept and their computed values cached, reporting every cell that computes to an error.
 *
 * Never writes over its input; refuses to replace an existing output without --force;
 * writes atomically (safeWrite.ts); refuses workbooks past the read limits (limits.ts).
 */
import * as fs from 'node:fs';
import * as path from 'node:path';
import { FLAG, readCommandLine } from './commandLine';
import type ExcelJS from 'exceljs';
import { excelJs } from './excelModel';
import cliProgress from 'cli-progress';
import { echemFunctionNames } from './echemPlugin';
import * as os from 'node:os';
import { Worker } from 'node:worker_threads';
import { setFlagsFromString } from 'node:v8';
import { EXIT_CELL_ERRORS, EXIT_INTERNAL, EXIT_OK, EXIT_USAGE, UsageError } from './io';
import { checkPackage, DEFAULT_LIMITS, DEFAULT_MAX_CELLS, DEFAULT_MAX_UNCOMPRESSED_MB } from './limits';
import type { PackageSize, ReadLimits } from './limits';
import { checkOutput, writeFileAtomically } from './safeWrite';
import { withDynamicArrays } from './dynamicArrays';
import type { Io } from './io';
import { buildEngine, loadWorkbook, writeResults } from './workbook';
import {
  loadPackage,
  openPackage,
  packageBytes,
  patchSheets,
  readResults,
  releaseSheetTexts,
} from './xlsxPackage';
import type { RecalcSummary } from './workbook';

export const RECALC_USAGE = `Usage: potentia recalc IN.xlsx [-o OUT.xlsx] [options]
       potentia recalc IN1.xlsx IN2.xlsx ... | FOLDER [-o OUT_FOLDER] [options]

Recalculates every formula of IN.xlsx and writes the workbook, formulas kept, with the
computed values, to OUT.xlsx (default: IN.recalc.xlsx next to the input). Prints how many
cells were computed and every error with its sheet, cell and message. Several workbooks,
or a folder of them, are recalculated in parallel (one worker thread each, up to --jobs)
with one summary; -o then names an existing folder for the outputs.

The output is written to a temporary file in its folder and put in place in one step: an
interrupted or failed run leaves an existing output as it was. Never the input, never
through a symbolic link; an existing output is replaced only with --force.

Options:
  -o, --output FILE    where to write (a folder when several workbooks are given)
  -f, --force          replace OUT.xlsx if it exists
  --allow-errors       exit 0 even when cells compute to errors (otherwise exit code 1)
  --max-size MB        refuse a workbook that unpacks to more (default ${DEFAULT_MAX_UNCOMPRESSED_MB})
  --max-cells N        refuse a workbook with more cells (default ${DEFAULT_MAX_CELLS.toLocaleString('en-US')})
  -j, --jobs N         workbooks recalculated at once (default: the number of cores)
  --progress           always show the progress bar on standard error
  --no-progress        never show it (default: shown on a terminal for large workbooks)

Exit codes: 0 done, 1 some cells compute to errors, 2 the command could not run (for
several workbooks: the highest of them).
`;

/** Formulas above which a progress bar is worth drawing. */
export const PROGRESS_THRESHOLD = 2000;
/** Errors listed one by one before the rest are counted. */
const MAX_LISTED_ERRORS = 200;

/** The default output name: "plant.xlsx" → "plant.recalc.xlsx". */
export function defaultOutputPath(input: string): string {
  const ext = path.extname(input);
  const base =
    ext.toLowerCase() === '.xlsx' || ext.toLowerCase() === '.xlsm' ? input.slice(0, -ext.length) : input;
  return `${base}.recalc.xlsx`;
}

/** Checks that a file is there and looks like an .xlsx (a ZIP package); explains if not. */
export function checkInputFile(file: string): void {
  let stat: fs.Stats;
  try {
    stat = fs.statSync(file);
  } catch {
    throw new UsageError(`cannot find ${file}: check the path (the current folder is ${process.cwd()})`);
  }
  if (stat.isDirectory()) throw new UsageError(`${file} is a folder, not an .xlsx workbook`);
  const head = Buffer.alloc(8);
  const fd = fs.openSync(file, 'r');
  let n = 0;
  try {
    n = fs.readSync(fd, head, 0, 8, 0);
  } finally {
    fs.closeSync(fd);
  }
  if (n >= 4 && head[0] === 0x50 && head[1] === 0x4b && head[2] === 0x03 && head[3] === 0x04) return;
  if (n >= 4 && head[0] === 0xd0 && head[1] === 0xcf && head[2] === 0x11 && head[3] === 0xe0) {
    throw new UsageError(
      `${file} is not an .xlsx workbook: it looks like a legacy .xls file (or a password-protected workbook); ` +
        'open it in a spreadsheet program and save it as .xlsx (without a password)',
    );
  }
  throw new UsageError(
    `${file} is not an .xlsx workbook (an .xlsx file is a ZIP package; this one ${n === 0 ? 'is empty' : 'is not'}); ` +
      'save the workbook as .xlsx and try again',
  );
}

/** An .xlsx file's bytes and what the limit check read of them (its entries and XML parts). */
export interface WorkbookBytes {
  data: Buffer;
  contents: PackageSize;
}

/**
 * Reads an .xlsx file's bytes, checked against the limits first (unpacked size, cell count)
 * before anything parses it.
 */
export function readWorkbookBytes(file: string, limits: ReadLimits = DEFAULT_LIMITS): WorkbookBytes {
  checkInputFile(file);
  const data = fs.readFileSync(file);
  return { data, contents: checkPackage(file, data, limits) };
}

/** The ExcelJS model of an .xlsx file's bytes, its failures turned into a clear message. */
async function workbookFromBytes(file: string, data: Buffer): Promise<ExcelJS.Workbook> {
  const wb = new (excelJs().Workbook)();
  try {
    await wb.xlsx.load(data as unknown as ExcelJS.Buffer);
  } catch (e) {
    throw new UsageError(
      `cannot read ${file} as an .xlsx workbook (${e instanceof Error ? e.message : String(e)}); ` +
        'is it damaged, or another kind of ZIP file?',
    );
  }
  return wb;
}

/**
 * Reads an .xlsx file with ExcelJS, turning its failures into a clear message. The package
 * is checked against the limits first (unpacked size, cell count), before ExcelJS parses it.
 */
export async function readWorkbookFile(
  file: string,
  limits: ReadLimits = DEFAULT_LIMITS,
): Promise<ExcelJS.Workbook> {
  return workbookFromBytes(file, readWorkbookBytes(file, limits).data);
}

/** Progress on standard error: a bar only where it helps; otherwise nothing. */
export interface Progress {
  phase: (name: string, total: number) => void;
  tick: (value: number) => void;
  stop: () => void;
}

function makeProgress(io: Io, show: boolean): Progress {
  if (!show) return { phase: () => undefined, tick: () => undefined, stop: () => undefined };
  const bar = new cliProgress.SingleBar(
    {
      stream: io.errStream,
      format: '{phase} |{bar}| {percentage}% {value}/{total}',
      hideCursor: true,
      clearOnComplete: true,
      noTTYOutput: !io.errIsTTY,
      notTTYSchedule: 1000,
      fps: 10,
    },
    cliProgress.Presets.shades_classic,
  );
  let started = false;
  return {
    phase: (name, total) => {
      if (!started) {
        bar.start(total, 0, { phase: name });
        started = true;
      } else {
        bar.setTotal(total);
        bar.update(0, { phase: name });
      }
    },
    tick: (v) => bar.update(v),
    stop: () => {
      if (started) bar.stop();
    },
  };
}

/** Recalculates a workbook in memory (no file written); returns the summary. */
export function recalcWorkbook(
  wb: ExcelJS.Workbook,
  progress?: { phase: (name: string, total: number) => void; tick: (value: number) => void },
  maxCells: number = DEFAULT_MAX_CELLS,
): RecalcSummary & { warnings: string[] } {
  const loaded = loadWorkbook(wb, maxCells);
  progress?.phase('computing', 1);
  const { hf, warnings } = buildEngine(loaded);
  try {
    progress?.tick(1);
    progress?.phase('writing values', loaded.formulas.length);
    const step = Math.max(1, Math.floor(loaded.formulas.length / 100));
    const summary = writeResults(wb, loaded, hf, echemFunctionNames(), (done) => {
      if (done % step === 0) progress?.tick(done);
    });
    return { ...summary, warnings };
  } finally {
    hf.destroy();
  }
}

function plural(n: number, one: string, many = `${one}s`): string {
  return `${n.toLocaleString('en-US')} ${n === 1 ? one : many}`;
}

/** The summary printed after a recalculation. */
export function formatSummary(summary: RecalcSummary, input: string, output: string | undefined): string {
  const lines: string[] = [];
  lines.push(output === undefined ? `Recalculated ${input}` : `Recalculated ${input} -> ${output}`);
  lines.push(
    `  ${plural(summary.formulas, 'formula')}, ${plural(summary.cellsComputed, 'cell')} computed, ` +
      `${plural(summary.errors.length, 'error')}`,
  );
  if (summary.errors.length > 0) {
    lines.push('  Errors (sheet!cell  code  message):');
    for (const e of summary.errors.slice(0, MAX_LISTED_ERRORS)) {
      lines.push(`    ${e.sheet}!${e.cell}  ${e.code}  ${e.message}`);
    }
    if (summary.errors.length > MAX_LISTED_ERRORS) {
      lines.push(`    ... and ${plural(summary.errors.length - MAX_LISTED_ERRORS, 'more error')}`);
    }
  }
  return lines.join('\n') + '\n';
}

/** Options of one recalculation. */
export interface RecalcOptions {
  force: boolean;
  allowErrors: boolean;
  limits: ReadLimits;
  /** Draw a progress bar (single workbook only). */
  progress: 'auto' | 'always' | 'never';
}

/** Cells from which a workbook is recalculated with a tight heap (`keepHeapTight`). */
export const TIGHT_HEAP_FROM_CELLS = 100_000;

/**
 * For a large workbook, lets V8's heap grow by 10 % between full collections instead of its
 * own factor (up to 4×), for the rest of the process. HyperFormula's graph is held at about
 * 1.2 KB a formula, and the default factor let the heap reach twice that before collecting:
 * at 100,000 formulas the peak memory is 390 MiB instead of 560, for 4.5 s instead of 3.5
 * (bench/README.md). V8 reads this setting at each collection; smaller workbooks keep the default.
 */
function keepHeapTight(cells: number): void {
  if (cells >= TIGHT_HEAP_FROM_CELLS) setFlagsFromString('--heap-growing-percent=10');
}

/**
 * Recalculates one workbook file and writes its output atomically; prints its summary and
 * warnings to `io`. Returns the exit code for this workbook.
 */
export async function recalcFile(
  input: string,
  output: string,
  options: RecalcOptions,
  io: Io,
  report?: (summary: RecalcSummary) => void,
): Promise<number> {
  if (output.trim() === '') throw new UsageError('the output file name (-o) is empty');
  checkInputFile(input);
  checkOutput(input, output, options.force);

  const read = readWorkbookBytes(input, options.limits);
  keepHeapTight(read.contents.cells);
  const show = (formulaCount: number) =>
    options.progress !== 'never' &&
    (options.progress === 'always' || (io.errIsTTY && formulaCount > PROGRESS_THRESHOLD));
  let progress: Progress | undefined;
  let summary: RecalcSummary & { warnings: string[] };
  try {
    const fast = recalcPackage(read, options.limits.maxCells, (formulas) => {
      progress = makeProgress(io, show(formulas));
      return progress;
    });
    let bytes: Uint8Array;
    if (fast !== undefined) {
      summary = fast.summary;
      bytes = fast.bytes;
    } else {
      // The model path: spills, array formulas and the other cases xlsxPackage.ts leaves to it.
      progress?.stop();
      const wb = await workbookFromBytes(input, read.data);
      progress = makeProgress(io, show(countFormulas(wb)));
      summary = recalcWorkbook(wb, progress, options.limits.maxCells);
      progress.phase('saving', 1);
      try {
        bytes = await withDynamicArrays(await workbookBytes(wb), summary.spillAnchors);
      } catch (e) {
        throw new UsageError(`cannot write ${output} (${e instanceof Error ? e.message : String(e)})`);
      }
    }
    writeFileAtomically(output, bytes, options.force, input);
    progress?.tick(1);
  } finally {
    progress?.stop();
  }
  for (const w of summary.warnings) io.err(`warning: ${w}\n`);
  io.out(formatSummary(summary, input, output));
  report?.(summary);
  return summary.errors.length > 0 && !options.allowErrors ? EXIT_CELL_ERRORS : EXIT_OK;
}

function countFormulas(wb: ExcelJS.Workbook): number {
  const { ValueType } = excelJs();
  let formulaCount = 0;
  wb.eachSheet((ws) =>
    ws.eachRow((row) =>
      row.eachCell((cell) => {
        if (cell.type === ValueType.Formula) formulaCount++;
      }),
    ),
  );
  return formulaCount;
}

/**
 * The fast path (xlsxPackage.ts): the package read into the engine and its formula cells
 * patched, no spreadsheet model. Undefined where the workbook needs the model path (nothing
 * is written then). `startProgress` gets the number of formulas once they are known.
 */
export function recalcPackage(
  read: WorkbookBytes,
  maxCells: number,
  startProgress?: (formulas: number) => Progress,
): { summary: RecalcSummary & { warnings: string[] }; bytes: Uint8Array } | undefined {
  const pkg = openPackage(read.data, read.contents);
  const loaded = pkg === undefined ? undefined : loadPackage(pkg, maxCells);
  if (pkg === undefined || loaded === undefined || loaded.needsModel) return undefined;
  releaseSheetTexts(pkg);
  const progress = startProgress?.(loaded.places.row.length);
  progress?.phase('computing', 1);
  const { hf, warnings } = buildEngine(loaded);
  loaded.sheets = {}; // the engine holds its own copy
  let results: ReturnType<typeof readResults>;
  try {
    progress?.tick(1);
    results = readResults(loaded, hf, echemFunctionNames());
  } finally {
    hf.destroy();
  }
  if (results === undefined) return undefined;
  progress?.phase('saving', 1);
  const summary = patchSheets(pkg, loaded, results);
  return { summary: { ...summary, warnings }, bytes: packageBytes(pkg) };
}

/** The bytes of the .xlsx file for a recalculated workbook. */
async function workbookBytes(wb: ExcelJS.Workbook): Promise<Uint8Array> {
  return new Uint8Array(await wb.xlsx.writeBuffer());
}

function positiveNumber(text: string | undefined, option: string, fallback: number): number {
  if (text === undefined) return fallback;
  const n = Number(text);
  if (!Number.isFinite(n) || n <= 0) throw new UsageError(`${option} needs a positive number, got "${text}"`);
  return n;
}

/** The workbooks a command line names: files as given, folders by their .xlsx/.xlsm files. */
export function expandInputs(positionals: readonly string[]): { inputs: string[]; fromFolder: boolean } {
  const inputs: string[] = [];
  let fromFolder = false;
  for (const p of positionals) {
    let stat: fs.Stats | undefined;
    try {
      stat = fs.statSync(p);
    } catch {
      stat = undefined;
    }
    if (stat?.isDirectory()) {
      fromFolder = true;
      const found = fs
        .readdirSync(p)
        .filter(
          (f) =>
            /\.(xlsx|xlsm)$/i.test(f) &&
            !/\.recalc\.xlsx$/i.test(f) &&
            !f.startsWith('~$') &&
            !f.startsWith('.'),
        )
        .sort()
        .map((f) => path.join(p, f));
      if (found.length === 0) throw new UsageError(`the folder ${p} holds no .xlsx workbooks`);
      inputs.push(...found);
    } else inputs.push(p);
  }
  return { inputs, fromFolder };
}

export async function recalcCommand(argv: string[], io: Io): Promise<number> {
  const line = readCommandLine(
    argv,
    io,
    RECALC_USAGE,
    {
      output: { type: 'string', short: 'o' },
      force: { type: 'boolean', short: 'f', default: false },
      'allow-errors': FLAG,
      'max-size': { type: 'string' },
      'max-cells': { type: 'string' },
      jobs: { type: 'string', short: 'j' },
      progress: FLAG,
      'no-progress': FLAG,
    },
    'recalc needs the workbook to recalculate, e.g. npx potentia recalc plant.xlsx',
  );
  if (line === null) return EXIT_OK;
  const { values, positionals } = line;
  const options: RecalcOptions = {
    force: values.force,
    allowErrors: values['allow-errors'],
    limits: {
      maxUncompressedBytes:
        positiveNumber(values['max-size'], '--max-size', DEFAULT_MAX_UNCOMPRESSED_MB) * 1024 * 1024,
      maxCells: Math.floor(positiveNumber(values['max-cells'], '--max-cells', DEFAULT_MAX_CELLS)),
    },
    progress: values['no-progress'] ? 'never' : values.progress ? 'always' : 'auto',
  };
  const jobs = Math.floor(positiveNumber(values.jobs, '--jobs', os.availableParallelism()));
  const { inputs, fromFolder } = expandInputs(positionals);
  if (inputs.length === 1 && !fromFolder) {
    const input = inputs[0] as string;
    return recalcFile(input, values.output ?? defaultOutputPath(input), options, io);
  }
  let outDir: string | undefined;
  if (values.output !== undefined) {
    outDir = values.output;
    if (!fs.existsSync(outDir) || !fs.statSync(outDir).isDirectory()) {
      throw new UsageError(
        `with several workbooks, -o names an existing folder for the outputs; ${outDir} is not one`,
      );
    }
  }
  const outputs = inputs.map((i) =>
    outDir === undefined ? defaultOutputPath(i) : path.join(outDir, path.basename(defaultOutputPath(i))),
  );
  const clash = outputs.find((o, k) => outputs.indexOf(o) !== k);
  if (clash !== undefined)
    throw new UsageError(`two inputs would both write ${clash}; give them different names`);
  return recalcMany(inputs, outputs, { ...options, progress: 'never' }, jobs, io);
}

/** What one workbook of a batch reported. */
export interface BatchResult {
  input: string;
  code: number;
  out: string;
  err: string;
  formulas: number;
  errors: number;
}

/** Recalculates one workbook of a batch with its output captured (in a worker or here). */
export async function recalcForBatch(
  input: string,
  output: string,
  options: RecalcOptions,
): Promise<BatchResult> {
  let out = '';
  let err = '';
  const sink = { write: () => true } as unknown as NodeJS.WritableStream;
  const io: Io = { out: (t) => (out += t), err: (t) => (err += t), errIsTTY: false, errStream: sink };
  try {
    let formulas = 0;
    let errors = 0;
    const code = await recalcFile(input, output, options, io, (s) => {
      formulas = s.formulas;
      errors = s.errors.length;
    });
    return { input, code, out, err, formulas, errors };
  } catch (e) {
    if (e instanceof UsageError)
      return { input, code: EXIT_USAGE, out, err: `${err}potentia: ${e.message}\n`, formulas: 0, errors: 0 };
    const text = e instanceof Error ? (e.stack ?? e.message) : String(e);
    return {
      input,
      code: EXIT_INTERNAL,
      out,
      err: `${err}potentia: internal error: ${text}\n`,
      formulas: 0,
      errors: 0,
    };
  }
}

/** The compiled worker next to this module, when the runner runs compiled (not under ts-jest). */
function workerScript(): string | undefined {
  const file = path.join(__dirname, 'recalcWorker.js');
  return __filename.endsWith('.js') && fs.existsSync(file) ? file : undefined;
}

function runInWorker(
  script: string,
  input: string,
  output: string,
  options: RecalcOptions,
): Promise<BatchResult> {
  return new Promise((resolve) => {
    const worker = new Worker(script, { workerData: { input, output, options } });
    let settled = false;
    // the first of message, error and exit settles the batch; an error or an exit without a
    // message is an internal failure of that workbook's worker
    const settle = (r: BatchResult): void => {
      if (settled) return;
      settled = true;
      resolve(r);
    };
    const failed = (err: string): BatchResult => ({
      input,
      code: EXIT_INTERNAL,
      out: '',
      err,
      formulas: 0,
      errors: 0,
    });
    worker.once('message', (r: BatchResult) => settle(r));
    worker.once('error', (e) => settle(failed(`potentia: internal error: ${e.message}\n`)));
    worker.once('exit', (code) =>
      settle(failed(`potentia: the worker for ${input} stopped (exit ${code})\n`)),
    );
  });
}

/** Recalculates several workbooks, up to `jobs` at once in worker threads; one summary. */
export async function recalcMany(
  inputs: readonly string[],
  outputs: readonly string[],
  options: RecalcOptions,
  jobs: number,
  io: Io,
): Promise<number> {
  const script = workerScript();
  const results: BatchResult[] = new Array<BatchResult>(inputs.length);
  let next = 0;
  const lane = async (): Promise<void> => {
    for (let k = next++; k < inputs.length; k = next++) {
      const input = inputs[k] as string;
      const output = outputs[k] as string;
      const r = script
        ? await runInWorker(script, input, output, options)
        : await recalcForBatch(input, output, options);
      results[k] = r;
      io.out(r.out);
      io.err(r.err);
    }
  };
  const width = script ? Math.max(1, Math.min(jobs, inputs.length)) : 1;
  await Promise.all(Array.from({ length: width }, lane));
  const failed = results.filter((r) => r.code >= EXIT_USAGE).length;
  const withErrors = results.filter((r) => r.errors > 0).length;
  const formulas = results.reduce((a, r) => a + r.formulas, 0);
  const errors = results.reduce((a, r) => a + r.errors, 0);
  io.out(
    `Recalculated ${plural(inputs.length, 'workbook')} (${plural(width, 'worker')}): ` +
      `${(inputs.length - failed).toLocaleString('en-US')} written, ${withErrors.toLocaleString('en-US')} with cell errors, ` +
      `${failed.toLocaleString('en-US')} could not run; ${plural(formulas, 'formula')}, ${plural(errors, 'error')}\n`,
  );
  return results.reduce((worst, r) => Math.max(worst, r.code), EXIT_OK);
}
