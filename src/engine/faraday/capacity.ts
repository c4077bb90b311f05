/**
 * Theoretical specific capacity of an electrode reaction or active material:
 *   q (mAh/g) = n·F / (3.6·m),
 * with n the electrons transferred, F the Faraday constant (C/mol; 1 mAh = 3.6 C)
 * and m the mass (g/mol) on the chosen basis. Molar masses from the IUPAC/CIAAW
 * 2021 abridged standard atomic weights.
 *
 * Bases for a half-reaction (written as a reduction):
 * - `reduced` (default): per mass of the solids on the reduced side (Li for
 *   Li+ + e- -> Li; LiCoO2 for CoO2 + Li+ + e- -> LiCoO2; LiC6 for the graphite
 *   reaction) — the discharged cathode, the charged anode;
 * - `oxidised` (or `oxidized`): per mass of the solids on the oxidised side
 *   (C6 in C6 + Li+ + e- -> LiC6: 372 mAh/g of carbon host);
 * - a species of the reaction, e.g. "C6": per mass of that species times its coefficient.
 * For a species alone ("Li", "LiFePO4") the basis is the electrons per formula
 * unit (a number); a metal element takes its common valence where none is given.
 */
import { EngineError, quote } from '../errors';
import { FARADAY_C_PER_MOL } from '../constants';
import { toNumber } from '../rational';
import { type Species, formatSpecies, parseSpecies, phaseOf, speciesKey } from '../notation/species';
import { stoichiometry, electronsConsumed } from '../notation/reaction';
import { halfReactionOf } from './halfReaction';
import { elementsOf } from '../notation/species';
import { G102_VALENCES } from '../data/alloys';
import { molarMassOfSpecies } from './molarMass';
import { positiveNumber } from '../measurement/guards';

/** mAh per coulomb-hour conversion: 1 mAh = 3.6 C. */
const C_PER_MAH = 3.6;

const REACTION_MARK = /->|→|⟶|=|⇌|<=>|\/|\|/;

/** What a text that is neither an electrode reaction nor a species is told. */
const NOT_ELECTRODE_REACTION =
  'is not an electrode reaction: give a half-reaction with its electrons ("Li+ + e- -> Li"), a couple ("Zn2+/Zn") or an active material ("LiFePO4"). A whole cell has a specific energy, not a specific capacity.';

/**
 * Theoretical specific capacity, mAh/g.
 *
 * Domain: a half-reaction or couple with at least one solid on the basis side, or
 * a species with a positive electron count. Precision: that of the atomic weights.
 *
 * @param text half-reaction ("Li+ + e- -> Li"), couple ("Zn2+/Zn") or species ("LiFePO4")
 * @param basis for a reaction: "reduced" (default), "oxidised" or a species of the reaction;
 *   for a species: electrons per formula unit (number), default the element's common valence
 * @throws EngineError `parse`, `unbalanced`, `argument` (no solid on the basis side, unknown basis, n missing)
 * @example
 * specificCapacityMAhG('Li+ + e- -> Li') // 3861.8
 * specificCapacityMAhG('LiCoO2', 1) // 273.8
 * specificCapacityMAhG('C6 + Li+ + e- -> LiC6', 'oxidised') // 371.9
 */
export function specificCapacityMAhG(text: string, basis?: string | number | null): number {
  if (typeof text !== 'string' || text.trim() === '')
    throw new EngineError(
      'parse',
      'reaction_or_species is empty: give an electrode reaction ("Li+ + e- -> Li") or an active material ("LiFePO4").',
      'reaction_or_species',
    );
  if (!REACTION_MARK.test(text)) return speciesCapacity(text, basis);
  if (typeof basis === 'number')
    throw new EngineError(
      'argument',
      `basis must be "reduced", "oxidised" or a species of the reaction for an electrode reaction; got ${basis}. A number of electrons goes with an active material written alone (e.g. "LiCoO2" with basis 1).`,
      'basis',
    );
  const r = halfReactionOf(text, 'reaction_or_species', NOT_ELECTRODE_REACTION);
  const n = Math.abs(toNumber(electronsConsumed(r)));
  const entries = stoichiometry(r).filter((e) => !e.species.isElectron);
  const b = (basis ?? '').trim();
  const key = b.toLowerCase();
  let massG = 0;
  if (key === '' || key === 'reduced' || key === 'oxidised' || key === 'oxidized') {
    const reducedSide = key === '' || key === 'reduced';
    // reduction as written: products are the reduced side (electrons consumed > 0)
    const forward = toNumber(electronsConsumed(r)) > 0;
    const wantPositive = reducedSide === forward;
    const solids = entries.filter((e) => phaseOf(e.species) === 's' && toNumber(e.nu) > 0 === wantPositive);
    if (solids.length === 0)
      throw new EngineError(
        'argument',
        `${quote(text)} has no solid on its ${reducedSide ? 'reduced' : 'oxidised'} side, so there is no electrode mass for the capacity; choose basis "${reducedSide ? 'oxidised' : 'reduced'}" or name a species of the reaction.`,
        'basis',
      );
    for (const e of solids) massG += Math.abs(toNumber(e.nu)) * molarMassOfSpecies(e.species);
  } else {
    const s = parseSpecies(b, 'basis');
    const e = entries.find((x) => speciesKey(x.species) === speciesKey(s));
    if (!e)
      throw new EngineError(
        'argument',
        `basis ${quote(b)} is not a species of ${quote(text)}; give "reduced", "oxidised" or one of ${entries.map((x) => formatSpecies(x.species)).join(', ')}.`,
        'basis',
      );
    massG = Math.abs(toNumber(e.nu)) * molarMassOfSpecies(e.species);
  }
  return (n * FARADAY_C_PER_MOL) / (C_PER_MAH * massG);
}

function speciesCapacity(text: string, basis: string | number | null | undefined): number {
  const s: Species = parseSpecies(text, 'reaction_or_species');
  let n: number;
  if (basis === undefined || basis === null || basis === '') {
    const els = elementsOf(s);
    const only = els.size === 1 ? Array.from(els.keys())[0]! : null;
    const v = only !== null && els.get(only) === 1 ? G102_VALENCES[only] : undefined;
    if (v === undefined || s.charge !== 0)
      throw new EngineError(
        'argument',
        `Give the electrons per formula unit of ${quote(text)} as basis (e.g. 1), or write its electrode reaction.`,
        'basis',
      );
    n = v;
  } else if (typeof basis === 'number') {
    n = positiveNumber(basis, 'basis', 'electrons per formula unit');
  } else {
    const parsed = Number(basis);
    if (basis.trim() !== '' && Number.isFinite(parsed))
      n = positiveNumber(parsed, 'basis', 'electrons per formula unit');
    else
      throw new EngineError(
        'argument',
        `basis for a species alone is its electrons per formula unit (a number); got ${quote(basis)}. "reduced" and "oxidised" go with an electrode reaction.`,
        'basis',
      );
  }
  return (n * FARADAY_C_PER_MOL) / (C_PER_MAH * molarMassOfSpecies(s));
}
