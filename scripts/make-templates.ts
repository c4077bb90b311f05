/**
 * Generates the shipped templates in assets/templates/ (run: npm run templates).
 *
 * Each template is a scenario of our own: fictional organisations, invented data. Each has
 * its own editable Potentials sheet (rows copied from the built-in table) that its formulas
 * use through the `table` argument, a Notes sheet, and the cautions on the working sheet.
 * After laying the sheets out, the generator recalculates them with the headless runner so
 * the files carry computed values (what a viewer without the add-in shows), and marks them
 * for a full recalculation when a spreadsheet program opens them.
 */
import * as fs from 'node:fs';
import * as path from 'node:path';
import ExcelJS from 'exceljs';
import { BUILTIN_POTENTIALS } from '../src/engine/index';
import { recalcWorkbook } from '../src/cli/recalcCommand';
import { TABLE_HEADER } from '../src/cli/tableCommand';
import {
  CAL_TEMPLATE,
  CAUTIONS,
  CP_TEMPLATE,
  POTENTIALS_RANGE,
  POTENTIALS_SHEET,
  SWEEP_TEMPLATE,
  TEMPLATE_DIR,
} from '../src/cli/templateLayout';

const VOLTS = '0.0000';
const BOLD = { bold: true };
const TITLE = { bold: true, size: 14 };
const INPUT_FILL: ExcelJS.Fill = { type: 'pattern', pattern: 'solid', fgColor: { argb: 'FFFFF2CC' } };

function newWorkbook(title: string): ExcelJS.Workbook {
  const wb = new ExcelJS.Workbook();
  wb.creator = 'Potentia template generator';
  wb.title = title;
  // Fixed dates keep regenerated files byte-comparable in content.
  wb.created = new Date(Date.UTC(2025, 0, 1));
  wb.modified = new Date(Date.UTC(2025, 0, 1));
  wb.calcProperties.fullCalcOnLoad = true;
  return wb;
}

function formula(cell: ExcelJS.Cell, text: string): void {
  cell.value = { formula: text } as ExcelJS.CellFormulaValue;
}

/** A spilled formula, written as an array formula over its spill range. */
function spill(ws: ExcelJS.Worksheet, ref: string, text: string): void {
  const [first] = ref.split(':');
  ws.getCell(first as string).value = {
    formula: text,
    shareType: 'array',
    ref,
  } as unknown as ExcelJS.CellValue;
}

function header(ws: ExcelJS.Worksheet, row: number, labels: readonly string[]): void {
  labels.forEach((label, i) => {
    const cell = ws.getCell(row, i + 1);
    cell.value = label;
    cell.font = BOLD;
    cell.alignment = { wrapText: true, vertical: 'top' };
  });
}

function input(cell: ExcelJS.Cell, value: ExcelJS.CellValue): void {
  cell.value = value;
  cell.fill = INPUT_FILL;
}

function cautions(ws: ExcelJS.Worksheet, row: number, extra: readonly string[] = []): void {
  ws.getCell(row, 1).value = 'Cautions';
  ws.getCell(row, 1).font = BOLD;
  [...CAUTIONS, ...extra].forEach((text, i) => {
    ws.getCell(row + 1 + i, 1).value = text;
  });
}

/** The Potentials sheet: header and the built-in rows for the given half-reactions. */
function potentialsSheet(wb: ExcelJS.Workbook, halfReactions: readonly string[], note: string): void {
  const ws = wb.addWorksheet(POTENTIALS_SHEET);
  header(ws, 1, TABLE_HEADER);
  halfReactions.forEach((text, i) => {
    const row = BUILTIN_POTENTIALS.find((r) => r.halfReaction === text);
    if (row === undefined) throw new Error(`the built-in table has no row "${text}"`);
    ws.getCell(i + 2, 1).value = row.halfReaction;
    ws.getCell(i + 2, 2).value = row.e0V;
    ws.getCell(i + 2, 3).value = row.dE0dTmVperK;
    ws.getCell(i + 2, 4).value = row.source;
  });
  ws.getColumn(1).width = 44;
  ws.getColumn(2).width = 10;
  ws.getColumn(3).width = 14;
  ws.getColumn(4).width = 60;
  ws.getCell('F1').value = 'About this table';
  ws.getCell('F1').font = BOLD;
  const lines = [
    'Half-reactions are written as reductions; E° in V vs SHE at 25 °C; dE°/dT in mV/K (blank: E° at 25 °C is used at every temperature).',
    `The formulas of this workbook read rows 2 to 40 (${POTENTIALS_RANGE}). Edit a value, or add your own formal potentials or in-house reference couples in the empty rows; a row of yours takes precedence over the built-in row for the same couple.`,
    'Blank rows are skipped. =ECHEM.CHECKTABLE(A2:D40) lists rows that do not balance, bad numbers and duplicates.',
    'The rows here were copied from the built-in table (potentia table), with the source of each value.',
    note,
  ];
  lines.forEach((t, i) => {
    ws.getCell(i + 2, 6).value = t;
  });
  ws.getColumn(6).width = 100;
}

function notesSheet(wb: ExcelJS.Workbook, lines: readonly string[]): void {
  const ws = wb.addWorksheet('Notes');
  ws.getColumn(1).width = 120;
  lines.forEach((t, i) => {
    ws.getCell(i + 1, 1).value = t;
    if (i === 0) ws.getCell(i + 1, 1).font = TITLE;
  });
}

// ---------------------------------------------------------------------------------------
// (1) Cathodic-protection check sheet

/** Invented survey readings: station, chainage (m), reference electrode, reading (mV), soil °C. */
const CP_READINGS: readonly [string, number, string, number, number][] = [
  ['TS-01', 0, 'Ag/AgCl sat. KCl', -812, 11],
  ['TS-02', 180, 'Ag/AgCl sat. KCl', -748, 11],
  ['TS-03', 360, 'CSE', -905, 12],
  ['TS-04', 540, 'CSE', -838, 12],
  ['TS-05', 720, 'Ag/AgCl sat. KCl', -702, 13],
  ['TS-06', 900, 'Ag/AgCl sat. KCl', -760, 13],
  ['TS-07', 1080, 'CSE', -872, 14],
  ['TS-08', 1260, 'Ag/AgCl sat. KCl', -733, 14],
  ['TS-09', 1440, 'Ag/AgCl sat. KCl', -691, 15],
  ['TS-10', 1620, 'CSE', -950, 15],
  ['TS-11', 1800, 'Ag/AgCl sat. KCl', -779, 16],
  ['TS-12', 1980, 'CSE', -846, 16],
];

function cathodicProtection(): ExcelJS.Workbook {
  const t = CP_TEMPLATE;
  const c = t.col;
  const wb = newWorkbook('Cathodic-protection check: Tessivar Water Board, Quorrel Ridge trunk main');
  const ws = wb.addWorksheet(t.sheet);
  ws.getCell('A1').value = 'Tessivar Water Board: Quorrel Ridge trunk main cathodic-protection survey';
  ws.getCell('A1').font = TITLE;
  ws.getCell('A2').value =
    'Fictional scenario, invented readings. Pipe-to-soil potentials of a buried steel main, current on (IR drop not corrected), converted to the saturated Cu/CuSO4 scale (CSE) with ECHEM.VSREF at the soil temperature.';
  ws.getCell('A3').value = 'Criterion (V vs CSE)';
  input(ws.getCell(t.criterionCell), -0.85);
  ws.getCell('C3').value = 'Scale';
  ws.getCell(t.scaleCell).value = 'CSE';

  header(ws, t.headerRow, [
    'Station',
    'Chainage (m)',
    'Reference electrode',
    'Reading (mV)',
    'Soil temperature (°C)',
    'E vs CSE (V)',
    'Margin (mV, + = more negative than criterion)',
    'Result',
  ]);
  CP_READINGS.forEach(([station, chainage, electrode, mV, soil], i) => {
    const r = t.firstRow + i;
    ws.getCell(`${c.station}${r}`).value = station;
    ws.getCell(`${c.chainage}${r}`).value = chainage;
    input(ws.getCell(`${c.electrode}${r}`), electrode);
    input(ws.getCell(`${c.reading}${r}`), mV);
    input(ws.getCell(`${c.temp}${r}`), soil);
    formula(
      ws.getCell(`${c.vsCse}${r}`),
      `ECHEM.VSREF(${c.reading}${r}/1000,${c.electrode}${r},$${t.scaleCell[0]}$${t.scaleCell.slice(1)},,${c.temp}${r})`,
    );
    ws.getCell(`${c.vsCse}${r}`).numFmt = VOLTS;
    formula(ws.getCell(`${c.margin}${r}`), `($B$3-${c.vsCse}${r})*1000`);
    ws.getCell(`${c.margin}${r}`).numFmt = '0';
    formula(
      ws.getCell(`${c.result}${r}`),
      `IF(ISNUMBER(${c.vsCse}${r}),IF(${c.vsCse}${r}<=$B$3,"PASS","CHECK"),"CHECK")`,
    );
  });

  const g = t.couple;
  ws.getCell(`A${g.titleRow}`).value =
    'Galvanic couple: zinc anode vs steel (driving voltage, thermodynamic estimate)';
  ws.getCell(`A${g.titleRow}`).font = BOLD;
  ws.getCell('A21').value = 'Cell (anode left, steel right)';
  input(ws.getCell(g.cell), 'Zn(s) | Zn2+(aq) || Fe2+(aq) | Fe(s)');
  ws.getCell('A22').value = 'Species';
  ws.getCell('B22').value = 'Zn2+';
  ws.getCell('C22').value = 'Fe2+';
  ws.getCell('A23').value = 'Activities (assumed: zinc ions near the anode, trace iron at the steel)';
  input(ws.getCell('B23'), 1e-4);
  input(ws.getCell('C23'), 1e-6);
  ws.getCell('A24').value = 'Temperature (°C): mean soil temperature of the survey';
  formula(ws.getCell(g.temp), `AVERAGE(${c.temp}${t.firstRow}:${c.temp}${t.lastRow})`);
  ws.getCell('A25').value = 'EMF (V)';
  formula(ws.getCell(g.emf), `ECHEM.POTENTIAL(B21,B22:C22,B23:C23,B24,${POTENTIALS_RANGE})`);
  ws.getCell(g.emf).numFmt = VOLTS;
  ws.getCell('A26').value = 'E° of the couple at that temperature (V)';
  formula(ws.getCell(g.e0), `ECHEM.STDPOTENTIAL(B21,B24,${POTENTIALS_RANGE})`);
  ws.getCell(g.e0).numFmt = VOLTS;
  ws.getCell('A27').value = 'Where E° comes from';
  formula(ws.getCell(g.source), `ECHEM.SOURCE(B21,${POTENTIALS_RANGE})`);

  cautions(ws, t.cautionsRow, [
    'Readings taken with the current on include an IR drop; the criterion applies to the polarized (instant-off) potential unless the IR drop is shown to be negligible.',
  ]);
  ws.getColumn(1).width = 30;
  ws.getColumn(2).width = 14;
  ws.getColumn(3).width = 20;
  for (const col of [4, 5, 6, 7]) ws.getColumn(col).width = 16;
  ws.getColumn(8).width = 10;

  anodeSheet(wb);
  potentialsSheet(
    wb,
    [
      'Zn2+ + 2 e- -> Zn',
      'Fe2+ + 2 e- -> Fe',
      'Cu2+ + 2 e- -> Cu',
      'AgCl(s) + e- -> Ag + Cl-',
      'O2(g) + 2 H2O + 4 e- -> 4 OH-',
      '2 H+ + 2 e- -> H2(g)',
    ],
    'The reference-electrode potentials used by ECHEM.VSREF are built in (potentia eval "=ECHEM.VSREF(0,\\"CSE\\",\\"SHE\\")").',
  );
  notesSheet(wb, [
    'Cathodic-protection check sheet',
    'Scenario: the Tessivar Water Board (an invented utility) surveys the Quorrel Ridge trunk main (an invented place), a buried, coated steel main protected by zinc anodes. All names and readings are invented.',
    'How to use: enter each test station\'s reading in mV, the reference electrode it was taken with (any name ECHEM.VSREF knows, e.g. "Ag/AgCl sat. KCl", "CSE", "SCE") and the soil temperature. Yellow cells are inputs.',
    "Column F converts each reading to the saturated Cu/CuSO4 scale with ECHEM.VSREF(E, from, to, , temp_C) (the empty place is pH, needed for RHE only), including the reference electrodes' temperature coefficients where known.",
    'Column H compares it with the criterion in B3 (-0.850 V vs CSE): PASS when at least as negative, otherwise CHECK. The 100 mV polarization criterion needs instant-off and depolarized readings, which this sheet does not hold.',
    'Rows 20-27: the EMF of a zinc anode against the steel, from the Potentials sheet, at the mean soil temperature, with ECHEM.POTENTIAL and the source of E° from ECHEM.SOURCE.',
    'Sheet "Anodes and corrosion": the life of each galvanic anode by ECHEM.ANODELIFE(mass_kg, capacity_Ah_kg or material, current_A, utilisation or anode type), and corrosion rates of the probes by ECHEM.CORRATE and ECHEM.MASSLOSS (ASTM G102), each with a plain-arithmetic check.',
    'Recalculate without a spreadsheet program: potentia recalc cathodic-protection-check.xlsx -o survey.xlsx',
    '',
    'Cautions',
    ...CAUTIONS,
  ]);
  return wb;
}

// ---------------------------------------------------------------------------------------
// (2) Cell-voltage sweep over composition and temperature

/** Invented cases: label, a(Zn2+), a(Cu2+), temperature °C. */
const SWEEP_CASES: readonly [string, number, number, number][] = [
  ['standard, 25 °C', 1, 1, 25],
  ['fresh electrolyte', 0.01, 1, 25],
  ['half discharged', 0.5, 0.5, 25],
  ['nearly spent', 1, 0.01, 25],
  ['deeply spent', 1, 0.0001, 25],
  ['cold store', 0.1, 1, 5],
  ['cold store, spent', 1, 0.01, 5],
  ['warm bench', 0.1, 1, 40],
  ['warm bench, spent', 1, 0.01, 40],
  ['hot test', 0.1, 1, 60],
  ['hot test, spent', 1, 0.01, 60],
  ['dilute both', 0.001, 0.001, 25],
];

function cellSweep(): ExcelJS.Workbook {
  const t = SWEEP_TEMPLATE;
  const c = t.col;
  const wb = newWorkbook('Cell-voltage sweep: Velkamoor Cell Works, zinc-copper reference cell');
  const ws = wb.addWorksheet(t.sheet);
  ws.getCell('A1').value =
    'Velkamoor Cell Works: zinc-copper reference cell, EMF over composition and temperature';
  ws.getCell('A1').font = TITLE;
  ws.getCell('A2').value =
    'Fictional scenario, invented cases. One spilled ECHEM.POTENTIAL formula (E7) computes every case; column G repeats the Nernst equation in plain spreadsheet arithmetic as a check.';
  ws.getCell('A4').value = 'Cell';
  input(ws.getCell(t.cellText), 'Zn(s) | Zn2+(aq) || Cu2+(aq) | Cu(s)');
  ws.getCell('B5').value = 'activity of';
  ws.getCell('B5').font = BOLD;
  header(ws, t.speciesRow, [
    'Case',
    'Zn2+',
    'Cu2+',
    'Temperature (°C)',
    'EMF (V)',
    'E° at temperature (V)',
    'Hand check (V)',
    'Difference (µV)',
  ]);
  const first = t.firstRow;
  const last = t.lastRow;
  SWEEP_CASES.forEach(([label, zn, cu, temp], i) => {
    const r = first + i;
    ws.getCell(`${c.label}${r}`).value = label;
    input(ws.getCell(`${c.zinc}${r}`), zn);
    input(ws.getCell(`${c.copper}${r}`), cu);
    input(ws.getCell(`${c.temp}${r}`), temp);
    formula(ws.getCell(`${c.e0}${r}`), `ECHEM.STDPOTENTIAL($B$4,${c.temp}${r},${POTENTIALS_RANGE})`);
    formula(
      ws.getCell(`${c.handCheck}${r}`),
      `${c.e0}${r}-(8.31446261815324*(${c.temp}${r}+273.15)/(2*96485.33212))*LN(${c.zinc}${r}/${c.copper}${r})`,
    );
    formula(ws.getCell(`${c.differenceMicroV}${r}`), `(${c.emf}${r}-${c.handCheck}${r})*1000000`);
    for (const col of [c.emf, c.e0, c.handCheck]) ws.getCell(`${col}${r}`).numFmt = VOLTS;
    ws.getCell(`${c.differenceMicroV}${r}`).numFmt = '0.000';
  });
  spill(
    ws,
    `${c.emf}${first}:${c.emf}${last}`,
    `ECHEM.POTENTIAL($B$4,${c.zinc}${t.speciesRow}:${c.copper}${t.speciesRow},${c.zinc}${first}:${c.copper}${last},${c.temp}${first}:${c.temp}${last},${POTENTIALS_RANGE})`,
  );
  ws.getCell(`G${t.lastRow + 2}`).value = 'Largest |difference| (µV)';
  ws.getCell(`G${t.lastRow + 2}`).font = BOLD;
  formula(
    ws.getCell(t.maxDifferenceCell),
    `MAX(MAX(${c.differenceMicroV}${first}:${c.differenceMicroV}${last}),-MIN(${c.differenceMicroV}${first}:${c.differenceMicroV}${last}))`,
  );
  cautions(ws, t.cautionsRow, [
    "A real cell's terminal voltage also depends on current, internal resistance, junction potentials and activity coefficients; this sheet gives the reversible EMF for the activities entered.",
  ]);
  ws.getColumn(1).width = 22;
  for (const col of [2, 3, 4, 5, 6, 7, 8]) ws.getColumn(col).width = 15;

  faradaySheet(wb);
  potentialsSheet(
    wb,
    ['Zn2+ + 2 e- -> Zn', 'Cu2+ + 2 e- -> Cu', '2 H+ + 2 e- -> H2(g)'],
    'E° at another temperature uses the dE°/dT column; edit it, enter 0 for a constant E°, or leave it blank to take it from the species entropies.',
  );
  notesSheet(wb, [
    'Cell-voltage sweep',
    'Scenario: Velkamoor Cell Works (an invented maker of laboratory reference cells) tabulates the reversible EMF of a zinc-copper cell over electrolyte composition and storage temperature. All cases are invented.',
    'How to use: edit the activities (columns B and C; their headers in row 6 name the species) and temperatures (column D); add cases by extending the ranges in E7 (an array formula over E7:E18).',
    'E7: =ECHEM.POTENTIAL(cell, species header, values matrix, temperature column, Potentials table) spills one EMF per case. Column F gives E° at each temperature; column G is the Nernst equation in plain arithmetic with the SI exact constants; column H shows the difference in µV.',
    'Sheet "Faraday and capacity": mass plated by a charge (ECHEM.DEPOSIT), plating time and thickness (ECHEM.PLATETIME, ECHEM.THICKNESS), theoretical capacities (ECHEM.CAPACITY) and specific energies (ECHEM.SPECENERGY), with plain-arithmetic checks.',
    'Recalculate without a spreadsheet program: potentia recalc cell-voltage-sweep.xlsx -o sweep.xlsx',
    '',
    'Cautions',
    ...CAUTIONS,
  ]);
  return wb;
}

// ---------------------------------------------------------------------------------------
// (3) Electrode calibration sheet

/** Invented calibration readings: temperature °C, buffer pH (at that temperature), mV. */
const CAL_READINGS: readonly [number, number, number][] = [
  [15, 4.0, 171.2],
  [15, 7.0, 2.3],
  [15, 10.0, -166.8],
  [25, 4.0, 177.6],
  [25, 7.0, 1.8],
  [25, 10.0, -174.6],
  [37, 4.0, 174.1],
  [37, 7.0, 0.6],
  [37, 10.0, -172.3],
];

function calibration(): ExcelJS.Workbook {
  const t = CAL_TEMPLATE;
  const c = t.col;
  const s = t.summaryCol;
  const wb = newWorkbook('Electrode calibration: Drennavik Analytical, pH electrode at three temperatures');
  const ws = wb.addWorksheet(t.sheet);
  ws.getCell('A1').value = 'Drennavik Analytical: pH electrode calibration at three temperatures';
  ws.getCell('A1').font = TITLE;
  ws.getCell('A2').value =
    'Fictional scenario, invented readings. Measured slope by SLOPE() against the ideal Nernst slope ECHEM.NERNSTSLOPE(temp_C) at each temperature.';
  header(ws, t.headerRow, ['Temperature (°C)', 'Buffer pH at that temperature', 'Reading (mV)']);
  CAL_READINGS.forEach(([temp, pH, mV], i) => {
    const r = t.firstRow + i;
    input(ws.getCell(`${c.temp}${r}`), temp);
    input(ws.getCell(`${c.pH}${r}`), pH);
    input(ws.getCell(`${c.mV}${r}`), mV);
  });
  header(ws, t.summaryHeaderRow, [
    'Temperature (°C)',
    'Measured slope (mV/pH)',
    'Ideal slope (mV/pH)',
    '% of ideal',
    'Potential at pH 7 (mV)',
    'Result (slope 95-102 %, |E(pH 7)| <= 30 mV)',
    'E° of the Ag/AgCl internal element at that temperature (V)',
  ]);
  for (let k = 0; k < t.temps; k++) {
    const r = t.summaryFirstRow + k;
    const a = t.firstRow + k * t.buffersPerTemp;
    const b = a + t.buffersPerTemp - 1;
    const mv = `${c.mV}${a}:${c.mV}${b}`;
    const ph = `${c.pH}${a}:${c.pH}${b}`;
    formula(ws.getCell(`${s.temp}${r}`), `${c.temp}${a}`);
    formula(ws.getCell(`${s.slope}${r}`), `SLOPE(${mv},${ph})`);
    formula(ws.getCell(`${s.ideal}${r}`), `-1000*ECHEM.NERNSTSLOPE(${s.temp}${r})`);
    formula(ws.getCell(`${s.percent}${r}`), `100*${s.slope}${r}/${s.ideal}${r}`);
    // Least-squares line through the mean point (portable: not every engine has INTERCEPT).
    formula(ws.getCell(`${s.offset}${r}`), `AVERAGE(${mv})+${s.slope}${r}*(7-AVERAGE(${ph}))`);
    formula(
      ws.getCell(`${s.result}${r}`),
      `IF(AND(${s.percent}${r}>=95,${s.percent}${r}<=102,ABS(${s.offset}${r})<=30),"PASS","CHECK")`,
    );
    formula(
      ws.getCell(`${s.refE0}${r}`),
      `ECHEM.STDPOTENTIAL("AgCl(s) + e- -> Ag + Cl-",${s.temp}${r},${POTENTIALS_RANGE})`,
    );
    ws.getCell(`${s.slope}${r}`).numFmt = '0.00';
    ws.getCell(`${s.ideal}${r}`).numFmt = '0.00';
    ws.getCell(`${s.percent}${r}`).numFmt = '0.0';
    ws.getCell(`${s.offset}${r}`).numFmt = '0.0';
    ws.getCell(`${s.refE0}${r}`).numFmt = '0.00000';
  }
  cautions(ws, t.cautionsRow, [
    "The acceptance limits in row 16 are the laboratory's own (fictional) procedure; use the limits of your method, the electrode maker and your quality system. Buffer pH changes with temperature: enter the value printed on the buffer's certificate for each temperature.",
  ]);
  ws.getColumn(1).width = 18;
  for (const col of [2, 3, 4, 5, 6, 7]) ws.getColumn(col).width = 18;

  potentialsSheet(
    wb,
    ['AgCl(s) + e- -> Ag + Cl-', '2 H+ + 2 e- -> H2(g)', 'Hg2Cl2(s) + 2 e- -> 2 Hg(l) + 2 Cl-'],
    "Column G of the Calibration sheet reads the Ag/AgCl row; replace it with your electrode maker's value if you have one.",
  );
  notesSheet(wb, [
    'Electrode calibration',
    'Scenario: Drennavik Analytical (an invented water-testing laboratory) calibrates a combination pH electrode in three buffers at 15, 25 and 37 °C. All readings are invented.',
    'How to use: enter the buffer pH at each temperature and the electrode reading in mV (yellow cells, rows 5-13, three buffers per temperature).',
    'Row 17-19: measured slope = SLOPE(mV, pH); ideal slope = -1000 x ECHEM.NERNSTSLOPE(temp_C), i.e. -RT ln10 / F in mV per pH unit with the SI exact constants; % of ideal; the potential at pH 7 on the fitted line; and the E° of the Ag/AgCl element at that temperature from the Potentials sheet.',
    'The same layout serves an ion-selective electrode: put log10 of the ion activity in column B, and use ECHEM.NERNSTSLOPE(temp_C, z) for an ion of charge z (the sign of the slope follows the charge).',
    'Recalculate without a spreadsheet program: potentia recalc electrode-calibration.xlsx -o calibration.xlsx',
    '',
    'Cautions',
    ...CAUTIONS,
  ]);
  return wb;
}

// ---------------------------------------------------------------------------------------
// Sheets of the Faraday, corrosion and anode functions

/** Layout of the cell-voltage template's Faraday and capacity sheet. */
export const FARADAY_SHEET = {
  name: 'Faraday and capacity',
  depositRows: [5, 6, 7],
  plateRows: [11, 12, 13],
  capacityRows: [17, 18, 19],
  energyRows: [22, 23],
  cautionsRow: 26,
} as const;

/** Invented plating cases: reaction, charge (C), efficiency, molar mass (g/mol) and n for the hand check. */
const DEPOSIT_CASES: readonly [string, number, number, number, number][] = [
  ['Cu2+ + 2 e- -> Cu', 3600, 0.98, 63.546, 2],
  ['Zn2+ + 2 e- -> Zn', 7200, 0.9, 65.38, 2],
  ['Ag+ + e- -> Ag', 1800, 1, 107.87, 1],
];
/** Invented plating jobs: reaction, thickness (µm), current density (A/m²), density (g/cm³), efficiency. */
const PLATE_CASES: readonly [string, number, number, number, number][] = [
  ['Cu2+ + 2 e- -> Cu', 25, 200, 8.96, 0.98],
  ['Zn2+ + 2 e- -> Zn', 10, 150, 7.13, 0.9],
  ['Ni2+ + 2 e- -> Ni', 15, 300, 8.9, 0.95],
];
const CAPACITY_CASES: readonly [string, string | number][] = [
  ['Zn2+ + 2 e- -> Zn', ''],
  ['Cu2+ + 2 e- -> Cu', ''],
  ['LiFePO4', 1],
];
const ENERGY_CASES: readonly [string, number][] = [
  ['Zn + Cu2+ -> Zn2+ + Cu', 25],
  ['Pb + PbO2 + 2 H2SO4 -> 2 PbSO4 + 2 H2O', 25],
];

function faradaySheet(wb: ExcelJS.Workbook): void {
  const t = FARADAY_SHEET;
  const ws = wb.addWorksheet(t.name);
  ws.getCell('A1').value =
    'Velkamoor Cell Works: electrode plating, theoretical capacity and specific energy';
  ws.getCell('A1').font = TITLE;
  ws.getCell('A2').value =
    "Invented cases. Faraday's law (ECHEM.DEPOSIT, PLATETIME, THICKNESS) with a plain-arithmetic check, theoretical capacities (ECHEM.CAPACITY) and specific energies (ECHEM.SPECENERGY, E° from the built-in table).";
  header(ws, 4, [
    'Electrode reaction',
    'Charge (C)',
    'Efficiency',
    'Molar mass (g/mol, for the check)',
    'n (for the check)',
    'Deposit (g)',
    'Hand check (g)',
  ]);
  DEPOSIT_CASES.forEach(([reaction, q, eff, m, n], i) => {
    const r = t.depositRows[i]!;
    input(ws.getCell(`A${r}`), reaction);
    input(ws.getCell(`B${r}`), q);
    input(ws.getCell(`C${r}`), eff);
    ws.getCell(`D${r}`).value = m;
    ws.getCell(`E${r}`).value = n;
    formula(ws.getCell(`F${r}`), `ECHEM.DEPOSIT(A${r},B${r},C${r})`);
    formula(ws.getCell(`G${r}`), `B${r}*C${r}*D${r}/(E${r}*96485.33212)`);
    for (const col of ['F', 'G']) ws.getCell(`${col}${r}`).numFmt = '0.0000';
  });
  header(ws, 10, [
    'Electrode reaction',
    'Thickness (µm)',
    'Current density (A/m²)',
    'Deposit density (g/cm³)',
    'Efficiency',
    'Plating time (s)',
    'Plating time (h)',
    'Thickness back from that time (µm)',
  ]);
  PLATE_CASES.forEach(([reaction, um, i0, rho, eff], i) => {
    const r = t.plateRows[i]!;
    input(ws.getCell(`A${r}`), reaction);
    input(ws.getCell(`B${r}`), um);
    input(ws.getCell(`C${r}`), i0);
    input(ws.getCell(`D${r}`), rho);
    input(ws.getCell(`E${r}`), eff);
    formula(ws.getCell(`F${r}`), `ECHEM.PLATETIME(A${r},B${r},C${r},D${r},E${r})`);
    formula(ws.getCell(`G${r}`), `F${r}/3600`);
    formula(ws.getCell(`H${r}`), `ECHEM.THICKNESS(A${r},C${r},F${r},D${r},E${r})`);
    ws.getCell(`F${r}`).numFmt = '0';
    ws.getCell(`G${r}`).numFmt = '0.00';
    ws.getCell(`H${r}`).numFmt = '0.000';
  });
  header(ws, 16, ['Electrode reaction or material', 'Basis', 'Theoretical capacity (mAh/g)']);
  CAPACITY_CASES.forEach(([text, basis], i) => {
    const r = t.capacityRows[i]!;
    input(ws.getCell(`A${r}`), text);
    input(ws.getCell(`B${r}`), basis);
    formula(ws.getCell(`C${r}`), `ECHEM.CAPACITY(A${r},B${r})`);
    ws.getCell(`C${r}`).numFmt = '0.0';
  });
  header(ws, 21, ['Cell reaction', 'Temperature (°C)', 'Theoretical specific energy (Wh/kg of reactants)']);
  ENERGY_CASES.forEach(([text, temp], i) => {
    const r = t.energyRows[i]!;
    input(ws.getCell(`A${r}`), text);
    input(ws.getCell(`B${r}`), temp);
    formula(ws.getCell(`C${r}`), `ECHEM.SPECENERGY(A${r},B${r})`);
    ws.getCell(`C${r}`).numFmt = '0.0';
  });
  cautions(ws, t.cautionsRow, [
    'Capacities and specific energies are theoretical (active material only); practical cells deliver a fraction of them.',
    'Plating baths and electrolysis evolve gases (hydrogen, oxygen, chlorine) and use hazardous chemicals; battery building, charging and handling carry fire and chemical hazards. Follow the applicable standards, local codes, the maker’s data and licensed practice.',
  ]);
  ws.getColumn(1).width = 44;
  for (const col of [2, 3, 4, 5, 6, 7, 8]) ws.getColumn(col).width = 16;
}

/** Layout of the cathodic-protection template's anode and corrosion-rate sheet. */
export const ANODE_SHEET = {
  name: 'Anodes and corrosion',
  anodeRows: [5, 6, 7, 8],
  probeRows: [12, 13, 14],
  cautionsRow: 17,
} as const;

/** Invented anodes: id, material or capacity, net mass (kg), mean current (A), utilisation or type, and the
 * capacity and utilisation in numbers for the plain-arithmetic check. */
const ANODE_CASES: readonly [string, string | number, number, number, string | number, number, number][] = [
  ['A-01 bracelet', 'zinc', 45, 0.12, 'bracelet', 780, 0.8],
  ['A-02 stand-off', 'zinc', 60, 0.2, 'long slender stand-off', 780, 0.9],
  ['A-03 spare', 780, 30, 0.15, 0.85, 780, 0.85],
  ['A-04 valve pit', 'magnesium', 17, 0.05, 'short slender stand-off', 1100, 0.85],
];
/** Invented corrosion probes: id, metal or alloy, i_corr (µA/cm²), and EW and density for the check. */
const PROBE_CASES: readonly [string, string, number, number, number][] = [
  ['P-1 buried coupon', 'carbon steel', 4.2, 27.92, 7.86],
  ['P-2 coupon at a coating holiday', 'carbon steel', 18.5, 27.92, 7.86],
  ['P-3 stainless fitting', '316', 0.08, 25.5, 8.0],
];

function anodeSheet(wb: ExcelJS.Workbook): void {
  const t = ANODE_SHEET;
  const ws = wb.addWorksheet(t.name);
  ws.getCell('A1').value = 'Tessivar Water Board: Quorrel Ridge main, anode life and corrosion rates';
  ws.getCell('A1').font = TITLE;
  ws.getCell('A2').value =
    'Invented anodes and probe readings. Anode life by ECHEM.ANODELIFE (capacities and utilisation factors by name, DNV-RP-B401 from memory; magnesium common practice); corrosion rates from i_corr by ECHEM.CORRATE and MASSLOSS (ASTM G102).';
  header(ws, 4, [
    'Anode',
    'Material or capacity (Ah/kg)',
    'Net mass (kg)',
    'Mean current (A)',
    'Utilisation or anode type',
    'Life (years)',
    'Hand check (years)',
  ]);
  ANODE_CASES.forEach(([id, material, kg, amps, u, cap, uNum], i) => {
    const r = t.anodeRows[i]!;
    ws.getCell(`A${r}`).value = id;
    input(ws.getCell(`B${r}`), material);
    input(ws.getCell(`C${r}`), kg);
    input(ws.getCell(`D${r}`), amps);
    input(ws.getCell(`E${r}`), u);
    formula(ws.getCell(`F${r}`), `ECHEM.ANODELIFE(C${r},B${r},D${r},E${r})`);
    formula(ws.getCell(`G${r}`), `C${r}*${cap}*${uNum}/(D${r}*8760)`);
    for (const col of ['F', 'G']) ws.getCell(`${col}${r}`).numFmt = '0.0';
  });
  header(ws, 11, [
    'Probe',
    'Metal or alloy',
    'i_corr (µA/cm²)',
    'Corrosion rate (mm/y)',
    'Mass loss (g/(m²·d))',
    'Hand check (mm/y)',
  ]);
  PROBE_CASES.forEach(([id, metal, i0, ew, rho], i) => {
    const r = t.probeRows[i]!;
    ws.getCell(`A${r}`).value = id;
    input(ws.getCell(`B${r}`), metal);
    input(ws.getCell(`C${r}`), i0);
    formula(ws.getCell(`D${r}`), `ECHEM.CORRATE(B${r},C${r})`);
    formula(ws.getCell(`E${r}`), `ECHEM.MASSLOSS(B${r},C${r})`);
    formula(ws.getCell(`F${r}`), `0.00327*C${r}*${ew}/${rho}`);
    for (const col of ['D', 'F']) ws.getCell(`${col}${r}`).numFmt = '0.0000';
    ws.getCell(`E${r}`).numFmt = '0.000';
  });
  cautions(ws, t.cautionsRow, [
    'Anode capacities and utilisation factors are defaults recalled from DNV-RP-B401 and common practice: design with the edition of the standard you work to and the anode maker’s certified data.',
    'Corrosion rates from i_corr assume uniform attack; pitting, crevice and microbially influenced corrosion can be far faster locally.',
    'Cathodic-protection design and assessment follow the applicable standards (e.g. AMPP/NACE SP0169, ISO 15589-1, DNV-RP-B401), local codes and licensed practice.',
  ]);
  ws.getColumn(1).width = 30;
  for (const col of [2, 3, 4, 5, 6, 7]) ws.getColumn(col).width = 18;
}

// ---------------------------------------------------------------------------------------

/** Builds every template; returns the workbooks by file name (not yet recalculated). */
export function buildTemplates(): Record<string, ExcelJS.Workbook> {
  return {
    [CP_TEMPLATE.file]: cathodicProtection(),
    [SWEEP_TEMPLATE.file]: cellSweep(),
    [CAL_TEMPLATE.file]: calibration(),
  };
}

async function main(): Promise<void> {
  const outDir = process.argv[2] ?? TEMPLATE_DIR;
  fs.mkdirSync(outDir, { recursive: true });
  let failed = false;
  for (const [file, wb] of Object.entries(buildTemplates())) {
    const summary = recalcWorkbook(wb);
    for (const e of summary.errors) {
      failed = true;
      process.stderr.write(`${file}: ${e.sheet}!${e.cell} ${e.code} ${e.message}\n`);
    }
    const target = path.join(outDir, file);
    await wb.xlsx.writeFile(target);
    process.stdout.write(`wrote ${path.relative(process.cwd(), target)} (${summary.formulas} formulas)\n`);
  }
  if (failed) {
    process.stderr.write('some template cells compute to errors\n');
    process.exitCode = 1;
  }
}

if (require.main === module) {
  void main();
}
