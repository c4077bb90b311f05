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

/** A galvanic anode material. */
export interface AnodeMaterial {
  readonly name: string;
  /** Lower-case names a user may type. */
  readonly aliases: readonly string[];
  /** Design electrochemical capacity, Ah/kg. */
  readonly capacityAhKg: number;
  readonly source: string;
}

export const ANODE_MATERIALS: readonly AnodeMaterial[] = Object.freeze<AnodeMaterial[]>([
  {
    name: 'Al-Zn-In (seawater, ≤ 30 °C)',
    aliases: ['al-zn-in', 'alznin', 'aluminium', 'aluminum', 'al', 'al-zn-in seawater'],
    capacityAhKg: 2000,
    source: 'DNV-RP-B401 (2017), Table 10-6, seawater, anode surface ≤ 30 °C (from memory)',
  },
  {
    name: 'zinc (seawater, ≤ 30 °C)',
    aliases: ['zinc', 'zn', 'zinc seawater'],
    capacityAhKg: 780,
    source: 'DNV-RP-B401 (2017), Table 10-6, seawater, anode surface ≤ 30 °C (from memory)',
  },
  {
    name: 'magnesium H-1 (AZ63)',
    aliases: ['magnesium', 'mg', 'h-1', 'h1', 'az63', 'magnesium h-1'],
    capacityAhKg: 1100,
    source: 'common practice for onshore design, about 50 % efficiency (from memory)',
  },
  {
    name: 'magnesium, high potential (Mg-Mn)',
    aliases: ['high-potential magnesium', 'high potential magnesium', 'mg-mn', 'magnesium high potential'],
    capacityAhKg: 1230,
    source: 'common practice for onshore design, about 50 % efficiency (from memory)',
  },
]);

/** A utilisation factor by anode shape. */
export interface AnodeUtilisation {
  readonly name: string;
  readonly aliases: readonly string[];
  readonly factor: number;
  readonly source: string;
}

export const ANODE_UTILISATION: readonly AnodeUtilisation[] = Object.freeze<AnodeUtilisation[]>([
  {
    name: 'long slender stand-off (L ≥ 4r)',
    aliases: ['long slender stand-off', 'long slender', 'slender stand-off', 'stand-off'],
    factor: 0.9,
    source: 'DNV-RP-B401 (2017), Table 10-8 (from memory)',
  },
  {
    name: 'short slender stand-off (L < 4r)',
    aliases: ['short slender stand-off', 'short slender', 'short stand-off'],
    factor: 0.85,
    source: 'DNV-RP-B401 (2017), Table 10-8 (from memory)',
  },
  {
    name: 'long flush-mounted (L ≥ 4 × width and thickness)',
    aliases: ['long flush-mounted', 'long flush', 'flush-mounted', 'flush'],
    factor: 0.85,
    source: 'DNV-RP-B401 (2017), Table 10-8 (from memory)',
  },
  {
    name: 'short flush-mounted, bracelet and other types',
    aliases: ['short flush-mounted', 'short flush', 'bracelet', 'other'],
    factor: 0.8,
    source: 'DNV-RP-B401 (2017), Table 10-8 (from memory)',
  },
]);

/** The utilisation used where none is given: DNV-RP-B401's factor for bracelets and other types, the lowest listed. */
export const DEFAULT_UTILISATION = 0.8;
