/**
 * Corrosion rates by ASTM G102 (constants, equations and Table 1 entries from memory):
 * CR = K1·i·EW/ρ (mm/y), MR = K2·i·EW (g/(m²·d)), EW = 1/Σ(nᵢfᵢ/Wᵢ).
 */
import {
  corrosionRateMmY,
  massLossRateGm2d,
  equivalentWeightOfComposition,
  corrodingMetal,
} from '../../../src/engine';
import { engineErrorOf } from '../../support';

const K1 = 3.27e-3; // ASTM G102, mm·g/(µA·cm·y) (from memory)
const K2 = 8.954e-3; // ASTM G102, g·cm²/(µA·m²·d) (from memory)

describe('CORRATE and MASSLOSS', () => {
  test('iron at 1 µA/cm²: 3.27e-3·27.92/7.87 = 0.0116 mm/y (derived)', () => {
    // EW(Fe) = 55.845/2 (CIAAW 2021, valence 2); ρ 7.87 g/cm³ (CRC Handbook, from memory)
    expect(corrosionRateMmY('Fe', 1)).toBeCloseTo((K1 * (55.845 / 2)) / 7.87, 12);
    expect(corrosionRateMmY('iron', 1)).toBeCloseTo(0.0116, 4);
    expect(massLossRateGm2d('Fe', 1)).toBeCloseTo(K2 * (55.845 / 2), 12);
  });

  test.each([
    // ASTM G102 Table 1 (from memory): UNS, EW, density
    ['304', 25.12, 7.94],
    ['S31600', 25.5, 8.0],
    ['carbon steel', 27.92, 7.86],
  ])('%s against ASTM G102 Table 1: EW %p, ρ %p', (name, ew, rho) => {
    expect(corrosionRateMmY(name, 10)).toBeCloseTo((K1 * 10 * ew) / rho, 12);
    expect(massLossRateGm2d(name, 10)).toBeCloseTo(K2 * 10 * ew, 12);
  });

  test('the G102 method reproduces the tabulated EW of 304 and 316 from their compositions', () => {
    // 304: Cr 19, Ni 9.25, Mn 1, Fe bal.; valences Cr 3, Ni 2, Mn 2, Fe 2 → 25.12 (G102 Table 1)
    expect(equivalentWeightOfComposition({ Fe: 70.75, Cr: 19, Ni: 9.25, Mn: 1 })).toBeCloseTo(25.12, 1);
    // 316: Cr 17, Ni 12, Mo 2.5 (valence 3), Mn 1, Fe bal. → 25.50 (G102 Table 1)
    expect(equivalentWeightOfComposition({ Fe: 67.5, Cr: 17, Ni: 12, Mo: 2.5, Mn: 1 })).toBeCloseTo(25.5, 1);
  });

  test('a composition in mass % gives EW = 1/Σ(nf/W) (derived)', () => {
    // 90/10 Cu-Ni: 2·0.886/63.546 + 2·0.10/58.693 + 2·0.014/55.845
    const ew = 1 / ((2 * 0.886) / 63.546 + (2 * 0.1) / 58.693 + (2 * 0.014) / 55.845);
    expect(corrodingMetal('Cu 88.6, Ni 10, Fe 1.4').equivalentWeight).toBeCloseTo(ew, 10);
    expect(corrodingMetal('C70600').equivalentWeight).toBeCloseTo(ew, 10);
    expect(corrosionRateMmY('Cu 88.6, Ni 10, Fe 1.4', 1, 8.94)).toBeCloseTo((K1 * ew) / 8.94, 12);
  });

  test('density and equivalent weight override the metal; both make the name optional', () => {
    expect(corrosionRateMmY('Fe', 1, 7.0)).toBeCloseTo((K1 * (55.845 / 2)) / 7.0, 12);
    expect(corrosionRateMmY('', 2, 7.9, 28)).toBeCloseTo((K1 * 2 * 28) / 7.9, 12);
    expect(massLossRateGm2d(null, 2, null, 28)).toBeCloseTo(K2 * 2 * 28, 12);
    // a given equivalent weight is used as given: the metal's name is not looked up
    expect(massLossRateGm2d('unobtainium', 2, null, 28)).toBeCloseTo(K2 * 2 * 28, 12);
    expect(corrosionRateMmY('Zn', 0)).toBe(0);
  });

  test.each([
    [() => corrosionRateMmY('unobtainium', 1), 'notFound', /is not a metal or alloy this function knows/],
    [() => corrosionRateMmY('Fe', -1), 'argument', /current_density_uA_cm2 must not be negative/],
    [() => corrosionRateMmY('Fe', 1, 0), 'argument', /density_g_cm3 must be greater than 0/],
    [() => corrosionRateMmY('Fe', 1, null, -3), 'argument', /equivalent_weight must be greater than 0/],
    [() => corrosionRateMmY('', 1), 'argument', /metal_or_alloy is empty/],
    [() => corrosionRateMmY('Pd', 1), 'notFound', /No valence is listed for Pd/],
    [() => corrosionRateMmY('Cu 50, Ni 10', 1, 8.9), 'argument', /adds up to 60/],
    [() => corrosionRateMmY('Cu 90, Pd 10', 1, 8.9), 'argument', /No valence is listed for Pd/],
    [() => massLossRateGm2d('Fe', NaN), 'argument', /must be a finite number/],
    [() => massLossRateGm2d('', 1), 'argument', /metal_or_alloy is empty/],
    // the mass-loss rate needs only the equivalent weight; the corrosion rate needs both
    [() => massLossRateGm2d(null, 1, 7.9), 'argument', /or give equivalent_weight\.$/],
    [
      () => corrosionRateMmY(null, 1, null, 28),
      'argument',
      /give both density_g_cm3 and equivalent_weight\.$/,
    ],
    [() => massLossRateGm2d('Fe', -1, null, 28), 'argument', /current_density_uA_cm2 must not be negative/],
    [() => massLossRateGm2d('Fe', 1, -7.9), 'argument', /density_g_cm3 must be greater than 0/],
  ])('bad input %#', (f, kind, message) => {
    const e = engineErrorOf(f);
    expect(e.kind).toBe(kind);
    expect(e.message).toMatch(message);
  });

  test('a composition element with no density needs density_g_cm3', () => {
    const e = engineErrorOf(() => corrosionRateMmY('Cu 90, Ni 10', 1));
    expect(e.message).toMatch(/give density_g_cm3/);
  });
});
