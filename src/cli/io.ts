/**
 * Output streams and errors shared by the runner's commands, so that tests can run a
 * command in-process and read what it printed.
 */

/** Where a command writes. */
export interface Io {
  out: (text: string) => void;
  err: (text: string) => void;
  /** True when standard error is a terminal (progress bars only then). */
  errIsTTY: boolean;
  /** The stream progress bars draw on. */
  errStream: NodeJS.WritableStream;
}

/** The process's own standard output and error. */
export function processIo(): Io {
  return {
    out: (t) => process.stdout.write(t),
    err: (t) => process.stderr.write(t),
    errIsTTY: Boolean(process.stderr.isTTY),
    errStream: process.stderr,
  };
}

/** Exit codes of the runner. */
export const EXIT_OK = 0;
/** A formula or a cell computed to an error (and --allow-errors was not given). */
export const EXIT_CELL_ERRORS = 1;
/** The command could not run: bad options, missing or unreadable file, output exists, a limit. */
export const EXIT_USAGE = 2;
/** A bug in the runner (an exception nobody expected): reported with its stack. */
export const EXIT_INTERNAL = 3;

/** A problem with how the command was called: printed with a hint, exit code 2. */
export class UsageError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'UsageError';
  }
}
