/**
 * Theoretical specific energy w = n·F·E°/(3.6·Σν·M), Wh/kg of reactants. E° from the
 * OpenStax Chemistry 2e Appendix L values (seen), masses from the CIAAW 2021 abridged
 * atomic weights (from memory); the expectations are derived by hand.
 */
import { specificEnergyWhKg, asIons, parseReaction, formatReaction } from '../../../src/engine';
import { F, engineErrorOf } from '../../support';

const M = { Pb: 207.2, O: 15.999, H: 1.008, S: 32.06, Zn: 65.38, Cu: 63.546 };

describe('SPECENERGY (derived)', () => {
  test('lead–acid: 2F·(1.69 + 0.3505 V)/(3.6·(Pb + PbO2 + 2 H2SO4)) ≈ 170 Wh/kg', () => {
    // OpenStax Appendix L: PbO2/PbSO4 +1.69 V, PbSO4/Pb −0.3505 V (E° = 2.0405 V)
    const mass = M.Pb + (M.Pb + 2 * M.O) + 2 * (2 * M.H + M.S + 4 * M.O);
    const expected = (2 * F * (1.69 + 0.3505)) / (3.6 * mass);
    const got = specificEnergyWhKg('Pb + PbO2 + 2 H2SO4 -> 2 PbSO4 + 2 H2O');
    // 2 mV of E° (the spread of published values) is 0.1 % of the result
    expect(Math.abs(got - expected) / expected).toBeLessThan(1e-3);
    expect(got).toBeGreaterThan(165); // the often-quoted 167 Wh/kg uses about 2.0 V
    expect(got).toBeLessThan(172);
  });

  test('the sulfuric acid is read as its ions', () => {
    expect(formatReaction(asIons(parseReaction('Pb + PbO2 + 2 H2SO4 -> 2 PbSO4 + 2 H2O')))).toBe(
      'Pb + PbO2 + 4 H+ + 2 SO4^2- -> 2 PbSO4 + 2 H2O',
    );
  });

  test.each([
    ['Zn + Cu2+ -> Zn2+ + Cu', M.Zn + M.Cu],
    ['Zn | Zn2+ || Cu2+ | Cu', M.Zn + M.Cu],
    // the sulfate is counted in the mass when written as a salt
    ['Zn + CuSO4(aq) -> ZnSO4(aq) + Cu', M.Zn + M.Cu + M.S + 4 * M.O],
  ])('Daniell cell %s: 2F·E°/(3.6·mass)', (text, mass) => {
    // E° between OpenStax Appendix L (0.337 + 0.7618 V) and CRC 54th ed. (0.3419 + 0.7628 V)
    const lo = (2 * F * (0.337 + 0.7618)) / (3.6 * mass);
    const hi = (2 * F * (0.3419 + 0.7628)) / (3.6 * mass);
    const got = specificEnergyWhKg(text);
    expect(got).toBeGreaterThanOrEqual(lo - 1e-9);
    expect(got).toBeLessThanOrEqual(hi);
  });

  test.each([
    ['Zn2+ + 2 e- -> Zn', 25, 'argument', /half-reaction; the specific energy needs a whole cell reaction/],
    ['Cu + Zn2+ -> Cu2+ + Zn', 25, 'argument', /gives no energy; write the discharge reaction/],
    ['Zn + Cu2+ -> Zn2+ + Cu', 298.15, 'argument', /looks like a temperature in kelvin/],
    [
      'Zn + Cu2+ -> Zn2+ + Cu',
      -20,
      'argument',
      /must be between 0 and 100 °C; got -20 °C, the range of this function/,
    ],
    ['Zn + Cu2+ -> Zn2+', 25, 'unbalanced', /./],
  ])('%s at %p °C: %s', (text, t, kind, message) => {
    const e = engineErrorOf(() => specificEnergyWhKg(text, t));
    expect(e.kind).toBe(kind);
    expect(e.message).toMatch(message);
  });
});
