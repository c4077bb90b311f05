/**
 * Species: a formula with a charge and a phase, as written in reactions, couples,
 * cell diagrams and species-name headers.
 *
 * Charge spellings read: `Fe3+`, `Fe+3`, `Fe+++`, `SO4^2-`, `SO4 2-`, `SO42-`,
 * `[Fe(CN)6]3-`, `Cu²⁺`, `SO₄²⁻`, the Unicode minus. Where one digit stands
 * between a formula and a single sign, it is the charge on a monatomic species
 * (`Fe3+`, `S2-`) and a subscript on a polyatomic one (`MnO4-`, `NH4+`); with two
 * or more digits the last is the charge (`SO42-`, `Hg22+`). Halide anions keep
 * the digit as a subscript (`I3-` is triiodide). The caret form is never ambiguous.
 * Phases `(s)`, `(l)`, `(g)`, `(aq)` (and `(cr)`); inline activities
 * `(aq, 0.1 M)`, `(g, 0.5 bar)`, `(0.01 M)`.
 */
import { EngineError, quote } from '../errors';
import { ATM_IN_BAR } from '../constants';
import { countElements, type ElementCounts } from './formula';
import { GAS_FORMULAS, LIQUID_FORMULAS, isElementSymbol, isMetal } from './elements';
import { SourceText } from './source';
import { ByteBoundedCache } from '../cacheRegistry';

export type Phase = 's' | 'l' | 'g' | 'aq';

/** A chemical species or the electron. Immutable; compare with {@link sameSpecies}. */
export interface Species {
  /** Formula without charge or phase, e.g. "SO4", "[Fe(CN)6]", "Fe"; "e" for the electron. */
  readonly formula: string;
  /** Charge number, e.g. 3 for Fe3+, −2 for SO4^2-, −1 for the electron. */
  readonly charge: number;
  /** The phase the user wrote, or null when none was written (see {@link phaseOf}). */
  readonly phase: Phase | null;
  /** True for the electron. */
  readonly isElectron: boolean;
}

/** An activity, concentration or pressure written inline, e.g. `Zn2+(aq, 0.1 M)`. */
export interface InlineActivity {
  /** The value as an activity (solutes, mol/L or mol/kg taken as ideal) or a pressure in bar. */
  readonly value: number;
  /** The unit as written ("M", "bar", "atm", … or "" for a bare number). */
  readonly unit: string;
  /** The number as written, before unit conversion (so canonical text keeps "10 µM"). */
  readonly amount: number;
}

export const ELECTRON: Species = Object.freeze({ formula: 'e', charge: -1, phase: null, isElectron: true });

const PHASE_ALIASES: Record<string, Phase> = {
  s: 's',
  cr: 's',
  c: 's',
  l: 'l',
  liq: 'l',
  g: 'g',
  gas: 'g',
  aq: 'aq',
};

/** Units accepted in inline activities and their factor to activity (or bar). */
const UNIT_FACTORS: Record<string, { factor: number; kind: 'solute' | 'gas' | 'any' }> = {
  '': { factor: 1, kind: 'any' },
  M: { factor: 1, kind: 'solute' },
  'mol/L': { factor: 1, kind: 'solute' },
  'mol/l': { factor: 1, kind: 'solute' },
  'mol/dm3': { factor: 1, kind: 'solute' },
  mM: { factor: 1e-3, kind: 'solute' },
  uM: { factor: 1e-6, kind: 'solute' },
  µM: { factor: 1e-6, kind: 'solute' },
  μM: { factor: 1e-6, kind: 'solute' },
  m: { factor: 1, kind: 'solute' },
  'mol/kg': { factor: 1, kind: 'solute' },
  bar: { factor: 1, kind: 'gas' },
  mbar: { factor: 1e-3, kind: 'gas' },
  atm: { factor: ATM_IN_BAR, kind: 'gas' },
  kPa: { factor: 0.01, kind: 'gas' },
  Pa: { factor: 1e-5, kind: 'gas' },
};

/** The inline-activity units the parser accepts, for messages and documentation. */
/**
 * The factor that turns an inline amount in `unit` into an activity (or a pressure in bar), as
 * the parser applies it; undefined for a unit it does not accept.
 *
 * @example
 * inlineUnitFactor('mM') // 0.001
 */
export function inlineUnitFactor(unit: string): number | undefined {
  return Object.prototype.hasOwnProperty.call(UNIT_FACTORS, unit) ? UNIT_FACTORS[unit]!.factor : undefined;
}

export const INLINE_UNITS: readonly string[] = Object.keys(UNIT_FACTORS).filter((u) => u !== '');

const elementCache = new ByteBoundedCache<ElementCounts>('elementCounts', {
  maxEntries: 4096,
  maxBytes: 8 * 1024 * 1024,
  // A formula's counts hold at most one entry per element symbol in it.
  sizeOf: (k, v) => 64 + 2 * k.length + 48 * (v as ElementCounts).size,
});

/**
 * Element counts of a species (empty for the electron). Cached by formula.
 *
 * @example
 * elementsOf(parseSpecies('SO4^2-')) // Map { 'S' => 1, 'O' => 4 }
 */
export function elementsOf(s: Species): ElementCounts {
  if (s.isElectron) return new Map();
  let c = elementCache.get(s.formula);
  if (!c) {
    c = countElements(s.formula);
    elementCache.set(s.formula, c);
  }
  return c;
}

/**
 * The phase of a species: as written, or inferred — ions aqueous, water and
 * mercury and bromine liquid, H2/O2/N2/Cl2/F2 (and other common gases) gas,
 * elements and metals solid, other neutral species aqueous.
 *
 * @example
 * phaseOf(parseSpecies('Zn')) // 's'
 */
export function phaseOf(s: Species): Phase | null {
  if (s.isElectron) return null;
  if (s.phase) return s.phase;
  if (s.charge !== 0) return 'aq';
  if (LIQUID_FORMULAS.has(s.formula)) return 'l';
  if (GAS_FORMULAS.has(s.formula)) return 'g';
  const els = elementsOf(s);
  if (els.size === 1) return 's'; // elements: metals, C, S, P, I2 …
  if (/[·*]/.test(s.formula)) return 's'; // hydrates: CuSO4·5H2O
  const symbols = Array.from(els.keys());
  // salts, oxides and hydroxides of metals: solid (AgCl, PbSO4, MnO2, Fe(OH)3, Hg2Cl2)
  if (symbols.some((el) => isMetal(el)) && !symbols.includes('H')) return 's';
  if (symbols.some((el) => isMetal(el)) && /\(OH\)\d*$/.test(s.formula)) return 's';
  return 'aq';
}

/** Identity key of a species ignoring phase: formula and charge. */
export function speciesKey(s: Species): string {
  return s.isElectron ? 'e' : `${s.formula}|${s.charge}`;
}

/**
 * Identity key including the effective phase ("Br2|0|l" vs "Br2|0|aq").
 */
export function speciesPhaseKey(s: Species): string {
  return `${speciesKey(s)}|${phaseOf(s) ?? ''}`;
}

/**
 * True where two species are the same: same formula and charge, and the same
 * phase where both were written explicitly (otherwise the effective phases).
 *
 * @example
 * sameSpecies(parseSpecies('Cu2+'), parseSpecies('Cu^2+(aq)')) // true
 */
export function sameSpecies(a: Species, b: Species): boolean {
  if (a.isElectron || b.isElectron) return a.isElectron === b.isElectron;
  if (a.formula !== b.formula || a.charge !== b.charge) return false;
  if (a.phase === null || b.phase === null) {
    // one side unspecified: match unless the inference contradicts an explicit phase
    return true;
  }
  return a.phase === b.phase;
}

/** True for species that are left out of Q at unit activity: pure solids, pure liquids, solvent water. */
export function isPureOrSolvent(s: Species): boolean {
  const p = phaseOf(s);
  return p === 's' || p === 'l';
}

/** True for a gas, whose value is a partial pressure in bar. */
export function isGas(s: Species): boolean {
  return phaseOf(s) === 'g';
}

function chargeText(charge: number): string {
  const sign = charge > 0 ? '+' : '-';
  const mag = Math.abs(charge);
  return mag === 1 ? sign : `${mag}${sign}`;
}

/**
 * Canonical text of a species: `Fe3+`, `MnO4-`, `SO4^2-`, `Hg2^2+`, `[Fe(CN)6]3-`,
 * `e-`; the phase appended where it was written (`AgCl(s)`). Always reads back to
 * the same species.
 *
 * @example
 * formatSpecies(parseSpecies('SO₄²⁻')) // 'SO4^2-'
 */
export function formatSpecies(s: Species, withPhase = true): string {
  if (s.isElectron) return 'e-';
  let core: string;
  if (s.charge === 0) core = s.formula;
  else {
    const short = s.formula + chargeText(s.charge);
    const back = readChargeSuffix(s.formula, chargeText(s.charge));
    const readable = Math.abs(s.charge) === 1 || !/\d$/.test(s.formula);
    core =
      readable && back && back.formula === s.formula && back.charge === s.charge
        ? short
        : `${s.formula}^${chargeText(s.charge)}`;
  }
  return withPhase && s.phase ? `${core}(${s.phase})` : core;
}

/**
 * Split "formula + digits + one sign" per the trailing-digit rule.
 * `body` is the formula text including any trailing digits; `signs` the sign text ("+", "2-", …).
 * Returns null where `signs` is not of that form.
 */
function readChargeSuffix(body: string, signs: string): { formula: string; charge: number } | null {
  const m = /^(\d*)([+-])$/.exec(signs);
  if (!m) return null;
  const sgn = m[2] === '+' ? 1 : -1;
  if (m[1] !== '') {
    // "Fe" + "3+" as the parser would read "Fe3+": the digits join the formula first
    const joined = body + m[1];
    const split = splitTrailingDigits(joined, sgn);
    return split ? { formula: split.formula, charge: split.mag * sgn } : { formula: joined, charge: sgn };
  }
  const split = splitTrailingDigits(body, sgn);
  return split ? { formula: split.formula, charge: split.mag * sgn } : { formula: body, charge: sgn };
}

/** Apply the trailing-digit rule; null where the digits (if any) stay subscripts. */
function splitTrailingDigits(body: string, sgn: number): { formula: string; mag: number } | null {
  // Step back over the trailing digits (a linear scan; no backtracking pattern).
  let cut = body.length;
  while (cut > 0 && isDigit(body.charCodeAt(cut - 1))) cut--;
  if (cut === body.length) return null;
  const head = body.slice(0, cut);
  const digits = body.slice(cut);
  if (head === '') return null;
  if (head.endsWith(']')) return { formula: head, mag: chargeMagnitude(digits) };
  if (digits.length >= 2) {
    return { formula: head + digits.slice(0, -1), mag: parseInt(digits.slice(-1), 10) };
  }
  const monatomic = /^[A-Z][a-z]?$/.test(head) && isElementSymbol(head);
  const halide = head === 'F' || head === 'Cl' || head === 'Br' || head === 'I';
  if (monatomic && !(halide && sgn < 0)) return { formula: head, mag: parseInt(digits, 10) };
  return null;
}

function isDigit(code: number): boolean {
  return code >= 48 && code <= 57;
}

/** A charge magnitude from its digits; longer runs than any charge read give a value past the limit. */
function chargeMagnitude(digits: string): number {
  return digits.length > 3 ? MAX_CHARGE + 1 : parseInt(digits, 10);
}

/** The largest charge number read (|z|); larger ones are refused as implausible. */
export const MAX_CHARGE = 12;

/**
 * Longest text between "(" and ")" read as a phase or inline amount ("(aq, 0.001 mol/kg)");
 * a longer group is a formula bracket. Bounding it keeps every scan of a group short.
 */
const MAX_PHASE_GROUP = 64;

/** A species read from text, with where it ended and any inline activity. */
export interface ScannedSpecies {
  species: Species;
  activity: InlineActivity | null;
  /** normalised index just past the species */
  end: number;
}

const FORMULA_CHAR = /[A-Za-z0-9()[\]·*]/;
const BOUNDARY = /[\s(),|/]/;

/**
 * Read one species starting at normalised index `i` of `src`.
 * Throws a positioned parse error where no species can be read.
 */
export function scanSpecies(src: SourceText, i: number, argument = 'reaction'): ScannedSpecies {
  const t = src.text;
  const start = i;
  // electron: "e", "e-", "e^-" not followed by a letter
  const el = /^e(\^?-(?!>))?(?![A-Za-z0-9(])/.exec(t.slice(i));
  if (el) {
    const end = i + el[0].length;
    return { species: ELECTRON, activity: null, end };
  }
  const first = t[i];
  if (first === undefined || !/[A-Z([]/.test(first)) {
    src.fail(
      i,
      first === undefined ? 'expected a species' : `expected a species, found "${first}"`,
      argument,
    );
  }
  // formula body: letters, digits, brackets — but stop before a phase group "(s)", "(aq, 0.1 M)"
  let j = i;
  while (j < t.length) {
    const ch = t[j] as string;
    if (ch === '(' && phaseGroupAt(t, j)) break;
    if (!FORMULA_CHAR.test(ch)) break;
    j++;
  }
  // brackets in the body must balance; a trailing ")" that closes nothing belongs to the caller
  j = balancedEnd(t, i, j);
  const body = t.slice(i, j);
  let charge = 0;
  let k = j;
  let formula = body;
  const rest = t.slice(k);
  let m: RegExpExecArray | null;
  if ((m = /^\^(?:(\d*)([+-])|([+-])(\d+))/.exec(rest))) {
    const mag =
      m[1] !== undefined ? (m[1] === '' ? 1 : chargeMagnitude(m[1])) : chargeMagnitude(m[4] as string);
    const sgn = (m[2] ?? m[3]) === '+' ? 1 : -1;
    charge = mag * sgn;
    k += m[0].length;
  } else if ((m = /^([+-])(\d+)(?=$|[\s(),|/])/.exec(rest))) {
    charge = chargeMagnitude(m[2] as string) * (m[1] === '+' ? 1 : -1);
    k += m[0].length;
  } else if ((m = /^(\+{2,}|-{2,})(?![->])/.exec(rest))) {
    charge = m[1]!.length * (m[1]!.startsWith('+') ? 1 : -1);
    k += m[0].length;
  } else if ((m = /^([+-])(?!>)/.exec(rest))) {
    const sgn = m[1] === '+' ? 1 : -1;
    const split = splitTrailingDigits(body, sgn);
    if (split) {
      formula = split.formula;
      charge = split.mag * sgn;
    } else charge = sgn;
    k += 1;
  } else if ((m = /^ +(\d+)([+-])(?=$|[\s(),|/])/.exec(rest))) {
    // "SO4 2-": a charge written after a space
    charge = chargeMagnitude(m[1] as string) * (m[2] === '+' ? 1 : -1);
    k += m[0].length;
  }
  if (Math.abs(charge) > MAX_CHARGE) {
    src.fail(
      j,
      `a charge larger than ${MAX_CHARGE} is not read (no ion carries one); check the charge`,
      argument,
    );
  }
  // validate the formula
  try {
    countElements(formula);
  } catch (e) {
    if (e instanceof EngineError && e.position !== undefined) {
      src.fail(start + e.position - 1, e.message.replace(/^Cannot read .* at character \d+: /, ''), argument);
    }
    throw e;
  }
  // phase / inline activity
  let phase: Phase | null = null;
  let activity: InlineActivity | null = null;
  if (t[k] === '(') {
    const g = phaseGroupAt(t, k);
    if (g) {
      if (g.phase) {
        const p = PHASE_ALIASES[g.phase];
        if (!p) src.fail(k + 1, `unknown phase "${g.phase}"; use s, l, g or aq`, argument);
        phase = p;
      }
      if (g.amount !== null) activity = readAmount(src, k + 1 + g.amountOffset, g.amount, argument);
      k += g.length;
    }
  }
  if (
    k < t.length &&
    !BOUNDARY.test(t[k] as string) &&
    t[k] !== '+' &&
    t[k] !== '-' &&
    t[k] !== '<' &&
    t[k] !== '=' &&
    t[k] !== ']'
  ) {
    src.fail(k, `unexpected "${t[k] as string}" after ${quote(t.slice(start, k))}`, argument);
  }
  const species: Species = Object.freeze({ formula, charge, phase, isElectron: false });
  return { species, activity, end: k };
}

/**
 * The end of the body [from, to) once the trailing ")" that close nothing are left to the
 * caller: the longest prefix ending where the text stops being ")" whose brackets balance.
 * One pass over the body (prefix bracket counts), however many ")" trail it.
 */
function balancedEnd(t: string, from: number, to: number): number {
  const n = to - from;
  // ok[k]: the prefix of length k never closes more than it opened; round/square: open counts.
  const round = new Int32Array(n + 1);
  const square = new Int32Array(n + 1);
  const ok = new Uint8Array(n + 1);
  ok[0] = 1;
  for (let k = 0; k < n; k++) {
    const ch = t[from + k];
    round[k + 1] = (round[k] as number) + (ch === '(' ? 1 : ch === ')' ? -1 : 0);
    square[k + 1] = (square[k] as number) + (ch === '[' ? 1 : ch === ']' ? -1 : 0);
    ok[k + 1] = ok[k] === 1 && (round[k + 1] as number) >= 0 && (square[k + 1] as number) >= 0 ? 1 : 0;
  }
  let len = n;
  while (len > 0 && t[from + len - 1] === ')' && !(ok[len] === 1 && round[len] === 0 && square[len] === 0))
    len--;
  return from + len;
}

/**
 * A parenthesised phase or amount at index `i`: "(s)", "(aq, 0.1 M)", "(0.5 bar)".
 */
function phaseGroupAt(
  t: string,
  i: number,
): { phase: string | null; amount: string | null; amountOffset: number; length: number } | null {
  // Look for the ")" only a short way ahead: a phase group is short, and this keeps a text
  // of many "(" linear.
  let close = -1;
  const last = Math.min(t.length, i + 1 + MAX_PHASE_GROUP);
  for (let k = i + 1; k < last; k++) {
    if (t[k] === ')') {
      close = k;
      break;
    }
    if (t[k] === '(') return null;
  }
  if (close < 0) return null;
  const inner = t.slice(i + 1, close);
  const withPhase = /^(\s*)([a-z]+)\s*(?:,(\s*)(.*?))?\s*$/.exec(inner);
  if (withPhase && PHASE_ALIASES[withPhase[2] as string] !== undefined) {
    const amount = withPhase[4] !== undefined ? withPhase[4] : null;
    const amountOffset = amount === null ? 0 : inner.indexOf(',') + 1 + (withPhase[3]?.length ?? 0);
    return { phase: withPhase[2] as string, amount, amountOffset, length: close - i + 1 };
  }
  const bare = /^(\s*)([0-9.]+(?:[eE][+-]?\d+)?\s*[A-Za-zµμ/0-9]*)\s*$/.exec(inner);
  if (bare && /^\s*[0-9.]/.test(inner)) {
    return {
      phase: null,
      amount: bare[2] as string,
      amountOffset: bare[1]?.length ?? 0,
      length: close - i + 1,
    };
  }
  return null;
}

function readAmount(src: SourceText, at: number, text: string, argument: string): InlineActivity {
  const m = /^([0-9]*\.?[0-9]+(?:[eE][+-]?\d+)?)\s*(.*)$/.exec(text.trim());
  if (!m) src.fail(at, `expected an amount such as "0.1 M" or "0.5 bar", found ${quote(text)}`, argument);
  const value = parseFloat(m[1] as string);
  const unit = (m[2] as string).trim();
  const u = UNIT_FACTORS[unit];
  if (!u) src.fail(at, `unknown unit "${unit}"; use one of ${INLINE_UNITS.join(', ')}`, argument);
  if (!(value > 0) || !Number.isFinite(value))
    src.fail(at, `an activity or pressure must be positive; got ${m[1] as string}`, argument);
  return { value: value * u.factor, unit, amount: value };
}

/**
 * Parse one species from text ("Fe3+", "SO4^2-", "H2(g)", "left:Ag+" is handled by callers).
 *
 * @param argument the argument name for error messages
 * @throws EngineError (`parse`) where the text is not exactly one species
 * @example
 * parseSpecies('Cu²⁺') // { formula: 'Cu', charge: 2, phase: null, isElectron: false }
 */
export function parseSpecies(text: string, argument = 'species'): Species {
  return parseSpeciesWithActivity(text, argument).species;
}

/** Parse one species that may carry an inline activity ("Zn2+(aq, 0.1 M)"). */
export function parseSpeciesWithActivity(
  text: string,
  argument = 'species',
): { species: Species; activity: InlineActivity | null } {
  const src = new SourceText(text);
  let i = 0;
  while (src.text[i] === ' ') i++;
  if (i >= src.text.length) {
    throw new EngineError('parse', `${argument} is empty: give a species such as "Cu2+".`, argument);
  }
  const r = scanSpecies(src, i, argument);
  let k = r.end;
  while (src.text[k] === ' ') k++;
  if (k < src.text.length) src.fail(k, `unexpected "${src.text[k] as string}" after the species`, argument);
  return { species: r.species, activity: r.activity };
}
