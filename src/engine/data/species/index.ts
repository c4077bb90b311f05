/**
 * The species data layer: one registry of standard thermodynamic data (ΔfG°, ΔfH°, S°,
 * Cp° at 298.15 K and 1 bar) for every species the engine knows, merged from the
 * potentials-table species (./standard.ts) and the E–pH species (./ephSpecies.ts).
 *
 * Lookup is by the notation's species identity with its effective phase
 * (`speciesPhaseKey`: formula, charge, phase), so "Br2(l)" and "Br2(aq)" are different
 * species and "Fe3+" finds "Fe3+(aq)".
 *
 * Electrons follow the SHE convention: ΔfG° = ΔfH° = 0, S°(e-) = ½·S°(H2, g) and
 * Cp°(e-) = ½·Cp°(H2, g) (with S° and Cp° of H+(aq) zero), so that every thermodynamic
 * quantity of 2 H+ + 2 e- -> H2(g) is zero at every temperature and E° = −ΔrG°/(nF) of a
 * half-reaction is on the SHE scale.
 */
import { EngineError, quote } from '../../errors';
import { type Species, parseSpecies, speciesPhaseKey, formatSpecies, phaseOf } from '../../notation/species';
import type { SpeciesThermoRecord } from './types';
import { standardSpecies } from './standard';
import { EPH_SPECIES } from './ephSpecies';
import { storedSpecies, storedSpeciesKeys } from '../storedParseReader';

export type { SpeciesThermoRecord } from './types';
export { standardSpecies } from './standard';

/** A record with the species parsed, as the registry holds it. */
export interface RegisteredSpecies {
  readonly record: SpeciesThermoRecord;
  readonly species: Species;
  /** the lookup key (formula|charge|phase) */
  readonly key: string;
  /** which list the record came from */
  readonly list: 'standard' | 'eph';
}

/** Two records for one species: reported by the data tests, the first one wins in lookups. */
export interface DuplicateSpecies {
  readonly key: string;
  readonly kept: RegisteredSpecies;
  readonly dropped: RegisteredSpecies;
}

function register(
  records: readonly SpeciesThermoRecord[],
  list: 'standard' | 'eph',
  into: Map<string, RegisteredSpecies>,
  dups: DuplicateSpecies[],
): void {
  const stored = storedSpecies(
    list,
    records.map((r) => r.species),
  );
  for (let i = 0; i < records.length; i++) {
    const record = records[i]!;
    let species = stored?.[i];
    if (!species) {
      const parsed = parseSpecies(record.species, 'species');
      species = { ...parsed, phase: phaseOf(parsed) };
    }
    const key = speciesPhaseKey(species);
    const entry: RegisteredSpecies = { record, species, key, list };
    const prior = into.get(key);
    if (prior) dups.push({ key, kept: prior, dropped: entry });
    else into.set(key, entry);
  }
}

let registry: { byKey: Map<string, RegisteredSpecies>; duplicates: DuplicateSpecies[] } | null = null;

function built(): { byKey: Map<string, RegisteredSpecies>; duplicates: DuplicateSpecies[] } {
  if (!registry) {
    const byKey = new Map<string, RegisteredSpecies>();
    const duplicates: DuplicateSpecies[] = [];
    register(standardSpecies(), 'standard', byKey, duplicates);
    register(EPH_SPECIES, 'eph', byKey, duplicates);
    registry = { byKey, duplicates };
  }
  return registry;
}

let recordIndex: Map<string, SpeciesThermoRecord> | null = null;

/**
 * The records by key, the first record of a key winning (as in the registry): from the stored
 * keys where they are fresh, without building the registry's species; else from the registry.
 */
function recordsByKey(): Map<string, SpeciesThermoRecord> {
  if (!recordIndex) {
    const standard = storedSpeciesKeys(
      'standard',
      standardSpecies().map((r) => r.species),
    );
    const eph = standard && storedSpeciesKeys('eph', EPH_SPECIES.map((r) => r.species));
    const index = new Map<string, SpeciesThermoRecord>();
    if (standard && eph) {
      const add = (records: readonly SpeciesThermoRecord[], keys: readonly string[]) => {
        for (let i = 0; i < records.length; i++) if (!index.has(keys[i]!)) index.set(keys[i]!, records[i]!);
      };
      add(standardSpecies(), standard);
      add(EPH_SPECIES, eph);
    } else for (const [key, entry] of built().byKey) index.set(key, entry.record);
    recordIndex = index;
  }
  return recordIndex;
}

/** S° of H2(g) in J/(mol·K), from the registry (the electron convention depends on it). */
function hydrogenGas(): SpeciesThermoRecord {
  const h2 = recordsByKey().get('H2|0|g');
  if (!h2) throw new Error('species data: H2(g) is missing');
  return h2;
}

/**
 * The electron's thermodynamic record by the SHE convention (see the module comment).
 *
 * @example
 * electronThermo().sJK // 65.342 (½·S°(H2, g))
 */
export function electronThermo(): SpeciesThermoRecord {
  const h2 = hydrogenGas();
  return {
    species: 'e-',
    dfGkJ: 0,
    dfHkJ: 0,
    sJK: (h2.sJK ?? 0) / 2,
    cpJK: (h2.cpJK ?? 0) / 2,
    source: `SHE convention: ΔfG° = ΔfH° = 0, S° and Cp° half those of H2(g) (${h2.source})`,
  };
}

/**
 * The data record of a parsed species (phase completed as the notation infers it), or
 * null where the data layer has none. Electrons give {@link electronThermo}.
 *
 * @example
 * speciesRecord(parseSpecies('Cu2+'))?.dfGkJ // 65.49
 */
export function speciesRecord(s: Species): SpeciesThermoRecord | null {
  if (s.isElectron) return electronThermo();
  const key = speciesPhaseKey(s);
  return recordsByKey().get(key) ?? null;
}

/**
 * The data record of a species written as text ("Fe3+", "H2O(l)", "PbSO4(s)").
 *
 * @throws EngineError `parse` for text that is not a species; `notFound` where the data
 *   layer has no record (the message names the nearest spellings that exist)
 * @example
 * findSpeciesRecord('H2O').dfHkJ // −285.83
 */
export function findSpeciesRecord(text: string, argName = 'species'): SpeciesThermoRecord {
  const t = typeof text === 'string' ? text.trim() : '';
  if (t === '') throw new EngineError('parse', `${argName} is empty: give a species such as "Cu2+" or "H2O(l)".`, argName);
  if (/^e-?$/.test(t)) return electronThermo();
  const s = parseSpecies(t, argName);
  const rec = speciesRecord(s);
  if (rec) return rec;
  const same = listSpecies().filter((r) => r.species.formula === s.formula && r.species.charge === s.charge);
  const hint =
    same.length > 0
      ? ` It has ${same.map((r) => quote(formatSpecies(r.species))).join(', ')}: write the phase.`
      : ' Use a species of the potentials table, or give the reaction’s E° in your own table.';
  throw new EngineError('notFound', `There is no formation data for ${quote(t)}.${hint}`, argName);
}

/** Every registered species, standard list first. */
export function listSpecies(): readonly RegisteredSpecies[] {
  return Array.from(built().byKey.values());
}

/** Records given twice (same species and phase in both lists, or twice in one list). */
export function duplicateSpecies(): readonly DuplicateSpecies[] {
  return built().duplicates;
}
