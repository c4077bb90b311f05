/**
 * Standard thermodynamic data (298.15 K, 1 bar) of every species the built-in potentials
 * table uses: ΔfG°, ΔfH° (kJ/mol), S° and Cp° (J/(mol·K)).
 *
 * Conventions: ΔfG°, ΔfH°, S° and Cp° of H+(aq) are zero (the usual convention for
 * aqueous ions); elements in their reference states have ΔfG° = ΔfH° = 0; electrons
 * follow the SHE convention (see `electronThermo` in ./index.ts), so that E° of
 * 2 H+ + 2 e- -> H2(g) is zero at every temperature.
 *
 * One source set per element, so that rows of the potentials table cannot contradict
 * each other:
 * - NBS: the NBS tables of chemical thermodynamic properties (Wagman et al., J. Phys.
 *   Chem. Ref. Data 11, Suppl. 2, 1982), recalled, not re-read: "from memory".
 * - OSX: OpenStax Chemistry 2e, Appendix G (read), for bromide, where the recalled NBS
 *   value disagreed with the measured E° of Br2/Br-.
 * - MEASURED: for the ions (and PbSO4, PbO2, AgCl) whose standard potential is the primary
 *   published value, ΔfG° is set from that E° (OpenStax Appendix L, Bates & Bower 1954,
 *   CRC Handbook) and ΔfH° moves with it; S° and Cp° stay as tabulated (see `measured`).
 * - DERIVED: ΔfG° computed from a published standard potential and the ΔfG° of the other
 *   species of that half-reaction, for species the NBS tables give no ΔfG° for (or where
 *   a measured E° is better than the tabulated ΔfG°); such a record names the potential.
 *   It carries no S° unless a source gives one, so its reactions have no entropy-based
 *   temperature dependence (SOURCE says so).
 *
 * Values are as the source prints them (kJ/mol to 0.01–0.1, J/(mol·K) to 0.01–1).
 */
import type { SpeciesThermoRecord } from './types';
import { FARADAY_C_PER_MOL } from '../../constants';

const NBS = 'NBS tables (Wagman et al., J. Phys. Chem. Ref. Data 11, Suppl. 2, 1982), from memory';
const OSX_G = 'OpenStax Chemistry 2e, Appendix G';
const FARADAY_KJ_PER_V = FARADAY_C_PER_MOL / 1000; // F in kJ/(mol·V), SI 2019 exact

/** ΔfG° (kJ/mol) of one species from a half-reaction's E°: ΔrG° = −nFE°. */
function fromPotential(
  species: string,
  dfGkJ: number,
  potential: string,
  extra: Partial<SpeciesThermoRecord> = {},
): SpeciesThermoRecord {
  return {
    species,
    dfGkJ,
    ...extra,
    source: `derived: ΔfG° from E°(${potential}) and the NBS 1982 values of the other species (from memory)`,
  };
}

type Row = readonly [species: string, g: number, h: number | null, s: number | null, cp: number | null];

function nbs(rows: readonly Row[], source = NBS): SpeciesThermoRecord[] {
  return rows.map(([species, dfGkJ, h, s, cp]) => ({
    species,
    dfGkJ,
    ...(h === null ? {} : { dfHkJ: h }),
    ...(s === null ? {} : { sJK: s }),
    ...(cp === null ? {} : { cpJK: cp }),
    source,
  }));
}

const F = FARADAY_KJ_PER_V;
// ΔfG° values used by the derived records below (NBS 1982, from memory)
const G_H2O = -237.129;
const G_OH = -157.244;
const G_CL = -131.228;
const G_CRO4 = -727.75;

/** The tabulated records (built on first use, not at load: see {@link standardSpecies}). */
// prettier-ignore
const tabulated = (): readonly SpeciesThermoRecord[] => [
  // hydrogen, oxygen, water
  ...nbs([
    ['H2(g)', 0, 0, 130.684, 28.824],
    ['H+(aq)', 0, 0, 0, 0],
    ['H2O(l)', G_H2O, -285.83, 69.91, 75.291],
    ['OH-(aq)', G_OH, -229.994, -10.75, -148.5],
    ['O2(g)', 0, 0, 205.138, 29.355],
    ['H2O2(aq)', -134.03, -191.17, 143.9, null],
    ['HO2-(aq)', -67.3, -160.33, 23.8, null],
    ['O3(g)', 163.2, 142.7, 238.93, 39.20],
  ]),
  // H-(aq): not in the NBS tables; from E° of H2/H- (CRC Handbook, 92nd ed., from memory)
  fromPotential('H-(aq)', F * 2.23, 'H2(g) + 2 e- -> 2 H-) = −2.23 V (CRC Handbook, 92nd ed.'),
  // alkali and alkaline-earth metals
  ...nbs([
    ['Li(s)', 0, 0, 29.12, 24.77],
    ['Li+(aq)', -293.31, -278.49, 13.4, 68.6],
    ['Be(s)', 0, 0, 9.50, 16.44],
    ['Be2+(aq)', -379.73, -382.8, -129.7, null],
    ['Na(s)', 0, 0, 51.21, 28.24],
    ['Na+(aq)', -261.905, -240.12, 59.0, 46.4],
    ['Mg(s)', 0, 0, 32.68, 24.89],
    ['Mg2+(aq)', -454.8, -466.85, -138.1, null],
    ['Mg(OH)2(s)', -833.51, -924.54, 63.18, 77.03],
    ['K(s)', 0, 0, 64.18, 29.58],
    ['K+(aq)', -283.27, -252.38, 102.5, 21.8],
    ['Ca(s)', 0, 0, 41.42, 25.31],
    ['Ca2+(aq)', -553.58, -542.83, -53.1, null],
    ['Rb(s)', 0, 0, 76.78, 31.06],
    ['Rb+(aq)', -282.33, -251.17, 121.50, null],
    ['Sr(s)', 0, 0, 52.3, 26.4],
    ['Sr2+(aq)', -559.48, -545.80, -32.6, null],
    ['Cs(s)', 0, 0, 85.23, 32.17],
    ['Cs+(aq)', -292.02, -258.28, 133.05, -10.5],
    ['Ba(s)', 0, 0, 62.8, 28.07],
    ['Ba2+(aq)', -560.77, -537.64, 9.6, null],
  ]),
  // aluminium, gallium, indium, thallium
  ...nbs([
    ['Al(s)', 0, 0, 28.33, 24.35],
    ['Al3+(aq)', -485.0, -531.0, -321.7, null],
    ['Ga(s)', 0, 0, 40.88, 25.86],
    ['Ga3+(aq)', -159.0, -211.7, -331, null],
    ['In(s)', 0, 0, 57.82, 26.74],
    ['In3+(aq)', -98.0, -105.0, -151, null],
    ['Tl(s)', 0, 0, 64.18, 26.32],
    ['Tl+(aq)', -32.38, 5.36, 125.5, null],
    ['Tl3+(aq)', 214.6, 196.6, -192, null],
  ]),
  fromPotential('Al(OH)3(s)', 3 * F * -2.31 + 3 * G_OH, 'Al(OH)3(s) + 3 e- -> Al + 3 OH-) = −2.31 V (CRC Handbook, 92nd ed.'),
  // nitrogen
  ...nbs([
    ['NO3-(aq)', -108.74, -205.0, 146.4, -86.6],
    ['NO2-(aq)', -32.2, -104.6, 123.0, -97.5],
    ['NO2(g)', 51.31, 33.18, 240.06, 37.20],
    ['HNO2(aq)', -50.6, -119.2, 135.6, null],
    ['NO(g)', 86.55, 90.25, 210.761, 29.844],
    ['NH3(aq)', -26.50, -80.29, 111.3, null],
  ]),
  // fluorine, chlorine, bromine, iodine
  ...nbs([
    ['F2(g)', 0, 0, 202.78, 31.30],
    ['F-(aq)', -278.79, -332.63, -13.8, -106.7],
    ['HF(aq)', -296.82, -320.08, 88.7, null],
    ['Cl2(g)', 0, 0, 223.066, 33.907],
    ['Cl-(aq)', G_CL, -167.159, 56.5, -136.4],
    ['ClO-(aq)', -36.8, -107.1, 42.0, null],
    ['ClO3-(aq)', -7.95, -103.97, 162.3, null],
    ['ClO4-(aq)', -8.52, -129.33, 182.0, null],
    ['HClO(aq)', -79.9, -120.9, 142, null],
    ['HClO2(aq)', 5.9, -51.9, 188.3, null],
    ['Br2(l)', 0, 0, 152.231, 75.689],
    ['Br2(aq)', 3.93, -2.59, 130.5, null],
    ['BrO3-(aq)', 18.60, -67.07, 161.71, null],
    ['I2(s)', 0, 0, 116.135, 54.438],
    ['I-(aq)', -51.57, -55.19, 111.3, -142.3],
    ['I3-(aq)', -51.4, -51.5, 239.3, null],
    ['IO3-(aq)', -128.0, -221.3, 118.4, null],
  ]),
  ...nbs([['Br-(aq)', -102.82, -120.9, 80.71, null]], OSX_G),
  // sulfur
  ...nbs([
    ['S(s)', 0, 0, 31.80, 22.64],
    ['S2-(aq)', 85.8, 33.1, -14.6, null],
    ['H2S(aq)', -27.83, -39.7, 121, null],
    ['SO3^2-(aq)', -486.5, -635.5, -29, null],
    ['H2SO3(aq)', -537.81, -608.81, 232.2, null],
    ['SO4^2-(aq)', -744.53, -909.27, 20.1, -293],
    ['S2O3^2-(aq)', -522.5, -652.3, 67, null],
    ['S4O6^2-(aq)', -1022.2, null, 257.3, null],
    ['S2O8^2-(aq)', -1114.9, -1344.7, 244.3, null],
  ]),
  // titanium, vanadium, chromium: the NBS tables give no ΔfG° for these ions; from E°
  ...nbs([
    ['Ti(s)', 0, 0, 30.63, 25.06],
    ['V(s)', 0, 0, 28.91, 24.89],
    ['Cr(s)', 0, 0, 23.77, 23.35],
    ['CrO4^2-(aq)', G_CRO4, -881.15, 50.21, null],
    ['Cr2O7^2-(aq)', -1301.1, -1490.3, 261.9, null],
  ]),
  fromPotential('Ti2+(aq)', 2 * F * -1.63, 'Ti2+/Ti) = −1.63 V (CRC Handbook, 92nd ed.'),
  fromPotential('V2+(aq)', 2 * F * -1.175, 'V2+/V) = −1.175 V (CRC Handbook, 92nd ed.'),
  fromPotential('V3+(aq)', 2 * F * -1.175 + F * -0.255, 'V3+/V2+) = −0.255 V (CRC Handbook, 92nd ed.'),
  fromPotential('VO^2+(aq)', 2 * F * -1.175 + F * -0.255 + F * 0.337 + G_H2O, 'VO^2+/V3+) = 0.337 V (CRC Handbook, 92nd ed.'),
  fromPotential('VO2^+(aq)', 2 * F * -1.175 + F * -0.255 + F * 0.337 + F * 0.991 + 2 * G_H2O, 'VO2^+/VO^2+) = 0.991 V (CRC Handbook, 92nd ed.'),
  fromPotential('Cr3+(aq)', 3 * F * -0.744, 'Cr3+/Cr) = −0.744 V (OpenStax Chemistry 2e, Appendix L'),
  fromPotential('Cr2+(aq)', 2 * F * -0.913, 'Cr2+/Cr) = −0.913 V (CRC Handbook, 92nd ed.'),
  fromPotential('Cr(OH)3(s)', 3 * F * 0.13 - 5 * G_OH + G_CRO4 + 4 * G_H2O, 'CrO4^2-/Cr(OH)3) = −0.13 V (CRC Handbook, 92nd ed.'),
  // manganese
  ...nbs([
    ['Mn(s)', 0, 0, 32.01, 26.32],
    ['Mn2+(aq)', -228.1, -220.75, -73.6, 50],
    ['Mn(OH)2(s)', -615.0, -695.4, 99.2, null],
    ['MnO2(s)', -465.14, -520.03, 53.05, 54.14],
    ['MnO4-(aq)', -447.2, -541.4, 191.2, -82.0],
    ['MnO4^2-(aq)', -500.7, -653, 59, null],
  ]),
  fromPotential('Mn3+(aq)', -228.1 + F * 1.5415, 'Mn3+/Mn2+) = 1.5415 V (CRC Handbook, 92nd ed.'),
  // iron, cobalt, nickel
  ...nbs([
    ['Fe(s)', 0, 0, 27.28, 25.10],
    ['Fe2+(aq)', -78.90, -89.1, -137.7, null],
    ['Fe3+(aq)', -4.7, -48.5, -315.9, null],
    ['Fe(OH)2(s)', -486.5, -569.0, 88, null],
    ['Fe(OH)3(s)', -696.5, -823.0, 106.7, null],
    ['[Fe(CN)6]3-(aq)', 729.4, 561.9, 270.3, null],
    ['[Fe(CN)6]4-(aq)', 695.08, 455.6, 95.0, null],
    ['Co(s)', 0, 0, 30.04, 24.81],
    ['Co2+(aq)', -54.4, -58.2, -113, null],
    ['Co3+(aq)', 134, 92, -305, null],
    ['Co(OH)2(s)', -454.3, -539.7, 79, null],
    ['Ni(s)', 0, 0, 29.87, 26.07],
    ['Ni2+(aq)', -45.6, -54.0, -128.9, null],
    ['Ni(OH)2(s)', -447.2, -529.7, 88, null],
  ]),
  fromPotential('NiO2(s)', -447.2 + 2 * G_OH - 2 * G_H2O + 2 * F * 0.49, 'NiO2/Ni(OH)2) = 0.49 V (OpenStax Chemistry 2e, Appendix L'),
  // copper, zinc, cadmium, mercury
  ...nbs([
    ['Cu(s)', 0, 0, 33.150, 24.435],
    ['Cu+(aq)', 49.98, 71.67, 40.6, null],
    ['Cu2+(aq)', 65.49, 64.77, -99.6, null],
    ['Cu2O(s)', -146.0, -168.6, 93.14, 63.64],
    ['Zn(s)', 0, 0, 41.63, 25.40],
    ['Zn2+(aq)', -147.06, -153.89, -112.1, 46],
    ['ZnO(s)', -318.30, -348.28, 43.64, 40.25],
    ['Zn(OH)2(s)', -553.5, -641.9, 81.2, null],
    ['ZnO2^2-(aq)', -384.2, null, null, null],
    ['Cd(s)', 0, 0, 51.76, 25.98],
    ['Cd2+(aq)', -77.612, -75.90, -73.2, null],
    ['Cd(OH)2(s)', -473.6, -560.7, 96, null],
    ['Hg(l)', 0, 0, 76.02, 27.983],
    ['Hg2+(aq)', 164.40, 171.1, -32.2, null],
    ['Hg2^2+(aq)', 153.52, 172.4, 84.5, null],
    ['HgO(s)', -58.539, -90.83, 70.29, 44.06],
    ['Hg2SO4(s)', -625.815, -743.12, 200.66, 131.96],
  ]),
  // Hg2Cl2: ΔfG° from the measured E° of the calomel couple, which the reference electrodes use
  fromPotential('Hg2Cl2(s)', 2 * G_CL + 2 * F * 0.26808, 'Hg2Cl2(s) + 2 e- -> 2 Hg(l) + 2 Cl-) = 0.26808 V (OpenStax Chemistry 2e, Appendix L', { dfHkJ: -265.22, sJK: 192.5 }),
  // silver
  ...nbs([
    ['Ag(s)', 0, 0, 42.55, 25.351],
    ['AgCl(s)', -109.789, -127.068, 96.2, 50.79],
    ['Ag+(aq)', 77.107, 105.579, 72.68, 21.8],
    ['Ag2+(aq)', 268.2, 268.6, -88, null],
    ['AgBr(s)', -96.90, -100.37, 107.1, 52.38],
    ['AgI(s)', -66.19, -61.84, 115.5, 56.82],
    ['Ag2O(s)', -11.20, -31.05, 121.3, 65.86],
    ['Ag2S(s)', -40.67, -32.59, 144.01, 76.53],
    ['Ag2CrO4(s)', -641.76, -731.74, 217.6, 142.26],
    ['Ag2SO4(s)', -618.41, -715.88, 200.4, 131.38],
    ['[Ag(NH3)2]+(aq)', -17.12, -111.29, 245.2, null],
  ]),
  // tin, lead, bismuth
  ...nbs([
    ['Sn(s)', 0, 0, 51.55, 26.99],
    ['Sn2+(aq)', -27.2, -8.8, -17, null],
    ['Sn4+(aq)', 2.5, 30.5, -117, null],
    ['Pb(s)', 0, 0, 64.81, 26.44],
    ['Pb2+(aq)', -24.43, -1.7, 10.5, null],
    ['PbO(s)', -187.89, -217.32, 68.70, 45.77],
    ['PbO2(s)', -217.33, -277.4, 68.6, 64.64],
    ['PbSO4(s)', -813.14, -919.94, 148.57, 103.207],
    ['PbCl2(s)', -314.10, -359.41, 136.0, null],
    ['Bi(s)', 0, 0, 56.74, 25.52],
    ['Bi3+(aq)', 82.8, null, null, null],
  ]),
  // palladium, platinum, gold, lanthanides
  ...nbs([
    ['Pd(s)', 0, 0, 37.57, 25.98],
    ['Pd2+(aq)', 176.5, 149.0, -184, null],
    ['Pt(s)', 0, 0, 41.63, 25.86],
    ['[PtCl4]2-(aq)', -368.6, null, 175, null],
    ['Au(s)', 0, 0, 47.40, 25.42],
    ['[AuCl4]-(aq)', -235.14, -322.2, 266.9, null],
    ['La(s)', 0, 0, 56.9, 27.11],
    ['La3+(aq)', -683.7, -707.1, -217.6, -13],
    ['Ce(s)', 0, 0, 72.0, 26.94],
    ['Ce3+(aq)', -672.0, -696.2, -205, null],
    ['Ce4+(aq)', -503.8, -537.2, -301, null],
  ]),
  fromPotential('Pt2+(aq)', 2 * F * 1.18, 'Pt2+/Pt) = 1.18 V (CRC Handbook, 92nd ed.'),
  fromPotential('Au3+(aq)', 3 * F * 1.498, 'Au3+/Au) = 1.498 V (OpenStax Chemistry 2e, Appendix L'),
  fromPotential('Au+(aq)', F * 1.692, 'Au+/Au) = 1.692 V (CRC Handbook, 92nd ed.'),
];

const OSX_L = 'OpenStax Chemistry 2e, Appendix L';
const CRC92 = 'CRC Handbook of Chemistry and Physics, 92nd ed. (from memory)';
const BB = 'Bates & Bower, J. Res. NBS 53, 283 (1954)';
const CRC92_SEEN = 'CRC Handbook of Chemistry and Physics, 92nd ed., Electrochemical Series';

/**
 * Species whose ΔfG° is set from a measured standard potential that is better than (or
 * the primary published value beside) the tabulated ΔfG°: [species, half-reaction terms
 * (species, coefficient; reactants negative), electrons, E° in V, source]. ΔfH° moves
 * with ΔfG° (S° is kept), so the record stays internally consistent. Applied in order,
 * each from the values before it.
 */
// prettier-ignore
const measured = (): readonly (readonly [string, readonly (readonly [string, number])[], number, number, string])[] => [
  ['Li+(aq)', [['Li+(aq)', -1], ['Li(s)', 1]], 1, -3.04, OSX_L],
  ['Na+(aq)', [['Na+(aq)', -1], ['Na(s)', 1]], 1, -2.71, OSX_L],
  ['K+(aq)', [['K+(aq)', -1], ['K(s)', 1]], 1, -2.931, OSX_L],
  ['Rb+(aq)', [['Rb+(aq)', -1], ['Rb(s)', 1]], 1, -2.98, OSX_L],
  ['Cs+(aq)', [['Cs+(aq)', -1], ['Cs(s)', 1]], 1, -3.026, CRC92],
  ['Mg2+(aq)', [['Mg2+(aq)', -1], ['Mg(s)', 1]], 2, -2.372, OSX_L],
  ['Ca2+(aq)', [['Ca2+(aq)', -1], ['Ca(s)', 1]], 2, -2.868, OSX_L],
  ['Sr2+(aq)', [['Sr2+(aq)', -1], ['Sr(s)', 1]], 2, -2.899, CRC92],
  ['Ba2+(aq)', [['Ba2+(aq)', -1], ['Ba(s)', 1]], 2, -2.912, OSX_L],
  ['Al3+(aq)', [['Al3+(aq)', -1], ['Al(s)', 1]], 3, -1.662, OSX_L],
  ['Ga3+(aq)', [['Ga3+(aq)', -1], ['Ga(s)', 1]], 3, -0.549, OSX_L],
  ['In3+(aq)', [['In3+(aq)', -1], ['In(s)', 1]], 3, -0.3382, OSX_L],
  ['Tl+(aq)', [['Tl+(aq)', -1], ['Tl(s)', 1]], 1, -0.336, CRC92],
  ['Mn2+(aq)', [['Mn2+(aq)', -1], ['Mn(s)', 1]], 2, -1.185, OSX_L],
  ['MnO4-(aq)', [['MnO4-(aq)', -1], ['H+(aq)', -8], ['Mn2+(aq)', 1], ['H2O(l)', 4]], 5, 1.507, OSX_L],
  ['Fe2+(aq)', [['Fe2+(aq)', -1], ['Fe(s)', 1]], 2, -0.447, OSX_L],
  ['Fe3+(aq)', [['Fe3+(aq)', -1], ['Fe2+(aq)', 1]], 1, 0.771, OSX_L],
  ['Co2+(aq)', [['Co2+(aq)', -1], ['Co(s)', 1]], 2, -0.28, OSX_L],
  ['Ni2+(aq)', [['Ni2+(aq)', -1], ['Ni(s)', 1]], 2, -0.257, OSX_L],
  ['Zn2+(aq)', [['Zn2+(aq)', -1], ['Zn(s)', 1]], 2, -0.7618, OSX_L],
  ['Cd2+(aq)', [['Cd2+(aq)', -1], ['Cd(s)', 1]], 2, -0.403, OSX_L],
  ['Hg2^2+(aq)', [['Hg2^2+(aq)', -1], ['Hg(l)', 2]], 2, 0.7973, OSX_L],
  ['Hg2+(aq)', [['Hg2+(aq)', -1], ['Hg(l)', 1]], 2, 0.851, OSX_L],
  ['Ag+(aq)', [['Ag+(aq)', -1], ['Ag(s)', 1]], 1, 0.7996, OSX_L],
  ['Sn2+(aq)', [['Sn2+(aq)', -1], ['Sn(s)', 1]], 2, -0.1375, OSX_L],
  ['Sn4+(aq)', [['Sn4+(aq)', -1], ['Sn2+(aq)', 1]], 2, 0.151, OSX_L],
  ['Pb2+(aq)', [['Pb2+(aq)', -1], ['Pb(s)', 1]], 2, -0.1262, OSX_L],
  ['PbSO4(s)', [['PbSO4(s)', -1], ['Pb(s)', 1], ['SO4^2-(aq)', 1]], 2, -0.3505, OSX_L],
  ['PbO2(s)', [['PbO2(s)', -1], ['SO4^2-(aq)', -1], ['H+(aq)', -4], ['PbSO4(s)', 1], ['H2O(l)', 2]], 2, 1.69, OSX_L],
  ['AgCl(s)', [['AgCl(s)', -1], ['Ag(s)', 1], ['Cl-(aq)', 1]], 1, 0.22234, BB],
  ['AgBr(s)', [['AgBr(s)', -1], ['Ag(s)', 1], ['Br-(aq)', 1]], 1, 0.07133, CRC92_SEEN],
];

const PHASE_SUFFIXES = ['(aq)', '(s)', '(l)', '(g)'];

/** A species text without its phase suffix: `MnO4-(aq)` → `MnO4-`. */
function withoutPhase(sp: string): string {
  for (const p of PHASE_SUFFIXES) if (sp.endsWith(p)) return sp.slice(0, sp.length - p.length);
  return sp;
}

/** A side of a measured half-reaction as written in its source text: `8 H+ + MnO4-`. */
function sideText(terms: readonly (readonly [string, number])[], sign: 1 | -1): string {
  let text = '';
  for (const [sp, nu] of terms) {
    const v = sign * nu;
    if (v <= 0) continue;
    text += `${text === '' ? '' : ' + '}${v === 1 ? '' : `${v} `}${withoutPhase(sp)}`;
  }
  return text;
}

function applyMeasured(records: readonly SpeciesThermoRecord[]): SpeciesThermoRecord[] {
  const out = records.slice();
  const index = new Map<string, number>();
  for (let i = 0; i < out.length; i++) index.set(out[i]!.species, i);
  const g = (sp: string): number => {
    const i = index.get(sp);
    if (i === undefined) throw new Error(`species data: ${sp} is missing`);
    return out[i]!.dfGkJ;
  };
  for (const [target, terms, n, e0, source] of measured()) {
    let rest = 0;
    let nuT = 0;
    for (const [sp, nu] of terms) {
      if (sp === target) nuT += nu;
      else rest += nu * g(sp);
    }
    // Σν·ΔfG° = −nFE°
    const dfG = (-n * F * e0 - rest) / nuT;
    const i = index.get(target)!;
    const prior = out[i]!;
    const shift = dfG - prior.dfGkJ;
    const text = sideText(terms, -1);
    const prod = sideText(terms, 1);
    out[i] = {
      ...prior,
      dfGkJ: dfG,
      ...(prior.dfHkJ === undefined ? {} : { dfHkJ: prior.dfHkJ + shift }),
      source: `ΔfG° from the measured E°(${text} + ${n} e- -> ${prod}) = ${e0} V (${source}); ΔfH° moved with it, S°${prior.cpJK === undefined ? '' : ' and Cp°'} from the ${prior.source}`,
    };
  }
  return out;
}

let standard: readonly SpeciesThermoRecord[] | null = null;

/**
 * Every species of the potentials table with its standard data (see the module comment),
 * built on the first call (about 200 records: not at load, where most workbooks' first
 * calls never need them) and the same array after it.
 *
 * @example
 * standardSpecies().find((r) => r.species === 'Cu2+(aq)')?.dfGkJ // 65.49
 */
export function standardSpecies(): readonly SpeciesThermoRecord[] {
  return (standard ??= applyMeasured(tabulated()));
}
