/**
 * Limiting ionic molar conductivities λ°ᵢ at 25 °C in water, S·cm²/mol, per mole of
 * the ion (so λ°(SO4^2-) = 2 × 80.0): CRC Handbook of Chemistry and Physics,
 * "Ionic conductivity and diffusion at infinite dilution" (the table prints
 * λ/|z| for multivalent ions; the values here are multiplied by |z|). From memory,
 * not re-read; the 1:1 values are good to about 0.1 %, the others to about 1 %.
 */

/** Ion (canonical text) → λ° at 25 °C, S·cm²/mol of ion (CRC Handbook, from memory). */
export const LIMITING_IONIC_CONDUCTIVITY_S_CM2_MOL: Readonly<Record<string, number>> = Object.freeze({
  'H+': 349.65,
  'Li+': 38.66,
  'Na+': 50.08,
  'K+': 73.48,
  'Rb+': 77.8,
  'Cs+': 77.2,
  'NH4+': 73.5,
  'Ag+': 61.9,
  'Tl+': 74.7,
  'Mg2+': 106.0,
  'Ca2+': 119.0,
  'Sr2+': 118.9,
  'Ba2+': 127.2,
  'Cu2+': 107.2,
  'Zn2+': 105.6,
  'Fe2+': 108.0,
  'Ni2+': 99.0,
  'Co2+': 110.0,
  'Mn2+': 107.0,
  'Cd2+': 108.0,
  'Pb2+': 142.0,
  'Fe3+': 204.0,
  'Al3+': 183.0,
  'OH-': 198.0,
  'F-': 55.4,
  'Cl-': 76.31,
  'Br-': 78.1,
  'I-': 76.8,
  'NO3-': 71.42,
  'ClO4-': 67.3,
  'HCO3-': 44.5,
  'HSO4-': 52.0,
  'SO4^2-': 160.0,
  'CO3^2-': 138.6,
});

export const CONDUCTIVITY_SOURCE =
  'CRC Handbook of Chemistry and Physics, ionic conductivity at infinite dilution, 25 °C (from memory)';
