/**
 * `potentia recalc IN.xlsx [-o OUT.xlsx]`: recalculates every formula of a workbook (the
 * ECHEM functions and the ordinary spreadsheet ones) and writes a copy with the formulas
 * kept and their computed values cached, reporting every cell that computes to an error.
 *
 * Never writes over its input; refuses to replace an existing output without --force.
 */
import * as fs from 'node:fs';
import * as path from 'node:path';
import { parseArgs } from 'node:util';
import ExcelJS from 'exceljs';
import cliProgress from 'cli-progress';
import { echemFunctionNames } from './echemPlugin';
import { EXIT_CELL_ERRORS, EXIT_OK, UsageError } from './io';
import type { Io } from './io';
import { buildEngine, loadWorkbook, writeResults } from './workbook';
import type { RecalcSummary } from './workbook';

export const RECALC_USAGE = `Usage: potentia recalc IN.xlsx [-o OUT.xlsx] [--force] [--allow-errors]

Recalculates every formula of IN.xlsx and writes the workbook, formulas kept, with the
computed values, to OUT.xlsx (default: IN.recalc.xlsx next to the input). Prints how many
cells were computed and every error with its sheet, cell and message.

Options:
  -o, --output FILE  where to write (never the input itself)
  -f, --force        replace OUT.xlsx if it exists
  --allow-errors     exit 0 even when cells compute to errors (otherwise exit code 1)
  --progress         always show the progress bar on standard error
  --no-progress      never show it (default: shown on a terminal for large workbooks)

Exit codes: 0 done, 1 some cells compute to errors, 2 the command could not run.
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

function sameFile(a: string, b: string): boolean {
  const ra = fs.realpathSync(a);
  let rb = path.resolve(b);
  try {
    rb = fs.realpathSync(b);
  } catch {
    // b does not exist yet: its resolved path is what counts.
  }
  return ra === rb || (process.platform !== 'linux' && ra.toLowerCase() === rb.toLowerCase());
}

/** Reads an .xlsx file with ExcelJS, turning its failures into a clear message. */
export async function readWorkbookFile(file: string): Promise<ExcelJS.Workbook> {
  checkInputFile(file);
  const wb = new ExcelJS.Workbook();
  try {
    await wb.xlsx.readFile(file);
  } catch (e) {
    throw new UsageError(
      `cannot read ${file} as an .xlsx workbook (${e instanceof Error ? e.message : String(e)}); ` +
        'is it damaged, or another kind of ZIP file?',
    );
  }
  return wb;
}

/** Progress on standard error: a bar only where it helps; otherwise nothing. */
interface Progress {
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
): RecalcSummary & { warnings: string[] } {
  const loaded = loadWorkbook(wb);
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

export async function recalcCommand(argv: string[], io: Io): Promise<number> {
  const { values, positionals } = parseArgs({
    args: argv,
    options: {
      output: { type: 'string', short: 'o' },
      force: { type: 'boolean', short: 'f', default: false },
      'allow-errors': { type: 'boolean', default: false },
      progress: { type: 'boolean', default: false },
      'no-progress': { type: 'boolean', default: false },
      help: { type: 'boolean', short: 'h', default: false },
    },
    allowPositionals: true,
    strict: true,
  });
  if (values.help) {
    io.out(RECALC_USAGE);
    return EXIT_OK;
  }
  if (positionals.length !== 1) {
    throw new UsageError(
      positionals.length === 0
        ? 'recalc needs the workbook to recalculate, e.g. potentia recalc plant.xlsx'
        : `recalc takes one workbook, got ${positionals.length}: ${positionals.join(' ')} (use -o for the output)`,
    );
  }
  const input = positionals[0] as string;
  const output = values.output ?? defaultOutputPath(input);
  if (output.trim() === '') throw new UsageError('the output file name (-o) is empty');

  checkInputFile(input);
  if (sameFile(input, output)) {
    throw new UsageError(
      `the output ${output} is the input itself: recalc never overwrites its input; choose another -o`,
    );
  }
  if (fs.existsSync(output) && !values.force) {
    throw new UsageError(
      `${output} already exists: add --force to replace it, or choose another name with -o`,
    );
  }
  const outDir = path.dirname(path.resolve(output));
  if (!fs.existsSync(outDir)) throw new UsageError(`the folder for the output does not exist: ${outDir}`);

  const wb = await readWorkbookFile(input);
  let formulaCount = 0;
  wb.eachSheet((ws) =>
    ws.eachRow((row) =>
      row.eachCell((cell) => {
        if (cell.type === ExcelJS.ValueType.Formula) formulaCount++;
      }),
    ),
  );
  const show =
    !values['no-progress'] && (values.progress || (io.errIsTTY && formulaCount > PROGRESS_THRESHOLD));
  const progress = makeProgress(io, show);
  let summary: RecalcSummary & { warnings: string[] };
  try {
    summary = recalcWorkbook(wb, progress);
    progress.phase('saving', 1);
    try {
      await wb.xlsx.writeFile(output);
    } catch (e) {
      throw new UsageError(`cannot write ${output} (${e instanceof Error ? e.message : String(e)})`);
    }
    progress.tick(1);
  } finally {
    progress.stop();
  }
  for (const w of summary.warnings) io.err(`warning: ${w}\n`);
  io.out(formatSummary(summary, input, output));
  return summary.errors.length > 0 && !values['allow-errors'] ? EXIT_CELL_ERRORS : EXIT_OK;
}
