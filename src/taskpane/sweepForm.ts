/**
 * The case series' form state, without DOM: the species rows (filled from the
 * reaction, plus rows the user adds), the choices of what to vary, and the defaults for
 * each choice. taskpane.ts renders this state and turns it into a {@link SweepForm}.
 */
import {
  type ReactionSpecies,
  type SweepForm,
  type SweepVariable,
  sameHeader,
  setsHydrogenIon,
} from './sweepPlan';

/** One row of the species list. */
export interface SpeciesRow {
  readonly name: string;
  readonly value: string;
  /** "reaction": filled from the reaction (replaced when it changes); "user": typed or edited. */
  readonly origin: 'reaction' | 'user';
  /** True for a gas (its value is a partial pressure in bar), where the reaction says so. */
  readonly gas?: boolean;
}

const PH_NAME = /^(?:(?:left|right|l|r)\s*:\s*)?ph$/i;

/** The unit of a species row's value: "pH" for a pH row, "bar" for a gas, else "activity". */
export function unitOf(row: Pick<SpeciesRow, 'name' | 'gas'>): 'pH' | 'bar' | 'activity' {
  if (PH_NAME.test(row.name.trim())) return 'pH';
  return row.gas === true || /\(g\)\s*$/.test(row.name.trim()) ? 'bar' : 'activity';
}

/** The value a new species row starts with: unit activity (1 bar for a gas). */
export const DEFAULT_SPECIES_VALUE = '1';

/**
 * The species rows after the reaction changed: the reaction's species first (keeping any
 * value already typed for the same name), then the user's own rows that the reaction
 * does not list. Rows filled from the previous reaction that it no longer needs go.
 *
 * @example
 * mergeSpeciesRows([{ name: 'Cu2+', value: '0.01', origin: 'reaction' }], [{ name: 'Cu2+', weight: -0.5, gas: false }])
 * // [{ name: 'Cu2+', value: '0.01', origin: 'reaction' }]
 */
export function mergeSpeciesRows(
  rows: readonly SpeciesRow[],
  needed: readonly ReactionSpecies[],
): SpeciesRow[] {
  const valueOf = new Map<string, string>();
  for (const r of rows)
    if (r.name.trim() !== '' && !valueOf.has(r.name.trim())) valueOf.set(r.name.trim(), r.value);
  const names = new Set(needed.map((s) => s.name));
  const out: SpeciesRow[] = needed.map((s) => ({
    name: s.name,
    value: valueOf.get(s.name) ?? DEFAULT_SPECIES_VALUE,
    origin: 'reaction',
    gas: s.gas,
  }));
  for (const r of rows) if (r.origin === 'user' && !names.has(r.name.trim())) out.push(r);
  return out;
}

/** One choice of the "vary" list. */
export interface VaryOption {
  /** "activity:<species>", "pH" or "temperature" */
  readonly value: string;
  readonly label: string;
}

/**
 * The "vary" choices for the species rows: each solute's activity or each gas's partial
 * pressure in bar, then pH and temperature.
 */
export function varyOptions(rows: readonly SpeciesRow[]): VaryOption[] {
  const seen = new Set<string>();
  const out: VaryOption[] = [];
  for (const r of rows) {
    const name = r.name.trim();
    if (name === '' || PH_NAME.test(name) || seen.has(name)) continue;
    seen.add(name);
    out.push({
      value: `activity:${name}`,
      label: unitOf(r) === 'bar' ? `Partial pressure of ${name} (bar)` : `Activity of ${name}`,
    });
  }
  out.push({ value: 'pH', label: 'pH' });
  out.push({ value: 'temperature', label: 'Temperature (°C)' });
  return out;
}

/** The variable a "vary" choice and scale stand for. */
export function variableOf(choice: string, scale: 'log' | 'linear'): SweepVariable {
  if (choice === 'pH') return { kind: 'pH' };
  if (choice === 'temperature') return { kind: 'temperature' };
  return { kind: 'activity', species: choice.replace(/^activity:/, ''), scale };
}

/** Range defaults for a kind of sweep. */
export interface RangeDefaults {
  readonly from: string;
  readonly to: string;
  readonly points: string;
  /** The unit shown beside From and To. */
  readonly unit: string;
}

/**
 * Defaults for a variable: activities from 1e-6 to 1 (log, 4 points a decade) or 0.001 to
 * 0.1 (linear), pH 0 to 14 in steps of 0.5, temperature 5 to 65 °C in steps of 5 °C.
 */
export function rangeDefaults(v: SweepVariable, gas = false): RangeDefaults {
  if (v.kind === 'pH') return { from: '0', to: '14', points: '29', unit: 'pH' };
  if (v.kind === 'temperature') return { from: '5', to: '65', points: '13', unit: '°C' };
  const unit = gas ? 'bar' : 'activity';
  return v.scale === 'log'
    ? { from: '1e-6', to: '1', points: '25', unit }
    : { from: '0.001', to: '0.1', points: '21', unit };
}

/** What a species row's value box shows for the current variable: its own value, or why it is not used. */
export function rowRole(row: SpeciesRow, v: SweepVariable): 'fixed' | 'varied' | 'set by pH' {
  const name = row.name.trim();
  if (name === '') return 'fixed';
  if (v.kind === 'activity' && sameHeader(name, v.species)) return 'varied';
  if (v.kind === 'pH' && setsHydrogenIon(name)) return 'set by pH';
  return 'fixed';
}

/** The form the sweep plan reads, from the page's state. */
export function sweepFormOf(state: {
  reaction: string;
  choice: string;
  scale: 'log' | 'linear';
  from: string;
  to: string;
  points: string;
  tempC: string;
  rows: readonly SpeciesRow[];
  table: string;
}): SweepForm {
  return {
    reaction: state.reaction,
    variable: variableOf(state.choice, state.scale),
    from: state.from,
    to: state.to,
    points: state.points,
    tempC: state.tempC,
    species: state.rows.map((r) => ({ name: r.name, value: r.value })),
    table: state.table,
  };
}
