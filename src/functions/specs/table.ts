/** The potentials table: provenance, listing and checking (docs/functions/). */
import {
  BUILTIN_POTENTIALS,
  compiledReaction,
  describeSource,
  filterPotentials,
  tableFor,
  tableCycleProblems,
} from '../../engine';
import type { Result } from '../cellTypes';
import { cellError } from '../errorCodes';
import { REACTION, TABLE } from '../spec/params';
import type { FunctionSpec } from '../spec/types';

/** What every Table function shares: its family, and one result row per case (unless it says otherwise). */
const TABLE_FAMILY = { family: 'Table', result: { kind: 'perCase' } } as const;

const SOURCE: FunctionSpec = {
  id: 'SOURCE',
  ...TABLE_FAMILY,
  params: [REACTION, TABLE],
  summary: 'Which table rows (built-in or yours) gave E°, with their sources and any derivation.',
  returns: 'Provenance text, one row per case',
  examples: [
    {
      args: ['Cu2+/Cu'],
      expected: 'OpenStax Chemistry 2e, Appendix L',
      source: 'the source named in the built-in row',
    },
  ],
  perCase: (a, call) => describeSource(compiledReaction(a.text('reaction'), call.table()).resolved),
};

const LISTTABLE: FunctionSpec = {
  id: 'LISTTABLE',
  family: 'Table',
  summary: 'The built-in potentials table (or the rows a filter picks), spilled with a header row.',
  returns: 'Rows: half-reaction | E° (V) | dE°/dT (mV/K) | source, under a header row',
  params: [
    {
      name: 'filter',
      kind: 'text',
      optional: true,
      perCase: false,
      defaultText: 'the whole table',
      description: 'An element symbol (Fe), a species (Cu2+) or any text',
      noun: 'text such as "Fe" or "Cu2+"',
    },
  ],
  result: { kind: 'fixed' },
  examples: [{ args: ['Cu'], expected: 'Half-reaction', source: 'the header row (first cell)' }],
  run: (call) => {
    const picked = filterPotentials(BUILTIN_POTENTIALS, call.at(0).optText('filter') ?? '');
    if (picked.rows.length === 0) {
      return [
        [
          cellError(
            '#N/A',
            `No built-in half-reaction matches ${picked.described}. Type an element symbol (Fe), a species (Cu2+), or leave the filter empty for the whole table.`,
          ),
        ],
      ];
    }
    const out: Result = [['Half-reaction', 'E° (V vs SHE, 25 °C)', 'dE°/dT (mV/K)', 'Source']];
    for (const r of picked.rows) out.push([r.halfReaction, r.e0V, r.dE0dTmVperK ?? '', r.source]);
    return out;
  },
};

const CHECKTABLE: FunctionSpec = {
  id: 'CHECKTABLE',
  family: 'Table',
  summary:
    'The problems in your potentials table (unbalanced rows, bad numbers, duplicates, thermodynamic cycles that disagree by more than 2 mV), one per row, or OK.',
  returns: 'OK, or one problem per row',
  params: [{ ...TABLE, optional: false, defaultText: undefined }],
  result: { kind: 'list', heightFrom: 'table' },
  examples: [
    {
      args: [[['Cu2+ + 2 e- -> Cu', 0.337]]],
      expected: 'OK',
      source: 'a balanced row with a number (by inspection)',
    },
  ],
  run: (call) => {
    const cells = call.table();
    if (!cells)
      return [
        [
          cellError(
            '#VALUE!',
            'table is empty: pass the range of your potentials table (half-reaction | E° | dE°/dT | source).',
          ),
        ],
      ];
    const t = tableFor(cells).table;
    // row problems, then thermodynamic cycles among the rows that disagree by more than 2 mV
    const problems = [...t.problems, ...tableCycleProblems(t)].sort((x, y) => x.row - y.row);
    if (problems.length === 0) return [['OK']];
    return problems.map((p) => [p.message]);
  },
};

/** The table family, in docs order. */
export const TABLE_SPECS: readonly FunctionSpec[] = [SOURCE, LISTTABLE, CHECKTABLE];
