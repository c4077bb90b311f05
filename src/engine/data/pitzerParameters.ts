/**
 * Pitzer ion-interaction parameters at 25 °C: binary cation–anion parameters β(0), β(1),
 * β(2), Cφ with each salt's published maximum molality, and the like-charge mixing
 * parameters θ and triple-ion parameters ψ of the seawater major ions.
 *
 * All values are recalled from the publications named in each row (from memory, not re-read);
 * treat them as such. Conventions (Pitzer 1973; Pitzer & Mayorga 1973, 1974):
 * - α1 = 2.0 (kg/mol)^½ and β(2) = 0 for salts with a univalent ion (1:1, 2:1, 1:2);
 *   α1 = 1.4 and α2 = 12 for 2:2 salts; b = 1.2 (kg/mol)^½ for every salt.
 * - Pitzer & Mayorga 1973 print, for 2:1 and 1:2 salts, (4/3)β(0), (4/3)β(1) and
 *   (2^{5/2}/3)Cφ; the rows below hold β(0), β(1) and Cφ themselves (converted).
 * - Cφ is the osmotic third virial coefficient; the activity form is C = Cφ / (2 √|z+ z−|).
 *
 * Ion keys are canonical engine species text (`formatSpecies` without phase): "Na+",
 * "Mg2+", "Cl-", "SO4^2-".
 */

/** One binary cation–anion parameter set. */
export interface PitzerBinaryRow {
  /** The salt formula, e.g. "Na2SO4". */
  readonly salt: string;
  /** Cation, canonical text. */
  readonly cation: string;
  /** Anion, canonical text. */
  readonly anion: string;
  /** β(0), kg/mol. */
  readonly beta0: number;
  /** β(1), kg/mol. */
  readonly beta1: number;
  /** β(2), kg/mol (2:2 salts; 0 otherwise). */
  readonly beta2: number;
  /** Cφ, (kg/mol)². */
  readonly cphi: number;
  /** α1, (kg/mol)^½. */
  readonly alpha1: number;
  /** α2, (kg/mol)^½ (used only where β(2) ≠ 0). */
  readonly alpha2: number;
  /** The published upper limit of the fit, mol/kg of the salt. */
  readonly maxMolalityMolKg: number;
  /** The publication (with "from memory"). */
  readonly source: string;
  /**
   * First temperature derivatives at 25 °C (per K) of β(0), β(1), Cφ, where the source gives
   * them; the parameters then vary linearly in T within the row's temperature range.
   */
  readonly dTemp?: {
    readonly beta0: number;
    readonly beta1: number;
    readonly cphi: number;
    readonly source: string;
  };
  /** Temperature range of validity, °C; [25, 25] where the source gives 25 °C only. */
  readonly tempRangeC: readonly [number, number];
}

const PM73 = 'Pitzer & Mayorga, J. Phys. Chem. 77, 2300 (1973), Table II (from memory)';
const PM74 = 'Pitzer & Mayorga, J. Solution Chem. 3, 539 (1974) (from memory)';
const HMW84 = 'Harvie, Møller & Weare, Geochim. Cosmochim. Acta 48, 723 (1984) (from memory)';
const SP77 =
  'Silvester & Pitzer, J. Phys. Chem. 81, 1822 (1977), first temperature derivatives at 25 °C (from memory)';

const T25: readonly [number, number] = [25, 25];

/**
 * The publication behind the α and b conventions.
 *
 * @example
 * `α1 = 2, b = 1.2 (${PITZER_CONVENTIONS_SOURCE})`
 */
export const PITZER_CONVENTIONS_SOURCE = 'Pitzer, J. Phys. Chem. 77, 268 (1973); Pitzer & Mayorga 1973, 1974';

/** b = 1.2 (kg/mol)^½, the same for every salt (Pitzer 1973). */
export const PITZER_B = 1.2;

/**
 * Binary parameters at 25 °C (Pitzer & Mayorga 1973 for 1:1, 2:1 and 1:2 salts; 1974 for 2:2;
 * CaSO4 from Harvie, Møller & Weare 1984), from memory. For 2:1/1:2 salts, β(0), β(1), Cφ are
 * the printed (4/3)β(0), (4/3)β(1), (2^{5/2}/3)Cφ converted. NaCl carries the first
 * temperature derivatives of Silvester & Pitzer 1977, used 0–50 °C.
 *
 * @example
 * PITZER_BINARY.find((r) => r.salt === 'NaCl')?.beta0 // 0.0765
 */
// prettier-ignore
export const PITZER_BINARY: readonly PitzerBinaryRow[] = [
  // 1:1 (Pitzer & Mayorga 1973)
  { salt: 'HCl', cation: 'H+', anion: 'Cl-', beta0: 0.1775, beta1: 0.2945, beta2: 0, cphi: 0.0008, alpha1: 2, alpha2: 0, maxMolalityMolKg: 6, source: PM73, tempRangeC: T25 },
  { salt: 'LiCl', cation: 'Li+', anion: 'Cl-', beta0: 0.1494, beta1: 0.3074, beta2: 0, cphi: 0.00359, alpha1: 2, alpha2: 0, maxMolalityMolKg: 6, source: PM73, tempRangeC: T25 },
  {
    salt: 'NaCl', cation: 'Na+', anion: 'Cl-', beta0: 0.0765, beta1: 0.2664, beta2: 0, cphi: 0.00127, alpha1: 2, alpha2: 0, maxMolalityMolKg: 6, source: PM73,
    dTemp: { beta0: 7.159e-4, beta1: 7.005e-4, cphi: -1.054e-5, source: SP77 }, tempRangeC: [0, 50],
  },
  { salt: 'KCl', cation: 'K+', anion: 'Cl-', beta0: 0.04835, beta1: 0.2122, beta2: 0, cphi: -0.00084, alpha1: 2, alpha2: 0, maxMolalityMolKg: 4.8, source: PM73, tempRangeC: T25 },
  { salt: 'NaOH', cation: 'Na+', anion: 'OH-', beta0: 0.0864, beta1: 0.253, beta2: 0, cphi: 0.0044, alpha1: 2, alpha2: 0, maxMolalityMolKg: 6, source: PM73, tempRangeC: T25 },
  { salt: 'KOH', cation: 'K+', anion: 'OH-', beta0: 0.1298, beta1: 0.32, beta2: 0, cphi: 0.0041, alpha1: 2, alpha2: 0, maxMolalityMolKg: 5.5, source: PM73, tempRangeC: T25 },
  // 2:1 (Pitzer & Mayorga 1973; printed 4/3 β0, 4/3 β1, 2^(5/2)/3 Cφ converted)
  { salt: 'CaCl2', cation: 'Ca2+', anion: 'Cl-', beta0: 0.3159, beta1: 1.614, beta2: 0, cphi: -0.00034, alpha1: 2, alpha2: 0, maxMolalityMolKg: 2.5, source: PM73, tempRangeC: T25 },
  { salt: 'MgCl2', cation: 'Mg2+', anion: 'Cl-', beta0: 0.35235, beta1: 1.6815, beta2: 0, cphi: 0.00519, alpha1: 2, alpha2: 0, maxMolalityMolKg: 4.5, source: PM73, tempRangeC: T25 },
  { salt: 'ZnCl2', cation: 'Zn2+', anion: 'Cl-', beta0: 0.2602, beta1: 1.6425, beta2: 0, cphi: -0.088, alpha1: 2, alpha2: 0, maxMolalityMolKg: 1.2, source: PM73, tempRangeC: T25 },
  { salt: 'NiCl2', cation: 'Ni2+', anion: 'Cl-', beta0: 0.34792, beta1: 1.581, beta2: 0, cphi: -0.00372, alpha1: 2, alpha2: 0, maxMolalityMolKg: 2.5, source: PM73, tempRangeC: T25 },
  { salt: 'CuCl2', cation: 'Cu2+', anion: 'Cl-', beta0: 0.30802, beta1: 1.3762, beta2: 0, cphi: -0.04043, alpha1: 2, alpha2: 0, maxMolalityMolKg: 2, source: PM73, tempRangeC: T25 },
  // 1:2 (Pitzer & Mayorga 1973)
  { salt: 'Na2SO4', cation: 'Na+', anion: 'SO4^2-', beta0: 0.01958, beta1: 1.113, beta2: 0, cphi: 0.00497, alpha1: 2, alpha2: 0, maxMolalityMolKg: 4, source: PM73, tempRangeC: T25 },
  { salt: 'K2SO4', cation: 'K+', anion: 'SO4^2-', beta0: 0.04995, beta1: 0.7793, beta2: 0, cphi: 0, alpha1: 2, alpha2: 0, maxMolalityMolKg: 0.7, source: PM73, tempRangeC: T25 },
  // 2:2 (Pitzer & Mayorga 1974; α1 = 1.4, α2 = 12)
  { salt: 'MgSO4', cation: 'Mg2+', anion: 'SO4^2-', beta0: 0.221, beta1: 3.343, beta2: -37.23, cphi: 0.025, alpha1: 1.4, alpha2: 12, maxMolalityMolKg: 3, source: PM74, tempRangeC: T25 },
  { salt: 'CuSO4', cation: 'Cu2+', anion: 'SO4^2-', beta0: 0.234, beta1: 2.527, beta2: -48.33, cphi: 0.0044, alpha1: 1.4, alpha2: 12, maxMolalityMolKg: 1.4, source: PM74, tempRangeC: T25 },
  { salt: 'ZnSO4', cation: 'Zn2+', anion: 'SO4^2-', beta0: 0.1949, beta1: 2.883, beta2: -32.81, cphi: 0.029, alpha1: 1.4, alpha2: 12, maxMolalityMolKg: 3.5, source: PM74, tempRangeC: T25 },
  { salt: 'NiSO4', cation: 'Ni2+', anion: 'SO4^2-', beta0: 0.1702, beta1: 2.907, beta2: -40.06, cphi: 0.0366, alpha1: 1.4, alpha2: 12, maxMolalityMolKg: 2.5, source: PM74, tempRangeC: T25 },
  // CaSO4: the seawater set (its own binary data end near saturation, 0.015 mol/kg)
  { salt: 'CaSO4', cation: 'Ca2+', anion: 'SO4^2-', beta0: 0.2, beta1: 3.1973, beta2: -54.24, cphi: 0, alpha1: 1.4, alpha2: 12, maxMolalityMolKg: 0.015, source: HMW84, tempRangeC: T25 },
];

/** A like-charge pair parameter θ (cation–cation or anion–anion), kg/mol. */
export interface PitzerThetaRow {
  readonly ions: readonly [string, string];
  readonly theta: number;
  readonly source: string;
}

/** A triple-ion parameter ψ: two like-charged ions and one of the opposite sign, (kg/mol)². */
export interface PitzerPsiRow {
  /** The two like-charged ions. */
  readonly pair: readonly [string, string];
  /** The common ion of the opposite sign. */
  readonly common: string;
  readonly psi: number;
  readonly source: string;
}

/**
 * θ of the seawater major ions at 25 °C (Harvie, Møller & Weare 1984, from memory). The
 * unsymmetrical-mixing terms Eθ(I) are added by the engine (Pitzer 1975). Pairs not
 * listed have θ = 0 (common practice in Pitzer mixtures).
 *
 * @example
 * PITZER_THETA.find((r) => r.ions.join() === 'Na+,K+')?.theta // -0.012
 */
// prettier-ignore
export const PITZER_THETA: readonly PitzerThetaRow[] = [
  { ions: ['Na+', 'K+'], theta: -0.012, source: HMW84 },
  { ions: ['Na+', 'Mg2+'], theta: 0.07, source: HMW84 },
  { ions: ['Na+', 'Ca2+'], theta: 0.07, source: HMW84 },
  { ions: ['K+', 'Ca2+'], theta: 0.032, source: HMW84 },
  { ions: ['Mg2+', 'Ca2+'], theta: 0.007, source: HMW84 },
  { ions: ['Cl-', 'SO4^2-'], theta: 0.02, source: HMW84 },
];

/**
 * ψ of the seawater major ions at 25 °C (Harvie, Møller & Weare 1984, from memory). Triples
 * not listed have ψ = 0 (common practice).
 *
 * @example
 * PITZER_PSI.find((r) => r.pair.join() === 'Na+,K+' && r.common === 'Cl-')?.psi // -0.0018
 */
// prettier-ignore
export const PITZER_PSI: readonly PitzerPsiRow[] = [
  { pair: ['Na+', 'K+'], common: 'Cl-', psi: -0.0018, source: HMW84 },
  { pair: ['Na+', 'K+'], common: 'SO4^2-', psi: -0.01, source: HMW84 },
  { pair: ['Na+', 'Mg2+'], common: 'Cl-', psi: -0.012, source: HMW84 },
  { pair: ['Na+', 'Mg2+'], common: 'SO4^2-', psi: -0.015, source: HMW84 },
  { pair: ['Na+', 'Ca2+'], common: 'Cl-', psi: -0.007, source: HMW84 },
  { pair: ['Na+', 'Ca2+'], common: 'SO4^2-', psi: -0.055, source: HMW84 },
  { pair: ['K+', 'Mg2+'], common: 'Cl-', psi: -0.022, source: HMW84 },
  { pair: ['K+', 'Mg2+'], common: 'SO4^2-', psi: -0.048, source: HMW84 },
  { pair: ['K+', 'Ca2+'], common: 'Cl-', psi: -0.025, source: HMW84 },
  { pair: ['Mg2+', 'Ca2+'], common: 'Cl-', psi: -0.012, source: HMW84 },
  { pair: ['Mg2+', 'Ca2+'], common: 'SO4^2-', psi: 0.024, source: HMW84 },
  { pair: ['Cl-', 'SO4^2-'], common: 'Na+', psi: 0.0014, source: HMW84 },
  { pair: ['Cl-', 'SO4^2-'], common: 'Mg2+', psi: -0.004, source: HMW84 },
  { pair: ['Cl-', 'SO4^2-'], common: 'Ca2+', psi: -0.018, source: HMW84 },
];

/**
 * The ionic-strength limit of a Pitzer mixture, mol/kg: Harvie, Møller & Weare 1984 fit
 * the seawater system to about 6 mol/kg (from memory). A mixture is also held to the largest
 * binary limit among its cation–anion pairs.
 *
 * @example
 * PITZER_MIXTURE_MAX_IONIC_STRENGTH // 6
 */
export const PITZER_MIXTURE_MAX_IONIC_STRENGTH = 6;

/** The publication of the mixing parameters. */
export const PITZER_MIXING_SOURCE = HMW84;
