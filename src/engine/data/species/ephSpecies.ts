import { FARADAY_C_PER_MOL } from '../../constants';
import type { SpeciesThermoRecord } from './types';

/**
 * Species that E–pH (Pourbaix) diagrams need: for each element the metal, its aqueous ions,
 * oxides, hydroxides, oxyanions and hydroxo complexes, plus water and its ions.
 *
 * Source set: the NBS tables of chemical thermodynamic properties (Wagman et al., J. Phys.
 * Chem. Ref. Data 11, Suppl. 2, 1982), recalled from memory, unless the record's source
 * names Pourbaix, Atlas of Electrochemical Equilibria in Aqueous Solutions (1966), also from
 * memory, or a measured standard potential. The metal ions shared with the potentials table
 * take ΔfG° from the measured E° of their couple (OpenStax Chemistry 2e, Appendix L, seen),
 * ΔfH° moved by the same amount and S° kept, exactly as the species data layer holds them, so
 * that a diagram line and the table's E° agree. Units: kJ/mol, J/(mol·K); 298.15 K, 1 bar.
 *
 * `[table]` in a comment marks a species that the potentials table's species also are, so
 * that the integrator can dedupe these records with those of the species data layer.
 */
const NBS = 'NBS tables (Wagman et al. 1982), from memory';
const POURBAIX = 'Pourbaix, Atlas of Electrochemical Equilibria (1966), from memory';
const F_KJ = FARADAY_C_PER_MOL / 1000;

/**
 * A record whose ΔfG° is set from a measured E° (V) of `ion + n e- -> reduced`, given the ΔfG° of
 * the reduced side (kJ/mol): ΔfG°(ion) = ΔfG°(reduced) + nFE°. ΔfH° moves with ΔfG°; S° is kept.
 */
function measured(
  species: string,
  nbs: { g: number; h?: number; s?: number; cp?: number },
  n: number,
  e0V: number,
  reducedGkJ: number,
  couple: string,
): SpeciesThermoRecord {
  const g = reducedGkJ + n * F_KJ * e0V;
  const shift = g - nbs.g;
  return {
    species,
    dfGkJ: g,
    ...(nbs.h === undefined ? {} : { dfHkJ: nbs.h + shift }),
    ...(nbs.s === undefined ? {} : { sJK: nbs.s }),
    ...(nbs.cp === undefined ? {} : { cpJK: nbs.cp }),
    source: `ΔfG° from the measured E°(${couple}) = ${e0V} V (OpenStax Chemistry 2e, Appendix L); ΔfH° moved with it, S° from the ${NBS}`,
  };
}

const OSX = 'OpenStax Chemistry 2e, Appendix L';
const G_FE2 = 2 * F_KJ * -0.447; // Fe2+ + 2e- -> Fe
const G_SN2 = 2 * F_KJ * -0.1375; // Sn2+ + 2e- -> Sn
// PbSO4 + 2e- -> Pb + SO4 2- (−0.3505 V) with NBS ΔfG°(SO4 2-) = −744.53; then
// PbO2 + SO4 2- + 4H+ + 2e- -> PbSO4 + 2H2O (1.69 V): ΔfG°(PbO2) = ΔfG°(PbSO4) + 2ΔfG°(H2O) − ΔfG°(SO4 2-) + 2F·1.69
const G_PBSO4 = -744.53 + 2 * F_KJ * -0.3505;
const G_PBO2 = G_PBSO4 + 2 * -237.129 + 744.53 + 2 * F_KJ * 1.69;

export const EPH_SPECIES: readonly SpeciesThermoRecord[] = [
  // water and its ions
  { species: 'H2O(l)', dfGkJ: -237.129, dfHkJ: -285.83, sJK: 69.91, cpJK: 75.291, source: NBS }, // [table]
  { species: 'H+', dfGkJ: 0, dfHkJ: 0, sJK: 0, cpJK: 0, source: `${NBS} (convention)` }, // [table]
  { species: 'OH-', dfGkJ: -157.244, dfHkJ: -229.994, sJK: -10.75, cpJK: -148.5, source: NBS }, // [table]
  { species: 'O2(g)', dfGkJ: 0, dfHkJ: 0, sJK: 205.138, cpJK: 29.355, source: NBS }, // [table]
  { species: 'H2(g)', dfGkJ: 0, dfHkJ: 0, sJK: 130.684, cpJK: 28.824, source: NBS }, // [table]

  // iron
  { species: 'Fe(s)', dfGkJ: 0, dfHkJ: 0, sJK: 27.28, cpJK: 25.1, source: NBS }, // [table]
  measured('Fe2+', { g: -78.9, h: -89.1, s: -137.7 }, 2, -0.447, 0, 'Fe2+ + 2 e- -> Fe'), // [table]
  measured('Fe3+', { g: -4.7, h: -48.5, s: -315.9 }, 1, 0.771, G_FE2, 'Fe3+ + e- -> Fe2+'), // [table]
  { species: 'FeOH 2+', dfGkJ: -229.41, dfHkJ: -290.8, sJK: -142, source: NBS },
  { species: 'HFeO2-', dfGkJ: -377.7, source: NBS },
  { species: 'Fe(OH)2(s)', dfGkJ: -486.5, dfHkJ: -569.0, sJK: 88, source: NBS },
  { species: 'Fe(OH)3(s)', dfGkJ: -696.5, dfHkJ: -823.0, sJK: 106.7, source: NBS },
  { species: 'Fe3O4(s)', dfGkJ: -1015.4, dfHkJ: -1118.4, sJK: 146.4, cpJK: 143.43, source: NBS },
  { species: 'Fe2O3(s)', dfGkJ: -742.2, dfHkJ: -824.2, sJK: 87.4, cpJK: 103.85, source: NBS },

  // copper
  { species: 'Cu(s)', dfGkJ: 0, dfHkJ: 0, sJK: 33.15, cpJK: 24.435, source: NBS }, // [table]
  { species: 'Cu+', dfGkJ: 49.98, dfHkJ: 71.67, sJK: 40.6, source: NBS }, // [table]
  { species: 'Cu2+', dfGkJ: 65.49, dfHkJ: 64.77, sJK: -99.6, source: NBS }, // [table]
  { species: 'Cu2O(s)', dfGkJ: -146.0, dfHkJ: -168.6, sJK: 93.14, cpJK: 63.64, source: NBS },
  { species: 'CuO(s)', dfGkJ: -129.7, dfHkJ: -157.3, sJK: 42.63, cpJK: 42.3, source: NBS },
  { species: 'HCuO2-', dfGkJ: -258.5, source: NBS },
  { species: 'CuO2 2-', dfGkJ: -183.6, source: NBS },

  // zinc
  { species: 'Zn(s)', dfGkJ: 0, dfHkJ: 0, sJK: 41.63, cpJK: 25.4, source: NBS }, // [table]
  measured('Zn2+', { g: -147.06, h: -153.89, s: -112.1, cp: 46 }, 2, -0.7618, 0, 'Zn2+ + 2 e- -> Zn'), // [table]
  { species: 'ZnO(s)', dfGkJ: -318.3, dfHkJ: -348.28, sJK: 43.64, cpJK: 40.25, source: NBS },
  { species: 'HZnO2-', dfGkJ: -464.0, source: NBS },
  { species: 'ZnO2 2-', dfGkJ: -384.2, source: NBS },

  // aluminium
  { species: 'Al(s)', dfGkJ: 0, dfHkJ: 0, sJK: 28.33, cpJK: 24.35, source: NBS }, // [table]
  measured('Al3+', { g: -485.0, h: -531, s: -321.7 }, 3, -1.662, 0, 'Al3+ + 3 e- -> Al'), // [table]
  {
    species: 'Al2O3(s)',
    dfGkJ: -1582.3,
    dfHkJ: -1675.7,
    sJK: 50.92,
    cpJK: 79.04,
    source: `${NBS}; corundum`,
  },
  { species: 'AlO2-', dfGkJ: -830.9, dfHkJ: -930.9, sJK: -36.8, source: NBS },

  // nickel
  { species: 'Ni(s)', dfGkJ: 0, dfHkJ: 0, sJK: 29.87, cpJK: 26.07, source: NBS }, // [table]
  measured('Ni2+', { g: -45.6, h: -54.0, s: -128.9 }, 2, -0.257, 0, 'Ni2+ + 2 e- -> Ni'), // [table]
  { species: 'Ni(OH)2(s)', dfGkJ: -447.2, dfHkJ: -529.7, sJK: 88, source: NBS }, // [table: NiO2/Ni(OH)2]
  { species: 'HNiO2-', dfGkJ: -349.2, source: NBS },
  { species: 'Ni3O4(s)', dfGkJ: -711.9, source: POURBAIX },
  { species: 'Ni2O3(s)', dfGkJ: -469.7, source: POURBAIX },
  {
    // NiO2 + 2H2O + 2e- -> Ni(OH)2 + 2OH- (0.49 V) with NBS Ni(OH)2, OH-, H2O
    species: 'NiO2(s)',
    dfGkJ: -447.2 + 2 * -157.244 - 2 * -237.129 + 2 * F_KJ * 0.49,
    source: `derived: ΔfG° from E°(NiO2/Ni(OH)2) = 0.49 V (${OSX}) and the ${NBS}`,
  }, // [table]

  // chromium
  { species: 'Cr(s)', dfGkJ: 0, dfHkJ: 0, sJK: 23.77, cpJK: 23.35, source: NBS }, // [table]
  {
    species: 'Cr2+',
    dfGkJ: 2 * F_KJ * -0.913,
    source: `derived: ΔfG° from E°(Cr2+/Cr) = −0.913 V (CRC Handbook, 92nd ed.), from memory`,
  },
  { species: 'Cr3+', dfGkJ: 3 * F_KJ * -0.744, source: `derived: ΔfG° from E°(Cr3+/Cr) = −0.744 V (${OSX})` }, // [table]
  { species: 'Cr2O3(s)', dfGkJ: -1058.1, dfHkJ: -1139.7, sJK: 81.2, cpJK: 118.74, source: NBS },
  { species: 'CrO2-', dfGkJ: -535.9, source: POURBAIX },
  { species: 'HCrO4-', dfGkJ: -764.7, dfHkJ: -878.2, sJK: 184.1, source: NBS },
  { species: 'CrO4 2-', dfGkJ: -727.75, dfHkJ: -881.15, sJK: 50.21, source: NBS },

  // lead
  { species: 'Pb(s)', dfGkJ: 0, dfHkJ: 0, sJK: 64.81, cpJK: 26.44, source: NBS }, // [table]
  measured('Pb2+', { g: -24.43, h: -1.7, s: 10.5 }, 2, -0.1262, 0, 'Pb2+ + 2 e- -> Pb'), // [table]
  { species: 'PbO(s)', dfGkJ: -187.89, dfHkJ: -217.32, sJK: 68.7, cpJK: 45.77, source: `${NBS}; yellow` }, // [table]
  { species: 'Pb3O4(s)', dfGkJ: -601.2, dfHkJ: -718.4, sJK: 211.3, cpJK: 146.9, source: NBS },
  {
    species: 'PbO2(s)',
    dfGkJ: G_PBO2,
    dfHkJ: -277.4 + (G_PBO2 - -217.33),
    sJK: 68.6,
    cpJK: 64.64,
    source: `ΔfG° from the measured E° of PbSO4/Pb (−0.3505 V) and PbO2/PbSO4 (1.69 V) (${OSX}) with NBS SO4 2- and H2O; ΔfH° moved with it, S° and Cp° from the ${NBS}`,
  }, // [table]
  { species: 'HPbO2-', dfGkJ: -338.9, source: NBS },

  // tin
  { species: 'Sn(s)', dfGkJ: 0, dfHkJ: 0, sJK: 51.55, cpJK: 26.99, source: `${NBS}; white tin` }, // [table]
  measured('Sn2+', { g: -27.2, h: -8.8, s: -17 }, 2, -0.1375, 0, 'Sn2+ + 2 e- -> Sn'), // [table]
  measured('Sn4+', { g: 2.5, h: 30.5, s: -117 }, 2, 0.151, G_SN2, 'Sn4+ + 2 e- -> Sn2+'), // [table]
  { species: 'SnO(s)', dfGkJ: -256.9, dfHkJ: -285.8, sJK: 56.5, cpJK: 44.31, source: NBS },
  { species: 'SnO2(s)', dfGkJ: -519.6, dfHkJ: -580.7, sJK: 52.3, cpJK: 52.59, source: NBS },
  { species: 'HSnO2-', dfGkJ: -410.0, source: NBS },
  { species: 'SnO3 2-', dfGkJ: -574.1, source: POURBAIX },

  // magnesium
  { species: 'Mg(s)', dfGkJ: 0, dfHkJ: 0, sJK: 32.68, cpJK: 24.89, source: NBS }, // [table]
  measured('Mg2+', { g: -454.8, h: -466.85, s: -138.1 }, 2, -2.372, 0, 'Mg2+ + 2 e- -> Mg'), // [table]
  { species: 'MgO(s)', dfGkJ: -569.43, dfHkJ: -601.7, sJK: 26.94, cpJK: 37.15, source: NBS },
  {
    species: 'Mg(OH)2(s)',
    dfGkJ: -833.51,
    dfHkJ: -924.54,
    sJK: 63.18,
    cpJK: 77.03,
    source: `${NBS}; brucite`,
  },

  // silver
  { species: 'Ag(s)', dfGkJ: 0, dfHkJ: 0, sJK: 42.55, cpJK: 25.351, source: NBS }, // [table]
  measured('Ag+', { g: 77.107, h: 105.579, s: 72.68, cp: 21.8 }, 1, 0.7996, 0, 'Ag+ + e- -> Ag'), // [table]
  { species: 'Ag2O(s)', dfGkJ: -11.2, dfHkJ: -31.05, sJK: 121.3, cpJK: 65.86, source: NBS },
  { species: 'AgO(s)', dfGkJ: 10.8, source: POURBAIX },
  { species: 'Ag(OH)2-', dfGkJ: -260.2, source: NBS },
];
