/**
 * Balancing: balance checks, skeleton redox equations in acid and base, half-reaction
 * skeletons, combining half-reactions by the LCM of their electrons, and the errors.
 *
 * Every balanced result is checked three ways: against the known balanced equation
 * (coefficients, order-independent), by the engine's checkBalance, and by the element and
 * charge counter below, which is written for this test and shares no code with the engine.
 * The known equations are the standard ones of redox chemistry ("common practice") unless a
 * comment names a publication.
 */
import {
  EngineError,
  balanceSkeleton,
  checkBalance,
  combineHalfReactions,
  formatReaction,
  parseMedium,
  parseReaction,
  type Medium,
} from '../../src/engine';
import { engineErrorOf } from '../support';

// ---------------------------------------------------------------------------------------
// An independent reader of canonical reaction text: "2 MnO4- + 16 H+ -> 2 Mn2+ + 8 H2O".
// Species: "e-"; formula with (), [] and a hydrate dot; charge "^2-", "^+", "]3-", or one
// trailing sign (a single digit before it is the charge of a monatomic non-halide ion, as
// in "Fe3+"; otherwise the charge is ±1, as in "MnO4-"); optional phase "(s)", "(aq)", ….
// ---------------------------------------------------------------------------------------

const SYMBOLS = new Set(
  (
    'H He Li Be B C N O F Ne Na Mg Al Si P S Cl Ar K Ca Sc Ti V Cr Mn Fe Co Ni Cu Zn Ga Ge As Se Br ' +
    'Kr Rb Sr Y Zr Nb Mo Tc Ru Rh Pd Ag Cd In Sn Sb Te I Xe Cs Ba La Ce Pt Au Hg Tl Pb Bi U'
  ).split(' '),
);
const HALOGENS = new Set(['F', 'Cl', 'Br', 'I']);

type Counts = Map<string, bigint>;

function countFormula(formula: string): Counts {
  let i = 0;
  const num = (): bigint => {
    const m = /^\d+/.exec(formula.slice(i));
    if (!m) return 1n;
    i += m[0].length;
    return BigInt(m[0]);
  };
  const add = (into: Counts, from: Counts, k: bigint) => {
    for (const [el, n] of from) into.set(el, (into.get(el) ?? 0n) + n * k);
  };
  const group = (close: string | null): Counts => {
    const out: Counts = new Map();
    while (i < formula.length) {
      const ch = formula.charAt(i);
      if (ch === close) return out;
      if (ch === '(' || ch === '[') {
        i++;
        const inner = group(ch === '(' ? ')' : ']');
        i++;
        add(out, inner, num());
      } else if (ch === '·') {
        i++;
        const k = num();
        add(out, group(null), k);
      } else {
        const m = /^[A-Z][a-z]?/.exec(formula.slice(i));
        if (!m || !SYMBOLS.has(m[0])) throw new Error(`test counter: cannot read "${formula}" at ${i}`);
        i += m[0].length;
        add(out, new Map([[m[0], 1n]]), num());
      }
    }
    if (close !== null) throw new Error(`test counter: unclosed group in "${formula}"`);
    return out;
  };
  return group(null);
}

interface TestSpecies {
  key: string; // formula|charge
  atoms: Counts;
  charge: bigint;
}

function readSpecies(text: string): TestSpecies {
  const t = text.replace(/\((s|l|g|aq)\)$/, '');
  if (t === 'e-') return { key: 'e|-1', atoms: new Map(), charge: -1n };
  let formula = t;
  let charge = 0n;
  let m: RegExpExecArray | null;
  if ((m = /^(.*)\^(\d*)([+-])$/.exec(t))) {
    formula = m[1]!;
    charge = BigInt(m[2] === '' ? 1 : Number(m[2])) * (m[3] === '+' ? 1n : -1n);
  } else if ((m = /^(.*\])(\d*)([+-])$/.exec(t))) {
    formula = m[1]!;
    charge = BigInt(m[2] === '' ? 1 : Number(m[2])) * (m[3] === '+' ? 1n : -1n);
  } else if ((m = /^(.*?)([+-])$/.exec(t))) {
    const body = m[1]!;
    const sign = m[2] === '+' ? 1n : -1n;
    const mono = /^([A-Z][a-z]?)(\d)$/.exec(body);
    if (mono && !(HALOGENS.has(mono[1]!) && sign < 0n)) {
      formula = mono[1]!;
      charge = BigInt(mono[2]!) * sign;
    } else {
      formula = body;
      charge = sign;
    }
  }
  return { key: `${formula}|${charge}`, atoms: countFormula(formula), charge };
}

interface TestTerm {
  coef: { num: bigint; den: bigint };
  species: TestSpecies;
}

function readSide(side: string): TestTerm[] {
  return side.split(' + ').map((term) => {
    const m = /^(?:(\d+)(?:\/(\d+))? )?(\S+)$/.exec(term.trim());
    if (!m) throw new Error(`test reader: cannot read term "${term}"`);
    return {
      coef: { num: BigInt(m[1] ?? '1'), den: BigInt(m[2] ?? '1') },
      species: readSpecies(m[3]!),
    };
  });
}

function readEquation(text: string): { left: TestTerm[]; right: TestTerm[] } {
  const parts = text.split(' -> ');
  if (parts.length !== 2) throw new Error(`test reader: expected one " -> " in "${text}"`);
  return { left: readSide(parts[0]!), right: readSide(parts[1]!) };
}

/** Signed coefficients by species (products +, reactants −) as "num/den" text. */
function coefficients(text: string): Record<string, string> {
  const { left, right } = readEquation(text);
  const out: Record<string, string> = {};
  const put = (t: TestTerm, sign: bigint) => {
    if (out[t.species.key] !== undefined) throw new Error(`test reader: ${t.species.key} twice in "${text}"`);
    out[t.species.key] = `${sign * t.coef.num}/${t.coef.den}`;
  };
  left.forEach((t) => put(t, -1n));
  right.forEach((t) => put(t, 1n));
  return out;
}

/** Element and charge totals left minus right, times the common denominator; all zero when balanced. */
function imbalance(text: string): Record<string, string> {
  const { left, right } = readEquation(text);
  const den = [...left, ...right].reduce((d, t) => d * t.coef.den, 1n);
  const tally = new Map<string, bigint>();
  const addSide = (terms: TestTerm[], sign: bigint) => {
    for (const t of terms) {
      const k = (sign * t.coef.num * den) / t.coef.den;
      for (const [el, n] of t.species.atoms) tally.set(el, (tally.get(el) ?? 0n) + k * n);
      tally.set('charge', (tally.get('charge') ?? 0n) + k * t.species.charge);
    }
  };
  addSide(left, 1n);
  addSide(right, -1n);
  const out: Record<string, string> = {};
  for (const [k, v] of tally) if (v !== 0n) out[k] = v.toString();
  return out;
}


describe('the test-local counter itself', () => {
  test.each([
    ['MnO4- + 8 H+ + 5 e- -> Mn2+ + 4 H2O', {}], // OSX App. L (seen)
    ['Cu2+ + e- -> Cu', { charge: '1' }],
    ['2 [Al(OH)4]- -> Al', { Al: '1', O: '8', H: '8', charge: '-2' }],
    ['CuSO4·5H2O -> CuSO4 + 5 H2O', {}],
    ['1/2 O2 + 2 H+ + 2 e- -> H2O', {}],
    ['I3- -> 3 I-', { charge: '2' }],
  ])('%s: imbalance %o', (text, expected) => {
    expect(imbalance(text)).toEqual(expected);
  });
});

// ---------------------------------------------------------------------------------------
// checkBalance
// ---------------------------------------------------------------------------------------

describe('checkBalance', () => {
  // prettier-ignore
  const cases: [string, boolean, string[]][] = [
    ['MnO4- + 8 H+ + 5 e- -> Mn2+ + 4 H2O', true, []],                        // OSX App. L (seen)
    ['Cr2O7^2- + 14 H+ + 6 e- -> 2 Cr3+ + 7 H2O', true, []],                 // OSX App. L (seen)
    ['1/2 O2 + 2 H+ + 2 e- -> H2O', true, []],                               // OSX App. L, halved (seen)
    ['PbO2 + Pb + 2 SO4^2- + 4 H+ -> 2 PbSO4 + 2 H2O', true, []],            // lead–acid cell (common practice)
    ['Cu2+ + e- -> Cu', false, ['charge: 1 on the left, 0 on the right']],
    ['Fe + O2 -> Fe2O3', false, ['Fe: 1 on the left, 2 on the right', 'O: 2 on the left, 3 on the right']],
    ['MnO4- + 8 H+ + 5 e- -> Mn2+ + 3 H2O', false, ['O: 4 on the left, 3 on the right', 'H: 8 on the left, 6 on the right']],
  ];
  test.each(cases)('%s: balanced %s', (text, balanced, problems) => {
    const c = checkBalance(parseReaction(text));
    expect(c.balanced).toBe(balanced);
    expect([...c.problems].sort()).toEqual([...problems].sort());
    expect(Object.keys(imbalance(text)).length === 0).toBe(balanced); // the independent counter agrees
  });
});

// ---------------------------------------------------------------------------------------
// Skeleton equations
// ---------------------------------------------------------------------------------------

/** Asserts that the engine's balance of `skeleton` in `medium` is `expected`. */
function expectBalance(skeleton: string, medium: Medium, expected: string, electrons: number): void {
  // the expected equation itself balances (guards the test data)
  expect(imbalance(expected)).toEqual({});
  const b = balanceSkeleton(parseReaction(skeleton), medium);
  const text = formatReaction(b.reaction);
  expect(coefficients(text)).toEqual(coefficients(expected));
  expect(b.electrons).toBe(electrons);
  expect(checkBalance(b.reaction).balanced).toBe(true);
  expect(imbalance(text)).toEqual({}); // every element and the charge, by the independent counter
  // smallest whole numbers
  const { left, right } = readEquation(text);
  for (const t of [...left, ...right]) expect(t.coef.den).toBe(1n);
  // the medium adds only its own species
  if (medium === 'acid') expect(text).not.toMatch(/(^| )OH-( |$)/);
  if (medium === 'base') expect(text).not.toMatch(/(^| )H\+( |$)/);
}

describe('balanceSkeleton: redox equations', () => {
  // [skeleton, medium, balanced equation, source]
  // prettier-ignore
  const cases: [string, Medium, string, string][] = [
    ['MnO4- + Fe2+ -> Mn2+ + Fe3+', 'acid', 'MnO4- + 5 Fe2+ + 8 H+ -> Mn2+ + 5 Fe3+ + 4 H2O', 'permanganate–iron(II) titration (common practice)'],
    ['Cr2O7^2- + Fe2+ -> Cr3+ + Fe3+', 'acid', 'Cr2O7^2- + 6 Fe2+ + 14 H+ -> 2 Cr3+ + 6 Fe3+ + 7 H2O', 'dichromate–iron(II) titration (common practice)'],
    ['Cr2O7^2- + I- -> Cr3+ + I2', 'acid', 'Cr2O7^2- + 6 I- + 14 H+ -> 2 Cr3+ + 3 I2 + 7 H2O', 'dichromate–iodide (common practice)'],
    ['MnO4- + C2O4^2- -> Mn2+ + CO2', 'acid', '2 MnO4- + 5 C2O4^2- + 16 H+ -> 2 Mn2+ + 10 CO2 + 8 H2O', 'permanganate standardised on oxalate (common practice)'],
    ['MnO4- + I- -> MnO2 + I2', 'base', '2 MnO4- + 6 I- + 4 H2O -> 2 MnO2 + 3 I2 + 8 OH-', 'permanganate–iodide in base (common practice)'],
    ['Cu + NO3- -> Cu2+ + NO', 'acid', '3 Cu + 2 NO3- + 8 H+ -> 3 Cu2+ + 2 NO + 4 H2O', 'copper in dilute nitric acid (common practice)'],
    ['Zn + NO3- -> Zn2+ + NH4+', 'acid', '4 Zn + NO3- + 10 H+ -> 4 Zn2+ + NH4+ + 3 H2O', 'zinc in very dilute nitric acid (common practice)'],
    ['H2O2 + I- -> I2 + H2O', 'acid', 'H2O2 + 2 I- + 2 H+ -> I2 + 2 H2O', 'peroxide–iodide (common practice)'],
    ['Cl2 -> Cl- + ClO3-', 'base', '3 Cl2 + 6 OH- -> 5 Cl- + ClO3- + 3 H2O', 'chlorine disproportionation in hot base (common practice)'],
    ['Cl2 -> Cl- + ClO-', 'base', 'Cl2 + 2 OH- -> Cl- + ClO- + H2O', 'chlorine disproportionation in cold base, bleach (common practice)'],
    ['Br2 -> Br- + BrO3-', 'base', '3 Br2 + 6 OH- -> 5 Br- + BrO3- + 3 H2O', 'bromine disproportionation in base (common practice)'],
    ['MnO4- + SO3^2- -> MnO2 + SO4^2-', 'base', '2 MnO4- + 3 SO3^2- + H2O -> 2 MnO2 + 3 SO4^2- + 2 OH-', 'permanganate–sulfite in base (common practice)'],
    ['Ag + NO3- -> Ag+ + NO2', 'acid', 'Ag + NO3- + 2 H+ -> Ag+ + NO2 + H2O', 'silver in concentrated nitric acid (common practice)'],
    ['Fe2+ + H2O2 -> Fe3+ + H2O', 'acid', '2 Fe2+ + H2O2 + 2 H+ -> 2 Fe3+ + 2 H2O', 'Fenton oxidation of iron(II) (common practice)'],
    ['Sn2+ + Fe3+ -> Sn4+ + Fe2+', null, 'Sn2+ + 2 Fe3+ -> Sn4+ + 2 Fe2+', 'tin(II) reduction of iron(III) (common practice)'],
    ['ClO3- + I- -> Cl- + I2', 'acid', 'ClO3- + 6 I- + 6 H+ -> Cl- + 3 I2 + 3 H2O', 'chlorate–iodide (common practice)'],
    ['Cu + SO4^2- -> Cu2+ + SO2', 'acid', 'Cu + SO4^2- + 4 H+ -> Cu2+ + SO2 + 2 H2O', 'copper in hot concentrated sulfuric acid (common practice)'],
    ['MnO4- + H2S -> Mn2+ + S', 'acid', '2 MnO4- + 5 H2S + 6 H+ -> 2 Mn2+ + 5 S + 8 H2O', 'permanganate–hydrogen sulfide (common practice)'],
    ['IO3- + I- -> I2', 'acid', 'IO3- + 5 I- + 6 H+ -> 3 I2 + 3 H2O', 'iodate–iodide comproportionation (common practice)'],
    ['CrO4^2- + Fe(OH)2 -> Cr(OH)3 + Fe(OH)3', 'base', 'CrO4^2- + 3 Fe(OH)2 + 4 H2O -> Cr(OH)3 + 3 Fe(OH)3 + 2 OH-', 'chromate–iron(II) hydroxide in base (common practice)'],
    ['Al + OH- -> [Al(OH)4]- + H2', 'base', '2 Al + 2 OH- + 6 H2O -> 2 [Al(OH)4]- + 3 H2', 'aluminium dissolving in alkali (common practice)'],
    ['Zn -> [Zn(OH)4]^2- + H2', 'base', 'Zn + 2 OH- + 2 H2O -> [Zn(OH)4]^2- + H2', 'zinc dissolving in alkali (common practice)'],
    ['N2H4 + Cu(OH)2 -> N2 + Cu', 'base', 'N2H4 + 2 Cu(OH)2 -> N2 + 2 Cu + 4 H2O', 'hydrazine reduction of copper(II) hydroxide (common practice)'],
    ['NO2- + MnO4- -> NO3- + Mn2+', 'acid', '5 NO2- + 2 MnO4- + 6 H+ -> 5 NO3- + 2 Mn2+ + 3 H2O', 'permanganate–nitrite (common practice)'],
    ['PbO2 + Mn2+ -> Pb2+ + MnO4-', 'acid', '5 PbO2 + 2 Mn2+ + 4 H+ -> 5 Pb2+ + 2 MnO4- + 2 H2O', 'lead dioxide oxidation of manganese(II) (common practice)'],
    ['Mn2+ + BiO3- -> MnO4- + Bi3+', 'acid', '2 Mn2+ + 5 BiO3- + 14 H+ -> 2 MnO4- + 5 Bi3+ + 7 H2O', 'bismuthate test for manganese (common practice)'],
    ['Cr(OH)3 + ClO- -> CrO4^2- + Cl-', 'base', '2 Cr(OH)3 + 3 ClO- + 4 OH- -> 2 CrO4^2- + 3 Cl- + 5 H2O', 'hypochlorite oxidation of chromium(III) in base (common practice)'],
    ['As2S3 + NO3- -> H3AsO4 + SO4^2- + NO', 'acid', '3 As2S3 + 28 NO3- + 10 H+ + 4 H2O -> 6 H3AsO4 + 9 SO4^2- + 28 NO', 'arsenic sulfide in nitric acid (common practice)'],
    ['S2O3^2- + I2 -> S4O6^2- + I-', null, '2 S2O3^2- + I2 -> S4O6^2- + 2 I-', 'iodometric titration (common practice)'],
    ['Fe3+ + Cu -> Fe2+ + Cu2+', null, '2 Fe3+ + Cu -> 2 Fe2+ + Cu2+', 'iron(III) etching of copper (common practice)'],
    ['Cu + NO3- + H+ -> Cu2+ + NO + H2O', null, '3 Cu + 2 NO3- + 8 H+ -> 3 Cu2+ + 2 NO + 4 H2O', 'every species written, no medium (common practice)'],
    ['Fe + O2 -> Fe2O3', null, '4 Fe + 3 O2 -> 2 Fe2O3', 'iron oxidation (common practice)'],
    ['C3H8 + O2 -> CO2 + H2O', null, 'C3H8 + 5 O2 -> 3 CO2 + 4 H2O', 'propane combustion (common practice)'],
    ['CuSO4·5H2O -> CuSO4 + H2O', null, 'CuSO4·5H2O -> CuSO4 + 5 H2O', 'dehydration of blue vitriol (common practice)'],
  ];

  test('at least 20 redox equations', () => {
    expect(cases.filter(([, m]) => m !== null).length).toBeGreaterThanOrEqual(20);
  });

  test.each(cases)('%s in %s → %s (%s)', (skeleton, medium, expected) => {
    expectBalance(skeleton, medium, expected, 0);
  });
});

describe('balanceSkeleton: half-reaction skeletons get electrons', () => {
  // [skeleton, medium, exact balanced text, electrons consumed, source]
  // prettier-ignore
  const cases: [string, Medium, string, number, string][] = [
    ['MnO4- -> Mn2+', 'acid', 'MnO4- + 8 H+ + 5 e- -> Mn2+ + 4 H2O', 5, 'OSX App. L (seen)'],
    ['Cr2O7^2- -> Cr3+', 'acid', 'Cr2O7^2- + 14 H+ + 6 e- -> 2 Cr3+ + 7 H2O', 6, 'OSX App. L (seen)'],
    ['MnO4- -> MnO2', 'base', 'MnO4- + 2 H2O + 3 e- -> MnO2 + 4 OH-', 3, 'CRC92 Electrochemical Series (from memory)'],
    ['NO3- -> NO', 'acid', 'NO3- + 4 H+ + 3 e- -> NO + 2 H2O', 3, 'OSX App. L (seen)'],
    ['O2 -> H2O', 'acid', 'O2 + 4 H+ + 4 e- -> 2 H2O', 4, 'OSX App. L (seen)'],
    ['O2 -> OH-', 'base', 'O2 + 2 H2O + 4 e- -> 4 OH-', 4, 'OSX App. L (seen)'],
    ['H2O2 -> H2O', 'acid', 'H2O2 + 2 H+ + 2 e- -> 2 H2O', 2, 'OSX App. L (seen)'],
    ['Fe3+ -> Fe2+', null, 'Fe3+ + e- -> Fe2+', 1, 'OSX App. L (seen)'],
    ['Cl2 -> Cl-', null, 'Cl2 + 2 e- -> 2 Cl-', 2, 'OSX App. L (seen)'],
    ['Zn -> Zn2+', null, 'Zn -> Zn2+ + 2 e-', -2, 'oxidation of zinc (common practice)'],
    ['C2O4^2- -> CO2', null, 'C2O4^2- -> 2 CO2 + 2 e-', -2, 'oxidation of oxalate (common practice)'],
    ['Cr(OH)3 -> CrO4^2-', 'base', 'Cr(OH)3 + 5 OH- -> CrO4^2- + 4 H2O + 3 e-', -3, 'oxidation of chromium(III) in base (common practice)'],
    ['PbSO4 -> PbO2 + SO4^2-', 'acid', 'PbSO4 + 2 H2O -> PbO2 + SO4^2- + 4 H+ + 2 e-', -2, 'lead–acid positive plate on charge, OSX App. L reversed (seen)'],
  ];
  test.each(cases)('%s in %s → %s', (skeleton, medium, expected, electrons) => {
    expectBalance(skeleton, medium, expected, electrons);
    expect(formatReaction(balanceSkeleton(parseReaction(skeleton), medium).reaction)).toBe(expected);
  });
});

describe('balanceSkeleton: errors', () => {
  test.each<[string, Medium]>([
    ['Fe2+ -> Cu2+', 'acid'],
    ['Fe2+ -> Cu2+', 'base'],
    ['Fe2+ -> Cu2+', null],
  ])('%s in %s cannot be balanced (no element changes into another)', (skeleton, medium) => {
    const e = engineErrorOf(() => balanceSkeleton(parseReaction(skeleton), medium));
    expect(e.kind).toBe('unbalanced');
    expect(e.message).toContain('cannot be balanced with these species');
  });

  test('without a medium, the message suggests one', () => {
    const e = engineErrorOf(() => balanceSkeleton(parseReaction('MnO4- -> Mn2+'), null));
    expect(e.kind).toBe('unbalanced');
    expect(e.message).toContain('try the medium "acid" or "base"');
  });

  test.each<[string, Medium, string]>([
    ['H2 + O2 -> H2O + H2O2', null, 'water and peroxide form independently (common practice)'],
    [
      'Ce4+ + H2O2 -> Ce3+ + O2',
      'acid',
      'peroxide disproportionation is independent of its oxidation (common practice)',
    ],
  ])('%s in %s has no unique balance (%s)', (skeleton, medium) => {
    const e = engineErrorOf(() => balanceSkeleton(parseReaction(skeleton), medium));
    expect(e.kind).toBe('unbalanced');
    expect(e.message).toContain('has no unique balance: 2 independent sets');
  });

  test.each([
    ['Zn + Cu2+ + Cu -> Zn2+', 'Cu as a reactant: the only balance puts it on the other side'],
    ['Cu + Zn2+ -> Cu2+', 'Zn2+ as a reactant: the only balance leaves it out'],
    ['Zn + Cu2+ -> Zn2+ + Cu + Fe', 'Fe as a product: the only balance leaves it out'],
    ['Cu + Cu2+ -> Cu', 'has Cu on both sides'],
  ])('%s: a species forced to the wrong side or left out', (skeleton, fragment) => {
    const e = engineErrorOf(() => balanceSkeleton(parseReaction(skeleton), null));
    expect(e.kind).toBe('unbalanced');
    expect(e.message).toContain(fragment);
  });
});

describe('parseMedium', () => {
  test.each<[string | null | undefined, Medium]>([
    ['acid', 'acid'],
    ['Acidic', 'acid'],
    [' ACID ', 'acid'],
    ['H+', 'acid'],
    ['base', 'base'],
    ['Basic', 'base'],
    ['alkaline', 'base'],
    ['Alkaline', 'base'],
    ['OH-', 'base'],
    ['', null],
    ['none', null],
    ['neutral', null],
    [null, null],
    [undefined, null],
  ])('%j → %s', (text, medium) => {
    expect(parseMedium(text)).toBe(medium);
  });

  test.each(['acidish', 'pH 7', 'sour'])('%j is an argument error that lists the choices', (text) => {
    const e = engineErrorOf(() => parseMedium(text));
    expect(e.kind).toBe('argument');
    expect(e.argument).toBe('medium');
    expect(e.message).toContain('"acid", "base" or empty');
  });
});

// ---------------------------------------------------------------------------------------
// Combining half-reactions
// ---------------------------------------------------------------------------------------

describe('combineHalfReactions: scaled by the LCM of the electrons', () => {
  // [reduction (cathode), other reduction run backwards (anode), cell reaction, n, source]
  // prettier-ignore
  const cases: [string, string, string, number, string][] = [
    ['Cu2+ + 2 e- -> Cu', 'Zn2+ + 2 e- -> Zn', 'Cu2+ + Zn -> Cu + Zn2+', 2, 'Daniell cell (common practice)'],
    ['Ag+ + e- -> Ag', 'Cu2+ + 2 e- -> Cu', '2 Ag+ + Cu -> 2 Ag + Cu2+', 2, 'OSX ch. 17 (seen)'],
    ['MnO4- + 8 H+ + 5 e- -> Mn2+ + 4 H2O', 'Fe3+ + e- -> Fe2+', 'MnO4- + 8 H+ + 5 Fe2+ -> Mn2+ + 4 H2O + 5 Fe3+', 5, 'common practice'],
    ['Cr2O7^2- + 14 H+ + 6 e- -> 2 Cr3+ + 7 H2O', 'Fe3+ + e- -> Fe2+', 'Cr2O7^2- + 14 H+ + 6 Fe2+ -> 2 Cr3+ + 7 H2O + 6 Fe3+', 6, 'common practice'],
    ['Au3+ + 3 e- -> Au', 'Fe2+ + 2 e- -> Fe', '2 Au3+ + 3 Fe -> 2 Au + 3 Fe2+', 6, 'LCM of 3 and 2 (common practice)'],
    ['O2 + 4 H+ + 4 e- -> 2 H2O', '2 H+ + 2 e- -> H2', 'O2 + 2 H2 -> 2 H2O', 4, 'hydrogen–oxygen fuel cell (common practice)'],
    ['PbO2 + SO4^2- + 4 H+ + 2 e- -> PbSO4 + 2 H2O', 'PbSO4 + 2 e- -> Pb + SO4^2-', 'PbO2 + 2 SO4^2- + 4 H+ + Pb -> 2 PbSO4 + 2 H2O', 2, 'lead–acid discharge (common practice)'],
    ['Cu2+ + e- -> Cu+', 'Cu+ + e- -> Cu', 'Cu2+ + Cu -> 2 Cu+', 1, 'comproportionation of copper (common practice)'],
    ['1/2 O2 + 2 H+ + 2 e- -> H2O', 'Zn2+ + 2 e- -> Zn', '1/2 O2 + 2 H+ + Zn -> H2O + Zn2+', 2, 'fractional coefficients kept exactly'],
  ];
  test.each(cases)('%s with %s reversed → %s, n = %d', (red, ox, expected, n) => {
    expect(imbalance(expected)).toEqual({});
    const c = combineHalfReactions(parseReaction(red), parseReaction(ox));
    const text = formatReaction(c.reaction);
    expect(coefficients(text)).toEqual(coefficients(expected));
    expect(c.n).toBe(n);
    expect(text).not.toContain('e-'); // the electrons cancel
    expect(checkBalance(c.reaction).balanced).toBe(true);
    expect(imbalance(text)).toEqual({});
  });

  test('the exact text of the silver–copper cell reaction', () => {
    const c = combineHalfReactions(parseReaction('Ag+ + e- -> Ag'), parseReaction('Cu2+ + 2 e- -> Cu'));
    expect(formatReaction(c.reaction)).toBe('2 Ag+ + Cu -> 2 Ag + Cu2+');
  });

  test('a half-reaction written as an oxidation is refused', () => {
    const e = engineErrorOf(() =>
      combineHalfReactions(parseReaction('Cu2+ + 2 e- -> Cu'), parseReaction('Zn -> Zn2+ + 2 e-')),
    );
    expect(e.kind).toBe('argument');
    expect(e.message).toContain('written as reductions');
  });

  // Regression (fixed): combining a couple with itself (here Cl2/Cl- written two ways) returns an empty
  // reaction whose text is " -> " (n = 2) instead of an error; the text cannot be read back.
  test('combining a couple with itself is an error, not an empty reaction', () => {
    expect(() =>
      combineHalfReactions(parseReaction('Cl2 + 2 e- -> 2 Cl-'), parseReaction('1/2 Cl2 + e- -> Cl-')),
    ).toThrow(EngineError);
  });
});
