/**
 * The Nernst equation compiled for a resolved reaction:
 *   E = E°(T) − (RT ln10 / F) · Σ wₖ log10 aₖ,   log10 Q = n · Σ wₖ log10 aₖ,
 * with wₖ = νₖ/n for a half-reaction or full reaction, and for a cell
 * wₖ = ν/n(right) for right-electrode species and −ν/n(left) for left-electrode
 * species (E = E(right) − E(left)). Pure solids and liquids and solvent water have
 * unit activity unless a value is given; gases take partial pressures in bar.
 */
import { EngineError, quote } from '../errors';
import { toNumber } from '../rational';
import {
  type Species,
  speciesKey,
  isPureOrSolvent,
  isGas,
  formatSpecies,
  parseSpecies,
  phaseOf,
} from '../notation/species';
import { type Resolved, type ResolvedHalf, standardPotentialV } from '../table/resolve';
import { slopePerElectronAtKelvin, kelvinFromCelsius } from '../constants';
import { pKw } from './water';
import { splitSpeciesHeader } from '../notation/speciesHeader';
import { waterActivity, waterElectrolyteOf } from '../activity/waterActivity';

/** One species' place in the Nernst equation. */
export interface NernstTerm {
  readonly key: string;
  readonly species: Species;
  /** weight of log10 a in Σ wₖ log10 aₖ */
  readonly weight: number;
  /** which electrode of a cell diagram the species belongs to, or null */
  readonly side: 'left' | 'right' | null;
  /** pure solid/liquid or solvent water: unit activity unless given */
  readonly pure: boolean;
  readonly gas: boolean;
  /** inline activity from the diagram, if any */
  readonly inline: number | undefined;
}

/** A resolved reaction ready for evaluation. */
export interface NernstForm {
  readonly resolved: Resolved;
  readonly terms: readonly NernstTerm[];
  /** electrons of the reaction as written (half) or the cell reaction */
  readonly n: number;
}

function halfTerms(h: ResolvedHalf, sign: 1 | -1, side: 'left' | 'right' | null): NernstTerm[] {
  const out: NernstTerm[] = [];
  for (const [key, v] of h.map) {
    if (v.species.isElectron) continue;
    out.push({
      key,
      species: v.species,
      weight: (sign * toNumber(v.nu)) / h.n,
      side,
      pure: isPureOrSolvent(v.species),
      gas: isGas(v.species),
      inline: h.inline.get(key),
    });
  }
  return out;
}

/**
 * Compile a resolution into its Nernst terms.
 *
 * @example
 * nernstForm(resolveReaction('Cu2+ + 2e- -> Cu', defaultTable())).terms // Cu2+ w = −1/2, Cu pure
 */
export function nernstForm(r: Resolved): NernstForm {
  if (r.kind === 'half') return { resolved: r, terms: halfTerms(r.half, 1, null), n: r.half.n };
  if (r.diagram) {
    return {
      resolved: r,
      terms: [...halfTerms(r.right, 1, 'right'), ...halfTerms(r.left, -1, 'left')],
      n: r.n,
    };
  }
  const terms: NernstTerm[] = [];
  for (const [key, v] of r.map) {
    terms.push({
      key,
      species: v.species,
      weight: toNumber(v.nu) / r.n,
      side: null,
      pure: isPureOrSolvent(v.species),
      gas: isGas(v.species),
      inline: r.left.inline.get(key) ?? r.right.inline.get(key),
    });
  }
  return { resolved: r, terms, n: r.n };
}

/** A species-name header, parsed: `Cu2+`, `H2(g)`, `left:Ag+`, `pH`. */
export interface SpeciesHeader {
  readonly text: string;
  readonly kind: 'species' | 'pH';
  readonly side: 'left' | 'right' | null;
  readonly key: string;
  readonly species: Species | null;
  /** for `H2O in <salt>`: the salt whose molality the column holds (a(H2O) by Pitzer) */
  readonly electrolyte?: string;
}

const headerCache = new Map<string, SpeciesHeader>();

/**
 * Read one species header.
 *
 * @throws EngineError (`parse`) naming the `species` argument where the text is not a species
 * @example
 * parseSpeciesHeader('left:Ag+').side // 'left'
 */
export function parseSpeciesHeader(text: string): SpeciesHeader {
  const cached = headerCache.get(text);
  if (cached) return cached;
  // the one header grammar: src/engine/notation/speciesHeader.ts
  const { side, isPH, body } = splitSpeciesHeader(text);
  let h: SpeciesHeader;
  if (isPH) h = { text, kind: 'pH', side, key: 'H|1', species: null };
  else {
    const electrolyte = waterElectrolyteOf(body);
    const s = parseSpecies(electrolyte === null ? body : 'H2O', 'species');
    h = { text, kind: 'species', side, key: speciesKey(s), species: s };
    if (electrolyte !== null) h = { ...h, electrolyte };
  }
  if (headerCache.size > 10000) headerCache.clear();
  headerCache.set(text, h);
  return h;
}

/** How each term gets its activity for a given species header row. */
export interface Binding {
  readonly form: NernstForm;
  /** column index per term, or −1 (then `fixedLog` holds its contribution) */
  readonly column: Int32Array;
  /**
   * 1 where the column is a pH giving a(H+) (log10 a = −pH); 2 where it gives a(OH-)
   * (log10 a = pH − pKw(T)); 3 where it is the molality of an electrolyte giving a(H2O)
   */
  readonly isPH: Uint8Array;
  /** per term: the salt of an `H2O in <salt>` column, else null */
  readonly electrolyte: readonly (string | null)[];
  /** Σ w of the OH- terms set by a pH column: Σ w·log10 a gains −ohFromPH·pKw(T) */
  readonly ohFromPH: number;
  readonly weight: Float64Array;
  /** Σ w·log10 a of the terms with fixed activities (inline or unit) */
  readonly fixedLog: number;
  /** per term: the label used in messages */
  readonly labels: readonly string[];
  /** per term: gas (pressure) or solute */
  readonly gas: Uint8Array;
}

/**
 * Bind a compiled reaction to the species headers of a values range.
 * Extra headers the reaction does not use are ignored (but must be valid species).
 * Where no headers are given at all, every species is at standard state (inline
 * activities still apply).
 *
 * @throws EngineError (`argument`) for a species the reaction needs that has no value
 */
export function bindSpecies(form: NernstForm, headers: readonly string[]): Binding {
  if (lastBinding && lastBinding.form === form && sameList(lastBinding.headers, headers))
    return lastBinding.binding;
  let byHeaders = bindingCache.get(form);
  if (!byHeaders) {
    byHeaders = new Map();
    bindingCache.set(form, byHeaders);
  }
  const key = headers.length === 1 ? headers[0]! : headers.join('\u0000');
  let b = byHeaders.get(key);
  if (!b) {
    b = bindSpeciesUncached(form, headers);
    if (byHeaders.size > 256) byHeaders.clear();
    byHeaders.set(key, b);
  }
  lastBinding = { form, headers: headers.slice(), binding: b };
  return b;
}

let lastBinding: { form: NernstForm; headers: readonly string[]; binding: Binding } | null = null;

function sameList(a: readonly string[], b: readonly string[]): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

const bindingCache = new WeakMap<NernstForm, Map<string, Binding>>();

function bindSpeciesUncached(form: NernstForm, headers: readonly string[]): Binding {
  const parsed = headers.map((h) => parseSpeciesHeader(h));
  const seen = new Map<string, number>();
  parsed.forEach((h, i) => {
    const id = `${h.side ?? ''}|${h.kind}|${h.key}`;
    if (seen.has(id)) {
      throw new EngineError(
        'argument',
        `species lists ${quote(h.text)} twice (columns ${seen.get(id)! + 1} and ${i + 1}); give each species once.`,
        'species',
      );
    }
    seen.set(id, i);
  });
  const standardState = headers.length === 0;
  const column = new Int32Array(form.terms.length).fill(-1);
  const isPH = new Uint8Array(form.terms.length);
  const weight = new Float64Array(form.terms.length);
  const gas = new Uint8Array(form.terms.length);
  const labels: string[] = [];
  const electrolyte: (string | null)[] = form.terms.map(() => null);
  let fixedLog = 0;
  let ohFromPH = 0;
  form.terms.forEach((t, i) => {
    weight[i] = t.weight;
    gas[i] = t.gas ? 1 : 0;
    labels.push((t.side ? `${t.side}:` : '') + formatSpecies(t.species, false));
    const termPhase = phaseOf(t.species);
    const find = (kind: 'species' | 'pH', side: 'left' | 'right' | null) =>
      parsed.findIndex(
        (h) =>
          h.kind === kind &&
          // a pH header serves H+ and, through Kw, OH-
          (kind === 'pH' || h.key === t.key) &&
          h.side === side &&
          // a header with a written phase binds only to that phase (Cl2(aq) is not Cl2(g))
          !(h.species?.phase && termPhase && h.species.phase !== termPhase),
      );
    let col = -1;
    let ph = false;
    const byPH = t.key === 'H|1' || t.key === 'OH|-1';
    if (t.side) {
      col = find('species', t.side);
      if (col < 0 && byPH) {
        col = find('pH', t.side);
        ph = col >= 0;
      }
    }
    if (col < 0) {
      col = find('species', null);
      if (col < 0 && byPH) {
        col = find('pH', null);
        ph = col >= 0;
      }
      if (byPH && !ph && col >= 0 && find('pH', null) >= 0) {
        throw new EngineError(
          'argument',
          `species gives both ${t.key === 'H|1' ? 'H+' : 'OH-'} and pH; give one of them.`,
          'species',
        );
      }
    }
    if (col >= 0) {
      column[i] = col;
      isPH[i] = ph ? (t.key === 'H|1' ? 1 : 2) : 0;
      const salt = parsed[col]!.electrolyte;
      if (salt !== undefined) {
        isPH[i] = 3;
        electrolyte[i] = salt;
      }
      if (ph && t.key === 'OH|-1') ohFromPH += t.weight;
      labels[i] = parsed[col]!.text.trim();
      return;
    }
    if (t.inline !== undefined) {
      fixedLog += t.weight * Math.log10(t.inline);
      return;
    }
    if (t.pure || standardState) return; // unit activity
    const what = t.gas ? 'a partial pressure in bar' : 'an activity (or concentration in mol/L)';
    const sideHint = t.side
      ? ` (or "${t.side}:${formatSpecies(t.species, false)}" for this electrode only)`
      : '';
    const phHint = t.key === 'H|1' || t.key === 'OH|-1' ? ' or a "pH" column' : '';
    throw new EngineError(
      'argument',
      `The reaction needs a value for ${formatSpecies(t.species, false)}: add "${formatSpecies(t.species, false)}"${sideHint}${phHint} to species with ${what} in values.`,
      'species',
    );
  });
  return { form, column, isPH, weight, fixedLog, labels, gas, ohFromPH, electrolyte };
}

/**
 * Σ wₖ log10 aₖ for one case (row of values). Checks each used value. An `H2O in <salt>`
 * column gives a(H2O) by the Pitzer model at `tempC` (default 25 °C), within its ranges.
 *
 * @throws EngineError (`argument`) for a non-positive or non-numeric activity or pressure, or
 *   an electrolyte molality or temperature outside the Pitzer range
 */
export function weightedLogActivity(b: Binding, row: ArrayLike<unknown>, tempC = 25): number {
  let sum = b.fixedLog;
  const n = b.column.length;
  for (let i = 0; i < n; i++) {
    const c = b.column[i]!;
    if (c < 0) continue;
    const v = row[c];
    if (typeof v !== 'number' || !Number.isFinite(v)) throw badValue(b, i, v);
    const ph = b.isPH[i]!;
    if (ph === 1) sum -= b.weight[i]! * v;
    else if (ph === 2) sum += b.weight[i]! * v;
    else if (ph === 3) sum += b.weight[i]! * Math.log10(waterActivity(b.electrolyte[i]!, v, tempC));
    else {
      if (!(v > 0)) throw badValue(b, i, v);
      sum += b.weight[i]! * Math.log10(v);
    }
  }
  return sum;
}

function badValue(b: Binding, i: number, v: unknown): EngineError {
  const label = b.labels[i]!;
  if (b.isPH[i] === 3)
    return new EngineError(
      'argument',
      `The molality of ${b.electrolyte[i]!} (for a(H2O), header ${quote(label)}) must be a number in mol/kg; got ${describe(v)}.`,
      'values',
    );
  if (b.isPH[i] !== 0)
    return new EngineError('argument', `pH must be a number; got ${describe(v)}.`, 'values');
  const what = b.gas[i] === 1 ? 'partial pressure (bar)' : 'activity';
  const shown = describe(v);
  return new EngineError(
    'argument',
    `The ${what} of ${label} must be a positive number; got ${shown}.${typeof v === 'number' && v === 0 ? ' An empty cell reads as 0: fill it in.' : ''}`,
    'values',
  );
}

function describe(v: unknown): string {
  if (v === null || v === undefined || v === '') return 'an empty cell';
  if (typeof v === 'string') return quote(v);
  return String(v);
}

/**
 * E for one case, V.
 *
 * @example
 * potentialV(form, bind, [0.01], 25) // Cu2+/Cu at a(Cu2+) = 0.01: 0.2778 V
 */
export function potentialV(b: Binding, row: ArrayLike<unknown>, tempC: number): number {
  const tempK = kelvinFromCelsius(tempC);
  const s = slopePerElectronAtKelvin(tempK);
  const oh = b.ohFromPH === 0 ? 0 : -b.ohFromPH * pKw(tempC);
  const e = standardPotentialV(b.form.resolved, tempC) - s * (weightedLogActivity(b, row, tempC) + oh);
  if (!Number.isFinite(e))
    throw new EngineError('range', 'E is beyond the number range; check the values.', 'values');
  return e;
}

/** log10 Q for one case. */
export function log10Quotient(b: Binding, row: ArrayLike<unknown>): number {
  const oh = b.ohFromPH === 0 ? 0 : -b.ohFromPH * pKw(25);
  return b.form.n * (weightedLogActivity(b, row) + oh);
}
