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

/**
 * Relative permittivity of water at t °C, 0–100 °C: Malmberg & Maryott, J. Res. NBS 56, 1
 * (1956), ε = 87.740 − 0.40008 t + 9.398e-4 t² − 1.410e-6 t³ (from memory).
 */
export const waterPermittivity = (t: number): number =>
  87.74 - 0.40008 * t + 9.398e-4 * t * t - 1.41e-6 * t ** 3;

/** Density of water at t °C in kg/m³, 0–100 °C: Kell 1975 (from memory). */
export const waterDensityKgM3 = (t: number): number =>
  (999.83952 +
    16.945176 * t -
    7.9870401e-3 * t * t -
    46.170461e-6 * t ** 3 +
    105.56302e-9 * t ** 4 -
    280.54253e-12 * t ** 5) /
  (1 + 16.87985e-3 * t);

/**
 * E°(AgCl/Ag) in V against °C from the Harned cell: Bates & Bower, J. Res. NBS 53, 283 (1954),
 * Table 5 (seen).
 */
export const BATES_BOWER_AGCL_E0_V: readonly (readonly [number, number])[] = [
  [5, 0.23413],
  [10, 0.23142],
  [15, 0.22857],
  [20, 0.22557],
  [25, 0.22234],
  [30, 0.21904],
  [35, 0.21566],
  [45, 0.20835],
  [50, 0.20449],
  [55, 0.20056],
  [60, 0.19649],
];
