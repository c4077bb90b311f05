/**
 * The built add-in as Excel meets it: dist/functions.js loaded alone in a fresh `vm` context
 * with stub `CustomFunctions` and `Office` globals, against the dist/functions.json that the
 * metadata plugin generated from functions.ts.
 *
 * - every id of functions.json is associated, once, and nothing else is;
 * - the metadata's parameters (names, order, optionality, dimensionality) match what
 *   functions.ts declares and what the catalogue lists;
 * - each associated function, called with a sample argument set, gives a grid of numbers,
 *   text or Excel errors, never NaN or ±Infinity;
 * - the functions bundle stays under its size budget (printed): 150 KB minified was set for the
 *   first 20 functions; with 44 functions, the species data layer, E–pH, Pitzer and Faraday data
 *   and the host fast paths the bundle is about 219 KB, and the budget is 230 KB: the custom
 *   functions are synchronous and registered at load, so a chunk loaded on demand cannot hold
 *   them, and the data is only about 25 KB of it (docs/design.md, Performance targets).
 */
import * as fs from 'fs';
import * as path from 'path';
import * as vm from 'vm';
import * as zlib from 'zlib';
import ts from 'typescript';
import { CATALOGUE } from '../../src/functions/catalogue';
import {
  makeCustomFunctionsStub,
  StubError,
  type CustomFunctionsStub,
} from '../functions/customFunctionsStub';
import { BUILD_OUTPUTS, BUILD_TIMEOUT_MS, DIST, ROOT, ensureBuilt } from './ensureBuilt';

const SIZE_BUDGET_BYTES = 230 * 1024;
const FUNCTIONS_TS = path.join(ROOT, 'src', 'functions', 'functions.ts');

interface MetaParam {
  name: string;
  description?: string;
  dimensionality?: string;
  optional?: boolean;
  repeating?: boolean;
  type?: string;
}
interface MetaFunction {
  id: string;
  name: string;
  description?: string;
  helpUrl?: string;
  parameters: MetaParam[];
  result?: { dimensionality?: string; type?: string };
  options?: Record<string, unknown>;
}

/** A parameter as functions.ts declares it. */
interface DeclaredParam {
  name: string;
  optional: boolean;
  type: string;
}

/** The @customfunction functions of functions.ts: id → declared parameters (read with the TypeScript parser). */
function declaredFunctions(): Map<string, { fnName: string; params: DeclaredParam[] }> {
  const src = ts.createSourceFile(
    FUNCTIONS_TS,
    fs.readFileSync(FUNCTIONS_TS, 'utf8'),
    ts.ScriptTarget.ES2020,
    true,
  );
  const out = new Map<string, { fnName: string; params: DeclaredParam[] }>();
  for (const st of src.statements) {
    if (!ts.isFunctionDeclaration(st) || !st.name) continue;
    const tag = ts.getJSDocTags(st).find((t) => t.tagName.text === 'customfunction');
    if (!tag) continue;
    const comment =
      typeof tag.comment === 'string' ? tag.comment : (ts.getTextOfJSDocComment(tag.comment) ?? '');
    const id = comment.trim().split(/\s+/)[0] || st.name.text.toUpperCase();
    out.set(id, {
      fnName: st.name.text,
      params: st.parameters.map((p) => ({
        name: p.name.getText(src),
        optional: Boolean(p.questionToken || p.initializer),
        type: p.type ? p.type.getText(src) : 'any',
      })),
    });
  }
  return out;
}

/**
 * One sample argument set per function, as Excel passes them to `any[][]` parameters
 * (a cell as [[v]], an omitted optional argument as null), each a case that should compute.
 */
const cell = (v: unknown) => [[v]];
const SAMPLES: Record<string, unknown[]> = {
  POTENTIAL: [cell('Cu2+/Cu'), cell('Cu2+'), [[1], [0.1], [0.01]], cell(25), null],
  STDPOTENTIAL: [cell('Zn(s) | Zn2+(aq) || Cu2+(aq) | Cu(s)'), cell(40), null],
  QUOTIENT: [cell('Zn + Cu2+ -> Zn2+ + Cu'), [['Zn2+', 'Cu2+']], [[0.1, 0.01]], null],
  LOGQ: [cell('Zn + Cu2+ -> Zn2+ + Cu'), [['Zn2+', 'Cu2+']], [[0.1, 0.01]], null],
  LOGK: [cell(1.1), cell(2), null, null],
  EQCONST: [cell('Zn + Cu2+ -> Zn2+ + Cu'), null, null, null],
  GIBBS: [cell(0.434), cell(2), null, null],
  ELECTRONS: [cell('MnO4- + 8 H+ + 5 e- -> Mn2+ + 4 H2O'), null],
  BALANCE: [cell('MnO4- + Fe2+ -> Mn2+ + Fe3+'), cell('acid'), null],
  NERNSTSLOPE: [[[0], [25], [50]], cell(1)],
  CONCCELL: [cell('Ag+/Ag'), cell(0.01), cell(1), null, null, null],
  VSREF: [cell(-0.85), cell('Cu/CuSO4'), cell('SCE'), null, null],
  ACTCOEF: [cell('Ca2+'), cell(0.01), cell('extended'), null, null, null],
  PREDOMINANT: [cell('Fe'), [[-1], [0.5]], [[7], [10]], null, null],
  EPHCLASS: [cell('Zn'), [[-1.5], [-0.5]], [[6], [4]], null, null],
  EPHLINES: [cell('Cu'), null, null, null, null],
  ACTIVITY: [
    [['Na+', 'Cl-']],
    [
      [0.01, 0.01],
      [0.1, 0.1],
    ],
    null,
    cell('davies'),
    null,
    null,
  ],
  IONICSTR: [[['Na+', 'SO4^2-']], [[0.02, 0.01]]],
  MEANACTCOEF: [cell('NaCl'), cell(1), null, null, null],
  WATERACTIVITY: [cell('NaCl'), cell(1), null, null],
  MOLALITY: [cell('NaCl'), cell(1), null, null],
  COMBINE: [[[0.771, -0.447]], [[1, 2]]],
  SOURCE: [cell('Fe3+/Fe2+'), null],
  CELLNOTATION: [cell('Zn + Cu2+ -> Zn2+ + Cu'), [['Zn2+', 'Cu2+']], [[0.1, 0.01]], null],
  LISTTABLE: [cell('Fe')],
  CHECKTABLE: [
    [
      ['Half-reaction', 'E° (V)', 'dE°/dT (mV/K)', 'Source'],
      ['Cu2+ + 2 e- -> Cu', 0.34, '', 'my lab'],
    ],
  ],
  // Faraday, corrosion, kinetics and measurement functions
  DEPOSIT: [cell('Cu2+ + 2 e- -> Cu'), [[1000], [3600]], null],
  PLATETIME: [cell('Cu2+ + 2 e- -> Cu'), cell(25), cell(200), cell(8.96), cell(0.98)],
  THICKNESS: [cell('Ni2+ + 2 e- -> Ni'), cell(300), cell(3600), cell(8.9), null],
  CAPACITY: [[['Li+ + e- -> Li'], ['LiFePO4']], [[null], [1]]],
  SPECENERGY: [cell('Pb + PbO2 + 2 H2SO4 -> 2 PbSO4 + 2 H2O'), null],
  CORRATE: [[['Fe'], ['304']], cell(1), null, null],
  MASSLOSS: [cell('carbon steel'), cell(4.2), null, null],
  ANODELIFE: [cell(100), cell('zinc'), cell(0.5), cell('long slender stand-off')],
  BVCURRENT: [[[-0.1], [0], [0.1]], cell(1e-3), cell(0.5), null, null, null],
  OVERPOTENTIAL: [cell(1e-3), cell(1e-3), cell(0.5), null, null, cell(0.01)],
  TAFELSLOPE: [cell(0.5), null, null],
  MIXEDPOTENTIAL: [cell(-0.5), cell(1e-6), cell(0.06), cell(0), cell(1e-7), cell(0.12)],
  SOLVEFOR: [cell('2 H+ + 2 e- -> H2'), cell(-0.2), cell('pH'), cell('H2'), cell(1), null, null],
  JUNCTION: [[['HCl', 'KCl']], [[0.1, 0]], [[0, 0.1]], null],
  ISERESPONSE: [cell(0.2), cell(0.05916), [['K+', 'Na+']], [[1e-4, 0.1]], [[1e-3]]],
  // thermodynamics from the species data
  FORMATION: [[['H2O(l)'], ['Cu2+'], ['PbSO4(s)']], cell('H')],
  ENTHALPY: [cell('H2 + 1/2 O2 -> H2O'), [[25], [60]], null],
  ENTROPY: [cell('PbSO4(s) -> Pb2+ + SO4^2-'), null, null],
  THERMONEUTRAL: [cell('H2O -> H2 + 1/2 O2'), [[25], [80]]],
};

let metadata: MetaFunction[];
let bundle: string;
let stub: CustomFunctionsStub;
let context: vm.Context;

beforeAll(async () => {
  await ensureBuilt();
  metadata = (
    JSON.parse(fs.readFileSync(path.join(DIST, 'functions.json'), 'utf8')) as { functions: MetaFunction[] }
  ).functions;
  bundle = fs.readFileSync(path.join(DIST, 'functions.js'), 'utf8');
  stub = makeCustomFunctionsStub();
  const office = {
    onReady: () => Promise.resolve({ host: 'Excel', platform: 'PC' }),
    HostType: { Excel: 'Excel' },
  };
  const document = {
    readyState: 'complete',
    currentScript: null,
    addEventListener: () => undefined,
    getElementById: () => null,
    querySelector: () => null,
  };
  context = vm.createContext({
    CustomFunctions: stub,
    Office: office,
    document,
    console,
    setTimeout,
    clearTimeout,
  });
  const g = context as Record<string, unknown>;
  g.window = context;
  g.self = context;
  g.globalThis = context;
  vm.runInContext(bundle, context, { filename: 'dist/functions.js' });
}, BUILD_TIMEOUT_MS);

describe('npm run build output', () => {
  it('has every file the add-in needs', () => {
    for (const f of BUILD_OUTPUTS)
      expect({ file: f, exists: fs.existsSync(path.join(DIST, f)) }).toEqual({ file: f, exists: true });
  });

  it('keeps the functions bundle under 230 KB minified (size budget)', () => {
    const bytes = Buffer.byteLength(bundle, 'utf8');
    const gzipped = zlib.gzipSync(bundle, { level: 9 }).length;
    console.log(
      `dist/functions.js: ${(bytes / 1024).toFixed(1)} KB minified, ${(gzipped / 1024).toFixed(1)} KB gzipped ` +
        `(budget ${SIZE_BUDGET_BYTES / 1024} KB minified)`,
    );
    expect(bytes).toBeLessThan(SIZE_BUDGET_BYTES);
  });

  it('is minified, uses no eval and contacts no host', () => {
    expect(bundle.split('\n').length).toBeLessThan(20);
    expect(bundle).not.toMatch(/\beval\s*\(/);
    expect(bundle).not.toMatch(/new Function\s*\(/);
    expect(bundle).not.toMatch(/\b(fetch|XMLHttpRequest|WebSocket|importScripts)\b/);
  });

  it('serves a page that loads office.js, then the functions, then the task pane, under a strict CSP', () => {
    const html = fs.readFileSync(path.join(DIST, 'taskpane.html'), 'utf8');
    const scripts = [...html.matchAll(/<script[^>]*\bsrc=["']?([^"' >]+)/g)].map((m) => m[1]);
    expect(scripts).toEqual([
      'https://appsforoffice.microsoft.com/lib/1/hosted/office.js',
      'functions.js',
      'taskpane.js',
    ]);
    const csp = /<meta[^>]*http-equiv=["']?Content-Security-Policy["']?[^>]*content="([^"]+)"/i.exec(html);
    expect(csp).not.toBeNull();
    const directives = new Map(
      csp![1]!.split(';').map((d) => {
        const [name, ...sources] = d.trim().split(/\s+/);
        return [name!, sources] as const;
      }),
    );
    expect(directives.get('script-src')).toEqual(["'self'", 'https://appsforoffice.microsoft.com']);
    expect(directives.get('connect-src')).toEqual(["'self'"]);
    expect(csp![1]).not.toMatch(/unsafe-eval/);
    // The policy comes before any script, so that it governs all of them.
    expect(html.search(/Content-Security-Policy/i)).toBeLessThan(html.search(/<script/i));
  });
});

describe('dist/functions.json', () => {
  it('lists the catalogue’s functions: upper-case ids without the namespace, name = id', () => {
    expect(metadata.map((f) => f.id)).toEqual(CATALOGUE.map((s) => s.id));
    for (const f of metadata) {
      expect(f.id).toMatch(/^[A-Z][A-Z0-9]*$/);
      expect(f.id).not.toMatch(/ECHEM/);
      expect(f.name).toBe(f.id);
      expect(f.options).toBeUndefined(); // no streaming, volatile or address-requesting functions
    }
  });

  it('gives each function a description with an example, a help link to its reference section, and a spilled result', () => {
    for (const f of metadata) {
      expect(f.description).toBeTruthy();
      expect(f.description).toContain(`ECHEM.${f.id}(`);
      expect(f.helpUrl).toBe(`https://localhost:3000/taskpane.html#ref-${f.id.toLowerCase()}`);
      expect(f.result).toEqual({ dimensionality: 'matrix' });
    }
  });

  it('declares the parameters of functions.ts: names, order, optionality, matrix dimensionality', () => {
    const declared = declaredFunctions();
    expect([...declared.keys()]).toEqual(metadata.map((f) => f.id));
    for (const f of metadata) {
      const d = declared.get(f.id)!;
      expect(d.fnName).toBe(f.id);
      const fromMeta = f.parameters.map((p) => ({
        name: p.name,
        optional: p.optional === true,
        matrix: p.dimensionality === 'matrix',
        any: p.type === 'any',
        repeating: p.repeating === true,
      }));
      const fromTs = d.params.map((p) => ({
        name: p.name,
        optional: p.optional,
        matrix: /\[\]\[\]$/.test(p.type),
        any: p.type.startsWith('any'),
        repeating: false,
      }));
      expect({ id: f.id, params: fromMeta }).toEqual({ id: f.id, params: fromTs });
      for (const p of f.parameters)
        expect({ id: f.id, param: p.name, described: Boolean(p.description) }).toEqual({
          id: f.id,
          param: p.name,
          described: true,
        });
    }
  });

  it('matches the catalogue’s parameter lists (names, order, optionality)', () => {
    for (const spec of CATALOGUE) {
      const f = metadata.find((m) => m.id === spec.id)!;
      expect({ id: spec.id, params: f.parameters.map((p) => [p.name, p.optional === true]) }).toEqual({
        id: spec.id,
        params: spec.params.map((p) => [p.name, p.optional]),
      });
    }
  });

  it('says in each optional temp_C that it defaults to 25 °C', () => {
    for (const f of metadata) {
      const t = f.parameters.find((p) => p.name === 'temp_C');
      if (t)
        expect({ id: f.id, text: t.description }).toEqual({
          id: f.id,
          text: expect.stringMatching(/°C \(default 25\)/),
        });
    }
  });
});

describe('dist/functions.js in a fresh context', () => {
  it('associates every id of functions.json, once, and nothing else', () => {
    const ids = stub.calls.map(([id]) => id);
    expect(ids.slice().sort()).toEqual(metadata.map((f) => f.id).sort());
    expect(new Set(ids).size).toBe(ids.length);
    for (const [, fn] of stub.calls) expect(typeof fn).toBe('function');
  });

  it('gives each associated function the parameter count of its metadata', () => {
    for (const f of metadata)
      expect({ id: f.id, n: stub.associations.get(f.id)!.length }).toEqual({
        id: f.id,
        n: f.parameters.length,
      });
  });

  it('has a sample argument set for every function', () => {
    expect(Object.keys(SAMPLES).sort()).toEqual(metadata.map((f) => f.id).sort());
    for (const f of metadata)
      expect({ id: f.id, n: SAMPLES[f.id]!.length }).toEqual({ id: f.id, n: f.parameters.length });
  });

  it.each(CATALOGUE.map((s) => s.id))('%s returns a grid of values without NaN or Infinity', (id) => {
    const fn = stub.associations.get(id)!;
    const result = fn(...SAMPLES[id]!) as unknown[][];
    expect(Array.isArray(result)).toBe(true);
    expect(result.length).toBeGreaterThan(0);
    const width = result[0]!.length;
    expect(width).toBeGreaterThan(0);
    for (const row of result) {
      expect(Array.isArray(row)).toBe(true);
      expect(row).toHaveLength(width);
      for (const v of row) {
        if (v instanceof StubError) throw new Error(`${id} sample gave ${v.code} ${v.message ?? ''}`);
        expect(['number', 'string']).toContain(typeof v);
        if (typeof v === 'number') expect(Number.isFinite(v)).toBe(true);
      }
    }
  });

  it('gives the same value as the catalogue run directly (no drift in the bundle)', () => {
    const fromBundle = stub.associations.get('POTENTIAL')!(...SAMPLES.POTENTIAL!) as number[][];
    const direct = CATALOGUE.find((s) => s.id === 'POTENTIAL')!.impl(...(SAMPLES.POTENTIAL as never[]));
    expect(fromBundle.map((r) => [...r])).toEqual(direct);
  });

  it('returns errors as CustomFunctions.Error objects', () => {
    const r = stub.associations.get('STDPOTENTIAL')!(cell('Rh3+/Rh'), null, null) as unknown[][];
    expect(r[0]![0]).toBeInstanceOf(StubError);
    expect((r[0]![0] as StubError).code).toBe('#N/A');
  });
});
