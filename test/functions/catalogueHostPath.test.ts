/**
 * The Excel path of POTENTIAL and LOGQ (spec `host`, called by the wrappers before any
 * argument is converted): reached by Excel-shaped calls, and for every shape or value it does
 * not take (error values, text, blanks, bad widths, refused temperatures) the result is the
 * general path's, message for message. Each result is compared with the same call made after
 * the one-entry cache is emptied (so the general path computes it) and, for numbers, with the
 * Nernst equation written out by hand.
 */
import { stub } from './installStub';
import { StubError } from './customFunctionsStub';
import '../../src/functions/functions';
import { CATALOGUE } from '../../src/functions/catalogue';
import { LAST_NERNST_CALL_CACHE } from '../../src/functions/specs/nernst';
import { F, R } from '../support';

/** E°(Cu2+/Cu) and E°(Zn2+/Zn) of the user's table rows below (OpenStax Chemistry 2e, Appendix L). */
const CU_E0 = 0.34;
const ZN_E0 = -0.7618;
/** dE°/dT of the rows, mV/K (Bratsch 1989, from memory). */
const CU_DEDT = 0.011;
const ZN_DEDT = 0.119;
const DANIELL = 'Zn | Zn2+ || Cu2+ | Cu';

function excelFn(id: string): (...args: unknown[]) => unknown[][] {
  const fn = stub.associations.get(id);
  if (!fn) throw new Error(`${id} is not associated`);
  return fn as (...args: unknown[]) => unknown[][];
}

function userTable(): unknown[][] {
  return [
    ['reaction', 'E0_V', 'dEdT_mV_per_K', 'source'],
    ['Zn2+ + 2 e- -> Zn', ZN_E0, ZN_DEDT, 'OpenStax Chemistry 2e, Appendix L'],
    ['Cu2+ + 2 e- -> Cu', CU_E0, CU_DEDT, 'OpenStax Chemistry 2e, Appendix L'],
  ];
}

/** The Daniell EMF by hand: E°(T) by the rows' straight lines, minus (RT ln10/2F)·log10(aZn/aCu). */
function handE(aZn: number, aCu: number, tempC = 25): number {
  const e0 = CU_E0 - ZN_E0 + ((CU_DEDT - ZN_DEDT) / 1000) * (tempC - 25);
  return e0 - ((R * (tempC + 273.15) * Math.LN10) / (2 * F)) * Math.log10(aZn / aCu);
}

const potential = (values: unknown, temp: unknown = null, table: unknown = userTable()) =>
  excelFn('POTENTIAL')([[DANIELL]], [['Zn2+', 'Cu2+']], values, temp, table);

/** The call primed (fast) and the same call on the general path, for comparison. */
function primedAndGeneral(call: () => unknown[][]): { fast: unknown[][]; general: unknown[][] } {
  LAST_NERNST_CALL_CACHE.clear();
  potential([[0.2, 0.3]]); // primes the one-entry cache with this reaction, species and table
  const fast = call();
  LAST_NERNST_CALL_CACHE.clear();
  const general = call();
  return { fast, general };
}

/** A result with error values written as their code and message, for comparing two results. */
function plain(r: unknown[][]): unknown[][] {
  return r.map((row) => row.map((c) => (c instanceof StubError ? `${c.code}: ${c.message ?? ''}` : c)));
}

describe('the Excel path of POTENTIAL', () => {
  const host = CATALOGUE.find((e) => e.id === 'POTENTIAL')!.host!;

  test('is reached by an Excel-shaped call once the reaction, species and table have been seen', () => {
    LAST_NERNST_CALL_CACHE.clear();
    const args = [[[DANIELL]], [['Zn2+', 'Cu2+']], [[0.1, 0.01]], null, userTable()];
    expect(host(args)).toBeNull(); // nothing prepared yet: the general path runs
    potential([[0.2, 0.3]]);
    const r = host(args);
    expect(r).not.toBeNull();
    // E = E° − (RT ln10/2F)·log10(0.1/0.01), derived by hand
    expect(r![0]![0] as number).toBeCloseTo(handE(0.1, 0.01), 12);
  });

  test.each([
    ['a distinct temperature as a 1×1 matrix', [[0.05, 0.2]], [[37.5]]],
    ['a temperature as a bare number', [[0.05, 0.2]], 60],
    ['the temperature omitted (undefined)', [[0.05, 0.2]], undefined],
    ['a 40-case spill', Array.from({ length: 40 }, (_, i) => [1e-3 * (i + 1), 0.02]), [[10]]],
  ])('gives bit for bit the general path for %s', (_name, values, temp) => {
    const { fast, general } = primedAndGeneral(() => potential(values, temp));
    expect(fast).toEqual(general);
    const t = typeof temp === 'number' ? temp : Array.isArray(temp) ? (temp[0]![0] as number) : 25;
    (values as number[][]).forEach((row, i) => {
      expect(Object.is(fast[i]![0], general[i]![0])).toBe(true);
      expect(fast[i]![0] as number).toBeCloseTo(handE(row[0]!, row[1]!, t), 12);
    });
  });

  test.each([
    ['an error value in a values cell', [[new StubError('#N/A'), 0.1]], null],
    ['an error value in one row of a spill', [[0.1, 0.2], [0.1, new StubError('#DIV/0!')], [0.3, 0.4]], null],
    ['a blank values cell', [[null, 0.1]], null],
    ['number text in a values cell', [['0.1', 0.1]], null],
    ['a zero activity', [[0, 0.1]], null],
    ['a negative activity', [[0.1, -0.1]], null],
    ['a values row wider than the species', [[0.1, 0.2, 0.3]], null],
    ['a values column for a two-species row', [[0.1], [0.2]], null],
    ['a temperature above the data range', [[0.1, 0.2]], [[150]]],
    ['a temperature given in kelvin', [[0.1, 0.2]], [[298.15]]],
    ['an error value as the temperature', [[0.1, 0.2]], [[new StubError('#N/A')]]],
    ['number text as the temperature', [[0.1, 0.2]], [['30']]],
    ['a column of temperatures', [[0.1, 0.2], [0.3, 0.4]], [[20], [30]]],
    ['activities whose ratio leaves the number range', [[1e300, 1e-300]], null],
  ])('leaves %s to the general path, with its result and message', (_name, values, temp) => {
    const { fast, general } = primedAndGeneral(() => potential(values, temp));
    expect(plain(fast)).toEqual(plain(general));
  });

  test('a value row of numbers is not changed by the call', () => {
    const rows = [[0.1, 0.01]];
    potential(rows);
    potential(rows);
    expect(rows).toEqual([[0.1, 0.01]]);
  });
});

describe('the Excel path of LOGQ', () => {
  const logq = (values: unknown) => excelFn('LOGQ')([[DANIELL]], [['Zn2+', 'Cu2+']], values, userTable());

  test('gives log10 Q = log10(a(Zn2+)/a(Cu2+)) bit for bit the general path', () => {
    LAST_NERNST_CALL_CACHE.clear();
    logq([[0.3, 0.2]]);
    const fast = logq([[0.1, 0.01]]);
    LAST_NERNST_CALL_CACHE.clear();
    const general = logq([[0.1, 0.01]]);
    expect(Object.is(fast[0]![0], general[0]![0])).toBe(true);
    // log10(0.1/0.01) = 1, derived by hand
    expect(fast[0]![0] as number).toBeCloseTo(1, 12);
  });

  test('after a POTENTIAL call of the same reaction, LOGQ still gives log10 Q (not E)', () => {
    LAST_NERNST_CALL_CACHE.clear();
    potential([[0.2, 0.3]]);
    expect(logq([[0.1, 0.01]])[0]![0] as number).toBeCloseTo(1, 12);
    expect(potential([[0.1, 0.01]])[0]![0] as number).toBeCloseTo(handE(0.1, 0.01), 12);
  });
});

describe('the Excel path of a cell diagram with its activities written in', () => {
  const host = CATALOGUE.find((e) => e.id === 'POTENTIAL')!.host!;
  const diagram = (a: string, b: string) => `Zn | Zn2+(aq, ${a} M) || Cu2+(aq, ${b} M) | Cu`;
  const call = (text: string, temp: unknown = null, table: unknown = userTable()) =>
    excelFn('POTENTIAL')([[text]], null, null, temp, table);

  /** The call after a primed diagram of other amounts, and the same call on the general path. */
  function primed(text: string, temp: unknown = null, table: unknown = userTable()) {
    LAST_NERNST_CALL_CACHE.clear();
    call(diagram('0.3', '0.04'), null, userTable());
    const args = [[[text]], null, null, temp, table];
    const reached = host(args) !== null;
    const fast = call(text, temp, table);
    LAST_NERNST_CALL_CACHE.clear();
    const general = call(text, temp, table);
    return { reached, fast, general };
  }

  test.each([
    ['0.1', '0.01', null],
    ['0.0123', '0.1', [[40]]],
    ['.5', '2.5e-3', 5],
    ['1', '7E2', null],
    ['0.012345678901234567', '0.98765432109876543', [[0]]],
  ])('reads %s M and %s M in one scan, bit for bit the general path', (a, b, temp) => {
    const { reached, fast, general } = primed(diagram(a, b), temp);
    expect(reached).toBe(true);
    expect(Object.is(fast[0]![0], general[0]![0])).toBe(true);
    const t = typeof temp === 'number' ? temp : Array.isArray(temp) ? (temp[0]![0] as number) : 25;
    expect(fast[0]![0] as number).toBeCloseTo(handE(parseFloat(a), parseFloat(b), t), 12);
  });

  test.each([
    ['a zero amount', diagram('0', '0.1')],
    ['an amount ending in a point', diagram('1.', '0.1')],
    ['an exponent without digits', diagram('1e', '0.1')],
    ['a signed amount', diagram('-0.1', '0.1')],
    ['another unit', 'Zn | Zn2+(aq, 0.1 mM) || Cu2+(aq, 0.01 M) | Cu'],
    ['another electrode', 'Zn | Zn2+(aq, 0.1 M) || Ag+(aq, 0.01 M) | Ag'],
    ['text after the diagram', `${diagram('0.1', '0.01')} `],
    ['a space before the amount', 'Zn | Zn2+(aq,  0.1 M) || Cu2+(aq, 0.01 M) | Cu'],
    ['an amount beyond the number range', diagram('1e999', '0.1')],
  ])('leaves %s to the general path, with its result and message', (_name, text) => {
    const { reached, fast, general } = primed(text);
    expect(reached).toBe(false);
    expect(plain(fast)).toEqual(plain(general));
  });

  test.each([
    ['a species row', [['Zn2+']], null],
    ['a values matrix', null, [[0.1]]],
  ])('with %s given, leaves the call to the general path', (_name, species, values) => {
    LAST_NERNST_CALL_CACHE.clear();
    call(diagram('0.3', '0.04'));
    expect(host([[[diagram('0.1', '0.01')]], species, values, null, userTable()])).toBeNull();
  });

  test('a table that changes is read again, not served from the last call', () => {
    LAST_NERNST_CALL_CACHE.clear();
    call(diagram('0.3', '0.04'));
    const other = userTable();
    other[2]![1] = 0.3; // the Cu row's E° lowered by 0.04 V
    const got = call(diagram('0.1', '0.01'), null, other)[0]![0] as number;
    // E = 0.3 − (−0.7618) − (RT ln10/2F)·log10(0.1/0.01), derived by hand
    expect(got).toBeCloseTo(0.3 - ZN_E0 - ((R * 298.15 * Math.LN10) / (2 * F)) * 1, 12);
  });

  test('LOGQ of the diagram gives log10 Q bit for bit the general path', () => {
    const logq = (text: string) => excelFn('LOGQ')([[text]], null, null, userTable());
    LAST_NERNST_CALL_CACHE.clear();
    logq(diagram('0.3', '0.04'));
    const fast = logq(diagram('0.1', '0.01'));
    LAST_NERNST_CALL_CACHE.clear();
    const general = logq(diagram('0.1', '0.01'));
    expect(plain(fast)).toEqual(plain(general));
    // log10 Q = log10(a(Zn2+)/a(Cu2+)) = log10(0.1/0.01) = 1, derived by hand
    expect(fast[0]![0] as number).toBeCloseTo(1, 12);
  });
});
