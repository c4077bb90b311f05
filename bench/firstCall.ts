/**
 * The first call after load: a fresh Node process loads the custom functions as Excel loads
 * them (the built bundle dist/functions.js, under a stand-in `CustomFunctions` global) and
 * makes one POTENTIAL call; the figure is from the start of the module load to the first
 * result, in ms. Without a build it loads src/functions/functions.ts through ts-node, which
 * adds the TypeScript compilation to the figure (reported as such).
 *
 * Also the runner's start-up: `node bin/potentia.js eval` of one ECHEM formula, wall time.
 */
import { spawnSync } from 'child_process';
import * as fs from 'fs';
import * as path from 'path';
import { CHECK_TOLERANCE_V, COPPER, daniellEmfV, daniellNernstTermV, daniellTableRange } from './reference';
import { CheckFailure, recordChecked, stat, type Stat } from './stats';

const ROOT = path.resolve(__dirname, '..');
export const BUNDLE = path.join(ROOT, 'dist', 'functions.js');

/** The child's script: stub global, timed load, timed first call, a checked second call. */
function childScript(source: 'dist' | 'ts-node', aZn: number, aCu: number, tempC: number): string {
  const load =
    source === 'dist'
      ? `require(${JSON.stringify(BUNDLE)});`
      : `require('ts-node').register({ transpileOnly: true, skipProject: true, compilerOptions: { target: 'ES2020', module: 'commonjs', esModuleInterop: true, resolveJsonModule: true } });
         require(${JSON.stringify(path.join(ROOT, 'src', 'functions', 'functions.ts'))});`;
  return `
    'use strict';
    // a worker-like global, as the custom-functions runtime gives the bundle
    if (typeof globalThis.self === 'undefined') globalThis.self = globalThis;
    const associations = new Map();
    class StubError { constructor(code, message) { this.code = code; this.message = message; } }
    globalThis.CustomFunctions = {
      Error: StubError,
      ErrorCode: { invalidValue: '#VALUE!', notAvailable: '#N/A', divisionByZero: '#DIV/0!', invalidNumber: '#NUM!',
        nullReference: '#NULL!', invalidName: '#NAME?', invalidReference: '#REF!' },
      associate: (id, fn) => associations.set(id, fn),
    };
    const t0 = process.hrtime.bigint();
    ${load}
    const t1 = process.hrtime.bigint();
    const P = associations.get('POTENTIAL');
    const first = P([['Zn | Zn2+ || Cu2+ | Cu']], [['Zn2+', 'Cu2+']], [[${aZn}, ${aCu}]], null, null);
    const t2 = process.hrtime.bigint();
    const second = P([['Zn | Zn2+ || Cu2+ | Cu']], [['Zn2+', 'Cu2+']], [[${aZn}, ${aCu}]], [[${tempC}]],
      ${JSON.stringify(daniellTableRange())});
    process.stdout.write(JSON.stringify({ loadMs: Number(t1 - t0) / 1e6, callMs: Number(t2 - t1) / 1e6,
      first: first[0][0], second: second[0][0] }));
  `;
}

export interface FirstCallFigures {
  source: 'dist' | 'ts-node';
  /** Module load to first result. */
  totalMs: Stat;
  loadMs: Stat;
  callMs: Stat;
}

/** `runs` fresh processes, each checked: the first call within 10 mV, the second exactly. */
export function benchFirstCall(runs: number): FirstCallFigures {
  const source = fs.existsSync(BUNDLE) ? 'dist' : 'ts-node';
  const total: number[] = [];
  const load: number[] = [];
  const call: number[] = [];
  for (let r = 0; r < runs; r++) {
    const aZn = 0.0123 + r * 1e-4;
    const aCu = 0.1 - r * 1e-4;
    const tempC = 37 + r;
    const res = spawnSync(process.execPath, ['-e', childScript(source, aZn, aCu, tempC)], {
      cwd: ROOT,
      encoding: 'utf8',
      timeout: 120_000,
    });
    if (res.status !== 0) throw new CheckFailure('first_call', `the fresh process failed: ${res.stderr}`);
    const out = JSON.parse(res.stdout) as { loadMs: number; callMs: number; first: unknown; second: unknown };
    const published25 = daniellEmfV(aZn, aCu, 25);
    if (typeof out.first !== 'number' || !(Math.abs(out.first - published25) <= 0.01))
      throw new CheckFailure(
        'first_call',
        `first result ${JSON.stringify(out.first)}, expected ${published25} ± 0.01 V`,
      );
    if (
      typeof out.second !== 'number' ||
      !(Math.abs(out.second - daniellEmfV(aZn, aCu, tempC)) <= CHECK_TOLERANCE_V)
    )
      throw new CheckFailure(
        'first_call',
        `second result ${JSON.stringify(out.second)}, expected ${daniellEmfV(aZn, aCu, tempC)}`,
      );
    recordChecked('first_call', 2);
    total.push(out.loadMs + out.callMs);
    load.push(out.loadMs);
    call.push(out.callMs);
  }
  return { source, totalMs: stat(total), loadMs: stat(load), callMs: stat(call) };
}

/** The `potentia` launcher, whatever it runs (compiled JavaScript or the sources). */
export const POTENTIA_BIN = path.join(ROOT, 'bin', 'potentia.js');

/**
 * Start-up plus a one-cell eval through the runner: `node bin/potentia.js eval FORMULA`, wall
 * time of the whole process; the printed value is checked against the published E°.
 */
export function benchCliEval(runs: number): Stat {
  const c = COPPER;
  const formula = `=ECHEM.POTENTIAL("${c.halfReaction}", "Cu2+", 0.01, 25, {"${c.halfReaction}",${c.e0V},${c.dE0dTmVperK},""})`;
  // E = E°(Cu2+/Cu) − (RT/2F)·ln(1/a(Cu2+)) at 25 °C, by hand; the same Nernst term as the
  // Daniell cell's with a(Zn2+) = 1
  const expected = c.e0V - daniellNernstTermV(1, 0.01, 25);
  const ms: number[] = [];
  // untimed: a launcher that compiles the runner on its first start does it here
  spawnSync(process.execPath, [POTENTIA_BIN, '--help'], { cwd: ROOT, encoding: 'utf8', timeout: 600_000 });
  for (let r = 0; r < runs; r++) {
    const t0 = process.hrtime.bigint();
    const res = spawnSync(process.execPath, [POTENTIA_BIN, 'eval', '--json', formula], {
      cwd: ROOT,
      encoding: 'utf8',
      timeout: 120_000,
    });
    ms.push(Number(process.hrtime.bigint() - t0) / 1e6);
    if (res.status !== 0)
      throw new CheckFailure('cli_eval', `potentia eval failed (${res.status}): ${res.stderr}`);
    const lines = res.stdout.trim().split('\n');
    const value: unknown = JSON.parse(lines[lines.length - 1] ?? 'null');
    const got = Array.isArray(value) ? (value as unknown[][])[0]?.[0] : value;
    if (typeof got !== 'number' || !(Math.abs(got - expected) <= CHECK_TOLERANCE_V))
      throw new CheckFailure('cli_eval', `potentia eval printed ${res.stdout.trim()}, expected ${expected}`);
    recordChecked('cli_eval');
  }
  return stat(ms);
}
