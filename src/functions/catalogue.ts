/**
 * The ECHEM function catalogue, independent of any spreadsheet host: one entry per function
 * spec of the registry (src/functions/registry.ts), each with its host-independent
 * implementation (src/functions/spec/reader.ts). Both the Excel custom functions
 * (functions.ts) and the headless runner (src/cli) call these, so results agree to the last
 * digit; the task pane calls {@link callFunction}.
 *
 * Argument values arrive as a host gives them: numbers, strings, booleans, null for omitted
 * optional arguments or empty cells (some hosts give 0 or ""), 2-D arrays (rows of cells) for
 * ranges, and the code text ("#N/A") for an error in an input cell (docs/design.md, "Errors").
 */
import type { Arg, Result } from './cellTypes';
import { cellError } from './errorCodes';
import { SPECS } from './registry';
import { implementationOf } from './spec/reader';
import type { FunctionSpec as Declaration, ParamSpec } from './spec/types';

export * from './cellTypes';
export type { ParamSpec } from './spec/types';

/** One function of the catalogue: its spec and its implementation. */
export interface CatalogueEntry extends Declaration {
  readonly params: readonly (ParamSpec & { readonly optional: boolean })[];
  readonly impl: (...args: Arg[]) => Result;
}
/** The catalogue entry type under its earlier name. */
export type FunctionSpec = CatalogueEntry;

/** Every function of the catalogue, in registry order. */
export const CATALOGUE: readonly CatalogueEntry[] = SPECS.map((s) => ({
  ...s,
  params: s.params.map((p) => ({ ...p, optional: p.optional === true })),
  impl: implementationOf(s),
}));

const BY_ID = new Map(CATALOGUE.map((e) => [e.id, e]));

/** The implementation of an id. */
function impl(id: string): (...args: Arg[]) => Result {
  const e = BY_ID.get(id);
  if (!e) throw new Error(`${id} is not in the catalogue`);
  return e.impl;
}

/**
 * Calls a catalogue function by id with host-shaped arguments: the one entry point that the
 * task pane and other in-process clients use, so they compute exactly what the sheet formula
 * computes.
 *
 * @example
 * callFunction('NERNSTSLOPE', [25]); // [[0.05916…]]
 */
export function callFunction(id: string, args: readonly Arg[]): Result {
  const spec = BY_ID.get(id.toUpperCase());
  if (!spec)
    return [[cellError('#N/A', `There is no function ECHEM.${id}; check the name in the function reference.`)]];
  return spec.impl(...args);
}

// The implementations by their JavaScript names, for in-process callers (benchmarks, tests).
export const potential = impl('POTENTIAL');
export const stdPotential = impl('STDPOTENTIAL');
export const quotient = impl('QUOTIENT');
export const logQ = impl('LOGQ');
export const logK = impl('LOGK');
export const eqConst = impl('EQCONST');
export const gibbs = impl('GIBBS');
export const electrons = impl('ELECTRONS');
export const balance = impl('BALANCE');
export const nernstSlope = impl('NERNSTSLOPE');
export const concCell = impl('CONCCELL');
export const vsRef = impl('VSREF');
export const actCoef = impl('ACTCOEF');
export const activity = impl('ACTIVITY');
export const ionicStr = impl('IONICSTR');
export const combine = impl('COMBINE');
export const source = impl('SOURCE');
export const cellNotation = impl('CELLNOTATION');
export const listTable = impl('LISTTABLE');
export const checkTable = impl('CHECKTABLE');
export { isPerCase, kindOf } from './spec/kinds';
