/**
 * Reaction thermodynamics from the species data layer: ΔrG°, ΔrH°, ΔrS° and ΔrCp° of a
 * balanced reaction at 25 °C, and their values at another temperature by the
 * Gibbs–Helmholtz equation with a constant ΔrCp°:
 *
 *   ΔrG°(T) = ΔrG°(T0) − (T − T0)·ΔrS°(T0) + ΔrCp°·[(T − T0) − T·ln(T/T0)]
 *   ΔrS°(T) = ΔrS°(T0) + ΔrCp°·ln(T/T0),   ΔrH°(T) = ΔrG°(T) + T·ΔrS°(T),   T0 = 298.15 K.
 *
 * ΔrH°(T0) is taken as ΔrG°(T0) + T0·ΔrS°(T0), from the same ΔfG° and S° that give E°(T),
 * so that ENTHALPY, ENTROPY and the temperature dependence of E° can never disagree.
 *
 * Heat capacities: every species' Cp° enters ΔrCp° where the source gives one; a species
 * without Cp° contributes none (its heat capacity is taken as zero). This is the one
 * rule under which ΔrG°(T) stays additive over species, so that every way of writing
 * one reaction (full reaction, cell, any pair of half-reactions, acid or base form)
 * gives the same value at every temperature; the result says which species lacked Cp°.
 *
 * Valid range: 0–100 °C (aqueous solutions near 1 bar; constant ΔrCp°). Outside it, an
 * argument error names the range.
 */
import { EngineError, quote } from '../errors';
import { ZERO_CELSIUS_K, kelvinFromCelsius, FARADAY_C_PER_MOL } from '../constants';
import { type Species, formatSpecies } from '../notation/species';
import { speciesRecord } from '../data/species/index';

/** The temperature range of thermodynamics from the species data, °C. */
export const SPECIES_DATA_RANGE_C = Object.freeze({ min: 0, max: 100 });
/** The reference temperature of the species data, K. */
export const T0_K = 298.15;

/** The species of a reaction that the species data gives no S° or no Cp° for (as text). */
export interface MissingSpeciesData {
  /** species without S° */
  readonly entropyMissing: readonly string[];
  /** species without Cp° */
  readonly cpMissing: readonly string[];
}

/** Thermodynamics of one reaction at 25 °C from the species data. */
export interface ReactionThermo extends MissingSpeciesData {
  /** ΔrG° at 25 °C, J/mol */
  readonly dGJ: number;
  /** ΔrS° at 25 °C, J/(mol·K), or null where a species has no S° */
  readonly dSJK: number | null;
  /** ΔrCp°, J/(mol·K), from the species that have a Cp° */
  readonly dCpJK: number;
  /** the sources of the species data used, without repeats */
  readonly sources: readonly string[];
}

/** A stoichiometric entry: species and coefficient (products positive, reactants negative). */
export interface ThermoEntry {
  readonly species: Species;
  readonly nu: number;
}

/**
 * ΔrG°, ΔrS° and ΔrCp° at 25 °C of a reaction given as entries, or the species that
 * have no data.
 *
 * @example
 * reactionThermo([{species: H2O, nu: -1}, {species: Hplus, nu: 1}, {species: OH, nu: 1}]).dGJ // 79885
 */
export function reactionThermo(entries: Iterable<ThermoEntry>): ReactionThermo | { readonly missing: readonly string[] } {
  let g = 0;
  let sSum = 0;
  let cp = 0;
  const missing: string[] = [];
  const entropyMissing: string[] = [];
  const cpMissing: string[] = [];
  const sources: string[] = [];
  for (const { species, nu } of entries) {
    if (nu === 0) continue;
    const rec = speciesRecord(species);
    const name = species.isElectron ? 'e-' : formatSpecies(species);
    if (!rec) {
      missing.push(name);
      continue;
    }
    if (!sources.includes(rec.source)) sources.push(rec.source);
    g += nu * rec.dfGkJ * 1000;
    if (rec.sJK === undefined) entropyMissing.push(name);
    else sSum += nu * rec.sJK;
    if (rec.cpJK === undefined) cpMissing.push(name);
    else cp += nu * rec.cpJK;
  }
  if (missing.length > 0) return { missing };
  return {
    dGJ: g,
    dSJK: entropyMissing.length > 0 ? null : sSum,
    dCpJK: cp,
    entropyMissing,
    cpMissing,
    sources,
  };
}

/** True where {@link reactionThermo} found data for every species. */
export function isComplete(
  t: ReactionThermo | { readonly missing: readonly string[] },
): t is ReactionThermo {
  return !('missing' in t);
}

/**
 * Check a temperature against the range of the species data (0–100 °C).
 *
 * @throws EngineError (`argument`) outside the range, naming it
 * @example
 * checkSpeciesTemperature(60) // 333.15 (K)
 */
export function checkSpeciesTemperature(tempC: number, what = 'E°, K and ΔG from the species data'): number {
  const tK = kelvinFromCelsius(tempC);
  if (tempC < SPECIES_DATA_RANGE_C.min - 1e-9 || tempC > SPECIES_DATA_RANGE_C.max + 1e-9) {
    throw new EngineError(
      'argument',
      `temp_C = ${tempC} °C is outside ${SPECIES_DATA_RANGE_C.min}–${SPECIES_DATA_RANGE_C.max} °C, the range of ${what} (aqueous solutions near 1 bar, constant ΔCp°). Give a temperature in that range, or your own E° and dE°/dT in a table.`,
      'temp_C',
    );
  }
  return tK;
}

/** (T − T0) − T·ln(T/T0), the factor of ΔrCp° in ΔrG°(T), K. Zero at 25 °C. */
export function cpFactorK(tK: number): number {
  return tK === T0_K ? 0 : tK - T0_K - tK * Math.log(tK / T0_K);
}

function needEntropy(t: ReactionThermo, tempC: number): number {
  if (t.dSJK === null) {
    throw new EngineError(
      'notFound',
      `The species data have no S° for ${t.entropyMissing.map((x) => quote(x)).join(', ')}, so this reaction's temperature dependence is unknown${tempC === 25 ? '' : ` (asked at ${tempC} °C)`}; give E° and dE°/dT in your own table.`,
      'reaction',
    );
  }
  return t.dSJK;
}

/**
 * ΔrG°(T) in J/mol. At 25 °C no S° is needed.
 *
 * Domain: 0–100 °C. Precision: that of the data (about ±0.1 kJ/mol at 25 °C; the
 * constant-ΔCp° model adds up to about ±0.5 kJ/mol at 100 °C for ionic reactions).
 * @throws EngineError `argument` outside 0–100 °C; `notFound` off 25 °C where a species has no S°
 * @example
 * gibbsAtJ(waterIonisation, 60) // ≈ 83.15e3 J/mol (pKw ≈ 13.04)
 */
export function gibbsAtJ(t: ReactionThermo, tempC: number): number {
  const tK = checkSpeciesTemperature(tempC);
  if (tK === T0_K) return t.dGJ;
  const s = needEntropy(t, tempC);
  return t.dGJ - (tK - T0_K) * s + t.dCpJK * cpFactorK(tK);
}

/**
 * ΔrS°(T) in J/(mol·K).
 *
 * @throws EngineError `argument` outside 0–100 °C; `notFound` where a species has no S°
 * @example
 * entropyAtJK(waterFormation, 25) // −163.3 J/(mol·K) for H2 + ½ O2 -> H2O(l)
 */
export function entropyAtJK(t: ReactionThermo, tempC: number): number {
  const tK = checkSpeciesTemperature(tempC);
  const s = needEntropy(t, tempC);
  return tK === T0_K ? s : s + t.dCpJK * Math.log(tK / T0_K);
}

/**
 * ΔrH°(T) in J/mol: ΔrG°(T) + T·ΔrS°(T).
 *
 * @throws EngineError `argument` outside 0–100 °C; `notFound` where a species has no S°
 * @example
 * enthalpyAtJ(waterFormation, 25) // −285.83e3 J/mol
 */
export function enthalpyAtJ(t: ReactionThermo, tempC: number): number {
  const tK = checkSpeciesTemperature(tempC);
  return gibbsAtJ(t, tempC) + tK * entropyAtJK(t, tempC);
}

/**
 * The temperature model of a half-reaction's E° from its thermodynamics: E°(T) =
 * e0V + slopeVPerK·(T − T0) + cpVPerK·cpFactorK(T), with n electrons consumed.
 *
 * @example
 * potentialModel(thermoOfO2H2O, 4) // { e0V: 1.2291, slopeVPerK: −0.000846…, cpVPerK: … }
 */
export function potentialModel(
  t: ReactionThermo,
  n: number,
): { e0V: number; slopeVPerK: number | null; cpVPerK: number } {
  const nF = n * FARADAY_C_PER_MOL;
  // 0 − x, not −x: the same value for every x but 0, where it gives 0, not −0 (E° of the SHE)
  return {
    e0V: (0 - t.dGJ) / nF,
    slopeVPerK: t.dSJK === null ? null : t.dSJK / nF,
    cpVPerK: t.dSJK === null ? 0 : (0 - t.dCpJK) / nF,
  };
}

/** Kelvin of a Celsius temperature without checks (hot paths). */
export function kelvinOf(tempC: number): number {
  return tempC + ZERO_CELSIUS_K;
}
