/**
 * Corrosion and cathodic protection: corrosion rate and mass-loss rate from a corrosion
 * current density by ASTM G102, and the life of a galvanic anode (docs/functions/).
 */
import {
  EngineError,
  anodeLifeYears,
  corrosionRateMmY,
  massLossRateGm2d,
  DEFAULT_UTILISATION,
} from '../../engine';
import { parseNumberText } from '../args';
import { isInputErrorText } from '../cellTypes';
import type { CaseArgs, FunctionSpec, ParamSpec } from '../spec/types';
import { ABOVE_ZERO, positiveParam } from './commonParams';

const CP_CAUTION =
  'Cathodic-protection design and assessment follow the applicable standards (e.g. DNV-RP-B401, ISO 15589, AMPP/NACE SP0169), the anode maker’s certified data and licensed practice; these are estimates.';
const G102 = 'ASTM G102 (K1 = 3.27e-3 mm·g/(µA·cm·y), K2 = 8.954e-3 g·cm²/(µA·m²·d); from memory)';

const RATE_PARAMS: readonly ParamSpec[] = [
  {
    name: 'metal_or_alloy',
    kind: 'text',
    description:
      'Element ("Fe"), metal name ("zinc"), alloy ("carbon steel", "304", "S31600", "C70600", "Alloy 400", "3003") or a composition in mass % ("Cu 88.6, Ni 10, Fe 1.4"); any label where density and equivalent weight are both given',
    noun: 'a metal or alloy such as "Fe" or "304"',
  },
  {
    name: 'current_density_uA_cm2',
    kind: 'currentDensity',
    unit: 'µA/cm²',
    domain: { min: 0 },
    description: 'Corrosion current density i_corr in µA/cm²',
  },
  {
    ...positiveParam('density_g_cm3', 'number', 'g/cm³', 'Density in g/cm³, to override the listed value'),
    optional: true,
    defaultText: "the metal's or alloy's",
  },
  {
    ...positiveParam(
      'equivalent_weight',
      'number',
      'g',
      'Equivalent weight in g per equivalent, to override the computed value',
    ),
    optional: true,
    defaultText: 'by ASTM G102 from the composition',
  },
];

/** An optional number where a 0 (an empty cell in some hosts) means omitted. */
function optionalPositive(a: CaseArgs, name: string): number | null {
  return a.cell(name) === 0 ? null : a.optNum(name);
}

const CORRATE: FunctionSpec = {
  id: 'CORRATE',
  family: 'Corrosion',
  summary: 'Corrosion rate in mm/y from a corrosion current density, CR = K1·i_corr·EW/ρ (ASTM G102).',
  returns: 'Corrosion rate in mm/y, one row per case',
  params: RATE_PARAMS,
  result: { kind: 'perCase' },
  notes: [
    'EW of an alloy = 1/Σ(nᵢ·fᵢ/Wᵢ) with the valences ASTM G102 uses (Fe 2, Ni 2, Cr 3, Mo 3, Mn 2, Cu 2, Al 3 …) and elements above about 1 %; EW and density of carbon steel, 304 and 316 from ASTM G102 Table 1 (from memory).',
    'Uniform corrosion is assumed; pitting and crevice attack can be far faster locally.',
    `${CP_CAUTION}`,
  ],
  examples: [
    {
      args: ['Fe', 1],
      expected: (3.27e-3 * 27.9225) / 7.87,
      tolerance: 1e-6,
      source: `${G102}; EW(Fe) = 55.845/2, ρ = 7.87 g/cm³ (CRC Handbook, from memory): 0.0116 mm/y`,
    },
    {
      args: ['304', 1],
      expected: (3.27e-3 * 25.12) / 7.94,
      tolerance: 1e-6,
      source: `${G102}; 304 stainless EW 25.12, ρ 7.94 (ASTM G102 Table 1, from memory)`,
    },
  ],
  perCase: (a) =>
    corrosionRateMmY(
      a.optText('metal_or_alloy'),
      a.num('current_density_uA_cm2'),
      optionalPositive(a, 'density_g_cm3'),
      optionalPositive(a, 'equivalent_weight'),
    ),
};

const MASSLOSS: FunctionSpec = {
  id: 'MASSLOSS',
  family: 'Corrosion',
  summary: 'Mass-loss rate in g/(m²·d) from a corrosion current density, MR = K2·i_corr·EW (ASTM G102).',
  returns: 'Mass-loss rate in g/(m²·d), one row per case',
  params: RATE_PARAMS,
  result: { kind: 'perCase' },
  notes: ['The density is not needed (it may be given, for the same arguments as CORRATE).', `${CP_CAUTION}`],
  examples: [
    {
      args: ['Fe', 1],
      expected: 8.954e-3 * 27.9225,
      tolerance: 1e-6,
      source: `${G102}; EW(Fe) = 55.845/2`,
    },
  ],
  perCase: (a) =>
    massLossRateGm2d(
      a.optText('metal_or_alloy'),
      a.num('current_density_uA_cm2'),
      optionalPositive(a, 'density_g_cm3'),
      optionalPositive(a, 'equivalent_weight'),
    ),
};

/**
 * A number (read and checked by its kind), or a name the engine looks up: a text cell that
 * is neither a number nor an error value is taken for a name.
 */
function numberOrName(a: CaseArgs, name: string): number | string | null {
  const raw = a.cell(name);
  if (typeof raw === 'string' && raw.trim() !== '' && parseNumberText(raw) === null && !isInputErrorText(raw))
    return raw;
  return a.optNum(name);
}

const ANODELIFE: FunctionSpec = {
  id: 'ANODELIFE',
  family: 'Corrosion',
  summary:
    'Life in years of a galvanic anode: mass·capacity·utilisation/(current·8760), with published capacities and utilisation factors by name.',
  returns: 'Anode life in years, one row per case',
  params: [
    { name: 'mass_kg', kind: 'mass', unit: 'kg', description: 'Net anode mass in kg' },
    positiveParam(
      'capacity_Ah_kg',
      'number',
      'Ah/kg',
      'Electrochemical capacity in Ah/kg, or a material: "Al-Zn-In" (2000), "zinc" (780), "magnesium" (1100), "high-potential magnesium" (1230)',
    ),
    {
      name: 'current_A',
      kind: 'current',
      domain: ABOVE_ZERO,
      description: 'Mean current output in A over the life',
    },
    {
      name: 'utilisation',
      kind: 'fraction',
      optional: true,
      default: DEFAULT_UTILISATION,
      description:
        'Utilisation factor in (0, 1], or an anode type: "long slender stand-off" (0.90), "short slender stand-off" (0.85), "long flush-mounted" (0.85), "bracelet" (0.80)',
    },
  ],
  result: { kind: 'perCase' },
  notes: [
    'Capacities: DNV-RP-B401 (2017) Table 10-6, seawater, anode surface up to 30 °C (Al-Zn-In 2000 Ah/kg, zinc 780 Ah/kg); magnesium about 1100 Ah/kg (H-1/AZ63) and 1230 Ah/kg (high-potential), common practice onshore. Utilisation factors: DNV-RP-B401 Table 10-8. All from memory: check against the edition you design to.',
    'Default utilisation 0.80 (the lowest DNV-RP-B401 factor, for bracelets and other types).',
    `${CP_CAUTION}`,
  ],
  examples: [
    {
      args: [100, 'zinc', 0.5, 'long slender stand-off'],
      expected: (100 * 780 * 0.9) / (0.5 * 8760),
      tolerance: 1e-9,
      source:
        'derived by hand: 100 kg × 780 Ah/kg × 0.90 / (0.5 A × 8760 h/y); DNV-RP-B401 (2017) Tables 10-6, 10-8 (from memory)',
    },
  ],
  perCase: (a) => {
    const cap = numberOrName(a, 'capacity_Ah_kg');
    if (cap === null)
      throw new EngineError(
        'argument',
        'capacity_Ah_kg is missing: give Ah/kg or a material such as "zinc".',
        'capacity_Ah_kg',
      );
    const u = numberOrName(a, 'utilisation');
    return anodeLifeYears(a.num('mass_kg'), cap, a.num('current_A'), u ?? DEFAULT_UTILISATION);
  },
};

/** The corrosion family, in docs order. */
export const CORROSION_SPECS: readonly FunctionSpec[] = [CORRATE, MASSLOSS, ANODELIFE];
