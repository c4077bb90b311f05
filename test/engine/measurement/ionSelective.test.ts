/**
 * Nikolsky–Eisenman response E = E0 + (S/zᵢ)·log10(aᵢ + Σ Kᵢⱼ·aⱼ^(zᵢ/zⱼ)) (IUPAC
 * recommendations on potentiometric selectivity, from memory); derived by hand.
 */
import { iseResponseV } from '../../../src/engine';
import { S25, engineErrorOf } from '../../support';

describe('ISERESPONSE', () => {
  test('ideal K+ electrode without interferents: E0 + S·log a', () => {
    expect(iseResponseV(0.2, S25, ['K+'], [1e-3], [])).toBeCloseTo(0.2 - 3 * S25, 14);
  });

  test('Na+ interference on a K+ electrode, K = 1e-3', () => {
    expect(iseResponseV(0.2, S25, ['K+', 'Na+'], [1e-4, 0.1], [1e-3])).toBeCloseTo(
      0.2 + S25 * Math.log10(1e-4 + 1e-3 * 0.1),
      14,
    );
    // selectivities may include the primary's own 1
    expect(iseResponseV(0.2, S25, ['K+', 'Na+'], [1e-4, 0.1], [1, 1e-3])).toBeCloseTo(
      0.2 + S25 * Math.log10(2e-4),
      14,
    );
  });

  test('a divalent primary with a monovalent interferent: slope S/2, a_j^(2/1)', () => {
    // Ca2+ electrode, Na+ interferent, K = 1e-3: log10(1e-3 + 1e-3·0.1²)
    expect(iseResponseV(0.05, S25, ['Ca2+', 'Na+'], [1e-3, 0.1], [1e-3])).toBeCloseTo(
      0.05 + (S25 / 2) * Math.log10(1e-3 + 1e-3 * 0.01),
      14,
    );
  });

  test('an anion electrode: the slope divided by z = −1 (Cl- with Br- interference)', () => {
    expect(iseResponseV(0.1, S25, ['Cl-', 'Br-'], [1e-2, 1e-4], [300])).toBeCloseTo(
      0.1 - S25 * Math.log10(1e-2 + 300 * 1e-4),
      14,
    );
  });

  test.each([
    [[0.1, 59.16, ['K+'], [1e-3], []], 'argument', /slope_V of 59.16 V is beyond ±10 V/],
    [[0.1, 0.5, ['K+'], [1e-3], []], 'argument', /far above the ideal/],
    [[0.1, -0.059, ['K+'], [1e-3], []], 'argument', /slope_V must be positive/],
    [[150, 0.059, ['K+'], [1e-3], []], 'argument', /E0_V of 150 V is beyond ±10 V/],
    [[0.1, 0.059, ['K'], [1e-3], []], 'argument', /has no charge/],
    [[0.1, 0.059, ['K+', 'Cl-'], [1e-3, 1], [1]], 'argument', /same sign/],
    [[0.1, 0.059, ['K+', 'Na+'], [1e-3], [1e-3]], 'shape', /activities has 1 values for 2 ions/],
    [[0.1, 0.059, ['K+', 'Na+'], [1e-3, 0.1], []], 'shape', /selectivities has 0 values for 1/],
    [[0.1, 0.059, ['K+'], [-1], []], 'argument', /must be a number ≥ 0/],
    [[0.1, 0.059, ['K+', 'Na+'], [1e-3, 0.1], [-1]], 'argument', /selectivity coefficient .* ≥ 0/],
    [[0.1, 0.059, ['K+'], [0], []], 'argument', /give the primary ion a positive activity/],
    [[0.1, 0.059, [], [], []], 'argument', /primary is empty/],
  ])('bad input %#', (args, kind, message) => {
    const [e0, sl, sp, a, k] = args as [number, number, string[], unknown[], unknown[]];
    const e = engineErrorOf(() => iseResponseV(e0, sl, sp, a, k));
    expect(e.kind).toBe(kind);
    expect(e.message).toMatch(message);
  });
});
