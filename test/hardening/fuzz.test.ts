/**
 * Fuzzing: random and mutated strings through the parser, and random arguments through every
 * function of the catalogue. Contract (docs/design.md, "Errors"): no
 * uncaught exception, no NaN or ±Infinity in any result cell, and every failure is an
 * EngineError (engine) or a CellError with a code and a non-empty message (catalogue).
 *
 * Size: a time budget, POTENTIA_FUZZ_SECONDS (default 8 s in all, shared out like the inputs
 * below), so the suite takes the same time on a busy machine as on an idle one and does less
 * work there; and at most POTENTIA_FUZZ_RUNS inputs in total (default 100,000; e.g.
 * POTENTIA_FUZZ_SECONDS=600 POTENTIA_FUZZ_RUNS=10000000 for a long run). Reproducible: one
 * fast-check seed, POTENTIA_FUZZ_SEED (default below); the seed and the counts are printed.
 * A run under a budget tries a prefix of the seed's sequence, so a failure replays with
 * `POTENTIA_FUZZ_SEED=<seed>` and a budget at least as long.
 */
import fc from 'fast-check';
import {
  BUILTIN_POTENTIALS,
  EngineError,
  balanceSkeleton,
  checkBalance,
  formatNotation,
  formatSpecies,
  listReferences,
  parseNotation,
  parseSpecies,
  formatRational,
  phaseOf,
  type CellDiagram,
  type Notation,
  type Species,
  type Term,
} from '../../src/engine';
import {
  CATALOGUE,
  isCellError,
  type Arg,
  type Grid,
  type Result,
  type Scalar,
} from '../../src/functions/catalogue';

const TOTAL = positiveIntFromEnv('POTENTIA_FUZZ_RUNS', 100_000);
const SEED = intFromEnv('POTENTIA_FUZZ_SEED', 20_260_407);
const BUDGET_MS = positiveIntFromEnv('POTENTIA_FUZZ_SECONDS', 8) * 1000;

function intFromEnv(name: string, dflt: number): number {
  const raw = process.env[name];
  if (raw === undefined || raw.trim() === '') return dflt;
  const x = Number(raw);
  if (!Number.isInteger(x)) throw new Error(`${name} must be an integer; got "${raw}"`);
  return x;
}

function positiveIntFromEnv(name: string, dflt: number): number {
  const x = intFromEnv(name, dflt);
  if (x <= 0) throw new Error(`${name} must be a positive integer; got ${x}`);
  return x;
}

// Budget: 35 % of the inputs go through the parser (each string through parseNotation and
// parseSpecies), 5 % through the round trip, 60 % through the catalogue, shared evenly by its
// functions. (A function with a known bug also runs its pinned counterexample, see KNOWN_BUGS.)
const PARSER_RUNS = Math.max(1, Math.round(TOTAL * 0.35));
const ROUNDTRIP_RUNS = Math.max(1, Math.round(TOTAL * 0.05));
const PER_FUNCTION_RUNS = Math.max(1, Math.round((TOTAL * 0.6) / CATALOGUE.length));
// The time budget, shared the same way; a run stops at its share (not a failure).
const budget = (share: number) => ({
  interruptAfterTimeLimit: Math.max(50, Math.round(BUDGET_MS * share)),
  markInterruptAsFailure: false,
});
const PARSER_BUDGET = budget(0.35);
const ROUNDTRIP_BUDGET = budget(0.05);
const PER_FUNCTION_BUDGET = budget(0.6 / CATALOGUE.length);

/**
 * A cap per test, not a timing assertion: generous (a default run takes seconds), growing with
 * the run size so that a long run on a slow machine is not cut off by jest's default timeout.
 */
const CAP_MS = Math.max(120_000, Math.ceil(TOTAL / 100_000) * 120_000);

/** The longest one catalogue call may take (its share of the budget is ~0.1 s; generous for a busy machine). */
const SLOW_CALL_MS = 2000;
const slowest = { ms: 0, id: '', args: '' };

const counts = { parser: 0, parserAccepted: 0, roundTrip: 0, catalogue: 0, catalogueErrors: 0 };
const started = Date.now();

afterAll(() => {
  const seconds = ((Date.now() - started) / 1000).toFixed(1);
  console.log(
    `fuzz: seed ${SEED}; ${counts.parser} parser strings (${counts.parserAccepted} accepted, ` +
      `${counts.roundTrip} round-tripped), ${counts.catalogue} catalogue calls over ${CATALOGUE.length} ` +
      `functions (${counts.catalogueErrors} returned at least one error cell); ` +
      `${counts.parser + counts.roundTrip + counts.catalogue} inputs in ${seconds} s ` +
      `(POTENTIA_FUZZ_SECONDS=${BUDGET_MS / 1000}, POTENTIA_FUZZ_RUNS=${TOTAL}, POTENTIA_FUZZ_SEED=${SEED}); ` +
      `slowest catalogue call ${slowest.ms.toFixed(1)} ms: ${slowest.id}(${slowest.args.slice(1, 200)}).`,
  );
});

// ---------------------------------------------------------------------------------------
// Seeds: valid texts of every kind, which the mutators then damage.

const HALF_REACTIONS = BUILTIN_POTENTIALS.map((r) => r.halfReaction);

const SEED_TEXTS: readonly string[] = [
  ...HALF_REACTIONS,
  'Cu2+/Cu',
  'Fe3+/Fe2+',
  'AgCl/Ag',
  'MnO4-/Mn2+',
  'MnO4-/MnO2',
  'Zn(s) | Zn2+(aq) || Cu2+(aq) | Cu(s)',
  'Zn | Zn2+(aq, 0.1 M) || Cu2+(aq, 1 M) | Cu',
  'Pt | H2(g, 0.5 bar) | H+(aq) || Ag+ | Ag',
  'Pt(s) | Fe3+, Fe2+ || Ce4+, Ce3+ | Pt(s)',
  'Zn + Cu2+ -> Zn2+ + Cu',
  'Cu + 2 Ag+ -> Cu2+ + 2 Ag',
  'MnO4- + Fe2+ -> Mn2+ + Fe3+',
  'Cr2O7^2- + Fe2+ -> Cr3+ + Fe3+',
  'H2 + 1/2 O2 -> H2O',
  '½ O2 + 2 H+ + 2 e- → H2O',
  'Cu²⁺ + 2e⁻ → Cu',
  'SO₄²⁻ + 4 H⁺ + 2 e⁻ ⇌ H2SO3 + H2O',
  '[Fe(CN)6]3- + e- <=> [Fe(CN)6]4-',
  'Fe+++ + e = Fe++',
  'CuSO4·5H2O',
  'left:Ag+',
  'pH',
  'SO4 2-',
  'Hg22+',
  'I3-',
  '0.5 H2 -> H+ + e-',
  '2.5 O2',
];

const REFERENCE_NAMES: readonly string[] = [
  ...listReferences().map((r) => r.id),
  'saturated calomel',
  'Ag/AgCl',
  'vs. SCE',
  'Cu/CuSO4',
];

const WORDS: readonly string[] = [
  'acid',
  'base',
  'alkaline',
  'none',
  'limiting',
  'extended',
  'davies',
  'Debye-Hückel',
  'Fe',
  'Cu2+',
  'OK',
  'Half-reaction',
  'E°',
  '25',
  '−0.5',
  '1e400',
  'NaN',
  'Infinity',
  '0x10',
  ' ',
  '',
];

/** Characters the mutators insert: formula characters, digits, notation marks, Unicode forms. */
const ALPHABET: readonly string[] = Array.from(
  'ABCEFHIKLMNOPSUZabcdefghilmnorsuxyz0123456789+-^()[]|/,. :=<>*·e' +
    '⁰¹²³⁴⁵⁶⁷⁸⁹⁺⁻₀₁₂₃₄₅₆₇₈₉−→⇌⇄↔⟶‖½¼\u00a0\t\n',
).concat([
  '->',
  '<=>',
  '||',
  ' | ',
  ' + ',
  '(s)',
  '(aq)',
  '(g)',
  '(l)',
  '(aq, 0.1 M)',
  'e-',
  '\u0000',
  '😀',
  '\ud800',
]);

const alphabetChar = fc.constantFrom(...ALPHABET);

type Mutation =
  | { op: 'insert'; at: number; text: string }
  | { op: 'delete'; at: number; length: number }
  | { op: 'replace'; at: number; text: string }
  | { op: 'duplicate'; at: number; length: number }
  | { op: 'splice'; at: number; other: string };

const mutation: fc.Arbitrary<Mutation> = fc.oneof(
  fc.record({ op: fc.constant('insert' as const), at: fc.nat(), text: alphabetChar }),
  fc.record({ op: fc.constant('delete' as const), at: fc.nat(), length: fc.integer({ min: 1, max: 4 }) }),
  fc.record({ op: fc.constant('replace' as const), at: fc.nat(), text: alphabetChar }),
  fc.record({ op: fc.constant('duplicate' as const), at: fc.nat(), length: fc.integer({ min: 1, max: 8 }) }),
  fc.record({ op: fc.constant('splice' as const), at: fc.nat(), other: fc.constantFrom(...SEED_TEXTS) }),
);

function applyMutation(s: string, m: Mutation): string {
  const at = s.length === 0 ? 0 : m.at % (s.length + 1);
  switch (m.op) {
    case 'insert':
      return s.slice(0, at) + m.text + s.slice(at);
    case 'delete':
      return s.slice(0, at) + s.slice(at + m.length);
    case 'replace':
      return s.slice(0, at) + m.text + s.slice(at + 1);
    case 'duplicate':
      return s.slice(0, at + m.length) + s.slice(at, at + m.length) + s.slice(at + m.length);
    case 'splice':
      return s.slice(0, at) + m.other.slice(at % (m.other.length + 1));
  }
}

/** A valid text damaged by 1–5 mutations. */
const mutatedText: fc.Arbitrary<string> = fc
  .tuple(
    fc.constantFrom(...SEED_TEXTS, ...REFERENCE_NAMES, ...WORDS),
    fc.array(mutation, { minLength: 1, maxLength: 5 }),
  )
  .map(([s, ms]) => ms.reduce(applyMutation, s));

/** Text made of the alphabet alone. */
const alphabetText: fc.Arbitrary<string> = fc
  .array(alphabetChar, { maxLength: 30 })
  .map((parts) => parts.join(''));

/** Any text: mostly mutated valid texts, some pure noise, some valid texts unchanged. */
const anyText: fc.Arbitrary<string> = fc.oneof(
  { weight: 6, arbitrary: mutatedText },
  { weight: 2, arbitrary: alphabetText },
  { weight: 1, arbitrary: fc.string({ maxLength: 20, unit: 'binary' }) },
  { weight: 1, arbitrary: fc.constantFrom(...SEED_TEXTS, ...REFERENCE_NAMES, ...WORDS) },
);

// ---------------------------------------------------------------------------------------
// Parser

function expectEngineErrorOnly(f: () => unknown): boolean {
  try {
    f();
    return true;
  } catch (e) {
    if (!(e instanceof EngineError)) {
      throw new Error(
        `threw ${e instanceof Error ? `${e.name}: ${e.message}` : String(e)}, not an EngineError`,
      );
    }
    if (typeof e.message !== 'string' || e.message.trim() === '')
      throw new Error('EngineError with an empty message');
    return false;
  }
}

describe('parser fuzz', () => {
  test(
    `parseNotation and parseSpecies accept or raise an EngineError (${PARSER_RUNS} strings)`,
    () => {
      fc.assert(
        fc.property(anyText, (text) => {
          counts.parser++;
          let accepted = expectEngineErrorOnly(() => parseNotation(text));
          accepted = expectEngineErrorOnly(() => parseSpecies(text)) || accepted;
          if (accepted) counts.parserAccepted++;
        }),
        { seed: SEED, numRuns: PARSER_RUNS, ...PARSER_BUDGET },
      );
    },
    CAP_MS,
  );

  test(
    `whatever parses formats to canonical text that reads back as the same thing, and balances or raises an EngineError (${ROUNDTRIP_RUNS} strings)`,
    () => {
      fc.assert(
        fc.property(anyText, (text) => {
          counts.roundTrip++;
          const n = attempt(() => parseNotation(text));
          if (n) {
            const once = formatNotation(n);
            const again = parseNotation(once);
            expect(describeNotation(again)).toBe(describeNotation(n));
            expect(formatNotation(again)).toBe(once);
            if (n.kind === 'half' || n.kind === 'reaction') {
              // the balancer on whatever parses: a balanced reaction, or an EngineError
              checkBalance(n.reaction);
              for (const medium of [null, 'acid', 'base'] as const) {
                const b = attempt(() => balanceSkeleton(n.reaction, medium));
                if (b) expect(checkBalance(b.reaction).problems).toEqual([]);
              }
            }
          }
          const s = attempt(() => parseSpecies(text));
          if (s) {
            const f = formatSpecies(s);
            expect(describeSpecies(parseSpecies(f))).toBe(describeSpecies(s));
          }
        }),
        { seed: SEED + 1, numRuns: ROUNDTRIP_RUNS, ...ROUNDTRIP_BUDGET },
      );
    },
    CAP_MS,
  );
});

/** The value, or null where it raised an EngineError (anything else propagates). */
function attempt<T>(f: () => T): T | null {
  try {
    return f();
  } catch (e) {
    if (e instanceof EngineError) return null;
    throw e;
  }
}

/**
 * What a notation means, as text: species by formula, charge and effective phase (the
 * canonical text may spell out an inferred phase, "Zn2+(aq, 0.1 M)"), coefficients exactly,
 * inline activities by value (a unit may be converted, "0.5 mbar" → "0.0005 bar").
 */
function describeSpecies(s: Species): string {
  return s.isElectron ? 'e' : `${s.formula}|${s.charge}|${phaseOf(s) ?? ''}`;
}
function describeActivity(a: { value: number } | null): string {
  return a ? `@${a.value.toPrecision(12)}` : '';
}
function describeNotation(n: Notation): string {
  const terms = (ts: readonly Term[]) =>
    ts
      .map(
        (t) =>
          `${formatRational(t.coefficient)} ${describeSpecies(t.species)}${describeActivity(t.activity)}`,
      )
      .join(' + ');
  const phases = (ps: CellDiagram['left']) =>
    ps
      .map((p) => p.map((c) => describeSpecies(c.species) + describeActivity(c.activity)).join(', '))
      .join(' | ');
  switch (n.kind) {
    case 'half':
    case 'reaction':
      return `${n.kind}: ${terms(n.reaction.reactants)} -> ${terms(n.reaction.products)}`;
    case 'couple':
      return `couple: ${n.couple.oxidized.map(describeSpecies).join(', ')} / ${n.couple.reduced.map(describeSpecies).join(', ')}`;
    case 'cell':
      return `cell: ${phases(n.diagram.left)}${n.diagram.bridge ? ' || ' : ''}${phases(n.diagram.right)}`;
  }
}

// ---------------------------------------------------------------------------------------
// Catalogue

const specialNumber = fc.constantFrom(
  NaN,
  Infinity,
  -Infinity,
  0,
  -0,
  -1,
  1,
  2,
  3,
  25,
  -300,
  -273.15,
  1e308,
  -1e308,
  Number.MAX_VALUE,
  Number.MIN_VALUE,
  1e-308,
  0.1,
  7,
  14,
  1.5,
);

const anyNumber: fc.Arbitrary<number> = fc.oneof(
  { weight: 3, arbitrary: specialNumber },
  { weight: 2, arbitrary: fc.double() },
  { weight: 2, arbitrary: fc.integer({ min: -20, max: 120 }) },
  { weight: 1, arbitrary: fc.double({ min: 1e-12, max: 10, noNaN: true }) },
);

/** One cell as a host may pass it (undefined included, which hosts use for omitted arguments). */
const anyScalar: fc.Arbitrary<Scalar | undefined> = fc.oneof(
  { weight: 5, arbitrary: anyText },
  { weight: 4, arbitrary: anyNumber },
  { weight: 1, arbitrary: fc.boolean() },
  { weight: 1, arbitrary: fc.constantFrom(null, undefined, '', 0) },
);

/** A range of random shape (including empty and ragged rows), cells as above. */
const anyGrid: fc.Arbitrary<Grid> = fc.array(fc.array(anyScalar, { minLength: 0, maxLength: 4 }), {
  minLength: 0,
  maxLength: 4,
}) as fc.Arbitrary<Grid>;

/** A user table: rows of half-reaction text (often valid), E°, dE°/dT, source. */
const anyTable: fc.Arbitrary<Grid> = fc.array(
  fc.tuple(
    fc.oneof(fc.constantFrom(...HALF_REACTIONS), mutatedText),
    fc.oneof(fc.double({ min: -3, max: 3, noNaN: true }), anyScalar),
    fc.oneof(fc.constant(null), anyScalar),
    fc.oneof(fc.constant('fuzz'), anyScalar),
  ),
  { minLength: 0, maxLength: 4 },
) as unknown as fc.Arbitrary<Grid>;

/** Any argument: a cell, a range, a table, or something nested deeper than a host would pass. */
const anyArg: fc.Arbitrary<Arg> = fc.oneof(
  { weight: 6, arbitrary: anyScalar as fc.Arbitrary<Arg> },
  { weight: 3, arbitrary: anyGrid as fc.Arbitrary<Arg> },
  { weight: 1, arbitrary: anyTable as fc.Arbitrary<Arg> },
  { weight: 1, arbitrary: fc.array(anyGrid, { maxLength: 2 }) as unknown as fc.Arbitrary<Arg> },
);

/** Species names of the built-in rows (and pH and side-qualified names) for species arguments. */
const SPECIES_NAMES: readonly string[] = (() => {
  const names = new Set<string>(['pH', 'left:Ag+', 'right:Ag+', 'Na+', 'Cl-', 'SO4^2-']);
  for (const h of HALF_REACTIONS) {
    const n = parseNotation(h);
    if (n.kind !== 'half') continue;
    for (const t of [...n.reaction.reactants, ...n.reaction.products])
      if (!t.species.isElectron) names.add(formatSpecies(t.species, false));
  }
  return [...names];
})();

const speciesName = fc.oneof(
  { weight: 4, arbitrary: fc.constantFrom(...SPECIES_NAMES) },
  { weight: 1, arbitrary: mutatedText },
);
const column = <T>(a: fc.Arbitrary<T>): fc.Arbitrary<T[][]> =>
  fc.array(a, { minLength: 1, maxLength: 4 }).map((xs) => xs.map((x) => [x]));
const rowOf = <T>(a: fc.Arbitrary<T>): fc.Arbitrary<T[][]> =>
  fc.array(a, { minLength: 1, maxLength: 4 }).map((xs) => [xs]);
const positive = fc.oneof(fc.double({ min: 1e-9, max: 10, noNaN: true }), anyNumber);
const reactionText = fc.oneof(
  { weight: 3, arbitrary: fc.constantFrom(...SEED_TEXTS) },
  { weight: 3, arbitrary: mutatedText },
);
const cellOrColumn = <T>(a: fc.Arbitrary<T>): fc.Arbitrary<Arg> =>
  fc.oneof({ weight: 3, arbitrary: a }, { weight: 1, arbitrary: column(a) }) as fc.Arbitrary<Arg>;

/** Plausible values for each parameter name, so that calls get past the first argument. */
const PLAUSIBLE: Record<string, fc.Arbitrary<Arg>> = {
  reaction: cellOrColumn(reactionText),
  couple: cellOrColumn(reactionText),
  reaction_or_E0: cellOrColumn(fc.oneof(reactionText, anyNumber, anyNumber.map(String))),
  reaction_or_E: cellOrColumn(fc.oneof(reactionText, anyNumber, anyNumber.map(String))),
  species: fc.oneof(rowOf(speciesName), speciesName, column(speciesName)) as fc.Arbitrary<Arg>,
  values: fc.oneof(
    fc.array(fc.array(positive, { minLength: 1, maxLength: 3 }), { minLength: 1, maxLength: 4 }),
    positive,
  ) as fc.Arbitrary<Arg>,
  temp_C: cellOrColumn(fc.oneof(fc.double({ min: -20, max: 120, noNaN: true }), anyNumber)),
  table: anyTable as fc.Arbitrary<Arg>,
  n: cellOrColumn(fc.oneof(fc.integer({ min: 1, max: 6 }), anyNumber)),
  medium: cellOrColumn(fc.constantFrom('acid', 'base', '', null, 'basic', 'Acidic')),
  value_left: cellOrColumn(positive),
  value_right: cellOrColumn(positive),
  potential: cellOrColumn(fc.oneof(fc.double({ min: -3, max: 3, noNaN: true }), anyNumber)),
  from_ref: cellOrColumn(fc.oneof(fc.constantFrom(...REFERENCE_NAMES), mutatedText)),
  to_ref: cellOrColumn(fc.oneof(fc.constantFrom(...REFERENCE_NAMES), mutatedText)),
  pH: cellOrColumn(fc.oneof(fc.double({ min: -2, max: 16, noNaN: true }), anyNumber)),
  ion: cellOrColumn(speciesName),
  ionic_strength: cellOrColumn(fc.oneof(fc.double({ min: 0, max: 2, noNaN: true }), anyNumber)),
  model: cellOrColumn(fc.constantFrom('limiting', 'extended', 'davies', '', null, 'Debye-Hückel')),
  ion_size: cellOrColumn(fc.oneof(fc.double({ min: 1, max: 10, noNaN: true }), anyNumber)),
  potentials: fc.oneof(
    rowOf(fc.double({ min: -3, max: 3, noNaN: true })),
    rowOf(anyScalar),
  ) as fc.Arbitrary<Arg>,
  electrons: fc.oneof(rowOf(fc.integer({ min: 1, max: 6 })), rowOf(anyScalar)) as fc.Arbitrary<Arg>,
  filter: fc.oneof(speciesName, fc.constantFrom('Fe', 'Cu2+', 'Ag', ''), mutatedText) as fc.Arbitrary<Arg>,
  // concentrated solutions (issue 13)
  extrapolate: fc.constantFrom<Arg>(true, false, 'TRUE', 1, 0, null, 'maybe'),
  salt: cellOrColumn(fc.oneof(fc.constantFrom('NaCl', 'CuSO4', 'K2SO4', 'ZnCl2', 'MgSO4', 'AgNO3', 'Na+'), mutatedText)),
  molality: cellOrColumn(fc.oneof(fc.double({ min: 0, max: 8, noNaN: true }), anyNumber)),
  molarity: cellOrColumn(fc.oneof(fc.double({ min: 0, max: 7, noNaN: true }), anyNumber)),
  density_g_cm3: cellOrColumn(fc.oneof(fc.double({ min: 0.4, max: 2, noNaN: true }), anyNumber)),
  salt_or_species: fc.oneof(
    fc.constantFrom<Arg>('NaCl', 'MgSO4', [['Na+', 'Cl-']], [['Na+', 'Mg2+', 'Cl-', 'SO4^2-']]),
    rowOf(speciesName),
  ) as fc.Arbitrary<Arg>,
  molality_or_values: fc.oneof(
    fc.array(fc.array(positive, { minLength: 1, maxLength: 4 }), { minLength: 1, maxLength: 4 }),
    positive,
  ) as fc.Arbitrary<Arg>,
  // E–pH functions
  element: fc.oneof(
    fc.constantFrom('Fe', 'Cu', 'zn', 'Al', 'Ni', 'Cr', 'Pb', 'Sn', 'Mg', 'Ag', ''),
    mutatedText,
  ) as fc.Arbitrary<Arg>,
  E_V: cellOrColumn(fc.oneof(fc.double({ min: -3, max: 3, noNaN: true }), anyNumber)),
  activity: cellOrColumn(fc.oneof(fc.double({ min: 1e-12, max: 1, noNaN: true }), anyNumber)),
  pH_min: fc.oneof(fc.double({ min: -2, max: 16, noNaN: true }), anyNumber) as fc.Arbitrary<Arg>,
  pH_max: fc.oneof(fc.double({ min: -2, max: 16, noNaN: true }), anyNumber) as fc.Arbitrary<Arg>,
  // Faraday, corrosion, kinetics and measurement functions
  metal_or_alloy: cellOrColumn(fc.oneof(fc.constantFrom('Fe', 'zinc', '304', 'carbon steel', 'Cu 88.6, Ni 10, Fe 1.4', ''), mutatedText)),
  current_density_uA_cm2: cellOrColumn(positive),
  equivalent_weight: cellOrColumn(positive),
  mass_kg: cellOrColumn(positive),
  capacity_Ah_kg: cellOrColumn(fc.oneof(positive, fc.constantFrom<Arg>('zinc', 'Al-Zn-In', 'magnesium'))),
  current_A: cellOrColumn(positive),
  utilisation: cellOrColumn(fc.oneof(fc.double({ min: 0, max: 1.2, noNaN: true }), fc.constantFrom<Arg>('bracelet', 'flush'))),
  charge_C: cellOrColumn(positive),
  efficiency: cellOrColumn(fc.oneof(fc.double({ min: 0, max: 1.2, noNaN: true }), anyNumber)),
  thickness_um: cellOrColumn(positive),
  current_density_A_m2: cellOrColumn(positive),
  time_s: cellOrColumn(positive),
  reaction_or_species: cellOrColumn(fc.oneof(reactionText, speciesName)),
  basis: cellOrColumn(fc.oneof(fc.constantFrom<Arg>('reduced', 'oxidised', 'C6', 1, 2), speciesName)),
  cell_reaction: cellOrColumn(reactionText),
  eta_V: cellOrColumn(fc.oneof(fc.double({ min: -2, max: 2, noNaN: true }), anyNumber)),
  i0: cellOrColumn(positive),
  alpha_a: cellOrColumn(fc.oneof(fc.double({ min: 0, max: 1.1, noNaN: true }), anyNumber)),
  alpha_c: cellOrColumn(fc.oneof(fc.double({ min: 0, max: 1.1, noNaN: true }), anyNumber)),
  alpha: cellOrColumn(fc.oneof(fc.double({ min: 0, max: 1.1, noNaN: true }), anyNumber)),
  i_lim: fc.oneof(positive, rowOf(positive)) as fc.Arbitrary<Arg>,
  i: cellOrColumn(fc.oneof(fc.double({ min: -1, max: 1, noNaN: true }), anyNumber)),
  E_a: cellOrColumn(fc.oneof(fc.double({ min: -3, max: 3, noNaN: true }), anyNumber)),
  E_c: cellOrColumn(fc.oneof(fc.double({ min: -3, max: 3, noNaN: true }), anyNumber)),
  i0_a: cellOrColumn(positive),
  i0_c: cellOrColumn(positive),
  b_a: cellOrColumn(fc.oneof(fc.double({ min: 0, max: 0.3, noNaN: true }), anyNumber)),
  b_c: cellOrColumn(fc.oneof(fc.double({ min: 0, max: 0.3, noNaN: true }), anyNumber)),
  unknown: cellOrColumn(fc.oneof(speciesName, fc.constantFrom<Arg>('pH', 'left:Ag+'))),
  left_values: fc.array(fc.array(positive, { minLength: 1, maxLength: 3 }), { minLength: 1, maxLength: 4 }) as fc.Arbitrary<Arg>,
  right_values: fc.array(fc.array(positive, { minLength: 1, maxLength: 3 }), { minLength: 1, maxLength: 4 }) as fc.Arbitrary<Arg>,
  E0_V: cellOrColumn(fc.oneof(fc.double({ min: -3, max: 3, noNaN: true }), anyNumber)),
  slope_V: cellOrColumn(fc.oneof(fc.double({ min: 0, max: 0.1, noNaN: true }), anyNumber)),
  primary: fc.oneof(rowOf(speciesName), speciesName) as fc.Arbitrary<Arg>,
  activities: fc.array(fc.array(positive, { minLength: 1, maxLength: 3 }), { minLength: 1, maxLength: 4 }) as fc.Arbitrary<Arg>,
  selectivities: fc.oneof(rowOf(positive), positive) as fc.Arbitrary<Arg>,
  quantity: cellOrColumn(fc.oneof(fc.constantFrom('G', 'H', 'S', 'Cp', 'source', '', null), mutatedText)),
};

/** Arguments for a function: each parameter plausible (3 in 4) or anything, sometimes one too many. */
function argsFor(params: readonly { name: string; optional: boolean }[]): fc.Arbitrary<Arg[]> {
  const perParam = params.map((p) => {
    const plausible = PLAUSIBLE[p.name];
    if (!plausible) throw new Error(`no plausible generator for parameter ${p.name}`);
    return fc.oneof(
      { weight: 6, arbitrary: plausible },
      { weight: 2, arbitrary: anyArg },
      { weight: p.optional ? 2 : 1, arbitrary: fc.constantFrom<Arg>(undefined, null, '', 0) },
    );
  });
  return fc
    .tuple(fc.tuple(...perParam), fc.option(anyArg, { freq: 10 }))
    .map(([xs, extra]) => (extra === null ? [...xs] : [...xs, extra]));
}

const CODES = new Set(['#VALUE!', '#N/A', '#NUM!']);

/** The contract every result must meet; returns whether it holds any error cell. */
function checkResult(id: string, args: readonly Arg[], r: Result): boolean {
  const where = () => `${id}(${args.map((a) => JSON.stringify(a) ?? 'undefined').join(', ')})`;
  if (!Array.isArray(r) || r.length === 0)
    throw new Error(`${where()} returned ${JSON.stringify(r)}, not rows`);
  let anyError = false;
  for (const row of r) {
    if (!Array.isArray(row) || row.length === 0)
      throw new Error(`${where()} returned a row ${JSON.stringify(row)}, not cells`);
    for (const cell of row) {
      if (typeof cell === 'number') {
        if (!Number.isFinite(cell)) throw new Error(`${where()} returned ${String(cell)} in a cell`);
      } else if (typeof cell === 'string') {
        continue;
      } else if (isCellError(cell)) {
        anyError = true;
        if (!CODES.has(cell.code)) throw new Error(`${where()} returned the error code ${String(cell.code)}`);
        if (typeof cell.message !== 'string' || cell.message.trim() === '')
          throw new Error(`${where()} returned ${cell.code} without a message`);
        if (/^Internal error/.test(cell.message))
          throw new Error(`${where()} hit an internal error: ${cell.message}`);
      } else {
        throw new Error(`${where()} returned a cell ${JSON.stringify(cell)}`);
      }
    }
  }
  return anyError;
}

/**
 * Functions with a known way to break the contract, found by this fuzz: their full-range run
 * is marked failing, with the counterexample pinned (so it fails at every size and seed), and
 * a run over ordinary magnitudes (no |x| above 1e300 or below 1e-300) keeps fuzzing the rest.
 * When the lead fixes one, its failing test passes and jest reports it: remove the entry.
 */
const KNOWN_BUGS: Record<string, { bug: string; example: Arg[] }> = {};

function isExtreme(x: unknown): boolean {
  if (typeof x === 'number') return Math.abs(x) > 1e300 || (x !== 0 && Math.abs(x) < 1e-300);
  if (Array.isArray(x)) return x.some(isExtreme);
  return false;
}

function fuzzFunction(f: (typeof CATALOGUE)[number], ordinaryOnly: boolean, examples: Arg[][]): void {
  // one seed per function so that each replays on its own
  const seed = SEED + 17 * (CATALOGUE.indexOf(f) + 2);
  const args = ordinaryOnly ? argsFor(f.params).filter((a) => !isExtreme(a)) : argsFor(f.params);
  fc.assert(
    fc.property(args, (xs) => {
      counts.catalogue++;
      let r: Result;
      const t0 = performance.now();
      try {
        r = f.impl(...xs);
      } catch (e) {
        throw new Error(
          `${f.id} threw past its wrapper: ${e instanceof Error ? e.message : String(e)} ` +
            `for ${JSON.stringify(xs)}`,
        );
      }
      const ms = performance.now() - t0;
      if (ms > slowest.ms) Object.assign(slowest, { ms, id: f.id, args: JSON.stringify(xs) });
      // fast-check stops at the time budget only between calls: one slow call would blow it
      if (ms > SLOW_CALL_MS)
        throw new Error(
          `${f.id} took ${Math.round(ms)} ms for one call (over ${SLOW_CALL_MS} ms): ${JSON.stringify(xs)}`,
        );
      if (checkResult(f.id, xs, r)) counts.catalogueErrors++;
    }),
    { seed, numRuns: PER_FUNCTION_RUNS, ...PER_FUNCTION_BUDGET, examples: examples.map((e) => [e]) },
  );
}

describe('catalogue fuzz', () => {
  for (const f of CATALOGUE) {
    const known = KNOWN_BUGS[f.id];
    if (!known) {
      test(
        `${f.id} survives random arguments (${PER_FUNCTION_RUNS} calls)`,
        () => fuzzFunction(f, false, []),
        CAP_MS,
      );
      continue;
    }
    // BUG (see KNOWN_BUGS): the full-range run fails on its pinned counterexample.
    test.failing(
      `${f.id} survives random arguments, extreme magnitudes too (BUG: ${known.bug})`,
      () => fuzzFunction(f, false, [known.example]),
      CAP_MS,
    );
    test(
      `${f.id} survives random arguments of ordinary magnitude (${PER_FUNCTION_RUNS} calls)`,
      () => fuzzFunction(f, true, []),
      CAP_MS,
    );
  }
});
