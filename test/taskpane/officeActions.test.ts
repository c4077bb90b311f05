/**
 * The task pane's workbook writes, against a recording Excel built from office-addin-mock:
 * sheet names, ranges, values, formulas, chart type and series, the no-overwrite rule,
 * and Office failures reaching the user's status area.
 */
import { BUILTIN_POTENTIALS } from '../../src/engine/index';
import { PartialWriteError, splitRangeRef, writeNewSheet } from '../../src/taskpane/officeActions';
import { planPotentialsSheet, POTENTIALS_HEADER } from '../../src/taskpane/potentialsSheet';
import { planExampleSheet } from '../../src/taskpane/reference';
import { runReported, type StatusKind } from '../../src/taskpane/status';
import { planSweep, sweepSheetPlan, type SweepForm } from '../../src/taskpane/sweepPlan';
import { input } from './sweepFixtures';
import { createExcelMock, installExcel, officeError, seriesOf, uninstallExcel } from './excelMock';

afterEach(() => uninstallExcel());

function recorder() {
  const lines: { kind: StatusKind; text: string }[] = [];
  return { lines, sink: { show: (kind: StatusKind, text: string) => lines.push({ kind, text }) } };
}

/** The case-series fixture's form (Cu2+/Cu, 25 log points) with any field replaced, planned. */
function sweepLayout(over: Partial<SweepForm> = {}) {
  return planSweep(input(over));
}

describe('insert potentials sheet', () => {
  test('writes header, every built-in row, notes and a live example into a new sheet "Potentials"', async () => {
    const mock = createExcelMock(['Sheet1']);
    installExcel(mock);
    const plan = await writeNewSheet((existing) => planPotentialsSheet(BUILTIN_POTENTIALS, '', existing));
    expect(plan.sheetName).toBe('Potentials');
    const sheet = mock.sheet('Potentials');
    expect(sheet.added).toBe(true);
    const n = BUILTIN_POTENTIALS.length;
    expect(mock.range('Potentials', 'A1:D1').values).toEqual([[...POTENTIALS_HEADER]]);
    expect(mock.range('Potentials', 'A1:D1').format.font.bold).toBe(true);
    const data = mock.range('Potentials', `A2:D${n + 1}`).values as unknown[][];
    expect(data).toHaveLength(n);
    const ferric = data.find((row) => row[0] === 'Fe3+ + e- -> Fe2+');
    expect(ferric?.[1]).toBe(0.771); // OpenStax Chemistry 2e, Appendix L
    // a row without dE°/dT leaves the cell empty, never 0
    const noSlope = BUILTIN_POTENTIALS.findIndex((r) => r.dE0dTmVperK === null);
    expect(data[noSlope]?.[2]).toBe('');
    // the note gives the actual sheet and range to pass as `table`
    const notes = mock.range('Potentials', 'F1:F3').values as string[][];
    // the suggested range takes in 50 empty rows for the user's own couples, and the note says so
    expect(notes[1]?.[0]).toContain(`Potentials!A2:D${n + 51}`);
    expect(notes[1]?.[0]).toContain(`50 empty rows below the data (rows ${n + 2} to ${n + 51})`);
    expect(mock.range('Potentials', 'F5').formulas).toEqual([
      [`=ECHEM.POTENTIAL("Fe3+/Fe2+",{"Fe3+","Fe2+"},{0.1,0.01},25,Potentials!A2:D${n + 51})`],
    ]);
    expect(sheet.frozenRows).toBe(1);
    expect(mock.range('Potentials', 'A:D').format.autofitted).toBe(true);
    expect(sheet.activated).toBe(true);
    // the workbook's own sheet was not touched
    expect(mock.sheet('Sheet1').ranges).toHaveLength(0);
    expect(plan.summary).toContain('Created sheet "Potentials"');
    expect(plan.summary).toContain(`Potentials!A2:D${n + 51}`);
  });

  test('never overwrites: with "Potentials" present it creates "Potentials (2)" and says so', async () => {
    const mock = createExcelMock(['Sheet1', 'Potentials']);
    installExcel(mock);
    const { lines, sink } = recorder();
    const plan = await runReported(
      'Inserting the potentials sheet',
      () => writeNewSheet((existing) => planPotentialsSheet(BUILTIN_POTENTIALS, 'Cu2+', existing)),
      sink,
      (p) => p.summary,
    );
    expect(plan?.sheetName).toBe('Potentials (2)');
    expect(mock.calls).toContain('worksheets.add(Potentials (2))');
    expect(mock.calls).not.toContain('worksheets.add(Potentials)');
    expect(mock.sheet('Potentials').ranges).toHaveLength(0);
    // Cu2+ picks the two copper(II) couples
    const data = mock.range('Potentials (2)', 'A2:D3').values as unknown[][];
    expect(data.map((r) => r[0])).toEqual(['Cu2+ + e- -> Cu+', 'Cu2+ + 2 e- -> Cu']);
    // the quoted sheet name is used in the table reference
    expect(plan?.tableRef).toBe("'Potentials (2)'!A2:D53");
    expect(lines.at(-1)).toEqual({ kind: 'success', text: expect.stringContaining('"Potentials (2)"') });
    expect(lines.at(-1)?.text).toContain("'Potentials (2)'!A2:D53");
  });

  test('a case-insensitive clash counts too: "potentials" and "Potentials (2)" give "Potentials (3)"', async () => {
    const mock = createExcelMock(['potentials', 'Potentials (2)']);
    installExcel(mock);
    const plan = await writeNewSheet((existing) => planPotentialsSheet(BUILTIN_POTENTIALS, 'Fe', existing));
    expect(plan.sheetName).toBe('Potentials (3)');
  });

  test('refuses a plan whose sheet name already exists instead of writing into that sheet', async () => {
    const mock = createExcelMock(['Potentials']);
    installExcel(mock);
    await expect(
      writeNewSheet(() => ({
        sheetName: 'POTENTIALS',
        blocks: [{ address: 'A1', values: [['x']] }],
        freezeRows: 0,
      })),
    ).rejects.toThrow(/already exists/);
    expect(mock.calls.some((c) => c.startsWith('worksheets.add'))).toBe(false);
    expect(mock.sheet('Potentials').ranges).toHaveLength(0);
  });
});

describe('build sweep sheet', () => {
  test('writes the case table, the LOG10 column, ONE spilled POTENTIAL formula and an XY scatter chart', async () => {
    const mock = createExcelMock(['Sheet1']);
    installExcel(mock);
    const layout = sweepLayout();
    const plan = await writeNewSheet((existing) => sweepSheetPlan(layout, existing));
    expect(plan.sheetName).toBe('E vs log a(Cu2+)');
    const name = plan.sheetName;
    expect(mock.range(name, 'B1').values).toEqual([['Cu2+/Cu']]);
    expect(mock.range(name, 'B1').numberFormat).toEqual([['@']]);
    expect(mock.range(name, 'A6:D6').values).toEqual([['Cu2+', 'temp_C', 'log10 a(Cu2+)', 'E / V vs SHE']]);
    const cases = mock.range(name, 'A7:B31').values as number[][];
    expect(cases).toHaveLength(25);
    expect(cases[0]).toEqual([1e-6, 25]);
    expect(cases[24]).toEqual([1, 25]);
    const logs = mock.range(name, 'C7:C31').formulas as string[][];
    expect(logs[0]).toEqual(['=LOG10(A7)']);
    expect(logs[24]).toEqual(['=LOG10(A31)']);
    // exactly one ECHEM formula, in the first result cell; it spills the rest
    const echem = mock
      .sheet(name)
      .ranges.flatMap((r) => (r.formulas ?? []).flat())
      .filter((f) => String(f).startsWith('=ECHEM.'));
    expect(echem).toEqual(['=ECHEM.POTENTIAL(B1,A6,A7:A31,B7:B31)']);
    expect(mock.range(name, 'D7').formulas).toEqual([['=ECHEM.POTENTIAL(B1,A6,A7:A31,B7:B31)']]);
    // the chart
    const [chart] = mock.sheet(name).charts;
    expect(chart?.type).toBe('XYScatterLines');
    expect(chart?.source).toBe('D6:D31');
    expect(seriesOf(chart!)).toEqual([{ name: 'E / V vs SHE', xValues: 'C7:C31', values: 'D7:D31' }]);
    expect(chart?.axes.categoryAxis.title.text).toBe('log10 a(Cu2+)');
    expect(chart?.axes.valueAxis.title.text).toBe('E / V vs SHE');
    expect(chart?.legend.visible).toBe(false);
    expect(chart?.position).toEqual({ topLeft: 'F6', bottomRight: 'M25' });
    expect(mock.sheet(name).frozenRows).toBe(6);
    expect(plan.summary).toContain('25 cases in A6:B31');
  });

  test('a Pourbaix-style E–pH sweep: pH column, x = pH, the table argument passed through', async () => {
    const mock = createExcelMock(['Sheet1', 'E vs pH']);
    installExcel(mock);
    const layout = sweepLayout({
      reaction: 'O2(g) + 4 H+ + 4 e- -> 2 H2O',
      variable: { kind: 'pH' },
      from: '0',
      to: '14',
      points: '15',
      tempC: '25',
      species: [
        { name: 'O2(g)', value: '0.21' },
        { name: 'H+', value: '1' },
      ],
      table: 'Potentials!A2:D131',
    });
    const plan = await writeNewSheet((existing) => sweepSheetPlan(layout, existing));
    expect(plan.sheetName).toBe('E vs pH (2)');
    expect(mock.sheet('E vs pH').ranges).toHaveLength(0);
    expect(mock.range(plan.sheetName, 'A6:D6').values).toEqual([['pH', 'O2(g)', 'temp_C', 'E / V vs SHE']]);
    const cases = mock.range(plan.sheetName, 'A7:C21').values as number[][];
    expect(cases.map((r) => r[0])).toEqual([0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 14]);
    expect(cases.every((r) => r[1] === 0.21 && r[2] === 25)).toBe(true);
    expect(mock.range(plan.sheetName, 'D7').formulas).toEqual([
      ['=ECHEM.POTENTIAL(B1,A6:B6,A7:B21,C7:C21,Potentials!A2:D131)'],
    ]);
    const [chart] = mock.sheet(plan.sheetName).charts;
    expect(seriesOf(chart!)[0]).toMatchObject({ xValues: 'A7:A21', values: 'D7:D21' });
    expect(chart?.axes.categoryAxis.title.text).toBe('pH');
  });

  test('a temperature sweep plots against the temp_C column', async () => {
    const mock = createExcelMock([]);
    installExcel(mock);
    const layout = sweepLayout({
      reaction: 'Ag+/Ag',
      variable: { kind: 'temperature' },
      from: '5',
      to: '65',
      points: '13',
      tempC: 'ignored',
      species: [{ name: 'Ag+', value: '0.01' }],
      table: '',
    });
    const plan = await writeNewSheet((existing) => sweepSheetPlan(layout, existing));
    expect(plan.sheetName).toBe('E vs T');
    expect(mock.range('E vs T', 'A7:B19').values).toEqual(
      [5, 10, 15, 20, 25, 30, 35, 40, 45, 50, 55, 60, 65].map((t) => [0.01, t]),
    );
    const [chart] = mock.sheet('E vs T').charts;
    expect(seriesOf(chart!)[0]).toMatchObject({ xValues: 'B7:B19', values: 'C7:C19' });
    expect(chart?.axes.categoryAxis.title.text).toBe('Temperature / °C');
  });
});

describe('insert example', () => {
  test('writes the example formula (text and live) into a new sheet and says where', async () => {
    const mock = createExcelMock(['Example POTENTIAL']);
    installExcel(mock);
    const { lines, sink } = recorder();
    const formula = '=ECHEM.POTENTIAL("Cu2+/Cu", "Cu2+", 0.01)';
    await runReported(
      'Inserting the example',
      () =>
        writeNewSheet((existing) =>
          planExampleSheet({ id: 'POTENTIAL', qualifiedName: 'ECHEM.POTENTIAL' }, formula, existing),
        ),
      sink,
      (p) => p.summary,
    );
    const name = 'Example POTENTIAL (2)';
    expect(mock.range(name, 'B3').formulas).toEqual([[formula]]);
    // the text copy is stored as text, with the apostrophe that stops Excel reading it as a formula
    expect(mock.range(name, 'B2').values).toEqual([[`'${formula}`]]);
    expect(mock.range(name, 'B2').numberFormat).toEqual([['@']]);
    expect(lines.at(-1)?.kind).toBe('success');
    expect(lines.at(-1)?.text).toContain(`'Example POTENTIAL (2)'!B3`);
  });
});

describe('Office failures reach the user', () => {
  test('Excel.run rejecting: the status shows the error, its code and location; nothing is written', async () => {
    const mock = createExcelMock(['Sheet1'], {
      runRejects: officeError('GeneralException', 'An internal error has occurred.', 'Workbook'),
    });
    installExcel(mock);
    const { lines, sink } = recorder();
    const result = await runReported(
      'Inserting the potentials sheet',
      () => writeNewSheet((existing) => planPotentialsSheet(BUILTIN_POTENTIALS, '', existing)),
      sink,
      (p) => p.summary,
    );
    expect(result).toBeUndefined();
    expect(lines[0]).toEqual({ kind: 'info', text: 'Inserting the potentials sheet…' });
    expect(lines.at(-1)).toEqual({
      kind: 'error',
      text: 'Inserting the potentials sheet failed: An internal error has occurred. (Excel error GeneralException at Workbook)',
    });
    expect(mock.sheets.filter((s) => s.added)).toHaveLength(0);
  });

  test('a failure while filling names the half-written new sheet', async () => {
    const mock = createExcelMock(['Sheet1'], {
      // sync 1 reads the names, sync 2 adds the sheet, sync 3 fills it
      syncRejects: {
        nth: 3,
        error: officeError('InvalidArgument', 'The argument is invalid or missing.', 'Range.values'),
      },
    });
    installExcel(mock);
    const { lines, sink } = recorder();
    const layout = sweepLayout();
    await runReported(
      'Building the sweep sheet',
      () => writeNewSheet((e) => sweepSheetPlan(layout, e)),
      sink,
      (p) => p.summary,
    );
    const last = lines.at(-1);
    expect(last?.kind).toBe('error');
    expect(last?.text).toContain('the new sheet "E vs log a(Cu2+)" was created but could not be filled');
    expect(last?.text).toContain(
      'The argument is invalid or missing. (Excel error InvalidArgument at Range.values)',
    );
    expect(last?.text).toContain('No other sheet was changed');
  });

  test('the partial-write error keeps its cause', async () => {
    const cause = officeError('InvalidArgument', 'bad', 'Chart.setPosition');
    const mock = createExcelMock([], { syncRejects: { nth: 3, error: cause } });
    installExcel(mock);
    const layout = sweepLayout();
    const error = await writeNewSheet((e) => sweepSheetPlan(layout, e)).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(PartialWriteError);
    expect((error as PartialWriteError).cause).toBe(cause);
    expect((error as PartialWriteError).sheetName).toBe('E vs log a(Cu2+)');
  });
});

describe('splitRangeRef (the table range the preview reads)', () => {
  test.each([
    ["'Potentials (2)'!A2:D115", { sheet: 'Potentials (2)', address: 'A2:D115' }],
    ["'Bob''s data'!A2:D9", { sheet: "Bob's data", address: 'A2:D9' }],
    ['Potentials!$A$2:$D$115', { sheet: 'Potentials', address: '$A$2:$D$115' }],
    ['A2:D20', { sheet: null, address: 'A2:D20' }],
    ['MyTable', { name: 'MyTable' }],
  ])('%s', (ref, parts) => {
    expect(splitRangeRef(ref)).toEqual(parts);
  });
});
