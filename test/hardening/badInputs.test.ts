/**
 * The bad-input catalogue (badInputCases.ts), run through the catalogue functions: each case
 * gives the error code and a message that names the argument or the fix, never an exception,
 * never NaN or ±Infinity. Cases the engine does not meet yet are marked failing (their `bug`
 * says what happens instead). And docs/errors.md lists every case.
 */
import * as fs from 'fs';
import * as path from 'path';
import { CATALOGUE, isCellError, type Arg, type Result } from '../../src/functions/catalogue';
import { BAD_INPUT_CASES, INPUT_CLASSES, resultLabel, type BadInputCase } from './badInputCases';

function impl(fn: string): (...args: Arg[]) => Result {
  const f = CATALOGUE.find((x) => x.id === fn);
  if (!f) throw new Error(`${fn} is not in the catalogue`);
  return f.impl;
}

function hasNonFinite(x: unknown): boolean {
  if (typeof x === 'number') return !Number.isFinite(x);
  if (Array.isArray(x)) return x.some(hasNonFinite);
  return false;
}

function show(r: Result): string {
  return JSON.stringify(r, (_, v: unknown) => (typeof v === 'number' && !Number.isFinite(v) ? String(v) : v));
}

/** Check one case; throws with what was wrong. */
function check(c: BadInputCase): void {
  const r = impl(c.fn)(...c.args);
  const cells = r.flat();
  if (cells.length === 0) throw new Error(`${c.fn} returned no cells`);
  for (const x of cells)
    if (typeof x === 'number' && !Number.isFinite(x))
      throw new Error(`${c.fn} returned ${String(x)}: ${show(r)}`);
  const x = c.expect;
  if ('code' in x) {
    for (const cell of cells) {
      if (!isCellError(cell)) throw new Error(`expected ${x.code}, got ${show(r)}`);
      expect(cell.code).toBe(x.code);
      expect(cell.message).toMatch(x.message);
      // a message shows NaN or Infinity only where the user gave one
      if (!hasNonFinite(c.args)) expect(cell.message).not.toMatch(/\bNaN\b|Infinity/);
    }
  } else if ('text' in x) {
    expect(cells.every((cell) => typeof cell === 'string')).toBe(true);
    expect(cells.some((cell) => typeof cell === 'string' && x.text.test(cell))).toBe(true);
  } else if ('same' in x) {
    const want = impl(c.fn)(...x.same);
    expect(want.flat().some(isCellError)).toBe(false); // the reference call itself succeeds
    expect(r).toEqual(want);
  } else {
    expect(cells).toHaveLength(1);
    const v = cells[0];
    if (typeof v !== 'number') throw new Error(`expected ${x.value}, got ${show(r)}`);
    expect(Math.abs(v - x.value)).toBeLessThanOrEqual(1e-12);
  }
}

describe('bad-input catalogue', () => {
  BAD_INPUT_CASES.forEach((c, i) => {
    const name = `#${i + 1} ${c.fn} ${c.argument}: ${c.input} → ${resultLabel(c)}`;
    if (c.bug) {
      // BUG: see the case's `bug` in badInputCases.ts (what the engine does instead)
      test.failing(`${name} (BUG: ${c.bug})`, () => check(c));
    } else {
      test(name, () => check(c));
    }
  });
});

describe('the catalogue of cases is complete', () => {
  test('every function of the catalogue has cases', () => {
    const covered = new Set(BAD_INPUT_CASES.map((c) => c.fn));
    expect(CATALOGUE.map((f) => f.id).filter((id) => !covered.has(id))).toEqual([]);
  });

  test('every input class is used, and every case names a parameter of its function', () => {
    const used = new Set(BAD_INPUT_CASES.map((c) => c.input));
    expect(INPUT_CLASSES.filter((k) => !used.has(k))).toEqual([]);
    const wrong = BAD_INPUT_CASES.filter((c) => {
      const f = CATALOGUE.find((x) => x.id === c.fn);
      return !f || !f.params.some((p) => p.name === c.argument) || c.args.length > f.params.length;
    }).map((c) => `${c.fn} ${c.argument}`);
    expect(wrong).toEqual([]);
  });

  test('the classes the brief names apply to every function that takes such an argument', () => {
    const has = (fn: string, input: string) => BAD_INPUT_CASES.some((c) => c.fn === fn && c.input === input);
    for (const f of CATALOGUE) {
      const names = f.params.map((p) => p.name);
      if (names.includes('temp_C') && f.id !== 'ACTCOEF' && f.id !== 'ACTIVITY' && f.id !== 'QUOTIENT')
        expect([f.id, has(f.id, 'absurd temperature (−300 °C)')]).toEqual([f.id, true]);
      if (names.includes('reaction')) {
        expect([
          f.id,
          has(f.id, 'empty ("")'),
          has(f.id, 'unknown species'),
          has(f.id, 'ambiguous couple'),
        ]).toEqual([f.id, true, true, true]);
      }
      if (names.includes('table') && names.includes('reaction'))
        expect([f.id, has(f.id, 'unbalanced user row in a table')]).toEqual([f.id, true]);
      if (names.includes('model')) expect([f.id, has(f.id, 'bad model name')]).toEqual([f.id, true]);
    }
  });
});

describe('docs/errors.md lists the catalogue', () => {
  const file = path.resolve(__dirname, '..', '..', 'docs', 'errors.md');
  const text = fs.existsSync(file) ? fs.readFileSync(file, 'utf8') : '';
  /** Rows of docs/errors.md: function, argument, input class and result, as written. */
  const rows: { fn: string; argument: string; input: string; result: string }[] = [];
  let fn = '';
  for (const line of text.split('\n')) {
    const h = /^## ECHEM\.([A-Z0-9]+)\s*$/.exec(line);
    if (h) fn = h[1]!;
    if (!line.startsWith('|') || /^\|\s*(argument|---)/.test(line)) continue;
    const cells = line
      .slice(1, -1)
      .split(/(?<!\\)\|/)
      .map((x) => x.trim().replace(/\\\|/g, '|'));
    rows.push({ fn, argument: cells[0]!, input: cells[1]!, result: cells[2]! });
  }

  test("lists every case's function, argument, input class and result (regenerate: npm run docs)", () => {
    const missing = BAD_INPUT_CASES.filter(
      (c) => !rows.some((r) => r.fn === c.fn && r.argument === c.argument && r.input === c.input && r.result === resultLabel(c)),
    ).map((c) => `${c.fn} | ${c.argument} | ${c.input} | ${resultLabel(c)}`);
    expect(missing).toEqual([]);
  });

  test('lists nothing that is not a case (no stale rows)', () => {
    const stale = rows
      .filter(
        (r) =>
          !BAD_INPUT_CASES.some(
            (c) => r.fn === c.fn && r.argument === c.argument && r.input === c.input && r.result === resultLabel(c),
          ),
      )
      .map((r) => `${r.fn} | ${r.argument} | ${r.input} | ${r.result}`);
    expect(stale).toEqual([]);
  });
});
