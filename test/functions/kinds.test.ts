/**
 * The argument kinds and the generic reader (src/functions/spec/): each kind read once into a
 * checked value, with the unit-slip hints (a temperature that looks like kelvin, millivolts
 * typed as volts), domains, defaults, flags and extrapolation, broadcasting and per-case
 * errors — exercised through a small spec of our own, so that the kinds the new function
 * families use are tested before any of those functions exists.
 */
import { implementationOf } from '../../src/functions/spec/reader';
import { readPotentialV, readTempC } from '../../src/functions/spec/kinds';
import type { FunctionSpec } from '../../src/functions/spec/types';
import { isCellError, type Result } from '../../src/functions/cellTypes';
import { TEMP_C } from '../../src/functions/spec/params';

/** A test spec: returns its typed arguments combined into one number per case. */
const PROBE: FunctionSpec = {
  id: 'PROBE',
  family: 'Test',
  summary: 'test',
  returns: 'a number',
  params: [
    { name: 'charge_C', kind: 'charge', description: 'charge' },
    { name: 'efficiency', kind: 'fraction', optional: true, default: 1, description: 'efficiency' },
    { name: 'E_V', kind: 'potential', optional: true, default: 0, description: 'potential' },
    { name: 'count', kind: 'count', optional: true, default: 1, description: 'count' },
    { ...TEMP_C, extrapolateParam: 'extrapolate' },
    { name: 'extrapolate', kind: 'flag', optional: true, default: false, description: 'allow any temperature' },
    {
      name: 'quantity',
      kind: 'choice',
      optional: true,
      default: 'G',
      choices: ['G', 'H'],
      parseChoice: (t) => (t === null ? 'G' : t.toUpperCase()),
      description: 'what',
    },
  ],
  result: { kind: 'perCase', width: 2 },
  examples: [{ args: [1], expected: 1, source: 'by construction' }],
  perCase: (a) => [
    a.num('charge_C') * a.num('efficiency') * a.num('count') + a.num('E_V') + a.num('temp_C'),
    a.choice<string>('quantity'),
  ],
};
const probe = implementationOf(PROBE);

function only(r: Result): unknown {
  expect(r).toHaveLength(1);
  return r[0]![0];
}
function errorOf(r: Result): { code: string; message: string } {
  const c = r.flat().find(isCellError);
  if (!c) throw new Error(`expected an error, got ${JSON.stringify(r)}`);
  return c;
}

describe('defaults and typed values', () => {
  test('omitted optional arguments take their defaults (25 °C, efficiency 1, "G")', () => {
    expect(probe(10)).toEqual([[10 + 25, 'G']]);
  });

  test('number text is read by the one rule, the Unicode minus included', () => {
    expect(only(probe(' 2 ', '0.5', '\u22121', 3, 0))).toBe(2 * 0.5 * 3 - 1 + 0);
  });

  test('a choice is read case-insensitively by its parser', () => {
    expect(probe(1, null, null, null, null, null, 'h')[0]![1]).toBe('H');
  });
});

describe('temperature: one check, with the kelvin hint', () => {
  test('0–100 °C is the aqueous domain; 298.15 gets the kelvin hint', () => {
    expect(errorOf(probe(1, null, null, null, 298.15)).message).toBe(
      'temp_C must be between 0 and 100 °C; got 298.15 °C: it looks like a temperature in kelvin; give it in °C (298.15 K is 25 °C).',
    );
    expect(errorOf(probe(1, null, null, null, 150)).message).toMatch(
      /got 150 °C, outside the aqueous range of the data; set extrapolate to TRUE to extrapolate/,
    );
    expect(errorOf(probe(1, null, null, null, -300)).message).toMatch(/above absolute zero \(−273\.15 °C\)/);
  });

  test('the extrapolate flag allows any physical temperature', () => {
    expect(only(probe(1, null, null, null, 150, true))).toBe(151);
    expect(only(probe(1, null, null, null, 150, 'TRUE'))).toBe(151);
    expect(errorOf(probe(1, null, null, null, -300, true)).message).toMatch(/absolute zero/);
    expect(errorOf(probe(1, null, null, null, 150, 'maybe')).message).toBe(
      'extrapolate must be TRUE or FALSE; got "maybe".',
    );
  });

  test('readTempC gives the branded value and the default', () => {
    expect(readTempC(null, TEMP_C)).toBe(25);
    expect(readTempC('37', TEMP_C)).toBe(37);
  });
});

describe('potential: millivolts typed as volts', () => {
  test('beyond ±10 V is refused with a hint, unless the parameter allows it', () => {
    expect(errorOf(probe(1, null, -850)).message).toBe(
      'E_V of -850 V is beyond ±10 V: were millivolts typed as volts? Give -0.85 for -850 mV.',
    );
    expect(readPotentialV(-850, { name: 'E', kind: 'potential', description: '', allowBeyond10V: true })).toBe(-850);
    expect(readPotentialV(-0.85, { name: 'E', kind: 'potential', description: '' })).toBe(-0.85);
  });
});

describe('domains', () => {
  test.each([
    [[-1], /charge_C must be ≥ 0 C; got -1 C/],
    [[1, 0], /efficiency must be > 0 and ≤ 1; got 0/],
    [[1, 1.5], /efficiency must be > 0 and ≤ 1; got 1\.5/],
    [[1, null, null, 2.5], /count must be a whole number; got 2\.5/],
    [[1, null, null, 0], /count must be ≥ 1; got 0/],
    [['abc'], /charge_C must be a number in C; got "abc"/],
    [[null], /charge_C is missing: give a charge in coulombs/],
  ])('%j → %s', (args, message) => {
    expect(errorOf(probe(...args)).message).toMatch(message);
  });
});

describe('cases and errors', () => {
  test('a column of cases broadcasts against single values; a bad case errs alone, across its width', () => {
    const r = probe([[1], [-1], [3]], 0.5);
    expect(r[0]).toEqual([0.5 + 25, 'G']);
    expect(isCellError(r[1]![0]) && isCellError(r[1]![1])).toBe(true);
    expect(r[2]).toEqual([1.5 + 25, 'G']);
  });

  test('columns of different lengths name both shapes', () => {
    expect(errorOf(probe([[1], [2]], [[0.5], [0.5], [0.5]])).message).toBe(
      'efficiency has 3 entries but charge_C has 2 entries: give one entry per case, or a single value for all cases.',
    );
  });

  test('an error in an input cell propagates: #N/A as #N/A, others as #VALUE!, naming the argument', () => {
    expect(errorOf(probe('#N/A'))).toEqual({
      kind: 'cell-error',
      code: '#N/A',
      message: 'charge_C holds the error #N/A from its cell: fix that cell (or the formula that gives it) first.',
    });
    expect(errorOf(probe(1, '#DIV/0!')).code).toBe('#VALUE!');
  });
});
