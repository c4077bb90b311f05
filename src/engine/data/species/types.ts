/**
 * The shape of one species' standard thermodynamic data, shared by every file of
 * the species data layer (src/engine/data/species/).
 *
 * Values are at 298.15 K and 1 bar; conventions: ΔfG°, ΔfH° and S° of H+(aq) are
 * zero, and of electrons by the SHE convention; elements in their reference
 * state have ΔfG° = ΔfH° = 0.
 *
 * @example
 * const water: SpeciesThermoRecord = {
 *   species: 'H2O(l)', dfGkJ: -237.13, dfHkJ: -285.83, sJK: 69.91, cpJK: 75.29,
 *   source: 'NBS tables (Wagman et al. 1982), from memory',
 * };
 */
export interface SpeciesThermoRecord {
  /** The species as the notation parser reads it, with its phase: 'Fe2+', 'Fe2O3(s)', 'O2(g)'. */
  readonly species: string;
  /** Standard Gibbs energy of formation, kJ/mol. */
  readonly dfGkJ: number;
  /** Standard enthalpy of formation, kJ/mol (absent where the source gives none). */
  readonly dfHkJ?: number;
  /** Standard molar entropy (partial molar for ions), J/(mol·K). */
  readonly sJK?: number;
  /** Standard molar heat capacity, J/(mol·K) (absent where the source gives none). */
  readonly cpJK?: number;
  /** The publication the values come from, with "from memory" where recalled. */
  readonly source: string;
}
