#!/usr/bin/env node
/* Launcher for the benchmarks: runs bench/run.ts through ts-node (transpile only). */
'use strict';
const path = require('path');
require('ts-node').register({
  transpileOnly: true,
  skipProject: true,
  compilerOptions: { target: 'ES2020', module: 'commonjs', esModuleInterop: true, resolveJsonModule: true },
});
require(path.join(__dirname, 'run.ts'))
  .main(process.argv.slice(2))
  .catch((e) => {
    console.error(e);
    process.exit(1);
  });
