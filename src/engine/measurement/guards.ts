/**
 * Domain guards shared by the Faraday, corrosion, kinetics and measurement
 * functions: finite positive numbers, fractions in (0, 1], potentials that look
 * like millivolts typed as volts, and temperatures that look like kelvin.
 */
import { EngineError } from '../errors';

/** Potentials beyond this magnitude (V) are taken for millivolts typed as volts. */
export const MAX_POTENTIAL_V = 10;

/** The aqueous range of temperature, °C, for functions that use aqueous data. */
export const AQUEOUS_RANGE_C: readonly [number, number] = [0, 100];

/**
 * A finite number, or an argument error naming the argument.
 *
 * @example
 * finiteNumber(2, 'charge_C') // 2
 */
export function finiteNumber(x: number, arg: string): number {
  if (typeof x !== 'number' || !Number.isFinite(x))
    throw new EngineError('argument', `${arg} must be a finite number; got ${String(x)}.`, arg);
  return x;
}

/**
 * A finite number > 0, or an argument error with a hint.
 *
 * @example
 * positiveNumber(0.5, 'i0') // 0.5
 */
export function positiveNumber(x: number, arg: string, unit = ''): number {
  finiteNumber(x, arg);
  if (!(x > 0))
    throw new EngineError(
      'argument',
      `${arg} must be greater than 0${unit ? ` (${unit})` : ''}; got ${x}.${x === 0 ? ' An empty cell reads as 0: fill it in.' : ''}`,
      arg,
    );
  return x;
}

/**
 * A finite number ≥ 0, or an argument error.
 *
 * @example
 * nonNegativeNumber(0, 'charge_C') // 0
 */
export function nonNegativeNumber(x: number, arg: string, unit = ''): number {
  finiteNumber(x, arg);
  if (x < 0)
    throw new EngineError(
      'argument',
      `${arg} must not be negative${unit ? ` (${unit})` : ''}; got ${x}.`,
      arg,
    );
  return x;
}

/**
 * A fraction in (0, 1] (efficiency, utilisation), or an argument error that
 * catches a percentage typed as a number (90 for 0.9).
 *
 * @example
 * fraction(0.95, 'efficiency') // 0.95
 */
export function fraction(x: number, arg: string): number {
  finiteNumber(x, arg);
  if (x > 1 && x <= 100)
    throw new EngineError(
      'argument',
      `${arg} must be a fraction in (0, 1]; got ${x}. For ${x} % write ${x / 100}.`,
      arg,
    );
  if (!(x > 0) || x > 1)
    throw new EngineError('argument', `${arg} must be a fraction in (0, 1]; got ${x}.`, arg);
  return x;
}

/**
 * A potential in volts within ±10 V; beyond that it is taken for millivolts typed
 * as volts and refused with a hint.
 *
 * @example
 * potentialInVolts(-0.85, 'E_V') // -0.85
 */
export function potentialInVolts(x: number, arg: string): number {
  finiteNumber(x, arg);
  if (Math.abs(x) > MAX_POTENTIAL_V)
    throw new EngineError(
      'argument',
      `${arg} of ${x} V is beyond ±${MAX_POTENTIAL_V} V: were millivolts typed as volts? Give ${x / 1000} for ${x} mV.`,
      arg,
    );
  return x;
}

/**
 * A temperature in °C within a function's range [lo, hi]; a value that is outside
 * the range but would be inside it read as kelvin gets a hint to convert.
 *
 * @example
 * celsiusInRange(25, 'temp_C', [0, 100]) // 25
 */
export function celsiusInRange(x: number, arg: string, range: readonly [number, number]): number {
  finiteNumber(x, arg);
  const [lo, hi] = range;
  if (x >= lo && x <= hi) return x;
  const asCelsius = x - 273.15;
  const hint =
    asCelsius >= lo && asCelsius <= hi
      ? `: it looks like a temperature in kelvin; give it in °C (${x} K is ${Number(asCelsius.toFixed(2))} °C).`
      : ', the range of this function; give the temperature in °C.';
  throw new EngineError('argument', `${arg} must be between ${lo} and ${hi} °C; got ${x} °C${hint}`, arg);
}
