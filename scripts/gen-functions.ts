/**
 * Writes src/functions/functions.ts from the function specs (scripts/gen/functionsTs.ts).
 *
 *   npm run gen:functions
 */
import * as fs from 'fs';
import * as path from 'path';
import { functionsSource } from './gen/functionsTs';

const target = path.resolve(__dirname, '..', 'src', 'functions', 'functions.ts');
fs.writeFileSync(target, functionsSource());
process.stdout.write(`wrote ${path.relative(process.cwd(), target)}\n`);
