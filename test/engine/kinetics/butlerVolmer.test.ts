/**
 * Butler–Volmer kinetics (Bard & Faulkner, Electrochemical Methods, 2nd ed. 2001,
 * eqs. 3.4.11 and 3.4.10 with mass transfer, from memory), anodic current positive;
 * expectations derived by hand from the SI exact F and R.
 */
import { butlerVolmerCurrent, overpotentialV, tafelSlopeV, kineticParams } from '../../../src/engine';
import { F, R, S25, engineErrorOf } from '../../support';

const f25 = F / (R * 298.15);

describe('BVCURRENT', () => {
  test.each([
    [0.05, 1e-3, 0.5, undefined],
    [-0.12, 2e-6, 0.3, 0.55],
    [0.2, 1, 0.6, undefined],
    [0, 1e-3, 0.5, undefined],
  ])('η = %p V, i0 = %p, αa = %p, αc = %p', (eta, i0, aa, ac) => {
    const alphaC = ac ?? 1 - aa;
    const expected = i0 * (Math.exp(aa * f25 * eta) - Math.exp(-alphaC * f25 * eta));
    expect(butlerVolmerCurrent(eta, kineticParams(i0, aa, ac))).toBeCloseTo(expected, 12);
  });

  test('with limits: i = i_BV/(1 + i0·e^{αa f η}/i_la + i0·e^{−αc f η}/i_lc)', () => {
    const p = kineticParams(1e-3, 0.3, 0.6, 25, 0.01, 0.02);
    for (const eta of [-0.3, -0.05, 0.01, 0.2]) {
      const A = Math.exp(0.3 * f25 * eta);
      const C = Math.exp(-0.6 * f25 * eta);
      const expected = (1e-3 * (A - C)) / (1 + (1e-3 * A) / 0.01 + (1e-3 * C) / 0.02);
      expect(butlerVolmerCurrent(eta, p)).toBeCloseTo(expected, 14);
    }
    // far beyond the kinetics the current is the limiting current
    expect(butlerVolmerCurrent(2, p)).toBeCloseTo(0.01, 9);
    expect(butlerVolmerCurrent(-2, p)).toBeCloseTo(-0.02, 9);
  });

  test('no overflow at ±10 V', () => {
    const p = kineticParams(1e-3, 0.5, undefined, 25, 1, 1);
    expect(butlerVolmerCurrent(10, p)).toBeCloseTo(1, 12);
  });

  test('temperature enters through f = F/RT', () => {
    const f60 = F / (R * 333.15);
    expect(butlerVolmerCurrent(0.1, kineticParams(1e-4, 0.5, 0.5, 60))).toBeCloseTo(
      2e-4 * Math.sinh(0.5 * f60 * 0.1),
      14,
    );
  });
});

describe('OVERPOTENTIAL (inverse)', () => {
  test('exact asinh for αa = αc without limits', () => {
    expect(overpotentialV(1e-3, kineticParams(1e-3, 0.5))).toBeCloseTo(Math.asinh(0.5) / (0.5 * f25), 14);
  });

  test.each([
    [kineticParams(1e-3, 0.3, 0.6), [-5, -1e-3, 1e-9, 0.5, 1e4]],
    [kineticParams(1e-3, 0.3, 0.6, 25, 0.01, 0.02), [-0.0199, -1e-3, 1e-6, 0.0099999]],
    [kineticParams(1e-6, 0.5, 0.5, 40, 1e-3), [-1, 5e-4, 9.99e-4]],
  ])('round trip i → η → i (%#)', (p, currents) => {
    for (const i of currents) {
      const eta = overpotentialV(i, p);
      // the inverse reproduces the current to ~1e-12 relative
      expect(Math.abs(butlerVolmerCurrent(eta, p) - i)).toBeLessThanOrEqual(1e-11 * Math.abs(i));
    }
  });

  test('the Tafel line far from equilibrium: η = b·log10(i/i0)', () => {
    const p = kineticParams(1e-6, 0.5);
    const b = 2 * S25; // ln10·RT/(0.5F)
    expect(overpotentialV(1e-2, p)).toBeCloseTo(b * 4, 6);
  });

  test.each([
    [0.01, /at or beyond the anodic limiting current 0.01/],
    [0.5, /at or beyond the anodic limiting current/],
    [-0.02, /at or beyond the cathodic limiting current −0.02/],
  ])('i = %p beyond a limit is refused', (i, message) => {
    const e = engineErrorOf(() => overpotentialV(i, kineticParams(1e-3, 0.3, 0.6, 25, 0.01, 0.02)));
    expect(e.kind).toBe('argument');
    expect(e.message).toMatch(message);
  });
});

describe('TAFELSLOPE (derived: ln10·RT/(αnF))', () => {
  test.each([
    [0.5, 25, 1, 2 * S25], // 118.3 mV/decade
    [1, 25, 1, S25], // 59.2 mV/decade
    [0.5, 25, 2, S25],
    [0.5, 80, 1, (Math.LN10 * R * 353.15) / (0.5 * F)],
  ])('α = %p, %p °C, n = %p', (a, t, n, expected) => {
    expect(tafelSlopeV(a, t, n)).toBeCloseTo(expected, 14);
  });

  test('118 mV/decade for α = 0.5 at 25 °C', () => {
    expect(tafelSlopeV(0.5) * 1000).toBeCloseTo(118.32, 2);
  });
});

describe('kinetic parameters: bad inputs', () => {
  test.each([
    [() => kineticParams(0, 0.5), /i0 must be greater than 0/],
    [() => kineticParams(1e-3, 0), /alpha_a must be a transfer coefficient in \(0, 1\]/],
    [() => kineticParams(1e-3, 1.5), /alpha_a must be a transfer coefficient/],
    [() => kineticParams(1e-3, 1), /alpha_c = 1 − alpha_a = 0/],
    [() => kineticParams(1e-3, 0.5, -0.1), /alpha_c must be a transfer coefficient/],
    [() => kineticParams(1e-3, 0.5, 0.5, 298.15), /looks like a temperature in kelvin/],
    [() => kineticParams(1e-3, 0.5, 0.5, 25, 0), /i_lim must be greater than 0/],
    [() => butlerVolmerCurrent(50, kineticParams(1e-3, 0.5)), /eta_V of 50 V is beyond ±10 V/],
    [() => butlerVolmerCurrent(-120, kineticParams(1e-3, 0.5)), /Give -0.12 for -120 mV/],
    [() => overpotentialV(NaN, kineticParams(1e-3, 0.5)), /i must be a finite number/],
    [() => tafelSlopeV(0), /alpha must be a transfer coefficient/],
    [() => tafelSlopeV(0.5, 25, 0), /n must be greater than 0/],
    [() => tafelSlopeV(0.5, 373.15), /looks like a temperature in kelvin/],
  ])('bad input %#', (f, message) => {
    const e = engineErrorOf(f);
    expect(e.kind).toBe('argument');
    expect(e.message).toMatch(message);
  });
});
