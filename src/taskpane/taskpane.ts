/**
 * The task pane page: wires the DOM to the DOM-free modules (potentialsSheet, sweepPlan,
 * sweepForm, reference) and the one Office writer (officeActions). Outside Excel the page
 * says so, keeps the reference, the reaction check and the formula preview working, and
 * disables the buttons that write, with the reason beside them.
 *
 * Everything is rendered with textContent and createElement (no HTML strings), and the
 * only request the page makes itself is functions.json from its own origin.
 */
import './taskpane.css';
import { BUILTIN_POTENTIALS } from '../engine/index';
import { writeNewSheet } from './officeActions';
import { filterPotentials, planPotentialsSheet } from './potentialsSheet';
import { idFromHash, planExampleSheet, type ReferenceEntry, referenceEntries } from './reference';
import { runReported, type StatusKind, type StatusSink } from './status';
import {
  mergeSpeciesRows,
  rangeDefaults,
  rowRole,
  type SpeciesRow,
  sweepFormOf,
  variableOf,
  varyOptions,
  DEFAULT_SPECIES_VALUE,
} from './sweepForm';
import {
  caretLine,
  checkReaction,
  expectedSlope,
  formatValue,
  planSweep,
  previewValues,
  readSweepForm,
  type ReactionCheck,
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

// ---------------------------------------------------------------------------
// Host, status, busy state

type Host = { readonly excel: true } | { readonly excel: false; readonly reason: string };

let host: Host = { excel: false, reason: 'Looking for Excel…' };
let busy = false;

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
  button.title = reason ?? '';
}

function refreshButtons(): void {
  refreshPotentials();
  refreshSweep();
  for (const b of Array.from(document.querySelectorAll<HTMLButtonElement>('button[data-example]'))) {
    setWritable(b, null, null);
  }
  const note = document.getElementById('ref-insert-note');
  if (note) note.textContent = host.excel ? '' : `Insert buttons: ${NEEDS_EXCEL}`;
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
// Potentials sheet

function potentialsProblem(): string | null {
  const picked = filterPotentials(BUILTIN_POTENTIALS, byId<HTMLInputElement>('pot-filter').value);
  return picked.rows.length === 0 ? 'No row matches the filter.' : null;
}

function refreshPotentials(): void {
  const filter = byId<HTMLInputElement>('pot-filter').value;
  const picked = filterPotentials(BUILTIN_POTENTIALS, filter);
  const n = picked.rows.length;
  byId('pot-count').textContent =
    n === 0
      ? `No built-in half-reaction matches ${picked.described}. Try an element symbol (Fe) or a species (Cu2+).`
      : `${n} half-reaction${n === 1 ? '' : 's'} (${picked.described}) will go into a new sheet.`;
  setWritable(byId<HTMLButtonElement>('pot-insert'), byId('pot-why'), potentialsProblem());
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
    updateSweep();
  }
}

// ---------------------------------------------------------------------------
// Sweep builder

let rows: SpeciesRow[] = [];
let lastKind = '';
let currentLayout: SweepLayout | null = null;
let currentProblem: string | null = 'Type a reaction.';

function choice(): string {
  return byId<HTMLSelectElement>('sw-vary').value;
}

function scale(): 'log' | 'linear' {
  return byId<HTMLInputElement>('sw-scale-linear').checked ? 'linear' : 'log';
}

function renderCheck(check: ReactionCheck, text: string): void {
  const input = byId<HTMLInputElement>('sw-reaction');
  const caret = byId('sw-caret');
  const msg = byId('sw-reaction-msg');
  if (!check.ok) {
    input.setAttribute('aria-invalid', 'true');
    msg.className = 'error-text';
    msg.textContent = check.message;
    if (check.position !== null) {
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

function onReactionInput(): void {
  const text = byId<HTMLInputElement>('sw-reaction').value;
  const check = checkReaction(text);
  renderCheck(check, text);
  if (check.ok) {
    rows = mergeSpeciesRows(rows, check.species);
    renderSpecies();
    renderVary();
  }
  updateSweep();
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

/** Apply the current "vary" choice: scale radios, units, range defaults (when the kind changed), row roles. */
function onVaryChanged(update = true): void {
  const v = variableOf(choice(), scale());
  const kind = v.kind === 'activity' ? `activity-${v.scale}` : v.kind;
  for (const id of ['sw-scale-log', 'sw-scale-linear'])
    byId<HTMLInputElement>(id).disabled = v.kind !== 'activity';
  const d = rangeDefaults(v);
  for (const u of Array.from(document.querySelectorAll('[data-unit]'))) u.textContent = `(${d.unit})`;
  if (kind !== lastKind) {
    byId<HTMLInputElement>('sw-from').value = d.from;
    byId<HTMLInputElement>('sw-to').value = d.to;
    byId<HTMLInputElement>('sw-points').value = d.points;
    lastKind = kind;
  }
  const temp = byId<HTMLInputElement>('sw-temp');
  temp.disabled = v.kind === 'temperature';
  temp.title = temp.disabled ? 'Temperature is the varied quantity.' : '';
  refreshRowRoles();
  if (update) updateSweep();
}

function refreshRowRoles(): void {
  const v = variableOf(choice(), scale());
  const body = byId('sw-species');
  rows.forEach((row, i) => {
    const tr = body.children[i];
    if (!tr) return;
    const value = tr.querySelector<HTMLInputElement>('input[data-role="value"]');
    const note = tr.querySelector<HTMLElement>('[data-role="note"]');
    const role = rowRole(row, v);
    if (value) {
      value.disabled = role !== 'fixed';
      value.setAttribute(
        'aria-label',
        `Value of ${row.name.trim() || `species ${i + 1}`}${role === 'fixed' ? '' : ` (${role})`}`,
      );
    }
    if (note) note.textContent = role === 'fixed' ? '' : role;
  });
}

function renderSpecies(): void {
  const body = byId('sw-species');
  body.replaceChildren(
    ...rows.map((row, i) => {
      const name = make('input', { id: `sw-species-${i}` });
      name.type = 'text';
      name.value = row.name;
      name.autocomplete = 'off';
      name.spellcheck = false;
      name.dataset.role = 'name';
      name.setAttribute('aria-label', `Species ${i + 1}`);
      name.addEventListener('input', () => {
        rows[i] = { name: name.value, value: rows[i]?.value ?? DEFAULT_SPECIES_VALUE, origin: 'user' };
        renderVary();
        updateSweep();
      });
      const value = make('input', { id: `sw-value-${i}` });
      value.type = 'text';
      value.inputMode = 'decimal';
      value.value = row.value;
      value.autocomplete = 'off';
      value.dataset.role = 'value';
      value.addEventListener('input', () => {
        const r = rows[i];
        if (r) rows[i] = { ...r, value: value.value };
        updateSweep();
      });
      const remove = make('button', { text: '×', className: 'icon' });
      remove.type = 'button';
      remove.setAttribute('aria-label', `Remove ${row.name || `species ${i + 1}`}`);
      remove.addEventListener('click', () => {
        rows.splice(i, 1);
        renderSpecies();
        renderVary();
        updateSweep();
        byId('sw-add').focus();
      });
      const note = make('span', { className: 'role-note' });
      note.dataset.role = 'note';
      const errName = make('span', { className: 'field-error', id: `sw-err-species-${i}` });
      const errValue = make('span', { className: 'field-error', id: `sw-err-value-${i}` });
      name.setAttribute('aria-describedby', errName.id);
      value.setAttribute('aria-describedby', `${errValue.id}`);
      return make('tr', {}, [
        make('td', {}, [name, errName]),
        make('td', {}, [value, note, errValue]),
        make('td', {}, [remove]),
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
  for (const e of Array.from(document.querySelectorAll('#sweep .field-error'))) e.textContent = '';
  for (const e of Array.from(document.querySelectorAll('#sweep [aria-invalid]'))) {
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

function updateSweep(): void {
  clearFieldErrors();
  const result = readSweepForm(sweepFormOf(formState()));
  const errorsBox = byId('sw-errors');
  const list = byId('sw-error-list');
  const formula = byId('sw-formula');
  const warnings = byId('sw-warnings');
  warnings.replaceChildren();
  if (!result.ok) {
    currentLayout = null;
    currentProblem = 'Fix the inputs above first.';
    const others = result.errors.filter((e) => e.field !== 'reaction');
    errorsBox.hidden = others.length === 0;
    list.replaceChildren(...others.map((e) => make('li', { text: e.message })));
    for (const e of result.errors) {
      const inputId = FIELD_INPUT[e.field] ?? `sw-${e.field}`;
      const err = document.getElementById(`sw-err-${e.field}`);
      if (err) err.textContent = e.message;
      document.getElementById(inputId)?.setAttribute('aria-invalid', 'true');
    }
    formula.textContent = '(no formula until the inputs read)';
    formula.classList.add('empty');
    byId('sw-formula-where').textContent = '';
    byId('sw-summary').textContent = '';
    byId('sw-preview').textContent = '';
    refreshSweep();
    return;
  }
  errorsBox.hidden = true;
  list.replaceChildren();
  const input = result.input;
  const layout = planSweep(input);
  currentLayout = layout;
  currentProblem = null;
  formula.textContent = layout.formula;
  formula.classList.remove('empty');
  byId('sw-formula-where').textContent =
    ` (cell ${layout.formulaCell} of the new sheet; it spills to ${layout.spillRange})`;
  byId('sw-summary').textContent =
    `${layout.cases.length} cases in ${layout.inputRange}; header row ${layout.columns.join(' | ')}; ` +
    `result spilling to ${layout.spillRange}; chart of ${layout.yTitle} against ${layout.xTitle}.`;
  const values = previewValues(input, layout);
  const firstV = values[0];
  const lastV = values[values.length - 1];
  const slope = expectedSlope(input);
  const yName = layout.yTitle.startsWith('EMF') ? 'EMF' : 'E';
  let preview: string;
  if (firstV?.ok && lastV?.ok) {
    preview =
      `Engine check with the built-in table: ${yName} = ${firstV.e.toFixed(4)} V for the first case, ` +
      `${lastV.e.toFixed(4)} V for the last.`;
    if (slope)
      preview += ` Nernst slope ${slope.slope.toFixed(5)} ${slope.per} at ${formatValue(input.tempC)} °C.`;
    if (input.table) preview += ` The sheet uses ${input.table} instead.`;
  } else {
    const bad = values.find((v) => !v.ok);
    preview = `Engine check with the built-in table: ${bad && !bad.ok ? bad.message : 'no value'}`;
    if (input.table) preview += ` (The sheet uses ${input.table}, which may have it.)`;
  }
  byId('sw-preview').textContent = preview;
  warnings.replaceChildren(...layout.warnings.map((w) => make('li', { text: w })));
  refreshSweep();
}

function refreshSweep(): void {
  setWritable(byId<HTMLButtonElement>('sw-build'), byId('sw-why'), currentProblem);
}

async function buildSweep(): Promise<void> {
  const layout = currentLayout;
  if (!layout) return;
  await withBusy(() =>
    runReported(
      'Building the sweep sheet',
      () => writeNewSheet((existing) => sweepSheetPlan(layout, existing)),
      sinkFor(byId('sw-status')),
      (p) => p.summary,
    ),
  );
}

// ---------------------------------------------------------------------------
// Reference

let entries: ReferenceEntry[] = [];

function renderEntry(entry: ReferenceEntry): HTMLElement {
  const heading = make('h3', { id: `${entry.anchor}-title` }, [make('code', { text: entry.signature })]);
  heading.tabIndex = -1;
  const article = make('article', { className: 'ref-entry', id: entry.anchor }, [heading]);
  article.setAttribute('aria-labelledby', heading.id);
  if (entry.description) article.append(make('p', { text: entry.description }));
  if (entry.params.length > 0) {
    const dl = make('dl', { className: 'params' });
    for (const p of entry.params) {
      dl.append(
        make('dt', {}, [make('code', { text: p.name }), ` ${p.optional ? 'optional, ' : ''}${p.shape}`]),
      );
      dl.append(make('dd', { text: p.description || '—' }));
    }
    article.append(make('h4', { text: 'Arguments' }), dl);
  }
  article.append(make('p', { className: 'returns', text: `Returns: ${entry.returns}.` }));
  if (entry.examples.length > 0) {
    article.append(make('h4', { text: entry.examples.length === 1 ? 'Example' : 'Examples' }));
    for (const formula of entry.examples) {
      const button = make('button', { text: 'Insert in a new sheet', className: 'secondary' });
      button.type = 'button';
      button.dataset.example = entry.id;
      button.setAttribute('aria-label', `Insert the example ${formula} in a new sheet`);
      const area = make('div', { className: 'status' });
      area.setAttribute('role', 'status');
      area.setAttribute('aria-live', 'polite');
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
      article.append(
        make('div', { className: 'example' }, [
          make('code', { className: 'formula', text: formula }),
          button,
        ]),
        area,
      );
    }
  }
  return article;
}

function goToHash(): void {
  const entry = idFromHash(location.hash, entries);
  if (!entry) return;
  const heading = document.getElementById(`${entry.anchor}-title`);
  heading?.scrollIntoView({ block: 'start' });
  heading?.focus({ preventScroll: true });
}

async function loadReference(): Promise<void> {
  const status = byId('ref-status');
  try {
    const response = await fetch('functions.json', { credentials: 'same-origin' });
    if (!response.ok)
      throw new Error(`functions.json answered ${response.status} ${response.statusText}`.trim());
    entries = referenceEntries(await response.json());
  } catch (error) {
    status.textContent =
      `The function list could not be loaded: ${error instanceof Error ? error.message : String(error)}. ` +
      'It comes from functions.json beside this page: serve the built add-in rather than opening the file directly.';
    status.className = 'error-text';
    return;
  }
  status.textContent = `${entries.length} functions in the ECHEM namespace, from this build's function metadata.`;
  const note = make('p', { className: 'why', id: 'ref-insert-note' });
  status.after(note);
  byId('ref-index').replaceChildren(
    ...entries.map((e) => {
      const a = make('a', { text: e.qualifiedName });
      a.href = `#${e.anchor}`;
      return a;
    }),
  );
  byId('ref-list').replaceChildren(...entries.map(renderEntry));
  refreshButtons();
  goToHash();
}

// ---------------------------------------------------------------------------
// Start

function start(): void {
  byId('pot-filter').addEventListener('input', refreshPotentials);
  byId('pot-insert').addEventListener('click', () => void insertPotentials());
  byId('sw-reaction').addEventListener('input', onReactionInput);
  byId('sw-vary').addEventListener('change', () => onVaryChanged());
  for (const id of ['sw-scale-log', 'sw-scale-linear'])
    byId(id).addEventListener('change', () => onVaryChanged());
  for (const id of ['sw-from', 'sw-to', 'sw-points', 'sw-temp', 'sw-table'])
    byId(id).addEventListener('input', updateSweep);
  byId('sw-build').addEventListener('click', () => void buildSweep());
  byId('sw-add').addEventListener('click', () => {
    rows.push({ name: '', value: DEFAULT_SPECIES_VALUE, origin: 'user' });
    renderSpecies();
    renderVary();
    updateSweep();
    document.getElementById(`sw-species-${rows.length - 1}`)?.focus();
  });
  byId('sw-refill').addEventListener('click', () => {
    const check = checkReaction(byId<HTMLInputElement>('sw-reaction').value);
    if (!check.ok) return;
    rows = mergeSpeciesRows(
      rows.filter((r) => r.origin === 'reaction'),
      check.species,
    );
    renderSpecies();
    renderVary();
    updateSweep();
  });
  window.addEventListener('hashchange', goToHash);

  onReactionInput();
  refreshButtons();
  void loadReference();
  void detectHost().then((h) => {
    host = h;
    const s = byId('host-status');
    s.textContent = h.excel
      ? 'Connected to Excel. Each action adds a new sheet and leaves your sheets as they are.'
      : `${h.reason} The reference, the reaction check and the formula preview work here; writing sheets needs Excel.`;
    s.className = `host-status ${h.excel ? 'ok' : 'offline'}`;
    refreshButtons();
  });
}

if (document.readyState === 'loading') document.addEventListener('DOMContentLoaded', start);
else start();
