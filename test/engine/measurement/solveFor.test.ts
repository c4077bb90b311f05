/**
 * Inverse Nernst. Expectations derived by hand from the Nernst equation with the SI
 * exact slope and the OpenStax Chemistry 2e Appendix L E° values (seen).
 */
import { solveForUnknown, standardPotentialV, resolveReaction, defaultTable } from '../../../src/engine';
import { S25, s, engineErrorOf } from '../../support';

// the engine's E° of the couple, read once (the quantity under test is the inversion)
const e0 = (text: string) => standardPotentialV(resolveReaction(text, defaultTable()), 25);

describe('SOLVEFOR', () => {
  test('a(Cu2+) from E = E° + (S/2)·log a (OpenStax: E° 0.337 V, CRC54 0.3419 V)', () => {
    const E0 = e0('Cu2+/Cu');
    expect(E0).toBeGreaterThanOrEqual(0.337);
    expect(E0).toBeLessThanOrEqual(0.3419);
    const r = solveForUnknown('Cu2+ + 2 e- -> Cu', E0 + (S25 / 2) * Math.log10(0.01), 'Cu2+', [], []);
    expect(r.kind).toBe('activity');
    expect(r.value).toBeCloseTo(0.01, 12);
  });

  test('pH from a hydrogen electrode: E = −S·pH at 1 bar (E° = 0 by definition)', () => {
    const r = solveForUnknown('2 H+ + 2 e- -> H2', -0.2, 'pH', ['H2'], [1], 25);
    expect(r.kind).toBe('pH');
    expect(r.value).toBeCloseTo(0.2 / S25, 12);
    // at 0.5 bar H2 and 37 °C: E = −S·pH − (S/2)·log10 0.5 (the written pH column is ignored)
    const r2 = solveForUnknown('2 H+ + 2 e- -> H2', -0.2, 'pH', ['H2(g)', 'pH'], [0.5, 99], 37);
    expect(r2.value).toBeCloseTo((0.2 - (s(37) / 2) * Math.log10(0.5)) / s(37), 12);
  });

  test('one species of a cell with the other given (Zn | Zn2+ || Cu2+ | Cu)', () => {
    const E0 = e0('Zn | Zn2+ || Cu2+ | Cu');
    // E = E° − (S/2)·log(a(Zn2+)/a(Cu2+)); a(Zn2+) = 0.5, a(Cu2+) = 0.02
    const E = E0 - (S25 / 2) * Math.log10(0.5 / 0.02);
    expect(solveForUnknown('Zn | Zn2+ || Cu2+ | Cu', E, 'Cu2+', ['Zn2+'], [0.5]).value).toBeCloseTo(0.02, 12);
    expect(
      solveForUnknown('Zn | Zn2+ || Cu2+ | Cu', E, 'Zn2+', ['Cu2+', 'Zn2+'], [0.02, 7]).value,
    ).toBeCloseTo(0.5, 12);
  });

  test('permanganate pH at given Mn2+ and MnO4- (n = 5, eight H+)', () => {
    const E0 = e0('MnO4- + 8 H+ + 5 e- -> Mn2+ + 4 H2O');
    // E = E° − (S/5)·(log a(Mn2+) − log a(MnO4-) + 8·pH)
    const E = E0 - (S25 / 5) * (Math.log10(1e-3) - Math.log10(0.1) + 8 * 2.5);
    const r = solveForUnknown('MnO4- + 8 H+ + 5 e- -> Mn2+ + 4 H2O', E, 'pH', ['Mn2+', 'MnO4-'], [1e-3, 0.1]);
    expect(r.value).toBeCloseTo(2.5, 10);
  });

  test.each([
    [['Cu2+ + 2 e- -> Cu', 0.3, 'Zn2+', [], []], 'argument', /"Zn2\+" does not appear/],
    [['Cu2+ + 2 e- -> Cu', 0.3, 'pH', [], []], 'argument', /it has neither H\+ nor OH-/],
    [['Ag | Ag+ || Ag+ | Ag', 0.05, 'Ag+', [], []], 'argument', /does not depend on "Ag\+"/],
    [
      ['Cu2+ + 2 e- -> Cu', 300, 'Cu2+', [], []],
      'argument',
      /beyond ±10 V: were millivolts typed as volts\? Give 0.3 for 300 mV/,
    ],
    [['Cu2+ + 2 e- -> Cu', 0.3, 'Cu2+', [], [], 298], 'argument', /looks like a temperature in kelvin/],
    [['Cu2+ + 2 e- -> Cu', 0.3, '', [], []], 'argument', /unknown is empty/],
    [['O2 + 4 H+ + 4 e- -> 2 H2O', 1.2, 'H2O in NaCl', ['pH'], [0]], 'argument', /give "H2O" as the unknown/],
    [['Cu2+ + 2 e- -> Cu', -9, 'Cu2+', [], []], 'range', /beyond the number range/],
    [['Cu2+ + e- -> Cu', 0.3, 'Cu2+', [], []], 'unbalanced', /./],
    [
      ['Zn | Zn2+ || Cu2+ | Cu', 1, 'Cu2+', ['Zn2+'], ['x']],
      'argument',
      /activity of Zn2\+ must be a positive number; got "x"/,
    ],
  ])('bad input %#', (args, kind, message) => {
    const [r, E, u, sp, v, t] = args as [string, number, string, string[], unknown[], number | undefined];
    const e = engineErrorOf(() => solveForUnknown(r, E, u, sp, v, t));
    expect(e.kind).toBe(kind);
    expect(e.message).toMatch(message);
  });
});
