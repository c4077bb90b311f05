/**
 * Liquid-junction potential by the Henderson equation (Henderson, Z. phys. Chem.
 * 59, 118 (1907); in the form of Bard & Faulkner, Electrochemical Methods, 2nd ed.
 * 2001, eq. 2.3.39, from memory), for a junction left | right with linear mixing:
 *
 *   E_j = φ(right) − φ(left)
 *       = (RT/F) · [Σ (λᵢ/zᵢ)(cᵢᴿ − cᵢᴸ)] / [Σ λᵢ(cᵢᴿ − cᵢᴸ)] · ln(Σ λᵢcᵢᴸ / Σ λᵢcᵢᴿ)
 *
 * with λᵢ = |zᵢ|·F·uᵢ the ionic molar conductivities at infinite dilution (25 °C,
 * CRC Handbook) and c in mol/L. Where the two sums of λc are equal the quotient
 * tends to its limit, computed with log1p (no 0/0). Ideal solutions; the
 * temperature enters RT/F only (the conductivities stay those of 25 °C).
 */
import { EngineError, quote } from '../errors';
import { FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K, ZERO_CELSIUS_K } from '../constants';
import { type Species, formatSpecies, parseSpecies } from '../notation/species';
import { splitElectrolyte } from '../notation/electrolytes';
import { LIMITING_IONIC_CONDUCTIVITY_S_CM2_MOL } from '../data/conductivities';
import { AQUEOUS_RANGE_C, celsiusInRange } from './guards';

/** One species column of a junction: the ions it stands for, with their stoichiometric numbers. */
interface JunctionColumn {
  readonly ions: readonly { ion: Species; count: number; lambda: number }[];
}

function lambdaOf(ion: Species, header: string): number {
  const key = formatSpecies(ion, false);
  const l = LIMITING_IONIC_CONDUCTIVITY_S_CM2_MOL[key];
  if (l === undefined)
    throw new EngineError(
      'notFound',
      `No limiting ionic conductivity is listed for ${key} (from ${quote(header)}); listed: ${Object.keys(LIMITING_IONIC_CONDUCTIVITY_S_CM2_MOL).join(', ')}.`,
      'species',
    );
  return l;
}

/**
 * Read the species headers of a junction: ions ("H+", "Cl-") or strong electrolytes
 * by formula ("HCl", "K2SO4"), which stand for their ions at c·ν.
 *
 * @throws EngineError (`parse`, `argument`, `notFound`)
 */
export function junctionColumns(species: readonly string[]): JunctionColumn[] {
  if (species.length === 0)
    throw new EngineError(
      'argument',
      'species is empty: give the ions or salts of the two solutions.',
      'species',
    );
  return species.map((h) => {
    const s = parseSpecies(h, 'species');
    if (s.charge !== 0) return { ions: [{ ion: s, count: 1, lambda: lambdaOf(s, h) }] };
    const ions = splitElectrolyte(s.formula);
    if (!ions)
      throw new EngineError(
        'argument',
        `${quote(h)} is neither an ion nor a strong electrolyte this function splits; give its ions ("K+", "Cl-").`,
        'species',
      );
    return { ions: ions.map(({ ion, count }) => ({ ion, count, lambda: lambdaOf(ion, h) })) };
  });
}

function concentrations(cols: readonly JunctionColumn[], values: readonly unknown[], arg: string) {
  if (values.length !== cols.length)
    throw new EngineError(
      'shape',
      `${arg} has ${values.length} values for ${cols.length} species; give one concentration per species.`,
      arg,
    );
  const byIon = new Map<string, { z: number; lambda: number; c: number }>();
  cols.forEach((col, i) => {
    const v = values[i];
    if (typeof v !== 'number' || !Number.isFinite(v) || v < 0)
      throw new EngineError(
        'argument',
        `${arg} must hold concentrations ≥ 0 in mol/L; got ${typeof v === 'string' ? quote(v) : String(v)} in column ${i + 1}.`,
        arg,
      );
    for (const { ion, count, lambda } of col.ions) {
      const k = formatSpecies(ion, false);
      const prev = byIon.get(k);
      if (prev) prev.c += v * count;
      else byIon.set(k, { z: ion.charge, lambda, c: v * count });
    }
  });
  return byIon;
}

/**
 * Henderson liquid-junction potential E_j = φ(right) − φ(left), V.
 *
 * Domain: concentrations ≥ 0 (mol/L), each solution electroneutral within 1 % and
 * with some ions; temp_C 0–100 °C. Precision: the Henderson model (about 1 mV
 * against measured junctions of simple electrolytes).
 *
 * @example
 * junctionPotentialV(['HCl', 'KCl'], [0.1, 0], [0, 0.1]) // +0.02685 V
 */
export function junctionPotentialV(
  species: readonly string[],
  left: readonly unknown[],
  right: readonly unknown[],
  tempC = 25,
): number {
  celsiusInRange(tempC, 'temp_C', AQUEOUS_RANGE_C);
  const cols = junctionColumns(species);
  const L = concentrations(cols, left, 'left_values');
  const R = concentrations(cols, right, 'right_values');
  const sideCheck = (m: typeof L, arg: string) => {
    let charge = 0;
    let total = 0;
    let cond = 0;
    for (const x of m.values()) {
      charge += x.z * x.c;
      total += Math.abs(x.z) * x.c;
      cond += x.lambda * x.c;
    }
    if (!(total > 0))
      throw new EngineError(
        'argument',
        `${arg} holds no ions; give the concentrations of that solution.`,
        arg,
      );
    if (Math.abs(charge) > 0.01 * total)
      throw new EngineError(
        'argument',
        `The solution of ${arg} is not electroneutral (Σ z·c = ${Number(charge.toPrecision(4))} mol/L); give every ion, or the salts by formula.`,
        arg,
      );
    return cond;
  };
  const sL = sideCheck(L, 'left_values');
  const sR = sideCheck(R, 'right_values');
  let num = 0;
  const keys = new Set([...L.keys(), ...R.keys()]);
  for (const k of keys) {
    const l = L.get(k);
    const r = R.get(k);
    const x = (l ?? r)!;
    num += (x.lambda / x.z) * ((r?.c ?? 0) - (l?.c ?? 0));
  }
  const d = (sR - sL) / sL;
  const h = d === 0 ? 1 : Math.log1p(d) / d;
  const rtf = (GAS_CONSTANT_J_PER_MOL_K * (tempC + ZERO_CELSIUS_K)) / FARADAY_C_PER_MOL;
  return (-rtf * num * h) / sL;
}
