/**
 * The Faraday/capacity sheet of the cell-voltage template and the anode/corrosion sheet of
 * the cathodic-protection template, recalculated by the runner, against values derived by
 * hand from published data: the SI exact F, the CIAAW 2021 abridged atomic weights (from
 * memory), ASTM G102 (K1 = 3.27e-3; EW and density of carbon steel and 316, Table 1, from
 * memory) and DNV-RP-B401 (2017) capacities and utilisation factors (from memory).
 */
import * as path from 'node:path';
import ExcelJS from 'exceljs';
import { recalcWorkbook } from '../../src/cli/recalcCommand';
import { CP_TEMPLATE, SWEEP_TEMPLATE, TEMPLATE_DIR } from '../../src/cli/templateLayout';
import { ANODE_SHEET, FARADAY_SHEET } from '../../scripts/make-templates';
import { F } from '../support';

async function recalculated(file: string): Promise<ExcelJS.Workbook> {
  const wb = new ExcelJS.Workbook();
  await wb.xlsx.readFile(path.join(TEMPLATE_DIR, file));
  const summary = recalcWorkbook(wb);
  expect(summary.errors).toEqual([]);
  return wb;
}

function num(ws: ExcelJS.Worksheet, address: string): number {
  const cell = ws.getCell(address);
  const v = cell.formula ? cell.result : cell.value;
  if (typeof v !== 'number')
    throw new Error(`${ws.name}!${address} holds ${JSON.stringify(v)}, not a number`);
  return v;
}

describe('cell-voltage template: Faraday and capacity sheet', () => {
  let ws: ExcelJS.Worksheet;
  beforeAll(async () => {
    const wb = await recalculated(SWEEP_TEMPLATE.file);
    ws = wb.getWorksheet(FARADAY_SHEET.name) as ExcelJS.Worksheet;
    expect(ws).toBeDefined();
  });

  test('deposits: m = Q·ε·M/(nF)', () => {
    const [r1, r2, r3] = FARADAY_SHEET.depositRows;
    expect(num(ws, `F${r1}`)).toBeCloseTo((3600 * 0.98 * 63.546) / (2 * F), 9); // copper, 1 A·h at 98 %
    expect(num(ws, `F${r2}`)).toBeCloseTo((7200 * 0.9 * 65.38) / (2 * F), 9);
    expect(num(ws, `F${r3}`)).toBeCloseTo((1800 * 107.87) / F, 9);
    // the sheet's own plain-arithmetic column agrees
    for (const r of FARADAY_SHEET.depositRows) expect(num(ws, `F${r}`)).toBeCloseTo(num(ws, `G${r}`), 6);
  });

  test('plating time of 25 µm copper at 200 A/m² and 98 %: 8.96·25·2F/(200·63.546·0.98) s; thickness back', () => {
    const r = FARADAY_SHEET.plateRows[0];
    expect(num(ws, `F${r}`)).toBeCloseTo((8.96 * 25 * 2 * F) / (200 * 63.546 * 0.98), 6);
    for (const row of FARADAY_SHEET.plateRows) expect(num(ws, `H${row}`)).toBeCloseTo(num(ws, `B${row}`), 9);
  });

  test('capacities: Zn 2F/(3.6·65.38) = 820 mAh/g, LiFePO4 F/(3.6·157.755) = 170 mAh/g', () => {
    const [zn, cu, lfp] = FARADAY_SHEET.capacityRows;
    expect(num(ws, `C${zn}`)).toBeCloseTo((2 * F) / (3.6 * 65.38), 6);
    expect(num(ws, `C${cu}`)).toBeCloseTo((2 * F) / (3.6 * 63.546), 6);
    expect(num(ws, `C${lfp}`)).toBeCloseTo(F / (3.6 * (6.94 + 55.845 + 30.974 + 4 * 15.999)), 6);
  });

  test('specific energies: Daniell and lead–acid (E° from OpenStax Appendix L)', () => {
    const [daniell, leadAcid] = FARADAY_SHEET.energyRows;
    // E° between OpenStax (0.337 + 0.7618) and CRC 54th ed. (0.3419 + 0.7628 V)
    const d = num(ws, `C${daniell}`);
    expect(d).toBeGreaterThanOrEqual((2 * F * 1.0988) / (3.6 * (65.38 + 63.546)) - 1e-9);
    expect(d).toBeLessThanOrEqual((2 * F * 1.1047) / (3.6 * (65.38 + 63.546)));
    const mass = 207.2 + 239.198 + 2 * 98.072;
    expect(num(ws, `C${leadAcid}`)).toBeCloseTo((2 * F * (1.69 + 0.3505)) / (3.6 * mass), 0);
  });

  test('the sheet carries the cautions', () => {
    const texts: string[] = [];
    ws.eachRow((row) => row.eachCell((c) => typeof c.value === 'string' && texts.push(c.value)));
    expect(texts.some((t) => /applicable standards, local codes/.test(t))).toBe(true);
    expect(texts.some((t) => /theoretical/.test(t))).toBe(true);
  });
});

describe('cathodic-protection template: anodes and corrosion sheet', () => {
  let ws: ExcelJS.Worksheet;
  beforeAll(async () => {
    const wb = await recalculated(CP_TEMPLATE.file);
    ws = wb.getWorksheet(ANODE_SHEET.name) as ExcelJS.Worksheet;
    expect(ws).toBeDefined();
  });

  test('anode lives: m·ε·u/(I·8760) with DNV-RP-B401 capacities and utilisation factors', () => {
    const [a1, a2, a3, a4] = ANODE_SHEET.anodeRows;
    expect(num(ws, `F${a1}`)).toBeCloseTo((45 * 780 * 0.8) / (0.12 * 8760), 9); // zinc bracelet
    expect(num(ws, `F${a2}`)).toBeCloseTo((60 * 780 * 0.9) / (0.2 * 8760), 9); // zinc stand-off
    expect(num(ws, `F${a3}`)).toBeCloseTo((30 * 780 * 0.85) / (0.15 * 8760), 9); // numbers given
    expect(num(ws, `F${a4}`)).toBeCloseTo((17 * 1100 * 0.85) / (0.05 * 8760), 9); // magnesium
    for (const r of ANODE_SHEET.anodeRows) expect(num(ws, `F${r}`)).toBeCloseTo(num(ws, `G${r}`), 9);
  });

  test('corrosion rates by ASTM G102: 3.27e-3·i·EW/ρ and 8.954e-3·i·EW', () => {
    const [p1, , p3] = ANODE_SHEET.probeRows;
    expect(num(ws, `D${p1}`)).toBeCloseTo((3.27e-3 * 4.2 * 27.92) / 7.86, 12);
    expect(num(ws, `E${p1}`)).toBeCloseTo(8.954e-3 * 4.2 * 27.92, 12);
    expect(num(ws, `D${p3}`)).toBeCloseTo((3.27e-3 * 0.08 * 25.5) / 8.0, 12);
    for (const r of ANODE_SHEET.probeRows) expect(num(ws, `D${r}`)).toBeCloseTo(num(ws, `F${r}`), 12);
  });

  test('the sheet carries the cautions and names no real place', () => {
    const texts: string[] = [];
    ws.eachRow((row) => row.eachCell((c) => typeof c.value === 'string' && texts.push(c.value)));
    expect(texts.some((t) => /licensed practice/.test(t))).toBe(true);
    expect(texts.join(' ')).not.toMatch(/Harrowgate|Brackenfield|Fellside|Lowmere/);
  });
});
