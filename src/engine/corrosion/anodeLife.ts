/**
 * Life of a galvanic (sacrificial) anode for cathodic protection:
 *   T (years) = m · ε · u / (I · 8760),
 * with m the net anode mass (kg), ε the design electrochemical capacity (Ah/kg),
 * u the utilisation factor and I the mean current (A); 8760 h per year. This is
 * the mass equation of DNV-RP-B401 (2017), section 7 (from memory).
 *
 * Caution: cathodic-protection design follows the applicable standards (e.g.
 * DNV-RP-B401, ISO 15589, NACE/AMPP SP0169), the anode maker's certified data and
 * licensed practice; this is an estimate, not a design.
 */
import { EngineError, quote } from '../errors';
import { ANODE_MATERIALS, ANODE_UTILISATION, DEFAULT_UTILISATION } from '../data/anodes';
import { fraction, positiveNumber } from '../measurement/guards';

/** Hours per year used by DNV-RP-B401. */
export const HOURS_PER_YEAR = 8760;

/**
 * The row of `rows` named `name` (its name or an alias, without regard to case), or an
 * argument error for `argument` saying what it accepts and listing the names.
 */
function namedRow<T extends { readonly name: string; readonly aliases: readonly string[] }>(
  rows: readonly T[],
  name: string,
  argument: string,
  accepts: string,
): T {
  const key = name.trim().toLowerCase();
  const row = rows.find((a) => a.aliases.includes(key) || a.name.toLowerCase() === key);
  if (!row)
    throw new EngineError(
      'argument',
      `${argument} must be ${accepts} this function knows (${rows.map((a) => `"${a.aliases[0]!}"`).join(', ')}); got ${quote(name)}.`,
      argument,
    );
  return row;
}

/**
 * Design capacity (Ah/kg) of a named anode material: "zinc", "Al-Zn-In", "magnesium", "high-potential magnesium".
 *
 * @throws EngineError (`argument`) listing the names
 * @example
 * anodeCapacityAhKg('zinc') // 780
 */
export function anodeCapacityAhKg(name: string): number {
  return namedRow(ANODE_MATERIALS, name, 'capacity_Ah_kg', 'a number in Ah/kg or an anode material')
    .capacityAhKg;
}

/**
 * Utilisation factor of a named anode shape (DNV-RP-B401 Table 10-8, from memory).
 *
 * @example
 * anodeUtilisation('long slender stand-off') // 0.9
 */
export function anodeUtilisation(name: string): number {
  return namedRow(ANODE_UTILISATION, name, 'utilisation', 'a number, a fraction in (0, 1], or an anode type')
    .factor;
}

/**
 * Anode life in years: m·ε·u/(I·8760).
 *
 * Domain: mass_kg > 0; capacity_Ah_kg > 0 (or a material name); current_A > 0;
 * utilisation in (0, 1] (or an anode type), default 0.80.
 *
 * @example
 * anodeLifeYears(100, 780, 0.5, 0.9) // 16.03 years
 */
export function anodeLifeYears(
  massKg: number,
  capacityAhKg: number | string,
  currentA: number,
  utilisation: number | string = DEFAULT_UTILISATION,
): number {
  positiveNumber(massKg, 'mass_kg', 'kg');
  const cap =
    typeof capacityAhKg === 'string'
      ? anodeCapacityAhKg(capacityAhKg)
      : positiveNumber(capacityAhKg, 'capacity_Ah_kg', 'Ah/kg');
  positiveNumber(currentA, 'current_A', 'A');
  const u =
    typeof utilisation === 'string' ? anodeUtilisation(utilisation) : fraction(utilisation, 'utilisation');
  const years = (massKg * cap * u) / (currentA * HOURS_PER_YEAR);
  if (!Number.isFinite(years))
    throw new EngineError(
      'range',
      'The anode life is beyond the number range; check the inputs.',
      'current_A',
    );
  return years;
}
