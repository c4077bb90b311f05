/**
 * The case series' logic (a column of what-if cases of one reaction: one quantity
 * varied, the others fixed), without DOM or Office: reading the form, checking the
 * reaction with the engine, and laying out the case-series sheet. The pane's preview of
 * the values goes through the catalogue (seriesPreview.ts), never through the engine
 * directly, so that it computes exactly what the sheet formula computes.
 *
 * Sheet layout (row numbers fixed, columns depend on the number of species S):
 *
 *   A1 Reaction   B1 the reaction text (the formula reads it from here)
 *   A2 Varied     B2 what varies, over which range, in how many points
 *   A3 Units      B3 activities / bar / pH / °C / V
 *   A4 Caution    B4 the cautions line
 *   row 6         header: S species names (the varied one, or "pH", among them) | temp_C |
 *                 [log10 a(X), log sweeps only] | E / V vs SHE (EMF / V for a cell)
 *   rows 7…       one row per case; the x column holds =LOG10(..) of the varied activity;
 *                 the E column holds ONE spilled formula in its first cell:
 *                 =ECHEM.POTENTIAL(B1,A6:B6,A7:B27,C7:C27[,table])
 *
 * and an XY scatter chart (lines) of E against the varied quantity beside the table.
 */
import {
  compiledReaction,
  isEngineError,
  type NernstForm,
  type Notation,
  parseNotation,
  parseSpeciesHeader,
  phaseOf,
  formatSpecies,
} from '../engine/index';
import type { AxisTitles } from './chart';
import type { CellBlock, ChartSpec, SheetPlan } from './sheetPlan';
import { asCellText, cellAddress, columnLetters, rangeAddress, uniqueSheetName } from './sheetNames';

/** The always-visible cautions, also written on every sweep sheet. */
export const CAUTIONS =
  'Results are thermodynamic estimates, not measurements. Cathodic protection, battery, plating-bath and gas-evolution decisions follow the applicable standards, local codes and licensed practice.';

/** Most cases one sweep sheet gets. */
export const MAX_POINTS = 10000;

export const HEADER_ROW = 6;
export const FIRST_CASE_ROW = 7;

// ---------------------------------------------------------------------------
// Reaction check (live validation)

/** A species the reaction needs a value for, as the pane lists it. */
export interface ReactionSpecies {
  /** The species header text that binds it, e.g. "Cu2+", "O2(g)", "left:Ag+". */
  readonly name: string;
  /** Weight w of log10 a in E = E° − (RT ln10/F)·Σ w log10 a (ν/n for a half-reaction). */
  readonly weight: number;
  readonly gas: boolean;
}

/** The outcome of checking a reaction text. */
export type ReactionCheck =
  | { readonly ok: false; readonly message: string; readonly position: number | null }
  | {
      readonly ok: true;
      readonly kind: Notation['kind'];
      /** Species needing values, from the engine's resolution against the built-in table. */
      readonly species: readonly ReactionSpecies[];
      /** Electrons of the reaction, where the built-in table resolves it. */
      readonly n: number | null;
      /** The resolved form, or null where the built-in table does not resolve it. */
      readonly form: NernstForm | null;
      /** Why the built-in table does not resolve it (the text still reads), or null. */
      readonly warning: string | null;
    };

function speciesFromNotation(n: Notation): ReactionSpecies[] {
  const out: ReactionSpecies[] = [];
  const push = (name: string, gas: boolean) => {
    if (!out.some((s) => s.name === name)) out.push({ name, weight: 0, gas });
  };
  const terms =
    n.kind === 'half' || n.kind === 'reaction'
      ? [...n.reaction.reactants, ...n.reaction.products].map((t) => t.species)
      : n.kind === 'couple'
        ? [...n.couple.oxidized, ...n.couple.reduced]
        : [...n.diagram.left, ...n.diagram.right].flat().map((c) => c.species);
  for (const s of terms) {
    const p = phaseOf(s);
    if (s.isElectron || p === 's' || p === 'l') continue;
    push(formatSpecies(s, false), p === 'g');
  }
  return out;
}

/**
 * Check a reaction text with the engine: the parse error with its 1-based position, or
 * the species the reaction needs values for (from the built-in table where it resolves
 * the text; otherwise from the text alone, with the table's message as a warning).
 *
 * @example
 * checkReaction('Zn2 + ->') // { ok: false, position: 5, message: 'Cannot read "Zn2 + ->" at character 5: …' }
 */
export function checkReaction(text: string): ReactionCheck {
  if (text.trim() === '') return { ok: false, message: EMPTY_REACTION, position: null };
  let notation: Notation;
  try {
    notation = parseNotation(text);
  } catch (e) {
    if (isEngineError(e))
      return { ok: false, message: sentenceCase(e.message), position: e.position ?? null };
    throw e;
  }
  let form: NernstForm;
  try {
    form = compiledReaction(text, null);
  } catch (e) {
    if (!isEngineError(e)) throw e;
    return {
      ok: true,
      kind: notation.kind,
      species: speciesFromNotation(notation),
      n: null,
      form: null,
      warning: `${sentenceCase(e.message)} (Fine if the potentials table you pass has it.)`,
    };
  }
  const live = form.terms.filter((t) => !t.pure && t.inline === undefined);
  const keys = live.map((t) => t.key);
  const species = live.map((t) => {
    const bare = formatSpecies(t.species, false);
    const both = t.side !== null && keys.filter((k) => k === t.key).length > 1;
    return { name: both ? `${t.side}:${bare}` : bare, weight: t.weight, gas: t.gas };
  });
  return { ok: true, kind: notation.kind, species, n: form.n, form, warning: null };
}

/** What the pane says when the reaction box is empty. */
export const EMPTY_REACTION = 'Type a reaction, for example Cu2+/Cu or Zn | Zn2+ || Cu2+ | Cu.';

/**
 * A message in sentence case: first letter capitalised, ending with a full stop.
 *
 * @example
 * sentenceCase('reaction is missing: give a reaction') // 'Reaction is missing: give a reaction.'
 */
export function sentenceCase(message: string): string {
  const t = message.trim();
  if (t === '') return t;
  const first = t.charAt(0).toUpperCase() + t.slice(1);
  return /[.!?)]$/.test(first) ? first : `${first}.`;
}

/** The caret line shown under the reaction text: spaces, then "^" under `position` (1-based). */
export function caretLine(position: number): string {
  return `${' '.repeat(Math.max(0, position - 1))}^`;
}

// ---------------------------------------------------------------------------
// The form

/** What varies in the sweep. */
export type SweepVariable =
  | { readonly kind: 'activity'; readonly species: string; readonly scale: 'log' | 'linear' }
  | { readonly kind: 'pH' }
  | { readonly kind: 'temperature' };

/** The sweep builder's inputs as typed (strings from the page). */
export interface SweepForm {
  readonly reaction: string;
  readonly variable: SweepVariable;
  readonly from: string;
  readonly to: string;
  readonly points: string;
  /** The fixed temperature in °C (not used when temperature varies). */
  readonly tempC: string;
  /** Species rows: name and fixed value (the varied species' value is not used). */
  readonly species: readonly { readonly name: string; readonly value: string }[];
  /** The potentials range for the `table` argument, or "" for the built-in table. */
  readonly table: string;
}

/** Checked inputs of a sweep. */
export interface SweepInput {
  readonly reaction: string;
  readonly variable: SweepVariable;
  readonly from: number;
  readonly to: number;
  readonly points: number;
  readonly tempC: number;
  readonly fixed: readonly { readonly name: string; readonly value: number }[];
  readonly table: string | null;
}

/** A problem with one input; `field` names it ("reaction", "from", "species-2", "value-0" …). */
export interface FieldError {
  readonly field: string;
  /** The field's name as its label shows it ("From", "Points", "Value of Fe2+"). */
  readonly label: string;
  readonly message: string;
}

/**
 * A number as typed: decimals with a point, exponents ("1e-6"), or a power of ten ("10^-6").
 * With `decimalComma` (a locale whose decimal separator is a comma, as Excel there shows
 * numbers), a comma is read as the decimal separator too: "0,01" is 0.01. Thousands
 * separators are not read. Null where the text is not a number.
 *
 * @example
 * readNumber('0,01', true) // 0.01
 * readNumber('0,01') // null
 */
export function readNumber(text: string, decimalComma = false): number | null {
  let t = text.trim().replace(/\u2212/g, '-');
  if (decimalComma && /^[^,]*,[^,]*$/.test(t) && !t.includes('.')) t = t.replace(',', '.');
  if (/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(t)) {
    const v = Number(t);
    return Number.isFinite(v) ? v : null;
  }
  const p = /^10\s*\^\s*\(?\s*([+-]?(?:\d+\.?\d*|\.\d+))\s*\)?$/.exec(t);
  if (p) {
    const v = 10 ** Number(p[1]);
    return Number.isFinite(v) && v > 0 ? v : null;
  }
  return null;
}

/** How to write a number, for the locale's decimal separator. */
export function numberHint(decimalComma: boolean): string {
  return decimalComma
    ? 'write a number such as 0,01, 1e-6 or 10^-6'
    : 'write a number such as 0.01, 1e-6 or 10^-6 (with a decimal point)';
}
const TABLE_REF =
  /^(?:(?:'(?:[^']|'')+'|[A-Za-z_][A-Za-z0-9_.]*)!)?\$?[A-Za-z]{1,3}\$?[0-9]+:\$?[A-Za-z]{1,3}\$?[0-9]+$|^[A-Za-z_\\][A-Za-z0-9_.]*$/;

/** Header key of a species name (side:formula|charge, or "pH"), or null where it does not read. */
function headerKey(name: string): string | null {
  try {
    const h = parseSpeciesHeader(name);
    return `${h.side ?? ''}|${h.kind}|${h.key}`;
  } catch {
    return null;
  }
}

/** True where two species headers name the same column (e.g. "Cu2+" and "Cu^2+"). */
export function sameHeader(a: string, b: string): boolean {
  if (a.trim() === b.trim()) return true;
  const ka = headerKey(a);
  return ka !== null && ka === headerKey(b);
}

/** True where a species header sets a(H+): "H+" or "pH" (any side). */
export function setsHydrogenIon(name: string): boolean {
  try {
    return parseSpeciesHeader(name).key === 'H|1';
  } catch {
    return false;
  }
}

/** The species rows that are fixed for a given variable (the varied one, and H+ under a pH sweep, drop out). */
export function fixedRows(
  form: Pick<SweepForm, 'variable' | 'species'>,
): { index: number; name: string; value: string }[] {
  const v = form.variable;
  return form.species
    .map((s, index) => ({ index, name: s.name.trim(), value: s.value }))
    .filter((s) => {
      if (s.name === '' && s.value.trim() === '') return false;
      if (v.kind === 'pH' && setsHydrogenIon(s.name)) return false;
      if (v.kind === 'activity' && sameHeader(s.name, v.species)) return false;
      return true;
    });
}

/** Options of {@link readSweepForm}. */
export interface ReadOptions {
  /** The reaction check already made for this text (the pane checks once per change). */
  readonly check?: ReactionCheck;
  /** Read a comma as the decimal separator (the locale's decimal separator is a comma). */
  readonly decimalComma?: boolean;
}

/**
 * Check the form: one plain sentence per problem, each against its field, or the
 * series' inputs. Numbers follow the locale's decimal separator (`options.decimalComma`).
 */
export function readSweepForm(
  form: SweepForm,
  options: ReadOptions = {},
): { ok: true; input: SweepInput } | { ok: false; errors: FieldError[] } {
  const comma = options.decimalComma === true;
  const num = (text: string) => readNumber(text, comma);
  const hint = numberHint(comma);
  const errors: FieldError[] = [];
  const reaction = form.reaction.trim();
  const check = options.check ?? checkReaction(reaction);
  if (!check.ok) errors.push({ field: 'reaction', label: 'Reaction', message: check.message });

  const v = form.variable;
  if (v.kind === 'activity') {
    if (v.species.trim() === '')
      errors.push({ field: 'vary', label: 'Quantity to vary', message: 'Choose the quantity to vary.' });
    else if (headerKey(v.species) === null) {
      errors.push({
        field: 'vary',
        label: 'Quantity to vary',
        message: `"${v.species}" is not a species name the functions can read.`,
      });
    }
  }
  const unit = v.kind === 'activity' ? 'activity' : v.kind === 'pH' ? 'pH' : 'temperature (°C)';
  const range: Record<'from' | 'to', number | null> = { from: null, to: null };
  for (const field of ['from', 'to'] as const) {
    const text = form[field];
    const value = num(text);
    const label = field === 'from' ? 'From' : 'To';
    if (text.trim() === '') {
      errors.push({ field, label, message: `Give a value for ${label}.` });
      continue;
    }
    if (value === null) {
      errors.push({ field, label, message: `${label} "${text}" is not a number: ${hint}.` });
      continue;
    }
    if (v.kind === 'activity' && !(value > 0)) {
      errors.push({
        field,
        label,
        message: `${label} must be above 0 (an activity, or a partial pressure in bar); it is ${value}.`,
      });
      continue;
    }
    if (v.kind === 'temperature' && !(value > -273.15)) {
      errors.push({ field, label, message: `${label} must be above −273.15 °C; it is ${value} °C.` });
      continue;
    }
    range[field] = value;
  }
  if (range.from !== null && range.to !== null && range.from === range.to) {
    errors.push({
      field: 'to',
      label: 'To',
      message: `From and To are both ${range.from}: give two different ${unit} values.`,
    });
  }
  const points = num(form.points);
  if (points === null || !Number.isInteger(points) || points < 2 || points > MAX_POINTS) {
    errors.push({
      field: 'points',
      label: 'Cases',
      message: `Give a whole number of cases from 2 to ${MAX_POINTS} (both ends included); "${form.points}" is not one.`,
    });
  }
  let tempC = 25;
  if (v.kind !== 'temperature') {
    const t = num(form.tempC);
    if (t === null || !(t > -273.15)) {
      errors.push({
        field: 'tempC',
        label: 'Temperature',
        message: `Give the temperature in °C, above −273.15; "${form.tempC}" is not one.`,
      });
    } else tempC = t;
  }

  const fixed: { name: string; value: number }[] = [];
  const seen = new Map<string, number>();
  if (v.kind === 'activity') {
    const k = headerKey(v.species);
    if (k) seen.set(k, -1);
  }
  for (const row of fixedRows(form)) {
    const rowLabel = `Species ${row.index + 1}`;
    if (row.name === '') {
      errors.push({
        field: `species-${row.index}`,
        label: rowLabel,
        message: `Give the name of species ${row.index + 1} (for example Cu2+), or remove the row.`,
      });
      continue;
    }
    const key = headerKey(row.name);
    if (key === null) {
      errors.push({
        field: `species-${row.index}`,
        label: rowLabel,
        message: `"${row.name}" is not a species: write for example Cu2+, O2(g), pH or left:Ag+.`,
      });
      continue;
    }
    if (seen.has(key)) {
      errors.push({
        field: `species-${row.index}`,
        label: rowLabel,
        message: `"${row.name}" is listed twice: remove one of the rows.`,
      });
      continue;
    }
    seen.set(key, row.index);
    const value = num(row.value);
    const isPH = /^(?:(?:left|right|l|r)\s*:\s*)?ph$/i.test(row.name);
    if (value === null || (!isPH && !(value > 0))) {
      errors.push({
        field: `value-${row.index}`,
        label: `Value of ${row.name}`,
        message: isPH
          ? `Give the pH as a number; "${row.value}" is not one.`
          : `Give ${row.name} a value above 0 (${value === null ? hint : `it is ${value}`}).`,
      });
      continue;
    }
    fixed.push({ name: row.name, value });
  }

  const tableText = form.table.trim();
  if (tableText !== '' && !TABLE_REF.test(tableText)) {
    errors.push({
      field: 'table',
      label: 'Potentials table',
      message: `"${tableText}" is not a range: write for example Potentials!A2:D115, or leave it empty for the built-in table.`,
    });
  }

  if (errors.length > 0) return { ok: false, errors };
  return {
    ok: true,
    input: {
      reaction,
      variable: v.kind === 'activity' ? { ...v, species: v.species.trim() } : v,
      from: range.from as number,
      to: range.to as number,
      points: points as number,
      tempC,
      fixed,
      table: tableText === '' ? null : tableText,
    },
  };
}

/**
 * What the disabled write button says is missing: the inputs to fix, by their labels
 * (each message itself is shown once, beside its input).
 *
 * @example
 * missingSummary([{ field: 'from', label: 'From', message: 'Give a value for From.' }])
 * // 'Not ready: From needs fixing (see the message beside it).'
 */
export function missingSummary(errors: readonly FieldError[]): string {
  const labels = [...new Set(errors.map((e) => e.label))];
  if (labels.length === 0) return '';
  if (labels.length === 1) return `Not ready: ${labels[0]} needs fixing (see the message beside it).`;
  const list = `${labels.slice(0, -1).join(', ')} and ${labels[labels.length - 1]}`;
  return `Not ready: ${list} need fixing (see the messages beside them).`;
}

// ---------------------------------------------------------------------------
// Case values

/** A number rounded to `digits` significant digits (removes float noise from spacing). */
function tidy(x: number, digits = 12): number {
  return x === 0 ? 0 : Number(x.toPrecision(digits));
}

/**
 * `points` evenly spaced values from `from` to `to`, both ends exact.
 *
 * @example
 * linearSteps(0, 14, 8) // [0, 2, 4, 6, 8, 10, 12, 14]
 */
export function linearSteps(from: number, to: number, points: number): number[] {
  const out: number[] = [];
  for (let i = 0; i < points; i++) {
    out.push(i === 0 ? from : i === points - 1 ? to : tidy(from + ((to - from) * i) / (points - 1)));
  }
  return out;
}

/**
 * `points` log-spaced values from `from` to `to` (both > 0), both ends exact: equal
 * ratios between neighbours, equal steps of log10.
 *
 * @example
 * logSteps(1e-6, 1, 7) // [1e-6, 1e-5, 1e-4, 0.001, 0.01, 0.1, 1]
 */
export function logSteps(from: number, to: number, points: number): number[] {
  const a = Math.log10(from);
  const b = Math.log10(to);
  return linearSteps(a, b, points).map((x, i) =>
    i === 0 ? from : i === points - 1 ? to : tidy(10 ** x, 15),
  );
}

/** A number for labels: short, with an exponent for very small or large magnitudes. */
export function formatValue(x: number): string {
  if (x === 0) return '0';
  const m = Math.abs(x);
  if (m < 1e-3 || m >= 1e6) {
    const [mant = '', exp = '0'] = x.toExponential(3).split('e');
    return `${String(Number(mant))}e${Number(exp)}`;
  }
  return String(Number(x.toPrecision(6)));
}

// ---------------------------------------------------------------------------
// The plan

/** The sweep sheet's layout, independent of the sheet's name. */
export interface SweepLayout extends AxisTitles {
  /** The sheet's name before it is made unique, e.g. "E vs log a(Cu2+)". */
  readonly baseName: string;
  /** The species header row (the `species` argument). */
  readonly headers: readonly string[];
  /** One row of species values per case (the `values` argument). */
  readonly cases: readonly (readonly number[])[];
  /** temp_C per case. */
  readonly temps: readonly number[];
  /** The x value per case: log10 a, a, pH or °C. */
  readonly x: readonly number[];
  /** The spilled formula, and the cell it goes in. */
  readonly formula: string;
  readonly formulaCell: string;
  /** The range the result spills into. */
  readonly spillRange: string;
  /** The header row of the sheet's table (species…, temp_C, [x], E). */
  readonly columns: readonly string[];
  /** The whole input table with its header (species, temp_C). */
  readonly inputRange: string;
  readonly description: string;
  readonly blocks: readonly CellBlock[];
  readonly chart: ChartSpec;
  /** Warnings about the inputs (the sheet is still written). */
  readonly warnings: readonly string[];
}

function activityLabel(name: string): { a: string; gas: boolean } {
  let gas = false;
  let bare = name;
  let side: string | null = null;
  try {
    const h = parseSpeciesHeader(name);
    if (h.species) {
      gas = phaseOf(h.species) === 'g';
      bare = formatSpecies(h.species, false);
    }
    side = h.side;
  } catch {
    /* the form check has already refused unreadable names */
  }
  const inner = side ? `${bare}, ${side}` : bare;
  return { a: gas ? `p(${inner})` : `a(${inner})`, gas };
}

/**
 * Lay out the case series: the input table, the x column, the one spilled formula and the
 * chart. `check` is the reaction check already made for `input.reaction` (checked here
 * where it is not given).
 */
export function planSweep(
  input: SweepInput,
  check: ReactionCheck = checkReaction(input.reaction),
): SweepLayout {
  const v = input.variable;
  const steps =
    v.kind === 'activity' && v.scale === 'log'
      ? logSteps(input.from, input.to, input.points)
      : linearSteps(input.from, input.to, input.points);
  const headers: string[] = [];
  let variedColumn = -1;
  if (v.kind === 'activity') {
    variedColumn = 0;
    headers.push(v.species);
  } else if (v.kind === 'pH') {
    variedColumn = 0;
    headers.push('pH');
  }
  for (const f of input.fixed) headers.push(f.name);
  const cases = steps.map((s) => {
    const row: number[] = [];
    if (variedColumn === 0) row.push(s);
    for (const f of input.fixed) row.push(f.value);
    return row;
  });
  const temps = steps.map((s) => (v.kind === 'temperature' ? s : input.tempC));

  const isCell = check.ok && (check.kind === 'cell' || check.kind === 'reaction');
  const yTitle = isCell ? 'EMF / V' : 'E / V vs SHE';
  const yShort = isCell ? 'EMF' : 'E';

  let xTitle: string;
  let x: number[];
  let label: string;
  let description: string;
  const n = input.points;
  const logX = v.kind === 'activity' && v.scale === 'log';
  if (v.kind === 'activity') {
    const { a, gas } = activityLabel(v.species);
    const unit = gas ? ' / bar' : '';
    xTitle = logX ? (gas ? `log10 (${a} / bar)` : `log10 ${a}`) : `${a}${unit}`;
    x = logX ? steps.map((s) => tidy(Math.log10(s), 12)) : steps;
    label = logX ? `log ${a}` : a;
    description = `${a}${unit} from ${formatValue(input.from)} to ${formatValue(input.to)}, ${logX ? 'log-spaced' : 'evenly spaced'}, ${n} cases`;
  } else if (v.kind === 'pH') {
    xTitle = 'pH';
    x = steps;
    label = 'pH';
    description = `pH from ${formatValue(input.from)} to ${formatValue(input.to)}, evenly spaced, ${n} cases (a(H+) = 10^-pH)`;
  } else {
    xTitle = 'Temperature / °C';
    x = steps;
    label = 'T';
    description = `temperature from ${formatValue(input.from)} to ${formatValue(input.to)} °C, evenly spaced, ${n} cases`;
  }
  const baseName = `${yShort} vs ${label}`;
  if (input.fixed.length > 0) {
    description += `; fixed: ${input.fixed.map((f) => `${f.name} = ${formatValue(f.value)}`).join(', ')}`;
  }
  if (v.kind !== 'temperature') description += `; temp_C = ${formatValue(input.tempC)} °C`;
  if (input.table) description += `; potentials from ${input.table}`;

  // columns
  const S = headers.length;
  const tempCol = S + 1;
  const xCol = logX ? S + 2 : -1;
  const eCol = logX ? S + 3 : S + 2;
  const first = FIRST_CASE_ROW;
  const last = FIRST_CASE_ROW + n - 1;
  const speciesHeader = S > 0 ? rangeAddress(1, HEADER_ROW, S, HEADER_ROW) : '';
  const valuesRange = S > 0 ? rangeAddress(1, first, S, last) : '';
  const tempRange = rangeAddress(tempCol, first, tempCol, last);
  const formula = `=ECHEM.POTENTIAL(B1,${speciesHeader},${valuesRange},${tempRange}${input.table ? `,${input.table}` : ''})`;
  const formulaCell = cellAddress(eCol, first);
  const spillRange = rangeAddress(eCol, first, eCol, last);
  const xValues =
    v.kind === 'temperature'
      ? tempRange
      : logX
        ? rangeAddress(xCol, first, xCol, last)
        : rangeAddress(1, first, 1, last);

  const headerRow: string[] = [...headers.map(asCellText), 'temp_C'];
  if (logX) headerRow.push(xTitle);
  headerRow.push(yTitle);

  const blocks: CellBlock[] = [
    { address: 'A1:A4', values: [['Reaction'], ['Varied'], ['Units'], ['Caution']], bold: true },
    { address: 'B1', values: [[asCellText(input.reaction)]], numberFormat: '@' },
    {
      address: 'B2:B4',
      values: [
        [description],
        [
          'Species columns hold activities of solutes (dimensionless; for a dilute, ideal solution the concentration in mol/L divided by 1 mol/L), ' +
            'partial pressures in bar (gases) or pH; temp_C in °C; ' +
            `${yTitle.replace(' / V', ' in V')}. Edit any value: the result column recalculates.`,
        ],
        [CAUTIONS],
      ],
    },
    { address: rangeAddress(1, HEADER_ROW, headerRow.length, HEADER_ROW), values: [headerRow], bold: true },
    {
      address: rangeAddress(1, first, tempCol, last),
      values: cases.map((row, i) => [...row, temps[i] as number]),
    },
  ];
  if (logX) {
    const col = columnLetters(1);
    blocks.push({
      address: rangeAddress(xCol, first, xCol, last),
      formulas: cases.map((_, i) => [`=LOG10(${col}${first + i})`]),
    });
  }
  blocks.push({ address: formulaCell, formulas: [[formula]] });

  const chartLeft = eCol + 2;
  const chart: ChartSpec = {
    type: 'XYScatterLines',
    source: rangeAddress(eCol, HEADER_ROW, eCol, last),
    xValues,
    yValues: spillRange,
    seriesName: yTitle,
    title: `${yShort} of ${input.reaction}`,
    xTitle,
    yTitle,
    topLeft: cellAddress(chartLeft, HEADER_ROW),
    bottomRight: cellAddress(chartLeft + 7, HEADER_ROW + 19),
  };

  const warnings: string[] = [];
  if (check.ok) {
    if (check.warning) warnings.push(check.warning);
    if (check.form && v.kind === 'pH') {
      const hasH = check.form.terms.some((t) => t.key === 'H|1');
      const hasOH = check.form.terms.some((t) => t.key === 'OH|-1');
      if (!hasH) {
        warnings.push(
          hasOH
            ? 'The reaction has OH- but no H+: a pH column sets only a(H+), so E will not change with pH. Write it with H+ (acid form) for an E–pH line.'
            : 'The reaction has no H+: E will not change with pH (a horizontal line on the E–pH plot).',
        );
      }
    }
    if (check.form && v.kind === 'activity') {
      const k = headerKey(v.species);
      const used = check.form.terms.some((t) => k !== null && k.endsWith(`|species|${t.key}`));
      if (!used) warnings.push(`${v.species} does not take part in the reaction: E will not change with it.`);
    }
  }
  if (
    v.kind === 'temperature' &&
    (Math.max(input.from, input.to) > 75 || Math.min(input.from, input.to) < -25)
  ) {
    warnings.push('dE°/dT values hold near 25 °C; far from 25 °C the estimate is rough.');
  }
  return {
    baseName,
    headers,
    cases,
    temps,
    x,
    xTitle,
    yTitle,
    formula,
    formulaCell,
    spillRange,
    columns: headerRow,
    inputRange: rangeAddress(1, HEADER_ROW, tempCol, last),
    description,
    blocks,
    chart,
    warnings,
  };
}

/** The sweep as a sheet plan, under a name none of `existingSheets` has. */
export function sweepSheetPlan(
  layout: SweepLayout,
  existingSheets: readonly string[],
): SheetPlan & { summary: string } {
  const sheetName = uniqueSheetName(layout.baseName, existingSheets);
  const n = layout.cases.length;
  return {
    sheetName,
    blocks: layout.blocks,
    chart: layout.chart,
    freezeRows: HEADER_ROW,
    summary:
      `Created sheet "${sheetName}": ${n} cases in ${layout.inputRange}, the formula ${layout.formula} in ${layout.formulaCell} ` +
      `(spilling to ${layout.spillRange}), and a chart of ${layout.yTitle} against ${layout.xTitle}.`,
  };
}
