/**
 * Faraday's law of electrolysis for one half-reaction:
 *   m = Q·M·ν·ε / (n·F)
 * with Q the charge (C), M the molar mass of the deposited (or dissolved) solid,
 * ν its coefficient, n the electrons of the half-reaction as written, ε the current
 * efficiency in (0, 1] and F the Faraday constant (SI 2019 exact).
 *
 * Thickness and time on an area follow from the mass per area ρ·t: ρ in g/cm³
 * times t in µm is g/m² exactly, so with the current density i in A/m²
 *   t(µm) = i·time·M·ν·ε / (n·F·ρ),   time(s) = ρ·t·n·F / (i·M·ν·ε).
 */
import { EngineError, quote } from '../errors';
import { FARADAY_C_PER_MOL } from '../constants';
import { toNumber } from '../rational';
import { type Species, formatSpecies, phaseOf } from '../notation/species';
import { stoichiometry, electronsConsumed } from '../notation/reaction';
import { halfReactionOf } from './halfReaction';
import { molarMassOfSpecies } from './molarMass';
import { fraction, nonNegativeNumber, positiveNumber } from '../measurement/guards';

/** The solid a half-reaction deposits or dissolves, with what Faraday's law needs. */
export interface FaradayPlan {
  /** the solid species */
  readonly solid: Species;
  /** its coefficient in the half-reaction (ν > 0) */
  readonly coefficient: number;
  /** electrons of the half-reaction as written (n > 0) */
  readonly electrons: number;
  /** molar mass of the solid, g/mol */
  readonly molarMassGmol: number;
  /** ν·M/n, g per mole of electrons */
  readonly gramsPerMolElectrons: number;
}

const planCache = new Map<string, FaradayPlan>();

/** What a text that is no half-reaction is told. */
const NOT_HALF =
  'is not a half-reaction: give the electrode reaction with its electrons, e.g. "Cu2+ + 2 e- -> Cu", or a couple such as "Cu2+/Cu".';

/**
 * What Faraday's law needs from a half-reaction (or a couple from the table): the
 * one solid it deposits or dissolves, its coefficient, and the electrons.
 *
 * The solid is the half-reaction's only solid product (what a reduction deposits);
 * where no product is solid, its only solid reactant (what it dissolves, e.g.
 * MnO2 reduced to Mn2+). Solids on both sides (PbSO4 + 2 e- -> Pb + SO4^2-) leave
 * the mass ambiguous and are refused.
 *
 * @throws EngineError `parse`, `unbalanced`; `argument` where the text is not a half-reaction, has no solid or several
 * @example
 * faradayPlan('Cu2+ + 2 e- -> Cu').gramsPerMolElectrons // 31.773
 */
export function faradayPlan(text: string): FaradayPlan {
  const cached = planCache.get(text);
  if (cached) return cached;
  const r = halfReactionOf(text, 'reaction', NOT_HALF);
  const n = toNumber(electronsConsumed(r));
  const entries = stoichiometry(r).filter((e) => !e.species.isElectron && phaseOf(e.species) === 's');
  const products = entries.filter((e) => toNumber(e.nu) > 0);
  const reactants = entries.filter((e) => toNumber(e.nu) < 0);
  const list = (xs: typeof entries) => xs.map((e) => formatSpecies(e.species)).join(', ');
  if (entries.length === 0)
    throw new EngineError(
      'argument',
      `${quote(text)} has no solid species, so nothing is deposited or dissolved; write the metal or solid with (s), e.g. "Cu2+ + 2 e- -> Cu(s)".`,
      'reaction',
    );
  if (products.length > 0 && reactants.length > 0)
    throw new EngineError(
      'ambiguous',
      `${quote(text)} has solids on both sides (${list(reactants)} and ${list(products)}); the mass deposited is not one species' mass. Write the half-reaction of the one solid that forms or dissolves.`,
      'reaction',
    );
  const side = products.length > 0 ? products : reactants;
  if (side.length > 1)
    throw new EngineError(
      'ambiguous',
      `${quote(text)} has several solids on one side (${list(side)}); give a half-reaction with one solid.`,
      'reaction',
    );
  const e = side[0]!;
  const coefficient = Math.abs(toNumber(e.nu));
  const electrons = Math.abs(n);
  const molarMassGmol = molarMassOfSpecies(e.species);
  const plan: FaradayPlan = {
    solid: e.species,
    coefficient,
    electrons,
    molarMassGmol,
    gramsPerMolElectrons: (coefficient * molarMassGmol) / electrons,
  };
  if (planCache.size > 1000) planCache.clear();
  planCache.set(text, plan);
  return plan;
}

/**
 * Mass (g) deposited or dissolved by a charge: m = Q·M·ν·ε/(n·F).
 *
 * Domain: charge_C ≥ 0 (C); efficiency in (0, 1], default 1.
 * Precision: that of the atomic weights (about 5 significant figures).
 *
 * @example
 * depositMassG('Cu2+ + 2 e- -> Cu', 96485.33212) // 31.773 g (half a mole of Cu)
 */
export function depositMassG(reaction: string, chargeC: number, efficiency = 1): number {
  const plan = faradayPlan(reaction);
  nonNegativeNumber(chargeC, 'charge_C', 'C');
  fraction(efficiency, 'efficiency');
  return assertFiniteResult(
    (chargeC * plan.gramsPerMolElectrons * efficiency) / FARADAY_C_PER_MOL,
    'the mass',
  );
}

/**
 * Time (s) to plate a thickness at a current density:
 * time = ρ·t·n·F / (i·M·ν·ε), with ρ·t in g/m² (ρ in g/cm³ times t in µm).
 *
 * Domain: thickness_um ≥ 0; current_density_A_m2 > 0; density_g_cm3 > 0; efficiency in (0, 1].
 *
 * @example
 * plateTimeS('Cu2+ + 2 e- -> Cu', 25, 200, 8.96) // 3400.6 s for 25 µm at 2 A/dm²
 */
export function plateTimeS(
  reaction: string,
  thicknessUm: number,
  currentDensityAm2: number,
  densityGcm3: number,
  efficiency = 1,
): number {
  nonNegativeNumber(thicknessUm, 'thickness_um', 'µm');
  // a time needs a current: zero would never plate the thickness
  positiveNumber(currentDensityAm2, 'current_density_A_m2', 'A/m²');
  const rate = platingRateUmS(reaction, currentDensityAm2, densityGcm3, efficiency);
  return assertFiniteResult(thicknessUm / rate, 'the time');
}

/**
 * Thickness (µm) plated by a current density over a time:
 * t = i·time·M·ν·ε / (n·F·ρ).
 *
 * Domain: current_density_A_m2 ≥ 0; time_s ≥ 0; density_g_cm3 > 0; efficiency in (0, 1].
 *
 * @example
 * thicknessUm('Cu2+ + 2 e- -> Cu', 200, 3600, 8.96) // 26.47 µm
 */
export function thicknessUm(
  reaction: string,
  currentDensityAm2: number,
  timeS: number,
  densityGcm3: number,
  efficiency = 1,
): number {
  const rate = platingRateUmS(reaction, currentDensityAm2, densityGcm3, efficiency);
  return assertFiniteResult(rate * nonNegativeNumber(timeS, 'time_s', 's'), 'the thickness');
}

/**
 * The rate (µm/s) at which a current density plates the solid of `reaction`:
 * i·M·ν·ε / (n·F·ρ), with ρ·t in g/m² (ρ in g/cm³ times t in µm). Checks the plating
 * conditions both plating functions share: the reaction, current_density_A_m2 ≥ 0,
 * density_g_cm3 > 0 and efficiency in (0, 1].
 */
function platingRateUmS(
  reaction: string,
  currentDensityAm2: number,
  densityGcm3: number,
  efficiency: number,
): number {
  const plan = faradayPlan(reaction);
  nonNegativeNumber(currentDensityAm2, 'current_density_A_m2', 'A/m²');
  positiveNumber(densityGcm3, 'density_g_cm3', 'g/cm³');
  fraction(efficiency, 'efficiency');
  return (currentDensityAm2 * plan.gramsPerMolElectrons * efficiency) / (FARADAY_C_PER_MOL * densityGcm3);
}

/** A finite result, or a range error naming what overflowed. */
export function assertFiniteResult(x: number, what: string): number {
  if (!Number.isFinite(x))
    throw new EngineError('range', `${what} is beyond the number range; check the inputs.`, what);
  return x;
}
