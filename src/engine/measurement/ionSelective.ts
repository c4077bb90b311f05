/**
 * Response of an ion-selective electrode by the Nikolsky–Eisenman equation
 * (IUPAC Recommendations 1994/2000 on potentiometric selectivity, from memory):
 *
 *   E = E0 + (S/zᵢ) · log10( aᵢ + Σⱼ Kᵢⱼ · aⱼ^(zᵢ/zⱼ) )
 *
 * with S the slope in V per decade for a singly charged ion (RT ln10/F = 0.05916 V
 * at 25 °C for an ideal electrode), zᵢ the charge of the primary ion, Kᵢⱼ the
 * potentiometric selectivity coefficients and a the activities.
 */
import { EngineError, quote } from '../errors';
import { parseSpecies } from '../notation/species';
import { finiteNumber, potentialInVolts } from './guards';

/**
 * Nikolsky–Eisenman potential, V.
 *
 * Domain: E0_V and slope_V within ±10 V (slope per decade for z = 1, > 0);
 * species[0] the primary ion, the rest interferents of the same sign of charge;
 * activities ≥ 0 with the primary's > 0 or some interferent's > 0; selectivities ≥ 0,
 * one per interferent.
 *
 * @example
 * iseResponseV(0.1, 0.05916, ['K+', 'Na+'], [1e-3, 0.1], [1e-3]) // 0.1 + 0.05916·log10(1.1e-3)
 */
export function iseResponseV(
  e0V: number,
  slopeV: number,
  species: readonly string[],
  activities: readonly unknown[],
  selectivities: readonly unknown[],
): number {
  potentialInVolts(e0V, 'E0_V');
  potentialInVolts(slopeV, 'slope_V');
  if (!(slopeV > 0))
    throw new EngineError(
      'argument',
      `slope_V must be positive (V per decade for a singly charged ion, e.g. 0.05916); got ${slopeV}. The sign follows the primary ion's charge.`,
      'slope_V',
    );
  if (slopeV > 0.2)
    throw new EngineError(
      'argument',
      `slope_V of ${slopeV} V per decade is far above the ideal 0.059 V; give it in volts (for ${slopeV} mV write ${slopeV / 1000}).`,
      'slope_V',
    );
  if (species.length === 0)
    throw new EngineError('argument', 'primary is empty: give the primary ion, e.g. "K+".', 'primary');
  const ions = species.map((t) => parseSpecies(t, 'primary'));
  const zi = ions[0]!.charge;
  if (zi === 0)
    throw new EngineError('argument', `The primary ion ${quote(species[0]!)} has no charge.`, 'primary');
  ions.forEach((s, j) => {
    if (j > 0 && Math.sign(s.charge) !== Math.sign(zi))
      throw new EngineError(
        'argument',
        `Interfering ion ${quote(species[j]!)} must carry a charge of the same sign as the primary ion ${quote(species[0]!)}.`,
        'primary',
      );
  });
  if (activities.length !== ions.length)
    throw new EngineError(
      'shape',
      `activities has ${activities.length} values for ${ions.length} ions; give one activity per ion (primary first).`,
      'activities',
    );
  let ks: readonly unknown[] = selectivities;
  if (ks.length === ions.length && ks[0] === 1) ks = ks.slice(1);
  if (ks.length !== ions.length - 1)
    throw new EngineError(
      'shape',
      `selectivities has ${selectivities.length} values for ${ions.length - 1} interfering ions; give one K per interfering ion.`,
      'selectivities',
    );
  const act = activities.map((v, j) => {
    if (typeof v !== 'number' || !Number.isFinite(v) || v < 0)
      throw new EngineError(
        'argument',
        `The activity of ${quote(species[j]!)} must be a number ≥ 0; got ${typeof v === 'string' ? quote(v) : String(v)}.`,
        'activities',
      );
    return v;
  });
  let sum = act[0]!;
  for (let j = 1; j < ions.length; j++) {
    const k = ks[j - 1];
    if (typeof k !== 'number' || !Number.isFinite(k) || k < 0)
      throw new EngineError(
        'argument',
        `The selectivity coefficient for ${quote(species[j]!)} must be a number ≥ 0; got ${typeof k === 'string' ? quote(k) : String(k)}.`,
        'selectivities',
      );
    sum += k * Math.pow(act[j]!, zi / ions[j]!.charge);
  }
  if (!(sum > 0))
    throw new EngineError(
      'argument',
      'The activities and selectivities give no response (all zero); give the primary ion a positive activity.',
      'activities',
    );
  const e = e0V + (slopeV / zi) * Math.log10(finiteNumber(sum, 'activities'));
  return e;
}
