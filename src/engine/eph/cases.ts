/**
 * E–pH work over columns of cases: the stable species (or its class) per case, and the
 * diagram's lines as rows for an XY chart. The planes are built once per (element, activity,
 * temperature); each case is then a minimum over a few dot products.
 */
import { EngineError, isEngineError } from '../errors';
import {
  checkEphPH,
  checkEphPotential,
  defaultEphWindow,
  defaultSpeciesGibbs,
  ephDiagram,
  ephPlanes,
  EPH_LIMITS,
  findEphElement,
  stableIndex,
  type EphClass,
  type EphPlanes,
  type SpeciesGibbs,
} from './diagram';

/** What a case returns: the species text, or its class (immunity, corrosion, passivation). */
export type EphMode = 'species' | 'class';

/** One value per case, or one value for every case. */
export type CaseColumn = number | readonly number[];

function columnLength(name: string, c: CaseColumn): number {
  return typeof c === 'number' ? 1 : c.length;
}

function at(c: CaseColumn, k: number): number {
  return typeof c === 'number' ? c : c.length === 1 ? (c[0] as number) : (c[k] as number);
}

/**
 * The stable species (mode `species`, default) or its class (mode `class`) of an element at
 * each case. `potentialV`, `pH`, `activity` and `tempC` are each one value or a column; the
 * columns' lengths must agree (or be 1). A bad case gives an EngineError in its own slot; the
 * other cases still compute.
 *
 * Domain: E within ±10 V vs SHE, pH −2…16, activity (0, 1] (default 1e-6), temp_C 0–100.
 * Speed: about 0.1 µs per case for a fixed activity and temperature (planes cached).
 *
 * @throws EngineError (`notFound` unknown element; `shape` columns of different lengths)
 * @example
 * predominantCases('Fe', [-1, 0.5], [7, 7]) // ['Fe(s)', 'Fe2O3(s)']
 * predominantCases('Fe', [-1, 0.5], 7, 1e-6, 25, 'class') // ['immunity', 'passivation']
 */
export function predominantCases(
  element: string,
  potentialV: CaseColumn,
  pH: CaseColumn,
  activity: CaseColumn = EPH_LIMITS.defaultActivity,
  tempC: CaseColumn = 25,
  mode: EphMode = 'species',
  gibbs: SpeciesGibbs = defaultSpeciesGibbs,
): (string | EngineError)[] {
  findEphElement(element);
  const cols: [string, CaseColumn][] = [
    ['E_V', potentialV],
    ['pH', pH],
    ['activity', activity],
    ['temp_C', tempC],
  ];
  let n = 1;
  for (const [name, c] of cols) {
    const len = columnLength(name, c);
    if (len === 0)
      throw new EngineError('shape', `${name} is empty: give a value or a column of cases.`, name);
    if (len !== 1) {
      if (n !== 1 && len !== n) {
        const other = cols.find(([, o]) => columnLength('', o) === n)?.[0] ?? 'another argument';
        throw new EngineError(
          'shape',
          `${name} has ${len} cases but ${other} has ${n}: give columns of one length, or single values.`,
          name,
        );
      }
      n = len;
    }
  }
  const out: (string | EngineError)[] = new Array<string | EngineError>(n);
  let planes: EphPlanes | null = null;
  let planesKey = NaN;
  let planesT = NaN;
  for (let k = 0; k < n; k++) {
    try {
      const a = at(activity, k);
      const t = at(tempC, k);
      if (planes === null || a !== planesKey || t !== planesT) {
        planes = ephPlanes(element, a, t, gibbs);
        planesKey = a;
        planesT = t;
      }
      const e = checkEphPotential(at(potentialV, k));
      const p = checkEphPH(at(pH, k));
      const q = planes.planes[stableIndex(planes, p, e)];
      if (!q) throw new EngineError('argument', 'no species', 'element');
      out[k] = mode === 'class' ? q.cls : q.species;
    } catch (err) {
      if (!isEngineError(err)) throw err;
      out[k] = err;
      planes = null;
    }
  }
  return out;
}

/**
 * The class of one species of an element's set: immunity (the metal), corrosion (a dissolved
 * species) or passivation (a solid oxide or hydroxide).
 *
 * @throws EngineError (`notFound`) for an element without a diagram or a species not in its set
 * @example
 * classifySpecies('Fe', 'Fe2O3(s)') // 'passivation'
 */
export function classifySpecies(element: string, species: string): EphClass {
  const p = ephPlanes(element);
  const q = p.planes.find((x) => x.species === species);
  if (!q) {
    throw new EngineError(
      'notFound',
      `${species} is not in the E–pH species set of ${p.element.symbol}: ${p.element.species.join(', ')}.`,
      'species',
    );
  }
  return q.cls;
}

/** The header of {@link ephLineRows}. */
export const EPH_LINE_HEADER = [
  'species A',
  'species B',
  'pH1',
  'E1 (V vs SHE)',
  'pH2',
  'E2 (V vs SHE)',
] as const;

/** One row of the lines table. */
export type EphLineRow = readonly [string, string, number, number, number, number];

/**
 * The diagram's boundary segments as rows (species A, species B, pH1, E1, pH2, E2; E in V vs
 * SHE), then the two water-stability lines (H+ | H2(g) and O2(g) | H2O(l)) across the pH range:
 * ready for an XY chart (one series per row). The potential window is the element's default
 * ({@link defaultEphWindow}).
 *
 * Domain: activity (0, 1] (default 1e-6); temp_C 0–100; pH_min < pH_max within −2…16
 * (default 0–14).
 *
 * @example
 * ephLineRows('Cu')[0] // ['Cu(s)', 'Cu2O(s)', 5.246…, 0.1619…, 14, −0.356…]
 */
export function ephLineRows(
  element: string,
  activity: number = EPH_LIMITS.defaultActivity,
  tempC = 25,
  pHMin = 0,
  pHMax = 14,
  gibbs: SpeciesGibbs = defaultSpeciesGibbs,
): EphLineRow[] {
  const d = ephDiagram(element, activity, tempC, defaultEphWindow(element, pHMin, pHMax), gibbs);
  const rows: EphLineRow[] = d.boundaries.map((b) => [
    b.speciesA,
    b.speciesB,
    b.from.pH,
    b.from.E,
    b.to.pH,
    b.to.E,
  ]);
  for (const w of d.waterLines) {
    const [ox, red] = w.name === 'hydrogen' ? ['H+', 'H2(g)'] : ['O2(g)', 'H2O(l)'];
    rows.push([ox, red, w.from.pH, w.from.E, w.to.pH, w.to.E]);
  }
  return rows;
}
