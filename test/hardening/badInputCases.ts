/**
 * The bad-input catalogue: every function of the catalogue × every input class that applies
 * to it, with the result the contract asks for (docs/design.md, "Errors"): the error code, and a
 * fragment of the message (a regular expression) that names the argument or the fix.
 *
 * The cases are of two sorts: derived from the function specs (every parameter gets the input
 * classes its kind implies: bad type, empty, NaN, out of domain, wrong shape, an error in an
 * input cell), with the message its kind gives; and written by hand, for the chemistry
 * (unknown couples, unbalanced rows, ambiguous names …) and for exact wordings. A hand case
 * replaces the derived case of the same function, argument and input class.
 *
 * badInputs.test.ts runs each case through its catalogue function; `npm run docs` writes
 * docs/errors.md and each function page's "Errors" from this table.
 *
 * A case with `bug` set describes behaviour the engine does not have yet: its test is marked
 * failing and the text says what it does instead. When the lead fixes it, the failing test
 * passes, jest reports that, and the `bug` field is removed.
 */
import { CATALOGUE, type Arg, type ErrorCode } from '../../src/functions/catalogue';
import { domainOf, isPerCase, kindOf, unitOf, type KindName } from '../../src/functions/spec/kinds';
import { BEYOND_EQUILIBRIUM_CASES } from './badInputCasesBeyond';
import type { ParamSpec } from '../../src/functions/spec/types';

/** The kinds of bad input a user can give. */
export const INPUT_CLASSES = [
  'empty ("")',
  'null (omitted)',
  '0 from an empty cell',
  'number for text',
  'text for a number',
  'negative',
  'zero',
  'fraction for a whole number',
  'huge (1e308)',
  'tiny (5e-324)',
  'NaN',
  'range of the wrong shape',
  'cases of different lengths',
  'unknown species',
  'unknown element symbol',
  'species the reaction needs is missing',
  'species given twice',
  'ambiguous couple',
  'unbalanced reaction',
  'reaction that cannot be balanced',
  'reaction with no unique balance',
  'electrons that do not match',
  'unbalanced user row in a table',
  'user table of the wrong shape',
  'bad number in a user table',
  'duplicate rows in a user table',
  'absurd temperature (−300 °C)',
  'temperature outside the model range',
  'unknown reference name',
  'ambiguous reference name',
  'RHE without pH',
  'bad model name',
  'bad medium name',
  'a cell where one electrode is due',
  'filter that matches nothing',
  'K beyond the number range',
  'Q beyond the number range',
  'error in an input cell',
  'below the domain',
  'above the domain',
  'temperature that looks like kelvin',
  'millivolts typed as volts',
] as const;

export type InputClass = (typeof INPUT_CLASSES)[number];

/** What the case must give. */
export type Expectation =
  /** one error cell (every cell of the result, for functions that spill per species) */
  | { readonly code: ErrorCode; readonly message: RegExp }
  /** a text result (CHECKTABLE's list of problems) matching the pattern */
  | { readonly text: RegExp }
  /** the same result as the call with these arguments (e.g. the argument omitted) */
  | { readonly same: readonly Arg[] }
  /** a number within 1e-12 */
  | { readonly value: number };

export interface BadInputCase {
  /** Catalogue id, e.g. "POTENTIAL". */
  readonly fn: string;
  /** The parameter that gets the bad input (as the spec names it). */
  readonly argument: string;
  readonly input: InputClass;
  /** The call's arguments, in parameter order. */
  readonly args: readonly Arg[];
  readonly expect: Expectation;
  /** What the message tells the user (for docs/errors.md). */
  readonly says: string;
  /** Set where the engine does not behave so yet: what it does instead (the test is marked failing). */
  readonly bug?: string;
}

const e = (code: ErrorCode, message: RegExp) => ({ code, message });
const V = (m: RegExp) => e('#VALUE!', m);
const NA = (m: RegExp) => e('#N/A', m);
const NUM = (m: RegExp) => e('#NUM!', m);

const GRID_2X2: Arg = [
  [1, 2],
  [3, 4],
];
const TEXT_2X2: Arg = [
  ['Cu2+/Cu', 'Zn2+/Zn'],
  ['Ag+/Ag', 'Fe3+/Fe2+'],
];
/** A user table whose one row does not balance (charge 1 on the left, 0 on the right). */
const UNBALANCED_CU_ROW: Arg = [['Cu2+ + e- -> Cu', 0.3]];
/** A user table with the half-reaction column only (no E°). */
const CU_ROW_WITHOUT_E0: Arg = [['Cu2+ + 2 e- -> Cu']];
const UNKNOWN = 'Tc2+/Tc';
const AMBIGUOUS = 'Br2/Br-'; // Br2(l) and Br2(aq) (MnO4-/MnO2 is one couple in acid and base through Kw)
const NOT_AN_ELEMENT = 'Xx2+/Xx';

const MISSING_REACTION = /reaction is missing: give a/;
const NOT_IN_TABLE = /not in the potentials table.*Add the half-reaction and its E° to your table/;
const MATCHES_TWO = /matches 2 half-reactions.*Write the half-reaction in full/;
const NOT_ELEMENT = /"Xx" is not an element symbol/;
const ROW_UNBALANCED = /row 1.*does not balance|does not balance.*row 1/;
const ROW_WITHOUT_E0 = /row 1 of your table.*E° must be a number in volts/;
const ABS_ZERO = /temp_C must be above absolute zero \(−273\.15 °C\)/;
const TEMP_TEXT = /temp_C must be a number in °C; got "hot"/;
const TEMP_NAN = /temp_C must be a finite/;
const TEMP_SHAPE = /temp_C must be one cell or one column with an entry per case; got a 2×2 range/;
const MV_AS_V = /of 1e\+308 V is beyond ±10 V: were millivolts typed as volts\?/;
const OVERFLOW = /not a finite number|(outside|beyond) the (spreadsheet's )?number range/;
const TEMP_HUGE = /temp_C must be between 0 and 100 °C; got 1e\+308 °C, outside the aqueous range of the data/;

/** The reaction-argument cases that every function taking a reaction shares. */
function reactionCases(
  fn: string,
  build: (reaction: Arg) => Arg[],
  opts: { table?: boolean } = {},
): BadInputCase[] {
  const cases: BadInputCase[] = [
    {
      fn,
      argument: 'reaction',
      input: 'empty ("")',
      args: build(''),
      expect: V(MISSING_REACTION),
      says: 'reaction is missing',
    },
    {
      fn,
      argument: 'reaction',
      input: 'null (omitted)',
      args: build(null),
      expect: V(MISSING_REACTION),
      says: 'reaction is missing',
    },
    {
      fn,
      argument: 'reaction',
      input: '0 from an empty cell',
      args: build(0),
      expect: V(/reaction is empty \(an empty cell reads as 0\)/),
      says: 'reaction is empty (an empty cell reads as 0): give a reaction',
    },
    {
      fn,
      argument: 'reaction',
      input: 'number for text',
      args: build(5),
      expect: V(/reaction must be a half-reaction, couple, cell diagram or reaction; got 5/),
      says: 'reaction must be a reaction, not a number',
    },
    {
      fn,
      argument: 'reaction',
      input: 'range of the wrong shape',
      args: build(TEXT_2X2),
      expect: V(/reaction must be one cell or one column with an entry per case; got a 2×2 range/),
      says: 'one cell or one column of cases, not a block',
    },
    {
      fn,
      argument: 'reaction',
      input: 'unknown species',
      args: build(UNKNOWN),
      expect: NA(NOT_IN_TABLE),
      says: 'not in the potentials table: add the half-reaction to your table',
    },
    {
      fn,
      argument: 'reaction',
      input: 'unknown element symbol',
      args: build(NOT_AN_ELEMENT),
      expect: V(NOT_ELEMENT),
      says: 'the position and the symbol that is not an element',
    },
    {
      fn,
      argument: 'reaction',
      input: 'ambiguous couple',
      args: build(AMBIGUOUS),
      expect: V(MATCHES_TWO),
      says: 'lists the matching rows: write the half-reaction in full',
    },
  ];
  if (opts.table !== false) {
    cases.push(
      {
        fn,
        argument: 'table',
        input: 'unbalanced user row in a table',
        args: build('Cu2+/Cu').map((a, i, all) => (i === all.length - 1 ? UNBALANCED_CU_ROW : a)),
        expect: V(ROW_UNBALANCED),
        says: 'the row of your table that the reaction needs does not balance (row number, elements)',
      },
      {
        fn,
        argument: 'table',
        input: 'user table of the wrong shape',
        args: build('Cu2+/Cu').map((a, i, all) => (i === all.length - 1 ? CU_ROW_WITHOUT_E0 : a)),
        expect: V(ROW_WITHOUT_E0),
        says: 'the row of your table that the reaction needs has no E°: fix the row (CHECKTABLE lists every problem)',
      },
    );
  }
  return cases;
}

/** Temperature cases for a function whose temp_C is at `index` of `base`. */
function tempCases(
  fn: string,
  base: readonly Arg[],
  index: number,
  huge = TEMP_HUGE,
  hugeSays = 'temp_C must be between 0 and 100 °C (the aqueous range of the data)',
): BadInputCase[] {
  const at = (t: Arg) => base.map((a, i) => (i === index ? t : a));
  return [
    {
      fn,
      argument: 'temp_C',
      input: 'text for a number',
      args: at('hot'),
      expect: V(TEMP_TEXT),
      says: 'temp_C must be a number in °C',
    },
    {
      fn,
      argument: 'temp_C',
      input: 'NaN',
      args: at(NaN),
      expect: V(TEMP_NAN),
      says: 'temp_C must be a finite number',
    },
    {
      fn,
      argument: 'temp_C',
      input: 'absurd temperature (−300 °C)',
      args: at(-300),
      expect: V(ABS_ZERO),
      says: 'temp_C must be above absolute zero (−273.15 °C); give it in °C',
    },
    {
      fn,
      argument: 'temp_C',
      input: 'huge (1e308)',
      args: at(1e308),
      expect: V(huge),
      says: hugeSays,
    },
    {
      fn,
      argument: 'temp_C',
      input: 'range of the wrong shape',
      args: at(GRID_2X2),
      expect: V(TEMP_SHAPE),
      says: 'one cell or one column of cases',
    },
  ];
}

const CU = 'Cu2+/Cu';

/** Cases written by hand: the chemistry-specific errors and the exact wording of the common ones. */
const HAND_CASES: readonly BadInputCase[] = [
  {
    fn: 'CONCCELL',
    argument: 'table',
    input: 'unbalanced user row in a table',
    args: ['Cu2+/Cu', 0.01, 0.1, null, null, UNBALANCED_CU_ROW],
    expect: V(ROW_UNBALANCED),
    says: 'the row of your table that the couple needs does not balance (row number, elements)',
  },
  // -------------------------------------------------------------------- POTENTIAL
  ...reactionCases('POTENTIAL', (r) => [r, null, null, null, null]),
  ...tempCases('POTENTIAL', [CU, 'Cu2+', 0.01, 25, null], 3),
  {
    fn: 'POTENTIAL',
    argument: 'values',
    input: 'text for a number',
    args: [CU, 'Cu2+', 'abc', null, null],
    expect: V(/activity of Cu2\+ must be a positive number; got "abc"/),
    says: 'the activity of the species must be a positive number',
  },
  {
    fn: 'POTENTIAL',
    argument: 'values',
    input: 'negative',
    args: [CU, 'Cu2+', -1, null, null],
    expect: V(/activity of Cu2\+ must be a positive number; got -1/),
    says: 'the activity of the species must be a positive number',
  },
  {
    fn: 'POTENTIAL',
    argument: 'values',
    input: 'zero',
    args: [CU, 'Cu2+', 0, null, null],
    expect: V(/activity of Cu2\+ must be a positive number; got 0\. An empty cell reads as 0: fill it in/),
    says: 'the activity must be positive; an empty cell reads as 0: fill it in',
  },
  {
    fn: 'POTENTIAL',
    argument: 'values',
    input: 'empty ("")',
    args: [CU, 'Cu2+', '', null, null],
    expect: V(/activity of Cu2\+ must be a positive number; got an empty cell/),
    says: 'the activity of the species is an empty cell',
  },
  {
    fn: 'POTENTIAL',
    argument: 'values',
    input: 'null (omitted)',
    args: [CU, 'Cu2+', null, null, null],
    expect: V(/values is missing: give one value per species \(Cu2\+\)/),
    says: 'values is missing: one value per species',
  },
  {
    fn: 'POTENTIAL',
    argument: 'values',
    input: 'NaN',
    args: [CU, 'Cu2+', NaN, null, null],
    expect: V(/activity of Cu2\+ must be a positive number; got NaN/),
    says: 'the activity of the species must be a positive number',
  },
  {
    fn: 'POTENTIAL',
    argument: 'values',
    input: 'range of the wrong shape',
    args: [CU, [['Cu2+', 'Zn2+']], [[1], [2], [3]], null, null],
    expect: V(
      /values is a 3×1 range but species lists 2 names: give one column per species and one row per case/,
    ),
    says: 'names both shapes: one column per species, one row per case',
  },
  {
    fn: 'POTENTIAL',
    argument: 'temp_C',
    input: 'cases of different lengths',
    args: [CU, 'Cu2+', [[1], [2], [3]], [[25], [30]], null],
    expect: V(/temp_C has 2 entries but values has 3 rows \(cases\)/),
    says: 'names both lengths: one entry per case, or one value for all',
  },
  {
    fn: 'POTENTIAL',
    argument: 'species',
    input: 'unknown element symbol',
    args: [CU, 'Xx', 1, null, null],
    expect: V(NOT_ELEMENT),
    says: 'the symbol that is not an element',
  },
  {
    fn: 'POTENTIAL',
    argument: 'species',
    input: 'species the reaction needs is missing',
    args: [CU, 'Zn2+', 1, null, null],
    expect: V(/needs a value for Cu2\+: add "Cu2\+" to species/),
    says: 'names the species to add to species and values',
  },
  {
    fn: 'POTENTIAL',
    argument: 'species',
    input: 'species given twice',
    args: [CU, [['Cu2+', 'Cu2+']], [[1, 1]], null, null],
    expect: V(/species lists "Cu2\+" twice \(columns 1 and 2\); give each species once/),
    says: 'names the species and both columns',
  },
  {
    fn: 'POTENTIAL',
    argument: 'species',
    input: '0 from an empty cell',
    args: [CU, 0, null, null, null],
    expect: { same: [CU, null, null, null, null] },
    says: 'as if omitted: standard state',
  },
  {
    fn: 'POTENTIAL',
    argument: 'table',
    input: 'unbalanced user row in a table',
    args: ['Fe3+/Fe2+', null, null, null, UNBALANCED_CU_ROW],
    expect: { value: 0.771 },
    says: 'a broken row does not break a lookup that does not need it',
  },

  // -------------------------------------------------------------------- STDPOTENTIAL
  ...reactionCases('STDPOTENTIAL', (r) => [r, null, null]),
  ...tempCases('STDPOTENTIAL', [CU, 25, null], 1),
  {
    fn: 'STDPOTENTIAL',
    argument: 'reaction',
    input: 'unbalanced reaction',
    args: ['Cu2+ + e- -> Cu', null, null],
    expect: V(
      /"Cu2\+ \+ e- -> Cu" does not balance \(charge: 1 on the left, 0 on the right\)\. Correct the coefficients\. Or let BALANCE balance it/,
    ),
    says: 'what does not balance; correct the coefficients or use BALANCE',
  },

  // -------------------------------------------------------------------- QUOTIENT, LOGQ
  ...reactionCases('QUOTIENT', (r) => [r, 'Cu2+', 0.1, null]),
  {
    fn: 'QUOTIENT',
    argument: 'values',
    input: 'negative',
    args: [CU, 'Cu2+', -0.1, null],
    expect: V(/activity of Cu2\+ must be a positive number; got -0\.1/),
    says: 'the activity of the species must be a positive number',
  },
  {
    fn: 'QUOTIENT',
    argument: 'values',
    input: 'zero',
    args: [CU, 'Cu2+', 0, null],
    expect: V(/got 0\. An empty cell reads as 0: fill it in/),
    says: 'the activity must be positive; an empty cell reads as 0',
  },
  {
    fn: 'QUOTIENT',
    argument: 'values',
    input: 'text for a number',
    args: [CU, 'Cu2+', 'abc', null],
    expect: V(/activity of Cu2\+ must be a positive number; got "abc"/),
    says: 'the activity of the species must be a positive number',
  },
  {
    fn: 'QUOTIENT',
    argument: 'values',
    input: 'Q beyond the number range',
    args: [CU, 'Cu2+', 1e308, null],
    expect: NUM(/outside the spreadsheet's number range; use LOGQ, which gives log10 Q = -308/),
    says: 'Q is outside the number range: use LOGQ (the message gives log10 Q)',
  },
  ...reactionCases('LOGQ', (r) => [r, 'Cu2+', 0.1, null]),
  {
    fn: 'LOGQ',
    argument: 'values',
    input: 'negative',
    args: [CU, 'Cu2+', -0.1, null],
    expect: V(/activity of Cu2\+ must be a positive number; got -0\.1/),
    says: 'the activity of the species must be a positive number',
  },
  {
    fn: 'LOGQ',
    argument: 'values',
    input: 'NaN',
    args: [CU, 'Cu2+', NaN, null],
    expect: V(/activity of Cu2\+ must be a positive number; got NaN/),
    says: 'the activity of the species must be a positive number',
  },
  {
    fn: 'LOGQ',
    argument: 'values',
    input: 'range of the wrong shape',
    args: [CU, [['Cu2+'], ['Zn2+']], [[1, 2, 3]], null],
    expect: V(/values is a 1×3 range but species lists 2 names/),
    says: 'names both shapes',
  },

  // -------------------------------------------------------------------- LOGK, EQCONST, GIBBS
  ...(['LOGK', 'EQCONST'] as const).flatMap((fn): BadInputCase[] => [
    {
      fn,
      argument: 'reaction_or_E',
      input: 'empty ("")',
      args: ['', 2, null, null],
      expect: V(/reaction_or_E is missing: give a reaction or a (standard )?potential in volts/),
      says: 'reaction_or_E is missing',
    },
    {
      fn,
      argument: 'reaction_or_E',
      input: 'NaN',
      args: [NaN, 2, null, null],
      expect: V(/reaction_or_E must be a finite number/),
      says: 'reaction_or_E must be a finite number',
    },
    {
      fn,
      argument: 'reaction_or_E',
      input: 'unknown species',
      args: [UNKNOWN, null, null, null],
      expect: NA(NOT_IN_TABLE),
      says: 'not in the potentials table',
    },
    {
      fn,
      argument: 'reaction_or_E',
      input: 'ambiguous couple',
      args: [AMBIGUOUS, null, null, null],
      expect: V(MATCHES_TWO),
      says: 'lists the matching rows',
    },
    {
      fn,
      argument: 'reaction_or_E',
      input: 'range of the wrong shape',
      args: [GRID_2X2, 2, null, null],
      expect: V(/reaction_or_E must be one cell or one column/),
      says: 'one cell or one column of cases',
    },
    {
      fn,
      argument: 'n',
      input: 'null (omitted)',
      args: [0.5, null, null, null],
      expect: V(
        /n is missing: when reaction_or_E is a potential \(0\.5 V\), give the electrons transferred, n/,
      ),
      says: 'n is needed when a potential is given',
    },
    {
      fn,
      argument: 'n',
      input: 'zero',
      args: [0.5, 0, null, null],
      expect: V(/n is missing: when reaction_or_E is a potential/),
      says: 'n is needed (0, an empty cell, counts as omitted)',
    },
    {
      fn,
      argument: 'n',
      input: 'negative',
      args: [0.5, -2, null, null],
      expect: V(/n \(electrons transferred\) must be a positive whole number; got -2/),
      says: 'n must be a positive whole number',
    },
    {
      fn,
      argument: 'n',
      input: 'fraction for a whole number',
      args: [0.5, 1.5, null, null],
      expect: V(/n \(electrons transferred\) must be a positive whole number; got 1\.5/),
      says: 'n must be a positive whole number',
    },
    {
      fn,
      argument: 'n',
      input: 'text for a number',
      args: [0.5, 'two', null, null],
      expect: V(/n must be a number; got "two"/),
      says: 'n must be a number',
    },
    {
      fn,
      argument: 'n',
      input: 'electrons that do not match',
      args: [CU, 3, null, null],
      expect: V(/n = 3 does not match the 2 electrons of Cu2\+\/Cu as written; leave n empty/),
      says: 'n does not match the reaction: leave n empty or scale the reaction',
    },
    ...tempCases(fn, [0.5, 2, 25, null], 2),
  ]),
  {
    fn: 'LOGK',
    argument: 'reaction_or_E',
    input: 'huge (1e308)',
    args: [1e308, 2, null, null],
    expect: V(MV_AS_V),
    says: 'beyond ±10 V: were millivolts typed as volts?',
  },
  {
    fn: 'EQCONST',
    argument: 'reaction_or_E',
    input: 'K beyond the number range',
    args: [10, 2, null, null],
    expect: NUM(
      /K = 1\.1748e\+338 is outside the spreadsheet's number range.*log10 K = 338\.07.*Use LOGK/,
    ),
    says: 'K is outside the number range: use LOGK (the message gives K and log10 K)',
  },
  {
    fn: 'EQCONST',
    argument: 'reaction_or_E',
    input: 'huge (1e308)',
    args: [1e308, 2, null, null],
    expect: V(MV_AS_V),
    says: 'beyond ±10 V: were millivolts typed as volts?',
  },
  {
    fn: 'GIBBS',
    argument: 'reaction_or_E',
    input: 'empty ("")',
    args: ['', 2, null, null],
    expect: V(/reaction_or_E is missing: give a reaction or a potential in volts/),
    says: 'reaction_or_E is missing',
  },
  {
    fn: 'GIBBS',
    argument: 'reaction_or_E',
    input: 'text for a number',
    args: ['abc', 2, null, null],
    expect: V(/Cannot read "abc".*expected a half-reaction or reaction with an arrow/),
    says: 'neither a reaction nor a number: what the text should look like',
  },
  {
    fn: 'GIBBS',
    argument: 'reaction_or_E',
    input: 'huge (1e308)',
    args: [1e308, 2, null, null],
    expect: V(MV_AS_V),
    says: 'beyond ±10 V: were millivolts typed as volts?',
  },
  {
    fn: 'GIBBS',
    argument: 'reaction_or_E',
    input: 'unknown species',
    args: [UNKNOWN, null, null, null],
    expect: NA(NOT_IN_TABLE),
    says: 'not in the potentials table',
  },
  {
    fn: 'GIBBS',
    argument: 'n',
    input: 'null (omitted)',
    args: [0.5, null, null, null],
    expect: V(
      /n is missing: when reaction_or_E is a potential \(0\.5 V\), give the electrons transferred, n/,
    ),
    says: 'n is needed when a potential is given',
  },
  {
    fn: 'GIBBS',
    argument: 'n',
    input: 'fraction for a whole number',
    args: [0.5, 1.5, null, null],
    expect: V(/n \(electrons transferred\) must be a positive whole number; got 1\.5/),
    says: 'n must be a positive whole number',
  },
  {
    fn: 'GIBBS',
    argument: 'n',
    input: 'negative',
    args: [0.5, -1, null, null],
    expect: V(/n \(electrons transferred\) must be a positive whole number; got -1/),
    says: 'n must be a positive whole number',
  },
  {
    fn: 'GIBBS',
    argument: 'n',
    input: 'range of the wrong shape',
    args: [0.5, GRID_2X2, null, null],
    expect: V(/n must be one cell or one column with an entry per case; got a 2×2 range/),
    says: 'one cell or one column of cases',
  },
  ...tempCases('GIBBS', [0.5, 2, 25, null], 2),

  // -------------------------------------------------------------------- ELECTRONS, BALANCE
  ...reactionCases('ELECTRONS', (r) => [r, null]),
  {
    fn: 'ELECTRONS',
    argument: 'reaction',
    input: 'unbalanced reaction',
    args: ['Cu2+ + e- -> Cu', null],
    expect: V(/"Cu2\+ \+ e- -> Cu" does not balance \(charge: 1 on the left, 0 on the right\)\. Use BALANCE/),
    says: 'what does not balance; use BALANCE',
  },
  ...reactionCases('BALANCE', (r) => [r, null, null]),
  {
    fn: 'BALANCE',
    argument: 'medium',
    input: 'bad medium name',
    args: ['MnO4- + Fe2+ -> Mn2+ + Fe3+', 'acidish', null],
    expect: V(/medium must be "acid", "base" or empty; got "acidish"/),
    says: 'medium must be "acid", "base" or empty',
  },
  {
    fn: 'BALANCE',
    argument: 'medium',
    input: 'number for text',
    args: ['MnO4- + Fe2+ -> Mn2+ + Fe3+', 5, null],
    expect: V(/medium must be "acid", "base" or empty; got 5/),
    says: 'medium must be "acid", "base" or empty',
  },
  {
    fn: 'BALANCE',
    argument: 'medium',
    input: '0 from an empty cell',
    args: ['Cu + Ag+ -> Cu2+ + Ag', 0, null],
    expect: { same: ['Cu + Ag+ -> Cu2+ + Ag', null, null] },
    says: 'as if omitted: no medium',
  },
  {
    fn: 'BALANCE',
    argument: 'medium',
    input: 'range of the wrong shape',
    args: [
      'MnO4- + Fe2+ -> Mn2+ + Fe3+',
      [
        ['acid', 'base'],
        ['acid', 'base'],
      ],
      null,
    ],
    expect: V(/medium must be one cell or one column with an entry per case; got a 2×2 range/),
    says: 'one cell or one column of cases',
  },
  {
    fn: 'BALANCE',
    argument: 'reaction',
    input: 'reaction that cannot be balanced',
    args: ['Cu -> Zn', null, null],
    expect: V(
      /"Cu -> Zn" cannot be balanced with these species\. If it takes place in water, try the medium "acid" or "base"/,
    ),
    says: 'cannot be balanced: check formulas and charges, or give a medium',
  },
  {
    fn: 'BALANCE',
    argument: 'reaction',
    input: 'reaction with no unique balance',
    args: ['H2 + O2 -> H2O + H2O2', null, null],
    expect: V(
      /has no unique balance: 2 independent sets of coefficients.*Balance each half-reaction separately/,
    ),
    says: 'no unique balance (a sum of independent reactions): balance each half-reaction',
  },

  // -------------------------------------------------------------------- NERNSTSLOPE
  ...tempCases(
    'NERNSTSLOPE',
    [25, 1],
    0,
    /temp_C must be > −273\.15 °C and ≤ 10000 °C; got 1e\+308 °C/,
    'temp_C must be above absolute zero and at most 10000 °C',
  ),
  {
    fn: 'NERNSTSLOPE',
    argument: 'n',
    input: 'zero',
    args: [25, 0],
    expect: V(/n must not be 0/),
    says: 'n must not be 0 (it may be negative for an anion-responsive electrode)',
  },
  {
    fn: 'NERNSTSLOPE',
    argument: 'n',
    input: 'negative',
    args: [25, -1],
    // an anion-responsive electrode: −RT ln10/F (SI 2019 exact constants, by hand)
    expect: { value: -((8.31446261815324 * 298.15 * Math.LN10) / 96485.33212331001) },
    says: 'the negative slope of an anion-responsive electrode',
  },
  {
    fn: 'NERNSTSLOPE',
    argument: 'n',
    input: 'text for a number',
    args: [25, 'two'],
    expect: V(/n must be a number; got "two"/),
    says: 'n must be a number',
  },
  {
    fn: 'NERNSTSLOPE',
    argument: 'n',
    input: 'tiny (5e-324)',
    args: [25, 5e-324],
    expect: NUM(OVERFLOW),
    says: 'not a finite number (overflow)',
  },
  {
    fn: 'NERNSTSLOPE',
    argument: 'n',
    input: 'cases of different lengths',
    args: [
      [[1], [2]],
      [[1], [2], [3]],
    ],
    expect: V(/n has 3 entries but temp_C has 2 entries: give one entry per case/),
    says: 'names both lengths',
  },

  // -------------------------------------------------------------------- CONCCELL
  {
    fn: 'CONCCELL',
    argument: 'reaction',
    input: 'empty ("")',
    args: ['', 0.1, 0.2, null, null, null],
    expect: V(/reaction is missing: give a couple such as "Ag\+\/Ag"/),
    says: 'reaction is missing: give a couple',
  },
  {
    fn: 'CONCCELL',
    argument: 'reaction',
    input: 'unknown species',
    args: [UNKNOWN, 0.1, 0.2, null, null, null],
    expect: NA(NOT_IN_TABLE),
    says: 'not in the potentials table',
  },
  {
    fn: 'CONCCELL',
    argument: 'reaction',
    input: 'ambiguous couple',
    args: [AMBIGUOUS, 0.1, 0.2, null, null, null],
    expect: V(MATCHES_TWO),
    says: 'lists the matching rows',
  },
  {
    fn: 'CONCCELL',
    argument: 'reaction',
    input: 'a cell where one electrode is due',
    args: ['Zn | Zn2+ || Cu2+ | Cu', 0.1, 0.2, null, null, null],
    expect: V(/couple must be one electrode \(a couple or half-reaction such as "Ag\+\/Ag"\), not a cell/),
    says: 'couple must be one electrode, not a cell',
  },
  ...(['value_left', 'value_right'] as const).flatMap((arg): BadInputCase[] => {
    const at = (v: Arg): Arg[] => [
      'Ag+/Ag',
      arg === 'value_left' ? v : 0.1,
      arg === 'value_right' ? v : 0.1,
      null,
      null,
      null,
    ];
    return [
      {
        fn: 'CONCCELL',
        argument: arg,
        input: 'zero',
        args: at(0),
        expect: V(new RegExp(`${arg} must be a positive activity of Ag\\+; got 0`)),
        says: `${arg} must be a positive activity`,
      },
      {
        fn: 'CONCCELL',
        argument: arg,
        input: 'negative',
        args: at(-1),
        expect: V(new RegExp(`${arg} must be ≥ 0; got -1`)),
        says: `${arg} must be a positive activity`,
      },
      {
        fn: 'CONCCELL',
        argument: arg,
        input: 'empty ("")',
        args: at(''),
        expect: V(new RegExp(`${arg} is missing: give an activity`)),
        says: `${arg} is missing`,
      },
      {
        fn: 'CONCCELL',
        argument: arg,
        input: 'text for a number',
        args: at('x'),
        expect: V(new RegExp(`${arg} must be a number; got "x"`)),
        says: `${arg} must be a number`,
      },
      {
        fn: 'CONCCELL',
        argument: arg,
        input: 'NaN',
        args: at(NaN),
        expect: V(new RegExp(`${arg} must be a finite number`)),
        says: `${arg} must be a finite number`,
      },
      {
        fn: 'CONCCELL',
        argument: arg,
        input: 'range of the wrong shape',
        args: at(GRID_2X2),
        expect: V(
          new RegExp(`${arg} must be one cell or one column with an entry per case; got a 2×2 range`),
        ),
        says: 'one cell or one column of cases',
      },
    ];
  }),
  {
    fn: 'CONCCELL',
    argument: 'species',
    input: 'unknown species',
    args: ['Ag+/Ag', 0.1, 0.2, 'Zn2+', null, null],
    expect: V(/species "Zn2\+" is not in Ag\+\/Ag; choose one of Ag\+/),
    says: 'the species is not in the couple: lists those that are',
  },
  {
    fn: 'CONCCELL',
    argument: 'species',
    input: '0 from an empty cell',
    args: ['Ag+/Ag', 0.01, 0.1, 0, null, null],
    expect: { same: ['Ag+/Ag', 0.01, 0.1, null, null, null] },
    says: 'as if omitted: the one species that can differ',
  },
  ...tempCases('CONCCELL', ['Ag+/Ag', 0.01, 0.1, null, 25, null], 4),
  // concentrated solutions (issue 13)
  ...tempCases('MEANACTCOEF', ['NaCl', 1, null, 25, null], 3),
  ...tempCases('WATERACTIVITY', ['NaCl', 1, 25, null], 2),
  ...tempCases('MOLALITY', ['NaCl', 1, 1.04, 25], 3),
  {
    fn: 'MEANACTCOEF',
    argument: 'model',
    input: 'bad model name',
    args: ['NaCl', 1, 'foo', null, null],
    expect: V(/model "foo" is not an activity model\. Use "limiting".*"pitzer"/),
    says: 'not an activity model: lists the models',
  },

  // -------------------------------------------------------------------- VSREF
  {
    fn: 'VSREF',
    argument: 'potential',
    input: 'empty ("")',
    args: ['', 'SCE', 'SHE', null, null],
    expect: V(/potential is missing: give a potential in volts/),
    says: 'potential is missing',
  },
  {
    fn: 'VSREF',
    argument: 'potential',
    input: 'text for a number',
    args: ['abc', 'SCE', 'SHE', null, null],
    expect: V(/potential must be a number in V; got "abc"/),
    says: 'potential must be a number in V',
  },
  {
    fn: 'VSREF',
    argument: 'potential',
    input: 'NaN',
    args: [NaN, 'SCE', 'SHE', null, null],
    expect: V(/potential must be a finite number/),
    says: 'potential must be a finite number',
  },
  {
    fn: 'VSREF',
    argument: 'potential',
    input: 'range of the wrong shape',
    args: [GRID_2X2, 'SCE', 'SHE', null, null],
    expect: V(/potential must be one cell or one column with an entry per case; got a 2×2 range/),
    says: 'one cell or one column of cases',
  },
  {
    fn: 'VSREF',
    argument: 'from_ref',
    input: 'empty ("")',
    args: [0.5, '', 'SHE', null, null],
    expect: V(/from_ref is missing: give a reference electrode name such as "SCE"/),
    says: 'from_ref is missing',
  },
  {
    fn: 'VSREF',
    argument: 'from_ref',
    input: 'number for text',
    args: [0.5, 5, 'SHE', null, null],
    expect: V(/from_ref must be a reference electrode name such as "SCE"; got 5/),
    says: 'from_ref must be a reference electrode name',
  },
  {
    fn: 'VSREF',
    argument: 'to_ref',
    input: 'unknown reference name',
    args: [0.5, 'SCE', 'XYZ', null, null],
    expect: NA(/to_ref "XYZ" is not a known reference electrode\. Use one of: SHE, SCE/),
    says: 'not a known reference electrode: lists the known ones',
  },
  {
    fn: 'VSREF',
    argument: 'from_ref',
    input: 'ambiguous reference name',
    args: [0.5, 'Ag/AgCl', 'SHE', null, null],
    expect: V(/from_ref "Ag\/AgCl" could be any of: Ag\/AgCl-sat-KCl .*Name the filling solution/),
    says: 'lists the candidates with their potentials: name the filling solution',
  },
  {
    fn: 'VSREF',
    argument: 'pH',
    input: 'RHE without pH',
    args: [0.5, 'RHE', 'SHE', null, null],
    expect: V(/pH is required for RHE/),
    says: 'pH is required for the RHE',
  },
  {
    fn: 'VSREF',
    argument: 'pH',
    input: 'text for a number',
    args: [0.5, 'RHE', 'SHE', 'abc', null],
    expect: V(/pH must be a number; got "abc"/),
    says: 'pH must be a number',
  },
  ...tempCases('VSREF', [0.5, 'SCE', 'SHE', null, 25], 4),

  // -------------------------------------------------------------------- E–pH (PREDOMINANT, EPHCLASS, EPHLINES)
  ...tempCases('PREDOMINANT', ['Fe', -1, 7, null, 25], 4),
  ...tempCases('EPHCLASS', ['Fe', -1, 7, null, 25], 4),
  ...tempCases('EPHLINES', ['Fe', null, 25, null, null], 2),

  // -------------------------------------------------------------------- ACTCOEF
  {
    fn: 'ACTCOEF',
    argument: 'species',
    input: 'empty ("")',
    args: ['', 0.1, null, null, null],
    expect: V(/species is missing: give an ion such as "Cu2\+"/),
    says: 'species is missing: give an ion',
  },
  {
    fn: 'ACTCOEF',
    argument: 'species',
    input: 'null (omitted)',
    args: [null, 0.1, null, null, null],
    expect: V(/species is missing: give an ion such as "Cu2\+"/),
    says: 'species is missing: give an ion',
  },
  {
    fn: 'ACTCOEF',
    argument: 'species',
    input: 'number for text',
    args: [5, 0.1, null, null, null],
    expect: V(/species must be an ion such as "Cu2\+"; got 5/),
    says: 'species must be an ion such as "Cu2+"',
  },
  {
    fn: 'ACTCOEF',
    argument: 'species',
    input: 'unknown element symbol',
    args: ['Xx2+', 0.1, null, null, null],
    expect: V(/"Xx" is not an element symbol/),
    says: 'the symbol that is not an element',
  },
  {
    fn: 'ACTCOEF',
    argument: 'ionic_strength',
    input: 'empty ("")',
    args: ['Cu2+', '', null, null, null],
    expect: V(/ionic_strength is missing: give an ionic strength in mol\/kg/),
    says: 'ionic_strength is missing',
  },
  {
    fn: 'ACTCOEF',
    argument: 'ionic_strength',
    input: 'negative',
    args: ['Cu2+', -0.1, null, null, null],
    expect: V(/ionic_strength must be ≥ 0 mol\/kg; got -0\.1 mol\/kg/),
    says: 'ionic_strength must be ≥ 0 mol/kg',
  },
  {
    fn: 'ACTCOEF',
    argument: 'ionic_strength',
    input: 'text for a number',
    args: ['Cu2+', 'x', null, null, null],
    expect: V(/ionic_strength must be a number in mol\/kg; got "x"/),
    says: 'ionic_strength must be a number in mol/kg',
  },
  {
    fn: 'ACTCOEF',
    argument: 'ionic_strength',
    input: 'NaN',
    args: ['Cu2+', NaN, null, null, null],
    expect: V(/ionic_strength must be a finite number/),
    says: 'ionic_strength must be a finite number',
  },
  {
    fn: 'ACTCOEF',
    argument: 'ionic_strength',
    input: 'huge (1e308)',
    args: ['Cu2+', 1e308, null, null, null],
    expect: V(/outside the range of the davies model \(I ≤ 0\.5 mol\/kg/),
    says: 'outside the range of the davies model (I ≤ 0.5 mol/kg): names a better model and the extrapolate flag',
  },
  {
    fn: 'ACTCOEF',
    argument: 'ionic_strength',
    input: 'range of the wrong shape',
    args: ['Cu2+', GRID_2X2, null, null, null],
    expect: V(/ionic_strength must be one cell or one column/),
    says: 'one cell or one column of cases',
  },
  {
    fn: 'ACTCOEF',
    argument: 'model',
    input: 'bad model name',
    args: ['Cu2+', 0.1, 'foo', null, null],
    expect: V(/model "foo" is not an activity model\. Use "limiting".*"extended".*"davies"/),
    says: 'not an activity model: lists limiting, extended and davies',
  },
  {
    fn: 'ACTCOEF',
    argument: 'model',
    input: '0 from an empty cell',
    args: ['Cu2+', 0.1, 0, null, null],
    expect: { same: ['Cu2+', 0.1, null, null, null] },
    says: 'as if omitted: davies',
  },
  {
    fn: 'ACTCOEF',
    argument: 'temp_C',
    input: 'absurd temperature (−300 °C)',
    args: ['Cu2+', 0.1, null, null, -300],
    expect: V(ABS_ZERO),
    says: 'temp_C must be above absolute zero (−273.15 °C); give it in °C',
  },
  {
    fn: 'ACTCOEF',
    argument: 'temp_C',
    input: 'temperature outside the model range',
    args: ['Cu2+', 0.1, null, null, 120],
    expect: V(/temp_C must be between 0 and 100 °C/),
    says: 'temp_C must be between 0 and 100 °C',
  },
  {
    fn: 'ACTCOEF',
    argument: 'ion_size',
    input: 'negative',
    args: ['Cu2+', 0.1, 'extended', -3, null],
    expect: V(/ion_size must be > 0 Å; got -3 Å/),
    says: 'ion_size must be a positive size in Å',
  },
  {
    fn: 'ACTCOEF',
    argument: 'ion_size',
    input: 'text for a number',
    args: ['Cu2+', 0.1, 'extended', 'x', null],
    expect: V(/ion_size must be a number in Å; got "x"/),
    says: 'ion_size must be a number in Å',
  },

  // -------------------------------------------------------------------- ACTIVITY, IONICSTR
  ...(['ACTIVITY', 'IONICSTR'] as const).flatMap((fn): BadInputCase[] => {
    const sp: Arg = [['Cu2+', 'SO4^2-']];
    const rest: Arg[] = fn === 'ACTIVITY' ? [null, null, null] : [];
    return [
      {
        fn,
        argument: 'values',
        input: 'negative',
        args: [sp, [[0.01, -0.01]], ...rest],
        expect: V(/value of SO4\^2- must be a finite molality ≥ 0 mol\/kg; got -0\.01/),
        says: 'the molality of the species must be ≥ 0 mol/kg',
      },
      {
        fn,
        argument: 'values',
        input: 'empty ("")',
        args: [sp, [[0.01, '']], ...rest],
        expect: V(/values \(SO4\^2-\) is missing: give a number in mol\/kg/),
        says: 'the value of the species is missing',
      },
      {
        fn,
        argument: 'values',
        input: 'text for a number',
        args: [sp, [[0.01, 'x']], ...rest],
        expect: V(/values \(SO4\^2-\) must be a number in mol\/kg; got "x"/),
        says: 'the value of the species must be a number in mol/kg',
      },
      {
        fn,
        argument: 'values',
        input: 'NaN',
        args: [sp, [[0.01, NaN]], ...rest],
        expect: V(/values \(SO4\^2-\) must be a finite number/),
        says: 'the value of the species must be a finite number',
      },
      {
        fn,
        argument: 'values',
        input: 'range of the wrong shape',
        args: [sp, [[0.01]], ...rest],
        expect: V(/values is a 1×1 range but species lists 2 names/),
        says: 'names both shapes',
      },
      {
        fn,
        argument: 'species',
        input: 'null (omitted)',
        args: [null, null, ...rest],
        expect: V(/species and values are needed/),
        says: 'species and values are needed',
      },
      {
        fn,
        argument: 'species',
        input: 'unknown element symbol',
        args: [[['Cu2+', 'Xx']], [[0.01, 0.01]], ...rest],
        expect: V(/"Xx" is not an element symbol/),
        says: 'the symbol that is not an element',
      },
      {
        fn,
        argument: 'species',
        input: 'empty ("")',
        args: [[['Cu2+', '']], [[0.01, 0.01]], ...rest],
        expect: V(/species entry 2 must be a species name such as "Cu2\+" or "pH"; got an empty cell/),
        says: 'names the empty species entry',
      },
    ];
  }),
  {
    fn: 'ACTIVITY',
    argument: 'values',
    input: 'huge (1e308)',
    args: [[['Na+', 'Cl-']], [[1e308, 1e308]], null, null, null],
    expect: NUM(/The ionic strength is beyond the number range/),
    says: 'the ionic strength is beyond the number range: check the concentrations',
  },
  {
    fn: 'ACTIVITY',
    argument: 'values',
    input: 'huge (1e308)',
    args: ['ZnO2^2-', 1e308, 7, 'davies', 0],
    expect: V(/outside the range of the davies model \(I ≤ 0\.5 mol\/kg/),
    says: 'I = 7 mol/kg is outside the range of the davies model (I ≤ 0.5 mol/kg)',
  },
  {
    fn: 'ACTIVITY',
    argument: 'model',
    input: 'bad model name',
    args: [[['Cu2+', 'SO4^2-']], [[0.01, 0.01]], null, 'foo', null],
    expect: V(/model "foo" is not an activity model/),
    says: 'not an activity model: lists the models',
  },
  {
    fn: 'ACTIVITY',
    argument: 'model',
    input: '0 from an empty cell',
    args: [[['Cu2+', 'SO4^2-']], [[0.01, 0.01]], null, 0, null],
    expect: { same: [[['Cu2+', 'SO4^2-']], [[0.01, 0.01]], null, null, null] },
    says: 'as if omitted: davies',
  },
  {
    fn: 'ACTIVITY',
    argument: 'ionic_strength',
    input: 'negative',
    args: [[['Cu2+', 'SO4^2-']], [[0.01, 0.01]], -1, null, null],
    expect: V(/ionic_strength must be ≥ 0 mol\/kg; got -1/),
    says: 'ionic_strength must be ≥ 0 mol/kg',
  },
  {
    fn: 'ACTIVITY',
    argument: 'temp_C',
    input: 'absurd temperature (−300 °C)',
    args: [[['Cu2+', 'SO4^2-']], [[0.01, 0.01]], null, null, -300],
    expect: V(ABS_ZERO),
    says: 'temp_C must be above absolute zero (−273.15 °C); give it in °C',
  },
  {
    fn: 'IONICSTR',
    argument: 'values',
    input: 'huge (1e308)',
    args: ['V2+', 1e308],
    expect: NUM(OVERFLOW),
    says: 'not a finite number (overflow)',
  },

  // -------------------------------------------------------------------- COMBINE
  {
    fn: 'COMBINE',
    argument: 'potentials',
    input: 'null (omitted)',
    args: [null, null],
    expect: V(/potentials is empty: give the E° of each step/),
    says: 'potentials is empty',
  },
  {
    fn: 'COMBINE',
    argument: 'potentials',
    input: 'empty ("")',
    args: [[[0.771, '']], [[1, 2]]],
    expect: V(/potentials \(entry 2\) is missing: give a number in V/),
    says: 'names the missing entry',
  },
  {
    fn: 'COMBINE',
    argument: 'potentials',
    input: 'text for a number',
    args: [[[0.771, 'x']], [[1, 2]]],
    expect: V(/potentials \(entry 2\) must be a number in V; got "x"/),
    says: 'names the entry that is not a number',
  },
  {
    fn: 'COMBINE',
    argument: 'potentials',
    input: 'NaN',
    args: [[[0.771, NaN]], [[1, 2]]],
    expect: V(/potentials \(entry 2\) must be a finite number/),
    says: 'names the entry that is not a finite number',
  },
  {
    fn: 'COMBINE',
    argument: 'potentials',
    input: 'range of the wrong shape',
    args: [GRID_2X2, GRID_2X2],
    expect: V(/potentials must be one row or one column; got a 2×2 range/),
    says: 'one row or one column',
  },
  {
    fn: 'COMBINE',
    argument: 'potentials',
    input: 'huge (1e308)',
    args: [1e308, 2],
    expect: NUM(OVERFLOW),
    says: 'the combined E° is beyond the number range: check the inputs',
  },
  {
    fn: 'COMBINE',
    argument: 'n',
    input: 'cases of different lengths',
    args: [[[0.771, -0.447]], [[1]]],
    expect: V(/potentials has 2 values but electrons has 1; give one electron count per step/),
    says: 'names both lengths: one electron count per step',
  },
  {
    fn: 'COMBINE',
    argument: 'n',
    input: 'zero',
    args: [[[0.771, -0.447]], [[1, 0]]],
    expect: V(/electrons \(electrons transferred\) must be a positive whole number; got 0/),
    says: 'electrons must be positive whole numbers',
  },
  {
    fn: 'COMBINE',
    argument: 'n',
    input: 'negative',
    args: [[[0.771, -0.447]], [[1, -2]]],
    expect: V(/electrons \(electrons transferred\) must be a positive whole number; got -2/),
    says: 'electrons must be positive whole numbers',
  },
  {
    fn: 'COMBINE',
    argument: 'n',
    input: 'fraction for a whole number',
    args: [[[0.771, -0.447]], [[1, 1.5]]],
    expect: V(/electrons \(electrons transferred\) must be a whole number; got 1\.5/),
    says: 'electrons must be whole numbers',
  },
  {
    fn: 'COMBINE',
    argument: 'n',
    input: 'text for a number',
    args: [[[0.771, -0.447]], [[1, 'x']]],
    expect: V(/n \(entry 2\) must be a number; got "x"/),
    says: 'names the entry that is not a number',
  },

  // -------------------------------------------------------------------- SOURCE, CELLNOTATION
  ...reactionCases('SOURCE', (r) => [r, null]),
  {
    fn: 'SOURCE',
    argument: 'reaction',
    input: 'unbalanced reaction',
    args: ['Cu2+ + e- -> Cu', null],
    expect: V(/does not balance \(charge: 1 on the left, 0 on the right\)/),
    says: 'what does not balance',
  },
  ...reactionCases('CELLNOTATION', (r) => [r, null, null, null]),
  ...reactionCases('ENTHALPY', (r) => [r, null, null]),
  ...tempCases('ENTHALPY', ['H2 + 1/2 O2 -> H2O', 25, null], 1),
  ...reactionCases('ENTROPY', (r) => [r, null, null]),
  ...tempCases('ENTROPY', ['H2 + 1/2 O2 -> H2O', 25, null], 1),
  ...reactionCases('THERMONEUTRAL', (r) => [r, null], { table: false }),
  ...tempCases('THERMONEUTRAL', ['H2O -> H2 + 1/2 O2', 25], 1),
  {
    fn: 'CELLNOTATION',
    argument: 'values',
    input: 'negative',
    args: ['Zn + Cu2+ -> Zn2+ + Cu', [['Zn2+', 'Cu2+']], [[0.1, -1]], null],
    expect: V(/activity of Cu2\+ must be a positive number; got -1/),
    says: 'the activity of the species must be a positive number',
  },
  {
    fn: 'CELLNOTATION',
    argument: 'values',
    input: 'zero',
    args: ['Zn + Cu2+ -> Zn2+ + Cu', [['Zn2+', 'Cu2+']], [[0.1, 0]], null],
    expect: V(/got 0\. An empty cell reads as 0: fill it in/),
    says: 'the activity must be positive; an empty cell reads as 0',
  },
  {
    fn: 'CELLNOTATION',
    argument: 'values',
    input: 'text for a number',
    args: ['Zn + Cu2+ -> Zn2+ + Cu', [['Zn2+', 'Cu2+']], [[0.1, 'x']], null],
    expect: V(/activity of Cu2\+ must be a positive number; got "x"/),
    says: 'the activity of the species must be a positive number',
  },
  {
    fn: 'CELLNOTATION',
    argument: 'values',
    input: 'range of the wrong shape',
    args: ['Zn + Cu2+ -> Zn2+ + Cu', [['Zn2+', 'Cu2+']], [[0.1]], null],
    expect: V(/values is a 1×1 range but species lists 2 names/),
    says: 'names both shapes',
  },
  {
    fn: 'CELLNOTATION',
    argument: 'species',
    input: 'species the reaction needs is missing',
    args: ['Zn + Cu2+ -> Zn2+ + Cu', [['Zn2+']], [[0.1]], null],
    expect: V(/needs a value for Cu2\+: add "Cu2\+" to species/),
    says: 'names the species to add',
  },

  // -------------------------------------------------------------------- LISTTABLE
  {
    fn: 'LISTTABLE',
    argument: 'filter',
    input: 'filter that matches nothing',
    args: ['Zz'],
    expect: NA(/No built-in half-reaction matches .*"Zz"/),
    says: 'no built-in half-reaction matches the filter',
  },
  {
    fn: 'LISTTABLE',
    argument: 'filter',
    input: 'number for text',
    args: [5],
    expect: V(/filter must be text such as "Fe" or "Cu2\+"; got 5/),
    says: 'filter must be text such as "Fe"',
  },
  {
    fn: 'LISTTABLE',
    argument: 'filter',
    input: 'NaN',
    args: [NaN],
    expect: V(/filter must be text such as "Fe" or "Cu2\+"; got NaN/),
    says: 'filter must be text',
  },
  {
    fn: 'LISTTABLE',
    argument: 'filter',
    input: '0 from an empty cell',
    args: [0],
    expect: { same: [null] },
    says: 'as if omitted: the whole table',
  },

  // -------------------------------------------------------------------- CHECKTABLE
  {
    fn: 'CHECKTABLE',
    argument: 'table',
    input: 'empty ("")',
    args: [''],
    expect: V(/table is empty: pass the range of your potentials table/),
    says: 'table is empty: pass the range of your potentials table',
  },
  {
    fn: 'CHECKTABLE',
    argument: 'table',
    input: 'null (omitted)',
    args: [null],
    expect: V(/table is empty: pass the range of your potentials table/),
    says: 'table is empty',
  },
  {
    fn: 'CHECKTABLE',
    argument: 'table',
    input: '0 from an empty cell',
    args: [0],
    expect: V(/table is empty: pass the range of your potentials table/),
    says: 'table is empty',
  },
  {
    fn: 'CHECKTABLE',
    argument: 'table',
    input: 'number for text',
    args: [5],
    expect: { text: /row 1: the first column must hold a half-reaction such as "Fe3\+ \+ e- -> Fe2\+"/ },
    says: 'row N: the first column must hold a half-reaction',
  },
  {
    fn: 'CHECKTABLE',
    argument: 'table',
    input: 'unbalanced user row in a table',
    args: [
      [
        ['Half-reaction', 'E0'],
        ['Cu2+ + e- -> Cu', 0.3],
      ],
    ],
    expect: { text: /row 2: "Cu2\+ \+ e- -> Cu" does not balance \(charge: 1 on the left, 0 on the right\)/ },
    says: 'row N: what does not balance',
  },
  {
    fn: 'CHECKTABLE',
    argument: 'table',
    input: 'user table of the wrong shape',
    args: [CU_ROW_WITHOUT_E0],
    expect: { text: /row 1 \("Cu2\+ \+ 2 e- -> Cu"\): E° must be a number in volts/ },
    says: 'row N: E° must be a number in volts',
  },
  {
    fn: 'CHECKTABLE',
    argument: 'table',
    input: 'bad number in a user table',
    args: [[['Cu2+ + 2 e- -> Cu', 'x']]],
    expect: { text: /row 1 \("Cu2\+ \+ 2 e- -> Cu"\): E° must be a number in volts; got "x"/ },
    says: 'row N: E° must be a number in volts',
  },
  {
    fn: 'CHECKTABLE',
    argument: 'table',
    input: 'huge (1e308)',
    args: [[['Cu2+ + 2 e- -> Cu', 1e308]]],
    expect: { text: /row 1 .*E° of 1e\+308 V is outside ±10 V; give it in volts, not millivolts/ },
    says: 'row N: E° is outside ±10 V: give it in volts, not millivolts',
  },
  {
    fn: 'CHECKTABLE',
    argument: 'table',
    input: 'text for a number',
    args: [[['Cu2+ + 2 e- -> Cu', 0.3, 'x']]],
    expect: { text: /row 1 .*dE°\/dT must be a number in mV\/K or empty; got "x"/ },
    says: 'row N: dE°/dT must be a number in mV/K or empty',
  },
  {
    fn: 'CHECKTABLE',
    argument: 'table',
    input: 'duplicate rows in a user table',
    args: [
      [
        ['Cu2+ + 2 e- -> Cu', 0.3],
        ['Cu2+ + 2 e- -> Cu', 0.4],
      ],
    ],
    expect: {
      text: /rows 1 and 2 give the same half-reaction .*with different E° \(0\.3 V and 0\.4 V\); keep one/,
    },
    says: 'rows N and M give the same half-reaction: keep one',
  },
  {
    fn: 'CHECKTABLE',
    argument: 'table',
    input: 'unknown element symbol',
    args: [[['Xx2+ + 2 e- -> Xx', 0.3]]],
    expect: { text: /row 1: .*"Xx" is not an element symbol/ },
    says: 'row N: the symbol that is not an element',
  },
];

/** The result column of a case: the error code, or what it returns instead. */
export function resultLabel(c: BadInputCase): string {
  const x = c.expect;
  if ('code' in x) return x.code;
  if ('text' in x) return 'text (one line per problem)';
  if ('same' in x) return 'as if omitted';
  return 'a number';
}


// ---------------------------------------------------------------------------------------
// Cases derived from the specs, by parameter kind

const esc = (t: string) => t.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
const TEXT_KINDS: readonly KindName[] = ['reaction', 'species', 'choice', 'text', 'reference', 'salt', 'element'];

/** The derived cases of one parameter of one function, from `base` (a valid call). */
function paramCases(fn: string, params: readonly ParamSpec[], base: readonly Arg[], index: number): BadInputCase[] {
  const p = params[index]!;
  const k = kindOf(p);
  const name = esc(p.name);
  const at = (v: Arg) => base.map((a, i) => (i === index ? v : a));
  const out: BadInputCase[] = [];
  const add = (input: InputClass, args: readonly Arg[], expect: Expectation, says: string) =>
    out.push({ fn, argument: p.name, input, args, expect, says });
  if (k.shape === 'cell') {
    add('error in an input cell', at('#N/A'), NA(new RegExp(`${name} holds the error #N/A from its cell`)), `${p.name} holds #N/A from its cell: fix that cell first`);
    if (isPerCase(p)) add('range of the wrong shape', at(GRID_2X2), V(new RegExp(`${name} must be one cell or one column with an entry per case; got a 2×2 range`)), 'one cell or one column of cases, not a block');
    if (!p.optional) add('empty ("")', at(''), V(new RegExp(`${name} is missing: give`)), `${p.name} is missing`);
    if (TEXT_KINDS.includes(p.kind)) add('number for text', at(5), V(new RegExp(`${name} must be .*; got 5`)), `${p.name} must be text`);
    if (k.value === 'number') {
      const unit = unitOf(p);
      add('text for a number', at('abc'), V(new RegExp(`${name} must be a number${unit ? ` in ${esc(unit)}` : ''}; got "abc"`)), `${p.name} must be a number${unit ? ` in ${unit}` : ''}`);
      add('NaN', at(NaN), V(new RegExp(`${name} must be a finite`)), `${p.name} must be a finite number`);
      const d = domainOf(p);
      if (p.kind === 'temperature') {
        if (d && d.max === 100) add('temperature that looks like kelvin', at(298.15), V(/temp_C must be between 0 and 100 °C; got 298\.15 °C: it looks like a temperature in kelvin; give it in °C \(298\.15 K is 25 °C\)/), 'looks like kelvin: give it in °C');
      } else if (d && p.kind !== 'electrons') {
        if (d.min !== undefined) add('below the domain', at(d.min - 1), V(new RegExp(`${name} must be (between|[≥>])`)), `${p.name} must be ${d.minExclusive ? '>' : '≥'} ${d.min}${unit ? ` ${unit}` : ''}`);
        if (d.max !== undefined) add('above the domain', at(d.max + 1), V(new RegExp(`${name} must be .*${esc(String(d.max))}`)), `${p.name} must be ≤ ${d.max}${unit ? ` ${unit}` : ''}`);
      }
      if (p.kind === 'potential' && !p.allowBeyond10V) add('millivolts typed as volts', at(250), V(/of 250 V is beyond ±10 V: were millivolts typed as volts\? Give 0\.25 for 250 mV/), 'beyond ±10 V: were millivolts typed as volts?');
    }
  } else if (k.shape === 'values') {
    const headers = base[params.findIndex((q) => q.name === (p.headerParam ?? 'species'))];
    const first = Array.isArray(headers) ? String(headers[0]?.[0]) : String(headers);
    const v = base[index];
    const grid: Arg = Array.isArray(v) ? v.map((row, r) => row.map((c, j) => (r === 0 && j === 0 ? '#N/A' : c))) : '#N/A';
    add('error in an input cell', at(grid), NA(new RegExp(`${name} \\(${esc(first)}\\) holds the error #N/A from its cell`)), `${p.name} holds #N/A in a cell: that case gives #N/A`);
  } else if (k.shape === 'list') {
    add('error in an input cell', at([['#N/A', 1]]), NA(new RegExp(`${name} \\(entry 1\\) holds the error #N/A from its cell`)), `an entry of ${p.name} holds #N/A`);
  } else if (k.shape === 'header') {
    add('error in an input cell', at('#N/A'), NA(new RegExp(`${name} entry 1 holds the error #N/A from its cell`)), `a name in ${p.name} holds #N/A`);
  }
  return out;
}

function derivedCases(): BadInputCase[] {
  return CATALOGUE.flatMap((f) => {
    const ex = f.examples[0];
    if (!ex) return [];
    const base = f.params.map((_, i) => (i < ex.args.length ? ex.args[i] : null));
    return f.params.flatMap((_, i) => paramCases(f.id, f.params, base, i));
  });
}

const key = (c: BadInputCase) => `${c.fn}|${c.argument}|${c.input}`;
const ALL_HAND_CASES: readonly BadInputCase[] = [...HAND_CASES, ...BEYOND_EQUILIBRIUM_CASES];
const HAND_KEYS = new Set(ALL_HAND_CASES.map(key));

/** Every case: the derived ones that no hand case replaces, then the hand cases. */
export const BAD_INPUT_CASES: readonly BadInputCase[] = [
  ...derivedCases().filter((c) => !HAND_KEYS.has(key(c))),
  ...ALL_HAND_CASES,
];
