/**
 * Measurement: inverse Nernst (the activity or pH that gives a measured potential), the
 * Henderson liquid-junction potential, and the Nikolsky–Eisenman response of an
 * ion-selective electrode (docs/functions/).
 */
import { iseResponseV, junctionPotentialV, solveForUnknown } from '../../engine';
import { ACTIVITIES, OPTIONAL_SPECIES_HEADER, REACTION, SPECIES_HEADER, TABLE, TEMP_C } from '../spec/params';
import type { FunctionSpec } from '../spec/types';

const S25 = (8.31446261815324 * 298.15 * Math.LN10) / 96485.33212;
const RTF25 = (8.31446261815324 * 298.15) / 96485.33212;

const SOLVEFOR: FunctionSpec = {
  id: 'SOLVEFOR',
  family: 'Measurement',
  summary:
    'The activity of one species, or the pH, that gives a measured potential (the Nernst equation solved exactly in log space).',
  returns: 'Activity (mol/L; bar for a gas) or pH, one row per case',
  params: [
    REACTION,
    { name: 'E_V', kind: 'potential', description: 'Measured potential in V vs SHE (or the cell EMF)' },
    {
      name: 'unknown',
      kind: 'text',
      description: 'The species to solve for ("Cu2+", "left:Ag+") or "pH"',
      noun: 'a species such as "Cu2+" or "pH"',
    },
    OPTIONAL_SPECIES_HEADER,
    { ...ACTIVITIES, optional: true },
    TEMP_C,
    TABLE,
  ],
  result: { kind: 'perCase' },
  notes: [
    'log10 a = ((E° − E)/S − Σ others)/w with S = RT ln10/F and w the species’ exponent over n; a column for the unknown itself is ignored. Where the exponent is zero (the species cancels) no unique value exists and the function refuses.',
    'Results are thermodynamic estimates; they do not replace measurement.',
  ],
  examples: [
    {
      args: ['2 H+ + 2 e- -> H2', -0.2, 'pH', 'H2', 1],
      expected: 0.2 / S25,
      tolerance: 1e-9,
      source:
        'derived by hand: E = −(RT ln10/F)·pH for a hydrogen electrode at 1 bar (E° = 0 by definition); SI 2019 exact R and F',
    },
  ],
  perCase: (a, call) =>
    solveForUnknown(
      a.text('reaction'),
      a.num('E_V'),
      a.text('unknown'),
      call.headers(),
      a.row() ?? [],
      a.num('temp_C'),
      call.table(),
    ).value,
};

const JUNCTION: FunctionSpec = {
  id: 'JUNCTION',
  family: 'Measurement',
  summary:
    'Liquid-junction potential E_j = φ(right) − φ(left) in V by the Henderson equation, from limiting ionic conductivities at 25 °C (CRC Handbook).',
  returns: 'E_j in V, one row per case',
  params: [
    {
      ...SPECIES_HEADER,
      description: 'Ions ("H+", "Cl-") or strong electrolytes by formula ("HCl", "KCl"), one per column',
    },
    {
      name: 'left_values',
      kind: 'values',
      headerParam: 'species',
      unit: 'mol/L',
      description: 'Concentrations in mol/L in the left solution, one per species; one row per case',
    },
    {
      name: 'right_values',
      kind: 'values',
      headerParam: 'species',
      unit: 'mol/L',
      description: 'Concentrations in mol/L in the right solution; one row per case',
    },
    TEMP_C,
  ],
  result: { kind: 'perCase' },
  notes: [
    'Henderson equation (linear mixing, ideal solutions) with λ° at 25 °C from the CRC Handbook (from memory); the temperature enters RT/F only. E_j is φ(right) − φ(left).',
  ],
  examples: [
    {
      args: [[['HCl', 'KCl']], [[0.1, 0]], [[0, 0.1]]],
      expected: RTF25 * Math.log((349.65 + 76.31) / (73.48 + 76.31)),
      tolerance: 1e-9,
      source:
        'derived by hand from CRC Handbook λ° (H+ 349.65, K+ 73.48, Cl- 76.31 S·cm²/mol; from memory): +26.85 mV; measured 26.78 mV (Bard & Faulkner 2001, Table 2.3.2, from memory)',
    },
  ],
  perCase: (a, call) =>
    junctionPotentialV(call.headers(), a.numbers('left_values'), a.numbers('right_values'), a.num('temp_C')),
};

const ISERESPONSE: FunctionSpec = {
  id: 'ISERESPONSE',
  family: 'Measurement',
  summary:
    'Potential in V of an ion-selective electrode by the Nikolsky–Eisenman equation, E = E0 + (S/z)·log10(a_i + Σ K_ij·a_j^(z_i/z_j)).',
  returns: 'E in V, one row per case',
  params: [
    { name: 'E0_V', kind: 'potential', description: 'The electrode’s E0 in V (from calibration)' },
    {
      name: 'slope_V',
      kind: 'number',
      unit: 'V/decade',
      description:
        'Slope in V per decade for a singly charged ion (0.05916 ideal at 25 °C); divided by z of the primary ion',
    },
    {
      name: 'primary',
      kind: 'speciesHeader',
      description: 'The primary ion, then the interfering ions, e.g. "K+", "Na+", "NH4+"',
    },
    {
      name: 'activities',
      kind: 'values',
      headerParam: 'primary',
      unit: 'mol/L',
      description: 'Activities of the primary and interfering ions, in that order; one row per case',
    },
    {
      name: 'selectivities',
      kind: 'numberList',
      optional: true,
      defaultText: 'none (no interfering ions)',
      description: 'Selectivity coefficients K_ij, one per interfering ion',
    },
  ],
  result: { kind: 'perCase' },
  notes: [
    'Nikolsky–Eisenman equation as in the IUPAC recommendations on potentiometric selectivity (from memory).',
  ],
  examples: [
    {
      args: [0.2, 0.05916, [['K+', 'Na+']], [[1e-4, 0.1]], [[1e-3]]],
      expected: 0.2 + 0.05916 * Math.log10(1e-4 + 1e-3 * 0.1),
      tolerance: 1e-12,
      source: 'derived by hand: E = E0 + S·log10(a_K + K·a_Na)',
    },
  ],
  perCase: (a, call) => {
    const ks =
      call.raw('selectivities') === undefined || call.raw('selectivities') === null
        ? []
        : call.numberList('selectivities');
    return iseResponseV(
      a.num('E0_V'),
      a.num('slope_V'),
      call.headers('primary'),
      a.row('activities') ?? [],
      ks,
    );
  },
};

/** The measurement family, in docs order. */
export const MEASUREMENT_SPECS: readonly FunctionSpec[] = [SOLVEFOR, JUNCTION, ISERESPONSE];
