/**
 * Henderson liquid-junction potentials, E_j = φ(right) − φ(left), from the limiting
 * ionic conductivities of the CRC Handbook at 25 °C (from memory):
 * H+ 349.65, K+ 73.48, Na+ 50.08, Li+ 38.66, Cl- 76.31, NO3- 71.42 S·cm²/mol.
 */
import { junctionPotentialV } from '../../../src/engine';
import { F, R, engineErrorOf } from '../../support';

const RT_F = (R * 298.15) / F;

describe('JUNCTION (Henderson)', () => {
  test('0.1 M HCl | 0.1 M KCl: derived 26.85 mV; measured 26.78 mV', () => {
    // Derived: equal concentrations with a common anion reduce Henderson to
    // (RT/F)·ln((λH + λCl)/(λK + λCl)) = 25.693 mV · ln(425.96/149.79) = 26.85 mV.
    const derived = RT_F * Math.log((349.65 + 76.31) / (73.48 + 76.31));
    const got = junctionPotentialV(['HCl', 'KCl'], [0.1, 0], [0, 0.1]);
    expect(got).toBeCloseTo(derived, 12);
    // Bard & Faulkner, Electrochemical Methods (2001), Table 2.3.2 (after MacInnes):
    // measured 26.78 mV (from memory); Henderson is within 0.5 mV of it
    expect(Math.abs(got * 1000 - 26.78)).toBeLessThan(0.5);
  });

  test('the same junction written with ions, and reversed', () => {
    const ions = junctionPotentialV(['H+', 'K+', 'Cl-'], [0.1, 0, 0.1], [0, 0.1, 0.1]);
    expect(ions).toBeCloseTo(RT_F * Math.log(425.96 / 149.79), 12);
    expect(junctionPotentialV(['HCl', 'KCl'], [0, 0.1], [0.1, 0])).toBeCloseTo(-ions, 12);
  });

  test('one electrolyte at two concentrations: (t+ − t−)(RT/F)ln(c_L/c_R) (derived)', () => {
    // 0.1 M | 0.01 M HCl: t+ − t− = (349.65 − 76.31)/(349.65 + 76.31)
    const expected = ((349.65 - 76.31) / (349.65 + 76.31)) * RT_F * Math.log(0.1 / 0.01);
    expect(junctionPotentialV(['HCl'], [0.1], [0.01])).toBeCloseTo(expected, 12);
  });

  test('equal conductance on both sides uses the limit of the logarithmic factor', () => {
    // NaNO3 | KCl at concentrations with Σλc equal: 0.1·(50.08+71.42) = c·(73.48+76.31)
    const c = (0.1 * (50.08 + 71.42)) / (73.48 + 76.31);
    // limit: E_j = −(RT/F)·Σ(λ/z)Δc / Σλc
    const num = 73.48 * c - 76.31 * c - (50.08 * 0.1 - 71.42 * 0.1);
    const expected = (-RT_F * num) / (0.1 * (50.08 + 71.42));
    expect(junctionPotentialV(['NaNO3', 'KCl'], [0.1, 0], [0, c])).toBeCloseTo(expected, 10);
    expect(junctionPotentialV(['KCl'], [0.1], [0.1])).toBe(-0);
  });

  test.each([
    [[['HCl', 'KCl'], [0.1], [0, 0.1]], 'shape', /left_values has 1 values for 2 species/],
    [[['HCl'], [-0.1], [0.1]], 'argument', /concentrations ≥ 0/],
    [[['HCl'], [0], [0.1]], 'argument', /holds no ions/],
    [[['H+'], [0.1], [0.1]], 'argument', /not electroneutral/],
    [
      [
        ['Xe+', 'Cl-'],
        [0.1, 0.1],
        [0.1, 0.1],
      ],
      'notFound',
      /No limiting ionic conductivity is listed for Xe\+/,
    ],
    [[['C6H12O6'], [0.1], [0.1]], 'argument', /neither an ion nor a strong electrolyte/],
    [[[], [], []], 'argument', /species is empty/],
    [[['HCl'], ['a'], [0.1]], 'argument', /got "a"/],
    [[['HCl'], [0.1], [0.01], 310], 'argument', /looks like a temperature in kelvin/],
  ])('bad input %#', (args, kind, message) => {
    const [sp, l, r, t] = args as [string[], unknown[], unknown[], number | undefined];
    const e = engineErrorOf(() => junctionPotentialV(sp, l, r, t));
    expect(e.kind).toBe(kind);
    expect(e.message).toMatch(message);
  });
});
