/**
 * The task pane in headless Chromium: the built dist/ served on 127.0.0.1, office.js
 * answered by a mock Office host of our own (test/browser/mockOfficeHost.js) so that no
 * network is used. Fills the sweep builder, checks the formula preview and the positioned
 * error of a bad reaction, builds the sweep and reads back the recorded workbook writes,
 * inserts a potentials sheet next to an existing "Potentials", shows an Office failure,
 * and checks the pane outside Excel. Screenshots go to test-output/.
 *
 * Skipped, with a warning, where /usr/bin/chromium is not installed.
 */
import { execSync } from 'child_process';
import * as fs from 'fs';
import * as os from 'os';
import * as path from 'path';
import { type BrowserContext, chromium, type Page } from 'playwright-core';
import { serveStatic, type StaticServer } from './staticServer';

const CHROMIUM = '/usr/bin/chromium';
const ROOT = path.join(__dirname, '..', '..');
const DIST = path.join(ROOT, 'dist');
const OUT = path.join(ROOT, 'test-output');
const OFFICE_JS = 'https://appsforoffice.microsoft.com/lib/1/hosted/office.js';
const MOCK_HOST = fs.readFileSync(path.join(__dirname, 'mockOfficeHost.js'), 'utf8');

const haveChromium = fs.existsSync(CHROMIUM);
if (!haveChromium) {
  console.warn(`taskpane.browser.test.ts: ${CHROMIUM} is not installed, so the browser test is skipped.`);
}

interface RecordedRange {
  address: string;
  values?: unknown[][];
  formulas?: string[][];
  numberFormat?: string[][];
}
interface RecordedChart {
  type: string;
  source: string;
  title: { text?: string };
  axes: { categoryAxis: { title: { text?: string } }; valueAxis: { title: { text?: string } } };
  recordedSeries: { name?: string; xValues?: string; values?: string };
  position?: [string, string];
}
interface RecordedSheet {
  name: string;
  added: boolean;
  ranges: RecordedRange[];
  charts: RecordedChart[];
  frozenRows: number;
  activated: boolean;
}

async function recordedSheets(page: Page): Promise<RecordedSheet[]> {
  return page.evaluate(() => {
    const g = globalThis as unknown as { __potentiaMock: { sheets: unknown } };
    return JSON.parse(JSON.stringify(g.__potentiaMock.sheets)) as RecordedSheet[];
  });
}

function written(sheet: RecordedSheet | undefined, address: string): RecordedRange {
  const r = sheet?.ranges.filter((x) => x.address === address && (x.values || x.formulas));
  const last = r?.[r.length - 1];
  if (!last) throw new Error(`nothing written at ${sheet?.name}!${address}`);
  return last;
}

(haveChromium ? describe : describe.skip)('task pane in headless Chromium', () => {
  let server: StaticServer;
  let context: BrowserContext;
  let userDataDir: string;
  /** Requests the page tried to make anywhere but our server (and office.js): must stay empty. */
  const foreign: string[] = [];
  const cspViolations: string[] = [];

  beforeAll(async () => {
    if (!fs.existsSync(path.join(DIST, 'taskpane.html'))) {
      execSync('npx webpack --mode production', { cwd: ROOT, stdio: 'inherit' });
    }
    fs.mkdirSync(OUT, { recursive: true });
    server = await serveStatic(DIST);
    userDataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'potentia-chromium-'));
    context = await chromium.launchPersistentContext(userDataDir, {
      executablePath: CHROMIUM,
      headless: true,
      args: [
        '--headless',
        '--no-sandbox',
        '--disable-gpu',
        '--disable-quic',
        '--no-first-run',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
      ],
      viewport: { width: 460, height: 1300 },
    });
  }, 300_000);

  afterAll(async () => {
    await context?.close();
    await server?.close();
    if (userDataDir) fs.rmSync(userDataDir, { recursive: true, force: true });
  });

  /** A new page whose office.js is `officeScript` and whose workbook holds `existing` sheets. */
  async function openPane(officeScript: string, existing: string[] = ['Sheet1']): Promise<Page> {
    const page = await context.newPage();
    await page.addInitScript((names: string[]) => {
      (globalThis as unknown as { __potentiaExisting: string[] }).__potentiaExisting = names;
    }, existing);
    await page.route('**/*', async (route) => {
      const url = route.request().url();
      if (url === OFFICE_JS) {
        await route.fulfill({ status: 200, contentType: 'text/javascript', body: officeScript });
      } else if (url.startsWith(`${server.origin}/`)) {
        await route.continue();
      } else {
        foreign.push(url);
        await route.abort();
      }
    });
    page.on('console', (msg) => {
      if (/Content Security Policy/i.test(msg.text())) cspViolations.push(msg.text());
    });
    page.on('pageerror', (err) => cspViolations.push(`page error: ${err.message}`));
    await page.goto(`${server.origin}/taskpane.html`);
    return page;
  }

  test('inside Excel: preview, positioned error, sweep build, potentials sheet, Office failure', async () => {
    const page = await openPane(MOCK_HOST, ['Sheet1', 'Potentials']);
    await page.getByText('Connected to Excel.').waitFor();

    // the cautions line is visible
    const cautions = page.locator('#cautions');
    expect(await cautions.isVisible()).toBe(true);
    expect(await cautions.textContent()).toContain('thermodynamic estimates, not measurements');

    // labels are bound to their inputs
    const reaction = page.getByLabel('Reaction: half-reaction, couple, cell diagram or full reaction');
    await reaction.fill('Fe3+/Fe2+');
    await page.locator('#sw-reaction-msg', { hasText: 'Reads as a couple, n = 1' }).waitFor();
    expect(
      await page
        .locator('#sw-species input[data-role="name"]')
        .evaluateAll((els) => els.map((e) => (e as HTMLInputElement).value)),
    ).toEqual(['Fe3+', 'Fe2+']);
    await page.getByLabel('Quantity').selectOption('activity:Fe3+');
    await page.getByLabel('From (activity; gases: bar)').fill('1e-4');
    await page.getByLabel('To (activity; gases: bar)').fill('1');
    await page.getByLabel('Points (cases, both ends included)').fill('9');
    await page.getByLabel('Value of Fe2+').fill('0.01');
    expect(await page.getByLabel('Value of Fe3+ (varied)').isDisabled()).toBe(true);

    // the formula preview: what will be written, and where
    await page.locator('#sw-formula', { hasText: '=ECHEM.POTENTIAL(B1,A6:B6,A7:B15,C7:C15)' }).waitFor();
    expect(await page.locator('#sw-formula-where').textContent()).toBe(
      ' (cell E7 of the new sheet; it spills to E7:E15)',
    );
    expect(await page.locator('#sw-summary').textContent()).toContain(
      'header row Fe3+ | Fe2+ | temp_C | log10 a(Fe3+) | E / V vs SHE',
    );
    // engine check: E° = 0.771 V (OpenStax Appendix L), 0.05916 V per decade (SI exact constants)
    const preview = await page.locator('#sw-preview').textContent();
    expect(preview).toContain('E = 0.6527 V for the first case, 0.8893 V for the last');
    expect(preview).toContain('Nernst slope 0.05916 V per decade at 25 °C');

    // a bad reaction: the engine's positioned message and a caret under character 5
    await reaction.fill('Zn2 + ->');
    await page.locator('#sw-reaction-msg', { hasText: 'character 5' }).waitFor();
    expect(await page.locator('#sw-caret').textContent()).toBe('Zn2 + ->\n    ^');
    expect(await reaction.getAttribute('aria-invalid')).toBe('true');
    expect(await page.locator('#sw-build').isDisabled()).toBe(true);
    expect(await page.locator('#sw-why').textContent()).toBe('Fix the inputs above first.');
    await page.locator('#sweep').screenshot({ path: path.join(OUT, 'taskpane-reaction-error.png') });

    // back to a good reaction: the typed values survive
    await reaction.fill('Fe3+/Fe2+');
    await page.locator('#sw-formula', { hasText: '=ECHEM.POTENTIAL(B1,A6:B6,A7:B15,C7:C15)' }).waitFor();
    expect(await page.getByLabel('Value of Fe2+').inputValue()).toBe('0.01');

    // build: the recorded writes
    await page.locator('#sw-build').click();
    await page.locator('#sw-status.success', { hasText: 'Created sheet "E vs log a(Fe3+)"' }).waitFor();
    let sheets = await recordedSheets(page);
    const sweep = sheets.find((s) => s.name === 'E vs log a(Fe3+)');
    expect(sweep?.added).toBe(true);
    expect(written(sweep, 'B1').values).toEqual([['Fe3+/Fe2+']]);
    expect(written(sweep, 'A6:E6').values).toEqual([
      ['Fe3+', 'Fe2+', 'temp_C', 'log10 a(Fe3+)', 'E / V vs SHE'],
    ]);
    const cases = written(sweep, 'A7:C15').values as number[][];
    expect(cases.map((r) => r[0])).toEqual(
      [
        1e-4,
        1e-3 / Math.sqrt(10),
        1e-3,
        1e-2 / Math.sqrt(10),
        0.01,
        0.1 / Math.sqrt(10),
        0.1,
        1 / Math.sqrt(10),
        1,
      ].map((v) => Number(v.toPrecision(15))),
    );
    expect(cases.every((r) => r[1] === 0.01 && r[2] === 25)).toBe(true);
    expect(written(sweep, 'D7:D15').formulas?.[0]).toEqual(['=LOG10(A7)']);
    expect(written(sweep, 'E7').formulas).toEqual([['=ECHEM.POTENTIAL(B1,A6:B6,A7:B15,C7:C15)']]);
    const chart = sweep?.charts[0];
    expect(chart?.type).toBe('XYScatterLines');
    expect(chart?.recordedSeries).toEqual({ name: 'E / V vs SHE', xValues: 'D7:D15', values: 'E7:E15' });
    expect(chart?.axes.categoryAxis.title.text).toBe('log10 a(Fe3+)');
    expect(chart?.axes.valueAxis.title.text).toBe('E / V vs SHE');
    expect(sweep?.activated).toBe(true);

    // potentials sheet: "Potentials" exists, so "Potentials (2)"; the pane says what it created
    await page.getByLabel('Only rows with (element or species, optional)').fill('Fe');
    await page.locator('#pot-count', { hasText: '(the element Fe) will go into a new sheet' }).waitFor();
    await page.locator('#pot-insert').click();
    await page.locator('#pot-status.success', { hasText: 'Created sheet "Potentials (2)"' }).waitFor();
    const status = await page.locator('#pot-status').textContent();
    expect(status).toMatch(/Pass 'Potentials \(2\)'!A2:D\d+ as the table argument\./);
    sheets = await recordedSheets(page);
    const original = sheets.find((s) => s.name === 'Potentials');
    expect(original?.ranges).toEqual([]);
    const pot = sheets.find((s) => s.name === 'Potentials (2)');
    expect(written(pot, 'A1:D1').values).toEqual([
      ['Half-reaction', 'E° (V vs SHE, 25 °C)', 'dE°/dT (mV/K)', 'Source'],
    ]);
    expect(pot?.frozenRows).toBe(1);
    // the sweep builder now offers that range as its table, and the preview formula passes it
    const tableRef = /Pass ('Potentials \(2\)'!A2:D\d+)/.exec(status ?? '')?.[1];
    expect(
      await page.getByLabel('Potentials table (optional range, e.g. Potentials!A2:D131)').inputValue(),
    ).toBe(tableRef);
    expect(await page.locator('#sw-formula').textContent()).toBe(
      `=ECHEM.POTENTIAL(B1,A6:B6,A7:B15,C7:C15,${tableRef})`,
    );

    // the screenshot: from the banner to the end of the sweep builder
    await page.evaluate(() => window.scrollTo(0, 0));
    const sweepBox = await page.locator('#sweep').boundingBox();
    await page.screenshot({
      path: path.join(OUT, 'taskpane.png'),
      fullPage: true,
      clip: {
        x: 0,
        y: 0,
        width: 460,
        height: Math.ceil((sweepBox?.y ?? 0) + (sweepBox?.height ?? 1300) + 12),
      },
    });

    // an Office failure is shown, not swallowed
    await page.evaluate(() => {
      const g = globalThis as unknown as { __potentiaMock: { failNextRun: unknown } };
      g.__potentiaMock.failNextRun = {
        code: 'GeneralException',
        message: 'An internal error has occurred.',
        debugInfo: { errorLocation: 'Workbook' },
      };
    });
    await page.locator('#pot-insert').click();
    await page.locator('#pot-status.error').waitFor();
    expect(await page.locator('#pot-status').textContent()).toBe(
      'Error: Inserting the potentials sheet failed: An internal error has occurred. (Excel error GeneralException at Workbook)',
    );
    expect((await recordedSheets(page)).filter((s) => s.added).map((s) => s.name)).toEqual([
      'E vs log a(Fe3+)',
      'Potentials (2)',
    ]);

    // the reference, from functions.json, with anchors and an insert-example button
    await page.locator('#ref-potential').waitFor();
    expect(await page.locator('#ref-potential h3').textContent()).toBe(
      'ECHEM.POTENTIAL(reaction, [species], [values], [temp_C], [table])',
    );
    const insert = page.locator('#ref-potential button[data-example]').first();
    expect(await insert.isEnabled()).toBe(true);
    const example = await page.locator('#ref-potential .example code').first().textContent();
    await insert.click();
    await page.locator('#ref-potential .status.success', { hasText: 'Wrote =ECHEM.POTENTIAL(' }).waitFor();
    const ex = (await recordedSheets(page)).find((s) => s.name === 'Example POTENTIAL');
    expect(written(ex, 'B3').formulas).toEqual([[example]]);

    // keyboard: Tab from the filter reaches its button, with a visible focus ring
    await page.locator('#pot-filter').focus();
    await page.keyboard.press('Tab');
    expect(await page.evaluate(() => document.activeElement?.id)).toBe('pot-insert');
    expect(await page.locator('#pot-insert').evaluate((e) => getComputedStyle(e).outlineStyle)).toBe('solid');

    expect(cspViolations).toEqual([]);
    await page.close();
  });

  test('a help link lands on its reference entry', async () => {
    const page = await context.newPage();
    await page.route(OFFICE_JS, (route) =>
      route.fulfill({ status: 200, contentType: 'text/javascript', body: MOCK_HOST }),
    );
    await page.goto(`${server.origin}/taskpane.html#ref-nernstslope`);
    await page.locator('#ref-nernstslope').waitFor();
    await page.waitForFunction(() => document.activeElement?.id === 'ref-nernstslope-title');
    expect(await page.locator('#ref-nernstslope h3').textContent()).toBe('ECHEM.NERNSTSLOPE([temp_C], [n])');
    // the entry's heading is below the sticky cautions line, not under it
    const caution = await page.locator('#cautions').boundingBox();
    const heading = await page.locator('#ref-nernstslope-title').boundingBox();
    expect(heading && caution && heading.y >= caution.y + caution.height).toBe(true);
    await page.screenshot({ path: path.join(OUT, 'taskpane-reference.png') });
    await page.close();
  });

  test('outside Excel: says so, keeps the reference and the preview, disables writing with the reason', async () => {
    // office.js that defines no Office (as when the platform script cannot load)
    const page = await openPane('/* no Office here */');
    await page.locator('#host-status', { hasText: 'Office did not load' }).waitFor();
    expect(await page.locator('#host-status').textContent()).toContain('writing sheets needs Excel');
    expect(await page.locator('#pot-insert').isDisabled()).toBe(true);
    expect(await page.locator('#pot-why').textContent()).toContain('Writing sheets needs Excel');
    expect(await page.locator('#sw-build').isDisabled()).toBe(true);
    expect(await page.locator('#sw-why').textContent()).toContain('Writing sheets needs Excel');
    // the reaction check and formula preview still work
    await page.locator('#sw-formula', { hasText: '=ECHEM.POTENTIAL(B1,A6,A7:A31,B7:B31)' }).waitFor();
    await page
      .getByLabel('Reaction: half-reaction, couple, cell diagram or full reaction')
      .fill('Cu2+ + 2e- ->> Cu');
    await page.locator('#sw-reaction-msg.error-text').waitFor();
    // the reference still renders, its insert buttons disabled
    await page.locator('#ref-potential').waitFor();
    expect(await page.locator('#ref-potential button[data-example]').first().isDisabled()).toBe(true);
    expect(await page.locator('#ref-insert-note').textContent()).toContain('needs Excel');
    expect(await page.locator('#cautions').isVisible()).toBe(true);
    await page.screenshot({ path: path.join(OUT, 'taskpane-outside-excel.png') });
    expect(cspViolations).toEqual([]);
    await page.close();
  });

  test('Office present but the host is not Excel: says so and disables writing', async () => {
    const notExcel =
      'globalThis.Office = { onReady: function (cb) { var i = { host: "Word", platform: "PC" }; if (cb) cb(i); return Promise.resolve(i); } };';
    const page = await openPane(notExcel);
    await page
      .locator('#host-status', { hasText: 'Not running inside Excel (the host here is Word).' })
      .waitFor();
    expect(await page.locator('#sw-build').isDisabled()).toBe(true);
    expect(await page.locator('#pot-insert').isDisabled()).toBe(true);
    await page.close();
  });

  test('no request left this machine', () => {
    expect(foreign).toEqual([]);
    expect(server.requests).toEqual(
      expect.arrayContaining(['/taskpane.html', '/functions.js', '/taskpane.js', '/functions.json']),
    );
  });
});
