/**
 * The build's record transformer (scripts/build/compactRecords.js) writes arrays of records
 * with the same keys as one key list and tuples; the objects rebuilt when the module loads
 * must equal the ones written, key order included, and anything else must be left as it is.
 */
import * as vm from 'vm';
import ts from 'typescript';
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { compactRecords } = require('../../scripts/build/compactRecords') as {
  compactRecords: ts.TransformerFactory<ts.SourceFile>;
};

function transpile(code: string, transform: boolean): string {
  return ts.transpileModule(code, {
    fileName: '/repo/src/engine/data/sample.ts',
    compilerOptions: { module: ts.ModuleKind.CommonJS, target: ts.ScriptTarget.ES2020 },
    transformers: transform ? { before: [compactRecords] } : undefined,
  }).outputText;
}

/** The module's exports, run in a fresh context. */
function run(js: string): Record<string, unknown> {
  const mod = { exports: {} as Record<string, unknown> };
  vm.runInNewContext(js, { module: mod, exports: mod.exports });
  return mod.exports;
}

const SAMPLE = `
const OSX = 'OpenStax Chemistry 2e, Appendix L';
let calls = 0;
const next = () => ++calls;
export const ROWS: readonly { halfReaction: string; e0V: number; published: { e0V: number; source: string } }[] = [
  { halfReaction: 'Ag+ + e- -> Ag', e0V: 0.7996, published: { e0V: 0.7996, source: OSX } },
  { halfReaction: 'Cu2+ + 2 e- -> Cu', e0V: 0.3394, published: { e0V: 0.34, source: OSX } },
  { halfReaction: 'Zn2+ + 2 e- -> Zn', e0V: -0.7618, published: { e0V: -0.7618, source: \`\${OSX} (seen)\` } },
];
export const ORDER = [{ a: next(), b: next() }, { a: next(), b: next() }, { a: next(), b: next() }];
const x = 1;
export const SHORT = [{ x, 'y-z': [1, 2] }, { x, 'y-z': [] }, { x: 2, 'y-z': null }];
export const VARIED = [{ a: 1, b: 2 }, { a: next() }, { b: undefined, c: next() }, { a: 5, c: 6 }, {}];
export const MIXED = [{ a: 1, b: 2 }, { b: 2, a: 1 }, { a: 1, b: 2 }];
export const SPREAD = [{ a: 1, b: 2 }, { ...{ a: 1 }, b: 2 }, { a: 1, b: 2 }];
export const TWO = [{ a: 1, b: 2 }, { a: 3, b: 4 }];
export const ONE_KEY = [{ a: 1 }, { a: 2 }, { a: 3 }];
export const FN = [{ a: 1, f() { return 1; } }, { a: 2, f() { return 2; } }, { a: 3, f() { return 3; } }];
`;

describe('compactRecords', () => {
  const plain = transpile(SAMPLE, false);
  const compact = transpile(SAMPLE, true);

  test('rewrites the arrays of records, and only those', () => {
    expect(compact).toContain('__records(["halfReaction", "e0V", "published"]');
    expect(compact).not.toContain('halfReaction: ');
    expect(compact).toContain('__records(["a", "b", "c"], [[1, 2], [next()], [, undefined, next()], [5, , 6], []])');
    for (const left of ['MIXED = [{', 'SPREAD = [{', 'TWO = [{', 'ONE_KEY = [{', 'FN = [{'])
      expect(compact).toContain(left);
  });

  test('the rebuilt records equal the written ones, key order and evaluation order included', () => {
    const a = run(plain);
    const b = run(compact);
    // FN holds functions, which are new objects in each run
    expect(Object.keys(b)).toEqual(Object.keys(a));
    for (const name of Object.keys(a).filter((k) => k !== 'FN')) expect(b[name]).toEqual(a[name]);
    for (const name of ['ROWS', 'ORDER', 'SHORT', 'VARIED']) {
      const rowsA = a[name] as Record<string, unknown>[];
      const rowsB = b[name] as Record<string, unknown>[];
      expect(rowsB.map((r) => Object.keys(r))).toEqual(rowsA.map((r) => Object.keys(r)));
      expect(JSON.stringify(rowsB)).toBe(JSON.stringify(rowsA));
    }
    // the values are evaluated record by record, key by key, as written
    expect(b['ORDER']).toEqual([
      { a: 1, b: 2 },
      { a: 3, b: 4 },
      { a: 5, b: 6 },
    ]);
    // a left-out key stays left out; a key given as undefined stays given
    const varied = b['VARIED'] as Record<string, unknown>[];
    expect(varied.map((r) => Object.keys(r))).toEqual([['a', 'b'], ['a'], ['b', 'c'], ['a', 'c'], []]);
    expect(varied[1]).toEqual({ a: 7 });
    expect(varied[2]).toEqual({ b: undefined, c: 8 });
    expect((b['ROWS'] as { published: { source: string } }[])[2]?.published.source).toBe(
      'OpenStax Chemistry 2e, Appendix L (seen)',
    );
  });
});
