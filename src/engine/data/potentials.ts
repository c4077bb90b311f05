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
 * the species layer was set to agree with it (see MEASURED in species/standard.ts).
 *
 * Notation follows the engine's reaction syntax: terms joined by " + ", arrow " -> ",
 * integer coefficients, charges written with a caret (`SO4^2-`, `VO2^+`) wherever the last
 * digit of a formula could be misread as a charge, phases in parentheses where they matter.
 * Rows are grouped by the element whose redox chemistry they describe (in order of atomic
 * number) and, within a group, sorted by increasing E°.
 */

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

const OSX = 'OpenStax Chemistry 2e, Appendix L';
const CRC54 = 'CRC Handbook of Chemistry and Physics, 54th ed., p. D-120';
const CRC92 = 'CRC Handbook of Chemistry and Physics, 92nd ed., Electrochemical Series';
const CRC92_MEMORY = `${CRC92} (from memory)`;
const LAYER = 'E° and dE°/dT from the species data (NBS tables, Wagman et al. 1982, from memory';

// prettier-ignore
const ROWS: readonly Omit<BuiltinPotentialRow, 'source'>[] = [
  // Hydrogen
  { halfReaction: 'H2(g) + 2 e- -> 2 H-', e0V: -2.23, dE0dTmVperK: null, published: { e0V: -2.23, source: OSX } },
  { halfReaction: '2 H2O + 2 e- -> H2(g) + 2 OH-', e0V: -0.8279, dE0dTmVperK: -0.836, published: { e0V: -0.8277, source: OSX } },
  { halfReaction: '2 H+ + 2 e- -> H2(g)', e0V: 0, dE0dTmVperK: 0, published: { e0V: 0, source: OSX } },

  // Lithium
  { halfReaction: 'Li+ + e- -> Li', e0V: -3.04, dE0dTmVperK: -0.514, published: { e0V: -3.04, source: OSX } },

  // Beryllium
  { halfReaction: 'Be2+ + 2 e- -> Be', e0V: -1.9678, dE0dTmVperK: 0.044, published: { e0V: -1.847, source: OSX } },

  // Nitrogen
  { halfReaction: 'NO3- + H2O + 2 e- -> NO2- + 2 OH-', e0V: 0.0042, dE0dTmVperK: -1.272, published: { e0V: 0.1, source: OSX } },
  { halfReaction: 'NO3- + 2 H+ + e- -> NO2(g) + H2O', e0V: 0.7989, dE0dTmVperK: 1.018, published: { e0V: 0.803, source: CRC92_MEMORY } },
  { halfReaction: 'NO3- + 3 H+ + 2 e- -> HNO2 + H2O', e0V: 0.9275, dE0dTmVperK: -0.371, published: { e0V: 0.92, source: OSX } },
  { halfReaction: 'NO3- + 4 H+ + 3 e- -> NO(g) + 2 H2O', e0V: 0.9638, dE0dTmVperK: 0.028, published: { e0V: 0.957, source: OSX } },
  { halfReaction: 'HNO2 + H+ + e- -> NO(g) + H2O', e0V: 1.0362, dE0dTmVperK: 0.826, published: { e0V: 0.983, source: CRC92_MEMORY } },

  // Oxygen (water, peroxide, ozone)
  { halfReaction: 'O2(g) + H2O + 2 e- -> HO2- + OH-', e0V: -0.0652, dE0dTmVperK: -2.035, published: { e0V: -0.076, source: CRC92_MEMORY } },
  { halfReaction: 'O2(g) + 2 H2O + 4 e- -> 4 OH-', e0V: 0.4009, dE0dTmVperK: -1.682, published: { e0V: 0.401, source: OSX } },
  { halfReaction: 'O2(g) + 2 H+ + 2 e- -> H2O2', e0V: 0.6946, dE0dTmVperK: -0.995, published: { e0V: 0.695, source: OSX } },
  { halfReaction: 'HO2- + H2O + 2 e- -> 3 OH-', e0V: 0.867, dE0dTmVperK: -1.33, published: { e0V: 0.878, source: OSX } },
  { halfReaction: 'O2(g) + 4 H+ + 4 e- -> 2 H2O', e0V: 1.2288, dE0dTmVperK: -0.846, published: { e0V: 1.229, source: OSX } },
  { halfReaction: 'H2O2 + 2 H+ + 2 e- -> 2 H2O', e0V: 1.7631, dE0dTmVperK: -0.698, published: { e0V: 1.776, source: OSX } },
  { halfReaction: 'O3(g) + 2 H+ + 2 e- -> O2(g) + H2O', e0V: 2.0746, dE0dTmVperK: -0.49, published: { e0V: 2.076, source: CRC92_MEMORY } },

  // Fluorine
  { halfReaction: 'F2(g) + 2 e- -> 2 F-', e0V: 2.8895, dE0dTmVperK: -1.871, published: { e0V: 2.866, source: OSX } },
  { halfReaction: 'F2(g) + 2 H+ + 2 e- -> 2 HF(aq)', e0V: 3.0763, dE0dTmVperK: -0.809, published: { e0V: 3.053, source: CRC92_MEMORY } },

  // Sodium
  { halfReaction: 'Na+ + e- -> Na', e0V: -2.71, dE0dTmVperK: -0.758, published: { e0V: -2.71, source: OSX } },

  // Magnesium
  { halfReaction: 'Mg(OH)2(s) + 2 e- -> Mg + 2 OH-', e0V: -2.6896, dE0dTmVperK: -0.947, published: { e0V: -2.69, source: CRC92_MEMORY } },
  { halfReaction: 'Mg2+ + 2 e- -> Mg', e0V: -2.372, dE0dTmVperK: 0.208, published: { e0V: -2.372, source: OSX } },

  // Aluminium
  { halfReaction: 'Al(OH)3(s) + 3 e- -> Al + 3 OH-', e0V: -2.31, dE0dTmVperK: null, published: { e0V: -2.31, source: CRC92_MEMORY } },
  { halfReaction: 'Al3+ + 3 e- -> Al', e0V: -1.662, dE0dTmVperK: 0.532, published: { e0V: -1.662, source: OSX } },

  // Sulfur
  { halfReaction: 'SO4^2- + H2O + 2 e- -> SO3^2- + 2 OH-', e0V: -0.9363, dE0dTmVperK: -1.405, published: { e0V: -0.93, source: CRC92_MEMORY } },
  { halfReaction: 'S(s) + 2 e- -> S2-', e0V: -0.4446, dE0dTmVperK: -0.918, published: { e0V: -0.47627, source: OSX } },
  { halfReaction: 'S4O6^2- + 2 e- -> 2 S2O3^2-', e0V: 0.1182, dE0dTmVperK: -1.316, published: { e0V: 0.08, source: CRC92_MEMORY } },
  { halfReaction: 'S(s) + 2 H+ + 2 e- -> H2S(aq)', e0V: 0.1442, dE0dTmVperK: -0.215, published: { e0V: 0.142, source: OSX } },
  { halfReaction: 'SO4^2- + 4 H+ + 2 e- -> H2SO3 + H2O', e0V: 0.1576, dE0dTmVperK: 0.784, published: { e0V: 0.172, source: CRC92_MEMORY } },
  { halfReaction: 'S2O8^2- + 2 e- -> 2 SO4^2-', e0V: 1.9389, dE0dTmVperK: -1.735, published: { e0V: 2.01, source: CRC92_MEMORY } },

  // Chlorine
  { halfReaction: 'ClO- + H2O + 2 e- -> Cl- + 2 OH-', e0V: 0.8902, dE0dTmVperK: -1.076, published: { e0V: 0.89, source: OSX } },
  { halfReaction: 'ClO4- + 2 H+ + 2 e- -> ClO3- + H2O', e0V: 1.2259, dE0dTmVperK: -0.417, published: { e0V: 1.189, source: OSX } },
  { halfReaction: 'ClO3- + 3 H+ + 2 e- -> HClO2 + H2O', e0V: 1.1571, dE0dTmVperK: -0.18, published: { e0V: 1.21, source: OSX } },
  { halfReaction: 'Cl2(g) + 2 e- -> 2 Cl-', e0V: 1.3601, dE0dTmVperK: -1.248, published: { e0V: 1.35827, source: OSX } },
  { halfReaction: 'ClO4- + 8 H+ + 8 e- -> Cl- + 4 H2O', e0V: 1.3878, dE0dTmVperK: -0.478, published: { e0V: 1.389, source: CRC92_MEMORY } },
  { halfReaction: 'ClO3- + 6 H+ + 6 e- -> Cl- + 3 H2O', e0V: 1.4418, dE0dTmVperK: -0.498, published: { e0V: 1.451, source: CRC92_MEMORY } },
  { halfReaction: 'HClO + H+ + 2 e- -> Cl- + H2O', e0V: 1.4948, dE0dTmVperK: -0.758, published: { e0V: 1.482, source: OSX } },
  { halfReaction: '2 HClO + 2 H+ + 2 e- -> Cl2(g) + 2 H2O', e0V: 1.6296, dE0dTmVperK: -0.268, published: { e0V: 1.611, source: OSX } },

  // Potassium
  { halfReaction: 'K+ + e- -> K', e0V: -2.931, dE0dTmVperK: -1.074, published: { e0V: -2.931, source: OSX } },

  // Calcium
  { halfReaction: 'Ca2+ + 2 e- -> Ca', e0V: -2.868, dE0dTmVperK: -0.187, published: { e0V: -2.868, source: OSX } },

  // Titanium
  { halfReaction: 'Ti2+ + 2 e- -> Ti', e0V: -1.63, dE0dTmVperK: null, published: { e0V: -1.63, source: OSX } },

  // Vanadium
  { halfReaction: 'V2+ + 2 e- -> V', e0V: -1.175, dE0dTmVperK: null, published: { e0V: -1.19, source: OSX } },
  { halfReaction: 'V3+ + e- -> V2+', e0V: -0.255, dE0dTmVperK: null, published: { e0V: -0.255, source: CRC92_MEMORY } },
  { halfReaction: 'VO^2+ + 2 H+ + e- -> V3+ + H2O', e0V: 0.337, dE0dTmVperK: null, published: { e0V: 0.337, source: CRC92_MEMORY } },
  { halfReaction: 'VO2^+ + 2 H+ + e- -> VO^2+ + H2O', e0V: 0.991, dE0dTmVperK: null, published: { e0V: 0.991, source: CRC92_MEMORY } },

  // Chromium
  { halfReaction: 'Cr2+ + 2 e- -> Cr', e0V: -0.913, dE0dTmVperK: null, published: { e0V: -0.913, source: OSX } },
  { halfReaction: 'Cr3+ + 3 e- -> Cr', e0V: -0.744, dE0dTmVperK: null, published: { e0V: -0.744, source: OSX } },
  { halfReaction: 'Cr3+ + e- -> Cr2+', e0V: -0.406, dE0dTmVperK: null, published: { e0V: -0.407, source: OSX } },
  { halfReaction: 'CrO4^2- + 4 H2O + 3 e- -> Cr(OH)3(s) + 5 OH-', e0V: -0.13, dE0dTmVperK: null, published: { e0V: -0.13, source: OSX } },
  { halfReaction: 'Cr2O7^2- + 14 H+ + 6 e- -> 2 Cr3+ + 7 H2O', e0V: 1.3638, dE0dTmVperK: null, published: { e0V: 1.232, source: OSX } },

  // Manganese
  { halfReaction: 'Mn(OH)2(s) + 2 e- -> Mn + 2 OH-', e0V: -1.5573, dE0dTmVperK: -1.137, published: { e0V: -1.56, source: CRC92_MEMORY } },
  { halfReaction: 'Mn2+ + 2 e- -> Mn', e0V: -1.185, dE0dTmVperK: -0.13, published: { e0V: -1.185, source: OSX } },
  { halfReaction: 'MnO4- + e- -> MnO4^2-', e0V: 0.5237, dE0dTmVperK: -2.047, published: { e0V: 0.558, source: CRC92_MEMORY } },
  { halfReaction: 'MnO4- + 2 H2O + 3 e- -> MnO2(s) + 4 OH-', e0V: 0.5862, dE0dTmVperK: -1.786, published: { e0V: 0.558, source: OSX } },
  { halfReaction: 'MnO2(s) + 4 H+ + 2 e- -> Mn2+ + 2 H2O', e0V: 1.2323, dE0dTmVperK: -0.609, published: { e0V: 1.23, source: OSX } },
  { halfReaction: 'MnO4- + 8 H+ + 5 e- -> Mn2+ + 4 H2O', e0V: 1.507, dE0dTmVperK: -0.646, published: { e0V: 1.507, source: OSX } },
  { halfReaction: 'Mn3+ + e- -> Mn2+', e0V: 1.5474, dE0dTmVperK: null, published: { e0V: 1.5415, source: CRC92_MEMORY } },
  { halfReaction: 'MnO4- + 4 H+ + 3 e- -> MnO2(s) + 2 H2O', e0V: 1.6902, dE0dTmVperK: -0.671, published: { e0V: 1.679, source: CRC92_MEMORY } },

  // Iron
  { halfReaction: 'Fe(OH)3(s) + e- -> Fe(OH)2(s) + OH-', e0V: -0.5468, dE0dTmVperK: -0.982, published: { e0V: -0.56, source: CRC92_MEMORY } },
  { halfReaction: 'Fe2+ + 2 e- -> Fe', e0V: -0.447, dE0dTmVperK: 0.178, published: { e0V: -0.447, source: OSX } },
  { halfReaction: 'Fe3+ + 3 e- -> Fe', e0V: -0.041, dE0dTmVperK: 0.508, published: { e0V: -0.037, source: CRC92_MEMORY } },
  { halfReaction: '[Fe(CN)6]^3- + e- -> [Fe(CN)6]^4-', e0V: 0.3557, dE0dTmVperK: -2.494, published: { e0V: 0.36, source: OSX } },
  { halfReaction: 'Fe3+ + e- -> Fe2+', e0V: 0.771, dE0dTmVperK: 1.17, published: { e0V: 0.771, source: OSX } },

  // Cobalt
  { halfReaction: 'Co(OH)2(s) + 2 e- -> Co + 2 OH-', e0V: -0.7245, dE0dTmVperK: -1.042, published: { e0V: -0.73, source: CRC92_MEMORY } },
  { halfReaction: 'Co2+ + 2 e- -> Co', e0V: -0.28, dE0dTmVperK: 0.064, published: { e0V: -0.28, source: OSX } },
  { halfReaction: 'Co3+ + e- -> Co2+', e0V: 1.9488, dE0dTmVperK: 1.313, published: { e0V: 1.92, source: CRC92_MEMORY } },

  // Nickel
  { halfReaction: 'Ni(OH)2(s) + 2 e- -> Ni + 2 OH-', e0V: -0.6877, dE0dTmVperK: -1.09, published: { e0V: -0.72, source: CRC92_MEMORY } },
  { halfReaction: 'Ni2+ + 2 e- -> Ni', e0V: -0.257, dE0dTmVperK: 0.146, published: { e0V: -0.257, source: OSX } },
  { halfReaction: 'NiO2(s) + 2 H2O + 2 e- -> Ni(OH)2(s) + 2 OH-', e0V: 0.49, dE0dTmVperK: null, published: { e0V: 0.49, source: OSX } },
  { halfReaction: 'NiO2(s) + 4 H+ + 2 e- -> Ni2+ + 2 H2O', e0V: 1.7152, dE0dTmVperK: null, published: { e0V: 1.593, source: OSX } },

  // Copper
  { halfReaction: 'Cu2O(s) + H2O + 2 e- -> 2 Cu + 2 OH-', e0V: -0.3557, dE0dTmVperK: -1.29, published: { e0V: -0.36, source: CRC92_MEMORY } },
  { halfReaction: 'Cu2+ + e- -> Cu+', e0V: 0.1607, dE0dTmVperK: 0.776, published: { e0V: 0.153, source: OSX } },
  { halfReaction: 'Cu2+ + 2 e- -> Cu', e0V: 0.3394, dE0dTmVperK: 0.011, published: { e0V: 0.34, source: OSX } },
  { halfReaction: 'Cu+ + e- -> Cu', e0V: 0.518, dE0dTmVperK: -0.754, published: { e0V: 0.521, source: OSX } },

  // Zinc
  { halfReaction: 'ZnO(s) + H2O + 2 e- -> Zn + 2 OH-', e0V: -1.2486, dE0dTmVperK: -1.161, published: { e0V: -1.26, source: CRC92_MEMORY } },
  { halfReaction: 'Zn(OH)2(s) + 2 e- -> Zn + 2 OH-', e0V: -1.2386, dE0dTmVperK: -0.994, published: { e0V: -1.245, source: OSX } },
  { halfReaction: 'ZnO2^2- + 2 H2O + 2 e- -> Zn + 4 OH-', e0V: -1.1892, dE0dTmVperK: null, published: { e0V: -1.215, source: CRC92_MEMORY } },
  { halfReaction: 'Zn2+ + 2 e- -> Zn', e0V: -0.7618, dE0dTmVperK: 0.119, published: { e0V: -0.7618, source: OSX } },

  // Gallium
  { halfReaction: 'Ga3+ + 3 e- -> Ga', e0V: -0.549, dE0dTmVperK: 0.608, published: { e0V: -0.549, source: OSX } },

  // Bromine
  { halfReaction: 'Br2(l) + 2 e- -> 2 Br-', e0V: 1.0657, dE0dTmVperK: -0.63, published: { e0V: 1.065, source: CRC54 } },
  { halfReaction: 'Br2(aq) + 2 e- -> 2 Br-', e0V: 1.086, dE0dTmVperK: -0.517, published: { e0V: 1.0873, source: OSX } },
  { halfReaction: 'BrO3- + 6 H+ + 6 e- -> Br- + 3 H2O', e0V: 1.4386, dE0dTmVperK: -0.455, published: { e0V: 1.423, source: CRC92_MEMORY } },
  { halfReaction: '2 BrO3- + 12 H+ + 10 e- -> Br2(l) + 6 H2O', e0V: 1.5132, dE0dTmVperK: -0.42, published: { e0V: 1.482, source: CRC92_MEMORY } },

  // Rubidium
  { halfReaction: 'Rb+ + e- -> Rb', e0V: -2.98, dE0dTmVperK: -1.141, published: { e0V: -2.98, source: OSX } },

  // Strontium
  { halfReaction: 'Sr2+ + 2 e- -> Sr', e0V: -2.899, dE0dTmVperK: -0.237, published: { e0V: -2.89, source: OSX } },

  // Palladium
  { halfReaction: 'Pd2+ + 2 e- -> Pd', e0V: 0.9146, dE0dTmVperK: 0.471, published: { e0V: 0.987, source: OSX } },

  // Silver
  { halfReaction: 'Ag2S(s) + 2 e- -> 2 Ag + S2-', e0V: -0.6554, dE0dTmVperK: -1.058, published: { e0V: -0.691, source: CRC92_MEMORY } },
  { halfReaction: 'AgI(s) + e- -> Ag + I-', e0V: -0.1515, dE0dTmVperK: -0.28, published: { e0V: -0.15224, source: CRC92_MEMORY } },
  { halfReaction: 'AgBr(s) + e- -> Ag + Br-', e0V: 0.0713, dE0dTmVperK: -0.51, published: { e0V: 0.07133, source: CRC92 } },
  { halfReaction: 'AgCl(s) + e- -> Ag + Cl-', e0V: 0.2223, dE0dTmVperK: -0.648, published: { e0V: 0.22233, source: OSX } },
  { halfReaction: 'Ag2O(s) + H2O + 2 e- -> 2 Ag + 2 OH-', e0V: 0.3428, dE0dTmVperK: -1.339, published: { e0V: 0.342, source: CRC92_MEMORY } },
  { halfReaction: '[Ag(NH3)2]+ + e- -> Ag + 2 NH3(aq)', e0V: 0.3719, dE0dTmVperK: -0.47, published: { e0V: 0.373, source: OSX } },
  { halfReaction: 'Ag2CrO4(s) + 2 e- -> 2 Ag + CrO4^2-', e0V: 0.4456, dE0dTmVperK: -1.104, published: { e0V: 0.45, source: OSX } },
  { halfReaction: 'Ag2SO4(s) + 2 e- -> 2 Ag + SO4^2-', e0V: 0.6536, dE0dTmVperK: -1.171, published: { e0V: 0.654, source: CRC92_MEMORY } },
  { halfReaction: 'Ag+ + e- -> Ag', e0V: 0.7996, dE0dTmVperK: -0.989, published: { e0V: 0.7996, source: OSX } },
  { halfReaction: 'Ag2+ + e- -> Ag+', e0V: 1.9801, dE0dTmVperK: 0.988, published: { e0V: 1.98, source: CRC92_MEMORY } },

  // Cadmium
  { halfReaction: 'Cd(OH)2(s) + 2 e- -> Cd + 2 OH-', e0V: -0.8245, dE0dTmVperK: -1.018, published: { e0V: -0.812, source: CRC54 } },
  { halfReaction: 'Cd2+ + 2 e- -> Cd', e0V: -0.403, dE0dTmVperK: -0.03, published: { e0V: -0.403, source: OSX } },

  // Indium
  { halfReaction: 'In3+ + 3 e- -> In', e0V: -0.3382, dE0dTmVperK: 0.044, published: { e0V: -0.3382, source: OSX } },

  // Tin
  { halfReaction: 'Sn2+ + 2 e- -> Sn', e0V: -0.1375, dE0dTmVperK: -0.322, published: { e0V: -0.1375, source: OSX } },
  { halfReaction: 'Sn4+ + 2 e- -> Sn2+', e0V: 0.151, dE0dTmVperK: -0.159, published: { e0V: 0.151, source: OSX } },

  // Iodine
  { halfReaction: 'I2(s) + 2 e- -> 2 I-', e0V: 0.5345, dE0dTmVperK: -0.126, published: { e0V: 0.5355, source: OSX } },
  { halfReaction: 'I3^- + 2 e- -> 3 I-', e0V: 0.5354, dE0dTmVperK: -0.187, published: { e0V: 0.536, source: CRC92_MEMORY } },
  { halfReaction: '2 IO3- + 12 H+ + 10 e- -> I2(s) + 6 H2O', e0V: 1.2093, dE0dTmVperK: -0.368, published: { e0V: 1.195, source: CRC92_MEMORY } },

  // Caesium
  { halfReaction: 'Cs+ + e- -> Cs', e0V: -3.026, dE0dTmVperK: -1.173, published: { e0V: -3.026, source: CRC92_MEMORY } },

  // Barium
  { halfReaction: 'Ba2+ + 2 e- -> Ba', e0V: -2.912, dE0dTmVperK: -0.402, published: { e0V: -2.912, source: OSX } },

  // Lanthanum
  { halfReaction: 'La3+ + 3 e- -> La', e0V: -2.362, dE0dTmVperK: 0.271, published: { e0V: -2.52, source: OSX } },

  // Cerium
  { halfReaction: 'Ce3+ + 3 e- -> Ce', e0V: -2.3216, dE0dTmVperK: 0.28, published: { e0V: -2.483, source: OSX } },
  { halfReaction: 'Ce4+ + e- -> Ce3+', e0V: 1.7433, dE0dTmVperK: 0.318, published: { e0V: 1.61, source: OSX } },

  // Platinum
  { halfReaction: '[PtCl4]^2- + 2 e- -> Pt + 4 Cl-', e0V: 0.81, dE0dTmVperK: -0.197, published: { e0V: 0.755, source: OSX } },
  { halfReaction: 'Pt2+ + 2 e- -> Pt', e0V: 1.18, dE0dTmVperK: null, published: { e0V: 1.2, source: OSX } },

  // Gold
  { halfReaction: '[AuCl4]- + 3 e- -> Au + 4 Cl-', e0V: 1.0011, dE0dTmVperK: -0.655, published: { e0V: 1.002, source: CRC92_MEMORY } },
  { halfReaction: 'Au3+ + 2 e- -> Au+', e0V: 1.401, dE0dTmVperK: null, published: { e0V: 1.401, source: CRC92_MEMORY } },
  { halfReaction: 'Au3+ + 3 e- -> Au', e0V: 1.498, dE0dTmVperK: null, published: { e0V: 1.498, source: OSX } },
  { halfReaction: 'Au+ + e- -> Au', e0V: 1.692, dE0dTmVperK: null, published: { e0V: 1.692, source: OSX } },

  // Mercury
  { halfReaction: 'HgO(s) + H2O + 2 e- -> Hg(l) + 2 OH-', e0V: 0.0975, dE0dTmVperK: -1.121, published: { e0V: 0.0977, source: CRC92_MEMORY } },
  { halfReaction: 'Hg2Cl2(s) + 2 e- -> 2 Hg(l) + 2 Cl-', e0V: 0.2681, dE0dTmVperK: -0.301, published: { e0V: 0.26808, source: OSX } },
  { halfReaction: 'Hg2SO4(s) + 2 e- -> 2 Hg(l) + SO4^2-', e0V: 0.6152, dE0dTmVperK: -0.825, published: { e0V: 0.6125, source: CRC92_MEMORY } },
  { halfReaction: 'Hg2^2+ + 2 e- -> 2 Hg(l)', e0V: 0.7973, dE0dTmVperK: -0.327, published: { e0V: 0.7973, source: OSX } },
  { halfReaction: 'Hg2+ + 2 e- -> Hg(l)', e0V: 0.851, dE0dTmVperK: -0.116, published: { e0V: 0.851, source: OSX } },
  { halfReaction: '2 Hg2+ + 2 e- -> Hg2^2+', e0V: 0.9047, dE0dTmVperK: 0.094, published: { e0V: 0.92, source: OSX } },

  // Thallium
  { halfReaction: 'Tl+ + e- -> Tl', e0V: -0.336, dE0dTmVperK: -1.313, published: { e0V: -0.336, source: CRC92_MEMORY } },
  { halfReaction: 'Tl3+ + 2 e- -> Tl+', e0V: 1.2801, dE0dTmVperK: 0.968, published: { e0V: 1.252, source: CRC92_MEMORY } },

  // Lead
  { halfReaction: 'PbO(s) + H2O + 2 e- -> Pb + 2 OH-', e0V: -0.5728, dE0dTmVperK: -1.171, published: { e0V: -0.58, source: CRC92_MEMORY } },
  { halfReaction: 'PbSO4(s) + 2 e- -> Pb + SO4^2-', e0V: -0.3505, dE0dTmVperK: -1.007, published: { e0V: -0.3505, source: OSX } },
  { halfReaction: 'PbCl2(s) + 2 e- -> Pb + 2 Cl-', e0V: -0.2676, dE0dTmVperK: -0.461, published: { e0V: -0.2675, source: CRC92_MEMORY } },
  { halfReaction: 'Pb2+ + 2 e- -> Pb', e0V: -0.1262, dE0dTmVperK: -0.396, published: { e0V: -0.1262, source: OSX } },
  { halfReaction: 'PbO2(s) + 4 H+ + 2 e- -> Pb2+ + 2 H2O', e0V: 1.4657, dE0dTmVperK: -0.254, published: { e0V: 1.455, source: CRC92_MEMORY } },
  { halfReaction: 'PbO2(s) + SO4^2- + 4 H+ + 2 e- -> PbSO4(s) + 2 H2O', e0V: 1.69, dE0dTmVperK: 0.358, published: { e0V: 1.69, source: OSX } },

  // Bismuth
  { halfReaction: 'Bi3+ + 3 e- -> Bi', e0V: 0.2861, dE0dTmVperK: null, published: { e0V: 0.308, source: CRC92_MEMORY } },

];

/**
 * Every built-in row with its source text: the species data it is derived from and the value
 * its publication prints (FORMATION(species, "source") names the source of each species).
 */
export const BUILTIN_POTENTIALS: readonly BuiltinPotentialRow[] = ROWS.map((r) => ({
  ...r,
  source: `${LAYER}${r.dE0dTmVperK === null ? '; no S° for a species: E° kept at its 25 °C value at other temperatures' : ''}); ${r.published.source} prints ${String(r.published.e0V)} V`,
}));
