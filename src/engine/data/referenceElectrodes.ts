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
 */

/**
 * One built-in reference electrode.
 *
 * @example
 * const row = REFERENCE_ELECTRODE_ROWS.find((r) => r.id === 'SCE'); // potentialVvsSHE 0.2412
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
 * AMBIGUOUS_REFERENCE_NAMES[0]?.candidateIds // ['Ag/AgCl-sat-KCl', 'Ag/AgCl-3.5M-KCl', …]
 */
export interface AmbiguousReferenceName {
  /** The generic names (normalised before matching). */
  readonly names: readonly string[];
  /** Ids of the electrodes the name could mean. */
  readonly candidateIds: readonly string[];
}

const IJC = 'Int. J. Corrosion 2010, art. 756950, Table 2';
const BARD_FAULKNER_MEMORY = 'Bard & Faulkner, Electrochemical Methods, 2nd ed., App. C (from memory)';
const IUPAC_SHE = 'Zero at every temperature by definition (IUPAC Gold Book, "standard hydrogen electrode")';
const COUPLE_NOTE =
  'from E°(T) of the couple (species data, NBS 1982, from memory) with the filling’s activity term held at its 25 °C value, 0–100 °C (derived)';
const BATES_NOTE =
  'from the Bates & Bower (1954) E°(AgCl/Ag) fit with the filling’s chloride activity held at its 25 °C value, 0–60 °C (derived)';

/** Every combination "head electrolyte" of the given spellings. */
function variants(heads: readonly string[], electrolytes: readonly string[]): string[] {
  const out: string[] = [];
  for (const h of heads) for (const e of electrolytes) out.push(`${h} ${e}`);
  return out;
}

const CALOMEL = ['calomel', 'Hg/Hg2Cl2', 'mercury/mercurous chloride'];
const SILVER_CHLORIDE = ['Ag/AgCl', 'silver chloride', 'silver/silver chloride'];
const MERCUROUS_SULFATE = [
  'Hg/Hg2SO4',
  'mercurous sulfate',
  'mercurous sulphate',
  'mercury/mercurous sulfate',
];
const MERCURIC_OXIDE = ['Hg/HgO', 'mercuric oxide', 'mercury/mercuric oxide'];

/** Spellings of one filling: "3 M KCl", "KCl 3 M", "3 M" (the salt may be left out). */
function filling(concentration: string, salt: string, saltOptional: boolean): string[] {
  const out = [`${concentration} ${salt}`, `${salt} ${concentration}`];
  if (saltOptional) out.push(concentration);
  return out;
}

/**
 * The built-in reference electrodes, SHE first and RHE last. Potentials to the published
 * precision (0.1–1 mV; the printed values of one electrode differ by up to a few mV between
 * publications, see each source).
 *
 * @example
 * REFERENCE_ELECTRODE_ROWS.map((r) => r.id) // ['SHE', 'SCE', 'calomel-1M-KCl', …, 'RHE']
 */
// prettier-ignore
export const REFERENCE_ELECTRODE_ROWS: readonly ReferenceElectrodeRow[] = [
  {
    id: 'SHE', name: 'Standard hydrogen electrode',
    aliases: ['standard hydrogen electrode', 'standard hydrogen', 'H+/H2'],
    potentialVvsSHE: 0, tempCoeffMvPerK: 0, source: IUPAC_SHE, needsPH: false, model: { kind: 'constant' },
  },
  {
    id: 'SCE', name: 'Saturated calomel electrode (Hg/Hg2Cl2, saturated KCl)',
    aliases: ['saturated calomel', 'saturated calomel electrode', ...variants(CALOMEL, filling('sat', 'KCl', true))],
    potentialVvsSHE: 0.2412, tempCoeffMvPerK: null,
    source: `0.2412 V and E(t) = 0.2412 − 6.61e-4·(t − 25) − 1.75e-6·(t − 25)² − 9.0e-10·(t − 25)³, 0–60 °C: ${BARD_FAULKNER_MEMORY}; ${IJC} prints 0.2410 V`, needsPH: false,
    model: { kind: 'polynomial', t0C: 25, coeffs: [0.2412, -6.61e-4, -1.75e-6, -9.0e-10], rangeC: [0, 60] },
  },
  {
    id: 'calomel-1M-KCl', name: 'Calomel electrode, 1 M KCl (normal calomel, Hg/Hg2Cl2)',
    aliases: ['NCE', 'normal calomel', 'normal calomel electrode', ...variants(CALOMEL, filling('1M', 'KCl', true))],
    potentialVvsSHE: 0.2801, tempCoeffMvPerK: null, source: `${IJC}; E(T) ${COUPLE_NOTE}`, needsPH: false,
    model: { kind: 'couple', halfReaction: 'Hg2Cl2(s) + 2 e- -> 2 Hg(l) + 2 Cl-', rangeC: [0, 100] },
  },
  {
    id: 'calomel-0.1M-KCl', name: 'Calomel electrode, 0.1 M KCl (Hg/Hg2Cl2)',
    aliases: ['decinormal calomel', ...variants(CALOMEL, filling('0.1M', 'KCl', true))],
    potentialVvsSHE: 0.3337, tempCoeffMvPerK: null, source: `${IJC}; E(T) ${COUPLE_NOTE}`, needsPH: false,
    model: { kind: 'couple', halfReaction: 'Hg2Cl2(s) + 2 e- -> 2 Hg(l) + 2 Cl-', rangeC: [0, 100] },
  },
  {
    id: 'SSCE', name: 'Saturated sodium calomel electrode (Hg/Hg2Cl2, saturated NaCl)',
    aliases: ['saturated sodium calomel', 'sodium saturated calomel', ...variants(CALOMEL, filling('sat', 'NaCl', false))],
    potentialVvsSHE: 0.236, tempCoeffMvPerK: null, source: `${IJC}; no temperature coefficient known`, needsPH: false,
    model: { kind: 'unknown' },
  },
  {
    id: 'Ag/AgCl-sat-KCl', name: 'Silver–silver chloride, saturated KCl',
    aliases: variants(SILVER_CHLORIDE, filling('sat', 'KCl', true)),
    potentialVvsSHE: 0.197, tempCoeffMvPerK: -1.0,
    source: `${IJC}; dE/dT about −1.0 mV/K from memory (no publication re-read), 0–60 °C`, needsPH: false,
    model: { kind: 'linear', mvPerK: -1.0, rangeC: [0, 60] },
  },
  {
    id: 'Ag/AgCl-3.5M-KCl', name: 'Silver–silver chloride, 3.5 M KCl',
    aliases: variants(SILVER_CHLORIDE, filling('3.5M', 'KCl', true)),
    potentialVvsSHE: 0.205, tempCoeffMvPerK: null, source: `${IJC}; E(T) ${BATES_NOTE}`, needsPH: false,
    model: { kind: 'bates', rangeC: [0, 60] },
  },
  {
    id: 'Ag/AgCl-3M-KCl', name: 'Silver–silver chloride, 3 M KCl',
    aliases: variants(SILVER_CHLORIDE, filling('3M', 'KCl', true)),
    potentialVvsSHE: 0.21, tempCoeffMvPerK: null, source: `${IJC}; E(T) ${BATES_NOTE}`, needsPH: false,
    model: { kind: 'bates', rangeC: [0, 60] },
  },
  {
    id: 'Ag/AgCl-1M-KCl', name: 'Silver–silver chloride, 1 M KCl',
    aliases: variants(SILVER_CHLORIDE, filling('1M', 'KCl', true)),
    potentialVvsSHE: 0.236, tempCoeffMvPerK: null, source: `${IJC}; E(T) ${BATES_NOTE}`, needsPH: false,
    model: { kind: 'bates', rangeC: [0, 60] },
  },
  {
    id: 'Ag/AgCl-0.1M-KCl', name: 'Silver–silver chloride, 0.1 M KCl',
    aliases: variants(SILVER_CHLORIDE, filling('0.1M', 'KCl', true)),
    potentialVvsSHE: 0.2895, tempCoeffMvPerK: null, source: `${IJC}; E(T) ${BATES_NOTE}`, needsPH: false,
    model: { kind: 'bates', rangeC: [0, 60] },
  },
  {
    id: 'CSE', name: 'Copper–copper sulfate, saturated CuSO4',
    aliases: [
      'Cu/CuSO4', 'Cu/CuSO4 sat', 'sat Cu/CuSO4', 'Cu/CuSO4 sat CuSO4', 'copper sulfate', 'copper sulphate',
      'copper/copper sulfate', 'copper/copper sulphate', 'copper sulfate electrode', 'saturated copper sulfate',
    ],
    potentialVvsSHE: 0.316, tempCoeffMvPerK: 0.9,
    source: `${IJC}; other printed values 0.314–0.318 V; about +0.9 mV/K, 0–60 °C (common practice)`, needsPH: false,
    model: { kind: 'linear', mvPerK: 0.9, rangeC: [0, 60] },
  },
  {
    id: 'Hg/Hg2SO4-1M-H2SO4', name: 'Mercury–mercurous sulfate, 1 M H2SO4',
    aliases: variants(MERCUROUS_SULFATE, filling('1M', 'H2SO4', false)),
    potentialVvsSHE: 0.6739, tempCoeffMvPerK: null, source: `${IJC}; E(T) ${COUPLE_NOTE}`, needsPH: false,
    model: { kind: 'couple', halfReaction: 'Hg2SO4(s) + 2 e- -> 2 Hg(l) + SO4^2-', rangeC: [0, 100] },
  },
  {
    id: 'Hg/Hg2SO4-sat-K2SO4', name: 'Mercury–mercurous sulfate, saturated K2SO4',
    aliases: variants(MERCUROUS_SULFATE, filling('sat', 'K2SO4', false)),
    potentialVvsSHE: 0.64, tempCoeffMvPerK: null,
    source: `${BARD_FAULKNER_MEMORY}; recalled printed values 0.64–0.65 V, 0.640 V used; no temperature coefficient known`, needsPH: false,
    model: { kind: 'unknown' },
  },
  {
    id: 'Hg/HgO-0.1M-NaOH', name: 'Mercury–mercuric oxide, 0.1 M NaOH',
    aliases: variants(MERCURIC_OXIDE, filling('0.1M', 'NaOH', true)),
    potentialVvsSHE: 0.165, tempCoeffMvPerK: null, source: `${IJC}; E(T) ${COUPLE_NOTE}`, needsPH: false,
    model: { kind: 'couple', halfReaction: 'HgO(s) + H2O + 2 e- -> Hg(l) + 2 OH-', rangeC: [0, 100] },
  },
  {
    id: 'Hg/HgO-1M-NaOH', name: 'Mercury–mercuric oxide, 1 M NaOH',
    aliases: variants(MERCURIC_OXIDE, filling('1M', 'NaOH', true)),
    potentialVvsSHE: 0.14, tempCoeffMvPerK: null, source: `${BARD_FAULKNER_MEMORY}; E(T) ${COUPLE_NOTE}`, needsPH: false,
    model: { kind: 'couple', halfReaction: 'HgO(s) + H2O + 2 e- -> Hg(l) + 2 OH-', rangeC: [0, 100] },
  },
  {
    id: 'RHE', name: 'Reversible hydrogen electrode (p(H2) = 1 bar, in the solution of the given pH)',
    aliases: ['reversible hydrogen electrode', 'reversible hydrogen'],
    potentialVvsSHE: 0, tempCoeffMvPerK: null,
    source: 'Definition: E(SHE) = E(RHE) − (RT ln10/F)·pH at p(H2) = 1 bar; E°(H+/H2) = 0 at every temperature (IUPAC Gold Book, "standard hydrogen electrode")',
    needsPH: true, model: { kind: 'rhe' },
  },
  {
    id: 'Ag/AgCl-seawater', name: 'Silver–silver chloride in seawater (practical salinity 35)',
    aliases: ['Ag/AgCl seawater', 'Ag/AgCl sw', 'Ag/AgCl/seawater', 'silver chloride seawater', 'Ag/AgCl sea water', 'SSC seawater'],
    potentialVvsSHE: 0.2473, tempCoeffMvPerK: null,
    source: `E°(AgCl/Ag) of Bates & Bower (1954) with a(Cl-) = 0.5658 mol/kg × (S/35) × 0.67 (chloride of standard seawater and its activity coefficient, from memory); about +0.25 V vs SHE (common practice)`,
    needsPH: false, model: { kind: 'seawater', salinity: 35, rangeC: [0, 40] },
  },
  {
    id: 'Zn-seawater', name: 'Zinc reference electrode in seawater (marine cathodic protection)',
    aliases: ['Zn seawater', 'zinc seawater', 'Zn/seawater', 'zinc reference', 'Zn sw'],
    potentialVvsSHE: -0.7827, tempCoeffMvPerK: null,
    source: 'E = E(Ag/AgCl seawater) − 1.030 V at 25 °C (DNV-RP-B401, from memory; common practice in marine cathodic protection); no temperature coefficient known',
    needsPH: false, model: { kind: 'unknown' },
  },
];

/**
 * Generic names that fit several built-in electrodes; looking them up is an `ambiguous` error.
 *
 * @example
 * AMBIGUOUS_REFERENCE_NAMES.some((a) => a.names.includes('calomel')) // true
 */
// prettier-ignore
export const AMBIGUOUS_REFERENCE_NAMES: readonly AmbiguousReferenceName[] = [
  { names: SILVER_CHLORIDE, candidateIds: ['Ag/AgCl-sat-KCl', 'Ag/AgCl-3.5M-KCl', 'Ag/AgCl-3M-KCl', 'Ag/AgCl-1M-KCl', 'Ag/AgCl-0.1M-KCl'] },
  { names: [...CALOMEL, 'calomel electrode'], candidateIds: ['SCE', 'calomel-1M-KCl', 'calomel-0.1M-KCl', 'SSCE'] },
  { names: [...MERCUROUS_SULFATE, 'MSE'], candidateIds: ['Hg/Hg2SO4-1M-H2SO4', 'Hg/Hg2SO4-sat-K2SO4'] },
  { names: MERCURIC_OXIDE, candidateIds: ['Hg/HgO-0.1M-NaOH', 'Hg/HgO-1M-NaOH'] },
];
