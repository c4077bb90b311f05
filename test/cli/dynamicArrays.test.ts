/**
 * Spills are written as dynamic arrays (the XLDAPR cell metadata of xl/metadata.xml and
 * `cm` on the anchor; ECMA-376 Part 1 §18.9 and the Excel 2017 dynamic-array extension),
 * and a recalculated workbook opens in LibreOffice with the cells the runner computed.
 */
import { execFile } from 'node:child_process';
import * as fs from 'node:fs';
import * as path from 'node:path';
import ExcelJS from 'exceljs';
import JSZip from 'jszip';
import { TEMPLATE_DIR } from '../../src/cli/templateLayout';
import { runMain, tempDir } from './helpers';

const dir = tempDir('dynamic');
afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));

async function partsOf(file: string): Promise<JSZip> {
  return JSZip.loadAsync(fs.readFileSync(file));
}

describe('dynamic-array metadata', () => {
  let zip: JSZip;
  beforeAll(async () => {
    const out = path.join(dir, 'sweep.xlsx');
    const r = await runMain(['recalc', path.join(TEMPLATE_DIR, 'cell-voltage-sweep.xlsx'), '-o', out]);
    expect(r.code).toBe(0);
    zip = await partsOf(out);
  });

  test('the metadata part declares the XLDAPR type with fDynamic="1"', async () => {
    const xml = (await zip.file('xl/metadata.xml')?.async('string')) ?? '';
    expect(xml).toContain('<metadataType name="XLDAPR"');
    expect(xml).toContain('<xda:dynamicArrayProperties fDynamic="1" fCollapsed="0"/>');
    expect(xml).toContain('<cellMetadata count="1"><bk><rc t="1" v="0"/></bk></cellMetadata>');
  });

  test('the part is related from the workbook and has its content type', async () => {
    const rels = (await zip.file('xl/_rels/workbook.xml.rels')?.async('string')) ?? '';
    expect(rels).toMatch(/Type="[^"]*\/relationships\/sheetMetadata" Target="metadata.xml"/);
    const types = (await zip.file('[Content_Types].xml')?.async('string')) ?? '';
    expect(types).toContain(
      '<Override PartName="/xl/metadata.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheetMetadata+xml"/>',
    );
  });

  test('the spill anchor E7 carries cm="1" on its array formula; no other cell does', async () => {
    const sheet = (await zip.file('xl/worksheets/sheet1.xml')?.async('string')) ?? '';
    expect(sheet).toMatch(/<c r="E7"[^>]* cm="1"><f t="array" ref="E7:E18">/);
    expect(sheet.match(/ cm="1"/g)).toHaveLength(1);
  });

  test('a workbook without spills gets no metadata part', async () => {
    const out = path.join(dir, 'cp.xlsx');
    expect(
      (await runMain(['recalc', path.join(TEMPLATE_DIR, 'cathodic-protection-check.xlsx'), '-o', out])).code,
    ).toBe(0);
    expect((await partsOf(out)).file('xl/metadata.xml')).toBeNull();
  });
});

const SOFFICE = '/usr/bin/soffice';
// Runs wherever LibreOffice is installed (CI installs it); fails when it disagrees. Under CI
// (CI=true, as .ci/run sets) a missing LibreOffice is a failure, not a skip.
const haveLibreOffice = fs.existsSync(SOFFICE);
const withLibreOffice = haveLibreOffice ? describe : describe.skip;
if (!haveLibreOffice && /^(1|true|yes)$/i.test(process.env.CI ?? ''))
  test('LibreOffice is installed (CI installs it with apt-get in .ci/run)', () => {
    throw new Error(`${SOFFICE} is missing under CI: the LibreOffice check cannot run.`);
  });

/** LibreOffice's reading of every sheet, as CSV rows by sheet name. */
async function libreOfficeCsv(file: string): Promise<Record<string, string[][]>> {
  const outDir = fs.mkdtempSync(path.join(dir, 'lo-'));
  const profile = `file://${fs.mkdtempSync(path.join(dir, 'lo-profile-'))}`;
  await new Promise<void>((resolve, reject) =>
    execFile(
      SOFFICE,
      [
        `-env:UserInstallation=${profile}`,
        '--headless',
        '--convert-to',
        // UTF-8, full precision (not as shown), every sheet to its own file.
        'csv:Text - txt - csv (StarCalc):44,34,76,1,,0,false,true,false,false,false,-1',
        '--outdir',
        outDir,
        file,
      ],
      { timeout: 120000 },
      (e) => (e ? reject(e) : resolve()),
    ),
  );
  const base = path.basename(file, '.xlsx');
  const sheets: Record<string, string[][]> = {};
  for (const f of fs.readdirSync(outDir)) {
    const name = f.slice(base.length + 1, -'.csv'.length);
    sheets[name] = fs
      .readFileSync(path.join(outDir, f), 'utf8')
      .split(/\r?\n/)
      .filter((l) => l !== '')
      .map((l) => l.split(','));
  }
  return sheets;
}

withLibreOffice('LibreOffice opens a recalculated workbook with the cells the runner computed', () => {
  test('spilled plain arithmetic, its dependents and single ECHEM cells agree cell by cell', async () => {
    const input = path.join(dir, 'mixed.xlsx');
    const wb = new ExcelJS.Workbook();
    const ws = wb.addWorksheet('Data');
    [1, 2, 3].forEach((v, i) => (ws.getCell(`A${i + 1}`).value = v));
    ws.getCell('B1').value = { formula: 'A1:A3*2' } as ExcelJS.CellFormulaValue;
    ws.getCell('C1').value = { formula: 'SUM(B1:B3)' } as ExcelJS.CellFormulaValue;
    ws.getCell('D1').value = { formula: 'ECHEM.NERNSTSLOPE(25)' } as ExcelJS.CellFormulaValue;
    ws.getCell('E1').value = { formula: 'D1*1000' } as ExcelJS.CellFormulaValue;
    await wb.xlsx.writeFile(input);
    const out = path.join(dir, 'mixed.recalc.xlsx');
    expect((await runMain(['recalc', input, '-o', out])).code).toBe(0);

    const ours = new ExcelJS.Workbook();
    await ours.xlsx.readFile(out);
    const sheet = ours.getWorksheet('Data') as ExcelJS.Worksheet;
    const cached = (a: string): number => {
      const c = sheet.getCell(a);
      return Number(c.formula ? c.result : c.value);
    };
    // By hand: 2·(1, 2, 3) = (2, 4, 6), their sum 12; RT ln10/F at 25 °C = 0.05915935 V (derived from the SI exact constants).
    expect([cached('B1'), cached('B2'), cached('B3'), cached('C1')]).toEqual([2, 4, 6, 12]);
    expect(cached('D1')).toBeCloseTo(0.05915935, 8);

    const lo = (await libreOfficeCsv(out)).Data ?? [];
    const at = (row: number, col: number): number => Number(lo[row]?.[col]);
    const cells: [string, number, number][] = [
      ['B1', 0, 1],
      ['B2', 1, 1],
      ['B3', 2, 1],
      ['C1', 0, 2],
      ['D1', 0, 3],
      ['E1', 0, 4],
    ];
    for (const [a, r, c] of cells) {
      expect({ cell: a, value: at(r, c) }).toEqual({
        cell: a,
        value: expect.closeTo(cached(a), 12) as number,
      });
    }
  }, 180000);
});
