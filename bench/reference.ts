/**
 * The independent side of every benchmark check: the Nernst equation written out by hand,
 * with standard potentials typed in here from their publications (never read from the
 * engine) and the SI 2019 exact constants from the shared test support module.
 *
 * Every output a benchmark times is compared with these functions; a benchmark whose
 * outputs disagree fails instead of printing a figure.
 */
import { F, R } from '../test/engine/support';

/** One half-reaction as the benchmarks pass it in a user potentials table. */
export interface PublishedCouple {
  readonly halfReaction: string;
  /** E° at 25 °C in V vs SHE. */
  readonly e0V: number;
  /** dE°/dT in mV/K. */
  readonly dE0dTmVperK: number;
  readonly source: string;
}

/** Zn2+/Zn. E°: OpenStax Chemistry 2e, Appendix L (−0.7618 V). dE°/dT: Bratsch 1989 (from memory). */
export const ZINC: PublishedCouple = {
  halfReaction: 'Zn2+ + 2 e- -> Zn',
  e0V: -0.7618,
  dE0dTmVperK: 0.119,
  source: 'OpenStax Chemistry 2e, Appendix L; dE°/dT Bratsch 1989 (from memory)',
};

/** Cu2+/Cu. E°: OpenStax Chemistry 2e, Appendix L (+0.34 V). dE°/dT: Bratsch 1989 (from memory). */
export const COPPER: PublishedCouple = {
  halfReaction: 'Cu2+ + 2 e- -> Cu',
  e0V: 0.34,
  dE0dTmVperK: 0.011,
  source: 'OpenStax Chemistry 2e, Appendix L; dE°/dT Bratsch 1989 (from memory)',
};

/** The Daniell cell: Zn anode (left), Cu cathode (right), two electrons. */
export const DANIELL_DIAGRAM = 'Zn | Zn2+ || Cu2+ | Cu';
export const DANIELL_N = 2;

/**
 * The user potentials table the benchmarks pass (half-reaction | E° (V) | dE°/dT (mV/K) |
 * source), with a header row. A fresh copy per call: Excel hands a custom function a new
 * array for every argument of every call.
 */
export function daniellTableRange(): (string | number)[][] {
  return [
    ['half-reaction', 'E° (V)', 'dE°/dT (mV/K)', 'source'],
    [ZINC.halfReaction, ZINC.e0V, ZINC.dE0dTmVperK, ZINC.source],
    [COPPER.halfReaction, COPPER.e0V, COPPER.dE0dTmVperK, COPPER.source],
  ];
}

/** E° of a couple at tempC by the table's straight line: E°(25 °C) + dE°/dT·(T − 25 °C). */
export function linearE0V(c: PublishedCouple, tempC: number): number {
  return c.e0V + (c.dE0dTmVperK / 1000) * (tempC - 25);
}

/**
 * The Daniell cell EMF by the Nernst equation, E = E°(Cu) − E°(Zn) − (RT/2F)·ln(a(Zn2+)/a(Cu2+)),
 * with T = tempC + 273.15 K.
 */
export function daniellEmfV(aZn: number, aCu: number, tempC: number): number {
  const e0 = linearE0V(COPPER, tempC) - linearE0V(ZINC, tempC);
  return e0 - ((R * (tempC + 273.15)) / (DANIELL_N * F)) * Math.log(aZn / aCu);
}

/** The Nernst term alone, (RT/nF)·ln(aZn/aCu), for checks where E° is the engine's built-in value. */
export function daniellNernstTermV(aZn: number, aCu: number, tempC: number): number {
  return ((R * (tempC + 273.15)) / (DANIELL_N * F)) * Math.log(aZn / aCu);
}

/** R and F as the plain-arithmetic workbook writes them in its formulas (SI 2019 exact products). */
export const GAS_CONSTANT = R;
export const FARADAY = F;

/**
 * Distinct, reproducible inputs: case i's activities spread over 1e-4…1 (a low-discrepancy
 * sequence, so no two cases repeat) and temperatures over 5–60 °C. Invented values.
 */
export function caseInputs(i: number): { aZn: number; aCu: number; tempC: number } {
  const u = ((i + 1) * 0.6180339887498949) % 1;
  const v = ((i + 1) * 0.4142135623730951) % 1;
  const w = ((i + 1) * 0.7320508075688772) % 1;
  return { aZn: Math.pow(10, -4 + 4 * u), aCu: Math.pow(10, -4 + 4 * v), tempC: 5 + 55 * w };
}

/** Tolerance of the checks of results the engine computes in double precision, in V. */
export const CHECK_TOLERANCE_V = 1e-12;
/** Tolerance of cell-by-cell workbook comparisons (spreadsheet arithmetic), in V. */
export const WORKBOOK_TOLERANCE_V = 1e-9;

/** Formats an activity as a diagram writes it, e.g. 0.0123 → "0.0123 M"; keeps every digit. */
export function molar(a: number): string {
  return `${a} M`;
}
