/**
 * The README's function reference against the functions themselves: a section per function
 * with its anchor and signature, and every example result it shows recomputed through the
 * Excel wrappers. Also the sideloading section's essentials.
 */
import * as fs from 'fs';
import * as path from 'path';
import { StubError } from './customFunctionsStub';
import './installStub';
import * as F from '../../src/functions/functions';
import { CATALOGUE } from '../../src/functions/catalogue';
import { numberMatches, parseFormula, parseShownResult } from './formulaText';

const README = fs.readFileSync(path.resolve(__dirname, '..', '..', 'README.md'), 'utf8');
const fns = F as unknown as Record<string, (...a: unknown[]) => unknown[][]>;

/** The text of a `## title` section (up to the next `## `). */
function section(title: string): string {
  const start = README.indexOf(`\n## ${title}\n`);
  if (start < 0) throw new Error(`README has no "## ${title}" section`);
  const next = README.indexOf('\n## ', start + 1);
  return README.slice(start, next < 0 ? undefined : next);
}

const reference = section('Function reference');

/** Each function's part of the reference, from its anchor to the next. */
function entry(id: string): string {
  const anchor = `<a id="ref-${id.toLowerCase()}"></a>`;
  const start = reference.indexOf(anchor);
  if (start < 0) throw new Error(`no ${anchor} in the function reference`);
  const next = reference.indexOf('<a id="ref-', start + anchor.length);
  return reference.slice(start, next < 0 ? undefined : next);
}

/** `formula` → `result` pairs of a text. */
function examples(text: string): { formula: string; shown: string }[] {
  return [...text.matchAll(/`(=ECHEM\.[^`]+)`\s*→\s*`([^`]+)`/g)].map((m) => ({
    formula: m[1]!,
    shown: m[2]!,
  }));
}

function matches(value: unknown, shown: string): boolean {
  if (value instanceof StubError) return shown === value.code;
  if (typeof value === 'number') return numberMatches(value, shown);
  return value === shown;
}

describe('README: Function reference', () => {
  it('has one section per function, in catalogue order, with its anchor and signature', () => {
    const anchors = [...reference.matchAll(/<a id="ref-([a-z0-9]+)"><\/a>/g)].map((m) => m[1]!.toUpperCase());
    expect(anchors).toEqual(CATALOGUE.map((s) => s.id));
    for (const spec of CATALOGUE) {
      const args = spec.params.map((p) => (p.optional ? `[${p.name}]` : p.name)).join(', ');
      expect(entry(spec.id)).toContain(`\`=ECHEM.${spec.id}(${args})\``);
      expect(entry(spec.id)).toContain(`### ${spec.id}\n`);
    }
  });

  it('lists every argument of each function in its table, and the errors it can give', () => {
    for (const spec of CATALOGUE) {
      const text = entry(spec.id);
      for (const p of spec.params)
        expect({
          id: spec.id,
          arg: p.name,
          listed: new RegExp(`\\|\\s*\`${p.name}\`\\s*\\|`).test(text),
        }).toEqual({
          id: spec.id,
          arg: p.name,
          listed: true,
        });
      expect({ id: spec.id, errors: /Errors:/.test(text) }).toEqual({ id: spec.id, errors: true });
    }
  });

  it('shows a checked example for every function', () => {
    for (const spec of CATALOGUE) {
      const own = examples(entry(spec.id)).filter((e) => e.formula.startsWith(`=ECHEM.${spec.id}(`));
      const prose = entry(spec.id).includes(`\`=ECHEM.${spec.id}(`);
      expect({ id: spec.id, examples: own.length > 0 && prose }).toEqual({ id: spec.id, examples: true });
    }
  });

  const all = examples(reference);

  it('finds the examples', () => {
    expect(all.length).toBeGreaterThan(50);
  });

  it.each(all.map((e) => [e.formula, e.shown]))('%s → %s', (formula, shown) => {
    const parsed = parseFormula(formula);
    expect(parsed).not.toBeNull();
    const fn = fns[parsed!.id];
    expect(fn).toBeDefined();
    const result = fn!(...parsed!.args);
    const expected = parseShownResult(shown);
    expect(result.length).toBe(expected.length);
    result.forEach((row, i) => {
      expect(row.length).toBe(expected[i]!.length);
      row.forEach((v, j) => {
        const ok = matches(v, expected[i]![j]!);
        if (!ok)
          throw new Error(
            `${formula}: cell ${i + 1},${j + 1} is ${JSON.stringify(v)}, the README shows ${expected[i]![j]}`,
          );
      });
    });
  });
});

describe('README: Install into Excel (sideloading)', () => {
  const install = section('Install into Excel (sideloading)');

  it('gives the build, the dev server, each Excel and the certificate', () => {
    for (const needle of [
      'npm run build',
      'npm start',
      'Upload My Add-in',
      'manifest.xml',
      'Trusted Add-in Catalogs',
      'Documents/wef',
      'office-addin-dev-certs install',
      'https://localhost:3000/',
    ]) {
      expect({ needle, found: install.includes(needle) }).toEqual({ needle, found: true });
    }
  });
});
