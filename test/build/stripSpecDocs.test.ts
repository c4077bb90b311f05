/**
 * The build's spec-docs transformer (scripts/build/stripSpecDocs.js) empties the
 * documentation-only text of the function specs and keeps everything the functions need at
 * run time (ids, names, kinds, nouns for messages, numbers, code).
 */
import ts from 'typescript';
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { stripSpecDocs } = require('../../scripts/build/stripSpecDocs') as {
  stripSpecDocs: ts.TransformerFactory<ts.SourceFile>;
};

function transform(fileName: string, code: string): string {
  const out = ts.transpileModule(code, {
    fileName,
    compilerOptions: { module: ts.ModuleKind.ES2020, target: ts.ScriptTarget.ES2020 },
    transformers: { before: [stripSpecDocs] },
  });
  return out.outputText;
}

const SPEC = `
const S = 'E°(Cu2+/Cu) = 0.337 V, OpenStax';
export const X = {
  id: 'POTENTIAL',
  summary: 'Electrode potential by the Nernst equation.',
  returns: \`E in V, \${S}\`,
  notes: ['a note', 'another'],
  params: [{ name: 'temp_C', kind: 'temperature', description: 'Temperature in °C', noun: 'a temperature in °C', default: 25 }],
  examples: [{ args: ['Cu2+/Cu'], expected: 0.337, tolerance: 1e-12, source: \`\${S}; derived by hand\` }],
  perCase: (a) => a.num('temp_C'),
};`;

describe('stripSpecDocs', () => {
  const out = transform('/repo/src/functions/specs/nernst.ts', SPEC);

  test('empties the documentation text', () => {
    for (const gone of ['Electrode potential', 'E in V', 'a note', 'Temperature in °C', 'derived by hand'])
      expect(out).not.toContain(gone);
    expect(out).toMatch(/summary: ""/);
    expect(out).toMatch(/notes: \[\]/);
  });

  test('keeps what the functions read at run time', () => {
    for (const kept of ["'POTENTIAL'", "'temp_C'", "'temperature'", "'a temperature in °C'", '0.337', "a.num('temp_C')"])
      expect(out).toContain(kept);
  });

  test('leaves other files alone', () => {
    expect(transform('/repo/src/functions/catalogue.ts', SPEC)).toContain('Electrode potential');
    expect(transform('/repo/src/engine/thermo/nernstForm.ts', SPEC)).toContain('Electrode potential');
  });
});
