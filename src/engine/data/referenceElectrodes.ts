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
  /** dE/dT near 25 °C in mV/K, or null where none is known (then the 25 °C value is used). */
  readonly tempCoeffMvPerK: number | null;
  /** The publication(s) the numbers come from; "(from memory)" where recalled. */
  readonly source: string;
  /** True for an electrode whose potential depends on the solution pH (RHE). */
  readonly needsPH: boolean;
}

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
    potentialVvsSHE: 0, tempCoeffMvPerK: 0, source: IUPAC_SHE, needsPH: false,
  },
  {
    id: 'SCE', name: 'Saturated calomel electrode (Hg/Hg2Cl2, saturated KCl)',
    aliases: ['saturated calomel', 'saturated calomel electrode', ...variants(CALOMEL, filling('sat', 'KCl', true))],
    potentialVvsSHE: 0.2412, tempCoeffMvPerK: -0.66,
    source: `0.2412 V and −0.66 mV/K: ${BARD_FAULKNER_MEMORY}; ${IJC} prints 0.2410 V`, needsPH: false,
  },
  {
    id: 'calomel-1M-KCl', name: 'Calomel electrode, 1 M KCl (normal calomel, Hg/Hg2Cl2)',
    aliases: ['NCE', 'normal calomel', 'normal calomel electrode', ...variants(CALOMEL, filling('1M', 'KCl', true))],
    potentialVvsSHE: 0.2801, tempCoeffMvPerK: null, source: IJC, needsPH: false,
  },
  {
    id: 'calomel-0.1M-KCl', name: 'Calomel electrode, 0.1 M KCl (Hg/Hg2Cl2)',
    aliases: ['decinormal calomel', ...variants(CALOMEL, filling('0.1M', 'KCl', true))],
    potentialVvsSHE: 0.3337, tempCoeffMvPerK: null, source: IJC, needsPH: false,
  },
  {
    id: 'SSCE', name: 'Saturated sodium calomel electrode (Hg/Hg2Cl2, saturated NaCl)',
    aliases: ['saturated sodium calomel', 'sodium saturated calomel', ...variants(CALOMEL, filling('sat', 'NaCl', false))],
    potentialVvsSHE: 0.236, tempCoeffMvPerK: null, source: IJC, needsPH: false,
  },
  {
    id: 'Ag/AgCl-sat-KCl', name: 'Silver–silver chloride, saturated KCl',
    aliases: variants(SILVER_CHLORIDE, filling('sat', 'KCl', true)),
    potentialVvsSHE: 0.197, tempCoeffMvPerK: -1.0,
    source: `${IJC}; dE/dT about −1.0 mV/K from memory (no publication re-read)`, needsPH: false,
  },
  {
    id: 'Ag/AgCl-3.5M-KCl', name: 'Silver–silver chloride, 3.5 M KCl',
    aliases: variants(SILVER_CHLORIDE, filling('3.5M', 'KCl', true)),
    potentialVvsSHE: 0.205, tempCoeffMvPerK: null, source: IJC, needsPH: false,
  },
  {
    id: 'Ag/AgCl-3M-KCl', name: 'Silver–silver chloride, 3 M KCl',
    aliases: variants(SILVER_CHLORIDE, filling('3M', 'KCl', true)),
    potentialVvsSHE: 0.21, tempCoeffMvPerK: null, source: IJC, needsPH: false,
  },
  {
    id: 'Ag/AgCl-1M-KCl', name: 'Silver–silver chloride, 1 M KCl',
    aliases: variants(SILVER_CHLORIDE, filling('1M', 'KCl', true)),
    potentialVvsSHE: 0.236, tempCoeffMvPerK: null, source: IJC, needsPH: false,
  },
  {
    id: 'Ag/AgCl-0.1M-KCl', name: 'Silver–silver chloride, 0.1 M KCl',
    aliases: variants(SILVER_CHLORIDE, filling('0.1M', 'KCl', true)),
    potentialVvsSHE: 0.2895, tempCoeffMvPerK: null, source: IJC, needsPH: false,
  },
  {
    id: 'CSE', name: 'Copper–copper sulfate, saturated CuSO4',
    aliases: [
      'Cu/CuSO4', 'Cu/CuSO4 sat', 'sat Cu/CuSO4', 'Cu/CuSO4 sat CuSO4', 'copper sulfate', 'copper sulphate',
      'copper/copper sulfate', 'copper/copper sulphate', 'copper sulfate electrode', 'saturated copper sulfate',
    ],
    potentialVvsSHE: 0.316, tempCoeffMvPerK: null, source: `${IJC}; other printed values 0.314–0.318 V`, needsPH: false,
  },
  {
    id: 'Hg/Hg2SO4-1M-H2SO4', name: 'Mercury–mercurous sulfate, 1 M H2SO4',
    aliases: variants(MERCUROUS_SULFATE, filling('1M', 'H2SO4', false)),
    potentialVvsSHE: 0.6739, tempCoeffMvPerK: null, source: IJC, needsPH: false,
  },
  {
    id: 'Hg/Hg2SO4-sat-K2SO4', name: 'Mercury–mercurous sulfate, saturated K2SO4',
    aliases: variants(MERCUROUS_SULFATE, filling('sat', 'K2SO4', false)),
    potentialVvsSHE: 0.64, tempCoeffMvPerK: null,
    source: `${BARD_FAULKNER_MEMORY}; recalled printed values 0.64–0.65 V, 0.640 V used`, needsPH: false,
  },
  {
    id: 'Hg/HgO-0.1M-NaOH', name: 'Mercury–mercuric oxide, 0.1 M NaOH',
    aliases: variants(MERCURIC_OXIDE, filling('0.1M', 'NaOH', true)),
    potentialVvsSHE: 0.165, tempCoeffMvPerK: null, source: IJC, needsPH: false,
  },
  {
    id: 'Hg/HgO-1M-NaOH', name: 'Mercury–mercuric oxide, 1 M NaOH',
    aliases: variants(MERCURIC_OXIDE, filling('1M', 'NaOH', true)),
    potentialVvsSHE: 0.14, tempCoeffMvPerK: null, source: BARD_FAULKNER_MEMORY, needsPH: false,
  },
  {
    id: 'RHE', name: 'Reversible hydrogen electrode (p(H2) = 1 bar, in the solution of the given pH)',
    aliases: ['reversible hydrogen electrode', 'reversible hydrogen'],
    potentialVvsSHE: 0, tempCoeffMvPerK: null,
    source: 'Definition: E(SHE) = E(RHE) − (RT ln10/F)·pH at p(H2) = 1 bar; E°(H+/H2) = 0 at every temperature (IUPAC Gold Book, "standard hydrogen electrode")',
    needsPH: true,
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
