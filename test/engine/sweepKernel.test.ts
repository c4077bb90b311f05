/**
 * The two-species kernel (pairKernel, pairColumn, sweepToColumn's fast loop) and the kernel of
 * cell diagrams with inline amounts (inlineDiagramKernel, readInlineAmounts,
 * inlineDiagramValue), checked against the Nernst equation written out by hand with the E°
 * and dE°/dT of the user's table below, and against the general path of the same engine.
 */
import {
  bindSpecies,
  cellOf,
  compiledReaction,
  inlineDiagramKernel,
  inlineDiagramValue,
  isFiniteColumn,
  pairColumn,
  pairKernel,
  readInlineAmounts,
  sweepCases,
  sweepToColumn,
} from '../../src/engine';
import { S25, s } from './support';

/** E°(Zn2+/Zn) −0.7618 V and E°(Cu2+/Cu) +0.34 V: OpenStax Chemistry 2e, Appendix L; dE°/dT Bratsch 1989 (from memory). */
const TABLE = [
  ['reaction', 'E0_V', 'dEdT_mV_per_K', 'source'],
  ['Zn2+ + 2 e- -> Zn', -0.7618, 0.119, 'OpenStax Chemistry 2e, Appendix L'],
  ['Cu2+ + 2 e- -> Cu', 0.34, 0.011, 'OpenStax Chemistry 2e, Appendix L'],
];
const DANIELL = 'Zn | Zn2+ || Cu2+ | Cu';

/** E = E°(T) − (RT ln10/2F)·log10(aZn/aCu), E°(T) by the rows' straight lines (derived by hand). */
function handE(aZn: number, aCu: number, tempC = 25): number {
  const e0 = 0.34 + 0.7618 + ((0.011 - 0.119) / 1000) * (tempC - 25);
  return e0 - (s(tempC) / 2) * Math.log10(aZn / aCu);
}

const binding = () => bindSpecies(compiledReaction(DANIELL, TABLE), ['Zn2+', 'Cu2+']);

describe('the two-species kernel', () => {
  test.each([25, 0, 37.5, 100])('at %s °C gives the Nernst equation by hand', (tempC) => {
    const k = pairKernel(binding(), tempC, 'potential')!;
    const col = pairColumn(k, [[0.1, 0.01], [0.0123, 0.5]])!;
    expect(col[0]![0]).toBeCloseTo(handE(0.1, 0.01, tempC), 12);
    expect(col[1]![0]).toBeCloseTo(handE(0.0123, 0.5, tempC), 12);
  });

  test('for log10 Q gives n·Σw·log10 a = log10(aZn/aCu)', () => {
    const k = pairKernel(binding(), 25, 'log10Q')!;
    // log10(0.1/0.01) = 1, derived by hand
    expect(pairColumn(k, [[0.1, 0.01]])![0]![0]).toBeCloseTo(1, 12);
  });

  test('is null for a binding that is not a ratio pair (one species, a pH column)', () => {
    expect(pairKernel(bindSpecies(compiledReaction('Cu2+/Cu', TABLE), ['Cu2+']), 25, 'potential')).toBeNull();
    const o2 = bindSpecies(compiledReaction('O2(g) + 4 H+ + 4 e- -> 2 H2O', null), ['O2', 'pH']);
    expect(pairKernel(o2, 25, 'potential')).toBeNull();
  });

  test('refuses a temperature outside the range as the sweep does', () => {
    expect(() => pairKernel(binding(), -300, 'potential')).toThrow(/absolute zero|temperature/i);
  });

  test.each([
    ['an error code text', '#N/A'],
    ['a blank', null],
    ['zero', 0],
    ['a negative activity', -0.1],
    ['number text', '0.1'],
  ])('gives no column where a case holds %s', (_name, bad) => {
    const k = pairKernel(binding(), 25, 'potential')!;
    expect(pairColumn(k, [[0.1, 0.01], [bad, 0.1]])).toBeNull();
  });

  test('marks a column of 32 or more finite cases, not a shorter one', () => {
    const k = pairKernel(binding(), 25, 'potential')!;
    const rows = Array.from({ length: 40 }, (_, i) => [0.001 * (i + 1), 0.02]);
    expect(isFiniteColumn(pairColumn(k, rows))).toBe(true);
    expect(isFiniteColumn(pairColumn(k, rows.slice(0, 5)))).toBe(false);
  });

  test('writes a spill of any length as plain one-cell rows, the same values by either row maker', () => {
    // from 32 cases the rows are made by new Array(1) and a store, below by a literal: a row
    // must hold its cell as its own element 0 (no hole) either way
    const k = pairKernel(binding(), 25, 'potential')!;
    const rows = Array.from({ length: 40 }, (_, i) => [0.001 * (i + 1), 0.02]);
    const long = pairColumn(k, rows)!;
    const short = pairColumn(k, rows.slice(0, 5))!;
    const swept = sweepToColumn(binding(), [...rows, [-1, 0.1]], 25, 'potential', (e) => e.message);
    for (const col of [long, short, swept]) {
      for (const row of col) {
        expect(Array.isArray(row)).toBe(true);
        expect(row).toHaveLength(1);
        expect(Object.keys(row)).toEqual(['0']);
      }
    }
    for (let i = 0; i < 5; i++) expect(Object.is(long[i]![0], short[i]![0])).toBe(true);
    rows.forEach(([aZn, aCu], i) => expect(long[i]![0]).toBeCloseTo(handE(aZn!, aCu!), 12));
    expect(JSON.stringify(swept.slice(0, 40))).toBe(JSON.stringify(long));
    expect(swept[40]![0]).toMatch(/positive number/);
  });

  test('sweepToColumn takes the general path for a bad case and the kernel again after it', () => {
    const rows: unknown[][] = [
      [0.1, 0.01],
      [-1, 0.1],
      [0.2, 0.3],
      [1e300, 1e-300],
      [0.5, 0.5],
    ];
    const col = sweepToColumn(binding(), rows, 25, 'potential', (e) => e.message);
    expect(col[0]![0]).toBeCloseTo(handE(0.1, 0.01), 12);
    expect(col[1]![0]).toMatch(/positive number/);
    expect(col[2]![0]).toBeCloseTo(handE(0.2, 0.3), 12);
    // a1/a2 overflows; log10 a1 − log10 a2 = 600 does not (derived by hand)
    expect(col[3]![0]).toBeCloseTo(0.34 + 0.7618 - (S25 / 2) * 600, 9);
    expect(col[4]![0]).toBeCloseTo(handE(0.5, 0.5), 12);
    // the same values as the general per-case path
    const general = sweepCases(binding(), rows as number[][], 25, 'potential');
    for (const i of [0, 2, 3, 4]) expect(Object.is(col[i]![0], general.values[i])).toBe(true);
  });

  test('cellOf reads a cell of a row as indexing does, undefined off the row or for no array', () => {
    expect(cellOf([0.1, 'x', null], 1)).toBe('x');
    expect(cellOf([0.1], 3)).toBeUndefined();
    expect(cellOf('ab', 0)).toBeUndefined();
    expect(cellOf(null, 0)).toBeUndefined();
  });
});

describe('the kernel of a cell diagram with inline amounts', () => {
  const text = (a: string, b: string) => `Zn | Zn2+(aq, ${a} M) || Cu2+(aq, ${b} mM) | Cu`;

  test('splits the text around its amounts', () => {
    expect(inlineDiagramKernel(text('0.1', '10'), TABLE)!.pieces).toEqual([
      'Zn | Zn2+(aq, ',
      ' M) || Cu2+(aq, ',
      ' mM) | Cu',
    ]);
  });

  test.each([
    ['0.1', '10', 25],
    ['2.5e-3', '0.7', 60],
    ['.5', '1E3', 5],
  ])('reads %s M and %s mM and gives bit for bit the compiled form at %s °C', (a, b, tempC) => {
    const k = inlineDiagramKernel(text('0.3', '4'), TABLE)!;
    const amounts = new Float64Array(2);
    expect(readInlineAmounts(k, text(a, b), amounts)).toBe(true);
    expect(Array.from(amounts)).toEqual([parseFloat(a), parseFloat(b)]);
    const got = inlineDiagramValue(k, amounts, tempC, 'potential');
    const general = sweepToColumn(bindSpecies(compiledReaction(text(a, b), TABLE), []), [[]], tempC, 'potential', (e) => e);
    expect(Object.is(got, general[0]![0])).toBe(true);
    // mM → mol/L by 1e-3 (common practice)
    expect(got).toBeCloseTo(handE(parseFloat(a), parseFloat(b) * 1e-3, tempC), 12);
  });

  test.each([
    ['another unit', 'Zn | Zn2+(aq, 0.1 mM) || Cu2+(aq, 4 mM) | Cu'],
    ['an amount ending in a point', text('1.', '4')],
    ['a zero amount', text('0', '4')],
    ['an amount beyond the number range', text('1e999', '4')],
    ['a trailing space', `${text('0.1', '4')} `],
    ['a missing amount', text('', '4')],
  ])('does not read %s', (_name, t) => {
    const k = inlineDiagramKernel(text('0.3', '4'), TABLE)!;
    expect(readInlineAmounts(k, t, new Float64Array(2))).toBe(false);
  });

  test('is null for a text without inline amounts', () => {
    expect(inlineDiagramKernel(DANIELL, TABLE)).toBeNull();
    expect(inlineDiagramKernel('Cu2+/Cu', TABLE)).toBeNull();
  });
});
