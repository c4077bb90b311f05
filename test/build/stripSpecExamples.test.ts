/**
 * The spec-docs transformer (scripts/build/stripSpecDocs.js) also empties the specs' example
 * lists, which only the docs, the formula-bar generator and the tests (reading the sources)
 * use, and leaves the computation and the parameters alone.
 */
import ts from 'typescript';
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { stripSpecDocs } = require('../../scripts/build/stripSpecDocs') as {
  stripSpecDocs: ts.TransformerFactory<ts.SourceFile>;
};

function transform(fileName: string, code: string): string {
  return ts.transpileModule(code, {
    fileName,
    compilerOptions: { module: ts.ModuleKind.ES2020, target: ts.ScriptTarget.ES2020 },
    transformers: { before: [stripSpecDocs] },
  }).outputText;
}

const SPEC = `
const SHARED = [{ args: [1.1, 2], expected: 37.187697, tolerance: 1e-5, source: 'derived by hand' }];
export const A = {
  id: 'LOGK',
  params: [{ name: 'n', kind: 'electrons', description: 'electrons', default: 2 }],
  examples: [{ args: ['Zn + Cu2+ -> Zn2+ + Cu'], expected: 1.68858e37, tolerance: 1e33, source: 'by hand' }],
  perCase: (a) => a.num('n') * 9.5,
};
export const B = { id: 'GIBBS', params: [], examples: SHARED, perCase: () => -83.749268 };`;

describe('stripSpecDocs and the examples', () => {
  test('empties each example list, written out or shared', () => {
    const out = transform('/repo/src/functions/specs/equilibrium.ts', SPEC);
    expect(out.match(/examples: \[\]/g)).toHaveLength(2);
    expect(out).not.toContain('Zn + Cu2+');
    expect(out).not.toContain('1.68858e37');
    expect(out).not.toMatch(/examples: SHARED/);
    for (const kept of ["'LOGK'", "'GIBBS'", "'electrons'", 'default: 2', '9.5', '-83.749268']) expect(out).toContain(kept);
  });

  test('leaves the examples of other files alone', () => {
    expect(transform('/repo/src/functions/catalogue.ts', SPEC)).toContain('1.68858e37');
  });
});
