/**
 * Metals and alloys for corrosion rates by the method of ASTM G102 ("Standard
 * Practice for Calculation of Corrosion Rates and Related Information from
 * Electrochemical Measurements"), all from memory, not re-read.
 *
 * The equivalent weight of an alloy is EW = 1 / Σ (nᵢ·fᵢ / Wᵢ), with fᵢ the mass
 * fraction, Wᵢ the atomic weight and nᵢ the valence of each element; elements below
 * about 1 % by mass are left out, as the standard does. The valences are those
 * G102 uses for its table (the lowest common oxidation state of dissolution:
 * Fe 2, Ni 2, Cr 3, Mo 3, Mn 2, Cu 2, Al 3 …).
 */

/** Valence nᵢ of each element in the ASTM G102 equivalent weight (from memory). */
export const G102_VALENCES: Readonly<Record<string, number>> = Object.freeze({
  Al: 3,
  Cd: 2,
  Co: 2,
  Cr: 3,
  Cu: 2,
  Fe: 2,
  Mg: 2,
  Mn: 2,
  Mo: 3,
  Nb: 3,
  Ni: 2,
  Pb: 2,
  Si: 4,
  Sn: 2,
  Ti: 2,
  Ag: 1,
  W: 4,
  Zn: 2,
  Li: 1,
  Na: 1,
  K: 1,
});

/** An alloy record: composition in mass %, density, and a tabulated EW where one is recalled. */
export interface AlloyRecord {
  /** Display name, e.g. "304 stainless steel (UNS S30400)". */
  readonly name: string;
  /** Lower-case names a user may type, e.g. "304", "s30400", "304 stainless". */
  readonly aliases: readonly string[];
  /** Element → mass % (the major elements only, ≥ about 1 %, as ASTM G102 counts them). */
  readonly compositionPct: Readonly<Record<string, number>>;
  /** Density, g/cm³. */
  readonly densityGcm3: number;
  /** Equivalent weight as the standard's table prints it, or null where not recalled. */
  readonly tabulatedEW: number | null;
  /** Where the figures come from. */
  readonly source: string;
}

/** The alloys known by name (nominal compositions, from memory). */
export const ALLOYS: readonly AlloyRecord[] = Object.freeze<AlloyRecord[]>([
  {
    name: 'carbon steel (UNS G10180)',
    aliases: ['carbon steel', 'mild steel', 'steel', 'g10180', 'uns g10180', '1018'],
    compositionPct: { Fe: 100 },
    densityGcm3: 7.86,
    tabulatedEW: 27.92,
    source: 'ASTM G102, Table 1 (EW 27.92, density 7.86; from memory)',
  },
  {
    name: '304 stainless steel (UNS S30400)',
    aliases: ['304', '304 stainless', '304 ss', 'ss304', 's30400', 'uns s30400'],
    compositionPct: { Cr: 19, Ni: 9.25, Mn: 1, Fe: 70.75 },
    densityGcm3: 7.94,
    tabulatedEW: 25.12,
    source: 'ASTM G102, Table 1 (EW 25.12, density 7.94; from memory)',
  },
  {
    name: '316 stainless steel (UNS S31600)',
    aliases: ['316', '316 stainless', '316 ss', 'ss316', 's31600', 'uns s31600'],
    compositionPct: { Cr: 17, Ni: 12, Mo: 2.5, Mn: 1, Fe: 67.5 },
    densityGcm3: 8.0,
    tabulatedEW: 25.5,
    source: 'ASTM G102, Table 1 (EW 25.50, density 8.00; from memory)',
  },
  {
    name: '90/10 copper-nickel (UNS C70600)',
    aliases: ['90/10 cu-ni', 'cu-ni 90/10', 'cuni 90/10', '90-10 cupronickel', 'c70600', 'uns c70600'],
    compositionPct: { Cu: 88.6, Ni: 10, Fe: 1.4 },
    densityGcm3: 8.94,
    tabulatedEW: null,
    source:
      'nominal composition and density (copper-alloy data sheets, from memory); EW by the ASTM G102 method with Cu 2',
  },
  {
    name: 'nickel-copper Alloy 400 (UNS N04400)',
    aliases: ['alloy 400', 'n04400', 'uns n04400', 'monel 400'],
    compositionPct: { Ni: 66.5, Cu: 31.5, Fe: 1.2, Mn: 0.8 },
    densityGcm3: 8.8,
    tabulatedEW: null,
    source:
      'nominal composition and density (nickel-alloy data sheets, from memory); EW by the ASTM G102 method with Cu 2',
  },
  {
    name: 'aluminium 3003 (UNS A93003)',
    aliases: ['3003', 'aluminium 3003', 'aluminum 3003', 'al 3003', 'a93003', 'uns a93003'],
    compositionPct: { Al: 98.8, Mn: 1.2 },
    densityGcm3: 2.73,
    tabulatedEW: null,
    source:
      'nominal composition and density (aluminium-alloy data sheets, from memory); EW by the ASTM G102 method',
  },
]);

/** Pure metals by name ("iron" as well as "Fe"). */
export const METAL_NAMES: Readonly<Record<string, string>> = Object.freeze({
  iron: 'Fe',
  copper: 'Cu',
  zinc: 'Zn',
  aluminium: 'Al',
  aluminum: 'Al',
  nickel: 'Ni',
  chromium: 'Cr',
  magnesium: 'Mg',
  lead: 'Pb',
  tin: 'Sn',
  titanium: 'Ti',
  silver: 'Ag',
  cadmium: 'Cd',
  cobalt: 'Co',
  manganese: 'Mn',
  molybdenum: 'Mo',
});
