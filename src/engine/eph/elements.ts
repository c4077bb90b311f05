/**
 * The species set of each element's E–pH diagram: which metal, ions, oxides, hydroxides,
 * oxyanions and hydroxo complexes compete for predominance, and why these.
 *
 * Every species named here has a record in the species data layer's registry
 * (src/engine/data/species/: the standard list, or EPH_SPECIES for the E–pH-only species)
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
  /** Which solids were chosen and which species never predominate (DEVELOPERS.md, "E–pH diagrams", has the reasons). */
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
      note: 'Fe3O4 and Fe2O3 as the solids; Fe(OH)2, Fe(OH)3 and FeOH2+ never predominate at 1e-6.',
    },
    {
      symbol: 'Cu',
      name: 'copper',
      species: ['Cu(s)', 'Cu+', 'Cu2+', 'Cu2O(s)', 'CuO(s)', 'HCuO2-', 'CuO2 2-'],
      note: 'Cu2O and CuO as the solids; Cu+ has no region at 1e-6 (a narrow one at 1e-7).',
    },
    {
      symbol: 'Zn',
      name: 'zinc',
      species: ['Zn(s)', 'Zn2+', 'ZnO(s)', 'HZnO2-', 'ZnO2 2-'],
      note: 'ZnO as the solid (the Atlas draws ε-Zn(OH)2).',
    },
    {
      symbol: 'Al',
      name: 'aluminium',
      species: ['Al(s)', 'Al3+', 'Al2O3(s)', 'AlO2-'],
      note: 'Corundum as the solid (the Atlas draws the more stable hydrargillite).',
    },
    {
      symbol: 'Ni',
      name: 'nickel',
      species: ['Ni(s)', 'Ni2+', 'Ni(OH)2(s)', 'HNiO2-', 'Ni3O4(s)', 'Ni2O3(s)', 'NiO2(s)'],
      note: 'Ni(OH)2; Ni3O4 and Ni2O3 from the Atlas; NiO2 from E°(NiO2/Ni(OH)2).',
    },
    {
      symbol: 'Cr',
      name: 'chromium',
      species: ['Cr(s)', 'Cr2+', 'Cr3+', 'Cr2O3(s)', 'CrO2-', 'HCrO4-', 'CrO4 2-'],
      note: 'Cr2O3 as the solid; dichromate (a dimer) left out; CrO2- from the Atlas.',
    },
    {
      symbol: 'Pb',
      name: 'lead',
      species: ['Pb(s)', 'Pb2+', 'PbO(s)', 'Pb3O4(s)', 'PbO2(s)', 'HPbO2-'],
      note: 'Yellow PbO, Pb3O4 and PbO2 as the solids; PbO has no region at 1e-6.',
    },
    {
      symbol: 'Sn',
      name: 'tin',
      species: ['Sn(s)', 'Sn2+', 'Sn4+', 'SnO(s)', 'SnO2(s)', 'HSnO2-', 'SnO3 2-'],
      note: 'White tin, SnO and SnO2; SnO and Sn4+ never predominate; SnO3 2- from the Atlas.',
    },
    {
      symbol: 'Mg',
      name: 'magnesium',
      species: ['Mg(s)', 'Mg2+', 'MgO(s)', 'Mg(OH)2(s)'],
      note: 'Brucite as the solid; MgO never predominates in water.',
    },
    {
      symbol: 'Ag',
      name: 'silver',
      species: ['Ag(s)', 'Ag+', 'Ag2O(s)', 'AgO(s)', 'Ag(OH)2-'],
      note: 'Ag2O and AgO (Atlas) as the solids; Ag2O has no region at 1e-6.',
    },
  ].map((e) =>
    Object.freeze({
      ...e,
      eMinV: e.symbol === 'Mg' || e.symbol === 'Al' ? -3 : -2,
      species: Object.freeze([...e.species]),
    }),
  ),
);
