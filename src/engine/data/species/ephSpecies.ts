import type { SpeciesThermoRecord } from './types';

/**
 * Species that E–pH (Pourbaix) diagrams need beyond those of the potentials table:
 * oxides, hydroxides, oxyanions and hydroxo complexes.
 */
export const EPH_SPECIES: readonly SpeciesThermoRecord[] = [];
