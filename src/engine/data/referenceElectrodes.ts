/**
 * Built-in reference electrodes: their potentials on the standard hydrogen electrode (SHE)
 * scale at 25 °C, their temperature coefficients where one is known, and the publication
 * each number comes from.
 *
 * A source ending in "(from memory)" marks a value recalled rather than re-read from a copy
 * of the publication; treat it as weaker. Where no temperature coefficient is known the
 * field is `null` and the engine uses the 25 °C potential at every temperature (and says
 * so, see `referenceTemperatureNote` in `references.ts`).
 *
 * The reversible hydrogen electrode (RHE) has no fixed potential: E(SHE) = E(RHE) −
 * (RT ln10/F)·pH at p(H2) = 1 bar, so its row carries 0 (its value at pH 0) and
 * `needsPH: true`; the engine computes the pH term at the temperature given.
 *
 * Aliases are matched after normalisation (see `normaliseReferenceName` in
 * `references.ts`): case is ignored, spaces, underscores, hyphens, slashes, bars, dots,
 * commas, colons and brackets are dropped ("Ag/AgCl" = "AgAgCl"), "saturated" and "sat'd"
 * read as "sat", and "mol/L" reads as "M". Every id is itself accepted as a name.
 *
 * The electrodes, their aliases and sources are data, in referenceElectrodeRows.json beside
 * this file: notes shared by several sources (Int. J. Corrosion 2010 Table 2, Bard &
 * Faulkner, the derived temperature models) are written once and named in a source as
 * {KEY}; the spellings of an electrode's filling are generated from its heads and filling.
 */
import DATA from './referenceElectrodeRows.json';

/**
 * One built-in reference electrode.
 *
 * @example
 * const row = referenceElectrodeRows().find((r) => r.id === 'SCE'); // potentialVvsSHE 0.2412
 */
export interface ReferenceElectrodeRow {
  /** Short, typeable identifier, unique; also accepted as a name (e.g. "SCE", "Ag/AgCl-3M-KCl"). */
  readonly id: string;
  /** Display name, e.g. "Saturated calomel electrode (Hg/Hg2Cl2, saturated KCl)". */
  readonly name: string;
  /** Other accepted names (normalised before matching). */
  readonly aliases: readonly string[];
  /** Potential vs SHE at 25 °C in V (for RHE: at pH 0). */
  readonly potentialVvsSHE: number;
  /** dE/dT near 25 °C in mV/K for a linear model, else null (the engine derives it from the model). */
  readonly tempCoeffMvPerK: number | null;
  /** The publication(s) the numbers come from; "(from memory)" where recalled. */
  readonly source: string;
  /** True for an electrode whose potential depends on the solution pH (RHE). */
  readonly needsPH: boolean;
  /** How the potential moves with temperature (see {@link ReferenceTemperatureModel}). */
  readonly model: ReferenceTemperatureModel;
}

/**
 * How a reference electrode's potential depends on temperature:
 * - `constant`: the same at every temperature (SHE, by definition).
 * - `linear`: E25 + mvPerK·(t − 25)/1000 over `rangeC`.
 * - `polynomial`: Σ coeffs[i]·(t − t0)^i (V, t in °C) over `rangeC`, a published fit.
 * - `couple`: the couple's E°(T) from the species data with the filling's activity term
 *   held at its 25 °C value: E(T) = E°(T) − (T/298.15)·(E°(25) − E25). `bates`: the same
 *   with E°(T) of AgCl/Ag from the Bates & Bower fit.
 * - `unknown`: no published coefficient; away from 25 °C a conversion is an error.
 * - `rhe`: −(RT ln10/F)·pH.
 */
export type ReferenceTemperatureModel =
  | { readonly kind: 'constant' }
  | { readonly kind: 'linear'; readonly mvPerK: number; readonly rangeC: readonly [number, number] }
  | { readonly kind: 'polynomial'; readonly t0C: number; readonly coeffs: readonly number[]; readonly rangeC: readonly [number, number] }
  | { readonly kind: 'couple'; readonly halfReaction: string; readonly rangeC: readonly [number, number] }
  | { readonly kind: 'bates'; readonly rangeC: readonly [number, number] }
  | { readonly kind: 'seawater'; readonly salinity: number; readonly rangeC: readonly [number, number] }
  | { readonly kind: 'unknown' }
  | { readonly kind: 'rhe' };

/**
 * E°(AgCl/Ag) in V at t °C, 0–60 °C: the fit of Bates & Bower, J. Res. NBS 53, 283 (1954)
 * (coefficients from memory; the fit reproduces their table, seen, within 0.1 mV):
 * E° = 0.23659 − 4.8564e-4·t − 3.4205e-6·t² + 5.869e-9·t³.
 */
export const BATES_BOWER_COEFFS: readonly number[] = [0.23659, -4.8564e-4, -3.4205e-6, 5.869e-9];

/**
 * Chloride in seawater of practical salinity 35: 0.5658 mol/kg (Millero et al. 2008 reference
 * composition, from memory), and its single-ion activity coefficient taken as 0.67 (from
 * memory, common practice); chloride scales with salinity.
 */
export const SEAWATER_CHLORIDE = Object.freeze({ molalityAtS35: 0.5658, gamma: 0.67 });

/**
 * A generic name that fits several electrodes (e.g. "Ag/AgCl" without its filling solution).
 * Looking one up is an `ambiguous` error listing the candidates, because the fillings differ
 * by up to 92.5 mV.
 *
 * @example
 * ambiguousReferenceNames()[0]?.candidateIds // ['Ag/AgCl-sat-KCl', 'Ag/AgCl-3.5M-KCl', …]
 */
export interface AmbiguousReferenceName {
  /** The generic names (normalised before matching). */
  readonly names: readonly string[];
  /** Ids of the electrodes the name could mean. */
  readonly candidateIds: readonly string[];
}

/**
 * An electrode row of referenceElectrodeRows.json, in the order of its `columns`: aliases and
 * source in their stored form, and the filling spellings to add as [heads, concentration,
 * salt, salt optional] (see {@link filling}) or null.
 */
type StoredElectrode = readonly [
  id: string,
  name: string,
  aliases: readonly string[],
  aliasVariants: readonly [string, string, string, boolean] | null,
  potentialVvsSHE: number,
  tempCoeffMvPerK: number | null,
  source: string,
  needsPH: boolean,
  model: ReferenceTemperatureModel,
];

const NOTES: Readonly<Record<string, string>> = DATA.notes;
const HEADS: Readonly<Record<string, readonly string[]>> = DATA.heads;

function headsNamed(key: string): readonly string[] {
  const heads = HEADS[key];
  if (!heads) throw new Error(`referenceElectrodeRows.json: unknown heads ${key}`);
  return heads;
}

/** A source with its {NOTE} keys replaced by the notes' text. */
function withNotes(source: string): string {
  return source.replace(/\{(\w+)\}/g, (whole, key: string) => {
    const note = NOTES[key];
    if (note === undefined) throw new Error(`referenceElectrodeRows.json: unknown note ${whole}`);
    return note;
  });
}

/** Spellings of one filling: "3 M KCl", "KCl 3 M", "3 M" (the salt may be left out). */
function filling(concentration: string, salt: string, saltOptional: boolean): string[] {
  const out = [`${concentration} ${salt}`, `${salt} ${concentration}`];
  if (saltOptional) out.push(concentration);
  return out;
}

/** Every combination "head electrolyte" of the given spellings. */
function variants(heads: readonly string[], electrolytes: readonly string[]): string[] {
  const out: string[] = [];
  for (const h of heads) for (const e of electrolytes) out.push(`${h} ${e}`);
  return out;
}

let electrodeRows: readonly ReferenceElectrodeRow[] | null = null;

/**
 * The built-in reference electrodes, SHE first and RHE last, read from
 * referenceElectrodeRows.json on first use (a worksheet that converts no potential never
 * reads them). Potentials to the published precision (0.1–1 mV; the printed values of one
 * electrode differ by up to a few mV between publications, see each source).
 *
 * @example
 * referenceElectrodeRows().map((r) => r.id) // ['SHE', 'SCE', 'calomel-1M-KCl', …, 'RHE']
 */
export function referenceElectrodeRows(): readonly ReferenceElectrodeRow[] {
  if (!electrodeRows) {
    electrodeRows = (DATA.electrodes as unknown as readonly StoredElectrode[]).map(
      ([id, name, aliases, more, potentialVvsSHE, tempCoeffMvPerK, source, needsPH, model]) => ({
        id,
        name,
        aliases: more ? [...aliases, ...variants(headsNamed(more[0]), filling(more[1], more[2], more[3]))] : aliases,
        potentialVvsSHE,
        tempCoeffMvPerK,
        source: withNotes(source),
        needsPH,
        model,
      }),
    );
  }
  return electrodeRows;
}

/**
 * Generic names that fit several built-in electrodes; looking them up is an `ambiguous` error.
 *
 * @example
 * ambiguousReferenceNames().some((a) => a.names.includes('calomel')) // true
 */
export function ambiguousReferenceNames(): readonly AmbiguousReferenceName[] {
  return DATA.ambiguous.map((a) => ({ names: [...headsNamed(a.heads), ...a.names], candidateIds: a.candidateIds }));
}
