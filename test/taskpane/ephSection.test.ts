/**
 * The E–pH section's link to the engine: what it finds, how it reads its form, and the
 * sheet it writes (a new, uniquely named sheet; the pane never overwrites one).
 */
import { DEFAULT_EPH_ELEMENTS, ephSheetPlan, ephSupport, readEphForm } from '../../src/taskpane/ephSection';

describe('ephSupport', () => {
  test('finds a renderer and an element list where the engine exports them', () => {
    const render = () => '<svg xmlns="http://www.w3.org/2000/svg"/>';
    const s = ephSupport({ renderEphSvg: render, EPH_ELEMENTS: ['Fe', 'Cu'] });
    expect(s.render).toBe(render);
    expect(s.elements).toEqual(['Fe', 'Cu']);
  });

  test('without a renderer the section has nothing to draw; the element list falls back', () => {
    const s = ephSupport({});
    expect(s.render).toBeNull();
    expect(s.elements).toBe(DEFAULT_EPH_ELEMENTS);
    expect(s.elements).toEqual(
      expect.arrayContaining(['Fe', 'Cu', 'Zn', 'Al', 'Ni', 'Cr', 'Pb', 'Sn', 'Mg', 'Ag']),
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
    [{ element: 'Fe', activity: 'x', tempC: '25' }, 'activity', '"x" is not one'],
    [{ element: 'Fe', activity: '1e-6', tempC: '150' }, 'tempC', 'from 0 to 100'],
  ])('%j: one sentence against %s', (over, field, text) => {
    const r = readEphForm({ referenceScale: 'SHE', ...over });
    expect(r.ok).toBe(false);
    expect(r).toEqual({
      ok: false,
      errors: [expect.objectContaining({ field, message: expect.stringContaining(text) })],
    });
  });
});

describe('ephSheetPlan', () => {
  test('a new sheet named after the element, made unique, with the inputs, cautions and one spilled formula', () => {
    const plan = ephSheetPlan({ element: 'Fe', activity: 1e-6, tempC: 25 }, ['Sheet1', 'E-pH Fe']);
    expect(plan.sheetName).toBe('E-pH Fe (2)');
    expect(plan.formula).toBe('=ECHEM.EPHLINES(B1,B2,B3)');
    expect(plan.blocks.find((b) => b.address === 'A7')?.formulas).toEqual([['=ECHEM.EPHLINES(B1,B2,B3)']]);
    const values = plan.blocks.find((b) => b.address === 'B2:B4')?.values;
    expect(values?.[0]).toEqual([1e-6]);
    expect(String(values?.[2]?.[0])).toContain('local codes and licensed practice');
    expect(plan.summary).toContain('Created sheet "E-pH Fe (2)"');
  });
});
