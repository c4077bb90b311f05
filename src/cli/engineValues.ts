/**
 * Reading results out of HyperFormula: spill sizes, error values, and messages that say
 * what went wrong (unknown function, formula that does not parse, blocked spill).
 */
import { HyperFormula } from 'hyperformula';
import type { SimpleCellAddress } from 'hyperformula';

interface ArrayVertexLike {
  width: number;
  height: number;
  array?: unknown;
}

/** The size of the spill a formula cell produced (1×1 for an ordinary formula). */
export function spillSize(hf: HyperFormula, address: SimpleCellAddress): { width: number; height: number } {
  const graph = (hf as unknown as { dependencyGraph?: { getCell?: (a: SimpleCellAddress) => unknown } })
    .dependencyGraph;
  const vertex = graph?.getCell?.(address) as ArrayVertexLike | undefined;
  if (
    vertex &&
    vertex.array !== undefined &&
    typeof vertex.width === 'number' &&
    typeof vertex.height === 'number'
  ) {
    return { width: Math.max(1, vertex.width), height: Math.max(1, vertex.height) };
  }
  return { width: 1, height: 1 };
}

/** A HyperFormula error value, as it comes out of `getCellValue`. */
export interface HfErrorValue {
  value: string;
  message: string;
}

export function isHfError(v: unknown): v is HfErrorValue {
  return (
    typeof v === 'object' &&
    v !== null &&
    typeof (v as { value?: unknown }).value === 'string' &&
    typeof (v as { type?: unknown }).type === 'string'
  );
}

/** The message to show for an error value, made clearer where HyperFormula's is terse. */
export function explainError(v: HfErrorValue, echemNames: readonly string[]): string {
  const unknown = /^Function name (.+) not recognized\.?$/.exec(v.message);
  if (unknown && unknown[1] !== undefined) return unknownFunctionMessage(unknown[1], echemNames);
  if (v.value === '#ERROR!' && v.message.startsWith('Parsing error')) return parseErrorMessage(v.message);
  const unknownName = /^Named expression (.+) not recognized\.?$/.exec(v.message);
  if (unknownName && unknownName[1] !== undefined) {
    return (
      `${unknownName[1]} is not a known name, cell or function: text arguments need double quotes ` +
      `(e.g. "Cu2+ + 2e- -> Cu"), and TRUE/FALSE inside an inline array are written TRUE()/FALSE()`
    );
  }
  if (v.value === '#SPILL!') {
    return 'the result needs more cells than are free below/right of the formula: clear the cells it spills into';
  }
  if (v.value === '#CYCLE!') return 'circular reference: the formula depends on its own value';
  return v.message || v.value;
}

/** HyperFormula's parser message, shortened to what a user can act on. */
export function parseErrorMessage(message: string): string {
  const flat = message.replace(/\s+/g, ' ').trim();
  const found = /but found: '(.*)'$/.exec(flat);
  if (found) {
    const what = found[1] ?? '';
    return what === ''
      ? 'the formula does not parse: it ends too early (a value, argument or closing bracket is missing)'
      : `the formula does not parse: unexpected "${what}"`;
  }
  const ch = /unexpected character: ->(.*)<- at offset: (\d+)/.exec(flat);
  if (ch)
    return `the formula does not parse: unexpected character "${ch[1] ?? ''}" at offset ${ch[2] ?? '?'}`;
  return `the formula does not parse (${flat.replace(/^Parsing error\.?\s*/, '')})`;
}

function editDistance(a: string, b: string): number {
  const d: number[] = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    let prev = d[0] as number;
    d[0] = i;
    for (let j = 1; j <= b.length; j++) {
      const tmp = d[j] as number;
      d[j] = Math.min((d[j] as number) + 1, (d[j - 1] as number) + 1, prev + (a[i - 1] === b[j - 1] ? 0 : 1));
      prev = tmp;
    }
  }
  return d[b.length] as number;
}

/** "unknown function X; did you mean …" with the list of ECHEM functions. */
export function unknownFunctionMessage(name: string, echemNames: readonly string[]): string {
  const upper = name.toUpperCase();
  const candidates = [...echemNames, ...HyperFormula.getRegisteredFunctionNames('enGB')];
  let best: string | undefined;
  let bestD = Infinity;
  for (const c of candidates) {
    const d = Math.min(editDistance(upper, c), editDistance(`ECHEM.${upper}`, c));
    if (d < bestD) {
      bestD = d;
      best = c;
    }
  }
  const hint =
    best !== undefined && bestD <= Math.max(1, Math.floor(upper.length / 4)) ? ` Did you mean ${best}?` : '';
  const what = upper.startsWith('ECHEM.')
    ? 'there is no ECHEM function of that name.'
    : 'neither an ECHEM function nor a spreadsheet function the runner provides.';
  const ids = echemNames.map((n) => n.replace(/^ECHEM\./, '')).join(', ');
  return (
    `unknown function ${name}: ${what}${hint} ECHEM functions: ${ids}. ` +
    'List the built-in potentials with: npx potentia eval "=ECHEM.LISTTABLE()"'
  );
}
