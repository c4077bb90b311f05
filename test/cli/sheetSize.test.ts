/**
 * The runner's HyperFormula settings hold a sheet of 100,000 rows (HyperFormula's default
 * refuses more than 40,000 with "Sheet size limit exceeded").
 */
import { HyperFormula } from 'hyperformula';
import type { RawCellContent } from 'hyperformula';
import { HF_CONFIG, registerEchemFunctions } from '../../src/cli/echemPlugin';
import { F, R } from '../support';

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
