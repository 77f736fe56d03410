#!/usr/bin/env node
// Plain JavaScript on purpose: it runs before the dependencies (TypeScript among them) are installed.
// Usage: node api/tools/bootstrap.cjs <tool> — installs what is missing, compiles the API, runs the tool.
'use strict';
const { spawnSync } = require('node:child_process');
const { existsSync, statSync } = require('node:fs');
const path = require('node:path');

const root = path.resolve(__dirname, '../..');
const tool = process.argv[2];
const testMode = tool === 'run-tests';

function fail(message) {
  console.error(message);
  if (testMode) console.log('0 passed, 1 failed');
  process.exit(1);
}

function step(command, args) {
  const result = spawnSync(command, args, { cwd: root, stdio: 'inherit' });
  if (result.status !== 0) fail(`\n${command} ${args.join(' ')} failed (exit ${result.status}).`);
}

function installIsCurrent() {
  const marker = path.join(root, 'node_modules/.package-lock.json');
  if (!existsSync(marker)) return false;
  return statSync(marker).mtimeMs >= statSync(path.join(root, 'package-lock.json')).mtimeMs;
}

if (!installIsCurrent()) {
  console.log('Installing npm dependencies (npm ci)…');
  step('npm', ['ci', '--no-audit', '--no-fund']);
}
step(process.execPath, [path.join(root, 'node_modules/typescript/bin/tsc'), '-p', 'api/tsconfig.json']);
if (tool) {
  const compiled = path.join(root, 'dist/server/api/tools', `${tool}.js`);
  if (!existsSync(compiled)) fail(`Unknown tool "${tool}"`);
  process.chdir(root);
  require(compiled);
}
