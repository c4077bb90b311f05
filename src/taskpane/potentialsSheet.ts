/**
 * The potentials sheet: the built-in table of standard potentials (all of it, or the rows
 * that a filter picks) as an ordinary, editable range on a new worksheet, with its units
 * and a worked example of passing it as the `table` argument. DOM-free and Office-free:
 * {@link planPotentialsSheet} returns what to write; officeActions.ts writes it.
 *
 * Filter (what the user types):
 * - an element symbol alone ("Fe", "Cu", "O") picks every row with a species containing
 *   that element;
 * - a species ("Cu2+", "Fe3+", "MnO4-", "Cu²⁺") picks the rows where that species (same
 *   formula and charge, any phase) takes part;
 * - anything else, or a species that no row has, picks the rows whose text contains it
 *   (ignoring case), e.g. "(OH)" or "CN".
 */
import {
  type BuiltinPotentialRow,
  compiledReaction,
  filterPotentials,
  formatSpecies,
  phaseOf,
} from '../engine/index';
import type { CellBlock, SheetPlan } from './sheetPlan';
import { asCellText, rangeAddress, sheetRef, uniqueSheetName } from './sheetNames';

/** The header row of the potentials sheet. */
export const POTENTIALS_HEADER = [
  'Half-reaction',
  'E° (V vs SHE, 25 °C)',
  'dE°/dT (mV/K)',
  'Source',
] as const;

/** Empty rows the suggested table range takes in below the written rows, for rows the user adds. */
export const ROOM_TO_GROW_ROWS = 50;

/** The name the sheet gets where the workbook has none of that name. */
export const POTENTIALS_BASE_NAME = 'Potentials';

export { filterPotentials, type FilterResult, type FilterRule } from '../engine/index';

/** The plan of a potentials sheet, with what the pane tells the user about it. */
export interface PotentialsSheetPlan extends SheetPlan {
  /** Number of half-reactions written. */
  readonly rowCount: number;
  /** The header and data, e.g. "A1:D65". */
  readonly tableAddress: string;
  /** What to pass as the `table` argument: the rows written plus {@link ROOM_TO_GROW_ROWS} empty ones, e.g. "Potentials!A2:D115". */
  readonly tableRef: string;
  /** A formula that uses the sheet as its table. */
  readonly exampleFormula: string;
  /** Where the notes are, e.g. "F1:F4". */
  readonly notesAddress: string;
  /** The sentence the pane shows after writing. */
  readonly summary: string;
}

function arrayConstant(items: readonly (string | number)[]): string {
  return `{${items.map((v) => (typeof v === 'number' ? String(v) : `"${v.replace(/"/g, '""')}"`)).join(',')}}`;
}

/**
 * A formula that computes one row's electrode potential with this sheet as the table: the
 * Fe3+/Fe2+ couple where that row is on the sheet, else the first row with a species whose
 * activity counts (solutes 0.1, 0.01, …; gases 1 bar).
 */
export function exampleFormulaFor(rows: readonly BuiltinPotentialRow[], tableRef: string): string {
  const ferric = rows.find((r) => r.halfReaction === 'Fe3+ + e- -> Fe2+');
  if (ferric) return `=ECHEM.POTENTIAL("Fe3+/Fe2+",{"Fe3+","Fe2+"},{0.1,0.01},25,${tableRef})`;
  for (const row of rows) {
    let terms;
    try {
      terms = compiledReaction(row.halfReaction, null).terms.filter((t) => !t.pure);
    } catch {
      continue;
    }
    if (terms.length === 0) continue;
    let solute = 0;
    const names = terms.map((t) => formatSpecies(t.species, false));
    const values = terms.map((t) => (phaseOf(t.species) === 'g' ? 1 : solute++ % 2 === 0 ? 0.1 : 0.01));
    const reaction = row.halfReaction.replace(/"/g, '""');
    return `=ECHEM.POTENTIAL("${reaction}",${arrayConstant(names)},${arrayConstant(values)},25,${tableRef})`;
  }
  const first = rows[0];
  const reaction = first ? first.halfReaction.replace(/"/g, '""') : 'Fe3+/Fe2+';
  return `=ECHEM.STDPOTENTIAL("${reaction}",25,${tableRef})`;
}

/**
 * What to write for a potentials sheet: the filtered built-in rows under the header in
 * A1:D…, and notes in column F (units; how to pass the range as `table`; a live example).
 * The sheet name is "Potentials", or "Potentials (2)" etc. where that name is taken.
 *
 * @throws Error where the filter picks no row (nothing is then written)
 */
export function planPotentialsSheet(
  rows: readonly BuiltinPotentialRow[],
  filter: string,
  existingSheets: readonly string[],
): PotentialsSheetPlan {
  const picked = filterPotentials(rows, filter);
  if (picked.rows.length === 0) {
    throw new Error(
      `no built-in half-reaction matches ${picked.described}. Type an element symbol (Fe), a species (Cu2+), or leave the filter empty for the whole table.`,
    );
  }
  const sheetName = uniqueSheetName(POTENTIALS_BASE_NAME, existingSheets);
  const n = picked.rows.length;
  const last = n + 1;
  const dataAddress = rangeAddress(1, 2, 4, last);
  const lastRoom = last + ROOM_TO_GROW_ROWS;
  const tableRef = `${sheetRef(sheetName)}!${rangeAddress(1, 2, 4, lastRoom)}`;
  const exampleFormula = exampleFormulaFor(picked.rows, tableRef);
  const notesAddress = 'F1:F5';
  const blocks: CellBlock[] = [
    { address: rangeAddress(1, 1, 4, 1), values: [[...POTENTIALS_HEADER]], bold: true },
    {
      address: dataAddress,
      values: picked.rows.map((r) => [asCellText(r.halfReaction), r.e0V, r.dE0dTmVperK ?? '', r.source]),
    },
    {
      address: 'F1:F3',
      values: [
        [
          'Units: E° in volts vs SHE at 25 °C; dE°/dT in mV/K near 25 °C (blank: none known, so E° at 25 °C is used at every temperature). ' +
            'Standard states: solutes at unit activity (1 mol/L), gases at 1 bar, pure solids, liquids and water at activity 1.',
        ],
        [
          `Pass ${tableRef} as the table argument (the last argument) of the ECHEM functions. Your rows take precedence over built-in rows for the same couple. ` +
            `The range takes in ${ROOM_TO_GROW_ROWS} empty rows below the data (rows ${last + 1} to ${lastRoom}) for couples you add; empty rows are skipped. ` +
            `Beyond row ${lastRoom}, extend the range. =ECHEM.CHECKTABLE(${tableRef}) lists any problem rows.`,
        ],
        [`Example: ${exampleFormula.slice(1)}`],
      ],
    },
    { address: 'F4', values: [['The example, computed (V vs SHE):']], italic: true },
    { address: 'F5', formulas: [[exampleFormula]] },
  ];
  const summary =
    `Created sheet "${sheetName}" with ${n} half-reaction${n === 1 ? '' : 's'} (${picked.described}) in ${rangeAddress(1, 1, 4, last)}, ` +
    `header in row 1, notes in ${notesAddress}. Pass ${tableRef} as the table argument (it has room for ${ROOM_TO_GROW_ROWS} rows you add).`;
  return {
    sheetName,
    blocks,
    freezeRows: 1,
    autofitColumns: 'A:D',
    rowCount: n,
    tableAddress: rangeAddress(1, 1, 4, last),
    tableRef,
    exampleFormula,
    notesAddress,
    summary,
  };
}
