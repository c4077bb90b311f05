import { BUILTIN_POTENTIALS } from '../../src/engine/index';
import { CATALOGUE } from '../../src/functions/catalogue';
import type { Arg } from '../../src/functions/catalogue';
import { evalCommand, evaluateFormulas, formatResult } from '../../src/cli/evalCommand';
import { captureIo, nernst, thermalVoltage } from './helpers';

/** E°(Cu2+/Cu) of the built-in row: ΔfG°(Cu2+) = 65.49 kJ/mol / 2F (NBS 1982, from memory; OpenStax Appendix L prints +0.34). */
const E_CU = 65.49e3 / (2 * 96485.33212331001);

const LN10 = Math.log(10);

function catalogue(id: string, ...args: Arg[]) {
  const spec = CATALOGUE.find((s) => s.id === id);
  if (!spec) throw new Error(`no ${id} in the catalogue`);
  return spec.impl(...args);
}

describe('potentia eval: values against published data', () => {
  test('Cu2+/Cu at a(Cu2+) = 0.01, 25 °C, equals the Nernst equation worked by hand', () => {
    const [e] = evaluateFormulas(['=ECHEM.POTENTIAL("Cu2+ + 2e- -> Cu", {"Cu2+"}, {0.01}, 25)']);
    // E° = 0.337 V: OpenStax Chemistry 2e, Appendix L (seen); Q = 1/a(Cu2+); SI exact constants.
    expect(e).toBeCloseTo(nernst(E_CU, 2, 1 / 0.01, 25), 12);
    // 0.33938 − 0.0295798·2 = 0.2802 V.
    expect(e).toBeCloseTo(0.2802, 4);
  });

  test('gives the same number as the catalogue the add-in calls, to the last digit', () => {
    const [e] = evaluateFormulas(['=ECHEM.POTENTIAL("Cu2+ + 2e- -> Cu", {"Cu2+"}, {0.01}, 25)']);
    const direct = catalogue('POTENTIAL', 'Cu2+ + 2e- -> Cu', [['Cu2+']], [[0.01]], 25, undefined);
    expect(e).toBe(direct[0]?.[0]);
  });

  test('the Nernst slope matches the derived values at 0–100 °C', () => {
    // Nernst slope RT ln10/F derived from the SI exact constants, in mV.
    const table: [number, number][] = [
      [0, 54.1988],
      [10, 56.183],
      [20, 58.1672],
      [25, 59.15935],
      [30, 60.1515],
      [50, 64.1199],
      [80, 70.0725],
      [100, 74.041],
    ];
    const results = evaluateFormulas(table.map(([t]) => `=ECHEM.NERNSTSLOPE(${t})*1000`));
    table.forEach(([t, mV], i) => {
      expect(results[i]).toBeCloseTo(mV, 3);
      expect(results[i]).toBeCloseTo(thermalVoltage(t) * LN10 * 1000, 9);
    });
  });

  test('ordinary spreadsheet functions work alongside ECHEM ones', () => {
    const [rounded, sum] = evaluateFormulas(['=ROUND(ECHEM.NERNSTSLOPE(25)*1000, 3)', 'SUM(1, 2, 3)']);
    // 59.15935 mV at 25 °C (derived from the SI exact constants).
    expect(rounded).toBe(59.159);
    expect(sum).toBe(6);
  });

  test('cell EMFs of OpenStax chapter 17', () => {
    // OpenStax Chemistry 2e, ch. 17 (seen): Mg/Ni2+ +2.115 V, Cd/Al3+ −1.259 V, from Appendix L.
    const [mgNi, cdAl] = evaluateFormulas([
      '=ECHEM.STDPOTENTIAL("Mg(s) | Mg2+(aq) || Ni2+(aq) | Ni(s)")',
      '=ECHEM.STDPOTENTIAL("Cd(s) | Cd2+(aq) || Al3+(aq) | Al(s)")',
    ]);
    expect(mgNi).toBeCloseTo(2.115, 6);
    expect(cdAl).toBeCloseTo(-1.259, 3);
  });

  test('Co + Fe2+ (1.94 M) -> Co2+ (0.15 M) + Fe: OpenStax gives E = −0.14 V', () => {
    const [e] = evaluateFormulas([
      '=ECHEM.POTENTIAL("Co + Fe2+ -> Co2+ + Fe", {"Fe2+","Co2+"}, {1.94,0.15}, 25)',
    ]);
    // E° = −0.447 − (−0.28) (OpenStax Appendix L, seen); Q = 0.15/1.94; n = 2.
    expect(e).toBeCloseTo(nernst(-0.447 + 0.28, 2, 0.15 / 1.94, 25), 12);
    // OpenStax ch. 17 (seen) prints −0.14 V with E° rounded to −0.17 V.
    expect(Math.abs((e as number) + 0.14)).toBeLessThan(0.01);
  });
});

describe('potentia eval: spills and errors', () => {
  test('a sweep spills one row per case, each the Nernst value by hand', () => {
    const [rows] = evaluateFormulas(['=ECHEM.POTENTIAL("Cu2+ + 2e- -> Cu", {"Cu2+"}, {0.01;0.1;1}, 25)']);
    expect(Array.isArray(rows)).toBe(true);
    const cells = rows as number[][];
    expect(cells).toHaveLength(3);
    [0.01, 0.1, 1].forEach((a, i) => {
      // E° 0.337 V, OpenStax Chemistry 2e, Appendix L (seen).
      expect(cells[i]?.[0]).toBeCloseTo(nernst(E_CU, 2, 1 / a, 25), 12);
    });
  });

  test('a bad case errs in its own cell; the other cases still compute', () => {
    const [rows] = evaluateFormulas(['=ECHEM.POTENTIAL("Cu2+ + 2e- -> Cu", {"Cu2+"}, {0.01;-1}, 25)']);
    const cells = rows as unknown[][];
    expect(cells[0]?.[0]).toBeCloseTo(nernst(E_CU, 2, 100, 25), 12);
    expect(cells[1]?.[0]).toEqual(expect.objectContaining({ error: '#VALUE!' }));
  });

  test('LISTTABLE() spills the whole built-in table with a header row', () => {
    const [rows] = evaluateFormulas(['=ECHEM.LISTTABLE()']);
    const cells = rows as unknown[][];
    expect(cells).toHaveLength(BUILTIN_POTENTIALS.length + 1);
    expect(cells[0]).toHaveLength(4);
    const cu = cells.find((r) => r[0] === 'Cu2+ + 2 e- -> Cu');
    // OpenStax Chemistry 2e, Appendix L (seen): +0.337 V.
    expect(cu?.[1]).toBe(0.3394); // the row shows E° to 0.1 mV
  });

  test('--json prints one JSON value per formula per line', () => {
    const io = captureIo();
    const code = evalCommand(
      [
        '--json',
        '=ECHEM.NERNSTSLOPE(25)',
        '="x"&"y"',
        '=ECHEM.NERNSTSLOPE({25;50})',
        '=ECHEM.VSREF(0,"nowhere","SHE")',
      ],
      io,
    );
    const lines = io.stdout().trimEnd().split('\n');
    expect(lines).toHaveLength(4);
    const values = lines.map((l) => JSON.parse(l) as unknown);
    // 59.15935 mV (derived from the SI exact constants).
    expect(values[0]).toBeCloseTo(0.05915935, 8);
    expect(values[1]).toBe('xy');
    const spill = values[2] as number[][];
    // 50 °C: 64.1199 mV (derived).
    expect(spill[1]?.[0]).toBeCloseTo(0.0641199, 7);
    // An unknown reference electrode is "not in the table": #N/A with a message.
    expect(values[3]).toEqual({ error: '#N/A', message: expect.stringContaining('nowhere') });
    // An error among the results: exit code 1.
    expect(code).toBe(1);
  });

  test('text output prints a spill as tab-separated rows', () => {
    const text = formatResult([
      [1, 'a'],
      [2, 'b'],
    ]);
    expect(text).toBe('1\ta\n2\tb');
  });

  test('a formula that does not parse says so', () => {
    const [r] = evaluateFormulas(['=1+']);
    expect(r).toEqual({ error: '#ERROR!', message: expect.stringContaining('does not parse') });
  });

  test('an unknown function is named, with a suggestion and the way to list potentials', () => {
    const [typo, bare] = evaluateFormulas(['=ECHEM.POTENTAIL(1)', '=POTENTIAL("Cu2+/Cu")']);
    expect(typo).toEqual({ error: '#NAME?', message: expect.stringContaining('ECHEM.POTENTAIL') });
    const message = (typo as { message: string }).message;
    expect(message).toContain('Did you mean ECHEM.POTENTIAL?');
    expect(message).toContain('potentia eval "=ECHEM.LISTTABLE()"');
    expect((bare as { message: string }).message).toContain('Did you mean ECHEM.POTENTIAL?');
  });

  test('results never hold NaN or infinities', () => {
    const results = evaluateFormulas([
      '=ECHEM.EQCONST(5, 4)',
      '=ECHEM.LOGK(5, 4)',
      '=ECHEM.QUOTIENT("Cu2+/Cu", {"Cu2+"}, {1E-300})',
    ]);
    const cells = results.flatMap((r) => (Array.isArray(r) ? r.flat() : [r]));
    expect(cells.filter((c) => typeof c === 'number' && !Number.isFinite(c))).toEqual([]);
    // The capital-E literal is read (it once failed to parse): Q = 1/a(Cu2+) = 1e300 for the
    // reduction Cu2+ + 2 e- -> Cu (the Nernst quotient, by hand).
    expect(typeof results[2]).toBe('number');
    expect((results[2] as number) / 1e300).toBeCloseTo(1, 12);
    // K = 10^(nFE°/(RT ln10)) with n = 4, E° = 5 V is beyond the number range: #NUM!.
    expect(results[0]).toEqual(expect.objectContaining({ error: '#NUM!' }));
    expect(results[1]).toBeCloseTo((4 * 5) / (thermalVoltage(25) * LN10), 9);
  });
});
