/**
 * Activity coefficients of ions in aqueous solution: ionic strength, the Debye–Hückel
 * limiting law, the extended Debye–Hückel equation and the Davies equation, single-ion and
 * mean (salt) coefficients, and activities a = γ·m of a composition row.
 *
 * Units: molalities and ionic strength in mol/kg; temperatures in °C (0–100, the range of
 * the Debye–Hückel constants table); ion sizes in Å; activity coefficients and activities
 * dimensionless (a = γ·m/m°, m° = 1 mol/kg). The Debye–Hückel family gives log10 γ:
 *
 * - `limiting`:  log10 γ = −A z² √I                                  (I below about 0.005 mol/kg)
 * - `extended`:  log10 γ = −A z² √I / (1 + B å √I)                   (I below about 0.1 mol/kg)
 * - `davies`:    log10 γ = −A z² (√I / (1 + √I) − 0.3 I)              (I up to about 0.5 mol/kg)
 *
 * - `pitzer`:    the Pitzer ion-interaction model (./activity/pitzer.ts, ./activity/pitzerMixing.ts);
 *                it needs the composition (a salt and its molality, or a row of species), not
 *                only the ionic strength.
 *
 * Each model's range of validity is data (ACTIVITY_MODEL_RANGES in data/activityData.ts;
 * per-salt limits in data/pitzerParameters.ts). Beyond it every function here throws an
 * argument error naming the range and a better model, unless the caller passes
 * `{ extrapolate: true }`. Neutral species have γ = 1 in every model.
 *
 * Sources: A and B from Freeze & Cherry, Groundwater (1979), Appendix IV; ion sizes from
 * Kielland, J. Am. Chem. Soc. 59, 1675 (1937) (from memory); the Davies equation with 0.3
 * from Davies, Ion Association (1962).
 */
import { EngineError, quote } from './errors';
import { formatSpecies, parseSpecies } from './notation/species';
import { ACTIVITY_MODEL_RANGES, DEBYE_HUCKEL_TABLE, KIELLAND_ION_SIZES } from './data/activityData';
import { pitzerMeanActivityCoefficient, type ActivityOptions } from './activity/pitzer';
import { pitzerMixture } from './activity/pitzerMixing';
import { parseSalt } from './activity/salt';
import { checkCompositionValue, finiteResult } from './activity/checks';
import { isWaterElectrolyteHeader } from './activity/waterActivity';

export type { ActivityOptions } from './activity/pitzer';

/**
 * An activity-coefficient model: Debye–Hückel limiting law (I ≤ 0.005 mol/kg), extended
 * Debye–Hückel (I ≤ 0.1 mol/kg), Davies (I ≤ 0.5 mol/kg), or Pitzer (per salt, up to its
 * published molality limit; needs the composition).
 *
 * @example
 * const model: ActivityModel = parseActivityModel('edh'); // 'extended'
 */
export type ActivityModel = 'limiting' | 'extended' | 'davies' | 'pitzer';

/**
 * The model used where none is given: Davies (it needs no ion size and is the widest-ranging).
 *
 * @example
 * parseActivityModel('') === DEFAULT_ACTIVITY_MODEL // true
 */
export const DEFAULT_ACTIVITY_MODEL: ActivityModel = 'davies';

const MODEL_ALIASES: Readonly<Record<string, ActivityModel>> = {
  limiting: 'limiting',
  limitinglaw: 'limiting',
  dh: 'limiting',
  dhll: 'limiting',
  dhlimiting: 'limiting',
  debyehuckel: 'limiting',
  debyehueckel: 'limiting',
  debyehuckellimiting: 'limiting',
  debyehueckellimiting: 'limiting',
  debyehuckellimitinglaw: 'limiting',
  debyehueckellimitinglaw: 'limiting',
  limitingdebyehuckel: 'limiting',
  extended: 'extended',
  edh: 'extended',
  extendeddh: 'extended',
  dhextended: 'extended',
  extendeddebyehuckel: 'extended',
  extendeddebyehueckel: 'extended',
  debyehuckelextended: 'extended',
  davies: 'davies',
  pitzer: 'pitzer',
  hmw: 'pitzer',
};

const MODEL_HELP =
  'Use "limiting" (Debye–Hückel limiting law, I ≤ 0.005 mol/kg), "extended" (extended Debye–Hückel ' +
  'with an ion size, I ≤ 0.1 mol/kg), "davies" (I ≤ 0.5 mol/kg) or "pitzer" (concentrated salts and ' +
  'mixtures, from the composition); leave it empty for davies.';

/**
 * Read an activity-model name.
 *
 * Domain: any text, or null/undefined/empty for the default, `davies` (chosen because it
 * needs no ion size and covers the widest ionic-strength range). Case, spaces, hyphens,
 * underscores and the umlaut do not matter. Accepted: `limiting`, `limiting law`, `dh`,
 * `dhll`, `debye-huckel`, `debye-hückel`, `debye-hueckel`, `debye-hückel limiting` →
 * `limiting`; `extended`, `edh`, `extended dh`, `extended debye-hückel` → `extended`;
 * `davies` → `davies`; `pitzer`, `hmw` → `pitzer`. An unqualified "Debye–Hückel" means the
 * limiting law.
 *
 * @param text the model as the user wrote it
 * @throws EngineError `argument` for an unknown name, listing the models
 * @example
 * parseActivityModel('Debye-Hückel limiting') // 'limiting'
 * parseActivityModel(undefined) // 'davies'
 */
export function parseActivityModel(text: string | null | undefined): ActivityModel {
  if (text === null || text === undefined) return DEFAULT_ACTIVITY_MODEL;
  const key = String(text)
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[\s\-‐‑–—_'’.]+/g, '');
  if (key === '') return DEFAULT_ACTIVITY_MODEL;
  const m = MODEL_ALIASES[key];
  if (m === undefined) {
    throw new EngineError(
      'argument',
      `model ${quote(String(text))} is not an activity model. ${MODEL_HELP}`,
      'model',
    );
  }
  return m;
}

// ---------------------------------------------------------------------------------------
// Debye–Hückel constants
// ---------------------------------------------------------------------------------------

const TABLE_T = Float64Array.from(DEBYE_HUCKEL_TABLE, (r) => r.tempC);
const TABLE_A = Float64Array.from(DEBYE_HUCKEL_TABLE, (r) => r.a);
const TABLE_B = Float64Array.from(DEBYE_HUCKEL_TABLE, (r) => r.bPerAngstrom);
const T_MIN = TABLE_T[0] as number;
const T_MAX = TABLE_T[TABLE_T.length - 1] as number;

function checkTempC(tempC: number, argName: string): void {
  if (typeof tempC !== 'number' || !Number.isFinite(tempC)) {
    throw new EngineError(
      'argument',
      `${argName} must be a finite temperature in °C between ${T_MIN} and ${T_MAX}; got ${String(tempC)}.`,
      argName,
    );
  }
  if (tempC < T_MIN || tempC > T_MAX) {
    throw new EngineError(
      'argument',
      `${argName} must be between ${T_MIN} and ${T_MAX} °C, the range of the Debye–Hückel constants ` +
        `(Freeze & Cherry 1979; 70–100 °C derived from the dielectric constant of water); got ${tempC} °C.`,
      argName,
    );
  }
}

/** Linear interpolation in one column of the table; tempC already checked. */
function interpolate(column: Float64Array, tempC: number): number {
  const last = TABLE_T.length - 1;
  for (let i = 0; i < last; i++) {
    const t1 = TABLE_T[i + 1] as number;
    if (tempC <= t1) {
      const t0 = TABLE_T[i] as number;
      const v0 = column[i] as number;
      if (tempC === t0) return v0;
      const v1 = column[i + 1] as number;
      return v0 + ((v1 - v0) * (tempC - t0)) / (t1 - t0);
    }
  }
  return column[last] as number;
}

/**
 * The Debye–Hückel constant A for log10 γ, in (mol/kg)^−1/2, at a temperature.
 *
 * Domain: 0 ≤ temp_C ≤ 100. Values at 0, 10, 20, 25, 30, 40, 50, 60 °C are the tabulated
 * ones (Freeze & Cherry 1979, App. IV, 4 decimals); 70, 80, 90, 100 °C are derived from the
 * dielectric constant (Malmberg & Maryott 1956) and density of water (DEBYE_HUCKEL_DERIVATION);
 * between rows, linear interpolation (error below 0.0005, since A is smooth in T). No allocation.
 *
 * @param tempC temperature in °C
 * @throws EngineError `argument` outside 0–100 °C or not finite
 * @example
 * debyeHuckelA(25) // 0.5085
 * debyeHuckelA(15) // 0.5001
 */
export function debyeHuckelA(tempC: number): number {
  checkTempC(tempC, 'temp_C');
  return interpolate(TABLE_A, tempC);
}

/**
 * The Debye–Hückel constant B, in 10^8 cm⁻¹·(mol/kg)^−1/2 (that is, per Å of ion size),
 * at a temperature.
 *
 * Domain: 0 ≤ temp_C ≤ 100; tabulated values (Freeze & Cherry 1979, App. IV; 70–100 °C
 * derived, see {@link debyeHuckelA}) with linear interpolation between them. No allocation.
 *
 * @param tempC temperature in °C
 * @throws EngineError `argument` outside 0–100 °C or not finite
 * @example
 * debyeHuckelB(25) // 0.3281
 */
export function debyeHuckelB(tempC: number): number {
  checkTempC(tempC, 'temp_C');
  return interpolate(TABLE_B, tempC);
}

// ---------------------------------------------------------------------------------------
// Species information (parsed once per text, cached)
// ---------------------------------------------------------------------------------------

let kiellandSizes: Map<string, number> | null = null;

/** Kielland's ion sizes (Å) by canonical ion text, read on first use (not at load). */
function kiellandSize(label: string): number | undefined {
  if (!kiellandSizes) {
    const sizes = new Map<string, number>();
    for (const row of KIELLAND_ION_SIZES) {
      sizes.set(formatSpecies(parseSpecies(row.ion, 'ion'), false), row.sizeAngstrom);
    }
    kiellandSizes = sizes;
  }
  return kiellandSizes.get(label);
}

/** What a species column holds. */
const Kind = { Ion: 0, Neutral: 1, PH: 2 } as const;
type KindValue = (typeof Kind)[keyof typeof Kind];

interface SpeciesInfo {
  readonly kind: KindValue;
  readonly charge: number;
  readonly sizeAngstrom: number | null;
  /** -1 for a `left:` species, +1 for `right:`, 0 unqualified. */
  readonly side: number;
  /** Canonical text for messages. */
  readonly label: string;
}

const infoCache = new Map<string, SpeciesInfo>();
const INFO_CACHE_LIMIT = 4096;
const PH_PATTERN = /^\s*ph\s*$/i;
const SIDE_PATTERN = /^\s*(left|right)\s*:\s*/i;

function speciesInfo(text: string, argName: string): SpeciesInfo {
  const hit = infoCache.get(text);
  if (hit) return hit;
  if (typeof text !== 'string') {
    throw new EngineError(
      'parse',
      `${argName} must be species text such as "Na+"; got ${String(text)}.`,
      argName,
    );
  }
  let info: SpeciesInfo;
  if (PH_PATTERN.test(text)) {
    info = { kind: Kind.PH, charge: 0, sizeAngstrom: null, side: 0, label: 'pH' };
  } else {
    let body = text;
    let side = 0;
    const q = SIDE_PATTERN.exec(text);
    if (q) {
      side = (q[1] as string).toLowerCase() === 'left' ? -1 : 1;
      body = text.slice(q[0].length);
    }
    if (isWaterElectrolyteHeader(body)) {
      throw new EngineError(
        'argument',
        `${argName} ${quote(text)} is a water-activity header of the Nernst functions; here list the ions ` +
          `of the salt (e.g. "Na+", "Cl-") with their molalities, or use WATERACTIVITY for a(H2O).`,
        argName,
      );
    }
    const s = parseSpecies(body, argName);
    if (s.isElectron) {
      throw new EngineError(
        'argument',
        `${argName} ${quote(text)} is the electron, which has no activity in solution; give an ion such as "Na+".`,
        argName,
      );
    }
    const label = formatSpecies(s, false);
    info = {
      kind: s.charge === 0 ? Kind.Neutral : Kind.Ion,
      charge: s.charge,
      sizeAngstrom: s.charge === 0 ? null : (kiellandSize(label) ?? null),
      side,
      label,
    };
  }
  if (infoCache.size >= INFO_CACHE_LIMIT) infoCache.clear();
  infoCache.set(text, info);
  return info;
}

/**
 * Kielland's ion-size parameter å of an ion, in Å, or null where the table has none.
 *
 * Domain: species text in any notation the engine reads ("SO4^2-", "SO₄²⁻", "Fe+++").
 * Values from Kielland, J. Am. Chem. Soc. 59, 1675 (1937) (from memory), to 0.5 Å; Na+ and
 * HCO3- are given a range 4.0–4.5 Å there, and its midpoint 4.25 Å is used. Neutral species
 * return null. Cached per text.
 *
 * @param speciesText the ion
 * @throws EngineError `parse` for text that is not a species
 * @example
 * ionSizeAngstrom('SO4^2-') // 4
 * ionSizeAngstrom('Cu²⁺') // 6
 * ionSizeAngstrom('Zr4+') // null
 */
export function ionSizeAngstrom(speciesText: string): number | null {
  const info = speciesInfo(speciesText, 'ion');
  return info.sizeAngstrom;
}

// ---------------------------------------------------------------------------------------
// Coefficients
// ---------------------------------------------------------------------------------------

function checkIonicStrength(ionicStrength: number, argName: string): void {
  if (typeof ionicStrength !== 'number' || !Number.isFinite(ionicStrength)) {
    throw new EngineError(
      'argument',
      `${argName} must be a finite number ≥ 0 mol/kg; got ${String(ionicStrength)}.`,
      argName,
    );
  }
  if (ionicStrength < 0) {
    throw new EngineError('argument', `${argName} must be ≥ 0 mol/kg; got ${ionicStrength}.`, argName);
  }
}

function checkModel(model: ActivityModel, allowPitzer = false): void {
  if (model === 'pitzer' && !allowPitzer) {
    throw new EngineError(
      'argument',
      'model "pitzer" needs the composition, not only the ionic strength: give the salt and its molality ' +
        '(mean activity coefficient), or the species and molalities of the whole mixture (activities).',
      'model',
    );
  }
  if (model !== 'limiting' && model !== 'extended' && model !== 'davies' && model !== 'pitzer') {
    throw new EngineError(
      'argument',
      `model ${quote(String(model))} is not an activity model. ${MODEL_HELP}`,
      'model',
    );
  }
}

function fmtNumber(x: number): string {
  return Number(x.toPrecision(6)).toString();
}

/**
 * Refuse an ionic strength beyond a Debye–Hückel-family model's range (data:
 * ACTIVITY_MODEL_RANGES), unless extrapolating.
 */
function checkModelRange(
  model: ActivityModel,
  ionicStrength: number,
  opts: ActivityOptions | undefined,
  argName = 'ionic_strength',
): void {
  if (opts?.extrapolate === true || model === 'pitzer') return;
  const r = ACTIVITY_MODEL_RANGES[model];
  if (ionicStrength > r.maxIonicStrengthMolKg) {
    throw new EngineError(
      'argument',
      `${argName} ${fmtNumber(ionicStrength)} mol/kg is outside the range of the ${model} model ` +
        `(I ≤ ${r.maxIonicStrengthMolKg} mol/kg, ${r.source}); use ${r.better}, or set extrapolate to TRUE to accept ` +
        `an extrapolation.`,
      argName,
    );
  }
}

function checkSize(sizeA: number | null | undefined, argName: string): void {
  if (sizeA === null || sizeA === undefined) return;
  if (typeof sizeA !== 'number' || !Number.isFinite(sizeA) || sizeA <= 0) {
    throw new EngineError(
      'argument',
      `${argName} must be a positive ion size in Å (Kielland's values run from 2.5 to 9 Å); got ${String(sizeA)}.`,
      argName,
    );
  }
}

function checkCharge(charge: number, argName: string): void {
  if (typeof charge !== 'number' || !Number.isInteger(charge) || Math.abs(charge) > 12) {
    throw new EngineError(
      'argument',
      `${argName} must be a whole-number ion charge between −12 and 12; got ${String(charge)}.`,
      argName,
    );
  }
}

/** log10 γ; arguments already checked; `sizeA` non-null for the extended model. */
function logGamma(
  z2: number,
  sqrtI: number,
  I: number,
  model: ActivityModel,
  a: number,
  b: number,
  sizeA: number,
): number {
  if (model === 'limiting') return -a * z2 * sqrtI;
  if (model === 'extended') return (-a * z2 * sqrtI) / (1 + b * sizeA * sqrtI);
  return -a * z2 * (sqrtI / (1 + sqrtI) - 0.3 * I);
}

/** 10^logγ, or a `range` error where the model has been pushed past float64. */
function gammaFromLog(logG: number, ionicStrength: number, model: ActivityModel): number {
  const g = Math.pow(10, logG);
  if (!(g > 0) || g === Infinity) {
    throw new EngineError(
      'range',
      `the ${model} model gives an activity coefficient of 10^${logG.toPrecision(4)} at ionic_strength ` +
        `${ionicStrength} mol/kg, outside the number range; the model does not apply there.`,
      'ionic_strength',
    );
  }
  return g;
}

function missingSizeError(what: string, argName: string): EngineError {
  return new EngineError(
    'argument',
    `the extended model needs an ion size for ${what}, and Kielland's table has none: pass ${argName} in Å, ` +
      `or use model "davies", which needs no ion size.`,
    argName,
  );
}

/**
 * The activity coefficient γ of an ion of charge z at ionic strength I.
 *
 * Models (log10 γ; A and B from {@link debyeHuckelA} / {@link debyeHuckelB} at temp_C):
 * - `limiting`: −A z² √I. Valid for I below about 0.005 mol/kg.
 * - `extended`: −A z² √I / (1 + B å √I), å the ion size in Å (required). Valid below about
 *   0.1 mol/kg.
 * - `davies`: −A z² (√I/(1+√I) − 0.3 I). Valid up to about 0.5 mol/kg; no ion size.
 * Beyond those ranges (ACTIVITY_MODEL_RANGES): an argument error naming the range and a
 * better model, unless `opts.extrapolate`. z = 0 gives 1. `pitzer` needs a composition
 * (argument error pointing to the salt and mixture functions).
 *
 * Domain: charge a whole number (|z| ≤ 12); ionic strength finite, ≥ 0 and within the
 * model's range, mol/kg; 0 ≤ temp_C ≤ 100; ion size, where given, > 0 Å (ignored by
 * `limiting` and `davies`). Precision: float64
 * evaluation of the model; the model itself is the limit (see the validity ranges). No
 * allocation.
 *
 * @param charge the ion's charge number z
 * @param ionicStrength I in mol/kg
 * @param model the activity model
 * @param tempC temperature in °C (default 25)
 * @param ionSizeAngstrom å in Å (extended model)
 * @param opts `{ extrapolate: true }` to accept an ionic strength beyond the model's range
 * @throws EngineError `argument` for bad inputs, a missing ion size, or I beyond the
 *   model's range; `range` where an extrapolation leaves the float64 range
 * @example
 * activityCoefficient(1, 0.01, 'davies') // 0.9022…
 * activityCoefficient(2, 0.01, 'extended', 25, 6) // 0.6762…
 */
export function activityCoefficient(
  charge: number,
  ionicStrength: number,
  model: ActivityModel,
  tempC = 25,
  ionSizeAngstrom?: number | null,
  opts?: ActivityOptions,
): number {
  return gammaOfCharge(
    charge,
    ionicStrength,
    model,
    tempC,
    ionSizeAngstrom,
    opts,
    ionSizeAngstrom,
    `charge ${charge}`,
  );
}

/**
 * γ of charge z by a Debye–Hückel-family model, every argument checked. `userSizeA` is the
 * size the caller typed (checked as given); `sizeA` the one used (it may be Kielland's);
 * `sizeLabel` names the ion in the missing-size message.
 */
function gammaOfCharge(
  charge: number,
  ionicStrength: number,
  model: ActivityModel,
  tempC: number,
  userSizeA: number | null | undefined,
  opts: ActivityOptions | undefined,
  sizeA: number | null | undefined,
  sizeLabel: string,
): number {
  checkModel(model);
  checkTempC(tempC, 'temp_C');
  checkIonicStrength(ionicStrength, 'ionic_strength');
  checkModelRange(model, ionicStrength, opts);
  checkCharge(charge, 'charge');
  checkSize(userSizeA, 'ion_size');
  if (charge === 0) return 1;
  let size = 0;
  if (model === 'extended') {
    if (sizeA === null || sizeA === undefined) throw missingSizeError(sizeLabel, 'ion_size');
    size = sizeA;
  }
  const a = interpolate(TABLE_A, tempC);
  const b = model === 'extended' ? interpolate(TABLE_B, tempC) : 0;
  return gammaFromLog(
    logGamma(charge * charge, Math.sqrt(ionicStrength), ionicStrength, model, a, b, size),
    ionicStrength,
    model,
  );
}

/**
 * The activity coefficient γ of an ion given as text; the charge is read from the formula.
 *
 * The extended model uses Kielland's ion size ({@link ionSizeAngstrom}) unless `ion_size`
 * is given; an ion Kielland does not list needs `ion_size`. Neutral species give 1.
 * Models and validity as in {@link activityCoefficient}. Parsing is cached per text, so a
 * sweep over one ion does not re-parse.
 *
 * Domain: `ion` any species text the engine reads ("Cu2+", "SO₄²⁻", "left:Ag+"); ionic
 * strength finite ≥ 0 mol/kg and within the model's range (unless `opts.extrapolate`);
 * 0 ≤ temp_C ≤ 100; ion size > 0 Å where given.
 *
 * @param ionText the ion
 * @param ionicStrength I in mol/kg
 * @param model the activity model (default `davies`)
 * @param tempC temperature in °C (default 25)
 * @param ionSizeAngstrom å in Å, overriding Kielland's value
 * @param opts `{ extrapolate: true }` to accept an ionic strength beyond the model's range
 * @throws EngineError `parse` for bad species text; `argument` for bad numbers, the
 *   electron or "pH", a missing ion size with the extended model, or I beyond the model's
 *   range (e.g. Cu2+ at I = 4.7 mol/kg with Davies); `range` (see above)
 * @example
 * ionActivityCoefficient('Cl-', 0.01, 'extended') // 0.8989…
 * ionActivityCoefficient('SO4^2-', 0.1) // 0.3735… (Davies)
 */
export function ionActivityCoefficient(
  ionText: string,
  ionicStrength: number,
  model: ActivityModel = DEFAULT_ACTIVITY_MODEL,
  tempC = 25,
  ionSizeAngstrom?: number | null,
  opts?: ActivityOptions,
): number {
  const info = speciesInfo(ionText, 'ion');
  if (info.kind === Kind.PH) {
    throw new EngineError('argument', `ion "pH" is not an ion; give the ion itself, e.g. "H+".`, 'ion');
  }
  const size = ionSizeAngstrom ?? info.sizeAngstrom;
  return gammaOfCharge(
    info.charge,
    ionicStrength,
    model,
    tempC,
    ionSizeAngstrom,
    opts,
    size,
    quote(info.label),
  );
}

/**
 * The mean activity coefficient γ± (dimensionless) of a salt, in two forms.
 *
 * **Salt form** `meanActivityCoefficient(salt, molality, [model], [tempC], [opts])`: the salt
 * by formula ("NaCl", "CuSO4", "K2SO4"), its molality m in mol/kg, the model (default
 * `pitzer`). Pitzer uses the salt's parameters (see pitzerMeanActivityCoefficient: held
 * salts, molality limit, temperature range); the Debye–Hückel family uses I = ½ m (ν+ z+² +
 * ν− z−²) and, for `extended`, Kielland's sizes of both ions.
 *
 * **Charge form** `meanActivityCoefficient(z+, z−, I, model, [tempC], [cationSizeA],
 * [anionSizeA], [opts])`: log10 γ± = (ν+ log10 γ+ + ν− log10 γ−)/(ν+ + ν−), with
 * ν+ = |z−|/g and ν− = z+/g (g the greatest common divisor), e.g. Na2SO4: ν+ = 2, ν− = 1.
 * For `limiting` and `davies` this is log10 γ± = −A |z+ z−| f(I); the extended model needs
 * both ion sizes; `pitzer` needs the salt form.
 *
 * Domain: cation charge a positive whole number, anion charge a negative whole number;
 * ionic strength or molality finite ≥ 0 mol/kg and within the model's range (argument error
 * naming the range and a better model unless `opts.extrapolate`); 0 ≤ temp_C ≤ 100.
 * Precision: Pitzer as {@link pitzerMeanActivityCoefficient} (about 1% for 1:1 salts, 2% for
 * 2:1/1:2; the 2:2 sulfates see there); the Debye–Hückel family as {@link activityCoefficient}.
 * No allocation.
 *
 * @throws EngineError `argument` for bad inputs, missing sizes or out of range; `notFound`
 *   for a salt without Pitzer parameters; `parse` for bad salt text; `range` (see above)
 * @example
 * meanActivityCoefficient('NaCl', 0.5) // 0.6796… (Pitzer)
 * meanActivityCoefficient('CuSO4', 0.1, 'pitzer') // 0.1478…
 * meanActivityCoefficient(1, -1, 0.05, 'davies') // 0.8217…
 */
export function meanActivityCoefficient(
  salt: string,
  molalityMolKg: number,
  model?: ActivityModel | null,
  tempC?: number,
  opts?: ActivityOptions,
): number;
export function meanActivityCoefficient(
  cationCharge: number,
  anionCharge: number,
  ionicStrength: number,
  model: ActivityModel,
  tempC?: number,
  cationSizeA?: number | null,
  anionSizeA?: number | null,
  opts?: ActivityOptions,
): number;
export function meanActivityCoefficient(
  first: string | number,
  second: number,
  third?: number | ActivityModel | null,
  fourth?: ActivityModel | number,
  fifth?: number | ActivityOptions,
  cationSizeA?: number | null,
  anionSizeA?: number | null,
  opts?: ActivityOptions,
): number {
  if (typeof first === 'string') {
    return saltMeanActivityCoefficient(
      first,
      second,
      (third ?? 'pitzer') as ActivityModel,
      (fourth ?? 25) as number,
      fifth as ActivityOptions | undefined,
    );
  }
  return chargeMeanActivityCoefficient(
    first,
    second,
    third as number,
    fourth as ActivityModel,
    (fifth ?? 25) as number,
    cationSizeA,
    anionSizeA,
    opts,
  );
}

function saltMeanActivityCoefficient(
  saltText: string,
  molality: number,
  model: ActivityModel,
  tempC: number,
  opts: ActivityOptions | undefined,
): number {
  checkModel(model, true);
  if (model === 'pitzer') return pitzerMeanActivityCoefficient(saltText, molality, tempC, opts);
  const ions = parseSalt(saltText);
  checkIonicStrength(molality, 'molality');
  const I =
    0.5 * molality * (ions.nuCation * ions.zCation * ions.zCation + ions.nuAnion * ions.zAnion * ions.zAnion);
  let sizeP: number | null = null;
  let sizeN: number | null = null;
  if (model === 'extended') {
    sizeP = ionSizeAngstrom(ions.cation);
    sizeN = ionSizeAngstrom(ions.anion);
    if (sizeP === null) throw missingSizeError(quote(ions.cation), 'cation_size');
    if (sizeN === null) throw missingSizeError(quote(ions.anion), 'anion_size');
  }
  return chargeMeanActivityCoefficient(ions.zCation, ions.zAnion, I, model, tempC, sizeP, sizeN, opts);
}

function chargeMeanActivityCoefficient(
  cationCharge: number,
  anionCharge: number,
  ionicStrength: number,
  model: ActivityModel,
  tempC: number,
  cationSizeA: number | null | undefined,
  anionSizeA: number | null | undefined,
  opts: ActivityOptions | undefined,
): number {
  checkModel(model);
  checkTempC(tempC, 'temp_C');
  checkIonicStrength(ionicStrength, 'ionic_strength');
  checkModelRange(model, ionicStrength, opts);
  checkCharge(cationCharge, 'cation_charge');
  checkCharge(anionCharge, 'anion_charge');
  if (!(cationCharge > 0)) {
    throw new EngineError(
      'argument',
      `cation_charge must be positive; got ${cationCharge}.`,
      'cation_charge',
    );
  }
  if (!(anionCharge < 0)) {
    throw new EngineError('argument', `anion_charge must be negative; got ${anionCharge}.`, 'anion_charge');
  }
  checkSize(cationSizeA, 'cation_size');
  checkSize(anionSizeA, 'anion_size');
  let sizeP = 0;
  let sizeN = 0;
  if (model === 'extended') {
    if (cationSizeA === null || cationSizeA === undefined)
      throw missingSizeError('the cation', 'cation_size');
    if (anionSizeA === null || anionSizeA === undefined) throw missingSizeError('the anion', 'anion_size');
    sizeP = cationSizeA;
    sizeN = anionSizeA;
  }
  let g = cationCharge;
  let h = -anionCharge;
  while (h !== 0) {
    const r = g % h;
    g = h;
    h = r;
  }
  const nuP = -anionCharge / g;
  const nuN = cationCharge / g;
  const a = interpolate(TABLE_A, tempC);
  const b = model === 'extended' ? interpolate(TABLE_B, tempC) : 0;
  const sqrtI = Math.sqrt(ionicStrength);
  const logP = logGamma(cationCharge * cationCharge, sqrtI, ionicStrength, model, a, b, sizeP);
  const logN = logGamma(anionCharge * anionCharge, sqrtI, ionicStrength, model, a, b, sizeN);
  return gammaFromLog((nuP * logP + nuN * logN) / (nuP + nuN), ionicStrength, model);
}

// ---------------------------------------------------------------------------------------
// Composition rows
// ---------------------------------------------------------------------------------------

function checkShape(species: readonly string[], values: readonly number[]): void {
  if (species.length !== values.length) {
    throw new EngineError(
      'shape',
      `species has ${species.length} entries but values has ${values.length}; give one value per species.`,
      'values',
    );
  }
}

function checkValue(v: number, info: SpeciesInfo): void {
  checkCompositionValue(v, info.label, info.kind === Kind.PH);
}

/**
 * Ionic strength I = ½ Σ mᵢ zᵢ² of one composition row, in mol/kg.
 *
 * Charges are read from the species formulas. Neutral species (H2O, O2(g), Zn(s) …) and a
 * column named `pH` contribute nothing (a pH value is an activity, not a molality; at pH ≥ 2
 * the H+ it stands for adds less than 0.005 mol/kg; list H+ as its own species where it
 * matters). `left:`/`right:` qualified species are read; a row holding both sides is an
 * error, since the two compartments are different solutions.
 *
 * Domain: equal lengths; values finite and ≥ 0 (pH: any finite number). Precision: float64
 * sum. Parsing is cached per species text; no allocation per call beyond that.
 *
 * @param species species texts (e.g. ["Na+", "SO4^2-"])
 * @param molalities the molalities in mol/kg, one per species
 * @throws EngineError `shape` for a length mismatch; `parse` for bad species text;
 *   `argument` for negative or non-finite values, the electron, or mixed left:/right:
 * @example
 * ionicStrength(['Na+', 'SO4^2-'], [0.2, 0.1]) // 0.3
 * ionicStrength(['Cu2+', 'SO4^2-'], [0.01, 0.01]) // 0.04
 */
export function ionicStrength(species: readonly string[], molalities: readonly number[]): number {
  checkShape(species, molalities);
  let sum = 0;
  let sides = 0;
  for (let i = 0; i < species.length; i++) {
    const info = speciesInfo(species[i] as string, 'species');
    const m = molalities[i] as number;
    checkValue(m, info);
    if (info.side !== 0) {
      if (sides !== 0 && sides !== info.side) {
        throw new EngineError(
          'argument',
          'species holds both left: and right: species, which are two different solutions; compute the ' +
            'ionic strength of each compartment from its own columns, or give ionic_strength.',
          'species',
        );
      }
      sides = info.side;
    }
    if (info.kind === Kind.Ion) sum += m * info.charge * info.charge;
  }
  return finiteResult(
    0.5 * sum,
    'The ionic strength is beyond the number range; check the concentrations (mol/kg).',
    'values',
  );
}

/**
 * Activities aᵢ = γᵢ mᵢ of one composition row.
 *
 * γ of each ion from the model at the row's ionic strength, computed from the same row by
 * {@link ionicStrength} unless `ionicStrength` is given. Neutral species (gases, solids,
 * water, neutral solutes) keep their value (γ = 1); a column named `pH` passes through
 * unchanged (it is already an activity scale). The extended model takes each ion's size
 * from Kielland's table; an ion without one is an error (use `davies`, or {@link
 * ionActivityCoefficient} with an ion size). Models and validity as in
 * {@link activityCoefficient}. With `pitzer`, each ion's γ comes from the Pitzer mixture
 * model of the whole row (single-ion coefficients in the Pitzer/HMW convention; the row must
 * be electrically neutral and every cation–anion pair held; see pitzerMixture), and
 * `givenIonicStrength` must be empty.
 *
 * Domain: equal lengths; values finite ≥ 0 mol/kg (pH any finite number); ionic strength,
 * where given, finite ≥ 0 mol/kg and within the model's range (unless `opts.extrapolate`);
 * 0 ≤ temp_C ≤ 100. Allocates only the result array.
 *
 * @param species species texts, one per value
 * @param values molalities in mol/kg (gas pressures in bar, pH as they are)
 * @param model the activity model
 * @param givenIonicStrength I in mol/kg; null/undefined to compute it from the row
 * @param tempC temperature in °C (default 25)
 * @param opts `{ extrapolate: true }` to accept results beyond the model's range
 * @throws EngineError `shape`, `parse`, `argument`, `range` as described above
 * @example
 * activities(['Na+', 'Cl-'], [0.01, 0.01], 'davies') // [0.009022…, 0.009022…]
 * activities(['pH', 'Fe2+'], [7, 1e-3], 'davies') // [7, 0.000821…] (I = 0.002 from Fe2+ alone)
 */
export function activities(
  species: readonly string[],
  values: readonly number[],
  model: ActivityModel,
  givenIonicStrength?: number | null,
  tempC = 25,
  opts?: ActivityOptions,
): number[] {
  checkShape(species, values);
  checkModel(model, true);
  if (model === 'pitzer') return pitzerActivities(species, values, givenIonicStrength, tempC, opts);
  checkTempC(tempC, 'temp_C');
  let I: number;
  if (givenIonicStrength === null || givenIonicStrength === undefined) {
    I = ionicStrength(species, values);
  } else {
    checkIonicStrength(givenIonicStrength, 'ionic_strength');
    I = givenIonicStrength;
  }
  checkModelRange(model, I, opts);
  const a = interpolate(TABLE_A, tempC);
  const b = model === 'extended' ? interpolate(TABLE_B, tempC) : 0;
  const sqrtI = Math.sqrt(I);
  const n = species.length;
  const out = new Array<number>(n);
  for (let i = 0; i < n; i++) {
    const info = speciesInfo(species[i] as string, 'species');
    const v = values[i] as number;
    checkValue(v, info);
    if (info.kind !== Kind.Ion) {
      out[i] = v;
      continue;
    }
    let size = 0;
    if (model === 'extended') {
      if (info.sizeAngstrom === null) {
        throw new EngineError(
          'argument',
          `the extended model needs an ion size for ${quote(info.label)}, and Kielland's table has none: use ` +
            `model "davies", or ACTCOEF with its ion_size for that ion.`,
          'species',
        );
      }
      size = info.sizeAngstrom;
    }
    const z = info.charge;
    const ai = v * gammaFromLog(logGamma(z * z, sqrtI, I, model, a, b, size), I, model);
    if (!Number.isFinite(ai)) {
      throw new EngineError(
        'range',
        `The activity of ${info.label} is beyond the number range; check its concentration.`,
        'values',
      );
    }
    out[i] = ai;
  }
  return out;
}

function pitzerActivities(
  species: readonly string[],
  values: readonly number[],
  givenIonicStrength: number | null | undefined,
  tempC: number,
  opts: ActivityOptions | undefined,
): number[] {
  if (givenIonicStrength !== null && givenIonicStrength !== undefined) {
    throw new EngineError(
      'argument',
      'the pitzer model computes the ionic strength from the composition; leave ionic_strength empty.',
      'ionic_strength',
    );
  }
  const gamma = pitzerMixture(species, values, tempC, opts).gamma;
  const out = new Array<number>(species.length);
  for (let i = 0; i < species.length; i++) {
    const info = speciesInfo(species[i] as string, 'species');
    const v = values[i] as number;
    out[i] = info.kind === Kind.Ion ? v * (gamma[i] as number) : v;
  }
  return out;
}
