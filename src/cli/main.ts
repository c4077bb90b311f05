/**
 * The `potentia` command: recalculates workbooks that use the ECHEM functions without a
 * spreadsheet program, evaluates formulas, and prints the built-in potentials table.
 *
 * Calculation by HyperFormula (GPL-3.0 licence, used under 'gpl-v3'), files by ExcelJS.
 */
import { EXIT_INTERNAL, EXIT_OK, EXIT_USAGE, processIo, UsageError } from './io';
import { packageVersion } from './paths';
import { forTerminal } from './terminalText';
import type { Io } from './io';

export const USAGE = `Usage: potentia <command> [options]

Commands:
  eval FORMULA...           evaluate formulas (ECHEM functions, spreadsheet functions,
                            inline arrays {..}); --json for one JSON value per formula
  recalc IN.xlsx [-o OUT]   recalculate a workbook and write the values (IN.recalc.xlsx)
  recalc IN... | FOLDER      several workbooks or a folder, in parallel, one summary
  table [--csv]             print the built-in potentials table
  demo                      recalculate a shipped template in memory and show its results
  --version                 print the version

In a checkout of the project the command is "npx potentia" (or "npm run potentia --").
Run "npx potentia <command> --help" for a command's options.
Examples:
  npx potentia eval '=ECHEM.POTENTIAL("Cu2+ + 2e- -> Cu", {"Cu2+"}, {0.01}, 25)'
  npx potentia recalc assets/templates/cell-voltage-sweep.xlsx -o sweep.xlsx

Results are thermodynamic estimates, not measurements. Calculation by HyperFormula (GPL-3.0).
`;

/** Each command's usage text, loaded with the command (so `eval` does not load ExcelJS). */
async function helpFor(command: string | undefined): Promise<string | undefined> {
  switch (command) {
    case 'eval':
      return (await import('./evalCommand')).EVAL_USAGE;
    case 'recalc':
      return (await import('./recalcCommand')).RECALC_USAGE;
    case 'table':
      return (await import('./tableCommand')).TABLE_USAGE;
    case 'demo':
      return (await import('./demo')).DEMO_USAGE;
    default:
      return undefined;
  }
}

/** Runs the command line `argv` (without "node" and the script); returns the exit code. */
export async function main(argv: readonly string[], rawIo: Io = processIo()): Promise<number> {
  // Workbook text and formulas may hold control characters: none reaches the terminal.
  const io: Io = { ...rawIo, out: (t) => rawIo.out(forTerminal(t)), err: (t) => rawIo.err(forTerminal(t)) };
  const [command, ...rest] = argv;
  try {
    switch (command) {
      case '--version':
      case '-V':
      case 'version':
        io.out(`potentia ${packageVersion()}\n`);
        return EXIT_OK;
      case undefined:
        io.err(USAGE);
        return EXIT_USAGE;
      case '-h':
      case '--help':
        io.out(USAGE);
        return EXIT_OK;
      case 'help':
        io.out((await helpFor(rest[0])) ?? USAGE);
        return EXIT_OK;
      case 'eval':
        return (await import('./evalCommand')).evalCommand(rest, io);
      case 'recalc':
        return await (await import('./recalcCommand')).recalcCommand(rest, io);
      case 'table':
        return (await import('./tableCommand')).tableCommand(rest, io);
      case 'demo':
        return await (await import('./demo')).demoCommand(rest, io);
      default:
        throw new UsageError(`unknown command "${command}"; the commands are eval, recalc, table and demo`);
    }
  } catch (e) {
    if (e instanceof UsageError || isParseArgsError(e)) {
      const which = (await helpFor(command)) !== undefined ? command : undefined;
      io.err(`potentia: ${(e as Error).message}\n`);
      io.err(
        which
          ? `Run "npx potentia ${which} --help" for its options.\n`
          : 'Run "npx potentia --help" for the commands.\n',
      );
      return EXIT_USAGE;
    }
    throw e;
  }
}

function isParseArgsError(e: unknown): boolean {
  const code = (e as { code?: unknown })?.code;
  return typeof code === 'string' && code.startsWith('ERR_PARSE_ARGS');
}

/** Entry point for bin/potentia.js. */
export function run(): void {
  main(process.argv.slice(2)).then(
    (code) => {
      process.exitCode = code;
    },
    (e: unknown) => {
      process.stderr.write(
        forTerminal(
          `potentia: internal error (a bug; please report it with the command line): ${e instanceof Error ? (e.stack ?? e.message) : String(e)}\n`,
        ),
      );
      process.exitCode = EXIT_INTERNAL;
    },
  );
}
