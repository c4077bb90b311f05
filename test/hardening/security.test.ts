/**
 * Safety of the built add-in (docs/design.md, "Safety": no network requests besides the
 * platform's own script; no eval): the bundles make no network calls and evaluate no code,
 * the task pane's Content-Security-Policy forbids eval and foreign scripts, and the manifest
 * asks for no more than ReadWriteDocument.
 *
 * The bundles are read from dist/, which `npm test` builds first; a run on its own builds it
 * (test/build/ensureBuilt.ts) or fails, never skips. The manifest is checked from manifest/.
 *
 * The dependency audit needs the registry, so it is not a test: run scripts/audit.sh.
 */
import * as fs from 'fs';
import * as path from 'path';
import { BUILD_TIMEOUT_MS, ensureBuilt } from '../build/ensureBuilt';

const ROOT = path.resolve(__dirname, '..', '..');
const DIST = path.join(ROOT, 'dist');
const BUNDLES = ['functions.js', 'taskpane.js'];
const PAGE = 'taskpane.html';

beforeAll(() => ensureBuilt(), BUILD_TIMEOUT_MS);
const read = (f: string) => fs.readFileSync(path.join(DIST, f), 'utf8');

/**
 * What the bundles must not contain. `allowed` lists the only occurrences that are fine, each
 * with why; every other match is a finding.
 */
const FORBIDDEN: readonly {
  what: string;
  pattern: RegExp;
  allowed: readonly {
    pattern: RegExp;
    why: string;
    /** a further condition on the match (with the whole bundle), where a pattern cannot say it */
    check?: (m: RegExpMatchArray, text: string) => boolean;
  }[];
}[] = [
  {
    what: 'fetch(',
    pattern: /\bfetch\s*\(/g,
    allowed: [
      {
        // the task pane reads the build's own function metadata, beside the page (connect-src 'self')
        pattern:
          /\bfetch\s*\(\s*(["'`])functions\.json\1\s*,\s*\{\s*credentials\s*:\s*(["'])same-origin\2\s*\}\s*\)/g,
        why: "the task pane's same-origin read of functions.json",
      },
      {
        // the same read through loadReference's injectable fetch (src/taskpane/referenceData.ts),
        // as minified: `f(g=(a,b)=>fetch(a,b)){const r=await g(U,{credentials:"same-origin"})`,
        // where U must be bound to "functions.json" in the bundle
        pattern:
          /([\w$]+)\s*=\s*\(\s*([\w$]+)\s*,\s*([\w$]+)\s*\)\s*=>\s*fetch\s*\(\s*\2\s*,\s*\3\s*\)\s*\)\s*\{\s*const\s+[\w$]+\s*=\s*await\s+\1\s*\(\s*([\w$]+)\s*,\s*\{\s*credentials\s*:\s*(["'])same-origin\5\s*\}\s*\)/g,
        why: "the task pane's same-origin read of functions.json through an injectable fetch",
        check: (m, text) => {
          const url = m[4]!.replace(/\$/g, '\\$');
          return new RegExp(`(?<![\\w$.])${url}\\s*=\\s*(["'\`])functions\\.json\\1`).test(text);
        },
      },
    ],
  },
  { what: 'XMLHttpRequest', pattern: /XMLHttpRequest/g, allowed: [] },
  { what: 'WebSocket', pattern: /WebSocket/g, allowed: [] },
  { what: 'EventSource', pattern: /EventSource/g, allowed: [] },
  { what: 'navigator.sendBeacon', pattern: /sendBeacon/g, allowed: [] },
  { what: 'eval(', pattern: /\beval\s*\(/g, allowed: [] },
  { what: 'new Function', pattern: /\bnew\s+Function\b/g, allowed: [] },
  { what: 'Function("…") without new', pattern: /(?<![\w.$])Function\s*\(\s*["'`]/g, allowed: [] },
  {
    what: 'setTimeout/setInterval with a string',
    pattern: /\bset(?:Timeout|Interval)\s*\(\s*["'`]/g,
    allowed: [],
  },
  {
    what: 'importScripts',
    pattern: /importScripts/g,
    allowed: [
      {
        // webpack's automatic publicPath probe: a typeof test, never a call
        pattern: /(["'])undefined\1\s*!==?\s*typeof\s+importScripts(?!\s*\()/g,
        why: "webpack's publicPath runtime testing `typeof importScripts` (no call)",
      },
    ],
  },
  { what: 'dynamic import(', pattern: /(?<![\w.$])import\s*\(/g, allowed: [] },
];

/** Matches of `pattern` in `text` that no allowed pattern covers, with context. */
function findings(text: string, rule: (typeof FORBIDDEN)[number]): string[] {
  const allowedSpans: [number, number][] = [];
  for (const a of rule.allowed)
    for (const m of text.matchAll(a.pattern))
      if (!a.check || a.check(m, text)) allowedSpans.push([m.index, m.index + m[0].length]);
  const out: string[] = [];
  for (const m of text.matchAll(rule.pattern)) {
    const at = m.index;
    if (allowedSpans.some(([from, to]) => at >= from && at < to)) continue;
    out.push(`${rule.what} at ${at}: …${text.slice(Math.max(0, at - 60), at + 60)}…`);
  }
  return out;
}

describe('built bundles', () => {
  test.each(BUNDLES)('%s makes no network request and evaluates no code', (file) => {
    const text = read(file);
    expect(text.length).toBeGreaterThan(1000);
    const found = FORBIDDEN.flatMap((rule) => findings(text, rule));
    expect(found).toEqual([]);
  });

  test('the one allowed fetch is the task pane reading functions.json, and nothing else is fetched', () => {
    const pane = read('taskpane.js');
    const fetchRule = FORBIDDEN.find((r) => r.what === 'fetch(')!;
    // exactly one fetch call in the pane, and it is an allowed read of functions.json
    expect([...pane.matchAll(fetchRule.pattern)]).toHaveLength(1);
    expect(findings(pane, fetchRule)).toEqual([]);
    expect(read('functions.js')).not.toMatch(/\bfetch\s*\(/);
  });

  test.each([
    [
      'another address',
      'async function j(e=(e,t)=>fetch(e,t)){const t=await e(K,{credentials:"same-origin"})}K="https://example.org/q";',
    ],
    [
      'credentials sent cross-origin',
      'async function j(e=(e,t)=>fetch(e,t)){const t=await e(K,{credentials:"include"})}K="functions.json";',
    ],
    [
      'a forwarder that rewrites the address',
      'async function j(e=(e,t)=>fetch(e+"x",t)){const t=await e(K,{credentials:"same-origin"})}K="functions.json";',
    ],
  ])('the fetch allowance does not cover %s', (_label, bad) => {
    const fetchRule = FORBIDDEN.find((r) => r.what === 'fetch(')!;
    expect(findings(bad, fetchRule)).toHaveLength(1);
  });

  test('the checks can fail: a bundle that calls out is caught', () => {
    const bad = 'x=fetch("https://example.org/q");eval("1");new Function("return 1");importScripts("w.js")';
    const found = FORBIDDEN.flatMap((rule) => findings(bad, rule)).map((f) => f.split(' at ')[0]);
    expect(found).toEqual(expect.arrayContaining(['fetch(', 'eval(', 'new Function', 'importScripts']));
  });
});

/** The Content-Security-Policy of an HTML page, directive → sources; null where it has none. */
function contentSecurityPolicy(html: string): Map<string, string[]> | null {
  for (const m of html.matchAll(/<meta\b[^>]*>/gi)) {
    const tag = m[0];
    if (!/http-equiv\s*=\s*["']?Content-Security-Policy["']?/i.test(tag)) continue;
    const content = /content\s*=\s*(["'])(.*?)\1/is.exec(tag)?.[2];
    if (content === undefined) return new Map();
    const policy = new Map<string, string[]>();
    for (const part of content.split(';')) {
      const [name, ...sources] = part.trim().split(/\s+/);
      if (name) policy.set(name.toLowerCase(), sources);
    }
    return policy;
  }
  return null;
}

describe('task pane page', () => {
  const OFFICE_JS = 'https://appsforoffice.microsoft.com';

  test('has a Content-Security-Policy meta tag without unsafe-eval', () => {
    const csp = contentSecurityPolicy(read(PAGE));
    expect(csp).not.toBeNull();
    const all = [...csp!.values()].flat();
    expect(all).not.toContain("'unsafe-eval'");
    expect(all).not.toContain("'wasm-unsafe-eval'");
  });

  test("scripts come only from the add-in itself and the platform's own library; connections only to itself", () => {
    const csp = contentSecurityPolicy(read(PAGE))!;
    const scripts = csp.get('script-src') ?? csp.get('default-src') ?? [];
    expect(scripts.filter((s) => s !== "'self'" && s !== OFFICE_JS)).toEqual([]);
    expect(scripts).not.toContain("'unsafe-inline'");
    const connect = csp.get('connect-src') ?? csp.get('default-src') ?? [];
    expect(connect).toEqual(["'self'"]);
    expect(csp.get('object-src')).toEqual(["'none'"]);
  });

  test('loads no script from elsewhere than the platform library', () => {
    const srcs = [...read(PAGE).matchAll(/<script\b[^>]*\bsrc\s*=\s*["']?([^"' >]+)/gi)].map((m) => m[1]!);
    expect(srcs.length).toBeGreaterThan(0);
    expect(srcs.filter((s) => /^(https?:)?\/\//i.test(s) && !s.startsWith(`${OFFICE_JS}/`))).toEqual([]);
  });

  test('the policy parser finds unsafe-eval where it is (so the check can fail)', () => {
    const bad = contentSecurityPolicy(
      `<meta http-equiv="Content-Security-Policy" content="default-src 'self'; script-src 'self' 'unsafe-eval'">`,
    );
    expect(bad?.get('script-src')).toContain("'unsafe-eval'");
    expect(contentSecurityPolicy('<meta charset="utf-8">')).toBeNull();
  });
});

describe('manifest', () => {
  const xml = fs.readFileSync(path.join(ROOT, 'manifest', 'manifest.xml'), 'utf8');
  // Office permission levels, least to most; an add-in for workbooks needs at most ReadWriteDocument
  const LEVELS = ['Restricted', 'ReadDocument', 'ReadAllDocument', 'WriteDocument', 'ReadWriteDocument'];

  test('asks for ReadWriteDocument or less, once', () => {
    const perms = [...xml.matchAll(/<Permissions>\s*([^<\s]+)\s*<\/Permissions>/g)].map((m) => m[1]!);
    expect(perms).toHaveLength(1);
    expect(LEVELS).toContain(perms[0]);
  });

  test('names no extra app domain', () => {
    expect(xml).not.toMatch(/<AppDomain\b/);
  });
});
