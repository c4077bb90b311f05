/**
 * Hand-written bad-input cases of the Faraday, corrosion, kinetics and measurement
 * functions: the chemistry-specific errors (no solid in a half-reaction, a species that is
 * not in the reaction, a current beyond the limiting current …) and the reaction-argument
 * classes every function taking a reaction must cover. The input classes each parameter's
 * kind implies are derived in badInputCases.ts; these join its hand cases.
 */
import type { Arg, ErrorCode } from '../../src/functions/catalogue';
import type { BadInputCase, InputClass } from './badInputCases';

const V = (message: RegExp) => ({ code: '#VALUE!' as ErrorCode, message });
const NA = (message: RegExp) => ({ code: '#N/A' as ErrorCode, message });

const MISSING_REACTION = /reaction is missing: give a/;
const NOT_IN_TABLE = /not in the potentials table/;
const MATCHES_TWO = /matches 2 half-reactions/;
/** A user table whose one row does not balance (charge 1 on the left, 0 on the right). */
const UNBALANCED_CU_ROW: Arg = [['Cu2+ + e- -> Cu', 0.3]];

function c(
  fn: string,
  argument: string,
  input: InputClass,
  args: readonly Arg[],
  expect: BadInputCase['expect'],
  says: string,
): BadInputCase {
  return { fn, argument, input, args, expect, says };
}

/** The reaction classes for a function whose reaction is its first argument. */
function reactionClasses(fn: string, rest: readonly Arg[]): BadInputCase[] {
  return [
    c(fn, 'reaction', 'empty ("")', ['', ...rest], V(MISSING_REACTION), 'reaction is missing'),
    c(
      fn,
      'reaction',
      'unknown species',
      ['Tc2+/Tc', ...rest],
      NA(NOT_IN_TABLE),
      'a couple not in the potentials table',
    ),
    c(
      fn,
      'reaction',
      'ambiguous couple',
      ['Br2/Br-', ...rest], // Br2(l) and Br2(aq); MnO4-/MnO2 is one couple in acid and base through Kw
      V(MATCHES_TWO),
      'lists the matching rows: write the half-reaction in full',
    ),
    c(
      fn,
      'reaction',
      'unknown element symbol',
      ['Xx2+ + 2 e- -> Xx', ...rest],
      V(/"Xx" is not an element symbol/),
      'the symbol that is not an element',
    ),
    c(
      fn,
      'reaction',
      'unbalanced reaction',
      ['Cu2+ + e- -> Cu', ...rest],
      V(/does not balance|not balanced/),
      'the half-reaction does not balance',
    ),
  ];
}

/** −300 °C for a function whose temp_C is at `index`. */
function absurdTemperature(fn: string, before: readonly Arg[], index: number): BadInputCase[] {
  const args = [...before.slice(0, index), -300];
  return [
    c(
      fn,
      'temp_C',
      'absurd temperature (−300 °C)',
      args,
      V(/temp_C must be above absolute zero \(−273\.15 °C\)/),
      'temp_C must be above absolute zero (−273.15 °C); give it in °C',
    ),
  ];
}

export const BEYOND_EQUILIBRIUM_CASES: readonly BadInputCase[] = [
  ...reactionClasses('DEPOSIT', [1000]),
  ...reactionClasses('PLATETIME', [25, 200, 8.96]),
  ...reactionClasses('THICKNESS', [200, 3600, 8.96]),
  c(
    'DEPOSIT',
    'reaction',
    'species the reaction needs is missing',
    ['2 H+ + 2 e- -> H2', 1000],
    V(/has no solid species, so nothing is deposited/),
    'no solid in the half-reaction: nothing is deposited',
  ),
  c(
    'DEPOSIT',
    'reaction',
    'a cell where one electrode is due',
    ['Zn | Zn2+ || Cu2+ | Cu', 1000],
    V(/is not a half-reaction/),
    'give a half-reaction, not a cell',
  ),
  c(
    'DEPOSIT',
    'reaction',
    'reaction with no unique balance',
    ['PbSO4 + 2 e- -> Pb + SO4^2-', 1000],
    V(/solids on both sides/),
    'solids on both sides: the mass is not one species’ mass',
  ),
  c(
    'CAPACITY',
    'basis',
    'unknown species',
    ['Li+ + e- -> Li', 'Na'],
    V(/basis "Na" is not a species of/),
    'the basis must be a species of the reaction',
  ),
  c(
    'CAPACITY',
    'reaction_or_species',
    'species the reaction needs is missing',
    ['LiCoO2'],
    V(/Give the electrons per formula unit/),
    'a compound needs its electrons per formula unit',
  ),
  c(
    'SPECENERGY',
    'cell_reaction',
    'a cell where one electrode is due',
    ['Zn2+ + 2 e- -> Zn'],
    V(/needs a whole cell reaction/),
    'a half-reaction has no specific energy: give the cell reaction',
  ),
  c(
    'SPECENERGY',
    'cell_reaction',
    'unbalanced reaction',
    ['Zn + Cu2+ -> Zn2+'],
    V(/does not balance|not balanced/),
    'the cell reaction does not balance',
  ),
  c(
    'SPECENERGY',
    'cell_reaction',
    'K beyond the number range',
    ['Cu + Zn2+ -> Cu2+ + Zn'],
    V(/gives no energy; write the discharge reaction/),
    'E° ≤ 0 as written: write the discharge reaction',
  ),
  c(
    'CORRATE',
    'metal_or_alloy',
    'unknown species',
    ['unobtainium', 1],
    NA(/is not a metal or alloy this function knows/),
    'not a listed metal or alloy: give density and equivalent weight',
  ),
  c(
    'CORRATE',
    'metal_or_alloy',
    'unknown element symbol',
    ['Cu 90, Xx 10', 1, 8.9],
    V(/"Xx" in the composition is not an element symbol/),
    'a composition with an unknown element',
  ),
  c(
    'MASSLOSS',
    'metal_or_alloy',
    'unknown species',
    ['unobtainium', 1],
    NA(/is not a metal or alloy this function knows/),
    'not a listed metal or alloy: give the equivalent weight',
  ),
  c(
    'ANODELIFE',
    'capacity_Ah_kg',
    'text for a number',
    [100, 'abc', 0.5],
    V(/capacity_Ah_kg must be a number in Ah\/kg or an anode material.*got "abc"/),
    'a number in Ah/kg or a listed anode material',
  ),
  c(
    'ANODELIFE',
    'utilisation',
    'text for a number',
    [100, 780, 0.5, 'abc'],
    V(/utilisation must be a number.*got "abc"/),
    'a fraction or a listed anode type',
  ),
  c(
    'ANODELIFE',
    'capacity_Ah_kg',
    'unknown species',
    [100, 'copper', 0.5],
    V(/capacity_Ah_kg must be a number in Ah\/kg or an anode material/),
    'a number in Ah/kg or a listed anode material',
  ),
  c(
    'ANODELIFE',
    'utilisation',
    'unknown species',
    [100, 780, 0.5, 'teardrop'],
    V(/utilisation must be a number.*or an anode type/),
    'a fraction or a listed anode type',
  ),
  c(
    'OVERPOTENTIAL',
    'i',
    'above the domain',
    [0.02, 1e-3, 0.5, null, 25, 0.01],
    V(/at or beyond the anodic limiting current/),
    'a current beyond the limiting current has no overpotential',
  ),
  c(
    'OVERPOTENTIAL',
    'i_lim',
    'range of the wrong shape',
    [1e-3, 1e-3, 0.5, null, 25, [[1, 2, 3]]],
    V(/i_lim has 3 values; give one/),
    'one limit or two (anodic, cathodic)',
  ),
  c(
    'BVCURRENT',
    'alpha_c',
    'zero',
    [0.05, 1e-3, 1],
    V(/alpha_c = 1 − alpha_a = 0/),
    'alpha_a = 1 needs an explicit alpha_c',
  ),
  c(
    'MIXEDPOTENTIAL',
    'E_c',
    'below the domain',
    [0.2, 1e-6, 0.06, 0.1, 1e-7, 0.12],
    V(/E_c \(0.1 V\) must lie above E_a/),
    'the cathodic reaction must lie above the anodic one',
  ),
  c(
    'MIXEDPOTENTIAL',
    'i0_c',
    'tiny (5e-324)',
    [-0.5, 1, 0.06, 0, 5e-324, 0.12],
    V(/outside E_a … E_c.*full Butler–Volmer currents/),
    'the Tafel lines cross outside E_a … E_c: use the Butler–Volmer form',
  ),
  ...reactionClasses('SOLVEFOR', [0.3, 'Cu2+']),
  ...absurdTemperature('SPECENERGY', ['Zn + Cu2+ -> Zn2+ + Cu'], 1),
  ...absurdTemperature('SOLVEFOR', ['Cu2+/Cu', 0.3, 'Cu2+', null, null], 5),
  ...absurdTemperature('JUNCTION', [[['HCl', 'KCl']], [[0.1, 0]], [[0, 0.1]]], 3),
  ...absurdTemperature('BVCURRENT', [0.05, 1e-3, 0.5, null], 4),
  ...absurdTemperature('OVERPOTENTIAL', [1e-3, 1e-3, 0.5, null], 4),
  ...absurdTemperature('TAFELSLOPE', [0.5], 1),
  // the kinetics range is −80…200 °C, so 298.15 looks like kelvin there too
  c(
    'TAFELSLOPE',
    'temp_C',
    'temperature that looks like kelvin',
    [0.5, 298.15],
    V(/it looks like a temperature in kelvin; give it in °C \(298\.15 K is 25 °C\)/),
    'looks like kelvin: give it in °C',
  ),
  c(
    'BVCURRENT',
    'temp_C',
    'temperature that looks like kelvin',
    [0.05, 1e-3, 0.5, null, 310.15],
    V(/it looks like a temperature in kelvin; give it in °C \(310\.15 K is 37 °C\)/),
    'looks like kelvin: give it in °C',
  ),
  c(
    'OVERPOTENTIAL',
    'temp_C',
    'temperature that looks like kelvin',
    [1e-3, 1e-3, 0.5, null, 298.15],
    V(/it looks like a temperature in kelvin/),
    'looks like kelvin: give it in °C',
  ),
  c(
    'SOLVEFOR',
    'table',
    'unbalanced user row in a table',
    ['Cu2+/Cu', 0.3, 'Cu2+', null, null, 25, UNBALANCED_CU_ROW],
    V(/row 1.*does not balance|does not balance.*row 1/),
    'the row of your table that the reaction needs does not balance',
  ),
  c(
    'SOLVEFOR',
    'unknown',
    'unknown species',
    ['Cu2+/Cu', 0.3, 'Zn2+'],
    V(/"Zn2\+" does not appear in/),
    'the unknown is not a species of the reaction',
  ),
  c(
    'SOLVEFOR',
    'unknown',
    'species given twice',
    ['Ag | Ag+ || Ag+ | Ag', 0.05, 'Ag+'],
    V(/does not depend on "Ag\+"/),
    'the species cancels: no unique value',
  ),
  c(
    'JUNCTION',
    'species',
    'unknown species',
    [[['Xe+', 'Cl-']], [[0.1, 0.1]], [[0.1, 0.1]]],
    NA(/No limiting ionic conductivity is listed for Xe\+/),
    'no conductivity listed for the ion',
  ),
  c(
    'JUNCTION',
    'left_values',
    'species the reaction needs is missing',
    [[['H+']], [[0.1]], [[0.1]]],
    V(/not electroneutral/),
    'each solution must be electroneutral: give every ion',
  ),
  c(
    'ISERESPONSE',
    'primary',
    'unknown species',
    [0.2, 0.059, [['K']], [[1e-3]]],
    V(/has no charge/),
    'the primary ion must carry a charge',
  ),
  c(
    'ISERESPONSE',
    'selectivities',
    'range of the wrong shape',
    [0.2, 0.059, [['K+', 'Na+']], [[1e-3, 0.1]], [[1, 2, 3]]],
    V(/selectivities has 3 values for 1 interfering ions/),
    'one selectivity coefficient per interfering ion',
  ),
];
