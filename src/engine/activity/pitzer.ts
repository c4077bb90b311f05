/**
 * The Pitzer ion-interaction model for one salt in water: the mean activity coefficient γ±
 * and the osmotic coefficient φ (Pitzer 1973; Pitzer & Mayorga 1973, 1974), and the
 * Debye–Hückel osmotic slope A_φ(T).
 *
 * For a salt M_ν+ X_ν− of molality m (mol/kg), I = ½ m (ν+ z+² + ν− z−²), ν = ν+ + ν−:
 *
 *   φ − 1   = |z+z−| f^φ + m (2ν+ν−/ν) B^φ + m² (2(ν+ν−)^{3/2}/ν) Cφ
 *   ln γ±   = |z+z−| f^γ + m (2ν+ν−/ν) B^γ + m² (3(ν+ν−)^{3/2}/ν) Cφ
 *   f^φ     = −A_φ √I/(1 + b√I)
 *   f^γ     = −A_φ [√I/(1 + b√I) + (2/b) ln(1 + b√I)]
 *   B^φ     = β0 + β1 e^{−α1√I} + β2 e^{−α2√I}
 *   B^γ     = 2β0 + Σ_k (2βk/(αk² I)) [1 − (1 + αk√I − αk² I/2) e^{−αk√I}]
 *
 * with b = 1.2, α1 = 2 (β2 = 0) for salts with a univalent ion, α1 = 1.4, α2 = 12 for 2:2.
 *
 * A_φ(T): the fit of Møller, Geochim. Cosmochim. Acta 52, 821 (1988) (from memory; 0.39148 at
 * 25 °C, Pitzer 1991 quotes 0.3915), valid 0–250 °C; the engine uses it 0–100 °C.
 */
import { EngineError, quote } from '../errors';
import { PITZER_B, PITZER_BINARY, type PitzerBinaryRow } from '../data/pitzerParameters';
import { parseSalt, type SaltIons } from './salt';
import { finiteResult } from './checks';

/** Options shared by the activity models. */
export interface ActivityOptions {
  /**
   * Accept results outside the model's range of validity (ionic strength, molality or
   * temperature). Without it such a result is an argument error that names the range.
   */
  readonly extrapolate?: boolean;
}

/** The temperature range of the A_φ fit as the engine uses it, °C. */
export const APHI_TEMP_RANGE_C: readonly [number, number] = [0, 100];

/**
 * The Debye–Hückel osmotic coefficient slope A_φ, (kg/mol)^½, at a temperature.
 *
 * Fit of Møller 1988 (from memory): A_φ = 0.336901532 − 6.32100430e-4 T + 9.14252359/T
 * − 1.35143986e-2 ln T + 2.26089488e-3/(T − 263) + 1.92118597e-6 T² + 45.2586464/(680 − T),
 * T in K. Domain 0–100 °C here. A_γ(log10) = 3 A_φ / ln 10.
 *
 * @param tempC temperature in °C
 * @throws EngineError `argument` outside 0–100 °C or not finite
 * @example
 * pitzerAphi(25) // 0.39148
 */
export function pitzerAphi(tempC: number): number {
  checkAphiTemp(tempC);
  return aphiUnchecked(tempC);
}

function checkAphiTemp(tempC: number): void {
  if (
    typeof tempC !== 'number' ||
    !Number.isFinite(tempC) ||
    tempC < APHI_TEMP_RANGE_C[0] ||
    tempC > APHI_TEMP_RANGE_C[1]
  ) {
    throw new EngineError(
      'argument',
      `temp_C must be between 0 and 100 °C for the Pitzer model (the aqueous range of its Debye–Hückel slope, ` +
        `Møller 1988); got ${String(tempC)}.`,
      'temp_C',
    );
  }
}

function aphiUnchecked(tempC: number): number {
  const T = tempC + 273.15;
  return (
    0.336901532 -
    6.3210043e-4 * T +
    9.14252359 / T -
    1.35143986e-2 * Math.log(T) +
    2.26089488e-3 / (T - 263) +
    1.92118597e-6 * T * T +
    45.2586464 / (680 - T)
  );
}

/** A salt with its Pitzer parameters, ready for fast repeated evaluation. */
export interface CompiledPitzerSalt {
  readonly ions: SaltIons;
  readonly row: PitzerBinaryRow;
  /** |z+ z−|. */
  readonly zProduct: number;
  /** I per unit molality: ½ (ν+ z+² + ν− z−²). */
  readonly ionicStrengthPerMolal: number;
  /** 2ν+ν−/ν. */
  readonly bFactor: number;
  /** 2(ν+ν−)^{3/2}/ν (osmotic); the activity term uses 1.5 times it. */
  readonly cFactor: number;
  /** ν = ν+ + ν−. */
  readonly nu: number;
}

const BY_PAIR = new Map<string, PitzerBinaryRow>();
for (const r of PITZER_BINARY) BY_PAIR.set(`${r.cation}|${r.anion}`, r);

/**
 * The binary parameter row of a cation–anion pair, or undefined.
 *
 * @example
 * pitzerPair('Na+', 'Cl-')?.salt // 'NaCl'
 */
export function pitzerPair(cation: string, anion: string): PitzerBinaryRow | undefined {
  return BY_PAIR.get(`${cation}|${anion}`);
}

const SALT_LIST = PITZER_BINARY.map((r) => r.salt).join(', ');
const compiled = new Map<string, CompiledPitzerSalt>();

/**
 * Read a salt and attach its Pitzer parameters and per-salt constants (cached per text).
 *
 * @param saltText the salt formula ("NaCl", "CuSO₄")
 * @throws EngineError `parse`/`argument` for text that is not a salt; `notFound` for a salt
 *   without Pitzer parameters (the message lists the salts held)
 * @example
 * compilePitzerSalt('Na2SO4').bFactor // 4/3
 */
export function compilePitzerSalt(saltText: string): CompiledPitzerSalt {
  const hit = compiled.get(saltText);
  if (hit) return hit;
  const ions = parseSalt(saltText);
  const row = pitzerPair(ions.cation, ions.anion);
  if (row === undefined) {
    throw new EngineError(
      'notFound',
      `no Pitzer parameters are held for ${quote(ions.formula)}; the salts held are ${SALT_LIST}. ` +
        `Use model "davies" below I = 0.5 mol/kg.`,
      'salt',
    );
  }
  const nuP = ions.nuCation;
  const nuN = ions.nuAnion;
  const nu = nuP + nuN;
  const c: CompiledPitzerSalt = {
    ions,
    row,
    zProduct: Math.abs(ions.zCation * ions.zAnion),
    ionicStrengthPerMolal: 0.5 * (nuP * ions.zCation * ions.zCation + nuN * ions.zAnion * ions.zAnion),
    bFactor: (2 * nuP * nuN) / nu,
    cFactor: (2 * Math.pow(nuP * nuN, 1.5)) / nu,
    nu,
  };
  if (compiled.size >= 256) compiled.clear();
  compiled.set(saltText, c);
  return c;
}

/**
 * The binary parameters of a row at a temperature: linear in T from 25 °C with the row's
 * first derivatives where it has them, else the 25 °C values. Writes into `out`.
 */
export function binaryAt(row: PitzerBinaryRow, tempC: number, out: Float64Array): void {
  const d = row.dTemp;
  const dt = tempC - 25;
  out[0] = d ? row.beta0 + d.beta0 * dt : row.beta0;
  out[1] = d ? row.beta1 + d.beta1 * dt : row.beta1;
  out[2] = row.beta2;
  out[3] = d ? row.cphi + d.cphi * dt : row.cphi;
}

function fmt(x: number): string {
  return Number(x.toPrecision(6)).toString();
}

/** Range checks of a single-salt evaluation. */
export function checkSaltRange(c: CompiledPitzerSalt, m: number, tempC: number, extrapolate: boolean): void {
  if (typeof m !== 'number' || !Number.isFinite(m) || m < 0) {
    throw new EngineError(
      'argument',
      `molality must be a finite number ≥ 0 mol/kg; got ${String(m)}.`,
      'molality',
    );
  }
  checkAphiTemp(tempC);
  if (extrapolate) return;
  const r = c.row;
  if (m > r.maxMolalityMolKg) {
    throw new EngineError(
      'argument',
      `molality ${fmt(m)} mol/kg of ${r.salt} is beyond the Pitzer fit (0–${r.maxMolalityMolKg} mol/kg, ${r.source}); ` +
        `no held model covers it: set extrapolate to TRUE to accept an extrapolation.`,
      'molality',
    );
  }
  const [t0, t1] = r.tempRangeC;
  if (tempC < t0 - 1e-9 || tempC > t1 + 1e-9) {
    const range = t0 === t1 ? `${t0} °C only` : `${t0}–${t1} °C`;
    throw new EngineError(
      'argument',
      `temp_C ${fmt(tempC)} °C is outside the range of the Pitzer parameters of ${r.salt} (${range}, ` +
        `${r.dTemp ? r.dTemp.source : r.source}); use ${t0 === t1 ? '25 °C' : 'a temperature in that range'}, ` +
        `model "davies" (0–100 °C, I ≤ 0.5 mol/kg), or set extrapolate to TRUE to use ` +
        `${r.dTemp ? 'the linear temperature dependence beyond its range' : 'the 25 °C parameters'}.`,
      'temp_C',
    );
  }
}

/**
 * ln γ± and φ − 1 of a single salt; arguments already checked. Writes [ln γ±, φ − 1] into
 * `out`. No allocation.
 */
export function pitzerSaltKernel(
  c: CompiledPitzerSalt,
  m: number,
  aphi: number,
  beta0: number,
  beta1: number,
  beta2: number,
  cphi: number,
  out: Float64Array,
): void {
  if (m === 0) {
    out[0] = 0;
    out[1] = 0;
    return;
  }
  const I = c.ionicStrengthPerMolal * m;
  const sI = Math.sqrt(I);
  const bs = 1 + PITZER_B * sI;
  const fphi = (-aphi * sI) / bs;
  const fgam = -aphi * (sI / bs + (2 / PITZER_B) * Math.log(bs));
  const x1 = c.row.alpha1 * sI;
  const e1 = Math.exp(-x1);
  let bphi = beta0 + beta1 * e1;
  let bgam = 2 * beta0 + ((2 * beta1) / (x1 * x1)) * (1 - (1 + x1 - 0.5 * x1 * x1) * e1);
  if (beta2 !== 0) {
    const x2 = c.row.alpha2 * sI;
    const e2 = Math.exp(-x2);
    bphi += beta2 * e2;
    bgam += ((2 * beta2) / (x2 * x2)) * (1 - (1 + x2 - 0.5 * x2 * x2) * e2);
  }
  out[0] = c.zProduct * fgam + m * c.bFactor * bgam + m * m * 1.5 * c.cFactor * cphi;
  out[1] = c.zProduct * fphi + m * c.bFactor * bphi + m * m * c.cFactor * cphi;
}

const scratchParams = new Float64Array(4);
const scratchOut = new Float64Array(2);

/**
 * The arguments of the single-salt functions: the salt formula, its molality m in mol/kg,
 * the temperature in °C (default 25), and `{ extrapolate: true }` to accept results outside
 * the range.
 */
export type PitzerSaltArgs = [
  saltText: string,
  molalityMolKg: number,
  tempC?: number,
  opts?: ActivityOptions,
];

function evaluate(saltText: string, m: number, tempC = 25, opts?: ActivityOptions): CompiledPitzerSalt {
  const c = compilePitzerSalt(saltText);
  checkSaltRange(c, m, tempC, opts?.extrapolate === true);
  binaryAt(c.row, tempC, scratchParams);
  pitzerSaltKernel(
    c,
    m,
    aphiUnchecked(tempC),
    scratchParams[0] as number,
    scratchParams[1] as number,
    scratchParams[2] as number,
    scratchParams[3] as number,
    scratchOut,
  );
  return c;
}

const OSMOTIC_RANGE = 'the Pitzer model gives an osmotic coefficient outside the number range here.';

function finite(x: number, what: string): number {
  if (!Number.isFinite(x) || x <= 0) {
    throw new EngineError(
      'range',
      `the Pitzer model gives ${what} outside the number range here.`,
      'molality',
    );
  }
  return x;
}

/**
 * Mean activity coefficient γ± (molal scale, dimensionless) of a salt by the Pitzer model.
 *
 * Domain: a salt with held parameters (HCl, LiCl, NaCl, KCl, NaOH, KOH, CaCl2, MgCl2, ZnCl2, NiCl2, CuCl2,
 * Na2SO4, K2SO4, MgSO4, CuSO4, ZnSO4, NiSO4, CaSO4); molality 0 to the salt's published
 * limit (mol/kg); temperature within the parameters' range (25 °C for most salts; 0–50 °C
 * for NaCl). Outside those, an argument error unless `extrapolate`. Precision: the model's
 * (against Robinson & Stokes 1959: γ± within 1% for the 1:1 chlorides to 4 mol/kg and 2–3% at
 * 6 mol/kg or for the hydroxides, 1.5% for 2:1, 2.5% for 1:2; for the 2:2 sulfates φ within
 * about 0.02 and the shape γ±(m)/γ±(0.1) within 2.5%, while the table's γ± differ by a
 * constant factor per salt, up to 1.16 for MgSO4 — see docs/data-sources.md); float64
 * evaluation. No allocation after the first call per salt.
 *
 * @param saltText the salt formula
 * @param molalityMolKg the salt's molality m, mol/kg
 * @param tempC temperature in °C (default 25)
 * @param opts `{ extrapolate: true }` to accept results outside the range
 * @throws EngineError `argument` out of range or for bad numbers; `notFound` for a salt
 *   without parameters; `parse` for bad text
 * @example
 * pitzerMeanActivityCoefficient('NaCl', 1) // 0.6576…
 */
export function pitzerMeanActivityCoefficient(...args: PitzerSaltArgs): number {
  evaluate(...args);
  return finite(Math.exp(scratchOut[0] as number), 'an activity coefficient');
}

/**
 * Osmotic coefficient φ (molal, dimensionless) of a salt by the Pitzer model. Domain and
 * range checks as {@link pitzerMeanActivityCoefficient}; precision about ±0.003 for 1:1
 * salts (Pitzer & Mayorga 1973 fit standard deviations are ~0.001–0.003).
 *
 * @param saltText the salt formula
 * @param molalityMolKg the salt's molality m, mol/kg
 * @param tempC temperature in °C (default 25)
 * @param opts `{ extrapolate: true }` to accept results outside the range
 * @throws EngineError as {@link pitzerMeanActivityCoefficient}
 * @example
 * pitzerOsmoticCoefficient('NaCl', 1) // 0.936…
 */
export function pitzerOsmoticCoefficient(...args: PitzerSaltArgs): number {
  evaluate(...args);
  return finiteResult(1 + (scratchOut[1] as number), OSMOTIC_RANGE, 'molality');
}

/**
 * γ± of one salt over a column of molalities at one temperature, written into `out`
 * (allocated when not given). The per-salt constants are computed once; the loop allocates
 * nothing. Every molality is range-checked as in {@link pitzerMeanActivityCoefficient}.
 *
 * @param saltText the salt formula
 * @param molalitiesMolKg molalities, mol/kg
 * @param tempC temperature in °C (default 25)
 * @param opts `{ extrapolate: true }` to accept results outside the range
 * @param out where to write (length ≥ molalities.length)
 * @throws EngineError as {@link pitzerMeanActivityCoefficient}, for the first bad case
 * @example
 * pitzerMeanActivityCoefficients('KCl', [0.1, 1]) // Float64Array [0.770…, 0.604…]
 */
export function pitzerMeanActivityCoefficients(
  saltText: string,
  molalitiesMolKg: ArrayLike<number>,
  tempC = 25,
  opts?: ActivityOptions,
  out?: Float64Array,
): Float64Array {
  const c = compilePitzerSalt(saltText);
  const n = molalitiesMolKg.length;
  const res = out ?? new Float64Array(n);
  const extrapolate = opts?.extrapolate === true;
  checkSaltRange(c, 0, tempC, extrapolate);
  const p = new Float64Array(4);
  binaryAt(c.row, tempC, p);
  const b0 = p[0] as number;
  const b1 = p[1] as number;
  const b2 = p[2] as number;
  const cp = p[3] as number;
  const aphi = aphiUnchecked(tempC);
  const o = new Float64Array(2);
  const max = c.row.maxMolalityMolKg;
  for (let i = 0; i < n; i++) {
    const m = molalitiesMolKg[i] as number;
    if (!(m >= 0 && (m <= max || (extrapolate && m < Infinity)))) checkSaltRange(c, m, tempC, extrapolate);
    pitzerSaltKernel(c, m, aphi, b0, b1, b2, cp, o);
    res[i] = finite(Math.exp(o[0] as number), 'an activity coefficient');
  }
  return res;
}
