/**
 * Inverse Nernst: the activity of one species (or the pH) that gives a measured
 * potential. The compiled Nernst form is linear in the logarithms,
 *   E = E°(T) − s·(Σ_{k≠u} wₖ log10 aₖ + W·log10 a_u),   s = RT ln10/F,
 * with W the summed weight of the unknown u, so
 *   log10 a_u = ((E° − E)/s − Σ_{k≠u} wₖ log10 aₖ) / W
 * exactly (and pH = −log10 a(H+)). W = 0 (the species cancels) leaves no unique
 * answer and is refused.
 */
import { EngineError, quote } from '../errors';
import { compiledReaction } from '../cache';
import { bindSpecies, parseSpeciesHeader, weightedLogActivity } from '../thermo/nernstForm';
import { standardPotentialV } from '../table/resolve';
import { slopePerElectronAtKelvin, ZERO_CELSIUS_K } from '../constants';
import { formatSpecies } from '../notation/species';
import { AQUEOUS_RANGE_C, celsiusInRange, potentialInVolts } from './guards';

/** What the inverse Nernst found: an activity (or bar for a gas) or a pH, and its log10. */
export interface SolvedUnknown {
  readonly kind: 'activity' | 'pH';
  readonly value: number;
  /** log10 of the activity (for a pH: log10 a(H+) = −pH) */
  readonly log10Activity: number;
}

/**
 * Solve the Nernst equation of a reaction for one species' activity or the pH.
 *
 * Domain: E_V within ±10 V; temp_C 0–100 °C; unknown a species of the reaction
 * (side-qualified for a cell: "left:Ag+") or "pH". The unknown's own column in
 * species/values, if any, is ignored. With no species at all, the others are at
 * standard state (inline activities still apply).
 *
 * @throws EngineError (`argument`) where the unknown is not in the reaction or its exponent is zero; (`range`) where the activity leaves the number range
 * @example
 * solveForUnknown('Cu2+ + 2 e- -> Cu', 0.2778, 'Cu2+', [], [], 25) // a ≈ 0.0100
 */
export function solveForUnknown(
  reaction: string,
  eV: number,
  unknown: string,
  species: readonly string[],
  values: readonly unknown[],
  tempC = 25,
  table: readonly (readonly unknown[])[] | null = null,
): SolvedUnknown {
  potentialInVolts(eV, 'E_V');
  celsiusInRange(tempC, 'temp_C', AQUEOUS_RANGE_C);
  if (typeof unknown !== 'string' || unknown.trim() === '')
    throw new EngineError(
      'argument',
      'unknown is empty: give the species to solve for ("Cu2+") or "pH".',
      'unknown',
    );
  const u = parseSpeciesHeader(unknown);
  const form = compiledReaction(reaction, table);
  const isPh = u.kind === 'pH';
  // drop the unknown's own column (and, for pH or H+, both H+ and pH columns)
  const headers: string[] = [];
  const row: unknown[] = [];
  species.forEach((h, i) => {
    const p = parseSpeciesHeader(h);
    const same = p.key === u.key && p.side === u.side && (p.kind === u.kind || p.key === 'H|1');
    if (!same) {
      headers.push(h);
      row.push(values[i]);
    }
  });
  if (species.length === 0) {
    // standard state for the others: a unit activity for each term without an inline value
    for (const t of form.terms) {
      if (t.pure || t.inline !== undefined || t.key === u.key) continue;
      headers.push((t.side ? `${t.side}:` : '') + formatSpecies(t.species, false));
      row.push(1);
    }
  }
  headers.push(unknown.trim());
  row.push(isPh ? 0 : 1);
  const col = headers.length - 1;
  const b = bindSpecies(form, headers);
  let w = 0;
  let bound = false;
  for (let i = 0; i < b.column.length; i++) {
    if (b.column[i] === col) {
      w += b.weight[i]!;
      bound = true;
    }
  }
  if (!bound)
    throw new EngineError(
      'argument',
      `${quote(unknown)} does not appear in ${quote(reaction)}${isPh ? ' (it has no H+)' : ''}; give one of its species: ${b.labels.join(', ')}.`,
      'unknown',
    );
  if (w === 0 || Math.abs(w) < 1e-12)
    throw new EngineError(
      'argument',
      `The potential of ${quote(reaction)} does not depend on ${quote(unknown)} (its exponents cancel), so no unique value gives E; solve for another species.`,
      'unknown',
    );
  const s = slopePerElectronAtKelvin(tempC + ZERO_CELSIUS_K);
  const rest = weightedLogActivity(b, row);
  const e0 = standardPotentialV(form.resolved, tempC);
  const x = ((e0 - eV) / s - rest) / w;
  if (isPh) return { kind: 'pH', value: -x, log10Activity: x };
  if (x > 300 || x < -300)
    throw new EngineError(
      'range',
      `The activity of ${quote(unknown)} that gives ${eV} V is 10^${Number(x.toFixed(2))}, beyond the number range; check E_V and the reference scale.`,
      'E_V',
    );
  return { kind: 'activity', value: Math.pow(10, x), log10Activity: x };
}
