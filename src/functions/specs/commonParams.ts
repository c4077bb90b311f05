/**
 * Parameter pieces that several spec families share (the generic parameters such as temp_C
 * and table are in ../spec/params.ts): one way to declare a quantity that must be above zero.
 */
import type { KindName, NumericDomain, ParamSpec } from '../spec/types';

/** Greater than zero, zero itself excluded. */
export const ABOVE_ZERO: NumericDomain = { min: 0, minExclusive: true };

/**
 * A required quantity greater than zero, in `unit`.
 *
 * @example
 * positiveParam('density_g_cm3', 'number', 'g/cm³', 'Density of the deposit in g/cm³')
 * // { name: 'density_g_cm3', kind: 'number', unit: 'g/cm³', domain: { min: 0, minExclusive: true }, description: … }
 */
export function positiveParam(name: string, kind: KindName, unit: string, description: string): ParamSpec {
  return { name, kind, unit, domain: ABOVE_ZERO, description };
}
