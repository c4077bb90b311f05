/**
 * The potentials sheet plan: filter rules, layout, the table reference and the example.
 */
import { BUILTIN_POTENTIALS } from '../../src/engine/index';
import {
  exampleFormulaFor,
  filterPotentials,
  planPotentialsSheet,
  POTENTIALS_HEADER,
} from '../../src/taskpane/potentialsSheet';

describe('filterPotentials', () => {
  test('empty: all rows', () => {
    const f = filterPotentials(BUILTIN_POTENTIALS, '  ');
    expect(f.rule).toBe('all');
    expect(f.rows).toHaveLength(BUILTIN_POTENTIALS.length);
  });

  test('an element symbol picks every row with that element, and only those', () => {
    const f = filterPotentials(BUILTIN_POTENTIALS, 'Fe');
    expect(f.rule).toBe('element');
    expect(f.described).toBe('the element Fe');
    expect(f.rows.map((r) => r.halfReaction)).toContain('Fe3+ + e- -> Fe2+');
    expect(f.rows.map((r) => r.halfReaction)).toContain('Fe2+ + 2 e- -> Fe');
    expect(f.rows.every((r) => /Fe/.test(r.halfReaction))).toBe(true);
    // "F" (fluorine) is an element of its own: Fe rows are not fluorine rows
    const fluorine = filterPotentials(BUILTIN_POTENTIALS, 'F');
    expect(fluorine.rows.length).toBeGreaterThan(0);
    expect(fluorine.rows.some((r) => r.halfReaction === 'Fe3+ + e- -> Fe2+')).toBe(false);
  });

  test('a species picks the rows where it takes part, however its charge is written', () => {
    const a = filterPotentials(BUILTIN_POTENTIALS, 'Cu2+');
    expect(a.rule).toBe('species');
    expect(a.rows.map((r) => r.halfReaction)).toEqual(['Cu2+ + e- -> Cu+', 'Cu2+ + 2 e- -> Cu']);
    expect(filterPotentials(BUILTIN_POTENTIALS, 'Cu²⁺').rows).toEqual(a.rows);
    expect(filterPotentials(BUILTIN_POTENTIALS, 'Cu+2').rows).toEqual(a.rows);
    // Cu+ is another species: it is not Cu2+
    expect(filterPotentials(BUILTIN_POTENTIALS, 'Cu+').rows.map((r) => r.halfReaction)).not.toContain(
      'Cu2+ + 2 e- -> Cu',
    );
  });

  test('other text matches the row text', () => {
    const f = filterPotentials(BUILTIN_POTENTIALS, 'CN');
    expect(f.rule).toBe('text');
    expect(f.rows.length).toBeGreaterThan(0);
    expect(f.rows.every((r) => r.halfReaction.toLowerCase().includes('cn'))).toBe(true);
  });
});

describe('planPotentialsSheet', () => {
  test('header in row 1, rows below, notes in column F, table reference without the header', () => {
    const plan = planPotentialsSheet(BUILTIN_POTENTIALS, 'Fe', ['Sheet1']);
    const n = plan.rowCount;
    expect(plan.sheetName).toBe('Potentials');
    expect(plan.tableAddress).toBe(`A1:D${n + 1}`);
    expect(plan.tableRef).toBe(`Potentials!A2:D${n + 51}`); // 50 empty rows of room to grow
    const header = plan.blocks.find((b) => b.address === 'A1:D1');
    expect(header?.values).toEqual([[...POTENTIALS_HEADER]]);
    expect(POTENTIALS_HEADER).toEqual(['Half-reaction', 'E° (V vs SHE, 25 °C)', 'dE°/dT (mV/K)', 'Source']);
    const data = plan.blocks.find((b) => b.address === `A2:D${n + 1}`);
    expect(data?.values).toHaveLength(n);
    for (const row of data?.values ?? []) {
      expect(row).toHaveLength(4);
      expect(typeof row[1]).toBe('number');
      expect(typeof row[3]).toBe('string');
    }
    expect(plan.exampleFormula).toBe(
      `=ECHEM.POTENTIAL("Fe3+/Fe2+",{"Fe3+","Fe2+"},{0.1,0.01},25,Potentials!A2:D${n + 51})`,
    );
    expect(plan.summary).toBe(
      `Created sheet "Potentials" with ${n} half-reactions (the element Fe) in A1:D${n + 1}, header in row 1, ` +
        `notes in F1:F5. Pass Potentials!A2:D${n + 51} as the table argument (it has room for 50 rows you add).`,
    );
  });

  test('the units note names volts vs SHE at 25 °C and mV/K', () => {
    const plan = planPotentialsSheet(BUILTIN_POTENTIALS, '', []);
    const notes = plan.blocks.find((b) => b.address === 'F1:F3')?.values as string[][];
    expect(notes[0]?.[0]).toContain('volts vs SHE at 25 °C');
    expect(notes[0]?.[0]).toContain('mV/K');
    expect(notes[2]?.[0]).toBe(`Example: ${plan.exampleFormula.slice(1)}`);
  });

  test('a filter that picks nothing writes nothing and says why', () => {
    expect(() => planPotentialsSheet(BUILTIN_POTENTIALS, 'Xyz', [])).toThrow(
      /no built-in half-reaction matches/,
    );
  });

  test('without Fe3+/Fe2+ the example uses the first row, its solutes at 0.1 and 0.01 and its gases at 1 bar', () => {
    const rows = filterPotentials(BUILTIN_POTENTIALS, 'Cl2').rows;
    expect(rows[0]?.halfReaction).toBe('Cl2(g) + 2 e- -> 2 Cl-');
    expect(exampleFormulaFor(rows, 'T!A2:D3')).toBe(
      '=ECHEM.POTENTIAL("Cl2(g) + 2 e- -> 2 Cl-",{"Cl2","Cl-"},{1,0.1},25,T!A2:D3)',
    );
  });
});
