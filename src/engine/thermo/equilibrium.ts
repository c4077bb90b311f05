/**
 * Equilibrium constants and Gibbs energies from standard potentials:
 *   log10 K = n F E° / (RT ln10),   ΔG = −n F E.
 * K itself is returned only where it is a float64; beyond, a range error carries
 * its value as mantissa × 10^exponent, computed from log10 K.
 */
import { EngineError } from '../errors';
import { FARADAY_C_PER_MOL, kelvinFromCelsius, slopePerElectronAtKelvin } from '../constants';

/**
 * Check an electron count: finite, positive, an integer.
 *
 * @example
 * checkElectrons(2) // 2
 */
export function checkElectrons(n: number, argName = 'n'): number {
  if (!Number.isFinite(n) || n <= 0) {
    throw new EngineError(
      'argument',
      `${argName} (electrons transferred) must be a positive whole number; got ${String(n)}.`,
      argName,
    );
  }
  if (!Number.isInteger(n)) {
    throw new EngineError(
      'argument',
      `${argName} (electrons transferred) must be a whole number; got ${n}. Balance the reaction with whole coefficients.`,
      argName,
    );
  }
  return n;
}

/**
 * A result that overflowed float64 is a range error, never ±Infinity.
 *
 * @example
 * finiteResult(1, 'E') // 1
 */
export function finiteResult(x: number, what: string): number {
  if (!Number.isFinite(x)) {
    throw new EngineError(
      'range',
      `${what} is beyond the number range (the inputs are far outside any real system); check them.`,
    );
  }
  return x;
}

function checkPotential(e: number, argName: string): number {
  if (!Number.isFinite(e))
    throw new EngineError('argument', `${argName} must be a potential in volts; got ${String(e)}.`, argName);
  return e;
}

/**
 * log10 K from a standard potential and electron count.
 *
 * Domain: any finite E° (V), n a positive integer, temp_C > −273.15. Precision: float64.
 * @example
 * log10EquilibriumConstant(0.291, 2) // 9.838 (Sn + 2 Cu2+ ⇌ Sn2+ + 2 Cu+)
 */
export function log10EquilibriumConstant(e0V: number, n: number, tempC = 25): number {
  checkPotential(e0V, 'E0');
  checkElectrons(n);
  return finiteResult((n * e0V) / slopePerElectronAtKelvin(kelvinFromCelsius(tempC)), 'log10 K');
}

/** The largest log10 K whose K is a float64 (log10 of 1.7976931348623157e308). */
export const MAX_LOG10_K = Math.log10(Number.MAX_VALUE);
/** The smallest log10 K whose K is a normal float64. */
export const MIN_LOG10_K = Math.log10(2.2250738585072014e-308);

/**
 * 10^x in exponential notation with 5 significant digits ("1.3802e+676"), for any
 * finite x, including far beyond the float64 range: exponent = floor(x), mantissa =
 * 10^(x − exponent). x − floor(x) is exact in float64, so the mantissa is 10^frac of the
 * given x to within an ulp or two, well inside its 5 digits. Where |x| ≥ 1e21 (x is a
 * whole number far beyond any real system) the value is written as 10^x.
 *
 * @example
 * exponentialOfLog10(676.1398) // '1.3802e+676'
 */
export function exponentialOfLog10(x: number): string {
  if (Math.abs(x) >= 1e21) return `10^${x.toExponential(4)}`;
  let exponent = Math.floor(x);
  let mantissa = Math.pow(10, x - exponent).toFixed(4);
  if (mantissa === '10.0000') {
    mantissa = '1.0000';
    exponent += 1;
  }
  return `${mantissa}e${exponent < 0 ? '-' : '+'}${Math.abs(exponent)}`;
}

/**
 * K = 10^(log10 K), where it is representable.
 *
 * @throws EngineError (`range`) where K is above 1.8e308 or below 2.2e-308, with its value in the message
 * @example
 * equilibriumConstantFromLog10(9.838) // 6.89e9
 */
export function equilibriumConstantFromLog10(log10K: number): number {
  if (Number.isNaN(log10K)) {
    throw new EngineError('argument', 'log10 K is not a number; check E° and n.', 'reaction_or_E0');
  }
  const k = Math.pow(10, log10K);
  if (!Number.isFinite(k) || log10K > MAX_LOG10_K || log10K < MIN_LOG10_K) {
    if (!Number.isFinite(log10K)) {
      throw new EngineError(
        'range',
        `log10 K is ${log10K > 0 ? '+' : '−'}∞; check E° and n.`,
        'reaction_or_E0',
      );
    }
    const value = exponentialOfLog10(log10K);
    throw new EngineError(
      'range',
      `K = ${value} is outside the spreadsheet's number range (about 2.2e-308 to 1.8e308); log10 K = ${log10K.toFixed(4)}.`,
      'reaction_or_E',
      undefined,
      'logForm',
    );
  }
  return k;
}

/**
 * ΔG = −n F E in kJ/mol (ΔG° where E is a standard potential).
 *
 * @example
 * gibbsEnergyKJ(0.434, 2) // −83.75 kJ/mol
 */
export function gibbsEnergyKJ(eV: number, n: number): number {
  checkPotential(eV, 'E');
  checkElectrons(n);
  return finiteResult((-n * FARADAY_C_PER_MOL * eV) / 1000, 'ΔG');
}

/**
 * E° of a couple obtained by chaining steps: Σ nᵢEᵢ / Σ nᵢ (Gibbs energies add).
 *
 * Domain: equal-length lists, each n a positive integer.
 * @example
 * combineStepPotentialsV([0.771, -0.447], [1, 2]) // Fe3+/Fe: −0.041 V
 */
export function combineStepPotentialsV(potentialsV: readonly number[], electrons: readonly number[]): number {
  if (potentialsV.length !== electrons.length) {
    throw new EngineError(
      'shape',
      `potentials has ${potentialsV.length} values but electrons has ${electrons.length}; give one electron count per step.`,
      'electrons',
    );
  }
  if (potentialsV.length === 0)
    throw new EngineError('argument', 'potentials is empty: give the E° of each step.', 'potentials');
  let num = 0;
  let den = 0;
  potentialsV.forEach((e, i) => {
    checkPotential(e, 'potentials');
    const n = checkElectrons(electrons[i]!, 'electrons');
    num += n * e;
    den += n;
  });
  return finiteResult(num / den, 'the combined E°');
}
