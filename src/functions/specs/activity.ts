/**
 * Activity corrections: single-ion activity coefficients, activities of a composition, and
 * ionic strength (docs/functions/). The models' validity ranges are data in the engine.
 */
import {
  EngineError,
  activities as engineActivities,
  ionActivityCoefficient,
  ionicStrength as engineIonicStrength,
  parseActivityModel,
  splitSpeciesHeader,
  type ActivityModel,
} from '../../engine';
import { IONIC_STRENGTH, MODEL, MOLALITIES, SPECIES_HEADER, TEMP_C } from '../spec/params';
import type { CallArgs, FunctionSpec, ParamSpec } from '../spec/types';

const MODEL_PARAM = {
  ...MODEL,
  parseChoice: parseActivityModel,
  choices: ['limiting', 'extended', 'davies', 'pitzer'],
  description:
    'Activity model: "limiting" (Debye–Hückel limiting law, I ≤ 0.005 mol/kg), "extended" (with ion size, I ≤ 0.1 mol/kg), "davies" (I ≤ 0.5 mol/kg) or "pitzer" (ACTIVITY only: the whole composition, concentrated and mixed electrolytes)',
};

/** The explicit permission to return a result outside the model's range of validity (shared with specs/solutions.ts). */
export const EXTRAPOLATE: ParamSpec = {
  name: 'extrapolate',
  kind: 'flag',
  optional: true,
  default: false,
  description:
    'TRUE to accept a result outside the model’s range of validity (ionic strength, molality or temperature); by default such a case is #VALUE! naming the range and a better model',
};
const DH = 'Debye–Hückel A = 0.509 (kg/mol)^½ at 25 °C (common practice)';

/**
 * Headers for the activity engine: a side-qualified pH (`left:pH`) is a pH column like any
 * other there (it adds nothing to the ionic strength), so it goes over as `pH`.
 */
function activityHeaders(call: CallArgs): string[] {
  const headers = call.headers();
  if (headers.length === 0)
    throw new EngineError(
      'argument',
      'species and values are needed: name each species and give its concentration in mol/kg.',
      'species',
    );
  return headers.map((h) => (splitSpeciesHeader(h).isPH ? 'pH' : h));
}

const ACTCOEF: FunctionSpec = {
  id: 'ACTCOEF',
  family: 'Activity',
  summary:
    'Activity coefficient of one ion at an ionic strength, by the Debye–Hückel limiting law, the extended Debye–Hückel equation or the Davies equation.',
  returns: 'γ (dimensionless), one row per case',
  params: [
    {
      name: 'species',
      kind: 'species',
      description: 'The ion, e.g. "Cu2+" or "SO4 2-"; one cell or a column of cases',
      noun: 'an ion such as "Cu2+"',
    },
    IONIC_STRENGTH,
    MODEL_PARAM,
    {
      name: 'ion_size',
      kind: 'ionSize',
      optional: true,
      defaultText: "Kielland's value for the ion",
      description: 'Ion-size parameter å in Å, for the extended model',
    },
    TEMP_C,
    EXTRAPOLATE,
  ],
  result: { kind: 'perCase' },
  examples: [
    {
      args: ['Ca2+', 0.001, 'limiting'],
      expected: 0.86236,
      tolerance: 1e-3,
      source: `${DH}: log10 γ = −A z² √I`,
    },
  ],
  perCase: (a) => {
    const ion = a.text('species');
    const I = a.num('ionic_strength');
    const m = a.choice<ActivityModel>('model');
    const size = a.cell('ion_size') === 0 ? null : a.optNum('ion_size');
    return ionActivityCoefficient(ion, I, m, a.num('temp_C'), size, { extrapolate: a.flag('extrapolate') });
  },
};

const ACTIVITY: FunctionSpec = {
  id: 'ACTIVITY',
  family: 'Activity',
  summary:
    'Activities of the species of a composition (same shape as values), with the ionic strength of each row unless one is given.',
  returns: 'Activities, one row per case and one column per species',
  params: [
    SPECIES_HEADER,
    MOLALITIES,
    {
      ...IONIC_STRENGTH,
      optional: true,
      defaultText: 'from the row',
      description: 'Ionic strength in mol/kg; one cell or a column of cases',
    },
    { ...MODEL_PARAM, perCase: false },
    TEMP_C,
    EXTRAPOLATE,
  ],
  result: { kind: 'perCase', widthFrom: 'species' },
  examples: [
    {
      args: [[['Na+', 'Cl-']], [[0.004, 0.004]], null, 'limiting'],
      expected: 0.0037142,
      tolerance: 2e-6,
      source: `${DH}: 0.004·10^(−A·√0.004), first cell (Na+)`,
    },
  ],
  perCase: (a, call) => {
    const headers = activityHeaders(call);
    return engineActivities(
      headers,
      a.numbers(),
      a.choice<ActivityModel>('model'),
      a.optNum('ionic_strength'),
      a.num('temp_C'),
      {
        extrapolate: a.flag('extrapolate'),
      },
    );
  },
};

const IONICSTR: FunctionSpec = {
  id: 'IONICSTR',
  family: 'Activity',
  summary: 'Ionic strength I = ½ Σ mᵢ zᵢ² of each row of a composition, in mol/kg.',
  returns: 'I in mol/kg, one row per case',
  params: [SPECIES_HEADER, MOLALITIES],
  result: { kind: 'perCase' },
  examples: [
    {
      args: [[['Na+', 'SO4 2-']], [[0.02, 0.01]]],
      expected: 0.03,
      tolerance: 1e-15,
      source: 'derived by hand: ½(0.02·1² + 0.01·2²)',
    },
  ],
  perCase: (a, call) => engineIonicStrength(activityHeaders(call), a.numbers()),
};

/** The activity family, in docs order. */
export const ACTIVITY_SPECS: readonly FunctionSpec[] = [ACTCOEF, ACTIVITY, IONICSTR];
