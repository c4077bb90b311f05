/**
 * Theoretical specific energy of a cell reaction:
 *   w (Wh/kg) = n·F·E° / (3.6·Σ νᵢ·Mᵢ),
 * over the reactants as written (electrolyte included, e.g. the sulfuric acid of
 * the lead–acid cell), with E° and n of the engine's resolution of the reaction
 * (standard potentials through the potentials table). 1 Wh/kg = 3.6 J/g.
 *
 * A strong acid written by formula (Pb + PbO2 + 2 H2SO4 -> 2 PbSO4 + 2 H2O), or a
 * strong base or salt written with (aq) (ZnSO4(aq)), is read as its ions for the
 * resolution (2 H2SO4 as 4 H+ + 2 SO4^2-); the mass is the same either way. A salt
 * with no phase written is read as a solid (PbSO4), as everywhere in the notation.
 */
import { EngineError, quote } from '../errors';
import { FARADAY_C_PER_MOL } from '../constants';
import { toNumber, mul, rat } from '../rational';
import { type Term, type Reaction, formatReaction } from '../notation/reaction';
import { parseNotation } from '../notation/notation';
import { splitElectrolyte } from '../notation/electrolytes';
import { phaseOf } from '../notation/species';
import { resolvedReaction } from '../cache';
import { standardPotentialV, electronCount } from '../table/resolve';
import { molarMassOfSpecies } from './molarMass';
import { AQUEOUS_RANGE_C, celsiusInRange } from '../measurement/guards';

/**
 * The reaction with every neutral strong electrolyte written by formula (no phase
 * or `(aq)`) replaced by its ions, or the reaction itself where there is none.
 *
 * @example
 * formatReaction(asIons(parseReaction('Pb + PbO2 + 2 H2SO4 -> 2 PbSO4 + 2 H2O')))
 * // 'Pb + PbO2 + 4 H+ + 2 SO4^2- -> 2 PbSO4 + 2 H2O'
 */
export function asIons(r: Reaction): Reaction {
  let changed = false;
  const split = (terms: readonly Term[]): Term[] =>
    terms.flatMap((t) => {
      const s = t.species;
      // written (aq), or no phase and inferred aqueous (acids: H2SO4, HCl); a salt with no
      // phase is inferred solid (PbSO4) and stays as written
      if (s.isElectron || s.charge !== 0 || phaseOf(s) !== 'aq') return [t];
      const ions = splitElectrolyte(s.formula);
      if (!ions) return [t];
      changed = true;
      return ions.map(({ ion, count }) => ({
        coefficient: mul(t.coefficient, rat(BigInt(count), 1n)),
        species: ion,
        activity: null,
      }));
    });
  const out = { reactants: split(r.reactants), products: split(r.products) };
  return changed ? out : r;
}

/** E°, n and reactant mass of a cell reaction, for the specific energy. */
export interface CellEnergyPlan {
  readonly e0V: number;
  readonly electrons: number;
  readonly reactantMassG: number;
}

/**
 * E° (V) at a temperature, electrons and reactant mass (g per reaction as written).
 *
 * @throws EngineError `parse`, `unbalanced`, `notFound`, `ambiguous`; `argument` for a half-reaction
 */
export function cellEnergyPlan(text: string, tempC = 25): CellEnergyPlan {
  const notation = parseNotation(text, 'cell_reaction');
  let reactants: readonly Term[];
  let resolveText: string;
  if (notation.kind === 'reaction') {
    reactants = notation.reaction.reactants;
    const ionic = asIons(notation.reaction);
    resolveText = ionic === notation.reaction ? text : formatReaction(ionic);
  } else if (notation.kind === 'cell') {
    resolveText = text;
    reactants = [];
  } else {
    throw new EngineError(
      'argument',
      `${quote(text)} is ${notation.kind === 'half' ? 'a half-reaction' : 'a couple'}; the specific energy needs a whole cell reaction ("Zn + Cu2+ -> Zn2+ + Cu") or a cell diagram; one electrode has a specific capacity instead.`,
      'cell_reaction',
    );
  }
  const r = resolvedReaction(resolveText, null);
  if (r.kind !== 'cell')
    throw new EngineError('argument', `${quote(text)} does not resolve to a cell reaction.`, 'cell_reaction');
  if (notation.kind === 'cell') reactants = r.reaction.reactants;
  let mass = 0;
  for (const t of reactants) mass += toNumber(t.coefficient) * molarMassOfSpecies(t.species);
  return { e0V: standardPotentialV(r, tempC), electrons: electronCount(r), reactantMassG: mass };
}

/**
 * Theoretical specific energy, Wh per kg of reactants: n·F·E°/(3.6·Σν·M).
 *
 * Domain: a cell reaction or diagram whose E° > 0 as written; temp_C 0–100 °C
 * (E° moved by the table's dE°/dT where it has one). Precision: that of E° (the
 * table's rounding) and the atomic weights.
 *
 * @throws EngineError (`argument`) where E° ≤ 0 as written (the reaction would need energy)
 * @example
 * specificEnergyWhKg('Pb + PbO2 + 2 H2SO4 -> 2 PbSO4 + 2 H2O') // ≈ 170 (E° 2.04 V)
 */
export function specificEnergyWhKg(text: string, tempC = 25): number {
  celsiusInRange(tempC, 'temp_C', AQUEOUS_RANGE_C);
  const p = cellEnergyPlan(text, tempC);
  if (!(p.e0V > 0))
    throw new EngineError(
      'argument',
      `${quote(text)} has E° = ${Number(p.e0V.toFixed(4))} V as written, so it gives no energy; write the discharge reaction (reverse it).`,
      'cell_reaction',
    );
  if (!(p.reactantMassG > 0))
    throw new EngineError('argument', `${quote(text)} has no reactant mass.`, 'cell_reaction');
  return (p.electrons * FARADAY_C_PER_MOL * p.e0V) / (3.6 * p.reactantMassG);
}
