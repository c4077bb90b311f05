/**
 * The registry of worksheet function specs: every family listed in specs/index.ts, in a fixed
 * order (the families this file names first, any other family after them by name), each
 * family's functions in the order the family gives. Ids must be unique.
 */
import * as FAMILIES from './specs';
import type { FunctionSpec } from './spec/types';

/** Families shown first in the docs and the formula bar, in this order. */
const FIRST = ['NERNST_SPECS', 'EQUILIBRIUM_SPECS', 'ACTIVITY_SPECS', 'REFERENCE_SPECS', 'TABLE_SPECS'];

function ordered(): FunctionSpec[] {
  const families = FAMILIES as unknown as Record<string, readonly FunctionSpec[]>;
  const names = Object.keys(families).sort((a, b) => {
    const ia = FIRST.indexOf(a);
    const ib = FIRST.indexOf(b);
    if (ia >= 0 || ib >= 0) return (ia < 0 ? FIRST.length : ia) - (ib < 0 ? FIRST.length : ib);
    return a < b ? -1 : a > b ? 1 : 0;
  });
  const out: FunctionSpec[] = [];
  const seen = new Set<string>();
  for (const name of names) {
    for (const spec of families[name] ?? []) {
      if (seen.has(spec.id)) throw new Error(`two function specs have the id ${spec.id}`);
      seen.add(spec.id);
      out.push(spec);
    }
  }
  return out;
}

/** Every function spec, in registry order. */
export const SPECS: readonly FunctionSpec[] = ordered();

/** The spec of an id (upper case), or undefined. */
export function specById(id: string): FunctionSpec | undefined {
  return SPECS.find((s) => s.id === id);
}
