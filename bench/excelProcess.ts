/**
 * Runs the Excel-shaped benchmarks in a fresh Node process (bench/excelChild.ts, compiled to
 * build/bench by tsconfig.bench.json): the built bundle loaded as Excel loads it, in a heap
 * that holds nothing else. The checks run in that process; their counts are added to this
 * process's `outputs_checked`.
 */
import { spawnSync } from 'child_process';
import * as fs from 'fs';
import * as path from 'path';
import type { ChildReport, ChildRequest } from './excelChild';
import { CheckFailure, recordChecked } from './stats';

const ROOT = path.resolve(__dirname, '..');
/** The bundle the child loads. */
export const FUNCTIONS_BUNDLE = path.join(ROOT, 'dist', 'functions.js');
const CHILD = path.join(ROOT, 'build', 'bench', 'bench', 'excelChild.js');

let compiled = false;

/** Compiles bench/excelChild.ts and what it imports (no type check: `npm test` type-checks them). */
function compileChild(): void {
  if (compiled) return;
  const tsc = require.resolve('typescript/bin/tsc');
  const res = spawnSync(process.execPath, [tsc, '-p', path.join(ROOT, 'tsconfig.bench.json'), '--noCheck'], {
    cwd: ROOT,
    encoding: 'utf8',
    timeout: 300_000,
  });
  if (res.status !== 0 || !fs.existsSync(CHILD))
    throw new Error(`compiling bench/excelChild.ts failed: ${res.stdout}${res.stderr}`);
  compiled = true;
}

/**
 * The figures of `req` measured in a fresh process loading `req.bundle`. A failed check there
 * is a {@link CheckFailure} here, with the child's message.
 */
export function excelFiguresInChild(req: ChildRequest): ChildReport {
  compileChild();
  const res = spawnSync(process.execPath, [CHILD, JSON.stringify(req)], {
    cwd: ROOT,
    encoding: 'utf8',
    timeout: 1_800_000,
    maxBuffer: 16 * 1024 * 1024,
  });
  if (res.status !== 0) {
    const msg = (res.stderr || `exit status ${String(res.status)}`).trim();
    const failed = /^CheckFailure: ([^:]+): ([\s\S]*)$/.exec(msg);
    if (failed) throw new CheckFailure(failed[1]!, failed[2]!);
    throw new Error(`the Excel-shaped benchmarks' process failed: ${msg}`);
  }
  const lines = res.stdout.trim().split('\n');
  const report = JSON.parse(lines[lines.length - 1] ?? '') as ChildReport;
  for (const [name, n] of Object.entries(report.outputsChecked)) recordChecked(name, n);
  return report;
}
