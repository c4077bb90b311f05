/**
 * Built-in table of standard reduction potentials.
 *
 * Each row is a half-reaction written as a reduction, its standard potential E° at 25 °C in
 * volts on the standard hydrogen electrode (SHE) scale and its temperature coefficient
 * dE°/dT in mV/K, both derived from the species data layer (src/engine/data/species/:
 * E° = −ΔrG°/(nF), dE°/dT = ΔrS°/(nF) at 25 °C; the engine uses the unrounded values and
 * the ΔCp° term), the value a publication prints for the same couple (`published`), and
 * the sources. `dE0dTmVperK` is null where a species has no S° (then E° keeps its 25 °C
 * value at other temperatures). Rows cannot contradict each other: every one is a sum
 * of the same species' Gibbs energies.
 *
 * Standard state: solutes at unit activity (1 mol/L), gases at 1 bar, pure solids and
 * liquids and water at unit activity. Some handbook values are referred to 1 atm; they are
 * carried as published, since the shift from 1 atm to 1 bar is at most about 0.34 mV for any
 * row here (0.169 mV for H+/H2), below the printed precision of most rows.
 *
 * `published` is the value OpenStax Chemistry 2e, Appendix L prints where it has the couple
 * (read), else the CRC Handbook value the row held before (a source ending in "(from
 * memory)" was recalled, not re-read). Where the primary published E° is the better value
 * the species layer was set to agree with it (see `measured` in species/standard.ts).
 *
 * Notation follows the engine's reaction syntax: terms joined by " + ", arrow " -> ",
 * integer coefficients, charges written with a caret (`SO4^2-`, `VO2^+`) wherever the last
 * digit of a formula could be misread as a charge, phases in parentheses where they matter.
 * Rows are grouped by the element whose redox chemistry they describe (in order of atomic
 * number) and, within a group, sorted by increasing E°.
 *
 * The rows themselves are data, in potentialRows.json beside this file: each row
 * [halfReaction, e0V, dE0dTmVperK, publishedE0V, publishedSource], publishedSource a key of its
 * `sources` (the publications' citations); `groups` names the element of each run of rows
 * (documentation, checked by the data test, not read at run time).
 */
import TABLE from './potentialRows.json';

/** The value a publication prints for a built-in row's couple. */
export interface PublishedPotential {
  /** E° in V as printed */
  readonly e0V: number;
  /** the publication */
  readonly source: string;
}

/** One row of the built-in table of standard reduction potentials. */
export interface BuiltinPotentialRow {
  /** Half-reaction written as a reduction, e.g. "Fe3+ + e- -> Fe2+". */
  readonly halfReaction: string;
  /** E° at 25 °C in volts vs SHE, from the species data (rounded to 0.1 mV). */
  readonly e0V: number;
  /** dE°/dT in mV/K at 25 °C from the species data, or null where a species has no S°. */
  readonly dE0dTmVperK: number | null;
  /** Where E° and dE°/dT come from, and what the publication prints. */
  readonly source: string;
  /** The published value for the same couple. */
  readonly published: PublishedPotential;
}

const LAYER = 'E° and dE°/dT from the species data (NBS tables, Wagman et al. 1982, from memory';

/** A row of potentialRows.json: [halfReaction, e0V, dE0dTmVperK, publishedE0V, publishedSource]. */
type StoredRow = readonly [string, number, number | null, number, string];

const SOURCES: Readonly<Record<string, string>> = TABLE.sources;

/**
 * Every built-in row with its source text: the species data it is derived from and the value
 * its publication prints (FORMATION(species, "source") names the source of each species). In
 * table order (grouped by element, in order of atomic number; published E° increasing within a
 * group).
 */
export const BUILTIN_POTENTIALS: readonly BuiltinPotentialRow[] = (TABLE.rows as unknown as readonly StoredRow[]).map(
  ([halfReaction, e0V, dE0dTmVperK, publishedE0V, key]) => {
    const published = SOURCES[key];
    if (published === undefined) throw new Error(`potentialRows.json: row ${halfReaction} names an unknown source ${key}`);
    return {
      halfReaction,
      e0V,
      dE0dTmVperK,
      published: { e0V: publishedE0V, source: published },
      source: `${LAYER}${dE0dTmVperK === null ? '; no S° for a species: E° kept at its 25 °C value at other temperatures' : ''}); ${published} prints ${String(publishedE0V)} V`,
    };
  },
);
