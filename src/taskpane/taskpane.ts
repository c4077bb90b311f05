/**
 * The task pane page: four sections behind tabs (table of potentials, case series, E–pH
 * diagram where the engine draws one, function reference), wired to the DOM-free modules
 * (potentialsSheet, sweepPlan, sweepForm, seriesPreview, chart, referenceData, ephSection)
 * and the one Office writer (officeActions). Outside Excel the page says so, keeps the
 * reference, the reaction check and the preview working, and disables the buttons that
 * write, with the reason beside them.
 *
 * Inputs are checked when they change (on leaving the box, or Enter), not on every key;
 * each problem is shown once, beside its input. Everything is rendered with textContent
 * and createElement (no HTML strings); the only request the page makes itself is
 * functions.json from its own origin.
 */
import './taskpane.css';
import { BUILTIN_POTENTIALS } from '../engine/index';
import { type AxisTitles, type ChartModel, chartModel } from './chart';
import { ephLines, ephSheetPlan, ephSupport, readEphForm, sanitizedSvg } from './ephSection';
import { decimalSeparatorOf, hostLocale, localNumber } from './locale';
import { readRangeValues, writeNewSheet } from './officeActions';
import { controlAttributes, PANE_TABS, paneField, tabId } from './paneMarkup';
import { filterPotentials, planPotentialsSheet } from './potentialsSheet';
import { idFromHash, planExampleSheet } from './reference';
import { loadReference, type ReferenceItem, searchReference } from './referenceData';
import { nernstSlope, previewValues, seriesSlope } from './seriesPreview';
import { runReported, type StatusKind, type StatusSink } from './status';
import {
  DEFAULT_SPECIES_VALUE,
  mergeSpeciesRows,
  rangeDefaults,
  rowRole,
  type SpeciesRow,
  sweepFormOf,
  unitOf,
  variableOf,
  varyOptions,
} from './sweepForm';
import {
  caretLine,
  checkReaction,
  formatValue,
  missingSummary,
  planSweep,
  type ReactionCheck,
  readSweepForm,
  type SweepInput,
  type SweepLayout,
  sweepSheetPlan,
} from './sweepPlan';

// ---------------------------------------------------------------------------
// DOM helpers

function byId<T extends HTMLElement = HTMLElement>(id: string): T {
  const e = document.getElementById(id);
  if (!e) throw new Error(`The page lacks #${id}.`);
  return e as T;
}

function make<K extends keyof HTMLElementTagNameMap>(
  tag: K,
  props: { className?: string; text?: string; id?: string } = {},
  children: (Node | string)[] = [],
): HTMLElementTagNameMap[K] {
  const e = document.createElement(tag);
  if (props.className) e.className = props.className;
  if (props.id) e.id = props.id;
  if (props.text !== undefined) e.textContent = props.text;
  for (const c of children) e.append(c);
  return e;
}

const SVG_NS = 'http://www.w3.org/2000/svg';

function svg<K extends keyof SVGElementTagNameMap>(
  tag: K,
  attrs: Record<string, string | number> = {},
  text?: string,
): SVGElementTagNameMap[K] {
  const e = document.createElementNS(SVG_NS, tag);
  for (const [k, v] of Object.entries(attrs)) e.setAttribute(k, String(v));
  if (text !== undefined) e.textContent = text;
  return e;
}

/** Run `handler` when a text box's value is committed: on change (leaving the box) or Enter. */
function onCommit(input: HTMLElement, handler: () => void): void {
  input.addEventListener('change', handler);
  input.addEventListener('keydown', (ev) => {
    if ((ev as KeyboardEvent).key === 'Enter') handler();
  });
}

// ---------------------------------------------------------------------------
// Host, locale, status, busy state

type Host = { readonly excel: true } | { readonly excel: false; readonly reason: string };

let host: Host = { excel: false, reason: 'Looking for Excel…' };
let busy = false;
let decimalComma = decimalSeparatorOf(hostLocale()) === ',';

/** A status sink writing into one status area (each action reports beside its button). */
function sinkFor(area: HTMLElement): StatusSink {
  return {
    show(kind: StatusKind, text: string): void {
      area.hidden = false;
      area.className = `status ${kind}`;
      area.textContent = kind === 'error' ? `Error: ${text}` : text;
    },
  };
}

async function detectHost(): Promise<Host> {
  const g = globalThis as { Office?: { onReady?: () => Promise<{ host?: unknown }> }; Excel?: unknown };
  if (!g.Office || typeof g.Office.onReady !== 'function') {
    return { excel: false, reason: 'Office did not load: this page is open outside Excel.' };
  }
  let info: { host?: unknown } | undefined;
  try {
    info = await g.Office.onReady();
  } catch (error) {
    return { excel: false, reason: `Office did not start (${String(error)}).` };
  }
  if (info && String(info.host) === 'Excel' && typeof g.Excel !== 'undefined') return { excel: true };
  const other = info && info.host ? ` (the host here is ${String(info.host)})` : '';
  return { excel: false, reason: `Not running inside Excel${other}.` };
}

const NEEDS_EXCEL = 'Writing sheets needs Excel: open this pane from the Potentia button in Excel.';

/** Enable or disable a write button, with the reason shown beside it. */
function setWritable(button: HTMLButtonElement, why: HTMLElement | null, problem: string | null): void {
  const reason = !host.excel ? NEEDS_EXCEL : busy ? 'Working…' : problem;
  button.disabled = reason !== null;
  if (why) why.textContent = reason ?? '';
}

function refreshButtons(): void {
  refreshPotentials();
  refreshSeriesButton();
  refreshEphButtons();
  for (const b of Array.from(document.querySelectorAll<HTMLButtonElement>('button[data-example]'))) {
    setWritable(b, null, null);
  }
  byId('ref-insert-note').textContent = host.excel ? '' : `Insert buttons: ${NEEDS_EXCEL}`;
}

async function withBusy<T>(work: () => Promise<T>): Promise<T> {
  busy = true;
  refreshButtons();
  try {
    return await work();
  } finally {
    busy = false;
    refreshButtons();
  }
}

// ---------------------------------------------------------------------------
// Sections (tabs)

const TAB_IDS = PANE_TABS.map(tabId);

/** The tab list, from PANE_TABS: the first tab selected and the one in the Tab order. */
function renderTabs(): void {
  byId('tabs').replaceChildren(
    ...PANE_TABS.map((t, i) => {
      const tab = make('button', { id: tabId(t), className: 'tab', text: t.label });
      tab.type = 'button';
      tab.setAttribute('role', 'tab');
      tab.setAttribute('aria-controls', t.panel);
      tab.setAttribute('aria-selected', String(i === 0));
      if (i > 0) tab.tabIndex = -1;
      tab.hidden = t.hidden === true;
      return tab;
    }),
  );
}

/** Each `[data-field]` placeholder of the page filled from its row of PANE_FIELDS. */
function renderFields(): void {
  for (const box of Array.from(document.querySelectorAll<HTMLElement>('[data-field]'))) {
    const f = paneField(box.dataset.field ?? '');
    const label = make('label', { text: f.label });
    label.htmlFor = f.id;
    if (f.unitSlot) {
      const unit = make('span', { className: 'unit' });
      unit.dataset.unit = '';
      label.append(' ', unit);
    }
    const control = make(f.select ? 'select' : 'input');
    for (const [name, value] of controlAttributes(f)) control.setAttribute(name, value);
    for (const [value, text] of f.options ?? []) {
      const o = make('option', { text });
      o.value = value;
      control.append(o);
    }
    box.replaceChildren(label, control);
    if (f.errorId) box.append(make('span', { id: f.errorId, className: 'field-error' }));
    if (f.noteId) box.append(make('span', { id: f.noteId, className: 'role-note' }));
  }
}

function visibleTabs(): HTMLButtonElement[] {
  return TAB_IDS.map((id) => byId<HTMLButtonElement>(id)).filter((t) => !t.hidden);
}

/** Show one section: its tab selected (and the one in the Tab order), the others hidden. */
function selectTab(tab: HTMLButtonElement, focus = false): void {
  for (const t of visibleTabs().concat(byId<HTMLButtonElement>('tab-eph'))) {
    const selected = t === tab;
    t.setAttribute('aria-selected', String(selected));
    t.tabIndex = selected ? 0 : -1;
    const panel = document.getElementById(t.getAttribute('aria-controls') ?? '');
    if (panel) panel.hidden = !selected;
  }
  if (focus) tab.focus();
  if (tab.id === 'tab-series') renderChart();
  if (tab.id === 'tab-eph' && byId('eph-diagram').childElementCount === 0) drawEph();
}

function onTabKey(ev: KeyboardEvent): void {
  const tabs = visibleTabs();
  const i = tabs.indexOf(ev.currentTarget as HTMLButtonElement);
  let next = -1;
  if (ev.key === 'ArrowRight' || ev.key === 'ArrowDown') next = (i + 1) % tabs.length;
  else if (ev.key === 'ArrowLeft' || ev.key === 'ArrowUp') next = (i - 1 + tabs.length) % tabs.length;
  else if (ev.key === 'Home') next = 0;
  else if (ev.key === 'End') next = tabs.length - 1;
  const target = tabs[next];
  if (!target) return;
  ev.preventDefault();
  selectTab(target, true);
}

// ---------------------------------------------------------------------------
// Table of potentials

function refreshPotentials(): void {
  const picked = filterPotentials(BUILTIN_POTENTIALS, byId<HTMLInputElement>('pot-filter').value);
  const n = picked.rows.length;
  byId('pot-count').textContent =
    n === 0
      ? `No built-in half-reaction matches ${picked.described}. Try an element symbol (Fe) or a species (Cu2+).`
      : `${n} half-reaction${n === 1 ? '' : 's'} (${picked.described}) will go into a new sheet.`;
  setWritable(
    byId<HTMLButtonElement>('pot-insert'),
    byId('pot-why'),
    n === 0 ? 'No row matches the filter: change or clear it.' : null,
  );
}

async function insertPotentials(): Promise<void> {
  const filter = byId<HTMLInputElement>('pot-filter').value;
  const plan = await withBusy(() =>
    runReported(
      'Inserting the potentials sheet',
      () => writeNewSheet((existing) => planPotentialsSheet(BUILTIN_POTENTIALS, filter, existing)),
      sinkFor(byId('pot-status')),
      (p) => p.summary,
    ),
  );
  const table = byId<HTMLInputElement>('sw-table');
  if (plan && table.value.trim() === '') {
    table.value = plan.tableRef;
    updateSeries();
  }
}

// ---------------------------------------------------------------------------
// Case series

let rows: SpeciesRow[] = [];
let lastKind = '';
let currentCheck: ReactionCheck = checkReaction('');
let currentCheckText = '';
let currentLayout: SweepLayout | null = null;
let currentProblem: string | null = 'Type a reaction.';
let currentChart: (AxisTitles & { points: { x: number; y: number }[] }) | null = null;
let previewRun = 0;

function choice(): string {
  return byId<HTMLSelectElement>('sw-vary').value;
}

function scale(): 'log' | 'linear' {
  return byId<HTMLInputElement>('sw-scale-linear').checked ? 'linear' : 'log';
}

function variedRow(): SpeciesRow | undefined {
  const v = variableOf(choice(), scale());
  return v.kind === 'activity' ? rows.find((r) => rowRole(r, v) === 'varied') : undefined;
}

function renderCheck(check: ReactionCheck, text: string): void {
  const input = byId<HTMLInputElement>('sw-reaction');
  const caret = byId('sw-caret');
  const msg = byId('sw-reaction-msg');
  if (!check.ok) {
    input.setAttribute('aria-invalid', 'true');
    msg.className = 'error-text';
    msg.textContent = check.message;
    if (check.position !== null && text.trim() !== '') {
      caret.hidden = false;
      caret.textContent = `${text}\n${caretLine(check.position)}`;
    } else caret.hidden = true;
    return;
  }
  input.removeAttribute('aria-invalid');
  caret.hidden = true;
  const kind = {
    half: 'a half-reaction',
    couple: 'a couple',
    cell: 'a cell diagram',
    reaction: 'a full reaction',
  }[check.kind];
  const needs =
    check.species.length > 0
      ? `needs values for ${check.species.map((s) => s.name).join(', ')}`
      : 'needs no activities';
  const n = check.n !== null ? `, n = ${check.n}` : '';
  msg.className = check.warning ? 'warn-text' : 'ok-text';
  msg.textContent = `Reads as ${kind}${n}; ${needs}.${check.warning ? ` ${check.warning}` : ''}`;
}

/** The reaction changed: check it once, and refill the species rows from it. */
function onReactionChanged(): void {
  const text = byId<HTMLInputElement>('sw-reaction').value;
  currentCheck = checkReaction(text);
  currentCheckText = text;
  renderCheck(currentCheck, text);
  if (currentCheck.ok) {
    rows = mergeSpeciesRows(rows, currentCheck.species);
    renderSpecies();
    renderVary();
  }
  updateSeries();
}

function renderVary(): void {
  const select = byId<HTMLSelectElement>('sw-vary');
  const previous = select.value;
  const options = varyOptions(rows);
  select.replaceChildren(
    ...options.map((o) => {
      const opt = make('option', { text: o.label });
      opt.value = o.value;
      return opt;
    }),
  );
  select.value = options.some((o) => o.value === previous) ? previous : (options[0]?.value ?? 'pH');
  onVaryChanged(false);
}

/** Apply the "vary" choice: spacing radios, units, range defaults (when the kind changed), row roles. */
function onVaryChanged(update = true): void {
  const v = variableOf(choice(), scale());
  const gas = variedRow() ? unitOf(variedRow() as SpeciesRow) === 'bar' : false;
  const kind = v.kind === 'activity' ? `activity-${v.scale}-${gas ? 'gas' : 'solute'}` : v.kind;
  for (const id of ['sw-scale-log', 'sw-scale-linear'])
    byId<HTMLInputElement>(id).disabled = v.kind !== 'activity';
  byId('sw-scale').hidden = v.kind !== 'activity';
  const d = rangeDefaults(v, gas);
  for (const u of Array.from(document.querySelectorAll('[data-unit]'))) u.textContent = `(${d.unit})`;
  if (kind !== lastKind) {
    byId<HTMLInputElement>('sw-from').value = localNumber(d.from, decimalComma ? ',' : '.');
    byId<HTMLInputElement>('sw-to').value = localNumber(d.to, decimalComma ? ',' : '.');
    byId<HTMLInputElement>('sw-points').value = d.points;
    lastKind = kind;
  }
  const temp = byId<HTMLInputElement>('sw-temp');
  temp.disabled = v.kind === 'temperature';
  byId('sw-temp-note').textContent = temp.disabled ? 'Temperature is the varied quantity (above).' : '';
  refreshRowRoles();
  if (update) updateSeries();
}

/** Show the fixed rows in the fixed list; the varied one (and H+ under a pH series) apart. */
function refreshRowRoles(): void {
  const v = variableOf(choice(), scale());
  const list = byId('sw-species');
  const apart: string[] = [];
  rows.forEach((row, i) => {
    const li = list.children[i] as HTMLElement | undefined;
    if (!li) return;
    const role = rowRole(row, v);
    li.hidden = role !== 'fixed';
    if (role === 'varied') apart.push(`${row.name} is the varied quantity (above), so it is not fixed here.`);
    if (role === 'set by pH') apart.push(`${row.name} is set by the varied pH (above).`);
  });
  byId('sw-species-varied').textContent = apart.join(' ');
}

function unitText(row: SpeciesRow): string {
  const u = unitOf(row);
  return u === 'bar' ? 'bar (partial pressure)' : u === 'pH' ? 'pH' : 'activity';
}

function renderSpecies(): void {
  const list = byId('sw-species');
  list.replaceChildren(
    ...rows.map((row, i) => {
      const label = row.name.trim() || `species ${i + 1}`;
      const name = make('input', { id: `sw-species-${i}`, className: 'text-input species-name' });
      name.type = 'text';
      name.value = row.name;
      name.autocomplete = 'off';
      name.spellcheck = false;
      name.setAttribute('aria-label', `Species ${i + 1}`);
      onCommit(name, () => {
        if ((rows[i]?.name ?? '') === name.value) return;
        rows[i] = { name: name.value, value: rows[i]?.value ?? DEFAULT_SPECIES_VALUE, origin: 'user' };
        renderSpecies();
        renderVary();
        updateSeries();
        document.getElementById(`sw-value-${i}`)?.focus();
      });
      const value = make('input', { id: `sw-value-${i}`, className: 'text-input species-value' });
      value.type = 'text';
      value.inputMode = 'decimal';
      value.value = row.value;
      value.autocomplete = 'off';
      value.setAttribute('aria-label', `Value of ${label} (${unitText(row)})`);
      onCommit(value, () => {
        const r = rows[i];
        if (r && r.value === value.value) return;
        if (r) rows[i] = { ...r, value: value.value };
        updateSeries();
      });
      const unit = make('span', { className: 'species-unit', text: unitText(row) });
      unit.setAttribute('aria-hidden', 'true');
      const remove = make('button', { text: 'Remove', className: 'btn btn-small' });
      remove.type = 'button';
      remove.setAttribute('aria-label', `Remove ${label}`);
      remove.addEventListener('click', () => {
        rows.splice(i, 1);
        renderSpecies();
        renderVary();
        updateSeries();
        byId('sw-add').focus();
      });
      const errName = make('span', { className: 'field-error', id: `sw-err-species-${i}` });
      const errValue = make('span', { className: 'field-error', id: `sw-err-value-${i}` });
      name.setAttribute('aria-describedby', errName.id);
      value.setAttribute('aria-describedby', errValue.id);
      return make('li', { className: 'species-row' }, [
        make('span', { className: 'species-cell' }, [name, errName]),
        make('span', { className: 'species-cell' }, [value, unit, errValue]),
        remove,
      ]);
    }),
  );
  refreshRowRoles();
}

function formState() {
  return {
    reaction: byId<HTMLInputElement>('sw-reaction').value,
    choice: choice(),
    scale: scale(),
    from: byId<HTMLInputElement>('sw-from').value,
    to: byId<HTMLInputElement>('sw-to').value,
    points: byId<HTMLInputElement>('sw-points').value,
    tempC: byId<HTMLInputElement>('sw-temp').value,
    rows,
    table: byId<HTMLInputElement>('sw-table').value,
  };
}

function clearFieldErrors(): void {
  for (const e of Array.from(document.querySelectorAll('#series .field-error'))) e.textContent = '';
  for (const e of Array.from(document.querySelectorAll('#series [aria-invalid]'))) {
    if (e.id !== 'sw-reaction') e.removeAttribute('aria-invalid');
  }
}

const FIELD_INPUT: Record<string, string> = {
  from: 'sw-from',
  to: 'sw-to',
  points: 'sw-points',
  tempC: 'sw-temp',
  table: 'sw-table',
  vary: 'sw-vary',
};

function clearPreview(text: string): void {
  currentChart = null;
  byId('sw-chart').replaceChildren();
  byId('sw-preview').textContent = text;
}

/** Re-read the form (after a change), show the problems or the layout, and start the preview. */
function updateSeries(): void {
  clearFieldErrors();
  const state = formState();
  if (state.reaction !== currentCheckText) {
    currentCheck = checkReaction(state.reaction);
    currentCheckText = state.reaction;
  }
  const result = readSweepForm(sweepFormOf(state), { check: currentCheck, decimalComma });
  const formula = byId('sw-formula');
  const warnings = byId('sw-warnings');
  warnings.replaceChildren();
  previewRun++;
  if (!result.ok) {
    currentLayout = null;
    currentProblem = missingSummary(result.errors);
    for (const e of result.errors) {
      if (e.field === 'reaction') continue; // shown under the reaction box
      const err = document.getElementById(`sw-err-${e.field}`);
      if (err) err.textContent = e.message;
      document.getElementById(FIELD_INPUT[e.field] ?? `sw-${e.field}`)?.setAttribute('aria-invalid', 'true');
    }
    formula.textContent = 'No formula until the inputs read.';
    formula.classList.add('empty');
    byId('sw-formula-where').textContent = '';
    byId('sw-summary').textContent = '';
    byId('sw-varied').textContent = '';
    clearPreview('');
    refreshSeriesButton();
    return;
  }
  const input = result.input;
  const layout = planSweep(input, currentCheck);
  currentLayout = layout;
  currentProblem = null;
  formula.textContent = layout.formula;
  formula.classList.remove('empty');
  byId('sw-formula-where').textContent =
    ` (cell ${layout.formulaCell} of the new sheet; it spills to ${layout.spillRange})`;
  byId('sw-varied').textContent = `Varied: ${layout.description.split(';')[0] ?? ''}.`;
  byId('sw-summary').textContent =
    `${layout.cases.length} cases in ${layout.inputRange}; header row ${layout.columns.join(' | ')}; ` +
    `result spilling to ${layout.spillRange}; chart of ${layout.yTitle} against ${layout.xTitle}.`;
  warnings.replaceChildren(...layout.warnings.map((w) => make('li', { text: w })));
  refreshSeriesButton();
  void runPreview(input, layout, previewRun);
}

/** The preview: ECHEM.POTENTIAL through the catalogue, with the user's table where one is given. */
async function runPreview(input: SweepInput, layout: SweepLayout, run: number): Promise<void> {
  let table: (string | number | boolean)[][] | null = null;
  let tableNote = 'with the built-in table';
  if (input.table) {
    if (host.excel) {
      try {
        table = await readRangeValues(input.table);
        tableNote = `with your table ${input.table}`;
      } catch (error) {
        tableNote = `with the built-in table, as ${input.table} could not be read (${error instanceof Error ? error.message : String(error)})`;
      }
    } else
      tableNote = `with the built-in table (outside Excel ${input.table} cannot be read; the sheet uses it)`;
  }
  if (run !== previewRun) return;
  const values = previewValues(input, layout, table);
  const yName = layout.yTitle.startsWith('EMF') ? 'EMF' : 'E';
  const unit = yName === 'EMF' ? 'V' : 'V vs SHE';
  const firstV = values[0];
  const lastV = values[values.length - 1];
  let text: string;
  if (firstV?.ok && lastV?.ok) {
    text =
      `Computed by ECHEM.POTENTIAL ${tableNote}: ${yName} = ${firstV.e.toFixed(4)} ${unit} for the first case, ` +
      `${lastV.e.toFixed(4)} ${unit} for the last.`;
    const slope = seriesSlope(input, layout, values);
    if (slope) text += ` Slope along the series: ${slope.slopeV.toFixed(5)} ${slope.per}.`;
    const n = currentCheck.ok ? currentCheck.n : null;
    const nernst = input.variable.kind === 'temperature' ? null : nernstSlope(input.tempC, n);
    if (nernst !== null)
      text += ` Nernst slope for n = ${n} at ${formatValue(input.tempC)} °C: ${nernst.toFixed(5)} V per decade (ECHEM.NERNSTSLOPE).`;
  } else {
    const bad = values.find((v) => !v.ok);
    text = `Computed by ECHEM.POTENTIAL ${tableNote}: ${bad && !bad.ok ? bad.message : 'no value.'}`;
  }
  const points = layout.x.map((x, i) => {
    const v = values[i];
    return { x, y: v?.ok ? v.e : Number.NaN };
  });
  currentChart = { points, xTitle: layout.xTitle, yTitle: layout.yTitle };
  byId('sw-preview').textContent = text;
  renderChart();
}

function drawChart(model: ChartModel, titleId: string): SVGSVGElement {
  const root = svg('svg', {
    width: model.width,
    height: model.height,
    viewBox: `0 0 ${model.width} ${model.height}`,
    role: 'img',
    'aria-labelledby': titleId,
    class: 'chart-svg',
  });
  root.append(svg('title', { id: titleId }, model.summary));
  const { left, top, right, bottom } = model.plot;
  root.append(
    svg('rect', { x: left, y: top, width: right - left, height: bottom - top, class: 'chart-frame' }),
  );
  for (const t of model.xTicks) {
    root.append(svg('line', { x1: t.position, x2: t.position, y1: top, y2: bottom, class: 'chart-grid' }));
    root.append(
      svg('text', { x: t.position, y: bottom + 16, 'text-anchor': 'middle', class: 'chart-tick' }, t.label),
    );
  }
  for (const t of model.yTicks) {
    root.append(svg('line', { x1: left, x2: right, y1: t.position, y2: t.position, class: 'chart-grid' }));
    root.append(
      svg('text', { x: left - 5, y: t.position + 4, 'text-anchor': 'end', class: 'chart-tick' }, t.label),
    );
  }
  root.append(svg('polyline', { points: model.polyline, class: 'chart-line' }));
  root.append(
    svg(
      'text',
      { x: (left + right) / 2, y: model.height - 8, 'text-anchor': 'middle', class: 'chart-title' },
      model.xTitle,
    ),
  );
  const yMid = (top + bottom) / 2;
  root.append(
    svg(
      'text',
      { x: 14, y: yMid, 'text-anchor': 'middle', transform: `rotate(-90 14 ${yMid})`, class: 'chart-title' },
      model.yTitle,
    ),
  );
  return root;
}

/** Draw the preview chart at the width the pane gives it. */
function renderChart(): void {
  const box = byId('sw-chart');
  if (!currentChart || box.offsetParent === null) {
    if (!currentChart) box.replaceChildren();
    return;
  }
  const model = chartModel(currentChart.points, {
    width: box.clientWidth,
    xTitle: currentChart.xTitle,
    yTitle: currentChart.yTitle,
  });
  box.replaceChildren(
    model
      ? drawChart(model, 'sw-chart-title')
      : make('p', { className: 'hint', text: 'No chart: fewer than two cases have a value.' }),
  );
}

function refreshSeriesButton(): void {
  setWritable(byId<HTMLButtonElement>('sw-build'), byId('sw-why'), currentProblem);
}

async function buildSeries(): Promise<void> {
  const layout = currentLayout;
  if (!layout) return;
  await withBusy(() =>
    runReported(
      'Writing the case series',
      () => writeNewSheet((existing) => sweepSheetPlan(layout, existing)),
      sinkFor(byId('sw-status')),
      (p) => p.summary,
    ),
  );
}

// ---------------------------------------------------------------------------
// E–pH diagram

const eph = ephSupport();
let ephProblem: string | null = null;

function ephInput() {
  const result = readEphForm(
    {
      element: byId<HTMLSelectElement>('eph-element').value,
      activity: byId<HTMLInputElement>('eph-activity').value,
      tempC: byId<HTMLInputElement>('eph-temp').value,
      referenceScale: byId<HTMLSelectElement>('eph-scale').value,
    },
    decimalComma,
  );
  for (const id of ['eph-err-activity', 'eph-err-tempC']) byId(id).textContent = '';
  for (const id of ['eph-activity', 'eph-temp']) byId(id).removeAttribute('aria-invalid');
  if (!result.ok) {
    for (const e of result.errors) {
      const err = document.getElementById(`eph-err-${e.field}`);
      if (err) err.textContent = e.message;
      document
        .getElementById(e.field === 'tempC' ? 'eph-temp' : `eph-${e.field}`)
        ?.setAttribute('aria-invalid', 'true');
    }
    ephProblem = missingSummary(result.errors);
  } else ephProblem = null;
  refreshEphButtons();
  return result;
}

function refreshEphButtons(): void {
  const draw = byId<HTMLButtonElement>('eph-draw');
  draw.disabled = ephProblem !== null || eph.render === null;
  const write = byId<HTMLButtonElement>('eph-write');
  const why = byId('eph-why');
  const noLines = eph.lines ? null : 'This build has no ECHEM.EPHLINES to write the lines.';
  setWritable(write, why, ephProblem ?? noLines);
  // a problem with the inputs stops Draw too, so it is what the line beside both buttons says
  if (ephProblem !== null) why.textContent = ephProblem;
}

function drawEph(): void {
  const input = ephInput();
  const box = byId('eph-diagram');
  if (!input.ok || !eph.render) return;
  const width = box.clientWidth;
  let text: string;
  try {
    text = eph.render({
      element: input.element,
      activity: input.activity,
      tempC: input.tempC,
      referenceScale: input.referenceScale,
      widthPx: width,
      heightPx: Math.round(Math.max(320, width) * 1.15),
    });
  } catch (error) {
    sinkFor(byId('eph-status')).show(
      'error',
      `Drawing failed: ${error instanceof Error ? error.message : String(error)}`,
    );
    return;
  }
  const el = sanitizedSvg(text, document);
  if (!el) {
    sinkFor(byId('eph-status')).show('error', 'Drawing failed: the engine gave no SVG picture.');
    return;
  }
  el.setAttribute('role', 'img');
  if (!el.getAttribute('aria-label') && !el.querySelector('title'))
    el.setAttribute(
      'aria-label',
      `E–pH diagram of ${input.element} at activity ${formatValue(input.activity)}, ${formatValue(input.tempC)} °C`,
    );
  box.replaceChildren(el);
  byId('eph-status').hidden = true;
}

async function writeEph(): Promise<void> {
  const input = ephInput();
  if (!input.ok) return;
  const lines = ephLines(input);
  const sink = sinkFor(byId('eph-status'));
  if (typeof lines === 'string') {
    sink.show('error', `Writing the E–pH lines failed: ${lines}`);
    return;
  }
  await withBusy(() =>
    runReported(
      'Writing the E–pH lines',
      () => writeNewSheet((existing) => ephSheetPlan(input, Math.max(0, lines.length - 1), existing)),
      sink,
      (p) => p.summary,
    ),
  );
}

function startEph(): void {
  if (!eph.render) return; // the section stays hidden: the engine draws no E–pH diagram yet
  byId('tab-eph').hidden = false;
  byId<HTMLSelectElement>('eph-element').replaceChildren(
    ...eph.elements.map((e) => {
      const o = make('option', { text: e.name ? `${e.symbol} (${e.name})` : e.symbol });
      o.value = e.symbol;
      return o;
    }),
  );
  byId<HTMLInputElement>('eph-activity').value = localNumber('1e-6', decimalComma ? ',' : '.');
  for (const id of ['eph-activity', 'eph-temp']) onCommit(byId(id), () => void ephInput());
  for (const id of ['eph-element', 'eph-scale']) byId(id).addEventListener('change', () => void ephInput());
  byId('eph-draw').addEventListener('click', drawEph);
  byId('eph-write').addEventListener('click', () => void writeEph());
}

// ---------------------------------------------------------------------------
// Reference

let items: ReferenceItem[] = [];

function renderEntry(entry: ReferenceItem): HTMLElement {
  const summary = make('summary', { id: `${entry.anchor}-title`, className: 'ref-summary' }, [
    make('code', { text: entry.qualifiedName }),
  ]);
  const first = /^[^.]*\.?/.exec(entry.description)?.[0] ?? '';
  if (first)
    summary.append(make('span', { className: 'ref-gist', text: ` ${first.replace(/ Example:.*$/, '')}` }));
  const details = make('details', { className: 'ref-entry', id: entry.anchor }, [summary]);
  details.append(make('p', { className: 'signature' }, [make('code', { text: entry.signature })]));
  if (entry.description) details.append(make('p', { text: entry.description }));
  if (entry.params.length > 0) {
    const dl = make('dl', { className: 'params' });
    for (const p of entry.params) {
      dl.append(
        make('dt', {}, [make('code', { text: p.name }), ` ${p.optional ? 'optional, ' : ''}${p.shape}`]),
      );
      dl.append(make('dd', { text: p.description || '—' }));
    }
    details.append(make('p', { className: 'sub', text: 'Arguments' }), dl);
  }
  details.append(
    make('p', { className: 'returns', text: `Returns: ${entry.returns}; unit: ${entry.unit}.` }),
  );
  entry.examples.forEach((formula, k) => {
    const codeId = `${entry.anchor}-example-${k}`;
    const button = make('button', { text: 'Insert in a new sheet', className: 'btn btn-secondary' });
    button.type = 'button';
    button.dataset.example = entry.id;
    button.setAttribute('aria-describedby', codeId);
    const area = make('div', { className: 'status' });
    area.setAttribute('role', 'status');
    area.hidden = true;
    button.addEventListener('click', () => {
      void withBusy(() =>
        runReported(
          `Inserting the ${entry.qualifiedName} example`,
          () => writeNewSheet((existing) => planExampleSheet(entry, formula, existing)),
          sinkFor(area),
          (p) => p.summary,
        ),
      );
    });
    details.append(
      make('div', { className: 'example' }, [
        make('span', { className: 'sub', text: 'Example:' }),
        make('code', { className: 'formula', text: formula, id: codeId }),
        button,
      ]),
      area,
    );
  });
  return make('li', {}, [details]);
}

function applySearch(): void {
  const query = byId<HTMLInputElement>('ref-search').value;
  const shown = new Set(searchReference(items, query).map((i) => i.anchor));
  for (const li of Array.from(byId('ref-list').children)) {
    const d = li.querySelector('details');
    (li as HTMLElement).hidden = !d || !shown.has(d.id);
  }
  byId('ref-status').textContent =
    query.trim() === ''
      ? `${items.length} functions in the ECHEM namespace, from this build's function metadata.`
      : `${shown.size} of ${items.length} functions match "${query.trim()}".`;
}

function goToHash(): void {
  const entry = idFromHash(location.hash, items);
  if (!entry) return;
  selectTab(byId<HTMLButtonElement>('tab-reference'));
  const details = document.getElementById(entry.anchor) as HTMLDetailsElement | null;
  if (!details) return;
  const li = details.parentElement;
  if (li?.hidden) {
    byId<HTMLInputElement>('ref-search').value = '';
    applySearch();
  }
  details.open = true;
  const summary = document.getElementById(`${entry.anchor}-title`);
  summary?.scrollIntoView({ block: 'start' });
  summary?.focus({ preventScroll: true });
}

async function startReference(): Promise<void> {
  const status = byId('ref-status');
  try {
    items = await loadReference();
  } catch (error) {
    status.textContent =
      `The function list could not be loaded: ${error instanceof Error ? error.message : String(error)}. ` +
      'It comes from functions.json beside this page: serve the built add-in rather than opening the file directly.';
    status.className = 'error-text';
    return;
  }
  byId('ref-list').replaceChildren(...items.map(renderEntry));
  applySearch();
  refreshButtons();
  goToHash();
}

// ---------------------------------------------------------------------------
// Start

function start(): void {
  renderTabs();
  renderFields();
  for (const id of TAB_IDS) {
    const tab = byId<HTMLButtonElement>(id);
    tab.addEventListener('click', () => selectTab(tab));
    tab.addEventListener('keydown', onTabKey);
  }
  byId('pot-filter').addEventListener('input', refreshPotentials);
  byId('pot-insert').addEventListener('click', () => void insertPotentials());
  onCommit(byId('sw-reaction'), onReactionChanged);
  byId('sw-vary').addEventListener('change', () => onVaryChanged());
  for (const id of ['sw-scale-log', 'sw-scale-linear'])
    byId(id).addEventListener('change', () => onVaryChanged());
  for (const id of ['sw-from', 'sw-to', 'sw-points', 'sw-temp', 'sw-table']) onCommit(byId(id), updateSeries);
  byId('sw-build').addEventListener('click', () => void buildSeries());
  byId('sw-add').addEventListener('click', () => {
    rows.push({ name: '', value: DEFAULT_SPECIES_VALUE, origin: 'user' });
    renderSpecies();
    renderVary();
    updateSeries();
    document.getElementById(`sw-species-${rows.length - 1}`)?.focus();
  });
  byId('sw-refill').addEventListener('click', () => {
    if (!currentCheck.ok) return;
    rows = mergeSpeciesRows(
      rows.filter((r) => r.origin === 'reaction'),
      currentCheck.species,
    );
    renderSpecies();
    renderVary();
    updateSeries();
  });
  byId('ref-search').addEventListener('input', applySearch);
  window.addEventListener('hashchange', goToHash);
  if (typeof ResizeObserver !== 'undefined')
    new ResizeObserver(() => renderChart()).observe(byId('sw-chart'));
  startEph();

  onReactionChanged();
  refreshButtons();
  void startReference();
  void detectHost().then((h) => {
    host = h;
    decimalComma = decimalSeparatorOf(hostLocale()) === ',';
    const s = byId('host-status');
    s.textContent = h.excel
      ? 'Connected to Excel. Each action adds a new sheet and leaves your sheets as they are.'
      : `${h.reason} The reference, the reaction check and the preview work here; writing sheets needs Excel.`;
    s.className = `host-status ${h.excel ? 'ok' : 'offline'}`;
    refreshButtons();
    updateSeries();
  });
}

if (document.readyState === 'loading') document.addEventListener('DOMContentLoaded', start);
else start();
