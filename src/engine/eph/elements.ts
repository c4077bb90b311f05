/**
 * The species set of each element's E–pH diagram: which metal, ions, oxides, hydroxides,
 * oxyanions and hydroxo complexes compete for predominance, and why these.
 *
 * Every species named here has a record in EPH_SPECIES (src/engine/data/species/ephSpecies.ts)
 * with its source; a test checks that each one contains the element and only H and O besides.
 */

/** One element's diagram definition. Frozen. */
export interface EphElement {
  /** The element symbol, e.g. "Fe". */
  readonly symbol: string;
  /** English name, for titles. */
  readonly name: string;
  /** The species (record texts of the data layer) that compete, the metal first. */
  readonly species: readonly string[];
  /** Why this set, which solids were chosen, and where it departs from the 1966 Atlas. */
  readonly note: string;
  /** The default plotting window's lowest potential, V vs SHE (below the metal's immunity line). */
  readonly eMinV: number;
}

export const EPH_ELEMENTS: readonly EphElement[] = Object.freeze(
  [
    {
      symbol: 'Fe',
      name: 'iron',
      species: [
        'Fe(s)',
        'Fe2+',
        'Fe3+',
        'FeOH 2+',
        'HFeO2-',
        'Fe(OH)2(s)',
        'Fe(OH)3(s)',
        'Fe3O4(s)',
        'Fe2O3(s)',
      ],
      note:
        'Anhydrous solids Fe3O4 and Fe2O3 (Pourbaix 1966, Fig. 4 convention); Fe(OH)2 and Fe(OH)3 are ' +
        'in the set but are metastable (Fe(OH)2 disproportionates to Fe + Fe3O4; Fe(OH)3 lies above Fe2O3), ' +
        'so they never predominate. Fe2+ and Fe3+ from the measured E° of their couples.',
    },
    {
      symbol: 'Cu',
      name: 'copper',
      species: ['Cu(s)', 'Cu+', 'Cu2+', 'Cu2O(s)', 'CuO(s)', 'HCuO2-', 'CuO2 2-'],
      note:
        'Cu2O and CuO (tenorite) as the solids; at 1e-6 Cu+ disproportionates (by 0.2 kJ/mol) and has no region; ' +
        'at 1e-7 it has a narrow one.',
    },
    {
      symbol: 'Zn',
      name: 'zinc',
      species: ['Zn(s)', 'Zn2+', 'ZnO(s)', 'HZnO2-', 'ZnO2 2-'],
      note: 'ZnO as the solid (the Atlas draws ε-Zn(OH)2, of nearly the same stability).',
    },
    {
      symbol: 'Al',
      name: 'aluminium',
      species: ['Al(s)', 'Al3+', 'Al2O3(s)', 'AlO2-'],
      note:
        'Corundum Al2O3 as the solid (the Atlas draws hydrargillite Al2O3·3H2O, which is more stable, ' +
        'so its passive range is wider by about half a pH unit on each side).',
    },
    {
      symbol: 'Ni',
      name: 'nickel',
      species: ['Ni(s)', 'Ni2+', 'Ni(OH)2(s)', 'HNiO2-', 'Ni3O4(s)', 'Ni2O3(s)', 'NiO2(s)'],
      note: 'Ni(OH)2 as the Ni(II) solid; the higher oxides Ni3O4, Ni2O3, NiO2 with Atlas values (NBS gives none).',
    },
    {
      symbol: 'Cr',
      name: 'chromium',
      species: ['Cr(s)', 'Cr2+', 'Cr3+', 'Cr2O3(s)', 'CrO2-', 'HCrO4-', 'CrO4 2-'],
      note:
        'Anhydrous Cr2O3 as the solid; dichromate left out (a dimer: at 1e-6 it never predominates); ' +
        'Cr2+ and Cr3+ from the measured E° of Cr2+/Cr and Cr3+/Cr; CrO2- with an Atlas value.',
    },
    {
      symbol: 'Pb',
      name: 'lead',
      species: ['Pb(s)', 'Pb2+', 'PbO(s)', 'Pb3O4(s)', 'PbO2(s)', 'HPbO2-'],
      note: 'Red PbO, Pb3O4 and PbO2 as the solids; plumbate(IV) ions left out.',
    },
    {
      symbol: 'Sn',
      name: 'tin',
      species: ['Sn(s)', 'Sn2+', 'Sn4+', 'SnO(s)', 'SnO2(s)', 'HSnO2-', 'SnO3 2-'],
      note:
        'White tin, SnO and SnO2 (cassiterite); SnO disproportionates to Sn + SnO2 and Sn4+ is below 1e-6 over ' +
        'SnO2 at every pH ≥ 0, so neither predominates. SnO3 2- with an Atlas value.',
    },
    {
      symbol: 'Mg',
      name: 'magnesium',
      species: ['Mg(s)', 'Mg2+', 'MgO(s)', 'Mg(OH)2(s)'],
      note: 'Brucite Mg(OH)2 as the solid; MgO hydrates to it in water and never predominates.',
    },
    {
      symbol: 'Ag',
      name: 'silver',
      species: ['Ag(s)', 'Ag+', 'Ag2O(s)', 'AgO(s)', 'Ag(OH)2-'],
      note:
        'Ag2O and AgO as the solids (AgO with an Atlas value); Ag(OH)2- as the anion. At 1e-6 the ' +
        'solubility of Ag2O (minimum about 2e-6 near pH 12) exceeds the activity, so Ag2O has no region.',
    },
  ].map((e) =>
    Object.freeze({
      ...e,
      eMinV: e.symbol === 'Mg' || e.symbol === 'Al' ? -3 : -2,
      species: Object.freeze([...e.species]),
    }),
  ),
);
