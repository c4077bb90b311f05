/**
 * The inverse of Butler–Volmer terminates for every input (found by the catalogue fuzz:
 * a subnormal current density made the bracket's first guess underflow to 0 V, and the
 * doubling 0 → 0 never ended). Expectations derived by hand: near η = 0 the current is
 * linear, i ≈ i0·(αa + αc)·f·η (Bard & Faulkner, Electrochemical Methods, 2nd ed. 2001,
 * eq. 3.4.12, from memory), so η ≈ i/(i0·f) for αa + αc = 1; f = F/(RT) from SI exact F, R.
 */
import { overpotentialV, kineticParams } from '../../../src/engine';
import { F, R, engineErrorOf } from '../../support';

const f25 = F / (R * 298.15);

describe('OVERPOTENTIAL terminates on extreme inputs', () => {
  test('counterexample: i = 5e-324 (smallest subnormal), i0 = 1, αa = 0.3 → η rounds to 0 V', () => {
    // exact η ≈ 5e-324/f = 1.3e-325 V, below half the smallest subnormal: float64 gives 0
    const eta = overpotentialV(Number.MIN_VALUE, kineticParams(1, 0.3));
    expect(eta).toBeGreaterThanOrEqual(0);
    expect(eta).toBeLessThanOrEqual(Number.MIN_VALUE);
  }, 5000);

  test('the cathodic mirror: i = −5e-324 → η rounds to 0 V', () => {
    const eta = overpotentialV(-Number.MIN_VALUE, kineticParams(1, 0.3));
    expect(eta).toBeLessThanOrEqual(0);
    expect(eta).toBeGreaterThanOrEqual(-Number.MIN_VALUE);
  }, 5000);

  test('i = 1e-300, i0 = 1, αa = 0.3: η = i/(i0·f) = 2.5693e-302 V (linear region)', () => {
    const eta = overpotentialV(1e-300, kineticParams(1, 0.3));
    expect(eta / (1e-300 / f25)).toBeCloseTo(1, 9);
  }, 5000);

  test.each([
    // α near 0 on both sides (exact asinh path): η = asinh(0.5)/(1e-300·f) ≈ 1.2e298 V
    ['αa = αc = 1e-300', () => overpotentialV(1, kineticParams(1, 1e-300, 1e-300))],
    // α near 0 anodic only: the anodic branch never exceeds ~i0 within ±50 V
    ['αa = 1e-300, huge i', () => overpotentialV(1e308, kineticParams(1e-12, 1e-300, 0.5))],
    // subnormal i0 against a unit current: exp(αa·f·50 V) · 5e-324 stays below 1 for αa = 0.3
    ['i0 = 5e-324, i = 1', () => overpotentialV(1, kineticParams(Number.MIN_VALUE, 0.3))],
  ])('%s → range error naming the ±50 V search', (_label, call) => {
    const e = engineErrorOf(call);
    expect(e.kind).toBe('range');
    expect(e.message).toMatch(/beyond ±50 V/);
  }, 5000);

  test('i0 = 5e-324, i = −1, αc = 0.7: cathodic Tafel branch, η = −ln(i/i0)/(αc·f) = −27.32 V', () => {
    // the anodic term is e^(−(αa+αc)·f·27 V) ≈ 1e-462 of the cathodic one: pure Tafel
    const eta = overpotentialV(-1, kineticParams(Number.MIN_VALUE, 0.3));
    // i0 = 2^−1074 exactly, so ln(i/i0) = 1074·ln 2
    expect(eta).toBeCloseTo(-(1074 * Math.LN2) / (0.7 * f25), 9);
  }, 5000);

  test('i = MAX_VALUE against i0 = 1e-12 with αa = 0.5 ≠ αc: range error, not Infinity', () => {
    // η = ln(1.8e320)/(0.5·f) ≈ 57.5 V > 50 V
    const e = engineErrorOf(() => overpotentialV(Number.MAX_VALUE, kineticParams(1e-12, 0.5, 0.6)));
    expect(e.kind).toBe('range');
  }, 5000);
});
