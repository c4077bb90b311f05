/**
 * Inverse Nernst: the activity of one species (or the pH) that gives a measured
 * potential. The compiled Nernst form is linear in the logarithms,
 *   E = E°(T) − s·(Σ_{k≠u} wₖ log10 aₖ + W·log10 a_u),   s = RT ln10/F,
 * with W the summed weight of the unknown u, so E is a straight line in log10 a_u
 * (or in the pH). The line is read off the engine's own compiled Nernst form at two
 * points and solved exactly:
 *   log10 a_u = (E − E(log a_u = 0)) / (E(1) − E(0)).
 * A zero slope (the species cancels) leaves no unique answer and is refused.
 */
import { EngineError, quote } from '../errors';
import { compiledReaction } from '../cache';
import { bindSpecies, parseSpeciesHeader, potentialV } from '../thermo/nernstForm';
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
  const target = parseSpeciesHeader(unknown);
  if (target.electrolyte !== undefined)
    throw new EngineError(
      'argument',
      `${quote(unknown)} names a salt's molality, which is not solved for: give "H2O" as the unknown to solve for the water activity.`,
      'unknown',
    );
  const form = compiledReaction(reaction, table);
  const isPh = target.kind === 'pH';
  // drop the unknown's own column (and, for pH or H+, the H+, OH- and pH columns)
  const headers: string[] = [];
  const row: unknown[] = [];
  species.forEach((h, i) => {
    const p = parseSpeciesHeader(h);
    const acid = p.key === 'H|1' || (isPh && p.key === 'OH|-1');
    const same =
      p.side === target.side &&
      ((p.key === target.key && p.kind === target.kind) || (acid && (isPh || target.key === 'H|1')));
    if (!same) {
      headers.push(h);
      row.push(values[i]);
    }
  });
  if (species.length === 0) {
    // standard state for the others: a unit activity for each term without an inline value
    for (const t of form.terms) {
      if (t.pure || t.inline !== undefined || t.key === target.key) continue;
      headers.push((t.side ? `${t.side}:` : '') + formatSpecies(t.species, false));
      row.push(1);
    }
  }
  headers.push(unknown.trim());
  row.push(0);
  const col = headers.length - 1;
  const b = bindSpecies(form, headers);
  let bound = false;
  for (let i = 0; i < b.column.length; i++) if (b.column[i] === col) bound = true;
  if (!bound)
    throw new EngineError(
      'argument',
      `${quote(unknown)} does not appear in ${quote(reaction)}${isPh ? ' (it has neither H+ nor OH-)' : ''}; give one of its species: ${b.labels.join(', ')}.`,
      'unknown',
    );
  // E is linear in the unknown's log variable u (log10 a, or the pH): evaluate the compiled
  // Nernst form at u = 0 and u = 1 and solve the line exactly. This goes through the same
  // potentialV as POTENTIAL, so every rule of the binding (a pH setting a(OH-) through Kw)
  // holds here too.
  const at = (x: number): number => {
    row[col] = isPh ? x : Math.pow(10, x);
    return potentialV(b, row, tempC);
  };
  const e0 = at(0);
  const slope = at(1) - e0;
  if (Math.abs(slope) < 1e-12)
    throw new EngineError(
      'argument',
      `The potential of ${quote(reaction)} does not depend on ${quote(unknown)} (its exponents cancel), so no unique value gives E; solve for another species.`,
      'unknown',
    );
  const x = (eV - e0) / slope;
  if (isPh) return { kind: 'pH', value: x, log10Activity: -x };
  if (x > 300 || x < -300)
    throw new EngineError(
      'range',
      `The activity of ${quote(unknown)} that gives ${eV} V is 10^${Number(x.toFixed(2))}, beyond the number range; check E_V and the reference scale.`,
      'E_V',
    );
  return { kind: 'activity', value: Math.pow(10, x), log10Activity: x };
}
