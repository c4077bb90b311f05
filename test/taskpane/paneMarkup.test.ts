/**
 * The pane's tabs and form fields as data (src/taskpane/paneMarkup.ts) against the page
 * that holds their placeholders (src/taskpane/taskpane.html): every placeholder has its
 * row and every row its placeholder, every id a control is described by exists, and the
 * controls carry the attributes the page spelled out by hand before the rows replaced it.
 */
import * as fs from 'fs';
import * as path from 'path';
import { controlAttributes, PANE_FIELDS, PANE_TABS, paneField, tabId } from '../../src/taskpane/paneMarkup';

const HTML = fs.readFileSync(path.join(__dirname, '..', '..', 'src', 'taskpane', 'taskpane.html'), 'utf8');
const placeholders = [...HTML.matchAll(/data-field="([^"]+)"/g)].map((m) => m[1]);
const pageIds = new Set([...HTML.matchAll(/\bid="([^"]+)"/g)].map((m) => m[1]));
const attrs = (id: string) => Object.fromEntries(controlAttributes(paneField(id)));

describe('PANE_FIELDS and the page', () => {
  test('one placeholder per field, in the same order, none left over', () => {
    expect(placeholders).toEqual(PANE_FIELDS.map((f) => f.id));
  });

  test('the ids the rows make are unique and not already on the page', () => {
    const made = PANE_FIELDS.flatMap((f) => [f.id, f.errorId, f.noteId].filter((x) => x !== undefined));
    made.push(...PANE_TABS.map(tabId));
    expect(new Set(made).size).toBe(made.length);
    expect(made.filter((id) => pageIds.has(id))).toEqual([]);
  });

  test('what describes a box elsewhere is on the page; each tab controls a section of it', () => {
    for (const f of PANE_FIELDS) for (const id of f.describedBy ?? []) expect(pageIds.has(id)).toBe(true);
    for (const t of PANE_TABS)
      expect(HTML).toMatch(new RegExp(`<section id="${t.panel}"[^>]*role="tabpanel"`));
  });

  test('an unknown field is a programming error', () => {
    expect(() => paneField('sw-nothing')).toThrow('The pane has no field "sw-nothing".');
  });
});

describe('controlAttributes', () => {
  test('a number box: number keyboard, no spell check, its error line describes it', () => {
    expect(controlAttributes(paneField('sw-points'))).toEqual([
      ['id', 'sw-points'],
      ['class', 'text-input'],
      ['type', 'text'],
      ['inputmode', 'numeric'],
      ['autocomplete', 'off'],
      ['aria-describedby', 'sw-err-points'],
    ]);
  });

  test('the case temperature: 25 °C (the standard temperature, common practice), error line then note', () => {
    expect(attrs('sw-temp')).toMatchObject({
      inputmode: 'decimal',
      value: '25',
      'aria-describedby': 'sw-err-tempC sw-temp-note',
    });
    expect(attrs('eph-temp')).toMatchObject({ value: '25', 'aria-describedby': 'eph-err-tempC' });
    expect(attrs('eph-activity')).toMatchObject({ value: '1e-6', 'aria-describedby': 'eph-err-activity' });
  });

  test('a text box is not spell-checked; the filter keeps its example and its count', () => {
    expect(controlAttributes(paneField('pot-filter'))).toEqual([
      ['id', 'pot-filter'],
      ['class', 'text-input'],
      ['type', 'text'],
      ['autocomplete', 'off'],
      ['spellcheck', 'false'],
      ['placeholder', 'e.g. Fe or Cu2+'],
      ['aria-describedby', 'pot-count'],
    ]);
    expect(attrs('sw-reaction')).toMatchObject({ value: 'Cu2+/Cu', 'aria-describedby': 'sw-reaction-msg' });
    expect(attrs('ref-search')).toMatchObject({ type: 'search', spellcheck: 'false' });
  });

  test('a list has only its id and class; the reference scale lists its electrodes, SHE first', () => {
    expect(controlAttributes(paneField('sw-vary'))).toEqual([
      ['id', 'sw-vary'],
      ['class', 'select-input'],
    ]);
    expect(paneField('eph-scale').options?.map(([value]) => value)).toEqual([
      'SHE',
      'SCE',
      'Ag/AgCl-sat-KCl',
      'Ag/AgCl-3.5M-KCl',
      'CSE',
    ]);
  });

  test('the tabs: E–pH starts hidden (shown where the engine draws), the rest visible', () => {
    expect(PANE_TABS.map((t) => [tabId(t), t.label, t.hidden === true])).toEqual([
      ['tab-potentials', 'Potentials', false],
      ['tab-series', 'Case series', false],
      ['tab-eph', 'E–pH', true],
      ['tab-reference', 'Reference', false],
    ]);
  });
});
