/**
 * Reference-electrode scales: find an electrode by name, its potential vs SHE at a
 * temperature (and pH, for the RHE), and convert a potential from one scale to another.
 *
 * Convention: a potential "vs X" is E(working) − E(X). So E vs B = E vs A + E_A − E_B,
 * where E_A and E_B are the reference potentials vs SHE.
 */
import { EngineError, quote } from './errors';
import { kelvinFromCelsius, slopePerElectronAtKelvin, STANDARD_TEMP_C } from './constants';
import {
  ambiguousReferenceNames,
  referenceElectrodeRows,
  BATES_BOWER_COEFFS,
  SEAWATER_CHLORIDE,
  type ReferenceTemperatureModel,
} from './data/referenceElectrodes';
import { resolveReaction, standardPotentialV } from './table/resolve';
import { defaultTable } from './table/potentialTable';

/**
 * A reference electrode, as listed by {@link listReferences}. Frozen.
 *
 * @example
 * const sce: ReferenceElectrode = findReference('SCE'); // sce.potentialVvsSHE === 0.2412
 */
export interface ReferenceElectrode {
  /** Short, unique identifier, also accepted as a name ("SCE", "Ag/AgCl-3M-KCl", "RHE"). */
  id: string;
  /** Display name. */
  name: string;
  /** Other accepted names (matched case-insensitively, punctuation-insensitively). */
  aliases: readonly string[];
  /** Potential vs SHE at 25 °C in V (RHE: at pH 0). */
  potentialVvsSHE: number;
  /** dE/dT at 25 °C in mV/K from the temperature model, or null where none is known (conversion away from 25 °C is then an error). */
  tempCoeffMvPerK: number | null;
  /** The publication(s) the numbers come from; "(from memory)" where recalled. */
  source: string;
  /** True where the potential depends on pH (RHE). */
  needsPH: boolean;
  /** How the potential depends on temperature. */
  model: ReferenceTemperatureModel;
}

/** E°(AgCl/Ag) in V at t °C from the Bates & Bower (1954) fit (0–60 °C). */
export function batesBowerE0V(tC: number): number {
  const [a, b, c, d] = BATES_BOWER_COEFFS as [number, number, number, number];
  return a + tC * (b + tC * (c + tC * d));
}

/**
 * Ag/AgCl in seawater, V vs SHE: E°(AgCl/Ag)(t) of Bates & Bower − (RT ln10/F)·log10 a(Cl-),
 * a(Cl-) = 0.5658 mol/kg × (S/35) × 0.67 (chloride of standard seawater and its activity
 * coefficient, from memory).
 *
 * Domain: 0–40 °C, practical salinity 5–45. Precision: about ±3 mV (the activity coefficient).
 * @throws EngineError (`argument`) outside the domain
 * @example
 * silverChlorideSeawaterV(25, 35) // 0.2473
 */
export function silverChlorideSeawaterV(tempC: number, salinity = 35): number {
  const tK = kelvinFromCelsius(tempC);
  inRange(tempC, [0, 40], 'Ag/AgCl in seawater');
  if (!Number.isFinite(salinity) || salinity < 5 || salinity > 45) {
    throw new EngineError(
      'argument',
      `salinity must be a practical salinity from 5 to 45 (open seawater is about 35); got ${String(salinity)}.`,
      'salinity',
    );
  }
  const a = SEAWATER_CHLORIDE.molalityAtS35 * (salinity / 35) * SEAWATER_CHLORIDE.gamma;
  return batesBowerE0V(tempC) - slopePerElectronAtKelvin(tK) * Math.log10(a);
}

function inRange(tempC: number, range: readonly [number, number], what: string): void {
  if (tempC < range[0] - 1e-9 || tempC > range[1] + 1e-9) {
    throw new EngineError(
      'argument',
      `temp_C = ${tempC} °C is outside ${range[0]}–${range[1]} °C, the range of the temperature model of ${what}; give a temperature in that range.`,
      'temp_C',
    );
  }
}

const coupleCache = new Map<string, ReturnType<typeof resolveReaction>>();

function coupleE0V(halfReaction: string, tempC: number): number {
  let r = coupleCache.get(halfReaction);
  if (!r) {
    r = resolveReaction(halfReaction, defaultTable());
    coupleCache.set(halfReaction, r);
  }
  return standardPotentialV(r, tempC);
}

/** The model's potential vs SHE at a temperature (not at 25 °C for `unknown`). */
function modelPotentialV(ref: { id: string; name: string; potentialVvsSHE: number; model: ReferenceTemperatureModel }, tempC: number): number {
  const m = ref.model;
  const e25 = ref.potentialVvsSHE;
  const tK = tempC + 273.15;
  switch (m.kind) {
    case 'constant':
    case 'rhe':
      return e25;
    case 'linear':
      inRange(tempC, m.rangeC, ref.id);
      return e25 + (m.mvPerK * (tempC - 25)) / 1000;
    case 'polynomial': {
      inRange(tempC, m.rangeC, ref.id);
      let x = 0;
      const d = tempC - m.t0C;
      for (let i = m.coeffs.length - 1; i >= 0; i--) x = x * d + m.coeffs[i]!;
      return x;
    }
    case 'couple':
      inRange(tempC, m.rangeC, ref.id);
      return coupleE0V(m.halfReaction, tempC) - (tK / 298.15) * (coupleE0V(m.halfReaction, 25) - e25);
    case 'bates':
      inRange(tempC, m.rangeC, ref.id);
      return batesBowerE0V(tempC) - (tK / 298.15) * (batesBowerE0V(25) - e25);
    case 'seawater':
      return silverChlorideSeawaterV(tempC, m.salinity);
    case 'unknown':
      throw new EngineError(
        'argument',
        `${ref.id} (${ref.name}) has no known temperature coefficient, so its potential at ${tempC} °C is unknown and a conversion would correct only one side. Convert at 25 °C, or use an electrode with a published temperature dependence.`,
        'temp_C',
      );
  }
}

function coefficientAt25(row: { id: string; name: string; potentialVvsSHE: number; model: ReferenceTemperatureModel; tempCoeffMvPerK: number | null }): number | null {
  const m = row.model;
  if (m.kind === 'unknown' || m.kind === 'rhe') return row.tempCoeffMvPerK;
  if (m.kind === 'constant') return 0;
  if (m.kind === 'linear') return m.mvPerK;
  return ((modelPotentialV(row, 26) - modelPotentialV(row, 24)) / 2) * 1000;
}

/**
 * The electrodes and their name index, built on first use: the coefficients at 25 °C of the
 * `couple` models read the potentials table, which the first POTENTIAL of a workbook does
 * not otherwise need in full.
 */
interface ReferenceIndex {
  readonly electrodes: readonly ReferenceElectrode[];
  readonly byName: ReadonlyMap<string, ReferenceElectrode>;
  readonly ambiguous: ReadonlyMap<string, readonly string[]>;
  readonly knownIds: string;
}

let referenceIndex: ReferenceIndex | null = null;

function references(): ReferenceIndex {
  if (referenceIndex) return referenceIndex;
  const electrodes: readonly ReferenceElectrode[] = Object.freeze(
    referenceElectrodeRows().map((r) =>
      Object.freeze({
        id: r.id,
        name: r.name,
        aliases: Object.freeze([...r.aliases]),
        potentialVvsSHE: r.potentialVvsSHE,
        tempCoeffMvPerK: coefficientAt25(r),
        source: r.source,
        needsPH: r.needsPH,
        model: r.model,
      }),
    ),
  );
  const byName = new Map<string, ReferenceElectrode>();
  const ambiguous = new Map<string, readonly string[]>();
  for (const e of electrodes) {
    for (const n of [e.id, ...e.aliases]) {
      const key = normaliseReferenceName(n);
      const prior = byName.get(key);
      if (prior && prior !== e) {
        throw new Error(`reference electrode alias "${n}" of ${e.id} collides with ${prior.id}`);
      }
      byName.set(key, e);
    }
  }
  for (const a of ambiguousReferenceNames()) {
    for (const n of a.names) {
      const key = normaliseReferenceName(n);
      if (byName.has(key)) throw new Error(`ambiguous reference name "${n}" is also an alias`);
      ambiguous.set(key, a.candidateIds);
    }
  }
  referenceIndex = { electrodes, byName, ambiguous, knownIds: electrodes.map((e) => e.id).join(', ') };
  return referenceIndex;
}

/**
 * The normalised form of a reference-electrode name, used for matching: Unicode
 * compatibility form (subscripts become digits), lower case, a leading "vs"/"vs." removed,
 * "mol/L" and "mol/dm3" read as "M", "saturated"/"sat'd" read as "sat", and spaces,
 * underscores, hyphens, dashes, slashes, bars, dots, commas, colons, apostrophes and brackets
 * dropped.
 *
 * Domain: any string. Allocates (not for per-value hot paths; {@link findReference} caches).
 *
 * @example
 * normaliseReferenceName('Ag/AgCl (3 M KCl)') // 'agagcl3mkcl'
 * normaliseReferenceName('vs. SCE') // 'sce'
 */
export function normaliseReferenceName(text: string): string {
  return text
    .normalize('NFKC')
    .toLowerCase()
    .trim()
    .replace(/^vs\.?\s+|^vs\./, '')
    .replace(/mol\s*\/\s*(?:l|dm3|dm\^3)\b/g, 'm')
    .replace(/saturated|sat'd|sat’d/g, 'sat')
    .replace(/[\s_\-‐‑‒–—/\\|.,:;'’()[\]{}]+/g, '');
}

/** Raw text → electrode, so that repeated look-ups of the same text skip normalisation. */
const lookupCache = new Map<string, ReferenceElectrode>();
const LOOKUP_CACHE_LIMIT = 512;

/**
 * Find a reference electrode by id or alias.
 *
 * Domain: any text. Matching ignores case, spaces, underscores, hyphens, slashes and other
 * punctuation ("Ag/AgCl 3M KCl" = "agagcl-3m-kcl" = "Ag/AgCl-3M-KCl"); a leading "vs" is
 * ignored. Known ids: SHE, SCE, calomel-1M-KCl, calomel-0.1M-KCl, SSCE, Ag/AgCl-sat-KCl,
 * Ag/AgCl-3.5M-KCl, Ag/AgCl-3M-KCl, Ag/AgCl-1M-KCl, Ag/AgCl-0.1M-KCl, CSE,
 * Hg/Hg2SO4-1M-H2SO4, Hg/Hg2SO4-sat-K2SO4, Hg/HgO-0.1M-NaOH, Hg/HgO-1M-NaOH, RHE.
 * A generic name without the filling ("Ag/AgCl", "calomel", "Hg/Hg2SO4", "MSE", "Hg/HgO")
 * is ambiguous, since the fillings differ by up to 92.5 mV.
 *
 * @param name the electrode name as the user wrote it
 * @param argName the argument name used in error messages (default `reference`)
 * @throws EngineError `parse` for empty text; `ambiguous` for a generic name, listing the
 *   candidates; `notFound` for an unknown name, listing every known id
 * @example
 * findReference('sce').potentialVvsSHE // 0.2412
 * findReference('Ag/AgCl 3M KCl').id // 'Ag/AgCl-3M-KCl'
 */
export function findReference(name: string, argName = 'reference'): ReferenceElectrode {
  const hit = lookupCache.get(name);
  if (hit) return hit;
  const text = typeof name === 'string' ? name : String(name);
  const key = normaliseReferenceName(text);
  if (key === '') {
    throw new EngineError(
      'parse',
      `${argName} is empty: name a reference electrode such as "SHE", "SCE", "Ag/AgCl sat KCl" or "CSE".`,
      argName,
    );
  }
  const { byName, ambiguous, knownIds } = references();
  const found = byName.get(key);
  if (found) {
    if (lookupCache.size >= LOOKUP_CACHE_LIMIT) lookupCache.clear();
    lookupCache.set(name, found);
    return found;
  }
  const candidates = ambiguous.get(key);
  if (candidates) {
    const list = candidates
      .map((id) => {
        const e = byName.get(normaliseReferenceName(id)) as ReferenceElectrode;
        return `${e.id} (${e.potentialVvsSHE} V vs SHE)`;
      })
      .join(', ');
    throw new EngineError(
      'ambiguous',
      `${argName} ${quote(text)} could be any of: ${list}. Name the filling solution, e.g. ${quote(candidates[0] ?? '')}.`,
      argName,
    );
  }
  throw new EngineError(
    'notFound',
    `${argName} ${quote(text)} is not a known reference electrode. Use one of: ${knownIds} ` +
      `(case, spaces, hyphens and slashes do not matter; aliases such as "saturated calomel" or "Cu/CuSO4" work too).`,
    argName,
  );
}

/**
 * The potential of a reference electrode vs SHE, in V, at a temperature (and pH for RHE).
 *
 * - Each electrode's temperature model (its `model`): a published fit (SCE; Ag/AgCl from
 *   Bates & Bower), a linear coefficient (Cu/CuSO4 +0.9 mV/K, common practice), or the
 *   couple's E°(T) from the species data with the filling's activity term held (calomel in
 *   KCl, Hg/Hg2SO4, Hg/HgO), each over its stated range (an argument error outside it).
 * - Electrodes without a known coefficient: an argument error away from 25 °C (never a
 *   silent half-correction of a conversion).
 * - RHE: E = −(RT ln10/F)·pH at the given temperature, p(H2) = 1 bar.
 *
 * Domain: temp_C > −273.15 and finite; pH any finite real (required for RHE, otherwise
 * ignored but still checked when given). Precision: float64; the result is as good as the
 * tabulated value (typically ±1 mV, see each electrode's source).
 *
 * @throws EngineError `argument` for a bad temperature, a non-finite pH, RHE without pH, a
 *   temperature outside the model's range, or any temperature but 25 °C without a model
 * @example
 * referencePotentialV(findReference('SCE'), 35, null) // 0.23443
 * referencePotentialV(findReference('RHE'), 25, 7) // −0.414115…
 */
export function referencePotentialV(ref: ReferenceElectrode, tempC: number, pH: number | null): number {
  const tempK = kelvinFromCelsius(tempC, 'temp_C');
  if (pH !== null && pH !== undefined && !Number.isFinite(pH)) {
    throw new EngineError('argument', `pH must be a finite number; got ${String(pH)}.`, 'pH');
  }
  if (ref.needsPH) {
    if (pH === null || pH === undefined) {
      throw new EngineError(
        'argument',
        `pH is required for ${ref.id} (${ref.name}): its potential vs SHE is −(RT ln10/F)·pH. Give the solution pH.`,
        'pH',
      );
    }
    return ref.potentialVvsSHE - slopePerElectronAtKelvin(tempK) * pH;
  }
  if (tempC === STANDARD_TEMP_C) return ref.potentialVvsSHE;
  return modelPotentialV(ref, tempC);
}

/**
 * A note for results at a temperature where an electrode has no temperature coefficient,
 * or null where there is nothing to say. Since a conversion away from 25 °C with such an
 * electrode is an error, the note only explains that error.
 *
 * Domain: finite temp_C. Allocates a string only when there is a note.
 *
 * @example
 * referenceTemperatureNote(findReference('SSCE'), 15) // '… has no known temperature coefficient …'
 * referenceTemperatureNote(findReference('SCE'), 15) // null
 */
export function referenceTemperatureNote(ref: ReferenceElectrode, tempC: number): string | null {
  if (ref.needsPH || ref.model.kind !== 'unknown' || tempC === STANDARD_TEMP_C) return null;
  return (
    `${ref.id} (${ref.name}) has no known temperature coefficient; ` +
    `only its 25 °C value ${ref.potentialVvsSHE} V vs SHE is known, so it cannot be used at ${tempC} °C.`
  );
}

/**
 * Convert a potential from one reference scale to another:
 * E_to = E_from + (E_ref(from) − E_ref(to)), both reference potentials vs SHE at `tempC`
 * (and `pH` where either is the RHE).
 *
 * Domain: potential finite (V); names as for {@link findReference}; temp_C > −273.15;
 * pH finite where given, required when either scale is RHE. Converting to the same scale
 * returns the potential unchanged. Precision: float64 arithmetic; the accuracy is that of
 * the reference values (about ±1 mV; see each electrode's source).
 *
 * @param potentialV the potential in V on the `fromRef` scale
 * @param fromRef the scale the potential is given on
 * @param toRef the scale wanted
 * @param tempC temperature in °C (default 25)
 * @param pH solution pH, for RHE (default none)
 * @throws EngineError `argument` (bad potential, temperature or pH; RHE without pH),
 *   `parse` (empty name), `notFound` (unknown name), `ambiguous` (generic name)
 * @example
 * convertPotentialV(0, 'SCE', 'SHE') // 0.2412
 * convertPotentialV(-0.85, 'CSE', 'Ag/AgCl sat KCl') // −0.731
 * convertPotentialV(0, 'RHE', 'SHE', 25, 7) // −0.414115…
 */
export function convertPotentialV(
  potentialV: number,
  fromRef: string,
  toRef: string,
  tempC = STANDARD_TEMP_C,
  pH: number | null = null,
): number {
  if (!Number.isFinite(potentialV)) {
    throw new EngineError(
      'argument',
      `potential must be a finite number in volts; got ${String(potentialV)}.`,
      'potential',
    );
  }
  const from = findReference(fromRef, 'from_ref');
  const to = findReference(toRef, 'to_ref');
  if (from === to) {
    // same scale: only check the other arguments (an RHE→RHE conversion needs no pH)
    kelvinFromCelsius(tempC, 'temp_C');
    if (pH !== null && pH !== undefined && !Number.isFinite(pH)) {
      throw new EngineError('argument', `pH must be a finite number; got ${String(pH)}.`, 'pH');
    }
    return potentialV;
  }
  const eFrom = referencePotentialV(from, tempC, pH);
  const eTo = referencePotentialV(to, tempC, pH);
  return potentialV + (eFrom - eTo);
}

/**
 * Every built-in reference electrode, in a fixed order (SHE first, RHE last). Frozen.
 *
 * @example
 * listReferences().map((r) => r.id) // ['SHE', 'SCE', 'calomel-1M-KCl', …, 'RHE']
 */
export function listReferences(): readonly ReferenceElectrode[] {
  return references().electrodes;
}
