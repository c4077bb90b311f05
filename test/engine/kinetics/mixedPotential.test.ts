/**
 * Mixed potential of two Tafel reactions (Wagner–Traud), against a case solved by hand:
 * E_a = −0.5 V, i0_a = 1e-6, b_a = 0.06 V/dec; E_c = 0 V, i0_c = 1e-7, b_c = 0.12 V/dec.
 * Setting −6 + (E + 0.5)/0.06 = −7 − E/0.12:
 *   E(1/0.06 + 1/0.12) = −1 − 0.5/0.06  →  25·E = −9.3333  →  E_corr = −0.373333 V;
 *   log10 i_corr = −6 + (−0.373333 + 0.5)/0.06 = −6 + 2.111111 = −3.888889,
 *   i_corr = 1.29155e-4 (the same from the cathodic line: −7 + 0.373333/0.12).
 */
import { mixedPotential } from '../../../src/engine';
import { engineErrorOf } from '../../support';

describe('MIXEDPOTENTIAL', () => {
  test('the case solved by hand', () => {
    const m = mixedPotential(-0.5, 1e-6, 0.06, 0, 1e-7, 0.12);
    expect(m.eCorrV).toBeCloseTo(-0.373333333333, 11);
    expect(m.log10ICorr).toBeCloseTo(-3.888888888889, 11);
    expect(m.iCorr).toBeCloseTo(1.29155e-4, 9);
  });

  test('symmetric slopes put E_corr midway when i0 are equal', () => {
    const m = mixedPotential(-0.44, 1e-5, 0.1, 0.0, 1e-5, 0.1);
    expect(m.eCorrV).toBeCloseTo(-0.22, 12);
    // log i = −5 + 0.22/0.1
    expect(m.log10ICorr).toBeCloseTo(-2.8, 12);
  });

  test.each([
    [() => mixedPotential(0.2, 1e-6, 0.06, 0.1, 1e-7, 0.12), /E_c \(0.1 V\) must lie above E_a/],
    [() => mixedPotential(-0.5, 1, 0.06, 0, 1e-12, 0.12), /outside E_a … E_c.*full Butler–Volmer currents/],
    [() => mixedPotential(-0.5, 0, 0.06, 0, 1e-7, 0.12), /i0_a must be greater than 0/],
    [() => mixedPotential(-0.5, 1e-6, 60, 0, 1e-7, 120), /Tafel slopes are in V per decade/],
    [() => mixedPotential(-500, 1e-6, 0.06, 0, 1e-7, 0.12), /E_a of -500 V is beyond ±10 V/],
    [() => mixedPotential(-0.5, 1e-6, -0.06, 0, 1e-7, 0.12), /b_a must be greater than 0/],
  ])('bad input %#', (f, message) => {
    const e = engineErrorOf(f);
    expect(e.kind).toBe('argument');
    expect(e.message).toMatch(message);
  });
});
