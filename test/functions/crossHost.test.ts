/**
 * One error-propagation policy across hosts (docs/design.md, "Errors"): the same inputs, with
 * error cells among them, give the same result — value by value, error code and message —
 * through the Excel wrapper (functions.ts over a stub `CustomFunctions`, where Excel hands an
 * error cell over as an error object) and through the headless runner (HyperFormula with the
 * ECHEM plugin, where the error comes from a formula such as =NA() in a referenced cell).
 *
 * The policy: an error in an input cell propagates to each case that reads it, #N/A as #N/A
 * and any other code as #VALUE!, with a message naming the argument; in the potentials table
 * an error cell makes its row a broken row (reported by CHECKTABLE) while other rows serve.
 */
import { HyperFormula, DetailedCellError } from 'hyperformula';
import type { RawCellContent } from 'hyperformula';
import { stub } from './installStub';
import { StubError } from './customFunctionsStub';
import '../../src/functions/functions';
import { HF_CONFIG, registerEchemFunctions } from '../../src/cli/echemPlugin';
import { callFunction, type Arg } from '../../src/functions/catalogue';

/** E°(Cu2+/Cu) of the built-in row: ΔfG°(Cu2+) = 65.49 kJ/mol / 2F (NBS 1982, from memory; OpenStax Appendix L prints +0.34). */
const E_CU = 65.49e3 / (2 * 96485.33212331001);

registerEchemFunctions();

/** An error cell: how Excel passes it, and a formula that gives it in HyperFormula. */
const ERR = {
  na: { code: '#N/A', formula: '=NA()' },
  div0: { code: '#DIV/0!', formula: '=1/0' },
  value: { code: '#VALUE!', formula: '=1+"a"' },
} as const;
type ErrCell = (typeof ERR)[keyof typeof ERR];
type In = number | string | null | ErrCell;

interface Case {
  readonly name: string;
  readonly id: string;
  /** Each argument as a grid of cells (one cell is [[v]]); undefined where omitted. */
  readonly args: readonly (readonly (readonly In[])[] | undefined)[];
}

const isErr = (v: In): v is ErrCell => typeof v === 'object' && v !== null;

const CASES: readonly Case[] = [
  { name: '#N/A in one row of values', id: 'POTENTIAL', args: [[['Cu2+/Cu']], [['Cu2+']], [[0.01], [ERR.na], [1]]] },
  { name: '#DIV/0! in one row of values', id: 'POTENTIAL', args: [[['Cu2+/Cu']], [['Cu2+']], [[0.01], [ERR.div0], [1]]] },
  { name: 'an error in the one row of values', id: 'LOGQ', args: [[['Zn + Cu2+ -> Zn2+ + Cu']], [['Zn2+', 'Cu2+']], [[0.1, ERR.value]]] },
  { name: '#N/A as temp_C', id: 'POTENTIAL', args: [[['Cu2+/Cu']], [['Cu2+']], [[0.01]], [[ERR.na]]] },
  { name: '#N/A in one case of temp_C', id: 'NERNSTSLOPE', args: [[[25], [ERR.na], [37]]] },
  { name: '#DIV/0! as the reaction', id: 'STDPOTENTIAL', args: [[[ERR.div0]]] },
  { name: '#N/A in a species header', id: 'IONICSTR', args: [[['Na+', ERR.na]], [[0.01, 0.01]]] },
  { name: 'an error in a molality', id: 'ACTIVITY', args: [[['Na+', 'Cl-']], [[0.01, 0.01], [ERR.div0, 0.1]]] },
  { name: '#N/A in a list of potentials', id: 'COMBINE', args: [[[0.771, ERR.na]], [[1, 2]]] },
  {
    name: 'an error in a table row the formula does not need',
    id: 'STDPOTENTIAL',
    args: [[['Cu2+/Cu']], undefined, [['Cu2+ + 2 e- -> Cu', 0.34], ['Ag+ + e- -> Ag', ERR.na]]],
  },
  { name: 'an error in a table row, checked', id: 'CHECKTABLE', args: [[['Cu2+ + 2 e- -> Cu', 0.34], ['Ag+ + e- -> Ag', ERR.na]]] },
];

/** What a result cell shows: a value, or an error's code and (where the host shows one) message. */
type Shown = number | string | { code: string; message: string | undefined };

function viaExcel(c: Case): Shown[][] {
  const fn = stub.associations.get(c.id);
  if (!fn) throw new Error(`${c.id} is not associated`);
  const args = c.args.map((g) =>
    g === undefined ? null : g.map((row) => row.map((v) => (isErr(v) ? new StubError(v.code) : v))),
  );
  const out = fn(...args) as unknown[][];
  return out.map((row) =>
    row.map((v) => (v instanceof StubError ? { code: v.code, message: v.message } : (v as number | string))),
  );
}

function viaRunner(c: Case): Shown[][] {
  // each argument in its own block of rows, the formula below them
  const rows: RawCellContent[][] = [];
  const refs: string[] = [];
  for (const g of c.args) {
    if (g === undefined) {
      refs.push('');
      continue;
    }
    const top = rows.length + 1;
    for (const row of g) rows.push(row.map((v) => (isErr(v) ? v.formula : v)));
    const width = Math.max(...g.map((r) => r.length));
    const col = (i: number) => String.fromCharCode(65 + i);
    refs.push(`${col(0)}${top}:${col(width - 1)}${top + g.length - 1}`);
  }
  while (refs.length > 0 && refs[refs.length - 1] === '') refs.pop();
  const formulaRow = rows.length;
  rows.push([`=ECHEM.${c.id}(${refs.join(', ')})`]);
  const hf = HyperFormula.buildFromSheets({ Main: rows }, { ...HF_CONFIG });
  try {
    const values = hf.getSheetValues(0).slice(formulaRow);
    return values
      .map((row) => {
        const cells = row.slice();
        while (cells.length > 0 && (cells[cells.length - 1] === null || cells[cells.length - 1] === undefined)) cells.pop();
        return cells.map((v): Shown =>
          v instanceof DetailedCellError
            ? { code: v.value, message: v.value === '#NUM!' ? undefined : v.message }
            : (v as number | string),
        );
      })
      .filter((row) => row.length > 0);
  } finally {
    hf.destroy();
  }
}

describe('an error in an input cell gives the same result in Excel and in the runner', () => {
  test.each(CASES)('$name ($id)', (c) => {
    const excel = viaExcel(c);
    const runner = viaRunner(c);
    expect(runner).toEqual(excel);
    // and the policy itself, from outside either host: codes and naming
    const errors = excel.flat().filter((v): v is { code: string; message: string | undefined } => typeof v === 'object');
    for (const e of errors) {
      expect(['#N/A', '#VALUE!', '#NUM!']).toContain(e.code);
      if (e.code !== '#NUM!') expect(e.message).toMatch(/holds the error #(N\/A|DIV\/0!|VALUE!) from its cell|does not|must be|row 2/);
    }
  });

  test('the erring case alone shows the error; the others compute', () => {
    const r = viaExcel(CASES[0]!);
    expect(r).toHaveLength(3);
    // a = 0.01: E = E° − (RT ln10/2F)·2 (E° = 65.49 kJ/mol / 2F, NBS 1982 from memory; SI 2019 R, F)
    expect(r[0]![0]).toBeCloseTo(0.2802187, 6);
    expect(r[1]![0]).toEqual({
      code: '#N/A',
      message: 'values (Cu2+) holds the error #N/A from its cell: fix that cell (or the formula that gives it) first.',
    });
    expect(r[2]![0]).toBeCloseTo(E_CU, 12);
  });

  test('a repeated sweep (the fast path) propagates an error cell the same way', () => {
    const args: Arg[] = ['Cu2+/Cu', [['Cu2+']], [[0.01], ['#N/A'], [1]]];
    const first = callFunction('POTENTIAL', args);
    const again = callFunction('POTENTIAL', args);
    expect(again).toEqual(first);
    expect(again[1]![0]).toEqual({
      kind: 'cell-error',
      code: '#N/A',
      message: 'values (Cu2+) holds the error #N/A from its cell: fix that cell (or the formula that gives it) first.',
    });
  });

  test('an error cell under a species the reaction does not read is not read', () => {
    // extra species are ignored (docs/design.md, "Conventions"): a(Cu2+) = 0.01 → 0.337 − RT ln10/F
    const r = callFunction('POTENTIAL', ['Cu2+/Cu', [['Cu2+', 'Zn2+']], [[0.01, '#N/A']]]);
    expect(r[0]![0] as number).toBeCloseTo(0.2802187, 6); // 65.49 kJ/mol / 2F (NBS 1982, from memory) − S25
  });

  test('a table row with an error does not break lookups of other rows', () => {
    expect(viaExcel(CASES[9]!)).toEqual([[0.34]]);
  });
});
