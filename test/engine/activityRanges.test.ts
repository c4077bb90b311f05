/**
 * Every activity model refuses results outside its range of validity (an argument error
 * naming the range and a better model) unless asked to extrapolate.
 */
import {
  ACTIVITY_MODEL_RANGES,
  activities,
  activityCoefficient,
  ionActivityCoefficient,
  meanActivityCoefficient,
  pitzerMixture,
  waterActivity,
} from '../../src/engine';
import { engineErrorOf } from '../support';

describe('ranges as data (common practice; Davies 1962)', () => {
  it('limiting 0.005, extended 0.1, davies 0.5 mol/kg; 0–100 °C', () => {
    expect(ACTIVITY_MODEL_RANGES.limiting.maxIonicStrengthMolKg).toBe(0.005);
    expect(ACTIVITY_MODEL_RANGES.extended.maxIonicStrengthMolKg).toBe(0.1);
    expect(ACTIVITY_MODEL_RANGES.davies.maxIonicStrengthMolKg).toBe(0.5);
    for (const r of Object.values(ACTIVITY_MODEL_RANGES)) expect(r.tempRangeC).toEqual([0, 100]);
  });
});

describe('out of range: an argument error naming the range and a better model', () => {
  it.each([
    // the measured defect: ACTCOEF("Cu2+", 4.7) gave 29.92 with Davies, silently
    [
      'Davies, Cu2+ at I = 4.7',
      () => ionActivityCoefficient('Cu2+', 4.7),
      'ionic_strength',
      /4\.7 mol\/kg.*davies.*I ≤ 0\.5 mol\/kg.*pitzer/,
    ],
    ['Davies, Cl- at I = 3', () => ionActivityCoefficient('Cl-', 3, 'davies'), 'ionic_strength', /I ≤ 0\.5/],
    [
      'limiting law at I = 0.2',
      () => ionActivityCoefficient('Na+', 0.2, 'limiting'),
      'ionic_strength',
      /I ≤ 0\.005 mol\/kg.*"extended".*"davies"/,
    ],
    [
      'extended at I = 0.3',
      () => activityCoefficient(2, 0.3, 'extended', 25, 6),
      'ionic_strength',
      /I ≤ 0\.1 mol\/kg.*"davies"/,
    ],
    [
      'activities of a 1 mol/kg row with Davies',
      () => activities(['Na+', 'Cl-'], [1, 1], 'davies'),
      'ionic_strength',
      /I ≤ 0\.5/,
    ],
    [
      'Davies γ± of a salt at 1 mol/kg',
      () => meanActivityCoefficient('NaCl', 1, 'davies'),
      'ionic_strength',
      /I ≤ 0\.5/,
    ],
    [
      'Pitzer NaCl beyond 6 mol/kg',
      () => meanActivityCoefficient('NaCl', 6.5),
      'molality',
      /0–6 mol\/kg.*Pitzer & Mayorga.*1973.*extrapolate/,
    ],
    [
      'Pitzer K2SO4 beyond 0.7 mol/kg',
      () => meanActivityCoefficient('K2SO4', 1),
      'molality',
      /0–0\.7 mol\/kg/,
    ],
    [
      'Pitzer CuSO4 at 40 °C (25 °C parameters)',
      () => meanActivityCoefficient('CuSO4', 0.1, 'pitzer', 40),
      'temp_C',
      /25 °C only.*"davies"/,
    ],
    [
      'Pitzer NaCl at 60 °C (0–50 °C)',
      () => meanActivityCoefficient('NaCl', 1, 'pitzer', 60),
      'temp_C',
      /0–50 °C.*Silvester/,
    ],
    [
      'Pitzer at 120 °C',
      () => meanActivityCoefficient('NaCl', 1, 'pitzer', 120, { extrapolate: true }),
      'temp_C',
      /0 and 100 °C/,
    ],
    [
      'Debye–Hückel family at 105 °C',
      () => ionActivityCoefficient('Na+', 0.001, 'davies', 105),
      'temp_C',
      /0 and 100 °C/,
    ],
    [
      'Pitzer mixture beyond its ionic strength',
      () => pitzerMixture(['Mg2+', 'Cl-'], [3, 6]),
      'values',
      /I ≤ 6 mol\/kg/,
    ],
    ['water activity of MgSO4 beyond 3 mol/kg', () => waterActivity('MgSO4', 3.5), 'molality', /0–3 mol\/kg/],
  ] as [string, () => unknown, string, RegExp][])('%s', (_label, f, arg, message) => {
    const err = engineErrorOf(f);
    expect(err.kind).toBe('argument');
    expect(err.argument).toBe(arg);
    expect(err.message).toMatch(message);
  });

  it('the edges themselves are inside', () => {
    expect(ionActivityCoefficient('Na+', 0.005, 'limiting')).toBeGreaterThan(0);
    expect(ionActivityCoefficient('Na+', 0.1, 'extended')).toBeGreaterThan(0);
    expect(ionActivityCoefficient('Na+', 0.5, 'davies')).toBeGreaterThan(0);
    expect(meanActivityCoefficient('NaCl', 6)).toBeGreaterThan(0);
    expect(meanActivityCoefficient('NaCl', 1, 'pitzer', 50)).toBeGreaterThan(0);
    expect(ionActivityCoefficient('Na+', 0.001, 'davies', 100)).toBeGreaterThan(0);
  });

  it('with extrapolate, each model answers again (the value is the model’s, flagged by the caller)', () => {
    const x = { extrapolate: true };
    // Davies at I = 4.7 for z = 2: 10^(−0.5085·4·(√4.7/(1+√4.7) − 1.41)) (derived) — the 29.9 of the issue
    const s = Math.sqrt(4.7);
    expect(ionActivityCoefficient('Cu2+', 4.7, 'davies', 25, null, x)).toBeCloseTo(
      Math.pow(10, -0.5085 * 4 * (s / (1 + s) - 0.3 * 4.7)),
      10,
    );
    expect(activityCoefficient(1, 0.2, 'limiting', 25, null, x)).toBeCloseTo(
      Math.pow(10, -0.5085 * Math.sqrt(0.2)),
      12,
    );
    expect(meanActivityCoefficient('NaCl', 6.5, 'pitzer', 25, x)).toBeGreaterThan(1);
    expect(meanActivityCoefficient('CuSO4', 0.1, 'pitzer', 40, x)).toBeGreaterThan(0.1);
    expect(activities(['Na+', 'Cl-'], [1, 1], 'davies', null, 25, x)[0]).toBeGreaterThan(0);
  });
});
