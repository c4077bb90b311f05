/**
 * Element counts of a chemical formula (without charge or phase):
 * "Fe(OH)3", "[Fe(CN)6]", "CuSO4·5H2O", "Hg2Cl2".
 */
import { EngineError, quote } from '../errors';
import { isElementSymbol } from './elements';

/** Element symbol → number of atoms (integers). */
export type ElementCounts = ReadonlyMap<string, number>;

/** The deepest nesting of brackets (and hydrate dots) read in one formula. */
export const MAX_FORMULA_NESTING = 32;

/**
 * The largest atom count read: a subscript, a multiplier or a total of one element.
 * Counts stay exact integers below it; a larger one is refused, never rounded.
 */
export const MAX_ATOM_COUNT = Number.MAX_SAFE_INTEGER;

/**
 * Count the atoms of each element in a formula.
 *
 * Domain: element symbols (case-sensitive), integer subscripts, nested (), [] and
 * hydrate dots (·, *) with an optional integer multiplier.
 *
 * @param formula the formula text, e.g. "Fe(OH)3"
 * @param offset  where the formula starts in the user's text (for error positions)
 * @param fullText the user's whole text (for error messages)
 * @throws EngineError (`parse`) for unknown element symbols or unbalanced brackets
 * @example
 * countElements('Fe(OH)3') // Map { 'Fe' => 1, 'O' => 3, 'H' => 3 }
 */
export function countElements(formula: string, offset = 0, fullText = formula): ElementCounts {
  let i = 0;
  const fail = (what: string, at: number): never => {
    throw new EngineError(
      'parse',
      `Cannot read ${quote(fullText)} at character ${offset + at + 1}: ${what}`,
      undefined,
      offset + at + 1,
    );
  };
  const tooLarge = (at: number): never =>
    fail(
      `an atom count above ${MAX_ATOM_COUNT.toLocaleString('en-US')} is not read (it could not stay exact); check the subscripts`,
      at,
    );
  const readInt = (): number | null => {
    const start = i;
    while (i < formula.length && formula.charCodeAt(i) >= 48 && formula.charCodeAt(i) <= 57) i++;
    if (i === start) return null;
    const digits = formula.slice(start, i);
    const n = digits.length > 16 ? Infinity : Number(digits);
    if (!(n <= MAX_ATOM_COUNT)) tooLarge(start);
    return n;
  };
  const addCount = (into: Map<string, number>, el: string, n: number, at: number) => {
    const total = (into.get(el) ?? 0) + n;
    if (!(total <= MAX_ATOM_COUNT)) tooLarge(at);
    into.set(el, total);
  };
  const addTo = (into: Map<string, number>, from: ReadonlyMap<string, number>, times: number, at: number) => {
    for (const [el, c] of from) {
      const n = c * times;
      if (!(n <= MAX_ATOM_COUNT)) tooLarge(at);
      addCount(into, el, n, at);
    }
  };
  let depth = 0;
  const parseGroup = (closer: string | null): Map<string, number> => {
    // The formula itself is level 0; each bracket (or hydrate part) one more.
    if (++depth > MAX_FORMULA_NESTING + 1) {
      fail(`brackets nested deeper than ${MAX_FORMULA_NESTING} levels are not read`, i);
    }
    const counts = new Map<string, number>();
    let sawItem = false;
    while (i < formula.length) {
      const ch = formula[i] as string;
      if (ch === '(' || ch === '[') {
        const close = ch === '(' ? ')' : ']';
        const start = i;
        const roman = /^\((I{1,3}|IV|VI{0,3}|IX)\)/.exec(formula.slice(i));
        if (roman) {
          fail(
            `"${roman[0]}" looks like an oxidation state in Roman numerals, which is not read; write the ion with its charge, e.g. "Fe3+" for iron(III)`,
            start,
          );
        }
        i++;
        const inner = parseGroup(close);
        if (formula[i] !== close) fail(`"${ch}" opened here is not closed`, start);
        i++;
        const timesAt = i;
        const times = readInt() ?? 1;
        addTo(counts, inner, times, timesAt);
        sawItem = true;
      } else if (ch === ')' || ch === ']') {
        if (closer === ch) break;
        fail(`unexpected "${ch}"`, i);
      } else if (/[A-Z]/.test(ch)) {
        const start = i;
        let sym = ch;
        i++;
        const next = formula[i];
        if (next !== undefined && /[a-z]/.test(next) && isElementSymbol(sym + next)) {
          sym += next;
          i++;
        } else if (!isElementSymbol(sym)) {
          fail(`"${sym}${next && /[a-z]/.test(next) ? next : ''}" is not an element symbol`, start);
        }
        const nAt = i;
        const n = readInt() ?? 1;
        addCount(counts, sym, n, nAt);
        sawItem = true;
        if (formula[i] !== undefined && /[a-z]/.test(formula[i] as string)) {
          fail(
            `"${sym}${formula.slice(i).match(/^[a-z]+/)?.[0] ?? ''}" is not an element symbol (symbols are one capital letter and at most one small letter)`,
            start,
          );
        }
      } else if (ch === '·' || ch === '*') {
        if (closer !== null) fail(`"${ch}" inside brackets`, i);
        if (!sawItem) fail(`expected a formula before "${ch}"`, i);
        i++;
        const timesAt = i;
        const times = readInt() ?? 1;
        const start = i;
        const part = parseGroup(null);
        if (part.size === 0) fail(`expected a formula after "${ch}"`, start);
        addTo(counts, part, times, timesAt);
      } else if (/[a-z]/.test(ch)) {
        fail(`element symbols start with a capital letter ("${ch}")`, i);
      } else {
        fail(`unexpected "${ch}" in a formula`, i);
      }
    }
    if (!sawItem) fail('expected an element symbol', i);
    depth--;
    return counts;
  };
  if (formula.length === 0) fail('expected a formula', 0);
  const result = parseGroup(null);
  if (i < formula.length) fail(`unexpected "${formula[i] as string}"`, i);
  return result;
}
