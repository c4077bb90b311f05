/**
 * Shared test support: the SI 2019 exact constants written out independently of the
 * engine (so expectations do not come from the code under test), and small helpers.
 */
import { EngineError } from '../../src/engine';

/** Avogadro constant, mol⁻¹ (SI 2019, exact). */
export const NA = 6.02214076e23;
/** Molar gas constant R = N_A·k, J/(mol·K) (SI 2019, exact). */
export const R = NA * 1.380649e-23;
/** Faraday constant F = N_A·e, C/mol (SI 2019, exact). */
export const F = NA * 1.602176634e-19;
/** RT ln10 / F in V at a temperature in °C (derived from the SI exact constants). */
export const s = (tC: number): number => (R * (tC + 273.15) * Math.LN10) / F;
/** The Nernst slope at 25 °C, V per decade (derived). */
export const S25 = s(25);

/** Runs `f` and returns the EngineError it throws (fails the test otherwise). */
export function engineErrorOf(f: () => unknown): EngineError {
  try {
    f();
  } catch (e) {
    if (e instanceof EngineError) return e;
    throw e;
  }
  throw new Error('expected an EngineError, but nothing was thrown');
}

/** |actual − expected| ≤ tol, with actual finite. */
export function expectNear(actual: number, expected: number, tol: number): void {
  expect(Number.isFinite(actual)).toBe(true);
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tol);
}
