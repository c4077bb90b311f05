/**
 * Atom and charge balance of reactions, exactly; combining half-reactions into a
 * cell reaction; balancing skeleton redox equations in acid or base by the exact
 * null space of the composition matrix.
 */
import { EngineError, quote } from '../errors';
import {
  type Rational,
  ZERO,
  add,
  mul,
  sign,
  isZero,
  formatRational,
  ratInt,
  rat,
  lcm,
  neg,
  div,
  eq,
} from '../rational';
import {
  type Species,
  elementsOf,
  sameSpecies,
  speciesPhaseKey,
  ELECTRON,
  formatSpecies,
} from '../notation/species';
import {
  type Reaction,
  type StoichEntry,
  stoichiometry,
  reactionFromStoichiometry,
  electronsConsumed,
  formatReaction,
} from '../notation/reaction';
import { nullSpace, toSmallestIntegers, fromBig } from './nullspace';

/** Result of a balance check. */
export interface BalanceCheck {
  readonly balanced: boolean;
  /** One line per element or charge that does not balance, e.g. "O: 4 on the left, 3 on the right". */
  readonly problems: readonly string[];
}

/**
 * Check atom and charge balance exactly (rational arithmetic, no tolerance).
 *
 * @example
 * checkBalance(parseReaction('MnO4- + 8 H+ + 5 e- -> Mn2+ + 4 H2O')).balanced // true
 */
export function checkBalance(r: Reaction): BalanceCheck {
  const left = new Map<string, Rational>();
  const right = new Map<string, Rational>();
  const addSide = (side: Map<string, Rational>, key: string, x: Rational) =>
    side.set(key, add(side.get(key) ?? ZERO, x));
  const tally = (terms: Reaction['reactants'], side: Map<string, Rational>) => {
    for (const t of terms) {
      for (const [el, c] of elementsOf(t.species)) addSide(side, el, mul(t.coefficient, ratInt(c)));
      addSide(side, 'charge', mul(t.coefficient, ratInt(t.species.charge)));
    }
  };
  tally(r.reactants, left);
  tally(r.products, right);
  const keys = new Set([...left.keys(), ...right.keys()]);
  const problems: string[] = [];
  for (const k of keys) {
    const a = left.get(k) ?? ZERO;
    const b = right.get(k) ?? ZERO;
    if (!eq(a, b)) {
      problems.push(
        k === 'charge'
          ? `charge: ${formatRational(a)} on the left, ${formatRational(b)} on the right`
          : `${k}: ${formatRational(a)} on the left, ${formatRational(b)} on the right`,
      );
    }
  }
  return { balanced: problems.length === 0, problems };
}

/**
 * Throw an `unbalanced` error where the reaction does not balance.
 *
 * @example
 * assertBalanced(parseReaction('Cu2+ + e- -> Cu'), 'Cu2+ + e- -> Cu') // throws: charge …
 */
export function assertBalanced(r: Reaction, text: string, argument = 'reaction'): void {
  const c = checkBalance(r);
  if (!c.balanced) {
    throw new EngineError(
      'unbalanced',
      `${quote(text)} does not balance (${c.problems.join('; ')}). Correct the coefficients.`,
      argument,
      undefined,
      'balance',
    );
  }
}

/** Multiply a stoichiometry by a rational. */
export function scaleStoich(entries: readonly StoichEntry[], f: Rational): StoichEntry[] {
  return entries.map((e) => ({ species: e.species, nu: mul(e.nu, f) }));
}

/** Sum stoichiometries, merging like species and dropping those that cancel. Order: first appearance. */
export function addStoich(...parts: (readonly StoichEntry[])[]): StoichEntry[] {
  const out: { species: Species; nu: Rational }[] = [];
  for (const part of parts) {
    for (const e of part) {
      const prev = out.find((o) => speciesPhaseKey(o.species) === speciesPhaseKey(e.species));
      if (prev) prev.nu = add(prev.nu, e.nu);
      else out.push({ species: e.species, nu: e.nu });
    }
  }
  return out.filter((o) => !isZero(o.nu));
}

/** A cell reaction made from two half-reactions. */
export interface CombinedReaction {
  readonly reaction: Reaction;
  /** Electrons transferred in the cell reaction as written (the LCM of the two). */
  readonly n: number;
}

/**
 * Combine a reduction (right electrode) with the reverse of another reduction
 * (left electrode) into a cell reaction, scaling by the least common multiple of
 * their electrons. Standard potentials are not multiplied (E° is intensive).
 *
 * @param reduction the half-reaction that runs as a reduction (cathode)
 * @param oxidation the half-reaction, written as a reduction, that runs backwards (anode)
 * @example
 * formatReaction(combineHalfReactions(parseReaction('Cu2+ + 2e- -> Cu'), parseReaction('Zn2+ + 2e- -> Zn')).reaction)
 * // 'Cu2+ + Zn -> Cu + Zn2+'
 */
export function combineHalfReactions(reduction: Reaction, oxidation: Reaction): CombinedReaction {
  const n1 = electronsConsumed(reduction);
  const n2 = electronsConsumed(oxidation);
  if (sign(n1) <= 0 || sign(n2) <= 0) {
    throw new EngineError(
      'argument',
      'Both half-reactions must be written as reductions (electrons on the left).',
      'reaction',
    );
  }
  // L = lcm over rationals: scale both to integer electron counts first
  const l = lcmRational(n1, n2);
  const s1 = scaleStoich(stoichiometry(reduction), div(l, n1));
  const s2 = scaleStoich(stoichiometry(oxidation), neg(div(l, n2)));
  const total = addStoich(s1, s2).filter((e) => !e.species.isElectron);
  if (total.length === 0) {
    throw new EngineError(
      'argument',
      'The two half-reactions are the same couple: a cell needs two different electrodes (for a concentration cell use CONCCELL).',
      'reaction',
    );
  }
  return { reaction: reactionFromStoichiometry(total), n: Number(l.num) / Number(l.den) };
}

function lcmRational(a: Rational, b: Rational): Rational {
  // lcm(p/q, r/s) = lcm(p·s, r·q) / (q·s)
  return rat(lcm(a.num * b.den, b.num * a.den), a.den * b.den);
}

/** The medium a skeleton equation is balanced in. */
export type Medium = 'acid' | 'base' | null;

/**
 * Read a medium argument: "acid"/"acidic"/"H+", "base"/"basic"/"alkaline"/"OH-", or empty for none.
 *
 * @example
 * parseMedium('Acidic') // 'acid'
 */
export function parseMedium(text: string | null | undefined): Medium {
  if (text === null || text === undefined) return null;
  const t = text.trim().toLowerCase();
  if (t === '' || t === 'none' || t === 'neutral') return null;
  if (['acid', 'acidic', 'h+', 'acid solution'].includes(t)) return 'acid';
  if (['base', 'basic', 'alkaline', 'oh-', 'base solution'].includes(t)) return 'base';
  throw new EngineError('argument', `medium must be "acid", "base" or empty; got ${quote(text)}.`, 'medium');
}

const H_PLUS: Species = Object.freeze({ formula: 'H', charge: 1, phase: null, isElectron: false });
const OH_MINUS: Species = Object.freeze({ formula: 'OH', charge: -1, phase: null, isElectron: false });
const WATER: Species = Object.freeze({ formula: 'H2O', charge: 0, phase: null, isElectron: false });

/** Result of balancing a skeleton equation. */
export interface BalancedReaction {
  readonly reaction: Reaction;
  /** Electrons in the balanced equation (consumed; 0 for a full reaction). */
  readonly electrons: number;
}

/**
 * Balance a skeleton equation exactly. In `acid`, H+ and H2O are added as needed;
 * in `base`, OH- and H2O. They may land on either side. Where the skeleton cannot
 * balance without electrons, electrons are added (a half-reaction).
 * Each species keeps the side it was written on.
 *
 * @throws EngineError (`unbalanced`) where no balance exists, or it is not unique
 * @example
 * formatReaction(balanceSkeleton(parseReaction('MnO4- + Fe2+ -> Mn2+ + Fe3+'), 'acid').reaction)
 * // 'MnO4- + 5 Fe2+ + 8 H+ -> Mn2+ + 5 Fe3+ + 4 H2O'
 */
export function balanceSkeleton(
  skeleton: Reaction,
  medium: Medium,
  text = formatReaction(skeleton),
): BalancedReaction {
  type Col = { species: Species; side: -1 | 1 | 0 };
  const cols: Col[] = [];
  const addCol = (s: Species, side: -1 | 1 | 0) => {
    if (cols.some((c) => sameSpecies(c.species, s) && speciesPhaseKey(c.species) === speciesPhaseKey(s))) {
      if (side !== 0) {
        const c = cols.find((x) => speciesPhaseKey(x.species) === speciesPhaseKey(s))!;
        if (c.side !== 0 && c.side !== side) {
          throw new EngineError(
            'unbalanced',
            `${quote(text)} has ${formatSpecies(s)} on both sides; write it once.`,
            'reaction',
          );
        }
      }
      return;
    }
    cols.push({ species: s, side });
  };
  for (const t of skeleton.reactants) addCol(t.species, -1);
  for (const t of skeleton.products) addCol(t.species, 1);
  if (medium === 'acid') {
    addCol(H_PLUS, 0);
    addCol(WATER, 0);
  } else if (medium === 'base') {
    addCol(OH_MINUS, 0);
    addCol(WATER, 0);
  }
  let solution = solve(cols);
  if (solution.kind === 'none' && !cols.some((c) => c.species.isElectron)) {
    const withE = [...cols, { species: ELECTRON, side: 0 as const }];
    const s2 = solve(withE);
    if (s2.kind !== 'none') {
      cols.push({ species: ELECTRON, side: 0 });
      solution = s2;
    }
  }
  if (solution.kind === 'none') {
    const hint = medium === null ? ' If it takes place in water, try the medium "acid" or "base".' : '';
    throw new EngineError(
      'unbalanced',
      `${quote(text)} cannot be balanced with these species.${hint} Check the formulas and charges.`,
      'reaction',
    );
  }
  if (solution.kind === 'many') {
    throw new EngineError(
      'unbalanced',
      `${quote(text)} has no unique balance: ${solution.dimension} independent sets of coefficients satisfy it (it is a sum of independent reactions). Balance each half-reaction separately and combine them, or give the coefficients.`,
      'reaction',
    );
  }
  let v = solution.vector;
  // orient so that written reactants are consumed
  const firstFixed = cols.findIndex((c) => c.side !== 0 && v[cols.indexOf(c)] !== 0n);
  if (firstFixed >= 0) {
    const c = cols[firstFixed]!;
    const x = v[firstFixed]!;
    if ((x < 0n ? -1 : 1) !== c.side) v = v.map((y) => -y);
  }
  cols.forEach((c, i) => {
    const x = v[i]!;
    if (c.side !== 0 && (x === 0n || (x < 0n ? -1 : 1) !== c.side)) {
      const where = c.side < 0 ? 'reactant' : 'product';
      throw new EngineError(
        'unbalanced',
        `${quote(text)} cannot be balanced with ${formatSpecies(c.species)} as a ${where}: the only balance ${x === 0n ? 'leaves it out' : 'puts it on the other side'}. Check the skeleton${medium === null ? ', or, if it takes place in water, give the medium "acid" or "base"' : ''}.`,
        'reaction',
      );
    }
  });
  // order: reactants as written, then medium species; products as written, then medium species
  const entries: StoichEntry[] = [];
  const push = (pred: (c: Col, x: bigint) => boolean) =>
    cols.forEach((c, i) => {
      const x = v[i]!;
      if (x !== 0n && pred(c, x)) entries.push({ species: c.species, nu: fromBig(x) });
    });
  push((c) => c.side === -1);
  push((c, x) => c.side === 0 && x < 0n && !c.species.isElectron);
  push((c, x) => c.side === 0 && x < 0n && c.species.isElectron);
  push((c) => c.side === 1);
  push((c, x) => c.side === 0 && x > 0n);
  const reaction = reactionFromStoichiometry(entries);
  const e = electronsConsumed(reaction);
  return { reaction, electrons: Number(e.num) / Number(e.den) };
}

type Solution = { kind: 'none' } | { kind: 'many'; dimension: number } | { kind: 'one'; vector: bigint[] };

function solve(cols: readonly { species: Species }[]): Solution {
  const elements = new Set<string>();
  for (const c of cols) for (const el of elementsOf(c.species).keys()) elements.add(el);
  const rows: Rational[][] = [];
  for (const el of elements) rows.push(cols.map((c) => ratInt(elementsOf(c.species).get(el) ?? 0)));
  rows.push(cols.map((c) => ratInt(c.species.charge)));
  const basis = nullSpace(rows, cols.length);
  if (basis.length === 0) return { kind: 'none' };
  if (basis.length > 1) return { kind: 'many', dimension: basis.length };
  return { kind: 'one', vector: toSmallestIntegers(basis[0]!) };
}
