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

/**
 * Each control as the page wrote it by hand before the rows replaced the markup
 * (taskpane.html at d988830), one control a line.
 */
const MARKUP_BEFORE = `
id="pot-filter" class="text-input" type="text" autocomplete="off" spellcheck="false" placeholder="e.g. Fe or Cu2+" aria-describedby="pot-count"
id="sw-reaction" class="text-input" type="text" autocomplete="off" spellcheck="false" value="Cu2+/Cu" aria-describedby="sw-reaction-msg"
id="sw-vary" class="select-input"
id="sw-from" class="text-input" type="text" inputmode="decimal" autocomplete="off" aria-describedby="sw-err-from"
id="sw-to" class="text-input" type="text" inputmode="decimal" autocomplete="off" aria-describedby="sw-err-to"
id="sw-points" class="text-input" type="text" inputmode="numeric" autocomplete="off" aria-describedby="sw-err-points"
id="sw-temp" class="text-input" type="text" inputmode="decimal" value="25" autocomplete="off" aria-describedby="sw-err-tempC sw-temp-note"
id="sw-table" class="text-input" type="text" autocomplete="off" spellcheck="false" aria-describedby="sw-err-table"
id="eph-element" class="select-input"
id="eph-activity" class="text-input" type="text" inputmode="decimal" value="1e-6" autocomplete="off" aria-describedby="eph-err-activity"
id="eph-temp" class="text-input" type="text" inputmode="decimal" value="25" autocomplete="off" aria-describedby="eph-err-tempC"
id="eph-scale" class="select-input"
id="ref-search" class="text-input" type="search" autocomplete="off" spellcheck="false" aria-describedby="ref-status"
`;

/** The attributes of one line of MARKUP_BEFORE. */
const parsed = (line: string) =>
  Object.fromEntries([...line.matchAll(/([a-z-]+)="([^"]*)"/g)].map((m) => [m[1], m[2]]));

describe('controlAttributes', () => {
  test.each(MARKUP_BEFORE.trim().split('\n'))('as the page had it: %s', (line) => {
    const id = parsed(line).id ?? '';
    expect(Object.fromEntries(controlAttributes(paneField(id)))).toEqual(parsed(line));
  });

  test('each attribute once; the error line describes a box before its note', () => {
    expect(MARKUP_BEFORE.trim().split('\n')).toHaveLength(PANE_FIELDS.length);
    for (const f of PANE_FIELDS) {
      const names = controlAttributes(f).map(([name]) => name);
      expect(new Set(names).size).toBe(names.length);
    }
    expect(attrs('sw-temp')['aria-describedby']).toBe('sw-err-tempC sw-temp-note');
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
