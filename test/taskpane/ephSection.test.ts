/**
 * The E–pH section's link to the engine: what it finds, how it reads its form, and the
 * sheet it writes (a new, uniquely named sheet; the pane never overwrites one).
 */
import { EPH_LINE_HEADER } from '../../src/engine/index';
import { ephLines, ephSheetPlan, ephSupport, readEphForm } from '../../src/taskpane/ephSection';

describe('ephSupport', () => {
  test('wraps the engine: the diagram of the request, drawn at the size and scale asked', () => {
    const calls: unknown[] = [];
    const s = ephSupport({
      ephDiagram: (e: string, a: number, t: number) => ({ e, a, t }),
      renderEphSvg: (d: unknown, o: unknown) => {
        calls.push([d, o]);
        return '<svg xmlns="http://www.w3.org/2000/svg"/>';
      },
      EPH_ELEMENTS: [{ symbol: 'Fe', name: 'iron' }, { symbol: 'Cu', name: 'copper' }, 'junk'],
    });
    expect(s.elements).toEqual([
      { symbol: 'Fe', name: 'iron' },
      { symbol: 'Cu', name: 'copper' },
    ]);
    s.render?.({
      element: 'Cu',
      activity: 1e-6,
      tempC: 25,
      referenceScale: 'SCE',
      widthPx: 300,
      heightPx: 200,
    });
    // the renderer draws no smaller than 320 × 280 px; the page scales it down to the pane
    expect(calls).toEqual([
      [
        { e: 'Cu', a: 1e-6, t: 25 },
        { widthPx: 320, heightPx: 280, referenceScale: 'SCE' },
      ],
    ]);
  });

  test('without a renderer or an element list the section has nothing to draw', () => {
    expect(ephSupport({}).render).toBeNull();
    expect(ephSupport({ renderEphSvg: () => '', ephDiagram: () => ({}) }).render).toBeNull();
  });

  test("this build's engine draws, and its catalogue has EPHLINES", () => {
    const s = ephSupport();
    expect(s.lines).toBe(true);
    expect(s.elements.map((e) => e.symbol)).toEqual(
      expect.arrayContaining(['Fe', 'Cu', 'Zn', 'Al', 'Ni', 'Cr', 'Pb', 'Sn', 'Mg', 'Ag']),
    );
    const svg = s.render?.({
      element: 'Fe',
      activity: 1e-6,
      tempC: 25,
      referenceScale: null,
      widthPx: 320,
      heightPx: 360,
    });
    expect(svg).toMatch(/^<svg[^>]*width="320"[^>]*height="360"/);
  });
});

describe('ephLines', () => {
  test('the header row first, then segments; an unknown element gives the function message', () => {
    const r = ephLines({ element: 'Fe', activity: 1e-6, tempC: 25 });
    expect(Array.isArray(r) && r[0]).toEqual([...EPH_LINE_HEADER]);
    expect(ephLines({ element: 'Xx', activity: 1e-6, tempC: 25 })).toContain(
      'No E–pH diagram for element "Xx"',
    );
  });
});

describe('readEphForm', () => {
  test('reads a complete form; SHE means no second axis', () => {
    expect(readEphForm({ element: 'Fe', activity: '1e-6', tempC: '25', referenceScale: 'SHE' })).toEqual({
      ok: true,
      element: 'Fe',
      activity: 1e-6,
      tempC: 25,
      referenceScale: null,
    });
    expect(
      readEphForm({ element: 'Cu', activity: '0,001', tempC: '60', referenceScale: 'SCE' }, true),
    ).toEqual({
      ok: true,
      element: 'Cu',
      activity: 0.001,
      tempC: 60,
      referenceScale: 'SCE',
    });
  });

  test.each([
    [{ element: '', activity: '1e-6', tempC: '25' }, 'element', 'Choose an element.'],
    [{ element: 'fe', activity: '1e-6', tempC: '25' }, 'element', 'is not an element symbol'],
    [{ element: 'Fe', activity: '0', tempC: '25' }, 'activity', 'above 0'],
    [{ element: 'Fe', activity: '2', tempC: '25' }, 'activity', 'at most 1'],
    [{ element: 'Fe', activity: 'x', tempC: '25' }, 'activity', '"x" is not one'],
    [{ element: 'Fe', activity: '1e-6', tempC: '150' }, 'tempC', 'from 0 to 100'],
  ])('%j: one sentence against %s', (over, field, text) => {
    expect(readEphForm({ referenceScale: 'SHE', ...over })).toEqual({
      ok: false,
      errors: [expect.objectContaining({ field, message: expect.stringContaining(text) })],
    });
  });
});

describe('ephSheetPlan', () => {
  test('a new, uniquely named sheet: inputs, cautions, one spilled formula, segment ends for one chart series', () => {
    const plan = ephSheetPlan({ element: 'Fe', activity: 1e-6, tempC: 25 }, 2, ['Sheet1', 'E-pH Fe']);
    expect(plan.sheetName).toBe('E-pH Fe (2)');
    expect(plan.blocks.find((b) => b.address === 'A7')?.formulas).toEqual([['=ECHEM.EPHLINES(B1,B2,B3)']]);
    const values = plan.blocks.find((b) => b.address === 'B2:B4')?.values;
    expect(values?.[0]).toEqual([1e-6]);
    expect(String(values?.[2]?.[0])).toContain('local codes and licensed practice');
    // segment k (sheet row 8 + k) becomes two x–y rows, then an empty row (a gap in the line)
    expect(plan.blocks.find((b) => b.address === 'H7:I8')?.formulas).toEqual([
      ['=C8', '=D8'],
      ['=E8', '=F8'],
    ]);
    expect(plan.blocks.find((b) => b.address === 'H10:I11')?.formulas).toEqual([
      ['=C9', '=D9'],
      ['=E9', '=F9'],
    ]);
    expect(plan.chart).toEqual(
      expect.objectContaining({
        type: 'XYScatterLines',
        xValues: 'H7:H12',
        yValues: 'I7:I12',
        xTitle: 'pH',
        yTitle: 'E / V vs SHE',
      }),
    );
    expect(plan.summary).toContain('Created sheet "E-pH Fe (2)"');
  });

  test('no segments: no chart', () => {
    expect(ephSheetPlan({ element: 'Fe', activity: 1e-6, tempC: 25 }, 0, []).chart).toBeUndefined();
  });
});
