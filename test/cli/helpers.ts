/**
 * Shared pieces of the runner's tests: a captured Io, temporary folders, the launcher, and
 * the Nernst equation written out by hand with the SI exact constants.
 */
import { execFile, execFileSync } from 'node:child_process';
import * as fs from 'node:fs';
import * as os from 'node:os';
import * as path from 'node:path';
import type { Io } from '../../src/cli/io';
import { main } from '../../src/cli/main';

/** Repository root. */
export const ROOT = path.resolve(__dirname, '..', '..');
export const LAUNCHER = path.join(ROOT, 'bin', 'potentia.js');

// SI 2019 exact values (derived from the SI exact constants: F = N_A·e, R = N_A·k).
import { F, R } from '../support';

export { F, R };

/** RT/F in V at t °C (derived from the SI exact constants). */
export function thermalVoltage(tC: number): number {
  return (R * (tC + 273.15)) / F;
}

/** E = E° − (RT/nF) ln Q, written out by hand. */
export function nernst(e0: number, n: number, q: number, tC = 25): number {
  return e0 - (thermalVoltage(tC) / n) * Math.log(q);
}

export interface Captured extends Io {
  stdout: () => string;
  stderr: () => string;
}

/** An Io that keeps what a command prints. */
export function captureIo(): Captured {
  let out = '';
  let err = '';
  const sink = { write: (t: string) => ((err += t), true) } as unknown as NodeJS.WritableStream;
  return {
    out: (t) => {
      out += t;
    },
    err: (t) => {
      err += t;
    },
    errIsTTY: false,
    errStream: sink,
    stdout: () => out,
    stderr: () => err,
  };
}

/** A fresh temporary folder for one test file. */
export function tempDir(prefix: string): string {
  return fs.mkdtempSync(path.join(os.tmpdir(), `potentia-${prefix}-`));
}

export interface RunResult {
  code: number;
  stdout: string;
  stderr: string;
}

const BUILD_LOCK = path.join(ROOT, '.build-cli-test.lock');
let cliBuilt = false;

/**
 * Compiles the runner into build/cli (incrementally: quick when nothing changed) before a
 * test starts `bin/potentia.js`, so a spawned runner never runs stale JavaScript. One jest
 * worker builds at a time (a lock folder); the others wait.
 */
export async function ensureCliBuilt(): Promise<void> {
  if (cliBuilt) return;
  const deadline = Date.now() + 300_000;
  for (;;) {
    try {
      fs.mkdirSync(BUILD_LOCK);
      break;
    } catch {
      if (Date.now() > deadline)
        throw new Error(`build/cli was not built in time; remove ${BUILD_LOCK} if it is stale.`);
      await new Promise((r) => setTimeout(r, 200));
    }
  }
  try {
    execFileSync(process.execPath, [require.resolve('typescript/bin/tsc'), '-p', 'tsconfig.build-cli.json'], {
      cwd: ROOT,
      stdio: 'pipe',
    });
    // Mark the build current (an incremental build that changed nothing keeps its old date),
    // so the launcher does not rebuild it again in each child process.
    const info = path.join(ROOT, 'build', 'cli', '.tsbuildinfo');
    const now = new Date();
    if (fs.existsSync(info)) fs.utimesSync(info, now, now);
    cliBuilt = true;
  } finally {
    fs.rmdirSync(BUILD_LOCK);
  }
}

/**
 * Runs the command in this process (no child process, no start-up cost): `main` with a
 * captured Io. An exception past `main` is what the launcher reports as exit code 3.
 */
export async function runMain(args: readonly string[]): Promise<RunResult> {
  const io = captureIo();
  try {
    const code = await main(args, io);
    return { code, stdout: io.stdout(), stderr: io.stderr() };
  } catch (e) {
    return {
      code: 3,
      stdout: io.stdout(),
      stderr: `${io.stderr()}${e instanceof Error ? e.message : String(e)}`,
    };
  }
}

/** Runs `node bin/potentia.js ...args` as a child process (the compiled runner). */
export async function runCli(args: readonly string[], cwd = ROOT): Promise<RunResult> {
  await ensureCliBuilt();
  return new Promise((resolve) => {
    execFile(
      process.execPath,
      [LAUNCHER, ...args],
      { cwd, env: { ...process.env, FORCE_COLOR: '0' }, timeout: 300000 },
      (error, stdout, stderr) => {
        const code = error ? (typeof error.code === 'number' ? error.code : -1) : 0;
        resolve({ code, stdout: String(stdout), stderr: String(stderr) });
      },
    );
  });
}

/** Parses CSV (RFC 4180: quoted fields, doubled quotes, CRLF). */
export function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let field = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i] as string;
    if (quoted) {
      if (ch === '"' && text[i + 1] === '"') {
        field += '"';
        i++;
      } else if (ch === '"') quoted = false;
      else field += ch;
    } else if (ch === '"') quoted = true;
    else if (ch === ',') {
      row.push(field);
      field = '';
    } else if (ch === '\n' || ch === '\r') {
      if (ch === '\r' && text[i + 1] === '\n') i++;
      row.push(field);
      rows.push(row);
      row = [];
      field = '';
    } else field += ch;
  }
  if (field !== '' || row.length > 0) rows.push([...row, field]);
  return rows;
}
