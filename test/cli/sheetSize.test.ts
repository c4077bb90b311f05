/**
 * The runner's HyperFormula settings hold a sheet of 100,000 rows (HyperFormula's default
 * refuses more than 40,000 with "Sheet size limit exceeded").
 */
import { HyperFormula } from 'hyperformula';
import type { RawCellContent } from 'hyperformula';
import { HF_CONFIG, registerEchemFunctions } from '../../src/cli/echemPlugin';
import { F, R } from '../support';
import { potential } from '../../src/functions/catalogue';

registerEchemFunctions();

test('a sheet with an ECHEM formula in row 100,000 loads and computes', () => {
  const rows: RawCellContent[][] = Array.from({ length: 100_000 }, () => []);
  rows[99_999] = [0.01, '=ECHEM.POTENTIAL("Cu2+/Cu", "Cu2+", A100000)'];
  const hf = HyperFormula.buildFromSheets({ Tall: rows }, { ...HF_CONFIG });
  const sheet = hf.getSheetId('Tall')!;
  const e = hf.getCellValue({ sheet, row: 99_999, col: 1 });
  // E°(Cu2+/Cu) = ΔfG°(Cu2+)/(2F) = 65.49 kJ/mol / 2F (NBS 1982, from memory), minus (RT ln10/2F)·2
  const expected = 65.49e3 / (2 * F) - ((R * 298.15 * Math.LN10) / (2 * F)) * 2;
  expect(e as number).toBeCloseTo(expected, 6);
  hf.destroy();
});

test('a spill of 100 all-number cases reaches the sheet cell by cell as the catalogue computed it', () => {
  const rows: RawCellContent[][] = Array.from({ length: 100 }, (_, i) => [1e-4 * (i + 1)]);
  rows[0]!.push('=ECHEM.POTENTIAL("Cu2+/Cu", "Cu2+", A1:A100)');
  const hf = HyperFormula.buildFromSheets({ Spill: rows }, { ...HF_CONFIG });
  const sheet = hf.getSheetId('Spill')!;
  const slope = (R * 298.15 * Math.LN10) / (2 * F);
  for (let i = 0; i < 100; i++) {
    const a = 1e-4 * (i + 1);
    const e = hf.getCellValue({ sheet, row: i, col: 1 });
    // E = E°(Cu2+/Cu) − (RT ln10/2F)·log10(1/a), E° = 65.49 kJ/mol / 2F (NBS 1982, from memory)
    expect(e as number).toBeCloseTo(65.49e3 / (2 * F) + slope * Math.log10(a), 9);
    expect(Object.is(e, potential('Cu2+/Cu', 'Cu2+', a)[0]![0])).toBe(true);
  }
  hf.destroy();
});
