/**
 * `potentia table [--csv]`: prints the built-in table of standard reduction potentials,
 * as aligned columns or as CSV (RFC 4180 quoting).
 */
import { FLAG, readCommandLine } from './commandLine';
import { BUILTIN_POTENTIALS } from '../engine/index';
import type { BuiltinPotentialRow } from '../engine/index';
import { EXIT_OK } from './io';
import type { Io } from './io';

/** The header of a potentials table, as on the templates' Potentials sheets. */
export const TABLE_HEADER = ['half-reaction', 'E° (V)', 'dE°/dT (mV/K)', 'source'] as const;

export const TABLE_USAGE = `Usage: potentia table [--csv]

Prints the built-in potentials table: half-reaction (as a reduction), E° in V vs SHE at
25 °C, dE°/dT in mV/K where known (blank: E° at 25 °C is used at every temperature), and
the publication each value comes from.

Options:
  --csv   comma-separated values with a header row, for a spreadsheet's Potentials sheet
`;

/** The table's rows as text cells, header first. */
export function tableRows(rows: readonly BuiltinPotentialRow[] = BUILTIN_POTENTIALS): string[][] {
  return [
    [...TABLE_HEADER],
    ...rows.map((r) => [
      r.halfReaction,
      String(r.e0V),
      r.dE0dTmVperK === null ? '' : String(r.dE0dTmVperK),
      r.source,
    ]),
  ];
}

/** One CSV field, quoted where it holds a comma, a quote, a line break or edge spaces. */
export function csvField(text: string): string {
  return /[",\r\n]|^\s|\s$/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

export function toCsv(rows: readonly (readonly string[])[]): string {
  return rows.map((r) => r.map(csvField).join(',')).join('\r\n') + '\r\n';
}

/** Display width of a string (code points; the table holds no wide characters). */
function width(text: string): number {
  return [...text].length;
}

/** Columns padded to their widest entry, numbers right-aligned; the last column is not padded. */
export function toAligned(rows: readonly (readonly string[])[]): string {
  const cols = Math.max(0, ...rows.map((r) => r.length));
  const widths = Array.from({ length: cols }, (_, c) => Math.max(0, ...rows.map((r) => width(r[c] ?? ''))));
  const numeric = Array.from({ length: cols }, (_, c) =>
    rows.slice(1).every((r) => (r[c] ?? '') === '' || Number.isFinite(Number(r[c]))),
  );
  return (
    rows
      .map((r, i) =>
        r
          .map((cell, c) => {
            if (c === cols - 1) return cell;
            const pad = ' '.repeat((widths[c] ?? 0) - width(cell));
            return numeric[c] && i > 0 ? pad + cell : cell + pad;
          })
          .join('  ')
          .trimEnd(),
      )
      .join('\n') + '\n'
  );
}

export function tableCommand(argv: string[], io: Io): number {
  const line = readCommandLine(
    argv,
    io,
    TABLE_USAGE,
    {
      csv: FLAG,
    },
    false,
  );
  if (line === null) return EXIT_OK;
  const { values } = line;
  const rows = tableRows();
  io.out(values.csv ? toCsv(rows) : toAligned(rows));
  return EXIT_OK;
}
