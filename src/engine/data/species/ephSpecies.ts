import type { SpeciesThermoRecord } from './types';

/**
 * The species that E–pH (Pourbaix) diagrams need beyond those of the standard list
 * (./standard.ts): the oxides, hydroxides, oxyanions and hydroxo complexes of each element.
 * The metals, their ions, water and its ions, and the solids the potentials table also
 * uses (Fe(OH)2, Fe(OH)3, Cu2O, ZnO, ZnO2 2-, Ni(OH)2, NiO2, Cr2+, Cr3+, CrO4 2-, PbO,
 * PbO2, Mg(OH)2, Ag2O) are held once, in the standard list; the registry
 * (./index.ts) merges both, and the diagrams read the registry.
 *
 * Source set: the NBS tables of chemical thermodynamic properties (Wagman et al., J. Phys.
 * Chem. Ref. Data 11, Suppl. 2, 1982), recalled from memory, unless the record's source
 * names Pourbaix, Atlas of Electrochemical Equilibria in Aqueous Solutions (1966), also from
 * memory. Units: kJ/mol, J/(mol·K); 298.15 K, 1 bar.
 */
const NBS = 'NBS tables (Wagman et al. 1982), from memory';
const POURBAIX = 'Pourbaix, Atlas of Electrochemical Equilibria (1966), from memory';

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

export const EPH_SPECIES: readonly SpeciesThermoRecord[] = [
  // iron
  rec('FeOH 2+', -229.41, -290.8, -142),
  rec('HFeO2-', -377.7),
  rec('Fe3O4(s)', -1015.4, -1118.4, 146.4, 143.43),
  rec('Fe2O3(s)', -742.2, -824.2, 87.4, 103.85),

  // copper
  rec('CuO(s)', -129.7, -157.3, 42.63, 42.3),
  rec('HCuO2-', -258.5),
  rec('CuO2 2-', -183.6),

  // zinc
  rec('HZnO2-', -464.0),

  // aluminium
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
  rec('HNiO2-', -349.2),
  rec('Ni3O4(s)', -711.9, u, u, u, POURBAIX),
  rec('Ni2O3(s)', -469.7, u, u, u, POURBAIX),

  // chromium
  rec('Cr2O3(s)', -1058.1, -1139.7, 81.2, 118.74),
  rec('CrO2-', -535.9, u, u, u, POURBAIX),
  rec('HCrO4-', -764.7, -878.2, 184.1),

  // lead
  rec('Pb3O4(s)', -601.2, -718.4, 211.3, 146.9),
  rec('HPbO2-', -338.9),

  // tin
  rec('SnO(s)', -256.9, -285.8, 56.5, 44.31),
  rec('SnO2(s)', -519.6, -580.7, 52.3, 52.59),
  rec('HSnO2-', -410.0),
  rec('SnO3 2-', -574.1, u, u, u, POURBAIX),

  // magnesium
  rec('MgO(s)', -569.43, -601.7, 26.94, 37.15),

  // silver
  rec('AgO(s)', 10.8, u, u, u, POURBAIX),
  rec('Ag(OH)2-', -260.2),
];
