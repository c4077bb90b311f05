/**
 * `potentia eph ELEMENT [--activity A] [--temp C] [--ph-min P] [--ph-max P] [--ref NAME]
 * [--svg FILE] [--csv FILE] [--force]`: an element's E–pH (Pourbaix) diagram as an SVG file
 * and its boundary lines as CSV (or, with neither file, the lines printed as columns).
 */
import * as fs from 'node:fs';
import * as path from 'node:path';
import { readCommandLine } from './commandLine';
import {
  defaultEphWindow,
  EPH_CAUTION,
  EPH_ELEMENTS,
  EPH_LINE_HEADER,
  ephDiagram,
  ephLineRows,
  isEngineError,
  renderEphSvg,
} from '../engine/index';
import { EXIT_OK, UsageError } from './io';
import type { Io } from './io';
import { toAligned, toCsv } from './tableCommand';

export const EPH_USAGE = `Usage: potentia eph ELEMENT [options]

Draws the E–pH (Pourbaix) diagram of an element: which species is thermodynamically stable
at each potential (V vs SHE) and pH, with the regions classed as immunity, corrosion or
passivation, the boundary lines and the water-stability lines.
Elements: ${EPH_ELEMENTS.map((e) => e.symbol).join(', ')}.

Options:
  --activity A    activity of the dissolved species (0 < A <= 1; default 1e-6)
  --temp C        temperature in °C, 0 to 100 (default 25)
  --ph-min P      lowest pH drawn (default 0; -2 to 16)
  --ph-max P      highest pH drawn (default 14; -2 to 16)
  --ref NAME      a second potential axis on this reference scale (e.g. SCE, CSE)
  --svg FILE      write the diagram as an SVG file
  --csv FILE      write the boundary and water lines as CSV (species A, species B, pH1, E1,
                  pH2, E2); "-" prints them
  -f, --force     replace FILE if it exists
With neither --svg nor --csv the lines are printed as columns.

${EPH_CAUTION}
`;

function numberOption(value: string | undefined, name: string, fallback: number): number {
  if (value === undefined) return fallback;
  const x = Number(value);
  if (value.trim() === '' || !Number.isFinite(x))
    throw new UsageError(`${name} must be a number; got "${value}"`);
  return x;
}

function writeOutput(file: string, text: string, force: boolean, io: Io): void {
  if (file === '-') {
    io.out(text);
    return;
  }
  if (file.trim() === '') throw new UsageError('an output file name is empty');
  if (fs.existsSync(file) && !force)
    throw new UsageError(`${file} already exists: add --force to replace it, or choose another name`);
  const dir = path.dirname(path.resolve(file));
  if (!fs.existsSync(dir)) throw new UsageError(`the folder for the output does not exist: ${dir}`);
  try {
    fs.writeFileSync(file, text, 'utf8');
  } catch (e) {
    throw new UsageError(`cannot write ${file} (${e instanceof Error ? e.message : String(e)})`);
  }
}

/** Rounds a number for the text outputs (1e-6 V is far below any data's precision). */
function fmt(x: number): string {
  return String(Math.round(x * 1e6) / 1e6);
}

/** Runs `potentia eph`; returns the exit code. Engine errors become usage errors (exit 2). */
export function ephCommand(argv: string[], io: Io): number {
  const line = readCommandLine(
    argv,
    io,
    EPH_USAGE,
    {
      activity: { type: 'string' },
      temp: { type: 'string' },
      'ph-min': { type: 'string' },
      'ph-max': { type: 'string' },
      ref: { type: 'string' },
      svg: { type: 'string' },
      csv: { type: 'string' },
      force: { type: 'boolean', short: 'f', default: false },
    },
    true,
  );
  if (line === null) return EXIT_OK;
  const { values, positionals } = line;
  if (positionals.length !== 1) {
    throw new UsageError(
      positionals.length === 0
        ? `eph needs an element, e.g. potentia eph Fe --svg fe.svg (elements: ${EPH_ELEMENTS.map((e) => e.symbol).join(', ')})`
        : `eph takes one element, got ${positionals.length}: ${positionals.join(' ')}`,
    );
  }
  const element = positionals[0] as string;
  const activity = numberOption(values.activity, '--activity', 1e-6);
  const tempC = numberOption(values.temp, '--temp', 25);
  const pHMin = numberOption(values['ph-min'], '--ph-min', 0);
  const pHMax = numberOption(values['ph-max'], '--ph-max', 14);
  try {
    const diagram = ephDiagram(element, activity, tempC, defaultEphWindow(element, pHMin, pHMax));
    const rows = ephLineRows(element, activity, tempC, pHMin, pHMax);
    const table = [
      [...EPH_LINE_HEADER],
      ...rows.map((r) => [r[0], r[1], fmt(r[2]), fmt(r[3]), fmt(r[4]), fmt(r[5])]),
    ];
    if (values.svg !== undefined) {
      const svg = renderEphSvg(diagram, values.ref !== undefined ? { referenceScale: values.ref } : {});
      writeOutput(values.svg, svg, values.force, io);
    }
    if (values.csv !== undefined) writeOutput(values.csv, toCsv(table), values.force, io);
    if (values.svg === undefined && values.csv === undefined) io.out(toAligned(table));
    if (values.svg !== undefined && values.svg !== '-') {
      const regions = diagram.regions.map((r) => `${r.species} (${r.cls})`).join(', ');
      io.err(
        `wrote ${values.svg}: ${diagram.element.name}, regions ${regions}` +
          (diagram.absent.length ? `; no region: ${diagram.absent.join(', ')}` : '') +
          '\n',
      );
    }
    return EXIT_OK;
  } catch (e) {
    if (isEngineError(e)) throw new UsageError(e.message);
    throw e;
  }
}
