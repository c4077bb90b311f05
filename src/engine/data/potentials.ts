/**
 * Built-in table of standard reduction potentials.
 *
 * Each row is a half-reaction written as a reduction, its standard potential E° at 25 °C in
 * volts on the standard hydrogen electrode (SHE) scale, its temperature coefficient dE°/dT
 * in mV/K where one is known (else `null`, and E° at other temperatures falls back to the
 * 25 °C value), and the publication the number comes from.
 *
 * Standard state: solutes at unit activity (1 mol/L), gases at 1 bar, pure solids and
 * liquids and water at unit activity. Some handbook values are referred to 1 atm; they are
 * carried as published, since the shift from 1 atm to 1 bar is at most about 0.34 mV for any
 * row here (0.169 mV for H+/H2), below the printed precision of most rows.
 *
 * Where OpenStax Chemistry 2e (Appendix L) gives a value, it is the primary one; other rows
 * come from the CRC Handbook of Chemistry and Physics. A source ending in "(from memory)"
 * marks a value recalled from that handbook rather than re-read from a copy, and is weaker.
 *
 * Notation follows the engine's reaction syntax: terms joined by " + ", arrow " -> ",
 * integer coefficients, charges written with a caret (`SO4^2-`, `VO2^+`) wherever the last
 * digit of a formula could be misread as a charge, phases in parentheses where they matter.
 * Rows are grouped by the element whose redox chemistry they describe (in order of atomic
 * number) and, within a group, sorted by increasing E°.
 */

/** One row of the built-in table of standard reduction potentials. */
export interface BuiltinPotentialRow {
  /** Half-reaction written as a reduction, e.g. "Fe3+ + e- -> Fe2+". */
  readonly halfReaction: string;
  /** E° at 25 °C in volts vs SHE. */
  readonly e0V: number;
  /** dE°/dT in mV/K near 25 °C, or null where none is published/known. */
  readonly dE0dTmVperK: number | null;
  /** The publication (edition, table) the E° comes from; "from memory" where recalled. */
  readonly source: string;
}

const OSX = 'OpenStax Chemistry 2e, Appendix L';
const CRC54 = 'CRC Handbook of Chemistry and Physics, 54th ed., p. D-120';
const CRC92 = 'CRC Handbook of Chemistry and Physics, 92nd ed., Electrochemical Series';
const CRC92_MEMORY = `${CRC92} (from memory)`;
const BRATSCH_MEMORY = 'dE°/dT from memory, Bratsch, J. Phys. Chem. Ref. Data 18, 1 (1989)';
const OSX_BRATSCH = `${OSX}; ${BRATSCH_MEMORY}`;
const OSX_SHE = `${OSX}; zero at every temperature by definition (IUPAC Gold Book, standard hydrogen electrode)`;
const OSX_BB = `${OSX}; dE°/dT derived from the 20-30 °C values of Bates & Bower, J. Res. NBS 53, 283 (1954)`;

// prettier-ignore
export const BUILTIN_POTENTIALS: readonly BuiltinPotentialRow[] = [
  // Hydrogen
  { halfReaction: 'H2(g) + 2 e- -> 2 H-', e0V: -2.23, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: '2 H2O + 2 e- -> H2(g) + 2 OH-', e0V: -0.8277, dE0dTmVperK: null, source: OSX },
  { halfReaction: '2 H+ + 2 e- -> H2(g)', e0V: 0, dE0dTmVperK: 0, source: OSX_SHE },

  // Lithium
  { halfReaction: 'Li+ + e- -> Li', e0V: -3.04, dE0dTmVperK: -0.51, source: OSX_BRATSCH },

  // Beryllium
  { halfReaction: 'Be2+ + 2 e- -> Be', e0V: -1.847, dE0dTmVperK: null, source: CRC92_MEMORY },

  // Nitrogen
  { halfReaction: 'NO3- + H2O + 2 e- -> NO2- + 2 OH-', e0V: 0.01, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'NO3- + 2 H+ + e- -> NO2(g) + H2O', e0V: 0.803, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'NO3- + 3 H+ + 2 e- -> HNO2 + H2O', e0V: 0.934, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'NO3- + 4 H+ + 3 e- -> NO(g) + 2 H2O', e0V: 0.957, dE0dTmVperK: null, source: OSX },
  { halfReaction: 'HNO2 + H+ + e- -> NO(g) + H2O', e0V: 0.983, dE0dTmVperK: null, source: CRC92_MEMORY },

  // Oxygen (water, peroxide, ozone)
  { halfReaction: 'O2(g) + H2O + 2 e- -> HO2- + OH-', e0V: -0.076, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'O2(g) + 2 H2O + 4 e- -> 4 OH-', e0V: 0.401, dE0dTmVperK: null, source: OSX },
  { halfReaction: 'O2(g) + 2 H+ + 2 e- -> H2O2', e0V: 0.695, dE0dTmVperK: null, source: OSX },
  { halfReaction: 'HO2- + H2O + 2 e- -> 3 OH-', e0V: 0.878, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'O2(g) + 4 H+ + 4 e- -> 2 H2O', e0V: 1.229, dE0dTmVperK: -0.846, source: OSX_BRATSCH },
  { halfReaction: 'H2O2 + 2 H+ + 2 e- -> 2 H2O', e0V: 1.776, dE0dTmVperK: null, source: OSX },
  { halfReaction: 'O3(g) + 2 H+ + 2 e- -> O2(g) + H2O', e0V: 2.076, dE0dTmVperK: null, source: CRC92_MEMORY },

  // Fluorine
  { halfReaction: 'F2(g) + 2 e- -> 2 F-', e0V: 2.866, dE0dTmVperK: null, source: OSX },
  { halfReaction: 'F2(g) + 2 H+ + 2 e- -> 2 HF(aq)', e0V: 3.053, dE0dTmVperK: null, source: CRC92_MEMORY },

  // Sodium
  { halfReaction: 'Na+ + e- -> Na', e0V: -2.71, dE0dTmVperK: -0.76, source: OSX_BRATSCH },

  // Magnesium
  { halfReaction: 'Mg(OH)2(s) + 2 e- -> Mg + 2 OH-', e0V: -2.69, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'Mg2+ + 2 e- -> Mg', e0V: -2.372, dE0dTmVperK: null, source: OSX },

  // Aluminium
  { halfReaction: 'Al(OH)3(s) + 3 e- -> Al + 3 OH-', e0V: -2.31, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'Al3+ + 3 e- -> Al', e0V: -1.662, dE0dTmVperK: null, source: OSX },

  // Sulfur
  { halfReaction: 'SO4^2- + H2O + 2 e- -> SO3^2- + 2 OH-', e0V: -0.93, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'S(s) + 2 e- -> S2-', e0V: -0.47627, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'S4O6^2- + 2 e- -> 2 S2O3^2-', e0V: 0.08, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'S(s) + 2 H+ + 2 e- -> H2S(aq)', e0V: 0.142, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'SO4^2- + 4 H+ + 2 e- -> H2SO3 + H2O', e0V: 0.172, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'S2O8^2- + 2 e- -> 2 SO4^2-', e0V: 2.01, dE0dTmVperK: null, source: CRC92_MEMORY },

  // Chlorine
  { halfReaction: 'ClO- + H2O + 2 e- -> Cl- + 2 OH-', e0V: 0.81, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'ClO4- + 2 H+ + 2 e- -> ClO3- + H2O', e0V: 1.189, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'ClO3- + 3 H+ + 2 e- -> HClO2 + H2O', e0V: 1.214, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'Cl2(g) + 2 e- -> 2 Cl-', e0V: 1.35827, dE0dTmVperK: -1.25, source: OSX_BRATSCH },
  { halfReaction: 'ClO4- + 8 H+ + 8 e- -> Cl- + 4 H2O', e0V: 1.389, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'ClO3- + 6 H+ + 6 e- -> Cl- + 3 H2O', e0V: 1.451, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'HClO + H+ + 2 e- -> Cl- + H2O', e0V: 1.482, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: '2 HClO + 2 H+ + 2 e- -> Cl2(g) + 2 H2O', e0V: 1.611, dE0dTmVperK: null, source: CRC92_MEMORY },

  // Potassium
  { halfReaction: 'K+ + e- -> K', e0V: -2.931, dE0dTmVperK: -1.07, source: OSX_BRATSCH },

  // Calcium
  { halfReaction: 'Ca2+ + 2 e- -> Ca', e0V: -2.868, dE0dTmVperK: null, source: CRC92_MEMORY },

  // Titanium
  { halfReaction: 'Ti2+ + 2 e- -> Ti', e0V: -1.63, dE0dTmVperK: null, source: CRC92_MEMORY },

  // Vanadium
  { halfReaction: 'V2+ + 2 e- -> V', e0V: -1.175, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'V3+ + e- -> V2+', e0V: -0.255, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'VO^2+ + 2 H+ + e- -> V3+ + H2O', e0V: 0.337, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'VO2^+ + 2 H+ + e- -> VO^2+ + H2O', e0V: 0.991, dE0dTmVperK: null, source: CRC92_MEMORY },

  // Chromium
  { halfReaction: 'Cr2+ + 2 e- -> Cr', e0V: -0.913, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'Cr3+ + 3 e- -> Cr', e0V: -0.744, dE0dTmVperK: null, source: OSX },
  { halfReaction: 'Cr3+ + e- -> Cr2+', e0V: -0.407, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'CrO4^2- + 4 H2O + 3 e- -> Cr(OH)3(s) + 5 OH-', e0V: -0.13, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'Cr2O7^2- + 14 H+ + 6 e- -> 2 Cr3+ + 7 H2O', e0V: 1.232, dE0dTmVperK: null, source: OSX },

  // Manganese
  { halfReaction: 'Mn(OH)2(s) + 2 e- -> Mn + 2 OH-', e0V: -1.56, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'Mn2+ + 2 e- -> Mn', e0V: -1.185, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'MnO4- + e- -> MnO4^2-', e0V: 0.558, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'MnO4- + 2 H2O + 3 e- -> MnO2(s) + 4 OH-', e0V: 0.595, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'MnO2(s) + 4 H+ + 2 e- -> Mn2+ + 2 H2O', e0V: 1.224, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'MnO4- + 8 H+ + 5 e- -> Mn2+ + 4 H2O', e0V: 1.507, dE0dTmVperK: null, source: OSX },
  { halfReaction: 'Mn3+ + e- -> Mn2+', e0V: 1.5415, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'MnO4- + 4 H+ + 3 e- -> MnO2(s) + 2 H2O', e0V: 1.679, dE0dTmVperK: null, source: CRC92_MEMORY },

  // Iron
  { halfReaction: 'Fe(OH)3(s) + e- -> Fe(OH)2(s) + OH-', e0V: -0.56, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'Fe2+ + 2 e- -> Fe', e0V: -0.447, dE0dTmVperK: null, source: OSX },
  { halfReaction: 'Fe3+ + 3 e- -> Fe', e0V: -0.037, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: '[Fe(CN)6]^3- + e- -> [Fe(CN)6]^4-', e0V: 0.358, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'Fe3+ + e- -> Fe2+', e0V: 0.771, dE0dTmVperK: 1.18, source: OSX_BRATSCH },

  // Cobalt
  { halfReaction: 'Co(OH)2(s) + 2 e- -> Co + 2 OH-', e0V: -0.73, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'Co2+ + 2 e- -> Co', e0V: -0.28, dE0dTmVperK: null, source: OSX },
  { halfReaction: 'Co3+ + e- -> Co2+', e0V: 1.92, dE0dTmVperK: null, source: CRC92_MEMORY },

  // Nickel
  { halfReaction: 'Ni(OH)2(s) + 2 e- -> Ni + 2 OH-', e0V: -0.72, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'Ni2+ + 2 e- -> Ni', e0V: -0.257, dE0dTmVperK: null, source: OSX },
  { halfReaction: 'NiO2(s) + 2 H2O + 2 e- -> Ni(OH)2(s) + 2 OH-', e0V: 0.49, dE0dTmVperK: null, source: OSX },
  { halfReaction: 'NiO2(s) + 4 H+ + 2 e- -> Ni2+ + 2 H2O', e0V: 1.678, dE0dTmVperK: null, source: CRC92_MEMORY },

  // Copper
  { halfReaction: 'Cu2O(s) + H2O + 2 e- -> 2 Cu + 2 OH-', e0V: -0.36, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'Cu2+ + e- -> Cu+', e0V: 0.153, dE0dTmVperK: null, source: OSX },
  { halfReaction: 'Cu2+ + 2 e- -> Cu', e0V: 0.337, dE0dTmVperK: 0.011, source: OSX_BRATSCH },
  { halfReaction: 'Cu+ + e- -> Cu', e0V: 0.521, dE0dTmVperK: null, source: OSX },

  // Zinc
  { halfReaction: 'ZnO(s) + H2O + 2 e- -> Zn + 2 OH-', e0V: -1.26, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'Zn(OH)2(s) + 2 e- -> Zn + 2 OH-', e0V: -1.249, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'ZnO2^2- + 2 H2O + 2 e- -> Zn + 4 OH-', e0V: -1.215, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'Zn2+ + 2 e- -> Zn', e0V: -0.7618, dE0dTmVperK: 0.119, source: OSX_BRATSCH },

  // Gallium
  { halfReaction: 'Ga3+ + 3 e- -> Ga', e0V: -0.549, dE0dTmVperK: null, source: CRC92_MEMORY },

  // Bromine
  { halfReaction: 'Br2(l) + 2 e- -> 2 Br-', e0V: 1.065, dE0dTmVperK: null, source: CRC54 },
  { halfReaction: 'Br2(aq) + 2 e- -> 2 Br-', e0V: 1.0873, dE0dTmVperK: null, source: OSX },
  { halfReaction: 'BrO3- + 6 H+ + 6 e- -> Br- + 3 H2O', e0V: 1.423, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: '2 BrO3- + 12 H+ + 10 e- -> Br2(l) + 6 H2O', e0V: 1.482, dE0dTmVperK: null, source: CRC92_MEMORY },

  // Rubidium
  { halfReaction: 'Rb+ + e- -> Rb', e0V: -2.98, dE0dTmVperK: null, source: CRC92_MEMORY },

  // Strontium
  { halfReaction: 'Sr2+ + 2 e- -> Sr', e0V: -2.899, dE0dTmVperK: null, source: CRC92_MEMORY },

  // Palladium
  { halfReaction: 'Pd2+ + 2 e- -> Pd', e0V: 0.951, dE0dTmVperK: null, source: CRC92_MEMORY },

  // Silver
  { halfReaction: 'Ag2S(s) + 2 e- -> 2 Ag + S2-', e0V: -0.691, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'AgI(s) + e- -> Ag + I-', e0V: -0.15224, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'AgBr(s) + e- -> Ag + Br-', e0V: 0.07133, dE0dTmVperK: null, source: CRC92 },
  { halfReaction: 'AgCl(s) + e- -> Ag + Cl-', e0V: 0.22233, dE0dTmVperK: -0.65, source: OSX_BB },
  { halfReaction: 'Ag2O(s) + H2O + 2 e- -> 2 Ag + 2 OH-', e0V: 0.342, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: '[Ag(NH3)2]+ + e- -> Ag + 2 NH3(aq)', e0V: 0.373, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'Ag2CrO4(s) + 2 e- -> 2 Ag + CrO4^2-', e0V: 0.447, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'Ag2SO4(s) + 2 e- -> 2 Ag + SO4^2-', e0V: 0.654, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'Ag+ + e- -> Ag', e0V: 0.7996, dE0dTmVperK: -0.989, source: OSX_BRATSCH },
  { halfReaction: 'Ag2+ + e- -> Ag+', e0V: 1.98, dE0dTmVperK: null, source: CRC92_MEMORY },

  // Cadmium
  { halfReaction: 'Cd(OH)2(s) + 2 e- -> Cd + 2 OH-', e0V: -0.812, dE0dTmVperK: null, source: CRC54 },
  { halfReaction: 'Cd2+ + 2 e- -> Cd', e0V: -0.403, dE0dTmVperK: null, source: CRC92_MEMORY },

  // Indium
  { halfReaction: 'In3+ + 3 e- -> In', e0V: -0.3382, dE0dTmVperK: null, source: CRC92_MEMORY },

  // Tin
  { halfReaction: 'Sn2+ + 2 e- -> Sn', e0V: -0.1375, dE0dTmVperK: null, source: OSX },
  { halfReaction: 'Sn4+ + 2 e- -> Sn2+', e0V: 0.151, dE0dTmVperK: null, source: OSX },

  // Iodine
  { halfReaction: 'I2(s) + 2 e- -> 2 I-', e0V: 0.5355, dE0dTmVperK: null, source: OSX },
  { halfReaction: 'I3^- + 2 e- -> 3 I-', e0V: 0.536, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: '2 IO3- + 12 H+ + 10 e- -> I2(s) + 6 H2O', e0V: 1.195, dE0dTmVperK: null, source: CRC92_MEMORY },

  // Caesium
  { halfReaction: 'Cs+ + e- -> Cs', e0V: -3.026, dE0dTmVperK: null, source: CRC92_MEMORY },

  // Barium
  { halfReaction: 'Ba2+ + 2 e- -> Ba', e0V: -2.912, dE0dTmVperK: null, source: CRC92_MEMORY },

  // Lanthanum
  { halfReaction: 'La3+ + 3 e- -> La', e0V: -2.379, dE0dTmVperK: null, source: CRC92_MEMORY },

  // Cerium
  { halfReaction: 'Ce3+ + 3 e- -> Ce', e0V: -2.336, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'Ce4+ + e- -> Ce3+', e0V: 1.61, dE0dTmVperK: null, source: OSX },

  // Platinum
  { halfReaction: '[PtCl4]^2- + 2 e- -> Pt + 4 Cl-', e0V: 0.755, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'Pt2+ + 2 e- -> Pt', e0V: 1.18, dE0dTmVperK: null, source: CRC92_MEMORY },

  // Gold
  { halfReaction: '[AuCl4]- + 3 e- -> Au + 4 Cl-', e0V: 1.002, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'Au3+ + 2 e- -> Au+', e0V: 1.401, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'Au3+ + 3 e- -> Au', e0V: 1.498, dE0dTmVperK: null, source: OSX },
  { halfReaction: 'Au+ + e- -> Au', e0V: 1.692, dE0dTmVperK: null, source: CRC92_MEMORY },

  // Mercury
  { halfReaction: 'HgO(s) + H2O + 2 e- -> Hg(l) + 2 OH-', e0V: 0.0977, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'Hg2Cl2(s) + 2 e- -> 2 Hg(l) + 2 Cl-', e0V: 0.26808, dE0dTmVperK: -0.3, source: OSX_BRATSCH },
  { halfReaction: 'Hg2SO4(s) + 2 e- -> 2 Hg(l) + SO4^2-', e0V: 0.6125, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'Hg2^2+ + 2 e- -> 2 Hg(l)', e0V: 0.7973, dE0dTmVperK: null, source: OSX },
  { halfReaction: 'Hg2+ + 2 e- -> Hg(l)', e0V: 0.851, dE0dTmVperK: null, source: OSX },
  { halfReaction: '2 Hg2+ + 2 e- -> Hg2^2+', e0V: 0.92, dE0dTmVperK: null, source: CRC92_MEMORY },

  // Thallium
  { halfReaction: 'Tl+ + e- -> Tl', e0V: -0.336, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'Tl3+ + 2 e- -> Tl+', e0V: 1.252, dE0dTmVperK: null, source: CRC92_MEMORY },

  // Lead
  { halfReaction: 'PbO(s) + H2O + 2 e- -> Pb + 2 OH-', e0V: -0.58, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'PbSO4(s) + 2 e- -> Pb + SO4^2-', e0V: -0.3505, dE0dTmVperK: null, source: OSX },
  { halfReaction: 'PbCl2(s) + 2 e- -> Pb + 2 Cl-', e0V: -0.2675, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'Pb2+ + 2 e- -> Pb', e0V: -0.1262, dE0dTmVperK: null, source: OSX },
  { halfReaction: 'PbO2(s) + 4 H+ + 2 e- -> Pb2+ + 2 H2O', e0V: 1.455, dE0dTmVperK: null, source: CRC92_MEMORY },
  { halfReaction: 'PbO2(s) + SO4^2- + 4 H+ + 2 e- -> PbSO4(s) + 2 H2O', e0V: 1.69, dE0dTmVperK: null, source: OSX },

  // Bismuth
  { halfReaction: 'Bi3+ + 3 e- -> Bi', e0V: 0.308, dE0dTmVperK: null, source: CRC92_MEMORY },
];
