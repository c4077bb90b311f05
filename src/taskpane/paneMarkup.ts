/**
 * The parts of the task pane's markup that repeat, as data: the section tabs and the form
 * fields (a label, its text box or list, the error line under it). taskpane.html holds one
 * placeholder per field (`<div class="field" data-field="sw-from">`) and an empty tab list;
 * taskpane.ts renders these rows into them at start-up, so that every field is written the
 * same way. DOM-free: the attributes are listed here and set there.
 */
import { STANDARD_TEMP_C } from '../engine/index';

/** One tab: the section it shows and its text. */
export interface PaneTab {
  /** id of the section (the tab's id is `tab-<panel>`) */
  readonly panel: string;
  readonly label: string;
  /** Shown only once the section knows it can work (the E–pH section, where the engine draws). */
  readonly hidden?: boolean;
}

/** The sections, in tab order; the first is selected when the pane opens. */
export const PANE_TABS: readonly PaneTab[] = [
  { panel: 'potentials', label: 'Potentials' },
  { panel: 'series', label: 'Case series' },
  { panel: 'eph', label: 'E–pH', hidden: true },
  { panel: 'reference', label: 'Reference' },
];

/** The id of a section's tab. */
export function tabId(tab: PaneTab): string {
  return `tab-${tab.panel}`;
}

/** One form field: a label and a text box, or a label and a list. */
export interface PaneField {
  /** id of the control (the label's `for`) */
  readonly id: string;
  /** the label's text */
  readonly label: string;
  /** A list (`select`) rather than a text box; its options, where they are fixed. */
  readonly select?: boolean;
  readonly options?: readonly (readonly [value: string, text: string])[];
  /** A "(unit)" after the label, filled in with the unit of the varied quantity. */
  readonly unitSlot?: boolean;
  /** The on-screen keyboard of a number box; a box without one is text (no spell check). */
  readonly inputMode?: 'decimal' | 'numeric';
  /** `search` for the reference's search box; `text` otherwise. */
  readonly type?: 'text' | 'search';
  /** The value the box opens with. */
  readonly value?: string;
  readonly placeholder?: string;
  /** id of the error line under the box. */
  readonly errorId?: string;
  /** id of the note line under the box (after the error line). */
  readonly noteId?: string;
  /** ids of elements elsewhere that describe the box. */
  readonly describedBy?: readonly string[];
}

const TEMPERATURE_LABEL = 'Temperature (°C)';

/** Every field of the pane, by section. */
export const PANE_FIELDS: readonly PaneField[] = [
  {
    id: 'pot-filter',
    label: 'Only rows with (element or species, optional)',
    placeholder: 'e.g. Fe or Cu2+',
    describedBy: ['pot-count'],
  },
  {
    id: 'sw-reaction',
    label: 'Reaction (half-reaction, couple, cell diagram or full reaction)',
    value: 'Cu2+/Cu',
    describedBy: ['sw-reaction-msg'],
  },
  { id: 'sw-vary', label: 'Quantity', select: true },
  { id: 'sw-from', label: 'From', unitSlot: true, inputMode: 'decimal', errorId: 'sw-err-from' },
  { id: 'sw-to', label: 'To', unitSlot: true, inputMode: 'decimal', errorId: 'sw-err-to' },
  { id: 'sw-points', label: 'Cases (both ends included)', inputMode: 'numeric', errorId: 'sw-err-points' },
  {
    id: 'sw-temp',
    label: TEMPERATURE_LABEL,
    inputMode: 'decimal',
    value: String(STANDARD_TEMP_C),
    errorId: 'sw-err-tempC',
    noteId: 'sw-temp-note',
  },
  {
    id: 'sw-table',
    label: 'Potentials table (optional range, e.g. Potentials!A2:D115)',
    errorId: 'sw-err-table',
  },
  { id: 'eph-element', label: 'Element', select: true },
  {
    id: 'eph-activity',
    label: 'Activity of dissolved species',
    inputMode: 'decimal',
    value: '1e-6',
    errorId: 'eph-err-activity',
  },
  {
    id: 'eph-temp',
    label: TEMPERATURE_LABEL,
    inputMode: 'decimal',
    value: String(STANDARD_TEMP_C),
    errorId: 'eph-err-tempC',
  },
  {
    id: 'eph-scale',
    label: 'Second E axis (reference electrode)',
    select: true,
    options: [
      ['SHE', 'None (SHE only)'],
      ['SCE', 'SCE (saturated calomel)'],
      ['Ag/AgCl-sat-KCl', 'Ag/AgCl (saturated KCl)'],
      ['Ag/AgCl-3.5M-KCl', 'Ag/AgCl (3.5 M KCl)'],
      ['CSE', 'Cu/CuSO4 (saturated, CSE)'],
    ],
  },
  { id: 'ref-search', label: 'Search the functions', type: 'search', describedBy: ['ref-status'] },
];

/**
 * The field with this id.
 *
 * @throws Error where the page names a field this table lacks (a programming error)
 * @example
 * paneField('sw-temp').label // 'Temperature (°C)'
 */
export function paneField(id: string): PaneField {
  const f = PANE_FIELDS.find((x) => x.id === id);
  if (!f) throw new Error(`The pane has no field "${id}".`);
  return f;
}

/**
 * The attributes of a field's control, in the order they are set: a text box is
 * `autocomplete="off"`, and a box for text (no number keyboard) is not spell-checked; the
 * error line, then the note line, then the elements named in `describedBy` describe it.
 *
 * @example
 * controlAttributes(paneField('sw-points'))
 * // [['id', 'sw-points'], ['class', 'text-input'], ['type', 'text'], ['inputmode', 'numeric'],
 * //  ['autocomplete', 'off'], ['aria-describedby', 'sw-err-points']]
 */
export function controlAttributes(f: PaneField): (readonly [string, string])[] {
  const out: (readonly [string, string])[] = [
    ['id', f.id],
    ['class', f.select ? 'select-input' : 'text-input'],
  ];
  if (!f.select) {
    out.push(['type', f.type ?? 'text']);
    if (f.inputMode) out.push(['inputmode', f.inputMode]);
    if (f.value !== undefined) out.push(['value', f.value]);
    out.push(['autocomplete', 'off']);
    if (!f.inputMode) out.push(['spellcheck', 'false']);
    if (f.placeholder) out.push(['placeholder', f.placeholder]);
  }
  const describedBy = [f.errorId, f.noteId, ...(f.describedBy ?? [])].filter((x) => x !== undefined);
  if (describedBy.length > 0) out.push(['aria-describedby', describedBy.join(' ')]);
  return out;
}
