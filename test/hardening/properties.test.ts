/**
 * Property-based tests (fast-check) of the notation, the balancer and the thermodynamics, over
 * species and half-reactions taken from the built-in table. Seeded (POTENTIA_PROPERTY_SEED) so
 * that a failure replays; fast-check prints the seed and the shrunk counterexample.
 *
 * Stoichiometry is checked with an element counter written here, independent of the engine's,
 * in exact rational arithmetic (bigint), as docs/design.md asks (stoichiometry is exact, no float tolerance).
 */
import fc from 'fast-check';
import {
  BUILTIN_POTENTIALS,
  EngineError,
  balanceSkeleton,
  combineHalfReactions,
  convertPotentialV,
  formatNotation,
  formatSpecies,
  listReferences,
  parseNotation,
  parseSpecies,
  phaseOf,
  type Notation,
  type Rational,
  type Reaction,
  type Species,
  type Term,
} from '../../src/engine';
import {
  concCell,
  electrons,
  logK,
  nernstSlope,
  potential,
  stdPotential,
  vsRef,
  type Result,
} from '../../src/functions/catalogue';

const SEED = Number(process.env.POTENTIA_PROPERTY_SEED ?? 7_310_553);
fc.configureGlobal({ seed: SEED, numRuns: 300 });

// ---------------------------------------------------------------------------------------
// Exact rationals (independent of src/engine/rational.ts)

interface Q {
  n: bigint;
  d: bigint;
}
const gcd = (a: bigint, b: bigint): bigint => {
  a = a < 0n ? -a : a;
  b = b < 0n ? -b : b;
  while (b) [a, b] = [b, a % b];
  return a;
};
const q = (n: bigint, d = 1n): Q => {
  if (d === 0n) throw new Error('zero denominator');
  if (d < 0n) [n, d] = [-n, -d];
  const g = gcd(n, d) || 1n;
  return { n: n / g, d: d / g };
};
const qAdd = (a: Q, b: Q): Q => q(a.n * b.d + b.n * a.d, a.d * b.d);
const qMul = (a: Q, b: Q): Q => q(a.n * b.n, a.d * b.d);
const qDiv = (a: Q, b: Q): Q => q(a.n * b.d, a.d * b.n);
const qEq = (a: Q, b: Q): boolean => a.n === b.n && a.d === b.d;
const qStr = (a: Q): string => (a.d === 1n ? `${a.n}` : `${a.n}/${a.d}`);
const fromRational = (r: Rational): Q => q(r.num, r.den);
const toRational = (a: Q): Rational => ({ num: a.n, den: a.d });

// ---------------------------------------------------------------------------------------
// An element counter of our own: element symbols, integer subscripts, nested () and [],
// hydrate dots (· or *) with an optional multiplier.

function countAtoms(formula: string): Map<string, bigint> {
  let i = 0;
  const num = (): bigint => {
    const m = /^\d+/.exec(formula.slice(i));
    if (!m) return 1n;
    i += m[0].length;
    return BigInt(m[0]);
  };
  const merge = (into: Map<string, bigint>, from: Map<string, bigint>, k: bigint) => {
    for (const [el, c] of from) into.set(el, (into.get(el) ?? 0n) + c * k);
  };
  const group = (close: string | null): Map<string, bigint> => {
    const out = new Map<string, bigint>();
    while (i < formula.length) {
      const ch = formula[i]!;
      if (ch === close) return out;
      if (ch === '(' || ch === '[') {
        i++;
        const inner = group(ch === '(' ? ')' : ']');
        i++; // the closer
        merge(out, inner, num());
      } else if (ch === '·' || ch === '*') {
        i++;
        const k = num();
        merge(out, group(close), k);
      } else {
        const m = /^[A-Z][a-z]?/.exec(formula.slice(i));
        if (!m) throw new Error(`counter cannot read ${formula} at ${i}`);
        i += m[0].length;
        out.set(m[0], (out.get(m[0]) ?? 0n) + num());
      }
    }
    return out;
  };
  return group(null);
}

/** Net atoms and charge, products minus reactants: all zero for a balanced reaction. */
function netBalance(r: Reaction): Map<string, Q> {
  const net = new Map<string, Q>();
  const add = (key: string, x: Q) => net.set(key, qAdd(net.get(key) ?? q(0n), x));
  const side = (terms: readonly Term[], sign: bigint) => {
    for (const t of terms) {
      const c = qMul(fromRational(t.coefficient), q(sign));
      add('charge', qMul(c, q(BigInt(t.species.charge))));
      if (t.species.isElectron) continue;
      for (const [el, k] of countAtoms(t.species.formula)) add(el, qMul(c, q(k)));
    }
  };
  side(r.reactants, -1n);
  side(r.products, 1n);
  return net;
}

function expectConserved(r: Reaction, what: string): void {
  const bad = [...netBalance(r)].filter(([, x]) => x.n !== 0n).map(([k, x]) => `${k} ${qStr(x)}`);
  if (bad.length > 0) throw new Error(`${what} does not conserve: ${bad.join(', ')}`);
}

/** Signed stoichiometry (products +, reactants −) by species identity, including phase. */
function stoich(r: Reaction): Map<string, Q> {
  const m = new Map<string, Q>();
  const side = (terms: readonly Term[], sign: bigint) => {
    for (const t of terms) {
      const key = `${t.species.formula}|${t.species.charge}|${phaseOf(t.species) ?? ''}`;
      m.set(key, qAdd(m.get(key) ?? q(0n), qMul(fromRational(t.coefficient), q(sign))));
    }
  };
  side(r.reactants, -1n);
  side(r.products, 1n);
  for (const [k, v] of m) if (v.n === 0n) m.delete(k);
  return m;
}

/** The positive factor g with a = g·b species by species, or null where there is none. */
function proportional(a: Map<string, Q>, b: Map<string, Q>): Q | null {
  if (a.size !== b.size || a.size === 0) return null;
  let g: Q | null = null;
  for (const [k, x] of a) {
    const y = b.get(k);
    if (!y) return null;
    const r = qDiv(x, y);
    if (g === null) g = r;
    else if (!qEq(g, r)) return null;
  }
  return g !== null && g.n > 0n ? g : null;
}

// ---------------------------------------------------------------------------------------
// The built-in rows and a pool of ~40 real species taken from them

interface Row {
  readonly text: string;
  readonly reaction: Reaction;
}
const ROWS: readonly Row[] = BUILTIN_POTENTIALS.map((r) => {
  const n = parseNotation(r.halfReaction);
  if (n.kind !== 'half') throw new Error(`built-in row is not a half-reaction: ${r.halfReaction}`);
  return { text: r.halfReaction, reaction: n.reaction };
});

const ALL_SPECIES: readonly Species[] = (() => {
  const byText = new Map<string, Species>();
  for (const r of ROWS)
    for (const t of [...r.reaction.reactants, ...r.reaction.products])
      if (!t.species.isElectron) byText.set(formatSpecies(t.species), t.species);
  return [...byText.values()];
})();

/** Species whose spelling is easy to get wrong; always in the pool. */
const MUST = [
  '[Fe(CN)6]^3-',
  'SO4^2-',
  'Hg2^2+',
  'VO^2+',
  'VO2^+',
  'I3^-',
  'Cr2O7^2-',
  'MnO2(s)',
  'H2(g)',
  'Hg(l)',
];
const POOL: readonly Species[] = (() => {
  const must = MUST.map((t) => {
    const s = ALL_SPECIES.find(
      (x) => formatSpecies(x) === t || formatSpecies(parseSpecies(t)) === formatSpecies(x),
    );
    if (!s) throw new Error(`${t} is not a species of the built-in table`);
    return s;
  });
  const rest = ALL_SPECIES.filter((s) => !must.includes(s));
  const stride = Math.max(1, Math.floor(rest.length / 30));
  return [...must, ...rest.filter((_, i) => i % stride === 0).slice(0, 30)];
})();

function sameSpeciesExactly(a: Species, b: Species): boolean {
  return (
    a.formula === b.formula && a.charge === b.charge && a.phase === b.phase && a.isElectron === b.isElectron
  );
}

const ELECTRON = parseSpecies('e-');
const poolSpecies = fc.constantFrom(...POOL);

/** Coefficients: integers, simple fractions and decimals, always positive. */
const coefficient: fc.Arbitrary<Q> = fc.oneof(
  fc.integer({ min: 1, max: 14 }).map((n) => q(BigInt(n))),
  fc
    .tuple(fc.integer({ min: 1, max: 9 }), fc.integer({ min: 2, max: 6 }))
    .map(([a, b]) => q(BigInt(a), BigInt(b))),
  fc.integer({ min: 1, max: 999 }).map((n) => q(BigInt(n), 100n)),
);

const term = (species: fc.Arbitrary<Species>): fc.Arbitrary<Term> =>
  fc.record({ coefficient: coefficient.map(toRational), species, activity: fc.constant(null) });

/** A random reaction over the pool: 1–4 terms a side, optionally electrons on the left. */
const reaction: fc.Arbitrary<Reaction> = fc
  .tuple(
    fc.array(term(poolSpecies), { minLength: 1, maxLength: 4 }),
    fc.array(term(poolSpecies), { minLength: 1, maxLength: 4 }),
    fc.option(term(fc.constant(ELECTRON))),
  )
  .map(([reactants, products, e]) => ({ reactants: e ? [...reactants, e] : reactants, products }));

function sameTerms(a: readonly Term[], b: readonly Term[]): boolean {
  return (
    a.length === b.length &&
    a.every((t, i) => {
      const u = b[i]!;
      return (
        t.coefficient.num === u.coefficient.num &&
        t.coefficient.den === u.coefficient.den &&
        sameSpeciesExactly(t.species, u.species)
      );
    })
  );
}

function sameNotation(a: Notation, b: Notation): boolean {
  if (a.kind !== b.kind) return false;
  if ((a.kind === 'half' || a.kind === 'reaction') && (b.kind === 'half' || b.kind === 'reaction'))
    return (
      sameTerms(a.reaction.reactants, b.reaction.reactants) &&
      sameTerms(a.reaction.products, b.reaction.products)
    );
  if (a.kind === 'couple' && b.kind === 'couple') {
    const same = (x: readonly Species[], y: readonly Species[]) =>
      x.length === y.length && x.every((s, i) => sameSpeciesExactly(s, y[i]!));
    return same(a.couple.oxidized, b.couple.oxidized) && same(a.couple.reduced, b.couple.reduced);
  }
  if (a.kind === 'cell' && b.kind === 'cell') {
    const phases = (x: typeof a.diagram.left, y: typeof a.diagram.left) =>
      x.length === y.length &&
      x.every(
        (p, i) =>
          p.length === y[i]!.length && p.every((c, j) => sameSpeciesExactly(c.species, y[i]![j]!.species)),
      );
    return (
      a.diagram.bridge === b.diagram.bridge &&
      phases(a.diagram.left, b.diagram.left) &&
      phases(a.diagram.right, b.diagram.right)
    );
  }
  return false;
}

/** The notation of a generated reaction: a half-reaction where electrons remain, else a reaction. */
function notationOf(r: Reaction): Notation {
  const e = [...r.reactants, ...r.products].some((t) => t.species.isElectron);
  return e ? { kind: 'half', reaction: r } : { kind: 'reaction', reaction: r };
}

/**
 * Alternative spellings of a generated reaction that must read as the same reaction: any
 * arrow, loose or tight spacing (one space around "+" and the arrow is the least: "Cl-->"
 * and "Cu2++" are ambiguous), coefficients as integers, decimals, fractions or "½".
 */
const ARROWS = ['->', '→', '=', '<=>', '⇌', '-->', '=>'];
function spell(r: Reaction, arrow: string, loose: boolean, coefStyle: number, caret: boolean): string {
  const gap = loose ? '   ' : ' ';
  const coef = (c: Rational): string => {
    if (c.num === c.den) return coefStyle === 2 ? `1${gap}` : '';
    if (c.den === 1n) return `${c.num}${gap}`;
    if (coefStyle === 1 && 10n ** 6n % c.den === 0n) return `${Number(c.num) / Number(c.den)}${gap}`;
    if (c.num === 1n && c.den === 2n && coefStyle === 2) return `½${gap}`;
    return `${c.num}/${c.den}${gap}`;
  };
  const side = (ts: readonly Term[]) =>
    ts
      .map((t) => {
        const name =
          caret && !t.species.isElectron
            ? header(t.species) + (t.species.phase ? `(${t.species.phase})` : '')
            : formatSpecies(t.species);
        return coef(t.coefficient) + name;
      })
      .join(`${gap}+${gap}`);
  return `${loose ? '  ' : ''}${side(r.reactants)}${gap}${arrow}${gap}${side(r.products)}${loose ? ' ' : ''}`;
}

/** A species name for a species argument, always in the unambiguous caret form ("VO^2+"). */
function header(s: Species): string {
  if (s.charge === 0) return s.formula;
  const mag = Math.abs(s.charge);
  return `${s.formula}^${mag === 1 ? '' : mag}${s.charge > 0 ? '+' : '-'}`;
}

// ---------------------------------------------------------------------------------------

describe('notation round trip: parse(format(x)) = x', () => {
  test('random reactions and half-reactions over the pool read back as themselves, and format stably', () => {
    fc.assert(
      fc.property(reaction, (r) => {
        const x = notationOf(r);
        const text = formatNotation(x);
        const y = parseNotation(text);
        expect(sameNotation(y, x)).toBe(true);
        expect(formatNotation(y)).toBe(text);
      }),
    );
  });

  test('every spelling of a reaction (arrows, spacing, decimal and fraction coefficients, caret charges) reads as the same reaction', () => {
    fc.assert(
      fc.property(
        reaction,
        fc.constantFrom(...ARROWS),
        fc.boolean(),
        fc.integer({ min: 0, max: 2 }),
        fc.boolean(),
        (r, arrow, loose, style, caret) => {
          const text = spell(r, arrow, loose, style, caret);
          const y = parseNotation(text);
          expect(sameNotation(y, notationOf(r))).toBe(true);
          expect(formatNotation(y)).toBe(formatNotation(notationOf(r)));
        },
      ),
    );
  });

  test('random couples and cell diagrams over the pool read back as themselves', () => {
    const list = fc.array(poolSpecies, { minLength: 1, maxLength: 2 });
    const couple = fc
      .tuple(list, list)
      .map(([oxidized, reduced]): Notation => ({ kind: 'couple', couple: { oxidized, reduced } }));
    const phases = fc.array(
      list.map((ss) => ss.map((species) => ({ species, activity: null }))),
      { minLength: 1, maxLength: 3 },
    );
    const cell = fc
      .tuple(phases, phases)
      .map(([left, right]): Notation => ({ kind: 'cell', diagram: { left, right, bridge: true } }));
    fc.assert(
      fc.property(fc.oneof(couple, cell), (x) => {
        const text = formatNotation(x);
        const y = parseNotation(text);
        expect(sameNotation(y, x)).toBe(true);
        expect(formatNotation(y)).toBe(text);
      }),
    );
  });

  test('species with random charges and phases read back as themselves', () => {
    const species = fc
      .tuple(
        fc.constantFrom(...ALL_SPECIES.map((s) => s.formula)),
        fc.integer({ min: -6, max: 6 }),
        fc.constantFrom(null, 's', 'l', 'g', 'aq'),
      )
      .map(([formula, charge, phase]): Species => ({
        formula,
        charge,
        phase: phase as Species['phase'],
        isElectron: false,
      }));
    fc.assert(
      fc.property(species, (s) => {
        const text = formatSpecies(s);
        expect(sameSpeciesExactly(parseSpecies(text), s)).toBe(true);
      }),
    );
  });

  // VO^2+ once came out as "VO2+", which reads back as VO2^+ (a charge digit glued to a formula
  // that ends in a letter reads as a subscript); the vanadium rows pin it.
  test('every species of the built-in table reads back as itself from its canonical text', () => {
    const wrong = ALL_SPECIES.filter((s) => !sameSpeciesExactly(parseSpecies(formatSpecies(s)), s)).map(
      (s) => `${formatSpecies(s)} (${s.formula}, charge ${s.charge})`,
    );
    expect(wrong).toEqual([]);
    expect(formatNotation(parseNotation('VO2^+ + 2 H+ + e- -> VO^2+ + H2O'))).toBe(
      'VO2+ + 2 H+ + e- -> VO^2+ + H2O',
    );
  });
});

// ---------------------------------------------------------------------------------------

const rowIndex = fc.integer({ min: 0, max: ROWS.length - 1 });
const scale = coefficient; // a positive rational multiplier

function scaled(r: Reaction, k: Q): Reaction {
  const m = (t: Term): Term => ({ ...t, coefficient: toRational(qMul(fromRational(t.coefficient), k)) });
  return { reactants: r.reactants.map(m), products: r.products.map(m) };
}

function electronsIn(r: Reaction): Q {
  let e = q(0n);
  for (const t of r.reactants) if (t.species.isElectron) e = qAdd(e, fromRational(t.coefficient));
  for (const t of r.products)
    if (t.species.isElectron) e = qAdd(e, qMul(fromRational(t.coefficient), q(-1n)));
  return e;
}

describe('balancing conserves every element and charge exactly', () => {
  test('every built-in row balances by the independent counter', () => {
    for (const r of ROWS) expectConserved(r.reaction, r.text);
  });

  test('combineHalfReactions of random multiples of two built-in rows conserves atoms and charge and equals n·(A/nA − B/nB)', () => {
    fc.assert(
      fc.property(rowIndex, rowIndex, scale, scale, (i, j, ka, kb) => {
        fc.pre(i !== j);
        const a = scaled(ROWS[i]!.reaction, ka);
        const b = scaled(ROWS[j]!.reaction, kb);
        const c = combineHalfReactions(a, b);
        expectConserved(c.reaction, `${ROWS[i]!.text} with ${ROWS[j]!.text} reversed`);
        expect([...c.reaction.reactants, ...c.reaction.products].some((t) => t.species.isElectron)).toBe(
          false,
        );
        expect(c.n).toBeGreaterThan(0);
        // independent expectation: ν = n·(νA/nA − νB/nB), species by species
        // n = lcm of the two electron counts (rationals): lcm(p/q, r/s) = lcm(p·s, r·q)/(q·s)
        const na = electronsIn(a);
        const nb = electronsIn(b);
        const x = na.n * nb.d;
        const y = nb.n * na.d;
        const n = q((x / gcd(x, y)) * y, na.d * nb.d);
        expect(c.n).toBeCloseTo(Number(n.n) / Number(n.d), 12);
        const expected = new Map<string, Q>();
        const addAll = (m: Map<string, Q>, f: Q) => {
          for (const [k, v] of m)
            if (!k.startsWith('e|')) expected.set(k, qAdd(expected.get(k) ?? q(0n), qMul(v, f)));
        };
        addAll(stoich(a), qDiv(n, electronsIn(a)));
        addAll(stoich(b), qMul(qDiv(n, electronsIn(b)), q(-1n)));
        for (const [k, v] of expected) if (v.n === 0n) expected.delete(k);
        const got = stoich(c.reaction);
        expect([...got.keys()].sort()).toEqual([...expected.keys()].sort());
        for (const [k, v] of expected) expect(qStr(got.get(k)!)).toBe(qStr(v));
      }),
    );
  });

  const MEDIUM_KEYS = ['H|1|aq', 'OH|-1|aq', 'H2O|0|l'];
  const strip = (r: Reaction, dropMedium: boolean): Reaction => {
    const keep = (t: Term) =>
      !dropMedium ||
      !MEDIUM_KEYS.includes(`${t.species.formula}|${t.species.charge}|${phaseOf(t.species) ?? ''}`);
    const one = (t: Term): Term => ({ ...t, coefficient: { num: 1n, den: 1n } });
    return { reactants: r.reactants.filter(keep).map(one), products: r.products.filter(keep).map(one) };
  };

  test.each([
    ['coefficients stripped, no medium', false],
    ['coefficients, H+, OH- and H2O stripped, medium from the reaction', true],
  ])(
    'balanceSkeleton of a built-in-derived cell reaction (%s): the same reaction, or a typed unbalanced error',
    (_, dropMedium) => {
      const outcomes = { balanced: 0, unbalanced: 0 };
      fc.assert(
        fc.property(rowIndex, rowIndex, (i, j) => {
          fc.pre(i !== j);
          const cell = combineHalfReactions(ROWS[i]!.reaction, ROWS[j]!.reaction).reaction;
          fc.pre(cell.reactants.length > 0 && cell.products.length > 0);
          const skeleton = strip(cell, dropMedium as boolean);
          fc.pre(skeleton.reactants.length > 0 && skeleton.products.length > 0);
          const keys = [...stoich(cell).keys()];
          const medium = !dropMedium
            ? null
            : keys.includes('OH|-1|aq')
              ? 'base'
              : keys.some((k) => MEDIUM_KEYS.includes(k))
                ? 'acid'
                : null;
          let result;
          try {
            result = balanceSkeleton(skeleton, medium);
          } catch (e) {
            if (e instanceof EngineError && e.kind === 'unbalanced') {
              outcomes.unbalanced++;
              return;
            }
            throw e;
          }
          outcomes.balanced++;
          expectConserved(result.reaction, 'the balanced skeleton');
          // a unique balance of the cell reaction's own species is that reaction, scaled (where
          // the cell reaction holds both H+ and OH-, their neutralisation makes it non-unique)
          if (!(keys.includes('H|1|aq') && keys.includes('OH|-1|aq')))
            expect(proportional(stoich(result.reaction), stoich(cell))).not.toBeNull();
        }),
        { numRuns: 400 },
      );
      // both outcomes occur, so the property exercised the balancer and its error
      expect(outcomes.balanced).toBeGreaterThan(0);
    },
  );
});

// ---------------------------------------------------------------------------------------
// Thermodynamics through the catalogue

function num(r: Result, what: string): number {
  const c = r[0]?.[0];
  if (typeof c !== 'number') throw new Error(`${what} gave ${JSON.stringify(c)}`);
  return c;
}

/** Species names of a row (no electrons), each with its side. */
function speciesOf(r: Row): { name: string; side: 'reactant' | 'product'; pure: boolean }[] {
  const out: { name: string; side: 'reactant' | 'product'; pure: boolean }[] = [];
  for (const [terms, side] of [
    [r.reaction.reactants, 'reactant'],
    [r.reaction.products, 'product'],
  ] as const)
    for (const t of terms)
      if (!t.species.isElectron) {
        const p = phaseOf(t.species);
        out.push({ name: header(t.species), side, pure: p === 's' || p === 'l' });
      }
  return out;
}

const tempC = fc.double({ min: 0, max: 100, noNaN: true });
const activity = fc.double({ min: -6, max: 1, noNaN: true }).map((x) => 10 ** x);

describe('Nernst equation properties', () => {
  test('E at Q = 1 equals E°: POTENTIAL with all activities 1 (or none given) = STDPOTENTIAL, 0–100 °C', () => {
    fc.assert(
      fc.property(rowIndex, tempC, (i, t) => {
        const row = ROWS[i]!;
        const names = speciesOf(row).map((s) => s.name);
        const e0 = num(stdPotential(row.text, t, null), `STDPOTENTIAL(${row.text}, ${t})`);
        const e = num(potential(row.text, [names], [names.map(() => 1)], t, null), `POTENTIAL(${row.text})`);
        const eStd = num(
          potential(row.text, null, null, t, null),
          `POTENTIAL(${row.text}) at standard state`,
        );
        expect(Math.abs(e - e0)).toBeLessThanOrEqual(1e-12);
        expect(Math.abs(eStd - e0)).toBeLessThanOrEqual(1e-12);
      }),
    );
  });

  test('log K round-trips with E°: E° = LOGK·slope/n, for rows and for (E°, n) given as numbers', () => {
    fc.assert(
      fc.property(
        rowIndex,
        tempC,
        fc.double({ min: -3, max: 3, noNaN: true }),
        fc.integer({ min: 1, max: 8 }),
        (i, t, e0, n) => {
          const row = ROWS[i]!;
          const lk = num(logK(row.text, null, t, null), `LOGK(${row.text})`);
          const ne = num(electrons(row.text, null), `ELECTRONS(${row.text})`);
          const slope = num(nernstSlope(t, 1), 'NERNSTSLOPE');
          const std = num(stdPotential(row.text, t, null), 'STDPOTENTIAL');
          expect(Math.abs((lk * slope) / ne - std)).toBeLessThanOrEqual(1e-12);
          const lk2 = num(logK(e0, n, t, null), `LOGK(${e0}, ${n})`);
          expect(Math.abs(lk2 * num(nernstSlope(t, n), 'NERNSTSLOPE') - e0)).toBeLessThanOrEqual(1e-12);
        },
      ),
    );
  });

  test("raising a reactant's activity never lowers E of a reduction; raising a product's never raises it", () => {
    fc.assert(
      fc.property(
        rowIndex,
        fc.array(activity, { minLength: 8, maxLength: 8 }),
        fc.nat(),
        fc.double({ min: 1.001, max: 1e6, noNaN: true }),
        tempC,
        (i, acts, pick, factor, t) => {
          const row = ROWS[i]!;
          const sp = speciesOf(row);
          const names = sp.map((s) => s.name);
          const base = names.map((_, k) => acts[k % acts.length]!);
          const k = pick % sp.length;
          const raised = base.map((a, m) => (m === k ? a * factor : a));
          const e1 = num(potential(row.text, [names], [base], t, null), 'POTENTIAL');
          const e2 = num(potential(row.text, [names], [raised], t, null), 'POTENTIAL');
          if (sp[k]!.side === 'reactant') expect(e2).toBeGreaterThan(e1);
          else expect(e2).toBeLessThan(e1);
        },
      ),
    );
  });

  test('a concentration cell at equal activities is 0, reverses sign when swapped, and adds', () => {
    const variableRows = ROWS.filter((r) => speciesOf(r).some((s) => !s.pure));
    fc.assert(
      fc.property(
        fc.constantFrom(...variableRows),
        fc.nat(),
        activity,
        activity,
        activity,
        tempC,
        (row, pick, a, b, c, t) => {
          const vary = speciesOf(row).filter((s) => !s.pure);
          const sp = vary[pick % vary.length]!.name;
          const cc = (l: number, r: number) =>
            num(concCell(row.text, l, r, sp, t, null), `CONCCELL(${row.text}, ${l}, ${r}, ${sp})`);
          expect(Math.abs(cc(a, a))).toBe(0);
          expect(cc(a, b)).toBeCloseTo(-cc(b, a), 14);
          expect(Math.abs(cc(a, b) + cc(b, c) - cc(a, c))).toBeLessThanOrEqual(1e-12);
        },
      ),
    );
  });
});

describe('reference scales and the Nernst slope', () => {
  // electrodes with a known temperature dependence, over the range every model covers
  // (0–40 °C: Ag/AgCl in seawater); the others are an error away from 25 °C
  const REFS = listReferences()
    .filter((r) => r.model.kind !== 'unknown')
    .map((r) => r.id);
  const refTempC = fc.double({ min: 0.5, max: 40, noNaN: true });
  const potentialV = fc.double({ min: -3, max: 3, noNaN: true });
  const pH = fc.double({ min: -1, max: 15, noNaN: true });

  test(`conversions compose (A→B→C = A→C) and invert (A→B→A = E) within 1e-12 for all ${REFS.length ** 3} triples`, () => {
    fc.assert(
      fc.property(potentialV, refTempC, pH, (e, t, ph) => {
        let worst = { err: 0, where: '' };
        const note = (err: number, where: () => string) => {
          if (!(err <= worst.err)) worst = { err, where: where() };
        };
        for (const a of REFS)
          for (const b of REFS) {
            const ab = convertPotentialV(e, a, b, t, ph);
            note(Math.abs(convertPotentialV(ab, b, a, t, ph) - e), () => `${a}→${b}→${a}`);
            for (const c of REFS) {
              const abc = convertPotentialV(ab, b, c, t, ph);
              note(Math.abs(abc - convertPotentialV(e, a, c, t, ph)), () => `${a}→${b}→${c}`);
            }
          }
        expect(worst.err <= 1e-12 ? 'ok' : `${worst.where}: off by ${worst.err}`).toBe('ok');
      }),
      { numRuns: 30 },
    );
  });

  test('VSREF agrees: A→B then B→A is the identity for every pair, RHE with a random pH', () => {
    fc.assert(
      fc.property(potentialV, refTempC, pH, (e, t, ph) => {
        const off: string[] = [];
        for (const a of REFS)
          for (const b of REFS) {
            const ab = num(vsRef(e, a, b, ph, t), `VSREF(${e}, ${a}, ${b})`);
            const err = Math.abs(num(vsRef(ab, b, a, ph, t), 'VSREF') - e);
            if (!(err <= 1e-12)) off.push(`${a}→${b}→${a}: ${err}`);
          }
        expect(off).toEqual([]);
      }),
      { numRuns: 20 },
    );
  });

  test('NERNSTSLOPE is linear in T, proportional to 1/n, and 59.159 mV at 25 °C', () => {
    // 25 °C: RT ln10/F = 59.15935 mV (derived from the SI 2019 exact constants)
    expect(num(nernstSlope(25, 1), 'NERNSTSLOPE') * 1000).toBeCloseTo(59.15935, 5);
    fc.assert(
      fc.property(
        tempC,
        tempC,
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.integer({ min: 1, max: 8 }),
        (t1, t2, lam, n) => {
          const s = (t: number, k = 1) => num(nernstSlope(t, k), 'NERNSTSLOPE');
          const mid = lam * t1 + (1 - lam) * t2;
          expect(Math.abs(s(mid) - (lam * s(t1) + (1 - lam) * s(t2)))).toBeLessThanOrEqual(1e-15);
          expect(Math.abs(s(t1, n) * n - s(t1))).toBeLessThanOrEqual(1e-16);
          // slope / T(K) is the same constant at every temperature
          expect(s(t1) / (t1 + 273.15)).toBeCloseTo(s(25) / 298.15, 15);
        },
      ),
    );
  });
});
