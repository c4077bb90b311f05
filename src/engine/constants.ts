/**
 * Physical constants, SI 2019 exact values (CODATA 2018), and the Nernst slope.
 *
 * F = N_A·e and R = N_A·k are exact by definition of the SI since 2019.
 */
import { EngineError } from './errors';

/** Elementary charge e in C (exact). */
export const ELEMENTARY_CHARGE_C = 1.602176634e-19;
/** Avogadro constant N_A in 1/mol (exact). */
export const AVOGADRO_PER_MOL = 6.02214076e23;
/** Boltzmann constant k in J/K (exact). */
export const BOLTZMANN_J_PER_K = 1.380649e-23;
/** Faraday constant F = N_A·e in C/mol (96485.33212…). */
export const FARADAY_C_PER_MOL = AVOGADRO_PER_MOL * ELEMENTARY_CHARGE_C;
/** Molar gas constant R = N_A·k in J/(mol·K) (8.31446261815324). */
export const GAS_CONSTANT_J_PER_MOL_K = AVOGADRO_PER_MOL * BOLTZMANN_J_PER_K;
/** 0 °C in kelvin. */
export const ZERO_CELSIUS_K = 273.15;
/** The reference temperature of tabulated standard potentials, °C. */
export const STANDARD_TEMP_C = 25;
/** Standard pressure, bar (IUPAC since 1982). */
export const STANDARD_PRESSURE_BAR = 1;
/** The highest temperature accepted, °C (far above any aqueous system; guards against overflow). */
export const MAX_TEMP_C = 10000;
/** One standard atmosphere in bar (exact). */
export const ATM_IN_BAR = 1.01325;

/**
 * Kelvin from degrees Celsius, checking that the temperature is above absolute zero
 * and finite.
 *
 * @param tempC temperature in °C
 * @param argName the argument name used in an error message
 * @throws EngineError (`argument`) at or below −273.15 °C, or not finite
 * @example
 * kelvinFromCelsius(25) // 298.15
 */
export function kelvinFromCelsius(tempC: number, argName = 'temp_C'): number {
  if (!Number.isFinite(tempC)) {
    throw new EngineError(
      'argument',
      `${argName} must be a finite temperature in °C; got ${String(tempC)}.`,
      argName,
    );
  }
  const tempK = tempC + ZERO_CELSIUS_K;
  if (tempC > MAX_TEMP_C) {
    throw new EngineError(
      'argument',
      `${argName} of ${tempC} °C is beyond the ${MAX_TEMP_C} °C this engine accepts; give the temperature in degrees Celsius.`,
      argName,
    );
  }
  if (tempK <= 0) {
    throw new EngineError(
      'argument',
      `${argName} must be above absolute zero (−273.15 °C); got ${tempC} °C. Give the temperature in degrees Celsius.`,
      argName,
    );
  }
  return tempK;
}

/**
 * RT ln10 / (nF), the Nernst slope in volts per decade of activity.
 *
 * Domain: temp_C > −273.15; n > 0 (need not be an integer here: a slope per
 * 1/n electrons is occasionally wanted for sensors).
 * Precision: float64, relative error ~1e-16.
 *
 * @param tempC temperature in °C (default 25)
 * @param n electrons (default 1)
 * @example
 * nernstSlopeV(25) // 0.0591593… V
 * nernstSlopeV(25, 2) // 0.0295797… V
 */
export function nernstSlopeV(tempC = STANDARD_TEMP_C, n = 1): number {
  const tempK = kelvinFromCelsius(tempC);
  if (!Number.isFinite(n) || n <= 0) {
    throw new EngineError('argument', `n (electrons) must be a positive number; got ${String(n)}.`, 'n');
  }
  const slope = (GAS_CONSTANT_J_PER_MOL_K * tempK * Math.LN10) / (n * FARADAY_C_PER_MOL);
  if (!Number.isFinite(slope)) {
    throw new EngineError(
      'range',
      `The Nernst slope for n = ${n} is beyond the number range; n is the electron count, e.g. 1 or 2.`,
      'n',
    );
  }
  return slope;
}

/** RT ln10 / F at a temperature in kelvin, without checks (hot paths). */
export function slopePerElectronAtKelvin(tempK: number): number {
  return (GAS_CONSTANT_J_PER_MOL_K * tempK * Math.LN10) / FARADAY_C_PER_MOL;
}
