/**
 * The ECHEM functions inside HyperFormula: names, spills sized from the arguments, errors
 * by case, and the same numbers as the catalogue the add-in calls.
 */
import { HyperFormula } from 'hyperformula';
import type { RawCellContent } from 'hyperformula';
import { CATALOGUE } from '../../src/functions/catalogue';
import type { Arg } from '../../src/functions/catalogue';
import { HF_CONFIG, echemFunctionNames, registerEchemFunctions } from '../../src/cli/echemPlugin';
import { explainError, isHfError, spillSize } from '../../src/cli/engineValues';
import { nernst } from './helpers';

/** E°(Cu2+/Cu) of the built-in row: ΔfG°(Cu2+) = 65.49 kJ/mol / 2F (NBS 1982, from memory; OpenStax Appendix L prints +0.34). */
const E_CU = 65.49e3 / (2 * 96485.33212331001);

registerEchemFunctions();

function build(rows: RawCellContent[][], extra: Record<string, RawCellContent[][]> = {}): HyperFormula {
  return HyperFormula.buildFromSheets({ Main: rows, ...extra }, { ...HF_CONFIG });
}

function catalogue(id: string, ...args: Arg[]) {
  const spec = CATALOGUE.find((s) => s.id === id);
  if (!spec) throw new Error(`no ${id} in the catalogue`);
  return spec.impl(...args);
}

const at = (row: number, col: number) => ({ sheet: 0, row, col });

test('every catalogue function is registered under ECHEM.<id>', () => {
  const registered = new Set(HyperFormula.getRegisteredFunctionNames('enGB'));
  expect(CATALOGUE.length).toBeGreaterThanOrEqual(20);
  for (const name of echemFunctionNames()) expect(registered.has(name)).toBe(true);
  expect(echemFunctionNames()).toContain('ECHEM.POTENTIAL');
});

test('a values range with three rows spills three cases, identical to the catalogue', () => {
  const hf = build([
    ['Cu2+', 'temp_C', '=ECHEM.POTENTIAL("Cu2+ + 2 e- -> Cu", A1, A2:A4, B2:B4)'],
    [0.001, 25],
    [0.01, 25],
    [0.1, 25],
  ]);
  expect(spillSize(hf, at(0, 2))).toEqual({ width: 1, height: 3 });
  const direct = catalogue(
    'POTENTIAL',
    'Cu2+ + 2 e- -> Cu',
    'Cu2+',
    [[0.001], [0.01], [0.1]],
    [[25], [25], [25]],
    undefined,
  );
  [0.001, 0.01, 0.1].forEach((a, i) => {
    const v = hf.getCellValue(at(i, 2));
    expect(v).toBe(direct[i]?.[0]);
    // E° 0.337 V (OpenStax Chemistry 2e, Appendix L (seen)); Nernst by hand.
    expect(v).toBeCloseTo(nernst(E_CU, 2, 1 / a, 25), 12);
  });
  hf.destroy();
});

test('species in a column with one value each is one case: no spill', () => {
  const hf = build([
    ['Zn2+', 0.1, '=ECHEM.POTENTIAL("Zn | Zn2+ || Cu2+ | Cu", A1:A2, B1:B2)'],
    ['Cu2+', 1],
  ]);
  expect(spillSize(hf, at(0, 2))).toEqual({ width: 1, height: 1 });
  // E° = 0.337 − (−0.7618) (OpenStax Appendix L (seen)); Q = a(Zn2+)/a(Cu2+) = 0.1.
  expect(hf.getCellValue(at(0, 2))).toBeCloseTo(nernst(E_CU + 0.7618, 2, 0.1, 25), 12);
  hf.destroy();
});

test('an error in one row of values errs only that case', () => {
  const hf = build([['Cu2+', '=ECHEM.POTENTIAL("Cu2+/Cu", A1, A2:A4)'], [0.01], ['=1/0'], [1]]);
  expect(hf.getCellValue(at(0, 1))).toBeCloseTo(nernst(E_CU, 2, 100, 25), 12);
  // docs/design.md, "Errors": an error cell propagates to its case, as #VALUE! naming it
  const bad = hf.getCellValue(at(1, 1));
  expect(isHfError(bad) && bad.value).toBe('#VALUE!');
  expect(isHfError(bad) && bad.message).toContain('values (Cu2+) holds the error #DIV/0! from its cell');
  // a = 1: E = E° = 0.337 V (OpenStax Chemistry 2e, Appendix L (seen)).
  expect(hf.getCellValue(at(2, 1))).toBeCloseTo(E_CU, 12);
  hf.destroy();
});

test("a broken row of the user's table does not break lookups of other rows", () => {
  const potentials: RawCellContent[][] = [
    ['half-reaction', 'E° (V)', 'dE°/dT (mV/K)', 'source'],
    ['Cu2+ + 2 e- -> Cu', 0.34, null, 'in-house formal potential (invented)'],
    ['Ag+ + e- -> Ag', '=NA()', null, 'broken on purpose'],
  ];
  const hf = build(
    [['=ECHEM.STDPOTENTIAL("Cu2+/Cu", 25, Potentials!A1:D10)'], ['=ECHEM.CHECKTABLE(Potentials!A1:D10)']],
    { Potentials: potentials },
  );
  // The user's row takes precedence over the built-in 0.337 V.
  expect(hf.getCellValue(at(0, 0))).toBe(0.34);
  const check = hf.getCellValue(at(1, 0));
  expect(typeof check).toBe('string');
  expect(check).not.toBe('OK');
  hf.destroy();
});

test('ACTIVITY spills the shape of values', () => {
  const hf = build([
    ['Na+', 'Cl-', '=ECHEM.ACTIVITY(A1:B1, A2:B3, , "davies")'],
    [0.01, 0.01],
    [0.05, 0.05],
  ]);
  expect(spillSize(hf, at(0, 2))).toEqual({ width: 2, height: 2 });
  const direct = catalogue(
    'ACTIVITY',
    [['Na+', 'Cl-']],
    [
      [0.01, 0.01],
      [0.05, 0.05],
    ],
    undefined,
    'davies',
    undefined,
  );
  expect(hf.getCellValue(at(1, 3))).toBe(direct[1]?.[1]);
  // Davies (1962, p. 41, from memory): log10 γ = −A z² (√I/(1+√I) − 0.3 I); A = 0.5085 at
  // 25 °C (Freeze & Cherry, Appendix IV (seen)); I = 0.05 for 0.05 m NaCl.
  const I = 0.05;
  const gamma = Math.pow(10, -0.5085 * (Math.sqrt(I) / (1 + Math.sqrt(I)) - 0.3 * I));
  expect(hf.getCellValue(at(1, 3))).toBeCloseTo(0.05 * gamma, 4);
  hf.destroy();
});

test('an omitted middle argument reads as omitted (standard temperature)', () => {
  const hf = build([
    [
      '=ECHEM.POTENTIAL("Cu2+/Cu", {"Cu2+"}, {0.01}, , )',
      '=ECHEM.POTENTIAL("Cu2+/Cu", {"Cu2+"}, {0.01}, 25)',
    ],
  ]);
  expect(hf.getCellValue(at(0, 0))).toBe(hf.getCellValue(at(0, 1)));
  hf.destroy();
});

test('a blocked spill is reported with what to do', () => {
  const hf = build([['=ECHEM.NERNSTSLOPE({25;50;75})'], [null], ['in the way']]);
  const v = hf.getCellValue(at(0, 0));
  if (!isHfError(v)) throw new Error(`expected #SPILL!, got ${String(v)}`);
  expect(v.value).toBe('#SPILL!');
  expect(explainError(v, echemFunctionNames())).toContain('clear the cells it spills into');
  hf.destroy();
});
