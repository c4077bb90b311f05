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
const u = undefined;

/** One record from its values (kJ/mol, J/(mol·K)); absent values as `u`; NBS unless named. */
function rec(
  species: string,
  g: number,
  h?: number,
  s?: number,
  cp?: number,
  source = NBS,
): SpeciesThermoRecord {
  return {
    species,
    dfGkJ: g,
    ...(h === undefined ? {} : { dfHkJ: h }),
    ...(s === undefined ? {} : { sJK: s }),
    ...(cp === undefined ? {} : { cpJK: cp }),
    source,
  };
}
const G_FE2 = 2 * F_KJ * -0.447; // Fe2+ + 2e- -> Fe
const G_SN2 = 2 * F_KJ * -0.1375; // Sn2+ + 2e- -> Sn
// PbSO4 + 2e- -> Pb + SO4 2- (−0.3505 V) with NBS ΔfG°(SO4 2-) = −744.53; then
// PbO2 + SO4 2- + 4H+ + 2e- -> PbSO4 + 2H2O (1.69 V): ΔfG°(PbO2) = ΔfG°(PbSO4) + 2ΔfG°(H2O) − ΔfG°(SO4 2-) + 2F·1.69
const G_PBSO4 = -744.53 + 2 * F_KJ * -0.3505;
const G_PBO2 = G_PBSO4 + 2 * -237.129 + 744.53 + 2 * F_KJ * 1.69;

export const EPH_SPECIES: readonly SpeciesThermoRecord[] = [
  // water and its ions
  rec('H2O(l)', -237.129, -285.83, 69.91, 75.291), // [table]
  { species: 'H+', dfGkJ: 0, dfHkJ: 0, sJK: 0, cpJK: 0, source: `${NBS} (convention)` }, // [table]
  rec('OH-', -157.244, -229.994, -10.75, -148.5), // [table]
  rec('O2(g)', 0, 0, 205.138, 29.355), // [table]
  rec('H2(g)', 0, 0, 130.684, 28.824), // [table]

  // iron
  rec('Fe(s)', 0, 0, 27.28, 25.1), // [table]
  measured('Fe2+', { g: -78.9, h: -89.1, s: -137.7 }, 2, -0.447, 0, 'Fe2+ + 2 e- -> Fe'), // [table]
  measured('Fe3+', { g: -4.7, h: -48.5, s: -315.9 }, 1, 0.771, G_FE2, 'Fe3+ + e- -> Fe2+'), // [table]
  rec('FeOH 2+', -229.41, -290.8, -142),
  rec('HFeO2-', -377.7),
  rec('Fe(OH)2(s)', -486.5, -569.0, 88),
  rec('Fe(OH)3(s)', -696.5, -823.0, 106.7),
  rec('Fe3O4(s)', -1015.4, -1118.4, 146.4, 143.43),
  rec('Fe2O3(s)', -742.2, -824.2, 87.4, 103.85),

  // copper
  rec('Cu(s)', 0, 0, 33.15, 24.435), // [table]
  rec('Cu+', 49.98, 71.67, 40.6), // [table]
  rec('Cu2+', 65.49, 64.77, -99.6), // [table]
  rec('Cu2O(s)', -146.0, -168.6, 93.14, 63.64),
  rec('CuO(s)', -129.7, -157.3, 42.63, 42.3),
  rec('HCuO2-', -258.5),
  rec('CuO2 2-', -183.6),

  // zinc
  rec('Zn(s)', 0, 0, 41.63, 25.4), // [table]
  measured('Zn2+', { g: -147.06, h: -153.89, s: -112.1, cp: 46 }, 2, -0.7618, 0, 'Zn2+ + 2 e- -> Zn'), // [table]
  rec('ZnO(s)', -318.3, -348.28, 43.64, 40.25),
  rec('HZnO2-', -464.0),
  rec('ZnO2 2-', -384.2),

  // aluminium
  rec('Al(s)', 0, 0, 28.33, 24.35), // [table]
  measured('Al3+', { g: -485.0, h: -531, s: -321.7 }, 3, -1.662, 0, 'Al3+ + 3 e- -> Al'), // [table]
  {
    species: 'Al2O3(s)',
    dfGkJ: -1582.3,
    dfHkJ: -1675.7,
    sJK: 50.92,
    cpJK: 79.04,
    source: `${NBS}; corundum`,
  },
  rec('AlO2-', -830.9, -930.9, -36.8),

  // nickel
  rec('Ni(s)', 0, 0, 29.87, 26.07), // [table]
  measured('Ni2+', { g: -45.6, h: -54.0, s: -128.9 }, 2, -0.257, 0, 'Ni2+ + 2 e- -> Ni'), // [table]
  rec('Ni(OH)2(s)', -447.2, -529.7, 88), // [table: NiO2/Ni(OH)2]
  rec('HNiO2-', -349.2),
  rec('Ni3O4(s)', -711.9, u, u, u, POURBAIX),
  rec('Ni2O3(s)', -469.7, u, u, u, POURBAIX),
  {
    // NiO2 + 2H2O + 2e- -> Ni(OH)2 + 2OH- (0.49 V) with NBS Ni(OH)2, OH-, H2O
    species: 'NiO2(s)',
    dfGkJ: -447.2 + 2 * -157.244 - 2 * -237.129 + 2 * F_KJ * 0.49,
    source: `derived: ΔfG° from E°(NiO2/Ni(OH)2) = 0.49 V (${OSX}) and the ${NBS}`,
  }, // [table]

  // chromium
  rec('Cr(s)', 0, 0, 23.77, 23.35), // [table]
  {
    species: 'Cr2+',
    dfGkJ: 2 * F_KJ * -0.913,
    source: `derived: ΔfG° from E°(Cr2+/Cr) = −0.913 V (CRC Handbook, 92nd ed.), from memory`,
  },
  { species: 'Cr3+', dfGkJ: 3 * F_KJ * -0.744, source: `derived: ΔfG° from E°(Cr3+/Cr) = −0.744 V (${OSX})` }, // [table]
  rec('Cr2O3(s)', -1058.1, -1139.7, 81.2, 118.74),
  rec('CrO2-', -535.9, u, u, u, POURBAIX),
  rec('HCrO4-', -764.7, -878.2, 184.1),
  rec('CrO4 2-', -727.75, -881.15, 50.21),

  // lead
  rec('Pb(s)', 0, 0, 64.81, 26.44), // [table]
  measured('Pb2+', { g: -24.43, h: -1.7, s: 10.5 }, 2, -0.1262, 0, 'Pb2+ + 2 e- -> Pb'), // [table]
  { species: 'PbO(s)', dfGkJ: -187.89, dfHkJ: -217.32, sJK: 68.7, cpJK: 45.77, source: `${NBS}; yellow` }, // [table]
  rec('Pb3O4(s)', -601.2, -718.4, 211.3, 146.9),
  {
    species: 'PbO2(s)',
    dfGkJ: G_PBO2,
    dfHkJ: -277.4 + (G_PBO2 - -217.33),
    sJK: 68.6,
    cpJK: 64.64,
    source: `ΔfG° from the measured E° of PbSO4/Pb (−0.3505 V) and PbO2/PbSO4 (1.69 V) (${OSX}) with NBS SO4 2- and H2O; ΔfH° moved with it, S° and Cp° from the ${NBS}`,
  }, // [table]
  rec('HPbO2-', -338.9),

  // tin
  { species: 'Sn(s)', dfGkJ: 0, dfHkJ: 0, sJK: 51.55, cpJK: 26.99, source: `${NBS}; white tin` }, // [table]
  measured('Sn2+', { g: -27.2, h: -8.8, s: -17 }, 2, -0.1375, 0, 'Sn2+ + 2 e- -> Sn'), // [table]
  measured('Sn4+', { g: 2.5, h: 30.5, s: -117 }, 2, 0.151, G_SN2, 'Sn4+ + 2 e- -> Sn2+'), // [table]
  rec('SnO(s)', -256.9, -285.8, 56.5, 44.31),
  rec('SnO2(s)', -519.6, -580.7, 52.3, 52.59),
  rec('HSnO2-', -410.0),
  rec('SnO3 2-', -574.1, u, u, u, POURBAIX),

  // magnesium
  rec('Mg(s)', 0, 0, 32.68, 24.89), // [table]
  measured('Mg2+', { g: -454.8, h: -466.85, s: -138.1 }, 2, -2.372, 0, 'Mg2+ + 2 e- -> Mg'), // [table]
  rec('MgO(s)', -569.43, -601.7, 26.94, 37.15),
  {
    species: 'Mg(OH)2(s)',
    dfGkJ: -833.51,
    dfHkJ: -924.54,
    sJK: 63.18,
    cpJK: 77.03,
    source: `${NBS}; brucite`,
  },

  // silver
  rec('Ag(s)', 0, 0, 42.55, 25.351), // [table]
  measured('Ag+', { g: 77.107, h: 105.579, s: 72.68, cp: 21.8 }, 1, 0.7996, 0, 'Ag+ + e- -> Ag'), // [table]
  rec('Ag2O(s)', -11.2, -31.05, 121.3, 65.86),
  rec('AgO(s)', 10.8, u, u, u, POURBAIX),
  rec('Ag(OH)2-', -260.2),
];
