/**
 * Faraday's law and batteries: mass deposited or dissolved by a charge, plating time and
 * thickness, theoretical specific capacity and specific energy (docs/functions/).
 * Molar masses from the IUPAC/CIAAW 2021 abridged standard atomic weights.
 */
import {
  depositMassG,
  plateTimeS,
  thicknessUm,
  specificCapacityMAhG,
  specificEnergyWhKg,
} from '../../engine';
import { parseNumberText } from '../args';
import { TEMP_C } from '../spec/params';
import { positiveParam } from './commonParams';
import type { FunctionSpec, ParamSpec } from '../spec/types';

const F = 'F = 96485.33212 C/mol (SI 2019 exact)';
const AW = 'atomic weights IUPAC/CIAAW 2021 abridged (from memory)';
const PLATING_CAUTION =
  'Plating baths and electrolysis evolve gases and use hazardous chemicals: follow the applicable standards, local codes and licensed practice.';

const HALF_REACTION: ParamSpec = {
  name: 'reaction',
  kind: 'reaction',
  description:
    'Half-reaction with its electrons, e.g. "Cu2+ + 2 e- -> Cu", or a couple such as "Cu2+/Cu"; the solid is what is deposited or dissolved; one cell or a column of cases',
  noun: 'a half-reaction such as "Cu2+ + 2 e- -> Cu"',
};

const EFFICIENCY: ParamSpec = {
  name: 'efficiency',
  kind: 'fraction',
  optional: true,
  default: 1,
  description: 'Current (Faradaic) efficiency, a fraction in (0, 1]',
};

const DENSITY = positiveParam(
  'density_g_cm3',
  'number',
  'g/cm³',
  'Density of the deposit in g/cm³ (e.g. 8.96 for copper)',
);

const CURRENT_DENSITY = positiveParam(
  'current_density_A_m2',
  'currentDensity',
  'A/m²',
  'Current density in A/m² (1 A/dm² = 100 A/m²)',
);

const DEPOSIT: FunctionSpec = {
  id: 'DEPOSIT',
  family: 'Faraday',
  summary:
    "Mass in g deposited (or dissolved) by a charge through a half-reaction, by Faraday's law m = Q·M·ε/(n·F).",
  returns: 'Mass in g, one row per case',
  params: [
    HALF_REACTION,
    { name: 'charge_C', kind: 'charge', description: 'Charge passed in C (A·s; 1 A·h = 3600 C)' },
    EFFICIENCY,
  ],
  result: { kind: 'perCase' },
  notes: [
    'The deposited species is the one solid of the half-reaction: the solid product (a reduction deposits it), or where no product is solid the solid reactant (it dissolves). Solids on both sides are refused as ambiguous.',
    'Molar masses from the IUPAC/CIAAW 2021 abridged standard atomic weights.',
    `${PLATING_CAUTION}`,
  ],
  examples: [
    {
      args: ['Cu2+ + 2 e- -> Cu', 96485.33212],
      expected: 31.773,
      tolerance: 1e-6,
      source: `derived by hand: one faraday deposits M/2 of copper, 63.546/2 g; ${AW}; ${F}`,
    },
    {
      args: ['Ag+ + e- -> Ag', 3600, 0.98],
      expected: (3600 * 107.87 * 0.98) / 96485.33212,
      tolerance: 1e-6,
      source: `derived by hand: 1 A·h at 98 % through Ag+/Ag, m = Q·M·ε/F; ${AW}; ${F}`,
    },
  ],
  perCase: (a) => depositMassG(a.text('reaction'), a.num('charge_C'), a.num('efficiency')),
};

/** What the two plating functions share: a deposit of uniform thickness, one row per case. */
const PLATING: Pick<FunctionSpec, 'family' | 'result' | 'notes'> = {
  family: 'Faraday',
  result: { kind: 'perCase' },
  notes: [
    'Uniform current distribution is assumed; real parts plate thicker at edges and thinner in recesses.',
    `${PLATING_CAUTION}`,
  ],
};

const PLATETIME: FunctionSpec = {
  ...PLATING,
  id: 'PLATETIME',
  summary: 'Time in s to plate a thickness at a current density: t = ρ·d·n·F/(i·M·ε).',
  returns: 'Time in s, one row per case',
  params: [
    HALF_REACTION,
    { name: 'thickness_um', kind: 'length', unit: 'µm', description: 'Thickness of the deposit in µm' },
    CURRENT_DENSITY,
    DENSITY,
    EFFICIENCY,
  ],
  examples: [
    {
      args: ['Cu2+ + 2 e- -> Cu', 25, 200, 8.96],
      expected: (8.96 * 25 * 2 * 96485.33212) / (200 * 63.546),
      tolerance: 1e-6,
      source: `derived by hand: 25 µm × 8.96 g/cm³ = 224 g/m² of copper at 200 A/m²; ${AW}; ${F}`,
    },
  ],
  perCase: (a) =>
    plateTimeS(
      a.text('reaction'),
      a.num('thickness_um'),
      a.num('current_density_A_m2'),
      a.num('density_g_cm3'),
      a.num('efficiency'),
    ),
};

const THICKNESS: FunctionSpec = {
  ...PLATING,
  id: 'THICKNESS',
  summary: 'Thickness in µm plated by a current density over a time: d = i·t·M·ε/(n·F·ρ).',
  returns: 'Thickness in µm, one row per case',
  params: [
    HALF_REACTION,
    { ...CURRENT_DENSITY, domain: { min: 0 } },
    { name: 'time_s', kind: 'time', description: 'Plating time in s' },
    DENSITY,
    EFFICIENCY,
  ],
  examples: [
    {
      args: ['Ni2+ + 2 e- -> Ni', 300, 3600, 8.9, 0.95],
      expected: (300 * 3600 * 58.693 * 0.95) / (2 * 96485.33212 * 8.9),
      tolerance: 1e-6,
      source: `derived by hand: nickel, 3 A/dm² for 1 h at 95 %; ${AW}; ${F}`,
    },
  ],
  perCase: (a) =>
    thicknessUm(
      a.text('reaction'),
      a.num('current_density_A_m2'),
      a.num('time_s'),
      a.num('density_g_cm3'),
      a.num('efficiency'),
    ),
};

const CAPACITY: FunctionSpec = {
  id: 'CAPACITY',
  family: 'Faraday',
  summary: 'Theoretical specific capacity in mAh/g of an electrode reaction or active material: n·F/(3.6·M).',
  returns: 'Specific capacity in mAh/g, one row per case',
  params: [
    {
      name: 'reaction_or_species',
      kind: 'text',
      description:
        'Electrode half-reaction ("CoO2 + Li+ + e- -> LiCoO2"), couple ("Zn2+/Zn") or active material ("LiFePO4"); one cell or a column of cases',
      noun: 'an electrode reaction or active material',
    },
    {
      name: 'basis',
      kind: 'text',
      optional: true,
      defaultText: '"reduced" (a reaction) or the common valence (an element)',
      description:
        'For a reaction: "reduced" (per mass of the solids on the reduced side), "oxidised", or a species of the reaction; for a species alone: its electrons per formula unit',
    },
  ],
  result: { kind: 'perCase' },
  notes: [
    'Theoretical capacity only: practical electrodes deliver less (binder, conductive additive, current collector, partial utilisation).',
    'Battery design and handling follow the applicable standards and the cell maker’s data.',
  ],
  examples: [
    {
      args: ['Li+ + e- -> Li'],
      expected: 96485.33212 / (3.6 * 6.94),
      tolerance: 1e-6,
      source: `derived by hand: 3861 mAh/g for lithium metal; ${AW}; ${F}`,
    },
    {
      args: ['CoO2 + Li+ + e- -> LiCoO2'],
      expected: 96485.33212 / (3.6 * (6.94 + 58.933 + 2 * 15.999)),
      tolerance: 1e-6,
      source: `derived by hand: 274 mAh/g per LiCoO2 for one Li; ${AW}; ${F}`,
    },
    {
      args: ['C6 + Li+ + e- -> LiC6', 'oxidised'],
      expected: 96485.33212 / (3.6 * 6 * 12.011),
      tolerance: 1e-6,
      source: `derived by hand: 372 mAh/g of graphite (per C6); ${AW}; ${F}`,
    },
  ],
  perCase: (a) => {
    const raw = a.cell('basis');
    const asNumber = typeof raw === 'string' ? parseNumberText(raw) : null;
    const basis =
      raw === null || raw === '' || raw === 0
        ? null
        : typeof raw === 'number'
          ? raw
          : (asNumber ?? a.optText('basis'));
    return specificCapacityMAhG(a.text('reaction_or_species'), basis);
  },
};

const SPECENERGY: FunctionSpec = {
  id: 'SPECENERGY',
  family: 'Faraday',
  summary:
    'Theoretical specific energy in Wh/kg of a cell reaction, n·F·E°/(3.6·Σ reactant masses), with E° from the potentials table.',
  returns: 'Specific energy in Wh per kg of reactants, one row per case',
  params: [
    {
      name: 'cell_reaction',
      kind: 'reaction',
      description:
        'Cell (discharge) reaction, e.g. "Pb + PbO2 + 2 H2SO4 -> 2 PbSO4 + 2 H2O", or a cell diagram; one cell or a column of cases',
      noun: 'a cell reaction',
    },
    TEMP_C,
  ],
  result: { kind: 'perCase' },
  notes: [
    'The mass is that of the reactants as written, the electrolyte included where it reacts (the sulfuric acid of the lead–acid cell). A strong acid written by formula, or a salt with (aq), is read as its ions to find E°.',
    'Theoretical value: practical cells reach a fraction of it. Battery design and handling follow the applicable standards and the cell maker’s data.',
  ],
  examples: [
    {
      args: ['Pb + PbO2 + 2 H2SO4 -> 2 PbSO4 + 2 H2O'],
      expected: (2 * 96485.33212 * (1.69 + 0.3505)) / (3.6 * (207.2 + 239.198 + 2 * 98.072)),
      tolerance: 0.2,
      source: `derived by hand: E° = 1.69 + 0.3505 V (OpenStax Chemistry 2e, Appendix L), 2 electrons, 642.54 g of reactants; ${AW}; ${F}`,
    },
  ],
  perCase: (a) => specificEnergyWhKg(a.text('cell_reaction'), a.num('temp_C')),
};

/** The Faraday family, in docs order. */
export const FARADAY_SPECS: readonly FunctionSpec[] = [DEPOSIT, PLATETIME, THICKNESS, CAPACITY, SPECENERGY];
