/**
 * No import circle anywhere in src/: the import graph of the TypeScript sources (static
 * `import … from` and `export … from`, type-only imports included, read with the TypeScript
 * parser) has no cycle. And the layering holds: the engine imports nothing outside itself, and
 * functions/, taskpane/ and cli/ reach the engine only through src/engine/index.ts.
 */
import * as fs from 'fs';
import * as path from 'path';
import ts from 'typescript';

const SRC = path.resolve(__dirname, '..', '..', 'src');

function sources(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((d) => {
    const p = path.join(dir, d.name);
    if (d.isDirectory()) return sources(p);
    return d.name.endsWith('.ts') && !d.name.endsWith('.d.ts') ? [p] : [];
  });
}

function resolveImport(from: string, spec: string): string | null {
  if (!spec.startsWith('.')) return null;
  const base = path.resolve(path.dirname(from), spec);
  for (const c of [`${base}.ts`, path.join(base, 'index.ts')]) if (fs.existsSync(c)) return c;
  return null;
}

/** file → the files of src/ it imports. */
function importGraph(): Map<string, string[]> {
  const graph = new Map<string, string[]>();
  for (const file of sources(SRC)) {
    const sf = ts.createSourceFile(file, fs.readFileSync(file, 'utf8'), ts.ScriptTarget.ES2020, false);
    const deps: string[] = [];
    sf.forEachChild((node) => {
      const spec =
        (ts.isImportDeclaration(node) || ts.isExportDeclaration(node)) &&
        node.moduleSpecifier &&
        ts.isStringLiteral(node.moduleSpecifier)
          ? node.moduleSpecifier.text
          : null;
      const target = spec === null ? null : resolveImport(file, spec);
      if (target) deps.push(target);
    });
    graph.set(file, deps);
  }
  return graph;
}

/** The cycles of a graph, each as the list of files around it (Tarjan's strongly connected components). */
export function cyclesOf(graph: ReadonlyMap<string, readonly string[]>): string[][] {
  let index = 0;
  const idx = new Map<string, number>();
  const low = new Map<string, number>();
  const stack: string[] = [];
  const on = new Set<string>();
  const out: string[][] = [];
  const visit = (v: string) => {
    idx.set(v, index);
    low.set(v, index);
    index++;
    stack.push(v);
    on.add(v);
    for (const w of graph.get(v) ?? []) {
      if (!idx.has(w)) {
        visit(w);
        low.set(v, Math.min(low.get(v)!, low.get(w)!));
      } else if (on.has(w)) low.set(v, Math.min(low.get(v)!, idx.get(w)!));
    }
    if (low.get(v) === idx.get(v)) {
      const comp: string[] = [];
      let w: string;
      do {
        w = stack.pop()!;
        on.delete(w);
        comp.push(w);
      } while (w !== v);
      if (comp.length > 1 || (graph.get(v) ?? []).includes(v)) out.push(comp);
    }
  };
  for (const v of graph.keys()) if (!idx.has(v)) visit(v);
  return out;
}

const rel = (f: string) => path.relative(SRC, f).split(path.sep).join('/');

describe('import graph of src/', () => {
  const graph = importGraph();

  test('the cycle finder finds a planted cycle (a → b → c → a) and no cycle in a chain', () => {
    expect(cyclesOf(new Map([['a', ['b']], ['b', ['c']], ['c', ['a']], ['d', ['a']]])).map((c) => c.sort())).toEqual([
      ['a', 'b', 'c'],
    ]);
    expect(cyclesOf(new Map([['a', ['b']], ['b', ['c']], ['c', []]]))).toEqual([]);
  });

  test('reads the whole tree', () => {
    expect(graph.size).toBeGreaterThan(40);
    expect(graph.get(path.join(SRC, 'functions', 'catalogue.ts'))!.map(rel)).toContain('functions/registry.ts');
  });

  test('has no import circle', () => {
    expect(cyclesOf(graph).map((c) => c.map(rel).sort())).toEqual([]);
  });

  test('the engine imports nothing outside src/engine', () => {
    const bad: string[] = [];
    for (const [file, deps] of graph)
      if (rel(file).startsWith('engine/'))
        for (const d of deps) if (!rel(d).startsWith('engine/')) bad.push(`${rel(file)} → ${rel(d)}`);
    expect(bad).toEqual([]);
  });

  test('functions/, taskpane/ and cli/ import the engine only through its index', () => {
    const bad: string[] = [];
    for (const [file, deps] of graph)
      if (!rel(file).startsWith('engine/'))
        for (const d of deps)
          if (rel(d).startsWith('engine/') && rel(d) !== 'engine/index.ts') bad.push(`${rel(file)} → ${rel(d)}`);
    expect(bad).toEqual([]);
  });
});
