/**
 * The ion product of water, Kw = a(H+)·a(OH-)/a(H2O), from the species data
 * (H2O(l) -> H+ + OH-), at 0–100 °C by Gibbs–Helmholtz with constant ΔCp°.
 *
 * A `pH` value sets a(H+) = 10^−pH and, through Kw(T), a(OH-) = Kw(T)·10^pH, so the
 * acid and base forms of a half-reaction give one potential at every pH.
 */
import { parseSpecies } from '../notation/species';
import { GAS_CONSTANT_J_PER_MOL_K } from '../constants';
import { reactionThermo, isComplete, gibbsAtJ, type ReactionThermo } from './reactionThermo';

let water: ReactionThermo | null = null;

function waterIonisation(): ReactionThermo {
  if (!water) {
    const t = reactionThermo([
      { species: parseSpecies('H2O(l)'), nu: -1 },
      { species: parseSpecies('H+'), nu: 1 },
      { species: parseSpecies('OH-'), nu: 1 },
    ]);
    if (!isComplete(t)) throw new Error('species data: water ionisation incomplete');
    water = t;
  }
  return water;
}

let lastT = NaN;
let lastPKw = NaN;

/**
 * pKw = −log10 Kw at a temperature, from the species data.
 *
 * Domain: 0–100 °C. Precision: 13.995 at 25 °C (NBS 1982 data); the constant-ΔCp° model
 * departs from the measured pKw at saturation pressure by up to about 0.05 near 100 °C.
 * @throws EngineError (`argument`) outside 0–100 °C
 * @example
 * pKw(25) // 13.995
 * pKw(60) // 13.04
 */
export function pKw(tempC: number): number {
  if (tempC === lastT) return lastPKw;
  const g = gibbsAtJ(waterIonisation(), tempC);
  const v = g / (GAS_CONSTANT_J_PER_MOL_K * (tempC + 273.15) * Math.LN10);
  lastT = tempC;
  lastPKw = v;
  return v;
}
