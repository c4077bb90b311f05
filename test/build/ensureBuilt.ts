/**
 * Makes sure dist/ holds a production build before a test reads it. `npm test` builds first;
 * a test run on its own (npx jest test/build) builds here. Test files run in parallel workers,
 * so the build is guarded by a lock directory: one worker builds, the others wait for it.
 */
import { execFileSync } from 'child_process';
import * as fs from 'fs';
import * as path from 'path';

export const ROOT = path.resolve(__dirname, '..', '..');
export const DIST = path.join(ROOT, 'dist');

/** What `npm run build` must produce. */
export const BUILD_OUTPUTS = [
  'functions.js',
  'functions.json',
  'taskpane.html',
  'taskpane.js',
  'manifest.xml',
  'assets/icon-16.png',
  'assets/icon-32.png',
  'assets/icon-64.png',
  'assets/icon-80.png',
  'assets/icon-128.png',
];

/** Generous: a cold production build on a small machine takes well under this. */
export const BUILD_TIMEOUT_MS = 300_000;

const LOCK = path.join(ROOT, '.build-test.lock');

function built(): boolean {
  return BUILD_OUTPUTS.every((f) => fs.existsSync(path.join(DIST, f)));
}

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/** Builds dist/ with `npx webpack --mode production` unless it is already there. */
export async function ensureBuilt(): Promise<void> {
  const deadline = Date.now() + BUILD_TIMEOUT_MS;
  while (!built()) {
    try {
      fs.mkdirSync(LOCK);
    } catch {
      // Another worker is building (or a stale lock from a killed run: give up at the deadline).
      if (Date.now() > deadline)
        throw new Error(`dist/ was not built in time; remove ${LOCK} if it is stale.`);
      await sleep(500);
      continue;
    }
    try {
      if (!built()) {
        execFileSync('npx', ['webpack', '--mode', 'production'], {
          cwd: ROOT,
          stdio: 'pipe',
          timeout: BUILD_TIMEOUT_MS,
        });
      }
    } finally {
      fs.rmdirSync(LOCK);
    }
  }
}
