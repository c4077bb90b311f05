#!/usr/bin/env node
/*
 * Figures of the compiled runner (not a test): start-up plus a one-cell eval, and the
 * recalculation of a large generated workbook (cells, seconds, peak RSS).
 *   node scripts/bench-runner.js [ROWS]      (default 39,000 rows, under the 40,000-row sheet limit)
 * Needs build/cli (npm run build:cli). The workbook is a fictional bench sheet.
 */
'use strict';
const { spawnSync } = require('child_process');
const fs = require('fs');
const os = require('os');
const path = require('path');
const ExcelJS = require('exceljs');

const root = path.resolve(__dirname, '..');
const launcher = path.join(root, 'bin', 'potentia.js');

function timed(args) {
  const t0 = process.hrtime.bigint();
  const r = spawnSync('/usr/bin/time', ['-f', '%M', process.execPath, launcher, ...args], {
    encoding: 'utf8',
  });
  const seconds = Number(process.hrtime.bigint() - t0) / 1e9;
  if (r.status !== 0) throw new Error(`potentia ${args.join(' ')} failed:\n${r.stdout}\n${r.stderr}`);
  const rssKb = Number((r.stderr.trim().split('\n').pop() || '0').trim());
  return { seconds, rssMb: rssKb / 1024, stdout: r.stdout };
}

async function main() {
  const rows = Number(process.argv[2] || 39000);
  const runs = [];
  for (let i = 0; i < 7; i++) runs.push(timed(['eval', '=ECHEM.NERNSTSLOPE(25)']).seconds);
  runs.sort((a, b) => a - b);
  console.log(
    `start-up + one-cell eval: median ${runs[3].toFixed(3)} s, best ${runs[0].toFixed(3)} s (7 runs, ${os.cpus().length} cores, load ${os.loadavg()[0].toFixed(2)})`,
  );

  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'potentia-bench-'));
  try {
    const input = path.join(dir, 'large.xlsx');
    const wb = new ExcelJS.Workbook();
    const ws = wb.addWorksheet('Bench');
    ws.addRow(['case', 'a(Cu2+)', 'E (V)', 'E (mV)']);
    for (let r = 2; r <= rows; r++) {
      ws.getCell(`A${r}`).value = r - 1;
      ws.getCell(`B${r}`).value = 10 ** -((r % 6) + 1);
      ws.getCell(`C${r}`).value = { formula: `ECHEM.POTENTIAL("Cu2+ + 2e- -> Cu","Cu2+",B${r},25)` };
      ws.getCell(`D${r}`).value = { formula: `C${r}*1000` };
    }
    await wb.xlsx.writeFile(input);
    const cells = 4 * rows;
    const r = timed(['recalc', input, '-o', path.join(dir, 'large.out.xlsx'), '--no-progress']);
    console.log(
      `recalc of ${rows.toLocaleString('en-US')} rows (${cells.toLocaleString('en-US')} cells, ` +
        `${(2 * (rows - 1)).toLocaleString('en-US')} formulas, ${(fs.statSync(input).size / 1024).toFixed(0)} KB): ` +
        `${r.seconds.toFixed(2)} s, peak RSS ${r.rssMb.toFixed(0)} MB`,
    );
  } finally {
    fs.rmSync(dir, { recursive: true, force: true });
  }
}

main().catch((e) => {
  console.error(e);
  process.exitCode = 1;
});
