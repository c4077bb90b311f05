/**
 * Corrosion rates from a corrosion current density, by the method of ASTM G102
 * ("Standard Practice for Calculation of Corrosion Rates and Related Information
 * from Electrochemical Measurements"; constants and equations from memory):
 *
 *   CR (mm/y)      = K1 · i_corr · EW / ρ,   K1 = 3.27e-3 mm·g/(µA·cm·y)
 *   MR (g/(m²·d))  = K2 · i_corr · EW,       K2 = 8.954e-3 g·cm²/(µA·m²·d)
 *
 * with i_corr in µA/cm², ρ in g/cm³ and EW the equivalent weight (g per
 * equivalent). The equivalent weight of an alloy is EW = 1 / Σ (nᵢ·fᵢ/Wᵢ), mass
 * fractions fᵢ, atomic weights Wᵢ (CIAAW 2021 abridged) and the valences nᵢ the
 * standard uses.
 */
import { EngineError, quote } from '../errors';
import { ATOMIC_WEIGHTS } from '../data/atomicWeights';
import { ALLOYS, G102_VALENCES, METAL_NAMES, type AlloyRecord } from '../data/alloys';
import { METAL_DENSITIES_G_CM3 } from '../data/metalDensities';
import { isElementSymbol } from '../notation/elements';
import { nonNegativeNumber, positiveNumber } from '../measurement/guards';

/** ASTM G102 K1, mm·g/(µA·cm·y). */
export const G102_K1 = 3.27e-3;
/** ASTM G102 K2, g·cm²/(µA·m²·d). */
export const G102_K2 = 8.954e-3;

/** One element of a composition: mass fraction and the valence used. */
export interface CompositionPart {
  readonly element: string;
  /** mass fraction (0, 1] after normalising */
  readonly fraction: number;
  readonly valence: number;
}

/**
 * Equivalent weight of an alloy by ASTM G102: EW = 1 / Σ (nᵢ·fᵢ/Wᵢ).
 *
 * Domain: mass percentages (or fractions) of elements with a valence in the
 * standard's list; they are normalised to their sum, which must be within 2 % of
 * 100 % (or of 1).
 *
 * @example
 * equivalentWeightOfComposition({ Fe: 70.75, Cr: 19, Ni: 9.25, Mn: 1 }) // 25.12 (304 stainless)
 */
export function equivalentWeightOfComposition(pct: Readonly<Record<string, number>>): number {
  const entries = Object.entries(pct);
  if (entries.length === 0)
    throw new EngineError(
      'argument',
      'The composition is empty; give elements with mass %.',
      'metal_or_alloy',
    );
  let total = 0;
  for (const [el, p] of entries) {
    if (!isElementSymbol(el))
      throw new EngineError(
        'argument',
        `${quote(el)} in the composition is not an element symbol.`,
        'metal_or_alloy',
      );
    if (!(typeof p === 'number' && Number.isFinite(p) && p > 0))
      throw new EngineError(
        'argument',
        `The mass % of ${el} must be a positive number; got ${String(p)}.`,
        'metal_or_alloy',
      );
    total += p;
  }
  const scale = Math.abs(total - 100) <= 2 ? total : Math.abs(total - 1) <= 0.02 ? total : null;
  if (scale === null)
    throw new EngineError(
      'argument',
      `The composition adds up to ${Number(total.toPrecision(6))}; give mass % adding up to 100 (or fractions adding up to 1), with the balance element written out.`,
      'metal_or_alloy',
    );
  let sum = 0;
  for (const [el, p] of entries) {
    const n = G102_VALENCES[el];
    const w = ATOMIC_WEIGHTS[el];
    if (n === undefined || w === undefined)
      throw new EngineError(
        'argument',
        `No valence is listed for ${el}; give the equivalent_weight yourself. Listed: ${Object.keys(G102_VALENCES).join(', ')}.`,
        'metal_or_alloy',
      );
    sum += (n * (p / scale)) / w;
  }
  return 1 / sum;
}

/** A metal or alloy as resolved for a corrosion rate. */
export interface CorrodingMetal {
  readonly name: string;
  readonly equivalentWeight: number;
  readonly densityGcm3: number | null;
  readonly source: string;
}

/** Parse "Fe 70.75, Cr 19, Ni 9.25, Mn 1" (mass %), or null where the text is not of that form. */
function parseComposition(text: string): Record<string, number> | null {
  const parts = text
    .split(/[,;]/)
    .map((p) => p.trim())
    .filter((p) => p !== '');
  if (parts.length < 2) return null;
  const out: Record<string, number> = {};
  for (const p of parts) {
    const m = /^([A-Z][a-z]?)\s*[:=]?\s*([0-9]*\.?[0-9]+(?:[eE][+-]?\d+)?)\s*%?$/.exec(p);
    if (!m) return null;
    const el = m[1]!;
    out[el] = (out[el] ?? 0) + parseFloat(m[2]!);
  }
  return out;
}

function findAlloy(key: string): AlloyRecord | undefined {
  return ALLOYS.find((a) => a.aliases.includes(key));
}

/**
 * Resolve a metal or alloy: an element symbol ("Fe"), a metal's name ("iron"),
 * an alloy of the list (ASTM G102 Table 1 entries and a few nominal compositions:
 * "carbon steel", "304", "S31600", "C70600", "Alloy 400", "3003"), or a
 * composition in mass % ("Cu 88.6, Ni 10, Fe 1.4").
 *
 * @throws EngineError (`notFound`) for a name not in the list, listing the names
 * @example
 * corrodingMetal('iron').equivalentWeight // 27.92
 */
export function corrodingMetal(text: string): CorrodingMetal {
  const t = text.trim();
  const symbol = isElementSymbol(t) ? t : METAL_NAMES[t.toLowerCase()];
  if (symbol !== undefined) {
    const n = G102_VALENCES[symbol];
    const w = ATOMIC_WEIGHTS[symbol];
    if (n === undefined || w === undefined)
      throw new EngineError(
        'notFound',
        `No valence is listed for ${symbol}; give the equivalent_weight (atomic weight / valence) yourself.`,
        'metal_or_alloy',
      );
    return {
      name: symbol,
      equivalentWeight: w / n,
      densityGcm3: METAL_DENSITIES_G_CM3[symbol] ?? null,
      source: `EW = ${w}/${n} (ASTM G102 method); density from the CRC Handbook (from memory)`,
    };
  }
  const alloy = findAlloy(t.toLowerCase().replace(/\s+/g, ' '));
  if (alloy) {
    return {
      name: alloy.name,
      equivalentWeight: alloy.tabulatedEW ?? equivalentWeightOfComposition(alloy.compositionPct),
      densityGcm3: alloy.densityGcm3,
      source: alloy.source,
    };
  }
  const comp = parseComposition(t);
  if (comp) {
    return {
      name: t,
      equivalentWeight: equivalentWeightOfComposition(comp),
      densityGcm3: null,
      source: 'EW from the composition by the ASTM G102 method',
    };
  }
  throw new EngineError(
    'notFound',
    `${quote(text)} is not a metal or alloy this function knows. Give an element symbol (Fe, Cu, Zn …), one of ${ALLOYS.map((a) => `"${a.aliases[0]!}"`).join(', ')}, a composition such as "Cu 88.6, Ni 10, Fe 1.4", or give density_g_cm3 and equivalent_weight.`,
    'metal_or_alloy',
  );
}

interface RateInputs {
  readonly ew: number;
  readonly rho: number | null;
}

/**
 * The checked inputs of an ASTM G102 rate: the current density (≥ 0), the density and
 * equivalent weight where given (> 0, they override the metal's), and the metal or alloy
 * for what is not given. `needsDensity` is false for the mass-loss rate, which uses the
 * equivalent weight only (a density given is still checked).
 */
function inputs(
  metal: string | null | undefined,
  currentDensityUAcm2: number,
  density: number | null | undefined,
  ew: number | null | undefined,
  needsDensity: boolean,
): RateInputs {
  nonNegativeNumber(currentDensityUAcm2, 'current_density_uA_cm2', 'µA/cm²');
  const hasD = density !== null && density !== undefined;
  const hasE = ew !== null && ew !== undefined;
  if (hasD) positiveNumber(density, 'density_g_cm3', 'g/cm³');
  if (hasE) positiveNumber(ew, 'equivalent_weight', 'g per equivalent');
  const given = hasE && (hasD || !needsDensity);
  if (given) return { ew, rho: hasD ? density : null };
  if (metal === null || metal === undefined || metal.trim() === '')
    throw new EngineError(
      'argument',
      `metal_or_alloy is empty: name the metal or alloy ("Fe", "304"), or give ${needsDensity ? 'both density_g_cm3 and equivalent_weight' : 'equivalent_weight'}.`,
      'metal_or_alloy',
    );
  const m = corrodingMetal(metal);
  return { ew: hasE ? ew : m.equivalentWeight, rho: hasD ? density : m.densityGcm3 };
}

/**
 * Corrosion rate in mm/y: CR = K1·i_corr·EW/ρ (ASTM G102).
 *
 * Domain: current_density_uA_cm2 ≥ 0 (µA/cm²); density and equivalent weight > 0
 * where given (they override the metal's values).
 *
 * @example
 * corrosionRateMmY('Fe', 1) // 0.011601 mm/y
 */
export function corrosionRateMmY(
  metal: string | null | undefined,
  currentDensityUAcm2: number,
  densityGcm3?: number | null,
  equivalentWeight?: number | null,
): number {
  const { ew, rho } = inputs(metal, currentDensityUAcm2, densityGcm3, equivalentWeight, true);
  if (rho === null)
    throw new EngineError(
      'argument',
      `No density is listed for ${quote(metal ?? '')}; give density_g_cm3.`,
      'density_g_cm3',
    );
  return (G102_K1 * currentDensityUAcm2 * ew) / rho;
}

/**
 * Mass loss rate in g/(m²·d): MR = K2·i_corr·EW (ASTM G102). The density is not
 * used (it may be given for symmetry with the corrosion rate).
 *
 * @example
 * massLossRateGm2d('Fe', 1) // 0.25000 g/(m²·d)
 */
export function massLossRateGm2d(
  metal: string | null | undefined,
  currentDensityUAcm2: number,
  densityGcm3?: number | null,
  equivalentWeight?: number | null,
): number {
  return (
    G102_K2 *
    currentDensityUAcm2 *
    inputs(metal, currentDensityUAcm2, densityGcm3, equivalentWeight, false).ew
  );
}
