/**
 * Galvanic anode materials for cathodic protection: design electrochemical
 * capacities and utilisation factors.
 *
 * Sources (from memory, not re-read): DNV-RP-B401 "Cathodic protection design"
 * (2017 edition; the same figures as the 2010 edition), Table 10-6 (design
 * electrochemical capacity of Al-Zn-In and zinc anodes in seawater at anode
 * surface temperatures up to 30 °C) and Table 10-8 (utilisation factors).
 * Magnesium anodes are not covered by DNV-RP-B401; their capacities are common
 * practice for onshore design (NACE SP0169 context; AMPP/NACE publications quote
 * about 1,100 Ah/kg for the standard H-1 (AZ63) alloy and about 1,230 Ah/kg for
 * high-potential Mg-Mn, from memory, both at roughly 50 % current efficiency).
 *
 * Caution: cathodic-protection design follows the applicable standards, the
 * anode maker's certified data and licensed practice; these figures are defaults
 * for estimates only.
 */

import DATA from './anodeRows.json';

/** A named design value a user picks by name: its display name, typeable aliases and source. */
interface NamedDesignValue {
  readonly name: string;
  /** Lower-case names a user may type. */
  readonly aliases: readonly string[];
  readonly source: string;
}

/** A galvanic anode material. */
export interface AnodeMaterial extends NamedDesignValue {
  /** Design electrochemical capacity, Ah/kg. */
  readonly capacityAhKg: number;
}

/** A utilisation factor by anode shape. */
export interface AnodeUtilisation extends NamedDesignValue {
  readonly factor: number;
}

/** The anode materials (rows in anodeRows.json beside this file). */
export const ANODE_MATERIALS: readonly AnodeMaterial[] = Object.freeze<AnodeMaterial[]>(DATA.materials);

/** Utilisation factors by anode shape (rows in anodeRows.json beside this file). */
export const ANODE_UTILISATION: readonly AnodeUtilisation[] = Object.freeze<AnodeUtilisation[]>(DATA.utilisation);

/** The utilisation used where none is given: DNV-RP-B401's factor for bracelets and other types, the lowest listed. */
export const DEFAULT_UTILISATION = 0.8;
