/** Reference-electrode scales (docs/functions/VSREF.md). */
import { convertPotentialV } from '../../engine';
import { TEMP_C } from '../spec/params';
import type { FunctionSpec } from '../spec/types';

/** What every References function shares: its family, and one result row per case (unless it says otherwise). */
const REFERENCES = { family: 'References', result: { kind: 'perCase' } } as const;

const VSREF: FunctionSpec = {
  id: 'VSREF',
  ...REFERENCES,
  summary:
    'A potential converted from one reference-electrode scale to another (SHE, SCE, Ag/AgCl in several KCl strengths, saturated Cu/CuSO4, Hg/Hg2SO4, Hg/HgO, RHE).',
  returns: 'The potential in V vs to_ref, one row per case',
  params: [
    { name: 'potential', kind: 'potential', description: 'The potential in V vs from_ref; one cell or a column of cases' },
    { name: 'from_ref', kind: 'reference', description: 'The reference it was measured against, e.g. "SCE"' },
    { name: 'to_ref', kind: 'reference', description: 'The reference to express it against, e.g. "SHE"' },
    { name: 'pH', kind: 'pH', optional: true, defaultText: 'none (needed for RHE)', description: 'pH of the solution, for RHE' },
    TEMP_C,
  ],
  examples: [
    {
      args: [0, 'SCE', 'SHE'],
      expected: 0.2412,
      tolerance: 1e-4,
      source: 'saturated calomel electrode +0.2412 V vs SHE at 25 °C, Int. J. Corrosion 2010, art. 756950, Table 2',
    },
  ],
  perCase: (a) =>
    convertPotentialV(a.potentialV('potential'), a.text('from_ref'), a.text('to_ref'), a.tempC(), a.optNum('pH')),
};

/** The reference-scale family. */
export const REFERENCE_SPECS: readonly FunctionSpec[] = [VSREF];
