/**
 * The one data source of the pane's function reference. Today it reads the functions.json
 * that the build generates from the custom functions' JSDoc (so the reference cannot drift
 * from what Excel registers) and adds each function's result unit; pointing the reference
 * at another description of the functions (a declarative spec with a registry) means
 * changing this module only: the page asks nothing but {@link loadReference}.
 */
import { type ReferenceEntry, referenceEntries } from './reference';
import { SPEC_RESULT_UNITS } from './resultUnits';

/** A reference entry with what the page shows and searches beyond the metadata. */
export interface ReferenceItem extends ReferenceEntry {
  /** The unit (or kind) of the result, e.g. "V vs SHE", "dimensionless", "text". */
  readonly unit: string;
  /** Lower-case text the search box matches against (name, description, arguments). */
  readonly searchText: string;
}

/** Where the metadata comes from, beside the page. */
export const REFERENCE_URL = 'functions.json';

/**
 * Result units by function id. functions.json carries no unit field, so every function gets
 * its spec's result description (src/taskpane/resultUnits.ts, generated with `npm run docs`,
 * so a new function never misses one); the wordings below, written for the pane, take
 * precedence where they exist. An id in neither shows "see the description".
 */
const PANE_UNITS: Readonly<Record<string, string>> = {
  POTENTIAL: 'V (vs SHE for a half-reaction or couple; EMF for a cell or reaction)',
  STDPOTENTIAL: 'V vs SHE (EMF for a cell)',
  QUOTIENT: 'dimensionless',
  LOGQ: 'dimensionless (log10 Q)',
  LOGK: 'dimensionless (log10 K)',
  EQCONST: 'dimensionless',
  GIBBS: 'kJ/mol',
  ELECTRONS: 'electrons (a whole number)',
  BALANCE: 'text (the balanced reaction)',
  NERNSTSLOPE: 'V per decade of activity',
  CONCCELL: 'V',
  VSREF: 'V vs the target reference electrode',
  ACTCOEF: 'dimensionless (γ)',
  ACTIVITY: 'dimensionless (a = γ·m with m in mol/kg)',
  IONICSTR: 'mol/kg',
  COMBINE: 'V vs SHE',
  SOURCE: 'text (the sources)',
  DIAGRAM: 'text (the cell diagram)',
  POTENTIALS: 'a table: half-reaction, E° in V vs SHE, dE°/dT in mV/K, source',
  CHECKTABLE: 'text (one line per problem row, or OK)',
  CELLNOTATION: 'text (the IUPAC cell diagram)',
  LISTTABLE: 'a table: half-reaction, E° in V vs SHE, dE°/dT in mV/K, source',
  PREDOMINANT: 'text (the stable species)',
  EPHCLASS: 'text: immunity, corrosion or passivation',
  EPHLINES: 'a table: species A, species B, pH1, E1 in V vs SHE, pH2, E2 in V vs SHE',
};

/** The unit of every function: the pane's wording, else the spec's result description. */
export const RESULT_UNITS: Readonly<Record<string, string>> = { ...SPEC_RESULT_UNITS, ...PANE_UNITS };

/** The result unit of a function id. */
export function resultUnit(id: string): string {
  return RESULT_UNITS[id.toUpperCase()] ?? 'see the description';
}

/** Reference items from parsed metadata (throws where it is not function metadata). */
export function referenceItems(json: unknown): ReferenceItem[] {
  return referenceEntries(json).map((e) => ({
    ...e,
    unit: resultUnit(e.id),
    searchText: [e.qualifiedName, e.description, ...e.params.map((p) => `${p.name} ${p.description}`)]
      .join(' ')
      .toLowerCase(),
  }));
}

/**
 * The items a search matches: every word of the query (case ignored) appears in the
 * item's name, description or arguments; an empty query matches all.
 *
 * @example
 * searchReference(items, 'slope') // [ECHEM.NERNSTSLOPE, …]
 */
export function searchReference<T extends Pick<ReferenceItem, 'searchText'>>(
  items: readonly T[],
  query: string,
): T[] {
  const words = query
    .toLowerCase()
    .split(/\s+/)
    .filter((w) => w !== '');
  return items.filter((i) => words.every((w) => i.searchText.includes(w)));
}

/**
 * Load the reference from the page's own origin.
 *
 * @throws Error saying why the list could not be loaded
 */
export async function loadReference(
  fetchImpl: (
    url: string,
    init: { credentials: 'same-origin' },
  ) => Promise<{
    ok: boolean;
    status: number;
    statusText: string;
    json(): Promise<unknown>;
  }> = (url, init) => fetch(url, init),
): Promise<ReferenceItem[]> {
  const response = await fetchImpl(REFERENCE_URL, { credentials: 'same-origin' });
  if (!response.ok)
    throw new Error(`${REFERENCE_URL} answered ${response.status} ${response.statusText}`.trim());
  return referenceItems(await response.json());
}
