/**
 * `potentia demo`: recalculates the shipped cathodic-protection template in memory (nothing
 * is written anywhere) and prints its key results as a table.
 */
import * as path from 'node:path';
import { parseArgs } from 'node:util';
import type ExcelJS from 'exceljs';
import { EXIT_OK } from './io';
import type { Io } from './io';
import { readWorkbookFile, recalcWorkbook } from './recalcCommand';
import { toAligned } from './tableCommand';
import { CAUTIONS, CP_TEMPLATE, TEMPLATE_DIR } from './templateLayout';

export const DEMO_USAGE = `Usage: potentia demo

Recalculates assets/templates/${CP_TEMPLATE.file} in memory with the ECHEM functions
(a fictional water utility's pipe-to-soil survey, invented readings) and prints the
converted potentials, the -0.850 V vs Cu/CuSO4 check and a zinc-anode couple's EMF.
Nothing is written. To recalculate a file: npx potentia recalc IN.xlsx -o OUT.xlsx
`;

/** The displayed value of a cell after recalculation (its cached result for a formula). */
export function cellResult(ws: ExcelJS.Worksheet, address: string): unknown {
  const cell = ws.getCell(address);
  // `cell.value` of a formula leaves out a result of 0, FALSE or "": read `cell.result`.
  if (cell.formula) return cell.result as unknown;
  return cell.value as unknown;
}

function show(v: unknown, digits?: number): string {
  if (v === null || v === undefined) return '';
  if (typeof v === 'number') return digits === undefined ? String(v) : v.toFixed(digits);
  if (typeof v === 'object' && v !== null && 'error' in v) return String((v as { error: unknown }).error);
  return String(v);
}

export async function demoCommand(argv: string[], io: Io): Promise<number> {
  const { values } = parseArgs({
    args: argv,
    options: { help: { type: 'boolean', short: 'h', default: false } },
    allowPositionals: false,
    strict: true,
  });
  if (values.help) {
    io.out(DEMO_USAGE);
    return EXIT_OK;
  }
  const file = path.join(TEMPLATE_DIR, CP_TEMPLATE.file);
  const wb = await readWorkbookFile(file);
  const summary = recalcWorkbook(wb);
  const ws = wb.getWorksheet(CP_TEMPLATE.sheet);
  if (ws === undefined) throw new Error(`the template ${file} has no sheet "${CP_TEMPLATE.sheet}"`);

  const t = CP_TEMPLATE;
  const c = t.col;
  const criterion = cellResult(ws, t.criterionCell);
  const rows: string[][] = [
    ['station', 'reference', 'reading (mV)', 'soil (°C)', 'E vs CSE (V)', 'margin (mV)', 'check'],
  ];
  for (let r = t.firstRow; r <= t.lastRow; r++) {
    rows.push([
      show(cellResult(ws, `${c.station}${r}`)),
      show(cellResult(ws, `${c.electrode}${r}`)),
      show(cellResult(ws, `${c.reading}${r}`)),
      show(cellResult(ws, `${c.temp}${r}`)),
      show(cellResult(ws, `${c.vsCse}${r}`), 4),
      show(cellResult(ws, `${c.margin}${r}`), 0),
      show(cellResult(ws, `${c.result}${r}`)),
    ]);
  }

  io.out(`Potentia demo: ${show(cellResult(ws, 'A1'))}\n`);
  io.out(
    `Recalculated ${path.relative(process.cwd(), file) || file} in memory with HyperFormula: ` +
      `${summary.formulas} formulas, ${summary.errors.length} errors, nothing written.\n\n`,
  );
  io.out(
    `Pipe-to-soil potentials converted with ECHEM.VSREF and checked against ${show(criterion, 3)} V vs CSE:\n`,
  );
  io.out(toAligned(rows));
  io.out('\n');
  io.out(`Galvanic couple (zinc anode vs steel): ${show(cellResult(ws, t.couple.cell))}\n`);
  io.out(
    `  EMF ${show(cellResult(ws, t.couple.emf), 4)} V at ${show(cellResult(ws, t.couple.temp), 1)} °C ` +
      `(E° ${show(cellResult(ws, t.couple.e0), 4)} V, =ECHEM.POTENTIAL in ${t.sheet}!${t.couple.emf})\n`,
  );
  for (const e of summary.errors) io.out(`  error ${e.sheet}!${e.cell} ${e.code} ${e.message}\n`);
  io.out('\nCautions:\n');
  for (const line of CAUTIONS) io.out(`  - ${line}\n`);
  io.out(
    '\nNext: npx potentia recalc assets/templates/cell-voltage-sweep.xlsx -o sweep.xlsx\n' +
      '      npx potentia eval \'=ECHEM.POTENTIAL("Cu2+ + 2e- -> Cu", {"Cu2+"}, {0.01}, 25)\'\n',
  );
  return EXIT_OK;
}
