/**
 * Reads the example formulas of the function reference, `=ECHEM.NAME(arg, …)` with literal
 * arguments only (text in double quotes, numbers, inline arrays `{a,b;c,d}`, empty for an
 * omitted argument), into arguments as Excel passes them to `any[][]` parameters; and reads the
 * results the reference shows (`0.2778`, `1.40E+37`, `{a; b}`, text, or an error code).
 */

export type Literal = number | string | null;

export interface ParsedFormula {
  id: string;
  /** Each argument as Excel passes it: [[v]] for one value, rows for an array, null where omitted. */
  args: (Literal[][] | null)[];
}

/** Parses `=ECHEM.ID(...)`; null where an argument is not a literal (a cell reference, a nested call). */
export function parseFormula(text: string): ParsedFormula | null {
  const m = /^=ECHEM\.([A-Z][A-Z0-9]*)\((.*)\)$/s.exec(text.trim());
  if (!m) return null;
  const body = m[2]!;
  let i = 0;
  const skipSpace = () => {
    while (body[i] === ' ') i++;
  };
  const literal = (): Literal | undefined => {
    skipSpace();
    if (body[i] === '"') {
      let s = '';
      i++;
      while (i < body.length) {
        if (body[i] === '"') {
          if (body[i + 1] === '"') {
            s += '"';
            i += 2;
            continue;
          }
          i++;
          return s;
        }
        s += body[i++];
      }
      return undefined;
    }
    const num = /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?/.exec(body.slice(i));
    if (num) {
      i += num[0].length;
      return Number(num[0]);
    }
    return undefined;
  };
  const args: (Literal[][] | null)[] = [];
  for (;;) {
    skipSpace();
    if (body[i] === ',' || i >= body.length) {
      if (i < body.length || args.length > 0 || body.trim() !== '') args.push(null);
    } else if (body[i] === '{') {
      i++;
      const rows: Literal[][] = [[]];
      for (;;) {
        const v = literal();
        if (v === undefined) return null;
        rows[rows.length - 1]!.push(v);
        skipSpace();
        const sep = body[i++];
        if (sep === ',') continue;
        if (sep === ';') {
          rows.push([]);
          continue;
        }
        if (sep === '}') break;
        return null;
      }
      args.push(rows);
    } else {
      const v = literal();
      if (v === undefined) return null;
      args.push([[v]]);
    }
    skipSpace();
    if (i >= body.length) break;
    if (body[i] !== ',') return null;
    i++;
    if (i >= body.length) {
      args.push(null);
      break;
    }
  }
  return { id: m[1]!, args };
}

/** A result as the reference shows it: one value, or `{a; b}` rows (`,` between columns). */
export function parseShownResult(text: string): string[][] {
  const t = text.trim();
  if (t.startsWith('{') && t.endsWith('}')) {
    return t
      .slice(1, -1)
      .split(';')
      .map((row) => row.split(',').map((v) => v.trim()));
  }
  return [[t]];
}

/** True where a computed number shows as `shown` at the precision shown. */
export function numberMatches(value: number, shown: string): boolean {
  const m = /^([-+]?)(\d*)\.?(\d*)(?:[eE]([-+]?\d+))?$/.exec(shown);
  if (!m) return false;
  const decimals = m[3]!.length;
  const exponent = m[4] ? Number(m[4]) : 0;
  const halfUnit = 0.5 * 10 ** (exponent - decimals);
  return Math.abs(value - Number(shown)) <= halfUnit * (1 + 1e-9);
}
