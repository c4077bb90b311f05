/**
 * `potentia eph`: the SVG file it writes (parsed), the CSV of lines, the printed table, and its
 * messages and exit codes for bad input. Run in-process through main().
 */
import * as fs from 'node:fs';
import * as path from 'node:path';
import { XMLParser, XMLValidator } from 'fast-xml-parser';
import { main } from '../../src/cli/main';
import { captureIo, F, parseCsv, tempDir } from './helpers';

const dir = tempDir('eph');
const parser = new XMLParser({ ignoreAttributes: false, attributeNamePrefix: '@' });

/** Zn2+/Zn at activity a by hand: E° = −0.7618 V (OpenStax Chemistry 2e, Appendix L), slope (s/2) per decade. */
const znLine = (log10a: number): number =>
  -0.7618 + ((8.31446261815324 * 298.15 * Math.LN10) / F / 2) * log10a;

describe('potentia eph', () => {
  test('writes a parseable SVG of the diagram with the reference axis', async () => {
    const file = path.join(dir, 'zn.svg');
    const io = captureIo();
    const code = await main(
      ['eph', 'Zn', '--activity', '1e-4', '--temp', '40', '--ref', 'CSE', '--svg', file],
      io,
    );
    expect(code).toBe(0);
    const text = fs.readFileSync(file, 'utf8');
    expect(XMLValidator.validate(text)).toBe(true);
    const svg = (parser.parse(text) as { svg: Record<string, unknown> }).svg;
    expect(String(svg['title'])).toMatch(/zinc \(Zn\).*activity 1e-4, 40 °C/);
    expect(text).toMatch(/data-reference="CSE"/);
    expect(text).toMatch(/data-species="ZnO\(s\)"/);
    expect(io.stderr()).toMatch(/wrote .*zn\.svg: zinc, regions Zn\(s\) \(immunity\), Zn2\+ \(corrosion\)/);
  });
  test('--csv - prints the lines with a header; Zn/Zn2+ as derived by hand', async () => {
    const io = captureIo();
    expect(await main(['eph', 'zn', '--csv', '-'], io)).toBe(0);
    const text = io.stdout();
    // RFC 4180: every record ends with CRLF, also on standard output (no bare LF, no lone CR)
    expect(text.endsWith('\r\n')).toBe(true);
    expect(text.split('\r\n').some((l) => /[\r\n]/.test(l))).toBe(false);
    const rows = parseCsv(text);
    expect(rows[0]).toEqual(['species A', 'species B', 'pH1', 'E1 (V vs SHE)', 'pH2', 'E2 (V vs SHE)']);
    const zn = rows.find((r) => r[0] === 'Zn(s)' && r[1] === 'Zn2+');
    expect(Math.abs(Number(zn?.[3]) - znLine(-6))).toBeLessThan(2e-6);
    expect(rows.map((r) => r[0])).toEqual(expect.arrayContaining(['H+', 'O2(g)']));
  });
  test('without --svg or --csv the lines are printed as columns', async () => {
    const io = captureIo();
    expect(await main(['eph', 'Cu', '--ph-min', '2', '--ph-max', '12'], io)).toBe(0);
    expect(io.stdout()).toMatch(/^species A\s+species B\s+pH1/);
    expect(io.stdout()).toMatch(/Cu\(s\)\s+Cu2\+\s+2\s/);
  });
  test('refuses to replace a file without --force', async () => {
    const file = path.join(dir, 'exists.svg');
    fs.writeFileSync(file, 'x');
    const io = captureIo();
    expect(await main(['eph', 'Fe', '--svg', file], io)).toBe(2);
    expect(io.stderr()).toMatch(/already exists: add --force/);
    expect(await main(['eph', 'Fe', '--svg', file, '--force'], captureIo())).toBe(0);
    expect(fs.readFileSync(file, 'utf8')).toMatch(/^<svg/);
  });
  test.each([
    [['eph'], /eph needs an element/],
    [['eph', 'Xx'], /No E–pH diagram for element "Xx"/],
    [['eph', 'Fe', '--temp', '120'], /temp_C must be between 0 and 100 °C/],
    [['eph', 'Fe', '--activity', '0'], /activity must be above 0 and at most 1/],
    [['eph', 'Fe', '--activity', 'lots'], /--activity must be a number/],
    [['eph', 'Fe', '--ph-max', '18'], /pH_max must be between −2 and 16/],
    [['eph', 'Fe', '--ref', 'RHE', '--svg', path.join(dir, 'rhe.svg')], /depends on pH/],
  ])('%j is a usage error', async (argv, message) => {
    const io = captureIo();
    expect(await main(argv, io)).toBe(2);
    expect(io.stderr()).toMatch(message);
  });
  test('--help shows the options and the caution', async () => {
    const io = captureIo();
    expect(await main(['eph', '--help'], io)).toBe(0);
    expect(io.stdout()).toMatch(/--activity A/);
    expect(io.stdout()).toMatch(/kinetics and local chemistry decide/);
  });
});
