/**
 * One reading of a command's arguments for every `potentia` command: Node's strict
 * `parseArgs` with the command's own options plus `-h`/`--help`, which prints the command's
 * usage instead of running it.
 */
import { parseArgs } from 'node:util';
import { UsageError, type Io } from './io';

/** The option declarations of one command, as `parseArgs` takes them. */
type OptionDeclarations = Record<
  string,
  { type: 'string' | 'boolean'; short?: string; default?: string | boolean; multiple?: boolean }
>;

const HELP = { help: { type: 'boolean', short: 'h', default: false } } as const;

/** An on/off option that is off unless given. */
export const FLAG = { type: 'boolean', default: false } as const;

/**
 * Reads `argv` against `options` (strict: an unknown option is a usage error thrown by
 * `parseArgs`). Where `--help` is given, prints `usage` and returns null: the command then
 * returns its success code without running. `positionals` is false where the command takes
 * none, true where it takes any number, or the message of the usage error to throw where it
 * needs at least one and none is given.
 *
 * @throws UsageError where `positionals` is a message and no positional argument is given
 * @example
 * const line = readCommandLine(argv, io, TABLE_USAGE, { csv: FLAG }, false);
 * if (line === null) return EXIT_OK;
 * line.values.csv // boolean
 */
export function readCommandLine<const O extends OptionDeclarations>(
  argv: string[],
  io: Io,
  usage: string,
  options: O,
  positionals: boolean | string,
) {
  const parsed = parseArgs({
    args: argv,
    options: { ...options, ...HELP },
    allowPositionals: positionals !== false,
    strict: true,
  });
  if ((parsed.values as { help?: unknown }).help === true) {
    io.out(usage);
    return null;
  }
  if (typeof positionals === 'string' && parsed.positionals.length === 0) throw new UsageError(positionals);
  return parsed;
}
