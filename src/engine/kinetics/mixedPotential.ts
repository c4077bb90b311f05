/**
 * Mixed (corrosion) potential of one anodic and one cathodic reaction with Tafel
 * kinetics (Wagner & Traud, Z. Elektrochem. 44, 391 (1938); from memory).
 *
 * Anodic partial current  i_a = i0_a · 10^((E − E_a)/b_a),
 * cathodic partial current |i_c| = i0_c · 10^(−(E − E_c)/b_c),
 * slopes b in V/decade (positive), exchange current densities in one unit.
 * At E_corr the two are equal. Taking log10 of both sides,
 *   log i0_a + (E − E_a)/b_a = log i0_c − (E − E_c)/b_c,
 * which is linear in E:
 *   E_corr = [b_a·b_c·(log i0_c − log i0_a) + b_c·E_a + b_a·E_c] / (b_a + b_c),
 * and substituting back,
 *   log i_corr = [b_a·log i0_a + b_c·log i0_c + (E_c − E_a)] / (b_a + b_c).
 * Both are exact; i_corr is computed from its logarithm, so it never overflows
 * in between.
 *
 * Validity: the Tafel form neglects each reaction's reverse, which holds only
 * where E_a < E_corr < E_c (better: a few b away from each); outside that the
 * function refuses and points to the Butler–Volmer form.
 */
import { EngineError } from '../errors';
import { positiveNumber, potentialInVolts } from '../measurement/guards';

/** E_corr (V, on the scale of E_a and E_c) and i_corr (the unit of i0). */
export interface MixedPotential {
  readonly eCorrV: number;
  readonly iCorr: number;
  readonly log10ICorr: number;
}

/**
 * Corrosion potential and current from two Tafel lines.
 *
 * Domain: potentials within ±10 V; i0 > 0; b > 0 (V/decade; 0.03–0.3 typical);
 * the lines must cross between E_a and E_c.
 *
 * @example
 * mixedPotential(-0.5, 1e-6, 0.06, 0, 1e-7, 0.12) // { eCorrV: -0.37333, iCorr: 1.2915e-4 }
 */
export function mixedPotential(
  eA: number,
  i0A: number,
  bA: number,
  eC: number,
  i0C: number,
  bC: number,
): MixedPotential {
  potentialInVolts(eA, 'E_a');
  positiveNumber(i0A, 'i0_a', 'exchange current density');
  positiveNumber(bA, 'b_a', 'V/decade');
  potentialInVolts(eC, 'E_c');
  positiveNumber(i0C, 'i0_c', 'exchange current density');
  positiveNumber(bC, 'b_c', 'V/decade');
  if (bA > 2 || bC > 2)
    throw new EngineError(
      'argument',
      `Tafel slopes are in V per decade (0.03–0.3 typical); got b_a = ${bA}, b_c = ${bC}. For mV/decade divide by 1000.`,
      bA > 2 ? 'b_a' : 'b_c',
    );
  if (!(eC > eA))
    throw new EngineError(
      'argument',
      `E_c (${eC} V) must lie above E_a (${eA} V): the cathodic reaction can drive the anodic one only then.`,
      'E_c',
    );
  const la = Math.log10(i0A);
  const lc = Math.log10(i0C);
  const eCorr = (bA * bC * (lc - la) + bC * eA + bA * eC) / (bA + bC);
  const logI = (bA * la + bC * lc + (eC - eA)) / (bA + bC);
  if (!(eCorr > eA && eCorr < eC))
    throw new EngineError(
      'argument',
      `The Tafel lines cross at ${Number(eCorr.toFixed(4))} V, outside E_a … E_c (${eA} … ${eC} V), where the reverse reactions are not negligible; solve the full Butler–Volmer currents of both reactions for their balance instead.`,
      'i0_c',
    );
  const iCorr = Math.pow(10, logI);
  if (!(iCorr > 0 && Number.isFinite(iCorr)))
    throw new EngineError('range', `i_corr = 10^${logI} is beyond the number range.`, 'i0_a');
  return { eCorrV: eCorr, iCorr, log10ICorr: logI };
}
