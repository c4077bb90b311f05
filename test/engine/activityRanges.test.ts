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
import { callFunction, isCellError } from '../../src/functions/catalogue';
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

describe('every Pitzer salt refuses molalities past its published limit and temperatures past its range', () => {
  // The published upper molality of each fit (Pitzer & Mayorga 1973, Table II; 1974, Table I;
  // CaSO4: Harvie, Møller & Weare 1984; all from memory), written here, not read from the table
  // prettier-ignore
  const LIMITS: [string, number, string][] = [
    ['HCl', 6, '25 °C only'], ['LiCl', 6, '25 °C only'], ['NaCl', 6, '0–50 °C'], ['KCl', 4.8, '25 °C only'],
    ['NaOH', 6, '25 °C only'], ['KOH', 5.5, '25 °C only'], ['CaCl2', 2.5, '25 °C only'], ['MgCl2', 4.5, '25 °C only'],
    ['ZnCl2', 1.2, '25 °C only'], ['NiCl2', 2.5, '25 °C only'], ['CuCl2', 2, '25 °C only'],
    ['Na2SO4', 4, '25 °C only'], ['K2SO4', 0.7, '25 °C only'], ['MgSO4', 3, '25 °C only'],
    ['CuSO4', 1.4, '25 °C only'], ['ZnSO4', 3.5, '25 °C only'], ['NiSO4', 2.5, '25 °C only'],
    ['CaSO4', 0.015, '25 °C only'],
  ];
  it.each(LIMITS)('%s: 0–%d mol/kg, %s', (salt, max, tempRange) => {
    expect(meanActivityCoefficient(salt, max)).toBeGreaterThan(0);
    const past = engineErrorOf(() => meanActivityCoefficient(salt, max * 1.01));
    expect([past.kind, past.argument]).toEqual(['argument', 'molality']);
    expect(past.message).toContain(`0–${max} mol/kg`);
    expect(past.message).toMatch(/extrapolate/);
    expect(engineErrorOf(() => waterActivity(salt, max * 1.01)).message).toContain(`0–${max} mol/kg`);
    const hot = engineErrorOf(() => meanActivityCoefficient(salt, max / 2, 'pitzer', 55));
    expect([hot.kind, hot.argument]).toEqual(['argument', 'temp_C']);
    expect(hot.message).toContain(tempRange);
    expect(hot.message).toMatch(/"davies"/);
    // the explicit argument lets the case through, with the model's own number
    expect(meanActivityCoefficient(salt, max * 1.01, 'pitzer', 25, { extrapolate: true })).toBeGreaterThan(0);
  });
});

describe('through the worksheet functions: #VALUE! naming the range, unless extrapolate is TRUE', () => {
  it.each([
    // ACTCOEF(species, ionic_strength, model, ion_size, temp_C, extrapolate)
    ['ACTCOEF', ['Cu2+', 4.7], /I ≤ 0\.5 mol\/kg.*pitzer/, ['Cu2+', 4.7, 'davies', null, 25, true]],
    ['ACTCOEF', ['Na+', 0.2, 'limiting'], /I ≤ 0\.005 mol\/kg/, ['Na+', 0.2, 'limiting', null, 25, true]],
    ['ACTCOEF', ['Na+', 0.3, 'extended'], /I ≤ 0\.1 mol\/kg/, ['Na+', 0.3, 'extended', null, 25, true]],
    ['ACTCOEF', ['Na+', 0.001, 'davies', null, 105], /0 and 100 °C/, null],
    // MEANACTCOEF(salt, molality, model, temp_C, extrapolate)
    ['MEANACTCOEF', ['NaCl', 6.5], /0–6 mol\/kg/, ['NaCl', 6.5, 'pitzer', 25, true]],
    ['MEANACTCOEF', ['MgSO4', 1, 'pitzer', 40], /25 °C only/, ['MgSO4', 1, 'pitzer', 40, true]],
    ['MEANACTCOEF', ['NaCl', 1, 'davies'], /I ≤ 0\.5/, ['NaCl', 1, 'davies', 25, true]],
    // WATERACTIVITY(salt_or_species, molality_or_values, temp_C, extrapolate)
    ['WATERACTIVITY', ['K2SO4', 1], /0–0\.7 mol\/kg/, ['K2SO4', 1, 25, true]],
  ] as [string, unknown[], RegExp, unknown[] | null][])('%s(%j)', (id, args, message, allowed) => {
    const e = callFunction(id, args as never)[0]![0];
    expect(isCellError(e) && e.code).toBe('#VALUE!');
    expect(isCellError(e) && e.message).toMatch(message);
    if (allowed) {
      const v = callFunction(id, allowed as never)[0]![0];
      expect(typeof v).toBe('number');
      expect(v as number).toBeGreaterThan(0);
    }
  });
});
