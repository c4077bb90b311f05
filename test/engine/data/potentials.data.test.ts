/**
 * Data checks for the built-in potentials table. Self-contained: the element and charge
 * counter below is written for this test only and does not use the engine's parser.
 */
import { BUILTIN_POTENTIALS, BuiltinPotentialRow } from '../../../src/engine/data/potentials';
import TABLE from '../../../src/engine/data/potentialRows.json';

// ---------------------------------------------------------------------------------------
// A small, strict counter for the notation the table is written in.
// ---------------------------------------------------------------------------------------

const ELEMENT_SYMBOLS = new Set(
  (
    'H He Li Be B C N O F Ne Na Mg Al Si P S Cl Ar K Ca Sc Ti V Cr Mn Fe Co Ni Cu Zn Ga Ge As Se ' +
    'Br Kr Rb Sr Y Zr Nb Mo Tc Ru Rh Pd Ag Cd In Sn Sb Te I Xe Cs Ba La Ce Pr Nd Pm Sm Eu Gd Tb ' +
    'Dy Ho Er Tm Yb Lu Hf Ta W Re Os Ir Pt Au Hg Tl Pb Bi Po At Rn Fr Ra Ac Th Pa U Np Pu Am Cm'
  ).split(' '),
);

type Counts = Map<string, number>;

function addInto(target: Counts, source: Counts, factor: number): void {
  for (const [el, n] of source) {
    const next = (target.get(el) ?? 0) + n * factor;
    if (next === 0) target.delete(el);
    else target.set(el, next);
  }
}

/** Counts atoms in a neutral formula body such as "Fe(OH)3", "[Fe(CN)6]", "Hg2Cl2". */
function countAtoms(formula: string): Counts {
  let pos = 0;

  const readInt = (): number => {
    const m = /^\d+/.exec(formula.slice(pos));
    if (!m) return 1;
    pos += m[0].length;
    const n = Number(m[0]);
    if (n < 1) throw new Error(`bad subscript in ${formula}`);
    return n;
  };

  const group = (close: string | null): Counts => {
    const out: Counts = new Map();
    while (pos < formula.length) {
      const ch = formula.charAt(pos);
      if (ch === ')' || ch === ']') {
        if (ch !== close) throw new Error(`unbalanced "${ch}" in ${formula}`);
        return out;
      }
      if (ch === '(' || ch === '[') {
        pos += 1;
        const inner = group(ch === '(' ? ')' : ']');
        if (formula.charAt(pos) !== (ch === '(' ? ')' : ']'))
          throw new Error(`unclosed "${ch}" in ${formula}`);
        pos += 1;
        addInto(out, inner, readInt());
        continue;
      }
      const m = /^[A-Z][a-z]?/.exec(formula.slice(pos));
      if (!m) throw new Error(`unexpected "${ch}" in ${formula}`);
      if (!ELEMENT_SYMBOLS.has(m[0])) throw new Error(`unknown element "${m[0]}" in ${formula}`);
      pos += m[0].length;
      addInto(out, new Map([[m[0], 1]]), readInt());
    }
    if (close !== null) throw new Error(`unclosed group in ${formula}`);
    return out;
  };

  const result = group(null);
  if (pos !== formula.length) throw new Error(`trailing text in ${formula}`);
  return result;
}

interface Species {
  readonly atoms: Counts;
  readonly charge: number;
}

/**
 * Reads one species: "e-", or a formula with optional charge and optional phase. Charges:
 * caret form "SO4^2-", "I3^-"; a monatomic element with one digit "Fe3+", "Hg2+"; otherwise
 * a bare sign is ±1 and any digits before it are subscripts ("MnO4-", "NH4+").
 */
function parseSpecies(text: string): Species {
  if (text === 'e-') return { atoms: new Map(), charge: -1 };
  const body = text.replace(/\((s|l|g|aq)\)$/, '');
  if (/\s/.test(body) || body.length === 0) throw new Error(`bad species "${text}"`);
  const caret = /^(.+)\^(\d*)([+-])$/.exec(body);
  if (caret) {
    const formula = caret[1] ?? '';
    const mag = caret[2] ? Number(caret[2]) : 1;
    if (mag < 1) throw new Error(`bad charge in "${text}"`);
    return { atoms: countAtoms(formula), charge: caret[3] === '-' ? -mag : mag };
  }
  const signed = /^(.+?)([+-])$/.exec(body);
  if (signed) {
    const rest = signed[1] ?? '';
    const sign = signed[2] === '-' ? -1 : 1;
    const mono = /^([A-Z][a-z]?)(\d)$/.exec(rest);
    if (mono) return { atoms: countAtoms(mono[1] ?? ''), charge: sign * Number(mono[2]) };
    return { atoms: countAtoms(rest), charge: sign };
  }
  return { atoms: countAtoms(body), charge: 0 };
}

interface Term {
  readonly num: number;
  readonly den: number;
  readonly species: string;
}

function parseTerm(text: string): Term {
  const m = /^(?:(\d+)(?:\/(\d+))? )?(\S+)$/.exec(text);
  if (!m) throw new Error(`bad term "${text}"`);
  const num = m[1] ? Number(m[1]) : 1;
  const den = m[2] ? Number(m[2]) : 1;
  if (num < 1 || den < 1) throw new Error(`bad coefficient in "${text}"`);
  if (m[1] && !m[2] && num === 1) throw new Error(`explicit coefficient 1 in "${text}"`);
  return { num, den, species: m[3] ?? '' };
}

interface ParsedHalfReaction {
  readonly left: readonly Term[];
  readonly right: readonly Term[];
}

function parseHalfReaction(text: string): ParsedHalfReaction {
  const sides = text.split(' -> ');
  if (sides.length !== 2) throw new Error(`need exactly one " -> " in "${text}"`);
  const [l = '', r = ''] = sides;
  return { left: l.split(' + ').map(parseTerm), right: r.split(' + ').map(parseTerm) };
}

const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));
const lcm = (a: number, b: number): number => (a / gcd(a, b)) * b;

/** Net (left − right) element counts and charge, on integer coefficients. */
function imbalance(text: string): { atoms: Counts; charge: number } {
  const { left, right } = parseHalfReaction(text);
  const scale = [...left, ...right].reduce((acc, t) => lcm(acc, t.den), 1);
  const atoms: Counts = new Map();
  let charge = 0;
  const apply = (terms: readonly Term[], sign: number): void => {
    for (const t of terms) {
      const k = (t.num * scale) / t.den;
      if (!Number.isInteger(k)) throw new Error('non-integer scaled coefficient');
      const sp = parseSpecies(t.species);
      addInto(atoms, sp.atoms, sign * k);
      charge += sign * k * sp.charge;
    }
  };
  apply(left, 1);
  apply(right, -1);
  return { atoms, charge };
}

// ---------------------------------------------------------------------------------------
// Self-checks of the counter, so that a broken counter cannot pass a broken table.
// ---------------------------------------------------------------------------------------

describe('test-local species counter', () => {
  it('reads formulas with groups, brackets and subscripts', () => {
    expect([...countAtoms('[Fe(CN)6]')].sort()).toEqual([
      ['C', 6],
      ['Fe', 1],
      ['N', 6],
    ]);
    expect([...countAtoms('Hg2Cl2')].sort()).toEqual([
      ['Cl', 2],
      ['Hg', 2],
    ]);
    expect(countAtoms('[Ag(NH3)2]').get('H')).toBe(6);
  });

  it('reads charges in each notation', () => {
    expect(parseSpecies('Fe3+').charge).toBe(3);
    expect(parseSpecies('Hg2+').atoms.get('Hg')).toBe(1);
    expect(parseSpecies('Hg2^2+').atoms.get('Hg')).toBe(2);
    expect(parseSpecies('Hg2^2+').charge).toBe(2);
    expect(parseSpecies('MnO4-').charge).toBe(-1);
    expect(parseSpecies('SO4^2-').charge).toBe(-2);
    expect(parseSpecies('I3^-').atoms.get('I')).toBe(3);
    expect(parseSpecies('VO2^+').charge).toBe(1);
    expect(parseSpecies('VO^2+').charge).toBe(2);
    expect(parseSpecies('[Fe(CN)6]^4-').charge).toBe(-4);
    expect(parseSpecies('Cr(OH)3(s)').atoms.get('O')).toBe(3);
    expect(parseSpecies('e-').charge).toBe(-1);
  });

  it('detects imbalance and handles 1/2 coefficients', () => {
    expect(imbalance('1/2 O2(g) + 2 H+ + 2 e- -> H2O').charge).toBe(0);
    expect(imbalance('1/2 O2(g) + 2 H+ + 2 e- -> H2O').atoms.size).toBe(0);
    expect(imbalance('O2(g) + 2 H+ + 2 e- -> H2O').atoms.get('O')).toBe(1);
    expect(imbalance('Fe3+ + 2 e- -> Fe2+').charge).toBe(-1);
    expect(() => countAtoms('Xx2')).toThrow();
    expect(() => countAtoms('Fe(OH')).toThrow();
  });
});

// ---------------------------------------------------------------------------------------
// The table itself.
// ---------------------------------------------------------------------------------------

const rows: readonly BuiltinPotentialRow[] = BUILTIN_POTENTIALS;

function row(halfReaction: string): BuiltinPotentialRow {
  const found = rows.find((r) => r.halfReaction === halfReaction);
  if (!found) throw new Error(`row not in table: ${halfReaction}`);
  return found;
}

describe('BUILTIN_POTENTIALS: shape', () => {
  it('has at least 75 rows', () => {
    expect(rows.length).toBeGreaterThanOrEqual(75);
  });

  it('has no duplicate half-reactions', () => {
    const seen = new Set<string>();
    const dups = rows.map((r) => r.halfReaction).filter((h) => (seen.has(h) ? true : (seen.add(h), false)));
    expect(dups).toEqual([]);
  });

  it.each(rows.map((r) => [r.halfReaction, r] as const))('%s: E°, dE°/dT and source are sane', (_h, r) => {
    expect(Number.isFinite(r.e0V)).toBe(true);
    expect(r.e0V).toBeGreaterThanOrEqual(-3.1);
    expect(r.e0V).toBeLessThanOrEqual(3.1);
    if (r.dE0dTmVperK !== null) {
      expect(Number.isFinite(r.dE0dTmVperK)).toBe(true);
      expect(Math.abs(r.dE0dTmVperK)).toBeLessThan(5);
      // A temperature coefficient names where it comes from, unless it is zero by definition.
      if (r.dE0dTmVperK !== 0) expect(r.source).toMatch(/dE°\/dT/);
    }
    expect(typeof r.source).toBe('string');
    expect(r.source.trim().length).toBeGreaterThan(0);
    expect(r.source).not.toMatch(/REFERENCE[- ]?DATA/i);
    // Recalled handbook values (everything from the 92nd edition but the AgBr row) say so.
    if (/92nd ed/.test(r.source) && r.halfReaction !== 'AgBr(s) + e- -> Ag + Br-') {
      expect(r.source).toMatch(/from memory/);
    }
  });
});

describe('BUILTIN_POTENTIALS: notation and balance', () => {
  it.each(rows.map((r) => [r.halfReaction] as const))('%s balances in atoms and charge', (h) => {
    const { atoms, charge } = imbalance(h);
    expect([...atoms]).toEqual([]);
    expect(charge).toBe(0);
  });

  it.each(rows.map((r) => [r.halfReaction] as const))(
    '%s is written as a reduction in table notation',
    (h) => {
      expect(h).toBe(h.trim());
      expect(h).not.toMatch(/\s{2}/);
      const { left, right } = parseHalfReaction(h);
      const electronsLeft = left.filter((t) => t.species === 'e-');
      expect(electronsLeft).toHaveLength(1);
      expect(right.some((t) => t.species === 'e-')).toBe(false);
      for (const t of [...left, ...right]) {
        // Charges of magnitude >= 2 after a subscript digit use the caret ("SO4^2-", not "SO42-").
        expect(t.species).not.toMatch(/\d\d[+-](\(|$)/);
        expect(t.species).not.toMatch(/\s/);
      }
    },
  );

  it('writes the phase where it distinguishes two rows (Br2(l) and Br2(aq))', () => {
    expect(row('Br2(l) + 2 e- -> 2 Br-').e0V).not.toBe(row('Br2(aq) + 2 e- -> 2 Br-').e0V);
  });
});

describe('BUILTIN_POTENTIALS: values against their publications', () => {
  // What OpenStax Chemistry 2e, Appendix L prints (read in the stored copy,
  // openstax/osbooks-chemistry-bundle modules/m68870/index.cnxml), for every row that cites it.
  const osxPrints: ReadonlyArray<readonly [string, number]> = [
    ['H2(g) + 2 e- -> 2 H-', -2.23], // printed as ½ H2 + e- -> H-
    ['2 H2O + 2 e- -> H2(g) + 2 OH-', -0.8277],
    ['2 H+ + 2 e- -> H2(g)', 0],
    ['Li+ + e- -> Li', -3.04],
    ['Be2+ + 2 e- -> Be', -1.847],
    ['NO3- + H2O + 2 e- -> NO2- + 2 OH-', 0.1],
    ['NO3- + 3 H+ + 2 e- -> HNO2 + H2O', 0.92],
    ['NO3- + 4 H+ + 3 e- -> NO(g) + 2 H2O', 0.957],
    ['O2(g) + 2 H2O + 4 e- -> 4 OH-', 0.401],
    ['O2(g) + 2 H+ + 2 e- -> H2O2', 0.695],
    ['HO2- + H2O + 2 e- -> 3 OH-', 0.878],
    ['O2(g) + 4 H+ + 4 e- -> 2 H2O', 1.229],
    ['H2O2 + 2 H+ + 2 e- -> 2 H2O', 1.776],
    ['F2(g) + 2 e- -> 2 F-', 2.866],
    ['Na+ + e- -> Na', -2.71],
    ['Mg2+ + 2 e- -> Mg', -2.372],
    ['Al3+ + 3 e- -> Al', -1.662],
    ['S(s) + 2 e- -> S2-', -0.47627],
    ['S(s) + 2 H+ + 2 e- -> H2S(aq)', 0.142],
    ['ClO- + H2O + 2 e- -> Cl- + 2 OH-', 0.89],
    ['ClO4- + 2 H+ + 2 e- -> ClO3- + H2O', 1.189],
    ['ClO3- + 3 H+ + 2 e- -> HClO2 + H2O', 1.21],
    ['Cl2(g) + 2 e- -> 2 Cl-', 1.35827],
    ['HClO + H+ + 2 e- -> Cl- + H2O', 1.482],
    ['2 HClO + 2 H+ + 2 e- -> Cl2(g) + 2 H2O', 1.611], // printed per ½ Cl2
    ['K+ + e- -> K', -2.931],
    ['Ca2+ + 2 e- -> Ca', -2.868],
    ['Ti2+ + 2 e- -> Ti', -1.63],
    ['V2+ + 2 e- -> V', -1.19],
    ['Cr2+ + 2 e- -> Cr', -0.913],
    ['Cr3+ + 3 e- -> Cr', -0.744],
    ['Cr3+ + e- -> Cr2+', -0.407],
    ['CrO4^2- + 4 H2O + 3 e- -> Cr(OH)3(s) + 5 OH-', -0.13],
    ['Cr2O7^2- + 14 H+ + 6 e- -> 2 Cr3+ + 7 H2O', 1.232],
    ['Mn2+ + 2 e- -> Mn', -1.185],
    ['MnO4- + 2 H2O + 3 e- -> MnO2(s) + 4 OH-', 0.558],
    ['MnO2(s) + 4 H+ + 2 e- -> Mn2+ + 2 H2O', 1.23],
    ['MnO4- + 8 H+ + 5 e- -> Mn2+ + 4 H2O', 1.507],
    ['Fe2+ + 2 e- -> Fe', -0.447],
    ['Fe3+ + e- -> Fe2+', 0.771],
    ['[Fe(CN)6]^3- + e- -> [Fe(CN)6]^4-', 0.36],
    ['Co2+ + 2 e- -> Co', -0.28],
    ['Ni2+ + 2 e- -> Ni', -0.257],
    ['NiO2(s) + 2 H2O + 2 e- -> Ni(OH)2(s) + 2 OH-', 0.49],
    ['NiO2(s) + 4 H+ + 2 e- -> Ni2+ + 2 H2O', 1.593],
    ['Cu2+ + e- -> Cu+', 0.153],
    ['Cu2+ + 2 e- -> Cu', 0.34],
    ['Cu+ + e- -> Cu', 0.521],
    ['Zn(OH)2(s) + 2 e- -> Zn + 2 OH-', -1.245],
    ['Zn2+ + 2 e- -> Zn', -0.7618],
    ['Ga3+ + 3 e- -> Ga', -0.549],
    ['Br2(aq) + 2 e- -> 2 Br-', 1.0873],
    ['Rb+ + e- -> Rb', -2.98],
    ['Sr2+ + 2 e- -> Sr', -2.89],
    ['Pd2+ + 2 e- -> Pd', 0.987],
    ['Ag2CrO4(s) + 2 e- -> 2 Ag + CrO4^2-', 0.45],
    ['[Ag(NH3)2]+ + e- -> Ag + 2 NH3(aq)', 0.373],
    ['Ag+ + e- -> Ag', 0.7996],
    ['AgCl(s) + e- -> Ag + Cl-', 0.22233],
    ['Cd2+ + 2 e- -> Cd', -0.403],
    ['In3+ + 3 e- -> In', -0.3382],
    ['Sn2+ + 2 e- -> Sn', -0.1375],
    ['Sn4+ + 2 e- -> Sn2+', 0.151],
    ['I2(s) + 2 e- -> 2 I-', 0.5355],
    ['Ba2+ + 2 e- -> Ba', -2.912],
    ['La3+ + 3 e- -> La', -2.52],
    ['Ce3+ + 3 e- -> Ce', -2.483],
    ['Ce4+ + e- -> Ce3+', 1.61],
    ['[PtCl4]^2- + 2 e- -> Pt + 4 Cl-', 0.755],
    ['Pt2+ + 2 e- -> Pt', 1.2],
    ['Au3+ + 3 e- -> Au', 1.498],
    ['Au+ + e- -> Au', 1.692],
    ['Hg2Cl2(s) + 2 e- -> 2 Hg(l) + 2 Cl-', 0.26808],
    ['Hg2^2+ + 2 e- -> 2 Hg(l)', 0.7973],
    ['Hg2+ + 2 e- -> Hg(l)', 0.851],
    ['2 Hg2+ + 2 e- -> Hg2^2+', 0.92],
    ['PbSO4(s) + 2 e- -> Pb + SO4^2-', -0.3505],
    ['Pb2+ + 2 e- -> Pb', -0.1262],
    ['PbO2(s) + SO4^2- + 4 H+ + 2 e- -> PbSO4(s) + 2 H2O', 1.69],
  ];

  it.each(osxPrints)('%s cites OpenStax Appendix L with the value it prints (%d V)', (h, v) => {
    const r = row(h);
    expect(r.published.source).toBe('OpenStax Chemistry 2e, Appendix L');
    expect(r.published.e0V).toBe(v);
    expect(r.source).toContain(`OpenStax Chemistry 2e, Appendix L prints ${String(v)} V`);
  });

  it('every row that cites OpenStax Appendix L is in the list above', () => {
    const cited = rows.filter((r) => r.published.source.startsWith('OpenStax')).map((r) => r.halfReaction);
    expect(cited.sort()).toEqual(osxPrints.map(([h]) => h).sort());
  });

  // Other publications, as read (seen) or recalled (from memory).
  const others: ReadonlyArray<readonly [string, number, string]> = [
    ['Cd(OH)2(s) + 2 e- -> Cd + 2 OH-', -0.812, 'CRC Handbook of Chemistry and Physics, 54th ed., p. D-120'], // seen
    ['Br2(l) + 2 e- -> 2 Br-', 1.065, 'CRC Handbook of Chemistry and Physics, 54th ed., p. D-120'], // seen
    ['AgBr(s) + e- -> Ag + Br-', 0.07133, 'CRC Handbook of Chemistry and Physics, 92nd ed., Electrochemical Series'], // seen
  ];
  it.each(others)('%s cites %d V as printed', (h, v, src) => {
    expect(row(h).published).toEqual({ e0V: v, source: src });
  });

  // The row's E° comes from the species data; where it departs from the published value by
  // more than 25 mV the row is named here with its disagreement (mV), so that a new
  // disagreement fails. The printed values of one couple differ between handbooks by as much.
  const knownLarge: ReadonlyMap<string, number> = new Map([
    ['Ce4+ + e- -> Ce3+', 133], // OSX 1.61 is a formal potential; NBS ΔfG° give 1.74 (CRC 92nd ed.: 1.72, from memory)
    ['Cr2O7^2- + 14 H+ + 6 e- -> 2 Cr3+ + 7 H2O', 132], // NBS ΔfG° give 1.36; OSX prints 1.232, CRC 54th ed. 1.33 (seen)
    ['Be2+ + 2 e- -> Be', 121],
    ['Ce3+ + 3 e- -> Ce', 161],
    ['La3+ + 3 e- -> La', 158],
    ['NO3- + H2O + 2 e- -> NO2- + 2 OH-', 109],
    ['S2O8^2- + 2 e- -> 2 SO4^2-', 71],
    ['Pd2+ + 2 e- -> Pd', 73],
    ['NiO2(s) + 4 H+ + 2 e- -> Ni2+ + 2 H2O', 123],
    ['[PtCl4]^2- + 2 e- -> Pt + 4 Cl-', 55],
    ['ClO3- + 3 H+ + 2 e- -> HClO2 + H2O', 53],
    ['HNO2 + H+ + e- -> NO(g) + H2O', 54],
    ['S4O6^2- + 2 e- -> 2 S2O3^2-', 39],
    ['ClO4- + 2 H+ + 2 e- -> ClO3- + H2O', 37],
    ['Ag2S(s) + 2 e- -> 2 Ag + S2-', 36],
    ['MnO4- + e- -> MnO4^2-', 35],
    ['MnO4- + 2 H2O + 3 e- -> MnO2(s) + 4 OH-', 36],
    ['Ni(OH)2(s) + 2 e- -> Ni + 2 OH-', 33],
    ['S(s) + 2 e- -> S2-', 32],
    ['2 BrO3- + 12 H+ + 10 e- -> Br2(l) + 6 H2O', 32],
    ['NO3- + 2 H+ + e- -> NO2(g) + H2O', 31],
    ['Co3+ + e- -> Co2+', 29],
    ['Tl3+ + 2 e- -> Tl+', 29],
    ['ZnO2^2- + 2 H2O + 2 e- -> Zn + 4 OH-', 26],
  ]);

  it.each(rows.map((r) => [r.halfReaction, r] as const))('%s: E° within its stated distance of the published value', (h, r) => {
    const mv = Math.abs(r.e0V - r.published.e0V) * 1000;
    expect(mv).toBeLessThanOrEqual((knownLarge.get(h) ?? 25) + 0.5);
  });

  it('the worst disagreement is the one the notes name', () => {
    const worst = rows
      .map((r) => ({ h: r.halfReaction, mv: Math.abs(r.e0V - r.published.e0V) * 1000 }))
      .sort((a, b) => b.mv - a.mv)[0]!;
    expect(worst.h).toBe('Ce3+ + 3 e- -> Ce');
    expect(worst.mv).toBeLessThan(162);
  });

  // [half-reaction, dE°/dT / (mV/K)]; all from memory (Bratsch 1989) except where marked.
  // The rows' coefficients come from S° of the species data; tolerance 0.015 mV/K (rounding
  // of S° and of the published coefficients).
  const coefficients: ReadonlyArray<readonly [string, number]> = [
    ['Li+ + e- -> Li', -0.51], // Bratsch, J. Phys. Chem. Ref. Data 18, 1 (1989) (from memory)
    ['K+ + e- -> K', -1.07], // Bratsch 1989 (from memory)
    ['Na+ + e- -> Na', -0.76], // Bratsch 1989 (from memory)
    ['Zn2+ + 2 e- -> Zn', 0.119], // Bratsch 1989 (from memory)
    ['Cu2+ + 2 e- -> Cu', 0.011], // Bratsch 1989 (from memory)
    ['Hg2Cl2(s) + 2 e- -> 2 Hg(l) + 2 Cl-', -0.3], // Bratsch 1989 (from memory)
    ['Fe3+ + e- -> Fe2+', 1.18], // Bratsch 1989 (from memory)
    ['Ag+ + e- -> Ag', -0.989], // Bratsch 1989 (from memory)
    ['O2(g) + 4 H+ + 4 e- -> 2 H2O', -0.846], // Bratsch 1989 (from memory)
    ['Cl2(g) + 2 e- -> 2 Cl-', -1.25], // Bratsch 1989 (from memory)
    ['2 H+ + 2 e- -> H2(g)', 0], // IUPAC Gold Book: zero at every temperature (seen)
  ];

  it.each(coefficients)('%s: dE°/dT = %d mV/K', (h, slope) => {
    expect(Math.abs((row(h).dE0dTmVperK ?? NaN) - slope)).toBeLessThanOrEqual(0.015);
  });

  it('AgCl/Ag dE°/dT matches the Bates & Bower 20-30 °C slope', () => {
    // Bates & Bower, J. Res. NBS 53, 283 (1954): 20 °C 0.22557 V, 30 °C 0.21904 V (seen)
    const slopeMvPerK = ((0.21904 - 0.22557) / 10) * 1000;
    const tabulated = row('AgCl(s) + e- -> Ag + Cl-').dE0dTmVperK;
    expect(tabulated).not.toBeNull();
    // the 20-30 °C chord includes curvature (ΔCp°): within 0.01 mV/K
    expect(Math.abs((tabulated ?? NaN) - slopeMvPerK)).toBeLessThan(0.01);
  });
});

describe('BUILTIN_POTENTIALS: cells of common practice', () => {
  it('lead-acid cell E° = E°(PbO2/PbSO4) − E°(PbSO4/Pb) ≈ 2.04 V', () => {
    // about 2 V per cell (common practice); 1.69 + 0.3505 from OpenStax Chemistry 2e, Appendix L
    const e =
      row('PbO2(s) + SO4^2- + 4 H+ + 2 e- -> PbSO4(s) + 2 H2O').e0V -
      row('PbSO4(s) + 2 e- -> Pb + SO4^2-').e0V;
    expect(e).toBeCloseTo(2.04, 2);
  });

  it('Daniell cell E° = E°(Cu2+/Cu) − E°(Zn2+/Zn) ≈ 1.10 V', () => {
    // a zinc-copper cell gives about 1.10 V at unit activities (common practice)
    const e = row('Cu2+ + 2 e- -> Cu').e0V - row('Zn2+ + 2 e- -> Zn').e0V;
    expect(e).toBeCloseTo(1.1, 2);
  });

  it('Cu + 2 Ag+ -> Cu2+ + 2 Ag has E° ≈ +0.46 V', () => {
    // OpenStax Chemistry 2e, chapter 17 worked example (seen)
    const e = row('Ag+ + e- -> Ag').e0V - row('Cu2+ + 2 e- -> Cu').e0V;
    expect(e).toBeCloseTo(0.46, 2);
  });
});

describe('potentialRows.json: groups', () => {
  // the groups document the table's order (by element, the published E° increasing within a
  // group); the engine does not read them, so they are checked here
  it('cover every row once, in order, each run sorted by increasing published E°', () => {
    const groups = TABLE.groups as unknown as readonly (readonly [string, number])[];
    expect(groups.reduce((n, [, count]) => n + count, 0)).toBe(BUILTIN_POTENTIALS.length);
    let at = 0;
    for (const [element, count] of groups) {
      expect(element).not.toBe('');
      expect(count).toBeGreaterThan(0);
      const e0 = BUILTIN_POTENTIALS.slice(at, at + count).map((r) => r.published.e0V);
      expect([...e0].sort((a, b) => a - b)).toEqual(e0);
      at += count;
    }
  });
});
