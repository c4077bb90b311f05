/**
 * Densities of pure metals near room temperature, g/cm³, as tabulated in the CRC
 * Handbook of Chemistry and Physics ("Physical constants of inorganic compounds" /
 * "Density of metals"), rounded to the figures commonly used in corrosion work.
 * From memory, not re-read. ASTM G102 uses the same values (it lists iron at 7.87).
 */

/** Element symbol → density at about 20 °C, g/cm³ (CRC Handbook, from memory). */
export const METAL_DENSITIES_G_CM3: Readonly<Record<string, number>> = Object.freeze({
  Li: 0.534,
  Na: 0.968,
  K: 0.89,
  Mg: 1.74,
  Al: 2.7,
  Ti: 4.51,
  Cr: 7.19,
  Mn: 7.3,
  Fe: 7.87,
  Co: 8.9,
  Ni: 8.9,
  Cu: 8.96,
  Zn: 7.13,
  Mo: 10.22,
  Ag: 10.5,
  Cd: 8.65,
  Sn: 7.29,
  W: 19.3,
  Pt: 21.45,
  Au: 19.3,
  Pb: 11.34,
});

/** Where the densities come from. */
export const METAL_DENSITIES_SOURCE =
  'CRC Handbook of Chemistry and Physics, densities of the elements (from memory)';
