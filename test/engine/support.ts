/** The shared test support moved to test/support/; this re-export keeps older imports working. */
export * from '../support';
import { BUILTIN_POTENTIALS, builtinTable } from '../../src/engine';

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
