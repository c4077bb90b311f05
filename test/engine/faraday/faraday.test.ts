/**
 * Faraday's law m = Q·M·ν·ε/(n·F): every expectation is derived by hand from the SI
 * exact F and the IUPAC/CIAAW 2021 abridged standard atomic weights (from memory),
 * typed here independently of the engine's table.
 */
import { depositMassG, plateTimeS, thicknessUm, faradayPlan, molarMassOfFormula } from '../../../src/engine';
import { F, engineErrorOf } from '../../support';

// CIAAW 2021 abridged standard atomic weights (from memory)
const M = {
  Cu: 63.546,
  Ag: 107.87,
  Zn: 65.38,
  Ni: 58.693,
  Cr: 51.996,
  Mn: 54.938,
  O: 15.999,
  Pb: 207.2,
  S: 32.06,
};

describe('molar masses from formulas (CIAAW 2021 abridged weights)', () => {
  test.each([
    ['Cu', M.Cu],
    ['PbO2', M.Pb + 2 * M.O],
    ['PbSO4', M.Pb + M.S + 4 * M.O],
    ['MnO2', M.Mn + 2 * M.O],
  ])('%s', (formula, expected) => {
    expect(molarMassOfFormula(formula)).toBeCloseTo(expected, 9);
  });

  test('an element without a standard atomic weight is refused', () => {
    const e = engineErrorOf(() => molarMassOfFormula('TcO4'));
    expect(e.kind).toBe('argument');
    expect(e.message).toMatch(/Tc .*no standard atomic weight/);
  });
});

describe('DEPOSIT: mass by Faraday’s law (derived)', () => {
  test.each([
    // one faraday deposits M/n grams
    ['Cu2+ + 2 e- -> Cu', F, 1, M.Cu / 2],
    ['Ag+ + e- -> Ag', F, 1, M.Ag],
    ['2 Ag+ + 2 e- -> 2 Ag', F, 1, M.Ag], // coefficients scale together
    ['Ni2+ + 2e- -> Ni(s)', 3600, 0.95, (3600 * M.Ni * 0.95) / (2 * F)], // 1 A·h at 95 %
    ['Cu2+/Cu', 1000, 1, (1000 * M.Cu) / (2 * F)], // a couple from the table
    ['Zn -> Zn2+ + 2 e-', 1000, 1, (1000 * M.Zn) / (2 * F)], // anodic dissolution
    ['MnO2 + 4 H+ + 2 e- -> Mn2+ + 2 H2O', F, 1, (M.Mn + 2 * M.O) / 2], // the solid dissolves
    ['Cu2+ + 2 e- -> Cu', 0, 1, 0],
  ])('%s, Q = %p C, ε = %p', (reaction, q, eff, expected) => {
    expect(depositMassG(reaction, q, eff)).toBeCloseTo(expected, 10);
  });

  test('efficiency defaults to 1', () => {
    expect(depositMassG('Cu2+ + 2 e- -> Cu', 2 * F)).toBeCloseTo(M.Cu, 10);
  });

  test('the plan names the solid and the electrons', () => {
    const p = faradayPlan('Cr3+ + 3 e- -> Cr');
    expect(p.solid.formula).toBe('Cr');
    expect(p.electrons).toBe(3);
    expect(p.gramsPerMolElectrons).toBeCloseTo(M.Cr / 3, 10);
  });

  test.each([
    ['2 H+ + 2 e- -> H2', 1, 1, 'argument', /no solid species/],
    ['PbSO4 + 2 e- -> Pb + SO4^2-', 1, 1, 'ambiguous', /solids on both sides \(PbSO4 and Pb\)/],
    ['Cu2+ + e- -> Cu', 1, 1, 'unbalanced', /./],
    ['Zn + Cu2+ -> Zn2+ + Cu', 1, 1, 'argument', /not a half-reaction/],
    ['Cu2+ + 2 e- -> Cu', -5, 1, 'argument', /charge_C must not be negative/],
    ['Cu2+ + 2 e- -> Cu', NaN, 1, 'argument', /charge_C must be a finite number/],
    ['Cu2+ + 2 e- -> Cu', 1, 1.2, 'argument', /efficiency must be a fraction in \(0, 1\]; got 1.2/],
    ['Cu2+ + 2 e- -> Cu', 1, 95, 'argument', /For 95 % write 0.95/],
    ['Cu2+ + 2 e- -> Cu', 1, 0, 'argument', /efficiency must be a fraction/],
    ['Cu2+ + 2 e- -> ', 1, 1, 'parse', /expected a species/],
  ])('%s, Q %p, ε %p: %s error', (reaction, q, eff, kind, message) => {
    const e = engineErrorOf(() => depositMassG(reaction, q, eff));
    expect(e.kind).toBe(kind);
    expect(e.message).toMatch(message);
  });
});

describe('PLATETIME and THICKNESS (derived; ρ·t in g/m² since g/cm³ × µm = g/m²)', () => {
  // 25 µm of copper at 2 A/dm² (200 A/m²), ρ = 8.96 g/cm³: m = 224 g/m²,
  // time = 224·2F/(200·63.546) s
  const tCu = (8.96 * 25 * 2 * F) / (200 * M.Cu);

  test('copper, 25 µm at 200 A/m²', () => {
    expect(plateTimeS('Cu2+ + 2 e- -> Cu', 25, 200, 8.96)).toBeCloseTo(tCu, 6);
    expect(tCu).toBeCloseTo(3401.1, 1); // about 57 minutes
  });

  test('a lower efficiency lengthens the time in proportion', () => {
    expect(plateTimeS('Cu2+ + 2 e- -> Cu', 25, 200, 8.96, 0.8)).toBeCloseTo(tCu / 0.8, 6);
  });

  test('thickness is the inverse of the time', () => {
    expect(thicknessUm('Cu2+ + 2 e- -> Cu', 200, tCu, 8.96)).toBeCloseTo(25, 10);
    // nickel, 1 h at 300 A/m², 95 %: t = 300·3600·58.693·0.95/(2F·8.9)
    expect(thicknessUm('Ni2+ + 2 e- -> Ni', 300, 3600, 8.9, 0.95)).toBeCloseTo(
      (300 * 3600 * M.Ni * 0.95) / (2 * F * 8.9),
      10,
    );
  });

  test('no current or no time plates nothing; no thickness takes no time', () => {
    expect(thicknessUm('Cu2+ + 2 e- -> Cu', 0, 3600, 8.96)).toBe(0);
    expect(thicknessUm('Cu2+ + 2 e- -> Cu', 200, 0, 8.96)).toBe(0);
    expect(plateTimeS('Cu2+ + 2 e- -> Cu', 0, 200, 8.96)).toBe(0);
  });

  test.each([
    [() => plateTimeS('Cu2+ + 2 e- -> Cu', 25, 0, 8.96), /current_density_A_m2 must be greater than 0/],
    [() => thicknessUm('Cu2+ + 2 e- -> Cu', -1, 10, 8.96), /current_density_A_m2 must not be negative/],
    [() => plateTimeS('Cu2+ + 2 e- -> Cu', 25, 200, 8.96, 0), /efficiency must be a fraction/],
    [() => plateTimeS('Zn | Zn2+ || Cu2+ | Cu', 25, 200, 8.96), /is not a half-reaction: give the electrode/],
    [() => plateTimeS('Cu2+ + 2 e- -> Cu', 25, 200, 0), /density_g_cm3 must be greater than 0/],
    [() => plateTimeS('Cu2+ + 2 e- -> Cu', -1, 200, 8.96), /thickness_um must not be negative/],
    [() => thicknessUm('Cu2+ + 2 e- -> Cu', 200, -1, 8.96), /time_s must not be negative/],
    [() => thicknessUm('Cu2+ + 2 e- -> Cu', 200, 10, 8.96, 1.5), /efficiency must be a fraction/],
    [() => thicknessUm('2 H+ + 2 e- -> H2', 200, 10, 8.96), /no solid species/],
  ])('bad input %#', (f, message) => {
    const e = engineErrorOf(f);
    expect(e.kind).toBe('argument');
    expect(e.message).toMatch(message);
  });
});
