/**
 * Exact rational numbers on bigint, for stoichiometry (balancing and balance
 * checks never use a float tolerance).
 */
import { EngineError } from './errors';

/** A rational number num/den in lowest terms with den > 0. */
export interface Rational {
  readonly num: bigint;
  readonly den: bigint;
}

function gcdBig(a: bigint, b: bigint): bigint {
  a = a < 0n ? -a : a;
  b = b < 0n ? -b : b;
  while (b !== 0n) {
    const t = a % b;
    a = b;
    b = t;
  }
  return a;
}

/**
 * Greatest common divisor of two bigints (non-negative result).
 *
 * @example
 * gcd(12n, 18n) // 6n
 */
export function gcd(a: bigint, b: bigint): bigint {
  return gcdBig(a, b);
}

/**
 * Least common multiple of two positive bigints.
 *
 * @example
 * lcm(2n, 3n) // 6n
 */
export function lcm(a: bigint, b: bigint): bigint {
  if (a === 0n || b === 0n) return 0n;
  const g = gcdBig(a, b);
  const r = (a / g) * b;
  return r < 0n ? -r : r;
}

/**
 * Make a rational in lowest terms.
 *
 * @example
 * rat(2n, 4n) // { num: 1n, den: 2n }
 */
export function rat(num: bigint, den: bigint = 1n): Rational {
  if (den === 0n) throw new EngineError('argument', 'Division by zero in exact arithmetic.');
  if (den < 0n) {
    num = -num;
    den = -den;
  }
  const g = gcdBig(num, den);
  if (g > 1n) {
    num /= g;
    den /= g;
  }
  return { num, den };
}

export const ZERO: Rational = { num: 0n, den: 1n };
export const ONE: Rational = { num: 1n, den: 1n };

/** Rational from a JS integer. */
export function ratInt(n: number): Rational {
  return { num: BigInt(n), den: 1n };
}

/**
 * Parse a decimal or fraction text exactly ("2", "0.5", "1/2", "1.25").
 *
 * @returns the rational, or null where the text is not such a number
 * @example
 * parseRational('0.25') // { num: 1n, den: 4n }
 */
export function parseRational(text: string): Rational | null {
  const frac = /^(\d+)\/(\d+)$/.exec(text);
  if (frac) {
    const d = BigInt(frac[2] as string);
    if (d === 0n) return null;
    return rat(BigInt(frac[1] as string), d);
  }
  const dec = /^(\d*)(?:\.(\d+))?$/.exec(text);
  if (!dec || text === '' || text === '.') return null;
  const intPart = dec[1] ?? '';
  const fracPart = dec[2] ?? '';
  if (intPart === '' && fracPart === '') return null;
  const den = 10n ** BigInt(fracPart.length);
  return rat(BigInt((intPart || '0') + fracPart), den);
}

export const add = (a: Rational, b: Rational): Rational => rat(a.num * b.den + b.num * a.den, a.den * b.den);
export const sub = (a: Rational, b: Rational): Rational => rat(a.num * b.den - b.num * a.den, a.den * b.den);
export const mul = (a: Rational, b: Rational): Rational => rat(a.num * b.num, a.den * b.den);
export const div = (a: Rational, b: Rational): Rational => {
  if (b.num === 0n) throw new EngineError('argument', 'Division by zero in exact arithmetic.');
  return rat(a.num * b.den, a.den * b.num);
};
export const neg = (a: Rational): Rational => ({ num: -a.num, den: a.den });
export const isZero = (a: Rational): boolean => a.num === 0n;
export const eq = (a: Rational, b: Rational): boolean => a.num === b.num && a.den === b.den;
export const sign = (a: Rational): number => (a.num > 0n ? 1 : a.num < 0n ? -1 : 0);
export const absR = (a: Rational): Rational => (a.num < 0n ? neg(a) : a);
export const toNumber = (a: Rational): number => Number(a.num) / Number(a.den);
export const isInteger = (a: Rational): boolean => a.den === 1n;

/**
 * Text of a rational: "2", "-1/2".
 *
 * @example
 * formatRational(rat(1n, 2n)) // '1/2'
 */
export function formatRational(a: Rational): string {
  return a.den === 1n ? a.num.toString() : `${a.num.toString()}/${a.den.toString()}`;
}
