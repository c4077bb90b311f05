/**
 * The case series' pure logic: the reaction check, reading the form (messages in sentence
 * case, decimal commas where the locale uses them), case values (log and linear spacing),
 * and the sheet layout and formula text. The preview values are checked against published
 * figures in seriesPreview.test.ts.
 */
import {
  caretLine,
  checkReaction,
  FIRST_CASE_ROW,
  fixedRows,
  formatValue,
  HEADER_ROW,
  linearSteps,
  logSteps,
  missingSummary,
  sentenceCase,
  MAX_POINTS,
  planSweep,
  readNumber,
  readSweepForm,
  sweepSheetPlan,
} from '../../src/taskpane/sweepPlan';
import { form, input } from './sweepFixtures';

describe('checkReaction (live validation)', () => {
  test('a bad reaction gives the engine message and its 1-based position', () => {
    const c = checkReaction('Zn2 + ->');
    expect(c.ok).toBe(false);
    if (c.ok) return;
    expect(c.position).toBe(5);
    expect(c.message).toContain('character 5');
    expect(caretLine(c.position ?? 1)).toBe('    ^');
  });

  test('empty text asks for a reaction in a sentence, with no caret position', () => {
    expect(checkReaction('  ')).toEqual({
      ok: false,
      message: 'Type a reaction, for example Cu2+/Cu or Zn | Zn2+ || Cu2+ | Cu.',
      position: null,
    });
  });

  test('a couple lists the species the resolved half-reaction needs, H+ included', () => {
    const c = checkReaction('MnO4-/Mn2+');
    expect(c.ok).toBe(true);
    if (!c.ok) return;
    expect(c.kind).toBe('couple');
    expect(c.n).toBe(5);
    expect(c.species.map((s) => s.name)).toEqual(['MnO4-', 'H+', 'Mn2+']);
  });

  test('pure solids and water are left out; gases are marked', () => {
    const c = checkReaction('O2(g) + 4 H+ + 4 e- -> 2 H2O');
    expect(c.ok && c.species).toEqual([
      { name: 'O2', weight: -0.25, gas: true },
      { name: 'H+', weight: -1, gas: false },
    ]);
  });

  test('a species in both half-cells is side-qualified', () => {
    const c = checkReaction('Ag | Ag+ || Ag+ | Ag');
    expect(c.ok && c.species.map((s) => s.name).sort()).toEqual(['left:Ag+', 'right:Ag+']);
  });

  test('text the built-in table cannot resolve still reads, with the table message as a warning', () => {
    const c = checkReaction('Au+ + 2 e- -> Au-');
    expect(c.ok).toBe(true);
    if (!c.ok) return;
    expect(c.form).toBeNull();
    expect(c.n).toBeNull();
    expect(c.warning).toContain('not in the potentials table');
    expect(c.warning).toContain('Fine if the potentials table you pass has it');
    expect(c.species.map((s) => s.name)).toEqual(['Au+', 'Au-']);
  });

  test('an unknown element symbol is a positioned parse error', () => {
    const c = checkReaction('Q2+ + 2 e- -> Q');
    expect(c).toEqual({
      ok: false,
      position: 1,
      message: expect.stringContaining('"Q" is not an element symbol'),
    });
  });
});

describe('readNumber', () => {
  test.each([
    ['0.01', 0.01],
    ['1e-6', 1e-6],
    ['10^-6', 1e-6],
    ['10^(-3)', 1e-3],
    ['−2', -2],
    [' 25 ', 25],
  ])('%s reads as %p', (text, value) => {
    expect(readNumber(text)).toBeCloseTo(value, 15);
  });
  test.each(['', 'abc', '0,01', '1e', '--1'])('%p is not a number', (text) => {
    expect(readNumber(text)).toBeNull();
  });
});

describe('case values', () => {
  test('log spacing: equal ratios, exact ends, 4 points a decade', () => {
    const a = logSteps(1e-6, 1, 25);
    expect(a).toHaveLength(25);
    expect(a[0]).toBe(1e-6);
    expect(a[24]).toBe(1);
    expect(a[4]).toBe(1e-5);
    expect(a[12]).toBe(0.001);
    const ratio = 10 ** 0.25;
    for (let i = 1; i < a.length; i++) expect((a[i] as number) / (a[i - 1] as number)).toBeCloseTo(ratio, 12);
  });

  test('linear spacing without float noise', () => {
    expect(linearSteps(0, 14, 29).slice(0, 4)).toEqual([0, 0.5, 1, 1.5]);
    expect(linearSteps(0.001, 0.1, 3)).toEqual([0.001, 0.0505, 0.1]);
    expect(linearSteps(0.1, 0.3, 3)[1]).toBe(0.2);
    expect(linearSteps(65, 5, 13)).toEqual([65, 60, 55, 50, 45, 40, 35, 30, 25, 20, 15, 10, 5]);
  });

  test('formatValue keeps labels short', () => {
    expect(formatValue(1e-6)).toBe('1e-6');
    expect(formatValue(2.5e-7)).toBe('2.5e-7');
    expect(formatValue(0.01)).toBe('0.01');
    expect(formatValue(25)).toBe('25');
    expect(formatValue(0)).toBe('0');
  });
});

describe('readSweepForm', () => {
  test('reads a complete form', () => {
    const i = input();
    expect(i).toEqual({
      reaction: 'Cu2+/Cu',
      variable: { kind: 'activity', species: 'Cu2+', scale: 'log' },
      from: 1e-6,
      to: 1,
      points: 25,
      tempC: 25,
      fixed: [],
      table: null,
    });
  });

  test('each bad input is reported against its field', () => {
    const r = readSweepForm(
      form({
        reaction: 'Zn2 + ->',
        from: 'abc',
        to: '0',
        points: '1',
        tempC: '-300',
        species: [
          { name: 'Cu2+', value: '1' },
          { name: 'Fe3+', value: '-1' },
          { name: 'Fe3+', value: '1' },
          { name: '', value: '0.1' },
          { name: 'Xq+', value: '1' },
        ],
        table: 'not a range!',
      }),
    );
    expect(r.ok).toBe(false);
    if (r.ok) return;
    const byField = Object.fromEntries(r.errors.map((e) => [e.field, e.message]));
    expect(byField.reaction).toContain('character 5');
    expect(byField.from).toContain('"abc" is not a number');
    expect(byField.to).toContain('above 0');
    expect(byField.points).toContain(`from 2 to ${MAX_POINTS}`);
    expect(byField.tempC).toContain('−273.15');
    expect(byField['value-1']).toContain('above 0');
    expect(byField['species-2']).toContain('listed twice');
    expect(byField['species-3']).toContain('Give the name of species 4');
    expect(byField['species-4']).toContain('is not a species');
    expect(byField.table).toContain('Potentials!A2:D115');
  });

  test('equal ends are refused; temperatures must be above absolute zero', () => {
    const a = readSweepForm(form({ from: '0.1', to: '0.1' }));
    expect(!a.ok && a.errors[0]?.field).toBe('to');
    const t = readSweepForm(form({ variable: { kind: 'temperature' }, from: '-274', to: '25' }));
    expect(!t.ok && t.errors.map((e) => e.field)).toEqual(['from']);
  });

  test('a pH sweep drops H+ (the pH column sets it) and the varied species drops out of the fixed list', () => {
    const rows = [
      { name: 'MnO4-', value: '0.01' },
      { name: 'H+', value: '1' },
      { name: 'Mn2+', value: '0.001' },
    ];
    expect(fixedRows({ variable: { kind: 'pH' }, species: rows }).map((r) => r.name)).toEqual([
      'MnO4-',
      'Mn2+',
    ]);
    expect(
      fixedRows({ variable: { kind: 'activity', species: 'Mn^2+', scale: 'log' }, species: rows }).map(
        (r) => r.name,
      ),
    ).toEqual(['MnO4-', 'H+']);
  });

  test('a table range is passed through; sheet names may be quoted', () => {
    expect(input({ table: "'Potentials (2)'!$A$2:$D$131" }).table).toBe("'Potentials (2)'!$A$2:$D$131");
    expect(input({ table: 'MyPotentials' }).table).toBe('MyPotentials');
  });
});

describe('planSweep: layout and formula', () => {
  test('log activity sweep: header, cases, LOG10 column, one spilled formula, chart', () => {
    const layout = planSweep(input());
    expect(layout.baseName).toBe('E vs log a(Cu2+)');
    expect(layout.headers).toEqual(['Cu2+']);
    expect(layout.cases).toHaveLength(25);
    expect(layout.cases[0]).toEqual([1e-6]);
    expect(layout.x[0]).toBe(-6);
    expect(layout.x[1]).toBe(-5.75);
    expect(layout.x[24]).toBe(0);
    expect(layout.columns).toEqual(['Cu2+', 'temp_C', 'log10 a(Cu2+)', 'E / V vs SHE']);
    expect(layout.formula).toBe('=ECHEM.POTENTIAL(B1,A6,A7:A31,B7:B31)');
    expect(layout.formulaCell).toBe('D7');
    expect(layout.spillRange).toBe('D7:D31');
    expect(layout.inputRange).toBe('A6:B31');
    expect(layout.chart).toMatchObject({
      type: 'XYScatterLines',
      xValues: 'C7:C31',
      yValues: 'D7:D31',
      xTitle: 'log10 a(Cu2+)',
      yTitle: 'E / V vs SHE',
    });
    const logBlock = layout.blocks.find((b) => b.address === 'C7:C31');
    expect(logBlock?.formulas?.[3]).toEqual(['=LOG10(A10)']);
    expect(HEADER_ROW).toBe(6);
    expect(FIRST_CASE_ROW).toBe(7);
  });

  test('fixed species follow the varied one; the table argument goes last', () => {
    const layout = planSweep(
      input({
        reaction: 'Fe3+/Fe2+',
        variable: { kind: 'activity', species: 'Fe3+', scale: 'linear' },
        from: '0.001',
        to: '0.1',
        points: '21',
        species: [
          { name: 'Fe3+', value: '1' },
          { name: 'Fe2+', value: '0.01' },
        ],
        table: 'Potentials!A2:D131',
      }),
    );
    expect(layout.headers).toEqual(['Fe3+', 'Fe2+']);
    expect(layout.cases[0]).toEqual([0.001, 0.01]);
    expect(layout.cases[20]).toEqual([0.1, 0.01]);
    expect(layout.columns).toEqual(['Fe3+', 'Fe2+', 'temp_C', 'E / V vs SHE']);
    expect(layout.formula).toBe('=ECHEM.POTENTIAL(B1,A6:B6,A7:B27,C7:C27,Potentials!A2:D131)');
    expect(layout.formulaCell).toBe('D7');
    expect(layout.chart.xValues).toBe('A7:A27');
    expect(layout.chart.xTitle).toBe('a(Fe3+)');
    expect(layout.blocks.some((b) => b.formulas?.[0]?.[0]?.startsWith('=LOG10'))).toBe(false);
  });

  test('gases are labelled by partial pressure in bar', () => {
    const layout = planSweep(
      input({
        reaction: '2 H+ + 2 e- -> H2(g)',
        variable: { kind: 'activity', species: 'H2(g)', scale: 'log' },
        from: '0.01',
        to: '1',
        points: '3',
        species: [{ name: 'H+', value: '1' }],
      }),
    );
    expect(layout.xTitle).toBe('log10 (p(H2) / bar)');
  });

  test('a temperature sweep with no species at all: standard state, empty species arguments', () => {
    const layout = planSweep(
      input({ variable: { kind: 'temperature' }, from: '5', to: '65', points: '13', species: [] }),
    );
    expect(layout.headers).toEqual([]);
    expect(layout.formula).toBe('=ECHEM.POTENTIAL(B1,,,A7:A19)');
    expect(layout.temps).toEqual([5, 10, 15, 20, 25, 30, 35, 40, 45, 50, 55, 60, 65]);
    expect(layout.chart.xValues).toBe('A7:A19');
    expect(layout.chart.xTitle).toBe('Temperature / °C');
  });

  test('a cell is plotted as EMF, not against SHE', () => {
    const layout = planSweep(
      input({
        reaction: 'Zn | Zn2+ || Cu2+ | Cu',
        species: [
          { name: 'Cu2+', value: '1' },
          { name: 'Zn2+', value: '1' },
        ],
      }),
    );
    expect(layout.yTitle).toBe('EMF / V');
    expect(layout.baseName).toBe('EMF vs log a(Cu2+)');
  });

  test('warnings: OH- with a pH sweep, a varied species the reaction does not use', () => {
    const basic = planSweep(
      input({
        reaction: 'O2(g) + 2 H2O + 4 e- -> 4 OH-',
        variable: { kind: 'pH' },
        from: '0',
        to: '14',
        points: '15',
        species: [
          { name: 'O2(g)', value: '1' },
          { name: 'OH-', value: '1' },
        ],
      }),
    );
    expect(basic.warnings.join(' ')).toContain('OH- but no H+');
    const unused = planSweep(input({ variable: { kind: 'activity', species: 'Zn2+', scale: 'log' } }));
    expect(unused.warnings.join(' ')).toContain('Zn2+ does not take part');
  });

  test('the sheet plan gets a unique name and says what it writes', () => {
    const layout = planSweep(input());
    const plan = sweepSheetPlan(layout, ['E vs log a(Cu2+)', 'e vs log a(cu2+) (2)']);
    expect(plan.sheetName).toBe('E vs log a(Cu2+) (3)');
    expect(plan.summary).toContain('=ECHEM.POTENTIAL(B1,A6,A7:A31,B7:B31) in D7');
    expect(plan.freezeRows).toBe(HEADER_ROW);
  });
});

describe('messages: sentence case, and what the write button says', () => {
  test('sentenceCase capitalises and ends with a full stop', () => {
    expect(sentenceCase('reaction is missing: give a reaction')).toBe(
      'Reaction is missing: give a reaction.',
    );
    expect(sentenceCase('Already fine.')).toBe('Already fine.');
    expect(sentenceCase('')).toBe('');
  });

  test('missingSummary names the inputs to fix, without repeating their messages', () => {
    const e = (label: string) => ({ field: label.toLowerCase(), label, message: `Message about ${label}.` });
    expect(missingSummary([])).toBe('');
    expect(missingSummary([e('From')])).toBe('Not ready: From needs fixing (see the message beside it).');
    expect(missingSummary([e('From'), e('To'), e('Cases')])).toBe(
      'Not ready: From, To and Cases need fixing (see the messages beside them).',
    );
  });

  test('a comma locale reads "0,01" in every number box; a point locale says to use a point', () => {
    const r = readSweepForm(
      form({
        from: '0,001',
        to: '0,1',
        species: [{ name: 'Cu2+', value: '0,5' }],
        variable: { kind: 'activity', species: 'Cu2+', scale: 'linear' },
      }),
      { decimalComma: true },
    );
    expect(r.ok && [r.input.from, r.input.to]).toEqual([0.001, 0.1]);
    const refused = readSweepForm(form({ from: '0,001' }));
    expect(refused).toEqual({
      ok: false,
      errors: [
        {
          field: 'from',
          label: 'From',
          message:
            'From "0,001" is not a number: write a number such as 0.01, 1e-6 or 10^-6 (with a decimal point).',
        },
      ],
    });
  });

  test('the reaction check given is used as it is (checked once per change)', () => {
    const check = checkReaction('Fe3+/Fe2+');
    const r = readSweepForm(
      form({
        reaction: 'Fe3+/Fe2+',
        species: [{ name: 'Fe2+', value: '1' }],
        variable: { kind: 'activity', species: 'Fe3+', scale: 'log' },
      }),
      { check },
    );
    expect(r.ok).toBe(true);
    const bad = readSweepForm(form(), { check: { ok: false, message: 'Given check.', position: null } });
    expect(bad).toEqual({
      ok: false,
      errors: [{ field: 'reaction', label: 'Reaction', message: 'Given check.' }],
    });
  });
});
