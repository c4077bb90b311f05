/**
 * What `potentia recalc` never does: lose an existing output, write through a symbolic link,
 * overwrite its input by another name, let two runs both create one file, read a workbook
 * past its limits, or pass control characters to the terminal. Each bad input below has
 * its message asserted.
 */
import { spawn } from 'node:child_process';
import * as fs from 'node:fs';
import * as path from 'node:path';
import JSZip from 'jszip';
import ExcelJS from 'exceljs';
import { CP_TEMPLATE, TEMPLATE_DIR } from '../../src/cli/templateLayout';
import { recalcCommand } from '../../src/cli/recalcCommand';
import { DEFAULT_MAX_CELLS, DEFAULT_MAX_UNCOMPRESSED_MB, ENGINE_MAX_ROWS } from '../../src/cli/limits';
import { writeFileAtomically } from '../../src/cli/safeWrite';
import { captureIo, ensureCliBuilt, LAUNCHER, ROOT, runMain, tempDir } from './helpers';
import { xlsxFromXml } from './xlsxXml';

const dir = tempDir('safety');
const template = path.join(TEMPLATE_DIR, CP_TEMPLATE.file);
afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));

let n = 0;
/** A fresh copy of the shipped template under a new name. */
function copyOfTemplate(): string {
  const f = path.join(dir, `in-${++n}.xlsx`);
  fs.copyFileSync(template, f);
  return f;
}

function put(name: string, content: string | Buffer): string {
  const f = path.join(dir, name);
  fs.writeFileSync(f, content);
  return f;
}

describe('atomic writes', () => {
  test('a broken input with --force leaves the existing output byte-identical', async () => {
    const out = put('kept.xlsx', 'previous output bytes');
    const broken = put(
      'broken.xlsx',
      Buffer.concat([Buffer.from([0x50, 0x4b, 0x03, 0x04]), Buffer.alloc(60)]),
    );
    const r = await runMain(['recalc', broken, '-o', out, '--force']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('cannot read');
    expect(fs.readFileSync(out, 'utf8')).toBe('previous output bytes');
  });

  test('a failed write (the output replaced by a folder meanwhile) leaves no temporary file', () => {
    const target = path.join(dir, 'became-a-folder');
    fs.mkdirSync(target);
    expect(() => writeFileAtomically(target, new Uint8Array([1, 2, 3]), true)).toThrow(/cannot write/);
    expect(fs.readdirSync(dir).filter((f) => f.endsWith('.tmp'))).toEqual([]);
  });

  test('--force replaces an existing output in one step with a complete workbook', async () => {
    const input = copyOfTemplate();
    const out = put('replaced.xlsx', 'old');
    const r = await runMain(['recalc', input, '-o', out, '--force']);
    expect(r.code).toBe(0);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(out);
    expect(wb.getWorksheet(CP_TEMPLATE.sheet)).toBeDefined();
    expect(fs.readdirSync(dir).filter((f) => f.endsWith('.tmp'))).toEqual([]);
  });

  test('killed (SIGKILL) while working: the previous output is byte-identical or a complete new workbook', async () => {
    await ensureCliBuilt();
    const input = copyOfTemplate();
    const out = put('killed.xlsx', 'previous output bytes');
    const before = fs.readFileSync(out);
    const child = spawn(process.execPath, [LAUNCHER, 'recalc', input, '-o', out, '--force'], { cwd: ROOT });
    // Kill it once it has started working (it has loaded when it has written nothing yet).
    await new Promise((r) => setTimeout(r, 150));
    child.kill('SIGKILL');
    await new Promise((r) => child.once('exit', r));
    const after = fs.readFileSync(out);
    // Either untouched, or (the rename came before the kill) a whole, readable workbook.
    const whole = async (): Promise<boolean> => {
      const wb = new ExcelJS.Workbook();
      await wb.xlsx.load(after as unknown as ExcelJS.Buffer);
      return wb.getWorksheet(CP_TEMPLATE.sheet) !== undefined;
    };
    expect(after.equals(before) || (await whole())).toBe(true);
    expect(after.length).toBeGreaterThan(0);
  }, 60000);
});

describe('the output is never a link, never the input', () => {
  test('a symbolic link at the output is refused, with or without --force; its target is untouched', async () => {
    const input = copyOfTemplate();
    const target = put('link-target.txt', 'precious');
    const link = path.join(dir, 'link.xlsx');
    fs.symlinkSync(target, link);
    for (const extra of [[], ['--force']]) {
      const r = await runMain(['recalc', input, '-o', link, ...extra]);
      expect(r.code).toBe(2);
      expect(r.stderr).toContain('is a symbolic link: recalc never writes through a link');
    }
    expect(fs.readFileSync(target, 'utf8')).toBe('precious');
  });

  test('a dangling symbolic link is refused and its target is not created', async () => {
    const input = copyOfTemplate();
    const missing = path.join(dir, 'nowhere', '..', 'not-there.xlsx');
    const link = path.join(dir, 'dangling.xlsx');
    fs.symlinkSync(missing, link);
    const r = await runMain(['recalc', input, '-o', link]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('symbolic link');
    expect(fs.existsSync(path.join(dir, 'not-there.xlsx'))).toBe(false);
  });

  test('a hard link to the input is the input (same device and inode): refused even with --force', async () => {
    const input = copyOfTemplate();
    const alias = path.join(dir, 'alias.xlsx');
    fs.linkSync(input, alias);
    const before = fs.readFileSync(input);
    const r = await runMain(['recalc', input, '-o', alias, '--force']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('is the input itself');
    expect(fs.readFileSync(input).equals(before)).toBe(true);
  });

  test('the input under another spelling of its path is refused', async () => {
    const input = copyOfTemplate();
    const other = path.join(dir, '.', '..', path.basename(dir), path.basename(input));
    const r = await runMain(['recalc', input, '-o', other, '--force']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('never overwrites its input');
  });
});

describe('exclusive creation', () => {
  test('two runs writing the same new output at once: exactly one writes, the other is refused', async () => {
    const a = copyOfTemplate();
    const b = copyOfTemplate();
    const out = path.join(dir, 'contested.xlsx');
    const ioA = captureIo();
    const ioB = captureIo();
    const codes = await Promise.all([
      recalcCommand([a, '-o', out], ioA).catch(() => 2),
      recalcCommand([b, '-o', out], ioB).catch((e: Error) => {
        ioB.err(e.message);
        return 2;
      }),
    ]);
    expect(codes.sort()).toEqual([0, 2]);
    expect(`${ioA.stderr()}${ioB.stderr()}`).toMatch(/already exists|created by someone else/);
    expect(fs.existsSync(out)).toBe(true);
  });
});

describe('read limits: exit code 2 and a message that says how to raise them', () => {
  test('the documented defaults', () => {
    expect(DEFAULT_MAX_UNCOMPRESSED_MB).toBe(200);
    expect(DEFAULT_MAX_CELLS).toBe(2_000_000);
    expect(ENGINE_MAX_ROWS).toBe(1_048_576); // the .xlsx sheet's row limit (common practice)
  });

  test('a workbook that unpacks past --max-size is refused before it is parsed', async () => {
    // 3 MB of spaces in one sheet compress to a few kilobytes: a small "ZIP bomb".
    const rows = `<row r="1"><c r="A1"><v>1</v></c></row>${' '.repeat(3 * 1024 * 1024)}`;
    const f = put('bomb.xlsx', await xlsxFromXml([{ name: 'Sheet1', rows }]));
    expect(fs.statSync(f).size).toBeLessThan(100_000);
    const r = await runMain(['recalc', f, '--max-size', '1']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('expands to more than 1 MB of data when unpacked');
    expect(r.stderr).toContain('--max-size');
    // Raised, it is read.
    expect(
      (await runMain(['recalc', f, '--max-size', '10', '-o', path.join(dir, 'bomb.out.xlsx')])).code,
    ).toBe(0);
  });

  test('a workbook with more cells than --max-cells is refused', async () => {
    const cells = Array.from({ length: 30 }, (_, i) => `<c r="A${i + 1}"><v>${i}</v></c>`);
    const rows = cells.map((c, i) => `<row r="${i + 1}">${c}</row>`).join('');
    const f = put('many-cells.xlsx', await xlsxFromXml([{ name: 'Sheet1', rows }]));
    const r = await runMain(['recalc', f, '--max-cells', '20']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('more than 20 cells');
    expect(r.stderr).toContain('--max-cells');
  });

  test('a row past the engine sheet size is refused (no stack trace, exit code 2)', async () => {
    const rows = `<row r="1048577"><c r="A1048577"><v>1</v></c></row>`;
    const f = put('deep.xlsx', await xlsxFromXml([{ name: 'Tall', rows }]));
    const r = await runMain(['recalc', f]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('sheet "Tall" has data down to row 1,048,577');
    expect(r.stderr).toContain('1,048,576 rows');
  });

  test('an array formula whose range covers the whole sheet is refused as damaged', async () => {
    const rows = `<row r="1"><c r="A1"><f t="array" ref="A1:XFD1048576">1+1</f><v>2</v></c></row>`;
    const f = put('whole-sheet-array.xlsx', await xlsxFromXml([{ name: 'Sheet1', rows }]));
    const r = await runMain(['recalc', f]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('claims the range A1:XFD1048576');
    expect(r.stderr).toContain('the file is damaged');
  });

  test('a package whose ZIP directory is missing is refused with the reason', async () => {
    const zip = await new JSZip().file('a.txt', 'x').generateAsync({ type: 'nodebuffer' });
    const f = put('truncated.xlsx', zip.subarray(0, zip.length - 22));
    const r = await runMain(['recalc', f]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('no ZIP directory at its end');
  });
});

describe('terminal safety', () => {
  test('escape sequences from a formula result never reach the terminal', async () => {
    const r = await runMain(['eval', '="A"&CHAR(27)&"[2J"&CHAR(7)&"B"']);
    expect(r.code).toBe(0);
    expect(r.stdout).toBe('A[2JB\n');
  });

  test('a lone carriage return (it could hide a line) is removed; a CRLF line end (RFC 4180 CSV) is kept', async () => {
    const r = await runMain(['eval', '="visible"&CHAR(13)&"hidden"']);
    expect(r.code).toBe(0);
    expect(r.stdout).toBe('visiblehidden\n');
    const csv = await runMain(['table', '--csv']);
    expect(csv.code).toBe(0);
    expect(csv.stdout.startsWith('half-reaction')).toBe(true);
    expect(csv.stdout.split('\r\n').length).toBeGreaterThan(10);
    expect(csv.stdout.split('\r\n').some((l) => /[\r\n]/.test(l))).toBe(false);
  });

  test('control characters in text echoed by an error message are stripped', async () => {
    const r = await runMain(['eval', '=ECHEM.STDPOTENTIAL("Cu2+"&CHAR(27)&"]0;pwned"&CHAR(7)&"/Cu")']);
    expect(r.code).toBe(1);
    // eslint-disable-next-line no-control-regex
    expect(r.stdout).not.toMatch(/[\u0000-\u0008\u000b-\u001f\u007f]/);
  });
});

describe('several workbooks', () => {
  test('a folder: each workbook written next to its input, one summary; a broken one makes exit code 2', async () => {
    const folder = path.join(dir, 'library');
    fs.mkdirSync(folder);
    fs.copyFileSync(template, path.join(folder, 'a.xlsx'));
    fs.copyFileSync(path.join(TEMPLATE_DIR, 'cell-voltage-sweep.xlsx'), path.join(folder, 'b.xlsx'));
    fs.writeFileSync(path.join(folder, 'c.xlsx'), 'not a workbook');
    const r = await runMain(['recalc', folder]);
    expect(r.code).toBe(2);
    expect(r.stdout).toContain('Recalculated 3 workbooks');
    expect(r.stdout).toContain('2 written, 0 with cell errors, 1 could not run');
    expect(r.stderr).toContain('c.xlsx is not an .xlsx workbook');
    expect(fs.existsSync(path.join(folder, 'a.recalc.xlsx'))).toBe(true);
    expect(fs.existsSync(path.join(folder, 'b.recalc.xlsx'))).toBe(true);
  });

  test('with -o, several workbooks need an existing folder', async () => {
    const r = await runMain(['recalc', template, template, '-o', path.join(dir, 'no-such-folder')]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('-o names an existing folder');
  });

  test('end to end, compiled: worker threads, one summary', async () => {
    await ensureCliBuilt();
    const out = path.join(dir, 'batch-out');
    fs.mkdirSync(out);
    const inputs = [template, path.join(TEMPLATE_DIR, 'electrode-calibration.xlsx')];
    const { runCli } = await import('./helpers');
    const r = await runCli(['recalc', ...inputs, '-o', out, '--jobs', '2']);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/Recalculated 2 workbooks \(2 workers\): 2 written/);
    expect(fs.readdirSync(out).sort()).toEqual([
      'cathodic-protection-check.recalc.xlsx',
      'electrode-calibration.recalc.xlsx',
    ]);
  }, 120000);
});
