#!/usr/bin/env node
/*
 * Launcher for the `potentia` command. It runs the compiled JavaScript in build/cli, made
 * from the TypeScript sources by `npm run build:cli` (run by `npm ci` through the prepare
 * script, by `npm run build` and by `npm test`). No TypeScript compiler at run time.
 * Calculation by HyperFormula, used under its GPL-3.0 licence (see README, Headless runner).
 */
'use strict';

const fs = require('fs');
const path = require('path');

const root = path.resolve(__dirname, '..');
const entry = path.join(root, 'build', 'cli', 'src', 'cli', 'main.js');

/** Compiles the runner once when a checkout has the compiler but no build yet. */
function buildOnce() {
  let tsc;
  try {
    tsc = require.resolve('typescript/bin/tsc', { paths: [root] });
  } catch {
    return false;
  }
  process.stderr.write('potentia: compiling the runner into build/cli (once)...\n');
  const { spawnSync } = require('child_process');
  const r = spawnSync(process.execPath, [tsc, '-p', path.join(root, 'tsconfig.build-cli.json')], {
    cwd: root,
    stdio: 'inherit',
  });
  return r.status === 0 && fs.existsSync(entry);
}

if (fs.existsSync(entry) || buildOnce()) {
  require(entry).run();
} else {
  process.stderr.write(
    'potentia: the runner is not built (build/cli is missing).\n' +
      'Build it with: npm run build:cli   (npm ci does it too)\n',
  );
  process.exitCode = 2;
}
