/**
 * Shared test support: the SI 2019 exact constants written out independently of the
 * engine (so expectations do not come from the code under test), and small helpers.
 */
import { EngineError, BUILTIN_POTENTIALS, builtinTable } from '../../src/engine';

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
 * The E° (V) the built-in table shows for a half-reaction, as its row prints it (from the
 * species data, rounded to 0.1 mV). Tests of resolution and of the Nernst equation compare
 * with it, so that they test the engine's arithmetic on the table, not the data.
 */
export function tabulatedE0V(halfReaction: string): number {
  const row = BUILTIN_POTENTIALS.find((r) => r.halfReaction === halfReaction);
  if (!row) throw new Error(`no built-in row ${halfReaction}`);
  return row.e0V;
}

/** Half the last printed digit of a built-in row's E° (V): the rounding of {@link tabulatedE0V}. */
export const TABLE_ROUNDING_V = 0.5e-4 + 1e-12;

/**
 * The exact E° (V) at 25 °C the engine holds for a built-in row (from the species data,
 * unrounded): the data under test elsewhere, used here as the input of Nernst arithmetic.
 */
export function rowE0V(halfReaction: string): number {
  const row = builtinTable().find((r) => r.text === halfReaction);
  if (!row) throw new Error(`no built-in row ${halfReaction}`);
  return row.e0V;
}
