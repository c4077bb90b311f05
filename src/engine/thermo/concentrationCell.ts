/**
 * Concentration cells: two like electrodes that differ only in one species'
 * activity (or a gas's pressure). EMF = E(right) − E(left); the sign follows
 * from the half-reaction, not from a rule of thumb: for a cation-reversible
 * electrode (Ag+/Ag) the more concentrated side is positive, for an
 * anion-reversible one (AgCl/Ag, Cl-) the more dilute side is.
 */
import { EngineError, quote } from '../errors';
import { formatSpecies } from '../notation/species';
import { kelvinFromCelsius, slopePerElectronAtKelvin } from '../constants';
import { type NernstForm, parseSpeciesHeader } from './nernstForm';

/** The term of the varied species in a half-reaction's Nernst form. */
export interface ConcentrationCellPlan {
  readonly label: string;
  readonly weight: number;
  readonly gas: boolean;
}

/**
 * Choose the species that differs between the two electrodes.
 *
 * @param speciesText the species named by the user, or null to take the only one that can vary
 * @throws EngineError where the couple has no such species, or several and none was named
 */
export function planConcentrationCell(form: NernstForm, speciesText: string | null): ConcentrationCellPlan {
  if (form.resolved.kind !== 'half') {
    throw new EngineError(
      'argument',
      'couple must be one electrode (a couple or half-reaction such as "Ag+/Ag"), not a cell.',
      'couple',
    );
  }
  const variable = form.terms.filter((t) => !t.pure);
  if (speciesText !== null && speciesText.trim() !== '') {
    const h = parseSpeciesHeader(speciesText);
    const t = form.terms.find((x) => x.key === h.key);
    if (!t) {
      throw new EngineError(
        'argument',
        `species ${quote(speciesText)} is not in ${form.resolved.text}; choose one of ${variable.map((x) => formatSpecies(x.species, false)).join(', ')}.`,
        'species',
      );
    }
    return { label: formatSpecies(t.species, false), weight: t.weight, gas: t.gas };
  }
  if (variable.length !== 1) {
    throw new EngineError(
      'argument',
      variable.length === 0
        ? `${form.resolved.text} has no species whose activity can differ (all are pure phases).`
        : `${form.resolved.text} has ${variable.length} species that could differ (${variable.map((x) => formatSpecies(x.species, false)).join(', ')}); name one in the species argument.`,
      'species',
    );
  }
  const t = variable[0]!;
  return { label: formatSpecies(t.species, false), weight: t.weight, gas: t.gas };
}

/**
 * EMF (V) of the concentration cell: −(RT ln10/F)·w·(log10 a_right − log10 a_left).
 *
 * @example
 * concentrationCellEmfV(plan /* Ag+/Ag *\/, 0.01, 0.1, 25) // +0.05916 V
 */
export function concentrationCellEmfV(
  plan: ConcentrationCellPlan,
  valueLeft: number,
  valueRight: number,
  tempC: number,
): number {
  const check = (v: number, arg: string) => {
    if (!Number.isFinite(v) || !(v > 0)) {
      throw new EngineError(
        'argument',
        `${arg} must be a positive ${plan.gas ? 'partial pressure in bar' : 'activity'} of ${plan.label}; got ${String(v)}.`,
        arg,
      );
    }
  };
  check(valueLeft, 'value_left');
  check(valueRight, 'value_right');
  const s = slopePerElectronAtKelvin(kelvinFromCelsius(tempC));
  return -s * plan.weight * (Math.log10(valueRight) - Math.log10(valueLeft));
}
