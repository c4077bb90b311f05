/**
 * Everything generated from the function specs is committed up to date: src/functions/functions.ts
 * (the Excel wrappers whose JSDoc becomes functions.json) and the generated pages of docs/.
 * Regenerate with `npm run docs`.
 */
import * as fs from 'fs';
import * as path from 'path';
import { generatedDocs } from '../../scripts/gen/docs';
import { functionsSource } from '../../scripts/gen/functionsTs';
import { resultUnitsSource } from '../../scripts/gen/resultUnits';
import { CATALOGUE } from '../../src/functions/catalogue';

const ROOT = path.resolve(__dirname, '..', '..');
const read = (rel: string) => {
  const file = path.join(ROOT, rel);
  return fs.existsSync(file) ? fs.readFileSync(file, 'utf8') : `(missing ${rel})`;
};

describe('generated files are fresh (run `npm run docs` where this fails)', () => {
  test('src/functions/functions.ts matches the specs', () => {
    expect(read('src/functions/functions.ts')).toBe(functionsSource());
  });

  test('src/taskpane/resultUnits.ts matches the specs', () => {
    expect(read('src/taskpane/resultUnits.ts')).toBe(resultUnitsSource());
  });

  const docs = generatedDocs();
  test.each([...docs.keys()])('%s matches the specs', (rel) => {
    expect(read(rel)).toBe(docs.get(rel));
  });

  test('docs/functions holds a page for every function and nothing else', () => {
    const pages = fs
      .readdirSync(path.join(ROOT, 'docs', 'functions'))
      .filter((f) => f.endsWith('.md'))
      .map((f) => f.replace(/\.md$/, ''))
      .sort();
    expect(pages).toEqual(CATALOGUE.map((e) => e.id).sort());
  });

  test('every function has one wrapper and one associate call', () => {
    const src = functionsSource();
    for (const e of CATALOGUE) {
      expect(src.split(`@customfunction ${e.id}\n`)).toHaveLength(2);
      expect(src.split(`CustomFunctions.associate('${e.id}', ${e.id});`)).toHaveLength(2);
    }
  });
});
