/**
 * The case series' preview values, computed through the catalogue: `callFunction` runs
 * ECHEM.POTENTIAL, the very function the sheet's formula calls, over the same species,
 * values and temperatures, with the user's potentials table where one is chosen (its
 * cells read from the workbook) and the built-in table otherwise. No chemistry here:
 * the slope along the series is read from the computed values, and the Nernst slope
 * comes from ECHEM.NERNSTSLOPE.
 */
import { type Arg, callFunction, type Grid, isCellError, type Result } from '../functions/catalogue';
import type { SweepInput, SweepLayout } from './sweepPlan';
import { sentenceCase } from './sweepPlan';

/** One case's preview value. */
export type PreviewValue =
  { readonly ok: true; readonly e: number } | { readonly ok: false; readonly message: string };

/** The arguments ECHEM.POTENTIAL gets on the sheet, as the catalogue takes them. */
export function potentialArgs(input: SweepInput, layout: SweepLayout, table: Grid | null): Arg[] {
  const species: Arg = layout.headers.length > 0 ? [[...layout.headers]] : undefined;
  const values: Arg = layout.headers.length > 0 ? layout.cases.map((row) => [...row]) : undefined;
  return [input.reaction, species, values, layout.temps.map((t) => [t]), table ?? undefined];
}

function valuesOf(result: Result, count: number): PreviewValue[] {
  const out: PreviewValue[] = [];
  for (let i = 0; i < count; i++) {
    const cell = result.length === 1 ? result[0]?.[0] : result[i]?.[0];
    if (typeof cell === 'number' && Number.isFinite(cell)) out.push({ ok: true, e: cell });
    else if (isCellError(cell)) out.push({ ok: false, message: sentenceCase(cell.message) });
    else out.push({ ok: false, message: 'The function gave no number for this case.' });
  }
  return out;
}

/**
 * E (or EMF) in V for every case of the series, from ECHEM.POTENTIAL through the catalogue;
 * each case may fail on its own, with the function's message.
 *
 * @example
 * previewValues(input, planSweep(input), null) // [{ ok: true, e: 0.2596… }, …]
 */
export function previewValues(input: SweepInput, layout: SweepLayout, table: Grid | null): PreviewValue[] {
  return valuesOf(callFunction('POTENTIAL', potentialArgs(input, layout, table)), layout.cases.length);
}

/** The slope of the series, read from its values, where E is a straight line of x. */
export interface SeriesSlope {
  /** V per unit of x. */
  readonly slopeV: number;
  /** "V per decade", "V per pH unit" or "V per °C (mean)". */
  readonly per: string;
}

/**
 * The slope of E along the series from its end values: exact for a log-activity or pH
 * series (E is linear in log a and in pH), the mean slope for a temperature series; null
 * for a linear activity series or where an end failed.
 */
export function seriesSlope(
  input: SweepInput,
  layout: SweepLayout,
  values: readonly PreviewValue[],
): SeriesSlope | null {
  const v = input.variable;
  if (v.kind === 'activity' && v.scale !== 'log') return null;
  const first = values[0];
  const last = values[values.length - 1];
  const x0 = layout.x[0];
  const x1 = layout.x[layout.x.length - 1];
  if (!first?.ok || !last?.ok || x0 === undefined || x1 === undefined || x0 === x1) return null;
  const slopeV = (last.e - first.e) / (x1 - x0);
  const per =
    v.kind === 'pH' ? 'V per pH unit' : v.kind === 'temperature' ? 'V per °C (mean)' : 'V per decade';
  return { slopeV, per };
}

/**
 * RT ln10/(nF) in V per decade from ECHEM.NERNSTSLOPE, or null where n is unknown or the
 * function refuses the inputs.
 *
 * @example
 * nernstSlope(25, 1) // 0.0591593…
 */
export function nernstSlope(tempC: number, n: number | null): number | null {
  if (n === null) return null;
  const cell = callFunction('NERNSTSLOPE', [tempC, n])[0]?.[0];
  return typeof cell === 'number' && Number.isFinite(cell) ? cell : null;
}
