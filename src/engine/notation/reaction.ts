/**
 * Reactions and half-reactions: terms with coefficients, sides, arrows.
 *
 * Coefficients: integers, decimals, simple fractions (`1/2 O2`, `½ O2`).
 * Arrows: `->`, `→`, `=`, `<=>`, `⇌` (and `-->`, `<->`, `=>`).
 * Electrons: `e-` or `e`.
 */
import { type Rational, ONE, parseRational, formatRational, eq, add, neg, isZero, sign } from '../rational';
import { SourceText } from './source';
import {
  type InlineActivity,
  type Species,
  scanSpecies,
  formatSpecies,
  speciesPhaseKey,
  phaseOf,
  sameSpecies,
} from './species';

/** One term of a reaction: coefficient × species, with an optional inline activity. */
export interface Term {
  readonly coefficient: Rational;
  readonly species: Species;
  readonly activity: InlineActivity | null;
}

/** A reaction as written: reactants -> products. */
export interface Reaction {
  readonly reactants: readonly Term[];
  readonly products: readonly Term[];
}

/** One entry of a reaction's stoichiometry: products positive, reactants negative. */
export interface StoichEntry {
  readonly species: Species;
  readonly nu: Rational;
}

const ARROW = /<=>|<->|-->|->|=>|=/g;

/**
 * The largest numerator or denominator of a coefficient (2^53 − 1): coefficients are exact
 * rationals, and below this their electron counts and sums stay exact as numbers too. A
 * larger one is refused with a message, never rounded.
 */
export const MAX_COEFFICIENT_PART = BigInt(Number.MAX_SAFE_INTEGER);

/** Find the single arrow in normalised text; null where there is none. */
export function findArrow(src: SourceText, argument = 'reaction'): { at: number; length: number } | null {
  const t = src.text;
  ARROW.lastIndex = 0;
  const found: { at: number; length: number }[] = [];
  let m: RegExpExecArray | null;
  while ((m = ARROW.exec(t))) {
    // a "-" that is a charge sign directly before ">" is still the arrow ("Cl- ->" vs "Cl-->")
    found.push({ at: m.index, length: m[0].length });
  }
  if (found.length > 1) src.fail(found[1]!.at, 'a reaction has one arrow; found a second one', argument);
  return found[0] ?? null;
}

/** Parse the terms of one side between normalised indices [from, to). */
export function parseSide(src: SourceText, from: number, to: number, argument = 'reaction'): Term[] {
  const t = src.text;
  const terms: Term[] = [];
  let i = from;
  const skip = () => {
    while (i < to && t[i] === ' ') i++;
  };
  skip();
  if (i >= to) src.fail(i, 'expected a species', argument);
  for (;;) {
    skip();
    let coefficient: Rational = ONE;
    const cm = /^(\d+\/\d+|\d*\.\d+|\d+)(?=\s*[A-Z([e])/.exec(t.slice(i, to));
    if (cm) {
      const c = parseRational(cm[1] as string);
      if (!c || isZero(c))
        src.fail(i, `coefficient "${cm[1] as string}" must be a positive number`, argument);
      if (c.num > MAX_COEFFICIENT_PART || c.den > MAX_COEFFICIENT_PART) {
        src.fail(
          i,
          `coefficient "${cm[1] as string}" is too large to compute with exactly (numerator and denominator at most ${MAX_COEFFICIENT_PART.toLocaleString('en-US')}); divide the reaction through`,
          argument,
        );
      }
      coefficient = c;
      i += cm[0].length;
      skip();
    }
    if (i >= to) src.fail(i, 'expected a species', argument);
    const scanned = scanSpecies(src, i, argument);
    if (scanned.end > to) src.fail(to, 'expected the end of the side', argument);
    terms.push({ coefficient, species: scanned.species, activity: scanned.activity });
    i = scanned.end;
    skip();
    if (i >= to) break;
    if (t[i] === '+') {
      const plusAt = i;
      i++;
      skip();
      if (i >= to) src.fail(plusAt, 'expected a species after "+"', argument);
      continue;
    }
    src.fail(i, `expected "+" or the end of the side, found "${t[i] as string}"`, argument);
  }
  return terms;
}

/**
 * Parse a reaction or half-reaction ("MnO4- + 8 H+ + 5 e- -> Mn2+ + 4 H2O").
 *
 * @throws EngineError (`parse`) with the position of the problem
 * @example
 * parseReaction('Zn + Cu2+ -> Zn2+ + Cu').reactants.length // 2
 */
export function parseReaction(text: string, argument = 'reaction'): Reaction {
  const src = new SourceText(text);
  return parseReactionSource(src, argument);
}

/** Parse a reaction from an already normalised source. */
export function parseReactionSource(src: SourceText, argument = 'reaction'): Reaction {
  const arrow = findArrow(src, argument);
  if (!arrow)
    src.fail(
      src.text.length,
      'expected an arrow (->, =, <=>, → or ⇌) between reactants and products',
      argument,
    );
  const reactants = parseSide(src, 0, arrow.at, argument);
  const products = parseSide(src, arrow.at + arrow.length, src.text.length, argument);
  return { reactants, products };
}

/**
 * Net stoichiometry of a reaction: each distinct species once, products positive,
 * reactants negative; species that cancel are dropped. Species are merged when
 * {@link sameSpecies} and their effective phases agree.
 *
 * @example
 * stoichiometry(parseReaction('2 H2 + O2 -> 2 H2O')) // [{H2, -2}, {O2, -1}, {H2O, 2}]
 */
export function stoichiometry(r: Reaction): StoichEntry[] {
  const byKey = new Map<string, { species: Species; nu: Rational }>();
  const addTerm = (term: Term, s: number) => {
    const key = speciesPhaseKey(term.species);
    const prev = byKey.get(key);
    const nu = s > 0 ? term.coefficient : neg(term.coefficient);
    if (prev) prev.nu = add(prev.nu, nu);
    else byKey.set(key, { species: term.species, nu });
  };
  for (const term of r.reactants) addTerm(term, -1);
  for (const term of r.products) addTerm(term, 1);
  return Array.from(byKey.values()).filter((e) => !isZero(e.nu));
}

/**
 * Electrons consumed by the reaction as written (positive for a reduction,
 * negative for an oxidation, 0 for a full reaction), exactly.
 *
 * @example
 * electronsConsumed(parseReaction('Cu2+ + 2 e- -> Cu')) // { num: 2n, den: 1n }
 */
export function electronsConsumed(r: Reaction): Rational {
  const e = stoichiometry(r).find((x) => x.species.isElectron);
  return e ? neg(e.nu) : { num: 0n, den: 1n };
}

/** True where the reaction has electrons (net) on either side. */
export function isHalfReaction(r: Reaction): boolean {
  return sign(electronsConsumed(r)) !== 0;
}

function formatTerm(term: Term): string {
  const c = eq(term.coefficient, ONE) ? '' : formatRational(term.coefficient) + ' ';
  let s = formatSpecies(term.species);
  if (term.activity) s = withActivity(term.species, term.activity, s);
  return c + s;
}

/**
 * Append an inline activity to a formatted species. The phase is written only
 * where the species has one written (so the text reads back the same), unless
 * `showPhase` asks for the effective phase (cell diagrams for people):
 * "Zn2+(0.1 M)", "Zn2+(aq, 0.1 M)", "H2(g, 0.5 bar)".
 *
 * @param activity a number (activity or bar) or the inline activity as written
 */
export function withActivity(
  species: Species,
  activity: number | InlineActivity,
  formatted = formatSpecies(species, false),
  showPhase = false,
): string {
  const base = formatted.replace(/\((s|l|g|aq)\)$/, '');
  const phase = phaseOf(species);
  let amount: string;
  if (typeof activity === 'number') {
    const unit = phase === 'g' ? ' bar' : phase === 'aq' ? ' M' : '';
    amount = `${showPhase ? formatNumberForPeople(activity) : formatNumber(activity)}${unit}`;
  } else {
    amount = `${formatNumber(activity.amount)}${activity.unit ? ' ' + activity.unit : ''}`;
  }
  const p = species.phase ?? (showPhase && (phase === 'g' || phase === 'aq') ? phase : null);
  return p ? `${base}(${p}, ${amount})` : `${base}(${amount})`;
}

/** A number with at most 12 significant digits, for text meant to be read. */
export function formatNumberForPeople(x: number): string {
  return String(Number(x.toPrecision(12)));
}

/** Shortest round-tripping text of a number. */
export function formatNumber(x: number): string {
  return String(x);
}

/**
 * Canonical text of a reaction: terms joined by " + ", coefficients before
 * species ("2 H2O", "1/2 O2"), the arrow " -> ". Reads back to the same reaction.
 *
 * @example
 * formatReaction(parseReaction('Cu²⁺+2e⁻→Cu')) // 'Cu2+ + 2 e- -> Cu'
 */
export function formatReaction(r: Reaction): string {
  return `${r.reactants.map(formatTerm).join(' + ')} -> ${r.products.map(formatTerm).join(' + ')}`;
}

/**
 * Build a reaction from a stoichiometry (products positive), in a stable order:
 * reactants then products in the order given.
 */
export function reactionFromStoichiometry(entries: readonly StoichEntry[]): Reaction {
  const reactants: Term[] = [];
  const products: Term[] = [];
  for (const e of entries) {
    if (sign(e.nu) < 0) reactants.push({ coefficient: neg(e.nu), species: e.species, activity: null });
    else if (sign(e.nu) > 0) products.push({ coefficient: e.nu, species: e.species, activity: null });
  }
  return { reactants, products };
}

/** True where two reactions have the same terms in the same order (used by round-trip tests). */
export function sameReaction(a: Reaction, b: Reaction): boolean {
  const sameTerms = (x: readonly Term[], y: readonly Term[]) =>
    x.length === y.length &&
    x.every((t, i) => {
      const u = y[i] as Term;
      return (
        eq(t.coefficient, u.coefficient) &&
        sameSpecies(t.species, u.species) &&
        t.species.phase === u.species.phase &&
        (t.activity?.value ?? null) === (u.activity?.value ?? null)
      );
    });
  return sameTerms(a.reactants, b.reactants) && sameTerms(a.products, b.products);
}
