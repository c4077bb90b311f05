/**
 * Checks shared by the activity models: one value of a composition row, and a result that
 * must be a finite number.
 */
import { EngineError } from '../errors';

/**
 * Check one value of a composition row (species and values as IONICSTR takes them): a `pH`
 * column any finite number, every other species a finite molality ≥ 0 mol/kg.
 *
 * @param v the value
 * @param label the species as named in messages
 * @param isPH true for a pH column
 * @throws EngineError `argument` naming the species and the unit
 * @example
 * checkCompositionValue(0.1, 'Na+', false) // passes
 */
export function checkCompositionValue(v: number, label: string, isPH: boolean): void {
  if (isPH) {
    if (typeof v !== 'number' || !Number.isFinite(v)) {
      throw new EngineError('argument', `the pH value must be a finite number; got ${String(v)}.`, 'values');
    }
    return;
  }
  if (typeof v !== 'number' || !Number.isFinite(v) || v < 0) {
    throw new EngineError(
      'argument',
      `the value of ${label} must be a finite molality ≥ 0 mol/kg; got ${String(v)}.`,
      'values',
    );
  }
}

/**
 * `x` where it is a finite number; otherwise a `range` error with the message given (a model
 * pushed past float64, or inputs too large).
 *
 * @param x the result
 * @param message what to tell the user
 * @param argName the argument to blame
 * @throws EngineError `range`
 * @example
 * finiteResult(0.93, 'φ is out of range', 'molality') // 0.93
 */
export function finiteResult(x: number, message: string, argName: string): number {
  if (!Number.isFinite(x)) throw new EngineError('range', message, argName);
  return x;
}
