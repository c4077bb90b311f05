/**
 * Galvanic anode life T = m·ε·u/(I·8760) (DNV-RP-B401 mass equation, from memory),
 * with the published design capacities (DNV-RP-B401 (2017) Table 10-6, seawater,
 * ≤ 30 °C: Al-Zn-In 2000 Ah/kg, zinc 780 Ah/kg; magnesium about 1100 Ah/kg, common
 * practice) and utilisation factors (Table 10-8), all from memory.
 */
import { anodeLifeYears, anodeCapacityAhKg, anodeUtilisation } from '../../../src/engine';
import { engineErrorOf } from '../../support';

describe('ANODELIFE', () => {
  test.each([
    ['zinc', 780],
    ['Al-Zn-In', 2000],
    ['magnesium', 1100],
    ['high-potential magnesium', 1230],
  ])('published capacity of %s: %p Ah/kg', (name, cap) => {
    expect(anodeCapacityAhKg(name)).toBe(cap);
  });

  test.each([
    ['long slender stand-off', 0.9],
    ['short slender stand-off', 0.85],
    ['long flush-mounted', 0.85],
    ['bracelet', 0.8],
  ])('utilisation of %s: %p', (name, u) => {
    expect(anodeUtilisation(name)).toBe(u);
  });

  test('100 kg zinc stand-off at 0.5 A: 100·780·0.9/(0.5·8760) = 16.03 years (derived)', () => {
    expect(anodeLifeYears(100, 780, 0.5, 0.9)).toBeCloseTo((100 * 780 * 0.9) / (0.5 * 8760), 12);
    expect(anodeLifeYears(100, 'zinc', 0.5, 'long slender stand-off')).toBeCloseTo(16.0274, 4);
  });

  test('utilisation defaults to 0.80', () => {
    expect(anodeLifeYears(200, 2000, 1.2)).toBeCloseTo((200 * 2000 * 0.8) / (1.2 * 8760), 12);
  });

  test.each([
    [() => anodeLifeYears(0, 780, 1), 'argument', /mass_kg must be greater than 0/],
    [() => anodeLifeYears(10, -780, 1), 'argument', /capacity_Ah_kg must be greater than 0/],
    [() => anodeLifeYears(10, 780, 0), 'argument', /current_A must be greater than 0/],
    [() => anodeLifeYears(10, 780, 1, 1.1), 'argument', /utilisation must be a fraction/],
    [() => anodeLifeYears(10, 780, 1, 90), 'argument', /For 90 % write 0.9/],
    [
      () => anodeLifeYears(10, 'copper', 1),
      'argument',
      /capacity_Ah_kg must be a number in Ah\/kg or an anode material.*got "copper"/,
    ],
    [
      () => anodeLifeYears(10, 780, 1, 'teardrop'),
      'argument',
      /utilisation must be a number.*got "teardrop"/,
    ],
  ])('bad input %#', (f, kind, message) => {
    const e = engineErrorOf(f);
    expect(e.kind).toBe(kind);
    expect(e.message).toMatch(message);
  });
});
