/**
 * Water activity from the Pitzer osmotic coefficient, and molarity → molality conversion.
 */
import {
  bindSpecies,
  compiledReaction,
  heldSolutionDensity,
  potentialV,
  molalityFromMolarity,
  saltMolarMass,
  waterActivity,
  WATER_MOLAR_MASS_KG_PER_MOL,
} from '../../src/engine';
import { engineErrorOf, expectNear, s as slope } from '../support';

describe('water activity, ln a_w = −φ M_w Σm', () => {
  it('M_w = 0.01801528 kg/mol (2 × 1.00794 + 15.9994, IUPAC atomic weights; common practice)', () => {
    expect(WATER_MOLAR_MASS_KG_PER_MOL).toBeCloseTo((2 * 1.00794 + 15.9994) / 1000, 8);
  });
  // derived from Robinson & Stokes Appendix 8.3 φ (from memory) with the definition
  it.each([
    ['NaCl', 1, 2, 0.9355],
    ['NaCl', 4, 2, 1.1158],
    ['KCl', 2, 2, 0.9124],
    ['CaCl2', 1, 3, 1.046],
  ] as [string, number, number, number][])(
    '%s %d mol/kg: a_w from φ(R&S) within 0.0005',
    (salt, m, nu, phi) => {
      const expected = Math.exp(-phi * 0.01801528 * nu * m);
      expect(Math.abs(waterActivity(salt, m) - expected)).toBeLessThanOrEqual(0.0005);
    },
  );
  it('saturated NaCl (6.144 mol/kg, common practice) gives a_w 0.7529 (Greenspan, J. Res. NBS 81A, 89 (1977), from memory) within 0.002, extrapolating past 6 mol/kg', () => {
    expect(Math.abs(waterActivity('NaCl', 6.144, 25, { extrapolate: true }) - 0.7529)).toBeLessThanOrEqual(
      0.002,
    );
    expect(engineErrorOf(() => waterActivity('NaCl', 6.144)).message).toMatch(/0–6 mol\/kg/);
  });
  it('pure water has a_w = 1', () => {
    expect(waterActivity('NaCl', 0)).toBe(1);
    expect(waterActivity(['H2O'], [1])).toBe(1);
  });
  it('rejects a salt given with a row of values, and a row given with one number', () => {
    expect(engineErrorOf(() => waterActivity('NaCl', [1] as unknown as number)).kind).toBe('argument');
    expect(engineErrorOf(() => waterActivity(['Na+', 'Cl-'], 1)).kind).toBe('shape');
  });
});

describe('the Nernst equation with a(H2O) ≠ 1 from the model', () => {
  it('O2 + 4 H+ + 4 e- -> 2 H2O in 4 mol/kg NaCl: E shifts by −(s/2)·log10 a_w (derived)', () => {
    const aw = waterActivity('NaCl', 4);
    const b = bindSpecies(compiledReaction('O2 + 4 H+ + 4 e- -> 2 H2O', null), ['O2', 'H+', 'H2O']);
    const shift = potentialV(b, [1, 1, aw], 25) - potentialV(b, [1, 1, 1], 25);
    // a_w from Robinson & Stokes App. 8.3 φ = 1.1158 at 4 mol/kg (from memory): exp(−1.1158·M_w·8)
    const awPublished = Math.exp(-1.1158 * 0.01801528 * 8);
    expectNear(shift, -(slope(25) / 2) * Math.log10(awPublished), 2e-5);
  });
});

describe('molarity → molality, m = c / (ρ − c M/1000)', () => {
  it('molar masses from IUPAC atomic weights (from memory): NaCl 58.44, CuSO4 159.61, K2SO4 174.26', () => {
    expect(saltMolarMass('NaCl')).toBeCloseTo(58.44, 2);
    expect(saltMolarMass('CuSO4')).toBeCloseTo(159.6, 1);
    expect(saltMolarMass('K2SO4')).toBeCloseTo(174.26, 1);
  });

  it('with the user’s density: by hand', () => {
    // 1 mol/L CuSO4 at ρ = 1.16 g/cm³: 1 / (1.16 − 0.15961) = 0.99952 mol/kg (derived)
    expect(molalityFromMolarity('CuSO4', 1, 1.16)).toBeCloseTo(1 / (1.16 - 159.609 / 1000), 3);
  });

  // At a row of the CRC table (20 °C, from memory) the molality follows from the mass fraction
  // alone, m = w / ((1 − w) M): an independent check of the conversion and the interpolation.
  it.each([
    ['NaCl', 10, 1.0707],
    ['NaCl', 20, 1.1478],
    ['NaCl', 26, 1.1972],
    ['KCl', 10, 1.0633],
    ['KCl', 20, 1.1328],
  ] as [string, number, number][])('%s %d wt%% (ρ %d): m = w/((1−w)M)', (salt, wt, rho) => {
    const w = wt / 100;
    const M = saltMolarMass(salt);
    const c = (w * rho * 1000) / M;
    expect(heldSolutionDensity(salt, c, 20)).toBeCloseTo(rho, 6);
    expect(molalityFromMolarity(salt, c, null, 20)).toBeCloseTo((w / (1 - w) / M) * 1000, 6);
  });

  it('between rows, within 0.2% of the mass-fraction molality (linear interpolation, derived)', () => {
    // 5 wt% NaCl: interpolating ρ between 4 and 6 wt% (CRC, from memory)
    const M = saltMolarMass('NaCl');
    const rho5 = (1.0268 + 1.0413) / 2;
    const c = (0.05 * rho5 * 1000) / M;
    const exact = (0.05 / 0.95 / M) * 1000;
    expect(Math.abs(molalityFromMolarity('NaCl', c) / exact - 1)).toBeLessThan(0.002);
  });

  it('zero molarity is zero molality', () => {
    expect(molalityFromMolarity('NaCl', 0)).toBe(0);
  });

  it.each([
    [
      'no density held and none given',
      () => molalityFromMolarity('CuSO4', 1),
      'density_g_cm3',
      /no density table.*g\/cm³/,
    ],
    [
      'a held table used far from its temperature',
      () => molalityFromMolarity('NaCl', 1, null, 60),
      'temp_C',
      /20 °C.*give the solution density/,
    ],
    [
      'beyond the held table',
      () => molalityFromMolarity('NaCl', 6),
      'molarity',
      /beyond the held density table/,
    ],
    ['an impossible density', () => molalityFromMolarity('NaCl', 20, 1.0), 'density_g_cm3', /cannot hold/],
    ['a density out of range', () => molalityFromMolarity('NaCl', 1, 12), 'density_g_cm3', /0.5 and 3/],
    ['a negative molarity', () => molalityFromMolarity('NaCl', -1, 1), 'molarity', /≥ 0 mol\/L/],
  ] as [string, () => unknown, string, RegExp][])('rejects %s', (_l, f, arg, message) => {
    const err = engineErrorOf(f);
    expect(err.kind).toBe('argument');
    expect(err.argument).toBe(arg);
    expect(err.message).toMatch(message);
  });
});
