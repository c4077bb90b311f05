/**
 * Regenerates everything derived from the function specs: src/functions/functions.ts (the
 * Excel wrappers and their formula-bar JSDoc) and the generated pages of docs/ (one per
 * function, the index, the error catalogue). Stale generated function pages are removed.
 *
 *   npm run docs
 */
import * as fs from 'fs';
import * as path from 'path';
import { generatedDocs } from './gen/docs';
import { functionsSource } from './gen/functionsTs';
import { resultUnitsSource } from './gen/resultUnits';

const ROOT = path.resolve(__dirname, '..');
const write = (rel: string, text: string) => {
  const file = path.join(ROOT, rel);
  fs.mkdirSync(path.dirname(file), { recursive: true });
  if (!fs.existsSync(file) || fs.readFileSync(file, 'utf8') !== text) {
    fs.writeFileSync(file, text);
    process.stdout.write(`wrote ${rel}\n`);
  }
};

write('src/functions/functions.ts', functionsSource());
write('src/taskpane/resultUnits.ts', resultUnitsSource());
const docs = generatedDocs();
for (const [rel, text] of docs) write(rel, text);
const pages = path.join(ROOT, 'docs', 'functions');
for (const f of fs.readdirSync(pages)) {
  if (f.endsWith('.md') && !docs.has(`docs/functions/${f}`)) {
    fs.rmSync(path.join(pages, f));
    process.stdout.write(`removed docs/functions/${f}\n`);
  }
}
