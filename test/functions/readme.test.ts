/**
 * The README is the front page: under 15 KB, with the job, a table of contents, the quick
 * start, the cautions, an overview naming every function, and links that lead to files that
 * exist. Its example formulas are recomputed through the Excel wrappers and checked against
 * values derived by hand (E° from OpenStax Chemistry 2e, Appendix L; SI 2019 exact R and F).
 */
import * as fs from 'fs';
import * as path from 'path';
import './installStub';
import * as F from '../../src/functions/functions';
import { CATALOGUE } from '../../src/functions/catalogue';
import { parseFormula } from './formulaText';
import { S25 } from '../support';

/** E°(Cu2+/Cu) of the built-in row: ΔfG°(Cu2+) = 65.49 kJ/mol / 2F (NBS 1982, from memory; OpenStax Appendix L prints +0.34). */
const E_CU = 65.49e3 / (2 * 96485.33212331001);

const ROOT = path.resolve(__dirname, '..', '..');
const README = fs.readFileSync(path.join(ROOT, 'README.md'), 'utf8');
const fns = F as unknown as Record<string, (...a: unknown[]) => unknown[][]>;


describe('README', () => {
  test('is under 15 KB', () => {
    expect(Buffer.byteLength(README, 'utf8')).toBeLessThan(15 * 1024);
  });

  test('has the sections a reader needs, in order, and a table of contents naming them', () => {
    const headings = [...README.matchAll(/^## (.+)$/gm)].map((m) => m[1]!);
    expect(headings.slice(0, 4)).toEqual(['Contents', 'Quick start', 'Cautions', 'Overview']);
    for (const h of headings.slice(1)) expect(README).toContain(`(#${h.toLowerCase().replace(/ /g, '-')})`);
    expect(README).toContain('npm ci && npm run demo');
    expect(README).toContain('npm test');
  });

  test('cautions defer to standards, local codes and licensed practice', () => {
    expect(README).toMatch(/thermodynamic estimates/);
    expect(README).toMatch(/standards, local\s+codes and licensed/);
  });

  test('the overview names every function and links its page', () => {
    for (const e of CATALOGUE) expect([e.id, README.includes(`(docs/functions/${e.id}.md)`)]).toEqual([e.id, true]);
  });

  test('every relative link leads to a file of the repository', () => {
    const links = [...README.matchAll(/\]\(([^)#\s]+)(#[^)]*)?\)/g)].map((m) => m[1]!).filter((l) => !/^https?:/.test(l));
    expect(links.length).toBeGreaterThan(10);
    expect(links.filter((l) => !fs.existsSync(path.join(ROOT, l)))).toEqual([]);
  });

  test('the example formulas give the values shown (derived by hand)', () => {
    const one = parseFormula('=ECHEM.POTENTIAL("Cu2+/Cu", "Cu2+", 0.01)')!;
    const sweep = parseFormula('=ECHEM.POTENTIAL("Cu2+/Cu", "Cu2+", {1;0.1;0.01})')!;
    expect(README).toContain('=ECHEM.POTENTIAL("Cu2+/Cu", "Cu2+", 0.01)        → 0.280219');
    const r1 = fns[one.id]!(...one.args);
    expect(r1[0]![0] as number).toBeCloseTo(E_CU - S25, 6);
    const r2 = fns[sweep.id]!(...sweep.args).map((r) => r[0] as number);
    expect(r2[0]).toBeCloseTo(E_CU, 12);
    expect(r2[1]!).toBeCloseTo(E_CU - S25 / 2, 6);
    expect(r2[2]!).toBeCloseTo(E_CU - S25, 6);
  });
});
