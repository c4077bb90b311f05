/**
 * Thermodynamics from the species data layer: formation data of a species, and ΔrH°,
 * ΔrS° and the thermoneutral voltage of a reaction (docs/functions/).
 */
import {
  formationValue,
  parseFormationQuantity,
  reactionEnthalpyKJ,
  reactionEntropyJK,
  thermoneutralV,
} from '../../engine';
import { REACTION, TABLE, TEMP_C } from '../spec/params';
import type { FunctionSpec } from '../spec/types';

const NBS = 'NBS tables (Wagman et al., J. Phys. Chem. Ref. Data 11, Suppl. 2, 1982), from memory';
const REACTION_ANY = {
  ...REACTION,
  description:
    'A reaction (also one that is not a redox reaction, e.g. "PbSO4(s) -> Pb2+ + SO4^2-"), half-reaction, couple or cell; one cell or a column of cases',
};

const FORMATION: FunctionSpec = {
  id: 'FORMATION',
  family: 'Thermodynamics',
  summary:
    'Standard formation data of a species at 298.15 K and 1 bar from the species data: ΔfG° or ΔfH° in kJ/mol, S° or Cp° in J/(mol·K), or the source.',
  returns: 'The quantity (kJ/mol, J/(mol·K)) or the source text, one row per case',
  params: [
    { name: 'species', kind: 'species', description: 'A species with its phase where it matters, e.g. "Cu2+", "H2O(l)", "PbSO4(s)"; one cell or a column of cases' },
    {
      name: 'quantity',
      kind: 'choice',
      optional: true,
      default: 'G',
      choices: ['G', 'H', 'S', 'Cp', 'source'],
      parseChoice: parseFormationQuantity,
      description: '"G" (ΔfG°, kJ/mol), "H" (ΔfH°, kJ/mol), "S" (S°, J/(mol·K)), "Cp" (J/(mol·K)) or "source"',
      noun: '"G", "H", "S", "Cp" or "source"',
    },
  ],
  result: { kind: 'perCase' },
  examples: [
    { args: ['H2O(l)', 'H'], expected: -285.83, tolerance: 1e-9, source: `ΔfH°(H2O, l) = −285.83 kJ/mol, ${NBS}; OpenStax Chemistry 2e, Appendix G prints −285.83` },
    { args: ['Cl-', 'S'], expected: 56.5, tolerance: 1e-9, source: `S°(Cl-, aq) = 56.5 J/(mol·K), OpenStax Chemistry 2e, Appendix G` },
  ],
  perCase: (a) => formationValue(a.text('species'), a.choice<ReturnType<typeof parseFormationQuantity>>('quantity')),
};

/** What the standard reaction quantities share: a reaction at temp_C, with the user's table. */
const REACTION_QUANTITY: Pick<FunctionSpec, 'family' | 'params' | 'result'> = {
  family: 'Thermodynamics',
  params: [REACTION_ANY, TEMP_C, TABLE],
  result: { kind: 'perCase' },
};

const ENTHALPY: FunctionSpec = {
  ...REACTION_QUANTITY,
  id: 'ENTHALPY',
  summary: 'Standard reaction enthalpy ΔrH° in kJ/mol at temp_C (Gibbs–Helmholtz with constant ΔCp° from the species data, or the table rows’ dE°/dT).',
  returns: 'ΔrH° in kJ/mol, one row per case',
  examples: [
    { args: ['H2 + 1/2 O2 -> H2O'], expected: -285.83, tolerance: 0.01, source: `ΔfH°(H2O, l) = −285.83 kJ/mol, ${NBS}` },
  ],
  perCase: (a, call) => reactionEnthalpyKJ(a.text('reaction'), a.tempC(), call.table()),
};

const ENTROPY: FunctionSpec = {
  ...REACTION_QUANTITY,
  id: 'ENTROPY',
  summary: 'Standard reaction entropy ΔrS° in J/(mol·K) at temp_C, from the species data or the table rows’ dE°/dT.',
  returns: 'ΔrS° in J/(mol·K), one row per case',
  examples: [
    {
      args: ['H2 + 1/2 O2 -> H2O'],
      expected: -163.343,
      tolerance: 0.01,
      source: `derived by hand: S° H2O(l) 69.91 − H2(g) 130.684 − ½·O2(g) 205.138 J/(mol·K), ${NBS}`,
    },
  ],
  perCase: (a, call) => reactionEntropyJK(a.text('reaction'), a.tempC(), call.table()),
};

const THERMONEUTRAL: FunctionSpec = {
  id: 'THERMONEUTRAL',
  family: 'Thermodynamics',
  summary:
    'Thermoneutral voltage ΔrH°/(nF) in V of a redox reaction as written (positive for an electrolysis such as "H2O -> H2 + 1/2 O2"), for electrolysers and fuel cells.',
  returns: 'V, one row per case',
  params: [REACTION_ANY, TEMP_C],
  result: { kind: 'perCase' },
  examples: [
    {
      args: ['H2O -> H2 + 1/2 O2'],
      expected: 1.4812,
      tolerance: 1e-3,
      source: `derived by hand: 285.83 kJ/mol / (2F), ΔfH°(H2O, l) from ${NBS}; about 1.48 V (common practice)`,
    },
  ],
  perCase: (a) => thermoneutralV(a.text('reaction'), a.tempC(), null),
};

/** The thermodynamics family. */
export const THERMO_SPECS: readonly FunctionSpec[] = [FORMATION, ENTHALPY, ENTROPY, THERMONEUTRAL];
