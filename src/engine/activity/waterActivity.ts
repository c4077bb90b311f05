/**
 * Water activity and osmotic coefficient of a salt solution or a mixture, from the Pitzer
 * model: ln a_w = −φ · M_w · Σ mᵢ, with M_w = 0.01801528 kg/mol (molar mass of water,
 * IUPAC atomic weights) and Σ mᵢ the total solute molality (ν·m for one salt).
 */
import { EngineError, quote } from '../errors';
import { PITZER_BINARY } from '../data/pitzerParameters';
import { compilePitzerSalt, pitzerOsmoticCoefficient, type ActivityOptions } from './pitzer';
import { pitzerMixture } from './pitzerMixing';

/** Molar mass of water, kg/mol. */
export const WATER_MOLAR_MASS_KG_PER_MOL = 0.01801528;

function isSpeciesList(x: unknown): x is readonly string[] {
  return Array.isArray(x);
}

/**
 * The arguments of the water functions: a salt formula or the species of a row, the salt's
 * molality (mol/kg) or one molality per species, the temperature in °C (default 25), and
 * `{ extrapolate: true }` to accept results outside the ranges.
 */
export type WaterArgs = [
  saltOrSpecies: string | readonly string[],
  molalityOrValues: number | readonly number[],
  tempC?: number,
  opts?: ActivityOptions,
];

function phiAndTotal(...[saltOrSpecies, molalityOrValues, tempC = 25, opts]: WaterArgs): [number, number] {
  if (isSpeciesList(saltOrSpecies)) {
    if (!Array.isArray(molalityOrValues)) {
      throw new EngineError(
        'shape',
        'give one molality per species (values must be a row like species).',
        'values',
      );
    }
    const r = pitzerMixture(saltOrSpecies, molalityOrValues as readonly number[], tempC, opts);
    return [r.osmoticCoefficient, r.totalMolalityMolKg];
  }
  if (typeof molalityOrValues !== 'number') {
    throw new EngineError('argument', 'for a salt, give its molality in mol/kg as one number.', 'molality');
  }
  const phi = pitzerOsmoticCoefficient(saltOrSpecies as string, molalityOrValues, tempC, opts);
  return [phi, compilePitzerSalt(saltOrSpecies as string).nu * molalityOrValues];
}

/**
 * Osmotic coefficient φ (molal, dimensionless) by the Pitzer model, of one salt at a
 * molality or of a composition row (species and molalities as IONICSTR takes them).
 *
 * Domain and errors: those of {@link pitzerOsmoticCoefficient} (a salt) or
 * {@link pitzerMixture} (a row). Precision about ±0.003 for 1:1 salts.
 *
 * @param saltOrSpecies a salt formula, or the species of a row
 * @param molalityOrValues the salt's molality (mol/kg), or one molality per species
 * @param tempC temperature in °C (default 25)
 * @param opts `{ extrapolate: true }` to accept results outside the ranges
 * @throws EngineError `argument`, `shape`, `parse`, `notFound`, `range`
 * @example
 * osmoticCoefficient('NaCl', 1) // 0.9359
 */
export function osmoticCoefficient(...args: WaterArgs): number {
  return phiAndTotal(...args)[0];
}

/**
 * Activity of water a(H2O) (dimensionless, pure water = 1) by the Pitzer model:
 * ln a_w = −φ M_w Σmᵢ. Domain as {@link osmoticCoefficient}; precision about ±0.0005 below
 * 2 mol/kg of a 1:1 salt (from the ±0.003 of φ).
 *
 * @param saltOrSpecies a salt formula, or the species of a row
 * @param molalityOrValues the salt's molality (mol/kg), or one molality per species
 * @param tempC temperature in °C (default 25)
 * @param opts `{ extrapolate: true }` to accept results outside the ranges
 * @throws EngineError as {@link osmoticCoefficient}
 * @example
 * waterActivity('NaCl', 1) // 0.9668
 */
export function waterActivity(...args: WaterArgs): number {
  const [phi, total] = phiAndTotal(...args);
  return Math.exp(-phi * WATER_MOLAR_MASS_KG_PER_MOL * total);
}

const WATER_IN = /^H(?:2|\u2082)O(?:\s*\(\s*l\s*\))?\s+in\s+(\S.*)$/i;

/**
 * The electrolyte of a water-activity header `H2O in <salt>` (docs/notation.md, "Species
 * headers"), or null where the text is not one. The salt must have Pitzer parameters: the
 * column's values are then the salt's molality in mol/kg, and a(H2O) is
 * {@link waterActivity} of that salt at that molality and the call's temperature.
 *
 * Domain: any text (case and spaces around "in" do not matter; `H₂O` and `H2O(l)` are read).
 * Precision: exact (text only).
 *
 * @param body the header without its side qualifier
 * @throws EngineError `parse`/`argument` for a salt that cannot be read; `notFound` for a salt
 *   without Pitzer parameters (the message lists the salts held)
 * @example
 * waterElectrolyteOf('H2O in NaCl') // 'NaCl'
 * waterElectrolyteOf('H2O') // null
 */
export function waterElectrolyteOf(body: string): string | null {
  const text = body.trim();
  // WATER_IN needs an H first: other headers skip the pattern
  const m = (text.charCodeAt(0) | 0x20) === 0x68 ? WATER_IN.exec(text) : null;
  if (!m) return null;
  const salt = (m[1] as string).trim();
  try {
    compilePitzerSalt(salt);
  } catch (e) {
    if (!(e instanceof EngineError) || e.kind !== 'notFound') throw e;
    throw new EngineError(
      'notFound',
      `${quote(body.trim())} needs Pitzer parameters for ${quote(salt)}, and none are held; the salts held are ` +
        `${PITZER_BINARY.map((r) => r.salt).join(', ')}. Or give a(H2O) itself in an "H2O" column.`,
      'species',
    );
  }
  return salt;
}

/**
 * True where a species text has the form `H2O in <salt>` (any salt): for messages of the
 * functions that do not take it.
 *
 * @example
 * isWaterElectrolyteHeader('H2O in NaCl') // true
 */
export function isWaterElectrolyteHeader(text: string): boolean {
  return WATER_IN.test(text.trim());
}
