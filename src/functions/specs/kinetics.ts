/**
 * Electrode kinetics: Butler–Volmer current density with an optional mass-transfer limit,
 * its inverse, the Tafel slope, and the mixed (corrosion) potential of two Tafel reactions
 * (docs/functions/).
 */
import {
  EngineError,
  KINETICS_RANGE_C,
  butlerVolmerCurrent,
  kineticParams,
  mixedPotential,
  overpotentialV,
  tafelSlopeV,
} from '../../engine';
import type { CallArgs, CaseArgs, FunctionSpec, ParamSpec } from '../spec/types';

const BF = 'Bard & Faulkner, Electrochemical Methods, 2nd ed. (2001), eqs. 3.4.10–3.4.11 (from memory)';
const SI = 'SI 2019 exact F and R';
const f25 = 96485.33212 / (8.31446261815324 * 298.15);

const KIN_TEMP: ParamSpec = {
  name: 'temp_C',
  kind: 'temperature',
  optional: true,
  default: 25,
  domain: { min: KINETICS_RANGE_C[0], max: KINETICS_RANGE_C[1] },
  description: 'Temperature in °C (−80 to 200 °C); one cell or a column of cases',
};

const KIN_PARAMS: readonly ParamSpec[] = [
  {
    name: 'i0',
    kind: 'currentDensity',
    unit: '',
    domain: { min: 0, minExclusive: true },
    description: 'Exchange current density (A/m², mA/cm² …; the result is in the same unit)',
  },
  {
    name: 'alpha_a',
    kind: 'fraction',
    description: 'Anodic transfer coefficient αa in (0, 1]',
  },
  {
    name: 'alpha_c',
    kind: 'fraction',
    optional: true,
    defaultText: '1 − alpha_a',
    description: 'Cathodic transfer coefficient αc in (0, 1]',
  },
  KIN_TEMP,
  {
    name: 'i_lim',
    kind: 'numberList',
    optional: true,
    defaultText: 'no mass-transfer limit',
    description:
      'Limiting current density (same unit as i0): one value for both directions, or two (anodic, cathodic magnitude)',
  },
];

const KIN_NOTES =
  'Anodic current and overpotential are positive (IUPAC). i = i0·[exp(αa·F·η/RT) − exp(−αc·F·η/RT)]; with limits, i = i_BV/(1 + i0·e^{αa f η}/i_lim,a + i0·e^{−αc f η}/i_lim,c) (Bard & Faulkner 2001, eq. 3.4.10, anodic-positive form).';

function limits(call: CallArgs): { a: number | null; c: number | null } {
  if (call.raw('i_lim') === undefined || call.raw('i_lim') === null) return { a: null, c: null };
  const xs = call.numberList('i_lim');
  if (xs.length === 0) return { a: null, c: null };
  if (xs.length > 2)
    throw new EngineError(
      'shape',
      `i_lim has ${xs.length} values; give one (both directions) or two (anodic, cathodic).`,
      'i_lim',
    );
  const a = xs[0]!;
  const c = xs.length === 2 ? Math.abs(xs[1]!) : a;
  return { a, c };
}

function params(a: CaseArgs, call: CallArgs) {
  const lim = limits(call);
  const ac = a.cell('alpha_c') === 0 ? null : a.optNum('alpha_c');
  return kineticParams(a.num('i0'), a.num('alpha_a'), ac, a.num('temp_C'), lim.a, lim.c);
}

const BVCURRENT: FunctionSpec = {
  id: 'BVCURRENT',
  family: 'Kinetics',
  summary:
    'Butler–Volmer current density at an overpotential, with an optional mass-transfer limit; anodic positive, same unit as i0.',
  returns: 'Current density (unit of i0), one row per case',
  params: [
    { name: 'eta_V', kind: 'potential', description: 'Overpotential η = E − E_eq in V' },
    ...KIN_PARAMS,
  ],
  result: { kind: 'perCase' },
  notes: [`${KIN_NOTES}`],
  examples: [
    {
      args: [0.05, 1e-3, 0.5],
      expected: 2e-3 * Math.sinh(0.5 * f25 * 0.05),
      tolerance: 1e-12,
      source: `derived by hand: αa = αc = 0.5 gives 2·i0·sinh(α·F·η/RT); ${BF}; ${SI}`,
    },
  ],
  perCase: (a, call) => butlerVolmerCurrent(a.num('eta_V'), params(a, call)),
};

const OVERPOTENTIAL: FunctionSpec = {
  id: 'OVERPOTENTIAL',
  family: 'Kinetics',
  summary:
    'Overpotential in V that gives a current density, the inverse of BVCURRENT (exact for αa = αc, else a safeguarded Newton iteration).',
  returns: 'Overpotential in V, one row per case',
  params: [
    {
      name: 'i',
      kind: 'currentDensity',
      unit: '',
      description: 'Current density (anodic positive, same unit as i0)',
    },
    ...KIN_PARAMS,
  ],
  result: { kind: 'perCase' },
  notes: [`${KIN_NOTES}`, 'A current at or beyond a limiting current has no overpotential and is refused.'],
  examples: [
    {
      args: [1e-3, 1e-3, 0.5],
      expected: Math.asinh(0.5) / (0.5 * f25),
      tolerance: 1e-12,
      source: `derived by hand: η = asinh(i/(2·i0))/(α·F/RT); ${BF}; ${SI}`,
    },
  ],
  perCase: (a, call) => overpotentialV(a.num('i'), params(a, call)),
};

const TAFELSLOPE: FunctionSpec = {
  id: 'TAFELSLOPE',
  family: 'Kinetics',
  summary: 'Tafel slope b = ln10·RT/(α·n·F) in V per decade of current.',
  returns: 'Tafel slope in V/decade, one row per case',
  params: [
    { name: 'alpha', kind: 'fraction', description: 'Transfer coefficient α in (0, 1]' },
    KIN_TEMP,
    {
      name: 'n',
      kind: 'number',
      optional: true,
      default: 1,
      domain: { min: 0, minExclusive: true },
      description: 'Electrons in the rate-determining step',
    },
  ],
  result: { kind: 'perCase' },
  examples: [
    {
      args: [0.5],
      expected: (Math.LN10 * 8.31446261815324 * 298.15) / (0.5 * 96485.33212),
      tolerance: 1e-9,
      source: `derived by hand: 118.3 mV/decade for α = 0.5 at 25 °C; ${SI}`,
    },
  ],
  perCase: (a) => tafelSlopeV(a.num('alpha'), a.num('temp_C'), a.num('n')),
};

const POT = { kind: 'potential' } as const;
const I0 = { kind: 'currentDensity', unit: '', domain: { min: 0, minExclusive: true } } as const;
const SLOPE = { kind: 'number', unit: 'V/decade', domain: { min: 0, minExclusive: true } } as const;

const MIXEDPOTENTIAL: FunctionSpec = {
  id: 'MIXEDPOTENTIAL',
  family: 'Kinetics',
  summary:
    'Corrosion potential and current (two cells) where an anodic and a cathodic Tafel reaction balance (Wagner–Traud), solved exactly in log space.',
  returns: 'Two cells per case: E_corr in V (the scale of E_a and E_c) and i_corr (the unit of i0)',
  params: [
    {
      ...POT,
      name: 'E_a',
      description: 'Equilibrium potential of the anodic reaction (e.g. metal dissolution) in V',
    },
    {
      ...I0,
      name: 'i0_a',
      description: 'Exchange current density of the anodic reaction (any unit; i_corr has the same)',
    },
    { ...SLOPE, name: 'b_a', description: 'Anodic Tafel slope in V/decade (positive, e.g. 0.06)' },
    {
      ...POT,
      name: 'E_c',
      description:
        'Equilibrium potential of the cathodic reaction (e.g. hydrogen evolution, oxygen reduction) in V',
    },
    {
      ...I0,
      name: 'i0_c',
      description: 'Exchange current density of the cathodic reaction (same unit as i0_a)',
    },
    { ...SLOPE, name: 'b_c', description: 'Cathodic Tafel slope in V/decade (positive, e.g. 0.12)' },
  ],
  result: { kind: 'perCase', width: 2 },
  notes: [
    'E_corr = [b_a·b_c·log10(i0_c/i0_a) + b_c·E_a + b_a·E_c]/(b_a + b_c); log10 i_corr = [b_a·log10 i0_a + b_c·log10 i0_c + E_c − E_a]/(b_a + b_c) (Wagner & Traud 1938).',
    'Valid where E_corr lies well between E_a and E_c (each reaction’s reverse negligible); otherwise refused.',
  ],
  examples: [
    {
      args: [-0.5, 1e-6, 0.06, 0, 1e-7, 0.12],
      expected: -0.373333333333,
      tolerance: 1e-9,
      source:
        'solved by hand: −6 + (E + 0.5)/0.06 = −7 − E/0.12 gives E = −0.37333 V, i_corr = 10^−3.8889 = 1.2915e-4',
    },
  ],
  perCase: (a) => {
    const m = mixedPotential(
      a.num('E_a'),
      a.num('i0_a'),
      a.num('b_a'),
      a.num('E_c'),
      a.num('i0_c'),
      a.num('b_c'),
    );
    return [m.eCorrV, m.iCorr];
  },
};

/** The kinetics family, in docs order. */
export const KINETICS_SPECS: readonly FunctionSpec[] = [BVCURRENT, OVERPOTENTIAL, TAFELSLOPE, MIXEDPOTENTIAL];
