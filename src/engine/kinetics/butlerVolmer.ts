/**
 * Electrode kinetics: the Butler–Volmer equation with an optional mass-transfer
 * limit, its inverse, and the Tafel slope.
 *
 * Sign convention (IUPAC): anodic current and overpotential positive.
 *   i = i0 · [exp(αa·f·η) − exp(−αc·f·η)],  f = F/(RT),  αc = 1 − αa by default.
 * With limiting currents i_lim,a (anodic) and i_lim,c (cathodic, magnitude), the
 * surface concentrations scale the two terms by (1 − i/i_lim,a) and (1 + i/i_lim,c)
 * (Bard & Faulkner, Electrochemical Methods, 2nd ed. 2001, eq. 3.4.10, from memory;
 * there written with cathodic current positive), which solved for i gives
 *   i = i0·[e^{αa f η} − e^{−αc f η}] / (1 + i0·e^{αa f η}/i_lim,a + i0·e^{−αc f η}/i_lim,c).
 * A limit left out is infinite (its term drops). The form is evaluated with the
 * larger exponent factored out, so it never overflows for |η| ≤ 10 V.
 *
 * Tafel slope b = ln10·RT/(α·n·F), V per decade (Bard & Faulkner §3.4.3).
 */
import { EngineError } from '../errors';
import { FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K, ZERO_CELSIUS_K } from '../constants';
import { celsiusInRange, finiteNumber, positiveNumber, potentialInVolts } from '../measurement/guards';

/** Temperature range of the kinetics functions, °C (liquid electrolytes). */
export const KINETICS_RANGE_C: readonly [number, number] = [-80, 200];

/** Kinetic parameters of one electrode reaction. */
export interface KineticParams {
  /** exchange current density (any unit; results are in the same unit) */
  readonly i0: number;
  readonly alphaA: number;
  readonly alphaC: number;
  readonly tempC: number;
  /** anodic limiting current density (positive), or Infinity */
  readonly iLimA: number;
  /** cathodic limiting current density (magnitude, positive), or Infinity */
  readonly iLimC: number;
}

function transferCoefficient(x: number, arg: string): number {
  finiteNumber(x, arg);
  if (!(x > 0 && x <= 1))
    throw new EngineError('argument', `${arg} must be a transfer coefficient in (0, 1]; got ${x}.`, arg);
  return x;
}

/**
 * Check and complete the parameters: αc defaults to 1 − αa; limits default to none.
 *
 * @throws EngineError (`argument`) for i0 ≤ 0, α outside (0, 1], a limit ≤ 0, temp_C outside −80…200 °C
 * @example
 * kineticParams(1e-3, 0.5).alphaC // 0.5
 */
export function kineticParams(
  i0: number,
  alphaA: number,
  alphaC?: number | null,
  tempC = 25,
  iLimA?: number | null,
  iLimC?: number | null,
): KineticParams {
  positiveNumber(i0, 'i0', 'exchange current density');
  transferCoefficient(alphaA, 'alpha_a');
  let ac: number;
  if (alphaC === null || alphaC === undefined) {
    if (alphaA >= 1)
      throw new EngineError(
        'argument',
        'alpha_a = 1 leaves alpha_c = 1 − alpha_a = 0; give alpha_c, or an alpha_a below 1.',
        'alpha_a',
      );
    ac = 1 - alphaA;
  } else ac = transferCoefficient(alphaC, 'alpha_c');
  celsiusInRange(tempC, 'temp_C', KINETICS_RANGE_C);
  const la =
    iLimA === null || iLimA === undefined
      ? Infinity
      : positiveNumber(iLimA, 'i_lim', 'anodic limiting current');
  const lc =
    iLimC === null || iLimC === undefined
      ? Infinity
      : positiveNumber(iLimC, 'i_lim', 'cathodic limiting current');
  return { i0, alphaA, alphaC: ac, tempC, iLimA: la, iLimC: lc };
}

function fOf(tempC: number): number {
  return FARADAY_C_PER_MOL / (GAS_CONSTANT_J_PER_MOL_K * (tempC + ZERO_CELSIUS_K));
}

/** The smallest normal float64 (2^−1022); below it a quotient loses digits. */
const SMALLEST_NORMAL = 2.2250738585072014e-308;

/** Current density at an overpotential, without argument checks. */
function currentAt(p: KineticParams, f: number, eta: number): number {
  const a = p.alphaA * f * eta;
  const c = -p.alphaC * f * eta;
  // factor out the larger exponential; expm1 keeps the digits near η = 0
  const hiExp = Math.max(a, c);
  const loExp = Math.min(a, c);
  const sign = a >= c ? 1 : -1;
  const r = Math.exp(loExp - hiExp);
  const mag = -p.i0 * Math.expm1(loExp - hiExp);
  const den =
    Math.exp(-hiExp) + (p.i0 * (a >= c ? 1 : r)) / p.iLimA + (p.i0 * (a >= c ? r : 1)) / p.iLimC;
  const i = (sign * mag) / den;
  if (den >= SMALLEST_NORMAL && Number.isFinite(i)) return i;
  // e^(−max exponent) underflowed or went subnormal (few digits left: a tiny i0 at a
  // large |η|): the same quotient in logs,
  // ln den = logsumexp(−max, ln(i0/i_lim,a) + …, ln(i0/i_lim,c) + …)
  const la = -hiExp;
  const lb = Math.log(p.i0 / p.iLimA) + (a >= c ? 0 : loExp - hiExp);
  const lc = Math.log(p.i0 / p.iLimC) + (a >= c ? loExp - hiExp : 0);
  const m = Math.max(la, lb, lc);
  const lnDen = m + Math.log(Math.exp(la - m) + Math.exp(lb - m) + Math.exp(lc - m));
  return sign * Math.exp(Math.log(mag) - lnDen);
}

/**
 * Butler–Volmer current density at an overpotential, with optional limits.
 *
 * Domain: |eta_V| ≤ 10 V; i0 > 0; α in (0, 1]; temp_C −80…200 °C.
 * Precision: float64, relative ~1e-15 (the exponentials are factored).
 *
 * @example
 * butlerVolmerCurrent(0.05, kineticParams(1e-3, 0.5)) // 2.2681e-3 = 2·i0·sinh(0.5·f·0.05)
 */
export function butlerVolmerCurrent(etaV: number, p: KineticParams): number {
  potentialInVolts(etaV, 'eta_V');
  const i = currentAt(p, fOf(p.tempC), etaV);
  if (!Number.isFinite(i))
    throw new EngineError(
      'range',
      'The current density is beyond the number range; check i0 and eta_V.',
      'eta_V',
    );
  return i;
}

/** Overpotentials searched for the inverse, V. */
const ETA_SEARCH_V = 50;

/**
 * Overpotential (V) that gives a current density: the inverse of
 * {@link butlerVolmerCurrent}. Exact (asinh) for αa = αc without limits; otherwise a
 * bracketed Newton iteration safeguarded by bisection (the current is strictly
 * increasing in η, so the root is unique).
 *
 * Domain: −i_lim,c < i < i_lim,a (strictly); the other domains as for the current.
 * Precision: |Δη| below 1e-15 V·max(1, |η|) or the float64 step.
 *
 * @throws EngineError (`argument`) where i is at or beyond a limiting current
 * @throws EngineError (`range`) where the overpotential would lie beyond ±50 V (e.g. α near 0,
 *   or a subnormal i0 against a unit current); every loop is capped, so it always returns
 * @example
 * overpotentialV(1e-3, kineticParams(1e-3, 0.5)) // 0.024727 V = asinh(0.5)/(0.5·f)
 */
export function overpotentialV(i: number, p: KineticParams): number {
  finiteNumber(i, 'i');
  if (i >= p.iLimA)
    throw new EngineError(
      'argument',
      `i = ${i} is at or beyond the anodic limiting current ${p.iLimA}; no overpotential gives it.`,
      'i',
    );
  if (i <= -p.iLimC)
    throw new EngineError(
      'argument',
      `i = ${i} is at or beyond the cathodic limiting current −${p.iLimC}; no overpotential gives it.`,
      'i',
    );
  const f = fOf(p.tempC);
  if (i === 0) return 0;
  if (p.alphaA === p.alphaC && p.iLimA === Infinity && p.iLimC === Infinity) {
    return withinSearch(Math.asinh(i / (2 * p.i0)) / (p.alphaA * f), i);
  }
  // Bracket [lo, hi] with g(lo) < i < g(hi), g(0) = 0. The first guess comes from the
  // one-sided Tafel form; it may underflow to 0 (a subnormal i) or overflow (α near 0),
  // so it is clamped to [MIN_VALUE, ETA_SEARCH_V] and the doubling is capped: from
  // MIN_VALUE (2^−1074) to 50 V takes at most 1080 doublings.
  let lo: number;
  let hi: number;
  if (i > 0) {
    lo = 0;
    hi = clampGuess(p.iLimA === Infinity ? Math.log1p(i / p.i0) / (p.alphaA * f) : 1e-3);
    for (let k = 0; !(currentAt(p, f, hi) >= i); k++) {
      if (hi >= ETA_SEARCH_V || k >= MAX_BRACKET_STEPS) throw beyondSearch(i);
      lo = hi;
      hi = Math.min(hi * 2, ETA_SEARCH_V);
    }
  } else {
    hi = 0;
    lo = -clampGuess(p.iLimC === Infinity ? Math.log1p(-i / p.i0) / (p.alphaC * f) : 1e-3);
    for (let k = 0; !(currentAt(p, f, lo) <= i); k++) {
      if (lo <= -ETA_SEARCH_V || k >= MAX_BRACKET_STEPS) throw beyondSearch(i);
      hi = lo;
      lo = Math.max(lo * 2, -ETA_SEARCH_V);
    }
  }
  let eta = (lo + hi) / 2;
  for (let k = 0; k < MAX_SOLVE_STEPS; k++) {
    const g = currentAt(p, f, eta) - i;
    if (!Number.isFinite(g))
      throw new EngineError(
        'range',
        `The current density near η = ${eta} V is beyond the number range; check i and i0.`,
        'i',
      );
    if (g === 0) return eta;
    if (g > 0) hi = eta;
    else lo = eta;
    // derivative by a small central difference (the current is smooth and monotone)
    const h = 1e-7;
    const d = (currentAt(p, f, eta + h) - currentAt(p, f, eta - h)) / (2 * h);
    let next = d > 0 && Number.isFinite(d) ? eta - g / d : NaN;
    // every fourth step bisects, so the bracket at least halves per four steps even where
    // Newton creeps (a rounded current far out on a Tafel branch)
    if (!(next > lo && next < hi) || k % 4 === 3) next = (lo + hi) / 2;
    if (
      Math.abs(next - eta) <= 1e-15 * Math.max(1, Math.abs(eta)) ||
      hi - lo <= 1e-15 * Math.max(1, Math.abs(eta)) ||
      next === lo ||
      next === hi
    )
      return next;
    eta = next;
  }
  // Unreachable in float64 (100 bisections shrink a ≤ 50 V bracket below any float
  // spacing), kept as a guard.
  throw new EngineError(
    'range',
    `The overpotential for i = ${i} did not converge in ${MAX_SOLVE_STEPS} steps; check i, i0 and the limits.`,
    'i',
  );
}

/** Cap on the bracket doublings (MIN_VALUE · 2^1100 exceeds ETA_SEARCH_V). */
const MAX_BRACKET_STEPS = 1100;
/** Cap on the safeguarded Newton steps. */
const MAX_SOLVE_STEPS = 400;

function clampGuess(etaV: number): number {
  if (!(etaV > 0)) return Number.MIN_VALUE; // 0 (underflow) or NaN
  return Math.min(etaV, ETA_SEARCH_V); // Infinity or beyond the search
}

function withinSearch(etaV: number, i: number): number {
  if (!(Math.abs(etaV) <= ETA_SEARCH_V)) throw beyondSearch(i);
  return etaV;
}

function beyondSearch(i: number): EngineError {
  return new EngineError(
    'range',
    `The overpotential for i = ${i} is beyond ±${ETA_SEARCH_V} V; check i, i0 and the limits.`,
    'i',
  );
}

/**
 * Tafel slope b = ln10·RT/(α·n·F), V per decade.
 *
 * Domain: α in (0, 1]; n > 0 (default 1); temp_C −80…200 °C.
 *
 * @example
 * tafelSlopeV(0.5) // 0.118319 V/decade at 25 °C
 */
export function tafelSlopeV(alpha: number, tempC = 25, n = 1): number {
  transferCoefficient(alpha, 'alpha');
  celsiusInRange(tempC, 'temp_C', KINETICS_RANGE_C);
  positiveNumber(n, 'n', 'electrons');
  return (Math.LN10 * GAS_CONSTANT_J_PER_MOL_K * (tempC + ZERO_CELSIUS_K)) / (alpha * n * FARADAY_C_PER_MOL);
}
