/**
 * The engine's purity is enforced, not assumed (docs/design.md, "Layers"): `npm run typecheck`
 * checks src/engine with its own config, which knows no DOM, no Office and no Node types, and
 * the lint rules forbid imports that leave the engine or enter it other than by its index.
 * (test/build/importCycles.test.ts checks the same layering on the import graph.)
 */
import * as fs from 'fs';
import * as path from 'path';

const ROOT = path.resolve(__dirname, '..', '..');
const json = (f: string) => JSON.parse(fs.readFileSync(path.join(ROOT, f), 'utf8')) as Record<string, unknown>;

describe('engine purity', () => {
  test('tsconfig.engine.json: ES2020 library only, no ambient types, only src/engine', () => {
    const cfg = json('tsconfig.engine.json') as { compilerOptions: Record<string, unknown>; include: string[] };
    expect(cfg.compilerOptions.lib).toEqual(['ES2020']);
    expect(cfg.compilerOptions.types).toEqual([]);
    expect(cfg.compilerOptions.strict).toBe(true);
    expect(cfg.include).toEqual(['src/engine/**/*.ts']);
  });

  test('npm run typecheck runs it', () => {
    const scripts = (json('package.json') as { scripts: Record<string, string> }).scripts;
    expect(scripts.typecheck).toContain('tsc -p tsconfig.engine.json');
    expect(scripts.test).toContain('npm run typecheck');
  });

  test('the lint config restricts imports into and out of the engine', () => {
    const text = fs.readFileSync(path.join(ROOT, 'eslint.config.mjs'), 'utf8');
    expect(text).toContain("files: ['src/engine/**/*.ts']");
    expect(text).toContain("group: ['**/engine/*', '!**/engine/index']");
    expect((text.match(/'no-restricted-imports'/g) ?? []).length).toBe(2);
  });

  test('no engine source names a host global', () => {
    const bad: string[] = [];
    const walk = (dir: string) => {
      for (const d of fs.readdirSync(dir, { withFileTypes: true })) {
        const p = path.join(dir, d.name);
        if (d.isDirectory()) walk(p);
        else if (d.name.endsWith('.ts')) {
          const code = fs
            .readFileSync(p, 'utf8')
            .replace(/\/\*[\s\S]*?\*\//g, '')
            .replace(/\/\/.*$/gm, '');
          for (const g of ['document.', 'window.', 'Office.', 'Excel.', 'CustomFunctions.', 'process.', 'require('])
            if (code.includes(g)) bad.push(`${path.relative(ROOT, p)}: ${g}`);
        }
      }
    };
    walk(path.join(ROOT, 'src', 'engine'));
    expect(bad).toEqual([]);
  });
});
