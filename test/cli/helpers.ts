/**
 * Shared pieces of the runner's tests: a captured Io, temporary folders, the launcher, and
 * the Nernst equation written out by hand with the SI exact constants.
 */
import { execFile } from 'node:child_process';
import * as fs from 'node:fs';
import * as os from 'node:os';
import * as path from 'node:path';
import type { Io } from '../../src/cli/io';

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

/** Runs `node bin/potentia.js ...args` as a child process. */
export function runCli(args: readonly string[], cwd = ROOT): Promise<RunResult> {
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
