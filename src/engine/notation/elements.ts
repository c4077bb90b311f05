/**
 * Chemical element symbols (IUPAC, 1–118) and the element classes the engine
 * uses to infer a species' phase when none is written.
 */

/** All element symbols, Z = 1 … 118. */
export const ELEMENT_SYMBOLS: readonly string[] = (
  'H He Li Be B C N O F Ne Na Mg Al Si P S Cl Ar K Ca Sc Ti V Cr Mn Fe Co Ni Cu Zn Ga Ge As Se Br Kr ' +
  'Rb Sr Y Zr Nb Mo Tc Ru Rh Pd Ag Cd In Sn Sb Te I Xe Cs Ba La Ce Pr Nd Pm Sm Eu Gd Tb Dy Ho Er Tm Yb ' +
  'Lu Hf Ta W Re Os Ir Pt Au Hg Tl Pb Bi Po At Rn Fr Ra Ac Th Pa U Np Pu Am Cm Bk Cf Es Fm Md No Lr ' +
  'Rf Db Sg Bh Hs Mt Ds Rg Cn Nh Fl Mc Lv Ts Og'
).split(' ');

const SYMBOL_SET = new Set(ELEMENT_SYMBOLS);

/**
 * True where `symbol` is an element symbol (case-sensitive: "Co" yes, "CO" no).
 *
 * @example
 * isElementSymbol('Fe') // true
 */
export function isElementSymbol(symbol: string): boolean {
  return SYMBOL_SET.has(symbol);
}

const NON_METALS = new Set([
  'H',
  'He',
  'B',
  'C',
  'N',
  'O',
  'F',
  'Ne',
  'Si',
  'P',
  'S',
  'Cl',
  'Ar',
  'As',
  'Se',
  'Br',
  'Kr',
  'Te',
  'I',
  'Xe',
  'At',
  'Rn',
  'Og',
  'Ts',
]);

/**
 * True for metallic elements (everything but the non-metals and metalloids
 * B, Si, As, Te, which are still solid as elements).
 *
 * @example
 * isMetal('Zn') // true
 */
export function isMetal(symbol: string): boolean {
  return SYMBOL_SET.has(symbol) && !NON_METALS.has(symbol);
}

/** Formulas (neutral) that are gases at 25 °C and 1 bar, when no phase is written. */
export const GAS_FORMULAS: ReadonlySet<string> = new Set([
  'H2',
  'O2',
  'N2',
  'Cl2',
  'F2',
  'O3',
  'He',
  'Ne',
  'Ar',
  'Kr',
  'Xe',
  'Rn',
  'CO',
  'CO2',
  'NO',
  'NO2',
  'N2O',
  'H2S',
  'SO2',
  'NH3',
  'CH4',
  'HCN',
  'ClO2',
]);

/** Neutral formulas that are liquids at 25 °C when no phase is written. */
export const LIQUID_FORMULAS: ReadonlySet<string> = new Set(['H2O', 'Hg', 'Br2']);

/**
 * Inert electrode materials, recognised in cell diagrams. They carry electrons
 * but take no part in the half-reaction unless the half-reaction names them.
 */
export const INERT_ELECTRODES: ReadonlySet<string> = new Set(['Pt', 'Au', 'C', 'Pd', 'Ir', 'Rh']);
