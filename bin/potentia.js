#!/usr/bin/env node
/*
 * Launcher for the `potentia` command. It runs the TypeScript sources directly through
 * ts-node in transpile-only mode (no type checking, no build step), so the command works
 * right after `npm ci` on a fresh clone. The compiler options are given here rather than
 * read from a tsconfig, so the command behaves the same from any working directory.
 * Calculation by HyperFormula, used under its GPL-3.0 licence (see README, Headless runner).
 */
'use strict';

const path = require('path');

const root = path.resolve(__dirname, '..');

require('ts-node').register({
  transpileOnly: true,
  skipProject: true,
  // Paths are taken relative to the package, so its own sources are compiled (and its
  // dependencies ignored) wherever it is installed and whatever the working directory.
  cwd: root,
  scope: true,
  scopeDir: root,
  compilerOptions: {
    target: 'ES2020',
    module: 'commonjs',
    esModuleInterop: true,
    resolveJsonModule: true,
    sourceMap: true,
  },
});

require(path.join(root, 'src', 'cli', 'main.ts')).run();
