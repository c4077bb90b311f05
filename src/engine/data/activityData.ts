/**
 * Data for activity coefficients: the Debye–Hückel constants A and B versus temperature,
 * and Kielland's ion-size parameters å.
 *
 * A is for log10 γ with the ionic strength in mol/kg: A in (mol/kg)^−1/2. B is in
 * 10^8 cm⁻¹·(mol/kg)^−1/2, i.e. per ångström, so B·å is dimensionless per √(mol/kg) when å
 * is in Å. A = 0.509 at 25 °C is the commonly quoted rounded value; the table gives 0.5085.
 *
 * Ion sizes are recalled (from memory) from Kielland's 1937 table; treat them as weaker
 * than the Debye–Hückel constants, which were read from the named publication.
 */

/**
 * One row of the Debye–Hückel constants table.
 *
 * @example
 * const row: DebyeHuckelRow = { tempC: 25, a: 0.5085, bPerAngstrom: 0.3281 };
 */
export interface DebyeHuckelRow {
  /** Temperature in °C. */
  readonly tempC: number;
  /** A for log10 γ, in (mol/kg)^−1/2. */
  readonly a: number;
  /** B in 10^8 cm⁻¹·(mol/kg)^−1/2 (per Å). */
  readonly bPerAngstrom: number;
  /** Where the row is not read from the table's publication: how it was obtained. */
  readonly derived?: string;
}

/**
 * The publication of {@link DEBYE_HUCKEL_TABLE}.
 *
 * @example
 * `A from ${DEBYE_HUCKEL_SOURCE}`
 */
export const DEBYE_HUCKEL_SOURCE = 'Freeze & Cherry, Groundwater (1979), Appendix IV';

/**
 * How the 70–100 °C rows were derived: A ∝ √ρw/(εT)^{3/2} and B ∝ √(ρw/(εT)), with the
 * dielectric constant of water from Malmberg & Maryott, J. Res. NBS 56, 1 (1956) and the
 * density of water from Kell, J. Chem. Eng. Data 20, 97 (1975) (both fits from memory),
 * scaled to the published 60 °C row so the table is continuous. The same derivation
 * reproduces the published 10–60 °C rows within 0.0008 in A and 0.0002 in B.
 *
 * @example
 * DEBYE_HUCKEL_TABLE.filter((r) => r.derived === DEBYE_HUCKEL_DERIVATION).length // 4
 */
export const DEBYE_HUCKEL_DERIVATION =
  'derived from the dielectric constant of water (Malmberg & Maryott 1956) and its density (Kell 1975), ' +
  'scaled to the 60 °C row of Freeze & Cherry 1979';

/**
 * Debye–Hückel A and B at 0–100 °C, ascending in temperature, 4 decimals: 0–60 °C as
 * published (Freeze & Cherry 1979), 70–100 °C derived ({@link DEBYE_HUCKEL_DERIVATION}).
 * Between rows the engine interpolates linearly; outside 0–100 °C it refuses.
 *
 * @example
 * DEBYE_HUCKEL_TABLE.find((r) => r.tempC === 25)?.a // 0.5085
 */
// prettier-ignore
export const DEBYE_HUCKEL_TABLE: readonly DebyeHuckelRow[] = [
  { tempC: 0, a: 0.4883, bPerAngstrom: 0.3241 },
  { tempC: 10, a: 0.4960, bPerAngstrom: 0.3258 },
  { tempC: 20, a: 0.5042, bPerAngstrom: 0.3273 },
  { tempC: 25, a: 0.5085, bPerAngstrom: 0.3281 },
  { tempC: 30, a: 0.5130, bPerAngstrom: 0.3290 },
  { tempC: 40, a: 0.5221, bPerAngstrom: 0.3305 },
  { tempC: 50, a: 0.5319, bPerAngstrom: 0.3321 },
  { tempC: 60, a: 0.5425, bPerAngstrom: 0.3338 },
  { tempC: 70, a: 0.5539, bPerAngstrom: 0.3355, derived: DEBYE_HUCKEL_DERIVATION },
  { tempC: 80, a: 0.5661, bPerAngstrom: 0.3373, derived: DEBYE_HUCKEL_DERIVATION },
  { tempC: 90, a: 0.5792, bPerAngstrom: 0.3391, derived: DEBYE_HUCKEL_DERIVATION },
  { tempC: 100, a: 0.5933, bPerAngstrom: 0.3410, derived: DEBYE_HUCKEL_DERIVATION },
];

/**
 * One Kielland ion size.
 *
 * @example
 * const row: IonSizeRow = { ion: 'SO4^2-', sizeAngstrom: 4 };
 */
export interface IonSizeRow {
  /** The ion in canonical engine notation (`formatSpecies` without phase), e.g. "SO4^2-". */
  readonly ion: string;
  /** The ion-size parameter å in Å. */
  readonly sizeAngstrom: number;
  /** Where the table gives a range rather than one value, what was done. */
  readonly note?: string;
}

/**
 * The publication of {@link KIELLAND_ION_SIZES}; marked "from memory".
 *
 * @example
 * `å from ${KIELLAND_SOURCE}`
 */
export const KIELLAND_SOURCE = 'Kielland, J. Am. Chem. Soc. 59, 1675 (1937) (from memory)';

const RANGE_4_45 = 'Kielland gives 4.0–4.5 Å; the midpoint 4.25 Å is used';

/**
 * Kielland ion-size parameters å in Å (from memory), largest first; precision 0.5 Å (the
 * table's own grouping). Only the ions recalled are listed; others have no size.
 *
 * @example
 * KIELLAND_ION_SIZES.find((r) => r.ion === 'Cl-')?.sizeAngstrom // 3
 */
// prettier-ignore
export const KIELLAND_ION_SIZES: readonly IonSizeRow[] = [
  { ion: 'H+', sizeAngstrom: 9 },
  { ion: 'Al3+', sizeAngstrom: 9 },
  { ion: 'Fe3+', sizeAngstrom: 9 },
  { ion: 'Cr3+', sizeAngstrom: 9 },
  { ion: 'Mg2+', sizeAngstrom: 8 },
  { ion: 'Li+', sizeAngstrom: 6 },
  { ion: 'Ca2+', sizeAngstrom: 6 },
  { ion: 'Cu2+', sizeAngstrom: 6 },
  { ion: 'Zn2+', sizeAngstrom: 6 },
  { ion: 'Fe2+', sizeAngstrom: 6 },
  { ion: 'Ni2+', sizeAngstrom: 6 },
  { ion: 'Co2+', sizeAngstrom: 6 },
  { ion: 'Mn2+', sizeAngstrom: 6 },
  { ion: 'Sn2+', sizeAngstrom: 6 },
  { ion: 'Sr2+', sizeAngstrom: 5 },
  { ion: 'Ba2+', sizeAngstrom: 5 },
  { ion: 'Cd2+', sizeAngstrom: 5 },
  { ion: 'Hg2+', sizeAngstrom: 5 },
  { ion: 'S2-', sizeAngstrom: 5 },
  { ion: 'Pb2+', sizeAngstrom: 4.5 },
  { ion: 'CO3^2-', sizeAngstrom: 4.5 },
  { ion: 'Na+', sizeAngstrom: 4.25, note: RANGE_4_45 },
  { ion: 'HCO3-', sizeAngstrom: 4.25, note: RANGE_4_45 },
  { ion: 'SO4^2-', sizeAngstrom: 4 },
  { ion: 'HPO4^2-', sizeAngstrom: 4 },
  { ion: 'PO4^3-', sizeAngstrom: 4 },
  { ion: 'OH-', sizeAngstrom: 3.5 },
  { ion: 'F-', sizeAngstrom: 3.5 },
  { ion: 'MnO4-', sizeAngstrom: 3.5 },
  { ion: 'ClO4-', sizeAngstrom: 3.5 },
  { ion: 'K+', sizeAngstrom: 3 },
  { ion: 'Cl-', sizeAngstrom: 3 },
  { ion: 'Br-', sizeAngstrom: 3 },
  { ion: 'I-', sizeAngstrom: 3 },
  { ion: 'NO3-', sizeAngstrom: 3 },
  { ion: 'CN-', sizeAngstrom: 3 },
  { ion: 'Rb+', sizeAngstrom: 2.5 },
  { ion: 'Cs+', sizeAngstrom: 2.5 },
  { ion: 'NH4+', sizeAngstrom: 2.5 },
  { ion: 'Ag+', sizeAngstrom: 2.5 },
];

/** The activity models that need only the ionic strength. */
export type DebyeHuckelFamilyModel = 'limiting' | 'extended' | 'davies';

/**
 * The range of validity of one activity model, as data: the engine refuses beyond it
 * (argument error naming the range and a better model) unless the caller asks to extrapolate.
 *
 * @example
 * const r: ActivityModelRange = ACTIVITY_MODEL_RANGES.davies; // r.maxIonicStrengthMolKg === 0.5
 */
export interface ActivityModelRange {
  /** The model. */
  readonly model: DebyeHuckelFamilyModel;
  /** Largest ionic strength, mol/kg. */
  readonly maxIonicStrengthMolKg: number;
  /** Temperature range, °C (that of the A and B table). */
  readonly tempRangeC: readonly [number, number];
  /** Where the limit comes from. */
  readonly source: string;
  /** What to use instead beyond the limit. */
  readonly better: string;
}

/**
 * Validity ranges of the Debye–Hückel family (common practice; the limits usually quoted
 * with each equation): the limiting law to I = 0.005 mol/kg (quoted as 0.001–0.005), the
 * extended equation to about 0.1 mol/kg, the Davies equation to about 0.5 mol/kg (Davies 1962).
 *
 * @example
 * ACTIVITY_MODEL_RANGES.limiting.maxIonicStrengthMolKg // 0.005
 */
export const ACTIVITY_MODEL_RANGES: Readonly<Record<DebyeHuckelFamilyModel, ActivityModelRange>> = {
  limiting: {
    model: 'limiting',
    maxIonicStrengthMolKg: 0.005,
    tempRangeC: [0, 100],
    source: 'Debye & Hückel 1923 limiting law; common practice',
    better: 'model "extended" (to 0.1 mol/kg) or "davies" (to 0.5 mol/kg)',
  },
  extended: {
    model: 'extended',
    maxIonicStrengthMolKg: 0.1,
    tempRangeC: [0, 100],
    source: 'extended Debye–Hückel with Kielland ion sizes; common practice',
    better:
      'model "davies" (to 0.5 mol/kg), or "pitzer" with the composition (a salt and its molality, or the species and molalities of a mixture)',
  },
  davies: {
    model: 'davies',
    maxIonicStrengthMolKg: 0.5,
    tempRangeC: [0, 100],
    source: 'Davies, Ion Association (1962)',
    better:
      'model "pitzer" with the composition (a salt and its molality, or the species and molalities of a mixture)',
  },
};
