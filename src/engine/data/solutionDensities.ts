/**
 * Densities of aqueous salt solutions against concentration, and the atomic weights used
 * to turn a salt formula into its molar mass.
 *
 * Densities: CRC Handbook of Chemistry and Physics, "Concentrative properties of aqueous
 * solutions: density, refractive index, freezing point depression, and viscosity", at
 * 20 °C, as mass percent of solute against density in g/cm³ (from memory, 4 decimals).
 * The table's own molarities follow from c = w·ρ·1000/M.
 */

/** One density table of a salt solution. */
export interface SolutionDensityTable {
  /** The salt formula. */
  readonly salt: string;
  /** The table's temperature, °C. */
  readonly tempC: number;
  /** Temperatures at which the table is used, °C (its own ± 5 K: about ±0.15% in ρ). */
  readonly useRangeC: readonly [number, number];
  /** Rows of [mass percent of salt, density in g/cm³], ascending. */
  readonly rows: readonly (readonly [number, number])[];
  /** The publication. */
  readonly source: string;
}

const CRC =
  'CRC Handbook of Chemistry and Physics, "Concentrative properties of aqueous solutions", 20 °C (from memory)';

/**
 * Solution densities held (NaCl and KCl at 20 °C, CRC Handbook, from memory). Pure water at
 * 20 °C is 0.9982 g/cm³ (Kell 1975, from memory).
 *
 * @example
 * SOLUTION_DENSITIES.find((t) => t.salt === 'NaCl')?.rows[0] // [0, 0.9982]
 */
// prettier-ignore
export const SOLUTION_DENSITIES: readonly SolutionDensityTable[] = [
  {
    salt: 'NaCl', tempC: 20, useRangeC: [15, 25], source: CRC,
    rows: [
      [0, 0.9982], [0.5, 1.0018], [1, 1.0053], [2, 1.0125], [4, 1.0268], [6, 1.0413], [8, 1.0559],
      [10, 1.0707], [12, 1.0857], [14, 1.1009], [16, 1.1162], [18, 1.1319], [20, 1.1478],
      [22, 1.1640], [24, 1.1804], [26, 1.1972],
    ],
  },
  {
    salt: 'KCl', tempC: 20, useRangeC: [15, 25], source: CRC,
    rows: [
      [0, 0.9982], [1, 1.0046], [2, 1.0110], [4, 1.0239], [6, 1.0369], [8, 1.0500], [10, 1.0633],
      [12, 1.0768], [14, 1.0905], [16, 1.1043], [18, 1.1185], [20, 1.1328], [22, 1.1474], [24, 1.1623],
    ],
  },
];
