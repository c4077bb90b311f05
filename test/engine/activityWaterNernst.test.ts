/**
 * a(H2O) ≠ 1 in the Nernst equation from a named electrolyte: the species header
 * `H2O in <salt>` (docs/notation.md, "Species headers") takes the salt's molality and gives
 * a(H2O) by the Pitzer model, with the model's molality and temperature ranges enforced.
 */
import { bindSpecies, compiledReaction, potentialV, waterElectrolyteOf } from '../../src/engine';
import { callFunction, isCellError } from '../../src/functions/catalogue';
import { engineErrorOf, expectNear, s as slope } from '../support';

const M_W = 0.01801528; // kg/mol, 2 × 1.00794 + 15.9994 (IUPAC atomic weights; common practice)
/** a(H2O) from a published φ: ln a_w = −φ M_w ν m (the definition of φ; derived). */
const awFromPhi = (phi: number, nu: number, m: number) => Math.exp(-phi * M_W * nu * m);

// O2 + 4 H+ + 4 e- -> 2 H2O: w(H2O) = 2/4, so at a(O2) = a(H+) = 1, E − E° = −(s/2)·log10 a_w
const O2 = 'O2 + 4 H+ + 4 e- -> 2 H2O';

describe('the header grammar', () => {
  it.each([
    ['H2O in NaCl', 'NaCl'],
    ['h2o IN CaCl2', 'CaCl2'],
    ['H₂O in NaCl', 'NaCl'],
    ['H2O(l) in  KCl', 'KCl'],
    ['H2O', null],
    ['Na+', null],
  ])('%j → %s', (text, salt) => {
    expect(waterElectrolyteOf(text)).toBe(salt);
  });
  it('a salt without Pitzer parameters is notFound, naming the salts held (H2SO4 is not held)', () => {
    const err = engineErrorOf(() => waterElectrolyteOf('H2O in H2SO4'));
    expect(err.kind).toBe('notFound');
    expect(err.message).toMatch(/"H2SO4".*NaCl.*give a\(H2O\) itself in an "H2O" column/);
  });
  it('ACTIVITY and IONICSTR, which take ions, say what to give instead', () => {
    const e = callFunction('ACTIVITY', [[['Na+', 'Cl-', 'H2O in NaCl']], [[1, 1, 1]]])[0]![0];
    expect(isCellError(e) && e.message).toMatch(/water-activity header.*WATERACTIVITY/);
  });
});

describe('E with a(H2O) from the electrolyte', () => {
  // Robinson & Stokes (1959) Appendix 8.3 (from memory): φ NaCl 4 mol/kg 1.1158, CaCl2 2 mol/kg
  // 1.384, KCl 2 mol/kg 0.9124. Tolerance 3e-5 V: the model's φ within 0.005 of these moves
  // log10 a_w by at most 0.005·M_w·ν·m/ln10 (≤ 0.0005 here), times s/2.
  it.each([
    ['NaCl', 4, 2, 1.1158],
    ['CaCl2', 2, 3, 1.384],
    ['KCl', 2, 2, 0.9124],
  ] as [string, number, number, number][])('%s %d mol/kg', (salt, m, nu, phi) => {
    const b = bindSpecies(compiledReaction(O2, null), ['O2', 'H+', `H2O in ${salt}`]);
    const pure = bindSpecies(compiledReaction(O2, null), ['O2', 'H+']);
    const shift = potentialV(b, [1, 1, m], 25) - potentialV(pure, [1, 1], 25);
    const expected = -(slope(25) / 2) * Math.log10(awFromPhi(phi, nu, m));
    expect(shift).toBeGreaterThan(0); // a(H2O) < 1 favours the reduction that makes water: E rises
    expectNear(shift, expected, 3e-5);
  });

  it('POTENTIAL over a column of cases (the sweep path) gives the same shifts', () => {
    const out = callFunction('POTENTIAL', [
      O2,
      [['O2', 'H+', 'H2O in NaCl']],
      [
        [1, 1, 0],
        [1, 1, 1],
        [1, 1, 4],
      ],
    ]);
    const e0 = out[0]![0] as number; // a_w = 1 at m = 0
    expectNear(e0, 1.229, 0.002); // OpenStax Chemistry 2e, Appendix L (E° of O2/H2O), read
    // φ NaCl 1 mol/kg 0.9355 (Robinson & Stokes 1959, Appendix 8.3, from memory)
    expectNear((out[1]![0] as number) - e0, -(slope(25) / 2) * Math.log10(awFromPhi(0.9355, 2, 1)), 3e-5);
    expectNear((out[2]![0] as number) - e0, -(slope(25) / 2) * Math.log10(awFromPhi(1.1158, 2, 4)), 3e-5);
  });

  it('a user-supplied a(H2O) still works as before (a plain "H2O" header)', () => {
    const aw = awFromPhi(1.1158, 2, 4);
    const a = callFunction('POTENTIAL', [O2, [['O2', 'H+', 'H2O']], [[1, 1, aw]]])[0]![0] as number;
    const b = callFunction('POTENTIAL', [O2, [['O2', 'H+', 'H2O in NaCl']], [[1, 1, 4]]])[0]![0] as number;
    expectNear(a, b, 3e-5);
  });
});

describe('the ranges of the model apply', () => {
  it('beyond the salt’s molality limit: #VALUE! naming 0–6 mol/kg', () => {
    const e = callFunction('POTENTIAL', [O2, [['O2', 'H+', 'H2O in NaCl']], [[1, 1, 7]]])[0]![0];
    expect(isCellError(e) && e.code).toBe('#VALUE!');
    expect(isCellError(e) && e.message).toMatch(/0–6 mol\/kg/);
  });
  it('at a temperature the salt’s parameters do not cover: #VALUE! naming 25 °C only', () => {
    const e = callFunction('POTENTIAL', [O2, [['O2', 'H+', 'H2O in KCl']], [[1, 1, 2]], 40])[0]![0];
    expect(isCellError(e) && e.message).toMatch(/25 °C only/);
  });
  it('NaCl within 0–50 °C uses its temperature dependence; a column of temperatures is read per case', () => {
    const out = callFunction('POTENTIAL', [
      O2,
      [['O2', 'H+', 'H2O in NaCl']],
      [[1, 1, 4]],
      [[25], [45], [60]],
    ]);
    expect(typeof out[0]![0]).toBe('number');
    expect(typeof out[1]![0]).toBe('number');
    expect(isCellError(out[2]![0]) && (out[2]![0] as { message: string }).message).toMatch(/0–50 °C/);
  });
  it('a negative or text molality is refused', () => {
    const b = bindSpecies(compiledReaction(O2, null), ['O2', 'H+', 'H2O in NaCl']);
    expect(engineErrorOf(() => potentialV(b, [1, 1, -1], 25)).message).toMatch(/molality/);
    expect(engineErrorOf(() => potentialV(b, [1, 1, 'x'], 25)).message).toMatch(/molality of NaCl/);
  });
  it('"H2O" and "H2O in NaCl" together name water twice', () => {
    expect(
      engineErrorOf(() => bindSpecies(compiledReaction(O2, null), ['O2', 'H+', 'H2O', 'H2O in NaCl']))
        .message,
    ).toMatch(/twice/);
  });
});
