/**
 * The Faraday, corrosion, kinetics and measurement functions through the catalogue: sweeps
 * over columns, the two-cell spill of MIXEDPOTENTIAL, and per-case errors. Expected values
 * derived by hand from the SI exact constants and the sources named beside each check.
 */
import { callFunction, isCellError, type Result } from '../../src/functions/catalogue';
import { F, R } from '../support';

function numbers(r: Result): number[][] {
  return r.map((row) =>
    row.map((c) => {
      if (typeof c !== 'number') throw new Error(`not a number: ${JSON.stringify(c)}`);
      return c;
    }),
  );
}

describe('sweeps and spills', () => {
  test('DEPOSIT over a column of charges (CIAAW 2021: Cu 63.546, from memory)', () => {
    const out = numbers(callFunction('DEPOSIT', ['Cu2+ + 2 e- -> Cu', [[0], [1000], [F]]]));
    expect(out.map((r) => r[0])).toEqual([
      0,
      expect.closeTo((1000 * 63.546) / (2 * F), 12),
      expect.closeTo(31.773, 9),
    ]);
  });

  test('CORRATE over a column of metals and current densities (ASTM G102, from memory)', () => {
    const out = numbers(
      callFunction('CORRATE', [
        [['Fe'], ['304']],
        [[1], [10]],
      ]),
    );
    expect(out[0]![0]).toBeCloseTo((3.27e-3 * (55.845 / 2)) / 7.87, 12);
    expect(out[1]![0]).toBeCloseTo((3.27e-3 * 10 * 25.12) / 7.94, 12);
  });

  test('MIXEDPOTENTIAL spills E_corr and i_corr (the case solved by hand)', () => {
    const out = numbers(callFunction('MIXEDPOTENTIAL', [-0.5, 1e-6, 0.06, 0, 1e-7, 0.12]));
    expect(out).toHaveLength(1);
    expect(out[0]![0]).toBeCloseTo(-0.373333333333, 11);
    expect(out[0]![1]).toBeCloseTo(1.29155e-4, 9);
  });

  test('BVCURRENT with a symmetric limit given as one cell, and with two limits', () => {
    const f = F / (R * 298.15);
    const A = Math.exp(0.5 * f * 0.1);
    const C = Math.exp(-0.5 * f * 0.1);
    const one = numbers(callFunction('BVCURRENT', [0.1, 1e-3, 0.5, null, 25, 0.01]))[0]![0]!;
    expect(one).toBeCloseTo((1e-3 * (A - C)) / (1 + (1e-3 * A) / 0.01 + (1e-3 * C) / 0.01), 14);
    const two = numbers(callFunction('BVCURRENT', [0.1, 1e-3, 0.5, null, 25, [[0.01, 0.02]]]))[0]![0]!;
    expect(two).toBeCloseTo((1e-3 * (A - C)) / (1 + (1e-3 * A) / 0.01 + (1e-3 * C) / 0.02), 14);
  });

  test('SOLVEFOR over a column of measured potentials gives one pH per case', () => {
    const s = (R * 298.15 * Math.LN10) / F;
    const out = numbers(callFunction('SOLVEFOR', ['2 H+ + 2 e- -> H2', [[-0.1], [-0.4]], 'pH', 'H2', 1]));
    expect(out.map((r) => r[0])).toEqual([expect.closeTo(0.1 / s, 10), expect.closeTo(0.4 / s, 10)]);
  });

  test('JUNCTION over two cases (Henderson; CRC λ° from memory)', () => {
    const rtf = (R * 298.15) / F;
    const out = numbers(
      callFunction('JUNCTION', [
        [['HCl', 'KCl']],
        [
          [0.1, 0],
          [0.01, 0],
        ],
        [
          [0, 0.1],
          [0, 0.01],
        ],
      ]),
    );
    // equal concentrations with a common anion: (RT/F)·ln((λH+λCl)/(λK+λCl)) at both strengths
    for (const r of out) expect(r[0]).toBeCloseTo(rtf * Math.log(425.96 / 149.79), 12);
  });

  test('a bad case gives an error in its own cell; the others compute', () => {
    const out = callFunction('ANODELIFE', [[[100], [100]], [['zinc'], ['copper']], 0.5, 0.9]);
    expect(out[0]![0]).toBeCloseTo((100 * 780 * 0.9) / (0.5 * 8760), 12);
    const bad = out[1]![0];
    expect(isCellError(bad) && bad.code).toBe('#VALUE!');
  });

  test('a millivolt slip in SOLVEFOR and a kelvin slip in TAFELSLOPE are hinted', () => {
    const e = callFunction('SOLVEFOR', ['Cu2+/Cu', 300, 'Cu2+'])[0]![0];
    expect(isCellError(e) && e.message).toMatch(/were millivolts typed as volts\? Give 0.3 for 300 mV/);
    const t = callFunction('TAFELSLOPE', [0.5, 298.15])[0]![0];
    expect(isCellError(t) && t.message).toMatch(/looks like a temperature in kelvin/);
  });
});
