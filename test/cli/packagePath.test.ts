/**
 * The runner's fast path (src/cli/xlsxPackage.ts: the package read and its formula cells
 * patched, no spreadsheet model) against the model path it replaces for most workbooks:
 * both outputs read back cell by cell, with everything a user stored (styles, number
 * formats, merged cells, column widths, defined names, sheet order) kept; and the cases it
 * hands to the model path (spills, array formulas) still written as dynamic arrays.
 * Expected values are arithmetic and the Nernst equation written out by hand (test helpers).
 */
import * as fs from 'node:fs';
import * as path from 'node:path';
import ExcelJS from 'exceljs';
import JSZip from 'jszip';
import { readWorkbookBytes, recalcFile, recalcPackage, recalcWorkbook } from '../../src/cli/recalcCommand';
import { withDynamicArrays } from '../../src/cli/dynamicArrays';
import { DEFAULT_LIMITS, DEFAULT_MAX_CELLS } from '../../src/cli/limits';
import { captureIo, nernst, tempDir } from './helpers';
import { xlsxFromXml } from './xlsxXml';

const dir = tempDir('package-path');
afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));

const OPTIONS = { force: true, allowErrors: false, limits: DEFAULT_LIMITS, progress: 'never' as const };

/** A workbook with a bit of everything a user stores, and formulas of every result type. */
async function richWorkbook(file: string): Promise<void> {
  const wb = new ExcelJS.Workbook();
  const inputs = wb.addWorksheet('Inputs');
  const cases = wb.addWorksheet('Cases');
  wb.addWorksheet('Notes').getCell('A1').value = 'fictional test bench, no real plant';
  inputs.getCell('A1').value = 'E0 Cu (V)';
  inputs.getCell('B1').value = 0.337;
  inputs.getCell('B1').numFmt = '0.000';
  inputs.getCell('A2').value = 'when';
  inputs.getCell('B2').value = new Date(Date.UTC(2024, 0, 15));
  inputs.getCell('B2').numFmt = 'yyyy-mm-dd';
  inputs.getCell('A3').value = { richText: [{ text: 'bold ', font: { bold: true } }, { text: 'plain' }] };
  inputs.getCell('A4').value = true;
  inputs.getCell('A5').value = { error: '#N/A' } as ExcelJS.CellErrorValue;
  inputs.mergeCells('C1:D2');
  inputs.getCell('C1').value = 'merged title';
  inputs.getColumn(1).width = 24;
  inputs.getCell('A1').font = { bold: true, color: { argb: 'FF1F4E79' } };
  inputs.getCell('A1').fill = { type: 'pattern', pattern: 'solid', fgColor: { argb: 'FFDDEBF7' } };
  wb.definedNames.add('Inputs!$B$1', 'E0_Cu');

  cases.columns = [{ width: 12 }, { width: 9 }, { width: 30 }];
  cases.getCell('A1').value = 'a(Cu2+)';
  cases.getCell('B1').value = 'E (V)';
  for (let r = 2; r <= 6; r++) {
    cases.getCell(r, 1).value = 10 ** -(r - 1);
    cases.getCell(r, 2).numFmt = '0.0000';
    cases.getCell(r, 2).font = { italic: true };
  }
  // A shared formula: master B2 over B2:B6, followers translated for their row.
  cases.getCell('B2').value = {
    formula: 'ECHEM.POTENTIAL("Cu2+ + 2e- = Cu","Cu2+",A2)',
    shareType: 'shared',
    ref: 'B2:B6',
  } as ExcelJS.CellValue;
  for (let r = 3; r <= 6; r++) cases.getCell(r, 2).value = { sharedFormula: 'B2' } as ExcelJS.CellValue;
  cases.getCell('C2').value = { formula: 'E0_Cu*2' } as ExcelJS.CellFormulaValue;
  cases.getCell('C3').value = { formula: 'IF(B2<E0_Cu,"below & under","above")' } as ExcelJS.CellFormulaValue;
  cases.getCell('C4').value = { formula: 'Inputs!A4' } as ExcelJS.CellFormulaValue;
  cases.getCell('C5').value = { formula: '1/0' } as ExcelJS.CellFormulaValue;
  cases.getCell('C6').value = { formula: 'Inputs!B2+1' } as ExcelJS.CellFormulaValue;
  cases.getCell('C7').value = { formula: 'LEN(Inputs!A3)' } as ExcelJS.CellFormulaValue;
  await wb.xlsx.writeFile(file);
}

/** What a reader sees of a workbook: per sheet, every cell's value and style, merges and widths. */
async function readBack(file: string): Promise<unknown> {
  const wb = new ExcelJS.Workbook();
  await wb.xlsx.readFile(file);
  const names = (wb.definedNames as unknown as { model: unknown }).model;
  return {
    names,
    sheets: wb.worksheets.map((ws) => {
      const cells: Record<string, unknown> = {};
      ws.eachRow({ includeEmpty: false }, (row) =>
        row.eachCell({ includeEmpty: false }, (cell) => {
          const v = cell.value as unknown;
          const value =
            v !== null && typeof v === 'object' && 'formula' in v
              ? { formula: cell.formula, result: (v as { result?: unknown }).result }
              : v !== null && typeof v === 'object' && 'sharedFormula' in v
                ? { formula: cell.formula, result: (v as { result?: unknown }).result }
                : v;
          cells[cell.address] = { value, style: cell.style, numFmt: cell.numFmt };
        }),
      );
      return {
        name: ws.name,
        merges: (ws.model as unknown as { merges: string[] }).merges,
        widths: (ws.columns ?? []).map((c) => c.width),
        cells,
      };
    }),
  };
}

/** The model path alone (what the runner did for every workbook before the fast path). */
async function viaModel(input: string, output: string): Promise<void> {
  const wb = new ExcelJS.Workbook();
  await wb.xlsx.readFile(input);
  const summary = recalcWorkbook(wb);
  const data = await withDynamicArrays(new Uint8Array(await wb.xlsx.writeBuffer()), summary.spillAnchors);
  fs.writeFileSync(output, data);
}

function resultOf(v: ExcelJS.CellValue): unknown {
  return v !== null && typeof v === 'object' && 'result' in v ? v.result : v;
}

/**
 * Cu2+ + 2e- = Cu over a(Cu2+) = 10^-1, 10^-2, … down rows `first`…`last` at 25 °C: each row
 * is (RT/2F)·ln 10 below the one before (the Nernst equation by hand), and the first within
 * 10 mV of E° + (RT/2F)·ln 0.1 with E° = +0.337 V (OpenStax Chemistry 2e, Appendix L; the
 * built-in table may cite another source).
 */
function expectCopperColumn(at: (row: number) => unknown, first: number, last: number): void {
  expect(Math.abs((at(first) as number) - nernst(0.337, 2, 10))).toBeLessThan(0.01);
  for (let r = first + 1; r <= last; r++) {
    const step = (at(r - 1) as number) - (at(r) as number);
    expect(step).toBeCloseTo(nernst(0, 2, 1) - nernst(0, 2, 10), 12);
  }
}

describe('fast path: the package patched, no model', () => {
  const input = path.join(dir, 'rich.xlsx');
  const fast = path.join(dir, 'rich.fast.xlsx');
  const model = path.join(dir, 'rich.model.xlsx');

  beforeAll(async () => {
    await richWorkbook(input);
    const io = captureIo();
    expect(await recalcFile(input, fast, OPTIONS, io)).toBe(1); // 1/0: one cell error
    await viaModel(input, model);
  });

  test('this workbook takes the fast path', async () => {
    const r = recalcPackage(readWorkbookBytes(input), DEFAULT_MAX_CELLS);
    expect(r).toBeDefined();
    expect(r?.summary.formulas).toBe(11);
    expect(r?.summary.errors.map((e) => `${e.sheet}!${e.cell} ${e.code}`)).toEqual(['Cases!C5 #DIV/0!']);
  });

  test('the computed values: the Nernst equation and arithmetic by hand', async () => {
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(fast);
    const cases = wb.getWorksheet('Cases')!;
    expectCopperColumn((r) => resultOf(cases.getCell(r, 2).value), 2, 6);
    expect(resultOf(cases.getCell('C2').value)).toBeCloseTo(0.674, 12);
    expect(resultOf(cases.getCell('C3').value)).toBe('below & under');
    expect(resultOf(cases.getCell('C4').value)).toBe(true);
    expect(resultOf(cases.getCell('C5').value)).toEqual({ error: '#DIV/0!' });
    // 2024-01-15 is serial 45306 (1900 date system, by hand: 45,306 days after 1899-12-30)
    expect(resultOf(cases.getCell('C6').value)).toBe(45307);
    expect(resultOf(cases.getCell('C7').value)).toBe('bold plain'.length);
  });

  test('reads back exactly as the model path writes it: values, styles, merges, widths, names, order', async () => {
    const a = (await readBack(fast)) as { sheets: { cells: Record<string, { value: unknown }> }[] };
    const b = (await readBack(model)) as typeof a;
    // The model path turns a date-formatted formula result into a date; the file holds the serial.
    const dated = (x: typeof a) => x.sheets[1]!.cells.C6 as { value: { result: unknown } };
    const fastC6 = dated(a).value.result;
    const modelC6 = dated(b).value.result;
    expect(fastC6 instanceof Date ? fastC6.getTime() : fastC6).toEqual(
      modelC6 instanceof Date ? modelC6.getTime() : modelC6,
    );
    dated(a).value.result = dated(b).value.result = 'date';
    expect(a).toEqual(b);
  });

  test('every part but the sheets with formulas is the input byte for byte', async () => {
    const zin = await JSZip.loadAsync(fs.readFileSync(input));
    const zout = await JSZip.loadAsync(fs.readFileSync(fast));
    expect(Object.keys(zout.files).sort()).toEqual(Object.keys(zin.files).sort());
    const changed: string[] = [];
    for (const name of Object.keys(zin.files)) {
      if (zin.files[name]!.dir) continue;
      const x = await zin.file(name)!.async('string');
      const y = await zout.file(name)!.async('string');
      if (x !== y) changed.push(name);
    }
    expect(changed.sort()).toEqual(['xl/worksheets/sheet2.xml']);
  });
});

describe('fast path on SpreadsheetML as other programs write it', () => {
  test('shared strings with runs, inline strings, entities, a shared formula from raw XML', async () => {
    const rows =
      '<row r="1"><c r="A1" t="inlineStr"><is><r><t>Zn2</t></r><r><t xml:space="preserve">+ </t></r></is></c>' +
      '<c r="B1"><v>0.5</v></c><c r="C1"><v>4</v></c></row>' +
      '<row r="2"><c r="A2"><f>LEN(A1)</f><v>0</v></c><c r="B2"><f t="shared" ref="B2:B4" si="0">B1*2</f><v>0</v></c>' +
      '<c r="C2"><f>"a&amp;b"&amp;"&lt;"</f></c></row>' +
      '<row r="3"><c r="B3"><f t="shared" si="0"/><v>0</v></c></row>' +
      '<row r="4"><c r="B4"><f t="shared" si="0"/></c><c r="C4" t="b"><v>1</v></c><c r="D4"><f>IF(C4,C1*C1,0)</f></c></row>';
    const file = path.join(dir, 'raw.xlsx');
    fs.writeFileSync(file, await xlsxFromXml([{ name: 'Raw', rows }]));
    const r = recalcPackage(readWorkbookBytes(file), DEFAULT_MAX_CELLS);
    expect(r).toBeDefined();
    const out = path.join(dir, 'raw.out.xlsx');
    fs.writeFileSync(out, r!.bytes);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(out);
    const ws = wb.getWorksheet('Raw')!;
    expect(resultOf(ws.getCell('A2').value)).toBe(5); // the runs "Zn2" and "+ " make "Zn2+ ", 5 characters
    expect(resultOf(ws.getCell('B2').value)).toBe(1); // 0.5 × 2
    expect(resultOf(ws.getCell('B3').value)).toBe(2); // B2 × 2
    expect(resultOf(ws.getCell('B4').value)).toBe(4); // B3 × 2
    expect(resultOf(ws.getCell('C2').value)).toBe('a&b<');
    expect(resultOf(ws.getCell('D4').value)).toBe(16); // 4 × 4
    expect(ws.getCell('B3').formula).toBe('B2*2');
  });
});

describe('workbooks the fast path hands to the model path', () => {
  test('a spill: recalcPackage declines, recalcFile writes it as a dynamic array', async () => {
    const wb = new ExcelJS.Workbook();
    const ws = wb.addWorksheet('Sweep');
    for (let r = 1; r <= 3; r++) ws.getCell(r, 1).value = 10 ** -r;
    ws.getCell('B1').value = { formula: 'ECHEM.POTENTIAL("Cu2+ + 2e- = Cu","Cu2+",A1:A3)' } as ExcelJS.CellFormulaValue;
    const file = path.join(dir, 'spill.xlsx');
    await wb.xlsx.writeFile(file);
    expect(recalcPackage(readWorkbookBytes(file), DEFAULT_MAX_CELLS)).toBeUndefined();
    const out = path.join(dir, 'spill.out.xlsx');
    expect(await recalcFile(file, out, OPTIONS, captureIo())).toBe(0);
    const back = new ExcelJS.Workbook();
    await back.xlsx.readFile(out);
    const sweep = back.getWorksheet('Sweep')!;
    expectCopperColumn((r) => resultOf(sweep.getCell(r, 2).value), 1, 3);
    const sheetXml = await (await JSZip.loadAsync(fs.readFileSync(out))).file('xl/worksheets/sheet1.xml')!.async('string');
    expect(sheetXml).toMatch(/<c r="B1"[^>]*cm="1"/);
  });

  test('an array formula: the package is read for the model path (recalcPackage declines)', async () => {
    const rows =
      '<row r="1"><c r="A1"><v>2</v></c><c r="B1"><f t="array" ref="B1:B2">A1:A2*3</f><v>0</v></c></row>' +
      '<row r="2"><c r="A2"><v>5</v></c><c r="B2"><v>99</v></c></row>';
    const file = path.join(dir, 'array.xlsx');
    fs.writeFileSync(file, await xlsxFromXml([{ name: 'Arr', rows }]));
    expect(recalcPackage(readWorkbookBytes(file), DEFAULT_MAX_CELLS)).toBeUndefined();
    const out = path.join(dir, 'array.out.xlsx');
    expect(await recalcFile(file, out, OPTIONS, captureIo())).toBe(0);
    const back = new ExcelJS.Workbook();
    await back.xlsx.readFile(out);
    expect(resultOf(back.getWorksheet('Arr')!.getCell('B1').value)).toBe(6); // 2 × 3
    expect(resultOf(back.getWorksheet('Arr')!.getCell('B2').value)).toBe(15); // 5 × 3
  });
});
