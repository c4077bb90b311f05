/**
 * The catalogue's fast paths give bit for bit what the general path gives, for calls shaped
 * the way Excel makes them: every argument a matrix (`[[text]]`), a fresh array for every
 * argument of every call, distinct values each call. Each call's result is compared with the
 * same call made after the one-entry fast-path cache is emptied (so it takes the general path),
 * and with the Nernst equation written by hand.
 */
import { stub } from './installStub';
import { StubError } from './customFunctionsStub';
import '../../src/functions/functions';
import { LAST_NERNST_CALL_CACHE } from '../../src/functions/specs/nernst';
import { F, R } from '../support';

const S25 = (R * 298.15 * Math.LN10) / F;
/** E°(Cu2+/Cu) and E°(Zn2+/Zn) of the user's table rows below (OpenStax Chemistry 2e, Appendix L). */
const CU_E0 = 0.34;
const ZN_E0 = -0.7618;
const DANIELL = 'Zn | Zn2+ || Cu2+ | Cu';

function potentialFn(): (...args: unknown[]) => unknown[][] {
  const fn = stub.associations.get('POTENTIAL');
  if (!fn) throw new Error('POTENTIAL is not associated');
  return fn as (...args: unknown[]) => unknown[][];
}

/** A fresh copy of a user's potentials range, as Excel passes a range: a new array every call. */
function userTable(cuE0 = CU_E0): unknown[][] {
  return [
    ['reaction', 'E0_V', 'dEdT_mV_per_K', 'source'],
    ['Zn2+ + 2 e- -> Zn', ZN_E0, 0.119, 'OpenStax Chemistry 2e, Appendix L'],
    ['Cu2+ + 2 e- -> Cu', cuE0, 0.011, 'OpenStax Chemistry 2e, Appendix L'],
  ];
}

/** One Excel-shaped call, every argument fresh. */
function excelCall(a1: number, a2: number, table: unknown[][] | null): unknown[][] {
  return potentialFn()([[DANIELL]], [['Zn2+', 'Cu2+']], [[a1, a2]], null, table);
}

describe('the POTENTIAL fast path with Excel-shaped arguments', () => {
  const cases: [number, number][] = [
    [0.1, 0.01],
    [0.0123, 0.1],
    [1, 1],
    [0.5, 2e-6],
    [3.7e-4, 0.91],
  ];

  test.each([
    ['the built-in table (table omitted)', false],
    ["the user's table, a fresh array each call", true],
  ])('repeated calls with %s give bit for bit the general path', (_name, withTable) => {
    LAST_NERNST_CALL_CACHE.clear();
    excelCall(0.2, 0.3, withTable ? userTable() : null); // primes the fast path
    for (const [a1, a2] of cases) {
      const fast = excelCall(a1, a2, withTable ? userTable() : null);
      LAST_NERNST_CALL_CACHE.clear();
      const general = excelCall(a1, a2, withTable ? userTable() : null);
      expect(fast).toHaveLength(1);
      expect(Object.is(fast[0]![0], general[0]![0])).toBe(true);
      if (withTable) {
        // E = E°(Cu) − E°(Zn) − (RT ln10 / 2F)·log10(a(Zn2+)/a(Cu2+)), derived by hand
        expect(fast[0]![0] as number).toBeCloseTo(CU_E0 - ZN_E0 - (S25 / 2) * Math.log10(a1 / a2), 12);
      }
    }
  });

  test('a table whose content changes (same shape, a new E°) is read again, not served from the last call', () => {
    LAST_NERNST_CALL_CACHE.clear();
    const before = excelCall(0.1, 0.01, userTable(CU_E0))[0]![0] as number;
    const after = excelCall(0.1, 0.01, userTable(0.3))[0]![0] as number;
    // the Cu row's E° lowered by 0.04 V lowers the EMF by the same (derived by hand)
    expect(before).toBeCloseTo(CU_E0 - ZN_E0 - (S25 / 2) * 1, 12);
    expect(after).toBeCloseTo(0.3 - ZN_E0 - (S25 / 2) * 1, 12);
  });

  test('a table that gains a row is read again', () => {
    LAST_NERNST_CALL_CACHE.clear();
    excelCall(0.1, 0.01, userTable());
    const longer = [...userTable(), ['Cu2+ + 2 e- -> Cu', 0.3, 0, 'a second row for the same couple']];
    const general = (() => {
      LAST_NERNST_CALL_CACHE.clear();
      return excelCall(0.1, 0.01, [...userTable(), ['Cu2+ + 2 e- -> Cu', 0.3, 0, 'a second row for the same couple']]);
    })();
    LAST_NERNST_CALL_CACHE.clear();
    excelCall(0.1, 0.01, userTable());
    expect(excelCall(0.1, 0.01, longer)).toEqual(general);
  });
});

describe('a spilled POTENTIAL checked in one pass', () => {
  /** 200 distinct cases (more than the kernel marks as all numbers), a fresh matrix. */
  function valueRows(): unknown[][] {
    const rows: unknown[][] = [];
    for (let i = 0; i < 200; i++) rows.push([1e-4 * (i + 1), 0.5 / (i + 1)]);
    return rows;
  }
  const handE = (a1: number, a2: number) => CU_E0 - ZN_E0 - (S25 / 2) * Math.log10(a1 / a2);

  test('all-number spills are handed over as the kernel wrote them, bit for bit the general path', () => {
    LAST_NERNST_CALL_CACHE.clear();
    const general = potentialFn()([[DANIELL]], [['Zn2+', 'Cu2+']], valueRows(), null, userTable());
    const fast = potentialFn()([[DANIELL]], [['Zn2+', 'Cu2+']], valueRows(), null, userTable());
    expect(fast).toHaveLength(200);
    const rows = valueRows() as [number, number][];
    for (let i = 0; i < 200; i++) {
      expect(fast[i]).toHaveLength(1);
      expect(Object.is(fast[i]![0], general[i]![0])).toBe(true);
      // the Nernst equation by hand (OpenStax Chemistry 2e, Appendix L E°; SI 2019 R and F)
      expect(fast[i]![0] as number).toBeCloseTo(handE(rows[i]![0], rows[i]![1]), 12);
    }
  });

  test.each([false, true])('an error cell and a bad value in a long spill still become error cells (fast path: %s)', (primed) => {
    LAST_NERNST_CALL_CACHE.clear();
    if (primed) potentialFn()([[DANIELL]], [['Zn2+', 'Cu2+']], valueRows(), null, userTable());
    const rows = valueRows();
    rows[7] = [new StubError('#N/A'), 0.1]; // Excel hands an error cell over as an error object
    rows[50] = [-1, 0.1];
    const out = potentialFn()([[DANIELL]], [['Zn2+', 'Cu2+']], rows, null, userTable());
    expect(out).toHaveLength(200);
    expect(typeof out[7]![0]).toBe('object');
    expect((out[7]![0] as { code: string }).code).toBe('#N/A');
    expect(typeof out[50]![0]).toBe('object');
    expect((out[50]![0] as { code: string }).code).toBe('#VALUE!');
    expect(out[8]![0] as number).toBeCloseTo(handE(9e-4, 0.5 / 9), 12);
  });
});
