/** E–pH (Pourbaix) diagrams: the stable species per case, its class, and the diagram's lines. */
import { EPH_ELEMENTS, EPH_LINE_HEADER, ephLineRows, predominantSpecies } from '../../engine';
import type { Result } from '../cellTypes';
import { TEMP_C } from '../spec/params';
import type { CaseArgs, FunctionSpec, ParamSpec } from '../spec/types';

const ELEMENT: ParamSpec = {
  name: 'element',
  kind: 'element',
  perCase: false,
  description: `The element: ${EPH_ELEMENTS.map((e) => e.symbol).join(', ')}`,
};

const E_V: ParamSpec = {
  name: 'E_V',
  kind: 'potential',
  description: 'Electrode potential in V vs SHE; one cell or a column of cases',
};

const PH: ParamSpec = {
  name: 'pH',
  kind: 'pH',
  description: 'pH of the solution; one cell or a column of cases',
};

const ACTIVITY: ParamSpec = {
  name: 'activity',
  kind: 'fraction',
  optional: true,
  default: 1e-6,
  description:
    'Activity of the dissolved species, 0 < a ≤ 1 (1e-6 as usual in corrosion work); one cell or a column of cases',
};

const NOTES = [
  'Thermodynamic estimate (species data: NBS 1982, measured E°, some Pourbaix 1966 values; solids and water at activity 1, 1 bar); kinetics and local chemistry decide; follow applicable standards. Species sets: DEVELOPERS.md, "E–pH diagrams".',
];

/** The species text or class of one case (the planes are cached per element, activity and T). */
function oneCase(mode: 'species' | 'class') {
  return (a: CaseArgs): string => {
    const r = predominantSpecies(
      a.text('element'),
      a.num('E_V'),
      a.num('pH'),
      a.num('activity'),
      a.num('temp_C'),
    );
    return mode === 'class' ? r.cls : r.species;
  };
}

/** What the two per-point functions share: one point (E, pH) of an element's diagram per case. */
const AT_A_POINT: Pick<FunctionSpec, 'family' | 'params' | 'result' | 'notes'> = {
  family: 'E–pH',
  params: [ELEMENT, E_V, PH, ACTIVITY, TEMP_C],
  result: { kind: 'perCase' },
  notes: NOTES,
};

const PREDOMINANT: FunctionSpec = {
  ...AT_A_POINT,
  id: 'PREDOMINANT',
  summary:
    'The thermodynamically stable species of an element at a potential and pH (E–pH / Pourbaix diagram).',
  returns: 'Species text, e.g. "Fe2O3(s)", one row per case',
  examples: [
    {
      args: ['Fe', -1, 7],
      expected: 'Fe(s)',
      source:
        'Pourbaix, Atlas of Electrochemical Equilibria (1966), iron diagram: immunity at −1 V, pH 7 (from memory)',
    },
    {
      args: ['Fe', 0.5, 10],
      expected: 'Fe2O3(s)',
      source: 'Pourbaix, Atlas (1966), iron diagram: Fe2O3 at +0.5 V, pH 10 (from memory)',
    },
  ],
  perCase: oneCase('species'),
};

const EPHCLASS: FunctionSpec = {
  ...AT_A_POINT,
  id: 'EPHCLASS',
  summary:
    'Immunity, corrosion or passivation: the class of the stable species of an element at a potential and pH.',
  returns:
    '"immunity" (the metal), "corrosion" (a dissolved species) or "passivation" (a solid oxide or hydroxide), one row per case',
  examples: [
    {
      args: ['Zn', -0.5, 4],
      expected: 'corrosion',
      source: 'Pourbaix, Atlas (1966), zinc diagram: Zn2+ at −0.5 V, pH 4 (from memory)',
    },
  ],
  perCase: oneCase('class'),
};

/** Rows of the lines table: header, boundaries, water lines. */
export const EPHLINES_MAX_ROWS = 24;

const EPHLINES: FunctionSpec = {
  id: 'EPHLINES',
  family: 'E–pH',
  summary:
    "An element's E–pH diagram as line segments (species A, species B, pH1, E1, pH2, E2) plus the two water lines, for an XY chart.",
  returns: 'Rows under a header: species A | species B | pH1 | E1 (V vs SHE) | pH2 | E2 (V vs SHE)',
  params: [
    ELEMENT,
    {
      ...ACTIVITY,
      perCase: false,
      description: 'Activity of the dissolved species, 0 < a ≤ 1 (default 1e-6)',
    },
    { ...TEMP_C, perCase: false, description: 'Temperature in °C, 0–100' },
    {
      name: 'pH_min',
      kind: 'pH',
      optional: true,
      default: 0,
      perCase: false,
      description: 'Lowest pH of the lines',
    },
    {
      name: 'pH_max',
      kind: 'pH',
      optional: true,
      default: 14,
      perCase: false,
      description: 'Highest pH of the lines',
    },
  ],
  result: { kind: 'list', rows: EPHLINES_MAX_ROWS, width: 6 },
  notes: NOTES,
  examples: [{ args: ['Zn'], expected: 'species A', source: 'the header row (first cell)' }],
  run: (call) => {
    const a = call.at(0);
    const rows = ephLineRows(
      a.text('element'),
      a.num('activity'),
      a.num('temp_C'),
      a.num('pH_min'),
      a.num('pH_max'),
    );
    const out: Result = [[...EPH_LINE_HEADER]];
    for (const r of rows) out.push([...r]);
    return out;
  },
};

/** The E–pH family, in docs order. */
export const EPH_SPECS: readonly FunctionSpec[] = [PREDOMINANT, EPHCLASS, EPHLINES];
