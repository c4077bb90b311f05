/**
 * The parameters many functions share, declared once so that one thing has one name, one
 * description and one place in the argument order (docs/design.md, "Argument names"):
 * chemistry arguments first, then `temp_C`, then `table`.
 */
import { STANDARD_TEMP_C } from '../../engine';
import type { ParamSpec } from './types';

/** A reaction, couple or cell, one cell or a column of cases. */
export const REACTION: ParamSpec = {
  name: 'reaction',
  kind: 'reaction',
  description:
    'Half-reaction (a reduction), couple such as "Cu2+/Cu", cell diagram such as "Zn | Zn2+ || Cu2+ | Cu", or full reaction; one cell or a column of cases',
};

/** A reaction, or a potential in V with `n`. */
export const REACTION_OR_E: ParamSpec = {
  name: 'reaction_or_E',
  kind: 'reactionOrPotential',
  description: 'A reaction, couple or cell (E° and n from the table), or a potential in V (then give n); one cell or a column of cases',
};

/** Species names heading the columns of `values`. */
export const SPECIES_HEADER: ParamSpec = {
  name: 'species',
  kind: 'speciesHeader',
  description: 'Names of the species whose values follow, one per column of values, e.g. "Cu2+", "O2", "pH" or "left:Ag+"',
};

/** The same, optional: without it every species is at standard state. */
export const OPTIONAL_SPECIES_HEADER: ParamSpec = {
  ...SPECIES_HEADER,
  optional: true,
  defaultText: 'standard state',
};

/** Activities per species column, one row per case. */
export const ACTIVITIES: ParamSpec = {
  name: 'values',
  kind: 'values',
  headerParam: 'species',
  unit: 'mol/L, bar',
  description: 'Activities: mol/L for solutes, bar for gases, the pH under a "pH" column; one row per case',
};

/** Molalities per species column, one row per case (activity models). */
export const MOLALITIES: ParamSpec = {
  name: 'values',
  kind: 'values',
  headerParam: 'species',
  unit: 'mol/kg',
  description: 'Molalities in mol/kg, one per species column (a "pH" column passes through); one row per case',
};

/** Temperature in °C, default 25, the aqueous range 0–100 °C. */
export const TEMP_C: ParamSpec = {
  name: 'temp_C',
  kind: 'temperature',
  optional: true,
  default: STANDARD_TEMP_C,
  description: 'Temperature in °C; one cell or a column of cases',
};

/** The user's potentials table. */
export const TABLE: ParamSpec = {
  name: 'table',
  kind: 'table',
  optional: true,
  defaultText: 'the built-in table',
  description: 'Your potentials range: half-reaction | E° (V) | dE°/dT (mV/K) | source',
};

/** Electrons transferred, from the reaction where it is left out. */
export const N_FROM_REACTION: ParamSpec = {
  name: 'n',
  kind: 'electrons',
  optional: true,
  defaultText: 'from the reaction',
  description: 'Electrons transferred (needed with a potential)',
};

/** The activity model. */
export const MODEL: ParamSpec = {
  name: 'model',
  kind: 'choice',
  optional: true,
  default: 'davies',
  choices: ['limiting', 'extended', 'davies'],
  description: 'Activity model: "limiting" (Debye–Hückel limiting law), "extended" (with ion size) or "davies"',
};

/** Ionic strength in mol/kg. */
export const IONIC_STRENGTH: ParamSpec = {
  name: 'ionic_strength',
  kind: 'ionicStrength',
  description: 'Ionic strength in mol/kg; one cell or a column of cases',
};
