/**
 * Notation: species, reactions, half-reactions, couples and cell diagrams in every form the
 * product brief lists; the canonical text and its round trip; parse errors with positions.
 *
 * Sources named beside the checks: chemical identities (sulfate is SO4 2−, triiodide is I3−, …)
 * are common practice; cell-diagram marks follow the IUPAC Green Book (Quantities, Units and
 * Symbols in Physical Chemistry, 3rd ed., §2.13, from memory); 1 atm = 101325 Pa exactly
 * (CGPM 1954 definition of the standard atmosphere, common practice).
 */
import {
  formatNotation,
  formatRational,
  formatSpecies,
  elementsOf,
  parseCellDiagram,
  parseCouple,
  parseNotation,
  parseReaction,
  parseSpecies,
  phaseOf,
  type Notation,
  type Phase,
  type Species,
} from '../../src/engine';
import { engineErrorOf } from '../support';

/** The EngineError `f` throws; fails the test where it throws nothing or something else. */

/** Element counts as a plain object, for toEqual. */
function atoms(s: Species): Record<string, number> {
  return Object.fromEntries(elementsOf(s));
}

// ---------------------------------------------------------------------------------------
// Species
// ---------------------------------------------------------------------------------------

describe('species: charge spellings', () => {
  // [text, formula, charge, what it is]
  // prettier-ignore
  const cases: [string, string, number, string][] = [
    ['Fe3+', 'Fe', 3, 'iron(III) ion (common practice)'],
    ['Fe+3', 'Fe', 3, 'iron(III), sign before the magnitude (common practice)'],
    ['Fe+++', 'Fe', 3, 'iron(III), one sign per unit of charge (common practice)'],
    ['Fe++', 'Fe', 2, 'iron(II), repeated signs (common practice)'],
    ['SO4^2-', 'SO4', -2, 'sulfate, caret form (common practice)'],
    ['SO4 2-', 'SO4', -2, 'sulfate, charge after a space (common practice)'],
    ['SO42-', 'SO4', -2, 'sulfate, two digits: the last is the charge (common practice)'],
    ['SO4--', 'SO4', -2, 'sulfate, repeated signs (common practice)'],
    ['[Fe(CN)6]3-', '[Fe(CN)6]', -3, 'hexacyanoferrate(III) (common practice)'],
    ['[Fe(CN)6]^4-', '[Fe(CN)6]', -4, 'hexacyanoferrate(II), caret form (common practice)'],
    ['Cu²⁺', 'Cu', 2, 'copper(II), Unicode superscripts (common practice)'],
    ['SO₄²⁻', 'SO4', -2, 'sulfate, Unicode sub- and superscripts (common practice)'],
    ['Fe³⁺', 'Fe', 3, 'iron(III), Unicode superscripts (common practice)'],
    ['Cl\u2212', 'Cl', -1, 'chloride with the Unicode minus sign U+2212 (common practice)'],
    ['MnO4\u2212', 'MnO4', -1, 'permanganate with the Unicode minus sign (common practice)'],
    ['Cr2O7^2-', 'Cr2O7', -2, 'dichromate (common practice)'],
    ['Cr2O72-', 'Cr2O7', -2, 'dichromate, two trailing digits (common practice)'],
    ['HPO42-', 'HPO4', -2, 'hydrogen phosphate (common practice)'],
    ['PO43-', 'PO4', -3, 'phosphate (common practice)'],
    ['C2O42-', 'C2O4', -2, 'oxalate (common practice)'],
    ['S2O32-', 'S2O3', -2, 'thiosulfate (common practice)'],
    ['Hg22+', 'Hg2', 2, 'mercury(I) dimer Hg2 2+ (common practice)'],
    ['Hg2^2+', 'Hg2', 2, 'mercury(I) dimer, caret form (common practice)'],
    ['O22-', 'O2', -2, 'peroxide O2 2− (common practice)'],
    ['VO2^+', 'VO2', 1, 'dioxovanadium(V) (common practice)'],
    ['VO^2+', 'VO', 2, 'oxovanadium(IV), vanadyl (common practice)'],
    ['H+', 'H', 1, 'hydrogen ion (common practice)'],
    ['OH-', 'OH', -1, 'hydroxide (common practice)'],
    ['[Cu(NH3)4]2+', '[Cu(NH3)4]', 2, 'tetraamminecopper(II) (common practice)'],
    ['[Ag(NH3)2]+', '[Ag(NH3)2]', 1, 'diamminesilver(I) (common practice)'],
  ];
  test.each(cases)('%s reads as formula %s, charge %d (%s)', (text, formula, charge) => {
    const s = parseSpecies(text);
    expect(s.formula).toBe(formula);
    expect(s.charge).toBe(charge);
    expect(s.isElectron).toBe(false);
  });
});

describe('species: the one-digit rule', () => {
  // One digit between a formula and a single sign: the charge on a monatomic ion, a
  // subscript on a polyatomic one; halide anions keep it as a subscript.
  // [text, formula, charge, atoms in the species, what it is]
  // prettier-ignore
  const cases: [string, string, number, number, string][] = [
    ['Fe3+', 'Fe', 3, 1, 'monatomic: iron(III) (common practice)'],
    ['Fe2+', 'Fe', 2, 1, 'monatomic: iron(II) (common practice)'],
    ['Cu2+', 'Cu', 2, 1, 'monatomic: copper(II) (common practice)'],
    ['Al3+', 'Al', 3, 1, 'monatomic: aluminium (common practice)'],
    ['S2-', 'S', -2, 1, 'monatomic: sulfide (common practice)'],
    ['O2-', 'O', -2, 1, 'monatomic: oxide ion (common practice)'],
    ['N3-', 'N', -3, 1, 'monatomic: nitride (common practice)'],
    ['MnO4-', 'MnO4', -1, 5, 'polyatomic: permanganate (common practice)'],
    ['NH4+', 'NH4', 1, 5, 'polyatomic: ammonium (common practice)'],
    ['NO3-', 'NO3', -1, 4, 'polyatomic: nitrate (common practice)'],
    ['ClO4-', 'ClO4', -1, 5, 'polyatomic: perchlorate (common practice)'],
    ['H3O+', 'H3O', 1, 4, 'polyatomic: hydronium (common practice)'],
    ['I3-', 'I3', -1, 3, 'halide anion: triiodide (common practice)'],
    ['Br3-', 'Br3', -1, 3, 'halide anion: tribromide (common practice)'],
  ];
  test.each(cases)('%s → formula %s, charge %d, %d atoms (%s)', (text, formula, charge, count) => {
    const s = parseSpecies(text);
    expect(s.formula).toBe(formula);
    expect(s.charge).toBe(charge);
    // the atom count tells a subscript from a charge independently of the formula string
    expect(Object.values(atoms(s)).reduce((a, b) => a + b, 0)).toBe(count);
  });
});

describe('species: phases', () => {
  // [text, written phase, effective phase, why]
  // prettier-ignore
  const cases: [string, Phase | null, Phase, string][] = [
    ['Cu(s)', 's', 's', 'written solid'],
    ['Hg(l)', 'l', 'l', 'written liquid'],
    ['H2(g)', 'g', 'g', 'written gas'],
    ['Cu2+(aq)', 'aq', 'aq', 'written aqueous'],
    ['Br2(aq)', 'aq', 'aq', 'a written phase overrides the inferred one (bromine water)'],
    ['Cu(cr)', 's', 's', '(cr) is crystalline solid (IUPAC Green Book §2.11, from memory)'],
    ['Zn2+', null, 'aq', 'ions are aqueous'],
    ['SO4^2-', null, 'aq', 'ions are aqueous'],
    ['H2O', null, 'l', 'water is liquid'],
    ['Zn', null, 's', 'metals are solid'],
    ['Fe', null, 's', 'metals are solid'],
    ['Hg', null, 'l', 'mercury is liquid at 25 °C (common practice)'],
    ['Br2', null, 'l', 'bromine is liquid at 25 °C (common practice)'],
    ['H2', null, 'g', 'hydrogen is a gas'],
    ['O2', null, 'g', 'oxygen is a gas'],
    ['N2', null, 'g', 'nitrogen is a gas'],
    ['Cl2', null, 'g', 'chlorine is a gas'],
    ['F2', null, 'g', 'fluorine is a gas'],
    ['I2', null, 's', 'iodine is solid at 25 °C (common practice)'],
    ['AgCl', null, 's', 'a metal salt is solid'],
    ['Fe(OH)3', null, 's', 'a metal hydroxide is solid'],
    ['MnO2', null, 's', 'a metal oxide is solid'],
  ];
  test.each(cases)('%s: written %s, effective %s (%s)', (text, written, effective) => {
    const s = parseSpecies(text);
    expect(s.phase).toBe(written);
    expect(phaseOf(s)).toBe(effective);
  });

  // Regression (fixed): a hydrated salt without a written phase is inferred aqueous ('aq'); a hydrate such
  // as CuSO4·5H2O exists only as a crystal (common practice), and the engine infers the
  // anhydrous CuSO4 as 's'. The water of crystallisation (its H) defeats the "metal salt" rule.
  test('a hydrate without a written phase is solid, like its anhydrous salt', () => {
    expect(phaseOf(parseSpecies('CuSO4'))).toBe('s');
    expect(phaseOf(parseSpecies('CuSO4·5H2O'))).toBe('s');
  });
});

describe('species: formulas, complexes and hydrates (atom counts)', () => {
  // prettier-ignore
  const cases: [string, Record<string, number>, string][] = [
    ['[Fe(CN)6]3-', { Fe: 1, C: 6, N: 6 }, 'hexacyanoferrate(III) (common practice)'],
    ['K4[Fe(CN)6]', { K: 4, Fe: 1, C: 6, N: 6 }, 'potassium hexacyanoferrate(II) (common practice)'],
    ['[Cu(NH3)4]2+', { Cu: 1, N: 4, H: 12 }, 'tetraamminecopper(II) (common practice)'],
    ['[PtCl4]2-', { Pt: 1, Cl: 4 }, 'tetrachloroplatinate(II) (common practice)'],
    ['CuSO4·5H2O', { Cu: 1, S: 1, O: 9, H: 10 }, 'copper(II) sulfate pentahydrate (common practice)'],
    ['CuSO4*5H2O', { Cu: 1, S: 1, O: 9, H: 10 }, 'the same, ASCII asterisk for the dot'],
    ['CuSO4•5H2O', { Cu: 1, S: 1, O: 9, H: 10 }, 'the same, bullet for the dot'],
    ['Na2SO4·10H2O', { Na: 2, S: 1, O: 14, H: 20 }, 'sodium sulfate decahydrate (common practice)'],
    ['Fe(OH)3', { Fe: 1, O: 3, H: 3 }, 'iron(III) hydroxide (common practice)'],
    ['Ca3(PO4)2', { Ca: 3, P: 2, O: 8 }, 'calcium phosphate (common practice)'],
    ['(NH4)2SO4', { N: 2, H: 8, S: 1, O: 4 }, 'ammonium sulfate (common practice)'],
    ['Hg2Cl2', { Hg: 2, Cl: 2 }, 'calomel (common practice)'],
    ['Fe2(SO4)3', { Fe: 2, S: 3, O: 12 }, 'iron(III) sulfate (common practice)'],
  ];
  test.each(cases)('%s has atoms %o (%s)', (text, expected) => {
    expect(atoms(parseSpecies(text))).toEqual(expected);
  });
});

describe('species: electrons', () => {
  test.each(['e-', 'e', 'e⁻', 'e^-', 'e\u2212'])('%s is the electron', (text) => {
    const s = parseSpecies(text);
    expect(s.isElectron).toBe(true);
    expect(s.charge).toBe(-1); // the electron carries one negative elementary charge (common practice)
    expect(elementsOf(s).size).toBe(0);
    expect(formatSpecies(s)).toBe('e-');
  });
});

describe('formatSpecies: canonical text reads back to the same species', () => {
  // [input, canonical text]
  // prettier-ignore
  const cases: [string, string][] = [
    ['Fe+3', 'Fe3+'],                 // iron(III) (common practice)
    ['SO₄²⁻', 'SO4^2-'],              // sulfate (common practice)
    ['SO4 2-', 'SO4^2-'],             // sulfate (common practice)
    ['Hg22+', 'Hg2^2+'],              // mercury(I) dimer (common practice)
    ['MnO4-', 'MnO4-'],               // permanganate (common practice)
    ['I3-', 'I3-'],                   // triiodide (common practice)
    ['N3^-', 'N3^-'],                 // azide, which must not read as nitride N3− (common practice)
    ['[Fe(CN)6]^3-', '[Fe(CN)6]3-'],  // hexacyanoferrate(III) (common practice)
    ['VO2^+', 'VO2+'],                // dioxovanadium(V) (common practice)
    ['AgCl(s)', 'AgCl(s)'],           // silver chloride (common practice)
    ['e⁻', 'e-'],                     // electron
  ];
  test.each(cases)('%s → %s', (input, canonical) => {
    const s = parseSpecies(input);
    expect(formatSpecies(s)).toBe(canonical);
    const back = parseSpecies(canonical);
    expect([back.formula, back.charge, back.phase]).toEqual([s.formula, s.charge, s.phase]);
  });

  // Regression (fixed): formatSpecies writes oxovanadium(IV) VO^2+ (formula VO, charge +2) as "VO2+",
  // which reads back as VO2 with charge +1 (dioxovanadium(V)): the one-digit rule makes the
  // 2 a subscript on a polyatomic formula. The same happens to FeOH^2+ ("FeOH2+") and TiO^2+.
  // It corrupts BALANCE output, e.g. "VO^2+ + MnO4- -> VO2^+ + Mn2+" in acid comes back as
  // "5 VO2+ + MnO4- + H2O -> 5 VO2+ + Mn2+ + 2 H+". Expected "VO^2+", got "VO2+".
  test.each([
    ['VO^2+', 'VO', 2], // vanadyl, oxovanadium(IV) (common practice)
    ['FeOH^2+', 'FeOH', 2], // hydroxoiron(III) (common practice)
    ['TiO^2+', 'TiO', 2], // titanyl (common practice)
  ])('%s: polyatomic, no trailing digit, |charge| ≥ 2, reads back', (input, formula, charge) => {
    const back = parseSpecies(formatSpecies(parseSpecies(input)));
    expect([back.formula, back.charge]).toEqual([formula, charge]);
  });
});

// ---------------------------------------------------------------------------------------
// Reactions
// ---------------------------------------------------------------------------------------

describe('reactions: coefficients', () => {
  // [text, coefficient of the first term as num/den]
  // prettier-ignore
  const cases: [string, string][] = [
    ['2 H2 + O2 -> 2 H2O', '2'],
    ['1/2 O2 + 2 H+ + 2 e- -> H2O', '1/2'],
    ['½ O2 + 2 H+ + 2 e- -> H2O', '1/2'],
    ['0.5 O2 + 2 H+ + 2 e- -> H2O', '1/2'],
    ['1/3 Au3+ + e- -> 1/3 Au', '1/3'],
    ['⅓ Au3+ + e- -> ⅓ Au', '1/3'],
    ['1.5 O2 -> O3', '3/2'],
    ['0.25 O2 + H+ + e- -> 0.5 H2O', '1/4'],
    ['10 Fe2+ + 2 MnO4- + 16 H+ -> 10 Fe3+ + 2 Mn2+ + 8 H2O', '10'],
  ];
  test.each(cases)('%s: first coefficient %s, exactly', (text, coef) => {
    const r = parseReaction(text);
    expect(formatRational(r.reactants[0]!.coefficient)).toBe(coef);
  });

  test('½, 1/2 and 0.5 give the same reaction text', () => {
    const texts = ['½ O2 + 2 H+ + 2 e- -> H2O', '1/2 O2 + 2 H+ + 2 e- -> H2O', '0.5 O2 + 2 H+ + 2 e- -> H2O'];
    const formatted = texts.map((t) => formatNotation(parseNotation(t)));
    expect(new Set(formatted)).toEqual(new Set(['1/2 O2 + 2 H+ + 2 e- -> H2O']));
  });

  // Regression (fixed): the mixed number "1½" reads as 11/2: "½" is rewritten to "1/2 " and the digit before
  // it is glued on, giving "11/2". Expected 3/2 (or a parse error), got 11/2 silently.
  test('the mixed number 1½ is 3/2', () => {
    expect(formatRational(parseReaction('1½ O2 -> O3').reactants[0]!.coefficient)).toBe('3/2');
  });
});

describe('reactions: every arrow', () => {
  test.each(['->', '→', '=', '<=>', '⇌', '-->', '=>', '<->', '↔', '⟶', '⇄'])(
    'Cu2+ + 2 e- %s Cu reads as the copper reduction',
    (arrow) => {
      const n = parseNotation(`Cu2+ + 2 e- ${arrow} Cu`);
      expect(n.kind).toBe('half');
      expect(formatNotation(n)).toBe('Cu2+ + 2 e- -> Cu');
    },
  );
});

describe('reactions: half-reactions and full reactions are told apart', () => {
  // prettier-ignore
  const cases: [string, 'half' | 'reaction', string][] = [
    ['MnO4- + 8 H+ + 5 e- -> Mn2+ + 4 H2O', 'half', 'MnO4- + 8 H+ + 5 e- -> Mn2+ + 4 H2O'], // OSX App. L (seen)
    ['MnO4− + 8 H⁺ + 5 e⁻ → Mn²⁺ + 4 H₂O', 'half', 'MnO4- + 8 H+ + 5 e- -> Mn2+ + 4 H2O'], // same, Unicode
    ['Cu2+ + 2e -> Cu', 'half', 'Cu2+ + 2 e- -> Cu'], // OSX App. L (seen)
    ['Zn -> Zn2+ + 2 e-', 'half', 'Zn -> Zn2+ + 2 e-'], // an oxidation is still a half-reaction
    ['Fe3+ + e- = Fe2+', 'half', 'Fe3+ + e- -> Fe2+'], // OSX App. L (seen)
    ['Zn + Cu2+ -> Zn2+ + Cu', 'reaction', 'Zn + Cu2+ -> Zn2+ + Cu'], // Daniell cell (common practice)
    ['2 H2 + O2 -> 2 H2O', 'reaction', '2 H2 + O2 -> 2 H2O'], // common practice
    ['CuSO4·5H2O -> CuSO4 + 5 H2O', 'reaction', 'CuSO4·5H2O -> CuSO4 + 5 H2O'], // dehydration (common practice)
  ];
  test.each(cases)('%s is a %s', (text, kind, canonical) => {
    const n = parseNotation(text);
    expect(n.kind).toBe(kind);
    expect(formatNotation(n)).toBe(canonical);
  });

  test('electron count and phases of a half-reaction with written phases', () => {
    const r = parseReaction('Hg2Cl2(s) + 2 e- -> 2 Hg(l) + 2 Cl-'); // OSX App. L (seen)
    expect(
      r.reactants.map((t) => [formatRational(t.coefficient), t.species.formula, t.species.phase]),
    ).toEqual([
      ['1', 'Hg2Cl2', 's'],
      ['2', 'e', null],
    ]);
    expect(
      r.products.map((t) => [formatRational(t.coefficient), t.species.formula, phaseOf(t.species)]),
    ).toEqual([
      ['2', 'Hg', 'l'],
      ['2', 'Cl', 'aq'],
    ]);
  });

  test('inline activities in a reaction: 0.1 M, 1 atm = 1.01325 bar, 5 mM', () => {
    const r = parseReaction('O2(g, 1 atm) + 4 H+(aq, 5 mM) + 4 e- -> 2 H2O');
    expect(r.reactants[0]!.activity?.value).toBeCloseTo(1.01325, 12); // 101325 Pa / 1e5 Pa (definition)
    expect(r.reactants[1]!.activity?.value).toBeCloseTo(0.005, 15); // 5 mM = 0.005 mol/L
    expect(r.reactants[2]!.activity).toBeNull();
    const z = parseReaction('Zn2+(aq, 0.1 M) + 2 e- -> Zn(s)');
    expect(z.reactants[0]!.activity).toEqual({ value: 0.1, unit: 'M', amount: 0.1 });
  });
});

// ---------------------------------------------------------------------------------------
// Couples and cell diagrams
// ---------------------------------------------------------------------------------------

describe('couples', () => {
  // [text, oxidised (formula charge), reduced (formula charge)]
  // prettier-ignore
  const cases: [string, string[], string[]][] = [
    ['Cu2+/Cu', ['Cu 2'], ['Cu 0']],                               // OSX App. L (seen)
    ['Fe3+/Fe2+', ['Fe 3'], ['Fe 2']],                             // OSX App. L (seen)
    ['AgCl/Ag', ['AgCl 0'], ['Ag 0']],                             // OSX App. L (seen)
    ['MnO4-/Mn2+', ['MnO4 -1'], ['Mn 2']],                         // OSX App. L (seen)
    ['MnO4-, H+/Mn2+', ['MnO4 -1', 'H 1'], ['Mn 2']],              // several species on a side
    ['[Fe(CN)6]3-/[Fe(CN)6]4-', ['[Fe(CN)6] -3'], ['[Fe(CN)6] -4']], // ferri/ferrocyanide (common practice)
    ['Cu²⁺/Cu', ['Cu 2'], ['Cu 0']],                               // Unicode
    ['Fe3+ / Fe2+', ['Fe 3'], ['Fe 2']],                           // spaces round the slash
    ['Hg2^2+/Hg', ['Hg2 2'], ['Hg 0']],                            // OSX App. L (seen)
  ];
  test.each(cases)('%s', (text, ox, red) => {
    const c = parseCouple(text);
    expect(c.oxidized.map((s) => `${s.formula} ${s.charge}`)).toEqual(ox);
    expect(c.reduced.map((s) => `${s.formula} ${s.charge}`)).toEqual(red);
    expect(parseNotation(text).kind).toBe('couple');
  });

  test('Br2(l)/Br- keeps the written phase', () => {
    const c = parseCouple('Br2(l)/Br-');
    expect(c.oxidized[0]!.phase).toBe('l');
  });
});

describe('cell diagrams (IUPAC Green Book §2.13, from memory: | phase boundary, || salt bridge)', () => {
  /** [formula charge] of each phase of one side. */
  const phases = (ps: ReturnType<typeof parseCellDiagram>['left']) =>
    ps.map((p) => p.map((c) => `${c.species.formula} ${c.species.charge}`));

  test('Daniell cell: two half-cells joined by a salt bridge', () => {
    const d = parseCellDiagram('Zn(s) | Zn2+(aq) || Cu2+(aq) | Cu(s)');
    expect(d.bridge).toBe(true);
    expect(phases(d.left)).toEqual([['Zn 0'], ['Zn 2']]);
    expect(phases(d.right)).toEqual([['Cu 2'], ['Cu 0']]);
  });

  test('no salt bridge: the hydrogen–silver chloride cell shares one electrolyte', () => {
    const d = parseCellDiagram('Pt | H2 | HCl(aq, 0.01 M) | AgCl | Ag');
    expect(d.bridge).toBe(false);
    expect(d.right).toEqual([]);
    expect(phases(d.left)).toEqual([['Pt 0'], ['H2 0'], ['HCl 0'], ['AgCl 0'], ['Ag 0']]);
    expect(d.left[2]![0]!.activity).toEqual({ value: 0.01, unit: 'M', amount: 0.01 });
  });

  test('commas separate species in one phase; inert electrodes are read as species', () => {
    const d = parseCellDiagram('Pt | H2(g, 1 atm) | H+ || Fe3+, Fe2+(aq, 5 mM) | Pt');
    expect(phases(d.right)).toEqual([['Fe 3', 'Fe 2'], ['Pt 0']]);
    expect(phaseOf(d.right[1]![0]!.species)).toBe('s'); // platinum metal
    expect(d.left[1]![0]!.activity?.value).toBeCloseTo(1.01325, 12); // 1 atm = 101325 Pa (definition)
    expect(d.left[1]![0]!.activity?.unit).toBe('atm');
    expect(d.right[0]![1]!.activity?.value).toBeCloseTo(0.005, 15); // 5 mM
  });

  // [inline text, value as an activity or a pressure in bar]
  // prettier-ignore
  const amounts: [string, number, string][] = [
    ['Zn2+(aq, 0.1 M)', 0.1, 'mol/L taken as activity (ideal)'],
    ['Zn2+(0.1 M)', 0.1, 'phase left out'],
    ['Zn2+(aq,0.1M)', 0.1, 'no spaces'],
    ['Zn2+(aq, 0.1 mol/L)', 0.1, 'mol/L spelled out'],
    ['Zn2+(aq, 2.5 mM)', 0.0025, 'millimolar'],
    ['Zn2+(aq, 1e-3 M)', 0.001, 'exponent'],
    ['H2(g, 0.5 bar)', 0.5, 'bar'],
    ['H2(g, 1 atm)', 1.01325, '1 atm = 1.01325 bar (definition)'],
    ['H2(g, 101.325 kPa)', 1.01325, '101.325 kPa = 1 atm (definition)'],
  ];
  test.each(amounts)('%s → %d (%s)', (species, value) => {
    const d = parseCellDiagram(`Pt | ${species} || Cu2+ | Cu`);
    expect(d.left[1]![0]!.activity!.value).toBeCloseTo(value, 12);
  });

  test('the double vertical line ‖ is a salt bridge', () => {
    const d = parseCellDiagram('Zn | Zn2+ ‖ Cu2+ | Cu');
    expect(d.bridge).toBe(true);
    expect(formatNotation(parseNotation('Zn | Zn2+ ‖ Cu2+ | Cu'))).toBe('Zn | Zn2+ || Cu2+ | Cu');
  });
});

// ---------------------------------------------------------------------------------------
// Round trip
// ---------------------------------------------------------------------------------------

interface FlatSpecies {
  formula: string;
  charge: number;
  phase: Phase | null;
  electron: boolean;
  coefficient: string | null;
  activity: number | null;
}

/** Every species of a notation in order, with its coefficient and inline activity. */
function flatten(n: Notation): (FlatSpecies | string)[] {
  const sp = (s: Species, coefficient: string | null, activity: number | null): FlatSpecies => ({
    formula: s.formula,
    charge: s.charge,
    phase: s.phase,
    electron: s.isElectron,
    coefficient,
    activity,
  });
  switch (n.kind) {
    case 'half':
    case 'reaction':
      return [
        ...n.reaction.reactants.map((t) =>
          sp(t.species, formatRational(t.coefficient), t.activity?.value ?? null),
        ),
        '->',
        ...n.reaction.products.map((t) =>
          sp(t.species, formatRational(t.coefficient), t.activity?.value ?? null),
        ),
      ];
    case 'couple':
      return [
        ...n.couple.oxidized.map((s) => sp(s, null, null)),
        '/',
        ...n.couple.reduced.map((s) => sp(s, null, null)),
      ];
    case 'cell': {
      const side = (ps: typeof n.diagram.left) =>
        ps.flatMap((p) => ['|', ...p.map((c) => sp(c.species, null, c.activity?.value ?? null))]);
      return [...side(n.diagram.left), n.diagram.bridge ? '||' : 'no bridge', ...side(n.diagram.right)];
    }
  }
}

describe('round trip: parse(format(x)) equals x', () => {
  // prettier-ignore
  const inputs: string[] = [
    'Fe3+ + e- -> Fe2+',
    'Fe+3 + e -> Fe+2',
    'Fe+++ + e⁻ → Fe++',
    'SO4^2- + 4 H+ + 2 e- -> H2SO3 + H2O',
    'SO4 2- + H2O + 2 e- = SO3 2- + 2 OH-',
    'SO42- + 4 H+ + 2 e- <=> H2SO3 + H2O',
    '[Fe(CN)6]3- + e- ⇌ [Fe(CN)6]4-',
    'Cu²⁺ + 2e⁻ → Cu',
    'SO₄²⁻ + 4 H⁺ + 2 e⁻ → H₂SO₃ + H₂O',
    'MnO4− + 8 H+ + 5 e− -> Mn2+ + 4 H2O',
    'I3- + 2 e- -> 3 I-',
    'Hg22+ + 2 e- -> 2 Hg(l)',
    '1/2 O2 + 2 H+ + 2 e- -> H2O',
    '½ O2(g) + H2O + 2 e- -> 2 OH-',
    '0.5 Cl2 + e- -> Cl-',
    '1.5 O2 -> O3',
    '1/3 Au3+ + e- -> 1/3 Au',
    'NH4+ -> NH3 + H+',
    'CuSO4·5H2O -> CuSO4 + 5 H2O',
    'Zn + Cu2+ -> Zn2+ + Cu',
    '2 H2 + O2 -> 2 H2O',
    'VO2^+ + 2 H+ + e- -> V3+ + H2O',
    'N3^- -> 3/2 N2 + e-',
    'O2^2- -> O2 + 2 e-',
    'Cr2O7 2- + 14 H+ + 6 e- -> 2 Cr3+ + 7 H2O',
    '[Al(OH)4]- + 3 e- -> Al + 4 OH-',
    '[Zn(OH)4]^2- + 2 e- -> Zn + 4 OH-',
    'Fe(OH)3(s) + e- -> Fe(OH)2(s) + OH-',
    'S2O8^2- + 2 e- -> 2 SO4^2-',
    '[Ag(NH3)2]+ + e- -> Ag + 2 NH3(aq)',
    'Zn2+(aq, 0.1 M) + 2 e- -> Zn(s)',
    'O2(g, 0.21 bar) + 4 H+(aq, 0.001 M) + 4 e- -> 2 H2O(l)',
    'Cu2+/Cu',
    'Fe3+/Fe2+',
    'AgCl/Ag',
    'MnO4-, H+/Mn2+',
    '[Fe(CN)6]3-/[Fe(CN)6]4-',
    'Br2(l)/Br-',
    'Hg2^2+/Hg',
    'Zn | Zn2+ || Cu2+ | Cu',
    'Zn(s) | Zn2+(aq, 0.1 M) || Cu2+(aq, 1 mM) | Cu(s)',
    'Pt | H2(g, 0.5 bar) | HCl(aq, 0.01 M) | AgCl(s) | Ag(s)',
    'Pt | H2(g, 1 atm) | H+(aq, 1 M) || Fe3+(aq, 0.2 M), Fe2+(aq, 0.05 M) | Pt',
    'Ag | AgCl | Cl-(aq, 0.1 M) || Cl-(aq, 0.01 M) | AgCl | Ag',
    'Hg(l) | Hg2Cl2(s) | KCl(aq, 3.5 M) || Zn2+ | Zn',
  ];

  test('there are at least 30 inputs', () => {
    expect(inputs.length).toBeGreaterThanOrEqual(30);
  });

  test.each(inputs)('%s', (text) => {
    const x = parseNotation(text);
    const f = formatNotation(x);
    const y = parseNotation(f);
    expect(y.kind).toBe(x.kind);
    expect(formatNotation(y)).toBe(f);
    expect(flatten(y)).toEqual(flatten(x));
  });

  // Regression (fixed): an inline amount written without a phase gains one in the canonical text:
  // "Zn2+(0.1 M)" formats as "Zn2+(aq, 0.1 M)" and "H2(0.5 bar)" as "H2(g, 0.5 bar)", so the
  // re-read species has phase 'aq' / 'g' where the original had none (phaseOf agrees; the
  // written phase field does not). formatNotation's contract is parse(format(x)) equals x.
  test.each(['Zn2+(0.1 M) + 2 e- -> Zn', 'H2(0.5 bar) -> 2 H+ + 2 e-', 'Zn | Zn2+(0.1 M) || Cu2+ | Cu'])(
    '%s keeps "no phase written"',
    (text) => {
      const x = parseNotation(text);
      expect(flatten(parseNotation(formatNotation(x)))).toEqual(flatten(x));
    },
  );
});

// ---------------------------------------------------------------------------------------
// Errors
// ---------------------------------------------------------------------------------------

describe('parse errors name the position', () => {
  test('the exact message for a dangling "+"', () => {
    const e = engineErrorOf(() => parseNotation('Zn2 + ->'));
    expect(e.kind).toBe('parse');
    expect(e.position).toBe(5);
    expect(e.message).toBe('Cannot read "Zn2 + ->" at character 5: expected a species after "+"');
  });

  // [text, 1-based position, part of the message]
  // prettier-ignore
  const cases: [string, number, string][] = [
    ['Xx + e- -> Fe', 1, '"Xx" is not an element symbol'],                       // unknown element
    ['Fe + Qq2+ -> Fe2+ + Qq', 6, '"Qq" is not an element symbol'],               // unknown element, mid-text
    ['Cu²⁺ + Xx → Cu', 8, '"Xx" is not an element symbol'],                       // positions count Unicode characters
    ['Hg + e- -> Hgg', 12, '"Hgg" is not an element symbol'],
    ['[Fe(CN)6 + e- -> Fe', 1, '"[" opened here is not closed'],                 // unclosed bracket
    ['Fe + Fe(OH -> Fe2+', 8, '"(" opened here is not closed'],                  // unclosed parenthesis
    ['[Fe(CN)6]]3- + e- -> [Fe(CN)6]4-', 10, 'unexpected "]"'],                  // one bracket too many
    ['Zn -> Zn2+ + 2 e- -> X', 19, 'a reaction has one arrow; found a second one'], // two arrows
    ['Fe3+ + e- → Fe2+ → Fe', 18, 'a reaction has one arrow; found a second one'],  // two Unicode arrows
    ['Cl-(aq, 0.1 furlong) + e- -> Cl2', 9, 'unknown unit "furlong"'],           // bad unit
    ['Zn | Zn2+(aq, 0.1 furlong) || Cu2+ | Cu', 15, 'unknown unit "furlong"'],   // bad unit in a cell
    ['Zn | Zn2+(aq, 0 M) || Cu2+ | Cu', 15, 'must be positive'],                 // zero activity
    ['Cu2+ + 2 e- -> Cu +', 19, 'expected a species after "+"'],
    ['Cu²⁺ + 2 e⁻ → Cu +', 18, 'expected a species after "+"'],
    ['Zn2+ + 2e- ->', 14, 'expected a species'],                                 // empty side
    ['0 Cu -> Cu', 1, 'must be a positive number'],                              // zero coefficient
    ['Cu2+ + 2 e- Cu', 15, 'expected a half-reaction or reaction with an arrow'], // no arrow
    ['Zn || Cu || Ag', 10, 'at most one salt bridge'],
    ['Zn |', 5, 'expected a species between the separators'],
    ['A/B/C', 4, 'a couple has one "/"'],
    ['Cu2+ + 2 e- -> Cu(xyz)', 19, 'element symbols start with a capital letter'],
  ];
  test.each(cases)('%s → character %d: %s', (text, position, fragment) => {
    const e = engineErrorOf(() => parseNotation(text));
    expect(e.kind).toBe('parse');
    expect(e.position).toBe(position);
    expect(e.message).toContain(fragment);
    expect(e.message).toContain(`at character ${position}:`);
  });

  test('a species with a bad unit, read alone', () => {
    const e = engineErrorOf(() => parseSpecies('Zn2+(aq, 0.1 furlong)'));
    expect(e.kind).toBe('parse');
    expect(e.position).toBe(10);
    expect(e.message).toContain('unknown unit "furlong"');
  });

  test.each(['', '   '])('empty text %j is a parse error that says what to give', (text) => {
    const e = engineErrorOf(() => parseNotation(text));
    expect(e.kind).toBe('parse');
    expect(e.message).toContain('is empty');
    expect(e.message).toContain('Cu2+/Cu');
  });

  // Regression (fixed): the empty-text error is the one parse error without a position (position is
  // undefined; every other parse error carries one). Expected position 1, got undefined.
  test('empty text has a position too', () => {
    expect(engineErrorOf(() => parseNotation('')).position).toBe(1);
  });
});
