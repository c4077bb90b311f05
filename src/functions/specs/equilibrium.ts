/**
 * Equilibrium and electron bookkeeping: log K, K, ΔG, n, balancing, the Nernst slope,
 * chained couples and concentration cells (docs/functions/).
 */
import {
  EngineError,
  balanceSkeleton,
  checkBalance,
  combineStepPotentialsV,
  compiledReaction,
  concentrationCellEmfV,
  electronCount,
  electronsConsumed,
  equilibriumConstantFromLog10,
  formatReaction,
  gibbsEnergyKJ,
  log10EquilibriumConstant,
  nernstSlopeV,
  parseMedium,
  parseNotation,
  planConcentrationCell,
  standardPotentialV,
  reactionEnergy,
  reactionGibbsKJ,
  hasInlineActivities,
} from '../../engine';
import { parseNumberText } from '../args';
import { PHYSICAL_TEMP_DOMAIN, readPotentialV } from '../spec/kinds';
import { N_FROM_REACTION, REACTION, REACTION_OR_E, TABLE, TEMP_C } from '../spec/params';
import type { CallArgs, CaseArgs, FunctionSpec } from '../spec/types';

/** What every Equilibrium function shares: its family, and one result row per case (unless it says otherwise). */
const EQUILIBRIUM = { family: 'Equilibrium', result: { kind: 'perCase' } } as const;

const SLOPE = 'derived by hand: RT ln10/(nF) with the SI 2019 exact R and F';
const CU_ZN =
  'E°(Cu2+/Cu) = 0.3394 V from ΔfG°(Cu2+) = 65.49 kJ/mol (NBS 1982, from memory; OpenStax Appendix G and L print 65.49 and +0.34) and E°(Zn2+/Zn) = −0.7618 V, OpenStax Chemistry 2e, Appendix L';

/** The reaction text of a case, or null where the case gives a potential. */
function reactionText(a: CaseArgs): string | null {
  const raw = a.cell(REACTION_OR_E.name);
  if (typeof raw === 'number' || (typeof raw === 'string' && parseNumberText(raw) !== null)) return null;
  return a.text(REACTION_OR_E.name);
}

/** (E°, n) from a reaction text (E° and n from the table) or from a potential with n. */
function standardAndN(a: CaseArgs, call: CallArgs): { e0: number; n: number } {
  const p = REACTION_OR_E;
  const raw = a.cell(p.name);
  const given = a.optNum('n');
  if (typeof raw === 'number' || (typeof raw === 'string' && parseNumberText(raw) !== null)) {
    const e0 = readPotentialV(raw, p);
    if (given === null) {
      throw new EngineError(
        'argument',
        `n is missing: when ${p.name} is a potential (${e0} V), give the electrons transferred, n.`,
        'n',
      );
    }
    return { e0, n: given };
  }
  const text = a.text(p.name);
  const form = compiledReaction(text, call.table());
  const n = electronCount(form.resolved);
  if (given !== null && Math.abs(given - n) > 1e-9) {
    throw new EngineError(
      'argument',
      `n = ${given} does not match the ${n} electron${n === 1 ? '' : 's'} of ${text} as written; leave n empty, or scale the reaction's coefficients.`,
      'n',
    );
  }
  return { e0: standardPotentialV(form.resolved, a.tempC()), n };
}

/**
 * log10 K: from a potential with n, or from the reaction's ΔrG°(T) (through the table, or
 * the species data for a reaction that is not a redox reaction, e.g. a solubility).
 */
function log10K(a: CaseArgs, call: CallArgs): number {
  const t = a.tempC();
  const text = reactionText(a);
  if (text === null) {
    const { e0, n } = standardAndN(a, call);
    return log10EquilibriumConstant(e0, n, t);
  }
  const e = reactionEnergy(text, t, call.table());
  checkGivenN(a, text, e.n);
  return e.log10K;
}

function checkGivenN(a: CaseArgs, text: string, n: number): void {
  const given = a.optNum('n');
  if (given !== null && Math.abs(given - n) > 1e-9) {
    throw new EngineError(
      'argument',
      n === 0
        ? `${text} is not a redox reaction, so n does not apply; leave n empty.`
        : `n = ${given} does not match the ${n} electron${n === 1 ? '' : 's'} of ${text} as written; leave n empty, or scale the reaction's coefficients.`,
      'n',
    );
  }
}

const LOGK_PARAMS = [REACTION_OR_E, N_FROM_REACTION, TEMP_C, TABLE];

const LOGK: FunctionSpec = {
  id: 'LOGK',
  ...EQUILIBRIUM,
  summary:
    'log10 of the equilibrium constant, −ΔrG°/(RT ln 10) = nFE°/(RT ln 10), of a reaction (also a solubility or an ionisation, from the species data) or from E° in V and n; activities written in the reaction do not change K.',
  returns: 'log10 K, one row per case',
  params: LOGK_PARAMS,
  examples: [
    { args: [1.1, 2], expected: 37.187697, tolerance: 1e-5, source: 'derived by hand: nFE°/(RT ln10) with the SI 2019 exact R and F' },
  ],
  perCase: log10K,
};

const EQCONST: FunctionSpec = {
  id: 'EQCONST',
  ...EQUILIBRIUM,
  summary:
    'Equilibrium constant K = 10^(nFE°/(RT ln 10)) from a reaction or from E° in V and n; #NUM! where K leaves the number range (use LOGK).',
  returns: 'K (dimensionless), one row per case',
  params: LOGK_PARAMS,
  examples: [
    {
      args: ['Zn + Cu2+ -> Zn2+ + Cu'],
      expected: 1.68858e37,
      tolerance: 1e33,
      source: `${CU_ZN}; derived by hand: 10^(2·1.1012 V·F/(RT ln10))`,
    },
  ],
  perCase: (a, call) => equilibriumConstantFromLog10(log10K(a, call)),
};

const GIBBS: FunctionSpec = {
  id: 'GIBBS',
  ...EQUILIBRIUM,
  summary:
    'Gibbs energy ΔG = −nFE in kJ/mol from a potential E in V and n; of a reaction, ΔG° at temp_C, or ΔG at the activities written in it (e.g. "Zn | Zn2+(aq, 0.1 M) || Cu2+(aq, 0.01 M) | Cu"), agreeing with POTENTIAL.',
  returns: 'ΔG in kJ/mol, one row per case',
  params: LOGK_PARAMS,
  examples: [
    { args: [0.434, 2], expected: -83.749268, tolerance: 1e-5, source: 'derived by hand: −nFE with the SI 2019 exact F' },
  ],
  perCase: (a, call) => {
    const t = a.tempC();
    const text = reactionText(a);
    if (text === null) {
      const { e0, n } = standardAndN(a, call);
      return gibbsEnergyKJ(e0, n);
    }
    let r;
    try {
      r = compiledReaction(text, call.table()).resolved;
    } catch (e) {
      // a reaction the table cannot split (no redox couple): ΔrG° from the species data
      if (!(e instanceof EngineError) || e.kind !== 'notFound') throw e;
      const en = reactionEnergy(text, t, call.table());
      checkGivenN(a, text, en.n);
      return en.gibbsKJ;
    }
    checkGivenN(a, text, electronCount(r));
    return reactionGibbsKJ(r, t, { atActivities: hasInlineActivities(r) });
  },
};

const ELECTRONS: FunctionSpec = {
  id: 'ELECTRONS',
  ...EQUILIBRIUM,
  summary: 'Number of electrons n transferred in the balanced half-reaction, cell or reaction.',
  returns: 'n, one row per case',
  params: [REACTION, TABLE],
  examples: [
    { args: ['Zn + Cu2+ -> Zn2+ + Cu'], expected: 2, tolerance: 0, source: 'derived by hand: Zn → Zn2+ gives 2 electrons' },
    { args: ['MnO4- + 8 H+ + 5 e- -> Mn2+ + 4 H2O'], expected: 5, tolerance: 0, source: 'derived by hand: Mn +7 → +2' },
  ],
  perCase: (a, call) => {
    const text = a.text('reaction');
    const parsed = parseNotation(text);
    if (parsed.kind === 'half') {
      const bal = checkBalance(parsed.reaction);
      if (!bal.balanced) {
        throw new EngineError(
          'unbalanced',
          `"${text}" does not balance (${bal.problems.join('; ')}). Use BALANCE to balance it.`,
          'reaction',
        );
      }
      const e = electronsConsumed(parsed.reaction);
      return Math.abs(Number(e.num) / Number(e.den));
    }
    return electronCount(compiledReaction(text, call.table()).resolved);
  },
};

const BALANCE: FunctionSpec = {
  id: 'BALANCE',
  ...EQUILIBRIUM,
  summary:
    'Balanced reaction text from a skeleton redox equation, half-reaction, couple or cell; medium "acid" balances with H+ and H2O, "base" with OH- and H2O.',
  returns: 'Balanced reaction text, one row per case',
  params: [
    { ...REACTION, description: 'Skeleton equation such as "MnO4- + Fe2+ -> Mn2+ + Fe3+", or a half-reaction, couple or cell; one cell or a column of cases' },
    {
      name: 'medium',
      kind: 'choice',
      optional: true,
      choices: ['acid', 'base'],
      defaultText: 'none: no H+, OH- or H2O added',
      parseChoice: parseMedium,
      description: '"acid", "base" or empty',
      noun: '"acid", "base" or empty',
    },
    TABLE,
  ],
  examples: [
    {
      args: ['MnO4- + Fe2+ -> Mn2+ + Fe3+', 'acid'],
      expected: 'MnO4- + 5 Fe2+ + 8 H+ -> Mn2+ + 5 Fe3+ + 4 H2O',
      source: 'the permanganate–iron(II) titration reaction (common practice)',
    },
  ],
  perCase: (a, call) => {
    const text = a.text('reaction');
    const m = a.choice<ReturnType<typeof parseMedium>>('medium');
    const parsed = parseNotation(text);
    if (parsed.kind === 'half' || parsed.kind === 'reaction')
      return formatReaction(balanceSkeleton(parsed.reaction, m, text).reaction);
    const r = compiledReaction(text, call.table()).resolved;
    return formatReaction(r.kind === 'half' ? r.half.reaction : r.reaction);
  },
};

const NERNSTSLOPE: FunctionSpec = {
  id: 'NERNSTSLOPE',
  ...EQUILIBRIUM,
  summary:
    'Nernst slope RT ln10/(nF) in V per decade of activity from the exact SI constants; a negative n gives the negative slope of an anion-responsive electrode.',
  returns: 'Slope in V per decade, one row per case',
  params: [
    { ...TEMP_C, domain: PHYSICAL_TEMP_DOMAIN },
    {
      name: 'n',
      kind: 'number',
      optional: true,
      default: 1,
      domain: { nonZero: true },
      description: 'Electrons (charge of the sensed ion); signed: −1 for an anion-responsive electrode',
    },
  ],
  examples: [
    { args: [25], expected: 0.0591593, tolerance: 1e-7, source: SLOPE },
    { args: [25, -1], expected: -0.0591593, tolerance: 1e-7, source: SLOPE },
    { args: [37, 2], expected: 0.0307702, tolerance: 1e-7, source: SLOPE },
  ],
  perCase: (a) => {
    const t = a.tempC();
    const n = a.num('n');
    return Math.sign(n) * nernstSlopeV(t, Math.abs(n));
  },
};

const COMBINE: FunctionSpec = {
  id: 'COMBINE',
  family: 'Equilibrium',
  summary: 'E° of the couple made by chaining steps, Σ nᵢEᵢ / Σ nᵢ (Gibbs energies add, potentials do not).',
  returns: 'E° in V of the combined couple',
  params: [
    { name: 'potentials', kind: 'numberList', unit: 'V', description: 'E° of each step in V, one row or one column' },
    { name: 'n', kind: 'numberList', description: 'Electrons of each step, in the same order' },
  ],
  result: { kind: 'single' },
  examples: [
    {
      args: [[[0.771, -0.447]], [[1, 2]]],
      expected: -0.041,
      tolerance: 1e-12,
      source: 'E°(Fe3+/Fe2+) = 0.771 V and E°(Fe2+/Fe) = −0.447 V, OpenStax Chemistry 2e, Appendix L; (0.771 − 2·0.447)/3',
    },
  ],
  run: (call) => [[combineStepPotentialsV(call.numberList('potentials'), call.numberList('n'))]],
};

const CONCCELL: FunctionSpec = {
  id: 'CONCCELL',
  ...EQUILIBRIUM,
  summary:
    "EMF in V of a concentration cell: two like electrodes whose solutions differ in one species' activity (right minus left, as IUPAC writes cells).",
  returns: 'EMF in V, one row per case',
  params: [
    { ...REACTION, description: 'The electrode couple, e.g. "Ag+/Ag" or "Cu2+/Cu"; one cell or a column of cases', noun: 'a couple such as "Ag+/Ag"' },
    { name: 'value_left', kind: 'activity', description: 'Activity of the varying species at the left electrode (mol/L, or bar for a gas)' },
    { name: 'value_right', kind: 'activity', description: 'Activity of the varying species at the right electrode (mol/L, or bar for a gas)' },
    {
      name: 'species',
      kind: 'species',
      optional: true,
      defaultText: "the couple's only dissolved species",
      description: 'The species whose activity differs',
    },
    TEMP_C,
    TABLE,
  ],
  examples: [
    { args: ['Cu2+/Cu', 0.001, 0.1], expected: 0.0591593, tolerance: 1e-7, source: `${SLOPE}: (RT ln10/2F)·log10(0.1/0.001)` },
  ],
  perCase: (a, call) => {
    const form = compiledReaction(a.text('reaction'), call.table());
    const plan = planConcentrationCell(form, a.optText('species'));
    return concentrationCellEmfV(plan, a.num('value_left'), a.num('value_right'), a.tempC());
  },
};

/** The equilibrium family, in docs order. */
export const EQUILIBRIUM_SPECS: readonly FunctionSpec[] = [
  LOGK,
  EQCONST,
  GIBBS,
  ELECTRONS,
  BALANCE,
  NERNSTSLOPE,
  COMBINE,
  CONCCELL,
];
