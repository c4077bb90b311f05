/**
 * Molarity (mol/L of solution) to molality (mol/kg of water):
 *   m = c / (ρ − c·M/1000)
 * with ρ the solution density in g/cm³ (= kg/L) and M the salt's molar mass in g/mol.
 * The density is the user's, or interpolated in a held published table.
 */
import { EngineError } from '../errors';
import { countElements } from '../notation/formula';
import { SOLUTION_DENSITIES, type SolutionDensityTable } from '../data/solutionDensities';
import { ATOMIC_WEIGHTS } from '../data/atomicWeights';
import { parseSalt } from './salt';

/**
 * Molar mass of a salt, g/mol, from its formula and the IUPAC/CIAAW standard atomic weights
 * (src/engine/data/atomicWeights.ts, the one atomic-weight table of the engine).
 *
 * @param saltText a salt formula ("NaCl", "CuSO4")
 * @throws EngineError `parse`/`argument` for text that is not a salt
 * @example
 * saltMolarMass('NaCl') // 58.44
 */
export function saltMolarMass(saltText: string): number {
  const ions = parseSalt(saltText);
  let sum = 0;
  for (const [el, n] of countElements(ions.formula)) {
    const w = ATOMIC_WEIGHTS[el];
    if (w === undefined) {
      throw new EngineError('argument', `no atomic weight is held for ${el}.`, 'salt');
    }
    sum += w * n;
  }
  return sum;
}

interface CompiledDensity {
  readonly table: SolutionDensityTable;
  /** molarity of each row, mol/L */
  readonly molarity: Float64Array;
  readonly density: Float64Array;
}

let compiledTables: Map<string, CompiledDensity> | null = null;

/** The held density tables by salt, with their molarities, worked out on first use (not at load). */
function compiledDensities(): Map<string, CompiledDensity> {
  if (compiledTables) return compiledTables;
  const compiled = new Map<string, CompiledDensity>();
  for (const t of SOLUTION_DENSITIES) {
    const M = saltMolarMass(t.salt);
    compiled.set(t.salt, {
      table: t,
      molarity: Float64Array.from(t.rows, ([w, rho]) => ((w / 100) * rho * 1000) / M),
      density: Float64Array.from(t.rows, ([, rho]) => rho),
    });
  }
  compiledTables = compiled;
  return compiled;
}

/**
 * The held density of a salt solution at a molarity, g/cm³, or null where no table is held.
 * Linear interpolation in molarity between the table's rows.
 *
 * @param saltText the salt formula
 * @param molarityMolL c, mol/L
 * @param tempC temperature in °C (the table's use range, e.g. 15–25 °C for a 20 °C table)
 * @throws EngineError `argument` outside the table's concentration or temperature range
 * @example
 * heldSolutionDensity('NaCl', 1.832) // ≈ 1.0707
 */
export function heldSolutionDensity(saltText: string, molarityMolL: number, tempC = 25): number | null {
  const ions = parseSalt(saltText);
  const c = compiledDensities().get(ions.formula);
  if (!c) return null;
  const t = c.table;
  if (tempC < t.useRangeC[0] || tempC > t.useRangeC[1]) {
    throw new EngineError(
      'argument',
      `the held density table of ${t.salt} is for ${t.tempC} °C (used ${t.useRangeC[0]}–${t.useRangeC[1]} °C, ` +
        `${t.source}); at ${tempC} °C give the solution density in g/cm³.`,
      'temp_C',
    );
  }
  const n = c.molarity.length;
  const cMax = c.molarity[n - 1] as number;
  if (molarityMolL > cMax + 1e-12) {
    throw new EngineError(
      'argument',
      `molarity ${molarityMolL} mol/L of ${t.salt} is beyond the held density table (up to ` +
        `${cMax.toFixed(3)} mol/L, ${t.source}); give the solution density in g/cm³.`,
      'molarity',
    );
  }
  for (let i = 1; i < n; i++) {
    const c1 = c.molarity[i] as number;
    if (molarityMolL <= c1) {
      const c0 = c.molarity[i - 1] as number;
      const d0 = c.density[i - 1] as number;
      const d1 = c.density[i] as number;
      return d0 + ((d1 - d0) * (molarityMolL - c0)) / (c1 - c0);
    }
  }
  return c.density[n - 1] as number;
}

/**
 * Molality m (mol/kg of water) of a salt solution from its molarity c (mol/L of solution):
 * m = c / (ρ − c·M/1000), ρ in g/cm³.
 *
 * Domain: c finite ≥ 0 mol/L; ρ, where given, 0.5–3 g/cm³ and larger than c·M/1000 (the
 * salt's own mass per litre); without ρ, a held density table (NaCl, KCl: CRC Handbook,
 * 20 °C, used 15–25 °C, to near saturation), else an argument error asking for ρ.
 * Precision: that of ρ (±0.0005 g/cm³ from the table gives about ±0.05% in m).
 *
 * @param saltText the salt formula
 * @param molarityMolL c, mol/L of solution
 * @param densityGcm3 solution density ρ, g/cm³ (optional)
 * @param tempC temperature in °C (default 25; used to check the held table)
 * @throws EngineError `argument` for bad numbers, no density, or out of the table
 * @example
 * molalityFromMolarity('NaCl', 1, 1.0369) // 1.0235… mol/kg
 */
export function molalityFromMolarity(
  saltText: string,
  molarityMolL: number,
  densityGcm3?: number | null,
  tempC = 25,
): number {
  if (typeof molarityMolL !== 'number' || !Number.isFinite(molarityMolL) || molarityMolL < 0) {
    throw new EngineError(
      'argument',
      `molarity must be a finite number ≥ 0 mol/L; got ${String(molarityMolL)}.`,
      'molarity',
    );
  }
  if (typeof tempC !== 'number' || !Number.isFinite(tempC)) {
    throw new EngineError(
      'argument',
      `temp_C must be a finite temperature in °C; got ${String(tempC)}.`,
      'temp_C',
    );
  }
  const M = saltMolarMass(saltText);
  let rho: number;
  if (densityGcm3 === null || densityGcm3 === undefined) {
    const held = heldSolutionDensity(saltText, molarityMolL, tempC);
    if (held === null) {
      const have = SOLUTION_DENSITIES.map((t) => t.salt).join(', ');
      throw new EngineError(
        'argument',
        `no density table is held for ${parseSalt(saltText).formula} (held: ${have}); give the solution density in g/cm³.`,
        'density_g_cm3',
      );
    }
    rho = held;
  } else {
    if (
      typeof densityGcm3 !== 'number' ||
      !Number.isFinite(densityGcm3) ||
      densityGcm3 < 0.5 ||
      densityGcm3 > 3
    ) {
      throw new EngineError(
        'argument',
        `density_g_cm3 must be a solution density between 0.5 and 3 g/cm³; got ${String(densityGcm3)}.`,
        'density_g_cm3',
      );
    }
    rho = densityGcm3;
  }
  const water = rho - (molarityMolL * M) / 1000;
  if (!(water > 0.05)) {
    throw new EngineError(
      'argument',
      `a litre of density ${rho} g/cm³ cannot hold ${molarityMolL} mol of ${parseSalt(saltText).formula} ` +
        `(${((molarityMolL * M) / 1000).toFixed(3)} kg of salt); check the molarity and the density.`,
      'density_g_cm3',
    );
  }
  return molarityMolL / water;
}
