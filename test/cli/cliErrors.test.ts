/**
 * The `potentia` command: output, messages and exit codes for good and bad input. Most
 * cases run the command in this process (`main` with captured output); the cases in
 * SPAWNED run `node bin/potentia.js` as users do, end to end.
 */
import * as fs from 'node:fs';
import * as path from 'node:path';
import ExcelJS from 'exceljs';
import { BUILTIN_POTENTIALS } from '../../src/engine/index';
import { CP_TEMPLATE, TEMPLATE_DIR } from '../../src/cli/templateLayout';
import { nernst, parseCsv, ROOT, runCli, runMain, tempDir } from './helpers';
import type { RunResult } from './helpers';

const dir = tempDir('cli');
const template = path.join(TEMPLATE_DIR, CP_TEMPLATE.file);

async function workbookWithErrors(file: string): Promise<void> {
  const wb = new ExcelJS.Workbook();
  const ws = wb.addWorksheet('Bad sheet');
  ws.getCell('A1').value = {
    formula: 'ECHEM.POTENTIAL("Cu2+ + 2e- -> Cu",{"Cu2+"},{-1})',
  } as ExcelJS.CellFormulaValue;
  ws.getCell('A2').value = { formula: 'NOSUCHFUNCTION(1)' } as ExcelJS.CellFormulaValue;
  ws.getCell('A3').value = { formula: '1/0' } as ExcelJS.CellFormulaValue;
  ws.getCell('A4').value = { formula: 'ECHEM.NERNSTSLOPE(25)' } as ExcelJS.CellFormulaValue;
  await wb.xlsx.writeFile(file);
}

const results: Record<string, RunResult> = {};
/** Cases run end to end as a child process: the launcher, exit codes, stdout and stderr. */
const SPAWNED = new Set(['none', 'evalOk', 'recalcErrors', 'demo']);
const files = {
  text: path.join(dir, 'notes.xlsx'),
  xls: path.join(dir, 'legacy.xlsx'),
  zip: path.join(dir, 'archive.xlsx'),
  bad: path.join(dir, 'bad.xlsx'),
  existing: path.join(dir, 'existing.xlsx'),
  copy: path.join(dir, 'copy.xlsx'),
};

beforeAll(async () => {
  fs.writeFileSync(files.text, 'station,reading\nTS-01,-812\n');
  fs.writeFileSync(files.xls, Buffer.from([0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1, 0, 0, 0, 0]));
  // A ZIP signature without an xlsx package behind it.
  fs.writeFileSync(files.zip, Buffer.concat([Buffer.from([0x50, 0x4b, 0x03, 0x04]), Buffer.alloc(60)]));
  await workbookWithErrors(files.bad);
  fs.writeFileSync(files.existing, 'placeholder');
  fs.copyFileSync(template, files.copy);

  const cases: Record<string, string[]> = {
    none: [],
    help: ['--help'],
    unknownCommand: ['calc'],
    evalOk: ['eval', '=ECHEM.POTENTIAL("Cu2+ + 2e- -> Cu", {"Cu2+"}, {0.01}, 25)', 'ECHEM.NERNSTSLOPE(25)'],
    evalJson: ['eval', '--json', '=ECHEM.POTENTIAL("Cu2+ + 2e- -> Cu", {"Cu2+"}, {0.01;1}, 25)'],
    evalNoFormula: ['eval'],
    evalBadOption: ['eval', '--jsn', '=1'],
    evalParse: ['eval', '=ECHEM.POTENTIAL("Cu2+/Cu",'],
    evalUnknown: ['eval', '=ECHEM.POTENTAIL("Cu2+/Cu")'],
    evalAllow: ['eval', '--allow-errors', '=ECHEM.VSREF(0,"nowhere","SHE")'],
    recalcNoFile: ['recalc'],
    recalcMissing: ['recalc', path.join(dir, 'missing.xlsx')],
    recalcText: ['recalc', files.text],
    recalcXls: ['recalc', files.xls],
    recalcZip: ['recalc', files.zip],
    recalcSelf: ['recalc', files.copy, '-o', files.copy, '--force'],
    recalcExists: ['recalc', files.copy, '-o', files.existing],
    recalcErrors: ['recalc', files.bad, '-o', path.join(dir, 'bad.out.xlsx')],
    recalcAllow: ['recalc', files.bad, '-o', path.join(dir, 'bad.allowed.xlsx'), '--allow-errors'],
    recalcDefault: ['recalc', files.copy],
    tableCsv: ['table', '--csv'],
    table: ['table'],
    demo: ['demo'],
  };
  // In-process runs one after another (they share the process's caches harmlessly);
  // the few spawned ones in parallel with them.
  const spawned = Promise.all(
    Object.entries(cases)
      .filter(([name]) => SPAWNED.has(name))
      .map(async ([name, args]) => {
        results[name] = await runCli(args);
      }),
  );
  for (const [name, args] of Object.entries(cases)) {
    if (!SPAWNED.has(name)) results[name] = await runMain(args);
  }
  await spawned;
}, 300000);

afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));

function result(name: string): RunResult {
  const r = results[name];
  if (!r) throw new Error(`no result for ${name}`);
  return r;
}

describe('usage', () => {
  test('no command: usage on stderr, exit code 2', () => {
    expect(result('none').code).toBe(2);
    expect(result('none').stderr).toContain('Usage: potentia <command>');
  });

  test('--help: usage on stdout, exit code 0, names the GPL-3.0 calculation engine', () => {
    expect(result('help').code).toBe(0);
    expect(result('help').stdout).toContain('recalc IN.xlsx');
    expect(result('help').stdout).toContain('GPL-3.0');
  });

  test('an unknown command is named', () => {
    expect(result('unknownCommand').code).toBe(2);
    expect(result('unknownCommand').stderr).toContain('unknown command "calc"');
  });
});

describe('eval', () => {
  test('prints each result on its own line, exit code 0', () => {
    const r = result('evalOk');
    expect(r.code).toBe(0);
    const [e, slope] = r.stdout.trim().split('\n').map(Number);
    // E° = 65.49 kJ/mol / 2F (NBS 1982 ΔfG°(Cu2+), from memory; OpenStax prints +0.34); Nernst by hand, SI exact constants.
    expect(e).toBeCloseTo(nernst(65.49e3 / (2 * 96485.33212331001), 2, 100, 25), 12);
    // 59.15935 mV (derived from the SI exact constants).
    expect(slope).toBeCloseTo(0.05915935, 8);
  });

  test('--json prints a spill as an array of rows', () => {
    const r = result('evalJson');
    expect(r.code).toBe(0);
    const rows = JSON.parse(r.stdout) as number[][];
    expect(rows).toHaveLength(2);
    expect(rows[1]?.[0]).toBeCloseTo(65.49e3 / (2 * 96485.33212331001), 12); // a = 1: E = E° (NBS 1982 ΔfG°, from memory)
  });

  test('no formula, or an unknown option: exit code 2 with a hint', () => {
    expect(result('evalNoFormula').code).toBe(2);
    expect(result('evalNoFormula').stderr).toContain('eval needs at least one formula');
    expect(result('evalBadOption').code).toBe(2);
    expect(result('evalBadOption').stderr).toContain("Unknown option '--jsn'");
    expect(result('evalBadOption').stderr).toContain('potentia eval --help');
  });

  test('a formula that does not parse: exit code 1 and the reason', () => {
    const r = result('evalParse');
    expect(r.code).toBe(1);
    expect(r.stdout).toContain('#ERROR!');
    expect(r.stdout).toContain('does not parse');
  });

  test('an unknown function: its name, a suggestion and the potentials listing', () => {
    const r = result('evalUnknown');
    expect(r.code).toBe(1);
    expect(r.stdout).toContain('#NAME? unknown function ECHEM.POTENTAIL');
    expect(r.stdout).toContain('Did you mean ECHEM.POTENTIAL?');
    expect(r.stdout).toContain('potentia eval "=ECHEM.LISTTABLE()"');
  });

  test('--allow-errors prints the error and exits 0', () => {
    const r = result('evalAllow');
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('#N/A');
    expect(r.stdout).toContain('nowhere');
  });
});

describe('recalc', () => {
  test('missing argument or file: exit code 2 and what to do', () => {
    expect(result('recalcNoFile').code).toBe(2);
    expect(result('recalcNoFile').stderr).toContain('recalc needs the workbook');
    expect(result('recalcMissing').code).toBe(2);
    expect(result('recalcMissing').stderr).toContain('cannot find');
    expect(result('recalcMissing').stderr).toContain('missing.xlsx');
  });

  test('a file that is not an xlsx workbook is refused with the reason', () => {
    expect(result('recalcText').code).toBe(2);
    expect(result('recalcText').stderr).toContain('is not an .xlsx workbook');
    expect(result('recalcXls').code).toBe(2);
    expect(result('recalcXls').stderr).toContain('legacy .xls');
    expect(result('recalcZip').code).toBe(2);
    expect(result('recalcZip').stderr).toContain('cannot read');
  });

  test('never overwrites its input, and an existing output only with --force', () => {
    expect(result('recalcSelf').code).toBe(2);
    expect(result('recalcSelf').stderr).toContain('never overwrites its input');
    expect(result('recalcExists').code).toBe(2);
    expect(result('recalcExists').stderr).toContain('--force');
    expect(fs.readFileSync(files.existing, 'utf8')).toBe('placeholder');
  });

  test('cells that compute to errors are listed with sheet, cell and message; exit code 1', () => {
    const r = result('recalcErrors');
    expect(r.code).toBe(1);
    expect(r.stdout).toContain('4 formulas');
    expect(r.stdout).toContain('3 errors');
    expect(r.stdout).toMatch(/Bad sheet!A1 {2}#VALUE! .+/);
    expect(r.stdout).toContain('Bad sheet!A2  #NAME?  unknown function NOSUCHFUNCTION');
    expect(r.stdout).toContain('Bad sheet!A3  #DIV/0!');
    // The output is still written, for inspection.
    expect(fs.existsSync(path.join(dir, 'bad.out.xlsx'))).toBe(true);
  });

  test('--allow-errors: same report, exit code 0', () => {
    const r = result('recalcAllow');
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('3 errors');
  });

  test('the default output sits next to the input as IN.recalc.xlsx', () => {
    const r = result('recalcDefault');
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('0 errors');
    expect(fs.existsSync(path.join(dir, 'copy.recalc.xlsx'))).toBe(true);
  });
});

describe('table', () => {
  test('--csv: a header and one properly quoted row per built-in couple', () => {
    const r = result('tableCsv');
    expect(r.code).toBe(0);
    const rows = parseCsv(r.stdout);
    expect(rows).toHaveLength(BUILTIN_POTENTIALS.length + 1);
    expect(rows[0]).toEqual(['half-reaction', 'E° (V)', 'dE°/dT (mV/K)', 'source']);
    BUILTIN_POTENTIALS.forEach((p, i) => {
      expect(rows[i + 1]).toEqual([
        p.halfReaction,
        String(p.e0V),
        p.dE0dTmVperK === null ? '' : String(p.dE0dTmVperK),
        p.source,
      ]);
    });
    // Sources hold commas ("Chemistry 2e, Appendix L"), so they must be quoted.
    expect(r.stdout).toMatch(/"E° and dE°\/dT from the species data \(NBS tables, Wagman et al\. 1982, [^"]*OpenStax Chemistry 2e, Appendix L prints [^"]*"/);
  });

  test('aligned columns: the Cu2+/Cu row with its published E°', () => {
    const r = result('table');
    expect(r.code).toBe(0);
    // 65.49 kJ/mol / 2F = 0.3394 V (NBS 1982, from memory; OpenStax Appendix L prints +0.34), dE°/dT 0.011 mV/K (Bratsch 1989, from memory)
    expect(r.stdout).toMatch(/^Cu2\+ \+ 2 e- -> Cu +0\.3394 +0\.011 +E° and dE°\/dT from the species data/m);
  });
});

describe('demo', () => {
  test('prints the survey table and the cautions, and writes nothing into assets/', () => {
    const r = result('demo');
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('nothing written');
    expect(r.stdout).toMatch(/TS-01 .+ PASS/);
    expect(r.stdout).toMatch(/CHECK/);
    expect(r.stdout).toContain('Zn(s) | Zn2+(aq) || Fe2+(aq) | Fe(s)');
    expect(r.stdout).toContain('NACE SP0169');
    const listed = fs.readdirSync(path.join(ROOT, 'assets', 'templates')).sort();
    expect(listed.filter((f) => f.includes('recalc'))).toEqual([]);
  });
});
