/**
 * Build settings for a real deployment: one engine in the page (the pane uses the modules of
 * functions.js), the deployment address written into the manifest and every help link, and
 * Office.js served from the add-in itself on request. The default build is checked in
 * dist/; one more build with both settings (unminified, to save time) goes to a temporary folder.
 */
import { execFile } from 'node:child_process';
import * as fs from 'node:fs';
import * as os from 'node:os';
import * as path from 'node:path';
import { BUILD_TIMEOUT_MS, DIST, ensureBuilt, ROOT } from './ensureBuilt';

const ORIGIN = 'https://addins.example.net/potentia';
const CDN = 'https://appsforoffice.microsoft.com/lib/1/hosted/office.js';
const out = fs.mkdtempSync(path.join(os.tmpdir(), 'potentia-deploy-'));
afterAll(() => fs.rmSync(out, { recursive: true, force: true }));

const read = (dir: string, f: string) => fs.readFileSync(path.join(dir, f), 'utf8');

describe('the default build: one engine in the page', () => {
  beforeAll(ensureBuilt, BUILD_TIMEOUT_MS);

  test('the engine and its table are in functions.js only, not in taskpane.js', () => {
    // A source note of the built-in potentials table, carried by the engine's data module.
    const marker = 'OpenStax Chemistry 2e, Appendix L';
    expect(read(DIST, 'functions.js')).toContain(marker);
    expect(read(DIST, 'taskpane.js')).not.toContain(marker);
  });

  test('the page loads functions.js before taskpane.js, which uses its modules', () => {
    const html = read(DIST, 'taskpane.html');
    const f = html.indexOf('functions.js');
    const t = html.indexOf('taskpane.js');
    expect(f).toBeGreaterThan(0);
    expect(t).toBeGreaterThan(f);
    // taskpane.js carries no webpack runtime of its own: it registers into functions.js's.
    expect(read(DIST, 'taskpane.js')).toMatch(/webpackChunk/);
  });

  test('development address and Office CDN by default', () => {
    expect(read(DIST, 'manifest.xml')).toContain('https://localhost:3000/taskpane.html');
    expect(read(DIST, 'taskpane.html')).toContain(CDN);
  });
});

describe(`--env origin=${ORIGIN} --env officejs=local`, () => {
  beforeAll(async () => {
    await new Promise<void>((resolve, reject) =>
      execFile(
        process.execPath,
        [
          require.resolve('webpack-cli/bin/cli.js'),
          // Development mode: the settings act the same, and the build skips minification.
          '--mode',
          'development',
          '--env',
          `origin=${ORIGIN}`,
          '--env',
          'officejs=local',
          '--output-path',
          out,
        ],
        { cwd: ROOT, timeout: BUILD_TIMEOUT_MS, maxBuffer: 16 * 1024 * 1024 },
        (e, _stdout, stderr) => (e ? reject(new Error(`${e.message}\n${stderr}`)) : resolve()),
      ),
    );
  }, BUILD_TIMEOUT_MS);

  test('no file of the build names the development address', () => {
    for (const f of ['manifest.xml', 'functions.json', 'taskpane.html', 'functions.js', 'taskpane.js']) {
      expect({ f, dev: read(out, f).includes('localhost:3000') }).toEqual({ f, dev: false });
    }
  });

  test('the manifest points at the deployment address', () => {
    const manifest = read(out, 'manifest.xml');
    expect(manifest).toContain(`<SourceLocation DefaultValue="${ORIGIN}/taskpane.html"/>`);
    expect(manifest).toContain(`DefaultValue="${ORIGIN}/functions.json"`);
    expect(manifest).toContain(`DefaultValue="${ORIGIN}/assets/icon-32.png"`);
  });

  test('every help link of functions.json points at the deployment address', () => {
    const meta = JSON.parse(read(out, 'functions.json')) as { functions: { helpUrl?: string }[] };
    const links = meta.functions.map((f) => f.helpUrl);
    expect(links.length).toBeGreaterThanOrEqual(20);
    for (const link of links) expect(link).toMatch(new RegExp(`^${ORIGIN.replace(/[.]/g, '\\.')}/taskpane\\.html#`));
  });

  test('Office.js is copied into office-js/ and the page and its policy point there', () => {
    expect(fs.existsSync(path.join(out, 'office-js', 'office.js'))).toBe(true);
    expect(fs.existsSync(path.join(out, 'office-js', 'excel-win32-16.01.js'))).toBe(true);
    const html = read(out, 'taskpane.html');
    expect(html).not.toContain('appsforoffice.microsoft.com');
    expect(html).toMatch(/<script src="?office-js\/office\.js"?>/);
    expect(html).toMatch(/script-src 'self'[;"]/);
  });
});

describe('package scripts the Office add-in tooling expects', () => {
  const pkg = JSON.parse(read(ROOT, 'package.json')) as {
    scripts: Record<string, string>;
    devDependencies: Record<string, string>;
  };

  test('"dev-server" starts the webpack dev server', () => {
    expect(pkg.scripts['dev-server']).toMatch(/^webpack serve\b/);
  });

  test('office-addin-cli and @microsoft/office-js are declared', () => {
    expect(pkg.devDependencies['office-addin-cli']).toBeDefined();
    expect(pkg.devDependencies['@microsoft/office-js']).toBeDefined();
  });
});
