#!/usr/bin/env node
// The `pinwright` command (package.json "bin"): registers tsx so Node can load
// TypeScript, with the project's tsconfig (for the @/ alias) whatever the
// working directory, then runs server/cli/pinwright.ts. Contract: math/README.md.
'use strict';
const path = require('node:path');

process.env.TSX_TSCONFIG_PATH = process.env.TSX_TSCONFIG_PATH || path.join(__dirname, '..', '..', 'tsconfig.json');
require('tsx/cjs');
require('./pinwright.ts');
