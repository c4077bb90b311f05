/**
 * The Excel wrappers (functions.ts) over a stub `CustomFunctions`: every function is associated
 * under its id, gives the published value for a known case, takes Excel's forms of empty and
 * omitted arguments, and returns errors as `CustomFunctions.Error` with the right code.
 *
 * Arguments are passed as Excel passes them to `any[][]` parameters: a cell as [[v]], a range
 * as rows, an omitted optional argument as null (some builds give undefined).
 */
import { stub } from './installStub';
import { StubError } from './customFunctionsStub';
import * as F from '../../src/functions/functions';
import { CATALOGUE, type Result } from '../../src/functions/catalogue';
import { argFromExcel, resultToExcel, toExcel } from '../../src/functions/excelErrors';
import { F as F_SI, s } from '../support';

/** E°(Cu2+/Cu) of the built-in row: ΔfG°(Cu2+) = 65.49 kJ/mol / 2F (NBS 1982, from memory; OpenStax Appendix L prints +0.34). */
const E_CU = 65.49e3 / (2 * 96485.33212331001);

type Cell = number | string | StubError;
const call = (fn: (...a: any[]) => any[][], ...args: unknown[]): Cell[][] => fn(...args) as Cell[][]; // eslint-disable-line @typescript-eslint/no-explicit-any
const c = (v: unknown) => [[v]];

/** The one value of a 1×1 result, which must be a number. */
function num(result: Cell[][]): number {
  expect(result).toHaveLength(1);
  expect(result[0]).toHaveLength(1);
  const v = result[0]![0];
  if (typeof v !== 'number') throw new Error(`expected a number, got ${JSON.stringify(v)}`);
  return v;
}

/** The one value of a 1×1 result, which must be an error. */
function err(result: Cell[][]): StubError {
  expect(result).toHaveLength(1);
  const v = result[0]![0];
  expect(v).toBeInstanceOf(StubError);
  return v as StubError;
}

// SI 2019 exact constants (F = N_A·e, R = N_A·k) and RT ln10/F, from the shared test support
const F_C = F_SI;
const slopeAt = s;

describe('association', () => {
  it('associates every catalogue id once, with the exported function of that name', () => {
    const ids = stub.calls.map(([id]) => id);
    expect(ids).toEqual(CATALOGUE.map((s) => s.id));
    expect(new Set(ids).size).toBe(ids.length);
    const exported = F as unknown as Record<string, unknown>;
    for (const [id, fn] of stub.calls) expect(fn).toBe(exported[id]);
  });

  it('declares the catalogue parameters in order (Function.length counts them all)', () => {
    const exported = F as unknown as Record<string, (...a: unknown[]) => unknown>;
    for (const spec of CATALOGUE)
      expect({ id: spec.id, n: exported[spec.id]!.length }).toEqual({ id: spec.id, n: spec.params.length });
  });
});

describe('published values', () => {
  it('NERNSTSLOPE at 25 °C is RT ln10/F = 0.0591593 V (derived from the SI 2019 exact constants)', () => {
    const v = num(call(F.NERNSTSLOPE, null, null));
    expect(v).toBeCloseTo(slopeAt(25), 12);
    expect(v.toFixed(5)).toBe('0.05916');
    expect(num(call(F.NERNSTSLOPE, c(25), c(2)))).toBeCloseTo(slopeAt(25) / 2, 12);
  });

  it('POTENTIAL of the Daniell cell at standard state is 1.10 V (common practice)', () => {
    const v = num(call(F.POTENTIAL, c('Zn(s) | Zn2+(aq) || Cu2+(aq) | Cu(s)'), null, null, null, null));
    expect(v.toFixed(2)).toBe('1.10');
    expect(num(call(F.POTENTIAL, c('Zn + Cu2+ -> Zn2+ + Cu')))).toBeCloseTo(v, 12);
  });

  it('STDPOTENTIAL of Cu2+/Cu is 65.49 kJ/mol / 2F = 0.3394 V (NBS 1982, from memory; OpenStax prints +0.34)', () => {
    expect(num(call(F.STDPOTENTIAL, c('Cu2+/Cu')))).toBeCloseTo(E_CU, 12);
  });

  it('POTENTIAL follows Nernst: Cu2+/Cu at a(Cu2+) = 0.01 is E° − (slope/2)·2 = 0.28022 V', () => {
    const v = num(call(F.POTENTIAL, c('Cu2+/Cu'), c('Cu2+'), c(0.01)));
    expect(v).toBeCloseTo(E_CU - slopeAt(25), 12);
    expect(num(call(F.POTENTIAL, c('Cu2+ + 2 e- -> Cu'), c('Cu2+'), c(0.01)))).toBeCloseTo(v, 12);
  });

  it('VSREF: the SCE is 0.2412 V vs SHE (Int. J. Corrosion 2010, art. 756950, Table 2)', () => {
    expect(num(call(F.VSREF, c(0), c('SCE'), c('SHE')))).toBeCloseTo(0.2412, 12);
    expect(num(call(F.VSREF, c(0.2412), c('SHE'), c('SCE')))).toBeCloseTo(0, 12);
  });

  it('GIBBS for (E°, n) = (+0.434 V, 2) is −83.7 kJ/mol (OpenStax Chemistry 2e, ch. 17)', () => {
    const v = num(call(F.GIBBS, c(0.434), c(2)));
    expect(v.toFixed(1)).toBe('-83.7');
    expect(v).toBeCloseTo((-2 * F_C * 0.434) / 1000, 10);
  });

  it('LOGK and EQCONST are nE°/slope and its power of ten (derived)', () => {
    expect(num(call(F.LOGK, c(1.1), c(2)))).toBeCloseTo((2 * 1.1) / slopeAt(25), 10);
    expect(num(call(F.EQCONST, c(0.1), c(1)))).toBeCloseTo(10 ** (0.1 / slopeAt(25)), 8);
    const k = num(call(F.EQCONST, c('Zn + Cu2+ -> Zn2+ + Cu')));
    expect(Math.log10(k)).toBeCloseTo(num(call(F.LOGK, c('Zn + Cu2+ -> Zn2+ + Cu'))), 10);
  });

  it('QUOTIENT and LOGQ of Zn + Cu2+ at a(Zn2+) = 0.1, a(Cu2+) = 0.01: Q = 10 (definition; Zn and Cu pure solids)', () => {
    const species = [['Zn2+', 'Cu2+']];
    const values = [[0.1, 0.01]];
    expect(num(call(F.QUOTIENT, c('Zn + Cu2+ -> Zn2+ + Cu'), species, values))).toBeCloseTo(10, 12);
    expect(num(call(F.LOGQ, c('Zn + Cu2+ -> Zn2+ + Cu'), species, values))).toBeCloseTo(1, 12);
  });

  it('ELECTRONS and BALANCE: permanganate takes 5 electrons and oxidises 5 Fe2+ in acid (textbook)', () => {
    expect(num(call(F.ELECTRONS, c('MnO4- + 8 H+ + 5 e- -> Mn2+ + 4 H2O')))).toBe(5);
    expect(num(call(F.ELECTRONS, c('Zn + Cu2+ -> Zn2+ + Cu')))).toBe(2);
    expect(call(F.BALANCE, c('MnO4- + Fe2+ -> Mn2+ + Fe3+'), c('acid'))).toEqual([
      ['MnO4- + 5 Fe2+ + 8 H+ -> Mn2+ + 5 Fe3+ + 4 H2O'],
    ]);
  });

  it('CONCCELL: a hundredfold ratio over a 2-electron couple gives one full slope, 0.05916 V (derived)', () => {
    expect(num(call(F.CONCCELL, c('Cu2+/Cu'), c(0.001), c(0.1)))).toBeCloseTo(slopeAt(25), 12);
  });

  it('ACTCOEF, ACTIVITY, IONICSTR: Davies at I = 0.01 mol/kg, A ≈ 0.509 (Davies equation)', () => {
    const davies = (z: number, I: number) =>
      10 ** (-0.509 * z * z * (Math.sqrt(I) / (1 + Math.sqrt(I)) - 0.3 * I));
    expect(num(call(F.ACTCOEF, c('Ca2+'), c(0.01), c('davies')))).toBeCloseTo(davies(2, 0.01), 3);
    const a = call(F.ACTIVITY, [['Na+', 'Cl-']], [[0.01, 0.01]]);
    expect(a).toHaveLength(1);
    for (const v of a[0]!) expect(v as number).toBeCloseTo(0.01 * davies(1, 0.01), 5);
    expect(num(call(F.IONICSTR, [['Na+', 'SO4^2-']], [[0.02, 0.01]]))).toBeCloseTo(
      0.5 * (0.02 + 0.01 * 4),
      12,
    );
  });

  it('COMBINE chains Fe3+/Fe2+ (0.771 V, 1 e−) and Fe2+/Fe (−0.447 V, 2 e−) into Fe3+/Fe: −0.041 V', () => {
    expect(num(call(F.COMBINE, [[0.771, -0.447]], [[1, 2]]))).toBeCloseTo((0.771 - 2 * 0.447) / 3, 12);
  });

  it('SOURCE names the publication; CELLNOTATION writes the activities in', () => {
    const s = call(F.SOURCE, c('Cu2+/Cu'));
    expect(String(s[0]![0])).toContain('OpenStax Chemistry 2e, Appendix L');
    expect(call(F.CELLNOTATION, c('Zn + Cu2+ -> Zn2+ + Cu'), [['Zn2+', 'Cu2+']], [[0.1, 0.01]])).toEqual([
      ['Zn(s) | Zn2+(aq, 0.1 M) || Cu2+(aq, 0.01 M) | Cu(s)'],
    ]);
  });

  it('LISTTABLE spills the table with a header row; CHECKTABLE says OK or lists the problems', () => {
    const t = call(F.LISTTABLE, c('Cu'));
    expect(t.length).toBeGreaterThan(2);
    expect(t[0]!).toHaveLength(4);
    expect(t.find((r) => r[0] === 'Cu2+ + 2 e- -> Cu')?.[1]).toBe(0.3394); // the row shows E° to 0.1 mV
    expect(call(F.LISTTABLE).length).toBeGreaterThan(60);
    expect(call(F.CHECKTABLE, [['Cu2+ + 2 e- -> Cu', 0.34, '', 'my lab']])).toEqual([['OK']]);
    const problems = call(F.CHECKTABLE, [
      ['Cu2+ + e- -> Cu', 0.34, '', 'typo'],
      ['Ag+ + e- -> Ag', 'abc', '', ''],
    ]);
    expect(problems).toHaveLength(2);
    for (const row of problems) expect(typeof row[0]).toBe('string');
  });
});

describe('defaults, omitted arguments and empty cells', () => {
  const E25 = E_CU - slopeAt(25);

  it('temp_C omitted, null, undefined or an empty cell ("") is 25 °C', () => {
    const args = [c('Cu2+/Cu'), c('Cu2+'), c(0.01)];
    expect(num(call(F.POTENTIAL, ...args))).toBeCloseTo(E25, 12);
    expect(num(call(F.POTENTIAL, ...args, null, null))).toBeCloseTo(E25, 12);
    expect(num(call(F.POTENTIAL, ...args, undefined, undefined))).toBeCloseTo(E25, 12);
    expect(num(call(F.POTENTIAL, ...args, c(''), c('')))).toBeCloseTo(E25, 12);
    expect(num(call(F.POTENTIAL, ...args, c(null), c(null)))).toBeCloseTo(E25, 12);
    expect(num(call(F.NERNSTSLOPE, c(''), c('')))).toBeCloseTo(slopeAt(25), 12);
  });

  it('temp_C 0 is 0 °C, a real temperature, not an empty cell', () => {
    expect(num(call(F.NERNSTSLOPE, c(0)))).toBeCloseTo(slopeAt(0), 12);
  });

  it('no species and no values is the standard state', () => {
    expect(num(call(F.POTENTIAL, c('Cu2+/Cu'), null, null))).toBeCloseTo(E_CU, 12);
    expect(num(call(F.POTENTIAL, c('Cu2+/Cu'), c(''), c('')))).toBeCloseTo(E_CU, 12);
  });

  it('an empty table ("", 0 or null) means the built-in table; a given table takes precedence', () => {
    for (const empty of [null, c(''), c(0), c(null)]) {
      expect(num(call(F.POTENTIAL, c('Cu2+/Cu'), c('Cu2+'), c(0.01), null, empty))).toBeCloseTo(E25, 12);
    }
    const mine = [['Cu2+ + 2 e- -> Cu', 0.34, '', 'my lab']];
    expect(num(call(F.STDPOTENTIAL, c('Cu2+/Cu'), null, mine))).toBe(0.34);
  });

  it('an empty values cell for a needed species is an error that says so (it reads as 0)', () => {
    const e = err(call(F.POTENTIAL, c('Cu2+/Cu'), c('Cu2+'), c(0)));
    expect(e.code).toBe('#VALUE!');
    expect(e.message).toMatch(/Cu2\+/);
  });

  it('accepts a single value as a plain scalar too (not only Excel’s [[v]])', () => {
    expect(num(call(F.POTENTIAL, 'Cu2+/Cu', 'Cu2+', 0.01))).toBeCloseTo(E25, 12);
  });

  it('keeps a 1×1 result a 1×1 grid', () => {
    const r = call(F.STDPOTENTIAL, c('Cu2+/Cu'));
    expect(r).toHaveLength(1);
    expect(r[0]).toHaveLength(1);
    expect(r[0]![0]).toBeCloseTo(E_CU, 12);
  });
});

describe('errors', () => {
  it('text where a number belongs is #VALUE! with a message naming the argument', () => {
    const cases: [string, Cell[][]][] = [
      ['temp_C', call(F.POTENTIAL, c('Cu2+/Cu'), c('Cu2+'), c(0.01), c('warm'))],
      ['n', call(F.NERNSTSLOPE, c(25), c('two'))],
      ['potential', call(F.VSREF, c('low'), c('SCE'), c('SHE'))],
      ['ionic_strength', call(F.ACTCOEF, c('Ca2+'), c('high'))],
    ];
    for (const [arg, result] of cases) {
      const e = err(result);
      expect(e.code).toBe('#VALUE!');
      expect(e.message).toContain(arg);
    }
  });

  it('a bad case errs in its own cell of the spill; the other cases compute', () => {
    const r = call(F.POTENTIAL, c('Cu2+/Cu'), c('Cu2+'), [[1], [0.1], [-1], ['x'], [0.01]]);
    expect(r).toHaveLength(5);
    expect(r[0]![0]).toBeCloseTo(E_CU, 12);
    expect(r[1]![0]).toBeCloseTo(E_CU - slopeAt(25) / 2, 12);
    expect(r[4]![0]).toBeCloseTo(E_CU - slopeAt(25), 12);
    for (const i of [2, 3]) {
      expect(r[i]![0]).toBeInstanceOf(StubError);
      expect((r[i]![0] as StubError).code).toBe('#VALUE!');
      expect((r[i]![0] as StubError).message).toMatch(/Cu2\+/);
    }
  });

  it('a column of temperatures sweeps; a column that does not fit the cases names both shapes', () => {
    const sweep = call(F.NERNSTSLOPE, [[0], [25], [50]]);
    expect(sweep.map((r) => r[0])).toEqual(
      [slopeAt(0), slopeAt(25), slopeAt(50)].map((x) => expect.closeTo(x, 12)),
    );
    const e = err(call(F.POTENTIAL, c('Cu2+/Cu'), c('Cu2+'), [[1], [0.1], [0.01]], [[25], [30]]));
    expect(e.code).toBe('#VALUE!');
    expect(e.message).toMatch(/temp_C has 2 entries/);
    expect(e.message).toMatch(/values has 3 rows/);
  });

  it('maps the codes: #VALUE! (unreadable), #N/A (not in the table, unknown reference), #NUM! (out of range)', () => {
    const bad = err(call(F.STDPOTENTIAL, c('Cu2+ -> ->')));
    expect(bad.code).toBe(stub.ErrorCode.invalidValue);
    expect(bad.message).toBeTruthy();

    const missing = err(call(F.STDPOTENTIAL, c('Rh3+/Rh')));
    expect(missing.code).toBe(stub.ErrorCode.notAvailable);
    expect(missing.message).toMatch(/not in the potentials table/);
    const ref = err(call(F.VSREF, c(0), c('XYZ'), c('SHE')));
    expect(ref.code).toBe('#N/A');
    expect(ref.message).toMatch(/from_ref/);

    const huge = err(call(F.EQCONST, c(10), c(4)));
    expect(huge.code).toBe(stub.ErrorCode.invalidNumber);
    expect(huge.message).toBeUndefined(); // Excel shows no message on #NUM!
  });

  it('an error value in an input cell propagates: #N/A stays #N/A, with a message naming the argument', () => {
    const e = err(call(F.POTENTIAL, c('Cu2+/Cu'), c('Cu2+'), c(0.01), [[new StubError('#N/A')]]));
    expect(e.code).toBe('#N/A');
    expect(e.message).toBe('temp_C holds the error #N/A from its cell: fix that cell (or the formula that gives it) first.');
    const d = err(call(F.POTENTIAL, c('Cu2+/Cu'), c('Cu2+'), [[new StubError('#DIV/0!')]]));
    expect(d.code).toBe('#VALUE!');
    expect(d.message).toContain('values (Cu2+) holds the error #DIV/0!');
  });
});

describe('excelErrors', () => {
  const cellError = (code: '#VALUE!' | '#N/A' | '#NUM!', message: string) => ({
    kind: 'cell-error' as const,
    code,
    message,
  });

  it('maps each catalogue code to its Excel error, keeping messages where Excel shows them', () => {
    const out = resultToExcel([
      [cellError('#VALUE!', 'bad text'), cellError('#N/A', 'not found'), cellError('#NUM!', 'too big')],
    ]) as unknown as StubError[][];
    expect(out[0]!.map((e) => [e.code, e.message])).toEqual([
      ['#VALUE!', 'bad text'],
      ['#N/A', 'not found'],
      ['#NUM!', undefined],
    ]);
  });

  it('hands an all-number result over as it is, and never lets NaN or Infinity through', () => {
    const clean: Result = [[1], [2]];
    expect(resultToExcel(clean)).toBe(clean);
    const out = resultToExcel([[NaN, Infinity, -Infinity, 'ok']]) as unknown as Cell[][];
    expect((out[0]![0] as StubError).code).toBe('#VALUE!');
    expect((out[0]![0] as StubError).message).toMatch(/^Internal error: .*please report/);
    expect((out[0]![1] as StubError).code).toBe('#NUM!');
    expect((out[0]![2] as StubError).code).toBe('#NUM!');
    expect(out[0]![3]).toBe('ok');
  });

  it('turns an exception or a malformed result into #VALUE! "Internal error: …, please report"', () => {
    const thrown = toExcel(() => {
      throw new Error('boom');
    }) as unknown as StubError[][];
    expect(thrown).toHaveLength(1);
    expect(thrown[0]![0]!.code).toBe('#VALUE!');
    expect(thrown[0]![0]!.message).toMatch(/^Internal error: boom, please report/);
    for (const bad of [[], [[]], 'x', null] as unknown as Result[]) {
      const r = toExcel(() => bad) as unknown as StubError[][];
      expect(r[0]![0]!.code).toBe('#VALUE!');
      expect(r[0]![0]!.message).toMatch(/^Internal error/);
    }
  });

  it('passes Excel’s arguments through: ranges uncopied, omitted as undefined, error values as their code', () => {
    const g = [[1, 'a', null, true]];
    expect(argFromExcel(g)).toBe(g);
    expect(argFromExcel(undefined)).toBeUndefined();
    expect(argFromExcel(null)).toBeNull();
    expect(argFromExcel([[new StubError('#DIV/0!'), 2]])).toEqual([['#DIV/0!', 2]]);
    expect(argFromExcel([1, 2])).toEqual([[1], [2]]);
  });

  it('no wrapper throws, whatever it is given', () => {
    const junk: unknown[] = [
      undefined,
      null,
      '',
      0,
      -1,
      NaN,
      'x',
      [[]],
      [[{}]],
      [[Symbol('s')]],
      { a: 1 },
      [[1e308, -1e308]],
    ];
    const exported = F as unknown as Record<string, (...a: unknown[]) => Cell[][]>;
    for (const spec of CATALOGUE) {
      for (const j of junk) {
        const args = spec.params.map(() => j);
        const r = exported[spec.id]!(...args);
        expect(
          Array.isArray(r) && r.length > 0 && r.every((row) => Array.isArray(row) && row.length > 0),
        ).toBe(true);
        for (const row of r)
          for (const v of row) {
            if (typeof v === 'number') expect(Number.isFinite(v)).toBe(true);
            else if (typeof v !== 'string') expect(v).toBeInstanceOf(StubError);
          }
      }
    }
  });
});
