/**
 * Concentrated and mixed electrolytes: mean activity coefficients of salts (Pitzer by
 * default), water activity, and molarity → molality (docs/functions/). The models' validity
 * ranges and parameter sources are data in the engine (DEVELOPERS.md, "Activity models").
 */
import {
  EngineError,
  meanActivityCoefficient,
  molalityFromMolarity,
  parseActivityModel,
  parseSalt,
  waterActivity,
  type ActivityModel,
} from '../../engine';
import { MOLALITIES, TEMP_C } from '../spec/params';
import type { ExampleSpec, FunctionSpec, ParamSpec } from '../spec/types';
import { EXTRAPOLATE } from './activity';

const PM73 = 'Pitzer & Mayorga 1973 parameters (from memory)';

/** An example whose result comes from Robinson & Stokes, Electrolyte Solutions, 2nd ed. (1959) (from memory). */
function robinsonStokes(
  args: ExampleSpec['args'],
  expected: number,
  tolerance: number,
  where: string,
  note?: string,
): ExampleSpec {
  const source = `Robinson & Stokes, Electrolyte Solutions (1959), ${where} (from memory)`;
  return note === undefined
    ? { args, expected, tolerance, source }
    : { args, expected, tolerance, source, note };
}

const SALT_MODEL: ParamSpec = {
  name: 'model',
  kind: 'choice',
  optional: true,
  default: 'pitzer',
  choices: ['pitzer', 'davies', 'extended', 'limiting'],
  parseChoice: (t) => (t === null || t.trim() === '' ? 'pitzer' : parseActivityModel(t)),
  description:
    'Activity model: "pitzer" (concentrated salts, to each salt’s published limit), "davies" (I ≤ 0.5 mol/kg), "extended" (I ≤ 0.1 mol/kg) or "limiting" (I ≤ 0.005 mol/kg)',
};

const MEANACTCOEF: FunctionSpec = {
  id: 'MEANACTCOEF',
  family: 'Solutions',
  summary:
    'Mean activity coefficient γ± of a salt at a molality, by the Pitzer model (default) or a Debye–Hückel-family model.',
  returns: 'γ± (dimensionless, molal scale), one row per case',
  params: [
    {
      name: 'salt',
      kind: 'salt',
      description: 'The salt, e.g. "NaCl", "CuSO4", "K2SO4"; one cell or a column of cases',
    },
    {
      name: 'molality',
      kind: 'molality',
      description: 'Molality of the salt in mol/kg; one cell or a column of cases',
    },
    SALT_MODEL,
    TEMP_C,
    EXTRAPOLATE,
  ],
  result: { kind: 'perCase' },
  examples: [
    robinsonStokes(['NaCl', 1], 0.657, 0.005, 'Appendix 8.10, NaCl 1 mol/kg'),
    robinsonStokes(
      ['CuSO4', 0.1],
      0.15,
      0.005,
      'Appendix 8.10, CuSO4 0.1 mol/kg',
      'A 2:2 salt, where the Davies equation gives 0.286.',
    ),
  ],
  notes: [
    `Pitzer: ${PM73} and 1974 (2:2 salts); HCl, LiCl, NaCl, KCl, NaOH, KOH, CaCl2, MgCl2, ZnCl2, NiCl2, CuCl2, Na2SO4, K2SO4, MgSO4, CuSO4, ZnSO4, NiSO4, CaSO4, each to its published molality limit; 25 °C (NaCl 0–50 °C).`,
    'Outside a model’s range the case is #VALUE! with the range and a better model named, unless extrapolate is TRUE.',
    'Results are thermodynamic estimates; plating-bath and battery decisions follow measurement, the applicable standards and licensed practice.',
  ],
  perCase: (a) =>
    meanActivityCoefficient(
      a.text('salt'),
      a.num('molality'),
      a.choice<ActivityModel>('model'),
      a.num('temp_C'),
      {
        extrapolate: a.flag('extrapolate'),
      },
    ),
};

/** True where a one-column header names a neutral salt (then values are its molality). */
function saltOf(headers: readonly string[]): string | null {
  if (headers.length !== 1) return null;
  try {
    return parseSalt(headers[0] as string).formula;
  } catch {
    return null;
  }
}

const WATERACTIVITY: FunctionSpec = {
  id: 'WATERACTIVITY',
  family: 'Solutions',
  summary:
    'Activity of water a(H2O) in a salt solution or a mixture, from the Pitzer osmotic coefficient: ln a_w = −φ·M_w·Σm.',
  returns: 'a(H2O) (dimensionless, pure water 1), one row per case',
  params: [
    {
      name: 'salt_or_species',
      kind: 'speciesHeader',
      description:
        'A salt such as "NaCl" (then values are its molality), or the ions of a mixture such as "Na+", "Mg2+", "Cl-"',
    },
    {
      ...MOLALITIES,
      name: 'molality_or_values',
      headerParam: 'salt_or_species',
      description:
        'Molality of the salt in mol/kg (one cell or a column of cases), or one molality per ion column, one row per case',
    },
    TEMP_C,
    EXTRAPOLATE,
  ],
  result: { kind: 'perCase' },
  examples: [
    robinsonStokes(
      ['NaCl', 1],
      0.96686,
      5e-4,
      'Appendix 8.3, φ = 0.9355 for NaCl 1 mol/kg, and exp(−2·0.9355·0.01801528) (derived)',
    ),
  ],
  notes: [
    'Mixtures use the Harvie, Møller & Weare (1984) mixing terms for Na+, K+, Mg2+, Ca2+, Cl- and SO4 2- at 25 °C; the row must be electrically neutral.',
    'In POTENTIAL and the other Nernst functions, a species header "H2O in NaCl" takes the salt’s molality and uses this a(H2O) (docs/notation.md, "Species headers").',
  ],
  perCase: (a, call) => {
    const headers = call.headers('salt_or_species');
    if (headers.length === 0)
      throw new EngineError(
        'argument',
        'salt_or_species is needed: give a salt such as "NaCl" or the ions of a mixture.',
        'salt_or_species',
      );
    const values = a.numbers('molality_or_values');
    const opts = { extrapolate: a.flag('extrapolate') };
    const salt = saltOf(headers);
    if (salt !== null) return waterActivity(salt, values[0] as number, a.num('temp_C'), opts);
    return waterActivity(headers, values, a.num('temp_C'), opts);
  },
};

const MOLALITY: FunctionSpec = {
  id: 'MOLALITY',
  family: 'Solutions',
  summary:
    'Molality (mol/kg of water) of a salt solution from its molarity (mol/L of solution): m = c / (ρ − c·M/1000).',
  returns: 'm in mol/kg, one row per case',
  params: [
    { name: 'salt', kind: 'salt', description: 'The salt, e.g. "NaCl"; one cell or a column of cases' },
    {
      name: 'molarity',
      kind: 'molarity',
      description: 'Concentration of the salt in mol/L of solution; one cell or a column of cases',
    },
    {
      name: 'density_g_cm3',
      kind: 'number',
      optional: true,
      unit: 'g/cm³',
      domain: { min: 0.5, max: 3 },
      defaultText: 'the held table (NaCl, KCl at 20 °C)',
      description: 'Density of the solution in g/cm³; one cell or a column of cases',
    },
    TEMP_C,
  ],
  result: { kind: 'perCase' },
  examples: [
    {
      args: ['NaCl', 1.832, null, 20],
      expected: 1.9012,
      tolerance: 2e-3,
      source:
        'derived: 10 wt% NaCl (ρ 1.0707 g/cm³, CRC Handbook, "Concentrative properties of aqueous solutions", from memory) is 1.832 mol/L and 0.1/(0.9·58.44) kg⁻¹ = 1.9012 mol/kg',
    },
  ],
  perCase: (a) =>
    molalityFromMolarity(a.text('salt'), a.num('molarity'), a.optNum('density_g_cm3'), a.num('temp_C')),
};

/** The solutions family, in docs order. */
export const SOLUTIONS_SPECS: readonly FunctionSpec[] = [MEANACTCOEF, WATERACTIVITY, MOLALITY];
