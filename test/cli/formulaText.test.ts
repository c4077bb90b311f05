/**
 * Reading formulas as spreadsheet files store them: numbers with a capital exponent mark,
 * bare decimal points, subnormal numbers, and the function prefixes of the file format.
 */
import ExcelJS from 'exceljs';
import {
  formulaForEngine,
  normalizeFormulaText,
  rewriteFormulaText,
  slideFormula,
} from '../../src/cli/formulaText';
import { evaluateFormulas } from '../../src/cli/evalCommand';
import { recalcWorkbook } from '../../src/cli/recalcCommand';
import { nernst } from './helpers';
import { xlsxFromXml } from './xlsxXml';

describe('normalizeFormulaText', () => {
  test.each([
    ['1E-6', '1e-6'],
    ['2.5E+3', '2.5e+3'],
    ['1E5', '1e5'],
    ['.5', '0.5'],
    ['-.25*2', '-0.25*2'],
    ['{1,1E-310}', '{1,1e-310}'],
    ['_xlfn.STDEV.S(A1:A3)', 'STDEV.S(A1:A3)'],
    ['_xlws.SORT(A1:A3)', 'SORT(A1:A3)'],
    ['_xldudf_ECHEM_NERNSTSLOPE(25)', 'ECHEM.NERNSTSLOPE(25)'],
    ['_xldudf_ECHEM.NERNSTSLOPE(25)', 'ECHEM.NERNSTSLOPE(25)'],
    // Text, sheet names, cell references and names are left as they are.
    ['"1E-6 _xlfn."&A1', '"1E-6 _xlfn."&A1'],
    ["'Sheet 1E5'!A1+E5", "'Sheet 1E5'!A1+E5"],
    ['LOG10(1E2)+ATAN2(1,1)', 'LOG10(1e2)+ATAN2(1,1)'],
    ['"a""1E5"""&1E5', '"a""1E5"""&1e5'],
    ['A1:A3', 'A1:A3'],
    ['IF(TRUE,1,2)+AND(false,A1)', 'IF(TRUE(),1,2)+AND(FALSE(),A1)'],
    ['TRUE()+TRUE!A1', 'TRUE()+TRUE!A1'],
  ])('%s → %s', (input, expected) => {
    expect(normalizeFormulaText(input)).toBe(expected);
  });

  test('formulaForEngine adds the leading "=" once', () => {
    expect(formulaForEngine('1E-6')).toBe('=1e-6');
    expect(formulaForEngine('=1E-6')).toBe('=1e-6');
  });
});

describe('normalizeFormulaText returns a formula it would not change as it is', () => {
  // The quick check in front of the rewrite must send every formula the rewrite changes to
  // it: on 20,000 formulas made of the pieces that matter (quotes, exponents, bare decimal
  // points, prefixes, logical constants, names, references), both give the same text.
  const pieces = [
    '"',
    "'",
    '1',
    '25',
    '.',
    'E',
    'e',
    '-',
    '+',
    '_xlfn.',
    '_',
    'TRUE',
    'false',
    'A1',
    '$B$2',
    'Sheet!',
    'LN(',
    ')',
    ',',
    '*',
    ' ',
    'ECHEM.POTENTIAL(',
    '"Zn | Zn2+"',
    '1E-6',
    '.5',
    'x',
  ];
  let seed = 12345;
  const next = () => {
    // Park–Miller minimal standard generator: the same formulas on every run.
    seed = (seed * 48271) % 2147483647;
    return seed;
  };
  test('on 20,000 generated formulas', () => {
    let unchanged = 0;
    for (let k = 0; k < 20000; k++) {
      let f = '';
      const len = 1 + (next() % 12);
      for (let p = 0; p < len; p++) f += pieces[next() % pieces.length];
      const expected = rewriteFormulaText(f);
      expect(normalizeFormulaText(f)).toBe(expected);
      if (expected === f) unchanged++;
    }
    // Both kinds were generated: formulas the rewrite changes and formulas it leaves.
    expect(unchanged).toBeGreaterThan(1000);
    expect(unchanged).toBeLessThan(19000);
  });
  test.each([
    'ECHEM.POTENTIAL("Zn | Zn2+ || Cu2+ | Cu",$A$1:$B$1,A2:B2,C2,Potentials!$A$2:$D$3)',
    'SUM(A1:A3)*2.5',
  ])('%s is returned as it is', (f) => {
    expect(normalizeFormulaText(f)).toBe(f);
  });
});

describe('eval reads every number form', () => {
  test('1E-6, 2.5E+3, .5 and the subnormal 1E-310 evaluate to their values', () => {
    const [a, b, c, d] = evaluateFormulas(['=1E-6', '=2.5E+3', '=.5', '={1,1E-310}']);
    expect(a).toBe(1e-6);
    expect(b).toBe(2500);
    expect(c).toBe(0.5);
    // 1e-310 is below the smallest normal double (2.2e-308): kept as the subnormal it is.
    expect(d).toEqual([[1, 1e-310]]);
  });

  test('a capital-E activity in an ECHEM call: the Nernst value by hand', () => {
    const [e] = evaluateFormulas(['=ECHEM.POTENTIAL("Zn2+/Zn","Zn2+",1E-6)']);
    // E° −0.7618 V (OpenStax Chemistry 2e, Appendix L); Q = 1/a(Zn2+) = 1e6, n = 2.
    expect(e as number).toBeCloseTo(nernst(-0.7618, 2, 1e6, 25), 10);
  });
});

describe('recalc of a workbook whose XML is written as a spreadsheet program writes it', () => {
  let wb: ExcelJS.Workbook;
  let summary: ReturnType<typeof recalcWorkbook>;

  beforeAll(async () => {
    // Formulas as stored in the file: no "=", capital exponent marks, the _xlfn. and _xldudf_
    // prefixes, a shared formula, cached values in <v> with capital E.
    const rows =
      '<row r="1"><c r="A1"><f>1E-6</f><v>9.9999999999999995E-7</v></c>' +
      '<c r="B1"><f>ECHEM.POTENTIAL("Zn2+/Zn","Zn2+",1E-6)</f><v>0</v></c>' +
      '<c r="C1"><f>_xldudf_ECHEM_NERNSTSLOPE(25)</f><v>0</v></c>' +
      '<c r="D1"><f>_xlfn.XOR(TRUE,FALSE)</f><v>1</v></c></row>' +
      '<row r="2"><c r="A2"><v>1E-310</v></c><c r="B2"><f>A2*1E+300</f><v>0</v></c>' +
      '<c r="C2"><f>.5+2.5E+3</f><v>0</v></c></row>' +
      '<row r="3"><c r="A3"><v>2</v></c><c r="B3"><f t="shared" ref="B3:B4" si="0">A3*1E3</f><v>0</v></c></row>' +
      '<row r="4"><c r="A4"><v>3</v></c><c r="B4"><f t="shared" si="0"/><v>0</v></c></row>';
    wb = new ExcelJS.Workbook();
    await wb.xlsx.load((await xlsxFromXml([{ name: 'Sheet1', rows }])) as unknown as ExcelJS.Buffer);
    summary = recalcWorkbook(wb);
  });

  const value = (a: string): unknown => {
    const cell = wb.getWorksheet('Sheet1')?.getCell(a);
    return cell?.formula ? cell.result : cell?.value;
  };

  test('no cell computes to an error', () => {
    expect(summary.errors).toEqual([]);
    expect(summary.formulas).toBe(8);
  });

  test('numbers with a capital E and bare decimal points', () => {
    expect(value('A1')).toBe(1e-6);
    expect(value('C2')).toBe(2500.5);
    // 1e-310 × 1e300 = 1e-10 up to the rounding of a subnormal (about 1 part in 1e5 here).
    expect(value('B2') as number).toBeCloseTo(1e-10, 14);
  });

  test('ECHEM calls through the file prefixes', () => {
    expect(value('B1') as number).toBeCloseTo(nernst(-0.7618, 2, 1e6, 25), 10);
    // RT ln10 / F at 25 °C = 0.05915935 V (derived from the SI exact constants).
    expect(value('C1') as number).toBeCloseTo(0.05915935, 8);
    expect(value('D1')).toBe(true);
  });

  test('a shared formula with a capital-E constant, master and follower', () => {
    expect(value('B3')).toBe(2000);
    expect(value('B4')).toBe(3000);
  });
});

describe('slideFormula (shared formulas: the text of each follower)', () => {
  // Expected texts written by hand: relative references move by the follower's offset
  // (two rows down, one column right here); absolute parts, text and function names stay.
  const from = { row: 1, col: 1 };
  const to = { row: 3, col: 2 };
  test.each([
    ['A2*2', 'B4*2'],
    ['$A$1+A$1+$A1', '$A$1+B$1+$A3'],
    ['ECHEM.POTENTIAL("Cu2+ + 2e- = Cu","Cu2+",A2)', 'ECHEM.POTENTIAL("Cu2+ + 2e- = Cu","Cu2+",B4)'],
    ['Potentials!$A$2:$D$3', 'Potentials!$A$2:$D$3'],
    ["'Case data'!A2:B2&\"A1\"", "'Case data'!B4:C4&\"A1\""],
    ['LOG10(A2)', 'LOG10(B4)'],
    ['"say ""A1"""&C5', '"say ""A1"""&D7'],
  ])('%s → %s', (master, follower) => {
    expect(slideFormula(master, from, to)).toBe(follower);
  });
});
