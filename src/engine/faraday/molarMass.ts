/**
 * Molar masses from formulas, with the IUPAC/CIAAW 2021 abridged standard atomic
 * weights. Formulas are read by the notation's one formula reader (countElements).
 */
import { EngineError, quote } from '../errors';
import { countElements } from '../notation/formula';
import { type Species, elementsOf } from '../notation/species';
import { ATOMIC_WEIGHTS, ATOMIC_WEIGHTS_SOURCE } from '../data/atomicWeights';

function fromCounts(counts: ReadonlyMap<string, number>, label: string): number {
  let m = 0;
  for (const [el, n] of counts) {
    const w = ATOMIC_WEIGHTS[el];
    if (w === undefined)
      throw new EngineError(
        'argument',
        `${el} in ${quote(label)} has no standard atomic weight (${ATOMIC_WEIGHTS_SOURCE}); it has no stable isotope.`,
        'reaction',
      );
    m += w * n;
  }
  return m;
}

/**
 * Molar mass of a formula in g/mol (charge and electrons' mass ignored).
 *
 * Precision: as the abridged atomic weights, about 5 significant figures.
 *
 * @throws EngineError (`parse`) for a formula that cannot be read; (`argument`) for an element with no standard atomic weight
 * @example
 * molarMassOfFormula('PbO2') // 239.198
 */
export function molarMassOfFormula(formula: string): number {
  return fromCounts(countElements(formula), formula);
}

/**
 * Molar mass of a parsed species in g/mol (0 for the electron).
 *
 * @example
 * molarMassOfSpecies(parseSpecies('SO4^2-')) // 96.056
 */
export function molarMassOfSpecies(s: Species): number {
  if (s.isElectron) return 0;
  return fromCounts(elementsOf(s), s.formula);
}
