/**
 * Parameter kinds: what each kind of argument holds, its unit, its default domain, whether it
 * varies per case, and the one reader that turns a cell into a typed, checked value
 * (docs/design.md, "Argument kinds"). Every function reads every argument through here, so a
 * temperature is checked in one place, a potential gets the same unit-slip hint everywhere,
 * and number text is read by one rule (args.ts `readNumber`).
 */
import { EngineError, STANDARD_TEMP_C, ZERO_CELSIUS_K } from '../../engine';
import { isInputErrorText } from '../cellTypes';
import { isBlank, readElectrons, readNumber, readText, readOptionalText } from '../args';
import type { KindName, NumericDomain, ParamSpec, PotentialV, TempC } from './types';

export type { KindName } from './types';

export type { PotentialV, TempC } from './types';

/** The aqueous range of the data behind the temperature-dependent functions, °C. */
export const AQUEOUS_TEMP_RANGE_C = { min: 0, max: 100 } as const;
/** The range of a purely physical formula (the Nernst slope): above absolute zero, °C. */
export const PHYSICAL_TEMP_DOMAIN: NumericDomain = { min: -ZERO_CELSIUS_K, minExclusive: true, max: 10000 };
/** Beyond this magnitude a potential is taken for millivolts typed as volts (common practice). */
export const MAX_POTENTIAL_V = 10;

/** How an argument is laid out. */
export type KindShape = 'cell' | 'header' | 'values' | 'table' | 'list';

/** What a kind reads into. */
export type KindValue = 'number' | 'text' | 'choice' | 'flag' | 'none';

export interface KindDef {
  /** Unit shown in the docs and messages ('' where dimensionless). */
  readonly unit: string;
  /** What to give, for messages and docs ("a temperature in °C"). */
  readonly noun: string;
  readonly shape: KindShape;
  readonly value: KindValue;
  /** Whether one cell or a column of cases may be given (cell kinds). */
  readonly perCase: boolean;
  readonly domain?: NumericDomain;
  /** One line for the docs' table of kinds. */
  readonly about: string;
}

const num = (
  unit: string,
  noun: string,
  about: string,
  domain?: NumericDomain,
  perCase = true,
): KindDef => ({ unit, noun, shape: 'cell', value: 'number', perCase, domain, about });
const text = (noun: string, about: string, perCase = true): KindDef => ({
  unit: '',
  noun,
  shape: 'cell',
  value: 'text',
  perCase,
  about,
});

/** Every parameter kind. */
export const KINDS = {
  reaction: text(
    'a half-reaction, couple, cell diagram or reaction',
    'Half-reaction (a reduction), couple such as "Cu2+/Cu", IUPAC cell diagram or full reaction (docs/notation.md).',
  ),
  reactionOrPotential: {
    ...text(
      'a reaction or a potential in volts',
      'A reaction, couple or cell (E° and n from the table), or a potential in V (then n is needed).',
    ),
  },
  species: text('a species name such as "Cu2+"', 'One species name, e.g. "Cu2+" or "left:Ag+" (docs/notation.md).'),
  speciesHeader: {
    unit: '',
    noun: 'species names such as "Cu2+" or "pH"',
    shape: 'header',
    value: 'none',
    perCase: false,
    about: 'Names heading the columns of values: species (`Cu2+`), `pH`, side-qualified `left:Ag+` / `l:Ag+`; one row or one column.',
  },
  values: {
    unit: 'mol/L, bar',
    noun: 'one value per species and one row per case',
    shape: 'values',
    value: 'none',
    perCase: true,
    about: 'A matrix: one column per species header, one row per case (or a single row for one case).',
  },
  temperature: num(
    '°C',
    'a temperature in °C',
    'Temperature in °C; default 25; 0–100 °C for aqueous data; a value that looks like kelvin gets a hint.',
    AQUEOUS_TEMP_RANGE_C,
  ),
  potential: num(
    'V',
    'a potential in volts',
    'Potential in V; beyond ±10 V a "millivolts typed as volts?" hint unless the function allows it.',
  ),
  activity: num('', 'an activity (mol/L for solutes, bar for gases)', 'Activity (solutes mol/L, gases bar); ≥ 0.', {
    min: 0,
  }),
  molality: num('mol/kg', 'a molality in mol/kg', 'Molality in mol/kg; ≥ 0.', { min: 0 }),
  molarity: num('mol/L', 'a concentration in mol/L', 'Concentration in mol/L; ≥ 0.', { min: 0 }),
  ionicStrength: num('mol/kg', 'an ionic strength in mol/kg', 'Ionic strength in mol/kg; ≥ 0.', { min: 0 }),
  currentDensity: num('A/m²', 'a current density', 'Current density (unit in the parameter name where it differs).'),
  current: num('A', 'a current in A', 'Current in A.'),
  charge: num('C', 'a charge in coulombs', 'Charge in C; ≥ 0.', { min: 0 }),
  mass: num('g', 'a mass', 'Mass (unit in the parameter name where it differs); > 0.', { min: 0, minExclusive: true }),
  length: num('µm', 'a length', 'Length (unit in the parameter name where it differs); > 0.', {
    min: 0,
    minExclusive: true,
  }),
  time: num('s', 'a time in seconds', 'Time in s; ≥ 0.', { min: 0 }),
  fraction: num('', 'a fraction between 0 and 1', 'Fraction or efficiency in (0, 1].', {
    min: 0,
    minExclusive: true,
    max: 1,
  }),
  count: num('', 'a positive whole number', 'A positive whole number.', { min: 1, integer: true }),
  electrons: num('', 'the electrons transferred', 'Electron count n; blank or 0 means "from the reaction".', {
    min: 0,
    minExclusive: true,
    integer: true,
  }),
  number: num('', 'a number', 'A finite number.'),
  pH: num('', 'a pH', 'pH, −2 to 16.', { min: -2, max: 16 }),
  ionSize: num('Å', 'an ion size in Å', 'Ion-size parameter å in Å; > 0.', { min: 0, minExclusive: true }),
  choice: text('one of the listed choices', 'One of a fixed list of words (case-insensitive).'),
  text: text('text', 'Free text.'),
  reference: text('a reference electrode name such as "SCE"', 'A reference electrode name (docs/functions/VSREF.md).'),
  salt: text('a salt formula such as "NaCl"', 'A salt formula, e.g. "NaCl" or "CaCl2".'),
  element: text('an element symbol such as "Fe"', 'An element symbol, e.g. "Fe".'),
  flag: {
    unit: '',
    noun: 'TRUE or FALSE',
    shape: 'cell',
    value: 'flag',
    perCase: false,
    about: 'TRUE or FALSE (1 or 0); blank means the default.',
  },
  table: {
    unit: '',
    noun: 'your potentials range (half-reaction | E° | dE°/dT | source)',
    shape: 'table',
    value: 'none',
    perCase: false,
    about: 'Your potentials range: half-reaction | E° (V) | dE°/dT (mV/K) | source; the built-in table where omitted.',
  },
  numberList: {
    unit: '',
    noun: 'one row or one column of numbers',
    shape: 'list',
    value: 'none',
    perCase: false,
    about: 'One row or one column of numbers.',
  },
} as const satisfies Record<KindName, KindDef>;

/** The kind definition of a parameter. */
export function kindOf(p: ParamSpec): KindDef {
  return KINDS[p.kind];
}

/** The unit of a parameter (its own, else its kind's). */
export function unitOf(p: ParamSpec): string {
  return p.unit ?? kindOf(p).unit;
}

/** Whether a parameter varies per case. */
export function isPerCase(p: ParamSpec): boolean {
  return p.perCase ?? kindOf(p).perCase;
}

/** The domain a parameter is checked against. */
export function domainOf(p: ParamSpec): NumericDomain | undefined {
  return p.domain ?? kindOf(p).domain;
}

/** What to give, for a message about this parameter. */
export function nounOf(p: ParamSpec): string {
  return p.noun ?? kindOf(p).noun;
}

/** The engine's minus sign for messages. */
function fmt(x: number): string {
  return String(x).replace(/^-/, '−');
}

/** "0–100 °C", "> 0", "(0, 1]" — a domain in words, for messages and docs. */
export function describeDomain(d: NumericDomain, unit: string): string {
  const u = unit ? ` ${unit}` : '';
  const parts: string[] = [];
  if (d.min !== undefined && d.max !== undefined && !d.minExclusive && !d.maxExclusive)
    parts.push(`${fmt(d.min)}–${fmt(d.max)}${u}`);
  else {
    if (d.min !== undefined) parts.push(`${d.minExclusive ? '>' : '≥'} ${fmt(d.min)}${u}`);
    if (d.max !== undefined) parts.push(`${d.maxExclusive ? '<' : '≤'} ${fmt(d.max)}${u}`);
  }
  if (d.integer) parts.push('whole');
  if (d.nonZero) parts.push('not 0');
  return parts.join(', ');
}

/**
 * An error in an input cell (its code text): propagates to the case that reads it, `#N/A` as
 * `#N/A`, any other code as `#VALUE!`, with a message naming the argument (docs/design.md,
 * "Errors").
 */
export function inputErrorOf(label: string, code: string): EngineError {
  return new EngineError(
    code === '#N/A' ? 'notFound' : 'argument',
    `${label} holds the error ${code} from its cell: fix that cell (or the formula that gives it) first.`,
    label,
  );
}

/** A domain as the message says it: "between 0 and 100 °C", "≥ 0 mol/kg", "> 0 and ≤ 1". */
function domainWords(d: NumericDomain, unit: string): string {
  const u = unit ? ` ${unit}` : '';
  if (d.min !== undefined && d.max !== undefined && !d.minExclusive && !d.maxExclusive)
    return `between ${fmt(d.min)} and ${fmt(d.max)}${u}`;
  const parts: string[] = [];
  if (d.min !== undefined) parts.push(`${d.minExclusive ? '>' : '≥'} ${fmt(d.min)}${u}`);
  if (d.max !== undefined) parts.push(`${d.maxExclusive ? '<' : '≤'} ${fmt(d.max)}${u}`);
  return parts.join(' and ');
}

function outside(p: ParamSpec, x: number, d: NumericDomain, unit: string, hint = ''): EngineError {
  return new EngineError(
    'argument',
    `${p.name} must be ${domainWords(d, unit)}; got ${String(x)}${unit ? ` ${unit}` : ''}${hint}.`,
    p.name,
  );
}

function checkDomain(p: ParamSpec, x: number, d: NumericDomain | undefined, unit: string): void {
  if (!d) return;
  const low = d.min !== undefined && (d.minExclusive ? !(x > d.min) : !(x >= d.min));
  const high = d.max !== undefined && (d.maxExclusive ? !(x < d.max) : !(x <= d.max));
  if (low || high) throw outside(p, x, d, unit);
  if (d.integer && !Number.isInteger(x))
    throw new EngineError('argument', `${p.name} must be a whole number; got ${String(x)}.`, p.name);
  if (d.nonZero && x === 0) throw new EngineError('argument', `${p.name} must not be 0.`, p.name);
}

/**
 * The one temperature check (docs/design.md, "Argument kinds"): above absolute zero, inside the
 * parameter's domain (0–100 °C for aqueous data unless extrapolation is allowed), with a hint
 * where the value looks like kelvin.
 *
 * @example
 * readTempC(null, { name: 'temp_C', kind: 'temperature', description: '' }) // 25
 */
export function readTempC(v: unknown, p: ParamSpec, extrapolate = false): TempC {
  const dflt = typeof p.default === 'number' ? p.default : STANDARD_TEMP_C;
  const t = readNumber(v, p.name, dflt, '°C');
  if (!(t > -ZERO_CELSIUS_K)) {
    throw new EngineError(
      'argument',
      `${p.name} must be above absolute zero (−273.15 °C); got ${String(t)} °C. Give the temperature in degrees Celsius.`,
      p.name,
    );
  }
  const d = extrapolate ? PHYSICAL_TEMP_DOMAIN : (domainOf(p) ?? PHYSICAL_TEMP_DOMAIN);
  const low = d.min !== undefined && (d.minExclusive ? !(t > d.min) : !(t >= d.min));
  const high = d.max !== undefined && !(t <= d.max);
  if (low || high) {
    const asC = t - ZERO_CELSIUS_K;
    const looksKelvin =
      high && d.max !== undefined && asC >= (d.min ?? -Infinity) && asC <= d.max && t >= ZERO_CELSIUS_K;
    const hint = looksKelvin
      ? `: it looks like a temperature in kelvin; give it in °C (${String(t)} K is ${fmt(Math.round(asC * 100) / 100)} °C)`
      : d === AQUEOUS_TEMP_RANGE_C
        ? `, outside the aqueous range of the data${p.extrapolateParam ? `; set ${p.extrapolateParam} to TRUE to extrapolate` : ''}`
        : '';
    throw outside(p, t, d, '°C', hint);
  }
  return t as TempC;
}

/**
 * The one potential check: a finite number of volts, with a "millivolts typed as volts?" hint
 * beyond ±10 V unless the parameter allows it.
 *
 * @example
 * readPotentialV(0.241, { name: 'potential', kind: 'potential', description: '' }) // 0.241
 */
export function readPotentialV(v: unknown, p: ParamSpec): PotentialV {
  const e = readNumber(v, p.name, typeof p.default === 'number' ? p.default : undefined, 'V');
  if (!p.allowBeyond10V && Math.abs(e) > MAX_POTENTIAL_V) {
    throw new EngineError(
      'argument',
      `${p.name} of ${String(e)} V is beyond ±${MAX_POTENTIAL_V} V: were millivolts typed as volts? Give ${String(e / 1000)} for ${String(e)} mV.`,
      p.name,
    );
  }
  return e as PotentialV;
}

/** Read a number of any numeric kind (null where blank without a default). */
export function readNumberOf(v: unknown, p: ParamSpec, extrapolate = false): number | null {
  if (isInputErrorText(v)) throw inputErrorOf(p.name, String(v));
  if (p.kind === 'temperature') return readTempC(v, p, extrapolate);
  const dflt = typeof p.default === 'number' ? p.default : undefined;
  if (p.kind === 'electrons') {
    if (isBlank(v) || v === 0) return dflt ?? null;
    const d = domainOf(p);
    if (d === KINDS.electrons.domain) return readElectrons(v, p.name);
    const x = readNumber(v, p.name);
    checkDomain(p, x, d, '');
    return x;
  }
  if (isBlank(v) && dflt === undefined) return null;
  if (p.kind === 'potential') return readPotentialV(v, p);
  const unit = unitOf(p);
  const x = readNumber(v, p.name, dflt, unit);
  checkDomain(p, x, domainOf(p), unit);
  return x;
}

/** Read text of any text kind (null where blank without a default). */
export function readTextOf(v: unknown, p: ParamSpec): string | null {
  if (isInputErrorText(v)) throw inputErrorOf(p.name, String(v));
  const dflt = typeof p.default === 'string' ? p.default : undefined;
  if (p.optional) {
    const t = readOptionalText(v, p.name, nounOf(p));
    return t ?? dflt ?? null;
  }
  return readText(v, p.name, dflt, nounOf(p));
}

/** Read a TRUE/FALSE flag: booleans, 1/0, "TRUE"/"FALSE"; blank gives the default. */
export function readFlag(v: unknown, p: ParamSpec): boolean {
  if (isInputErrorText(v)) throw inputErrorOf(p.name, String(v));
  if (isBlank(v)) return p.default === true;
  if (typeof v === 'boolean') return v;
  if (v === 1 || v === 0) return v === 1;
  if (typeof v === 'string' && /^(true|false)$/i.test(v.trim())) return /^true$/i.test(v.trim());
  throw new EngineError('argument', `${p.name} must be TRUE or FALSE; got ${JSON.stringify(v)}.`, p.name);
}
