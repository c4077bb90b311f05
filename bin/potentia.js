#!/usr/bin/env node
/*
 * Launcher for the `potentia` command. It runs the compiled JavaScript in build/cli, made
 * from the TypeScript sources by `npm run build:cli` (run by `npm ci` through the prepare
 * script, by `npm run build` and by `npm test`). No TypeScript compiler at run time; in a
 * checkout whose sources are newer than the build, the launcher brings the build up to date
 * first (where the compiler is installed).
 * Calculation by HyperFormula, used under its GPL-3.0 licence (see README, Headless runner).
 */
'use strict';

const fs = require('fs');
const path = require('path');

const root = path.resolve(__dirname, '..');
const entry = path.join(root, 'build', 'cli', 'src', 'cli', 'main.js');

/** The newest modification time (ms) of the TypeScript sources the runner is built from. */
function newestSource(dir) {
  let newest = 0;
  let entries;
  try {
    entries = fs.readdirSync(dir, { withFileTypes: true });
  } catch {
    return 0;
  }
  for (const e of entries) {
    const p = path.join(dir, e.name);
    if (e.isDirectory()) newest = Math.max(newest, newestSource(p));
    else if (e.name.endsWith('.ts')) newest = Math.max(newest, fs.statSync(p).mtimeMs);
  }
  return newest;
}

/** True where build/cli is older than a source (a checkout being edited): build again. */
function stale() {
  const info = path.join(root, 'build', 'cli', '.tsbuildinfo');
  if (!fs.existsSync(info)) return false;
  return newestSource(path.join(root, 'src')) > fs.statSync(info).mtimeMs;
}

/** Compiles the runner (incrementally) when a checkout has the compiler but no current build. */
function buildOnce() {
  let tsc;
  try {
    tsc = require.resolve('typescript/bin/tsc', { paths: [root] });
  } catch {
    return false;
  }
  process.stderr.write('potentia: compiling the runner into build/cli...\n');
  const { spawnSync } = require('child_process');
  const r = spawnSync(process.execPath, [tsc, '-p', path.join(root, 'tsconfig.build-cli.json')], {
    cwd: root,
    stdio: 'inherit',
  });
  if (r.status !== 0 || !fs.existsSync(entry)) return false;
  // An incremental build that changed nothing leaves its record as it was: mark it current.
  const info = path.join(root, 'build', 'cli', '.tsbuildinfo');
  if (fs.existsSync(info)) {
    const now = new Date();
    fs.utimesSync(info, now, now);
  }
  return true;
}

if ((fs.existsSync(entry) && !stale()) || buildOnce() || fs.existsSync(entry)) {
  require(entry).run();
} else {
  process.stderr.write(
    'potentia: the runner is not built (build/cli is missing).\n' +
      'Build it with: npm run build:cli   (npm ci does it too)\n',
  );
  process.exitCode = 2;
}
