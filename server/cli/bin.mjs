#!/usr/bin/env node
// Package bin for `overstrand`: runs server/cli/overstrand.ts through tsx in one child process,
// with the server tsconfig (path alias @/), passing stdio, arguments and the exit code through.
import { spawn } from 'node:child_process';
import { fileURLToPath } from 'node:url';

const script = fileURLToPath(new URL('./overstrand.ts', import.meta.url));
const tsconfig = fileURLToPath(new URL('../tsconfig.json', import.meta.url));
const child = spawn(process.execPath, ['--import', import.meta.resolve('tsx'), script, ...process.argv.slice(2)], {
  stdio: 'inherit',
  env: { ...process.env, TSX_TSCONFIG_PATH: tsconfig },
});
for (const signal of ['SIGINT', 'SIGTERM']) process.on(signal, () => child.kill(signal));
child.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
