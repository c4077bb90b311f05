/**
 * ΔG, ΔH, ΔS and log K of any reaction argument (half-reaction, couple, cell diagram,
 * full reaction, also one that is not a redox reaction) at a temperature, and formation
 * data of single species (FORMATION, ENTHALPY, ENTROPY, THERMONEUTRAL, GIBBS, LOGK).
 *
 * Where the reaction resolves through the potentials table, ΔrG° = −nF·E°(T) from the rows
 * (user rows take precedence) and ΔrS° = nF·dE°/dT at T; ΔrH° = ΔrG° + T·ΔrS°. For built-in
 * rows this is exactly the Gibbs–Helmholtz result of the species data. A reaction that the
 * table cannot split (no redox couple in it, e.g. CaCO3(s) -> Ca2+ + CO3^2-) is computed
 * from the species data directly.
 *
 * ΔG at the written activities: with `atActivities`, ΔG = −nF·E where E is the Nernst
 * potential at the activities written inline in the reaction or cell diagram (species
 * without one at standard state), so GIBBS of a diagram agrees with POTENTIAL: ΔG = −nFE.
 */
import { EngineError, quote } from '../errors';
import { FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K, kelvinFromCelsius } from '../constants';
import { toNumber } from '../rational';
import { parseNotation } from '../notation/notation';
import { stoichiometry } from '../notation/reaction';
import { assertBalanced } from '../balance/balance';
import { type Resolved, type ResolvedHalf, standardPotentialV, electronCount } from '../table/resolve';
import { compiledReaction } from '../cache';
import { nernstForm, bindSpecies, potentialV } from './nernstForm';
import {
  reactionThermo,
  isComplete,
  gibbsAtJ,
  entropyAtJK,
  checkSpeciesTemperature,
  T0_K,
} from './reactionThermo';
import { findSpeciesRecord } from '../data/species/index';

type Cells = readonly (readonly unknown[])[] | null | undefined;

/** The thermodynamics of one reaction at one temperature. */
export interface ReactionEnergy {
  /** ΔrG° at the temperature, kJ/mol (of the reaction as written) */
  readonly gibbsKJ: number;
  /** ΔrS°, J/(mol·K), or null where its temperature dependence is unknown */
  readonly entropyJK: number | null;
  /** ΔrH° = ΔrG° + T·ΔrS°, kJ/mol, or null with the entropy */
  readonly enthalpyKJ: number | null;
  /** electrons transferred (0 for a reaction computed from the species data alone) */
  readonly n: number;
  /** log10 K = −ΔrG°/(RT ln10) */
  readonly log10K: number;
  /** 'table' where resolved through the potentials table, 'species' where from the species data directly */
  readonly basis: 'table' | 'species';
  /** why the entropy is unknown, where it is */
  readonly entropyNote: string | null;
}

function halfSlopeAt(h: ResolvedHalf, tK: number): { slope: number; known: boolean; note: string | null } {
  let slope = 0;
  let known = true;
  let note: string | null = null;
  for (const s of h.shares) {
    const t = s.row.temperature;
    if (t.basis === 'none') {
      known = false;
      note =
        t.entropyMissing.length > 0
          ? `the species data have no S° for ${t.entropyMissing.join(', ')}`
          : `${s.row.text} has no dE°/dT and its species are not all in the species data`;
      continue;
    }
    // d/dT of slope·(T − T0) + cp·[(T − T0) − T ln(T/T0)] = slope − cp·ln(T/T0)
    slope += s.weight * (t.basis === 'species' ? t.slopeVPerK - t.cpVPerK * Math.log(tK / T0_K) : t.slopeVPerK);
  }
  return { slope, known, note };
}

/** dE°/dT at a temperature (V/K) of a resolution, or null where unknown (with the reason). */
function slopeAt(r: Resolved, tK: number): { slope: number | null; note: string | null } {
  if (r.kind === 'half') {
    const h = halfSlopeAt(r.half, tK);
    return { slope: h.known ? h.slope : null, note: h.note };
  }
  const a = halfSlopeAt(r.right, tK);
  const b = halfSlopeAt(r.left, tK);
  return a.known && b.known ? { slope: a.slope - b.slope, note: null } : { slope: null, note: a.note ?? b.note };
}

function fromResolved(r: Resolved, tempC: number): ReactionEnergy {
  const tK = kelvinFromCelsius(tempC);
  const n = electronCount(r);
  const e0 = standardPotentialV(r, tempC);
  const g = -n * FARADAY_C_PER_MOL * e0;
  const { slope, note } = slopeAt(r, tK);
  const sJK = slope === null ? null : n * FARADAY_C_PER_MOL * slope;
  return {
    gibbsKJ: g / 1000,
    entropyJK: sJK,
    enthalpyKJ: sJK === null ? null : (g + tK * sJK) / 1000,
    n,
    log10K: -g / (GAS_CONSTANT_J_PER_MOL_K * tK * Math.LN10),
    basis: 'table',
    entropyNote: note,
  };
}

function fromSpecies(text: string, tempC: number): ReactionEnergy | null {
  let parsed;
  try {
    parsed = parseNotation(text);
  } catch {
    return null;
  }
  if (parsed.kind !== 'reaction') return null;
  assertBalanced(parsed.reaction, text);
  const entries = stoichiometry(parsed.reaction).map((e) => ({ species: e.species, nu: toNumber(e.nu) }));
  const th = reactionThermo(entries);
  if (!isComplete(th)) return null;
  const tK = checkSpeciesTemperature(tempC);
  const g = gibbsAtJ(th, tempC);
  let sJK: number | null = null;
  let note: string | null = null;
  if (th.dSJK !== null) sJK = entropyAtJK(th, tempC);
  else note = `the species data have no S° for ${th.entropyMissing.join(', ')}`;
  return {
    gibbsKJ: g / 1000,
    entropyJK: sJK,
    enthalpyKJ: sJK === null ? null : (g + tK * sJK) / 1000,
    n: 0,
    log10K: -g / (GAS_CONSTANT_J_PER_MOL_K * tK * Math.LN10),
    basis: 'species',
    entropyNote: note,
  };
}

/**
 * ΔrG°, ΔrH°, ΔrS° and log K of any reaction argument at a temperature.
 *
 * Domain: any reaction text the notation reads; temp_C 0–100 °C where the species data
 * give E°(T) (built-in rows, user rows without dE°/dT), any temperature above absolute zero
 * for user rows with their own dE°/dT. Precision: that of the data (about ±0.1 kJ/mol).
 * @throws EngineError as resolution does (parse, unbalanced, notFound, ambiguous), and
 *   `argument` outside the temperature range
 * @example
 * reactionEnergy('H2O -> H+ + OH-', 25, null).log10K // −13.995
 * reactionEnergy('2 H2 + O2 -> 2 H2O', 80, null).gibbsKJ // −456.3 (−228.2 per H2O)
 */
export function reactionEnergy(text: string, tempC: number, cells: Cells): ReactionEnergy {
  try {
    return fromResolved(compiledReaction(text, cells).resolved, tempC);
  } catch (e) {
    if (!(e instanceof EngineError) || e.kind !== 'notFound') throw e;
    const direct = fromSpecies(text, tempC);
    if (direct) return direct;
    throw e;
  }
}

/**
 * ΔG in kJ/mol of a resolved reaction: ΔG° = −nF·E°(T), or with `atActivities` ΔG = −nF·E
 * at the activities written inline (unwritten species at standard state).
 *
 * @example
 * reactionGibbsKJ(resolveReaction('Zn | Zn2+(aq, 0.1 M) || Cu2+(aq, 0.01 M) | Cu', t), 25, { atActivities: true })
 */
export function reactionGibbsKJ(r: Resolved, tempC: number, options: { atActivities: boolean }): number {
  const n = electronCount(r);
  const e = options.atActivities
    ? potentialV(bindSpecies(nernstForm(r), []), [], tempC)
    : standardPotentialV(r, tempC);
  return (-n * FARADAY_C_PER_MOL * e) / 1000;
}

/** True where a resolution carries activities written inline. */
export function hasInlineActivities(r: Resolved): boolean {
  return r.kind === 'half' ? r.half.inline.size > 0 : r.left.inline.size > 0 || r.right.inline.size > 0;
}

/** The quantities FORMATION can return. */
export type FormationQuantity = 'G' | 'H' | 'S' | 'Cp' | 'source';

/**
 * Read FORMATION's quantity argument: "G" (default), "H", "S", "Cp" or "source" (any case).
 *
 * @throws EngineError (`argument`) for anything else
 * @example
 * parseFormationQuantity('cp') // 'Cp'
 */
export function parseFormationQuantity(text: string | null | undefined): FormationQuantity {
  const t = (text ?? '').trim().toLowerCase();
  if (t === '' || t === 'g' || t === 'dg' || t === 'gibbs') return 'G';
  if (t === 'h' || t === 'dh' || t === 'enthalpy') return 'H';
  if (t === 's' || t === 'entropy') return 'S';
  if (t === 'cp' || t === 'heat capacity') return 'Cp';
  if (t === 'source') return 'source';
  throw new EngineError(
    'argument',
    `quantity ${quote(text ?? '')} is not one of "G" (ΔfG°, kJ/mol), "H" (ΔfH°, kJ/mol), "S" (S°, J/(mol·K)), "Cp" (J/(mol·K)) or "source".`,
    'quantity',
  );
}

/**
 * A species' standard formation data at 298.15 K and 1 bar: ΔfG° or ΔfH° in kJ/mol, S° or
 * Cp° in J/(mol·K), or the source text.
 *
 * @throws EngineError `notFound` for a species without data or a quantity its source does not give
 * @example
 * formationValue('H2O(l)', 'H') // −285.83
 * formationValue('Cu2+', 'source') // 'NBS tables (Wagman et al. …), from memory'
 */
export function formationValue(species: string, quantity: FormationQuantity): number | string {
  const rec = findSpeciesRecord(species);
  const missing = (what: string): never => {
    throw new EngineError(
      'notFound',
      `The species data give no ${what} for ${quote(species)} (source: ${rec.source}).`,
      'quantity',
    );
  };
  switch (quantity) {
    case 'G':
      return rec.dfGkJ;
    case 'H':
      return rec.dfHkJ ?? missing('ΔfH°');
    case 'S':
      return rec.sJK ?? missing('S°');
    case 'Cp':
      return rec.cpJK ?? missing('Cp°');
    case 'source':
      return rec.source;
  }
}

function needEntropy(e: ReactionEnergy, what: string, text: string): number {
  if (e.entropyJK === null || e.enthalpyKJ === null) {
    throw new EngineError(
      'notFound',
      `${what} of ${quote(text)} needs its temperature dependence, which is unknown: ${e.entropyNote ?? 'no data'}. Give dE°/dT in your table.`,
      'reaction',
    );
  }
  return e.entropyJK;
}

/**
 * ΔrH° in kJ/mol of a reaction at a temperature.
 *
 * @example
 * reactionEnthalpyKJ('H2 + 1/2 O2 -> H2O', 25, null) // −285.83
 */
export function reactionEnthalpyKJ(text: string, tempC: number, cells: Cells): number {
  const e = reactionEnergy(text, tempC, cells);
  needEntropy(e, 'ΔrH°', text);
  return e.enthalpyKJ!;
}

/**
 * ΔrS° in J/(mol·K) of a reaction at a temperature.
 *
 * @example
 * reactionEntropyJK('H2 + 1/2 O2 -> H2O', 25, null) // −163.3
 */
export function reactionEntropyJK(text: string, tempC: number, cells: Cells): number {
  return needEntropy(reactionEnergy(text, tempC, cells), 'ΔrS°', text);
}

/**
 * The thermoneutral voltage ΔrH°/(nF) in V of a redox reaction as written: positive for an
 * electrolysis (H2O -> H2 + 1/2 O2: about 1.48 V at 25 °C), negative for the reverse.
 *
 * @throws EngineError (`argument`) for a reaction that transfers no electrons
 * @example
 * thermoneutralV('H2O -> H2 + 1/2 O2', 25, null) // 1.481
 */
export function thermoneutralV(text: string, tempC: number, cells: Cells): number {
  const e = reactionEnergy(text, tempC, cells);
  if (e.n <= 0) {
    throw new EngineError(
      'argument',
      `${quote(text)} transfers no electrons, so it has no thermoneutral voltage; give a redox reaction such as "H2O -> H2 + 1/2 O2".`,
      'reaction',
    );
  }
  needEntropy(e, 'The thermoneutral voltage', text);
  return (e.enthalpyKJ! * 1000) / (e.n * FARADAY_C_PER_MOL);
}
