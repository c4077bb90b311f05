/**
 * The potentials table: every built-in row read by the engine's own parser (this complements
 * test/engine/data/potentials.data.test.ts, which checks the rows with a parser of its own),
 * and user tables as a spreadsheet range delivers them: header, blank rows, numbers as text,
 * broken rows reported by row number, duplicates, and user rows shadowing built-in ones.
 *
 * Values in the user tables below are real published numbers, so that the lookups they feed
 * are checked against something outside the project; each names its source.
 */
import {
  BUILTIN_POTENTIALS,
  builtinTable,
  checkBalance,
  defaultTable,
  electronCount,
  parseNotation,
  readUserTable,
  resolveReaction,
  rowE0V,
  standardPotentialV,
  type PotentialTable,
} from '../../src/engine';
import { engineErrorOf, F } from '../support';


const e0 = (text: string, table: PotentialTable): number =>
  standardPotentialV(resolveReaction(text, table), 25);

// ---------------------------------------------------------------------------------------
// Built-in rows
// ---------------------------------------------------------------------------------------

describe('built-in table', () => {
  test('holds at least 60 couples (docs/design.md, The potentials table)', () => {
    expect(BUILTIN_POTENTIALS.length).toBeGreaterThanOrEqual(60);
    expect(builtinTable().length).toBe(BUILTIN_POTENTIALS.length);
  });

  test('defaultTable() is the built-in rows with no user rows and no problems', () => {
    const t = defaultTable();
    expect(t.rows).toBe(builtinTable());
    expect(t.userRows).toEqual([]);
    expect(t.problems).toEqual([]);
    expect(readUserTable(null)).toBe(t);
    expect(readUserTable([])).toBe(t);
  });

  const rows = BUILTIN_POTENTIALS.map((r, i) => [i + 1, r.halfReaction, r.e0V, r.source] as const);

  // The checks are structural: each row's E° and source are those of the publication the row
  // names (checked value by value in the data test); here the engine must read them.
  test.each(rows)('row %d: %s parses as a balanced reduction', (i, text) => {
    const n = parseNotation(text);
    expect(n.kind).toBe('half');
    if (n.kind !== 'half') return;
    expect(checkBalance(n.reaction).balanced).toBe(true);
    const row = builtinTable()[i - 1]!;
    expect(row.text).toBe(text);
    expect(row.n).toBeGreaterThan(0); // electrons on the left: a reduction
    expect(row.origin).toEqual({ kind: 'builtin', index: i - 1 });
  });

  test.each(rows)('row %d: %s names its publication', (_i, _text, e0V, source) => {
    expect(source.trim()).not.toBe('');
    expect(source).toMatch(/OpenStax|CRC Handbook|Bates|IUPAC|Bratsch/);
    expect(source).toMatch(/species data/);
    expect(Number.isFinite(e0V)).toBe(true);
    expect(Math.abs(e0V)).toBeLessThan(4); // all aqueous standard potentials lie within about ±3.1 V (common practice)
  });

  test.each(rows)('row %d: %s is found by its own text, alone, with its own E°', (_i, text, e0V) => {
    // a unique match also shows that no other row is the same half-reaction
    // the row shows E° from the species data rounded to 0.1 mV; the engine uses it unrounded
    expect(Math.abs(e0(text, defaultTable()) - e0V)).toBeLessThanOrEqual(0.5e-4 + 1e-12);
  });
});

// ---------------------------------------------------------------------------------------
// User tables
// ---------------------------------------------------------------------------------------

describe('user table read from a spreadsheet range', () => {
  // A range as Excel hands it over: strings, numbers, null for empty cells, "" and 0 in
  // cells that look empty. Row numbers are 1-based within the range, header included.
  // prettier-ignore
  const cells: unknown[][] = [
    ['Half-reaction', 'E° (V)', 'dE°/dT (mV/K)', 'Source'],                               // 1 header
    ['Fe3+ + e- -> Fe2+', 0.68, null, 'formal potential in 1 M H2SO4 (Bard & Faulkner, from memory)'], // 2
    [null, null, null, null],                                                            // 3 blank
    ['', '', '', ''],                                                                    // 4 blank
    [0, 0, 0, 0],                                                                        // 5 blank (Excel zeros)
    ['Cu2+ + e- -> Cu', 0.34, null, ''],                                                 // 6 unbalanced
    ['Ag+ + e- -> Ag', 'abc', null, null],                                               // 7 bad number
    ['Zn -> Zn2+ + 2 e-', -0.76, null, null],                                            // 8 oxidation
    ['Zn2+/Zn', -0.76, null, null],                                                      // 9 not a half-reaction
    [null, 0.5, null, null],                                                             // 10 empty first column
    ['Ni2+ + 2 e- -> Ni', ' -0.23 ', '', 'CRC Handbook 54th ed. p. D-120 (seen)'],       // 11 numeric text
    ['Ni2+ + 2 e- -> Ni', -0.257, null, 'OpenStax Chemistry 2e, Appendix L (seen)'],     // 12 duplicate of 11, other E°
    ['2 Fe3+ + 2 e- -> 2 Fe2+', 0.68, null, null],                                       // 13 duplicate of 2, same E°
    ['Co2+ + 2 e- -> Co', -280, null, null],                                             // 14 millivolts
    ['Pb2+ + 2 e- -> Pb', '\u22120.1263', 'x', null],                                    // 15 bad dE°/dT
    ['Sn2+ + 2 e- -> Sn', '\u22120.1364', '0', 'CRC Handbook 54th ed. p. D-120 (seen)'], // 16 Unicode minus, zero slope
    ['Hg + e- -> Hgg', 0.1, null, null],                                                 // 17 unknown element
    [42, 0.1, null, null],                                                               // 18 a number in the first column
    ['Cd2+ + 2 e- -> Cd', true, null, null],                                             // 19 a boolean E°
    ['Zn + Cu2+ -> Zn2+ + Cu', 1.1, null, null],                                         // 20 a full reaction
    ['Ag+ + e- -> Ag', 0.7996, '-0.989', 'CRC Handbook 92nd ed. (seen)'],                // 21 good, slope as text
  ];
  const t = readUserTable(cells);

  // [row, part of the message]
  // prettier-ignore
  const broken: [number, string][] = [
    [6, 'does not balance (charge: 1 on the left, 0 on the right)'],
    [7, 'E° must be a number in volts; got "abc"'],
    [8, 'is written as an oxidation'],
    [9, 'is not a half-reaction'],
    [10, 'the first column must hold a half-reaction'],
    [12, 'rows 11 and 12 give the same half-reaction'],
    [13, 'rows 2 and 13 give the same half-reaction'],
    [14, 'outside ±10 V; give it in volts, not millivolts'],
    [15, 'dE°/dT must be a number in mV/K or empty; got "x"'],
    [17, '"Hgg" is not an element symbol'],
    [18, 'the first column must hold a half-reaction'],
    [19, 'E° must be a number in volts'],
    [20, 'is not a half-reaction'],
  ];

  test.each(broken)('row %d is reported: %s', (row, fragment) => {
    const p = t.problems.filter((x) => x.row === row);
    expect(p).toHaveLength(1);
    expect(p[0]!.message).toContain(fragment);
    expect(p[0]!.message).toContain(`${row}`);
  });

  test('only the broken rows are reported; header and blank rows are not', () => {
    expect(t.problems.map((p) => p.row).sort((a, b) => a - b)).toEqual(broken.map(([r]) => r));
  });

  test('a duplicate with another E° names both values', () => {
    const p = t.problems.find((x) => x.row === 12)!;
    expect(p.message).toContain('with different E° (-0.23 V and -0.257 V)');
    const same = t.problems.find((x) => x.row === 13)!;
    expect(same.message).not.toContain('different E°');
  });

  test('the good rows are read, with numbers from text and the 1-based row number', () => {
    expect(t.userRows.map((r) => [r.origin, r.text, r.e0V, r.dE0dTmVperK, r.source])).toEqual([
      [
        { kind: 'user', row: 2 },
        'Fe3+ + e- -> Fe2+',
        0.68,
        null,
        'formal potential in 1 M H2SO4 (Bard & Faulkner, from memory)',
      ],
      [{ kind: 'user', row: 11 }, 'Ni2+ + 2 e- -> Ni', -0.23, null, 'CRC Handbook 54th ed. p. D-120 (seen)'],
      [
        { kind: 'user', row: 12 },
        'Ni2+ + 2 e- -> Ni',
        -0.257,
        null,
        'OpenStax Chemistry 2e, Appendix L (seen)',
      ],
      [{ kind: 'user', row: 13 }, '2 Fe3+ + 2 e- -> 2 Fe2+', 0.68, null, 'user table'],
      [
        { kind: 'user', row: 16 },
        'Sn2+ + 2 e- -> Sn',
        -0.1364,
        0, // '0' as text: an explicit zero slope (constant E°), not an empty cell
        'CRC Handbook 54th ed. p. D-120 (seen)',
      ],
      [{ kind: 'user', row: 21 }, 'Ag+ + e- -> Ag', 0.7996, -0.989, 'CRC Handbook 92nd ed. (seen)'],
    ]);
  });

  test('the other rows are still usable', () => {
    expect(e0('Sn2+/Sn', t)).toBe(-0.1364); // CRC54 p. D-120 (seen), from user row 16
    expect(e0('Ag+/Ag', t)).toBe(0.7996); // CRC92 (seen), from user row 21
    expect(e0('Zn2+/Zn', t)).toBe(-0.7618); // built-in, OSX App. L (seen): row 8's broken text touches nothing
    expect(e0('Cl2/Cl-', t)).toBe(e0('Cl2/Cl-', defaultTable())); // built-in (species data; OSX App. L prints 1.35827)
    expect(e0('Cl2/Cl-', t)).toBeCloseTo(1.35827, 2);
  });

  test('a couple with two user rows of different E° is ambiguous and names the rows', () => {
    const e = engineErrorOf(() => resolveReaction('Ni2+/Ni', t));
    expect(e.kind).toBe('ambiguous');
    expect(e.message).toContain('your table, row 11');
    expect(e.message).toContain('your table, row 12');
  });

  test('user rows shadow built-in rows for the same couple', () => {
    expect(t.rows.filter((r) => r.text === 'Sn2+ + 2 e- -> Sn').map((r) => r.origin.kind)).toEqual(['user']);
    expect(t.rows.filter((r) => r.text === 'Ag+ + e- -> Ag').map((r) => r.origin.kind)).toEqual(['user']);
    // the rest of the built-in table is still there
    const builtinLeft = t.rows.filter((r) => r.origin.kind === 'builtin').length;
    expect(builtinLeft).toBe(BUILTIN_POTENTIALS.length - 4); // Fe3+/Fe2+, Ni2+/Ni, Sn2+/Sn, Ag+/Ag
    // a user row that repeats another with the same E° is kept for CHECKTABLE and used once
    const repeats = t.problems.filter(
      (p) => /give the same half-reaction/.test(p.message) && !/different/.test(p.message),
    ).length;
    expect(t.rows.length).toBe(t.userRows.length - repeats + builtinLeft);
  });
});

describe('user table: header, blank rows and cells', () => {
  test.each<[string, unknown[][]]>([
    [
      'a header "Half-reaction | E° (V)"',
      [
        ['Half-reaction', 'E° (V)'],
        ['Cu2+ + 2 e- -> Cu', 0.3419],
      ],
    ],
    [
      'a header "Couple | E0 (V)"',
      [
        ['Couple', 'E0 (V)'],
        ['Cu2+ + 2 e- -> Cu', 0.3419],
      ],
    ],
    [
      'a header "Reaction | E0"',
      [
        ['Reaction', 'E0'],
        ['Cu2+ + 2 e- -> Cu', 0.3419],
      ],
    ],
    ['no header', [['Cu2+ + 2 e- -> Cu', 0.3419]]],
    [
      'a blank first row',
      [
        [null, null],
        ['Cu2+ + 2 e- -> Cu', 0.3419],
      ],
    ],
    ['E° as text', [['Cu2+ + 2 e- -> Cu', '0.3419']]],
    ['E° as text with spaces', [['Cu2+ + 2 e- -> Cu', '  0.3419  ']]],
    ['a short row (two columns)', [['Cu2+ + 2 e- -> Cu', 0.3419]]],
    [
      'trailing blank rows',
      [
        ['Cu2+ + 2 e- -> Cu', 0.3419],
        [null, null],
        ['', ''],
      ],
    ],
  ])('%s: one user row, no problems, Cu2+/Cu = 0.3419 (CRC54 p. D-120, seen)', (_what, cells) => {
    const t = readUserTable(cells);
    expect(t.problems).toEqual([]);
    expect(t.userRows).toHaveLength(1);
    expect(e0('Cu2+/Cu', t)).toBe(0.3419);
  });

  test('the row number counts the header and blank rows', () => {
    const t = readUserTable([
      ['Half-reaction', 'E°'],
      [null, null],
      ['', ''],
      ['Cu2+ + 2 e- -> Cu', 0.3419],
    ]);
    expect(t.userRows[0]!.origin).toEqual({ kind: 'user', row: 4 });
  });

  test('a header-like row after the first row is a broken row, not a header', () => {
    const t = readUserTable([
      ['Cu2+ + 2 e- -> Cu', 0.3419],
      ['Half-reaction', 'E0'],
    ]);
    expect(t.problems).toHaveLength(1);
    expect(t.problems[0]!.row).toBe(2);
    expect(t.problems[0]!.message).toContain('E° must be a number');
    expect(e0('Cu2+/Cu', t)).toBe(0.3419);
  });

  test.each<[string, unknown]>([
    ['an empty E° cell', null],
    ['an E° of ""', ''],
    ['an E° with a unit', '0.3419 V'],
    ['an E° of NaN', NaN],
  ])('%s is reported', (_what, value) => {
    const t = readUserTable([['Cu2+ + 2 e- -> Cu', value]]);
    expect(t.problems).toHaveLength(1);
    expect(t.problems[0]!.row).toBe(1);
    expect(t.problems[0]!.message).toContain('E° must be a number in volts');
    // the lookup that needs the broken row is refused rather than silently answered by the
    // built-in row (OSX App. L 0.337): the user meant their own value
    expect(() => e0('Cu2+/Cu', t)).toThrow(/needs row 1 of your table/);
    // a lookup that does not touch the broken row still works
    expect(e0('Zn2+/Zn', t)).toBe(-0.7618); // OSX App. L (seen)
  });

  test('dE°/dT: a number (0 included), numeric text, or empty for none given', () => {
    // dE°/dT values from memory: Bratsch, J. Phys. Chem. Ref. Data 18, 1 (1989)
    const t = readUserTable([
      ['Cu2+ + 2 e- -> Cu', 0.34, 0.011],
      ['Ag+ + e- -> Ag', 0.7996, '-0.989'],
      ['Zn2+ + 2 e- -> Zn', -0.7618, 0],
      ['Fe3+ + e- -> Fe2+', 0.771, ''],
      ['Sn2+ + 2 e- -> Sn', -0.1375, '0'],
    ]);
    expect(t.problems).toEqual([]);
    expect(t.userRows.map((r) => r.dE0dTmVperK)).toEqual([0.011, -0.989, 0, null, 0]);
  });

  test('an explicit 0 in dE°/dT forces a constant E°; an empty cell takes the slope from the species entropies', () => {
    // E° as the user types them: OpenStax Chemistry 2e, Appendix L (seen)
    const t = readUserTable([
      ['Zn2+ + 2 e- -> Zn', -0.7618, 0],
      ['Fe3+ + e- -> Fe2+', 0.771, null],
    ]);
    const [zn, fe] = t.userRows;
    expect(zn!.temperature.basis).toBe('row');
    for (const tC of [0, 60, 100]) expect(rowE0V(zn!, tC)).toBe(-0.7618);
    // Fe3+ + e- -> Fe2+ from the NBS 1982 S° (Wagman et al., from memory) and the SHE convention
    // S°(e-) = ½·S°(H2, g) = 65.342, Cp°(e-) = 14.412 J/(mol·K); Fe2+ and Fe3+ have no Cp°:
    // ΔrS° = −137.7 + 315.9 − 65.342 = 112.858 J/(mol·K), ΔrCp° = −14.412 J/(mol·K),
    // E°(T) = E°(25 °C) + ΔrS°/F·(T − T0) − ΔrCp°/F·[(T − T0) − T ln(T/T0)]
    expect(fe!.temperature.basis).toBe('species');
    const T0 = 298.15;
    const T = 333.15;
    const byHand = 0.771 + (112.858 / F) * (T - T0) - (-14.412 / F) * (T - T0 - T * Math.log(T / T0));
    expect(rowE0V(fe!, 60)).toBeCloseTo(byHand, 9);
    // about +1.17 mV/K over 35 K (the heat-capacity term adds −0.3 mV)
    expect(Math.abs(rowE0V(fe!, 60) - 0.771 - 35 * 1.17e-3)).toBeLessThan(0.001);
  });
});

describe('user rows shadow built-in rows', () => {
  test('a formal potential replaces the standard one (Fe3+/Fe2+ 0.68 V in 1 M H2SO4, Bard & Faulkner, from memory)', () => {
    const t = readUserTable([['Fe3+ + e- -> Fe2+', 0.68, null, 'formal, 1 M H2SO4']]);
    expect(e0('Fe3+/Fe2+', t)).toBe(0.68);
    expect(e0('Fe3+ + e- -> Fe2+', t)).toBe(0.68);
    expect(e0('Fe3+/Fe2+', defaultTable())).toBe(0.771); // OSX App. L (seen): the built-in table is untouched
    expect(e0('Cu2+/Cu', t)).toBe(e0('Cu2+/Cu', defaultTable())); // other couples keep their built-in rows
    expect(e0('Cu2+/Cu', t)).toBeCloseTo(0.34, 2); // OSX App. L prints +0.34 (seen)
  });

  test('a proportional half-reaction shadows too: 2 Fe3+ + 2 e- -> 2 Fe2+ replaces Fe3+ + e- -> Fe2+', () => {
    const t = readUserTable([['2 Fe3+ + 2 e- -> 2 Fe2+', 0.68]]);
    expect(t.rows.some((r) => r.origin.kind === 'builtin' && r.text === 'Fe3+ + e- -> Fe2+')).toBe(false);
    expect(e0('Fe3+ + e- -> Fe2+', t)).toBe(0.68);
    expect(e0('Fe3+/Fe2+', t)).toBe(0.68);
    // a cell through the user row: E° = 0.7996 (OSX App. L, seen) − 0.68
    const cell = resolveReaction('Pt | Fe3+, Fe2+ || Ag+ | Ag', t);
    expect(standardPotentialV(cell, 25)).toBeCloseTo(0.7996 - 0.68, 12);
  });

  // Regression (fixed): the electron count of a cell diagram follows the scale the user's row is written in.
  // With the built-in row Fe3+ + e- -> Fe2+, "Pt | Fe3+, Fe2+ || Ag+ | Ag" has n = 1 (the
  // smallest whole-number cell reaction Ag+ + Fe2+ -> Ag + Fe3+); with the proportional user
  // row 2 Fe3+ + 2 e- -> 2 Fe2+ it has n = 2, so ELECTRONS, LOGK and GIBBS of the same diagram
  // double although E° is the same. Expected n = 1, got 2.
  test('a proportional user row does not change the electron count of a cell diagram', () => {
    const text = 'Pt | Fe3+, Fe2+ || Ag+ | Ag';
    expect(electronCount(resolveReaction(text, defaultTable()))).toBe(1);
    expect(electronCount(resolveReaction(text, readUserTable([['2 Fe3+ + 2 e- -> 2 Fe2+', 0.68]])))).toBe(1);
  });

  test('a phase-specific row shadows only that phase: Br2(aq) but not Br2(l)', () => {
    const t = readUserTable([['Br2(aq) + 2 e- -> 2 Br-', 1.0873, null, 'OpenStax Chemistry 2e, Appendix L']]);
    expect(t.rows.filter((r) => r.text.startsWith('Br2(')).map((r) => [r.text, r.origin.kind])).toEqual([
      ['Br2(aq) + 2 e- -> 2 Br-', 'user'],
      ['Br2(l) + 2 e- -> 2 Br-', 'builtin'],
    ]);
    expect(e0('Br2(l) + 2 e- -> 2 Br-', t)).toBe(e0('Br2(l) + 2 e- -> 2 Br-', defaultTable()));
    expect(e0('Br2(l) + 2 e- -> 2 Br-', t)).toBeCloseTo(1.065, 2); // CRC54 p. D-120 prints 1.065 (seen)
  });

  // Regression (fixed): two user rows for the same half-reaction with the SAME E° (rows 1 and 2: one written
  // with 1 electron, one with 2) are reported by CHECKTABLE, and the engine's own conflict
  // check (conflictingDuplicates) lets equal-E° duplicates through, but the lookup still fails:
  // resolveReaction('Fe3+/Fe2+', table) throws 'ambiguous' ("matches 2 half-reactions").
  // Expected E° = 0.68, got an ambiguous error.
  test('duplicate user rows with the same E° still resolve', () => {
    const t = readUserTable([
      ['Fe3+ + e- -> Fe2+', 0.68],
      ['2 Fe3+ + 2 e- -> 2 Fe2+', 0.68],
    ]);
    expect(t.problems).toHaveLength(1);
    expect(e0('Fe3+/Fe2+', t)).toBe(0.68);
  });
});
